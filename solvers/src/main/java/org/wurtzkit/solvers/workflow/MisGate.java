package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/**
 * Gate-stack workflows: the threshold voltage and the sheet density under an MIS or recessed gate
 * against one design parameter (insulator thickness, fixed interface charge, recess depth: any
 * {@link StructureFamily}, e.g. {@link StructureFamilies#insulatorThicknessNm} or
 * {@link StructureFamilies#recessDepthNm}), beside the access region's sheet density (the
 * un-recessed stack without the gate), and the C-V curve of an MIS gate with interface states.
 * Which recess depth or insulator thickness gives a target V_th is a
 * {@link TargetSearch#thresholdVoltage} over the same families. Stateless and thread-safe.
 */
public final class MisGate {

    /**
     * How interface states answer the small signal of a C-V measurement.
     * <ul>
     * <li>{@link #QUASI_STATIC} (default): they follow it, the slow-sweep limit; their capacitance
     * C_it adds to the semiconductor's.</li>
     * <li>{@link #HIGH_FREQUENCY}: they keep the occupancy of the operating point, the limit of a
     * signal much faster than their emission times (at 300 K about 4 ms for states 0.5 eV below E_c
     * and longer than an hour below 0.8 eV, from the Shockley-Read-Hall emission rate with a capture
     * cross-section of 1e-15 cm^2, computed); they then act as fixed charge, which shifts the curve but
     * does not stretch it (S. M. Sze &amp; K. K. Ng, Physics of Semiconductor Devices, ch. 4, from
     * memory).</li>
     * </ul>
     */
    public enum StateResponse {
        /** Interface states follow the signal. */
        QUASI_STATIC,
        /** Interface states are frozen at the operating point. */
        HIGH_FREQUENCY
    }

    /** Default bias step of the centred difference of a C-V point (V). */
    public static final double DEFAULT_STEP_V = 0.005;

    /**
     * One design point.
     *
     * @param parameter         the family's parameter value
     * @param thresholdV        V_th under the gate (V)
     * @param gateSheetPerCm2   n_s under the gate at the structure's own bias (cm^-2)
     * @param accessSheetPerCm2 n_s of the access region (cm^-2), the same for every point
     */
    public record Point(double parameter, double thresholdV, double gateSheetPerCm2, double accessSheetPerCm2) {
    }

    /**
     * A C-V curve: the capacitance at each bias by a centred difference of the gate charge.
     *
     * @param biasV       gate biases (V)
     * @param capacitance C = dQ_gate/dV at each bias (F/m^2)
     * @param response    how the interface states answered
     */
    public record CvCurve(double[] biasV, double[] capacitance, StateResponse response) {
        /**
         * Copies.
         *
         * @param biasV gate biases (V)
         * @param capacitance C = dQ_gate/dV at each bias (F/m^2)
         * @param response how the interface states answered
         */
        public CvCurve {
            biasV = biasV.clone();
            capacitance = capacitance.clone();
        }

        /** {@return the gate biases (V), a copy} */
        @Override
        public double[] biasV() {
            return biasV.clone();
        }

        /** {@return C = dQ_gate/dV at each bias (F/m^2), a copy} */
        @Override
        public double[] capacitance() {
            return capacitance.clone();
        }

        /** {@return the capacitance in uF/cm^2} */
        public double[] capacitanceMicroFaradPerCm2() {
            double[] out = new double[capacitance.length];
            for (int i = 0; i < out.length; i++) {
                out[i] = capacitance[i] / Units.UF_PER_CM2;
            }
            return out;
        }

        /** @return e.g. {@code "C-V, high-frequency, 41 biases from -6 V to 2 V"} */
        @Override
        public String toString() {
            return "C-V, " + (response == StateResponse.QUASI_STATIC ? "quasi-static" : "high-frequency") + ", "
                    + biasV.length + " biases from " + biasV[0] + " V to " + biasV[biasV.length - 1] + " V";
        }
    }

    private final SelfConsistentSolver solver;
    private final ThresholdExtraction extraction;

    /**
     * @param solver     the solver of every point
     * @param extraction how V_th is read (bias grid and definition)
     */
    public MisGate(SelfConsistentSolver solver, ThresholdExtraction extraction) {
        this.solver = Require.nonNull("solver", solver);
        this.extraction = Require.nonNull("threshold extraction", extraction);
    }

    /**
     * V_th and n_s under the gate at each parameter value, beside the access region's n_s.
     *
     * @param gated  the gated stacks (Schottky gate on top)
     * @param values the parameter values, at least one
     * @param access the access region (typically the un-recessed stack with a free or passivated surface)
     * @return one point per value, in order
     * @throws WurtzkitException of kind NOT_CONVERGED if a solve fails
     */
    public List<Point> sweep(StructureFamily gated, double[] values, Structure access) {
        Require.nonNull("gated structure family", gated);
        Require.nonEmpty("parameter values", values);
        Require.allFinite("parameter values", values, values.length);
        Require.nonNull("access-region structure", access);
        double nsAccess = solver.solve(access).sheetDensityPerCm2();
        BiasSweep sweep = new BiasSweep(solver);
        List<Point> out = new ArrayList<>(values.length);
        for (double v : values) {
            Structure s = gated.at(v);
            out.add(new Point(v, extraction.thresholdVoltage(s, sweep), solver.solve(s).sheetDensityPerCm2(),
                    nsAccess));
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * The C-V curve of an MIS gate: at each bias the operating point is solved (starting from the
     * previous one), then C = [Q_gate(V + h) - Q_gate(V - h)] / 2h with the interface states either
     * following (quasi-static) or frozen at their operating-point charge (high-frequency; see
     * {@link Structure#withInterfaceStatesFrozen}). Error of the centred difference: C'' h^2 / 6.
     *
     * @param gated    the stack with a Schottky gate
     * @param grid     the biases
     * @param response how the interface states answer
     * @param stepV    the half-step h (V), in [1e-4, 0.1]; {@link #DEFAULT_STEP_V} is a good choice
     * @return the curve
     */
    public CvCurve capacitance(Structure gated, BiasGrid grid, StateResponse response, double stepV) {
        Require.nonNull("structure", gated);
        Require.nonNull("bias grid", grid);
        Require.nonNull("interface-state response", response);
        Require.inRange("C-V bias step (V)", stepV, 1e-4, 0.1);
        if (!(gated.top() instanceof TopBoundary.Schottky gate)) {
            throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                    "a C-V curve needs a gate: the top boundary is " + gated.top());
        }
        double[] v = grid.values();
        double[] c = new double[v.length];
        Solution previous = null;
        for (int i = 0; i < v.length; i++) {
            Structure at = gated.withTop(gate.atBiasV(v[i]));
            Solution op = previous == null ? solver.solve(at) : solver.solve(at, previous);
            Structure probe = response == StateResponse.QUASI_STATIC ? gated
                    : gated.withInterfaceStatesFrozen(op.interfaceStateCharge());
            double up = solver.solve(probe.withTop(gate.atBiasV(v[i] + stepV)), op).gateCharge();
            double down = solver.solve(probe.withTop(gate.atBiasV(v[i] - stepV)), op).gateCharge();
            c[i] = (up - down) / (2 * stepV);
            previous = op;
        }
        return new CvCurve(v, c, response);
    }

    @Override
    public String toString() {
        return "MIS gate workflow, threshold " + extraction;
    }
}
