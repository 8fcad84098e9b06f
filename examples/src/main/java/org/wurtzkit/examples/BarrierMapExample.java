package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.plot.DesignMapPlot;
import org.wurtzkit.plot.Labels;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.DesignMap;
import org.wurtzkit.solvers.workflow.DesignMapResult;
import org.wurtzkit.solvers.workflow.PointFailure;
import org.wurtzkit.solvers.workflow.Quantity;
import org.wurtzkit.solvers.workflow.StructureFactory;

/**
 * Example 2: the barrier design map of the invented wafer family of {@link DemoLab}: the 2DEG
 * sheet density n_s over the barrier's Al fraction and thickness (cap, spacer, buffer and gate as
 * on wafer {@value DemoLab#WAFER}), from the full self-consistent solver
 * ({@link DesignMap}, in parallel, with progress on the terminal) and from the analytic
 * charge-balance model ({@link ChargeBalanceModel#fromStructure}) of the same stacks, side by side
 * on one colour scale with contour lines, and a third panel with their relative difference
 * (analytic &minus; full) / full in percent ({@link DesignMapPlot}).
 *
 * <p>Writes {@code barrier-map.png}, {@code barrier-map-full.csv} (the design map's own table) and
 * {@code barrier-map-analytic.csv}. The data is invented; the numbers are model estimates.
 */
public final class BarrierMapExample {
    static final int PANEL_WIDTH = 860;
    static final int PANEL_HEIGHT = 720;

    private BarrierMapExample() {
    }

    /**
     * The grid.
     *
     * @param alFractions barrier Al fractions, increasing
     * @param barrierNm   barrier thicknesses (nm), increasing
     */
    public record Settings(double[] alFractions, double[] barrierNm) {
        /** @return the demo's grid: 16 Al fractions 0.10 to 0.40 by 16 thicknesses 5 to 35 nm */
        public static Settings full() {
            return new Settings(Axis.linear("x", "", 0.10, 0.40, 16).values(),
                    Axis.linear("d", "nm", 5, 35, 16).values());
        }

        /** @return a 3 x 3 grid for tests */
        public static Settings quick() {
            return new Settings(new double[] {0.15, 0.25, 0.35}, new double[] {10, 20, 30});
        }
    }

    /**
     * @param full          the full solver's map (n_s in cm^-2)
     * @param analytic      analytic n_s (cm^-2), [Al index][thickness index]
     * @param files         files written
     * @param summary       summary lines
     */
    public record Result(DesignMapResult full, double[][] analytic, List<Path> files, List<String> summary)
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
     * @param out      folder to write into (must exist)
     * @param settings the grid
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        double[] xs = settings.alFractions();
        double[] ds = settings.barrierNm();
        StructureFactory family = p -> DemoLab.wafer(ParameterSets.defaultSet(), p[0], p[1], DemoLab.CAP_NM, 0);
        long t0 = System.nanoTime();
        DesignMapResult map = DesignMap.builder(family)
                .axis(Axis.of("barrier_al_fraction", "", xs))
                .axis(Axis.of("barrier_thickness", "nm", ds))
                .quantities(Quantity.SHEET_DENSITY, Quantity.GROUND_SUBBAND)
                .progress(new TerminalProgress("barrier map, full solver", log))
                .build()
                .run();
        double seconds = (System.nanoTime() - t0) / 1e9;

        int nx = xs.length;
        int nd = ds.length;
        double[][] full = new double[nx][nd];
        double[][] analytic = new double[nx][nd];
        Tables at = Tables.of(Column.of("barrier_al_fraction", ""), Column.of("barrier_thickness", "nm"),
                Column.of("sheet_density", "cm^-2"), Column.of("threshold_voltage", "V"));
        double[] ns = map.column("sheet_density");
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < nd; j++) {
                full[i][j] = ns[map.index(i, j)];
                ChargeBalanceModel m = ChargeBalanceModel.fromStructure(family.at(new double[] {xs[i], ds[j]}));
                analytic[i][j] = m.sheetDensityPerCm2();
                at.row(xs[i], ds[j], analytic[i][j], m.thresholdVoltage());
            }
        }

        DesignMapPlot plot = DesignMapPlot.of(xs, ds, scaled(full))
                .axes("Al fraction x of the barrier", "barrier thickness (nm)")
                .quantity(Labels.N_S + " (" + Labels.powerOfTen(13) + " " + Labels.PER_CM2 + ")")
                .title(DemoLab.WAFER + " family (invented)")
                .name("full solver")
                .compareWith("analytic model", scaled(analytic))
                .mark("wafer " + DemoLab.WAFER, DemoLab.AL_FRACTION, DemoLab.BARRIER_NM)
                .panelSize(PANEL_WIDTH, PANEL_HEIGHT);

        List<Path> files = new ArrayList<>();
        files.add(plot.figure().writePng(out.resolve("barrier-map.png")));
        files.add(Tables.write(map, out.resolve("barrier-map-full.csv")));
        files.add(at.write(out.resolve("barrier-map-analytic.csv")));

        double maxRel = 0;
        double sumRel = 0;
        int count = 0;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < nd; j++) {
                if (!Double.isNaN(full[i][j]) && full[i][j] > 0) {
                    double rel = (analytic[i][j] - full[i][j]) / full[i][j];
                    maxRel = Math.abs(rel) > Math.abs(maxRel) ? rel : maxRel;
                    sumRel += Math.abs(rel);
                    count++;
                }
            }
        }
        List<String> summary = new ArrayList<>();
        summary.add("Barrier design map around wafer " + DemoLab.WAFER + ", " + DemoLab.INVENTED + ":");
        summary.add(String.format(Locale.ROOT, "  %d x %d points (Al fraction %.2f to %.2f, barrier %s to %s nm, cap %s nm,"
                + " AlN spacer %s nm), full solver in %.1f s", nx, nd, xs[0], xs[nx - 1], Labels.trimmed(ds[0]),
                Labels.trimmed(ds[nd - 1]), Labels.trimmed(DemoLab.CAP_NM), Labels.trimmed(DemoLab.SPACER_NM), seconds));
        summary.add(String.format(Locale.ROOT, "  full solver n_s from %.3e to %.3e cm^-2; analytic model from %.3e to %.3e cm^-2",
                min(full), max(full), min(analytic), max(analytic)));
        summary.add(String.format(Locale.ROOT, "  analytic minus full, relative: mean |difference| %.1f %%, largest %+.1f %%",
                count == 0 ? Double.NaN : 100 * sumRel / count, 100 * maxRel));
        summary.add("  failed points: " + map.failures().size());
        for (PointFailure f : map.failures()) {
            summary.add("    " + f);
        }
        summary.add("  model estimates: confirm by measurement");
        return new Result(map, analytic, List.copyOf(files), List.copyOf(summary));
    }

    private static double[][] scaled(double[][] z) {
        double[][] out = new double[z.length][];
        for (int i = 0; i < z.length; i++) {
            out[i] = z[i].clone();
            for (int j = 0; j < out[i].length; j++) {
                out[i][j] /= 1e13;
            }
        }
        return out;
    }

    private static double min(double[][] z) {
        double m = Double.NaN;
        for (double[] r : z) {
            for (double v : r) {
                m = Double.isNaN(m) || v < m ? v : m;
            }
        }
        return m;
    }

    private static double max(double[][] z) {
        double m = Double.NaN;
        for (double[] r : z) {
            for (double v : r) {
                m = Double.isNaN(m) || v > m ? v : m;
            }
        }
        return m;
    }
}
