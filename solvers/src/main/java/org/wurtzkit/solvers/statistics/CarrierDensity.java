package org.wurtzkit.solvers.statistics;

import org.wurtzkit.units.Constants;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * Equilibrium free-carrier densities of parabolic bands, in SI units with energies in eV.
 *
 * <p><b>3D (bulk)</b>, S. M. Sze and K. K. Ng, <i>Physics of Semiconductor Devices</i>, 3rd ed.
 * (Wiley, 2007), ch. 1; Fermi-Dirac integral in Blakemore's normalisation (J. S. Blakemore,
 * Solid-State Electron. 25, 1067 (1982)):
 *
 * <pre>
 *   n = N_c F_1/2((E_F - E_c)/kT),   p = N_v F_1/2((E_v - E_F)/kT),
 *   N_c = 2 (2 pi m* k_B T / h^2)^(3/2)   (m^-3),
 * </pre>
 *
 * with derivatives dn/dE_c = -(N_c/kT) F_-1/2 and dp/dE_v = +(N_v/kT) F_-1/2 (dn/dE_F = -dn/dE_c,
 * dp/dE_F = -dp/dE_v).
 *
 * <p><b>2D (one subband)</b>, T. Ando, A. B. Fowler, F. Stern, Rev. Mod. Phys. 54, 437 (1982):
 * a parabolic subband at E_k with spin degeneracy 2 and valley degeneracy g_v has the density of
 * states D = g_v m* / (pi hbar^2) per unit area and energy, and holds
 *
 * <pre>
 *   n_k = D kT ln(1 + exp((E_F - E_k)/kT))   (m^-2),   dn_k/dE_k = -D / (1 + exp((E_k - E_F)/kT)).
 * </pre>
 *
 * <p>Units: densities in m^-3 (3D) and m^-2 (2D); energies and kT in eV; densities of states in
 * m^-2 eV^-1 (2D); derivatives with respect to an energy in m^-3 eV^-1 or m^-2 eV^-1; mass as a
 * ratio to the free-electron mass m0; temperature in K.
 *
 * <p>The density functions are allocation-free (one Fermi-Dirac evaluation each) and check their
 * arguments with a few comparisons only.
 *
 * <p>Constants: CODATA 2018 (E. Tiesinga, P. J. Mohr, D. B. Newell, B. N. Taylor, Rev. Mod. Phys.
 * 93, 025010 (2021)); h, k_B, e exact since the 2019 SI redefinition.
 */
public final class CarrierDensity {

    private CarrierDensity() {
    }

    // CODATA 2018 values from the library's single constants class
    private static final double PLANCK = Constants.PLANCK;
    private static final double HBAR = Constants.HBAR;
    private static final double BOLTZMANN = Constants.BOLTZMANN;
    private static final double ELECTRON_MASS = Constants.ELECTRON_MASS;
    private static final double ELEMENTARY_CHARGE = Constants.ELEMENTARY_CHARGE;

    /**
     * Thermal energy k_B T in eV, numerically equal to the thermal voltage k_B T/e in V, with the
     * exact SI values of k_B and e (CODATA 2018, Tiesinga et al., Rev. Mod. Phys. 93, 025010
     * (2021)).
     *
     * @param temperatureK temperature (K), finite and &gt; 0
     * @return k_B T / e (eV)
     * @throws IllegalArgumentException if the temperature is not finite and positive
     */
    public static double thermalEnergyEv(double temperatureK) {
        requirePositive("temperatureK", temperatureK);
        return BOLTZMANN * temperatureK / ELEMENTARY_CHARGE;
    }

    /**
     * Effective density of states of a parabolic 3D band with one valley, N = 2 (2 pi m* k_B T /
     * h^2)^(3/2) (Sze &amp; Ng 2007, ch. 1). Use it as N_c with the electron and as N_v with the hole
     * density-of-states mass.
     *
     * @param massRatio density-of-states mass m* / m0, finite and &gt; 0
     * @param temperatureK temperature (K), finite and &gt; 0
     * @return effective density of states (m^-3)
     * @throws IllegalArgumentException if an argument is not finite and positive
     */
    public static double effectiveDensityOfStates(double massRatio, double temperatureK) {
        requirePositive("massRatio", massRatio);
        requirePositive("temperatureK", temperatureK);
        double a = 2.0 * Math.PI * massRatio * ELECTRON_MASS * BOLTZMANN * temperatureK
                / (PLANCK * PLANCK);
        return 2.0 * a * Math.sqrt(a);
    }

    /**
     * Electron density n = N_c F_1/2((E_F - E_c)/kT) (Sze &amp; Ng 2007, ch. 1; Blakemore 1982).
     *
     * @param ncPerM3 conduction-band effective density of states (m^-3), finite and &ge; 0
     * @param fermiEv Fermi level E_F (eV), finite
     * @param conductionEdgeEv conduction-band edge E_c (eV), finite
     * @param kTEv thermal energy kT (eV), finite and &gt; 0
     * @return n (m^-3)
     * @throws IllegalArgumentException on NaN or out-of-range arguments
     */
    public static double electronDensity(double ncPerM3, double fermiEv, double conductionEdgeEv,
            double kTEv) {
        checkBulk("ncPerM3", ncPerM3, kTEv);
        double eta = reduced(fermiEv, conductionEdgeEv, "conductionEdgeEv", kTEv);
        return ncPerM3 * FermiDirac.f12(eta);
    }

    /**
     * dn/dE_c = -(N_c/kT) F_-1/2((E_F - E_c)/kT), using dF_1/2/deta = F_-1/2 (Blakemore 1982).
     * dn/dE_F is the negative of this.
     *
     * @param ncPerM3 conduction-band effective density of states (m^-3), finite and &ge; 0
     * @param fermiEv Fermi level E_F (eV), finite
     * @param conductionEdgeEv conduction-band edge E_c (eV), finite
     * @param kTEv thermal energy kT (eV), finite and &gt; 0
     * @return dn/dE_c (m^-3 eV^-1), &le; 0
     * @throws IllegalArgumentException on NaN or out-of-range arguments
     */
    public static double electronDensityDerivativeEc(double ncPerM3, double fermiEv,
            double conductionEdgeEv, double kTEv) {
        checkBulk("ncPerM3", ncPerM3, kTEv);
        double eta = reduced(fermiEv, conductionEdgeEv, "conductionEdgeEv", kTEv);
        return -(ncPerM3 / kTEv) * FermiDirac.fm12(eta);
    }

    /**
     * Hole density p = N_v F_1/2((E_v - E_F)/kT) (Sze &amp; Ng 2007, ch. 1; Blakemore 1982).
     *
     * @param nvPerM3 valence-band effective density of states (m^-3), finite and &ge; 0
     * @param fermiEv Fermi level E_F (eV), finite
     * @param valenceEdgeEv valence-band edge E_v (eV), finite
     * @param kTEv thermal energy kT (eV), finite and &gt; 0
     * @return p (m^-3)
     * @throws IllegalArgumentException on NaN or out-of-range arguments
     */
    public static double holeDensity(double nvPerM3, double fermiEv, double valenceEdgeEv,
            double kTEv) {
        checkBulk("nvPerM3", nvPerM3, kTEv);
        double eta = -reduced(fermiEv, valenceEdgeEv, "valenceEdgeEv", kTEv);
        return nvPerM3 * FermiDirac.f12(eta);
    }

    /**
     * dp/dE_v = +(N_v/kT) F_-1/2((E_v - E_F)/kT) (Blakemore 1982). dp/dE_F is the negative of
     * this.
     *
     * @param nvPerM3 valence-band effective density of states (m^-3), finite and &ge; 0
     * @param fermiEv Fermi level E_F (eV), finite
     * @param valenceEdgeEv valence-band edge E_v (eV), finite
     * @param kTEv thermal energy kT (eV), finite and &gt; 0
     * @return dp/dE_v (m^-3 eV^-1), &ge; 0
     * @throws IllegalArgumentException on NaN or out-of-range arguments
     */
    public static double holeDensityDerivativeEv(double nvPerM3, double fermiEv, double valenceEdgeEv,
            double kTEv) {
        checkBulk("nvPerM3", nvPerM3, kTEv);
        double eta = -reduced(fermiEv, valenceEdgeEv, "valenceEdgeEv", kTEv);
        return (nvPerM3 / kTEv) * FermiDirac.fm12(eta);
    }

    /**
     * Density of states of one parabolic 2D subband including spin, D = g_v m* / (pi hbar^2) (Ando,
     * Fowler, Stern, Rev. Mod. Phys. 54, 437 (1982)), converted to per eV.
     *
     * @param massRatio in-plane effective mass m* / m0, finite and &gt; 0
     * @param valleyDegeneracy number of equivalent valleys g_v, &ge; 1 (1 for the Gamma valley of
     *                         GaN)
     * @return D (m^-2 eV^-1)
     * @throws IllegalArgumentException if the mass is not finite and positive or g_v &lt; 1
     */
    public static double subbandDensityOfStates(double massRatio, int valleyDegeneracy) {
        requirePositive("massRatio", massRatio);
        if (valleyDegeneracy < 1) {
            throw new InvalidParameterException("valleyDegeneracy", Integer.toString(valleyDegeneracy),
                    "[1, " + Integer.MAX_VALUE + "]");
        }
        return valleyDegeneracy * massRatio * ELECTRON_MASS * ELEMENTARY_CHARGE
                / (Math.PI * HBAR * HBAR);
    }

    /**
     * Sheet density of one subband, n_k = D kT ln(1 + exp((E_F - E_k)/kT)) (Ando, Fowler, Stern
     * 1982), with ln(1 + e^x) from {@link FermiDirac#log1pExp(double)}.
     *
     * @param dosPerM2Ev subband density of states D (m^-2 eV^-1), e.g. from
     *                   {@link #subbandDensityOfStates(double, int)}; finite and &ge; 0
     * @param fermiEv Fermi level E_F (eV), finite
     * @param subbandEv subband bottom E_k (eV), finite
     * @param kTEv thermal energy kT (eV), finite and &gt; 0
     * @return n_k (m^-2)
     * @throws IllegalArgumentException on NaN or out-of-range arguments
     */
    public static double subbandSheetDensity(double dosPerM2Ev, double fermiEv, double subbandEv,
            double kTEv) {
        checkBulk("dosPerM2Ev", dosPerM2Ev, kTEv);
        double eta = reduced(fermiEv, subbandEv, "subbandEv", kTEv);
        return dosPerM2Ev * kTEv * FermiDirac.log1pExp(eta);
    }

    /**
     * dn_k/dE_k = -D / (1 + exp((E_k - E_F)/kT)), the derivative of
     * {@link #subbandSheetDensity} (Ando, Fowler, Stern 1982); dn_k/dE_F is the negative of this.
     *
     * @param dosPerM2Ev subband density of states D (m^-2 eV^-1), finite and &ge; 0
     * @param fermiEv Fermi level E_F (eV), finite
     * @param subbandEv subband bottom E_k (eV), finite
     * @param kTEv thermal energy kT (eV), finite and &gt; 0
     * @return dn_k/dE_k (m^-2 eV^-1), &le; 0
     * @throws IllegalArgumentException on NaN or out-of-range arguments
     */
    public static double subbandSheetDensityDerivativeEk(double dosPerM2Ev, double fermiEv,
            double subbandEv, double kTEv) {
        checkBulk("dosPerM2Ev", dosPerM2Ev, kTEv);
        double eta = reduced(fermiEv, subbandEv, "subbandEv", kTEv);
        return -dosPerM2Ev * FermiDirac.logistic(eta);
    }

    // ---------------------------------------------------------------------------------------

    /** (E_F - E_level)/kT after checking that both energies are finite. */
    private static double reduced(double fermiEv, double levelEv, String levelName, double kTEv) {
        if (!(Math.abs(fermiEv) <= Double.MAX_VALUE)) {
            throw new InvalidParameterException("fermiEv", Double.toString(fermiEv),
                    "(-inf, +inf), finite");
        }
        if (!(Math.abs(levelEv) <= Double.MAX_VALUE)) {
            throw new InvalidParameterException(levelName, Double.toString(levelEv),
                    "(-inf, +inf), finite");
        }
        return (fermiEv - levelEv) / kTEv;
    }

    private static void checkBulk(String densityName, double density, double kTEv) {
        if (!(density >= 0.0 && density < Double.POSITIVE_INFINITY)) {
            throw new InvalidParameterException(densityName, Double.toString(density),
                    "[0, +inf), finite");
        }
        if (!(kTEv > 0.0 && kTEv < Double.POSITIVE_INFINITY)) {
            throw new InvalidParameterException("kTEv", Double.toString(kTEv), "(0, +inf), finite");
        }
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0.0 && value < Double.POSITIVE_INFINITY)) {
            throw new InvalidParameterException(name, Double.toString(value), "(0, +inf), finite");
        }
    }
}
