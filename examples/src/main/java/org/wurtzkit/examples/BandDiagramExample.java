package org.wurtzkit.examples;

import java.awt.Color;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.solvers.sp.BandDiagram;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Units;

/**
 * Example 1: the band diagram of the invented wafer {@value DemoLab#WAFER} (a capped
 * AlGaN/AlN/GaN HEMT, see {@link DemoLab}) at 0 V from the full self-consistent
 * Schr&ouml;dinger&ndash;Poisson solver: E<sub>c</sub>, E<sub>v</sub>, the Fermi level, the
 * |&psi;|&sup2; of every subband that holds at least {@value #DRAWN_SHARE_PERCENT} % of the 2DEG drawn
 * at its energy, and the electron density on a second axis, over the shaded and labelled layers.
 *
 * <p>Writes {@code band-diagram.png} (the top of the stack), {@code band-diagram-channel.png} (the
 * channel enlarged), {@code band-diagram.csv} (the band edges with both sides of every step, the
 * whole stack), {@code band-diagram-nodes.csv} (per mesh node: band edges, electron density and the
 * drawn |&psi;|&sup2;) and {@code subbands.csv} (every subband). The stack and the lab are invented;
 * the numbers are model estimates.
 *
 * <p>Run: {@code java -Djava.awt.headless=true -cp ... org.wurtzkit.examples.BandDiagramExample [out] [--quick]}
 * ({@code --quick} is accepted for symmetry with the other examples; a single solve is already quick).
 */
public final class BandDiagramExample {
    /** Subbands holding at least this share of n_s (percent) are drawn. */
    static final double DRAWN_SHARE_PERCENT = 0.5;
    /** Plot sizes (pixels). */
    static final int WIDTH = 1400;
    static final int HEIGHT = 820;
    /** Height of the tallest drawn |psi|^2 on the energy axis (eV), main and channel plot. */
    private static final double PSI_HEIGHT_EV = 0.6;
    private static final double PSI_HEIGHT_CHANNEL_EV = 0.22;
    /** How far into the buffer the main plot reaches (nm). */
    private static final double BUFFER_SHOWN_NM = 30;

    private static final Color[] LAYER_FILLS = {new Color(236, 242, 250), new Color(253, 243, 224),
        new Color(232, 244, 234), new Color(244, 236, 248), new Color(240, 240, 240)};
    private static final Color[] PSI_COLORS = {Charts.ORANGE, Charts.PURPLE, new Color(0, 150, 160),
        new Color(160, 100, 40), new Color(200, 60, 140), Charts.GREY};

    private BandDiagramExample() {
    }

    /**
     * What the example computed and wrote.
     *
     * @param solution           the converged solution
     * @param sheetDensityPerCm2 n_s (cm^-2)
     * @param drawnSubbands      number of subbands drawn
     * @param files              files written
     * @param summary            summary lines
     */
    public record Result(Solution solution, double sheetDensityPerCm2, int drawnSubbands, List<Path> files,
            List<String> summary) implements ExampleResult {
    }

    /**
     * @param args {@code [output folder] [--quick]}
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        ExampleArgs a = ExampleArgs.parse(args);
        Result r = run(a.createdOut(), System.out);
        r.summary().forEach(System.out::println);
    }

    /**
     * Solves the wafer's stack and writes the plots and tables.
     *
     * @param out folder to write into (must exist)
     * @param log where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, PrintStream log) throws IOException {
        Structure wafer = DemoLab.wafer();
        log.println("  solving wafer " + DemoLab.WAFER + " (" + wafer.layerStates().size() + " layers) ...");
        Solution s = new SelfConsistentSolver().solve(wafer);
        double ns = s.sheetDensityPerCm2();
        List<Subband> drawn = drawnSubbands(s);

        List<Path> files = new ArrayList<>();
        LayerState spacer = layer(wafer, "spacer");
        double spacerBottomNm = Units.mToNm(spacer.depthBottom());
        XYChart main = chart(s, drawn, 0, spacerBottomNm + BUFFER_SHOWN_NM, Double.NaN, Double.NaN, PSI_HEIGHT_EV,
                "Wafer " + DemoLab.WAFER + " at V_g = 0 V: band diagram \u2014 " + DemoLab.INVENTED);
        files.add(Charts.savePng(main, out.resolve("band-diagram.png")));
        double barrierBottomNm = Units.mToNm(layer(wafer, "barrier").depthBottom());
        XYChart channel = chart(s, drawn, barrierBottomNm - 4, spacerBottomNm + 16, -0.65, 0.75,
                PSI_HEIGHT_CHANNEL_EV, "Wafer " + DemoLab.WAFER + " at V_g = 0 V: the channel enlarged \u2014 " + DemoLab.INVENTED);
        files.add(Charts.savePng(channel, out.resolve("band-diagram-channel.png")));
        files.addAll(writeTables(s, drawn, out));

        List<String> summary = new ArrayList<>();
        summary.add("Band diagram of wafer " + DemoLab.WAFER + " at 0 V, " + DemoLab.INVENTED + ":");
        summary.add("  stack (top down): " + describe(wafer));
        summary.add("  2DEG sheet density n_s = " + formatSheetDensity(ns) + " in " + s.subbands().size()
                + " subbands (" + drawn.size() + " drawn, each holding >= " + DRAWN_SHARE_PERCENT + " % of n_s)");
        for (Subband b : drawn) {
            summary.add(String.format(java.util.Locale.ROOT, "    E_%d - E_F = %+.4f eV, %.3e cm^-2 (%.1f %%)", b.index(),
                    b.energyEv(), b.sheetDensityPerCm2(), 100 * b.sheetDensityPerCm2() / ns));
        }
        summary.add("  electrons in the whole stack " + String.format(java.util.Locale.ROOT, "%.4e cm^-2",
                Units.perM2ToPerCm2(s.electronSheetDensity())) + "; field in the barrier "
                + Charts.fixed(meanField(s, layer(wafer, "barrier")) / Units.MV_PER_CM, 3) + " MV/cm (along the depth)");
        summary.add("  model estimate: confirm by measurement");
        return new Result(s, ns, drawn.size(), List.copyOf(files), List.copyOf(summary));
    }

    /** @return the 2DEG density as printed by every example and the jshell walkthrough */
    static String formatSheetDensity(double perCm2) {
        return String.format(java.util.Locale.ROOT, "%.6e cm^-2", perCm2);
    }

    static String describe(Structure st) {
        StringBuilder sb = new StringBuilder();
        for (LayerState l : st.layerStates()) {
            if (sb.length() > 0) {
                sb.append(" / ");
            }
            sb.append(l.layer().name()).append(' ').append(l.layer().material().describe()).append(' ')
                    .append(Charts.nm(l.layer().thicknessNm())).append(" nm");
        }
        return sb.toString();
    }

    static LayerState layer(Structure st, String name) {
        for (LayerState l : st.layerStates()) {
            if (l.layer().name().equals(name)) {
                return l;
            }
        }
        throw new IllegalArgumentException("no layer named " + name + " in " + st);
    }

    /**
     * The mean electric field over a layer, the length-weighted mean of the cell fields inside it.
     *
     * @return field along the depth direction (V/m)
     */
    static double meanField(Solution s, LayerState layer) {
        double[] mid = s.cellMidpoints();
        double[] e = s.electricField();
        double[] x = s.depth();
        double sum = 0;
        double length = 0;
        for (int k = 0; k < mid.length; k++) {
            if (mid[k] > layer.depthTop() && mid[k] < layer.depthBottom()) {
                double h = x[k + 1] - x[k];
                sum += e[k] * h;
                length += h;
            }
        }
        return sum / length;
    }

    private static List<Subband> drawnSubbands(Solution s) {
        double total = 0;
        for (Subband b : s.subbands()) {
            total += b.sheetDensity();
        }
        List<Subband> out = new ArrayList<>();
        for (Subband b : s.subbands()) {
            if (b.sheetDensity() >= DRAWN_SHARE_PERCENT / 100 * total) {
                out.add(b);
            }
        }
        return out;
    }

    private static XYChart chart(Solution s, List<Subband> drawn, double fromNm, double toNm, double yMin,
            double yMax, double psiHeightEv, String title) {
        XYChart c = Charts.xy(WIDTH, HEIGHT, title, "depth below the surface (nm)", "energy E \u2212 E_F (eV)");
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        c.getStyler().setPlotContentSize(0.9999);
        c.getStyler().setXAxisMin(fromNm);
        c.getStyler().setXAxisMax(toNm);

        BandDiagram bd = s.bandDiagram();
        double[] bdNm = bd.depthNm();
        double[] bdEc = bd.conductionEv();
        double[] bdEv = bd.valenceEv();
        List<double[]> band = new ArrayList<>();
        for (int i = 0; i < bdNm.length; i++) {
            double d = bdNm[i];
            if (d >= fromNm - 1e-9 && d <= toNm + 1e-9) {
                band.add(new double[] {d, bdEc[i], bdEv[i]});
            }
        }
        double[] bx = column(band, 0);
        double[] ec = column(band, 1);
        double[] ev = column(band, 2);
        boolean whole = Double.isNaN(yMin);
        // the whole diagram: both band edges, with room above them for the layer labels
        double lo = whole ? Math.floor(2 * (min(ev) - 0.3)) / 2 : yMin;
        double hi = whole ? Math.ceil(2 * (max(ec) + 1.2)) / 2 : yMax;
        c.getStyler().setYAxisMin(lo);
        c.getStyler().setYAxisMax(hi);

        List<LayerState> shown = new ArrayList<>();
        for (LayerState l : s.structure().layerStates()) {
            double top = Math.max(Units.mToNm(l.depthTop()), fromNm);
            double bottom = Math.min(Units.mToNm(l.depthBottom()), toNm);
            if (bottom > top) {
                shown.add(l);
                String label = l.layer().name() + ": " + l.layer().material().describe() + ", "
                        + Charts.nm(l.layer().thicknessNm()) + " nm";
                XYSeries r = Charts.rectangle(c, label, top, bottom, lo, hi,
                        LAYER_FILLS[l.indexFromTop() % LAYER_FILLS.length], true);
                r.setLineColor(new Color(170, 170, 170));
            }
        }

        Charts.line(c, "E_c, conduction band", bx, ec, Charts.BLUE, Charts.SOLID);
        if (whole) {
            Charts.line(c, "E_v, valence band", bx, ev, Charts.GREEN, Charts.SOLID);
        }
        Charts.line(c, "E_F = 0, Fermi level", new double[] {fromNm, toNm}, new double[] {0, 0}, Charts.INK,
                Charts.DASHED);

        double[] x = s.depthNm();
        double psiMax = 0;
        for (Subband b : drawn) {
            for (double p : b.wavefunction()) {
                psiMax = Math.max(psiMax, p * p);
            }
        }
        for (int k = 0; k < drawn.size(); k++) {
            Subband b = drawn.get(k);
            double[] psi = b.wavefunction();
            double ownMax = 0;
            for (double p : psi) {
                ownMax = Math.max(ownMax, p * p);
            }
            List<double[]> pts = new ArrayList<>();
            for (int i = 0; i < x.length; i++) {
                double p2 = psi[i] * psi[i];
                if (x[i] >= fromNm && x[i] <= toNm && p2 >= 1e-3 * ownMax) {
                    pts.add(new double[] {x[i], b.energyEv() + psiHeightEv * p2 / psiMax});
                }
            }
            if (pts.isEmpty()) {
                continue;
            }
            Color color = PSI_COLORS[k % PSI_COLORS.length];
            double x0 = pts.get(0)[0];
            double x1 = pts.get(pts.size() - 1)[0];
            // the level itself, and the curve standing on it
            XYSeries level = Charts.line(c, "E_" + b.index(), new double[] {x0, x1},
                    new double[] {b.energyEv(), b.energyEv()}, color, Charts.DOTTED);
            level.setShowInLegend(false);
            pts.add(0, new double[] {x0, b.energyEv()});
            pts.add(new double[] {x1, b.energyEv()});
            String name = String.format(java.util.Locale.ROOT, "|\u03c8%s|\u00b2 at E%s = %+.3f eV, %.2f\u00d710\u00b9\u00b2 cm\u207b\u00b2",
                    subscript(b.index()), subscript(b.index()), b.energyEv(), b.sheetDensityPerCm2() / 1e12);
            Charts.line(c, name, column(pts, 0), column(pts, 1), color, Charts.SOLID);
        }

        double[] n = s.electronDensity();
        List<double[]> np = new ArrayList<>();
        double nMax = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] >= fromNm && x[i] <= toNm) {
                double v = Units.perM3ToPerCm3(n[i]) / 1e19;
                np.add(new double[] {x[i], v});
                nMax = Math.max(nMax, v);
            }
        }
        XYSeries ns = Charts.line(c, "n, electron density (right axis)", column(np, 0), column(np, 1), Charts.RED,
                Charts.SOLID);
        ns.setYAxisGroup(1);
        c.setYAxisGroupTitle(1, "electron density n (10\u00b9\u2079 cm\u207b\u00b3)");
        c.getStyler().setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        c.getStyler().setYAxisMin(1, 0.0);
        c.getStyler().setYAxisMax(1, niceCeiling(nMax * (whole ? 1.6 : 1.15)));

        Charts.layOut(c);
        labelLayers(c, shown, fromNm, toNm, hi);
        return c;
    }

    /**
     * Labels every shaded layer at the top of the plot: name and "material, thickness" inside the
     * layer where they fit, the name alone where only it fits, and otherwise "\u2190 name" just to
     * the right of the layer, one row lower (the legend lists every layer in full).
     */
    private static void labelLayers(XYChart c, List<LayerState> shown, double fromNm, double toNm, double hi) {
        java.awt.Font f = Charts.ANNOTATION_FONT;
        double line = f.getSize2D() * 1.45;
        double topPx = c.getScreenYFromChart(hi);
        double row1 = topPx + 6 + line / 2;
        for (LayerState l : shown) {
            double left = c.getScreenXFromChart(Math.max(Units.mToNm(l.depthTop()), fromNm));
            double right = c.getScreenXFromChart(Math.min(Units.mToNm(l.depthBottom()), toNm));
            double width = right - left;
            String name = l.layer().name();
            String detail = l.layer().material().describe() + ", " + Charts.nm(l.layer().thicknessNm()) + " nm";
            double centre = 0.5 * (left + right);
            if (Charts.textWidth(detail, f) + 8 <= width) {
                Charts.textAtPixel(c, name, centre, row1);
                Charts.textAtPixel(c, detail, centre, row1 + line);
            } else if (Charts.textWidth(name, f) + 2 <= width) {
                Charts.textAtPixel(c, name, centre, row1);
            } else {
                String text = "\u2190 " + name;
                Charts.textAtPixel(c, text, right + 6 + Charts.textWidth(text, f) / 2, row1 + 2 * line);
            }
        }
    }

    private static String subscript(int k) {
        StringBuilder sb = new StringBuilder();
        for (char ch : Integer.toString(k).toCharArray()) {
            sb.append((char) ('\u2080' + (ch - '0')));
        }
        return sb.toString();
    }

    private static List<Path> writeTables(Solution s, List<Subband> drawn, Path out) throws IOException {
        List<Path> files = new ArrayList<>();
        BandDiagram bd = s.bandDiagram();
        Tables bands = Tables.of(Column.of("depth", "nm"), Column.of("conduction_band_minus_fermi", "eV"),
                Column.of("valence_band_minus_fermi", "eV"));
        double[] bdNm = bd.depthNm();
        double[] bdEc = bd.conductionEv();
        double[] bdEv = bd.valenceEv();
        for (int i = 0; i < bd.size(); i++) {
            bands.row(bdNm[i], bdEc[i], bdEv[i]);
        }
        files.add(bands.write(out.resolve("band-diagram.csv")));

        List<Column> cols = new ArrayList<>(List.of(Column.of("depth", "nm"),
                Column.of("conduction_band_minus_fermi", "eV"), Column.of("valence_band_minus_fermi", "eV"),
                Column.of("electron_density", "cm^-3")));
        for (Subband b : drawn) {
            cols.add(Column.of("psi_squared_subband_" + b.index(), "1/nm"));
        }
        Tables nodes = Tables.of(cols.toArray(new Column[0]));
        double[] x = s.depthNm();
        double[] ec = s.conductionBand();
        double[] ev = s.valenceBand();
        double[] n = s.electronDensity();
        List<double[]> psi = new ArrayList<>();
        for (Subband b : drawn) {
            psi.add(b.wavefunction());
        }
        for (int i = 0; i < x.length; i++) {
            Object[] row = new Object[cols.size()];
            row[0] = x[i];
            row[1] = ec[i];
            row[2] = ev[i];
            row[3] = Units.perM3ToPerCm3(n[i]);
            for (int k = 0; k < psi.size(); k++) {
                row[4 + k] = psi.get(k)[i] * psi.get(k)[i] * Units.NM; // 1/m -> 1/nm
            }
            nodes.row(row);
        }
        files.add(nodes.write(out.resolve("band-diagram-nodes.csv")));

        Tables sub = Tables.of(Column.of("window", ""), Column.of("index", ""),
                Column.of("energy_minus_fermi", "eV"), Column.of("occupation", "cm^-2"),
                Column.of("in_plane_mass", "m0"));
        for (Subband b : s.subbands()) {
            sub.row(b.window(), b.index(), b.energyEv(), b.sheetDensityPerCm2(), b.inPlaneMass());
        }
        files.add(sub.write(out.resolve("subbands.csv")));
        return files;
    }

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
