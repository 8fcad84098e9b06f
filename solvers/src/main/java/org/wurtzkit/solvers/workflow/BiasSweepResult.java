package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.Optional;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * The result of a {@link BiasSweep}: per bias point the 2DEG sheet density, the gate charge, all
 * electrons of the stack and the solver's outer iteration count; the quasi-static C-V curve
 * ({@link #capacitanceVoltage()}); threshold voltages by the definitions of
 * {@link ThresholdDefinition}. Immutable; array accessors return copies.
 *
 * <p>A failed point has NaN in every numeric array (and an empty cell in the CSV), and is listed in
 * {@link #failures()} with the reason; nothing is dropped.
 *
 * <p>CSV columns: {@code gate_bias_V, sheet_density_cm^-2, gate_charge_C/m^2,
 * electrons_total_cm^-2, outer_iterations, status}.
 */
public final class BiasSweepResult implements CsvTable {
    private static final List<Column> COLUMNS = List.of(Column.of("gate_bias", "V"),
            Column.of("sheet_density", "cm^-2"), Column.of("gate_charge", "C/m^2"),
            Column.of("electrons_total", "cm^-2"), Column.of("outer_iterations", ""), Column.of("status", ""));

    private final Structure structure;
    private final double[] bias;
    private final SweepPoints points;
    private final double[] sheet; // cm^-2, exactly as Solution#sheetDensityPerCm2 reports it
    private final double[] allElectrons; // m^-2
    private final List<PointFailure> failures;
    private final CapacitanceVoltage cv;
    private final SolverOptions options;
    private final List<Warning> warnings;

    BiasSweepResult(Structure structure, BiasGrid grid, Solution[] solutions, PointFailure.Reason[] reasons,
            SolverOptions options) {
        int n = grid.size();
        this.structure = structure;
        this.options = options;
        this.bias = grid.values();
        this.points = new SweepPoints(solutions, reasons, i -> "gate bias = " + bias[i] + " V", s -> "ok");
        this.sheet = points.sheet;
        this.failures = points.failures;
        this.allElectrons = new double[n];
        for (int i = 0; i < n; i++) {
            allElectrons[i] = solutions[i] == null ? Double.NaN : solutions[i].electronSheetDensity();
        }
        this.cv = new CapacitanceVoltage(bias, points.gateCharge, this::provenance);
        String[] labels = new String[n];
        for (int i = 0; i < n; i++) {
            labels[i] = "V_g = " + Decimals.format(bias[i], "V");
        }
        this.warnings = Warning.union(structure.warnings().stream()
                .filter(w -> w.kind() != WarningKind.GATE_BIAS_AT_OR_ABOVE_BARRIER).toList(),
                PointWarnings.of(solutions, labels));
    }

    /**
     * What may make this sweep mislead: the stack's own warnings (except its own gate bias, which is
     * not one of the points), then each kind of warning that a converged point raised, once, at the
     * first such point, with the count of the others.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /** {@return the structure as given to the sweep (its own bias is not one of the points, unless listed)} */
    public Structure structure() {
        return structure;
    }

    /** {@return number of bias points} */
    public int size() {
        return bias.length;
    }

    /** {@return the gate biases in solving order (V)} */
    public double[] gateBiasV() {
        return bias.clone();
    }

    /** {@return 2DEG sheet density, the subband electrons of the quantum windows (m^-2)} */
    public double[] sheetDensity() {
        return points.sheetDensity();
    }

    /** {@return 2DEG sheet density (cm^-2), exactly as {@link Solution#sheetDensityPerCm2()} reports it} */
    public double[] sheetDensityPerCm2() {
        return points.sheetDensityPerCm2();
    }

    /** {@return sheet charge on the gate metal (C/m&sup2;)} */
    public double[] gateCharge() {
        return points.gateCharge();
    }

    /** {@return all electrons of the stack (m^-2)} */
    public double[] electronSheetDensity() {
        return allElectrons.clone();
    }

    /** {@return all electrons of the stack (cm^-2); the twin of {@link #electronSheetDensity()}} */
    public double[] electronSheetDensityPerCm2() {
        double[] out = new double[allElectrons.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Units.perM2ToPerCm2(allElectrons[i]);
        }
        return out;
    }

    /** {@return outer Schroedinger-Poisson iterations per point, -1 for a failed point} */
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
     * @return the full solution at point i (band diagram, subbands, ...), empty for a failed point
     */
    public Optional<Solution> solution(int i) {
        return points.solution(i);
    }

    /** {@return the failed points with their reasons, in sweep order (empty if all converged)} */
    public List<PointFailure> failures() {
        return failures;
    }

    /** {@return the quasi-static C-V curve C = dQ_gate/dV on the intervals between the points} */
    public CapacitanceVoltage capacitanceVoltage() {
        return cv;
    }

    /**
     * Reads the threshold voltage off the computed n_s(V_g), using only intervals whose two ends
     * converged.
     *
     * @param definition the definition (see {@link ThresholdDefinition})
     * @return V_th (V)
     * @throws InvalidParameterException if the curve does not contain what the definition needs:
     *                                   the level is not crossed, or n_s never rises with V_g
     */
    public double thresholdVoltage(ThresholdDefinition definition) {
        return threshold(definition).voltageV();
    }

    /**
     * As {@link #thresholdVoltage(ThresholdDefinition)}, with a warning of kind
     * {@link WarningKind#THRESHOLD_OUTSIDE_SWEPT_RANGE} when a linear extrapolation meets n_s = 0
     * outside the swept biases (the tangent was then carried beyond what was computed).
     *
     * @param definition the definition (see {@link ThresholdDefinition})
     * @return V_th with its warnings
     * @throws InvalidParameterException as {@link #thresholdVoltage(ThresholdDefinition)}
     */
    public Threshold threshold(ThresholdDefinition definition) {
        Require.nonNull("threshold definition", definition);
        int n = bias.length;
        // ascending order of bias
        boolean up = bias[n - 1] > bias[0];
        double[] v = new double[n];
        double[] s = new double[n];
        for (int k = 0; k < n; k++) {
            int i = up ? k : n - 1 - k;
            v[k] = bias[i];
            s[k] = sheet[i];
        }
        if (definition instanceof ThresholdDefinition.ConstantDensity c) {
            return new Threshold(constantDensity(v, s, c.levelPerCm2()), definition, List.of());
        }
        double vth = linearExtrapolation(v, s);
        if (vth < v[0] || vth > v[n - 1]) {
            return new Threshold(vth, definition, List.of(new Warning(WarningKind.THRESHOLD_OUTSIDE_SWEPT_RANGE,
                    "the linear extrapolation meets n_s = 0 at " + Decimals.format(vth, "V") + ", outside the swept "
                            + "range [" + Decimals.format(v[0]) + ", " + Decimals.format(v[n - 1], "V")
                            + "]; extend the sweep to confirm")));
        }
        return new Threshold(vth, definition, List.of());
    }

    private double constantDensity(double[] v, double[] s, double level) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int k = 0; k + 1 < v.length; k++) {
            double a = s[k];
            double b = s[k + 1];
            if (Double.isNaN(a) || Double.isNaN(b)) {
                continue;
            }
            lo = Math.min(lo, Math.min(a, b));
            hi = Math.max(hi, Math.max(a, b));
            if (a < level && b >= level) {
                double t = a > 0 ? Math.log(level / a) / Math.log(b / a) : (level - a) / (b - a);
                return v[k] + t * (v[k + 1] - v[k]);
            }
        }
        throw new InvalidParameterException("threshold sheet-density level (cm^-2)", Double.toString(level),
                "(" + Text.num(lo) + ", " + Text.num(hi) + "] (the sheet densities of the converged intervals of the "
                        + "sweep from " + Text.num(v[0]) + " V to " + Text.num(v[v.length - 1])
                        + " V; widen the bias range)");
    }

    private double linearExtrapolation(double[] v, double[] s) {
        int best = -1;
        double bestSlope = 0;
        for (int k = 0; k + 1 < v.length; k++) {
            double slope = (s[k + 1] - s[k]) / (v[k + 1] - v[k]);
            if (slope > bestSlope) { // NaN compares false
                bestSlope = slope;
                best = k;
            }
        }
        if (best < 0) {
            throw new InvalidParameterException("gate bias range (V)", "[" + v[0] + ", " + v[v.length - 1] + "]",
                    "a range over which n_s rises with the gate bias (no converged interval has a positive slope)");
        }
        return v[best] - s[best] / bestSlope;
    }

    /**
     * What produced this sweep: the structure (with its own bias before the sweep), the solver
     * options, the biases in solving order and a warning for every failed point and every layer
     * beyond its critical thickness. Repeating
     * {@code new BiasSweep(new SelfConsistentSolver(SolverOptions.fromSettings(p.solverOptions()))).run(p.structure(), biases)}
     * with the biases of {@code p.run().get("biasesV")} gives the same numbers bit for bit.
     *
     * @return the provenance (computed on each call; it hashes the parameter set)
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        return Optional.of(SweepProvenance.of("bias sweep", "biasesV", bias, structure, options, failures, warnings));
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    @Override
    public int rowCount() {
        return bias.length;
    }

    @Override
    public List<String> row(int i) {
        return List.of(CsvTable.cell(bias[i]), CsvTable.cell(sheet[i]),
                CsvTable.cell(points.gateCharge[i]), CsvTable.cell(Units.perM2ToPerCm2(allElectrons[i])),
                points.iterations[i] < 0 ? "" : Integer.toString(points.iterations[i]), points.status[i]);
    }

    /**
     * @return a summary line (number of biases, their range, how many converged, the n_s range) and
     *         a {@link #preview(int) preview} of the table, e.g.
     *         {@code "Bias sweep: 31 gate biases from 0 V to -6 V, 31 converged; n_s from 0 to 8.91e12 cm^-2"}
     */
    @Override
    public String toString() {
        double lo = Double.NaN;
        double hi = Double.NaN;
        for (double v : sheet) {
            if (!Double.isNaN(v)) {
                lo = Double.isNaN(lo) ? v : Math.min(lo, v);
                hi = Double.isNaN(hi) ? v : Math.max(hi, v);
            }
        }
        return "Bias sweep: " + bias.length + " gate biases from " + Decimals.format(bias[0], "V") + " to "
                + Decimals.format(bias[bias.length - 1], "V") + ", " + (bias.length - failures.size()) + " converged"
                + (failures.isEmpty() ? "" : ", " + failures.size() + " failed")
                + (Double.isNaN(lo) ? "" : "; n_s from " + Decimals.format(lo) + " to " + Decimals.format(hi, "cm^-2"))
                + Warning.lines(warnings) + "\n" + preview(10);
    }
}
