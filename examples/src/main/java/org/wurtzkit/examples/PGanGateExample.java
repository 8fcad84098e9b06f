package org.wurtzkit.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.plot.CurvesPlot;
import org.wurtzkit.plot.Labels;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/**
 * Example 6: the threshold voltage of a normally-off p-GaN gate HEMT, the invented wafer
 * {@value #WAFER} of the demo lab (gate / p-GaN:Mg 70 nm / Al0.2Ga0.8N / GaN 1 um), against the Mg
 * density for three barrier thicknesses. Each point is a gate sweep of the full solver with the Mg
 * and the holes of the p-GaN at the gate's quasi-Fermi level (the default of
 * {@link org.wurtzkit.solvers.sp.QuasiFermiLevels}); the Mg level follows
 * {@link Dopant#magnesiumInGaNPerCm3(double)}. V_th is where the channel 2DEG reaches 1e11 cm^-2.
 *
 * <p>Writes {@code p-gan-gate-vth.png} and {@code p-gan-gate-vth.csv}. The wafer is invented; the
 * numbers are one-dimensional equilibrium estimates (no gate leakage, no traps).
 */
public final class PGanGateExample {
    static final int WIDTH = CurvesPlot.WIDTH;
    static final int HEIGHT = CurvesPlot.HEIGHT;
    /** The invented p-GaN gate wafer of the demo lab. */
    public static final String WAFER = "TNL-0817";
    /** Gate metal to conduction band on p-GaN (eV), nearly ohmic for holes (invented wafer value). */
    static final double GATE_BARRIER_EV = 3.3;

    private PGanGateExample() {
    }

    /**
     * @param mgPerCm3  Mg densities (cm^-3), increasing
     * @param barrierNm barrier thicknesses (nm)
     */
    public record Settings(double[] mgPerCm3, double[] barrierNm) {
        /** @return seven densities from 1e18 to 5e19 cm^-3, barriers 12, 15 and 18 nm */
        public static Settings full() {
            return new Settings(new double[] {1e18, 2e18, 5e18, 1e19, 2e19, 3e19, 5e19}, new double[] {12, 15, 18});
        }

        /** @return two densities and two barriers for tests */
        public static Settings quick() {
            return new Settings(new double[] {3e18, 3e19}, new double[] {12, 15});
        }
    }

    /**
     * @param vthV    V_th (V) per barrier (rows) and Mg density (columns)
     * @param files   files written
     * @param summary summary lines
     */
    public record Result(double[][] vthV, List<Path> files, List<String> summary) implements ExampleResult {
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
     * The wafer's stack for one design point.
     *
     * @param mgPerCm3  Mg density of the p-GaN (cm^-3)
     * @param barrierNm Al0.2Ga0.8N barrier thickness (nm)
     * @return the stack at zero gate bias
     */
    public static Structure wafer(double mgPerCm3, double barrierNm) {
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 1000 * Units.NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.2), barrierNm * Units.NM))
                .grow(Layer.of("p-GaN", Composition.GAN, 70 * Units.NM).withDopant(Dopant.magnesiumInGaNPerCm3(mgPerCm3)))
                .top(TopBoundary.schottky(GATE_BARRIER_EV, 0)).build();
    }

    /**
     * @param out      folder to write into (must exist)
     * @param settings the design points
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        double[] mg = settings.mgPerCm3();
        double[] d = settings.barrierNm();
        ThresholdExtraction vth = new ThresholdExtraction(BiasGrid.linear(-2, 4, 31), ThresholdDefinition.constantDensity(1e11));
        BiasSweep sweep = new BiasSweep();
        double[][] v = new double[d.length][mg.length];
        Tables t = Tables.of(Column.of("barrier_thickness", "nm"), Column.of("mg_density", "cm^-3"),
                Column.of("threshold_voltage", "V"));
        for (int b = 0; b < d.length; b++) {
            for (int m = 0; m < mg.length; m++) {
                v[b][m] = vth.thresholdVoltage(wafer(mg[m], d[b]), sweep);
                t.row(d[b], mg[m], v[b][m]);
            }
            log.printf(Locale.ROOT, "p-GaN gate, barrier %s nm: done%n", Labels.sig(d[b], 3));
        }
        CurvesPlot plot = CurvesPlot.of("Wafer " + WAFER + ": p-GaN gate threshold against Mg \u2014 " + DemoLab.INVENTED,
                "Mg density in the p-GaN (cm\u207b\u00b3, log scale)", "threshold voltage V_th (V)").logX();
        for (int b = 0; b < d.length; b++) {
            plot.curve("Al_0.2Ga_0.8N " + Labels.sig(d[b], 3) + " nm", mg, v[b]);
        }
        plot.reference("V_th = 0 (normally-off above)", 0);
        List<Path> files = new ArrayList<>();
        files.add(plot.figure().writePng(out.resolve("p-gan-gate-vth.png")));
        files.add(t.write(out.resolve("p-gan-gate-vth.csv")));
        List<String> summary = new ArrayList<>();
        summary.add("p-GaN gate threshold of wafer " + WAFER + ", " + DemoLab.INVENTED + ":");
        for (int b = 0; b < d.length; b++) {
            summary.add(String.format(Locale.ROOT, "  barrier %s nm: V_th = %+.2f V at Mg %.0e to %+.2f V at Mg %.0e cm^-3",
                    Labels.sig(d[b], 3), v[b][0], mg[0], v[b][mg.length - 1], mg[mg.length - 1]));
        }
        summary.add("  one-dimensional equilibrium estimates: confirm by measurement");
        return new Result(v, List.copyOf(files), List.copyOf(summary));
    }
}
