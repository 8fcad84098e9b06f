package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.IntFunction;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.units.Units;

/**
 * The per-point read-outs that every one-dimensional sweep result shares, in one place: the
 * solution or the failure of each point, the 2DEG sheet density, the gate charge, the outer
 * iteration count and the status text. {@link BiasSweepResult} and {@link TemperatureSweepResult}
 * hold one each and delegate their point accessors to it. Immutable after construction; the
 * accessors that return arrays return copies.
 */
final class SweepPoints {
    /** The solution of each point, null for a failed one. */
    private final Solution[] solutions;
    /** 2DEG sheet density (cm^-2), exactly as {@link Solution#sheetDensityPerCm2()} reports it; NaN for a failed point. */
    final double[] sheet;
    /** Sheet charge on the gate metal (C/m^2); NaN for a failed point. */
    final double[] gateCharge;
    /** Outer iterations, -1 for a failed point. */
    final int[] iterations;
    /** The CSV status of each point: the converged one's text, or "failed: " and the reason. */
    final String[] status;
    private final PointFailure[] failureAt;
    /** The failed points, in sweep order. */
    final List<PointFailure> failures;

    /**
     * @param solutions the solution of each point, null for a failed one (the array is copied)
     * @param reasons   why each failed point failed (read only where the solution is null)
     * @param where     names point i in its failure record, e.g. {@code "gate bias = -2.0 V"}
     * @param okStatus  the status text of a converged point
     */
    SweepPoints(Solution[] solutions, PointFailure.Reason[] reasons, IntFunction<String> where,
            Function<Solution, String> okStatus) {
        int n = solutions.length;
        this.solutions = solutions.clone();
        sheet = new double[n];
        gateCharge = new double[n];
        iterations = new int[n];
        status = new String[n];
        failureAt = new PointFailure[n];
        List<PointFailure> f = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Solution s = solutions[i];
            if (s == null) {
                sheet[i] = Double.NaN;
                gateCharge[i] = Double.NaN;
                iterations[i] = -1;
                failureAt[i] = reasons[i].at(i, where.apply(i));
                f.add(failureAt[i]);
                status[i] = "failed: " + reasons[i].message();
            } else {
                sheet[i] = s.sheetDensityPerCm2();
                gateCharge[i] = s.gateCharge();
                iterations[i] = s.convergence().iterations();
                status[i] = okStatus.apply(s);
            }
        }
        failures = Collections.unmodifiableList(f);
    }

    /** {@return 2DEG sheet density of each point (m^-2)} */
    double[] sheetDensity() {
        double[] out = new double[sheet.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Units.perCm2ToPerM2(sheet[i]);
        }
        return out;
    }

    /** {@return 2DEG sheet density of each point (cm^-2)} */
    double[] sheetDensityPerCm2() {
        return sheet.clone();
    }

    /** {@return sheet charge on the gate metal of each point (C/m^2)} */
    double[] gateCharge() {
        return gateCharge.clone();
    }

    /** {@return outer iterations per point, -1 for a failed point} */
    int[] iterations() {
        return iterations.clone();
    }

    /**
     * @param i point index
     * @return true if point i was computed
     */
    boolean succeeded(int i) {
        return failureAt[i] == null;
    }

    /**
     * @param i point index
     * @return why point i failed, or empty
     */
    Optional<PointFailure> failure(int i) {
        return Optional.ofNullable(failureAt[i]);
    }

    /**
     * @param i point index
     * @return the solution at point i, empty for a failed point
     */
    Optional<Solution> solution(int i) {
        return Optional.ofNullable(solutions[i]);
    }
}
