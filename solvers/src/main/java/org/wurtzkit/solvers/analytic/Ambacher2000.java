package org.wurtzkit.solvers.analytic;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Units;

/**
 * The composition-dependent expressions of O. Ambacher et al., J. Appl. Phys. 87, 334 (2000)
 * ("A00") for undoped metal-face Al<sub>x</sub>Ga<sub>1-x</sub>N pseudomorphic on relaxed GaN,
 * and the analytic 2DEG model built from them ({@link ChargeBalanceModel}).
 *
 * <p><b>Provenance.</b> The paper itself was not available while this was written; the linear
 * fits below were recalled from memory (not checked against the printed paper). They are used
 * exactly as listed here:
 * <ul>
 * <li>a(x) = (-0.077 x + 3.189) &Aring;; C13 = (5x + 103) GPa; C33 = (-32x + 405) GPa</li>
 * <li>e31 = (-0.11x - 0.49) C/m&sup2;; e33 = (0.73x + 0.73) C/m&sup2;; P_sp = (-0.052x - 0.029) C/m&sup2;</li>
 * <li>sigma(x) = |P_pz(x) + P_sp(x) - P_sp(0)|, P_pz = 2 [(a(0) - a(x))/a(x)] [e31 - e33 C13/C33]</li>
 * <li>eps(x) = -0.5x + 9.5; e phi_b(x) = (1.3x + 0.84) eV (Ni Schottky contact)</li>
 * <li>E_g(x) = 6.13x + 3.42(1 - x) - 1.0 x(1 - x) eV; dE_c = 0.7 [E_g(x) - E_g(0)]</li>
 * <li>m* = 0.22 m0; E_0 evaluated with eps(x), as the recalled expression writes it</li>
 * </ul>
 * All methods are static and thread-safe; x must lie in [0, 1].
 */
public final class Ambacher2000 {
    /** Electron effective mass of the model (m0). */
    public static final double ELECTRON_MASS = 0.22;
    /** Share of the gap difference that goes to the conduction band. */
    public static final double CONDUCTION_BAND_SHARE = 0.7;
    /** Band-gap bowing of AlGaN in the model (eV). */
    public static final double GAP_BOWING_EV = 1.0;

    private Ambacher2000() {
    }

    private static double x(double x) {
        return Require.inRange("Al fraction x", x, 0, 1);
    }

    /**
     * @param x Al fraction
     * @return a(x) (m)
     */
    public static double latticeA(double x) {
        return (-0.077 * x(x) + 3.189) * Units.ANGSTROM;
    }

    /**
     * @param x Al fraction
     * @return C13(x) (Pa)
     */
    public static double c13(double x) {
        return (5 * x(x) + 103) * Units.GPA;
    }

    /**
     * @param x Al fraction
     * @return C33(x) (Pa)
     */
    public static double c33(double x) {
        return (-32 * x(x) + 405) * Units.GPA;
    }

    /**
     * @param x Al fraction
     * @return e31(x) (C/m&sup2;)
     */
    public static double e31(double x) {
        return -0.11 * x(x) - 0.49;
    }

    /**
     * @param x Al fraction
     * @return e33(x) (C/m&sup2;)
     */
    public static double e33(double x) {
        return 0.73 * x(x) + 0.73;
    }

    /**
     * @param x Al fraction
     * @return P_sp(x) along [0001] (C/m&sup2;)
     */
    public static double spontaneousPolarization(double x) {
        return -0.052 * x(x) - 0.029;
    }

    /**
     * @param x Al fraction
     * @return basal strain (a(0) - a(x))/a(x) of the barrier on relaxed GaN
     */
    public static double basalStrain(double x) {
        return (latticeA(0) - latticeA(x)) / latticeA(x);
    }

    /**
     * @param x Al fraction
     * @return P_pz = 2 eps_xx (e31 - e33 C13/C33) along [0001] (C/m&sup2;), negative for tensile AlGaN
     */
    public static double piezoelectricPolarization(double x) {
        return 2 * basalStrain(x) * (e31(x) - e33(x) * c13(x) / c33(x));
    }

    /**
     * Bound sheet charge at the AlGaN/GaN interface, sigma = P_z(GaN) - P_z(AlGaN) =
     * -(P_pz(x) + P_sp(x) - P_sp(0)) for metal face; positive for x in (0, 1], where it equals A00's
     * |P_pz(x) + P_sp(x) - P_sp(0)|.
     *
     * @param x Al fraction
     * @return sigma (C/m&sup2;)
     */
    public static double sheetCharge(double x) {
        return -(piezoelectricPolarization(x) + spontaneousPolarization(x) - spontaneousPolarization(0));
    }

    /**
     * @param x Al fraction
     * @return eps(x) = -0.5x + 9.5, static relative permittivity
     */
    public static double relativePermittivity(double x) {
        return -0.5 * x(x) + 9.5;
    }

    /**
     * @param x Al fraction
     * @return e phi_b(x) = 1.3x + 0.84 (eV), Ni Schottky barrier
     */
    public static double schottkyBarrierEv(double x) {
        return 1.3 * x(x) + 0.84;
    }

    /**
     * @param x Al fraction
     * @return E_g(x) = 6.13x + 3.42(1 - x) - 1.0 x(1 - x) (eV)
     */
    public static double bandGapEv(double x) {
        return 6.13 * x(x) + 3.42 * (1 - x) - GAP_BOWING_EV * x * (1 - x);
    }

    /**
     * @param x Al fraction
     * @return dE_c = 0.7 [E_g(x) - E_g(0)] (eV)
     */
    public static double conductionBandOffsetEv(double x) {
        return CONDUCTION_BAND_SHARE * (bandGapEv(x) - bandGapEv(0));
    }

    /**
     * The A00 model of Al<sub>x</sub>Ga<sub>1-x</sub>N/GaN with A00's Ni barrier phi_b(x), at zero
     * gate bias: n_s = sigma/e - eps/(e^2 d) [e phi_b + E_F - dE_c].
     *
     * @param x                Al fraction
     * @param barrierThickness d (m)
     * @return the model
     */
    public static ChargeBalanceModel model(double x, double barrierThickness) {
        return model(x, barrierThickness, schottkyBarrierEv(x));
    }

    /**
     * The A00 model with a chosen Schottky barrier.
     *
     * @param x                 Al fraction
     * @param barrierThickness  d (m)
     * @param schottkyBarrierEv phi_b on the AlGaN surface (eV)
     * @return the model at zero gate bias
     */
    public static ChargeBalanceModel model(double x, double barrierThickness, double schottkyBarrierEv) {
        return ChargeBalanceModel.builder()
                .addLayer(new ChargeBalanceModel.BarrierLayer("barrier", barrierThickness, relativePermittivity(x),
                        sheetCharge(x)))
                .schottkyBarrierEv(schottkyBarrierEv)
                .surfaceOffsetEv(conductionBandOffsetEv(x))
                .wellPermittivity(relativePermittivity(x))
                .quantizationMass(ELECTRON_MASS)
                .densityOfStatesMass(ELECTRON_MASS)
                .build();
    }

    /**
     * The A00 constants with a GaN cap of thickness t_c on the barrier: the cap is unstrained GaN
     * (it grows on the barrier, which has GaN's in-plane lattice), so it carries the channel's
     * polarization (S_cap = 0, the cap/barrier interface holds -sigma) and the conduction band at
     * the surface is GaN's (offset 0). The surface barrier is A00's phi_b(x) at x = 0, 0.84 eV,
     * with permittivity eps(0) = 9.5 in the cap. Then
     * n_s = [sigma d/eps_b - (phi_b + E_F/e)] / [e (d/eps_b + t_c/eps_c)].
     *
     * <p>As t_c tends to 0 this does not become {@link #model(double, double)}: the surface barrier
     * then sits on GaN (0.84 eV above GaN's E_c) instead of on AlGaN (phi_b(x) above AlGaN's E_c).
     *
     * @param x                Al fraction of the barrier
     * @param barrierThickness d (m)
     * @param capThickness     t_c (m), &gt; 0
     * @return the model at zero gate bias
     */
    public static ChargeBalanceModel modelWithGaNCap(double x, double barrierThickness, double capThickness) {
        double eps = relativePermittivity(x);
        return ChargeBalanceModel.builder()
                .addLayer(new ChargeBalanceModel.BarrierLayer("cap", capThickness, relativePermittivity(0), 0))
                .addLayer(new ChargeBalanceModel.BarrierLayer("barrier", barrierThickness, eps, sheetCharge(x)))
                .schottkyBarrierEv(schottkyBarrierEv(0))
                .surfaceOffsetEv(0)
                .wellPermittivity(eps)
                .quantizationMass(ELECTRON_MASS)
                .densityOfStatesMass(ELECTRON_MASS)
                .build();
    }

    /**
     * @param x                Al fraction
     * @param barrierThickness d (m)
     * @return n_s at zero bias with phi_b(x) (cm^-2)
     */
    public static double sheetDensityPerCm2(double x, double barrierThickness) {
        return model(x, barrierThickness).sheetDensityPerCm2();
    }

    /**
     * The barrier thickness below which the A00 model has no 2DEG at zero bias,
     * d_0 = eps(x) [phi_b(x) - dE_c(x)] / sigma(x).
     *
     * @param x Al fraction, in (0, 1]
     * @return d_0 (m)
     */
    public static double criticalThickness(double x) {
        Require.inRange("Al fraction x", x, Double.MIN_VALUE, 1);
        return model(x, 10 * Units.NM).criticalBarrierThickness();
    }
}
