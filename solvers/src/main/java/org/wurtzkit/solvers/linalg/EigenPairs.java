package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.Require;

import java.util.Arrays;

/**
 * Immutable set of eigenpairs {@code (lambda_i, v_i)} of a real symmetric matrix, eigenvalues in
 * ascending order, eigenvectors of unit Euclidean norm. Accessors return copies; nothing of the
 * internal state can be changed from outside.
 *
 * <p>Sign convention of the solvers in this package: the component of largest magnitude of each
 * eigenvector (the first one, on ties) is positive.
 */
public final class EigenPairs {

    private final double[] values;
    private final double[][] vectors;
    private final int dimension;

    /** Takes ownership of the arrays (no copy); callers in this package guarantee validity. */
    EigenPairs(double[] values, double[][] vectors, int dimension) {
        this.values = values;
        this.vectors = vectors;
        this.dimension = dimension;
    }

    /**
     * Creates an instance from copies of the given arrays.
     *
     * @param values  eigenvalues, finite, in ascending (non-decreasing) order
     * @param vectors one vector per eigenvalue, all of the same length {@code dimension >= 1}
     *                (may be empty together with {@code values}, then {@code dimension} is 0)
     * @return the eigenpairs
     * @throws IllegalArgumentException if the arrays are null, have inconsistent lengths, hold
     *                                  non-finite values or the eigenvalues are not ascending
     */
    public static EigenPairs of(double[] values, double[][] vectors) {
        if (values == null) {
            throw Require.invalid("values", "null", "(a non-null array)");
        }
        if (vectors == null) {
            throw Require.invalid("vectors", "null", "(a non-null array)");
        }
        int k = values.length;
        if (vectors.length != k) {
            throw Require.invalid("vectors.length", vectors.length, "[" + k + ", " + k + "] (one vector per value)");
        }
        Require.allFinite("values", values, k);
        for (int i = 1; i < k; i++) {
            if (values[i] < values[i - 1]) {
                throw Require.invalid("values[" + i + "]", values[i],
                        "[" + values[i - 1] + ", +Infinity) (ascending order)");
            }
        }
        int dim = k == 0 ? 0 : -1;
        double[][] copy = new double[k][];
        for (int i = 0; i < k; i++) {
            double[] v = vectors[i];
            if (v == null) {
                throw Require.invalid("vectors[" + i + "]", "null", "(a non-null array)");
            }
            if (dim < 0) {
                dim = v.length;
                if (dim < 1) {
                    throw Require.invalid("vectors[0].length", 0, "[1, " + Integer.MAX_VALUE + "]");
                }
            } else if (v.length != dim) {
                throw Require.invalid("vectors[" + i + "].length", v.length, "[" + dim + ", " + dim + "]");
            }
            Require.allFinite("vectors[" + i + "]", v, dim);
            copy[i] = v.clone();
        }
        return new EigenPairs(values.clone(), copy, dim);
    }

    /**
     * Number of eigenpairs held.
     *
     * @return size, possibly 0
     */
    public int size() {
        return values.length;
    }

    /**
     * Length of each eigenvector (the order of the matrix); 0 for an empty set created by
     * {@link #of} with no vectors.
     *
     * @return dimension
     */
    public int dimension() {
        return dimension;
    }

    /**
     * The {@code i}-th eigenvalue (ascending order).
     *
     * @param i index in {@code [0, size()-1]}
     * @return eigenvalue
     * @throws IllegalArgumentException if {@code i} is out of range
     */
    public double value(int i) {
        Require.inRange("i", i, 0, values.length - 1);
        return values[i];
    }

    /**
     * All eigenvalues, ascending.
     *
     * @return a copy
     */
    public double[] values() {
        return values.clone();
    }

    /**
     * The {@code i}-th eigenvector.
     *
     * @param i index in {@code [0, size()-1]}
     * @return a copy of unit Euclidean norm
     * @throws IllegalArgumentException if {@code i} is out of range
     */
    public double[] vector(int i) {
        Require.inRange("i", i, 0, values.length - 1);
        return vectors[i].clone();
    }

    /**
     * One component of the {@code i}-th eigenvector, without copying.
     *
     * @param i   eigenpair index in {@code [0, size()-1]}
     * @param row component index in {@code [0, dimension()-1]}
     * @return the component
     * @throws IllegalArgumentException if an index is out of range
     */
    public double component(int i, int row) {
        Require.inRange("i", i, 0, values.length - 1);
        Require.inRange("row", row, 0, dimension - 1);
        return vectors[i][row];
    }

    /**
     * All eigenvectors, {@code vectors()[i]} belonging to {@code value(i)}.
     *
     * @return a deep copy
     */
    public double[][] vectors() {
        double[][] copy = new double[vectors.length][];
        for (int i = 0; i < vectors.length; i++) {
            copy[i] = vectors[i].clone();
        }
        return copy;
    }

    /**
     * Short description with the eigenvalues.
     *
     * @return text such as {@code EigenPairs[size=3, dimension=100, values=[...]]}
     */
    @Override
    public String toString() {
        return "EigenPairs[size=" + values.length + ", dimension=" + dimension
                + ", values=" + Arrays.toString(values) + "]";
    }
}
