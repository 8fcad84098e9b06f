package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Structure;

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
                return new double[] {extraction.thresholdVoltage(structure, new BiasSweep(solver))};
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
}
