package org.wurtzkit.solvers.workflow;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;

/**
 * The outcome of a {@link TargetSearch}: the parameter value found, the structure it gives, the
 * value of the target quantity there, and every evaluation made on the way. Immutable.
 *
 * <p>CSV: one row per evaluation, columns {@code evaluation, <parameter>_<unit>,
 * <quantity>_<unit>, accepted} (accepted is "yes" on the returned point), after the
 * {@link #provenance()} comment lines.
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
    private final Setup setup;

    /**
     * How the search ran besides its target: the family, the solver's options, the interval, the
     * evaluation budget, for a threshold target the extraction (else null), and for a sheet-density
     * target the relative tolerance as given (else NaN).
     */
    record Setup(StructureFamily family, SolverOptions options, double lower, double upper, int maxEvaluations,
            ThresholdExtraction extraction, double relativeTolerance) {
    }

    TargetResult(Column parameter, Column quantity, double target, double tolerance, double value, double achieved,
            Structure structure, double[] evaluatedParameters, double[] evaluatedValues, Setup setup) {
        this.setup = setup;
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

    /**
     * What produced this search. When the family is one of {@link StructureFamilies}, it is data: the
     * structure recorded is the family's template ({@code structureRole} "template of the family")
     * and {@code structureFamily} names the factory method and its layer, e.g.
     * {@code StructureFamilies.layerThicknessNm(template, "barrier")}; a re-run rebuilds the family from
     * them. A family of code is not recorded: the structure recorded is then the structure found
     * ({@code structureRole} "structure found"), and a re-run needs the same family. The run also
     * records the quantity and its {@code target}, {@code tolerance} (and the {@code relativeTolerance}
     * as given, for a sheet-density target), the interval {@code lowerEnd},
     * {@code upperEnd}, {@code maxEvaluations}, for a threshold target the {@code thresholdDefinition}
     * and {@code thresholdBiasesV}, and every evaluated parameter value in order
     * ({@code evaluatedValues}); with a solver of the recorded options the search repeats them and
     * its table bit for bit.
     *
     * @return the provenance
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "target search");
        Optional<Structure> template = setup.family().template();
        run.put("structureFamily", setup.family().description());
        run.put("structureRole", template.isPresent() ? "template of the family" : "structure found");
        run.put("parameter", parameter.header());
        run.put("quantity", quantity.header());
        run.put("target", Double.toString(target));
        run.put("tolerance", Double.toString(tolerance));
        if (!Double.isNaN(setup.relativeTolerance())) {
            run.put("relativeTolerance", Double.toString(setup.relativeTolerance()));
        }
        run.put("lowerEnd", Double.toString(setup.lower()));
        run.put("upperEnd", Double.toString(setup.upper()));
        run.put("maxEvaluations", Integer.toString(setup.maxEvaluations()));
        if (setup.extraction() != null) {
            run.put("thresholdDefinition", setup.extraction().definition().toString());
            run.put("thresholdBiasesV", SweepProvenance.values(setup.extraction().grid().values()));
        }
        run.put("evaluatedValues", SweepProvenance.values(evaluatedParameters));
        return Optional.of(SweepProvenance.of(run, template.orElse(structure), setup.options(), List.of(),
                warnings()));
    }

    /**
     * {@return the warnings of the structure found ({@link Structure#warnings()}), e.g. a barrier
     * grown beyond its critical thickness to reach the target}
     */
    public List<org.wurtzkit.warnings.Warning> warnings() {
        return structure.warnings();
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
                + (evaluatedParameters.length == 1 ? " evaluation" : " evaluations")
                + org.wurtzkit.warnings.Warning.lines(warnings()) + "\n" + preview(10);
    }
}
