package org.wurtzkit.examples;

import static org.wurtzkit.units.Units.NM;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.plot.CurvesPlot;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.MisGate;
import org.wurtzkit.solvers.workflow.StructureFamilies;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.InterfaceStates;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/**
 * Example 6: an MIS-HEMT of the invented wafer {@value DemoLab#WAFER}-MIS: the uncapped
 * {@value DemoLab#WAFER} stack under an Al2O3 gate insulator (built-in data) and a gate whose Fermi
 * level lies {@value #GATE_BARRIER_EV} eV below the Al2O3 conduction band. Left: V_th against
 * insulator thickness for two fixed interface charges; right: the C&ndash;V curve at
 * {@value #CV_TOX_NM} nm and the larger fixed charge, without interface states, and with a U-shaped D_it quasi-static and
 * high-frequency. Writes {@code mis-hemt.png}, {@code mis-hemt-threshold.csv} and
 * {@code mis-hemt-cv.csv}. Everything about the wafer (charges, D_it, gate) is invented; the
 * numbers are model estimates.
 */
public final class MisHemtExample {
    static final int PANEL_WIDTH = 900;
    static final int PANEL_HEIGHT = 720;
    /** Gate Fermi level below the Al2O3 conduction band (eV), invented. */
    static final double GATE_BARRIER_EV = 3.5;
    /** Insulator thickness of the C-V curves (nm). */
    static final double CV_TOX_NM = 15;
    /**
     * The two fixed interface charges (cm^-2), invented, of the order of the AlGaN surface polarization
     * charge as reported for Al2O3/AlGaN (M. Matys et al., Appl. Phys. Lett. 110 (2017), doi
     * 10.1063/1.4986482 [verified: abstract]). Much smaller positive charges leave the barrier's top
     * face so negative that holes gather under the insulator, whose supply the solver's hole
     * quasi-Fermi level option decides (SolverOptions.holeFermiLevel); these values stay clear of that.
     */
    static final double[] FIXED_CHARGES = {2.0e13, 3.0e13};

    private MisHemtExample() {
    }

    /**
     * @param thicknessesNm insulator thicknesses of the V_th curves (nm)
     * @param biasStepV     bias step of the threshold sweeps and the C-V curves (V)
     */
    public record Settings(double[] thicknessesNm, double biasStepV) {
        /** @return 5 to 30 nm in 5 nm steps, 0.1 V steps */
        public static Settings full() {
            return new Settings(new double[] {5, 10, 15, 20, 25, 30}, 0.1);
        }

        /** @return three thicknesses, 0.5 V steps, for tests */
        public static Settings quick() {
            return new Settings(new double[] {5, 15, 30}, 0.5);
        }
    }

    /**
     * @param thresholdV V_th [charge][thickness] (V)
     * @param cv         the three C-V curves: no states, with states quasi-static, with states high-frequency
     * @param files      files written
     * @param summary    summary lines
     */
    public record Result(double[][] thresholdV, List<MisGate.CvCurve> cv, List<Path> files, List<String> summary)
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
     * The MIS-HEMT of the demo lab (invented).
     *
     * @param fixedPerCm2 fixed charge at the Al2O3/AlGaN interface (cm^-2)
     * @param states      interface states there, or null
     * @param toxNm       Al2O3 thickness (nm)
     * @return the structure at 0 V
     */
    public static Structure misHemt(double fixedPerCm2, InterfaceStates states, double toxNm) {
        InterfaceSheet sheet = InterfaceSheet.fixedPerCm2(fixedPerCm2);
        if (states != null) {
            sheet = sheet.withStates(states);
        }
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, DemoLab.BUFFER_NM * NM))
                .grow(Layer.of("spacer", Composition.ALN, DemoLab.SPACER_NM * NM))
                .grow(Layer.of("barrier", Composition.alGaN(DemoLab.AL_FRACTION), DemoLab.BARRIER_NM * NM))
                .sheetOnTop(sheet)
                .depositNm("Al2O3", toxNm) // the built-in Al2O3, by name from the set
                .top(TopBoundary.schottky(GATE_BARRIER_EV, 0)).build();
    }

    /** U-shaped D_it, invented: floor 5e11, band-edge 5e13 cm^-2 eV^-1, tails 0.15 eV, neutral level E_c - 1.8 eV. */
    static InterfaceStates inventedStates() {
        return new InterfaceStates(new InterfaceStates.UShaped(Units.perCm2ToPerM2(5e11), Units.perCm2ToPerM2(5e13),
                0.15, 0.15), 1.8);
    }

    /**
     * @param out      folder to write into (must exist)
     * @param settings thicknesses and bias step
     * @param log      where progress goes
     * @return the result
     * @throws IOException if a file cannot be written
     */
    public static Result run(Path out, Settings settings, PrintStream log) throws IOException {
        SelfConsistentSolver solver = new SelfConsistentSolver();
        double step = settings.biasStepV();
        int pts = (int) Math.round(18 / step) + 1;
        ThresholdExtraction extraction = new ThresholdExtraction(BiasGrid.linear(2, -16, pts),
                ThresholdDefinition.constantDensity(1e11));
        MisGate gate = new MisGate(solver, extraction);
        Structure access = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, DemoLab.BUFFER_NM * NM))
                .grow(Layer.of("spacer", Composition.ALN, DemoLab.SPACER_NM * NM))
                .grow(Layer.of("barrier", Composition.alGaN(DemoLab.AL_FRACTION), DemoLab.BARRIER_NM * NM))
                .top(TopBoundary.freeSurface(1.65, 1e14)).build();
        double[] t = settings.thicknessesNm().clone();
        double[][] vth = new double[FIXED_CHARGES.length][];
        double nsAccess = Double.NaN;
        log.println("  MIS-HEMT of wafer " + DemoLab.WAFER + "-MIS: V_th against Al2O3 thickness ...");
        for (int c = 0; c < FIXED_CHARGES.length; c++) {
            List<MisGate.Point> p = gate.sweep(StructureFamilies.insulatorThicknessNm(misHemt(FIXED_CHARGES[c], null,
                    t[0]), "Al2O3"), t, access);
            vth[c] = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                vth[c][i] = p.get(i).thresholdV();
            }
            nsAccess = p.get(0).accessSheetPerCm2();
        }
        log.println("  C-V at " + CV_TOX_NM + " nm ...");
        int cvPts = (int) Math.round(13 / step) + 1;
        BiasGrid cvGrid = BiasGrid.linear(-12, 1, cvPts);
        double qfCv = FIXED_CHARGES[1];
        List<MisGate.CvCurve> cv = List.of(
                gate.capacitance(misHemt(qfCv, null, CV_TOX_NM), cvGrid, MisGate.StateResponse.QUASI_STATIC,
                        MisGate.DEFAULT_STEP_V),
                gate.capacitance(misHemt(qfCv, inventedStates(), CV_TOX_NM), cvGrid,
                        MisGate.StateResponse.QUASI_STATIC, MisGate.DEFAULT_STEP_V),
                gate.capacitance(misHemt(qfCv, inventedStates(), CV_TOX_NM), cvGrid,
                        MisGate.StateResponse.HIGH_FREQUENCY, MisGate.DEFAULT_STEP_V));

        List<Path> files = new ArrayList<>();
        files.add(CurvesPlot.row(thresholdPanel(t, vth), cvPanel(cv)).writePng(out.resolve("mis-hemt.png")));
        Tables th = Tables.of(Column.of("insulator_thickness", "nm"), Column.of("fixed_charge", "cm^-2"),
                Column.of("threshold_voltage", "V"));
        for (int c = 0; c < FIXED_CHARGES.length; c++) {
            for (int i = 0; i < t.length; i++) {
                th.row(t[i], FIXED_CHARGES[c], vth[c][i]);
            }
        }
        files.add(th.write(out.resolve("mis-hemt-threshold.csv")));
        Tables cvt = Tables.of(Column.of("gate_bias", "V"), Column.of("capacitance_no_states", "uF/cm^2"),
                Column.of("capacitance_states_quasi_static", "uF/cm^2"),
                Column.of("capacitance_states_high_frequency", "uF/cm^2"));
        double[] v = cv.get(0).biasV();
        for (int i = 0; i < v.length; i++) {
            cvt.row(v[i], cv.get(0).capacitanceMicroFaradPerCm2()[i], cv.get(1).capacitanceMicroFaradPerCm2()[i],
                    cv.get(2).capacitanceMicroFaradPerCm2()[i]);
        }
        files.add(cvt.write(out.resolve("mis-hemt-cv.csv")));

        List<String> summary = new ArrayList<>();
        summary.add("MIS-HEMT of wafer " + DemoLab.WAFER + "-MIS, " + DemoLab.INVENTED + ":");
        for (int c = 0; c < FIXED_CHARGES.length; c++) {
            double slope = (vth[c][t.length - 1] - vth[c][0]) / (t[t.length - 1] - t[0]);
            summary.add(String.format(Locale.ROOT, "  Q_f = %.1e cm^-2: V_th from %+.2f V (%.0f nm) to %+.2f V (%.0f nm),"
                    + " %.3f V/nm", FIXED_CHARGES[c], vth[c][0], t[0], vth[c][t.length - 1], t[t.length - 1], slope));
        }
        summary.add(String.format(Locale.ROOT, "  access region n_s = %.3e cm^-2 (no gate, surface donors)", nsAccess));
        summary.add("  model estimates: confirm by measurement");
        double[][] vthCopy = new double[vth.length][];
        for (int c = 0; c < vth.length; c++) {
            vthCopy[c] = vth[c].clone();
        }
        return new Result(vthCopy, cv, List.copyOf(files), List.copyOf(summary));
    }

    private static CurvesPlot thresholdPanel(double[] t, double[][] vth) {
        CurvesPlot p = CurvesPlot.of("Wafer " + DemoLab.WAFER + "-MIS: V_th against Al\u2082O\u2083 thickness"
                + " (invented demo data)", "Al\u2082O\u2083 thickness (nm)",
                "threshold voltage V_th (V), n_s = 10\u00b9\u00b9 cm\u207b\u00b2", PANEL_WIDTH, PANEL_HEIGHT);
        for (int k = 0; k < vth.length; k++) {
            p.curve(String.format(Locale.ROOT, "fixed interface charge +%.1f\u00d710\u00b9\u00b3 cm\u207b\u00b2",
                    FIXED_CHARGES[k] / 1e13), t, vth[k]);
        }
        return p;
    }

    private static CurvesPlot cvPanel(List<MisGate.CvCurve> cv) {
        CurvesPlot p = CurvesPlot.of("Wafer " + DemoLab.WAFER + "-MIS: C\u2013V at " + (int) CV_TOX_NM
                + " nm Al\u2082O\u2083, Q_f = +3\u00d710\u00b9\u00b3 cm\u207b\u00b2 (invented demo data)", "gate bias V_g (V)",
                "gate capacitance C (\u00b5F/cm\u00b2)", PANEL_WIDTH, PANEL_HEIGHT).yFromZero();
        p.dashed("no interface states", cv.get(0).biasV(), cv.get(0).capacitanceMicroFaradPerCm2());
        p.curve("U-shaped D_it, quasi-static", cv.get(1).biasV(), cv.get(1).capacitanceMicroFaradPerCm2());
        p.curve("U-shaped D_it, high-frequency (states frozen)", cv.get(2).biasV(),
                cv.get(2).capacitanceMicroFaradPerCm2());
        return p;
    }
}
