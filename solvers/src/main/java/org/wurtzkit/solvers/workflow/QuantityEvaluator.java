package org.wurtzkit.solvers.workflow;

import java.util.List;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.Warning;

/**
 * The evaluator of {@link PointEvaluator#solve(Quantity...)}: one solve per point, from which the
 * quantities are read. A design map with continuation ({@link DesignMap.Builder#continuation(boolean)})
 * runs the solve itself, from a neighbour's solution, and reads the quantities with {@link #read}.
 */
final class QuantityEvaluator implements PointEvaluator {
    private final Quantity[] quantities;
    private final List<Column> columns;

    QuantityEvaluator(Quantity[] quantities, List<Column> columns) {
        this.quantities = quantities;
        this.columns = columns;
    }

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
        return read(structure, solver.solve(structure));
    }

    @Override
    public String description() {
        return "one cold solve per point, read: " + columns.stream().map(Column::header).toList();
    }

    /**
     * @param structure the point's structure
     * @param s         the point's solution
     * @return one value per quantity, with the structure's and the solution's warnings
     */
    Evaluated read(Structure structure, Solution s) {
        double[] out = new double[quantities.length];
        for (int i = 0; i < quantities.length; i++) {
            out[i] = quantities[i].extractor().applyAsDouble(s);
        }
        return new Evaluated(out, Warning.union(structure.warnings(), s.warnings()));
    }
}
