package org.wurtzkit.solvers.transport;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.solvers.sp.BandDiagram;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * Gate leakage current through the computed barrier of a converged solution.
 *
 * <p><b>Model.</b> The barrier is the conduction-band edge E_c(x) of the solution from the gate
 * (x = 0) down to the depth of the lowest E_c of the stack (the 2DEG well of a HEMT, the neutral
 * bulk of a Schottky diode), piecewise linear between mesh nodes, with the band steps at the
 * heterointerfaces and, on each segment, the electron mass along c of the layer there. The gate
 * metal's Fermi level is at -qV_g and the semiconductor's at 0 (the bottom contact's, which the 2DEG
 * shares). The current is the integral of R. Tsu and L. Esaki, Appl. Phys. Lett. 22, 562 (1973)
 * ({@link TunnelCurrent}) with parabolic bands, the in-plane wave vector conserved, one in-plane
 * (supply) mass, and the transmission by WKB or transfer matrices ({@link TransmissionMethod}); its
 * part above the barrier top is the thermionic current, the part below it field and
 * thermionic-field emission (F. A. Padovani and R. Stratton, Solid-State Electron. 9, 695 (1966)),
 * both from the one integral, with no fitted parameter. The collector or emitter on the
 * semiconductor side is treated as a bulk lead with its band edge at the lowest E_c; the 2DEG's
 * subbands are not resolved. Optional: image-force lowering, and Poole-Frenkel emission with measured
 * trap parameters ({@link LeakageOptions}).
 *
 * <p>All methods are stateless and thread-safe. Cost per solution: one pass over the barrier's nodes
 * per energy (WKB), a few thousand energies.
 */
public final class GateLeakage {
    /** Warn when the image-force lowering left out exceeds this (eV). */
    static final double IMAGE_FORCE_WARNING_EV = 0.1;
    /** Largest bias step of {@link #atReverseBias} (V). */
    static final double REVERSE_SWEEP_STEP_V = 0.25;

    private GateLeakage() {
    }

    /**
     * The leakage current of one converged solution.
     *
     * @param solution a converged solution of a structure with a Schottky gate, at a temperature in
     *                 [{@value TunnelCurrent#MIN_TEMPERATURE_K}, {@value TunnelCurrent#MAX_TEMPERATURE_K}] K
     * @param options  the model choices
     * @return the current density and its parts
     * @throws InvalidParameterException for a temperature out of range
     * @throws WurtzkitException         of kind INVALID_STRUCTURE for a structure without a Schottky gate,
     *                                   NOT_CONVERGED if the current integral does not converge
     */
    public static LeakageCurrent of(Solution solution, LeakageOptions options) {
        Require.nonNull("solution", solution);
        Require.nonNull("leakage options", options);
        Structure st = solution.structure();
        TopBoundary.Schottky gate = schottky(st);
        double t = TunnelCurrent.checkTemperature(st.temperatureK());
        double kT = Constants.BOLTZMANN_EV * t;
        double v = gate.biasV();
        List<Warning> warnings = new ArrayList<>();
        Profile p = profile(solution, options, warnings);
        WurtziteMaterial atGate = st.pointAt(0).material();
        double supplyMass = Double.isNaN(options.richardsonMass()) ? atGate.masses().electronPerpendicular()
                : options.richardsonMass();
        double thermionic = 0;
        double tunnelling = 0;
        if (options.computes(LeakageMechanism.THERMIONIC) || options.computes(LeakageMechanism.TUNNELLING)) {
            Transmission tr = options.transmission().of(p.barrier, options.slabWidth());
            TunnelCurrent.Result r = TunnelCurrent.leftToRight(tr, -v, 0, supplyMass, t, options.relativeAccuracy());
            // electrons from gate to semiconductor are a negative (reverse) gate current
            thermionic = options.computes(LeakageMechanism.THERMIONIC) ? -r.overTheTop() : 0;
            tunnelling = options.computes(LeakageMechanism.TUNNELLING) ? -r.tunnelling() : 0;
        }
        double field = barrierField(solution, p.endDepth);
        double pf = 0;
        if (options.computes(LeakageMechanism.POOLE_FRENKEL) && v < 0) {
            pf = -options.pooleFrenkel().current(field, atGate.permittivityHighFrequency(), t) * -Math.expm1(v / kT);
        }
        return new LeakageCurrent(v, thermionic, tunnelling, pf, p.barrier.topEv(), field, warnings);
    }

    /**
     * The J-V curve of a bias sweep: {@link #of} at every converged point.
     *
     * @param sweep   a bias sweep of a structure with a Schottky gate
     * @param options the model choices
     * @return the curve; a point whose solve failed, or whose current integral did not converge, is NaN
     *         with its reason in the status column
     */
    public static LeakageCurve curve(BiasSweepResult sweep, LeakageOptions options) {
        Require.nonNull("bias sweep", sweep);
        Require.nonNull("leakage options", options);
        schottky(sweep.structure());
        TunnelCurrent.checkTemperature(sweep.structure().temperatureK());
        int n = sweep.size();
        LeakageCurrent[] points = new LeakageCurrent[n];
        String[] status = new String[n];
        for (int i = 0; i < n; i++) {
            var s = sweep.solution(i);
            if (s.isEmpty()) {
                status[i] = "failed: the solve at this bias did not converge";
                continue;
            }
            try {
                points[i] = of(s.get(), options);
                int w = points[i].warnings().size();
                status[i] = w == 0 ? "ok" : "ok, " + w + " warning(s)";
            } catch (WurtzkitException e) {
                if (e.kind() != ErrorKind.NOT_CONVERGED) {
                    throw e;
                }
                status[i] = "failed: " + e.getMessage();
            }
        }
        return new LeakageCurve(sweep, options, points, status);
    }

    /**
     * The leakage at one bias of a sweep: at a point of the sweep, or, between two converged points,
     * interpolated in log|J| (linearly where the two have opposite signs), with a warning.
     *
     * @param sweep   a bias sweep of a structure with a Schottky gate
     * @param biasV   the gate bias (V); must lie within the sweep's converged points
     * @param options the model choices
     * @return the current
     * @throws InvalidParameterException if the sweep's converged points never reach biasV
     */
    public static LeakageCurrent atBias(BiasSweepResult sweep, double biasV, LeakageOptions options) {
        Require.nonNull("bias sweep", sweep);
        Require.finite("gate bias (V)", biasV);
        Require.nonNull("leakage options", options);
        double[] v = sweep.gateBiasV();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        int below = -1;
        int above = -1;
        for (int i = 0; i < v.length; i++) {
            if (!sweep.succeeded(i)) {
                continue;
            }
            lo = Math.min(lo, v[i]);
            hi = Math.max(hi, v[i]);
            if (Math.abs(v[i] - biasV) <= 1e-9 * Math.max(1, Math.abs(biasV))) {
                return of(sweep.solution(i).orElseThrow(), options);
            }
            if (v[i] < biasV && (below < 0 || v[i] > v[below])) {
                below = i;
            }
            if (v[i] > biasV && (above < 0 || v[i] < v[above])) {
                above = i;
            }
        }
        if (below < 0 || above < 0) {
            throw new InvalidParameterException("gate bias for the leakage current (V)", Double.toString(biasV),
                    lo > hi ? "none: no point of the sweep converged"
                            : "[" + lo + ", " + hi + "], the converged points of the sweep; extend the sweep to "
                                    + "reach it");
        }
        LeakageCurrent a = of(sweep.solution(below).orElseThrow(), options);
        LeakageCurrent b = of(sweep.solution(above).orElseThrow(), options);
        double w = (biasV - v[below]) / (v[above] - v[below]);
        List<Warning> warnings = new ArrayList<>(Warning.union(a.warnings(), b.warnings()));
        warnings.add(new Warning(WarningKind.INTERPOLATED_BETWEEN_POINTS, "interpolated in log|J| between the sweep's "
                + "points at " + v[below] + " V and " + v[above] + " V"));
        return new LeakageCurrent(biasV, interpolate(a.thermionic(), b.thermionic(), w),
                interpolate(a.tunnelling(), b.tunnelling(), w), interpolate(a.pooleFrenkel(), b.pooleFrenkel(), w),
                a.barrierTopEv() + w * (b.barrierTopEv() - a.barrierTopEv()),
                a.barrierFieldVPerM() + w * (b.barrierFieldVPerM() - a.barrierFieldVPerM()), warnings);
    }

    /**
     * The leakage of a structure at a reverse gate bias, in one call: a bias sweep from 0 V down to
     * -reverseBiasV in steps of at most {@value #REVERSE_SWEEP_STEP_V} V (continuation carries the
     * solve where a cold start at a large reverse bias may not converge), then {@link #of} at its
     * last point.
     *
     * @param structure    a structure with a Schottky gate (its own bias is ignored)
     * @param reverseBiasV V_R = -V_g (V), in (0, 100]
     * @param sweep        the sweep (and its solver) to use
     * @param options      the model choices
     * @return the current at V_g = -reverseBiasV (negative: reverse)
     * @throws WurtzkitException of kind NOT_CONVERGED, carrying the sweep's failures, if the sweep does
     *                           not reach -reverseBiasV
     */
    public static LeakageCurrent atReverseBias(Structure structure, double reverseBiasV, BiasSweep sweep,
            LeakageOptions options) {
        Require.nonNull("structure", structure);
        Require.nonNull("bias sweep", sweep);
        Require.nonNull("leakage options", options);
        if (!(reverseBiasV > 0 && reverseBiasV <= 100)) {
            throw new InvalidParameterException("reverse gate bias (V)", Double.toString(reverseBiasV), "(0, 100]");
        }
        schottky(structure);
        TunnelCurrent.checkTemperature(structure.temperatureK());
        int points = 1 + (int) Math.ceil(reverseBiasV / REVERSE_SWEEP_STEP_V - 1e-9);
        BiasSweepResult r = sweep.run(structure, BiasGrid.linear(0, -reverseBiasV, points));
        int last = r.size() - 1;
        if (!r.succeeded(last)) {
            throw new WurtzkitException(r.failure(last).orElseThrow().kind(), "the bias sweep from 0 V did not reach "
                    + -reverseBiasV + " V: " + r.failures());
        }
        return of(r.solution(last).orElseThrow(), options);
    }

    /**
     * The barrier that {@link #of} integrates, for inspection and plots.
     *
     * @param solution a converged solution with a Schottky gate
     * @param options  the model choices (image-force lowering)
     * @return the barrier from the gate to the lowest E_c, energies relative to the bottom contact's
     *         Fermi level
     */
    public static TunnelBarrier barrier(Solution solution, LeakageOptions options) {
        Require.nonNull("solution", solution);
        Require.nonNull("leakage options", options);
        schottky(solution.structure());
        return profile(solution, options, new ArrayList<>()).barrier;
    }

    private static double interpolate(double a, double b, double w) {
        if (a == b) {
            return a;
        }
        if (a != 0 && b != 0 && Math.signum(a) == Math.signum(b)) {
            double la = Math.log(Math.abs(a));
            return Math.signum(a) * Math.exp(la + w * (Math.log(Math.abs(b)) - la));
        }
        return a + w * (b - a);
    }

    private static TopBoundary.Schottky schottky(Structure st) {
        if (st.top() instanceof TopBoundary.Schottky g) {
            return g;
        }
        throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                "gate leakage needs a Schottky gate on top of the stack; this structure has " + st.top());
    }

    private record Profile(TunnelBarrier barrier, double endDepth) {
    }

    private static Profile profile(Solution solution, LeakageOptions options, List<Warning> warnings) {
        Structure st = solution.structure();
        BandDiagram bd = solution.bandDiagram();
        double[] x = bd.depth();
        double[] ec = bd.conductionEv();
        int end = 0;
        for (int i = 1; i < ec.length; i++) {
            if (ec[i] < ec[end]) {
                end = i;
            }
        }
        end = Math.max(end, 1);
        double kT = Constants.BOLTZMANN_EV * st.temperatureK();
        if (ec[end] > 3 * kT) {
            warnings.add(new Warning(WarningKind.NO_ELECTRON_GAS_UNDER_GATE, String.format(Locale.ROOT, "no electron gas "
                    + "under the gate: the lowest E_c, %.3f eV above the Fermi level at %.1f nm, is taken as the "
                    + "collector's band edge", ec[end], x[end] * 1e9)));
        }
        double gateEps = st.pointAt(0).material().permittivityHighFrequency();
        double[] field = solution.electricField();
        double gateField = Math.abs(field[0]);
        double lowering = Math.sqrt(Constants.ELEMENTARY_CHARGE * gateField
                / (4 * Math.PI * Constants.VACUUM_PERMITTIVITY * gateEps));
        double[] xs;
        double[] us;
        if (options.imageForceLowering()) {
            double phiB = ((TopBoundary.Schottky) st.top()).barrierHeightEv();
            double[][] refined = withImagePotential(x, ec, end, gateEps, phiB);
            xs = refined[0];
            us = refined[1];
        } else {
            xs = java.util.Arrays.copyOf(x, end + 1);
            us = java.util.Arrays.copyOf(ec, end + 1);
            if (lowering > IMAGE_FORCE_WARNING_EV) {
                warnings.add(new Warning(WarningKind.IMAGE_FORCE_LOWERING_LEFT_OUT, String.format(Locale.ROOT,
                        "image-force lowering is off; at the gate field of %.2f MV/cm it would lower the barrier by "
                        + "%.3f eV", gateField / 1e8, lowering)));
            }
        }
        double[] m = new double[xs.length - 1];
        for (int i = 0; i < m.length; i++) {
            double mid = 0.5 * (xs[i] + xs[i + 1]);
            m[i] = st.pointAt(Math.min(mid, st.totalThickness())).material().masses().electronParallel();
        }
        int last = us.length - 1;
        TunnelBarrier b = TunnelBarrier.of(xs, us, m, us[last], m[0], us[last], m[last - 1]);
        return new Profile(b, xs[last]);
    }

    /**
     * Adds the image potential -q / (16 pi eps0 eps_inf x) (eV) to the profile on [0, x_end], on the
     * mesh nodes and on extra nodes spaced geometrically (ratio 1.15) from x_c to 10 nm, where x_c =
     * q / (16 pi eps0 eps_inf phi_B) is the depth at which the image potential equals the barrier height;
     * between the gate and x_c the image term is held at its value at x_c (minus phi_B: the band edge
     * meets the metal's Fermi level there). For phi_B below 0.05 eV, x_c is that of 0.05 eV, so that
     * the held part stays under a nanometre.
     */
    private static double[][] withImagePotential(double[] x, double[] ec, int end, double eps, double phiB) {
        double k = Constants.ELEMENTARY_CHARGE / (16 * Math.PI * Constants.VACUUM_PERMITTIVITY * eps);
        double xc = k / Math.max(phiB, 0.05);
        double xEnd = x[end];
        List<double[]> pts = new ArrayList<>();
        pts.add(new double[] {x[0], ec[0]});
        double extra = xc;
        double extraEnd = Math.min(10e-9, xEnd);
        for (int s = 0; s < end; s++) {
            if (x[s + 1] > x[s]) {
                while (extra < x[s + 1] && extra < extraEnd) {
                    if (extra > x[s]) {
                        double w = (extra - x[s]) / (x[s + 1] - x[s]);
                        pts.add(new double[] {extra, ec[s] + w * (ec[s + 1] - ec[s])});
                    }
                    extra *= 1.15;
                }
            }
            pts.add(new double[] {x[s + 1], ec[s + 1]});
        }
        double[] xs = new double[pts.size()];
        double[] us = new double[pts.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = pts.get(i)[0];
            us[i] = pts.get(i)[1] - k / Math.max(xs[i], xc);
        }
        return new double[][] {xs, us};
    }

    /** Mean |field| over the barrier layers: from the gate to the deepest interface above the end depth. */
    private static double barrierField(Solution solution, double endDepth) {
        double d = 0;
        for (double z : solution.structure().interfaceDepths()) {
            if (z <= endDepth) {
                d = Math.max(d, z);
            }
        }
        if (d == 0) {
            d = endDepth;
        }
        double[] x = solution.depth();
        double[] f = solution.electricField();
        double sum = 0;
        for (int k = 0; k + 1 < x.length && x[k] < d; k++) {
            double h = Math.min(x[k + 1], d) - x[k];
            sum += f[k] * h;
        }
        return Math.abs(sum) / d;
    }
}
