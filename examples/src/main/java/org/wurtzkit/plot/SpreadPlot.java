package org.wurtzkit.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.List;
import java.util.function.Function;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.workflow.SpreadResult;

/**
 * How far n_s and V_th move between parameter sets, against a design parameter: two panels side
 * by side, each with the min&ndash;max band across the sets, every set as its own line with its own
 * marker, and the median as a broad grey line drawn underneath them. With an odd number of sets
 * the median is one set's value at every point; drawn thin on top it would hide that set (or hide
 * under it), so it is drawn broad and below, showing as a grey halo around whichever set it equals.
 *
 * <pre>{@code
 * SpreadPlot.of(alFractions, spreads).xTitle("Al fraction x of the barrier").figure().writePng(file);
 * }</pre>
 */
public final class SpreadPlot {
    /** Width of the median's line (pixels), broad enough to show around a member's line and markers. */
    static final float MEDIAN_WIDTH = 11f;
    static final Color MEDIAN_COLOR = new Color(150, 150, 150, 150);
    private static final Color[] SET_COLORS = {Style.BLUE, Style.GREEN, Style.ORANGE, Style.PURPLE, Style.RED,
        Style.GREY};
    private static final Marker[] SET_MARKERS = {SeriesMarkers.CIRCLE, SeriesMarkers.SQUARE, SeriesMarkers.DIAMOND,
        SeriesMarkers.TRIANGLE_UP, SeriesMarkers.TRIANGLE_DOWN, SeriesMarkers.CROSS};

    private final double[] xs;
    private final List<SpreadResult> spreads;
    private String xTitle = "design parameter";
    private String subject = "";
    private Function<String, String> setLabel = Function.identity();
    private int panelWidth = 900;
    private int panelHeight = 720;

    private SpreadPlot(double[] xs, List<SpreadResult> spreads) {
        Require.nonNull("x values", xs);
        this.spreads = List.copyOf(Require.nonNull("spreads", spreads));
        if (xs.length != spreads.size() || xs.length < 1) {
            throw new InvalidParameterException("spreads", Integer.toString(spreads.size()),
                    "one per x value (" + xs.length + "), at least one");
        }
        int sets = spreads.get(0).members().size();
        for (SpreadResult s : spreads) {
            if (s.members().size() != sets) {
                throw new InvalidParameterException("members of a spread", Integer.toString(s.members().size()),
                        sets + ", the same parameter sets at every x");
            }
        }
        this.xs = xs.clone();
    }

    /**
     * @param xs      the design parameter, one value per spread
     * @param spreads the spreads, each over the same parameter sets in the same order
     * @return a plot of two 900 &times; 720 pixel panels
     */
    public static SpreadPlot of(double[] xs, List<SpreadResult> spreads) {
        return new SpreadPlot(xs, spreads);
    }

    /** @param title the x-axis title, with unit @return this plot */
    public SpreadPlot xTitle(String title) {
        this.xTitle = Require.nonNull("x title", title);
        return this;
    }

    /** @param text what the panel titles end with, e.g. the stack @return this plot */
    public SpreadPlot title(String text) {
        this.subject = Require.nonNull("title", text);
        return this;
    }

    /** @param label how a parameter set's name is written in the legend @return this plot */
    public SpreadPlot setLabels(Function<String, String> label) {
        this.setLabel = Require.nonNull("label", label);
        return this;
    }

    /** @param widthPx width of each panel @param heightPx height @return this plot */
    public SpreadPlot panelSize(int widthPx, int heightPx) {
        this.panelWidth = Require.inRange("width", widthPx, 300, 20_000);
        this.panelHeight = Require.inRange("height", heightPx, 200, 20_000);
        return this;
    }

    /** @return the n_s panel and the V_th panel side by side */
    public Figure figure() {
        String tail = subject.isEmpty() ? "" : " (" + subject + ")";
        return Figure.row(List.of(
                panel(Labels.N_S + " at " + Labels.V_G + " = 0 V across parameter sets" + tail, "2DEG sheet density "
                        + Labels.N_S + " (" + Labels.powerOfTen(13) + " " + Labels.PER_CM2 + ")", true),
                panel("Threshold voltage across parameter sets" + tail, "threshold voltage " + Labels.V_TH
                        + " (V), linear extrapolation", false)));
    }

    private XYChart panel(String title, String yTitle, boolean sheet) {
        XYChart c = Style.xy(panelWidth, panelHeight, title, xTitle, yTitle);
        c.getStyler().setLegendPosition(sheet ? Styler.LegendPosition.InsideNW : Styler.LegendPosition.InsideNE);
        double scale = sheet ? 1e-13 : 1;
        int n = xs.length;
        int sets = spreads.get(0).members().size();
        double[] min = new double[n];
        double[] med = new double[n];
        double[] max = new double[n];
        for (int i = 0; i < n; i++) {
            SpreadResult.Statistics s = sheet ? spreads.get(i).sheetDensityPerCm2() : spreads.get(i).thresholdVoltage();
            min[i] = s.min() * scale;
            med[i] = s.median() * scale;
            max[i] = s.max() * scale;
        }
        double[] px = new double[2 * n];
        double[] py = new double[2 * n];
        for (int i = 0; i < n; i++) {
            px[i] = xs[i];
            py[i] = min[i];
            px[2 * n - 1 - i] = xs[i];
            py[2 * n - 1 - i] = max[i];
        }
        Style.polygon(c, "min\u2013max band over " + sets + " parameter sets", px, py, new Color(205, 223, 240), true);
        String medianName = "median of the " + sets + " sets (broad grey line"
                + (sets % 2 == 1 ? ", under the set it equals)" : ")");
        XYSeries median = Style.line(c, medianName, xs, med, MEDIAN_COLOR,
                new BasicStroke(MEDIAN_WIDTH, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        median.setMarker(SeriesMarkers.NONE);
        for (int k = 0; k < sets; k++) {
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                SpreadResult.Member m = spreads.get(i).members().get(k);
                y[i] = (sheet ? m.sheetDensityPerCm2() : m.thresholdVoltage()) * scale;
            }
            String name = setLabel.apply(spreads.get(0).members().get(k).parameterSet());
            Style.lineWithMarkers(c, name, xs, y, SET_COLORS[k % SET_COLORS.length], Style.THIN)
                    .setMarker(SET_MARKERS[k % SET_MARKERS.length]);
        }
        double lo = BandDiagramPlot.min(min);
        double hi = BandDiagramPlot.max(max);
        double pad = 0.35 * (hi - lo) + 1e-9;
        if (xs.length > 1) {
            double dx = 0.04 * (xs[n - 1] - xs[0]);
            c.getStyler().setXAxisMin(xs[0] - dx);
            c.getStyler().setXAxisMax(xs[n - 1] + dx);
        }
        if (sheet) {
            c.getStyler().setYAxisMin(0.0);
            c.getStyler().setYAxisMax(BandDiagramPlot.niceCeiling(hi + pad));
        } else {
            c.getStyler().setYAxisMin(Math.floor(lo - 0.05 * (hi - lo)));
            c.getStyler().setYAxisMax(Math.ceil(hi + pad));
        }
        return c;
    }
}
