package org.wurtzkit.plot;

import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.sp.BandDiagram;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.units.Units;

/**
 * The band diagram of a converged {@link Solution}: E<sub>c</sub>, E<sub>v</sub> and the Fermi
 * level against the depth, over the layers shaded and labelled; each subband that holds at least
 * a given share of the 2DEG drawn as its |&psi;|&sup2; standing on a dotted line at its energy; the
 * electron density on a second axis.
 *
 * <pre>{@code
 * Figure f = BandDiagramPlot.of(solution).title("My wafer at 0 V").figure();
 * f.writePng(Path.of("band-diagram.png"));
 * }</pre>
 *
 * <p>A |&psi;|&sup2; curve is drawn over the nodes where it exceeds {@value #PSI_CUT} of its own
 * maximum; where the depth range cuts it, it ends in mid-air at the edge of the plot (it goes on
 * beyond it), never closed down to its level, which would look like a wall that is not there.
 */
public final class BandDiagramPlot {
    /** Share of its own maximum below which a |psi|^2 curve is not drawn. */
    static final double PSI_CUT = 1e-3;
    private static final Color[] LAYER_FILLS = {new Color(236, 242, 250), new Color(253, 243, 224),
        new Color(232, 244, 234), new Color(244, 236, 248), new Color(240, 240, 240)};
    private static final Color[] PSI_COLORS = {Style.ORANGE, Style.PURPLE, new Color(0, 150, 160),
        new Color(160, 100, 40), new Color(200, 60, 140), Style.GREY};

    private final Solution solution;
    private int width = 1400;
    private int height = 820;
    private String title = "Band diagram";
    private double fromNm = Double.NaN;
    private double toNm = Double.NaN;
    private double minEv = Double.NaN;
    private double maxEv = Double.NaN;
    private boolean valenceBand = true;
    private double minSharePercent = 0.5;
    private double psiHeightEv = Double.NaN;

    private BandDiagramPlot(Solution solution) {
        this.solution = Require.nonNull("solution", solution);
    }

    /**
     * @param solution a converged solution
     * @return a plot with the defaults: 1400 &times; 820 pixels, from the surface to 30 nm into the
     *         bottom layer, energies chosen to show both band edges, subbands holding at least
     *         0.5 % of n_s
     */
    public static BandDiagramPlot of(Solution solution) {
        return new BandDiagramPlot(solution);
    }

    /**
     * @param widthPx  width (pixels), at least 300
     * @param heightPx height (pixels), at least 200
     * @return this plot
     */
    public BandDiagramPlot size(int widthPx, int heightPx) {
        this.width = Require.inRange("width", widthPx, 300, 20_000);
        this.height = Require.inRange("height", heightPx, 200, 20_000);
        return this;
    }

    /** @param text the title @return this plot */
    public BandDiagramPlot title(String text) {
        this.title = Require.nonNull("title", text);
        return this;
    }

    /**
     * @param from depth of the left edge (nm), &ge; 0
     * @param to   depth of the right edge (nm), &gt; from
     * @return this plot
     */
    public BandDiagramPlot depthRangeNm(double from, double to) {
        Require.nonNegative("from (nm)", from);
        Require.finite("to (nm)", to);
        if (!(to > from)) {
            throw new org.wurtzkit.errors.InvalidParameterException("to (nm)", Double.toString(to),
                    "greater than from = " + from + " nm");
        }
        this.fromNm = from;
        this.toNm = to;
        return this;
    }

    /**
     * Fixes the energy axis (eV, relative to the Fermi level); without it the axis is chosen to
     * show both band edges with room for the layer labels.
     *
     * @param min bottom (eV)
     * @param max top (eV), &gt; min
     * @return this plot
     */
    public BandDiagramPlot energyRangeEv(double min, double max) {
        Require.finite("min (eV)", min);
        Require.finite("max (eV)", max);
        if (!(max > min)) {
            throw new org.wurtzkit.errors.InvalidParameterException("max (eV)", Double.toString(max),
                    "greater than min = " + min + " eV");
        }
        this.minEv = min;
        this.maxEv = max;
        return this;
    }

    /** @param show whether E_v is drawn (default true) @return this plot */
    public BandDiagramPlot valenceBand(boolean show) {
        this.valenceBand = show;
        return this;
    }

    /**
     * @param percent subbands holding at least this share of the electrons in subbands are drawn
     *                (percent, 0 to 100; default 0.5)
     * @return this plot
     */
    public BandDiagramPlot minSubbandSharePercent(double percent) {
        this.minSharePercent = Require.inRange("percent", percent, 0, 100);
        return this;
    }

    /**
     * @param ev height on the energy axis of the tallest drawn |psi|^2 (eV, &gt; 0); by default
     *           6.5 % of the energy axis when E_v is drawn, 16 % otherwise
     * @return this plot
     */
    public BandDiagramPlot wavefunctionHeightEv(double ev) {
        this.psiHeightEv = Require.positive("wavefunction height (eV)", ev);
        return this;
    }

    /** @return the subbands this plot draws, in the solution's order */
    public List<Subband> drawnSubbands() {
        double total = 0;
        for (Subband b : solution.subbands()) {
            total += b.sheetDensity();
        }
        List<Subband> out = new ArrayList<>();
        for (Subband b : solution.subbands()) {
            if (total > 0 && b.sheetDensity() >= minSharePercent / 100 * total) {
                out.add(b);
            }
        }
        return out;
    }

    /** @return the plot as a figure of one panel */
    public Figure figure() {
        return Figure.of(chart());
    }

    private double defaultToNm() {
        List<LayerState> layers = solution.structure().layerStates();
        LayerState bottom = layers.get(layers.size() - 1);
        return Math.min(Units.mToNm(bottom.depthTop()) + 30, Units.mToNm(bottom.depthBottom()));
    }

    XYChart chart() {
        double from = Double.isNaN(fromNm) ? 0 : fromNm;
        double to = Double.isNaN(toNm) ? defaultToNm() : toNm;
        XYChart c = Style.xy(width, height, title, "depth below the surface (nm)",
                "energy E \u2212 " + Labels.E_F + " (eV)");
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        c.getStyler().setPlotContentSize(0.9999);
        c.getStyler().setXAxisMin(from);
        c.getStyler().setXAxisMax(to);

        BandDiagram bd = solution.bandDiagram();
        double[] bdNm = bd.depthNm();
        double[] bdEc = bd.conductionEv();
        double[] bdEv = bd.valenceEv();
        List<double[]> band = new ArrayList<>();
        for (int i = 0; i < bdNm.length; i++) {
            double d = bdNm[i];
            if (d >= from - 1e-9 && d <= to + 1e-9) {
                band.add(new double[] {d, bdEc[i], bdEv[i]});
            }
        }
        double[] bx = column(band, 0);
        double[] ec = column(band, 1);
        double[] ev = column(band, 2);
        boolean auto = Double.isNaN(minEv);
        double lo = auto ? Math.floor(2 * ((valenceBand ? min(ev) : min(ec)) - 0.3)) / 2 : minEv;
        double hi = auto ? Math.ceil(2 * (max(ec) + 1.2)) / 2 : maxEv;
        c.getStyler().setYAxisMin(lo);
        c.getStyler().setYAxisMax(hi);
        double psiHeight = Double.isNaN(psiHeightEv) ? (valenceBand ? 0.065 : 0.16) * (hi - lo) : psiHeightEv;

        List<LayerState> shown = new ArrayList<>();
        for (LayerState l : solution.structure().layerStates()) {
            double top = Math.max(Units.mToNm(l.depthTop()), from);
            double bottom = Math.min(Units.mToNm(l.depthBottom()), to);
            if (bottom > top) {
                shown.add(l);
                XYSeries r = Style.rectangle(c, layerText(l, ": "), top, bottom, lo, hi,
                        LAYER_FILLS[l.indexFromTop() % LAYER_FILLS.length], true);
                r.setLineColor(new Color(170, 170, 170));
            }
        }

        Style.line(c, Labels.E_C + ", conduction band", bx, ec, Style.BLUE, Style.SOLID);
        if (valenceBand) {
            Style.line(c, Labels.E_V + ", valence band", bx, ev, Style.GREEN, Style.SOLID);
        }
        Style.line(c, Labels.E_F + " = 0, Fermi level", new double[] {from, to}, new double[] {0, 0}, Style.INK,
                Style.DASHED);

        List<Subband> drawn = drawnSubbands();
        double[] x = solution.depthNm();
        double psiMax = 0;
        for (Subband b : drawn) {
            for (double p : b.wavefunction()) {
                psiMax = Math.max(psiMax, p * p);
            }
        }
        for (int k = 0; k < drawn.size(); k++) {
            Subband b = drawn.get(k);
            double[] curve = wavefunctionCurve(x, b.wavefunction(), from, to);
            if (curve.length == 0) {
                continue;
            }
            int n = curve.length / 2;
            double[] cx = new double[n];
            double[] cy = new double[n];
            for (int i = 0; i < n; i++) {
                cx[i] = curve[2 * i];
                cy[i] = b.energyEv() + psiHeight * curve[2 * i + 1] / psiMax;
            }
            Color color = PSI_COLORS[k % PSI_COLORS.length];
            XYSeries level = Style.line(c, "level " + b.index(), new double[] {cx[0], cx[n - 1]},
                    new double[] {b.energyEv(), b.energyEv()}, color, Style.DOTTED);
            level.setShowInLegend(false);
            String e = Labels.sub("E", Integer.toString(b.index()));
            String name = String.format(Locale.ROOT, "|\u03c8_%d|\u00b2 at %s = %+.3f eV, %.2f\u00d7%s %s", b.index(), e,
                    b.energyEv(), b.sheetDensityPerCm2() / 1e12, Labels.powerOfTen(12), Labels.PER_CM2);
            Style.line(c, name, cx, cy, color, Style.SOLID);
        }

        double[] n = solution.electronDensity();
        List<double[]> np = new ArrayList<>();
        double nMax = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] >= from && x[i] <= to) {
                double v = Units.perM3ToPerCm3(n[i]) / 1e19;
                np.add(new double[] {x[i], v});
                nMax = Math.max(nMax, v);
            }
        }
        XYSeries ns = Style.line(c, "n, electron density (right axis)", column(np, 0), column(np, 1), Style.RED,
                Style.SOLID);
        ns.setYAxisGroup(1);
        c.setYAxisGroupTitle(1, "electron density n (" + Labels.powerOfTen(19) + " " + Labels.PER_CM3 + ")");
        c.getStyler().setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        c.getStyler().setYAxisMin(1, 0.0);
        c.getStyler().setYAxisMax(1, niceCeiling(nMax * (valenceBand ? 1.6 : 1.15)));

        Style.layOut(c);
        labelLayers(c, shown, from, to, hi);
        return c;
    }

    /**
     * The part of a |psi|^2 curve to draw: the contiguous run of nodes from the first to the last
     * one where |psi|^2 exceeds {@link #PSI_CUT} of its maximum, cut to the depth range. Nothing is
     * added at either end.
     *
     * @param x   node depths (nm)
     * @param psi the wavefunction at the nodes
     * @return x and |psi|^2 interleaved, empty if nothing lies in the range
     */
    static double[] wavefunctionCurve(double[] x, double[] psi, double from, double to) {
        double own = 0;
        for (double p : psi) {
            own = Math.max(own, p * p);
        }
        int first = -1;
        int last = -1;
        for (int i = 0; i < psi.length; i++) {
            if (psi[i] * psi[i] >= PSI_CUT * own) {
                if (first < 0) {
                    first = i;
                }
                last = i;
            }
        }
        List<double[]> pts = new ArrayList<>();
        for (int i = Math.max(first, 0); first >= 0 && i <= last; i++) {
            if (x[i] >= from && x[i] <= to) {
                pts.add(new double[] {x[i], psi[i] * psi[i]});
            }
        }
        double[] out = new double[2 * pts.size()];
        for (int i = 0; i < pts.size(); i++) {
            out[2 * i] = pts.get(i)[0];
            out[2 * i + 1] = pts.get(i)[1];
        }
        return out;
    }

    private static String layerText(LayerState l, String separator) {
        return l.layer().name() + separator + l.layer().material().describe() + ", "
                + Labels.trimmed(l.layer().thicknessNm()) + " nm";
    }

    /**
     * Labels every shaded layer at the top of the plot: name and "material, thickness" inside the
     * layer where they fit, the name alone where only it fits, and otherwise "&larr; name" just to
     * the right of the layer, one row lower (the legend lists every layer in full).
     */
    private static void labelLayers(XYChart c, List<LayerState> shown, double fromNm, double toNm, double hi) {
        Font f = Style.ANNOTATION_FONT;
        double line = f.getSize2D() * 1.45;
        double topPx = c.getScreenYFromChart(hi);
        double row1 = topPx + 6 + line / 2;
        for (LayerState l : shown) {
            double left = c.getScreenXFromChart(Math.max(Units.mToNm(l.depthTop()), fromNm));
            double right = c.getScreenXFromChart(Math.min(Units.mToNm(l.depthBottom()), toNm));
            double width = right - left;
            String name = l.layer().name();
            String detail = l.layer().material().describe() + ", " + Labels.trimmed(l.layer().thicknessNm()) + " nm";
            double centre = 0.5 * (left + right);
            if (Style.textWidth(detail, f) + 8 <= width) {
                Style.textAtPixel(c, name, centre, row1);
                Style.textAtPixel(c, detail, centre, row1 + line);
            } else if (Style.textWidth(name, f) + 2 <= width) {
                Style.textAtPixel(c, name, centre, row1);
            } else {
                String text = "\u2190 " + name;
                Style.textAtPixel(c, text, right + 6 + Style.textWidth(text, f) / 2, row1 + 2 * line);
            }
        }
    }

    /** @return the smallest of 1, 1.2, 1.4, ... 8, 10 times a power of ten that is &ge; v */
    static double niceCeiling(double v) {
        if (!(v > 0)) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(v)));
        for (double m : new double[] {1, 1.2, 1.4, 1.6, 1.8, 2, 2.5, 3, 4, 5, 6, 8, 10}) {
            if (m * p >= v) {
                return m * p;
            }
        }
        return 10 * p;
    }

    static double[] column(List<double[]> rows, int c) {
        double[] out = new double[rows.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = rows.get(i)[c];
        }
        return out;
    }

    static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double d : v) {
            m = Math.min(m, d);
        }
        return m;
    }

    static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            m = Math.max(m, d);
        }
        return m;
    }
}
