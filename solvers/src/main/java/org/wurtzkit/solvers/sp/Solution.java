package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.statistics.FermiDirac;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * A converged band diagram. Immutable: every array accessor returns a copy. No field holds NaN.
 *
 * <p>Node arrays have one value per mesh node at depth {@link #depth()} (m, 0 at the surface).
 * Energies are in eV with the bottom contact's Fermi level at 0. At an interface node the band
 * edges reported by {@link #conductionBand()} and {@link #valenceBand()} are those of the layer
 * below the node; {@link #bandDiagram()} gives both sides of every step for plotting. Cell arrays
 * ({@link #electricField()}) have one value per interval between nodes, at {@link #cellMidpoints()}.
 */
public final class Solution {
    /** Depth below a gate stack within which holes are summed for the warning of {@link #toString()} (m). */
    static final double HOLE_WATCH_DEPTH = 5e-9;
    /** Hole sheet under a gate stack above which {@link #toString()} warns (m^-2): 1e10 cm^-2. */
    static final double HOLE_WARNING_PER_M2 = 1e14;

    /** Subbands listed one per line by {@link #toString()}; the rest are summed on one line. */
    private static final int SUBBANDS_SHOWN = 4;

    private final Structure structure;
    private final double[] depth;
    private final double[] potential;
    private final double[] ec;
    private final double[] ev;
    private final double[] n;
    private final double[] p;
    private final double[] donors;
    private final double[] acceptors;
    private final double[] charge;
    private final double[] midpoints;
    private final double[] field;
    private final double[] plotDepth;
    private final double[] plotEc;
    private final double[] plotEv;
    private final List<Subband> subbands;
    private final double[] wellSheetDensity;
    private final double[][] windows;
    private final double electronSheet;
    private final double holeSheet;
    private final double gateCharge;
    private final double neutralityResidual;
    private final double holeFermiEv;
    private final boolean subbandLimitReached;
    private final ConvergenceRecord record;
    private final double[] interfaceStateCharge;
    private final double holesUnderInsulator;

    /**
     * Copies out what one solve computed: the potential and subbands are read, never kept; the
     * report's arrays are taken over (the caller hands them on and keeps no reference).
     */
    Solution(Device d, double[] phi, double[] ref, QuantumStates qs, ChargeModel.Report report,
            ConvergenceRecord record) {
        int nn = d.n;
        this.structure = d.structure;
        this.record = record;
        this.holeFermiEv = d.holeFermiEv;
        this.subbandLimitReached = qs != null && qs.limitReached;
        depth = d.x.clone();
        potential = phi.clone();
        ec = new double[nn];
        ev = new double[nn];
        for (int i = 0; i < nn; i++) {
            int k = i < nn - 1 ? i : nn - 2;
            ec[i] = d.ec[k] - phi[i];
            ev[i] = d.ev[k] - phi[i];
        }
        interfaceStateCharge = new double[d.structure.interfaceSheets().size()];
        for (int k = 0; k < d.sheetNode.length; k++) {
            interfaceStateCharge[d.sheetOwner[k]] += Device.Q * ChargeModel.stateCharge(d, k, phi[d.sheetNode[k]]);
        }
        n = report.electrons();
        p = report.holes();
        donors = report.donors();
        acceptors = report.acceptors();
        double[] q = report.boxCharge();
        charge = new double[nn];
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
        electronSheet = eSheet;
        double gateT = d.structure.gateStackThickness();
        double under = 0;
        if (gateT > 0) {
            for (int i = 0; i < nn; i++) {
                if (d.x[i] >= gateT && d.x[i] <= gateT + HOLE_WATCH_DEPTH) {
                    under += p[i] * d.box(i);
                }
            }
        }
        holesUnderInsulator = under;
        holeSheet = hSheet;
        midpoints = new double[nn - 1];
        field = new double[nn - 1];
        for (int k = 0; k < nn - 1; k++) {
            midpoints[k] = 0.5 * (d.x[k] + d.x[k + 1]);
            field[k] = -(phi[k + 1] - phi[k]) / d.h[k];
        }
        // D just below the surface box, D = eps E + P along +x
        double dTop = d.eps[0] * field[0] + d.px[0];
        // metal sheet charge: D_{1/2} - Q_0 (zero for a free surface, up to the Newton residual)
        gateCharge = d.topDirichlet ? dTop - q[0] : 0;
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
        neutralityResidual = Math.abs(gateCharge + sumQ + bound - contactBottom) / scale;

        // plotting polyline with both sides of every band step
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < nn; i++) {
            if (i > 0 && i < nn - 1 && d.ec[i - 1] != d.ec[i]) {
                pts.add(new double[] {d.x[i], d.ec[i - 1] - phi[i], d.ev[i - 1] - phi[i]});
            }
            pts.add(new double[] {d.x[i], ec[i], ev[i]});
        }
        plotDepth = new double[pts.size()];
        plotEc = new double[pts.size()];
        plotEv = new double[pts.size()];
        for (int j = 0; j < pts.size(); j++) {
            plotDepth[j] = pts.get(j)[0];
            plotEc[j] = pts.get(j)[1];
            plotEv[j] = pts.get(j)[2];
        }

        List<Subband> bands = new ArrayList<>();
        int nw = qs == null ? 0 : qs.windows;
        wellSheetDensity = new double[nw];
        windows = new double[nw][];
        for (int w = 0; w < nw; w++) {
            int a = d.windowStart[w];
            windows[w] = new double[] {d.x[a], d.x[d.windowEnd[w]]};
            // zero outside the window; each subband overwrites the window part, and Subband copies it
            double[] full = new double[nn];
            for (int k = 0; k < qs.count[w]; k++) {
                System.arraycopy(qs.psi[w][k], 0, full, a, qs.psi[w][k].length);
                // occupation with the same first-order shift (phi - ref) as the density of Poisson
                double occ = SubbandDensity.sheet(d, qs, w, k, phi, ref);
                wellSheetDensity[w] += occ;
                bands.add(new Subband(w, k, qs.energy[w][k], full, occ, qs.massXY[w][k]));
            }
        }
        subbands = Collections.unmodifiableList(bands);
        checkFinite();
    }

    private void checkFinite() {
        for (double[] a : new double[][] {potential, ec, ev, n, p, donors, acceptors, charge, field}) {
            for (double v : a) {
                if (!Double.isFinite(v)) {
                    throw new WurtzkitException(ErrorKind.NON_FINITE_RESULT,
                            "non-finite value in a solution; please report this structure: "
                            + structure);
                }
            }
        }
    }

    /** {@return the structure that was solved} */
    public Structure structure() {
        return structure;
    }

    /** {@return node depths (m)} */
    public double[] depth() {
        return depth.clone();
    }

    /** {@return node depths (nm)} */
    public double[] depthNm() {
        double[] out = new double[depth.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Units.mToNm(depth[i]);
        }
        return out;
    }

    /** {@return number of mesh nodes} */
    public int nodeCount() {
        return depth.length;
    }

    /** {@return electrostatic potential (V)} */
    public double[] potential() {
        return potential.clone();
    }

    /** {@return conduction-band edge E_c - E_F (eV), of the layer below at interface nodes} */
    public double[] conductionBand() {
        return ec.clone();
    }

    /** {@return valence-band edge E_v - E_F (eV), of the layer below at interface nodes} */
    public double[] valenceBand() {
        return ev.clone();
    }

    /** {@return the electron Fermi level (eV): 0 by construction} */
    public double fermiLevelEv() {
        return 0;
    }

    /** {@return the holes' quasi-Fermi level (eV)} */
    public double holeFermiLevelEv() {
        return holeFermiEv;
    }

    /** {@return the band diagram for plotting: depth, E_c and E_v with both sides of every step} */
    public BandDiagram bandDiagram() {
        return new BandDiagram(plotDepth, plotEc, plotEv);
    }

    /** {@return electron density (m^-3), box-averaged; subband electrons inside windows} */
    public double[] electronDensity() {
        return n.clone();
    }

    /** {@return hole density (m^-3), box-averaged} */
    public double[] holeDensity() {
        return p.clone();
    }

    /** {@return ionised donors and empty donor-like traps (m^-3), box-averaged} */
    public double[] ionizedDonors() {
        return donors.clone();
    }

    /** {@return ionised acceptors and filled acceptor-like traps (m^-3), box-averaged} */
    public double[] ionizedAcceptors() {
        return acceptors.clone();
    }

    /**
     * @return free charge density (C/m^3), box-averaged, including delta sheets and surface states
     *         spread over their node's box
     */
    public double[] chargeDensity() {
        return charge.clone();
    }

    /** {@return midpoints of the mesh cells (m)} */
    public double[] cellMidpoints() {
        return midpoints.clone();
    }

    /** {@return electric field along the depth direction in each cell (V/m)} */
    public double[] electricField() {
        return field.clone();
    }

    /** {@return every subband of every window, windows in order, energies ascending within a window} */
    public List<Subband> subbands() {
        return subbands;
    }

    /** {@return the quantum windows as resolved onto the mesh, shallowest first (empty for a classical solve)} */
    public List<DepthRange> quantumWindows() {
        List<DepthRange> c = new ArrayList<>(windows.length);
        for (double[] w : windows) {
            c.add(new DepthRange(w[0], w[1]));
        }
        return Collections.unmodifiableList(c);
    }

    /** {@return electron sheet density held in the subbands of each window (m^-2)} */
    public double[] wellSheetDensities() {
        return wellSheetDensity.clone();
    }

    /** {@return all electrons of the stack, the integral of n over depth (m^-2)} */
    public double electronSheetDensity() {
        return electronSheet;
    }

    /**
     * Electrons between two depths, e.g. only those in the channel layer: the integral of the
     * box-averaged density over the boxes whose nodes lie in [fromDepth, toDepth], end boxes halved
     * at the bounds.
     *
     * @param fromDepth upper depth (m), &ge; 0
     * @param toDepth   lower depth (m), &ge; fromDepth
     * @return sheet density (m^-2)
     */
    public double electronSheetDensityBetween(double fromDepth, double toDepth) {
        org.wurtzkit.errors.Require.inRange("fromDepth (m)", fromDepth, 0, depth[depth.length - 1]);
        org.wurtzkit.errors.Require.inRange("toDepth (m)", toDepth, fromDepth, depth[depth.length - 1]);
        double sum = 0;
        for (int k = 0; k + 1 < depth.length; k++) {
            double a = Math.max(depth[k], fromDepth);
            double b = Math.min(depth[k + 1], toDepth);
            if (b > a) {
                // each half of cell k belongs to the box of its nearer node
                double mid = 0.5 * (depth[k] + depth[k + 1]);
                sum += n[k] * Math.max(0, Math.min(b, mid) - a) + n[k + 1] * Math.max(0, b - Math.max(a, mid));
            }
        }
        return sum;
    }

    /** {@return all holes of the stack (m^-2)} */
    public double holeSheetDensity() {
        return holeSheet;
    }

    /**
     * The 2DEG sheet density: the subband electrons of all windows, or, for a solve without quantum
     * windows, all electrons of the stack.
     *
     * @return sheet density (cm^-2)
     */
    public double sheetDensityPerCm2() {
        if (wellSheetDensity.length == 0) {
            return Units.perM2ToPerCm2(electronSheet);
        }
        double s = 0;
        for (double v : wellSheetDensity) {
            s += v;
        }
        return Units.perM2ToPerCm2(s);
    }

    /**
     * {@return the charge of the interface states of each sheet of
     * {@link Structure#interfaceSheets()}, in that order (C/m^2, signed; the sheets' fixed charges
     * not included)}
     */
    public double[] interfaceStateCharge() {
        return interfaceStateCharge.clone();
    }

    /** {@return holes within 5 nm below the gate stack (m^-2); 0 without a gate stack} */
    public double holesUnderGateStack() {
        return holesUnderInsulator;
    }

    /** {@return sheet charge on the gate metal (C/m^2); 0 for a free surface} */
    public double gateCharge() {
        return gateCharge;
    }

    /**
     * @return |free + bound + contact charge| divided by the sum of their magnitudes; of the order of
     *         the Newton residual for a converged solve
     */
    public double chargeNeutralityResidual() {
        return neutralityResidual;
    }

    /**
     * @return true if a quantum window had more subbands below E_F + cut-off than
     *         {@link SolverOptions#maxSubbands()} allows: the subband density is then too low; raise
     *         the limit or narrow the window
     */
    public boolean subbandLimitReached() {
        return subbandLimitReached;
    }

    /** {@return how the solve converged} */
    public ConvergenceRecord convergence() {
        return record;
    }

    /**
     * A summary to read in jshell or a notebook: the bias, temperature and mesh; the 2DEG sheet
     * density and the holes; one line for each of the first {@value #SUBBANDS_SHOWN} subbands (in
     * the order of {@link #subbands()}) and one for the rest together; the convergence record; and a
     * warning when the subband limit was reached. For example:
     *
     * <pre>
     * Solution (Schottky gate, barrier 1 eV, bias 0 V; 300 K; 412 nodes over 1825 nm):
     *   n_s = 8.91e12 cm^-2 (2DEG, 2 subbands in 1 window), holes 0 cm^-2
     *   subband 0 of window 0: E - E_F = -0.152 eV, 6.12e12 cm^-2, in-plane mass 0.2 m0
     *   ...
     *   ... 14 more subbands, 2.1e10 cm^-2 together
     *   converged after 6 iterations (34 Newton steps), last change 4.1e-7 V
     * </pre>
     *
     * @return the summary (lines separated by '\n')
     */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("Solution (").append(structure.top()).append("; ")
                .append(Decimals.format(structure.temperatureK(), "K")).append("; ").append(depth.length)
                .append(" nodes over ").append(Decimals.format(Units.mToNm(depth[depth.length - 1]), "nm"))
                .append("):\n");
        sb.append("  n_s = ").append(Decimals.format(sheetDensityPerCm2(), "cm^-2"));
        if (windows.length == 0) {
            sb.append(" (all electrons of the stack, no quantum window)");
        } else {
            sb.append(" (2DEG, ").append(subbands.size()).append(subbands.size() == 1 ? " subband" : " subbands")
                    .append(" in ").append(windows.length).append(windows.length == 1 ? " window)" : " windows)");
        }
        sb.append(", holes ").append(Decimals.format(Units.perM2ToPerCm2(holeSheet), "cm^-2")).append('\n');
        int shown = Math.min(subbands.size(), SUBBANDS_SHOWN);
        for (int k = 0; k < shown; k++) {
            sb.append("  ").append(subbands.get(k)).append('\n');
        }
        if (shown < subbands.size()) {
            double rest = 0;
            for (int k = shown; k < subbands.size(); k++) {
                rest += subbands.get(k).sheetDensityPerCm2();
            }
            int more = subbands.size() - shown;
            sb.append("  ... ").append(more).append(more == 1 ? " more subband, " : " more subbands, ")
                    .append(Decimals.format(rest, "cm^-2")).append(" together\n");
        }
        sb.append("  ").append(record);
        if (subbandLimitReached) {
            sb.append("\n  warning: a quantum window reached the subband limit; its density is too low");
        }
        if (holesUnderInsulator > HOLE_WARNING_PER_M2) {
            sb.append("\n  warning: ").append(Decimals.format(Units.perM2ToPerCm2(holesUnderInsulator), "cm^-2"))
                    .append(" of holes within 5 nm under the gate stack; their supply is set by the hole quasi-Fermi")
                    .append(" level option, which an insulator makes uncertain");
        }
        return sb.toString();
    }
}
