// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.Arrays;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * The Pareto front of points with two objectives that are both to be made small, e.g. the sheet
 * resistance and the magnitude of the gate leakage of a family of stacks.
 *
 * <p>Point p is dominated when another point q is no worse in both objectives and better in at least
 * one: a<sub>q</sub> &le; a<sub>p</sub> and b<sub>q</sub> &le; b<sub>p</sub>, with one of the two
 * strict. The front is the set of points that no point dominates (the usual definition of Pareto
 * optimality). Two identical points do not dominate each other: both are on the front or neither is.
 *
 * <p>Cost O(n log n): the points are sorted by (a, b), then one pass keeps the least b seen at
 * smaller a. Points with a NaN in either objective take no part (they are neither on the front nor
 * dominate anything); infinities are ordinary values.
 */
public final class ParetoFront {
    private ParetoFront() {
    }

    /**
     * The indices of the non-dominated points.
     *
     * @param a first objective of each point, to be minimised
     * @param b second objective of each point, to be minimised; same length as a
     * @return the indices of the points on the front, in increasing a (ties in increasing index)
     * @throws InvalidParameterException if the arrays differ in length
     */
    public static int[] indices(double[] a, double[] b) {
        Require.nonNull("first objective", a);
        Require.nonNull("second objective", b);
        if (a.length != b.length) {
            throw new InvalidParameterException("length of the second objective", Integer.toString(b.length),
                    "[" + a.length + ", " + a.length + "] (the length of the first objective)");
        }
        int m = 0;
        Integer[] order = new Integer[a.length];
        for (int i = 0; i < a.length; i++) {
            if (!Double.isNaN(a[i]) && !Double.isNaN(b[i])) {
                order[m++] = i;
            }
        }
        Integer[] sorted = Arrays.copyOf(order, m);
        Arrays.sort(sorted, (p, q) -> {
            // plain comparisons, so that -0.0 and 0.0 count as equal, as in the definition
            if (a[p] != a[q]) {
                return a[p] < a[q] ? -1 : 1;
            }
            if (b[p] != b[q]) {
                return b[p] < b[q] ? -1 : 1;
            }
            return Integer.compare(p, q);
        });
        int[] front = new int[m];
        int k = 0;
        double bestB = Double.POSITIVE_INFINITY;
        boolean any = false;
        int g = 0;
        while (g < m) {
            // one group of equal a; sorted by b, so its first member has the group's least b
            double ga = a[sorted[g]];
            double gb = b[sorted[g]];
            int end = g;
            while (end < m && a[sorted[end]] == ga) {
                end++;
            }
            // a point at smaller a with b <= gb dominates the whole group
            if (!any || gb < bestB) {
                for (int j = g; j < end && b[sorted[j]] == gb; j++) {
                    front[k++] = sorted[j];
                }
                bestB = gb;
                any = true;
            }
            g = end;
        }
        return Arrays.copyOf(front, k);
    }

    /**
     * @param a first objective of each point, to be minimised
     * @param b second objective of each point, to be minimised; same length as a
     * @return for each point, whether it is on the front
     */
    public static boolean[] mask(double[] a, double[] b) {
        boolean[] on = new boolean[a == null ? 0 : a.length];
        for (int i : indices(a, b)) {
            on[i] = true;
        }
        return on;
    }
}
