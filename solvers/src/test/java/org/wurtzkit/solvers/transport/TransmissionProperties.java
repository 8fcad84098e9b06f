package org.wurtzkit.solvers.transport;

import static org.wurtzkit.units.Units.NM;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

/** Invariants of the transmission kernels on random piecewise-linear barriers. */
class TransmissionProperties {

    /** A random barrier: 2-8 nodes 0.05-0.95 nm apart, U in [-0.5, 3] eV, masses in [0.1, 0.5], leads at -0.6 eV. */
    @Provide
    Arbitrary<TunnelBarrier> barriers() {
        return Arbitraries.integers().between(2, 8).flatMap(n -> Combinators.combine(
                Arbitraries.doubles().between(0.05, 0.95).array(double[].class).ofSize(n - 1),
                Arbitraries.doubles().between(-0.5, 3.0).array(double[].class).ofSize(n),
                Arbitraries.doubles().between(0.1, 0.5).array(double[].class).ofSize(n - 1))
                .as((widths, u, m) -> {
                    double[] x = new double[n];
                    for (int i = 1; i < n; i++) {
                        x[i] = x[i - 1] + widths[i - 1] * NM;
                    }
                    return TunnelBarrier.of(x, u, m, -0.6, 0.2, -0.6, 0.25);
                }));
    }

    /**
     * The WKB exponent's integrand sqrt(max(U - E, 0)) falls with E at every point, so T_WKB never
     * falls as E rises, and it is 1 from the top up (follows from the formula; common practice, no
     * source).
     */
    @Property(tries = 300)
    void wkbTransmissionRisesWithEnergy(@ForAll("barriers") TunnelBarrier b, @ForAll @DoubleRange(min = -0.59,
            max = 3.2) double e, @ForAll @DoubleRange(min = 0, max = 0.5) double de) {
        WkbTransmission t = new WkbTransmission(b);
        double lower = t.at(e);
        double higher = t.at(e + de);
        if (!(lower >= 0 && higher >= lower && higher <= 1)) {
            throw new AssertionError("T(" + e + ") = " + lower + ", T(" + (e + de) + ") = " + higher);
        }
        if (e >= b.topEv() && lower != 1) {
            throw new AssertionError("T above the top " + b.topEv() + " is " + lower);
        }
    }

    /**
     * The transfer matrix conserves current: T in [0, 1] (up to round-off) for any barrier and
     * energy above both leads, and it is the same from either side (reciprocity of the stationary
     * Schroedinger equation, common practice, no source): the mirrored barrier with swapped leads
     * gives the same T to 1e-9 relative. Slabs of 1 nm put one slab on each segment (all are
     * shorter), so both directions see the same slabs and only the matching algebra is compared.
     */
    @Property(tries = 200)
    void transferMatrixIsAProbabilityAndReciprocal(@ForAll("barriers") TunnelBarrier b,
            @ForAll @DoubleRange(min = -0.55, max = 3.5) double e) {
        TransferMatrixTransmission t = new TransferMatrixTransmission(b, 1 * NM);
        double v = t.at(e);
        if (!(v >= 0 && v <= 1)) {
            throw new AssertionError("T(" + e + ") = " + v);
        }
        double[] x = b.positions();
        double[] u = b.energiesEv();
        double[] m = b.segmentMasses();
        int n = x.length;
        double[] xr = new double[n];
        double[] ur = new double[n];
        double[] mr = new double[n - 1];
        for (int i = 0; i < n; i++) {
            xr[i] = x[n - 1] - x[n - 1 - i];
            ur[i] = u[n - 1 - i];
        }
        for (int i = 0; i < n - 1; i++) {
            mr[i] = m[n - 2 - i];
        }
        TunnelBarrier mirrored = TunnelBarrier.of(xr, ur, mr, b.rightEdgeEv(), b.rightMass(), b.leftEdgeEv(),
                b.leftMass());
        double w = new TransferMatrixTransmission(mirrored, 1 * NM).at(e);
        if (!(Math.abs(w - v) <= 1e-9 * v + 1e-300)) {
            throw new AssertionError("T forward " + v + ", backward " + w + " at E " + e);
        }
    }
}
