package org.wurtzkit.errors;

import java.util.List;

/**
 * Argument checks that throw {@link InvalidParameterException} with the parameter, the value and
 * the allowed range in the message. Nothing is ever clamped.
 */
public final class Require {
    private Require() {
    }

    /**
     * @param name  parameter name
     * @param value value to check
     * @return value, if finite
     */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new InvalidParameterException(name, Double.toString(value), "(finite)");
        }
        return value;
    }

    /**
     * @param name  parameter name
     * @param value value to check
     * @return value, if finite and strictly positive
     */
    public static double positive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new InvalidParameterException(name, Double.toString(value), "(0, +inf), finite");
        }
        return value;
    }

    /**
     * @param name  parameter name
     * @param value value to check
     * @return value, if finite and not negative
     */
    public static double nonNegative(String name, double value) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new InvalidParameterException(name, Double.toString(value), "[0, +inf), finite");
        }
        return value;
    }

    /**
     * Closed-interval check.
     *
     * @param name  parameter name
     * @param value value to check
     * @param min   smallest allowed value
     * @param max   largest allowed value
     * @return value, if in [min, max]
     */
    public static double inRange(String name, double value, double min, double max) {
        if (!(value >= min && value <= max)) {
            throw new InvalidParameterException(name, Double.toString(value),
                    "[" + fmt(min) + ", " + fmt(max) + "]");
        }
        return value;
    }

    /**
     * Integer closed-interval check.
     *
     * @param name  parameter name
     * @param value value to check
     * @param min   smallest allowed value
     * @param max   largest allowed value
     * @return value, if in [min, max]
     */
    public static int inRange(String name, int value, int min, int max) {
        if (value < min || value > max) {
            throw new InvalidParameterException(name, Integer.toString(value), "[" + min + ", " + max + "]");
        }
        return value;
    }

    /**
     * @param name  parameter name
     * @param value reference to check
     * @param <T>   type
     * @return value, if not null
     */
    public static <T> T nonNull(String name, T value) {
        if (value == null) {
            throw new InvalidParameterException(name, "null", "(non-null)");
        }
        return value;
    }

    /**
     * An unmodifiable copy of a list that must be non-null and hold no null element.
     *
     * @param name  parameter name, e.g. "dopants of layer \"barrier\""
     * @param value the list
     * @param <T>   element type
     * @return an unmodifiable copy
     * @throws InvalidParameterException naming the list, or the index of its first null element
     */
    public static <T> List<T> nonNullElements(String name, List<T> value) {
        nonNull(name, value);
        for (int i = 0; i < value.size(); i++) {
            if (value.get(i) == null) {
                throw invalid(name + "[" + i + "]", "null", "(non-null)");
            }
        }
        return List.copyOf(value);
    }

    /**
     * The exception for a value outside its allowed range, for checks that have no helper here;
     * throw what it returns.
     *
     * @param name  parameter name
     * @param value the offending value (its {@code String.valueOf} is shown)
     * @param range the allowed range, as text
     * @return the exception, naming parameter, value and range
     */
    public static InvalidParameterException invalid(String name, Object value, String range) {
        return new InvalidParameterException(name, String.valueOf(value), range);
    }

    /**
     * @param name  parameter name
     * @param value value to check (infinities allowed)
     * @return value, if not NaN
     */
    public static double notNaN(String name, double value) {
        if (Double.isNaN(value)) {
            throw invalid(name, value, "[-Infinity, +Infinity] (not NaN)");
        }
        return value;
    }

    /**
     * @param name  array name
     * @param array array to check
     * @return its length, if the array is non-null and has at least one element
     */
    public static int nonEmpty(String name, double[] array) {
        if (array == null) {
            throw invalid(name, "null", "(a non-null array)");
        }
        if (array.length < 1) {
            throw invalid(name + ".length", 0, "[1, " + Integer.MAX_VALUE + "]");
        }
        return array.length;
    }

    /**
     * @param name     array name
     * @param array    array to check
     * @param expected required length
     */
    public static void length(String name, double[] array, int expected) {
        if (array == null) {
            throw invalid(name, "null", "(a non-null array)");
        }
        if (array.length != expected) {
            throw invalid(name + ".length", array.length, "[" + expected + ", " + expected + "]");
        }
    }

    /**
     * @param name  array name
     * @param array array to check
     * @param min   smallest allowed length
     */
    public static void minLength(String name, double[] array, int min) {
        if (array == null) {
            throw invalid(name, "null", "(a non-null array)");
        }
        if (array.length < min) {
            throw invalid(name + ".length", array.length, "[" + min + ", " + Integer.MAX_VALUE + "]");
        }
    }

    /**
     * Requires every element of {@code array[0..n-1]} to be finite.
     *
     * @param name  array name
     * @param array array to check (at least n long)
     * @param n     number of leading elements to check
     */
    public static void allFinite(String name, double[] array, int n) {
        for (int i = 0; i < n; i++) {
            double v = array[i];
            if (!Double.isFinite(v)) {
                throw invalid(name + "[" + i + "]", v, "(-Infinity, +Infinity) (finite values only)");
            }
        }
    }

    private static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
