package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.plot.Figure;
import org.wurtzkit.plot.GateSweepPlot;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.PointFailure;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Units;

/**
 * Example 4: the gate sweep of the invented wafer {@value DemoLab#WAFER}: n_s against the gate
 * bias V_g and the quasi-static C&ndash;V curve from a {@link BiasSweep} of the full solver (with
 * continuation), the threshold voltage read off by linear extrapolation at the steepest slope
 * (drawn as the tangent) and at a constant density of {@value #LEVEL_PER_CM2} cm^-2, and the
 * analytic charge-balance model of the same stack beside them.
 *
 * <p>The sweep runs from {@value #TOP_BIAS_V} V down to 1.5 V below the analytic model's
 * threshold. Writes {@code gate-sweep.png}, {@code gate-sweep.csv} (the sweep's own table),
 * {@code gate-sweep-cv.csv} (the C&ndash;V table) and {@code gate-sweep-threshold.csv}. The data is
 * invented; the numbers are model estimates.
 */
public final class GateSweepExample {
    static final int PANEL_WIDTH = 900;
    static final int PANEL_HEIGHT = 720;
    /** Highest gate bias of the sweep (V), well below the onset of conduction in the barrier. */
    static final double TOP_BIAS_V = 0.5;
    /** The level of the constant-density threshold definition (cm^-2). */
    static final double LEVEL_PER_CM2 = 1e11;
    /** How far the sweep reaches below the analytic threshold (V). */
    private static final double BELOW_THRESHOLD_V = 1.5;

    private GateSweepExample() {
    }

    /** @param stepV bias step of the sweep (V), &gt; 0 */
    public record Settings(double stepV) {
        /** @return 0.1 V steps */
        public static Settings full() {
            return new Settings(0.1);
        }

        /** @return 0.5 V steps, for tests */
        public static Settings quick() {
            return new Settings(0.5);
        }
    }

    /**
     * @param sweep             the sweep
     * @param thresholdLinearV  V_th by linear extrapolation (V)
     * @param thresholdLevelV   V_th at n_s = {@value #LEVEL_PER_CM2} cm^-2 (V), NaN if the sweep does not reach it
     * @param thresholdAnalyticV V_th of the analytic model (V)
     * @param tangentSlope      slope of the drawn tangent (cm^-2 per V)
     * @param tangentZeroV      where the drawn tangent meets n_s = 0 (V)
     * @param files             files written
     * @param summary           summary lines
     */
    public record Result(BiasSweepResult sweep, double thresholdLinearV, double thresholdLevelV,
            double thresholdAnalyticV, double tangentSlope, double tangentZeroV, List<Path> files,
            List<String> summary) implements ExampleResult {
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
     * @param settings the bias step
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        Structure wafer = DemoLab.wafer();
        ChargeBalanceModel model = ChargeBalanceModel.fromStructure(wafer);
        double bottom = Math.floor((model.thresholdVoltage() - BELOW_THRESHOLD_V) / settings.stepV())
                * settings.stepV();
        int points = (int) Math.round((TOP_BIAS_V - bottom) / settings.stepV()) + 1;
        BiasGrid grid = BiasGrid.linear(TOP_BIAS_V, bottom, points);
        log.println(String.format(Locale.ROOT, "  gate sweep of wafer %s: %d biases from %+.2f V to %+.2f V ...",
                DemoLab.WAFER, points, TOP_BIAS_V, bottom));
        long t0 = System.nanoTime();
        BiasSweepResult r = new BiasSweep().run(wafer, grid);
        double seconds = (System.nanoTime() - t0) / 1e9;

        double vthLinear = r.thresholdVoltage(ThresholdDefinition.linearExtrapolation());
        double vthLevel;
        try {
            vthLevel = r.thresholdVoltage(ThresholdDefinition.constantDensity(LEVEL_PER_CM2));
        } catch (IllegalArgumentException e) {
            vthLevel = Double.NaN;
        }
        double vthModel = model.thresholdVoltage();

        // ascending order for the tangent
        double[] v = r.gateBiasV();
        double[] ns = r.sheetDensityPerCm2();
        reverseIfDescending(v, ns);
        GateSweepPlot.Tangent tangent = GateSweepPlot.steepestTangent(v, ns);
        double slope = tangent.slopePerCm2PerV();
        double tangentZero = tangent.zeroV();

        List<Path> files = new ArrayList<>();
        Figure figure = GateSweepPlot.of(r).analyticModel(model).constantDensityThreshold(LEVEL_PER_CM2)
                .title("Wafer " + DemoLab.WAFER + " (invented demo data)")
                .panelSize(PANEL_WIDTH, PANEL_HEIGHT)
                .figure();
        files.add(figure.writePng(out.resolve("gate-sweep.png")));
        files.add(Tables.write(r, out.resolve("gate-sweep.csv")));
        files.add(Tables.write(r.capacitanceVoltage(), out.resolve("gate-sweep-cv.csv")));
        Tables th = Tables.of(Column.of("model", ""), Column.of("definition", ""), Column.of("threshold_voltage", "V"));
        th.row("self-consistent solver", ThresholdDefinition.linearExtrapolation().describe(), vthLinear);
        th.row("self-consistent solver", ThresholdDefinition.constantDensity(LEVEL_PER_CM2).describe(), vthLevel);
        th.row("analytic charge-balance model", "n_s = 0 at zero temperature", vthModel);
        files.add(th.write(out.resolve("gate-sweep-threshold.csv")));

        List<String> summary = new ArrayList<>();
        summary.add("Gate sweep of wafer " + DemoLab.WAFER + ", " + DemoLab.INVENTED + ":");
        summary.add(String.format(Locale.ROOT, "  %d biases from %+.2f V to %+.2f V in %.1f s, %d failed",
                points, TOP_BIAS_V, bottom, seconds, r.failures().size()));
        for (PointFailure f : r.failures()) {
            summary.add("    " + f);
        }
        summary.add(String.format(Locale.ROOT, "  n_s(V_g = %+.2f V) = %.4e cm^-2", v[v.length - 1], ns[ns.length - 1]));
        summary.add(String.format(Locale.ROOT, "  threshold voltage: %+.3f V (linear extrapolation), %+.3f V (n_s = %.0e cm^-2),"
                + " %+.3f V (analytic model)", vthLinear, vthLevel, LEVEL_PER_CM2, vthModel));
        double[] c = r.capacitanceVoltage().capacitanceMicroFaradPerCm2();
        summary.add(String.format(Locale.ROOT, "  C at the top of the sweep %.4f uF/cm^2; series capacitance of the layers above the"
                + " channel %.4f uF/cm^2", c[0], model.gateCapacitance() / Units.UF_PER_CM2));
        summary.add("  model estimates: confirm by measurement");
        return new Result(r, vthLinear, vthLevel, vthModel, slope, tangentZero, List.copyOf(files),
                List.copyOf(summary));
    }

    private static void reverseIfDescending(double[] x, double[] y) {
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
