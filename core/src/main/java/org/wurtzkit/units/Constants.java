package org.wurtzkit.units;

/**
 * Physical constants in SI units, CODATA 2018 recommended values.
 *
 * <p>Source: E. Tiesinga, P. J. Mohr, D. B. Newell, B. N. Taylor, "CODATA recommended values of the
 * fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021). Since the 2019 SI
 * redefinition {@link #ELEMENTARY_CHARGE}, {@link #PLANCK}, {@link #BOLTZMANN} are exact.
 *
 * <p>This is the only place in the library where these numbers are written.
 */
public final class Constants {
    private Constants() {
    }

    /** Elementary charge e (C), exact. */
    public static final double ELEMENTARY_CHARGE = 1.602176634e-19;
    /** Planck constant h (J s), exact. */
    public static final double PLANCK = 6.62607015e-34;
    /** Reduced Planck constant hbar = h / (2 pi) (J s). */
    public static final double HBAR = PLANCK / (2.0 * Math.PI);
    /** Boltzmann constant k_B (J/K), exact. */
    public static final double BOLTZMANN = 1.380649e-23;
    /** Vacuum electric permittivity epsilon_0 (F/m), CODATA 2018: 8.8541878128(13)e-12. */
    public static final double VACUUM_PERMITTIVITY = 8.8541878128e-12;
    /** Electron rest mass m_0 (kg), CODATA 2018: 9.1093837015(28)e-31. */
    public static final double ELECTRON_MASS = 9.1093837015e-31;
    /** Boltzmann constant in eV/K: k_B / e. */
    public static final double BOLTZMANN_EV = BOLTZMANN / ELEMENTARY_CHARGE;

    /**
     * Thermal voltage kT/q (V) at the given temperature.
     *
     * @param temperatureK temperature (K)
     * @return k_B T / e (V)
     */
    public static double thermalVoltage(double temperatureK) {
        return BOLTZMANN * temperatureK / ELEMENTARY_CHARGE;
    }
}
