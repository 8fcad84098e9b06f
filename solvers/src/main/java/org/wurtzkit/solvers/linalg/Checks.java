package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * Argument checks shared by this package. Every failure is an {@link IllegalArgumentException}
 * whose message names the parameter, the offending value and the allowed range, in the form
 * {@code "k = 0 is outside the allowed range [1, 500]"}.
 */
final class Checks {

    private Checks() {
    }

    /** Builds the standard message {@code "name = value is outside the allowed range range"}. */
    static IllegalArgumentException outside(String name, Object value, String range) {
        return new InvalidParameterException(name, String.valueOf(value), range);
    }

    /** Requires {@code min <= value <= max}. */
    static int intInRange(String name, int value, int min, int max) {
        if (value < min || value > max) {
            throw outside(name, value, "[" + min + ", " + max + "]");
        }
        return value;
    }

    /** Requires a non-null array of exactly {@code expected} elements. */
    static void length(String name, double[] array, int expected) {
        if (array == null) {
            throw outside(name, "null", "(a non-null array)");
        }
        if (array.length != expected) {
            throw outside(name + ".length", array.length, "[" + expected + ", " + expected + "]");
        }
    }

    /** Requires a non-null array of at least {@code min} elements. */
    static void minLength(String name, double[] array, int min) {
        if (array == null) {
            throw outside(name, "null", "(a non-null array)");
        }
        if (array.length < min) {
            throw outside(name + ".length", array.length, "[" + min + ", " + Integer.MAX_VALUE + "]");
        }
    }

    /** Requires every element of {@code array[0..n-1]} to be finite. */
    static void finite(String name, double[] array, int n) {
        for (int i = 0; i < n; i++) {
            double v = array[i];
            if (!(v - v == 0.0)) { // false for NaN and +-Infinity
                throw outside(name + "[" + i + "]", v, "(-Infinity, +Infinity) (finite values only)");
            }
        }
    }

    /** Requires a non-NaN value (infinities allowed). */
    static double notNaN(String name, double value) {
        if (Double.isNaN(value)) {
            throw outside(name, value, "[-Infinity, +Infinity] (not NaN)");
        }
        return value;
    }

    /** Requires a finite value. */
    static double finite(String name, double value) {
        if (!(value - value == 0.0)) {
            throw outside(name, value, "(-Infinity, +Infinity) (finite values only)");
        }
        return value;
    }
}
