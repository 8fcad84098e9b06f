// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.math.BigDecimal;
import java.math.MathContext;
import org.wurtzkit.units.Decimals;

/** Equally spaced grids without binary round-off in their decimals, and their short text. */
final class Grids {
    /** Values listed in full by {@link #list(double[], String)}; longer lists show both ends. */
    private static final int LISTED = 8;

    private Grids() {
    }

    /**
     * @param from   first value, finite
     * @param to     last value, finite
     * @param points number of values, &ge; 2
     * @return values[i] = the double nearest to the decimal from + (to - from) i / (points - 1),
     *         computed in 34-digit decimal arithmetic from the shortest decimal forms of from and to
     *         ({@link BigDecimal#valueOf(double)}); both ends exact
     */
    static double[] linear(double from, double to, int points) {
        BigDecimal a = BigDecimal.valueOf(from);
        BigDecimal span = BigDecimal.valueOf(to).subtract(a);
        BigDecimal intervals = BigDecimal.valueOf(points - 1L);
        double[] v = new double[points];
        for (int i = 0; i < points; i++) {
            BigDecimal step = span.multiply(BigDecimal.valueOf(i)).divide(intervals, MathContext.DECIMAL128);
            v[i] = a.add(step).doubleValue();
        }
        v[0] = from;
        v[points - 1] = to;
        return v;
    }

    /**
     * @param values a non-empty list
     * @param unit   its unit, "" for none
     * @return e.g. "0, 0.1, 0.2, ..., 1 V": every value when there are at most {@value #LISTED}, else
     *         the first three, "..." and the last
     */
    static String list(double[] values, String unit) {
        StringBuilder sb = new StringBuilder();
        int n = values.length;
        for (int i = 0; i < n; i++) {
            if (n > LISTED && i == 3) {
                sb.append("..., ");
                i = n - 1;
            }
            sb.append(Decimals.format(values[i]));
            if (i + 1 < n) {
                sb.append(", ");
            }
        }
        return unit.isEmpty() ? sb.toString() : sb.append(' ').append(unit).toString();
    }
}
