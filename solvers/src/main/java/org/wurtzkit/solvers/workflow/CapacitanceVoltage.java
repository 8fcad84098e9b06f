package org.wurtzkit.solvers.workflow;

import java.util.List;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * Quasi-static C-V curve of a bias sweep, C = dQ_gate/dV_g per unit gate area.
 *
 * <p><b>Construction.</b> With the gate charges Q_k at the sweep's biases V_k (solving order),
 * interval k (between points k and k+1) carries the finite difference
 * C_k = (Q_{k+1} - Q_k) / (V_{k+1} - V_k). This is the exact derivative of the piecewise-linear
 * interpolant of Q(V), and a second-order estimate of dQ/dV at the interval's midpoint (error
 * C''(V) h&sup2;/24 for a step h, by Taylor expansion about the midpoint). Treating C as constant on
 * each interval, the integral of C dV from V_i to V_j is the sum of C_k (V_{k+1} - V_k), which
 * telescopes to Q_j - Q_i: integrating the C-V curve gives back the change of gate charge exactly,
 * up to floating-point rounding ({@link #chargeChange(int, int)}, {@link #reconstructedCharge()}).
 *
 * <p>An interval with a failed end has C = NaN (an empty CSV cell). Immutable.
 *
 * <p>CSV columns: {@code interval_start_V, interval_end_V, gate_bias_midpoint_V,
 * capacitance_F/m^2, capacitance_uF/cm^2, status}.
 */
public final class CapacitanceVoltage implements CsvTable {
    private static final List<Column> COLUMNS = List.of(Column.of("interval_start", "V"),
            Column.of("interval_end", "V"), Column.of("gate_bias_midpoint", "V"), Column.of("capacitance", "F/m^2"),
            Column.of("capacitance", "uF/cm^2"), Column.of("status", ""));
    /** 1 F/m^2 = 1e6 uF / 1e4 cm^2. */

    private final double[] bias;
    private final double[] charge;
    private final double[] capacitance;

    CapacitanceVoltage(double[] bias, double[] charge) {
        this.bias = bias.clone();
        this.charge = charge.clone();
        this.capacitance = new double[bias.length - 1];
        for (int k = 0; k < capacitance.length; k++) {
            capacitance[k] = (charge[k + 1] - charge[k]) / (bias[k + 1] - bias[k]);
        }
    }

    /** {@return number of intervals (one fewer than the sweep's points)} */
    public int intervals() {
        return capacitance.length;
    }

    /** {@return C on each interval (F/m&sup2;)} */
    public double[] capacitance() {
        return capacitance.clone();
    }

    /** {@return C on each interval (&mu;F/cm&sup2;)} */
    public double[] capacitanceMicroFaradPerCm2() {
        double[] out = new double[capacitance.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = capacitance[k] / Units.UF_PER_CM2;
        }
        return out;
    }

    /** {@return the bias at the start of each interval (V), in solving order} */
    public double[] intervalStartV() {
        double[] out = new double[capacitance.length];
        System.arraycopy(bias, 0, out, 0, out.length);
        return out;
    }

    /** {@return the bias at the end of each interval (V)} */
    public double[] intervalEndV() {
        double[] out = new double[capacitance.length];
        System.arraycopy(bias, 1, out, 0, out.length);
        return out;
    }

    /** {@return the midpoint bias of each interval (V), where C_k is second-order accurate} */
    public double[] midpointBiasV() {
        double[] out = new double[capacitance.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = 0.5 * (bias[k] + bias[k + 1]);
        }
        return out;
    }

    /**
     * The integral of C dV from sweep point {@code from} to sweep point {@code to}, C constant on
     * each interval: sum of C_k (V_{k+1} - V_k), negated when to &lt; from.
     *
     * @param from a point index in [0, points)
     * @param to   a point index in [0, points)
     * @return the integral (C/m&sup2;); equal to Q_to - Q_from; NaN if an interval in between failed
     */
    public double chargeChange(int from, int to) {
        Require.inRange("first point index", from, 0, bias.length - 1);
        Require.inRange("last point index", to, 0, bias.length - 1);
        int a = Math.min(from, to);
        int b = Math.max(from, to);
        double sum = 0;
        for (int k = a; k < b; k++) {
            sum += capacitance[k] * (bias[k + 1] - bias[k]);
        }
        return to >= from ? sum : -sum;
    }

    /**
     * The gate charge rebuilt from the first point's charge and the C-V curve, Q_0 + the running
     * integral of C dV; equal to the sweep's gate charges up to rounding.
     *
     * @return Q at every sweep point (C/m&sup2;); NaN from the first failed interval on
     */
    public double[] reconstructedCharge() {
        double[] q = new double[bias.length];
        q[0] = charge[0];
        for (int k = 0; k < capacitance.length; k++) {
            q[k + 1] = q[k] + capacitance[k] * (bias[k + 1] - bias[k]);
        }
        return q;
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    @Override
    public int rowCount() {
        return capacitance.length;
    }

    @Override
    public List<String> row(int k) {
        double c = capacitance[k];
        return List.of(CsvTable.cell(bias[k]), CsvTable.cell(bias[k + 1]), CsvTable.cell(0.5 * (bias[k] + bias[k + 1])),
                CsvTable.cell(c), CsvTable.cell(c / Units.UF_PER_CM2),
                Double.isNaN(c) ? "failed: an end point of the interval did not converge" : "ok");
    }

    /**
     * @return a summary line (intervals, bias range, capacitance range in &mu;F/cm&sup2;) and a
     *         {@link #preview(int) preview} of the table
     */
    @Override
    public String toString() {
        double lo = Double.NaN;
        double hi = Double.NaN;
        for (double c : capacitanceMicroFaradPerCm2()) {
            if (!Double.isNaN(c)) {
                lo = Double.isNaN(lo) ? c : Math.min(lo, c);
                hi = Double.isNaN(hi) ? c : Math.max(hi, c);
            }
        }
        return "C-V: " + capacitance.length + " bias intervals from " + Decimals.format(bias[0], "V") + " to "
                + Decimals.format(bias[bias.length - 1], "V")
                + (Double.isNaN(lo) ? "" : ", C from " + Decimals.format(lo) + " to " + Decimals.format(hi, "uF/cm^2"))
                + "\n" + preview(10);
    }
}
