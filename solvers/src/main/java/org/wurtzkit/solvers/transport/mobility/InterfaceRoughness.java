package org.wurtzkit.solvers.transport.mobility;

import java.util.Locale;
import java.util.Optional;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.units.Units;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * Interface-roughness scattering at the interface nearest the subband's peak, with a Gaussian
 * height correlation of rms height Delta and correlation length Lambda,
 * &lt;Delta(r) Delta(r')&gt; = Delta^2 exp(-|r - r'|^2/Lambda^2), and static screening (Ando, Fowler
 * &amp; Stern, Rev. Mod. Phys. 54, 437 (1982)): |U(q)|^2 = pi Delta^2 Lambda^2 (e F_eff)^2
 * exp(-q^2 Lambda^2/4), so 1/tau = (4 m Delta^2 Lambda^2 (e F_eff)^2/hbar^3) integral_0^1 u^2
 * exp(-k_F^2 Lambda^2 u^2) S(q) du/sqrt(1 - u^2). F_eff is the mean electric field over the subband
 * on the channel side of the interface (below it for a metal-face channel, above it for an N-face one;
 * for a ground subband in a triangular well it is the
 * e(N_depl + n_s/2)/epsilon of the same paper).
 *
 * <p>Delta and Lambda are sample properties, not material constants, and are in practice fitted to
 * the low-temperature mobility; published AlGaN/GaN forms of this rate differ by constant factors
 * (some carry (n_s/2)^2/2 where this one has n_s^2/4), so fitted values are only transferable with
 * the formula they were fitted with. Defaults ({@link #DEFAULT}): Delta = 0.26 nm, one bilayer step
 * c/2 of GaN (common practice, no source), Lambda = 3 nm, inside the 1-3 nm of published fits (from
 * memory). The same pair is used at every interface; {@link InterfaceRoughnessByBarrier} gives an
 * interface of another kind (the AlN/GaN interface under an AlN interlayer) its own.
 *
 * <p>The field term e F_eff is a model choice ({@link FieldTerm}): the default,
 * {@link FieldTerm#MEAN_FIELD}, is the mean field above; {@link FieldTerm#BAND_STEP} is the form of
 * R. E. Prange and T.-W. Nee, Phys. Rev. 166, 737 (1968), the conduction-band step times |psi|^2 at
 * the interface, DeltaE_c |psi(z_i)|^2, which is the first-order shift of the subband energy when the
 * interface moves by one unit of height. For an exact eigenstate of a well whose only step is the rough
 * interface, the two agree when the field on the barrier side is counted too (Hellmann-Feynman, Ando,
 * Fowler &amp; Stern 1982); the mean field here counts the channel side only, so the forms differ on a
 * real stack (the band-step rate is about 1.4 times lower at an AlGaN/GaN interface and 1.7 times higher
 * at the AlN/GaN interface under a 1 nm AlN interlayer, for the ground subband of the test stacks at
 * 300 K). The default stays the mean field because the published AlGaN/GaN (Delta, Lambda) fits that this
 * library's defaults follow were made with that form, and no published comparison of the two forms
 * against III-nitride measurements was at hand to justify a switch; the band-step form is the one that
 * also holds in a flat-band square well (well-width fluctuations), where the mean field is 0.
 *
 * @param rmsHeight         Delta (m), in [0, 2 nm]
 * @param correlationLength Lambda (m), in [0.1 nm, 100 nm]
 * @param fieldTerm         what stands for e F_eff in the rate; non-null
 */
public record InterfaceRoughness(double rmsHeight, double correlationLength, FieldTerm fieldTerm)
        implements ScatteringMechanism {
    /** What stands for the force e F_eff on the electron in the roughness rate. */
    public enum FieldTerm {
        /**
         * e times the mean field over the subband on the channel side of the interface (Ando, Fowler &amp;
         * Stern, Rev. Mod. Phys. 54, 437 (1982)); the default.
         */
        MEAN_FIELD,
        /**
         * The conduction-band step across the interface times |psi|^2 there, DeltaE_c |psi(z_i)|^2 (Prange
         * &amp; Nee, Phys. Rev. 166, 737 (1968)).
         */
        BAND_STEP
    }

    /** The mechanism's name, {@value}. */
    public static final String NAME = "interface roughness";
    /** Delta 0.26 nm, Lambda 3 nm. */
    public static final InterfaceRoughness DEFAULT = ofNm(0.26, 3);

    /**
     * Validates the ranges.
     *
     * @param rmsHeight Delta (m), in [0, 2 nm]
     * @param correlationLength Lambda (m), in [0.1 nm, 100 nm]
     * @param fieldTerm the field term of the scattering potential, non-null
     *        (default {@link FieldTerm#MEAN_FIELD})
     */
    public InterfaceRoughness {
        Require.inRange("interface roughness rms height Delta (m)", rmsHeight, 0, 2e-9);
        Require.inRange("interface roughness correlation length Lambda (m)", correlationLength, 1e-10, 1e-7);
        Require.nonNull("interface roughness field term", fieldTerm);
    }

    /**
     * The default field term, {@link FieldTerm#MEAN_FIELD}.
     *
     * @param rmsHeight Delta (m), in [0, 2 nm]
     * @param correlationLength Lambda (m), in [0.1 nm, 100 nm]
     */
    public InterfaceRoughness(double rmsHeight, double correlationLength) {
        this(rmsHeight, correlationLength, FieldTerm.MEAN_FIELD);
    }

    /**
     * @param term the field term
     * @return this roughness with that field term
     */
    public InterfaceRoughness withFieldTerm(FieldTerm term) {
        return new InterfaceRoughness(rmsHeight, correlationLength, term);
    }

    /**
     * @param s the subband
     * @return what stands for e F_eff at its rough interface under this field term (N): e F_eff, or
     *         DeltaE_c |psi(z_i)|^2
     */
    public double force(SubbandScattering s) {
        return fieldTerm == FieldTerm.MEAN_FIELD ? Rates.E * s.interfaceField()
                : s.interfaceBandStep() * s.interfaceDensity();
    }

    /** @return as a record's text; the field term is shown only when it is not the default */
    @Override
    public String toString() {
        return "InterfaceRoughness[rmsHeight=" + rmsHeight + ", correlationLength=" + correlationLength
                + (fieldTerm == FieldTerm.MEAN_FIELD ? "" : ", fieldTerm=" + fieldTerm) + "]";
    }

    /**
     * @param deltaNm  rms height (nm), in [0, 2]
     * @param lambdaNm correlation length (nm), in [0.1, 100]
     * @return the mechanism
     */
    public static InterfaceRoughness ofNm(double deltaNm, double lambdaNm) {
        Require.inRange("interface roughness rms height Delta (nm)", deltaNm, 0, 2);
        Require.inRange("interface roughness correlation length Lambda (nm)", lambdaNm, 0.1, 100);
        return new InterfaceRoughness(deltaNm * Units.NM, lambdaNm * Units.NM);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        double kl = s.fermiWaveVector() * correlationLength;
        double sum = 0;
        for (int j = 0; j < s.quadratureSize(); j++) {
            double u = s.node(j);
            sum += s.weight(j) * u * u * Math.exp(-kl * kl * u * u) * s.screeningFactorSquared(j);
        }
        double ef = force(s);
        return 4 * s.mass() * rmsHeight * rmsHeight * correlationLength * correlationLength * ef * ef / Rates.HBAR3
                * sum;
    }

    /**
     * Warns when the subband has no rough interface, and when its rough interface faces a binary barrier
     * (an AlN interlayer): the one (Delta, Lambda) of this mechanism, in practice fitted to AlGaN/GaN, is
     * then applied to an interface of another kind, whose roughness is a sample property of its own
     * (Miyoshi et al., Appl. Phys. Lett. 85, 1710 (2004), report lower roughness scattering with a 1 nm
     * AlN interlayer); {@link InterfaceRoughnessByBarrier} sets it per barrier.
     *
     * @param s the subband
     * @return the warning, if any
     */
    @Override
    public Optional<Warning> typedWarning(SubbandScattering s) {
        boolean binary = force(s) != 0 && s.interfaceBarrier().map(InterfaceRoughness::isBinary).orElse(false);
        return warning(s).map(text -> new Warning(binary ? WarningKind.PARAMETER_OUTSIDE_MEASURED_RANGE
                : WarningKind.SCATTERING_MODEL_OUT_OF_VALIDITY, text));
    }

    @Override
    public Optional<String> warning(SubbandScattering s) {
        if (force(s) == 0) {
            return Optional.of("interface roughness: a subband has no interface near its peak (or no "
                    + (fieldTerm == FieldTerm.MEAN_FIELD ? "field" : "band step") + " there); its roughness rate is 0");
        }
        Optional<WurtziteMaterial> barrier = s.interfaceBarrier();
        if (barrier.isPresent() && isBinary(barrier.get())) {
            return Optional.of(String.format(Locale.ROOT, "interface roughness: the rough interface faces the binary"
                    + " %s; the same Delta = %.3g nm, Lambda = %.3g nm as at an alloy interface is applied to it,"
                    + " although its roughness is a property of its own (a 1 nm AlN interlayer is measured to cut"
                    + " roughness scattering too): set it per barrier with InterfaceRoughnessByBarrier",
                    barrier.get().name(), rmsHeight * 1e9, correlationLength * 1e9));
        }
        return Optional.empty();
    }

    /**
     * @param m a material
     * @return whether it declares a composition with one cation only (GaN, AlN, InN)
     */
    static boolean isBinary(WurtziteMaterial m) {
        Composition c = m.composition();
        return c != null && Math.max(c.aluminium(), Math.max(c.gallium(), c.indium())) == 1;
    }
}
