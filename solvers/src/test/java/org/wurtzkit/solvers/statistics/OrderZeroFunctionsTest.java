package org.wurtzkit.solvers.statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/** Checks of {@link FermiDirac#log1pExp(double)} (F_0) and {@link FermiDirac#logistic(double)}. */
class OrderZeroFunctionsTest {

    /** Exact identity ln(1 + e^x) - ln(1 + e^-x) = x (common practice, no source). */
    @Property(tries = 1000)
    void log1pExpReflection(@ForAll @DoubleRange(min = -700.0, max = 700.0) double x) {
        double difference = FermiDirac.log1pExp(x) - FermiDirac.log1pExp(-x);
        assertEquals(x, difference, 4e-16 * Math.max(1.0, Math.abs(x)));
    }

    /**
     * Closed form of the order-0 Fermi-Dirac integral, F_0(x) = ln(1 + e^x) = -Li_1(-e^x); in
     * the moderate range the naive formula is itself accurate to a few ulp.
     */
    @Property(tries = 1000)
    void log1pExpMatchesNaiveFormulaInModerateRange(@ForAll @DoubleRange(min = -30.0, max = 30.0) double x) {
        double naive = Math.log1p(Math.exp(x));
        assertEquals(naive, FermiDirac.log1pExp(x), 1e-15 * naive);
    }

    /** No overflow at large x, no loss at very negative x (where ln(1 + z) = z - z^2/2 + ...). */
    @Test
    void log1pExpExtremes() {
        assertEquals(800.0, FermiDirac.log1pExp(800.0));
        assertEquals(1e6, FermiDirac.log1pExp(1e6));
        double z = Math.exp(-40.0);
        assertEquals(z - z * z / 2, FermiDirac.log1pExp(-40.0), 1e-16 * z);
        double z2 = Math.exp(-700.0);
        assertEquals(z2, FermiDirac.log1pExp(-700.0), 1e-15 * z2);
        assertEquals(Math.log(2.0), FermiDirac.log1pExp(0.0), 1e-16);
        assertEquals(0.0, FermiDirac.log1pExp(Double.NEGATIVE_INFINITY));
        assertEquals(Double.POSITIVE_INFINITY, FermiDirac.log1pExp(Double.POSITIVE_INFINITY));
    }

    /** d/dx ln(1 + e^x) = logistic(x): Richardson-extrapolated central difference. */
    @Property(tries = 500)
    void logisticIsDerivativeOfLog1pExp(@ForAll @DoubleRange(min = -30.0, max = 30.0) double x) {
        double h = 1e-2;
        double d1 = (FermiDirac.log1pExp(x + h) - FermiDirac.log1pExp(x - h)) / (2 * h);
        double d2 = (FermiDirac.log1pExp(x + h / 2) - FermiDirac.log1pExp(x - h / 2)) / h;
        double richardson = (4 * d2 - d1) / 3;
        double expected = FermiDirac.logistic(x);
        assertEquals(expected, richardson, 1e-9 * expected);
    }

    /** logistic(x) + logistic(-x) = 1 and logistic(x) = exp(x - ln(1 + e^x)) (exact identities). */
    @Property(tries = 1000)
    void logisticIdentities(@ForAll @DoubleRange(min = -700.0, max = 700.0) double x) {
        double s = FermiDirac.logistic(x);
        assertEquals(1.0, s + FermiDirac.logistic(-x), 2.3e-16);
        double viaLog = Math.exp(x - FermiDirac.log1pExp(x));
        assertEquals(viaLog, s, 1e-12 * viaLog);
    }

    @Test
    void logisticExtremes() {
        assertEquals(1.0, FermiDirac.logistic(800.0));
        assertEquals(0.0, FermiDirac.logistic(-800.0));
        assertEquals(0.5, FermiDirac.logistic(0.0));
        double z = Math.exp(-700.0);
        assertEquals(z, FermiDirac.logistic(-700.0), 1e-15 * z);
        assertEquals(1.0, FermiDirac.logistic(Double.POSITIVE_INFINITY));
        assertEquals(0.0, FermiDirac.logistic(Double.NEGATIVE_INFINITY));
    }

    @Test
    void nanIsRejected() {
        IllegalArgumentException e1 = assertThrows(IllegalArgumentException.class,
                () -> FermiDirac.log1pExp(Double.NaN));
        assertTrue(e1.getMessage().contains("eta") && e1.getMessage().contains("NaN"), e1.getMessage());
        IllegalArgumentException e2 = assertThrows(IllegalArgumentException.class,
                () -> FermiDirac.logistic(Double.NaN));
        assertTrue(e2.getMessage().contains("eta") && e2.getMessage().contains("NaN"), e2.getMessage());
    }
}
