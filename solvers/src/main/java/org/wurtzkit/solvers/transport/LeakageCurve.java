package org.wurtzkit.solvers.transport;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.CsvTable;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * A gate-leakage J-V curve ({@link GateLeakage#curve}): per bias point of the sweep, the current
 * density and its parts, in the sweep's order. Immutable; array accessors return copies. A point
 * without a value (its solve or its current integral failed) is NaN, with the reason in
 * {@link #status(int)}.
 *
 * <p>CSV columns: {@code gate_bias_V, total_A/cm^2, thermionic_A/cm^2, tunnelling_A/cm^2,
 * poole_frenkel_A/cm^2, barrier_top_eV, status}; sign as in {@link LeakageCurrent} (negative in
 * reverse bias). The CSV starts with the {@link #provenance()} comment lines, warnings included.
 */
public final class LeakageCurve implements CsvTable {
    private static final List<Column> COLUMNS = List.of(Column.of("gate_bias", "V"), Column.of("total", "A/cm^2"),
            Column.of("thermionic", "A/cm^2"), Column.of("tunnelling", "A/cm^2"), Column.of("poole_frenkel", "A/cm^2"),
            Column.of("barrier_top", "eV"), Column.of("status", ""));

    private final double[] bias;
    private final LeakageCurrent[] points;
    private final String[] status;
    private final BiasSweepResult sweep;
    private final LeakageOptions options;
    private final List<Warning> warnings;

    LeakageCurve(BiasSweepResult sweep, LeakageOptions options, LeakageCurrent[] points, String[] status) {
        this.sweep = sweep;
        this.options = options;
        this.bias = sweep.gateBiasV();
        this.points = points.clone();
        this.status = status.clone();
        List<List<Warning>> per = new ArrayList<>(points.length);
        List<String> labels = new ArrayList<>(points.length);
        for (int i = 0; i < points.length; i++) {
            per.add(points[i] == null ? null : points[i].warnings());
            labels.add("V_g = " + Decimals.format(bias[i], "V"));
        }
        this.warnings = Warning.union(sweep.warnings(), Warning.aggregate(per, labels));
    }

    /**
     * What may make this curve mislead: the warnings of its bias sweep, then each kind of warning
     * that a point's current raised ({@link LeakageCurrent#warnings()}), once, at the first such
     * point, with the count of the others.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /** {@return the leakage model choices the curve was computed with} */
    public LeakageOptions options() {
        return options;
    }

    /**
     * What produced this curve: the provenance of its bias sweep (structure, solver options, biases),
     * with the run's {@code computation} set to "gate leakage curve", the sweep's run kept under
     * keys prefixed {@code sweep.}, the leakage options as {@code leakageOptions}
     * ({@link LeakageOptions#describe()}) and the curve's warnings. A re-run repeats the bias sweep from that provenance and calls
     * {@link GateLeakage#curve} with the same options.
     *
     * @return the provenance
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        ResultProvenance p = sweep.provenance().orElseThrow();
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "gate leakage curve");
        p.run().forEach((k, v) -> run.put("sweep." + k, v));
        run.put("leakageOptions", options.describe());
        List<String> w = new ArrayList<>();
        for (String s : p.warnings()) {
            if (s.startsWith("point failed: ")) {
                w.add(s);
            }
        }
        for (Warning x : warnings) {
            w.add(x.toString());
        }
        return Optional.of(new ResultProvenance(p.libraryVersion(), p.structure(), p.parameterSetName(),
                p.parameterSetSha256(), p.solverOptions(), run, w));
    }

    /** @return number of points */
    public int size() {
        return bias.length;
    }

    /** @return the gate biases (V) */
    public double[] gateBiasV() {
        return bias.clone();
    }

    /**

     * {@return the current at point i, empty where it failed}

     *

     * @param i point index

     */
    public Optional<LeakageCurrent> point(int i) {
        return Optional.ofNullable(points[i]);
    }

    /**

     * {@return "ok", "ok, n warning(s)", or "failed: " and the reason}

     *

     * @param i point index

     */
    public String status(int i) {
        return status[i];
    }

    /** @return total current density per point (A/cm^2), NaN where failed */
    public double[] totalAPerCm2() {
        return column(LeakageCurrent::totalAPerCm2);
    }

    /** @return thermionic current density per point (A/cm^2), NaN where failed */
    public double[] thermionicAPerCm2() {
        return column(LeakageCurrent::thermionicAPerCm2);
    }

    /** @return tunnelling current density per point (A/cm^2), NaN where failed */
    public double[] tunnellingAPerCm2() {
        return column(LeakageCurrent::tunnellingAPerCm2);
    }

    /** @return Poole-Frenkel current density per point (A/cm^2), NaN where failed */
    public double[] pooleFrenkelAPerCm2() {
        return column(LeakageCurrent::pooleFrenkelAPerCm2);
    }

    private double[] column(ToDoubleFunction<LeakageCurrent> f) {
        double[] out = new double[bias.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = points[i] == null ? Double.NaN : f.applyAsDouble(points[i]);
        }
        return out;
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    @Override
    public int rowCount() {
        return bias.length;
    }

    @Override
    public List<String> row(int i) {
        LeakageCurrent p = points[i];
        if (p == null) {
            return List.of(CsvTable.cell(bias[i]), "", "", "", "", "", status[i]);
        }
        return List.of(CsvTable.cell(bias[i]), CsvTable.cell(p.totalAPerCm2()), CsvTable.cell(p.thermionicAPerCm2()),
                CsvTable.cell(p.tunnellingAPerCm2()), CsvTable.cell(p.pooleFrenkelAPerCm2()),
                CsvTable.cell(p.barrierTopEv()), status[i]);
    }
}
