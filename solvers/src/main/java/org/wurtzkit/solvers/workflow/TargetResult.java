package org.wurtzkit.solvers.workflow;

import java.util.List;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;

/**
 * The outcome of a {@link TargetSearch}: the parameter value found, the structure it gives, the
 * value of the target quantity there, and every evaluation made on the way. Immutable.
 *
 * <p>CSV: one row per evaluation, columns {@code evaluation, <parameter>_<unit>,
 * <quantity>_<unit>, accepted} (accepted is "yes" on the returned point).
 */
public final class TargetResult implements CsvTable {
    private final Column parameter;
    private final Column quantity;
    private final double target;
    private final double tolerance;
    private final double value;
    private final double achieved;
    private final Structure structure;
    private final double[] evaluatedParameters;
    private final double[] evaluatedValues;
    private final List<Column> columns;

    TargetResult(Column parameter, Column quantity, double target, double tolerance, double value, double achieved,
            Structure structure, double[] evaluatedParameters, double[] evaluatedValues) {
        this.parameter = parameter;
        this.quantity = quantity;
        this.target = target;
        this.tolerance = tolerance;
        this.value = value;
        this.achieved = achieved;
        this.structure = structure;
        this.evaluatedParameters = evaluatedParameters.clone();
        this.evaluatedValues = evaluatedValues.clone();
        this.columns = List.of(Column.of("evaluation", ""), parameter, quantity, Column.of("accepted", ""));
    }

    /** {@return the searched parameter's name and unit} */
    public Column parameter() {
        return parameter;
    }

    /** {@return the target quantity's name and unit} */
    public Column quantity() {
        return quantity;
    }

    /** {@return the requested target, in the quantity's unit} */
    public double target() {
        return target;
    }

    /** {@return the accepted absolute deviation from the target, in the quantity's unit} */
    public double tolerance() {
        return tolerance;
    }

    /** {@return the parameter value found, in its unit} */
    public double value() {
        return value;
    }

    /** {@return the quantity at that value, within {@link #tolerance()} of the target} */
    public double achieved() {
        return achieved;
    }

    /** {@return the structure at the value found} */
    public Structure structure() {
        return structure;
    }

    /** {@return number of evaluations (each one a full solve or bias sweep)} */
    public int evaluations() {
        return evaluatedParameters.length;
    }

    /** {@return the parameter values evaluated, in order} */
    public double[] evaluatedParameters() {
        return evaluatedParameters.clone();
    }

    /** {@return the quantity at each evaluated value} */
    public double[] evaluatedValues() {
        return evaluatedValues.clone();
    }

    @Override
    public List<Column> columns() {
        return columns;
    }

    @Override
    public int rowCount() {
        return evaluatedParameters.length;
    }

    @Override
    public List<String> row(int i) {
        return List.of(Integer.toString(i), CsvTable.cell(evaluatedParameters[i]), CsvTable.cell(evaluatedValues[i]),
                evaluatedParameters[i] == value && evaluatedValues[i] == achieved ? "yes" : "no");
    }

    /**
     * @return e.g. {@code "Target sheet_density = 1e13 cm^-2 (tolerance 1e10 cm^-2): barrier_thickness = 13.8 nm
     *         gives 1.0001e13 cm^-2 after 7 evaluations"} and a {@link #preview(int) preview} of the
     *         evaluations
     */
    @Override
    public String toString() {
        return "Target " + quantity.name() + " = " + Decimals.format(target, quantity.unit()) + " (tolerance "
                + Decimals.format(tolerance, quantity.unit()) + "): " + parameter.name() + " = "
                + Decimals.format(value, parameter.unit())
                + " gives " + Decimals.format(achieved, quantity.unit()) + " after " + evaluatedParameters.length
                + (evaluatedParameters.length == 1 ? " evaluation" : " evaluations") + "\n" + preview(10);
    }
}
