package org.wurtzkit.solvers.transport;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Constants;

/**
 * The WKB transmission T(E) = exp(-2 &int; &kappa;(x) dx) over the classically forbidden part of a
 * {@link TunnelBarrier}, with &kappa;(x) = sqrt(2 m(x) (U(x) - E)) / &hbar; (the usual
 * semiclassical estimate, e.g. S. M. Sze and K. K. Ng, <i>Physics of Semiconductor Devices</i>, 3rd
 * ed., Wiley 2007; the same exponent gives the law of R. H. Fowler and L. Nordheim, Proc. R. Soc.
 * Lond. A 119, 173 (1928) for a triangular barrier). T = 1 at and above the barrier top.
 *
 * <p>On each linear segment the integral of sqrt(U - E) is done in closed form, (2/3) L (b^{3/2} -
 * a^{3/2}) / (b - a) with a, b the positive parts of U - E at its ends, so the result is exact for the
 * piecewise-linear profile and costs one pass over the nodes (O(N), no allocation). The leads and
 * the steps to them enter only through the profile: WKB has no prefactor for abrupt steps or mass
 * changes (the exact {@link TransferMatrixTransmission} has).
 */
public final class WkbTransmission implements Transmission {
    /** sqrt(2 m0 q) / hbar: kappa (1/m) = C sqrt(m/m0 * (U - E)/eV). */
    static final double KAPPA_PER_SQRT_MASS_EV = Math.sqrt(2 * Constants.ELECTRON_MASS * Constants.ELEMENTARY_CHARGE)
            / Constants.HBAR;

    private final TunnelBarrier barrier;
    private final double[] x;
    private final double[] u;
    private final double[] sqrtMass;

    /** @param barrier the barrier */
    public WkbTransmission(TunnelBarrier barrier) {
        this.barrier = Require.nonNull("barrier", barrier);
        this.x = barrier.x();
        this.u = barrier.u();
        double[] m = barrier.m();
        this.sqrtMass = new double[m.length];
        for (int i = 0; i < m.length; i++) {
            sqrtMass[i] = Math.sqrt(m[i]);
        }
    }

    @Override
    public TunnelBarrier barrier() {
        return barrier;
    }

    @Override
    public double at(double energyEv) {
        if (energyEv <= barrier.bottomEv() || Double.isNaN(energyEv)) {
            return 0;
        }
        double exponent = 2 * KAPPA_PER_SQRT_MASS_EV * actionIntegral(energyEv);
        return Math.exp(-exponent);
    }

    /**
     * @param energyEv E (eV)
     * @return the sum over segments of sqrt(m/m0) &int; sqrt(max(U - E, 0)/eV) dx (m)
     */
    double actionIntegral(double energyEv) {
        double sum = 0;
        for (int i = 0; i + 1 < x.length; i++) {
            double len = x[i + 1] - x[i];
            if (len == 0) {
                continue;
            }
            double a = u[i] - energyEv;
            double b = u[i + 1] - energyEv;
            if (a <= 0 && b <= 0) {
                continue;
            }
            double s;
            if (a > 0 && b > 0) {
                // (2/3) L (B^3 - A^3) / (B^2 - A^2) = (2/3) L (A^2 + AB + B^2) / (A + B), no cancellation
                double ra = Math.sqrt(a);
                double rb = Math.sqrt(b);
                s = (2.0 / 3.0) * len * (a + ra * rb + b) / (ra + rb);
            } else {
                // one end forbidden: the forbidden part is len * p / (p - q) long, p > 0 >= q
                double p = Math.max(a, b);
                double q = Math.min(a, b);
                s = (2.0 / 3.0) * len * p * Math.sqrt(p) / (p - q);
            }
            sum += sqrtMass[i] * s;
        }
        return sum;
    }
}
