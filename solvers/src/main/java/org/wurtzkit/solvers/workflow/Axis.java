package org.wurtzkit.solvers.workflow;

import java.util.Arrays;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * One axis of a design map: a named structure parameter, its unit and the values it takes.
 * Immutable.
 */
public final class Axis {
    private final Column column;
    private final double[] values;

    private Axis(Column column, double[] values) {
        this.column = column;
        Require.nonNull("values of axis " + column.name(), values);
        if (values.length == 0) {
            throw new InvalidParameterException("number of values of axis " + column.name(), "0", "[1, ...)");
        }
        for (int i = 0; i < values.length; i++) {
            Require.finite("value [" + i + "] of axis " + column.name(), values[i]);
        }
        this.values = values;
    }

    /**
     * @param name   the parameter's name, e.g. "barrier_thickness"
     * @param unit   its unit, e.g. "nm" ("" for dimensionless)
     * @param values the values, at least one, finite (any order; repeats allowed)
     * @return the axis
     */
    public static Axis of(String name, String unit, double... values) {
        return new Axis(Column.of(name, unit), Require.nonNull("axis values", values).clone());
    }

    /**
     * @param name   parameter name
     * @param unit   unit
     * @param from   first value, finite
     * @param to     last value, finite
     * @param points number of equally spaced values, &ge; 1 (1 gives just {@code from}); each is the
     *               double nearest to the decimal value from + (to - from) i / (points - 1), so
     *               that, e.g., 0.3 is 0.3 and not 0.30000000000000004
     * @return the axis
     */
    public static Axis linear(String name, String unit, double from, double to, int points) {
        Require.finite("first value of axis " + name, from);
        Require.finite("last value of axis " + name, to);
        Require.inRange("number of values of axis " + name, points, 1, 1_000_000);
        double[] v = points == 1 ? new double[] {from} : Grids.linear(from, to, points);
        return new Axis(Column.of(name, unit), v);
    }

    /** {@return the axis as a table column} */
    public Column column() {
        return column;
    }

    /** {@return the parameter's name} */
    public String name() {
        return column.name();
    }

    /** {@return its unit} */
    public String unit() {
        return column.unit();
    }

    /** {@return the values (a copy)} */
    public double[] values() {
        return values.clone();
    }

    /** {@return number of values} */
    public int size() {
        return values.length;
    }

    /**
     * @param i index
     * @return value i
     */
    public double get(int i) {
        return values[i];
    }

    /** @return e.g. {@code "Axis[al_fraction: 0.2, 0.25, 0.3]"}, all values when there are at most 8 */
    @Override
    public String toString() {
        return "Axis[" + column.name() + ": " + Grids.list(values, column.unit()) + "]";
    }
}
