package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * The result of a {@link DesignMap}: for every point (row-major, last axis fastest) its axis
 * values and its computed values, or the reason it failed. Immutable; accessors return copies.
 * A failed point has NaN values.
 *
 * <p>CSV columns: one per axis ({@code name_unit}), one per computed quantity, then
 * {@code status} ("ok" or "failed: reason"), after the {@link #provenance()} comment lines.
 */
public final class DesignMapResult implements CsvTable {
    private final List<Axis> axes;
    private final List<Column> quantities;
    private final List<Column> columns;
    private final double[][] parameters;
    private final double[][] values;
    private final PointFailure[] failureAt;
    private final List<PointFailure> failureList;
    private final List<Warning> warnings;
    private final Setup setup;

    /**
     * What ran the map besides its axes: the structure factory (code), the solver's options and the
     * evaluator's description.
     */
    record Setup(StructureFactory factory, SolverOptions options, String evaluator) {
    }

    DesignMapResult(List<Axis> axes, List<Column> quantities, double[][] parameters, ParallelPoints.Outcome[] out,
            List<Warning>[] pointWarnings, Setup setup) {
        this.setup = setup;
        this.axes = List.copyOf(axes);
        this.quantities = List.copyOf(quantities);
        List<Column> c = new ArrayList<>();
        for (Axis a : axes) {
            c.add(a.column());
        }
        c.addAll(quantities);
        c.add(Column.of("status", ""));
        this.columns = List.copyOf(c);
        int n = out.length;
        this.parameters = parameters;
        this.values = new double[n][];
        this.failureAt = new PointFailure[n];
        List<PointFailure> f = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (out[i].values() != null) {
                values[i] = out[i].values();
            } else {
                double[] nan = new double[quantities.size()];
                java.util.Arrays.fill(nan, Double.NaN);
                values[i] = nan;
                failureAt[i] = out[i].failure().at(i, describe(i));
                f.add(failureAt[i]);
            }
        }
        this.failureList = Collections.unmodifiableList(f);
        String[] labels = new String[n];
        @SuppressWarnings("unchecked")
        List<Warning>[] per = new List[n];
        for (int i = 0; i < n; i++) {
            labels[i] = describe(i);
            per[i] = failureAt[i] == null ? pointWarnings[i] : null;
        }
        this.warnings = PointWarnings.of(per, labels);
    }

    /**
     * What may make this map mislead: each kind of warning that a computed point raised (its
     * structure's, its solution's, its sweep's or threshold's, as its evaluator reports them through
     * {@link PointEvaluator#evaluateWithWarnings}), once, at the first such point, with the count of
     * the others.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /**
     * What produced this map. A map's structures come from its {@link StructureFactory}, which is
     * code: the provenance cannot hold it. It records instead
     * <ul>
     * <li>as its structure, the factory's output at the first computed point (usually point 0),
     *     whose index is {@code structureAtPoint} in the run;</li>
     * <li>{@code structureFamily}: that the family is code, not recorded;</li>
     * <li>each axis as {@code axis<k> = name|unit|values} (values by {@link Double#toString(double)},
     *     in order), and the evaluator's {@link PointEvaluator#description()};</li>
     * <li>the solver options, every failed point and the map's warnings.</li>
     * </ul>
     * A re-run needs the same factory and evaluator: with them, a map built on these axes with a
     * solver of these options reproduces the table bit for bit (any thread count); the recorded
     * structure lets a reader check that the factory at hand gives the same stack at that point.
     *
     * @return the provenance, or empty when no point's structure could be built (every point failed
     *         in its factory)
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        int at = -1;
        for (int i = 0; i < values.length && at < 0; i++) {
            if (failureAt[i] == null) {
                at = i;
            }
        }
        Structure structure = null;
        if (at >= 0) {
            structure = setup.factory().at(parameters[at].clone());
        } else {
            for (int i = 0; i < values.length && structure == null; i++) {
                try {
                    structure = setup.factory().at(parameters[i].clone());
                    at = i;
                } catch (InvalidParameterException | org.wurtzkit.errors.WurtzkitException e) {
                    // this point's factory failed in the map too; try the next
                }
            }
        }
        if (structure == null) {
            return Optional.empty();
        }
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "design map");
        run.put("structureFamily", "code (a StructureFactory), not recorded, and the structure recorded is its output at "
                + "point structureAtPoint");
        run.put("structureAtPoint", Integer.toString(at));
        for (int a = 0; a < axes.size(); a++) {
            Axis ax = axes.get(a);
            run.put("axis" + a, ax.name() + "|" + ax.unit() + "|" + SweepProvenance.values(ax.values()));
        }
        run.put("evaluator", setup.evaluator());
        return Optional.of(SweepProvenance.of(run, structure, setup.options(), failureList, warnings));
    }

    private String describe(int i) {
        StringBuilder sb = new StringBuilder();
        for (int a = 0; a < axes.size(); a++) {
            if (a > 0) {
                sb.append(", ");
            }
            sb.append(axes.get(a).name()).append(" = ").append(parameters[i][a]);
            if (!axes.get(a).unit().isEmpty()) {
                sb.append(' ').append(axes.get(a).unit());
            }
        }
        return sb.toString();
    }

    /** {@return the axes} */
    public List<Axis> axes() {
        return axes;
    }

    /** {@return the computed columns (without the axes and the status)} */
    public List<Column> quantities() {
        return quantities;
    }

    /** {@return number of points} */
    public int size() {
        return values.length;
    }

    /**
     * @param axisIndices one index per axis
     * @return the point index (row-major)
     */
    public int index(int... axisIndices) {
        Require.nonNull("axis indices", axisIndices);
        if (axisIndices.length != axes.size()) {
            throw new InvalidParameterException("number of axis indices", Integer.toString(axisIndices.length),
                    "[" + axes.size() + ", " + axes.size() + "] (one per axis)");
        }
        int i = 0;
        for (int a = 0; a < axes.size(); a++) {
            Require.inRange("index on axis " + axes.get(a).name(), axisIndices[a], 0, axes.get(a).size() - 1);
            i = i * axes.get(a).size() + axisIndices[a];
        }
        return i;
    }

    /**
     * @param i point index
     * @return the axis values of point i
     */
    public double[] parameters(int i) {
        return parameters[i].clone();
    }

    /**
     * @param i point index
     * @return the computed values of point i (NaN if it failed)
     */
    public double[] values(int i) {
        return values[i].clone();
    }

    /**
     * @param i      point index
     * @param column index among {@link #quantities()}
     * @return that value (NaN if the point failed)
     */
    public double value(int i, int column) {
        return values[i][column];
    }

    /**
     * @param name a quantity's column name
     * @return its value at every point
     */
    public double[] column(String name) {
        for (int c = 0; c < quantities.size(); c++) {
            if (quantities.get(c).name().equals(name)) {
                double[] out = new double[values.length];
                for (int i = 0; i < out.length; i++) {
                    out[i] = values[i][c];
                }
                return out;
            }
        }
        throw new InvalidParameterException("quantity name", "\"" + name + "\"",
                quantities.stream().map(Column::name).toList().toString());
    }

    /**
     * @param i point index
     * @return true if point i was computed (the one verb of every workflow result)
     */
    public boolean succeeded(int i) {
        return failureAt[i] == null;
    }

    /**
     * @param i point index
     * @return why point i failed (with the kind of failure), or empty
     */
    public Optional<PointFailure> failure(int i) {
        return Optional.ofNullable(failureAt[i]);
    }

    /** {@return every failed point, in map order} */
    public List<PointFailure> failures() {
        return failureList;
    }

    @Override
    public List<Column> columns() {
        return columns;
    }

    @Override
    public int rowCount() {
        return values.length;
    }

    @Override
    public List<String> row(int i) {
        List<String> r = new ArrayList<>(columns.size());
        for (double p : parameters[i]) {
            r.add(CsvTable.cell(p));
        }
        for (double v : values[i]) {
            r.add(CsvTable.cell(v));
        }
        r.add(failureAt[i] == null ? "ok" : "failed: " + failureAt[i].message());
        return r;
    }

    /**
     * @return a summary line (each axis with its size and range, the quantities, how many points
     *         failed) and a {@link #preview(int) preview} of the table
     */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("Design map: ").append(size()).append(" points over ");
        for (int a = 0; a < axes.size(); a++) {
            Axis ax = axes.get(a);
            if (a > 0) {
                sb.append(" x ");
            }
            double[] v = ax.values();
            double lo = Arrays.stream(v).min().orElseThrow();
            double hi = Arrays.stream(v).max().orElseThrow();
            sb.append(ax.name()).append(" (").append(v.length).append(v.length == 1 ? " value, " : " values, ")
                    .append(Decimals.format(lo)).append(" to ").append(Decimals.format(hi, ax.unit())).append(')');
        }
        sb.append("; ").append(quantities.stream().map(Column::header).toList()).append(", ")
                .append(failureList.size()).append(" failed").append(Warning.lines(warnings));
        return sb.append('\n').append(preview(10)).toString();
    }
}
