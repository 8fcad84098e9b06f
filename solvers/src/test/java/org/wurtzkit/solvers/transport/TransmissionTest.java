package org.wurtzkit.solvers.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.units.Constants;

/** WKB and transfer-matrix transmission against exact results. */
class TransmissionTest {
    private static final double C = Math.sqrt(2 * Constants.ELECTRON_MASS * Constants.ELEMENTARY_CHARGE)
            / Constants.HBAR;

    /**
     * Exact transmission of a rectangular barrier for equal masses (textbook quantum mechanics, e.g.
     * D. J. Griffiths, Introduction to Quantum Mechanics, problem on the finite barrier; from memory):
     * T = [1 + V0^2 sinh^2(kappa a) / (4 E (V0 - E))]^-1 below the top, with sin for E &gt; V0.
     */
    static double exactRectangular(double v0, double a, double m, double e) {
        if (e < v0) {
            double kappa = C * Math.sqrt(m * (v0 - e));
            double s = Math.sinh(kappa * a);
            return 1 / (1 + v0 * v0 * s * s / (4 * e * (v0 - e)));
        }
        double k = C * Math.sqrt(m * (e - v0));
        double s = Math.sin(k * a);
        return 1 / (1 + v0 * v0 * s * s / (4 * e * (e - v0)));
    }

    /** The transfer matrix is exact for a piecewise-constant barrier: agreement to 1e-10 relative. */
    @Test
    void transferMatrixEqualsTheRectangularClosedForm() {
        double[][] cases = {{0.5, 2, 0.2}, {1.0, 5, 0.3}, {1.2, 1, 0.22}, {0.3, 10, 0.2}};
        for (double[] c : cases) {
            TunnelBarrier b = TunnelBarrier.rectangular(c[0], c[1] * NM, c[2]);
            // a slab width that cuts the barrier into several slabs: must not matter for a rectangle
            TransferMatrixTransmission tmm = new TransferMatrixTransmission(b, 0.37 * NM);
            for (double f : new double[] {0.01, 0.2, 0.5, 0.9, 0.999, 1.3, 2.5}) {
                double e = f * c[0];
                double exact = exactRectangular(c[0], c[1] * NM, c[2], e);
                assertEquals(exact, tmm.at(e), 1e-10 * exact, "V0 " + c[0] + " eV, a " + c[1] + " nm, E " + e);
            }
        }
    }

    /** Far below the top the barrier is reflected off its abrupt edges; T stays in [0, 1] everywhere. */
    @Test
    void transmissionIsAProbability() {
        TunnelBarrier b = TunnelBarrier.rectangular(1.0, 3 * NM, 0.3);
        Transmission[] ts = {new WkbTransmission(b), new TransferMatrixTransmission(b, 0.05 * NM)};
        for (Transmission t : ts) {
            assertEquals(0, t.at(0), "no propagating state at the lead edge");
            assertEquals(0, t.at(-0.3), "below the lead edge");
            for (double e = 0.005; e < 3; e += 0.0137) {
                double v = t.at(e);
                assertTrue(v >= 0 && v <= 1, t.getClass().getSimpleName() + " T(" + e + ") = " + v);
            }
        }
        assertEquals(1.0, ts[0].at(1.0), 0, "WKB: T = 1 at and above the top");
    }

    /**
     * WKB gives only the exponent: for a thick rectangular barrier, with x = kappa a and P = 16 E
     * (V0 - E) / V0^2, the closed form above expands (sinh^2 x = e^{2x}(1 - 2e^{-2x} + e^{-4x})/4) to
     * exact = P e^{-2x} [1 + (2 - P) e^{-2x} + O(e^{-4x})], so exact / WKB must equal
     * P [1 + (2 - P) e^{-2x}] up to 10 P e^{-4x} (and round-off).
     */
    @Test
    void wkbHasTheExactExponentOfAThickBarrier() {
        double v0 = 1.0;
        double m = 0.3;
        for (double aNm : new double[] {5, 10, 20}) {
            TunnelBarrier b = TunnelBarrier.rectangular(v0, aNm * NM, m);
            WkbTransmission wkb = new WkbTransmission(b);
            for (double e : new double[] {0.1, 0.4, 0.7}) {
                double exact = exactRectangular(v0, aNm * NM, m, e);
                double kappaA = C * Math.sqrt(m * (v0 - e)) * aNm * NM;
                double p = 16 * e * (v0 - e) / (v0 * v0);
                double w = Math.exp(-2 * kappaA);
                assertEquals(p * (1 + (2 - p) * w), exact / wkb.at(e), p * (1e-9 + 10 * w * w),
                        "a " + aNm + " nm, E " + e);
                assertEquals(-2 * kappaA, Math.log(wkb.at(e)), 1e-12 * kappaA, "WKB exponent");
            }
        }
    }

    /**
     * A triangular barrier (uniform field, a Fowler-Nordheim barrier) has no elementary closed form;
     * the transfer matrix with midpoint slabs converges as h^2 (the midpoint rule's order, common
     * practice, no source): halving h divides the change by 4 (within 3 %), and the extrapolated value
     * is reached to 1e-6 at h = 0.005 nm.
     */
    @Test
    void transferMatrixConvergesOnATriangleAsTheSquareOfTheSlabWidth() {
        TunnelBarrier b = TunnelBarrier.triangular(1.0, 3e8, -3, -3, 0.3);
        double e = -0.1;
        double t1 = new TransferMatrixTransmission(b, 0.04 * NM).at(e);
        double t2 = new TransferMatrixTransmission(b, 0.02 * NM).at(e);
        double t3 = new TransferMatrixTransmission(b, 0.01 * NM).at(e);
        double t4 = new TransferMatrixTransmission(b, 0.005 * NM).at(e);
        double r1 = (t1 - t2) / (t2 - t3);
        double r2 = (t2 - t3) / (t3 - t4);
        assertEquals(4, r1, 0.12, "order of convergence");
        assertEquals(4, r2, 0.12, "order of convergence");
        double extrapolated = t4 + (t4 - t3) / 3;
        assertEquals(extrapolated, t4, 1e-6 * extrapolated);
    }

    /**
     * On the triangle, WKB misses only the prefactor of the abrupt step where the barrier starts: the
     * exact matching of a plane wave k onto an evanescent wave kappa0 at a step, followed by a smooth
     * (linear) turning point, gives T = [4 k kappa0 / (k^2 + kappa0^2)] e^{-2 S}, S = int kappa dx
     * (standard step matching, derived from memory for this test). The next order of the
     * semiclassical expansion is O(1/S), so TMM / WKB must be that factor within 0.5 / S (relative);
     * S runs from about 0.8 to 25 over the cases.
     */
    @Test
    void transferMatrixOverWkbIsTheStepFactorOnATriangle() {
        double m = 0.3;
        double phi = 1.0;
        for (double field : new double[] {1e8, 2e8, 3e8, 4e8, 6e8}) {
            TunnelBarrier b = TunnelBarrier.triangular(phi, field, -3, -3, m);
            TransferMatrixTransmission tmm = new TransferMatrixTransmission(b, 0.005 * NM);
            WkbTransmission wkb = new WkbTransmission(b);
            for (double e : new double[] {-0.5, -0.2, 0.0, 0.3, 0.6}) {
                double k2 = e + 3;
                double kappa2 = phi - e;
                double factor = 4 * Math.sqrt(k2 * kappa2) / (k2 + kappa2);
                double s = -0.5 * Math.log(wkb.at(e));
                assertEquals(factor, tmm.at(e) / wkb.at(e), 0.5 / s * factor, "F " + field + " V/m, E " + e + " eV");
            }
        }
    }

    /** A mass step at a boundary enters the transfer matrix through psi'/m: T is symmetric in direction. */
    @Test
    void transferMatrixIsReciprocalWithMassSteps() {
        double[] x = {0, 2 * NM, 2 * NM, 5 * NM};
        double[] u = {1.2, 0.9, 0.6, 0.3};
        double[] m = {0.35, 0, 0.22};
        m[1] = 0.5; // zero-length segment: its mass is never used
        TunnelBarrier forward = TunnelBarrier.of(x, u, m, 0.0, 0.2, -0.4, 0.25);
        double[] xr = {0, 3 * NM, 3 * NM, 5 * NM};
        double[] ur = {0.3, 0.6, 0.9, 1.2};
        double[] mr = {0.22, 0.5, 0.35};
        TunnelBarrier backward = TunnelBarrier.of(xr, ur, mr, -0.4, 0.25, 0.0, 0.2);
        TransferMatrixTransmission a = new TransferMatrixTransmission(forward, 0.01 * NM);
        TransferMatrixTransmission bk = new TransferMatrixTransmission(backward, 0.01 * NM);
        for (double e : new double[] {0.05, 0.4, 0.8, 1.1, 1.5}) {
            assertEquals(a.at(e), bk.at(e), 1e-10 * a.at(e), "time-reversal symmetry at E " + e);
        }
    }

    /** Opaque barriers underflow gracefully: no overflow, no NaN, T agrees with WKB's exponent. */
    @Test
    void opaqueBarrierGivesTinyFiniteTransmission() {
        TunnelBarrier b = TunnelBarrier.rectangular(2.0, 30 * NM, 0.4);
        double t = new TransferMatrixTransmission(b, 0.1 * NM).at(0.5);
        double w = new WkbTransmission(b).at(0.5);
        assertTrue(t > 0 && Double.isFinite(t), "T = " + t);
        assertEquals(Math.log(w) + Math.log(16 * 0.5 * 1.5 / 4.0), Math.log(t), 1e-6 * Math.abs(Math.log(t)));
    }

    @Test
    void badInputIsRefusedWithItsRange() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> TunnelBarrier.of(new double[] {0, 1e-9, 0.5e-9}, new double[] {1, 1, 1},
                        new double[] {0.2, 0.2}, 0, 0.2, 0, 0.2));
        assertTrue(e.getMessage().contains("non-decreasing"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> TunnelBarrier.rectangular(1, 1e-9, 0));
        assertThrows(InvalidParameterException.class, () -> TunnelBarrier.rectangular(Double.NaN, 1e-9, 0.2));
        assertThrows(InvalidParameterException.class,
                () -> new TransferMatrixTransmission(TunnelBarrier.rectangular(1, 1e-9, 0.2), 0));
    }
}
