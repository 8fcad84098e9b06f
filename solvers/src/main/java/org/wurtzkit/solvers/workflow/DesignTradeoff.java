// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.transport.GateLeakage;
import org.wurtzkit.solvers.transport.LeakageCurrent;
import org.wurtzkit.solvers.transport.LeakageOptions;
import org.wurtzkit.solvers.transport.mobility.Mobility;
import org.wurtzkit.solvers.transport.mobility.MobilityOptions;
import org.wurtzkit.solvers.transport.mobility.MobilityResult;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * The designer's trade-off over a family of stacks: for every point of a grid of design variables,
 * the 2DEG sheet density n<sub>s</sub>, the threshold voltage V<sub>th</sub>, the mobility and the
 * sheet resistance R<sub>sh</sub> at a gate bias of 0 V, and the gate leakage current density J at a
 * chosen reverse bias V<sub>R</sub>; then the Pareto front of R<sub>sh</sub> against |J| among the
 * stacks whose V<sub>th</sub> lies in a chosen band.
 *
 * <pre>{@code
 * TradeoffResult r = DesignTradeoff.builder(p -> stack(p[0], p[1], p[2]))
 *         .axis(Axis.of("cap", "nm", 0, 2, 4))
 *         .axis(Axis.of("al_fraction", "", 0.20, 0.25, 0.30))
 *         .axis(Axis.of("barrier", "nm", 15, 20, 25, 30))
 *         .reverseBiasV(10)
 *         .thresholdBand(-4.0, 0.5)
 *         .build()
 *         .run();
 * r.writeCsv(Path.of("tradeoff.csv"));
 * r.front().forEach(System.out::println);
 * }</pre>
 *
 * <p><b>One sweep per point.</b> Each point's stack is solved along one gate-bias sweep from 0 V
 * (the stack's own bias is ignored) downwards: its first solution (0 V, a cold solve) gives
 * n<sub>s</sub> and, through {@link Mobility#of}, the mobility and R<sub>sh</sub>; V<sub>th</sub>
 * is read off the whole sweep by the {@link ThresholdDefinition}; the solution at -V<sub>R</sub>
 * gives J through {@link GateLeakage#of}. By default the sweep's range is placed as in
 * {@link SheetDensityAndThreshold}: down to min(-V<sub>R</sub>, V<sub>th,model</sub> - margin),
 * with V<sub>th,model</sub> the closed-form charge balance of {@link ChargeBalanceModel}, in equal
 * steps of at most {@link #stepV()} chosen so that -V<sub>R</sub> is a point of the sweep (no
 * interpolation of J). For stacks the closed-form model cannot hold, give the sweep yourself with
 * {@link Builder#sweep(ThresholdExtraction)}; its first bias must be 0 V, and J at -V<sub>R</sub> is
 * then interpolated between the sweep's points if -V<sub>R</sub> is not one of them (with a warning,
 * see {@link GateLeakage#atBias}).
 *
 * <p><b>"At fixed V<sub>th</sub>".</b> V<sub>th</sub> differs from stack to stack. The honest
 * comparison this class offers is a band: with {@link Builder#thresholdBand(double, double)} the
 * front is computed among the stacks with |V<sub>th</sub> - target| &le; tolerance only, and the
 * table marks which rows are in the band and which on the front. Nothing is re-targeted: every
 * number is that of the stack as specified. Without a band every computed stack is in it, and the
 * result warns that its front mixes threshold voltages.
 *
 * <p><b>Failures.</b> A point fails, with its kind and reason, when the factory or a solve throws
 * a library exception, when a bias of the sweep does not converge (NOT_CONVERGED: the threshold
 * needs every point), when the sweep never reaches -V<sub>R</sub> (INVALID_PARAMETER, naming the
 * sweep's range), when the stack has no 2DEG at 0 V (the mobility needs one), or when the leakage
 * integral does not converge. Failed points are in no band and on no front. Any other exception is
 * a defect and propagates.
 *
 * <p><b>Determinism.</b> Every point is computed independently, from a cold start, into its own
 * slot ({@link ParallelPoints}); the result is the same, bit for bit, for any thread count. A
 * configured trade-off is immutable and may be run several times, also concurrently. Interrupting
 * the calling thread stops the run with a {@link java.util.concurrent.CancellationException}.
 *
 * <p>Cost per point: one bias sweep, one mobility and one leakage evaluation.
 */
public final class DesignTradeoff {
    /** Default threshold definition: n_s = 1e11 cm^-2 (constant-density method). */
    public static final double DEFAULT_THRESHOLD_LEVEL_PER_CM2 = 1e11;

    /** Indices into a point's values. */
    static final int NS = 0;
    static final int VTH = 1;
    static final int VTH_MODEL = 2;
    static final int MU = 3;
    static final int RSH = 4;
    static final int J = 5;
    static final int WIDTH = 6;

    private final StructureFactory factory;
    private final List<Axis> axes;
    private final SelfConsistentSolver solver;
    private final double reverseBiasV;
    private final ThresholdDefinition definition;
    private final ThresholdExtraction fixedSweep;
    private final double stepV;
    private final double marginV;
    private final double marginFraction;
    private final double bandTargetV;
    private final double bandToleranceV;
    private final MobilityOptions mobility;
    private final LeakageOptions leakage;
    private final int threads;
    private final ProgressListener progress;

    private DesignTradeoff(Builder b) {
        if (b.axes.isEmpty()) {
            throw new InvalidParameterException("number of trade-off axes", "0", "[1, ...) (add an axis)");
        }
        if (Double.isNaN(b.reverseBiasV)) {
            throw new InvalidParameterException("reverse gate bias (V)", "not set", "(0, 100] (set it with reverseBiasV)");
        }
        long points = 1;
        for (Axis a : b.axes) {
            points *= a.size();
            if (points > Integer.MAX_VALUE - 8) {
                throw new InvalidParameterException("number of trade-off points", Long.toString(points),
                        "[1, " + (Integer.MAX_VALUE - 8) + "]");
            }
        }
        if (b.fixedSweep != null && b.fixedSweep.grid().get(0) != 0) {
            throw new InvalidParameterException("first bias of the trade-off sweep (V)",
                    Double.toString(b.fixedSweep.grid().get(0)), "[0, 0] (n_s and R_sh are taken at 0 V)");
        }
        this.factory = b.factory;
        this.axes = List.copyOf(b.axes);
        this.solver = b.run.solver();
        this.reverseBiasV = b.reverseBiasV;
        this.definition = b.fixedSweep != null ? b.fixedSweep.definition() : b.definition;
        this.fixedSweep = b.fixedSweep;
        this.stepV = b.stepV;
        this.marginV = b.marginV;
        this.marginFraction = b.marginFraction;
        this.bandTargetV = b.bandTargetV;
        this.bandToleranceV = b.bandToleranceV;
        this.mobility = b.mobility;
        this.leakage = b.leakage;
        this.threads = b.run.threads();
        this.progress = b.run.progress();
    }

    /**
     * @param factory builds a point's structure (with a Schottky gate) from the axis values
     * @return a builder
     */
    public static Builder builder(StructureFactory factory) {
        return new Builder(factory);
    }

    /** {@return the axes, in order} */
    public List<Axis> axes() {
        return axes;
    }

    /** {@return the number of points, the product of the axis sizes} */
    public int size() {
        int n = 1;
        for (Axis a : axes) {
            n *= a.size();
        }
        return n;
    }

    /** {@return the reverse bias V_R = -V_g of the leakage current (V)} */
    public double reverseBiasV() {
        return reverseBiasV;
    }

    /** {@return the largest bias step of the automatic sweep (V)} */
    public double stepV() {
        return stepV;
    }

    /** {@return the threshold definition} */
    public ThresholdDefinition definition() {
        return definition;
    }

    /** {@return true if a V_th band was set} */
    public boolean hasThresholdBand() {
        return !Double.isNaN(bandTargetV);
    }

    double[] parameters(int index) {
        double[] p = new double[axes.size()];
        int rest = index;
        for (int a = axes.size() - 1; a >= 0; a--) {
            Axis axis = axes.get(a);
            p[a] = axis.get(rest % axis.size());
            rest /= axis.size();
        }
        return p;
    }

    /**
     * The automatic sweep of a stack: equal steps h = V_R / ceil(V_R / stepV) from 0 V, down to
     * min(-V_R, V_th,model - margin), with -V_R itself a point.
     *
     * @param structure a stack with a Schottky gate
     * @return the grid, and V_th,model
     */
    private Placed placedGrid(Structure structure) {
        double model = ChargeBalanceModel.fromStructure(structure).thresholdVoltage();
        int toReverse = (int) Math.ceil(reverseBiasV / stepV - 1e-9);
        double h = reverseBiasV / toReverse;
        double margin = Math.max(marginV, marginFraction * Math.abs(model));
        double low = Math.min(-reverseBiasV, Math.min(0, model) - margin);
        int steps = Math.max(toReverse, (int) Math.ceil(-low / h - 1e-9));
        double[] v = new double[steps + 1];
        for (int i = 0; i <= steps; i++) {
            v[i] = -i * h;
        }
        v[toReverse] = -reverseBiasV;
        return new Placed(BiasGrid.of(v), model);
    }

    private record Placed(BiasGrid grid, double modelV) {
    }

    /**
     * Runs the trade-off. Blocks until every point is done.
     *
     * @return the table, the band and the front
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted
     */
    public TradeoffResult run() {
        int n = size();
        @SuppressWarnings("unchecked")
        List<Warning>[] warnings = new List[n];
        BiasSweep sweeper = new BiasSweep(solver);
        ParallelPoints.Outcome[] out = ParallelPoints.run(n, threads, i -> {
            Structure s = factory.at(parameters(i));
            if (s == null) {
                throw new WurtzkitException(ErrorKind.INVALID_CALLBACK_RESULT, "the structure factory returned null");
            }
            if (!(s.top() instanceof TopBoundary.Schottky)) {
                throw new InvalidParameterException("top boundary", s.top().toString(),
                        "a Schottky gate (a threshold voltage and a gate leakage need a gate)");
            }
            BiasGrid grid;
            double model;
            if (fixedSweep != null) {
                grid = fixedSweep.grid();
                model = Double.NaN;
                double lowest = Math.min(grid.get(0), grid.get(grid.size() - 1));
                if (lowest > -reverseBiasV * (1 + 1e-12)) {
                    throw new InvalidParameterException("reverse gate bias of the trade-off (V)",
                            Double.toString(reverseBiasV), "(0, " + -lowest + "]: the bias sweep " + grid
                                    + " never reaches " + -reverseBiasV + " V; extend the sweep");
                }
            } else {
                Placed p = placedGrid(s);
                grid = p.grid();
                model = p.modelV();
            }
            BiasSweepResult r = sweeper.run(s, grid);
            if (!r.failures().isEmpty()) {
                throw new WurtzkitException(ErrorKind.NOT_CONVERGED, "the trade-off sweep needs every bias point; "
                        + r.failures().size() + " of " + r.size() + " failed, first: " + r.failures().get(0));
            }
            Threshold th = r.threshold(definition);
            double vth = th.voltageV();
            Solution zero = r.solution(0).orElseThrow();
            MobilityResult mu = Mobility.of(zero, mobility);
            LeakageCurrent j = GateLeakage.atBias(r, -reverseBiasV, leakage);
            List<Warning> w = new ArrayList<>(Warning.union(s.warnings(), r.warnings(), th.warnings()));
            for (Warning m : mu.warnings()) {
                w.add(new Warning(m.kind(), "mobility: " + m.message()));
            }
            for (Warning m : j.warnings()) {
                w.add(new Warning(m.kind(), "leakage: " + m.message()));
            }
            warnings[i] = List.copyOf(w);
            double[] v = new double[WIDTH];
            v[NS] = r.sheetDensityPerCm2()[0];
            v[VTH] = vth;
            v[VTH_MODEL] = model;
            v[MU] = mu.mobilityCm2PerVs();
            v[RSH] = mu.sheetResistanceOhmPerSquare();
            v[J] = j.totalAPerCm2();
            return v;
        }, progress);
        double[][] params = new double[n][];
        for (int i = 0; i < n; i++) {
            params[i] = parameters(i);
        }
        return new TradeoffResult(this, params, out, warnings, bandTargetV, bandToleranceV);
    }

    /** {@return the structure factory (code)} */
    StructureFactory factory() {
        return factory;
    }

    /** {@return the solver's options} */
    org.wurtzkit.solvers.sp.SolverOptions solverOptions() {
        return solver.options();
    }

    /**
     * {@return the settings of this trade-off besides its axes and factory, exactly (numbers by
     * {@link Double#toString(double)}), as provenance run entries}
     */
    java.util.Map<String, String> settings() {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        m.put("reverseBiasV", Double.toString(reverseBiasV));
        m.put("thresholdDefinition", definition.toString());
        if (fixedSweep != null) {
            m.put("thresholdBiasesV", SweepProvenance.values(fixedSweep.grid().values()));
        } else {
            m.put("sweepStepV", Double.toString(stepV));
            m.put("sweepMarginV", Double.toString(marginV));
            m.put("sweepMarginFraction", Double.toString(marginFraction));
        }
        m.put("bandTargetV", Double.toString(bandTargetV));
        m.put("bandToleranceV", Double.toString(bandToleranceV));
        m.put("mobilityOptions", mobility.toString());
        m.put("leakageOptions", leakage.describe());
        return m;
    }

    /** @return e.g. "trade-off over 3 x 3 x 4 stacks: J at V_R = 10 V, threshold at ..., band -4 V +- 0.5 V" */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("trade-off over ");
        for (int a = 0; a < axes.size(); a++) {
            sb.append(a == 0 ? "" : " x ").append(axes.get(a).size());
        }
        sb.append(" stacks: J at V_R = ").append(Decimals.format(reverseBiasV, "V")).append(", ").append(definition);
        if (hasThresholdBand()) {
            sb.append(", V_th band ").append(Decimals.format(bandTargetV, "V")).append(" \u00b1 ")
                    .append(Decimals.format(bandToleranceV, "V"));
        }
        return sb.toString();
    }

    /** Mutable builder. */
    public static final class Builder {
        private final StructureFactory factory;
        private final List<Axis> axes = new ArrayList<>();
        private double reverseBiasV = Double.NaN;
        private ThresholdDefinition definition = ThresholdDefinition.constantDensity(DEFAULT_THRESHOLD_LEVEL_PER_CM2);
        private ThresholdExtraction fixedSweep;
        private double stepV = SheetDensityAndThreshold.DEFAULT_STEP_V;
        private double marginV = SheetDensityAndThreshold.DEFAULT_MARGIN_V;
        private double marginFraction = SheetDensityAndThreshold.DEFAULT_MARGIN_FRACTION;
        private double bandTargetV = Double.NaN;
        private double bandToleranceV = Double.NaN;
        private MobilityOptions mobility = MobilityOptions.defaults();
        private LeakageOptions leakage = LeakageOptions.defaults();
        private RunSettings run = RunSettings.defaults();

        private Builder(StructureFactory factory) {
            this.factory = Require.nonNull("structure factory", factory);
        }

        /**
         * @param axis the next design variable
         * @return this builder
         */
        public Builder axis(Axis axis) {
            axes.add(Require.nonNull("axis", axis));
            return this;
        }

        /**
         * @param v the reverse bias V_R = -V_g at which the leakage is compared (V), in (0, 100];
         *          no default: it is the designer's rating
         * @return this builder
         */
        public Builder reverseBiasV(double v) {
            if (!(v > 0 && v <= 100)) {
                throw new InvalidParameterException("reverse gate bias (V)", Double.toString(v), "(0, 100]");
            }
            this.reverseBiasV = v;
            return this;
        }

        /**
         * Compares stacks at a fixed threshold voltage: the front is computed among the stacks with
         * |V_th - target| &le; tolerance. Default: no band (all computed stacks).
         *
         * @param targetV    the target V_th (V), in [-100, 100]
         * @param toleranceV the half-width of the band (V), in (0, 100]
         * @return this builder
         */
        public Builder thresholdBand(double targetV, double toleranceV) {
            Require.inRange("target threshold voltage (V)", targetV, -100, 100);
            if (!(toleranceV > 0 && toleranceV <= 100)) {
                throw new InvalidParameterException("threshold-voltage tolerance (V)", Double.toString(toleranceV),
                        "(0, 100]");
            }
            this.bandTargetV = targetV;
            this.bandToleranceV = toleranceV;
            return this;
        }

        /**
         * @param d how V_th is read off each sweep (default: n_s = 1e11 cm^-2); replaced by the
         *          definition of a sweep set with {@link #sweep(ThresholdExtraction)}
         * @return this builder
         */
        public Builder threshold(ThresholdDefinition d) {
            this.definition = Require.nonNull("threshold definition", d);
            return this;
        }

        /**
         * @param v largest bias step of the automatic sweep (V), in [0.001, 5] (default
         *          {@value SheetDensityAndThreshold#DEFAULT_STEP_V})
         * @return this builder
         */
        public Builder stepV(double v) {
            this.stepV = Require.inRange("bias step (V)", v, 0.001, 5);
            return this;
        }

        /**
         * @param volts    least distance the automatic sweep runs below the model's V_th (V), in [0, 50]
         *                 (default {@value SheetDensityAndThreshold#DEFAULT_MARGIN_V})
         * @param fraction further margin as a fraction of |V_th,model|, in [0, 10] (default
         *                 {@value SheetDensityAndThreshold#DEFAULT_MARGIN_FRACTION})
         * @return this builder
         */
        public Builder margin(double volts, double fraction) {
            this.marginV = Require.inRange("margin below the model threshold (V)", volts, 0, 50);
            this.marginFraction = Require.inRange("margin fraction", fraction, 0, 10);
            return this;
        }

        /**
         * Uses one fixed sweep for every stack instead of the automatic one (for stacks the
         * closed-form model cannot hold). Its first bias must be 0 V; if it does not reach -V_R,
         * every point fails with the reason.
         *
         * @param e the sweep and the threshold definition
         * @return this builder
         */
        public Builder sweep(ThresholdExtraction e) {
            this.fixedSweep = Require.nonNull("threshold extraction", e);
            return this;
        }

        /**
         * @param o mobility options (default {@link MobilityOptions#defaults()}; set the roughness and
         *          dislocations of your samples)
         * @return this builder
         */
        public Builder mobility(MobilityOptions o) {
            this.mobility = Require.nonNull("mobility options", o);
            return this;
        }

        /**
         * @param o leakage options (default {@link LeakageOptions#defaults()})
         * @return this builder
         */
        public Builder leakage(LeakageOptions o) {
            this.leakage = Require.nonNull("leakage options", o);
            return this;
        }

        /**
         * @param s the solver (default: {@link SelfConsistentSolver#SelfConsistentSolver()})
         * @return this builder
         */
        public Builder solver(SelfConsistentSolver s) {
            run = run.withSolver(s);
            return this;
        }

        /**
         * @param n worker threads, in [1, 1024] (default: {@link Runtime#availableProcessors()})
         * @return this builder
         */
        public Builder threads(int n) {
            run = run.withThreads(n);
            return this;
        }

        /**
         * @param p progress listener (default: none)
         * @return this builder
         */
        public Builder progress(ProgressListener p) {
            run = run.withProgress(p);
            return this;
        }

        /**
         * {@return the trade-off}
         *
         * @throws InvalidParameterException if there is no axis, no reverse bias, or a fixed sweep
         *                                   that does not start at 0 V
         */
        public DesignTradeoff build() {
            return new DesignTradeoff(this);
        }
    }
}
