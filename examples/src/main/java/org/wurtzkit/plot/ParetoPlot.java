// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.plot;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.workflow.TradeoffPoint;
import org.wurtzkit.solvers.workflow.TradeoffResult;
import org.wurtzkit.units.Decimals;

/**
 * The trade-off a designer pins on the wall: every computed stack of a {@link TradeoffResult} as a
 * point of sheet resistance R<sub>sh</sub> (linear axis) against the magnitude of the gate leakage
 * |J| at the reverse bias (logarithmic axis). Stacks whose V<sub>th</sub> is outside the band are
 * grey; those in the band are blue; the Pareto front among them is drawn in red as the staircase
 * that bounds what the family can reach: every stack up and to the right of it is beaten by a
 * stack on it, in both objectives.
 *
 * <pre>{@code
 * ParetoPlot.of("Wafer family: R_sh against gate leakage", result).figure().writePng(file);
 * }</pre>
 */
public final class ParetoPlot {
    /** Width of the chart (pixels). */
    public static final int WIDTH = 1000;
    /** Height of the chart (pixels). */
    public static final int HEIGHT = 700;
    /** Currents below this are drawn at it (A/cm²): a log axis has no zero. */
    public static final double FLOOR_A_PER_CM2 = 1e-26;
    private static final Color OUT_OF_BAND = new Color(170, 170, 170);

    private final XYChart chart;
    private final List<TradeoffPoint> front;
    private Function<TradeoffPoint, String> labels;

    private ParetoPlot(XYChart chart, List<TradeoffPoint> front) {
        this.chart = chart;
        this.front = front;
    }

    /**
     * @param title  the chart title
     * @param result the trade-off, with at least one computed stack
     * @return the plot
     * @throws InvalidParameterException if no stack of the result was computed
     */
    public static ParetoPlot of(String title, TradeoffResult result) {
        Require.nonNull("title", title);
        Require.nonNull("trade-off result", result);
        List<TradeoffPoint> out = new ArrayList<>();
        List<TradeoffPoint> in = new ArrayList<>();
        for (TradeoffPoint p : result.points()) {
            if (!result.succeeded(p.index())) {
                continue;
            }
            (p.inBand() ? in : out).add(p);
        }
        if (in.isEmpty() && out.isEmpty()) {
            throw new InvalidParameterException("computed stacks of the trade-off", "0 of " + result.size(),
                    "[1, " + result.size() + "] (nothing to draw)");
        }
        String vr = Decimals.format(result.reverseBiasV(), "V");
        XYChart c = Style.xy(WIDTH, HEIGHT, title, "sheet resistance " + Labels.sub("R", "sh")
                + " at " + Labels.V_G + " = 0 V (\u03a9/\u25a1)", "|J| at " + Labels.V_G + " = -" + vr + " (A/cm\u00b2)");
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setYAxisDecimalPattern("0E0");
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
        String band = result.bandTargetV().map(t -> Labels.V_TH + " within " + Decimals.format(t, "V") + " \u00b1 "
                + Decimals.format(result.bandToleranceV().orElseThrow(), "V")).orElse("all stacks (no " + Labels.V_TH
                + " band)");
        if (!out.isEmpty()) {
            scatter(c, "stacks outside the " + Labels.V_TH + " band", out, OUT_OF_BAND);
        }
        if (!in.isEmpty()) {
            scatter(c, "stacks with " + band, in, Style.BLUE);
        }
        List<TradeoffPoint> front = result.front();
        if (!front.isEmpty()) {
            double[][] s = staircase(front);
            XYSeries line = Style.line(c, "Pareto front (" + front.size() + " stacks)", s[0], s[1], Style.RED, Style.SOLID);
            line.setShowInLegend(true);
            XYSeries marks = scatter(c, "on the front", front, Style.RED);
            marks.setMarker(SeriesMarkers.DIAMOND);
            marks.setShowInLegend(false);
        }
        return new ParetoPlot(c, front);
    }

    /**
     * The staircase through front points in increasing R_sh (decreasing |J|): from each point across
     * at its |J| to the next point's R_sh, then down to that point.
     *
     * @param front the front, in increasing R_sh
     * @return {x, y}
     */
    static double[][] staircase(List<TradeoffPoint> front) {
        int n = front.size();
        double[] x = new double[2 * n - 1];
        double[] y = new double[2 * n - 1];
        for (int k = 0; k < n; k++) {
            TradeoffPoint p = front.get(k);
            x[2 * k] = p.sheetResistanceOhmPerSquare();
            y[2 * k] = floor(p.leakageMagnitudeAPerCm2());
            if (k + 1 < n) {
                x[2 * k + 1] = front.get(k + 1).sheetResistanceOhmPerSquare();
                y[2 * k + 1] = y[2 * k];
            }
        }
        return new double[][] {x, y};
    }

    private static XYSeries scatter(XYChart c, String name, List<TradeoffPoint> points, Color color) {
        double[] x = new double[points.size()];
        double[] y = new double[points.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = points.get(i).sheetResistanceOhmPerSquare();
            y[i] = floor(points.get(i).leakageMagnitudeAPerCm2());
        }
        XYSeries s = c.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setMarkerColor(color);
        return s;
    }

    private static double floor(double j) {
        return Math.max(j, FLOOR_A_PER_CM2);
    }

    /**
     * Writes a label beside each stack on the front, e.g. its design values.
     *
     * @param text the label of a front stack
     * @return this plot
     */
    public ParetoPlot labelFront(Function<TradeoffPoint, String> text) {
        this.labels = Require.nonNull("label function", text);
        return this;
    }

    /** {@return the chart as a figure (PNG, SVG or an image); labels are placed once} */
    public Figure figure() {
        if (labels != null) {
            Style.layOut(chart);
            double right = chart.getWidth() - 12;
            for (int k = 0; k < front.size(); k++) {
                TradeoffPoint p = front.get(k);
                String t = Require.nonNull("front label", labels.apply(p));
                double half = Style.textWidth(t, Style.ANNOTATION_FONT) / 2;
                double x = chart.getScreenXFromChart(p.sheetResistanceOhmPerSquare());
                double y = chart.getScreenYFromChart(floor(p.leakageMagnitudeAPerCm2()));
                // right of the point, or left of it where the image ends; above and below in turn, so
                // that neighbours on one level of the staircase do not overlap
                double cx = x + 8 + half + half + 8 <= right ? x + 8 + half : x - 8 - half;
                Style.textAtPixel(chart, t, cx, k % 2 == 0 ? y - 12 : y + 16);
            }
            labels = null;
        }
        return Figure.of(chart);
    }
}
