// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
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
import org.wurtzkit.plot.Labels;
import org.wurtzkit.plot.ParetoPlot;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.DesignTradeoff;
import org.wurtzkit.solvers.workflow.TradeoffPoint;
import org.wurtzkit.solvers.workflow.TradeoffResult;

/**
 * Example 7: the designer's trade-off over an invented family of wafers of {@value DemoLab#LAB}
 * around {@value DemoLab#WAFER}: GaN cap thickness x Al fraction x AlGaN barrier thickness, each
 * stack solved along one gate-bias sweep ({@link DesignTradeoff}) for n<sub>s</sub>, V<sub>th</sub>,
 * mobility and R<sub>sh</sub> at 0 V and the gate leakage at a reverse bias of
 * {@value #REVERSE_BIAS_V} V; the Pareto front of R<sub>sh</sub> against |J| is taken among the
 * stacks with V<sub>th</sub> within {@value #BAND_TOLERANCE_V} V of {@value #TARGET_THRESHOLD_V} V.
 *
 * <p>Writes {@code tradeoff.png} ({@link ParetoPlot}) and {@code tradeoff.csv} (one row per stack,
 * in-band and on-front marked). The family is invented; the numbers are model estimates, with the
 * default mobility sample parameters (roughness, dislocations) and the one-dimensional leakage
 * under the gate (no gate edges or surface paths).
 */
public final class TradeoffExample {
    static final int WIDTH = ParetoPlot.WIDTH;
    static final int HEIGHT = ParetoPlot.HEIGHT;
    /** Reverse gate bias at which the leakage is compared (V). */
    static final double REVERSE_BIAS_V = 10;
    /** Target threshold voltage of the band (V). */
    static final double TARGET_THRESHOLD_V = -4;
    /** Half-width of the band (V). */
    static final double BAND_TOLERANCE_V = 1;

    private TradeoffExample() {
    }

    /**
     * @param capNm     GaN cap thicknesses (nm), 0 for none
     * @param alloy     Al fractions of the barrier
     * @param barrierNm barrier thicknesses (nm)
     * @param stepV     largest bias step of each stack's sweep (V)
     */
    public record Settings(double[] capNm, double[] alloy, double[] barrierNm, double stepV) {
        /** @return caps 0-4 nm, Al 0.20-0.30, barriers 15-30 nm: 3 x 3 x 4 stacks, 0.25 V steps */
        public static Settings full() {
            return new Settings(new double[] {0, 2, 4}, new double[] {0.20, 0.25, 0.30},
                    new double[] {15, 20, 25, 30}, 0.25);
        }

        /** @return 2 x 2 x 2 stacks and 0.5 V steps, for tests */
        public static Settings quick() {
            return new Settings(new double[] {0, 4}, new double[] {0.20, 0.30}, new double[] {15, 25}, 0.5);
        }
    }

    /**
     * @param tradeoff the trade-off
     * @param files    files written
     * @param summary  summary lines
     */
    public record Result(TradeoffResult tradeoff, List<Path> files, List<String> summary) implements ExampleResult {
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
     * @param settings the family
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        ParameterSet set = ParameterSets.defaultSet();
        TradeoffResult t = DesignTradeoff.builder(p -> DemoLab.wafer(set, p[1], p[2], p[0], 0))
                .axis(Axis.of("cap", "nm", settings.capNm()))
                .axis(Axis.of("al_fraction", "", settings.alloy()))
                .axis(Axis.of("barrier", "nm", settings.barrierNm()))
                .reverseBiasV(REVERSE_BIAS_V)
                .thresholdBand(TARGET_THRESHOLD_V, BAND_TOLERANCE_V)
                .stepV(settings.stepV())
                .progress(new TerminalProgress("trade-off, full solver", log))
                .build()
                .run();
        Figure figure = ParetoPlot.of("Invented wafer family around " + DemoLab.WAFER + " (" + DemoLab.LAB
                + "): R_sh against gate leakage", t)
                .labelFront(p -> "cap " + Labels.trimmed(p.design()[0]) + " nm, Al " + Labels.trimmed(p.design()[1])
                        + ", " + Labels.trimmed(p.design()[2]) + " nm")
                .figure();
        List<Path> files = new ArrayList<>();
        files.add(figure.writePng(out.resolve("tradeoff.png")));
        files.add(Tables.write(t, out.resolve("tradeoff.csv")));

        List<String> summary = new ArrayList<>();
        summary.add("Trade-off over a wafer family of " + DemoLab.LAB + " around " + DemoLab.WAFER + ", "
                + DemoLab.INVENTED + ":");
        summary.add(String.format(Locale.ROOT, "  %d stacks, %d computed, %d with V_th in %.1f V +- %.1f V, %d on the "
                + "front of R_sh against |J| at -%.0f V", t.size(), t.size() - t.failures().size(), t.inBand().size(),
                TARGET_THRESHOLD_V, BAND_TOLERANCE_V, t.front().size(), REVERSE_BIAS_V));
        for (TradeoffPoint p : t.front()) {
            double[] d = p.design();
            summary.add(String.format(Locale.ROOT, "  front: cap %s nm, Al %.2f, barrier %s nm: n_s %.3e cm^-2, "
                    + "V_th %.2f V, R_sh %.0f Ohm/sq, |J| %.2e A/cm^2", Labels.trimmed(d[0]), d[1], Labels.trimmed(d[2]),
                    p.sheetDensityPerCm2(), p.thresholdVoltageV(), p.sheetResistanceOhmPerSquare(),
                    p.leakageMagnitudeAPerCm2()));
        }
        t.warnings().forEach(w -> summary.add("  warning: " + w.message()));
        t.failures().forEach(f -> summary.add("  failed: " + f));
        summary.add("  model estimates: confirm by measurement");
        return new Result(t, List.copyOf(files), List.copyOf(summary));
    }
}
