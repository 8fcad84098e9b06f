package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.transport.GateLeakage;
import org.wurtzkit.solvers.transport.LeakageCurve;
import org.wurtzkit.solvers.transport.LeakageOptions;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.structure.Structure;

/**
 * Example 6: the reverse gate leakage of the invented wafer {@value DemoLab#WAFER} through its
 * computed barrier ({@link GateLeakage}): the J-V curve of a {@link BiasSweep} from 0 V down to
 * {@value #BOTTOM_BIAS_V} V with the default model (Tsu-Esaki integral, WKB, thermionic and
 * tunnelling parts), the same with image-force lowering, and the same wafer with a cap twice as
 * thick. Writes {@code gate-leakage.png} (|J| on a log scale) and {@code gate-leakage.csv} (the
 * wafer's curve, default model). The data is invented; the numbers are model estimates of the
 * one-dimensional current under the gate, without the gate edges and surfaces that often dominate
 * measured leakage.
 */
public final class GateLeakageExample {
    static final int WIDTH = 900;
    static final int HEIGHT = 640;
    /** Lower end of the plot's |J| axis (A/cm^2); smaller currents are drawn on it. */
    static final double Y_MIN_A_PER_CM2 = 1e-26;
    /** Lowest gate bias of the sweep (V). */
    static final double BOTTOM_BIAS_V = -6;

    private GateLeakageExample() {
    }

    /** @param stepV bias step of the sweeps (V), &gt; 0 */
    public record Settings(double stepV) {
        /** @return 0.1 V steps */
        public static Settings full() {
            return new Settings(0.1);
        }

        /** @return 1 V steps, for tests */
        public static Settings quick() {
            return new Settings(1.0);
        }
    }

    /**
     * @param wafer      the wafer's curve, default model
     * @param imageForce the wafer's curve with image-force lowering
     * @param thickerCap the curve of the wafer with a cap twice as thick, default model
     * @param files      files written
     * @param summary    summary lines
     */
    public record Result(LeakageCurve wafer, LeakageCurve imageForce, LeakageCurve thickerCap, List<Path> files,
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
        int points = (int) Math.round(-BOTTOM_BIAS_V / settings.stepV()) + 1;
        BiasGrid grid = BiasGrid.linear(0, BOTTOM_BIAS_V, points);
        Structure wafer = DemoLab.wafer();
        double thickCapNm = 2 * DemoLab.CAP_NM;
        Structure thick = DemoLab.wafer(ParameterSets.defaultSet(), DemoLab.AL_FRACTION, DemoLab.BARRIER_NM, thickCapNm, 0);
        log.println(String.format(Locale.ROOT, "  gate leakage of wafer %s: %d biases from 0 V to %+.1f V ...",
                DemoLab.WAFER, points, BOTTOM_BIAS_V));
        BiasSweep sweep = new BiasSweep();
        BiasSweepResult s = sweep.run(wafer, grid);
        BiasSweepResult t = sweep.run(thick, grid);
        LeakageOptions model = LeakageOptions.defaults();
        LeakageCurve j = GateLeakage.curve(s, model);
        LeakageCurve image = GateLeakage.curve(s, model.withImageForceLowering(true));
        LeakageCurve capped = GateLeakage.curve(t, model);

        XYChart c = Charts.xy(WIDTH, HEIGHT, "Wafer " + DemoLab.WAFER + ": reverse gate leakage (invented demo data)",
                "gate bias V\u0067 (V)", "|J| (A/cm\u00b2)");
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setYAxisMin(Y_MIN_A_PER_CM2);
        c.getStyler().setXAxisMin(BOTTOM_BIAS_V);
        c.getStyler().setXAxisMax(0.0);
        c.getStyler().setXAxisTickMarkSpacingHint(110);
        c.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
        c.getStyler().setYAxisDecimalPattern("0E0");
        double[] v = j.gateBiasV();
        double[] x = negative(v);
        Charts.lineWithMarkers(c, "total, " + Charts.nm(DemoLab.CAP_NM) + " nm cap (WKB)", x,
                reverse(v, j.totalAPerCm2()), Charts.BLUE, Charts.SOLID);
        Charts.line(c, "  of which tunnelling", x, reverse(v, j.tunnellingAPerCm2()), Charts.GREEN, Charts.DASHED);
        Charts.line(c, "  of which thermionic", x, reverse(v, j.thermionicAPerCm2()), Charts.ORANGE, Charts.DOTTED);
        Charts.line(c, "total with image-force lowering", x, reverse(v, image.totalAPerCm2()), Charts.PURPLE,
                Charts.DASHED);
        Charts.lineWithMarkers(c, "total, " + Charts.nm(thickCapNm) + " nm cap", x,
                reverse(v, capped.totalAPerCm2()), Charts.RED, Charts.SOLID);
        List<Path> files = new ArrayList<>();
        files.add(Charts.savePng(c, out.resolve("gate-leakage.png")));
        files.add(Tables.write(j, out.resolve("gate-leakage.csv")));

        List<String> summary = new ArrayList<>();
        int last = v.length - 1;
        summary.add(String.format(Locale.ROOT, "Gate leakage of wafer %s at %+.1f V: %.3e A/cm^2 (%.3e with image "
                + "force; %.3e with a %s nm cap)", DemoLab.WAFER, v[last], j.totalAPerCm2()[last],
                image.totalAPerCm2()[last], capped.totalAPerCm2()[last], Charts.nm(thickCapNm)));
        for (int i = 0; i <= last; i++) {
            if (j.point(i).isPresent() && !j.point(i).get().warnings().isEmpty()) {
                summary.add(String.format(Locale.ROOT, "  from %+.1f V on: %s", v[i], String.join("; ",
                        j.point(i).get().warnings())));
                break;
            }
        }
        return new Result(j, image, capped, files, summary);
    }

    /** The biases below 0 V. */
    private static double[] negative(double[] bias) {
        return java.util.Arrays.stream(bias).filter(b -> b < 0).toArray();
    }

    /** |y|, floored at the axis minimum, at the points below 0 V (a log axis cannot show 0 A at 0 V). */
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
                out[k++] = Math.max(Math.abs(y[i]), Y_MIN_A_PER_CM2);
            }
        }
        return out;
    }
}
