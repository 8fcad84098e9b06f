// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;

/**
 * The Pareto front against its definition (V. Pareto's optimality, as stated for two minimised
 * objectives in e.g. K. Deb, "Multi-Objective Optimization using Evolutionary Algorithms", Wiley
 * (2001), ch. 2 - citation from memory): a point is on the front when no other point is no worse in
 * both objectives and better in one.
 */
class ParetoFrontTest {

    /** Brute force O(n^2), straight from the definition. */
    private static boolean[] bruteForce(double[] a, double[] b) {
        boolean[] on = new boolean[a.length];
        for (int p = 0; p < a.length; p++) {
            if (Double.isNaN(a[p]) || Double.isNaN(b[p])) {
                continue;
            }
            boolean dominated = false;
            for (int q = 0; q < a.length && !dominated; q++) {
                if (q == p || Double.isNaN(a[q]) || Double.isNaN(b[q])) {
                    continue;
                }
                dominated = a[q] <= a[p] && b[q] <= b[p] && (a[q] < a[p] || b[q] < b[p]);
            }
            on[p] = !dominated;
        }
        return on;
    }

    @Test
    void handExample() {
        // worked by hand: (1,9) (2,5) (3,6) (4,2) (5,2) (6,1) (2,5) (7,7)
        // (3,6) is dominated by (2,5); (5,2) by (4,2); (7,7) by (4,2); the two (2,5) tie and both stay
        double[] a = {1, 2, 3, 4, 5, 6, 2, 7};
        double[] b = {9, 5, 6, 2, 2, 1, 5, 7};
        assertArrayEquals(new int[] {0, 1, 6, 3, 5}, ParetoFront.indices(a, b));
    }

    @Test
    void equalFirstObjectiveKeepsOnlyTheLeastSecond() {
        // (1,3) and (1,2): the second dominates the first (same a, smaller b)
        assertArrayEquals(new int[] {1}, ParetoFront.indices(new double[] {1, 1}, new double[] {3, 2}));
        // (0,2) and (1,2): smaller a with equal b dominates
        assertArrayEquals(new int[] {0}, ParetoFront.indices(new double[] {0, 1}, new double[] {2, 2}));
        // -0.0 and 0.0 are the same number for the definition
        assertArrayEquals(new int[] {1}, ParetoFront.indices(new double[] {0.0, -0.0}, new double[] {3, 2}));
    }

    @Test
    void nanTakesNoPartAndEmptyIsEmpty() {
        double[] a = {1, Double.NaN, 0.5};
        double[] b = {1, 0, Double.NaN};
        assertArrayEquals(new int[] {0}, ParetoFront.indices(a, b));
        assertEquals(0, ParetoFront.indices(new double[0], new double[0]).length);
    }

    @Test
    void differentLengthsAreRejected() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> ParetoFront.indices(new double[3], new double[2]));
        assertEquals("length of the second objective", e.parameter());
    }

    @Property(tries = 500)
    void agreesWithTheDefinition(@ForAll @Size(max = 60) List<@IntRange(min = 0, max = 12) Integer> as,
            @ForAll @Size(max = 60) List<@IntRange(min = 0, max = 12) Integer> bs) {
        // small integer values force many ties, the hard cases
        int n = Math.min(as.size(), bs.size());
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = as.get(i);
            b[i] = bs.get(i) == 12 ? Double.NaN : bs.get(i);
        }
        assertArrayEquals(bruteForce(a, b), ParetoFront.mask(a, b));
        int[] idx = ParetoFront.indices(a, b);
        for (int k = 1; k < idx.length; k++) {
            // increasing a, and along the front b falls strictly where a rises
            if (a[idx[k]] != a[idx[k - 1]]) {
                assertEquals(true, a[idx[k]] > a[idx[k - 1]] && b[idx[k]] < b[idx[k - 1]]);
            }
        }
    }

    @Property(tries = 200)
    void agreesWithTheDefinitionOnRealNumbers(@ForAll @Size(max = 40) List<Double> as,
            @ForAll @Size(max = 40) List<Double> bs) {
        int n = Math.min(as.size(), bs.size());
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = as.get(i);
            b[i] = bs.get(i);
        }
        assertArrayEquals(bruteForce(a, b), ParetoFront.mask(a, b));
    }
}
