// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.plot;

import java.awt.Color;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.errors.Require;

/**
 * Several named curves over one x axis (linear or logarithmic), each with markers in its own colour,
 * and dotted reference lines: e.g. a threshold voltage against a doping density for several barrier
 * thicknesses.
 *
 * <pre>{@code
 * CurvesPlot.of("V_th against Mg", "Mg density (cm^-3)", "V_th (V)").logX()
 *         .curve("12 nm", mg, vth12).reference("V_th = 0", 0).figure().writePng(file);
 * }</pre>
 */
public final class CurvesPlot {
    /** Width of the chart (pixels). */
    public static final int WIDTH = 900;
    /** Height of the chart (pixels). */
    public static final int HEIGHT = 680;
    private static final Color[] COLORS = {Style.BLUE, Style.RED, Style.GREEN, Style.ORANGE, Style.PURPLE};

    private final XYChart chart;
    private int curves;
    private double xMin = Double.POSITIVE_INFINITY;
    private double xMax = Double.NEGATIVE_INFINITY;

    private CurvesPlot(XYChart chart) {
        this.chart = chart;
    }

    /**
     * An empty chart.
     *
     * @param title  the chart title
     * @param xTitle the x-axis title, with unit
     * @param yTitle the y-axis title, with unit
     * @return the plot
     */
    public static CurvesPlot of(String title, String xTitle, String yTitle) {
        return of(title, xTitle, yTitle, WIDTH, HEIGHT);
    }

    /**
     * An empty chart of a given size, with its legend inside the plot area (for panels side by side).
     *
     * @param title    the chart title
     * @param xTitle   the x-axis title, with unit
     * @param yTitle   the y-axis title, with unit
     * @param widthPx  width (pixels), in [200, 4000]
     * @param heightPx height (pixels), in [200, 4000]
     * @return the plot
     */
    public static CurvesPlot of(String title, String xTitle, String yTitle, int widthPx, int heightPx) {
        Require.inRange("width (px)", widthPx, 200, 4000);
        Require.inRange("height (px)", heightPx, 200, 4000);
        XYChart c = Style.xy(widthPx, heightPx, Require.nonNull("title", title), Require.nonNull("x title", xTitle),
                Require.nonNull("y title", yTitle));
        c.getStyler().setLegendPosition(widthPx == WIDTH && heightPx == HEIGHT ? Styler.LegendPosition.OutsideS
                : Styler.LegendPosition.InsideNW);
        return new CurvesPlot(c);
    }

    /**
     * Several plots side by side in one figure.
     *
     * @param plots the plots, left to right
     * @return the figure
     */
    public static Figure row(CurvesPlot... plots) {
        java.util.List<XYChart> charts = new java.util.ArrayList<>();
        for (CurvesPlot p : Require.nonNull("plots", plots)) {
            charts.add(Require.nonNull("plot", p).chart);
        }
        return Figure.row(charts);
    }

    /** {@return this plot with the y axis starting at 0} */
    public CurvesPlot yFromZero() {
        chart.getStyler().setYAxisMin(0.0);
        return this;
    }

    /**
     * Adds a dashed curve without markers, in grey (a reference case, e.g. without a mechanism).
     *
     * @param name the legend entry
     * @param x    the x values
     * @param y    the y values, one per x
     * @return this plot
     */
    public CurvesPlot dashed(String name, double[] x, double[] y) {
        Require.nonNull("x values", x);
        Require.nonNull("y values", y);
        if (x.length != y.length || x.length == 0) {
            throw Require.invalid("y values", y.length + " values", "one per x value (" + x.length + "), at least one");
        }
        Style.line(chart, Require.nonNull("name", name), x, y, Style.GREY, Style.DASHED);
        return this;
    }

    /** {@return this plot with a logarithmic x axis} */
    public CurvesPlot logX() {
        chart.getStyler().setXAxisLogarithmic(true);
        return this;
    }

    /**
     * Adds a curve with markers, in the next colour.
     *
     * @param name the legend entry
     * @param x    the x values
     * @param y    the y values, one per x
     * @return this plot
     */
    public CurvesPlot curve(String name, double[] x, double[] y) {
        Require.nonNull("x values", x);
        Require.nonNull("y values", y);
        if (x.length != y.length || x.length == 0) {
            throw Require.invalid("y values", y.length + " values", "one per x value (" + x.length + "), at least one");
        }
        for (double v : x) {
            xMin = Math.min(xMin, v);
            xMax = Math.max(xMax, v);
        }
        Style.lineWithMarkers(chart, Require.nonNull("name", name), x, y, COLORS[curves++ % COLORS.length],
                Style.SOLID);
        return this;
    }

    /**
     * Adds a dotted horizontal reference line across the x range of the curves added so far.
     *
     * @param name the legend entry
     * @param y    the level
     * @return this plot
     */
    public CurvesPlot reference(String name, double y) {
        if (curves == 0) {
            throw Require.invalid("curves before a reference line", "0", "at least one");
        }
        Style.line(chart, Require.nonNull("name", name), new double[] {xMin, xMax}, new double[] {y, y}, Style.GREY,
                Style.DOTTED);
        return this;
    }

    /** {@return the chart as a figure (PNG, SVG or an image)} */
    public Figure figure() {
        return Figure.of(chart);
    }
}
