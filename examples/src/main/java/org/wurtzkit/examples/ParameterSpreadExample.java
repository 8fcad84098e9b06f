package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.plot.Figure;
import org.wurtzkit.plot.SpreadPlot;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.ParameterSetSpread;
import org.wurtzkit.solvers.workflow.ProgressListener;
import org.wurtzkit.solvers.workflow.SpreadResult;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;

/**
 * Example 5: how far the answer depends on the parameter set. The stack of the invented wafer
 * {@value DemoLab#WAFER} is solved, for several barrier Al fractions, with every registered
 * parameter set ({@link ParameterSets#all()}: the built-in published sets and, with this module
 * on the class path, the invented set of the fictional lab, {@link DemoLabParameterSets}, which is
 * labelled "(invented)" wherever it appears) by {@link ParameterSetSpread}: n_s at 0 V and the
 * threshold voltage (linear extrapolation of a bias sweep), with the min&ndash;max band and the
 * median across the sets ({@link SpreadPlot}).
 *
 * <p>Writes {@code parameter-spread.png}, {@code parameter-spread.csv} (every member) and
 * {@code parameter-spread-summary.csv} (min, median, max per Al fraction). The data is invented;
 * the numbers are model estimates, and their spread is a reminder of how far published constants
 * disagree.
 */
public final class ParameterSpreadExample {
    static final int PANEL_WIDTH = 900;
    static final int PANEL_HEIGHT = 720;
    /** Highest bias of each threshold sweep (V). */
    private static final double TOP_BIAS_V = 0.5;
    /** How far below the analytic threshold of the default set each sweep reaches (V). */
    private static final double BELOW_THRESHOLD_V = 2.0;

    private ParameterSpreadExample() {
    }

    /**
     * @param alFractions barrier Al fractions, increasing
     * @param biasStepV   bias step of the threshold sweeps (V)
     */
    public record Settings(double[] alFractions, double biasStepV) {
        /** @return six Al fractions 0.15 to 0.40, 0.25 V steps */
        public static Settings full() {
            return new Settings(new double[] {0.15, 0.20, 0.25, 0.30, 0.35, 0.40}, 0.25);
        }

        /** @return two Al fractions, 1 V steps, for tests */
        public static Settings quick() {
            return new Settings(new double[] {0.20, 0.30}, 1.0);
        }
    }

    /**
     * @param sets    the parameter sets, in the order of the members
     * @param spreads one spread per Al fraction
     * @param files   files written
     * @param summary summary lines
     */
    public record Result(List<String> sets, List<SpreadResult> spreads, List<Path> files, List<String> summary)
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
     * @param settings Al fractions and bias step
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        double[] xs = settings.alFractions();
        // the published sets first, the invented one (when registered) last
        List<ParameterSet> sets = new ArrayList<>(ParameterSets.all());
        sets.sort(java.util.Comparator.comparing(set -> DemoLabParameterSets.NAME.equals(set.name())));
        List<String> names = sets.stream().map(ParameterSet::name).toList();
        log.println("  parameter sets: " + names.stream().map(DemoLabParameterSets::label).toList());
        int total = xs.length * sets.size();
        TerminalProgress bar = new TerminalProgress("parameter-set spread", log);
        SelfConsistentSolver solver = new SelfConsistentSolver();
        List<SpreadResult> spreads = new ArrayList<>();
        for (int i = 0; i < xs.length; i++) {
            double x = xs[i];
            double vth = ChargeBalanceModel.fromStructure(DemoLab.wafer(ParameterSets.defaultSet(), x,
                    DemoLab.BARRIER_NM, DemoLab.CAP_NM, 0)).thresholdVoltage();
            double step = settings.biasStepV();
            double bottom = Math.floor((vth - BELOW_THRESHOLD_V) / step) * step;
            int points = (int) Math.round((TOP_BIAS_V - bottom) / step) + 1;
            ThresholdExtraction threshold = new ThresholdExtraction(BiasGrid.linear(TOP_BIAS_V, bottom, points),
                    ThresholdDefinition.linearExtrapolation());
            int offset = i * sets.size();
            ProgressListener p = (done, n) -> bar.progress(offset + done, total);
            spreads.add(new ParameterSetSpread(solver, threshold).withProgress(p)
                    .run(set -> DemoLab.wafer(set, x, DemoLab.BARRIER_NM, DemoLab.CAP_NM, 0), sets));
        }

        Tables members = Tables.of(Column.of("barrier_al_fraction", ""), Column.of("parameter_set", ""),
                Column.of("sheet_density", "cm^-2"), Column.of("threshold_voltage", "V"), Column.of("status", ""));
        Tables stats = Tables.of(Column.of("barrier_al_fraction", ""), Column.of("sheet_density_min", "cm^-2"),
                Column.of("sheet_density_median", "cm^-2"), Column.of("sheet_density_max", "cm^-2"),
                Column.of("threshold_voltage_min", "V"), Column.of("threshold_voltage_median", "V"),
                Column.of("threshold_voltage_max", "V"), Column.of("members", ""));
        for (int i = 0; i < xs.length; i++) {
            SpreadResult s = spreads.get(i);
            for (SpreadResult.Member m : s.members()) {
                members.row(xs[i], DemoLabParameterSets.label(m.parameterSet()), m.sheetDensityPerCm2(), m.thresholdVoltage(),
                        m.succeeded() ? "ok" : "failed: " + m.failure().message());
            }
            SpreadResult.Statistics n = s.sheetDensityPerCm2();
            SpreadResult.Statistics v = s.thresholdVoltage();
            stats.row(xs[i], n.min(), n.median(), n.max(), v.min(), v.median(), v.max(), n.count());
        }

        Figure figure = SpreadPlot.of(xs, spreads).xTitle("Al fraction x of the barrier")
                .title("invented demo stack").setLabels(DemoLabParameterSets::label)
                .panelSize(PANEL_WIDTH, PANEL_HEIGHT).figure();
        List<Path> files = new ArrayList<>();
        files.add(figure.writePng(out.resolve("parameter-spread.png")));
        files.add(members.write(out.resolve("parameter-spread.csv")));
        files.add(stats.write(out.resolve("parameter-spread-summary.csv")));

        List<String> summary = new ArrayList<>();
        summary.add("Parameter-set spread for wafer " + DemoLab.WAFER + " with other Al fractions, " + DemoLab.INVENTED
                + ":");
        summary.add("  sets: " + names.stream().map(DemoLabParameterSets::label).toList());
        for (int i = 0; i < xs.length; i++) {
            SpreadResult.Statistics n = spreads.get(i).sheetDensityPerCm2();
            SpreadResult.Statistics v = spreads.get(i).thresholdVoltage();
            summary.add(String.format(Locale.ROOT,
                    "  x = %.2f: n_s %.3e to %.3e cm^-2 (range %.0f %% of the median), V_th %+.2f to %+.2f V; %d of %d sets",
                    xs[i], n.min(), n.max(), 100 * n.range() / n.median(), v.min(), v.max(), n.count(), sets.size()));
            spreads.get(i).failures().forEach(f -> summary.add("    " + f));
        }
        summary.add("  model estimates: confirm by measurement");
        return new Result(names, List.copyOf(spreads), List.copyOf(files), List.copyOf(summary));
    }
}
