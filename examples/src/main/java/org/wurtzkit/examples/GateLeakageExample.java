package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.plot.Figure;
import org.wurtzkit.plot.LeakagePlot;
import org.wurtzkit.plot.Labels;
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
    static final int WIDTH = LeakagePlot.WIDTH;
    static final int HEIGHT = LeakagePlot.HEIGHT;
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

        double[] v = j.gateBiasV();
        Figure plot = LeakagePlot.reverse("Wafer " + DemoLab.WAFER + ": reverse gate leakage (invented demo data)",
                BOTTOM_BIAS_V)
                .total("total, " + Labels.sig(DemoLab.CAP_NM, 3) + " nm cap (WKB)", j).components(j)
                .variant("total with image-force lowering", image)
                .total("total, " + Labels.sig(thickCapNm, 3) + " nm cap", capped).figure();
        List<Path> files = new ArrayList<>();
        files.add(plot.writePng(out.resolve("gate-leakage.png")));
        files.add(Tables.write(j, out.resolve("gate-leakage.csv")));

        List<String> summary = new ArrayList<>();
        int last = v.length - 1;
        summary.add(String.format(Locale.ROOT, "Gate leakage of wafer %s at %+.1f V: %.3e A/cm^2 (%.3e with image "
                + "force; %.3e with a %s nm cap)", DemoLab.WAFER, v[last], j.totalAPerCm2()[last],
                image.totalAPerCm2()[last], capped.totalAPerCm2()[last], Labels.sig(thickCapNm, 3)));
        for (int i = 0; i <= last; i++) {
            if (j.point(i).isPresent() && !j.point(i).get().warnings().isEmpty()) {
                summary.add(String.format(Locale.ROOT, "  from %+.1f V on: %s", v[i], String.join("; ",
                        j.point(i).get().warnings().stream().map(org.wurtzkit.warnings.Warning::message).toList())));
                break;
            }
        }
        return new Result(j, image, capped, files, summary);
    }

}
