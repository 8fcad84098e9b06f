package org.wurtzkit.plot;

import java.util.List;
import java.util.Locale;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.CapacitanceVoltage;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.units.Units;

/**
 * A gate sweep in two panels side by side: n_s against V_g with the threshold voltage read off by
 * linear extrapolation at the steepest slope (the tangent drawn) and, optionally, at a constant
 * density; and the quasi-static C&ndash;V curve of the same sweep. An analytic charge-balance model
 * of the same stack, when given, is drawn beside the solver in both panels (its n_s(V_g) line and
 * its series capacitance).
 *
 * <pre>{@code
 * BiasSweepResult sweep = new BiasSweep().run(wafer, BiasGrid.linear(0.5, -5, 56));
 * GateSweepPlot.of(sweep).analyticModel(ChargeBalanceModel.fromStructure(wafer)).figure().writePng(file);
 * }</pre>
 */
public final class GateSweepPlot {
    private final BiasSweepResult sweep;
    private ChargeBalanceModel model;
    private double levelPerCm2 = Double.NaN;
    private String subject = "Gate sweep";
    private int panelWidth = 900;
    private int panelHeight = 720;

    private GateSweepPlot(BiasSweepResult sweep) {
        this.sweep = Require.nonNull("sweep", sweep);
        if (sweep.size() < 3) {
            throw new org.wurtzkit.errors.InvalidParameterException("sweep size", Integer.toString(sweep.size()),
                    "at least 3 biases");
        }
    }

    /**
     * @param sweep a bias sweep of at least three points
     * @return a plot of two 900 &times; 720 pixel panels
     */
    public static GateSweepPlot of(BiasSweepResult sweep) {
        return new GateSweepPlot(sweep);
    }

    /** @param m the analytic model of the same stack, drawn beside the solver @return this plot */
    public GateSweepPlot analyticModel(ChargeBalanceModel m) {
        this.model = Require.nonNull("model", m);
        return this;
    }

    /**
     * Also reads the threshold off where n_s crosses a level; left out if the sweep does not reach it.
     *
     * @param perCm2 the level (cm^-2), &gt; 0
     * @return this plot
     */
    public GateSweepPlot constantDensityThreshold(double perCm2) {
        this.levelPerCm2 = Require.positive("level (cm^-2)", perCm2);
        return this;
    }

    /** @param text what the panels' titles begin with, e.g. the wafer's name @return this plot */
    public GateSweepPlot title(String text) {
        this.subject = Require.nonNull("title", text);
        return this;
    }

    /**
     * @param widthPx  width of each panel (pixels)
     * @param heightPx height (pixels)
     * @return this plot
     */
    public GateSweepPlot panelSize(int widthPx, int heightPx) {
        this.panelWidth = Require.inRange("width", widthPx, 300, 20_000);
        this.panelHeight = Require.inRange("height", heightPx, 200, 20_000);
        return this;
    }

    /**
     * The tangent of the linear-extrapolation threshold: the straight line through the two
     * neighbouring points of the steepest rise of n_s(V_g).
     *
     * @param slopePerCm2PerV its slope (cm^-2 per V)
     * @param zeroV           where it meets n_s = 0 (V), NaN if n_s never rises
     */
    public record Tangent(double slopePerCm2PerV, double zeroV) {
    }

    /**
     * @param biasV      biases (V), increasing
     * @param nsPerCm2   n_s at them (cm^-2)
     * @return the tangent at the steepest interval
     */
    public static Tangent steepestTangent(double[] biasV, double[] nsPerCm2) {
        int steep = -1;
        double slope = 0;
        for (int k = 0; k + 1 < biasV.length; k++) {
            double s = (nsPerCm2[k + 1] - nsPerCm2[k]) / (biasV[k + 1] - biasV[k]);
            if (s > slope) {
                slope = s;
                steep = k;
            }
        }
        return new Tangent(slope, steep < 0 ? Double.NaN : biasV[steep] - nsPerCm2[steep] / slope);
    }

    /** @return the two panels side by side */
    public Figure figure() {
        double[] v = sweep.gateBiasV();
        double[] ns = sweep.sheetDensityPerCm2();
        reverseIfDescending(v, ns);
        double vthLinear = sweep.thresholdVoltage(ThresholdDefinition.linearExtrapolation());
        double vthLevel = Double.NaN;
        if (!Double.isNaN(levelPerCm2)) {
            try {
                vthLevel = sweep.thresholdVoltage(ThresholdDefinition.constantDensity(levelPerCm2));
            } catch (IllegalArgumentException notReached) {
                vthLevel = Double.NaN;
            }
        }
        return Figure.row(List.of(nsPanel(v, ns, vthLinear, vthLevel, steepestTangent(v, ns)),
                cvPanel(sweep.capacitanceVoltage(), vthLinear)));
    }

    private XYChart nsPanel(double[] v, double[] ns, double vthLinear, double vthLevel, Tangent t) {
        XYChart c = Style.xy(panelWidth, panelHeight, subject + ": " + Labels.N_S + " against " + Labels.V_G,
                "gate bias " + Labels.V_G + " (V)", "2DEG sheet density " + Labels.N_S + " (" + Labels.powerOfTen(13)
                        + " " + Labels.PER_CM2 + ")");
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNW);
        double[] y = new double[ns.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = ns[i] / 1e13;
        }
        double top = BandDiagramPlot.niceCeiling(1.3 * BandDiagramPlot.max(y));
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(top);
        c.getStyler().setXAxisMin(v[0]);
        c.getStyler().setXAxisMax(v[v.length - 1]);
        Style.lineWithMarkers(c, "self-consistent solver", v, y, Style.BLUE, Style.SOLID);
        if (model != null) {
            int fine = 200;
            double[] vf = new double[fine];
            double[] nf = new double[fine];
            for (int i = 0; i < fine; i++) {
                vf[i] = v[0] + (v[v.length - 1] - v[0]) * i / (fine - 1);
                nf[i] = model.sheetDensityPerCm2(vf[i]) / 1e13;
            }
            Style.line(c, "analytic charge-balance model", vf, nf, Style.GREY, Style.DASHED);
        }
        if (!Double.isNaN(t.zeroV())) {
            double vEnd = v[v.length - 1];
            Style.line(c, "tangent at the steepest slope", new double[] {t.zeroV(), vEnd},
                    new double[] {0, t.slopePerCm2PerV() * (vEnd - t.zeroV()) / 1e13}, Style.ORANGE, Style.DOTTED);
        }
        Style.line(c, String.format(Locale.ROOT, "%s = %+.2f V (linear extrapolation)", Labels.V_TH, vthLinear),
                new double[] {vthLinear, vthLinear}, new double[] {0, top}, Style.RED, Style.SOLID);
        if (!Double.isNaN(vthLevel)) {
            int exp = (int) Math.floor(Math.log10(levelPerCm2));
            double mant = levelPerCm2 / Math.pow(10, exp);
            String level = (Math.abs(mant - 1) < 1e-9 ? "" : Labels.trimmed(mant) + "\u00d7") + Labels.powerOfTen(exp);
            Style.line(c, String.format(Locale.ROOT, "%s = %+.2f V (%s = %s %s)", Labels.V_TH, vthLevel, Labels.N_S,
                    level, Labels.PER_CM2), new double[] {vthLevel, vthLevel}, new double[] {0, top}, Style.PURPLE,
                    Style.DASHED);
        }
        return c;
    }

    private XYChart cvPanel(CapacitanceVoltage cv, double vthLinear) {
        XYChart c = Style.xy(panelWidth, panelHeight, subject + ": quasi-static C\u2013V",
                "gate bias " + Labels.V_G + " (V), interval midpoints", "gate capacitance C (\u00b5F/cm\u00b2)");
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNW);
        double[] v = cv.midpointBiasV();
        double[] cap = cv.capacitanceMicroFaradPerCm2();
        reverseIfDescending(v, cap);
        double series = model == null ? Double.NaN : model.gateCapacitance() / Units.UF_PER_CM2;
        double top = BandDiagramPlot.niceCeiling(1.3 * (model == null ? BandDiagramPlot.max(cap)
                : Math.max(BandDiagramPlot.max(cap), series)));
        c.getStyler().setYAxisDecimalPattern("0.00");
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(top);
        c.getStyler().setXAxisMin(v[0]);
        c.getStyler().setXAxisMax(v[v.length - 1]);
        Style.lineWithMarkers(c, "C = dQ_gate/d" + Labels.V_G + ", self-consistent solver", v, cap, Style.BLUE,
                Style.SOLID);
        if (model != null) {
            Style.line(c, String.format(Locale.ROOT, "series capacitance above the channel (analytic), %.3f \u00b5F/cm\u00b2",
                    series), new double[] {v[0], v[v.length - 1]}, new double[] {series, series}, Style.GREY,
                    Style.DASHED);
        }
        Style.line(c, String.format(Locale.ROOT, "%s = %+.2f V (linear extrapolation)", Labels.V_TH, vthLinear),
                new double[] {vthLinear, vthLinear}, new double[] {0, top}, Style.RED, Style.SOLID);
        return c;
    }

    static void reverseIfDescending(double[] x, double[] y) {
        if (x.length > 1 && x[0] > x[x.length - 1]) {
            for (int i = 0, j = x.length - 1; i < j; i++, j--) {
                double t = x[i];
                x[i] = x[j];
                x[j] = t;
                t = y[i];
                y[i] = y[j];
                y[j] = t;
            }
        }
    }
}
