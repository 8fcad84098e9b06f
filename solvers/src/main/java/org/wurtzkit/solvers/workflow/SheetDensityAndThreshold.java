// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * A design-map evaluator that gives, for each point, the 2DEG sheet density at the structure's own
 * gate bias and the threshold voltage of the full solver, from one bias sweep, without a bias range
 * to choose by hand. Columns: {@code sheet_density_cm^-2}, {@code threshold_voltage_V} and
 * {@code model_threshold_voltage_V}, the closed-form estimate that placed the range.
 *
 * <p>At each point the closed-form charge balance ({@link ChargeBalanceModel#fromStructure(Structure)})
 * gives an estimate
 * V<sub>th,model</sub>. The sweep runs from the structure's bias V<sub>0</sub> down to
 * min(V<sub>0</sub>, V<sub>th,model</sub>) - margin, margin = max({@link #marginV()},
 * {@link #marginFraction()} |V<sub>0</sub> - V<sub>th,model</sub>|), rounded down to a whole
 * number of steps of {@link #stepV()} (at least 4 steps). Its first point is a cold solve at V<sub>0</sub>, which
 * gives n<sub>s</sub>; V<sub>th</sub> is read off the whole sweep by the {@link #definition()}.
 * The model only places the range: both reported full-solver numbers come from the sweep.
 *
 * <p>The defaults (step 0.25 V, margin 1 V or 25 % of the distance to the estimate) cover the
 * differences between the closed-form and the full V<sub>th</sub> seen on AlGaN/GaN stacks (below
 * 5 %, see {@code FullSolverVersusAnalyticTest}); for a definition at a level far above
 * 10<sup>11</sup> cm<sup>-2</sup> or an unusual stack, widen them.
 *
 * <p>A point fails, with the reason, when its top is not a Schottky gate, when the closed-form model
 * cannot hold the stack (doped or graded layers above the channel; use
 * {@link PointEvaluator#thresholdVoltage(ThresholdExtraction)} with an explicit grid there), when a
 * bias of the sweep does not converge, or when the sweep does not reach what the definition needs.
 *
 * @param definition     the threshold definition
 * @param stepV          bias step (V), in [0.001, 5]
 * @param marginV        least distance the sweep runs below the model's V_th (V), in [0, 50]
 * @param marginFraction further margin as a fraction of |V_0 - V_th,model|, in [0, 10]
 */
public record SheetDensityAndThreshold(ThresholdDefinition definition, double stepV, double marginV,
        double marginFraction) implements PointEvaluator {
    /** Default bias step (V). */
    public static final double DEFAULT_STEP_V = 0.25;
    /** Default least margin below the model's threshold (V). */
    public static final double DEFAULT_MARGIN_V = 1.0;
    /** Default margin as a fraction of the distance from the structure's bias to the model's threshold. */
    public static final double DEFAULT_MARGIN_FRACTION = 0.25;
    /** Fewest biases of a sweep. */
    private static final int MIN_POINTS = 5;

    private static final List<Column> COLUMNS = List.of(Column.of("sheet_density", "cm^-2"),
            Column.of("threshold_voltage", "V"), Column.of("model_threshold_voltage", "V"));

    /**
     * Creates the record and checks every component.
     *
     * @param definition     the threshold definition
     * @param stepV          bias step (V), in [0.001, 5]
     * @param marginV        least distance the sweep runs below the model's V_th (V), in [0, 50]
     * @param marginFraction further margin as a fraction of |V_0 - V_th,model|, in [0, 10]
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public SheetDensityAndThreshold {
        Require.nonNull("threshold definition", definition);
        Require.inRange("bias step (V)", stepV, 0.001, 5);
        Require.inRange("margin below the model threshold (V)", marginV, 0, 50);
        Require.inRange("margin fraction", marginFraction, 0, 10);
    }

    /**
     * @param definition the threshold definition
     * @return the evaluator with the default step and margins
     */
    public static SheetDensityAndThreshold of(ThresholdDefinition definition) {
        return new SheetDensityAndThreshold(definition, DEFAULT_STEP_V, DEFAULT_MARGIN_V, DEFAULT_MARGIN_FRACTION);
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    /**
     * The gate biases of the sweep for a structure, as {@link #evaluate} runs them.
     *
     * @param structure the point's structure, with a Schottky gate
     * @param solver    the solver whose options set the model's band line-up
     * @return the biases, from the structure's own bias downwards
     * @throws InvalidParameterException if the top is not a Schottky gate or the model cannot hold
     *                                   the stack
     */
    public BiasGrid biasGrid(Structure structure, SelfConsistentSolver solver) {
        return grid(structure, modelThreshold(structure, solver));
    }

    @Override
    public double[] evaluate(Structure structure, SelfConsistentSolver solver) {
        return evaluateWithWarnings(structure, solver).values();
    }

    /** {@return the values, with the warnings of the stack, of its sweep and of the threshold} */
    @Override
    public Evaluated evaluateWithWarnings(Structure structure, SelfConsistentSolver solver) {
        double model = modelThreshold(structure, solver);
        BiasGrid grid = grid(structure, model);
        BiasSweepResult r = new BiasSweep(solver).run(structure, grid);
        if (!r.failures().isEmpty()) {
            throw new WurtzkitException(ErrorKind.NOT_CONVERGED, "the threshold sweep needs every bias point; "
                    + r.failures().size() + " of " + r.size() + " failed, first: " + r.failures().get(0));
        }
        Threshold t = r.threshold(definition);
        return new Evaluated(new double[] {r.sheetDensityPerCm2()[0], t.voltageV(), model},
                Warning.union(structure.warnings(), r.warnings(), t.warnings()));
    }

    /** {@return {@link #toString()}} */
    @Override
    public String description() {
        return toString();
    }

    private static double modelThreshold(Structure structure, SelfConsistentSolver solver) {
        Require.nonNull("structure", structure);
        Require.nonNull("solver", solver);
        if (!(structure.top() instanceof TopBoundary.Schottky)) {
            throw new InvalidParameterException("top boundary", structure.top().toString(),
                    "a Schottky gate (a threshold voltage needs a gate)");
        }
        return ChargeBalanceModel.fromStructure(structure).thresholdVoltage();
    }

    private BiasGrid grid(Structure structure, double model) {
        double v0 = ((TopBoundary.Schottky) structure.top()).biasV();
        double margin = Math.max(marginV, marginFraction * Math.abs(v0 - model));
        double span = v0 - (Math.min(v0, model) - margin);
        // a whole number of steps, so that the biases are V_0 - k stepV
        int steps = Math.max(MIN_POINTS - 1, (int) Math.ceil(span / stepV - 1e-9));
        return BiasGrid.linear(v0, v0 - steps * stepV, steps + 1);
    }

    /** @return e.g. {@code "n_s and V_th (threshold at n_s = 1e11 cm^-2), steps of 0.25 V, margin 1 V or 25 %"} */
    @Override
    public String toString() {
        return "n_s and V_th (" + definition + "), steps of " + Decimals.format(stepV, "V") + ", margin "
                + Decimals.format(marginV, "V") + " or " + Decimals.format(100 * marginFraction, "%");
    }
}
