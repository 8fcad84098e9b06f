package org.wurtzkit.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Marching squares against functions whose level sets are known exactly. */
class ContoursTest {
    private static double[] grid(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from + (to - from) * i / (n - 1);
        }
        return v;
    }

    @Test
    void linearFunctionGivesTheExactStraightLine() {
        // z = 2x + y: linear interpolation is exact, so every vertex lies on 2x + y = 1.3
        double[] xs = grid(0, 1, 7);
        double[] ys = grid(0, 1, 9);
        double[][] z = new double[xs.length][ys.length];
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < ys.length; j++) {
                z[i][j] = 2 * xs[i] + ys[j];
            }
        }
        List<Contours.Polyline> lines = Contours.at(xs, ys, z, 1.3);
        assertEquals(1, lines.size(), "one straight line crosses the grid");
        Contours.Polyline l = lines.get(0);
        assertFalse(l.closed());
        for (int k = 0; k < l.size(); k++) {
            assertEquals(1.3, 2 * l.x()[k] + l.y()[k], 1e-12);
        }
        // it runs from the bottom edge (y = 0, x = 0.65) to the top edge (y = 1, x = 0.15)
        double[] ends = {l.y()[0], l.y()[l.size() - 1]};
        java.util.Arrays.sort(ends);
        assertEquals(0, ends[0], 1e-12);
        assertEquals(1, ends[1], 1e-12);
    }

    @Test
    void circleIsOneClosedLoopNearTheRadius() {
        // z = x^2 + y^2 on [-1, 1]^2, level 0.5^2: a closed loop of radius 0.5; linear
        // interpolation of a quadratic on cells of width h errs by at most h^2/4 in z
        double[] xs = grid(-1, 1, 41);
        double[] ys = grid(-1, 1, 41);
        double[][] z = new double[41][41];
        for (int i = 0; i < 41; i++) {
            for (int j = 0; j < 41; j++) {
                z[i][j] = xs[i] * xs[i] + ys[j] * ys[j];
            }
        }
        List<Contours.Polyline> lines = Contours.at(xs, ys, z, 0.25);
        assertEquals(1, lines.size());
        Contours.Polyline loop = lines.get(0);
        assertTrue(loop.closed(), "the loop closes on its first vertex");
        double h = 0.05;
        for (int k = 0; k < loop.size(); k++) {
            double r2 = loop.x()[k] * loop.x()[k] + loop.y()[k] * loop.y()[k];
            assertEquals(0.25, r2, h * h / 4 + 1e-12);
        }
        // its length approaches the circumference pi
        assertEquals(Math.PI, loop.length(1, 1), 0.01);
    }

    @Test
    void missingValuesCutTheLine() {
        double[] xs = grid(0, 1, 5);
        double[] ys = grid(0, 1, 5);
        double[][] z = new double[5][5];
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 5; j++) {
                z[i][j] = xs[i];
            }
        }
        z[2][2] = Double.NaN; // the four cells around (0.5, 0.5) are skipped
        List<Contours.Polyline> lines = Contours.at(xs, ys, z, 0.4);
        assertEquals(2, lines.size(), "the vertical line x = 0.4 is cut in two by the missing cells");
        for (Contours.Polyline l : lines) {
            for (double x : l.x()) {
                assertEquals(0.4, x, 1e-12);
            }
            for (double y : l.y()) {
                assertTrue(y <= 0.25 + 1e-12 || y >= 0.75 - 1e-12, "no vertex inside the skipped cells: " + y);
            }
        }
    }

    @Test
    void saddleFollowsTheCentreValue() {
        // one cell, a = c = 1 (high), b = d = 0 (low), level 0.4: the centre 0.5 is high, so the
        // high corners connect and the two lines cut off the low corners b = (1, 0) and d = (0, 1)
        double[] xs = {0, 1};
        double[] ys = {0, 1};
        double[][] z = {{1, 0}, {0, 1}};
        List<Contours.Polyline> lines = Contours.at(xs, ys, z, 0.4);
        assertEquals(2, lines.size());
        for (Contours.Polyline l : lines) {
            double mx = 0.5 * (l.x()[0] + l.x()[1]);
            double my = 0.5 * (l.y()[0] + l.y()[1]);
            boolean nearB = mx > 0.5 && my < 0.5;
            boolean nearD = mx < 0.5 && my > 0.5;
            assertTrue(nearB || nearD, "each line cuts off a low corner, got midpoint " + mx + ", " + my);
        }
        // above the centre value the low corners connect instead
        for (Contours.Polyline l : Contours.at(xs, ys, z, 0.6)) {
            double mx = 0.5 * (l.x()[0] + l.x()[1]);
            double my = 0.5 * (l.y()[0] + l.y()[1]);
            assertTrue((mx < 0.5 && my < 0.5) || (mx > 0.5 && my > 0.5), "cuts off a high corner");
        }
    }

    @Test
    void levelOutsideTheRangeHasNoLine() {
        double[][] z = {{0, 1}, {2, 3}};
        assertTrue(Contours.at(new double[] {0, 1}, new double[] {0, 1}, z, 5).isEmpty());
    }
}
