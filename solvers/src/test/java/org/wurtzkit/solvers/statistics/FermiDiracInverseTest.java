package org.wurtzkit.solvers.statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/** Checks of {@link FermiDirac#f12Inverse(double)}. */
class FermiDiracInverseTest {

    /** Round trip y -&gt; eta -&gt; F_1/2(eta) over 500 decades of y: 1e-12 relative in F. */
    @Property(tries = 2000)
    void roundTripInY(@ForAll @DoubleRange(min = -250.0, max = 250.0) double log10y) {
        double y = Math.pow(10.0, log10y);
        double eta = FermiDirac.f12Inverse(y);
        double back = FermiDirac.f12(eta);
        assertTrue(Math.abs(back - y) <= 1e-12 * y, () -> "y=" + y + " eta=" + eta + " F(eta)=" + back);
    }

    /** Round trip eta -&gt; F_1/2 -&gt; eta, in the range a device simulation visits. */
    @Property(tries = 2000)
    void roundTripInEta(@ForAll @DoubleRange(min = -700.0, max = 1.0e5) double eta) {
        double again = FermiDirac.f12Inverse(FermiDirac.f12(eta));
        assertTrue(Math.abs(again - eta) <= 1e-12 * Math.max(1.0, Math.abs(eta)),
                () -> "eta=" + eta + " inverse=" + again);
    }

    /**
     * Published check values: the inverse of the table in test resource
     * {@code reference/fermi-dirac-half.csv} (computed, mpmath polylog) and the Joyce-Dixon regime, where eta = ln y + y/2^(3/2) + O(y^2) (Joyce &amp;
     * Dixon, Appl. Phys. Lett. 31, 354 (1977), A1 = 2^(-3/2) exact).
     */
    @Test
    void knownPoints() {
        // F_1/2(0) = (1 - 2^(-1/2)) zeta(3/2) = 0.76514702462540794537 (mpmath, 30 digits).
        assertEquals(0.0, FermiDirac.f12Inverse(0.76514702462540794537), 1e-15);
        // F_1/2(10) = 24.084656964637653615, F_1/2(-5) = 6.7219543145059127078e-3 (mpmath).
        assertEquals(10.0, FermiDirac.f12Inverse(24.084656964637653615), 1e-14);
        assertEquals(-5.0, FermiDirac.f12Inverse(6.7219543145059127078e-3), 1e-14);
        double y = 1e-10;
        assertEquals(Math.log(y) + y / Math.pow(2, 1.5), FermiDirac.f12Inverse(y), 1e-14);
    }

    @Test
    void rangeEnds() {
        double lo = FermiDirac.F12_INVERSE_MIN;
        assertEquals(lo, FermiDirac.f12(FermiDirac.f12Inverse(lo)), 1e-12 * lo);
        double hi = FermiDirac.F12_INVERSE_MAX;
        assertEquals(hi, FermiDirac.f12(FermiDirac.f12Inverse(hi)), 1e-12 * hi);
    }

    @Test
    void badInputIsRejected() {
        for (double y : new double[] {0.0, -1.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, 1e301,
            Double.MIN_VALUE}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> FermiDirac.f12Inverse(y), "y = " + y);
            assertTrue(e.getMessage().startsWith("y = ") && e.getMessage().contains(Double.toString(y)),
                    e.getMessage());
        }
    }
}
