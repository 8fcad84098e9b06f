package org.wurtzkit.solvers.workflow;

import java.util.Locale;

/** Number formatting for messages. */
final class Text {
    private Text() {
    }

    /**
     * @param v a number
     * @return six significant digits without trailing zeros, e.g. "10", "-5.5", "8.66055e+12"
     */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e7) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.6g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        String exponent = e < 0 ? "" : s.substring(e);
        if (mantissa.indexOf('.') >= 0) {
            mantissa = mantissa.replaceAll("0+$", "");
            if (mantissa.endsWith(".")) {
                mantissa = mantissa.substring(0, mantissa.length() - 1);
            }
        }
        return mantissa + exponent;
    }
}
