package org.wurtzkit.plot;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * A trade-off: several quantities against one design parameter, each in its own panel with its
 * own y axis, the panels stacked over one shared x axis (so no two y scales share a panel and
 * cross at a point that means nothing). Vertical marks (e.g. the chosen design) run through every
 * panel.
 *
 * <pre>{@code
 * Figure f = TradeoffPlot.along("GaN cap thickness (nm)", caps)
 *         .title("Cap trade-off")
 *         .panel("n_s (10¹³ cm⁻²)").points("self-consistent solver", ns).line("analytic model", nsAnalytic)
 *         .panel("|E| in the barrier (MV/cm)").points("self-consistent solver", field)
 *         .mark("chosen cap, 2 nm", 2.0)
 *         .figure();
 * }</pre>
 *
 * <p>The figure is {@code width} wide and (panels &times; panel height) + {@link #TITLE_HEIGHT_PX}
 * (with a title) + {@link #AXIS_HEIGHT_PX} high. Each panel's y axis starts at zero when all its values are positive, else it spans them with
 * a margin.
 */
public final class TradeoffPlot {
    private static final Color[] COLORS = {Style.BLUE, Style.RED, Style.GREEN, Style.PURPLE, Style.ORANGE};
    private static final Marker[] MARKERS = {SeriesMarkers.CIRCLE, SeriesMarkers.SQUARE, SeriesMarkers.DIAMOND,
        SeriesMarkers.TRIANGLE_UP};

    /** Height added to the top panel for the title (pixels). */
    public static final int TITLE_HEIGHT_PX = 40;
    /** Height added to the bottom panel for the x-axis tick labels and title (pixels). */
    public static final int AXIS_HEIGHT_PX = 60;

    private final String xTitle;
    private final double[] x;
    private final List<Panel> panels = new ArrayList<>();
    private final List<Double> marks = new ArrayList<>();
    private final List<String> markNames = new ArrayList<>();
    private String title = "";
    private int width = 1200;
    private int panelHeight = 400;

    private record Series(String name, double[] y, boolean points) {
    }

    private record Panel(String yTitle, List<Series> series) {
    }

    private TradeoffPlot(String xTitle, double[] x) {
        this.xTitle = Require.nonNull("x title", xTitle);
        Require.nonNull("x", x);
        if (x.length < 2) {
            throw new InvalidParameterException("x", java.util.Arrays.toString(x), "at least 2 values");
        }
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] > x[i - 1])) {
                throw new InvalidParameterException("x", java.util.Arrays.toString(x), "strictly increasing");
            }
        }
        this.x = x.clone();
    }

    /**
     * @param xTitle the design parameter, with unit
     * @param x      its values, strictly increasing
     * @return a plot without panels yet
     */
    public static TradeoffPlot along(String xTitle, double[] x) {
        return new TradeoffPlot(xTitle, x);
    }

    /** @param text title over the top panel @return this plot */
    public TradeoffPlot title(String text) {
        this.title = Require.nonNull("title", text);
        return this;
    }

    /** @param widthPx width of the figure @param heightPx height of each panel @return this plot */
    public TradeoffPlot size(int widthPx, int heightPx) {
        this.width = Require.inRange("width", widthPx, 300, 20_000);
        this.panelHeight = Require.inRange("panel height", heightPx, 150, 20_000);
        return this;
    }

    /**
     * Starts a new panel below the previous ones; the following series go into it.
     *
     * @param yTitle its y-axis title, with unit
     * @return this plot
     */
    public TradeoffPlot panel(String yTitle) {
        panels.add(new Panel(Require.nonNull("y title", yTitle), new ArrayList<>()));
        return this;
    }

    /** @param name legend text @param y one value per x (NaN for a failed point) @return this plot */
    public TradeoffPlot points(String name, double[] y) {
        return add(name, y, true);
    }

    /** A dashed line without markers, e.g. a model. @param name legend text @param y one value per x @return this plot */
    public TradeoffPlot line(String name, double[] y) {
        return add(name, y, false);
    }

    /** @param label legend text @param xValue where a vertical dotted line runs through every panel @return this plot */
    public TradeoffPlot mark(String label, double xValue) {
        markNames.add(Require.nonNull("label", label));
        marks.add(Require.finite("mark", xValue));
        return this;
    }

    private TradeoffPlot add(String name, double[] y, boolean points) {
        if (panels.isEmpty()) {
            throw new IllegalStateException("call panel(yTitle) before adding a series");
        }
        Require.nonNull("y", y);
        if (y.length != x.length) {
            throw new InvalidParameterException("y of " + name, Integer.toString(y.length), x.length + " values, one per x");
        }
        panels.get(panels.size() - 1).series().add(new Series(Require.nonNull("name", name), y.clone(), points));
        return this;
    }

    /** @return the panels stacked over the shared x axis */
    public Figure figure() {
        if (panels.isEmpty()) {
            throw new IllegalStateException("a trade-off plot needs at least one panel");
        }
        List<XYChart> charts = new ArrayList<>();
        for (int p = 0; p < panels.size(); p++) {
            int colour = p;
            Panel panel = panels.get(p);
            boolean first = p == 0;
            boolean last = p == panels.size() - 1;
            // the title sits on the top panel; the x-axis title and tick labels under the bottom one
            int extra = (first && !title.isEmpty() ? TITLE_HEIGHT_PX : 0) + (last ? AXIS_HEIGHT_PX : 0);
            XYChart c = Style.xy(width, panelHeight + extra, first ? title : "", xTitle, panel.yTitle());
            c.getStyler().setChartTitleVisible(first && !title.isEmpty());
            c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
            // the plot area is the axes' range (so that a mark runs from top to bottom), with the
            // first and last points 3 % inside it
            double pad = 0.03 * (x[x.length - 1] - x[0]);
            c.getStyler().setPlotContentSize(0.9999);
            c.getStyler().setXAxisMin(x[0] - pad);
            c.getStyler().setXAxisMax(x[x.length - 1] + pad);
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            boolean seenPoints = false;
            for (Series s : panel.series()) {
                if (s.points()) {
                    colour += seenPoints ? 1 : 0;
                    seenPoints = true;
                    Style.lineWithMarkers(c, s.name(), x, s.y(), COLORS[colour % COLORS.length], Style.SOLID)
                            .setMarker(MARKERS[colour % MARKERS.length]);
                } else {
                    // a model drawn beside measured-like points keeps their colour, dashed
                    Style.line(c, s.name(), x, s.y(), COLORS[colour % COLORS.length], Style.DASHED);
                }
                for (double v : s.y()) {
                    if (!Double.isNaN(v)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
            if (lo > hi) {
                lo = 0;
                hi = 1;
            }
            double yMin;
            double yMax;
            if (lo >= 0) {
                yMin = 0;
                // room above for the legend
                yMax = BandDiagramPlot.niceCeiling(1.45 * hi);
            } else {
                double span = Math.max(hi - lo, 1e-12);
                yMin = lo - 0.1 * span;
                yMax = hi + 0.6 * span;
            }
            c.getStyler().setYAxisMin(yMin);
            c.getStyler().setYAxisMax(yMax);
            for (int m = 0; m < marks.size(); m++) {
                XYSeries s = Style.line(c, markNames.get(m), new double[] {marks.get(m), marks.get(m)},
                        new double[] {yMin, yMax}, Style.GREY, Style.DOTTED);
                s.setShowInLegend(first);
            }
            charts.add(c);
        }
        return Figure.stackedSharedX(charts);
    }
}
