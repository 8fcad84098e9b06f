package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.plot.BandDiagramPlot;
import org.wurtzkit.plot.Labels;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.BandDiagram;
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

        List<Path> files = new ArrayList<>();
        LayerState spacer = layer(wafer, "spacer");
        double spacerBottomNm = Units.mToNm(spacer.depthBottom());
        BandDiagramPlot main = BandDiagramPlot.of(s).size(WIDTH, HEIGHT)
                .minSubbandSharePercent(DRAWN_SHARE_PERCENT)
                .depthRangeNm(0, spacerBottomNm + BUFFER_SHOWN_NM)
                .wavefunctionHeightEv(PSI_HEIGHT_EV)
                .title("Wafer " + DemoLab.WAFER + " at " + Labels.V_G + " = 0 V: band diagram \u2014 " + DemoLab.INVENTED);
        List<Subband> drawn = main.drawnSubbands();
        files.add(main.figure().writePng(out.resolve("band-diagram.png")));
        double barrierBottomNm = Units.mToNm(layer(wafer, "barrier").depthBottom());
        BandDiagramPlot channel = BandDiagramPlot.of(s).size(WIDTH, HEIGHT)
                .minSubbandSharePercent(DRAWN_SHARE_PERCENT)
                .depthRangeNm(barrierBottomNm - 4, spacerBottomNm + 16)
                .energyRangeEv(-0.65, 0.75).valenceBand(false)
                .wavefunctionHeightEv(PSI_HEIGHT_CHANNEL_EV)
                .title("Wafer " + DemoLab.WAFER + " at " + Labels.V_G + " = 0 V: the channel enlarged \u2014 "
                        + DemoLab.INVENTED);
        files.add(channel.figure().writePng(out.resolve("band-diagram-channel.png")));
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
                + Labels.fixed(meanField(s, layer(wafer, "barrier")) / Units.MV_PER_CM, 3) + " MV/cm (along the depth)");
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
                    .append(Labels.trimmed(l.layer().thicknessNm())).append(" nm");
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

    /**
     * @return the name of a subband's |psi|^2 column: "subband_0_psi_squared" (the index first, so
     *         that it is never read as part of the unit), with the quantum window as well,
     *         "window_1_subband_0_psi_squared", when the solution has more than one
     */
    static String psiColumn(Solution s, Subband b) {
        boolean windows = s.subbands().stream().anyMatch(o -> o.window() != b.window());
        return (windows ? "window_" + b.window() + "_" : "") + "subband_" + b.index() + "_psi_squared";
    }

    private static List<Path> writeTables(Solution s, List<Subband> drawn, Path out) throws IOException {
        List<Path> files = new ArrayList<>();
        BandDiagram bd = s.bandDiagram();
        double[] bdNm = bd.depthNm();
        double[] bdEc = bd.conductionEv();
        double[] bdEv = bd.valenceEv();
        Tables bands = Tables.of(Column.of("depth", "nm"), Column.of("conduction_band_minus_fermi", "eV"),
                Column.of("valence_band_minus_fermi", "eV"));
        for (int i = 0; i < bdNm.length; i++) {
            bands.row(bdNm[i], bdEc[i], bdEv[i]);
        }
        files.add(bands.write(out.resolve("band-diagram.csv")));

        List<Column> cols = new ArrayList<>(List.of(Column.of("depth", "nm"),
                Column.of("conduction_band_minus_fermi", "eV"), Column.of("valence_band_minus_fermi", "eV"),
                Column.of("electron_density", "cm^-3")));
        for (Subband b : drawn) {
            cols.add(Column.of(psiColumn(s, b), "nm^-1"));
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

}
