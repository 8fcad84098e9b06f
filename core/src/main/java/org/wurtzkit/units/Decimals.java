// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.units;

import java.util.Locale;

/**
 * Short, locale-independent number text for the {@code toString()} of results and records, meant
 * for people reading them in jshell or a notebook: at most six significant digits, no trailing
 * zeros, a decimal point (never a comma) whatever the default locale, and an exponent only outside
 * 10<sup>-4</sup> &le; |v| &lt; 10<sup>6</sup>. A bias grid point computed as 0.30000000000000004
 * prints {@code 0.3}; -1.0926261e13 prints {@code -1.09263e13}.
 *
 * <p>This text is for reading, not for storing: six digits do not read back to the identical
 * double. Tables written as CSV keep every digit ({@link Double#toString(double)}).
 */
public final class Decimals {
    /** Significant digits kept. */
    public static final int SIGNIFICANT_DIGITS = 6;

    private Decimals() {
    }

    /**
     * @param v any double
     * @return its short text, e.g. {@code "0.3"}, {@code "70"}, {@code "-1.09263e13"},
     *         {@code "2.5e-5"}; {@code "NaN"}, {@code "Infinity"}, {@code "-Infinity"} as Java
     *         writes them; {@code "0"} for both zeros
     */
    public static String format(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        String s = String.format(Locale.ROOT, "%." + SIGNIFICANT_DIGITS + "g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        if (mantissa.indexOf('.') >= 0) {
            int end = mantissa.length();
            while (mantissa.charAt(end - 1) == '0') {
                end--;
            }
            if (mantissa.charAt(end - 1) == '.') {
                end--;
            }
            mantissa = mantissa.substring(0, end);
        }
        if (e < 0) {
            return mantissa;
        }
        // "e+06" -> "e6", "e-05" -> "e-5"
        int exponent = Integer.parseInt(s.substring(e + 1));
        return mantissa + "e" + exponent;
    }

    /**
     * @param v    a value
     * @param unit its unit as it should be read, e.g. "V", "cm^-2", "nm"; empty for none
     * @return {@link #format(double)} of v, a space and the unit (no space if the unit is empty)
     */
    public static String format(double v, String unit) {
        return unit == null || unit.isEmpty() ? format(v) : format(v) + " " + unit;
    }
}
