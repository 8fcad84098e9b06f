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
    static final int PANEL_WIDTH = 640;
    static final int PANEL_HEIGHT = 560;
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
        List<Chart<?, ?>> panels = new ArrayList<>();
        panels.add(histogram(r, 0, 1e-13, "n\u209b at V_g = 0 V (10\u00b9\u00b3 cm\u207b\u00b2)",
                "Spread of n\u209b, wafer " + DemoLab.WAFER + " (invented tolerances)", Charts.BLUE));
        if (r.outputs().size() > 1) {
            panels.add(histogram(r, 1, 1, "threshold voltage V_th (V), linear extrapolation",
                    "Spread of V_th, wafer " + DemoLab.WAFER + " (invented tolerances)", Charts.ORANGE));
        }
        panels.add(ranking(r));
        Path png = out.resolve("tolerance-study.png");
        BitmapEncoder.saveBitmap(panels, 1, panels.size(), png.toString(), BitmapEncoder.BitmapFormat.PNG);
        files.add(png);
        Path all = out.resolve("tolerance-study.csv");
        r.writeCsv(all);
        files.add(all);
        Path summary = out.resolve("tolerance-study-summary.csv");
        r.summaryTable().writeCsv(summary);
        files.add(summary);
        Path sens = out.resolve("tolerance-study-sensitivity.csv");
        r.sensitivityTable().writeCsv(sens);
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
            ranked.warnings().forEach(w -> lines.add("    warning: " + w));
        }
        r.failures().stream().limit(5).forEach(f -> lines.add("    " + f));
        lines.add("  model estimates: confirm by measurement");
        return new Result(r, List.copyOf(files), List.copyOf(lines));
    }

    /** A histogram of the independent samples of one output, with mean and 5 % / 95 % quantiles. */
    private static XYChart histogram(ToleranceStudyResult r, int output, double scale, String xTitle, String title,
            Color color) {
        double[] v = r.sampleValues(output);
        ToleranceStudyResult.Summary s = r.summary(output);
        XYChart c = Charts.xy(PANEL_WIDTH, PANEL_HEIGHT, title, xTitle, "samples per bin");
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNW);
        int bins = Math.max(6, Math.min(30, (int) Math.ceil(Math.sqrt(v.length))));
        double lo = s.min() * scale;
        double hi = s.max() * scale;
        double w = (hi - lo) / bins;
        if (!(w > 0)) {
            w = Math.max(Math.abs(lo) * 1e-3, 1e-9);
        }
        int[] counts = new int[bins];
        for (double x : v) {
            int b = (int) Math.floor((x * scale - lo) / w);
            counts[Math.min(bins - 1, Math.max(0, b))]++;
        }
        double[] px = new double[2 * bins + 2];
        double[] py = new double[2 * bins + 2];
        px[0] = lo;
        py[0] = 0;
        int top = 0;
        for (int b = 0; b < bins; b++) {
            px[1 + 2 * b] = lo + b * w;
            py[1 + 2 * b] = counts[b];
            px[2 + 2 * b] = lo + (b + 1) * w;
            py[2 + 2 * b] = counts[b];
            top = Math.max(top, counts[b]);
        }
        px[2 * bins + 1] = lo + bins * w;
        py[2 * bins + 1] = 0;
        Charts.polygon(c, String.format(Locale.ROOT, "%d samples", v.length), px, py, lighter(color), true);
        double yTop = Math.ceil(1.3 * top) + 1;
        Charts.line(c, String.format(Locale.ROOT, "mean %s", Charts.sig(s.mean() * scale, 4)),
                new double[] {s.mean() * scale, s.mean() * scale}, new double[] {0, yTop}, Charts.INK, Charts.DASHED);
        Charts.line(c, "5 % and 95 % quantiles", new double[] {s.p05() * scale, s.p05() * scale, Double.NaN,
            s.p95() * scale, s.p95() * scale}, new double[] {0, yTop, Double.NaN, 0, yTop}, color, Charts.DOTTED);
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(yTop);
        double pad = 0.08 * (hi - lo) + w;
        c.getStyler().setXAxisMin(lo - pad);
        c.getStyler().setXAxisMax(hi + pad);
        return c;
    }

    /** The first-order Sobol indices of every output as bars, with one standard error. */
    private static CategoryChart ranking(ToleranceStudyResult r) {
        CategoryChart c = new CategoryChartBuilder().width(PANEL_WIDTH).height(PANEL_HEIGHT)
                .title("Which tolerance dominates? (invented demo tolerances)")
                .xAxisTitle("tolerance").yAxisTitle("first-order Sobol index S\u1d62").build();
        CategoryStyler st = c.getStyler();
        st.setLocale(Locale.ROOT);
        st.setAntiAlias(true);
        st.setChartBackgroundColor(Color.WHITE);
        st.setPlotBackgroundColor(Color.WHITE);
        st.setPlotBorderColor(Charts.GREY);
        st.setPlotGridLinesColor(Charts.GRID);
        st.setChartFontColor(Charts.INK);
        st.setAxisTickLabelsColor(Charts.INK);
        st.setChartTitleFont(new Font(Charts.FAMILY, Font.BOLD, 17));
        st.setChartTitleBoxVisible(false);
        st.setAxisTitleFont(new Font(Charts.FAMILY, Font.PLAIN, 16));
        st.setAxisTickLabelsFont(new Font(Charts.FAMILY, Font.PLAIN, 13));
        st.setLegendFont(new Font(Charts.FAMILY, Font.PLAIN, 13));
        st.setLegendPosition(Styler.LegendPosition.InsideN);
        st.setLegendBorderColor(Charts.GREY);
        st.setXAxisLabelRotation(35);
        st.setChartPadding(12);
        st.setErrorBarsColor(Charts.INK);
        st.setYAxisDecimalPattern("0.00");
        st.setAvailableSpaceFill(0.7);
        List<String> labels = new ArrayList<>(LABELS);
        if (labels.size() != r.design().inputs().size()) {
            labels = r.design().inputs().stream().map(i -> i.column().name()).toList();
        }
        Color[] colors = {Charts.BLUE, Charts.ORANGE, Charts.GREEN};
        double max = 0;
        double min = 0;
        for (int q = 0; q < r.outputs().size(); q++) {
            ToleranceStudyResult.Sensitivity s = r.sensitivity(q);
            double[] y = new double[labels.size()];
            double[] e = new double[labels.size()];
            for (int i = 0; i < y.length; i++) {
                y[i] = s.indices().get(i).firstOrder();
                e[i] = s.indices().get(i).firstOrderStandardError();
                max = Math.max(max, y[i] + e[i]);
                min = Math.min(min, y[i] - e[i]);
            }
            String name = q == 0 ? "n\u209b" : r.outputs().get(q).name().equals("threshold_voltage") ? "V_th"
                    : r.outputs().get(q).name();
            CategorySeries series = c.addSeries(name + " (\u00b1 1 standard error)", labels,
                    Arrays.stream(y).boxed().toList(), Arrays.stream(e).boxed().toList());
            series.setFillColor(colors[q % colors.length]);
        }
        st.setYAxisMin(Math.floor(min * 10) / 10);
        st.setYAxisMax(Math.max(1.0, Math.ceil(max * 10) / 10) + 0.3); // room for the legend
        return c;
    }

    private static Color lighter(Color c) {
        return new Color((c.getRed() + 2 * 255) / 3, (c.getGreen() + 2 * 255) / 3, (c.getBlue() + 2 * 255) / 3);
    }
}
