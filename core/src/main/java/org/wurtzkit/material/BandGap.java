package org.wurtzkit.material;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;

/**
 * Band gap with the Varshni temperature dependence Eg(T) = Eg(0) - alpha T&sup2;/(T + beta)
 * (Y. P. Varshni, Physica 34, 149 (1967)).
 *
 * @param gap0KEv      Eg(0 K) (eV)
 * @param alphaEvPerK  alpha (eV/K)
 * @param betaK        beta (K)
 */
public record BandGap(double gap0KEv, double alphaEvPerK, double betaK) {
    /** Highest temperature accepted anywhere in the library (K). */
    public static final double MAX_TEMPERATURE_K = 2000;

    /**
     * @param temperatureK temperature in (0, 2000] K
     * @return Eg(T) (eV)
     */
    public double atTemperature(double temperatureK) {
        checkTemperature(temperatureK);
        return gap0KEv - alphaEvPerK * temperatureK * temperatureK / (temperatureK + betaK);
    }

    /**
     * @param temperatureK a temperature to validate
     * @return it, if in (0, {@value #MAX_TEMPERATURE_K}] K
     */
    public static double checkTemperature(double temperatureK) {
        if (!(temperatureK > 0 && temperatureK <= MAX_TEMPERATURE_K)) {
            throw new org.wurtzkit.errors.InvalidParameterException("temperature (K)", Double.toString(temperatureK),
                    "(0, " + (int) MAX_TEMPERATURE_K + "]");
        }
        return Require.finite("temperature (K)", temperatureK);
    }

    /** @return e.g. {@code "E_g(0 K) = 3.51 eV, Varshni alpha = 0.000909 eV/K, beta = 830 K"} */
    @Override
    public String toString() {
        return "E_g(0 K) = " + Decimals.format(gap0KEv, "eV") + ", Varshni alpha = " + Decimals.format(alphaEvPerK, "eV/K")
                + ", beta = " + Decimals.format(betaK, "K");
    }
}
