package org.wurtzkit.solvers.sp;

import java.util.List;
import org.wurtzkit.structure.InterfaceStates;

/**
 * Turns a distribution of interface states into quadrature nodes over the gap, once per solve: the
 * midpoint rule on [0, e_0] (acceptor-like) and [e_0, E_g] (donor-like) separately, so that the
 * split at the neutrality level is exact, with a step no wider than kT/8 and a quarter of the
 * distribution's narrowest scale (midpoint error about h^2/24 of the curvature: below 1e-3 of the
 * occupancy's change across one kT). A discrete level is one node carrying its whole density.
 */
final class InterfaceStateQuadrature {
    /** Step as a fraction of kT. */
    static final double STEP_PER_KT = 0.125;
    /** Step as a fraction of the distribution's narrowest scale. */
    static final double STEP_PER_SCALE = 0.25;

    private InterfaceStateQuadrature() {
    }

    /**
     * @param is    the states
     * @param gapEv gap of the nitride below (eV)
     * @param kTeV  kT (eV)
     * @param out   receives {e below E_c (eV), states (m^-2), 1 if donor-like else 0}
     */
    static void append(InterfaceStates is, double gapEv, double kTeV, List<double[]> out) {
        double e0 = is.neutralLevelBelowEcEv();
        if (is.distribution() instanceof InterfaceStates.Discrete dl) {
            if (dl.densityPerM2() > 0) {
                out.add(new double[] {dl.levelBelowEcEv(), dl.densityPerM2(), dl.levelBelowEcEv() > e0 ? 1 : 0});
            }
            return;
        }
        double step = Math.min(STEP_PER_KT * kTeV, STEP_PER_SCALE * is.distribution().narrowestScaleEv());
        interval(is, 0, e0, gapEv, step, 0, out);
        interval(is, e0, gapEv, gapEv, step, 1, out);
    }

    private static void interval(InterfaceStates is, double a, double b, double gapEv, double step, int donor,
            List<double[]> out) {
        if (b <= a) {
            return;
        }
        int m = (int) Math.ceil((b - a) / step);
        double h = (b - a) / m;
        for (int j = 0; j < m; j++) {
            double e = a + (j + 0.5) * h;
            double w = is.distribution().densityPerM2PerEv(e, gapEv) * h;
            if (w > 0) {
                out.add(new double[] {e, w, donor});
            }
        }
    }
}
