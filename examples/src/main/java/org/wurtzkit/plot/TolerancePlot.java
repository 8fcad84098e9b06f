package org.wurtzkit.plot;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;
import org.knowm.xchart.CategorySeries;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.CategoryStyler;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.workflow.ToleranceStudyResult;

/**
 * The spread a tolerance study predicts and which tolerance drives it: one histogram panel per
 * output (independent samples, with the mean and the 5 % and 95 % quantiles) and a bar panel of the
 * first-order Sobol indices of every output with one standard error.
 *
 * <pre>{@code
 * TolerancePlot.of(result).histogram(0, 1e-13, "n_s (10^13 cm^-2)", "Spread of n_s")
 *         .ranking(List.of("barrier Al fraction", ...), "Which tolerance dominates?").writePng(file);
 * }</pre>
 */
public final class TolerancePlot {
    /** Width of each panel (pixels). */
    public static final int PANEL_WIDTH = 640;
    /** Height of each panel (pixels). */
    public static final int PANEL_HEIGHT = 560;
    private static final Color[] HISTOGRAM_COLORS = {Style.BLUE, Style.ORANGE, Style.GREEN};

    private final ToleranceStudyResult r;
    private final List<Chart<?, ?>> panels = new ArrayList<>();

    private TolerancePlot(ToleranceStudyResult r) {
        this.r = Require.nonNull("tolerance study result", r);
    }

    /**
     * @param result a tolerance study's result
     * @return an empty plot of it; add panels with {@link #histogram} and {@link #ranking}
     */
    public static TolerancePlot of(ToleranceStudyResult result) {
        return new TolerancePlot(result);
    }

    /**
     * Adds a histogram panel of one output.
     *
     * @param output the output's index
     * @param scale  factor from the output's unit to the axis unit (e.g. 1e-13 for 10^13 cm^-2)
     * @param xTitle the x-axis title, with unit
     * @param title  the panel title
     * @return this plot
     */
    public TolerancePlot histogram(int output, double scale, String xTitle, String title) {
        Require.inRange("output index", output, 0, r.outputs().size() - 1);
        Require.finite("histogram scale", scale);
        panels.add(histogram(r, output, scale, Require.nonNull("x title", xTitle), Require.nonNull("title", title),
                HISTOGRAM_COLORS[output % HISTOGRAM_COLORS.length]));
        return this;
    }

    /**
     * Adds the panel of first-order Sobol indices (needs a study run with the sensitivity design).
     *
     * @param inputLabels one label per uncertain input, in input order (the inputs' own names are used
     *                    when the count differs)
     * @param title       the panel title
     * @return this plot
     */
    public TolerancePlot ranking(List<String> inputLabels, String title) {
        panels.add(ranking(r, Require.nonNull("input labels", inputLabels), Require.nonNull("title", title)));
        return this;
    }

    /** {@return the panels side by side as one image} */
    public BufferedImage image() {
        if (panels.isEmpty()) {
            throw Require.invalid("panels", "[]", "at least one (add a histogram or the ranking)");
        }
        int w = 0;
        int h = 0;
        for (Chart<?, ?> c : panels) {
            w += c.getWidth();
            h = Math.max(h, c.getHeight());
        }
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, w, h);
            int x = 0;
            for (Chart<?, ?> c : panels) {
                g.drawImage(BitmapEncoder.getBufferedImage(c), x, 0, null);
                x += c.getWidth();
            }
        } finally {
            g.dispose();
        }
        return img;
    }

    /**
     * @param file where to write the PNG
     * @return the file
     * @throws IOException if it cannot be written
     */
    public Path writePng(Path file) throws IOException {
        if (!ImageIO.write(image(), "png", file.toFile())) {
            throw new IOException("no PNG writer in this JDK");
        }
        return file;
    }

    /** A histogram of the independent samples of one output, with mean and 5 % / 95 % quantiles. */
    static XYChart histogram(ToleranceStudyResult r, int output, double scale, String xTitle, String title,
            Color color) {
        double[] v = r.sampleValues(output);
        ToleranceStudyResult.Summary s = r.summary(output);
        XYChart c = Style.xy(PANEL_WIDTH, PANEL_HEIGHT, title, xTitle, "samples per bin");
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
        Style.polygon(c, String.format(Locale.ROOT, "%d samples", v.length), px, py, lighter(color), true);
        double yTop = Math.ceil(1.3 * top) + 1;
        Style.line(c, String.format(Locale.ROOT, "mean %s", Labels.sig(s.mean() * scale, 4)),
                new double[] {s.mean() * scale, s.mean() * scale}, new double[] {0, yTop}, Style.INK, Style.DASHED);
        Style.line(c, "5 % and 95 % quantiles", new double[] {s.p05() * scale, s.p05() * scale, Double.NaN,
            s.p95() * scale, s.p95() * scale}, new double[] {0, yTop, Double.NaN, 0, yTop}, color, Style.DOTTED);
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(yTop);
        double pad = 0.08 * (hi - lo) + w;
        c.getStyler().setXAxisMin(lo - pad);
        c.getStyler().setXAxisMax(hi + pad);
        return c;
    }

    /** The first-order Sobol indices of every output as bars, with one standard error. */
    static CategoryChart ranking(ToleranceStudyResult r, List<String> inputLabels, String title) {
        CategoryChart c = new CategoryChartBuilder().width(PANEL_WIDTH).height(PANEL_HEIGHT)
                .title(title)
                .xAxisTitle("tolerance").yAxisTitle("first-order Sobol index S\u1d62").build();
        CategoryStyler st = c.getStyler();
        st.setLocale(Locale.ROOT);
        st.setAntiAlias(true);
        st.setChartBackgroundColor(Color.WHITE);
        st.setPlotBackgroundColor(Color.WHITE);
        st.setPlotBorderColor(Style.GREY);
        st.setPlotGridLinesColor(Style.GRID);
        st.setChartFontColor(Style.INK);
        st.setAxisTickLabelsColor(Style.INK);
        st.setChartTitleFont(new Font(Style.FAMILY, Font.BOLD, 17));
        st.setChartTitleBoxVisible(false);
        st.setAxisTitleFont(new Font(Style.FAMILY, Font.PLAIN, 16));
        st.setAxisTickLabelsFont(new Font(Style.FAMILY, Font.PLAIN, 13));
        st.setLegendFont(new Font(Style.FAMILY, Font.PLAIN, 13));
        st.setLegendPosition(Styler.LegendPosition.InsideN);
        st.setLegendBorderColor(Style.GREY);
        st.setXAxisLabelRotation(35);
        st.setChartPadding(12);
        st.setErrorBarsColor(Style.INK);
        st.setYAxisDecimalPattern("0.00");
        st.setAvailableSpaceFill(0.7);
        List<String> labels = new ArrayList<>(inputLabels);
        if (labels.size() != r.design().inputs().size()) {
            labels = r.design().inputs().stream().map(i -> i.column().name()).toList();
        }
        Color[] colors = {Style.BLUE, Style.ORANGE, Style.GREEN};
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
            String name = q == 0 ? "n_s" : r.outputs().get(q).name().equals("threshold_voltage") ? "V_th"
                    : r.outputs().get(q).name();
            CategorySeries series = c.addSeries(name + " (\u00b1 1 standard error)", labels,
                    Arrays.stream(y).boxed().toList(), Arrays.stream(e).boxed().toList());
            series.setFillColor(colors[q % colors.length]);
        }
        st.setYAxisMin(Math.floor(min * 10) / 10);
        st.setYAxisMax(Math.max(1.0, Math.ceil(max * 10) / 10) + 0.3); // room for the legend
        return c;
    }

    static Color lighter(Color c) {
        return new Color((c.getRed() + 2 * 255) / 3, (c.getGreen() + 2 * 255) / 3, (c.getBlue() + 2 * 255) / 3);
    }
}
