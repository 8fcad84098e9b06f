package org.wurtzkit.examples;

import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;
import org.knowm.xchart.CategorySeries;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.CategoryStyler;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.material.Binary;
import org.wurtzkit.plot.TolerancePlot;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.Distribution;
import org.wurtzkit.solvers.workflow.PointEvaluator;
import org.wurtzkit.solvers.workflow.ProgressListener;
import org.wurtzkit.solvers.workflow.Quantity;
import org.wurtzkit.solvers.workflow.SamplingPlan;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.solvers.workflow.Tolerance;
import org.wurtzkit.solvers.workflow.ToleranceStudy;
import org.wurtzkit.solvers.workflow.ToleranceStudyResult;

/**
 * Example 6: what spread of n_s and V_th the wafers of run {@value DemoLab#WAFER} will show under
 * the fictional lab's growth tolerances, and which tolerance dominates it. A
 * {@link ToleranceStudy} with the Sobol design draws the barrier's Al fraction and thickness, the
 * cap and buffer thicknesses, the gate barrier height and the spontaneous polarization of AlN
 * (published values disagree by about 10 %), solves every sample with the full solver (n_s at 0 V,
 * V_th by linear extrapolation of a bias sweep), and ranks the tolerances by their first-order
 * Sobol indices.
 *
 * <p>The tolerances are <b>invented</b> for the demo: they describe no real growth process. Writes
 * {@code tolerance-study.png} (histograms of n_s and V_th, and the ranking as a bar chart),
 * {@code tolerance-study.csv} (every evaluation), {@code tolerance-study-summary.csv} and
 * {@code tolerance-study-sensitivity.csv}.
 *
 * <p>{@link #study(Settings, int, ProgressListener)} is the whole study as a pure function of its
 * settings: the Spark integration of this module (Maven profile {@code spark}) runs the same
 * function in Spark tasks and gets the same numbers bit for bit.
 */
public final class ToleranceStudyExample {
    static final int PANEL_WIDTH = org.wurtzkit.plot.TolerancePlot.PANEL_WIDTH;
    static final int PANEL_HEIGHT = org.wurtzkit.plot.TolerancePlot.PANEL_HEIGHT;
    /** Highest bias of each threshold sweep (V). */
    private static final double TOP_BIAS_V = 0.5;
    /** How far below the analytic threshold of the nominal wafer each sweep reaches (V). */
    private static final double BELOW_THRESHOLD_V = 2.5;

    /** Short labels of the tolerances for the bar chart, in input order. */
    static final List<String> LABELS = List.of("barrier Al fraction", "barrier thickness", "cap thickness",
            "buffer thickness", "gate barrier", "P_sp(AlN)");

    private ToleranceStudyExample() {
    }

    /**
     * @param rows             sample rows n of the Sobol design (n (k + 2) evaluations)
     * @param biasStepV        bias step of the threshold sweeps (V)
     * @param seed             the seed
     * @param thresholdVoltage whether each sample also gets a bias sweep for V_th
     */
    public record Settings(int rows, double biasStepV, long seed, boolean thresholdVoltage) {
        /** @return 128 rows (1024 evaluations), 0.25 V steps, n_s and V_th */
        public static Settings full() {
            return new Settings(128, 0.25, 731, true);
        }

        /** @return 6 rows (48 evaluations), 1.5 V steps, for tests */
        public static Settings quick() {
            return new Settings(6, 1.5, 731, true);
        }
    }

    /**
     * @param study   the study's result
     * @param files   files written
     * @param summary summary lines
     */
    public record Result(ToleranceStudyResult study, List<Path> files, List<String> summary) implements ExampleResult {
    }

    /**
     * The fictional lab's growth tolerances for wafer {@value DemoLab#WAFER} (invented demo data),
     * each a normal distribution cut at three standard deviations: barrier Al fraction 0.26 &plusmn;
     * 0.01, barrier thickness 22 nm &plusmn; 3 %, cap 2 nm &plusmn; 0.2 nm, buffer 1800 nm &plusmn;
     * 5 %, gate barrier 1.0 &plusmn; 0.05 eV; and P_sp of AlN in the default set &plusmn; 10 % (not
     * cut), for the disagreement of published values.
     *
     * @return the tolerances, in input order ({@link #LABELS})
     */
    public static List<Tolerance> growthTolerances() {
        double psp = ParameterSets.defaultSet().binary(Binary.ALN).spontaneousPolarization();
        return List.of(
                Tolerance.alFraction("barrier", Distribution.normalWithin(DemoLab.AL_FRACTION, 0.01, 3)),
                Tolerance.layerThicknessNm("barrier", Distribution.normalWithin(DemoLab.BARRIER_NM,
                        0.03 * DemoLab.BARRIER_NM, 3)),
                Tolerance.layerThicknessNm("cap", Distribution.normalWithin(DemoLab.CAP_NM, 0.2, 3)),
                Tolerance.layerThicknessNm("buffer", Distribution.normalWithin(DemoLab.BUFFER_NM,
                        0.05 * DemoLab.BUFFER_NM, 3)),
                Tolerance.gateBarrierEv(Distribution.normalWithin(DemoLab.GATE_BARRIER_EV, 0.05, 3)),
                Tolerance.material(Binary.ALN, MaterialParameter.SPONTANEOUS_POLARIZATION,
                        Distribution.normal(psp, 0.1 * Math.abs(psp))));
    }

    /**
     * The study: a pure function of the settings (same settings, same numbers, on any machine).
     *
     * @param s        settings
     * @param threads  threads of a local run
     * @param progress progress of a local run
     * @return the study, ready to run or to evaluate sample by sample
     */
    public static ToleranceStudy study(Settings s, int threads, ProgressListener progress) {
        ToleranceStudy.Builder b = ToleranceStudy.builder(DemoLab.wafer())
                .samples(s.rows())
                .plan(SamplingPlan.MONTE_CARLO)
                .seed(s.seed())
                .sensitivity(true)
                .threads(threads)
                .progress(progress);
        growthTolerances().forEach(b::tolerance);
        PointEvaluator sheet = PointEvaluator.solve(Quantity.SHEET_DENSITY);
        if (s.thresholdVoltage()) {
            b.evaluators(sheet, PointEvaluator.thresholdVoltage(thresholdExtraction(s.biasStepV())));
        } else {
            b.evaluators(sheet);
        }
        return b.build();
    }

    /** The sweep of every sample: from +0.5 V down to 2.5 V below the nominal wafer's analytic V_th. */
    static ThresholdExtraction thresholdExtraction(double step) {
        double vth = ChargeBalanceModel.fromStructure(DemoLab.wafer()).thresholdVoltage();
        double bottom = Math.floor((vth - BELOW_THRESHOLD_V) / step) * step;
        int points = (int) Math.round((TOP_BIAS_V - bottom) / step) + 1;
        return new ThresholdExtraction(BiasGrid.linear(TOP_BIAS_V, bottom, points),
                ThresholdDefinition.linearExtrapolation());
    }

    /**
     * @param args {@code [output folder] [--quick]}
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        ExampleArgs a = ExampleArgs.parse(args);
        Result r = run(a.createdOut(), a.quick() ? Settings.quick() : Settings.full(), System.out);
        r.summary().forEach(System.out::println);
    }

    /**
     * @param out      folder to write into (must exist)
     * @param settings settings
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        TerminalProgress bar = new TerminalProgress("tolerance study", log);
        ToleranceStudy study = study(settings, Runtime.getRuntime().availableProcessors(), bar);
        log.println("  " + study.size() + " evaluations: " + study.design());
        ToleranceStudyResult r = study.run();

        List<Path> files = new ArrayList<>();
        TolerancePlot plot = TolerancePlot.of(r).histogram(0, 1e-13, "n_s at V_g = 0 V (10\u00b9\u00b3 cm\u207b\u00b2)",
                "Spread of n_s, wafer " + DemoLab.WAFER + " (invented tolerances)");
        if (r.outputs().size() > 1) {
            plot.histogram(1, 1, "threshold voltage V_th (V), linear extrapolation",
                    "Spread of V_th, wafer " + DemoLab.WAFER + " (invented tolerances)");
        }
        plot.ranking(LABELS, "Which tolerance dominates? (invented demo tolerances)");
        Path png = plot.writePng(out.resolve("tolerance-study.png"));
        files.add(png);
        Path all = out.resolve("tolerance-study.csv");
        Tables.write(r, all);
        files.add(all);
        Path summary = out.resolve("tolerance-study-summary.csv");
        Tables.write(r.summaryTable(), summary);
        files.add(summary);
        Path sens = out.resolve("tolerance-study-sensitivity.csv");
        Tables.write(r.sensitivityTable(), sens);
        files.add(sens);

        List<String> lines = new ArrayList<>();
        lines.add("Tolerance study of wafer " + DemoLab.WAFER + ", " + DemoLab.INVENTED + " (invented tolerances):");
        lines.add(String.format(Locale.ROOT, "  %d evaluations (%d Sobol rows x %d), %d failed", r.size(),
                settings.rows(), study.tolerances().size() + 2, r.failures().size()));
        for (int q = 0; q < r.outputs().size(); q++) {
            ToleranceStudyResult.Summary s = r.summary(q);
            lines.add(String.format(Locale.ROOT, "  %s: mean %.4g, sd %.3g, 5-95 %% %.4g to %.4g (%d samples)",
                    s.column().header(), s.mean(), s.standardDeviation(), s.p05(), s.p95(), s.count()));
            StringBuilder rank = new StringBuilder("    ranking by first-order index:");
            ToleranceStudyResult.Sensitivity ranked = r.sensitivity(q);
            for (ToleranceStudyResult.SobolIndex x : ranked.ranking()) {
                rank.append(String.format(Locale.ROOT, " %s %.2f;", x.input(), x.firstOrder()));
            }
            lines.add(rank.toString());
            ranked.warnings().forEach(w -> lines.add("    warning: " + w.message()));
        }
        r.failures().stream().limit(5).forEach(f -> lines.add("    " + f));
        lines.add("  model estimates: confirm by measurement");
        return new Result(r, List.copyOf(files), List.copyOf(lines));
    }
}
