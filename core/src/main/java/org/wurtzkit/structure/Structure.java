package org.wurtzkit.structure;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.bands.BandEdges;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.BandGap;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.polarization.Polarization;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.strain.BandEdgeShift;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.strain.Strain;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * An immutable c-plane layer stack with everything a solver needs: the parameter set, the layers,
 * the in-plane reference lattice, polarity, polarization model, temperature and the two boundaries.
 * Thread-safe.
 *
 * <p>Build one with {@link #builder(ParameterSet)}; layers are added in growth order, bottom first:
 *
 * <pre>{@code
 * Structure hemt = Structure.builder(ParameterSets.defaultSet())
 *         .grow(Layer.of("buffer", Composition.GAN, 2000 * NM))   // first grown = bottom
 *         .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
 *         .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM))
 *         .grow(Layer.of("cap", Composition.GAN, 2 * NM))          // last grown = top
 *         .top(TopBoundary.schottky(1.0).atBiasV(0))
 *         .build();
 * }</pre>
 *
 * <p>Coordinates: {@code depth} is measured from the top surface (0) into the stack. Polarization
 * components "along growth" point from the substrate toward the surface (see {@link Polarity}).
 *
 * <p>Strain: each layer is grown on the actual in-plane lattice of the layer below it (the bottom
 * layer on the reference lattice) and relaxes toward its own lattice constant by its relaxation r.
 * The reference defaults to the bottom layer's own relaxed lattice constant (a relaxed buffer).
 */
public final class Structure {
    private final ParameterSet parameters;
    private final List<Layer> bottomUp;
    private final List<LayerState> states; // top-down
    private final double referenceLatticeA;
    private final Polarity polarity;
    private final PolarizationModel polarizationModel;
    private final BandAlignment bandAlignment;
    private final boolean strainShiftsBandEdges;
    private final boolean strainShiftsValenceSplittings;
    private final double temperatureK;
    private final TopBoundary top;
    private final BottomBoundary bottom;
    private final double totalThickness;
    private final CriticalThicknessModel criticalThicknessModel;
    private final List<Warning> warnings;

    /** Layers thicker than this (m) get a {@link WarningKind#LAYER_THICKER_THAN_10_UM} warning. */
    public static final double WARN_LAYER_THICKNESS = 10e-6;
    /** Below this temperature (K) a structure gets a {@link WarningKind#TEMPERATURE_OUT_OF_RANGE} warning. */
    public static final double WARN_TEMPERATURE_BELOW_K = 20;
    /** Above this temperature (K) a structure gets a {@link WarningKind#TEMPERATURE_OUT_OF_RANGE} warning. */
    public static final double WARN_TEMPERATURE_ABOVE_K = 1000;
    /** Bottom depth of every layer, top-down, for the binary search of {@link #layerIndexAt}. */
    private final double[] bottoms;
    private final List<InsulatorLayer> gateStack; // top-down
    private final double gateStackThickness;
    private final List<PlacedSheet> sheets; // shallowest first
    private final java.util.Map<Integer, List<InterfaceSheet>> sheetsBottomUp; // for toBuilder

    private Structure(Builder b) {
        this.parameters = b.parameters;
        this.bottomUp = List.copyOf(b.layers);
        this.polarity = b.polarity;
        this.polarizationModel = b.polarizationModel != null ? b.polarizationModel
                : parameters.recommendedPolarizationModel();
        this.bandAlignment = b.bandAlignment != null ? b.bandAlignment : BandAlignment.recommendedFor(parameters);
        this.strainShiftsBandEdges = b.strainShiftsBandEdges;
        this.strainShiftsValenceSplittings = b.strainShiftsValenceSplittings;
        this.temperatureK = b.temperatureK;
        this.top = b.top;
        this.bottom = b.bottom;
        Layer first = bottomUp.get(0);
        this.referenceLatticeA = b.referenceLatticeA > 0 ? b.referenceLatticeA
                : first.material().at(0, parameters).latticeA();
        List<InsulatorLayer> gs = new ArrayList<>(b.deposited);
        Collections.reverse(gs);
        this.gateStack = List.copyOf(gs);
        double g = 0;
        for (InsulatorLayer il : gateStack) {
            g += il.thickness();
        }
        this.gateStackThickness = g;
        double t = g;
        for (Layer l : bottomUp) {
            t += l.thickness();
        }
        this.totalThickness = t;
        this.states = resolveStates();
        this.criticalThicknessModel = b.criticalThicknessModel;
        this.bottoms = new double[states.size()];
        for (int i = 0; i < bottoms.length; i++) {
            bottoms[i] = states.get(i).depthBottom();
        }
        this.sheetsBottomUp = new java.util.TreeMap<>();
        for (var e : b.sheets.entrySet()) {
            sheetsBottomUp.put(e.getKey(), List.copyOf(e.getValue()));
        }
        this.sheets = placeSheets();
        this.warnings = collectWarnings();
    }

    private List<Warning> collectWarnings() {
        List<Warning> out = new ArrayList<>();
        for (LayerState s : layersBeyondCriticalThickness(criticalThicknessModel)) {
            PointState worst = Math.abs(s.top().strain().xx()) >= Math.abs(s.bottom().strain().xx()) ? s.top()
                    : s.bottom();
            double hc = criticalThicknessModel.of(worst.material(), worst.strain());
            out.add(new Warning(WarningKind.BEYOND_CRITICAL_THICKNESS, s.layer().name() + " ("
                    + Decimals.format(s.layer().thicknessNm(), "nm") + ") is thicker than its critical thickness "
                    + Decimals.format(hc * 1e9, "nm") + " (an estimate of the structure's critical-thickness model); "
                    + "it may relax or crack"));
        }
        for (Layer l : bottomUp) {
            if (l.thickness() > WARN_LAYER_THICKNESS) {
                out.add(new Warning(WarningKind.LAYER_THICKER_THAN_10_UM, l.name() + " is "
                        + Decimals.format(l.thicknessNm() * 1e-3, "um") + " thick, above 10 um: check the unit"));
            }
        }
        if (temperatureK < WARN_TEMPERATURE_BELOW_K || temperatureK > WARN_TEMPERATURE_ABOVE_K) {
            out.add(new Warning(WarningKind.TEMPERATURE_OUT_OF_RANGE, "temperature "
                    + Decimals.format(temperatureK, "K") + " is outside [20 K, 1000 K], where the band-gap "
                    + "temperature laws and the carrier statistics were checked"));
        }
        if (top instanceof TopBoundary.Schottky g && g.biasV() >= g.barrierHeightEv()) {
            out.add(new Warning(WarningKind.GATE_BIAS_AT_OR_ABOVE_BARRIER, "gate bias " + Decimals.format(g.biasV(), "V")
                    + " is at or above the barrier height " + Decimals.format(g.barrierHeightEv(), "eV")
                    + ": the gate conducts forward and an equilibrium solve does not describe it"));
        }
        return List.copyOf(out);
    }

    /**
     * What may make this stack mislead, in this order: layers beyond their critical thickness
     * ({@link #criticalThicknessModel()}), layers thicker than 10 um, a temperature outside
     * [20 K, 1000 K], a gate bias at or above the Schottky barrier height.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /** {@return the critical-thickness model whose verdicts {@link #warnings()} reports} */
    public CriticalThicknessModel criticalThicknessModel() {
        return criticalThicknessModel;
    }

    private List<PlacedSheet> placeSheets() {
        List<PlacedSheet> out = new ArrayList<>();
        int n = bottomUp.size();
        for (int fromTop = 0; fromTop < n; fromTop++) {
            List<InterfaceSheet> l = sheetsBottomUp.get(n - 1 - fromTop);
            if (l == null) {
                continue;
            }
            LayerState st = states.get(fromTop);
            String upper = fromTop > 0 ? states.get(fromTop - 1).layer().name()
                    : gateStack.isEmpty() ? "vacuum" : gateStack.get(gateStack.size() - 1).name();
            BandEdges e = bandEdgesAt(st.top());
            double gap = e.conductionEv() - e.valenceEv();
            String where = "the top of layer \"" + st.layer().name() + "\" (gap " + gap + " eV)";
            for (int k = 0; k < l.size(); k++) {
                InterfaceSheet sh = l.get(k);
                for (int j = 0; j < sh.states().size(); j++) {
                    InterfaceStates is = sh.states().get(j);
                    try {
                        Require.inRange("interface-state charge-neutrality level below E_c at " + where + " (eV)",
                                is.neutralLevelBelowEcEv(), 0, gap);
                        is.distribution().checkInsideGap(gap, where);
                    } catch (InvalidParameterException bad) {
                        throw new InvalidStructurePartException(
                                new StructurePart(StructurePart.Kind.INTERFACE_STATES, fromTop, k, j), bad);
                    }
                }
                out.add(new PlacedSheet(st.depthTop(), upper, fromTop, gap, sh));
            }
        }
        return Collections.unmodifiableList(out);
    }

    private List<LayerState> resolveStates() {
        int n = bottomUp.size();
        LayerState[] out = new LayerState[n];
        double below = referenceLatticeA;
        double depthBottom = totalThickness;
        for (int i = 0; i < n; i++) {
            Layer l = bottomUp.get(i);
            double depthTop = depthBottom - l.thickness();
            if (i == n - 1) {
                depthTop = gateStackThickness; // exact value at the top despite round-off
            }
            PointState bot = point(l, 0, below);
            PointState topState = l.material().isGraded() ? point(l, 1, below) : bot;
            out[n - 1 - i] = new LayerState(l, n - 1 - i, depthTop, depthBottom, topState, bot);
            below = topState.inPlaneLatticeA();
            depthBottom = depthTop;
        }
        List<LayerState> list = new ArrayList<>(n);
        Collections.addAll(list, out);
        return Collections.unmodifiableList(list);
    }

    private PointState point(Layer l, double fromBottom, double inPlaneBelow) {
        WurtziteMaterial m = l.material().at(fromBottom, parameters);
        return pointFor(m, inPlaneBelow, l.relaxation());
    }

    private PointState pointFor(WurtziteMaterial m, double inPlaneBelow, double relaxation) {
        Strain s = Strain.pseudomorphic(m, inPlaneBelow, relaxation);
        Polarization p = Polarization.of(m, s, polarizationModel);
        return new PointState(m, Strain.actualInPlaneLattice(m.latticeA(), inPlaneBelow, relaxation), s, p,
                p.alongGrowth(polarity), BandEdgeShift.of(m, s));
    }

    /**
     * @param set the parameter set that resolves every alloy of the stack
     * @return a new builder
     */
    public static Builder builder(ParameterSet set) {
        return new Builder(set);
    }

    /** {@return a builder pre-filled with this structure, to derive a variant} */
    public Builder toBuilder() {
        Builder b = new Builder(parameters);
        b.layers.addAll(bottomUp);
        b.referenceLatticeA = referenceLatticeA;
        b.polarity = polarity;
        b.polarizationModel = polarizationModel;
        b.bandAlignment = bandAlignment;
        b.strainShiftsBandEdges = strainShiftsBandEdges;
        b.strainShiftsValenceSplittings = strainShiftsValenceSplittings;
        b.temperatureK = temperatureK;
        b.top = top;
        b.bottom = bottom;
        b.criticalThicknessModel = criticalThicknessModel;
        for (int i = gateStack.size() - 1; i >= 0; i--) {
            b.deposited.add(gateStack.get(i));
        }
        for (var e : sheetsBottomUp.entrySet()) {
            b.sheets.put(e.getKey(), new ArrayList<>(e.getValue()));
        }
        return b;
    }

    /**
     * The same stack (gate stack, interface sheets, boundaries and model choices included) with one
     * nitride layer replaced, e.g. a thinner barrier after a gate recess.
     *
     * @param indexBottomUp the layer's index in {@link #layersBottomUp()}
     * @param layer         the replacement
     * @return the modified copy
     */
    public Structure withLayer(int indexBottomUp, Layer layer) {
        Require.inRange("layer index (bottom-up)", indexBottomUp, 0, bottomUp.size() - 1);
        Require.nonNull("layer", layer);
        Builder b = toBuilder();
        b.layers.set(indexBottomUp, layer);
        return b.build();
    }

    /**
     * The same stack with another gate stack (everything else kept).
     *
     * @param topDown the insulator layers from the top down; empty for none
     * @return the modified copy
     */
    public Structure withGateStack(List<InsulatorLayer> topDown) {
        Require.nonNull("gate stack", topDown);
        Builder b = toBuilder();
        b.deposited.clear();
        for (int i = topDown.size() - 1; i >= 0; i--) {
            b.deposited.add(Require.nonNull("insulator layer", topDown.get(i)));
        }
        return b.build();
    }

    /**
     * Two structures are equal when everything the builder was given is equal: the same parameter
     * set (by its own {@code equals}, identity for the built-in sets), the same layers, reference
     * lattice, polarity, polarization model, band line-up, strain-shift switch, temperature,
     * boundaries, critical-thickness model, gate stack and interface sheets. Doubles compare bit for bit ({@link Double#compare}), as in records.
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof Structure s && s.parameters.equals(parameters) && s.bottomUp.equals(bottomUp)
                && Double.compare(s.referenceLatticeA, referenceLatticeA) == 0 && s.polarity == polarity
                && s.polarizationModel.equals(polarizationModel) && s.bandAlignment.equals(bandAlignment)
                && s.strainShiftsBandEdges == strainShiftsBandEdges
                && s.strainShiftsValenceSplittings == strainShiftsValenceSplittings
                && Double.compare(s.temperatureK, temperatureK) == 0 && s.top.equals(top) && s.bottom.equals(bottom)
                && s.criticalThicknessModel.equals(criticalThicknessModel) && s.gateStack.equals(gateStack)
                && s.sheetsBottomUp.equals(sheetsBottomUp);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(parameters, bottomUp, referenceLatticeA, polarity, polarizationModel,
                bandAlignment, strainShiftsBandEdges, strainShiftsValenceSplittings, temperatureK, top, bottom, criticalThicknessModel, gateStack,
                sheetsBottomUp);
    }

    /**
     * Returns a copy of this structure at another lattice temperature.
     *
     * @param temperatureK temperature (K), in (0, 2000]
     * @return a copy at that temperature
     */
    public Structure withTemperatureK(double temperatureK) {
        return toBuilder().temperatureK(temperatureK).build();
    }

    /**
     * Returns a copy of this structure at another lattice temperature.
     *
     * @param t temperature (K)
     * @return a copy at that temperature
     * @deprecated the unit belongs in the name: use {@link #withTemperatureK(double)}
     */
    @Deprecated(since = "0.2", forRemoval = true)
    public Structure withTemperature(double t) {
        return withTemperatureK(t);
    }

    /**
     * Returns a copy of this structure with another top boundary.
     *
     * @param boundary the new top boundary
     * @return a copy with it
     */
    public Structure withTop(TopBoundary boundary) {
        Builder b = toBuilder();
        b.top = Require.nonNull("top boundary", boundary);
        return b.build();
    }

    /** {@return the parameter set} */
    public ParameterSet parameters() {
        return parameters;
    }

    /**
     * {@return the deposited insulator layers of the gate stack, from the top down (empty without
     * one); they occupy depths [0, {@link #gateStackThickness()}] above the nitride layers}
     */
    public List<InsulatorLayer> gateStack() {
        return gateStack;
    }

    /** {@return the total thickness of the gate stack (m), 0 without one} */
    public double gateStackThickness() {
        return gateStackThickness;
    }

    /**
     * @param depth a depth in [0, {@link #gateStackThickness()}) (m)
     * @return the insulator layer there (the upper one at an interface)
     */
    public InsulatorLayer insulatorAt(double depth) {
        if (!(depth >= 0 && depth < gateStackThickness)) {
            throw Require.invalid("depth inside the gate stack (m)", depth, "[0, " + gateStackThickness + ")");
        }
        double bottomOf = 0;
        for (InsulatorLayer il : gateStack) {
            bottomOf += il.thickness();
            if (depth <= bottomOf) {
                return il;
            }
        }
        return gateStack.get(gateStack.size() - 1);
    }

    /**
     * The band edges of an insulator of this stack: E_c = E_c(GaN) + its conduction-band offset,
     * with E_c(GaN) the parameter set's GaN under this structure's band line-up at its temperature
     * (unstrained), and E_v = E_c - E_g.
     *
     * @param layer an insulator layer
     * @return E_c and E_v on the parameter set's energy scale (eV)
     */
    public BandEdges bandEdgesOf(InsulatorLayer layer) {
        Require.nonNull("insulator layer", layer);
        WurtziteMaterial gan = parameters.binary(org.wurtzkit.material.Binary.GAN);
        double ec = bandAlignment.edges(parameters, gan, temperatureK).conductionEv()
                + layer.insulator().conductionBandOffsetToGaNEv();
        return new BandEdges(ec, ec - layer.insulator().bandGapEv());
    }

    /**
     * {@return the fixed charges and interface states on the top faces of nitride layers,
     * shallowest first, with the gap their states span}
     */
    public List<PlacedSheet> interfaceSheets() {
        return sheets;
    }

    /**
     * The same stack with every sheet's interface states replaced by a fixed charge: the sheet's
     * fixed charge plus the given charge of its states. This is how states too slow to follow a
     * signal are described (the high-frequency limit of a C-V measurement): their occupancy stays
     * at its value at the operating point.
     *
     * @param stateCharge the charge of the states of each sheet of {@link #interfaceSheets()}, in
     *                    that order (C/m^2), e.g. from a solution at the operating point
     * @return the stack with frozen states
     */
    public Structure withInterfaceStatesFrozen(double[] stateCharge) {
        Require.nonNull("frozen interface-state charges", stateCharge);
        if (stateCharge.length != sheets.size()) {
            throw Require.invalid("number of frozen interface-state charges", stateCharge.length,
                    "[" + sheets.size() + ", " + sheets.size() + "] (one per interface sheet)");
        }
        Require.allFinite("frozen interface-state charges (C/m^2)", stateCharge, stateCharge.length);
        Builder b = toBuilder();
        b.sheets.clear();
        int n = bottomUp.size();
        int idx = 0;
        for (int fromTop = 0; fromTop < n; fromTop++) {
            List<InterfaceSheet> l = sheetsBottomUp.get(n - 1 - fromTop);
            if (l == null) {
                continue;
            }
            List<InterfaceSheet> frozen = new ArrayList<>();
            for (InterfaceSheet sh : l) {
                double extra = stateCharge[idx++] / org.wurtzkit.units.Constants.ELEMENTARY_CHARGE;
                frozen.add(new InterfaceSheet(sh.fixedChargePerM2() + extra, List.of()));
            }
            b.sheets.put(n - 1 - fromTop, frozen);
        }
        return b.build();
    }

    /** {@return the layers in growth order, bottom (first grown) first} */
    public List<Layer> layersBottomUp() {
        return bottomUp;
    }

    /** {@return the layers from the surface down, top first} */
    public List<Layer> layersTopDown() {
        List<Layer> l = new ArrayList<>(bottomUp);
        Collections.reverse(l);
        return Collections.unmodifiableList(l);
    }

    /** {@return every layer in place, from the surface down, with depths, strain and polarization} */
    public List<LayerState> layerStates() {
        return states;
    }

    /** {@return the in-plane lattice constant the bottom layer grows on (m)} */
    public double referenceLatticeA() {
        return referenceLatticeA;
    }

    /** {@return polarity} */
    public Polarity polarity() {
        return polarity;
    }

    /** {@return the polarization model in force} */
    public PolarizationModel polarizationModel() {
        return polarizationModel;
    }

    /** {@return the band line-up in force} */
    public BandAlignment bandAlignment() {
        return bandAlignment;
    }

    /** {@return whether the deformation potentials shift the band edges} */
    public boolean strainShiftsBandEdges() {
        return strainShiftsBandEdges;
    }

    /**
     * {@return whether strain also shifts the valence splittings (heavy, light and crystal-field
     * hole), in force only where {@link #strainShiftsBandEdges()} is; default true}
     */
    public boolean strainShiftsValenceSplittings() {
        return strainShiftsValenceSplittings;
    }

    /**
     * {@return whether the valence bands of this stack are those of its strain: both
     * {@link #strainShiftsBandEdges()} and {@link #strainShiftsValenceSplittings()}}
     */
    public boolean valenceBandsFollowStrain() {
        return strainShiftsBandEdges && strainShiftsValenceSplittings;
    }

    /**
     * The valence bands (heavy, light and crystal-field hole) at a point of this stack: those of its
     * strain ({@link ValenceBands#of(org.wurtzkit.material.WurtziteMaterial, double, double)}) if
     * {@link #valenceBandsFollowStrain()}, else the unstrained ones.
     *
     * @param point a point of this stack
     * @return its valence bands
     */
    public ValenceBands valenceBandsAt(PointState point) {
        Require.nonNull("point state", point);
        if (valenceBandsFollowStrain()) {
            return ValenceBands.of(point.material(), point.strain().xx(), point.strain().zz());
        }
        return ValenceBands.of(point.material());
    }

    /**
     * The band edges at a point of this stack: the structure's {@link #bandAlignment()} at its
     * temperature, plus the point's strain shifts if {@link #strainShiftsBandEdges()}. The valence
     * edge is the top of the three valence bands: with {@link #valenceBandsFollowStrain()} it moves
     * with the top band of the strained splittings (the heavy-hole shift, plus
     * {@link ValenceBands#topShiftBeyondHeavyHoleEv()} where another band is on top with or without
     * strain); otherwise by the heavy-hole shift alone. The one line-up rule of the full solver and
     * of the closed-form charge-balance model.
     *
     * @param point a point of this stack (from {@link #pointAt(double)} or {@link #layerStates()})
     * @return E_c and E_v on the parameter set's energy scale (eV)
     */
    public BandEdges bandEdgesAt(PointState point) {
        Require.nonNull("point state", point);
        BandEdges e = bandAlignment.edges(parameters, point.material(), temperatureK);
        if (strainShiftsBandEdges) {
            double dv = point.bandShift().valenceEv();
            if (strainShiftsValenceSplittings) {
                // exactly 0 where the heavy hole is on top with and without strain
                dv += valenceBandsAt(point).topShiftBeyondHeavyHoleEv();
            }
            e = e.shiftedBy(point.bandShift().conductionEv(), dv);
        }
        return e;
    }

    /** {@return temperature (K)} */
    public double temperatureK() {
        return temperatureK;
    }

    /** {@return the top boundary} */
    public TopBoundary top() {
        return top;
    }

    /** {@return the bottom boundary} */
    public BottomBoundary bottom() {
        return bottom;
    }

    /** {@return total thickness (m)} */
    public double totalThickness() {
        return totalThickness;
    }

    /**
     * {@return depths of the internal interfaces below the surface, shallowest first (m), those of
     * the gate stack (insulator/insulator and insulator/nitride) included}
     */
    public double[] interfaceDepths() {
        int g = gateStack.size();
        double[] d = new double[g + states.size() - 1];
        double acc = 0;
        for (int i = 0; i < g; i++) {
            acc += gateStack.get(i).thickness();
            d[i] = i == g - 1 ? gateStackThickness : acc;
        }
        for (int i = 0; i + 1 < states.size(); i++) {
            d[g + i] = states.get(i).depthBottom();
        }
        return d;
    }

    /**
     * @param depth a depth in [gate-stack thickness, total thickness] (m): inside the nitride
     *              layers (without a gate stack, [0, total thickness])
     * @return the index from the top of the layer containing it (the upper layer at an interface);
     *         O(log layers) by binary search
     */
    public int layerIndexAt(double depth) {
        Require.inRange("depth (m)", depth, gateStackThickness, totalThickness);
        // the first layer whose bottom is at or below the depth; bottoms never decrease
        int lo = 0;
        int hi = bottoms.length - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (depth <= bottoms[mid]) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return lo;
    }

    /**
     * The state at a depth; inside a graded layer the composition is interpolated linearly.
     *
     * @param depth a depth in the nitride layers, [gate-stack thickness, total thickness] (m); at an
     *              interface the upper layer is used
     * @return material, strain and polarization there
     */
    public PointState pointAt(double depth) {
        return pointAt(layerIndexAt(depth), depth);
    }

    /**
     * The state at a depth inside a layer already found, for callers that walk the depths in order
     * (a mesh) and so find each layer in O(1) rather than by search.
     *
     * @param layerIndexFromTop the index from the top of the layer that holds the depth
     * @param depth             a depth inside that layer, [its top, its bottom] (m)
     * @return material, strain and polarization there
     */
    public PointState pointAt(int layerIndexFromTop, double depth) {
        Require.inRange("layer index (from the top)", layerIndexFromTop, 0, states.size() - 1);
        LayerState s = states.get(layerIndexFromTop);
        Require.inRange("depth in layer \"" + s.layer().name() + "\" (m)", depth, s.depthTop(), s.depthBottom());
        if (!s.layer().material().isGraded()) {
            return s.top();
        }
        // in [0, 1] up to round-off of the depths; the clamp removes only that round-off
        double fromBottom = Math.min(1, Math.max(0, (s.depthBottom() - depth) / (s.depthBottom() - s.depthTop())));
        double below = s.indexFromTop() == states.size() - 1 ? referenceLatticeA
                : states.get(s.indexFromTop() + 1).top().inPlaneLatticeA();
        WurtziteMaterial m = s.layer().material().at(fromBottom, parameters);
        return pointFor(m, below, s.layer().relaxation());
    }

    /**
     * The bound sheet charges at the internal interfaces, shallowest first. Their sum equals
     * P_z(bottom layer) - P_z(top layer) minus any bound charge inside graded layers. An insulator
     * has no polarization, so at an insulator/nitride interface sigma = P_z(nitride) - 0, as at a
     * free surface, and between two insulators sigma = 0; with a gate stack these interfaces come
     * first.
     *
     * @return sigma = P_z(lower) - P_z(upper) at every interface
     */
    public List<InterfaceCharge> interfaceCharges() {
        List<InterfaceCharge> out = new ArrayList<>();
        double acc = 0;
        for (int i = 0; i < gateStack.size(); i++) {
            acc += gateStack.get(i).thickness();
            boolean last = i == gateStack.size() - 1;
            out.add(new InterfaceCharge(last ? gateStackThickness : acc, gateStack.get(i).name(),
                    last ? states.get(0).layer().name() : gateStack.get(i + 1).name(),
                    last ? states.get(0).top().alongGrowth() : 0));
        }
        for (int i = 0; i + 1 < states.size(); i++) {
            LayerState up = states.get(i);
            LayerState low = states.get(i + 1);
            out.add(new InterfaceCharge(up.depthBottom(), up.layer().name(), low.layer().name(),
                    low.top().alongGrowth() - up.bottom().alongGrowth()));
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * {@return the bound charge at the top surface, sigma = P_z(top layer) - 0; zero on top of a gate
     * stack (an insulator has no polarization)}
     */
    public InterfaceCharge surfaceCharge() {
        if (!gateStack.isEmpty()) {
            return new InterfaceCharge(0, "vacuum", gateStack.get(0).name(), 0);
        }
        LayerState t = states.get(0);
        return new InterfaceCharge(0, "vacuum", t.layer().name(), t.top().alongGrowth());
    }

    /**
     * @param model the critical-thickness model
     * @return the layers (from the top down) thicker than the critical thickness for their strain
     */
    public List<LayerState> layersBeyondCriticalThickness(CriticalThicknessModel model) {
        org.wurtzkit.errors.Require.nonNull("critical-thickness model", model);
        List<LayerState> out = new ArrayList<>();
        for (LayerState s : states) {
            PointState worst = Math.abs(s.top().strain().xx()) >= Math.abs(s.bottom().strain().xx()) ? s.top()
                    : s.bottom();
            if (s.layer().thickness() > model.of(worst.material(), worst.strain())) {
                out.add(s);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * {@return the layers beyond the critical thickness of the default model
     * {@link CriticalThicknessModel#C_PLANE_WURTZITE}: channel cracking for layers under tension,
     * pyramidal-slip Matthews-Blakeslee for layers under compression}
     */
    public List<LayerState> layersBeyondCriticalThickness() {
        return layersBeyondCriticalThickness(CriticalThicknessModel.C_PLANE_WURTZITE);
    }

    /**
     * A summary to read in jshell or a notebook, one line per item, top down: the parameter set,
     * polarity and temperature; the top boundary; every layer with its material, thickness,
     * relaxation, dopants, deep levels and delta sheets; the bottom boundary; and one line for each
     * of its {@link #warnings()}. For example:
     *
     * <pre>
     * Structure (vurgaftman-meyer-2003, metal-face, 300 K), top down:
     *   top: Schottky gate, barrier 1 eV, bias 0 V
     *   cap: GaN, 2 nm
     *   barrier: Al0.26Ga0.74N, 22 nm
     *   spacer: AlN, 1 nm
     *   buffer: GaN, 1800 nm
     *   bottom: zero field at the bottom
     * </pre>
     *
     * @return the summary (lines separated by '\n')
     */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("Structure (").append(parameters.name()).append(", ")
                .append(polarity == Polarity.METAL_FACE ? "metal-face" : "N-face").append(", ")
                .append(Decimals.format(temperatureK, "K")).append("), top down:\n");
        sb.append("  top: ").append(top).append('\n');
        for (InsulatorLayer il : gateStack) {
            sb.append("  ").append(il).append('\n');
        }
        for (LayerState s : states) {
            for (PlacedSheet ps : sheets) {
                if (ps.nitrideIndex() == s.indexFromTop()) {
                    sb.append("  ").append(ps).append('\n');
                }
            }
            sb.append("  ").append(s.layer()).append('\n');
        }
        sb.append("  bottom: ").append(bottom);
        sb.append(Warning.lines(warnings));
        return sb.toString();
    }

    /**
     * Mutable builder; {@link #build()} validates everything and returns the immutable structure.
     * Layers are added with {@link #grow(Layer)} in growth order: the first call is the bottom layer,
     * each further call grows a layer on top of the previous one.
     */
    public static final class Builder {
        private final ParameterSet parameters;
        private final List<Layer> layers = new ArrayList<>();
        private double referenceLatticeA = -1;
        private Polarity polarity = Polarity.METAL_FACE;
        private PolarizationModel polarizationModel;
        private BandAlignment bandAlignment;
        private boolean strainShiftsBandEdges;
        private boolean strainShiftsValenceSplittings = true;
        private double temperatureK = 300;
        private TopBoundary top;
        private BottomBoundary bottom = new BottomBoundary.ZeroField();
        private CriticalThicknessModel criticalThicknessModel = CriticalThicknessModel.C_PLANE_WURTZITE;
        private final List<InsulatorLayer> deposited = new ArrayList<>(); // bottom-up
        private final java.util.Map<Integer, List<InterfaceSheet>> sheets = new java.util.TreeMap<>();

        private Builder(ParameterSet parameters) {
            this.parameters = Require.nonNull("parameter set", parameters);
        }

        /**
         * Grows a layer on top of those grown so far (the first call gives the bottom layer).
         *
         * @param layer the layer
         * @return this builder
         */
        public Builder grow(Layer layer) {
            Require.nonNull("layer", layer);
            if (!deposited.isEmpty()) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, "nitride layer \"" + layer.name()
                        + "\" cannot be grown on the amorphous insulator \"" + deposited.get(deposited.size() - 1).name()
                        + "\": epitaxy needs a crystal below; grow every nitride layer before deposit(...)");
            }
            layers.add(layer);
            return this;
        }

        /**
         * Deposits an amorphous insulator on top of what was grown or deposited so far (gate stacks:
         * SiO2, SiN, Al2O3, HfO2, or several of them). Nitride layers cannot be grown afterwards.
         *
         * @param layer the insulator layer
         * @return this builder
         */
        public Builder deposit(InsulatorLayer layer) {
            Require.nonNull("insulator layer", layer);
            if (layers.isEmpty()) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, "insulator \"" + layer.name()
                        + "\" cannot be the bottom of the stack: grow at least one nitride layer before deposit(...)");
            }
            deposited.add(layer);
            return this;
        }

        /**
         * Deposits the builder's parameter set's insulator of that name
         * ({@link ParameterSet#insulator(String)}): {@code depositNm("Al2O3", 10)} is
         * {@code deposit(InsulatorLayer.ofNm(set.insulator("Al2O3"), 10))}.
         *
         * @param insulatorName the insulator's name in the parameter set (case-insensitive)
         * @param thicknessNm   its thickness (nm)
         * @return this builder
         * @throws org.wurtzkit.errors.InvalidParameterException if the set declares no insulator of
         *         that name (the message lists the set's insulators and the nearest one) or the
         *         thickness is out of range
         */
        public Builder depositNm(String insulatorName, double thicknessNm) {
            return deposit(InsulatorLayer.ofNm(parameters.insulator(insulatorName), thicknessNm));
        }

        /**
         * Puts a fixed charge and/or interface states on the top face of the nitride layer grown last:
         * the interface with the next layer or insulator, or the free surface.
         *
         * @param sheet the charge
         * @return this builder
         */
        public Builder sheetOnTop(InterfaceSheet sheet) {
            Require.nonNull("interface sheet", sheet);
            if (layers.isEmpty() || !deposited.isEmpty()) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, "an interface sheet sits on the top face of"
                        + " a nitride layer: call sheetOnTop(...) right after grow(...) of that layer, before any"
                        + " deposit(...)" + (layers.isEmpty() ? " (no layer grown yet)" : ""));
            }
            sheets.computeIfAbsent(layers.size() - 1, k -> new ArrayList<>()).add(sheet);
            return this;
        }

        /**
         * The bottom layer grows on the relaxed lattice of this composition (a relaxed buffer or
         * template). Default: the bottom layer's own lattice.
         *
         * @param composition the relaxed template
         * @return this builder
         */
        public Builder onRelaxed(Composition composition) {
            Require.nonNull("relaxed template composition", composition);
            this.referenceLatticeA = parameters.material(composition).latticeA();
            return this;
        }

        /**
         * @param latticeA in-plane lattice constant the bottom layer grows on (m)
         * @return this builder
         */
        public Builder onInPlaneLattice(double latticeA) {
            this.referenceLatticeA = Require.inRange("in-plane reference lattice constant (m)", latticeA, 2.5e-10,
                    4.0e-10);
            return this;
        }

        /**
         * Sets the polarity of the stack.
         *
         * @param p polarity (default metal-face)
         * @return this builder
         */
        public Builder polarity(Polarity p) {
            this.polarity = Require.nonNull("polarity", p);
            return this;
        }

        /**
         * @param model the polarization model (default: the parameter set's recommended model)
         * @return this builder
         */
        public Builder polarizationModel(PolarizationModel model) {
            this.polarizationModel = Require.nonNull("polarization model", model);
            return this;
        }

        /**
         * @param alignment how the band edges of the materials line up; default
         *                  {@link BandAlignment#recommendedFor(ParameterSet)}: the rule the parameter
         *                  set declares, else its tabulated valence-band maxima
         * @return this builder
         */
        public Builder bandAlignment(BandAlignment alignment) {
            this.bandAlignment = Require.nonNull("band alignment", alignment);
            return this;
        }

        /**
         * @param shifts whether the deformation potentials shift the band edges; default false,
         *               because the deformation potentials of the built-in sets are recalled values
         *               whose sign convention was not verified
         * @return this builder
         */
        public Builder strainShiftsBandEdges(boolean shifts) {
            this.strainShiftsBandEdges = shifts;
            return this;
        }

        /**
         * Whether strain also moves the valence splittings: the heavy-, light- and crystal-field-hole
         * edges at k = 0 of the 6x6 k.p Hamiltonian under biaxial c-plane strain (S. L. Chuang and
         * C. S. Chang, Phys. Rev. B 54, 2491 (1996)), with their masses and offsets, for the valence
         * edge, the classical holes and the quantum holes. In force only where
         * {@link #strainShiftsBandEdges(boolean)} is on. Default true: a strain large enough to shift
         * the edges moves the splittings (tens of meV at 1 % strain) by more than their unstrained
         * size (GaN: 10 and 17 meV), and under tension puts the |Z&gt;-like band on top, as measured in
         * strained GaN (e.g. the excitonic transitions of B. Gil, O. Briot and R.-L. Aulombard,
         * Phys. Rev. B 52, R17028 (1995), from memory). False keeps the unstrained splittings, the
         * valence edge moving with the heavy-hole deformation potentials alone (the behaviour before
         * this option).
         *
         * @param shifts whether strain shifts the valence splittings
         * @return this builder
         */
        public Builder strainShiftsValenceSplittings(boolean shifts) {
            this.strainShiftsValenceSplittings = shifts;
            return this;
        }

        /**
         * Sets the lattice temperature.
         *
         * @param temperatureK temperature in (0, 2000] K (default 300 K)
         * @return this builder
         */
        public Builder temperatureK(double temperatureK) {
            this.temperatureK = BandGap.checkTemperature(temperatureK);
            return this;
        }

        /**
         * @param t temperature in (0, 2000] K
         * @return this builder
         * @deprecated the unit belongs in the name: use {@link #temperatureK(double)}
         */
        @Deprecated(since = "0.2", forRemoval = true)
        public Builder temperature(double t) {
            return temperatureK(t);
        }

        /**
         * Sets the top boundary; setting it twice is an error, so that two contacts cannot be
         * given by mistake.
         *
         * @param boundary a Schottky gate or a free surface
         * @return this builder
         */
        public Builder top(TopBoundary boundary) {
            Require.nonNull("top boundary", boundary);
            if (top != null) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                        "the top boundary is already set to " + top + "; a stack has one top boundary, cannot also set "
                                + boundary);
            }
            this.top = boundary;
            return this;
        }

        /**
         * Sets the critical-thickness model of the structure's warnings.
         *
         * @param model the critical-thickness model whose verdicts the structure's warnings report;
         *              default {@link CriticalThicknessModel#C_PLANE_WURTZITE} (channel cracking under
         *              tension, pyramidal slip under compression)
         * @return this builder
         */
        public Builder criticalThicknessModel(CriticalThicknessModel model) {
            this.criticalThicknessModel = Require.nonNull("critical-thickness model", model);
            return this;
        }

        /**
         * Sets the boundary condition below the deepest layer.
         *
         * @param boundary the bottom boundary (default zero field)
         * @return this builder
         */
        public Builder bottom(BottomBoundary boundary) {
            this.bottom = Require.nonNull("bottom boundary", boundary);
            return this;
        }

        /**
         * @return the structure
         * @throws WurtzkitException of kind INVALID_STRUCTURE for an empty stack or no top boundary
         * @throws StructurePartException for surface donors on a free surface above an insulator (part: the
         *         top boundary)
         * @throws InvalidStructurePartException for an interface-state level outside the gap of the layer
         *         below it (part: that layer, sheet and interface-state set)
         */
        public Structure build() {
            if (layers.isEmpty()) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                        "the stack is empty: number of layers = 0, allowed range [1, ...]; call grow(...) at least once");
            }
            if (top == null) {
                throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                        "no top boundary: call top(TopBoundary.schottky(...)) or top(TopBoundary.freeSurface(...))");
            }
            if (!deposited.isEmpty() && top instanceof TopBoundary.FreeSurface fs && fs.donorDensityPerM2() > 0) {
                throw new StructurePartException(StructurePart.topBoundary(), "the free surface above the insulator \""
                        + deposited.get(deposited.size() - 1).name() + "\" has surface donors ("
                        + fs.donorDensityPerM2() + " m^-2), which describe a nitride surface: put states at the"
                        + " nitride's top face with sheetOnTop(...) and use TopBoundary.freeSurface(0, 0)");
            }
            return new Structure(this);
        }
    }

}
