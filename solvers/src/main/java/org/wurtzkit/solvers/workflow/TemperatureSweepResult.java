package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.Optional;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * The result of a {@link TemperatureSweep}: per temperature the 2DEG sheet density, the gate
 * charge, the lowest subband's energy relative to the Fermi level and the band gap at the bottom
 * of the stack (E_c - E_v at the deepest node, the temperature-dependent gap the solver used
 * there). Immutable; array accessors return copies. A failed point has NaN values and is listed in
 * {@link #failures()}.
 *
 * <p>CSV columns: {@code temperature_K, sheet_density_cm^-2, gate_charge_C/m^2,
 * ground_subband_minus_fermi_eV, bottom_band_gap_eV, outer_iterations, status}.
 */
public final class TemperatureSweepResult implements CsvTable {
    private static final List<Column> COLUMNS = List.of(Column.of("temperature", "K"),
            Column.of("sheet_density", "cm^-2"), Column.of("gate_charge", "C/m^2"),
            Column.of("ground_subband_minus_fermi", "eV"), Column.of("bottom_band_gap", "eV"),
            Column.of("outer_iterations", ""), Column.of("status", ""));

    private final Structure structure;
    private final double[] temperature;
    private final SweepPoints points;
    private final double[] groundSubband;
    private final double[] bottomGap;
    private final List<PointFailure> failures;
    private final SolverOptions options;
    private final List<Warning> warnings;

    TemperatureSweepResult(Structure structure, double[] temperature, Solution[] solutions, PointFailure.Reason[] reasons,
            SolverOptions options) {
        int n = temperature.length;
        this.structure = structure;
        this.options = options;
        this.temperature = temperature.clone();
        this.points = new SweepPoints(solutions, reasons, i -> "temperature = " + temperature[i] + " K",
                s -> s.subbands().isEmpty() ? "ok (no subbands)" : "ok");
        this.failures = points.failures;
        groundSubband = new double[n];
        bottomGap = new double[n];
        for (int i = 0; i < n; i++) {
            Solution s = solutions[i];
            if (s == null) {
                groundSubband[i] = Double.NaN;
                bottomGap[i] = Double.NaN;
                continue;
            }
            List<Subband> bands = s.subbands();
            // NaN when the stack has no subband at all (no quantum window); documented in the accessor
            groundSubband[i] = bands.isEmpty() ? Double.NaN : lowest(bands);
            double[] ec = s.conductionBand();
            double[] ev = s.valenceBand();
            bottomGap[i] = ec[ec.length - 1] - ev[ev.length - 1];
        }
        String[] labels = new String[n];
        for (int i = 0; i < n; i++) {
            labels[i] = "T = " + Decimals.format(temperature[i], "K");
        }
        this.warnings = PointWarnings.of(solutions, labels);
    }

    /**
     * What may make this sweep mislead: each kind of warning that a converged point raised (its
     * structure's or its solution's), once, at the first such point, with the count of the others.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    private static double lowest(List<Subband> bands) {
        double e = Double.POSITIVE_INFINITY;
        for (Subband b : bands) {
            e = Math.min(e, b.energyEv());
        }
        return e;
    }

    /** {@return the structure as given} */
    public Structure structure() {
        return structure;
    }

    /** {@return number of points} */
    public int size() {
        return temperature.length;
    }

    /** {@return temperatures in solving order (K)} */
    public double[] temperatureK() {
        return temperature.clone();
    }

    /** {@return 2DEG sheet density (cm^-2)} */
    public double[] sheetDensityPerCm2() {
        return points.sheetDensityPerCm2();
    }

    /** {@return 2DEG sheet density (m^-2); the twin of {@link #sheetDensityPerCm2()}} */
    public double[] sheetDensity() {
        return points.sheetDensity();
    }

    /** {@return gate charge (C/m&sup2;), 0 for a free surface} */
    public double[] gateCharge() {
        return points.gateCharge();
    }

    /**
     * @return lowest subband energy minus the Fermi level (eV), over all windows; NaN where the
     *         solve had no subband (status "ok (no subbands)") or failed
     */
    public double[] groundSubbandMinusFermiEv() {
        return groundSubband.clone();
    }

    /** {@return E_c - E_v at the deepest node (eV)} */
    public double[] bottomBandGapEv() {
        return bottomGap.clone();
    }

    /** {@return outer iterations per point, -1 for a failed point} */
    public int[] iterations() {
        return points.iterations();
    }

    /**
     * @param i point index
     * @return true if point i was computed (the one verb of every workflow result)
     */
    public boolean succeeded(int i) {
        return points.succeeded(i);
    }

    /**
     * @param i point index
     * @return why point i failed (with the kind of failure), or empty
     */
    public Optional<PointFailure> failure(int i) {
        return points.failure(i);
    }

    /**
     * @param i point index
     * @return the solution there, empty for a failed point
     */
    public Optional<Solution> solution(int i) {
        return points.solution(i);
    }

    /** {@return the failed points, in sweep order} */
    public List<PointFailure> failures() {
        return failures;
    }

    /**
     * What produced this sweep: the structure, the solver options, the temperatures in solving order
     * and a warning for every failed point, then the sweep's own warnings. Running
     * the sweep again with them gives the same numbers bit for bit.
     *
     * @return the provenance (computed on each call; it hashes the parameter set)
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        return Optional.of(SweepProvenance.of("temperature sweep", "temperaturesK", temperature, structure, options, failures, warnings));
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    @Override
    public int rowCount() {
        return temperature.length;
    }

    @Override
    public List<String> row(int i) {
        return List.of(CsvTable.cell(temperature[i]), CsvTable.cell(points.sheet[i]), CsvTable.cell(points.gateCharge[i]),
                CsvTable.cell(groundSubband[i]), CsvTable.cell(bottomGap[i]),
                points.iterations[i] < 0 ? "" : Integer.toString(points.iterations[i]), points.status[i]);
    }

    /**
     * @return a summary line (number of temperatures, their range, how many converged) and a
     *         {@link #preview(int) preview} of the table
     */
    @Override
    public String toString() {
        return "Temperature sweep: " + temperature.length + " temperatures from " + Decimals.format(temperature[0], "K")
                + " to " + Decimals.format(temperature[temperature.length - 1], "K") + ", "
                + (temperature.length - failures.size()) + " converged"
                + (failures.isEmpty() ? "" : ", " + failures.size() + " failed") + Warning.lines(warnings) + "\n"
                + preview(10);
    }
}
