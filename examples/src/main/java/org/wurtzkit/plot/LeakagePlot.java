// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.plot;

import java.awt.Color;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.transport.LeakageCurve;

/**
 * Reverse gate leakage against gate bias on a logarithmic current axis: |J| (A/cm²) over the
 * reverse part of one or more {@link LeakageCurve}s, with the tunnelling and thermionic parts of a
 * curve on request. Currents below the axis floor are drawn at the floor (a log axis has no zero).
 *
 * <pre>{@code
 * LeakagePlot.reverse("Reverse gate leakage", -10).total("2 nm cap", curve).components(curve)
 *         .figure().writePng(file);
 * }</pre>
 */
public final class LeakagePlot {
    /** Width of the chart (pixels). */
    public static final int WIDTH = 900;
    /** Height of the chart (pixels). */
    public static final int HEIGHT = 640;
    /** The floor of the current axis (A/cm²). */
    public static final double FLOOR_A_PER_CM2 = 1e-26;
    private static final Color[] TOTAL_COLORS = {Style.BLUE, Style.RED, Style.PURPLE, Style.GREY};

    private final XYChart chart;
    private int totals;

    private LeakagePlot(XYChart chart) {
        this.chart = chart;
    }

    /**
     * An empty chart of reverse bias from {@code bottomBiasV} to 0 V.
     *
     * @param title       the chart title
     * @param bottomBiasV the most negative gate bias shown (V), below 0
     * @return the plot
     */
    public static LeakagePlot reverse(String title, double bottomBiasV) {
        Require.nonNull("title", title);
        if (!(bottomBiasV < 0) || !Double.isFinite(bottomBiasV)) {
            throw Require.invalid("bottom gate bias (V)", Double.toString(bottomBiasV), "(-Infinity, 0), finite");
        }
        XYChart c = Style.xy(WIDTH, HEIGHT, title, "gate bias " + Labels.V_G + " (V)", "|J| (A/cm\u00b2)");
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setYAxisMin(FLOOR_A_PER_CM2);
        c.getStyler().setXAxisMin(bottomBiasV);
        c.getStyler().setXAxisMax(0.0);
        c.getStyler().setXAxisTickMarkSpacingHint(110);
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
        c.getStyler().setYAxisDecimalPattern("0E0");
        return new LeakagePlot(c);
    }

    /**
     * Adds a curve's total current as a line with markers, in the next colour.
     *
     * @param name  the legend entry
     * @param curve the curve
     * @return this plot
     */
    public LeakagePlot total(String name, LeakageCurve curve) {
        Color color = TOTAL_COLORS[totals++ % TOTAL_COLORS.length];
        double[] v = Require.nonNull("leakage curve", curve).gateBiasV();
        Style.lineWithMarkers(chart, Require.nonNull("name", name), negative(v), reverse(v, curve.totalAPerCm2()),
                color, Style.SOLID);
        return this;
    }

    /**
     * Adds a curve's total current as a dashed line without markers (a variant of a model).
     *
     * @param name  the legend entry
     * @param curve the curve
     * @return this plot
     */
    public LeakagePlot variant(String name, LeakageCurve curve) {
        double[] v = Require.nonNull("leakage curve", curve).gateBiasV();
        Style.line(chart, Require.nonNull("name", name), negative(v), reverse(v, curve.totalAPerCm2()), Style.PURPLE,
                Style.DASHED);
        return this;
    }

    /**
     * Adds the tunnelling (dashed) and thermionic (dotted) parts of a curve.
     *
     * @param curve the curve
     * @return this plot
     */
    public LeakagePlot components(LeakageCurve curve) {
        double[] v = Require.nonNull("leakage curve", curve).gateBiasV();
        double[] x = negative(v);
        Style.line(chart, "  of which tunnelling", x, reverse(v, curve.tunnellingAPerCm2()), Style.GREEN, Style.DASHED);
        Style.line(chart, "  of which thermionic", x, reverse(v, curve.thermionicAPerCm2()), Style.ORANGE,
                Style.DOTTED);
        return this;
    }

    /** {@return the chart as a figure (PNG, SVG or an image)} */
    public Figure figure() {
        return Figure.of(chart);
    }

    /** The biases below 0 V. */
    private static double[] negative(double[] bias) {
        return java.util.Arrays.stream(bias).filter(b -> b < 0).toArray();
    }

    /** |J| at the biases below 0 V, drawn at the axis floor where smaller. */
    private static double[] reverse(double[] bias, double[] y) {
        int n = 0;
        for (double b : bias) {
            if (b < 0) {
                n++;
            }
        }
        double[] out = new double[n];
        int k = 0;
        for (int i = 0; i < bias.length; i++) {
            if (bias[i] < 0) {
                out[k++] = Math.max(Math.abs(y[i]), FLOOR_A_PER_CM2);
            }
        }
        return out;
    }
}
