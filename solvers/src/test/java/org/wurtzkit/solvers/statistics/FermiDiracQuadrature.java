package org.wurtzkit.solvers.statistics;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.UnivariateIntegrator;

/**
 * Independent reference values of the complete Fermi-Dirac integrals of order 1/2 and -1/2, by
 * adaptive Gauss-Legendre quadrature of the defining integrals (Blakemore, Solid-State Electron. 25,
 * 1067 (1982), normalisation) with Apache Commons Math 3.6.1
 * {@link IterativeLegendreGaussIntegrator}. Test support only; slow by design.
 *
 * <p>The substitution t = u^2 turns both integrands into smooth functions of u:
 *
 * <pre>
 *   F_1/2(eta)  = (2/sqrt(pi)) int_0^inf 2 u^2 / (1 + exp(u^2 - eta)) du,
 *   F_-1/2(eta) = (1/sqrt(pi)) int_0^inf 2     / (1 + exp(u^2 - eta)) du,
 * </pre>
 *
 * removing the t^(1/2) and t^(-1/2) endpoint singularities. The range is cut where z = u^2 - eta
 * takes the values -40, -20, -10, -5, -2, 0, 2, 5, 10, 20, 40 (so that the Fermi step around u =
 * sqrt(eta) is resolved by short pieces) and ends at z = 110 where the integrand is below e^-110
 * relative to its bulk. Each piece is integrated to a relative tolerance of 1e-15.
 */
final class FermiDiracQuadrature {

    private FermiDiracQuadrature() {
    }

    private static final double[] CUTS_IN_Z = {-40, -20, -10, -5, -2, 0, 2, 5, 10, 20, 40, 110};
    private static final int MAX_EVALUATIONS = 10_000_000;

    /** F_1/2(eta) by quadrature. */
    static double f12(double eta) {
        return 2.0 / Math.sqrt(Math.PI) * integrate(eta, true);
    }

    /** F_-1/2(eta) by quadrature. */
    static double fm12(double eta) {
        return 1.0 / Math.sqrt(Math.PI) * integrate(eta, false);
    }

    private static double integrate(double eta, boolean half) {
        UnivariateFunction integrand = u -> {
            double z = u * u - eta;
            double occupancy;
            if (z > 0) {
                double e = Math.exp(-z);
                occupancy = e / (1.0 + e);
            } else {
                occupancy = 1.0 / (1.0 + Math.exp(z));
            }
            return half ? 2.0 * u * u * occupancy : 2.0 * occupancy;
        };
        // A fresh integrator per piece: Commons Math integrators keep per-call state.
        double sum = 0.0;
        double lower = 0.0;
        for (double z : CUTS_IN_Z) {
            double t = eta + z;
            if (t <= 0.0) {
                continue;
            }
            double upper = Math.sqrt(t);
            if (upper > lower) {
                UnivariateIntegrator integrator = new IterativeLegendreGaussIntegrator(8, 1.0e-14, 1.0e-300, 2, 64);
                sum += integrator.integrate(MAX_EVALUATIONS, integrand, lower, upper);
                lower = upper;
            }
        }
        return sum;
    }
}
