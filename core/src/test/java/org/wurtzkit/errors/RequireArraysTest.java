package org.wurtzkit.errors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The array and NaN checks of {@link Require} (the one home of argument checks): each failure names
 * parameter, value and allowed range (the library's error convention, common practice, no source).
 */
class RequireArraysTest {

    private static void expect(String parameter, String value, String range, Runnable r) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, r::run);
        assertEquals(parameter, e.parameter());
        assertEquals(value, e.value());
        assertEquals(range, e.allowedRange());
        assertEquals(ErrorKind.INVALID_PARAMETER, e.kind());
    }

    @Test
    void arraysAreCheckedForNullLengthAndFiniteness() {
        expect("diag", "null", "(a non-null array)", () -> Require.nonEmpty("diag", null));
        expect("diag.length", "0", "[1, 2147483647]", () -> Require.nonEmpty("diag", new double[0]));
        assertEquals(3, Require.nonEmpty("diag", new double[3]));
        expect("off.length", "1", "[2, 2]", () -> Require.length("off", new double[1], 2));
        expect("x.length", "2", "[3, 2147483647]", () -> Require.minLength("x", new double[2], 3));
        expect("v[1]", "NaN", "(-Infinity, +Infinity) (finite values only)",
                () -> Require.allFinite("v", new double[] {0, Double.NaN, 1}, 3));
        // only the first n elements are checked
        Require.allFinite("v", new double[] {0, 1, Double.POSITIVE_INFINITY}, 2);
    }

    @Test
    void notNaNAllowsInfinities() {
        assertEquals(Double.NEGATIVE_INFINITY, Require.notNaN("bound", Double.NEGATIVE_INFINITY));
        expect("bound", "NaN", "[-Infinity, +Infinity] (not NaN)", () -> Require.notNaN("bound", Double.NaN));
    }

    @Test
    void bothRootsAnswerTheirKind() {
        WurtzkitError a = Require.invalid("k", 0, "[1, 5]");
        assertEquals("k = 0 is outside the allowed range [1, 5]", a.getMessage());
        WurtzkitError b = new WurtzkitException(ErrorKind.NOT_CONVERGED, "budget spent");
        assertSame(ErrorKind.NOT_CONVERGED, b.kind());
    }
}
