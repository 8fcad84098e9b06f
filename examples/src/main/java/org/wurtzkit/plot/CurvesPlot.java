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
        XYChart c = Style.xy(WIDTH, HEIGHT, Require.nonNull("title", title), Require.nonNull("x title", xTitle),
                Require.nonNull("y title", yTitle));
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS);
        return new CurvesPlot(c);
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
