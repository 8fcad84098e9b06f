package org.wurtzkit.plot;

import java.math.BigDecimal;
import java.util.Locale;

/**
 * The one way every plot of this package writes symbols, units and numbers, so that all labels
 * read alike.
 *
 * <ul>
 * <li><b>Subscripts</b> are written with an underscore: {@code n_s}, {@code V_g}, {@code V_th},
 * {@code E_c}, {@code E_F}, {@code E_0}. (Unicode has subscript letters for only part of the
 * alphabet, no subscript c, g or F, so a mix of both styles would be unavoidable with them.)</li>
 * <li><b>Superscripts</b> (powers of ten, powers of units, |&psi;|&sup2;) are written with Unicode
 * superscript digits: 10&sup1;&sup3; cm&#8315;&sup2;, never with a caret.</li>
 * <li><b>Numbers</b> are formatted in {@link Locale#ROOT}, with a decimal point on every machine.</li>
 * </ul>
 */
public final class Labels {
    /** The 2DEG sheet density. */
    public static final String N_S = "n_s";
    /** The gate bias. */
    public static final String V_G = "V_g";
    /** The threshold voltage. */
    public static final String V_TH = "V_th";
    /** The conduction-band edge. */
    public static final String E_C = "E_c";
    /** The valence-band edge. */
    public static final String E_V = "E_v";
    /** The Fermi level. */
    public static final String E_F = "E_F";
    /** Per square centimetre. */
    public static final String PER_CM2 = "cm" + superscript("-2");
    /** Per cubic centimetre. */
    public static final String PER_CM3 = "cm" + superscript("-3");

    private static final String SUPERSCRIPT_DIGITS = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";

    private Labels() {
    }

    /**
     * @param symbol a symbol, e.g. "E"
     * @param index  its subscript, e.g. "0"
     * @return the symbol with its subscript, e.g. "E_0"
     */
    public static String sub(String symbol, String index) {
        return symbol + "_" + index;
    }

    /**
     * @param text digits with an optional leading minus sign, e.g. "-2" or "13"
     * @return the same in Unicode superscript characters
     * @throws IllegalArgumentException for any other character
     */
    public static String superscript(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (ch >= '0' && ch <= '9') {
                sb.append(SUPERSCRIPT_DIGITS.charAt(ch - '0'));
            } else if (ch == '-' && i == 0) {
                sb.append('\u207b');
            } else {
                throw new IllegalArgumentException("superscript takes digits and a leading minus sign, not \""
                        + text + "\"");
            }
        }
        return sb.toString();
    }

    /** @return "10" with the exponent as superscript, e.g. 10&sup1;&sup3; */
    public static String powerOfTen(int exponent) {
        return "10" + superscript(Integer.toString(exponent));
    }

    /**
     * @param label a label
     * @return true if it keeps the convention: no Unicode subscript characters and no caret
     */
    public static boolean followsConvention(String label) {
        for (int i = 0; i < label.length(); i++) {
            char ch = label.charAt(i);
            if (ch == '^' || (ch >= '\u2080' && ch <= '\u209c') || (ch >= '\u1d62' && ch <= '\u1d6a')) {
                return false;
            }
        }
        return true;
    }

    /** @return v with n significant digits */
    public static String sig(double v, int n) {
        return String.format(Locale.ROOT, "%." + n + "g", v);
    }

    /** @return v with d decimals */
    public static String fixed(double v, int d) {
        return String.format(Locale.ROOT, "%." + d + "f", v);
    }

    /** @return v to six significant digits without trailing zeros, e.g. "2", "22", "1800", "2.5" */
    public static String trimmed(double v) {
        return new BigDecimal(sig(v, 6)).stripTrailingZeros().toPlainString();
    }
}
