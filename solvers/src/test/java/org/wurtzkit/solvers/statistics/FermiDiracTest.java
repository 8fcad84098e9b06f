package org.wurtzkit.solvers.statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** Checks of {@link FermiDirac#f12(double)} and {@link FermiDirac#fm12(double)}. */
class FermiDiracTest {

    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private static double relErr(double actual, double expected) {
        return Math.abs(actual - expected) / Math.abs(expected);
    }

    // ---------------------------------------------------------------------------------------
    // 1. Against Apache Commons Math 3.6.1 adaptive Gauss-Legendre quadrature of the defining
    //    integrals (Blakemore, Solid-State Electron. 25, 1067 (1982)); see FermiDiracQuadrature.
    //    The quadrature itself agrees with 30-digit mpmath polylog values to 4e-15 on [-50, 60]
    //    (checked while writing this test), so 1e-12 is a meaningful bound.
    // ---------------------------------------------------------------------------------------

    @Property(tries = 600)
    void f12MatchesQuadrature(@ForAll @DoubleRange(min = -50.0, max = 60.0) double eta) {
        double reference = FermiDiracQuadrature.f12(eta);
        assertTrue(relErr(FermiDirac.f12(eta), reference) <= 1e-12,
                () -> "eta=" + eta + " f12=" + FermiDirac.f12(eta) + " quadrature=" + reference);
    }

    @Property(tries = 600)
    void fm12MatchesQuadrature(@ForAll @DoubleRange(min = -50.0, max = 60.0) double eta) {
        double reference = FermiDiracQuadrature.fm12(eta);
        assertTrue(relErr(FermiDirac.fm12(eta), reference) <= 1e-12,
                () -> "eta=" + eta + " fm12=" + FermiDirac.fm12(eta) + " quadrature=" + reference);
    }

    /** Both sides of every piece boundary of the approximation (-2, 0, 2, 5, 10, 20, 40). */
    @Test
    void pieceBoundariesMatchQuadrature() {
        double[] boundaries = {-2.0, 0.0, 2.0, 5.0, 10.0, 20.0, 40.0};
        for (double b : boundaries) {
            for (double eta : new double[] {Math.nextDown(b), b, Math.nextUp(b)}) {
                assertTrue(relErr(FermiDirac.f12(eta), FermiDiracQuadrature.f12(eta)) <= 1e-12, "f12 at " + eta);
                assertTrue(relErr(FermiDirac.fm12(eta), FermiDiracQuadrature.fm12(eta)) <= 1e-12, "fm12 at " + eta);
            }
        }
    }

    // ---------------------------------------------------------------------------------------
    // 2. Check table in test resources reference/fermi-dirac-half.csv (computed with mpmath
    //    polylog, 30 digits; normalisation of J. S. Blakemore, Solid-State Electron. 25, 1067
    //    (1982); tables also in M. Goano, Solid-State Electron. 36, 217 (1993)), printed to 7-8
    //    significant digits. The printed digits limit the comparison: each value is asserted to
    //    half a unit of its last printed digit (relative 5e-10 .. 7e-8), the best those values
    //    support.
    // ---------------------------------------------------------------------------------------

    @ParameterizedTest(name = "F_1/2({0}) = {1}")
    @CsvFileSource(resources = "/reference/fermi-dirac-half.csv")
    void publishedCheckTable(double eta, String printedText) {
        BigDecimal printed = new BigDecimal(printedText);
        double halfLastDigit = 0.5 * printed.ulp().doubleValue();
        double value = FermiDirac.f12(eta);
        assertEquals(printed.doubleValue(), value, halfLastDigit * (1 + 1e-9), "F_1/2(" + eta + ")");
    }

    // ---------------------------------------------------------------------------------------
    // 3. Twenty-digit values computed for this test with mpmath 1.3.0 (general-purpose
    //    arbitrary-precision library), 30 working digits: F_1/2(eta) = -Re Li_{3/2}(-e^eta),
    //    F_-1/2(eta) = -Re Li_{1/2}(-e^eta) (Blakemore 1982 normalisation). Covers the
    //    non-degenerate tail and the asymptotic region up to eta = 1e6.
    // ---------------------------------------------------------------------------------------

    private static final double[][] MPMATH_VALUES = {
        {-700, 9.8596765437597708567e-305, 9.8596765437597708567e-305},
        {-200, 1.3838965267367375306e-87, 1.3838965267367375306e-87},
        {-50, 1.928749847963917783e-22, 1.928749847963917783e-22},
        {-10, 4.5399201052641327548e-5, 4.5398472360805495324e-5},
        {-5, 6.7219543145059127078e-3, 6.7060199892682091278e-3},
        {-2, 1.2929851332007559106e-1, 1.2366562180120994266e-1},
        {-1, 3.2779515926071154772e-1, 2.9402761761145122022e-1},
        {-0.5, 5.0753710355463783614e-1, 4.3123144192639708687e-1},
        {0, 7.6514702462540794537e-1, 6.0489864342163037025e-1},
        {0.5, 1.1173314873128224008, 8.0774596957990475882e-1},
        {1, 1.5756407761513002308, 1.027057125474350689},
        {2, 2.8237212774015841337, 1.4642945890876291203},
        {3, 4.4875474213517089443, 1.853485088601517738},
        {4.5, 7.6420312757934553297, 2.3342457661422442488},
        {5, 8.8442088952429538939, 2.4729876224829440227},
        {7.5, 1.579628990218740283e+1, 3.0651707101368528291},
        {10, 2.4084656964637653615e+1, 3.5527792395366171601},
        {15, 4.3942522487722176138e+1, 4.3620391319208860426},
        {20, 6.7491512221658920486e+1, 5.0410185075353286025},
        {30, 1.2377734775009833128e+2, 6.1775494458220960454},
        {40, 1.9045339037568929464e+2, 7.1346572335507647305},
        {50, 2.6609281252136259343e+2, 7.9775308585818699601},
        {100, 7.5234559155219611884e+2, 1.1283327442927680603e+1},
        {1000, 2.3788350896394340905e+4, 3.5682467649159369622e+1},
        {10000, 7.522527873442217908e+5, 1.1283791624552390428e+2},
        {1000000, 7.5225277806460310393e+8, 1.1283791670950485466e+3},
    };

    @Test
    void mpmathTwentyDigitValues() {
        for (double[] row : MPMATH_VALUES) {
            double eta = row[0];
            assertTrue(relErr(FermiDirac.f12(eta), row[1]) <= 1e-14, "F_1/2(" + eta + ") = " + FermiDirac.f12(eta));
            assertTrue(relErr(FermiDirac.fm12(eta), row[2]) <= 1e-14, "F_-1/2(" + eta + ") = " + FermiDirac.fm12(eta));
        }
    }

    // ---------------------------------------------------------------------------------------
    // 4. Exact identities and limits.
    // ---------------------------------------------------------------------------------------

    /**
     * dF_1/2/deta = F_-1/2 (Blakemore 1982): fourth-order central difference (Richardson
     * extrapolation of two central differences, h = 1e-2 and 5e-3; truncation error ~1e-11,
     * rounding ~1e-13 relative).
     */
    @Property(tries = 400)
    void derivativeOfF12IsFm12(@ForAll @DoubleRange(min = -40.0, max = 200.0) double eta) {
        double h = 1e-2;
        double d1 = (FermiDirac.f12(eta + h) - FermiDirac.f12(eta - h)) / (2 * h);
        double d2 = (FermiDirac.f12(eta + h / 2) - FermiDirac.f12(eta - h / 2)) / h;
        double richardson = (4 * d2 - d1) / 3;
        assertTrue(relErr(richardson, FermiDirac.fm12(eta)) <= 1e-9,
                () -> "eta=" + eta + " difference=" + richardson + " fm12=" + FermiDirac.fm12(eta));
    }

    /**
     * For eta &lt; 0, F_j(eta) = -Li_{j+1}(-e^eta) = sum_{n&ge;1} (-1)^(n+1) e^(n eta) / n^(j+1),
     * the alternating series of Blakemore (1982) (also J. McDougall and E. C. Stoner, Phil. Trans.
     * R. Soc. A 237, 67 (1938), from memory). Summed here to full double precision.
     */
    @Property(tries = 400)
    void negativeEtaMatchesAlternatingSeries(@ForAll @DoubleRange(min = -60.0, max = -0.5) double eta) {
        double z = Math.exp(eta);
        double sumHalf = 0;
        double sumMinusHalf = 0;
        double zn = z;
        for (int n = 1; n < 200 && zn > 1e-40 * z; n++) {
            double sign = (n % 2 == 1) ? 1.0 : -1.0;
            sumHalf += sign * zn / (n * Math.sqrt(n));
            sumMinusHalf += sign * zn / Math.sqrt(n);
            zn *= z;
        }
        assertTrue(relErr(FermiDirac.f12(eta), sumHalf) <= 1e-14, "f12 at " + eta);
        assertTrue(relErr(FermiDirac.fm12(eta), sumMinusHalf) <= 1e-14, "fm12 at " + eta);
    }

    /**
     * Non-degenerate limit F_j(eta) -&gt; e^eta for eta -&gt; -infinity (Blakemore 1982). For eta
     * &le; -37 the next series term is below 3e-17 relative, so the ratio must be 1 to rounding.
     */
    @Property(tries = 300)
    void nonDegenerateLimit(@ForAll @DoubleRange(min = -700.0, max = -37.0) double eta) {
        double z = Math.exp(eta);
        assertTrue(relErr(FermiDirac.f12(eta), z) <= 1e-15, "f12 at " + eta);
        assertTrue(relErr(FermiDirac.fm12(eta), z) <= 1e-15, "fm12 at " + eta);
    }

    /** Where e^eta underflows, so do the integrals; -infinity gives 0 and +infinity gives +infinity. */
    @Test
    void extremeArguments() {
        assertEquals(0.0, FermiDirac.f12(-800.0));
        assertEquals(0.0, FermiDirac.fm12(-800.0));
        assertEquals(0.0, FermiDirac.f12(Double.NEGATIVE_INFINITY));
        assertEquals(Double.POSITIVE_INFINITY, FermiDirac.f12(Double.POSITIVE_INFINITY));
        assertEquals(Double.POSITIVE_INFINITY, FermiDirac.fm12(Double.POSITIVE_INFINITY));
    }

    /**
     * Sommerfeld asymptotic expansion (A. Sommerfeld, Z. Phys. 47, 1 (1928); for F_1/2 in
     * Blakemore 1982): F_j(eta) = eta^(j+1)/Gamma(j+2) [1 + sum_n 2 (1 - 2^(1-2n)) zeta(2n)
     * (j+1) j ... (j+2-2n) eta^(-2n)] + O(e^-eta). With five terms and eta &ge; 100 the truncation
     * is below 2e-16 relative.
     */
    @Property(tries = 300)
    void degenerateRegionMatchesSommerfeldSeries(@ForAll @DoubleRange(min = 100.0, max = 1.0e6) double eta) {
        assertTrue(relErr(FermiDirac.f12(eta), sommerfeld(0.5, eta)) <= 1e-14, "f12 at " + eta);
        assertTrue(relErr(FermiDirac.fm12(eta), sommerfeld(-0.5, eta)) <= 1e-14, "fm12 at " + eta);
    }

    /** Degenerate limit F_1/2 -&gt; (4/(3 sqrt(pi))) eta^(3/2) (Blakemore 1982), leading term only. */
    @Test
    void degenerateLimitLeadingTerm() {
        double previous = Double.POSITIVE_INFINITY;
        for (double eta : new double[] {1e2, 1e3, 1e4, 1e5, 1e6}) {
            double ratio = FermiDirac.f12(eta) / (4.0 / (3.0 * SQRT_PI) * eta * Math.sqrt(eta));
            double excess = ratio - 1.0;
            assertTrue(excess > 0 && excess < previous, "ratio at " + eta + " = " + ratio);
            assertTrue(excess <= 1.3 / (eta * eta) + 1e-15, "ratio at " + eta + " = " + ratio);
            previous = excess;
        }
    }

    private static double sommerfeld(double j, double eta) {
        // zeta(2), zeta(4), ..., zeta(10) in closed form (Euler).
        double p2 = Math.PI * Math.PI;
        double[] zeta = {p2 / 6, p2 * p2 / 90, p2 * p2 * p2 / 945, p2 * p2 * p2 * p2 / 9450,
            p2 * p2 * p2 * p2 * p2 / 93555};
        double sum = 1.0;
        double falling = 1.0;
        double power = 1.0;
        for (int n = 1; n <= 5; n++) {
            falling *= (j + 1 - (2 * n - 2)) * (j + 1 - (2 * n - 1));
            power /= eta * eta;
            sum += 2 * (1 - Math.pow(2, 1 - 2 * n)) * zeta[n - 1] * falling * power;
        }
        double gammaJPlus2 = (j == 0.5) ? 0.75 * SQRT_PI : 0.5 * SQRT_PI;
        return Math.pow(eta, j + 1) / gammaJPlus2 * sum;
    }

    // ---------------------------------------------------------------------------------------
    // 5. Bad input.
    // ---------------------------------------------------------------------------------------

    @Test
    void nanIsRejectedWithParameterName() {
        IllegalArgumentException e1 = assertThrows(IllegalArgumentException.class, () -> FermiDirac.f12(Double.NaN));
        assertTrue(e1.getMessage().contains("eta") && e1.getMessage().contains("NaN"), e1.getMessage());
        IllegalArgumentException e2 = assertThrows(IllegalArgumentException.class, () -> FermiDirac.fm12(Double.NaN));
        assertTrue(e2.getMessage().contains("eta") && e2.getMessage().contains("NaN"), e2.getMessage());
    }
}
