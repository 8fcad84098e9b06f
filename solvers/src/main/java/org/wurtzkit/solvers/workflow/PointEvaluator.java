package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.Warning;

/**
 * What a design map computes at each point. Implementations must be thread-safe and
 * deterministic (the same structure must always give the same numbers), so that a parallel map
 * equals a serial one bit for bit. A library exception thrown by {@link #evaluate}
 * ({@link org.wurtzkit.errors.InvalidParameterException} or
 * {@link org.wurtzkit.errors.WurtzkitException}) marks the point failed; any other exception is a
 * defect and ends the map.
 */
public interface PointEvaluator {
    /** {@return the output columns, one per value returned by {@link #evaluate}} */
    List<Column> columns();

    /**
     * @param structure the point's structure
     * @param solver    the map's solver
     * @return one value per column
     */
    double[] evaluate(Structure structure, SelfConsistentSolver solver);

    /**
     * The values of a point with the warnings they rest on.
     *
     * @param values   one value per column
     * @param warnings what may make them mislead, possibly none
     */
    record Evaluated(double[] values, List<Warning> warnings) {
        /**
         * Validates and copies the warnings (the values are kept as given; a map checks their count).
         *
         * @param values   one value per column
         * @param warnings what may make them mislead, possibly none
         */
        public Evaluated {
            Require.nonNull("warnings", warnings);
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * As {@link #evaluate}, with the warnings of the point. The default calls {@link #evaluate} and
     * returns the structure's own warnings ({@link Structure#warnings()}); the evaluators of this
     * interface's factories return those of their solutions, sweeps and thresholds too. Maps and
     * studies call this method, so an implementation that overrides it should compute the same
     * values as {@link #evaluate}.
     *
     * @param structure the point's structure
     * @param solver    the map's solver
     * @return the values and the warnings
     */
    default Evaluated evaluateWithWarnings(Structure structure, SelfConsistentSolver solver) {
        return new Evaluated(evaluate(structure, solver), structure.warnings());
    }

    /**
     * What this evaluator computes, in words, for a result's provenance. The default says that the
     * evaluator is code the provenance cannot hold; the factories of this interface name their
     * quantities and settings.
     *
     * @return the description
     */
    default String description() {
        return "a custom PointEvaluator (code, not recorded) with columns "
                + columns().stream().map(Column::header).toList();
    }

    /**
     * One cold solve per point, from which the quantities are read.
     *
     * @param quantities at least one
     * @return the evaluator
     */
    static PointEvaluator solve(Quantity... quantities) {
        Require.nonNull("quantities", quantities);
        if (quantities.length == 0) {
            throw new InvalidParameterException("number of quantities", "0", "[1, ...)");
        }
        Quantity[] q = quantities.clone();
        List<Column> cols = new ArrayList<>();
        for (Quantity x : q) {
            cols.add(Require.nonNull("quantity", x).column());
        }
        return new QuantityEvaluator(q, List.copyOf(cols));
    }

    /**
     * A bias sweep per point, from which the threshold voltage is read (column
     * {@code threshold_voltage_V}).
     *
     * @param extraction the sweep and the definition
     * @return the evaluator
     */
    static PointEvaluator thresholdVoltage(ThresholdExtraction extraction) {
        Require.nonNull("threshold extraction", extraction);
        List<Column> columns = List.of(Column.of("threshold_voltage", "V"));
        return new PointEvaluator() {
            @Override
            public List<Column> columns() {
                return columns;
            }

            @Override
            public double[] evaluate(Structure structure, SelfConsistentSolver solver) {
                return evaluateWithWarnings(structure, solver).values();
            }

            @Override
            public Evaluated evaluateWithWarnings(Structure structure, SelfConsistentSolver solver) {
                BiasSweepResult r = new BiasSweep(solver).run(structure, extraction.grid());
                Threshold t = extraction.threshold(r);
                return new Evaluated(new double[] {t.voltageV()}, Warning.union(sweepWarnings(structure, r), t.warnings()));
            }

            @Override
            public String description() {
                return "threshold voltage per point: " + extraction;
            }
        };
    }

    /**
     * n<sub>s</sub> at each point's own bias and V<sub>th</sub> in one call: one bias sweep per point
     * whose range starts from the closed-form model's threshold (see
     * {@link SheetDensityAndThreshold}); columns {@code sheet_density_cm^-2},
     * {@code threshold_voltage_V} and {@code model_threshold_voltage_V}.
     *
     * @param definition the threshold definition, e.g. {@link ThresholdDefinition#constantDensity(double)}
     * @return the evaluator with the default step and margins
     */
    static SheetDensityAndThreshold sheetDensityAndThreshold(ThresholdDefinition definition) {
        return SheetDensityAndThreshold.of(definition);
    }

    /**
     * @param structure a point's structure
     * @param sweep     its bias sweep
     * @return the structure's warnings (its own gate bias too, as it is the point's) and the sweep's
     */
    private static List<Warning> sweepWarnings(Structure structure, BiasSweepResult sweep) {
        return Warning.union(structure.warnings(), sweep.warnings());
    }
}
