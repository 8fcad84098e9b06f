// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * The result of a {@link DesignTradeoff}: one {@link TradeoffPoint} per stack (row-major, last axis
 * fastest), which stacks are in the V<sub>th</sub> band, and the Pareto front of R<sub>sh</sub>
 * against |J| among them ({@link ParetoFront}). Immutable.
 *
 * <p>CSV columns: one per axis ({@code name_unit}), {@code sheet_density_cm^-2},
 * {@code threshold_voltage_V}, {@code model_threshold_voltage_V} (the closed-form estimate that placed
 * the sweep; empty with a fixed sweep), {@code mobility_cm^2/Vs}, {@code sheet_resistance_Ohm/sq},
 * {@code gate_leakage_A/cm^2} (signed, at the reverse bias), {@code in_vth_band} and
 * {@code on_front} (true/false), {@code warnings} (the point's warning messages joined by " | ",
 * empty if none), {@code status}; after the {@link #provenance()} comment lines.
 */
public final class TradeoffResult implements CsvTable {
    private final List<Axis> axes;
    private final double reverseBiasV;
    private final double bandTargetV;
    private final double bandToleranceV;
    private final String setup;
    private final double[][] parameters;
    private final double[][] values;
    private final List<Warning>[] warnings;
    private final DesignTradeoff tradeoff;
    private final boolean[] inBand;
    private final boolean[] onFront;
    private final int[] front;
    private final PointFailure[] failureAt;
    private final List<PointFailure> failureList;
    private final List<Column> columns;

    TradeoffResult(DesignTradeoff t, double[][] parameters, ParallelPoints.Outcome[] out, List<Warning>[] warnings,
            double bandTargetV, double bandToleranceV) {
        this.tradeoff = t;
        this.axes = t.axes();
        this.reverseBiasV = t.reverseBiasV();
        this.bandTargetV = bandTargetV;
        this.bandToleranceV = bandToleranceV;
        this.setup = t.toString();
        int n = out.length;
        this.parameters = parameters;
        this.values = new double[n][];
        this.warnings = warnings;
        this.failureAt = new PointFailure[n];
        this.inBand = new boolean[n];
        List<PointFailure> f = new ArrayList<>();
        double[] rsh = new double[n];
        double[] jAbs = new double[n];
        for (int i = 0; i < n; i++) {
            if (out[i].values() != null) {
                values[i] = out[i].values();
                double vth = values[i][DesignTradeoff.VTH];
                inBand[i] = Double.isNaN(bandTargetV) || Math.abs(vth - bandTargetV) <= bandToleranceV;
            } else {
                double[] nan = new double[DesignTradeoff.WIDTH];
                Arrays.fill(nan, Double.NaN);
                values[i] = nan;
                warnings[i] = List.of();
                failureAt[i] = out[i].failure().at(i, describe(i));
                f.add(failureAt[i]);
            }
            rsh[i] = inBand[i] ? values[i][DesignTradeoff.RSH] : Double.NaN;
            jAbs[i] = inBand[i] ? Math.abs(values[i][DesignTradeoff.J]) : Double.NaN;
        }
        this.failureList = Collections.unmodifiableList(f);
        this.front = ParetoFront.indices(rsh, jAbs);
        this.onFront = new boolean[n];
        for (int i : front) {
            onFront[i] = true;
        }
        List<Column> c = new ArrayList<>();
        for (Axis a : axes) {
            c.add(a.column());
        }
        c.add(Column.of("sheet_density", "cm^-2"));
        c.add(Column.of("threshold_voltage", "V"));
        c.add(Column.of("model_threshold_voltage", "V"));
        c.add(Column.of("mobility", "cm^2/Vs"));
        c.add(Column.of("sheet_resistance", "Ohm/sq"));
        c.add(Column.of("gate_leakage", "A/cm^2"));
        c.add(Column.of("in_vth_band", ""));
        c.add(Column.of("on_front", ""));
        c.add(Column.of("warnings", ""));
        c.add(Column.of("status", ""));
        this.columns = List.copyOf(c);
    }

    private String describe(int i) {
        StringBuilder sb = new StringBuilder();
        for (int a = 0; a < axes.size(); a++) {
            sb.append(a > 0 ? ", " : "").append(axes.get(a).name()).append(" = ").append(parameters[i][a]);
            if (!axes.get(a).unit().isEmpty()) {
                sb.append(' ').append(axes.get(a).unit());
            }
        }
        return sb.toString();
    }

    /** {@return the axes} */
    public List<Axis> axes() {
        return axes;
    }

    /** {@return the number of stacks} */
    public int size() {
        return values.length;
    }

    /** {@return the reverse bias of the leakage (V)} */
    public double reverseBiasV() {
        return reverseBiasV;
    }

    /** {@return the target of the V_th band (V), or empty if no band was set} */
    public Optional<Double> bandTargetV() {
        return Double.isNaN(bandTargetV) ? Optional.empty() : Optional.of(bandTargetV);
    }

    /** {@return the half-width of the V_th band (V), or empty if no band was set} */
    public Optional<Double> bandToleranceV() {
        return Double.isNaN(bandToleranceV) ? Optional.empty() : Optional.of(bandToleranceV);
    }

    /**
     * @param i point index
     * @return that stack
     */
    public TradeoffPoint point(int i) {
        double[] v = values[i];
        return new TradeoffPoint(i, parameters[i], v[DesignTradeoff.NS], v[DesignTradeoff.VTH], v[DesignTradeoff.MU],
                v[DesignTradeoff.RSH], v[DesignTradeoff.J], inBand[i], onFront[i], warnings[i]);
    }

    /** {@return every stack, in point order} */
    public List<TradeoffPoint> points() {
        List<TradeoffPoint> p = new ArrayList<>(size());
        for (int i = 0; i < size(); i++) {
            p.add(point(i));
        }
        return Collections.unmodifiableList(p);
    }

    /** {@return the stacks on the Pareto front, in increasing R_sh (so decreasing |J|)} */
    public List<TradeoffPoint> front() {
        List<TradeoffPoint> p = new ArrayList<>(front.length);
        for (int i : front) {
            p.add(point(i));
        }
        return Collections.unmodifiableList(p);
    }

    /** {@return the computed stacks whose V_th is in the band (all computed stacks without a band)} */
    public List<TradeoffPoint> inBand() {
        List<TradeoffPoint> p = new ArrayList<>();
        for (int i = 0; i < size(); i++) {
            if (inBand[i]) {
                p.add(point(i));
            }
        }
        return Collections.unmodifiableList(p);
    }

    /**
     * @param i point index
     * @return the closed-form V_th that placed the point's sweep (V), NaN with a fixed sweep or if the
     *         point failed
     */
    public double modelThresholdVoltageV(int i) {
        return values[i][DesignTradeoff.VTH_MODEL];
    }

    /**
     * @param i point index
     * @return true if point i was computed
     */
    public boolean succeeded(int i) {
        return failureAt[i] == null;
    }

    /**
     * @param i point index
     * @return why point i failed (with the kind of failure), or empty
     */
    public Optional<PointFailure> failure(int i) {
        return Optional.ofNullable(failureAt[i]);
    }

    /** {@return every failed point, in point order} */
    public List<PointFailure> failures() {
        return failureList;
    }

    /**
     * @param i point index
     * @return the warnings of that stack: its own, its sweep's, its threshold's, and its mobility's
     *         and leakage's (their messages prefixed "mobility: " and "leakage: "); empty for a
     *         failed stack
     */
    public List<Warning> warnings(int i) {
        return warnings[i];
    }

    /**
     * What may make this trade-off mislead, as a whole: no V_th band
     * ({@link WarningKind#NO_THRESHOLD_BAND}: the front then mixes threshold voltages), an empty band
     * ({@link WarningKind#THRESHOLD_BAND_EMPTY}), failed points ({@link WarningKind#POINTS_LEFT_OUT});
     * then each kind of warning that a computed stack raised ({@link #warnings(int)}), once, at the
     * first such stack, with the count of the others.
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        List<Warning> w = new ArrayList<>();
        if (Double.isNaN(bandTargetV)) {
            w.add(new Warning(WarningKind.NO_THRESHOLD_BAND,
                    "no V_th band set: the front compares stacks of different threshold voltage"));
        } else if (front.length == 0) {
            w.add(new Warning(WarningKind.THRESHOLD_BAND_EMPTY, "no computed stack has its V_th within "
                    + Decimals.format(bandToleranceV, "V") + " of " + Decimals.format(bandTargetV, "V")
                    + ": the front is empty"));
        }
        if (!failureList.isEmpty()) {
            w.add(new Warning(WarningKind.POINTS_LEFT_OUT,
                    failureList.size() + " of " + size() + " stacks failed and take no part in the front"));
        }
        String[] labels = new String[size()];
        for (int i = 0; i < labels.length; i++) {
            labels[i] = describe(i);
        }
        return Warning.union(w, PointWarnings.of(warnings, labels));
    }

    /**
     * What produced this trade-off. As for a {@link DesignMapResult#provenance() design map}, the
     * structure factory is code the provenance cannot hold: the structure recorded is its output at
     * the first computed stack ({@code structureAtPoint}); the run records each axis as
     * {@code axis<k> = name|unit|values}, the reverse bias, the threshold definition and the sweep
     * (its biases, or its step and margins), the V_th band, and the mobility options (their record text) and
     * the leakage options ({@link org.wurtzkit.solvers.transport.LeakageOptions#describe()}); then every failed stack and the warnings. With the same factory and these
     * settings, a re-run gives the same table bit for bit.
     *
     * @return the provenance, or empty when no stack's structure could be built
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        Structure structure = null;
        int at = -1;
        for (int i = 0; i < size() && structure == null; i++) {
            try {
                structure = tradeoff.factory().at(parameters[i].clone());
                at = i;
            } catch (InvalidParameterException | WurtzkitException e) {
                // this stack's factory failed in the run too; try the next
            }
        }
        if (structure == null) {
            return Optional.empty();
        }
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "design trade-off");
        run.put("structureFamily", "code (a StructureFactory), not recorded, and the structure recorded is its output "
                + "at point structureAtPoint");
        run.put("structureAtPoint", Integer.toString(at));
        for (int a = 0; a < axes.size(); a++) {
            Axis ax = axes.get(a);
            run.put("axis" + a, ax.name() + "|" + ax.unit() + "|" + SweepProvenance.values(ax.values()));
        }
        run.putAll(tradeoff.settings());
        return Optional.of(SweepProvenance.of(run, structure, tradeoff.solverOptions(), failureList, warnings()));
    }

    @Override
    public List<Column> columns() {
        return columns;
    }

    @Override
    public int rowCount() {
        return values.length;
    }

    @Override
    public List<String> row(int i) {
        List<String> r = new ArrayList<>(columns.size());
        for (double p : parameters[i]) {
            r.add(CsvTable.cell(p));
        }
        double[] v = values[i];
        r.add(CsvTable.cell(v[DesignTradeoff.NS]));
        r.add(CsvTable.cell(v[DesignTradeoff.VTH]));
        r.add(CsvTable.cell(v[DesignTradeoff.VTH_MODEL]));
        r.add(CsvTable.cell(v[DesignTradeoff.MU]));
        r.add(CsvTable.cell(v[DesignTradeoff.RSH]));
        r.add(CsvTable.cell(v[DesignTradeoff.J]));
        r.add(Boolean.toString(inBand[i]));
        r.add(Boolean.toString(onFront[i]));
        r.add(String.join(" | ", warnings[i].stream().map(Warning::message).toList()));
        r.add(failureAt[i] == null ? "ok" : "failed: " + failureAt[i].message());
        return r;
    }

    /** @return the set-up, counts (computed, in band, on front, failed), the front and any warnings */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("Trade-off: ").append(setup).append('\n');
        int inB = 0;
        for (boolean b : inBand) {
            inB += b ? 1 : 0;
        }
        sb.append(size() - failureList.size()).append(" of ").append(size()).append(" stacks computed, ").append(inB)
                .append(" in the V_th band, ").append(front.length).append(" on the front of R_sh against |J| at V_R = ")
                .append(Decimals.format(reverseBiasV, "V"));
        for (TradeoffPoint p : front()) {
            sb.append("\n  ").append(p);
        }
        sb.append(Warning.lines(warnings()));
        return sb.toString();
    }
}
