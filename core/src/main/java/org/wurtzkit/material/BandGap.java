package org.wurtzkit.material;

import java.util.Arrays;
import java.util.Objects;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;

/**
 * Band gap with the Varshni temperature dependence Eg(T) = Eg(0) - alpha T&sup2;/(T + beta)
 * (Y. P. Varshni, Physica 34, 149 (1967)).
 *
 * <p>For an alloy resolved with {@link AlloyGapTemperatureRule#VARSHNI_PER_BINARY_THEN_BOWING} the
 * gap at T is instead sum x_i Eg_i(T) - bowing, each binary with its own Varshni law
 * ({@link #perBinary()} not null); {@link #gap0KEv()}, {@link #alphaEvPerK()} and {@link #betaK()}
 * then keep the bowed 0 K gap and the interpolated Varshni parameters for reference, and the two
 * forms agree at 0 K.
 *
 * @param gap0KEv      Eg(0 K) (eV)
 * @param alphaEvPerK  alpha (eV/K)
 * @param betaK        beta (K)
 * @param perBinary    the per-binary form of an alloy, or null for one Varshni law
 */
public record BandGap(double gap0KEv, double alphaEvPerK, double betaK, PerBinary perBinary) {
    /** Highest temperature accepted anywhere in the library (K). */
    public static final double MAX_TEMPERATURE_K = 2000;

    /**
     * One Varshni law.
     *
     * @param gap0KEv     Eg(0 K) (eV)
     * @param alphaEvPerK alpha (eV/K)
     * @param betaK       beta (K)
     */
    public BandGap(double gap0KEv, double alphaEvPerK, double betaK) {
        this(gap0KEv, alphaEvPerK, betaK, null);
    }

    /**
     * An alloy gap as the weighted sum of the binaries' Varshni gaps minus a temperature-independent
     * bowing term. Immutable (arrays are copied).
     *
     * @param fractions the binaries' fractions (sum 1)
     * @param binaries  the binaries' gaps (one Varshni law each)
     * @param bowingEv  the bowing term sum b_ij x_i x_j (eV)
     */
    public record PerBinary(double[] fractions, BandGap[] binaries, double bowingEv) {
        /** Copies and validates. */
        public PerBinary {
            Require.nonNull("binary fractions", fractions);
            Require.nonNull("binary gaps", binaries);
            if (fractions.length != binaries.length) {
                throw new org.wurtzkit.errors.InvalidParameterException("number of binary gaps",
                        Integer.toString(binaries.length), "{" + fractions.length + "} (one per fraction)");
            }
            fractions = fractions.clone();
            binaries = binaries.clone();
            Require.finite("gap bowing term (eV)", bowingEv);
        }

        @Override
        public double[] fractions() {
            return fractions.clone();
        }

        @Override
        public BandGap[] binaries() {
            return binaries.clone();
        }

        double at(double temperatureK) {
            double g = -bowingEv;
            for (int i = 0; i < fractions.length; i++) {
                if (fractions[i] > 0) {
                    g += fractions[i] * binaries[i].atTemperature(temperatureK);
                }
            }
            return g;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof PerBinary p && Arrays.equals(p.fractions, fractions)
                    && Arrays.equals(p.binaries, binaries) && Double.compare(p.bowingEv, bowingEv) == 0;
        }

        @Override
        public int hashCode() {
            return Objects.hash(Arrays.hashCode(fractions), Arrays.hashCode(binaries), bowingEv);
        }

        @Override
        public String toString() {
            return "PerBinary[fractions=" + Arrays.toString(fractions) + ", binaries=" + Arrays.toString(binaries)
                    + ", bowingEv=" + bowingEv + "]";
        }
    }

    /**
     * @param temperatureK temperature in (0, 2000] K
     * @return Eg(T) (eV)
     */
    public double atTemperature(double temperatureK) {
        checkTemperature(temperatureK);
        if (perBinary != null) {
            return perBinary.at(temperatureK);
        }
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
