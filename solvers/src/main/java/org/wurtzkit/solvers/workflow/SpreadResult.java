package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * The result of a {@link ParameterSetSpread}: each member (parameter set) with its n_s and V_th,
 * and min / median / max over the members that succeeded. Immutable.
 *
 * <p>CSV ({@link #writeCsv(java.io.Writer)}): one row per member, columns
 * {@code parameter_set, sheet_density_cm^-2, threshold_voltage_V, status}. The statistics are a
 * second table, {@link #summary()}. Both start with the {@link #provenance()} comment lines.
 */
public final class SpreadResult implements CsvTable {
    private static final List<Column> COLUMNS = List.of(Column.of("parameter_set", ""),
            Column.of("sheet_density", "cm^-2"), Column.of("threshold_voltage", "V"), Column.of("status", ""));

    /**
     * One member of the spread.
     *
     * @param parameterSet        the set's name
     * @param sheetDensityPerCm2  n_s (cm^-2), NaN if the member failed
     * @param thresholdVoltage    V_th (V), NaN if the member failed
     * @param failure             why it failed (with the kind of failure), or null
     */
    public record Member(String parameterSet, double sheetDensityPerCm2, double thresholdVoltage, PointFailure failure) {
        /** {@return true if the member was computed} */
        public boolean succeeded() {
            return failure == null;
        }

        /** @return e.g. {@code "vurgaftman-meyer-2003: n_s = 8.91e12 cm^-2, V_th = -3.25 V"} or why it failed */
        @Override
        public String toString() {
            return parameterSet + ": " + (succeeded() ? "n_s = " + Decimals.format(sheetDensityPerCm2, "cm^-2")
                    + ", V_th = " + Decimals.format(thresholdVoltage, "V") : "failed: " + failure);
        }
    }

    /**
     * Order statistics over the members that succeeded; the median of an even count is the mean of
     * the two middle values. All NaN when no member succeeded (count 0).
     *
     * @param min    smallest value
     * @param median median
     * @param max    largest value
     * @param count  members included
     */
    public record Statistics(double min, double median, double max, int count) {
        static Statistics of(double[] values) {
            double[] v = Arrays.stream(values).filter(d -> !Double.isNaN(d)).sorted().toArray();
            int n = v.length;
            if (n == 0) {
                return new Statistics(Double.NaN, Double.NaN, Double.NaN, 0);
            }
            double med = n % 2 == 1 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
            return new Statistics(v[0], med, v[n - 1], n);
        }

        /** {@return max - min} */
        public double range() {
            return max - min;
        }

        /**
         * @param unit the unit of the values
         * @return e.g. {@code "min 8.1e12, median 8.9e12, max 9.6e12 cm^-2 (3 sets)"}
         */
        public String toString(String unit) {
            return count == 0 ? "no set succeeded" : "min " + Decimals.format(min) + ", median "
                    + Decimals.format(median)
                    + ", max " + Decimals.format(max, unit) + " (" + count + (count == 1 ? " set)" : " sets)");
        }

        /** @return {@link #toString(String)} without a unit */
        @Override
        public String toString() {
            return toString("");
        }
    }

    private final List<Member> members;
    private final Statistics sheet;
    private final Statistics threshold;
    private final ThresholdExtraction extraction;
    private final List<PointFailure> failures;
    private final List<ParameterSet> sets;
    private final List<Warning> warnings;
    private final Function<ParameterSet, Structure> factory;
    private final SolverOptions options;

    SpreadResult(List<ParameterSet> sets, ParallelPoints.Outcome[] out, ThresholdExtraction extraction,
            List<Warning>[] memberWarnings, Function<ParameterSet, Structure> factory, SolverOptions options) {
        this.sets = List.copyOf(sets);
        this.factory = factory;
        this.options = options;
        String[] labels = new String[sets.size()];
        @SuppressWarnings("unchecked")
        List<Warning>[] per = new List[sets.size()];
        for (int i = 0; i < labels.length; i++) {
            labels[i] = "parameter set " + sets.get(i).name();
            per[i] = out[i].values() != null ? memberWarnings[i] : null;
        }
        this.warnings = PointWarnings.of(per, labels);
        List<Member> m = new ArrayList<>();
        List<PointFailure> f = new ArrayList<>();
        double[] ns = new double[sets.size()];
        double[] vth = new double[sets.size()];
        for (int i = 0; i < sets.size(); i++) {
            String name = sets.get(i).name();
            if (out[i].values() != null) {
                ns[i] = out[i].values()[0];
                vth[i] = out[i].values()[1];
                m.add(new Member(name, ns[i], vth[i], null));
            } else {
                ns[i] = Double.NaN;
                vth[i] = Double.NaN;
                PointFailure why = out[i].failure().at(i, "parameter set " + name);
                m.add(new Member(name, Double.NaN, Double.NaN, why));
                f.add(why);
            }
        }
        this.members = Collections.unmodifiableList(m);
        this.failures = Collections.unmodifiableList(f);
        this.sheet = Statistics.of(ns);
        this.threshold = Statistics.of(vth);
        this.extraction = extraction;
    }

    /** {@return every member, in the order of the sets} */
    public List<Member> members() {
        return members;
    }

    /**
     * @param parameterSet a set's name
     * @return its member, or empty
     */
    public Optional<Member> member(String parameterSet) {
        return members.stream().filter(x -> x.parameterSet().equals(parameterSet)).findFirst();
    }

    /** {@return statistics of n_s (cm^-2)} */
    public Statistics sheetDensityPerCm2() {
        return sheet;
    }

    /** {@return statistics of V_th (V)} */
    public Statistics thresholdVoltage() {
        return threshold;
    }

    /** {@return how V_th was obtained} */
    public ThresholdExtraction thresholdExtraction() {
        return extraction;
    }

    /** {@return the members that failed} */
    public List<PointFailure> failures() {
        return failures;
    }

    /**
     * @return the statistics as a table: columns {@code statistic, sheet_density_cm^-2,
     *         threshold_voltage_V}, rows min, median, max, count
     */
    public CsvTable summary() {
        List<Column> cols = List.of(Column.of("statistic", ""), Column.of("sheet_density", "cm^-2"),
                Column.of("threshold_voltage", "V"));
        List<List<String>> rows = List.of(
                List.of("min", CsvTable.cell(sheet.min()), CsvTable.cell(threshold.min())),
                List.of("median", CsvTable.cell(sheet.median()), CsvTable.cell(threshold.median())),
                List.of("max", CsvTable.cell(sheet.max()), CsvTable.cell(threshold.max())),
                List.of("count", Integer.toString(sheet.count()), Integer.toString(threshold.count())));
        return new RowsTable(cols, rows, provenance());
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    @Override
    public int rowCount() {
        return members.size();
    }

    @Override
    public List<String> row(int i) {
        Member m = members.get(i);
        return List.of(m.parameterSet(), CsvTable.cell(m.sheetDensityPerCm2()), CsvTable.cell(m.thresholdVoltage()),
                m.succeeded() ? "ok" : "failed: " + m.failure().message());
    }

    /**
     * @return one line per parameter set (n_s and V_th, or why it failed), then the min / median /
     *         max of both, and the threshold definition
     */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("Parameter-set spread over ").append(members.size()).append(" sets (")
                .append(extraction).append("):");
        for (Member m : members) {
            sb.append("\n  ").append(m);
        }
        sb.append("\n  n_s: ").append(sheet.toString("cm^-2")).append("\n  V_th: ").append(threshold.toString("V"));
        return sb.append(Warning.lines(warnings)).toString();
    }

    /**
     * What may make this spread mislead: each kind of warning that a computed member raised (its
     * stack's, its solution's, its threshold sweep's and threshold's), once, at the first such
     * member, with the count of the others.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /**
     * What produced this spread. The structure of each member comes from a factory of the caller
     * ({@code Function<ParameterSet, Structure>}), which is code the provenance cannot hold; it
     * records instead
     * <ul>
     * <li>as its structure, the factory's output for the first member whose structure can be built
     *     (its index is {@code structureOfMember} in the run);</li>
     * <li>{@code structureFamily}: that the factory is code, not recorded;</li>
     * <li>each member as {@code set<i> = name sha256 <hash>}: a re-run looks the sets up by name
     *     ({@link org.wurtzkit.material.ParameterSets#named}) and checks the hash;</li>
     * <li>the threshold extraction: {@code thresholdDefinition} (its text) and
     *     {@code thresholdBiasesV} (every bias by {@link Double#toString(double)});</li>
     * <li>the solver options, every failed member and the spread's warnings.</li>
     * </ul>
     * With the same factory, the sets so found and a solver of these options, a re-run gives the
     * same table bit for bit.
     *
     * @return the provenance, or empty when no member's structure can be built
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        Structure structure = null;
        int at = -1;
        for (int i = 0; i < sets.size() && structure == null; i++) {
            try {
                structure = factory.apply(sets.get(i));
                at = i;
            } catch (InvalidParameterException | WurtzkitException e) {
                // this member's factory failed in the run too; try the next
            }
        }
        if (structure == null) {
            return Optional.empty();
        }
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "parameter-set spread");
        run.put("structureFamily", "code (a function of the parameter set), not recorded, and the structure recorded is "
                + "its output for member structureOfMember");
        run.put("structureOfMember", Integer.toString(at));
        for (int i = 0; i < sets.size(); i++) {
            run.put("set" + i, sets.get(i).name() + " sha256 " + ParameterSetHash.sha256(sets.get(i)));
        }
        run.put("thresholdDefinition", extraction.definition().toString());
        run.put("thresholdBiasesV", SweepProvenance.values(extraction.grid().values()));
        return Optional.of(SweepProvenance.of(run, structure, options, failures, warnings));
    }
}
