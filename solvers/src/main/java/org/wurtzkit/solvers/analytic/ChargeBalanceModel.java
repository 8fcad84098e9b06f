package org.wurtzkit.solvers.analytic;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.EffectiveMasses;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.structure.PointState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;
import org.wurtzkit.units.Units;

/**
 * The closed-form charge balance of a gated heterostructure whose electron gas sits at the deepest
 * interface (the top of the channel layer): the analytic two-dimensional electron gas model of O.
 * Ambacher et al., J. Appl. Phys. 87, 334 (2000), generalised to any number of undoped uniform
 * layers between the gate and the channel (a GaN cap, an AlN spacer, the barrier). Immutable and
 * thread-safe; every evaluation is a scalar root search and takes microseconds.
 *
 * <h2>Derivation (re-derived here; not copied from a formula in the literature)</h2>
 *
 * <p>A paper in Chinese Physics B (abstract seen, details not) gives a published
 * warning about "a longstanding confusion" in a widely cited 2DEG-density formula, whose details
 * were not available; the balance is therefore derived from Gauss's law alone.
 *
 * <p>Depth x runs from the gate (x = 0) into the stack. Layers j = 0..m-1 (top down) of thickness
 * t_j and permittivity eps_j lie above the channel. The model's assumptions are those of A00: the
 * 2DEG is a sheet of density n_s at the channel's top interface, the channel below it is free of
 * field (no depletion charge, no back contact), the layers above the channel hold no free charge,
 * and the gate is a Schottky metal that pins the conduction band at the surface at phi_B - V above
 * the metal's Fermi level while the channel's Fermi level is the energy zero.
 *
 * <ol>
 * <li>Gauss's law with D = eps E + P (P_z the polarization along growth, pointing from the
 * substrate to the surface, so that the depth component is -P_z): in the field-free channel
 * D = -P_z(ch). Crossing the 2DEG (free charge -e n_s) and then every interface (bound charge
 * only, D continuous) gives in layer j: eps_j E_j - P_z(j) = -P_z(ch) + e n_s, i.e.
 * E_j = (e n_s - S_j) / eps_j with S_j = P_z(ch) - P_z(j), the total interface bound charge between
 * layer j and the channel ({@link Structure#interfaceCharges()} summed).</li>
 * <li>The conduction-band edge (eV) changes by E_j t_j across layer j (dE_c/dx = E in V/m for an
 * electron), and by the band offsets at the interfaces, whose sum is E_c(ch) - E_c(top layer).
 * Starting from E_c(0) = phi_B - V at the gate and ending, at the channel side of the 2DEG
 * interface, at -E_F(n_s) below the Fermi level:
 * <pre>
 *   phi_B - V + sum_j (e n_s - S_j) t_j / eps_j + E_c(ch) - E_c(top) = -E_F(n_s)
 * </pre></li>
 * <li>With 1/C = sum_j t_j/eps_j (the series capacitance of the layers) and
 * <pre>
 *   V_th = phi_B - [E_c(top) - E_c(ch)] - sum_j S_j t_j / eps_j
 * </pre>
 * this is e n_s / C = V - V_th - E_F(n_s)/e. At V = V_th the balance gives n_s = 0, so V_th is the
 * threshold voltage of the model; above it n_s is the unique root of this monotone equation (found
 * with the Brent solver of Commons Math), below it the model has no electron gas (n_s = 0).
 * Dropping E_F gives the charge-control line n_s = C (V - V_th)/e.</li>
 * </ol>
 *
 * <p>For a single barrier (thickness d, permittivity eps, S = sigma) at V = 0 this is
 * n_s = sigma/e - eps/(e^2 d) [e phi_B + E_F - dE_c], the form in which A00's model is usually
 * quoted (from memory; the paper itself was not at hand).
 * For a GaN cap on AlGaN on GaN the cap has the channel's polarization, so S_cap = 0 and
 * E_c(top) = E_c(ch): the two band-offset steps cancel and n_s = [sigma d/eps_b - (phi_B + E_F/e)] /
 * [e (d/eps_b + t_c/eps_c)], the cap expression used by the tests.
 *
 * <p>The Fermi level above the well bottom is E_F = E_0 + pi hbar^2 n_s / m_dos with the lowest
 * level of a triangular well in the mean field e n_s / (2 eps_w):
 * E_0 = [9 pi hbar e^2 n_s / (8 eps_w sqrt(8 m_z))]^{2/3} (the asymptotic Airy level, T. Ando, A.
 * B. Fowler and F. Stern, Rev. Mod. Phys. 54, 437 (1982); the expression A00 uses, as recalled
 * from memory). One subband, zero temperature.
 *
 * <p>Units: SI inside (m, m^-2, F/m^2, C/m^2); energies in eV and voltages in V as named.
 */
public final class ChargeBalanceModel {
    private static final double E = Constants.ELEMENTARY_CHARGE;
    private static final double EPS0 = Constants.VACUUM_PERMITTIVITY;
    private static final double HBAR = Constants.HBAR;
    private static final double M0 = Constants.ELECTRON_MASS;

    private final BarrierLayer[] layers;
    private final double schottkyBarrierEv;
    private final double gateBiasV;
    private final double surfaceOffsetEv;
    private final double wellPermittivity;
    private final double quantizationMass;
    private final double densityOfStatesMass;
    // derived
    private final double inverseCapacitance; // m^2/F
    private final double polarizationVoltage; // V
    private final double e0Prefactor; // E_0 = e0Prefactor * n^{2/3}, eV
    private final double dosCoefficient; // eV per m^-2

    /**
     * One undoped, uniform layer between the gate and the channel.
     *
     * @param name                 a name for messages
     * @param thickness            thickness (m), in (0, 1e-3]
     * @param relativePermittivity static relative permittivity, finite and &gt; 0
     * @param chargeBelow          S_j = P_z(channel) - P_z(this layer) (C/m&sup2;): the bound sheet
     *                             charge of all interfaces between this layer and the channel, in
     *                             [-1, 1]
     */
    public record BarrierLayer(String name, double thickness, double relativePermittivity, double chargeBelow) {
        /**
         * Creates the record and checks every component.
         *
         * @param name                 a name for messages
         * @param thickness            thickness (m), in (0, 1e-3]
         * @param relativePermittivity static relative permittivity, finite and &gt; 0
         * @param chargeBelow          S_j = P_z(channel) - P_z(this layer) (C/m&sup2;): the bound sheet
         *                                                         charge of all interfaces between this layer and the channel, in
         *                                                         [-1, 1]
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public BarrierLayer {
            Require.nonNull("barrier layer name", name);
            if (!(thickness > 0 && thickness <= Layer.MAX_THICKNESS)) {
                throw new InvalidParameterException("thickness of layer \"" + name + "\" (m)", Double.toString(thickness),
                        "(0, " + Layer.MAX_THICKNESS + "]");
            }
            Require.positive("relative permittivity of layer \"" + name + "\"", relativePermittivity);
            Require.inRange("polarization charge below layer \"" + name + "\" (C/m^2)", chargeBelow, -1, 1);
        }

        /** {@return thickness (nm)} */
        public double thicknessNm() {
            return Units.mToNm(thickness);
        }

        /**
         * @param t new thickness (m)
         * @return a copy with that thickness
         */
        public BarrierLayer withThickness(double t) {
            return new BarrierLayer(name, t, relativePermittivity, chargeBelow);
        }
    }

    private ChargeBalanceModel(Builder b) {
        if (b.layers.isEmpty()) {
            throw new InvalidParameterException("number of layers between gate and channel", "0",
                    "[1, ...) (add at least the barrier)");
        }
        this.layers = b.layers.toArray(new BarrierLayer[0]);
        this.schottkyBarrierEv = Require.inRange("Schottky barrier height (eV)", b.schottkyBarrierEv, 0, 6);
        this.gateBiasV = Require.inRange("gate bias (V)", b.gateBiasV, -100, 20);
        this.surfaceOffsetEv = Require.inRange("E_c(top layer) - E_c(channel) (eV)", b.surfaceOffsetEv, -7, 7);
        this.wellPermittivity = Require.positive("relative permittivity of the channel", b.wellPermittivity);
        this.quantizationMass = Require.positive("quantization mass of the channel (m0)", b.quantizationMass);
        this.densityOfStatesMass = Require.positive("density-of-states mass of the channel (m0)",
                b.densityOfStatesMass);
        double inv = 0;
        double pol = 0;
        for (BarrierLayer l : layers) {
            double eps = l.relativePermittivity() * EPS0;
            inv += l.thickness() / eps;
            pol += l.chargeBelow() * l.thickness() / eps;
        }
        this.inverseCapacitance = inv;
        this.polarizationVoltage = pol;
        double mz = quantizationMass * M0;
        double epsW = wellPermittivity * EPS0;
        // E_0 (J) = [9 pi hbar e^2 n / (8 eps sqrt(8 m))]^{2/3}; in eV divide by e
        this.e0Prefactor = Math.pow(9 * Math.PI * HBAR * E * E / (8 * epsW * Math.sqrt(8 * mz)), 2.0 / 3.0) / E;
        this.dosCoefficient = Math.PI * HBAR * HBAR / (densityOfStatesMass * M0) / E;
    }

    /** {@return an empty builder} */
    public static Builder builder() {
        return new Builder();
    }

    /** {@return a builder pre-filled with this model} */
    public Builder toBuilder() {
        Builder b = new Builder();
        Collections.addAll(b.layers, layers);
        b.schottkyBarrierEv = schottkyBarrierEv;
        b.gateBiasV = gateBiasV;
        b.surfaceOffsetEv = surfaceOffsetEv;
        b.wellPermittivity = wellPermittivity;
        b.quantizationMass = quantizationMass;
        b.densityOfStatesMass = densityOfStatesMass;
        return b;
    }

    /**
     * The model of a structure, fed by the structure's parameter set: the polarization charges S_j
     * from the structure's strain and polarization model (core's {@link Structure#layerStates()}),
     * permittivities from the set, the offset E_c(top) - E_c(channel) from the set's band edges at
     * the structure's temperature with the same line-up rule as the full solver
     * ({@link Structure#bandEdgesAt}: the structure's band alignment and strain-shift switch), and
     * the channel's electron masses (along c for E_0, in the basal plane for the density of
     * states). E_0 is evaluated with the channel's permittivity, since the field of the well is in
     * the channel; A00's expression as recalled uses the barrier's eps(x) there ({@link Ambacher2000}
     * keeps that). The Schottky barrier and the bias are the structure's.
     *
     * <p>Requirements: at least two layers (the bottom one is the channel); every layer above the
     * channel uniform (not graded) and undoped (no dopants, deep levels or delta sheets, which the
     * model cannot hold); a Schottky top boundary. As in A00, the channel is taken to be field-free,
     * so its own doping and the bottom boundary do not enter.
     *
     * @param structure the stack
     * @return its charge-balance model
     * @throws InvalidParameterException naming the offending layer or boundary
     */
    public static ChargeBalanceModel fromStructure(Structure structure) {
        Require.nonNull("structure", structure);
        List<LayerState> states = structure.layerStates();
        if (states.size() < 2) {
            throw new InvalidParameterException("number of layers of the structure", Integer.toString(states.size()),
                    "[2, ...) (at least a barrier on a channel)");
        }
        if (!(structure.top() instanceof TopBoundary.Schottky gate)) {
            throw new InvalidParameterException("top boundary", String.valueOf(structure.top()),
                    "a Schottky gate (the analytic model pins E_c at the surface)");
        }
        LayerState channel = states.get(states.size() - 1);
        PointState ch = channel.top();
        double pCh = ch.alongGrowth();
        Builder b = builder().schottkyBarrierEv(gate.barrierHeightEv()).gateBias(gate.biasV());
        if (!structure.interfaceSheets().isEmpty()) {
            throw new InvalidParameterException("number of interface sheets (fixed charge, interface states)",
                    Integer.toString(structure.interfaceSheets().size()),
                    "[0, 0] (the analytic model holds polarization charge only; use the self-consistent solver)");
        }
        for (org.wurtzkit.structure.InsulatorLayer il : structure.gateStack()) {
            // an insulator: no polarization, so its sheet relative to the channel is P_z(channel) - 0
            b.addLayer(new BarrierLayer(il.name(), il.thickness(), il.insulator().relativePermittivity(), pCh));
        }
        for (int i = 0; i < states.size() - 1; i++) {
            LayerState s = states.get(i);
            Layer l = s.layer();
            if (l.material().isGraded()) {
                throw new InvalidParameterException("material of layer \"" + l.name() + "\"", l.material().describe(),
                        "a uniform material (the analytic model has no graded layers)");
            }
            int doping = l.dopants().size() + l.deepLevels().size() + l.deltaSheets().size();
            if (doping != 0) {
                throw new InvalidParameterException("number of dopants, deep levels and delta sheets in layer \""
                        + l.name() + "\"", Integer.toString(doping), "[0, 0] (the analytic model holds undoped layers)");
            }
            b.addLayer(new BarrierLayer(l.name(), l.thickness(), s.top().material().permittivityStatic(),
                    pCh - s.top().alongGrowth()));
        }
        double ecTop = structure.gateStack().isEmpty() ? structure.bandEdgesAt(states.get(0).top()).conductionEv()
                : structure.bandEdgesOf(structure.gateStack().get(0)).conductionEv();
        double ecCh = structure.bandEdgesAt(ch).conductionEv();
        EffectiveMasses m = ch.material().masses();
        return b.surfaceOffsetEv(ecTop - ecCh)
                .wellPermittivity(ch.material().permittivityStatic())
                .quantizationMass(m.electronParallel())
                .densityOfStatesMass(m.electronPerpendicular())
                .build();
    }

    /**
     * The set-fed model of an undoped Al<sub>x</sub>Ga<sub>1-x</sub>N barrier pseudomorphic on a
     * relaxed GaN channel (metal face, the set's recommended polarization model, default band
     * line-up).
     *
     * @param set               the parameter set
     * @param x                 Al fraction, in [0, 1]
     * @param barrierThickness  barrier thickness (m)
     * @param schottkyBarrierEv phi_B (eV)
     * @param temperatureK      temperature (K)
     * @return the model at zero gate bias
     */
    public static ChargeBalanceModel alGaNOnGaN(ParameterSet set, double x, double barrierThickness,
            double schottkyBarrierEv, double temperatureK) {
        Structure s = Structure.builder(set)
                .grow(Layer.of("channel", Composition.GAN, 1000 * Units.NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierThickness))
                .top(TopBoundary.schottky(schottkyBarrierEv).atBiasV(0))
                .temperatureK(temperatureK)
                .build();
        return fromStructure(s);
    }

    // ------------------------------------------------------------------ evaluation

    /**
     * Threshold voltage V_th = phi_B - [E_c(top) - E_c(ch)] - sum_j S_j t_j / eps_j (see the class
     * documentation for the derivation).
     *
     * @return V_th (V)
     */
    public double thresholdVoltage() {
        return schottkyBarrierEv - surfaceOffsetEv - polarizationVoltage;
    }

    /** {@return the series capacitance of the layers above the channel, 1 / sum_j t_j/eps_j (F/m&sup2;)} */
    public double gateCapacitance() {
        return 1 / inverseCapacitance;
    }

    /** {@return 2DEG sheet density at the model's own gate bias (m^-2)} */
    public double sheetDensity() {
        return sheetDensity(gateBiasV);
    }

    /** {@return 2DEG sheet density at the model's own gate bias (cm^-2)} */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(sheetDensity());
    }

    /**
     * Solves e n_s / C = V - V_th - E_F(n_s)/e for n_s with the Brent solver (Commons Math 3,
     * {@link BrentSolver}) on the bracket [0, C (V - V_th)/e], where the left side minus the right
     * side changes sign because E_F(0) = 0 and E_F &gt; 0. Returns 0 at and below threshold.
     *
     * @param gateBiasV gate bias V (V), finite
     * @return n_s (m^-2)
     */
    public double sheetDensity(double gateBiasV) {
        Require.finite("gate bias (V)", gateBiasV);
        double overdrive = gateBiasV - thresholdVoltage();
        if (!(overdrive > 0)) {
            return 0;
        }
        double nMax = overdrive / (E * inverseCapacitance);
        // in u = n / nMax: g(u) = E_F(u nMax) - overdrive (1 - u), g(0) < 0 < g(1)
        BrentSolver brent = new BrentSolver(1e-15, 1e-15);
        double u = brent.solve(200, v -> fermiLevelAboveWellBottomEv(v * nMax) - overdrive * (1 - v), 0, 1);
        return u * nMax;
    }

    /**
     * @param gateBiasV gate bias (V)
     * @return n_s (cm^-2)
     */
    public double sheetDensityPerCm2(double gateBiasV) {
        return Units.perM2ToPerCm2(sheetDensity(gateBiasV));
    }

    /**
     * The charge-control line n_s = C (V - V_th) / e above threshold, 0 below (the E_F term of the
     * balance dropped); for a single barrier C = eps/d, i.e. n_s = eps (V - V_th) / (e d).
     *
     * @param gateBiasV gate bias (V), finite
     * @return n_s on the line (m^-2)
     */
    public double chargeControlDensity(double gateBiasV) {
        Require.finite("gate bias (V)", gateBiasV);
        double overdrive = gateBiasV - thresholdVoltage();
        return overdrive > 0 ? overdrive / (E * inverseCapacitance) : 0;
    }

    /**
     * @param gateBiasV gate bias (V)
     * @return n_s on the charge-control line (cm^-2)
     */
    public double chargeControlDensityPerCm2(double gateBiasV) {
        return Units.perM2ToPerCm2(chargeControlDensity(gateBiasV));
    }

    /**
     * Lowest level of the triangular well above its bottom, E_0 = [9 pi hbar e^2 n_s /
     * (8 eps_w sqrt(8 m_z))]^{2/3} (asymptotic Airy level at the mean field e n_s/(2 eps_w); Ando,
     * Fowler and Stern, Rev. Mod. Phys. 54, 437 (1982)).
     *
     * @param sheetDensity n_s (m^-2), &ge; 0
     * @return E_0 (eV)
     */
    public double groundStateEnergyEv(double sheetDensity) {
        Require.nonNegative("sheet density (m^-2)", sheetDensity);
        return e0Prefactor * Math.cbrt(sheetDensity * sheetDensity);
    }

    /**
     * E_F above the well bottom, E_0 + pi hbar^2 n_s / m_dos (one subband, zero temperature).
     *
     * @param sheetDensity n_s (m^-2), &ge; 0
     * @return E_F - E_c(interface) (eV)
     */
    public double fermiLevelAboveWellBottomEv(double sheetDensity) {
        return groundStateEnergyEv(sheetDensity) + dosCoefficient * sheetDensity;
    }

    /**
     * The thickness of the layer directly above the channel (the barrier) at which n_s vanishes at
     * the model's gate bias: V_th(t) = V, linear in t, solved in closed form.
     *
     * @return the critical barrier thickness (m)
     * @throws WurtzkitException of kind INVALID_STRUCTURE if no positive thickness gives n_s = 0
     *                           (the barrier's charge S is not positive, or n_s &gt; 0 for every
     *                           thickness)
     */
    public double criticalBarrierThickness() {
        BarrierLayer b = layers[layers.length - 1];
        double eps = b.relativePermittivity() * EPS0;
        double others = polarizationVoltage - b.chargeBelow() * b.thickness() / eps;
        double drive = schottkyBarrierEv - surfaceOffsetEv - others - gateBiasV;
        double t = drive * eps / b.chargeBelow();
        if (!(b.chargeBelow() > 0) || !(t > 0)) {
            throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, String.format(java.util.Locale.ROOT,
                    "no barrier thickness makes n_s vanish at %.4g V: charge below the barrier S = %.4g C/m^2, "
                            + "phi_B - offset - other layers - V = %.4g V (need S > 0 and a positive result)",
                    gateBiasV, b.chargeBelow(), drive));
        }
        return t;
    }

    // ------------------------------------------------------------------ variants and accessors

    /**
     * @param v gate bias (V), in [-100, 20]
     * @return a copy at that bias
     */
    public ChargeBalanceModel withGateBias(double v) {
        return toBuilder().gateBias(v).build();
    }

    /**
     * @param thickness new thickness of the layer directly above the channel (m)
     * @return a copy with that barrier thickness
     */
    public ChargeBalanceModel withBarrierThickness(double thickness) {
        Builder b = toBuilder();
        int last = b.layers.size() - 1;
        b.layers.set(last, b.layers.get(last).withThickness(thickness));
        return b.build();
    }

    /** {@return the layers between the gate and the channel, top first} */
    public List<BarrierLayer> layers() {
        return List.of(layers);
    }

    /** {@return phi_B (eV)} */
    public double schottkyBarrierEv() {
        return schottkyBarrierEv;
    }

    /** {@return the gate bias the model is evaluated at by default (V)} */
    public double gateBiasV() {
        return gateBiasV;
    }

    /** {@return E_c(top layer) - E_c(channel) (eV)} */
    public double surfaceOffsetEv() {
        return surfaceOffsetEv;
    }

    /** {@return sum_j S_j t_j / eps_j (V)} */
    public double polarizationVoltage() {
        return polarizationVoltage;
    }

    /** {@return relative permittivity used for E_0} */
    public double wellPermittivity() {
        return wellPermittivity;
    }

    /** {@return mass along the growth direction used for E_0 (m0)} */
    public double quantizationMass() {
        return quantizationMass;
    }

    /** {@return in-plane density-of-states mass (m0)} */
    public double densityOfStatesMass() {
        return densityOfStatesMass;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("ChargeBalanceModel[");
        for (BarrierLayer l : layers) {
            sb.append(l.name()).append(' ').append(String.format(java.util.Locale.ROOT, "%.3g nm", l.thicknessNm()))
                    .append(" / ");
        }
        return sb.append(String.format(java.util.Locale.ROOT, "channel; phi_B %.3g eV, V %.3g V, V_th %.4g V]",
                schottkyBarrierEv, gateBiasV, thresholdVoltage())).toString();
    }

    /**
     * Mutable builder. Required: at least one layer, the Schottky barrier, the offset, the channel's
     * permittivity and masses; the gate bias defaults to 0 V.
     */
    public static final class Builder {
        private final List<BarrierLayer> layers = new ArrayList<>();
        private double schottkyBarrierEv = Double.NaN;
        private double gateBiasV = 0;
        private double surfaceOffsetEv = Double.NaN;
        private double wellPermittivity = Double.NaN;
        private double quantizationMass = Double.NaN;
        private double densityOfStatesMass = Double.NaN;

        private Builder() {
        }

        /**
         * Adds a layer below those added so far (the first call gives the layer under the gate,
         * the last the barrier on the channel).
         *
         * @param layer the layer
         * @return this builder
         */
        public Builder addLayer(BarrierLayer layer) {
            layers.add(Require.nonNull("layer", layer));
            return this;
        }

        /**
         * @param v phi_B (eV), in [0, 6]
         * @return this builder
         */
        public Builder schottkyBarrierEv(double v) {
            this.schottkyBarrierEv = v;
            return this;
        }

        /**
         * @param v gate bias (V), in [-100, 20]
         * @return this builder
         */
        public Builder gateBias(double v) {
            this.gateBiasV = v;
            return this;
        }

        /**
         * @param v E_c(top layer) - E_c(channel) (eV), in [-7, 7]
         * @return this builder
         */
        public Builder surfaceOffsetEv(double v) {
            this.surfaceOffsetEv = v;
            return this;
        }

        /**
         * @param v relative permittivity for E_0
         * @return this builder
         */
        public Builder wellPermittivity(double v) {
            this.wellPermittivity = v;
            return this;
        }

        /**
         * @param v mass along growth for E_0 (m0)
         * @return this builder
         */
        public Builder quantizationMass(double v) {
            this.quantizationMass = v;
            return this;
        }

        /**
         * @param v in-plane density-of-states mass (m0)
         * @return this builder
         */
        public Builder densityOfStatesMass(double v) {
            this.densityOfStatesMass = v;
            return this;
        }

        /**
         * {@return the model}
         *
         * @throws InvalidParameterException for a missing or out-of-range value
         */
        public ChargeBalanceModel build() {
            return new ChargeBalanceModel(this);
        }
    }
}
