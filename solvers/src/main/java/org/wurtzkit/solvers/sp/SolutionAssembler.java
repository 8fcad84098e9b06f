package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * Turns what one solve computed into a {@link Solution}: the one place that derives the band
 * edges, charge, field, neutrality check, plot lines, subbands, sheets, warnings and well read-outs
 * from the device, the potential and the charge model's report. {@link SelfConsistentSolver} calls
 * {@link #assemble} once, at the end of a solve; the solution then only holds what is derived here.
 *
 * <p>Each array is computed once into the array the solution keeps (the potential is copied, the
 * report's arrays are taken over); nothing is copied twice.
 */
final class SolutionAssembler {

    private SolutionAssembler() {
    }

    /**
     * Derives every read-out of one solve.
     *
     * @param d          the resolved device
     * @param phi        the converged potential (V); read, not kept
     * @param ref        the potential the subbands were computed at (V), or null for a classical solve
     * @param qs         the subbands of the last iteration, or null for a classical solve
     * @param report     the charge model's densities at {@code phi}; its arrays are taken over
     * @param record     how the solve converged
     * @param coldStart  whether the solve started cold
     * @return the solution
     * @throws WurtzkitException of kind {@link ErrorKind#NON_FINITE_RESULT} if a derived value is not finite
     */
    static Solution assemble(Device d, double[] phi, double[] ref, QuantumStates qs, ChargeModel.Report report,
            ConvergenceRecord record, boolean coldStart) {
        int nn = d.n;
        Structure structure = d.structure;
        double[] electronFermi = new double[d.n];
        double[] holeFermi = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            int c = i < d.n - 1 ? i : i - 1;
            electronFermi[i] = d.efn[c];
            holeFermi[i] = d.efp[c];
        }
        boolean subbandLimitReached = qs != null && qs.limitReached;
        double[] depth = d.x.clone();
        double[] potential = phi.clone();
        double[] ec = new double[nn];
        double[] ev = new double[nn];
        for (int i = 0; i < nn; i++) {
            int k = i < nn - 1 ? i : nn - 2;
            ec[i] = d.ec[k] - phi[i];
            ev[i] = d.ev[k] - phi[i];
        }
        double[] interfaceStateCharge = new double[structure.interfaceSheets().size()];
        for (int k = 0; k < d.sheetNode.length; k++) {
            interfaceStateCharge[d.sheetOwner[k]] += Device.Q * ChargeModel.stateCharge(d, k, phi[d.sheetNode[k]]);
        }
        double[] n = report.electrons();
        double[] p = report.holes();
        double[] q = report.boxCharge();
        double[] charge = new double[nn];
        double eSheet = 0;
        double hSheet = 0;
        double sumQ = 0;
        double scale = 0;
        for (int i = 0; i < nn; i++) {
            double w = d.box(i);
            charge[i] = q[i] / w;
            eSheet += n[i] * w;
            hSheet += p[i] * w;
            sumQ += q[i];
            scale += Math.abs(q[i]);
        }
        double gateT = structure.gateStackThickness();
        double under = 0;
        if (gateT > 0) {
            for (int i = 0; i < nn; i++) {
                if (d.x[i] >= gateT && d.x[i] <= gateT + Solution.HOLE_WATCH_DEPTH) {
                    under += p[i] * d.box(i);
                }
            }
        }
        double[] midpoints = new double[nn - 1];
        double[] field = new double[nn - 1];
        for (int k = 0; k < nn - 1; k++) {
            midpoints[k] = 0.5 * (d.x[k] + d.x[k + 1]);
            field[k] = -(phi[k + 1] - phi[k]) / d.h[k];
        }
        // D just below the surface box, D = eps E + P along +x
        double dTop = d.eps[0] * field[0] + d.px[0];
        // metal sheet charge: D_{1/2} - Q_0 (zero for a free surface, up to the Newton residual)
        double gateCharge = d.topDirichlet ? dTop - q[0] : 0;
        double dBottom = d.bottomDirichlet ? d.eps[nn - 2] * field[nn - 2] + d.px[nn - 2] + q[nn - 1] : d.px[nn - 2];
        double bound = 0;
        for (int i = 0; i < nn; i++) {
            double below = i < nn - 1 ? d.px[i] : d.px[nn - 2];
            double above = i > 0 ? d.px[i - 1] : 0;
            bound += above - below;
        }
        scale += Math.abs(gateCharge) + Math.abs(d.px[0]) + Math.abs(d.px[nn - 2]);
        for (int k = 1; k < nn - 1; k++) {
            scale += Math.abs(d.px[k] - d.px[k - 1]);
        }
        // free + bound + contact charge must vanish; what the bottom carries is D_bottom - P_bottom
        double contactBottom = dBottom - d.px[nn - 2];
        double neutralityResidual = Math.abs(gateCharge + sumQ + bound - contactBottom) / scale;

        // plotting polyline with both sides of every band step
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < nn; i++) {
            if (i > 0 && i < nn - 1 && d.ec[i - 1] != d.ec[i]) {
                pts.add(new double[] {d.x[i], d.ec[i - 1] - phi[i], d.ev[i - 1] - phi[i]});
            }
            pts.add(new double[] {d.x[i], ec[i], ev[i]});
        }
        double[] plotDepth = new double[pts.size()];
        double[] plotEc = new double[pts.size()];
        double[] plotEv = new double[pts.size()];
        for (int j = 0; j < pts.size(); j++) {
            plotDepth[j] = pts.get(j)[0];
            plotEc[j] = pts.get(j)[1];
            plotEv[j] = pts.get(j)[2];
        }

        List<Subband> bands = new ArrayList<>();
        int nw = qs == null ? 0 : qs.windows;
        double[] wellSheetDensity = new double[nw];
        double[][] windows = new double[nw][];
        for (int w = 0; w < nw; w++) {
            int a = d.windowStart[w];
            windows[w] = new double[] {d.x[a], d.x[d.windowEnd[w]]};
            for (int k = 0; k < qs.count[w]; k++) {
                // the subband keeps the window's part only (QuantumStates' rows are overwritten by later updates)
                WindowedWavefunction psi = new WindowedWavefunction(qs.psi[w][k].clone(), a, nn);
                // occupation with the same first-order shift (phi - ref) as the density of Poisson
                double occ = SubbandDensity.sheet(d, qs, w, k, phi, ref);
                wellSheetDensity[w] += occ;
                bands.add(new Subband(w, k, qs.energy[w][k], psi, occ, qs.massXY[w][k]));
            }
        }
        List<Subband> subbands = Collections.unmodifiableList(bands);
        List<HoleSubband> hb = new ArrayList<>();
        for (int w = 0; qs != null && qs.holes != null && w < nw; w++) {
            int a = d.windowStart[w];
            for (int b = 0; b < HoleStates.BANDS; b++) {
                for (int k = 0; k < qs.holes.count[w][b]; k++) {
                    WindowedWavefunction psi = new WindowedWavefunction(qs.holes.psi[w][b][k].clone(), a, nn);
                    double occ = qs.holes.sheet(d, w, b, k, phi, ref);
                    double mxy = qs.holes.dos[w][b][k] * Math.PI * Constants.HBAR * Constants.HBAR
                            / (Constants.ELECTRON_MASS * d.kT);
                    hb.add(new HoleSubband(w, ValenceBands.Kind.values()[b], k, -qs.holes.energy[w][b][k], psi, occ, mxy));
                }
            }
        }
        List<HoleSubband> holeSubbands = Collections.unmodifiableList(hb);
        List<CarrierSheet> sheets = Collections.unmodifiableList(
                CarrierSheet.gather(d, phi, qs, n, p, bands, holeSubbands, ref));
        checkFinite(structure, potential, ec, ev, n, p, report.donors(), report.acceptors(), charge, field);
        List<Warning> warnings = warnings(d, phi, depth, ec, n, p, windows, subbands, wellSheetDensity,
                subbandLimitReached);
        if (under > Solution.HOLE_WARNING_PER_M2) {
            warnings = withHolesUnderGateStack(warnings, under);
        }
        List<InterfaceEdges> interfaceEdges = InterfaceEdges.of(d, depth, phi);
        List<WellMinimum> wellMinima = WellMinimum.of(d, depth, phi, nw);
        return new Solution(structure, d.options, record, coldStart, depth, potential, ec, ev, electronFermi,
                holeFermi, n, p, report.donors(), report.acceptors(), charge, midpoints, field, plotDepth, plotEc,
                plotEv, windows, subbands, wellSheetDensity, holeSubbands, subbandLimitReached, sheets, eSheet,
                hSheet, under, interfaceStateCharge, gateCharge, neutralityResidual, warnings, interfaceEdges,
                wellMinima);
    }

    /**
     * The structure's own warnings, then a surface hole gas under a free surface, window-bound
     * subbands, window edges inside free electrons and a reached subband limit (thresholds: the
     * {@code WARN_...} constants of {@link Solution}).
     */
    private static List<Warning> warnings(Device d, double[] phi, double[] depth, double[] ec, double[] n, double[] p,
            double[][] windows, List<Subband> subbands, double[] wellSheetDensity, boolean subbandLimitReached) {
        Structure structure = d.structure;
        List<Warning> out = new ArrayList<>(structure.warnings());
        int nn = depth.length;
        if (structure.top() instanceof TopBoundary.FreeSurface) {
            double bottomOfTop = structure.layerStates().get(0).depthBottom();
            double holes = 0;
            for (int i = 0; i < nn && depth[i] <= bottomOfTop; i++) {
                holes += p[i] * d.box(i);
            }
            if (holes > Solution.WARN_SURFACE_HOLES_PER_M2) {
                out.add(new Warning(WarningKind.SURFACE_HOLE_GAS, "a hole gas of "
                        + Decimals.format(Units.perM2ToPerCm2(holes), "cm^-2") + " gathers in the top layer: the "
                        + "surface donors given (" + structure.top() + ") cannot balance the polarization charge; "
                        + "give more surface donors or a deeper donor level if the real surface has no holes"));
            }
        }
        for (int w = 0; w < windows.length; w++) {
            int a = d.windowStart[w];
            int b = d.windowEnd[w];
            // conduction band just outside each edge that is not the surface
            double outsideBelow = b < nn - 1 ? ec[b] : Double.POSITIVE_INFINITY;
            double outsideAbove = a > 0 ? d.ec[a - 1] - phi[a] : Double.POSITIVE_INFINITY;
            double wall = Math.min(outsideBelow, outsideAbove);
            double bound = 0;
            int boundCount = 0;
            for (Subband s : subbands) {
                if (s.window() == w && s.energyEv() > wall) {
                    bound += s.sheetDensity();
                    boundCount++;
                }
            }
            if (bound > Solution.WARN_SURFACE_HOLES_PER_M2 && bound > Solution.WARN_WINDOW_BOUND_FRACTION * wellSheetDensity[w]) {
                out.add(new Warning(WarningKind.WINDOW_BOUND_SUBBAND, boundCount + (boundCount == 1 ? " subband" : " subbands")
                        + " of window " + w + " (" + Decimals.format(Units.mToNm(windows[w][0])) + " to "
                        + Decimals.format(Units.mToNm(windows[w][1]), "nm") + ") lie above the conduction band " + Decimals.format(wall, "eV")
                        + " outside its edge and hold " + Decimals.format(Units.perM2ToPerCm2(bound), "cm^-2")
                        + ": bound only by the window's wall; widen the window"));
            }
            double peak = 0;
            for (int i = a; i <= b; i++) {
                peak = Math.max(peak, n[i]);
            }
            for (int i : new int[] {a - 1, b + 1}) {
                if (i >= 0 && i < nn && n[i] > Solution.WARN_EDGE_DENSITY_FRACTION * peak && n[i] > 0) {
                    out.add(new Warning(WarningKind.WINDOW_EDGE_IN_ELECTRONS, "the " + (i < a ? "top" : "bottom")
                            + " edge of window " + w + " (at " + Decimals.format(Units.mToNm(depth[i < a ? a : b]), "nm")
                            + ") cuts through free electrons: " + Decimals.format(Units.perM3ToPerCm3(n[i]), "cm^-3")
                            + " just outside against a peak of " + Decimals.format(Units.perM3ToPerCm3(peak), "cm^-3")
                            + " inside; move the edge where the density is low"));
                }
            }
        }
        if (subbandLimitReached) {
            out.add(new Warning(WarningKind.SUBBAND_LIMIT_REACHED,
                    "a quantum window reached the subband limit; its density is too low"));
        }
        return List.copyOf(out);
    }

    /** The warnings and, after them, the one about holes within 5 nm under the gate stack. */
    private static List<Warning> withHolesUnderGateStack(List<Warning> warnings, double under) {
        List<Warning> out = new ArrayList<>(warnings);
        out.add(new Warning(WarningKind.HOLES_UNDER_GATE_STACK, Decimals.format(Units.perM2ToPerCm2(under), "cm^-2")
                + " of holes within 5 nm under the gate stack, at the hole quasi-Fermi level of QuasiFermiLevels"
                + " (by default the channel's): a steady state, which a measurement faster than their supply"
                + " (generation, leakage through the barrier) does not reach"));
        return List.copyOf(out);
    }

    private static void checkFinite(Structure structure, double[]... arrays) {
        for (double[] a : arrays) {
            for (double v : a) {
                if (!Double.isFinite(v)) {
                    throw new WurtzkitException(ErrorKind.NON_FINITE_RESULT,
                            "non-finite value in a solution; please report this structure: "
                            + structure);
                }
            }
        }
    }
}
