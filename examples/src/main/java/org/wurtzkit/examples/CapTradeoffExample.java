package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.plot.Figure;
import org.wurtzkit.plot.Labels;
import org.wurtzkit.plot.TradeoffPlot;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.DesignMap;
import org.wurtzkit.solvers.workflow.DesignMapResult;
import org.wurtzkit.solvers.workflow.Quantity;
import org.wurtzkit.solvers.workflow.StructureFamilies;
import org.wurtzkit.solvers.workflow.StructureFamily;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.units.Units;

/**
 * Example 3: the cap-layer trade-off of the invented wafer {@value DemoLab#WAFER}: how the 2DEG
 * sheet density n_s and the electric field in the AlGaN barrier change with the thickness of the
 * GaN cap (0 = no cap), everything else as on the wafer. The full solver runs as a one-axis
 * {@link DesignMap} (progress on the terminal); the analytic charge-balance model of the same
 * stacks is drawn beside it. The two quantities are drawn in two panels stacked over one shared
 * x axis ({@link TradeoffPlot}), each with its own y axis.
 *
 * <p>Writes {@code cap-tradeoff.png}, {@code cap-tradeoff.csv} (per cap thickness: n_s of both
 * models, the barrier field, status) and {@code cap-tradeoff-map.csv} (the design map's own
 * table). The data is invented; the numbers are model estimates.
 */
public final class CapTradeoffExample {
    static final int WIDTH = 1200;
    /** Height of each of the two stacked panels (pixels); the figure adds room for title and x axis. */
    static final int PANEL_HEIGHT = 380;

    private CapTradeoffExample() {
    }

    /** @param capNm cap thicknesses (nm), increasing, 0 for no cap */
    public record Settings(double[] capNm) {
        /** @return 0 to 10 nm in steps of 0.5 nm */
        public static Settings full() {
            return new Settings(Axis.linear("cap", "nm", 0, 10, 21).values());
        }

        /** @return three thicknesses for tests */
        public static Settings quick() {
            return new Settings(new double[] {0, 2, 6});
        }
    }

    /**
     * @param map           the full solver's results per cap thickness
     * @param analyticPerCm2 analytic n_s per cap thickness (cm^-2)
     * @param files         files written
     * @param summary       summary lines
     */
    public record Result(DesignMapResult map, double[] analyticPerCm2, List<Path> files, List<String> summary)
            implements ExampleResult {
    }

    /**
     * @param args {@code [output folder] [--quick]}
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        ExampleArgs a = ExampleArgs.parse(args);
        Result r = run(a.createdOut(), a.quick() ? Settings.quick() : Settings.full(), System.out);
        r.summary().forEach(System.out::println);
    }

    /**
     * The mean field along the depth direction in the layer named "barrier" (MV/cm); negative when
     * it points toward the surface, as in a metal-face barrier above a 2DEG.
     */
    static final Quantity BARRIER_FIELD = Quantity.of("barrier_field_along_depth", "MV/cm",
            s -> barrierField(s) / Units.MV_PER_CM);

    private static double barrierField(Solution s) {
        LayerState barrier = BandDiagramExample.layer(s.structure(), "barrier");
        return BandDiagramExample.meanField(s, barrier);
    }

    /**
     * @param out      folder to write into (must exist)
     * @param settings the cap thicknesses
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        double[] caps = settings.capNm();
        StructureFamily family = StructureFamilies.layerThicknessNm(DemoLab.wafer(), "cap");
        DesignMapResult map = DesignMap.builder(p -> family.at(p[0]))
                .axis(Axis.of(family.parameter().name(), family.parameter().unit(), caps))
                .quantities(Quantity.SHEET_DENSITY, BARRIER_FIELD)
                .progress(new TerminalProgress("cap trade-off, full solver", log))
                .build()
                .run();
        int n = caps.length;
        double[] ns = map.column("sheet_density");
        double[] field = map.column("barrier_field_along_depth");
        double[] analytic = new double[n];
        Tables t = Tables.of(Column.of("cap_thickness", "nm"), Column.of("sheet_density", "cm^-2"),
                Column.of("sheet_density_analytic", "cm^-2"), Column.of("barrier_field_along_depth", "MV/cm"),
                Column.of("status", ""));
        for (int i = 0; i < n; i++) {
            analytic[i] = ChargeBalanceModel.fromStructure(family.at(caps[i])).sheetDensityPerCm2();
            t.row(caps[i], ns[i], analytic[i], field[i], map.failure(i).map(f -> "failed: " + f.message()).orElse("ok"));
        }

        double[] nsScaled = new double[n];
        double[] anScaled = new double[n];
        double[] fieldAbs = new double[n];
        for (int i = 0; i < n; i++) {
            nsScaled[i] = ns[i] / 1e13;
            anScaled[i] = analytic[i] / 1e13;
            fieldAbs[i] = Math.abs(field[i]);
        }
        Figure figure = TradeoffPlot.along("GaN cap thickness (nm)", caps)
                .title("Wafer " + DemoLab.WAFER + ": 2DEG and barrier field against the GaN cap \u2014 " + DemoLab.INVENTED)
                .size(WIDTH, PANEL_HEIGHT)
                .panel("2DEG sheet density " + Labels.N_S + " (" + Labels.powerOfTen(13) + " " + Labels.PER_CM2 + ")")
                .points(Labels.N_S + ", self-consistent solver", nsScaled)
                .line(Labels.N_S + ", analytic charge-balance model", anScaled)
                .panel("field in the AlGaN barrier |E| (MV/cm)")
                .points("|E| in the barrier, self-consistent solver", fieldAbs)
                .mark("wafer " + DemoLab.WAFER + " (" + Labels.trimmed(DemoLab.CAP_NM) + " nm cap)", DemoLab.CAP_NM)
                .figure();

        List<Path> files = new ArrayList<>();
        files.add(figure.writePng(out.resolve("cap-tradeoff.png")));
        files.add(t.write(out.resolve("cap-tradeoff.csv")));
        files.add(Tables.write(map, out.resolve("cap-tradeoff-map.csv")));

        List<String> summary = new ArrayList<>();
        summary.add("Cap-layer trade-off of wafer " + DemoLab.WAFER + ", " + DemoLab.INVENTED + ":");
        for (int i = 0; i < n; i++) {
            if (i == 0 || i == n - 1 || caps[i] == DemoLab.CAP_NM) {
                summary.add(String.format(Locale.ROOT,
                        "  cap %5s nm: n_s = %.4e cm^-2 (analytic %.4e), barrier field %+.3f MV/cm", Labels.trimmed(caps[i]),
                        ns[i], analytic[i], field[i]));
            }
        }
        double slope = (ns[n - 1] - ns[0]) / (caps[n - 1] - caps[0]);
        summary.add(String.format(Locale.ROOT, "  n_s changes by %.3e cm^-2 per nm of cap on average (%.1f %% per nm of the uncapped value)",
                slope, 100 * slope / ns[0]));
        summary.add("  failed points: " + map.failures().size());
        summary.add("  model estimates: confirm by measurement");
        return new Result(map, analytic, List.copyOf(files), List.copyOf(summary));
    }
}
