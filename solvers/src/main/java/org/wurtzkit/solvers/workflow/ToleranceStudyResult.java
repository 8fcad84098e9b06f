package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * The result of a Monte Carlo study ({@link ToleranceStudy}, or any response evaluated over a
 * {@link SampleDesign}): every evaluation's inputs and outputs, summary statistics per output, and
 * with the Sobol design the first-order and total-effect sensitivity indices. Immutable.
 *
 * <p><b>Statistics</b> ({@link #summary(int)}) are taken over the independent samples: every
 * evaluation without sensitivity analysis, the rows of A and B with it. Failed evaluations are
 * left out and counted ({@link Summary#failed()}); the sample standard deviation divides by
 * count - 1; quantiles interpolate linearly between order statistics (definition 7 of R. J.
 * Hyndman, Y. Fan, Am. Stat. 50, 361 (1996), Commons Math's {@code Percentile.EstimationType.R_7}).
 *
 * <p><b>Sensitivity</b> ({@link #sensitivity(int)}): with f<sub>A</sub>, f<sub>B</sub> and
 * f(A<sub>B</sub><sup>(i)</sup>) the outputs of the rows of the three matrices (see
 * {@link SampleDesign}), centred on the mean of f<sub>A</sub> and f<sub>B</sub> (this leaves the
 * indices' expectations unchanged and avoids cancellation for outputs such as n_s ~ 10<sup>13</sup>),
 * and V the sample variance of f<sub>A</sub> and f<sub>B</sub> together:
 * <ul>
 * <li>first order, S<sub>i</sub> = (1/N) &Sigma; f<sub>B</sub> (f(A<sub>B</sub><sup>(i)</sup>) -
 * f<sub>A</sub>) / V, the estimator of A. Saltelli et al., Comput. Phys. Commun. 181, 259 (2010),
 * Table 2 (b);</li>
 * <li>total effect, S<sub>Ti</sub> = (1/2N) &Sigma; (f<sub>A</sub> - f(A<sub>B</sub><sup>(i)</sup>))<sup>2</sup>
 * / V, the estimator of M. J. W. Jansen, Comput. Phys. Commun. 117, 35 (1999), Table 2 (f) of
 * Saltelli et al. (2010);</li>
 * <li>a standard error of S<sub>i</sub> from the spread of its N terms, sd / &radic;N / V (central
 * limit theorem, V taken as exact: common practice, no source).</li>
 * </ul>
 * Only rows whose k + 2 evaluations all succeeded enter; {@link Sensitivity#rows()} says how many.
 */
public final class ToleranceStudyResult implements CsvTable {
    private static final double[] QUANTILES = {0.05, 0.25, 0.5, 0.75, 0.95};

    /**
     * Summary statistics of one output over the independent samples that succeeded; NaN values
     * (and count 0) when fewer than two succeeded.
     *
     * @param column            the output
     * @param count             samples included
     * @param failed            samples left out because their evaluation failed
     * @param mean              mean
     * @param standardDeviation sample standard deviation (divisor count - 1)
     * @param min               smallest value
     * @param p05               5 % quantile
     * @param p25               25 % quantile
     * @param median            median
     * @param p75               75 % quantile
     * @param p95               95 % quantile
     * @param max               largest value
     */
    public record Summary(Column column, int count, int failed, double mean, double standardDeviation, double min,
            double p05, double p25, double median, double p75, double p95, double max) {
    }

    /**
     * The sensitivity indices of one input for one output.
     *
     * @param input                   the input's name
     * @param firstOrder              S_i, the share of the output variance due to this input alone
     * @param firstOrderStandardError standard error of S_i
     * @param totalEffect             S_Ti, the share due to this input including its interactions
     */
    public record SobolIndex(String input, double firstOrder, double firstOrderStandardError, double totalEffect) {
    }

    /**
     * The sensitivity analysis of one output.
     *
     * @param column   the output
     * @param variance V, the output's variance over the rows of A and B used
     * @param rows     rows of the design used (all k + 2 evaluations succeeded)
     * @param skipped  rows left out because an evaluation failed
     * @param indices  one index per input, in input order
     * @param warnings why the indices may mislead, if they may (empty otherwise): a standard error
     *                 above {@value #ROUGH_STANDARD_ERROR}, which can reorder inputs whose indices lie
     *                 closer than that ({@link WarningKind#SENSITIVITY_STANDARD_ERROR_LARGE}); rows
     *                 left out by failures, which select the samples by their outcome
     *                 ({@link WarningKind#POINTS_LEFT_OUT})
     */
    public record Sensitivity(Column column, double variance, int rows, int skipped, List<SobolIndex> indices,
            List<Warning> warnings) {
        /** Standard error of a first-order index above which the ranking gets a warning. */
        public static final double ROUGH_STANDARD_ERROR = 0.05;

        /**
         * Creates the record; copies the lists.
         *
         * @param column   the output
         * @param variance V, the output's variance over the rows of A and B used
         * @param rows     rows of the design used (all k + 2 evaluations succeeded)
         * @param skipped  rows left out because an evaluation failed
         * @param indices  one index per input, in input order
         * @param warnings why the indices may mislead, if they may (empty otherwise): a standard error
         *                                 above {@value #ROUGH_STANDARD_ERROR}, which can reorder inputs whose indices lie
         *                                 closer than that; rows left out by failures, which select the samples by
         *                                 their outcome
         */
        public Sensitivity {
            indices = List.copyOf(indices);
            warnings = List.copyOf(warnings);
        }

        /** @return the indices from the largest first-order index down (ties keep input order) */
        public List<SobolIndex> ranking() {
            List<SobolIndex> r = new ArrayList<>(indices);
            r.sort(Comparator.comparingDouble(SobolIndex::firstOrder).reversed());
            return Collections.unmodifiableList(r);
        }

        /**
         * @param input an input's name
         * @return its index
         */
        public SobolIndex index(String input) {
            for (SobolIndex s : indices) {
                if (s.input().equals(input)) {
                    return s;
                }
            }
            throw new InvalidParameterException("input name", "\"" + input + "\"",
                    "one of " + indices.stream().map(SobolIndex::input).toList());
        }
    }

    private final SampleDesign design;
    private final List<Column> outputs;
    private final double[] values; // evaluation-major, NaN where failed
    private final String[] failure;
    private final PointFailure[] failureAt;
    private final List<PointFailure> failures;
    private final Origin origin; // null when assembled without its study
    private final List<Warning> warnings;

    /**
     * What a study's provenance records besides its sample design: the template, the solver's
     * options, each tolerance and each evaluator in words.
     */
    record Origin(Structure template, SolverOptions options, List<String> tolerances, List<String> evaluators) {
    }

    private ToleranceStudyResult(ToleranceStudyResult r, Origin origin, List<Warning> warnings) {
        this.design = r.design;
        this.outputs = r.outputs;
        this.values = r.values;
        this.failure = r.failure;
        this.failureAt = r.failureAt;
        this.failures = r.failures;
        this.origin = origin;
        this.warnings = warnings;
    }

    /**
     * @param origin        the study that ran this result
     * @param pointWarnings each evaluation's warnings, or null when they are not known (evaluations
     *                      computed elsewhere)
     * @return this result with its provenance and warnings
     */
    ToleranceStudyResult withOrigin(Origin origin, List<Warning>[] pointWarnings) {
        List<Warning> w = List.of();
        if (pointWarnings != null) {
            String[] labels = new String[size()];
            @SuppressWarnings("unchecked")
            List<Warning>[] per = new List[size()];
            for (int j = 0; j < labels.length; j++) {
                labels[j] = "evaluation " + j + " (" + where(j) + ")";
                per[j] = failure[j] == null ? pointWarnings[j] : null;
            }
            w = PointWarnings.of(per, labels);
        }
        return new ToleranceStudyResult(this, origin, w);
    }

    private ToleranceStudyResult(SampleDesign design, List<Column> outputs, double[] values, String[] failure,
            ErrorKind[] kinds) {
        this.origin = null;
        this.warnings = List.of();
        this.design = design;
        this.outputs = outputs;
        this.values = values;
        this.failure = failure;
        List<PointFailure> f = new ArrayList<>();
        this.failureAt = new PointFailure[failure.length];
        for (int j = 0; j < failure.length; j++) {
            if (failure[j] != null) {
                failureAt[j] = new PointFailure(j, where(j), kinds[j], failure[j]);
                f.add(failureAt[j]);
            }
        }
        this.failures = Collections.unmodifiableList(f);
    }

    /**
     * Assembles a result from evaluations computed anywhere (threads of this JVM, Spark tasks, ...).
     * The result depends only on the evaluations, not on the order they come in.
     *
     * @param design      the design that was evaluated
     * @param outputs     the output columns, at least one
     * @param evaluations exactly one per evaluation index of the design, with one value per output
     * @return the result
     * @throws InvalidParameterException if an index is missing, repeated or out of range, or an
     *                                   evaluation has the wrong number of outputs
     */
    public static ToleranceStudyResult of(SampleDesign design, List<Column> outputs, Collection<Evaluation> evaluations) {
        Require.nonNull("sample design", design);
        Require.nonNull("output columns", outputs);
        Require.nonNull("evaluations", evaluations);
        if (outputs.isEmpty()) {
            throw new InvalidParameterException("number of output columns", "0", "[1, ...)");
        }
        List<Column> cols = List.copyOf(outputs);
        int n = design.evaluations();
        int q = cols.size();
        if (evaluations.size() != n) {
            throw new InvalidParameterException("number of evaluations", Integer.toString(evaluations.size()),
                    "[" + n + ", " + n + "] (one per evaluation of the design)");
        }
        if ((long) n * q > SampleDesign.MAX_EVALUATIONS) {
            throw new InvalidParameterException("evaluations x outputs", Long.toString((long) n * q),
                    "[1, " + SampleDesign.MAX_EVALUATIONS + "] (one array holds every value; split the study)");
        }
        double[] v = new double[n * q];
        String[] f = new String[n];
        ErrorKind[] kinds = new ErrorKind[n];
        boolean[] seen = new boolean[n];
        for (Evaluation e : evaluations) {
            int j = Require.nonNull("evaluation", e).index();
            Require.inRange("evaluation index", j, 0, n - 1);
            if (seen[j]) {
                throw new InvalidParameterException("evaluation index", Integer.toString(j), "each index once");
            }
            seen[j] = true;
            if (e.succeeded()) {
                double[] out = e.outputs();
                if (out.length != q) {
                    throw new InvalidParameterException("number of outputs of evaluation " + j,
                            Integer.toString(out.length), "[" + q + ", " + q + "] (one per output column)");
                }
                System.arraycopy(out, 0, v, j * q, q);
            } else {
                Arrays.fill(v, j * q, j * q + q, Double.NaN);
                f[j] = e.failure();
                kinds[j] = e.failureKind();
            }
        }
        return new ToleranceStudyResult(design, cols, v, f, kinds);
    }

    /** Assembles the result of {@link ParallelPoints} outcomes (index = position). */
    static ToleranceStudyResult of(SampleDesign design, List<Column> outputs, ParallelPoints.Outcome[] out) {
        List<Evaluation> e = new ArrayList<>(out.length);
        for (int j = 0; j < out.length; j++) {
            e.add(out[j].values() == null ? Evaluation.failed(j, out[j].failure()) : Evaluation.of(j, out[j].values()));
        }
        return of(design, outputs, e);
    }

    /** @return the design */
    public SampleDesign design() {
        return design;
    }

    /** @return the output columns */
    public List<Column> outputs() {
        return outputs;
    }

    /** @return the number of evaluations */
    public int size() {
        return failure.length;
    }

    /**
     * @param evaluation an evaluation index
     * @param output     an output index
     * @return the value, NaN if the evaluation failed
     */
    public double value(int evaluation, int output) {
        Require.inRange("evaluation index", evaluation, 0, size() - 1);
        Require.inRange("output index", output, 0, outputs.size() - 1);
        return values[evaluation * outputs.size() + output];
    }

    /**
     * @param evaluation an evaluation index
     * @return true if the evaluation produced its outputs (the one verb of every workflow result)
     */
    public boolean succeeded(int evaluation) {
        Require.inRange("evaluation index", evaluation, 0, size() - 1);
        return failure[evaluation] == null;
    }

    /**
     * @param evaluation an evaluation index
     * @return why it failed (with the kind of failure), or empty if it succeeded
     */
    public Optional<PointFailure> failure(int evaluation) {
        Require.inRange("evaluation index", evaluation, 0, size() - 1);
        return Optional.ofNullable(failureAt[evaluation]);
    }

    /** @return every failed evaluation, in index order */
    public List<PointFailure> failures() {
        return failures;
    }

    /**
     * @param name an output column's name
     * @return its index
     */
    public int output(String name) {
        for (int i = 0; i < outputs.size(); i++) {
            if (outputs.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new InvalidParameterException("output name", "\"" + name + "\"",
                "one of " + outputs.stream().map(Column::name).toList());
    }

    /**
     * @param output an output index
     * @return the output over the independent samples that succeeded, in evaluation order (the
     *         values the statistics use, e.g. for a histogram)
     */
    public double[] sampleValues(int output) {
        Require.inRange("output index", output, 0, outputs.size() - 1);
        int q = outputs.size();
        double[] out = new double[size()];
        int m = 0;
        for (int j = 0; j < size(); j++) {
            if (independent(j) && failure[j] == null) {
                out[m++] = values[j * q + output];
            }
        }
        return Arrays.copyOf(out, m);
    }

    /**
     * @param output an output index
     * @return its summary statistics
     */
    public Summary summary(int output) {
        double[] v = sampleValues(output);
        int failed = 0;
        for (int j = 0; j < size(); j++) {
            if (independent(j) && failure[j] != null) {
                failed++;
            }
        }
        Column c = outputs.get(output);
        if (v.length < 2) {
            double nan = Double.NaN;
            return new Summary(c, 0, failed + v.length, nan, nan, nan, nan, nan, nan, nan, nan, nan);
        }
        Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        p.setData(v);
        double[] qs = new double[QUANTILES.length];
        for (int i = 0; i < qs.length; i++) {
            qs[i] = p.evaluate(100 * QUANTILES[i]);
        }
        return new Summary(c, v.length, failed, StatUtils.mean(v), Math.sqrt(StatUtils.variance(v)), StatUtils.min(v),
                qs[0], qs[1], qs[2], qs[3], qs[4], StatUtils.max(v));
    }

    /**
     * @param output an output index
     * @return its sensitivity indices
     * @throws WurtzkitException of kind INVALID_STRUCTURE if the design has no Sobol layout, or if
     *                           fewer than two rows, or no output variance, remain
     */
    public Sensitivity sensitivity(int output) {
        Require.inRange("output index", output, 0, outputs.size() - 1);
        if (!design.sensitivity()) {
            throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                    "this study ran without the Sobol design; build it with sensitivity(true)");
        }
        int k = design.inputs().size();
        int width = k + 2;
        int q = outputs.size();
        int n = design.samples();
        int[] rows = new int[n];
        int m = 0;
        for (int r = 0; r < n; r++) {
            boolean ok = true;
            for (int s = 0; s < width && ok; s++) {
                ok = failure[r * width + s] == null;
            }
            if (ok) {
                rows[m++] = r;
            }
        }
        Column c = outputs.get(output);
        if (m < 2) {
            throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, "sensitivity of " + c.name() + ": " + m + " of " + n
                    + " rows have every evaluation, at least 2 are needed; first failure: "
                    + (failures.isEmpty() ? "none" : failures.get(0)));
        }
        double[] fa = new double[m];
        double[] fb = new double[m];
        double[] ab = new double[2 * m];
        for (int t = 0; t < m; t++) {
            int base = rows[t] * width;
            fa[t] = values[base * q + output];
            fb[t] = values[(base + 1) * q + output];
            ab[t] = fa[t];
            ab[m + t] = fb[t];
        }
        double f0 = StatUtils.mean(ab);
        double var = StatUtils.variance(ab);
        if (!(var > 0)) {
            throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE, "sensitivity of " + c.name()
                    + ": the output does not vary over the samples (variance " + var + "), no share to apportion");
        }
        List<SobolIndex> indices = new ArrayList<>();
        double[] terms = new double[m];
        for (int i = 0; i < k; i++) {
            double tot = 0;
            for (int t = 0; t < m; t++) {
                double fabi = values[(rows[t] * width + 2 + i) * q + output] - f0;
                double a = fa[t] - f0;
                terms[t] = (fb[t] - f0) * (fabi - a);
                tot += (a - fabi) * (a - fabi);
            }
            double vi = StatUtils.mean(terms);
            double se = Math.sqrt(StatUtils.variance(terms) / m);
            indices.add(new SobolIndex(design.inputs().get(i).column().name(), vi / var, se / var, tot / (2.0 * m) / var));
        }
        List<Warning> warnings = new ArrayList<>();
        double worst = indices.stream().mapToDouble(SobolIndex::firstOrderStandardError).max().orElse(0);
        if (worst > Sensitivity.ROUGH_STANDARD_ERROR) {
            warnings.add(new Warning(WarningKind.SENSITIVITY_STANDARD_ERROR_LARGE, String.format(java.util.Locale.ROOT,
                    "first-order indices carry standard errors up to %.3f with %d rows: inputs closer than that may "
                    + "be ranked in either order; add samples", worst, m)));
        }
        if (m < n) {
            warnings.add(new Warning(WarningKind.POINTS_LEFT_OUT, (n - m) + " of " + n + " rows left out because an "
                    + "evaluation failed: if failures depend on the inputs, the indices describe only the part of the "
                    + "input space that succeeded"));
        }
        return new Sensitivity(c, var, m, n - m, indices, warnings);
    }

    /** @return whether evaluation j is an independent sample (a row of A or B, or a plain sample) */
    private boolean independent(int j) {
        return design.slot(j) <= 1;
    }

    private String where(int j) {
        return design.role(j) + " row " + design.row(j);
    }

    /**
     * @return per output: count, failed, mean, standard deviation, min, 5/25/50/75/95 % quantiles,
     *         max; one row per output
     */
    public CsvTable summaryTable() {
        List<Column> cols = List.of(Column.of("output", ""), Column.of("unit", ""), Column.of("count", ""),
                Column.of("failed", ""), Column.of("mean", ""), Column.of("standard_deviation", ""), Column.of("min", ""),
                Column.of("p05", ""), Column.of("p25", ""), Column.of("median", ""), Column.of("p75", ""),
                Column.of("p95", ""), Column.of("max", ""));
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < outputs.size(); i++) {
            Summary s = summary(i);
            rows.add(List.of(s.column().name(), s.column().unit(), Integer.toString(s.count()),
                    Integer.toString(s.failed()), CsvTable.cell(s.mean()), CsvTable.cell(s.standardDeviation()),
                    CsvTable.cell(s.min()), CsvTable.cell(s.p05()), CsvTable.cell(s.p25()), CsvTable.cell(s.median()),
                    CsvTable.cell(s.p75()), CsvTable.cell(s.p95()), CsvTable.cell(s.max())));
        }
        return new RowsTable(cols, rows, provenance());
    }

    /**
     * @return per output and input: first-order index, its standard error, total-effect index and
     *         the rows used
     */
    public CsvTable sensitivityTable() {
        List<Column> cols = List.of(Column.of("output", ""), Column.of("input", ""), Column.of("first_order", ""),
                Column.of("first_order_standard_error", ""), Column.of("total_effect", ""), Column.of("rows", ""));
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < outputs.size(); i++) {
            Sensitivity s = sensitivity(i);
            for (SobolIndex x : s.indices()) {
                rows.add(List.of(s.column().name(), x.input(), CsvTable.cell(x.firstOrder()),
                        CsvTable.cell(x.firstOrderStandardError()), CsvTable.cell(x.totalEffect()),
                        Integer.toString(s.rows())));
            }
        }
        return new RowsTable(cols, rows, provenance());
    }


    /**
     * One row per evaluation: {@code evaluation, role, row}, the inputs, the outputs, {@code status}.
     */
    @Override
    public List<Column> columns() {
        List<Column> c = new ArrayList<>();
        c.add(Column.of("evaluation", ""));
        c.add(Column.of("role", ""));
        c.add(Column.of("row", ""));
        design.inputs().forEach(i -> c.add(i.column()));
        c.addAll(outputs);
        c.add(Column.of("status", ""));
        return c;
    }

    @Override
    public int rowCount() {
        return size();
    }

    @Override
    public List<String> row(int j) {
        List<String> r = new ArrayList<>();
        r.add(Integer.toString(j));
        r.add(design.role(j));
        r.add(Integer.toString(design.row(j)));
        for (double x : design.values(j)) {
            r.add(CsvTable.cell(x));
        }
        for (int i = 0; i < outputs.size(); i++) {
            r.add(CsvTable.cell(values[j * outputs.size() + i]));
        }
        r.add(failure[j] == null ? "ok" : "failed: " + failure[j]);
        return r;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("ToleranceStudyResult[").append(design).append(", ")
                .append(size() - failures.size()).append(" of ").append(size()).append(" evaluations succeeded");
        for (int i = 0; i < outputs.size(); i++) {
            Summary s = summary(i);
            sb.append("; ").append(s.column().header()).append(" mean ").append(s.mean()).append(" sd ")
                    .append(s.standardDeviation());
        }
        return sb.append(']').append(Warning.lines(warnings)).toString();
    }

    /**
     * What may make this study mislead: each kind of warning that a successful evaluation raised
     * (its stack's, its solution's, its sweep's, as its evaluators report them through
     * {@link PointEvaluator#evaluateWithWarnings}), once, at the first such evaluation, with the
     * count of the others. Known only for a result of {@link ToleranceStudy#run()}: evaluations
     * computed elsewhere ({@link Evaluation}) carry no warnings, so a result assembled from them has
     * none. The sensitivity indices carry their own ({@link Sensitivity#warnings()}).
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /**
     * What produced this study, for a result of {@link ToleranceStudy#run()} or
     * {@link ToleranceStudy#result}: the template as the structure, the solver options, and in the
     * run: {@code computation} "tolerance study", the design's {@code plan}, {@code samples},
     * {@code seed} and {@code sensitivity}, each tolerance as {@code tolerance<i>} (its text, e.g.
     * {@code "Tolerance[barrier_thickness_nm ~ Normal[mean=22.0, standardDeviation=0.5]]"}, every number by
     * {@link Double#toString(double)}), each evaluator's {@link PointEvaluator#description()} as
     * {@code evaluator<i>}; then every failed evaluation and the study's warnings. A re-run builds
     * {@code ToleranceStudy.builder(template)} with tolerances of the same text, the same plan,
     * samples, seed, sensitivity and evaluators and a solver of these options; it gives the same
     * table bit for bit, with any thread count.
     *
     * @return the provenance, or empty for a result assembled by {@link #of(SampleDesign, List, Collection)}
     *         without its study
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        if (origin == null) {
            return Optional.empty();
        }
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "tolerance study");
        run.put("plan", design.plan().name());
        run.put("samples", Integer.toString(design.samples()));
        run.put("seed", Long.toString(design.seed()));
        run.put("sensitivity", Boolean.toString(design.sensitivity()));
        for (int i = 0; i < origin.tolerances().size(); i++) {
            run.put("tolerance" + i, origin.tolerances().get(i));
        }
        for (int i = 0; i < origin.evaluators().size(); i++) {
            run.put("evaluator" + i, origin.evaluators().get(i));
        }
        return Optional.of(SweepProvenance.of(run, origin.template(), origin.options(), failures, warnings));
    }
}
