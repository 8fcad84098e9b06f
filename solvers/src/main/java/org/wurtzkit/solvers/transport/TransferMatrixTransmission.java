package org.wurtzkit.solvers.transport;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * The transmission of a {@link TunnelBarrier} by transfer matrices: each linear segment is cut into
 * slabs of width at most {@code maxSlabWidth} with U constant at its midpoint value, the wave function
 * is a sum of plane (or evanescent) waves in each slab, and at every boundary &psi; and
 * &psi;'/m are continuous (the effective-mass matching of D. J. BenDaniel and C. B. Duke, Phys. Rev.
 * 152, 683 (1966)). With k = sqrt(2m(E - U))/&hbar; in the leads and t the transmitted amplitude,
 * T = (k_R m_L / (k_L m_R)) |t|^2 (standard, from memory).
 *
 * <p>For a barrier that is piecewise constant (a rectangle) the result is exact whatever the slab
 * width; a linear segment converges as the square of the slab width.
 *
 * <p>Numerics: the state (&psi;, &psi;'/m) is carried across a slab of width d by the real matrix
 * [[cos kd, m sin(kd)/k], [-k sin(kd)/m, cos kd]] (cosh and sinh where E &lt; U), so the product P =
 * [[a, b], [c, d]] over all slabs is real with det P = 1. Matching plane waves in the leads then gives
 * in closed form, with &beta; = k/m on each side,
 * T = 4 &beta;_L &beta;_R / [(b &beta;_L &beta;_R - c)^2 + (a &beta;_R + d &beta;_L)^2]
 * (derived for this class; reduces to the textbook closed form of the rectangular barrier). The
 * product is rescaled when it grows past 1e100, so opaque barriers give T down to the smallest double
 * instead of overflowing. Cost O(number of slabs) per energy, no allocation.
 */
public final class TransferMatrixTransmission implements Transmission {
    private static final double RESCALE_ABOVE = 1e100;
    private static final double C = WkbTransmission.KAPPA_PER_SQRT_MASS_EV;

    private final TunnelBarrier barrier;
    private final double[] width;
    private final double[] potential;
    private final double[] mass;

    /**
     * @param barrier      the barrier
     * @param maxSlabWidth largest slab width (m), in (0, 1e-9]
     */
    public TransferMatrixTransmission(TunnelBarrier barrier, double maxSlabWidth) {
        this.barrier = Require.nonNull("barrier", barrier);
        if (!(maxSlabWidth > 0 && maxSlabWidth <= 1e-9)) {
            throw new InvalidParameterException("maximum slab width (m)", Double.toString(maxSlabWidth), "(0, 1e-9]");
        }
        double[] x = barrier.x();
        double[] u = barrier.u();
        double[] m = barrier.m();
        int count = 0;
        for (int i = 0; i + 1 < x.length; i++) {
            count += slabs(x[i + 1] - x[i], maxSlabWidth);
        }
        width = new double[count];
        potential = new double[count];
        mass = new double[count];
        int k = 0;
        for (int i = 0; i + 1 < x.length; i++) {
            double len = x[i + 1] - x[i];
            int ns = slabs(len, maxSlabWidth);
            for (int j = 0; j < ns; j++) {
                double t = (j + 0.5) / ns;
                width[k] = len / ns;
                potential[k] = u[i] + t * (u[i + 1] - u[i]);
                mass[k] = m[i];
                k++;
            }
        }
    }

    private static int slabs(double len, double h) {
        if (len <= 0) {
            return 0;
        }
        double n = Math.ceil(len / h);
        if (n > 10_000_000) {
            throw new InvalidParameterException("maximum slab width (m)", Double.toString(h),
                    "at least " + (len / 10_000_000) + " for a segment of " + len + " m (10^7 slabs at most)");
        }
        return (int) n;
    }

    @Override
    public TunnelBarrier barrier() {
        return barrier;
    }

    /** @return number of slabs */
    public int slabCount() {
        return width.length;
    }

    @Override
    public double at(double energyEv) {
        double eL = energyEv - barrier.leftEdgeEv();
        double eR = energyEv - barrier.rightEdgeEv();
        if (!(eL > 0 && eR > 0)) {
            return 0;
        }
        double betaL = C * Math.sqrt(barrier.leftMass() * eL) / barrier.leftMass();
        double betaR = C * Math.sqrt(barrier.rightMass() * eR) / barrier.rightMass();
        double a = 1;
        double b = 0;
        double c = 0;
        double d = 1;
        double logScale = 0;
        for (int s = 0; s < width.length; s++) {
            double m = mass[s];
            double w = width[s];
            // q = k^2 (1/m^2), signed: negative in a forbidden slab
            double q = C * C * m * (energyEv - potential[s]);
            double qd2 = q * w * w;
            double p11;
            double p12;
            double p21;
            if (Math.abs(qd2) < 1e-8) {
                p11 = 1 - 0.5 * qd2;
                p12 = m * w * (1 - qd2 / 6);
                p21 = -q * w * (1 - qd2 / 6) / m;
            } else if (q > 0) {
                double k = Math.sqrt(q);
                double sn = Math.sin(k * w);
                p11 = Math.cos(k * w);
                p12 = m * sn / k;
                p21 = -k * sn / m;
            } else {
                double kappa = Math.sqrt(-q);
                double e = Math.exp(kappa * w);
                double ch = 0.5 * (e + 1 / e);
                double sh = 0.5 * (e - 1 / e);
                p11 = ch;
                p12 = m * sh / kappa;
                p21 = kappa * sh / m;
            }
            double na = p11 * a + p12 * c;
            double nb = p11 * b + p12 * d;
            double nc = p21 * a + p11 * c;
            double nd = p21 * b + p11 * d;
            a = na;
            b = nb;
            c = nc;
            d = nd;
            double big = Math.max(Math.max(Math.abs(a), Math.abs(b * betaL)),
                    Math.max(Math.abs(c / betaL), Math.abs(d)));
            if (big > RESCALE_ABOVE) {
                double f = 1 / big;
                a *= f;
                b *= f;
                c *= f;
                d *= f;
                logScale += Math.log(big);
            }
        }
        double re = b * betaL * betaR - c;
        double im = a * betaR + d * betaL;
        double t = 4 * betaL * betaR / (re * re + im * im);
        // T <= 1 by current conservation (det P = 1); the min removes only round-off above 1
        if (logScale == 0) {
            return Math.min(1, t);
        }
        return Math.min(1, Math.exp(Math.log(t) - 2 * logScale));
    }
}
