package org.wurtzkit.solvers.workflow;

import java.util.Arrays;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * The gate biases of a sweep, in the order they are solved: at least two, finite, strictly
 * increasing or strictly decreasing. Immutable.
 */
public final class BiasGrid {
    private final double[] values;

    private BiasGrid(double[] values) {
        Require.nonNull("gate biases", values);
        if (values.length < 2) {
            throw new InvalidParameterException("number of gate biases", Integer.toString(values.length),
                    "[2, ...) (a sweep needs two points at least)");
        }
        for (int i = 0; i < values.length; i++) {
            Require.finite("gate bias [" + i + "] (V)", values[i]);
        }
        boolean up = values[1] > values[0];
        for (int i = 1; i < values.length; i++) {
            boolean ok = up ? values[i] > values[i - 1] : values[i] < values[i - 1];
            if (!ok) {
                throw new InvalidParameterException("gate bias [" + i + "] (V)", Double.toString(values[i]),
                        (up ? "(" + values[i - 1] + ", +inf)" : "(-inf, " + values[i - 1] + ")")
                                + " (biases must be strictly monotonic)");
            }
        }
        this.values = values;
    }

    /**
     * @param biasesV the biases (V), in solving order
     * @return the grid
     */
    public static BiasGrid of(double... biasesV) {
        return new BiasGrid(Require.nonNull("gate biases", biasesV).clone());
    }

    /**
     * Equally spaced biases from {@code fromV} to {@code toV}, both included; the sweep runs in that
     * order (from may be above to). Each bias is the double nearest to the decimal value
     * from + (to - from) i / (points - 1), taken from the shortest decimal forms of from and to, so
     * {@code linear(0, 1, 11)} holds 0.3, not 0.30000000000000004.
     *
     * @param fromV  first bias (V), finite
     * @param toV    last bias (V), finite, different from fromV
     * @param points number of biases, &ge; 2
     * @return the grid
     */
    public static BiasGrid linear(double fromV, double toV, int points) {
        Require.finite("first gate bias (V)", fromV);
        Require.finite("last gate bias (V)", toV);
        Require.inRange("number of gate biases", points, 2, 1_000_000);
        if (fromV == toV) {
            throw new InvalidParameterException("last gate bias (V)", Double.toString(toV),
                    "any finite value other than the first bias " + fromV + " (empty bias range)");
        }
        return new BiasGrid(Grids.linear(fromV, toV, points));
    }

    /** {@return the biases (V), a copy} */
    public double[] values() {
        return values.clone();
    }

    /** {@return number of biases} */
    public int size() {
        return values.length;
    }

    /**
     * @param i index
     * @return bias i (V)
     */
    public double get(int i) {
        return values[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof BiasGrid g && Arrays.equals(g.values, values);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(values);
    }

    /** @return e.g. {@code "BiasGrid[11 gate biases: 0, 0.1, 0.2, ..., 1 V]"}, all biases when there are at most 8 */
    @Override
    public String toString() {
        return "BiasGrid[" + values.length + " gate biases: " + Grids.list(values, "V") + "]";
    }
}
