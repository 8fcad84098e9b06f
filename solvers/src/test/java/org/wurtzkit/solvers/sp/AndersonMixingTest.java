// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Anderson mixing on linear fixed-point problems x = M x + b with a known exact solution
 * x* = (I - M)^-1 b. On a linear problem Anderson mixing with an unlimited history is equivalent to
 * GMRES applied to (I - M) x = b (H. F. Walker and P. Ni, SIAM J. Numer. Anal. 49, 1715 (2011),
 * [from memory]); with M diagonal and three
 * distinct eigenvalues the minimal polynomial has degree three, so a history of three differences
 * reaches x* to round-off within a few iterations, whereas the plain damped iteration with the same
 * beta contracts by only 1 - beta (1 - 0.99) per step on the slow eigenvalue.
 */
class AndersonMixingTest {
    private static final int N = 60;

    /** M = diag(0.99, 0.5, 0.1, ...) cycling, b_i = 1 + i/N; the last node is "Dirichlet": M = 0, b = x0. */
    private static void apply(double[] x, double[] out) {
        double[] eig = {0.99, 0.5, 0.1};
        for (int i = 0; i < N - 1; i++) {
            out[i] = eig[i % 3] * x[i] + 1 + (double) i / N;
        }
        out[N - 1] = x[N - 1];
    }

    private static double exact(int i) {
        double[] eig = {0.99, 0.5, 0.1};
        return (1 + (double) i / N) / (1 - eig[i % 3]);
    }

    @Test
    void convergesToTheExactFixedPointWhereDampedIterationCrawls() {
        AndersonMixing mixing = new AndersonMixing(N, SelfConsistentSolver.ANDERSON_DEPTH,
                SelfConsistentSolver.ANDERSON_BETA);
        double[] x = new double[N];
        x[N - 1] = 7.25; // a Dirichlet value: its residual is zero, so it must never move
        double[] g = new double[N];
        int it = 0;
        double change = Double.MAX_VALUE;
        while (change > 1e-11 && it < 50) {
            apply(x, g);
            change = 0;
            for (int i = 0; i < N; i++) {
                change = Math.max(change, Math.abs(g[i] - x[i]));
            }
            mixing.next(x, g);
            System.arraycopy(g, 0, x, 0, N);
            it++;
        }
        assertTrue(change <= 1e-11, "Anderson mixing left a change of " + change + " after " + it + " iterations");
        assertTrue(it <= 12, "iterations " + it);
        for (int i = 0; i < N - 1; i++) {
            assertEquals(exact(i), x[i], 1e-9 * exact(i), "node " + i);
        }
        assertEquals(7.25, x[N - 1], 0.0, "the Dirichlet node");

        // the damped iteration x <- x + beta (G(x) - x) on the same problem, same number of steps
        double[] y = new double[N];
        double[] h = new double[N];
        for (int k = 0; k < it; k++) {
            apply(y, h);
            for (int i = 0; i < N; i++) {
                y[i] += SelfConsistentSolver.ANDERSON_BETA * (h[i] - y[i]);
            }
        }
        assertTrue(Math.abs(y[0] - exact(0)) > 0.5 * exact(0), "damped iteration after " + it + " steps: " + y[0]);
    }

    /** A residual that grows by more than the restart factor clears the history. */
    @Test
    void growingResidualRestartsTheHistory() {
        AndersonMixing mixing = new AndersonMixing(3, 3, 0.5);
        double[] x = {0, 0, 0};
        double[] g = {1, 1, 1};
        mixing.next(x, g);
        assertEquals(0, mixing.restarts());
        double[] x2 = {0.5, 0.5, 0.5};
        double[] g2 = {10, 10, 10}; // |f| grows from 1.7 to 16.5
        mixing.next(x2, g2);
        assertEquals(1, mixing.restarts());
        // with an empty history the step is the damped one: x + beta f
        assertEquals(0.5 + 0.5 * 9.5, g2[0], 1e-15);
    }
}
