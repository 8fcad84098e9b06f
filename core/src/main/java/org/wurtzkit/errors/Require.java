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
                throw new InvalidParameterException(name + "[" + i + "]", "null", "(non-null)");
            }
        }
        return List.copyOf(value);
    }

    private static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
