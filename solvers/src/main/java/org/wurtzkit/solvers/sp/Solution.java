package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.statistics.FermiDirac;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.units.Constants;
import org.wurtzkit.units.Units;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

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
    private final double[] electronFermi;
    private final double[] holeFermi;
    private final boolean subbandLimitReached;
    private final ConvergenceRecord record;
    private final SolverOptions options;
    private final boolean coldStart;
    private final List<Warning> warnings;
    private final List<InterfaceEdges> interfaceEdges;
    private final List<WellMinimum> wellMinima;

    /**
     * Holes in the top layer under a free surface above this sheet density (m^-2, 1e10 cm^-2) raise
     * {@link WarningKind#SURFACE_HOLE_GAS}.
     */
    public static final double WARN_SURFACE_HOLES_PER_M2 = 1e14;
    /**
     * Window-bound subbands (above the band edge outside an edge of their window) raise
     * {@link WarningKind#WINDOW_BOUND_SUBBAND} when they hold more than this fraction of their
     * window's electrons and more than {@link #WARN_SURFACE_HOLES_PER_M2} (1e10 cm^-2).
     */
    public static final double WARN_WINDOW_BOUND_FRACTION = 0.01;
    /**
     * A window edge raises {@link WarningKind#WINDOW_EDGE_IN_ELECTRONS} when the classical electron
     * density just outside it exceeds this fraction of the peak density inside the window.
     */
    public static final double WARN_EDGE_DENSITY_FRACTION = 0.01;
    private final List<CarrierSheet> sheets;
    private final List<HoleSubband> holeSubbands;
    private final double channelSheet;
    private final double parasiticSheet;

    /**
     * Smallest sheet reported by {@link #carrierSheets()} (m^-2): 10^8 cm^-2, far below any sheet
     * that a Hall or C-V measurement resolves (common practice, no source).
     */
    public static final double SHEET_REPORT_THRESHOLD = 1e12;
    private final double[] interfaceStateCharge;
    private final double holesUnderInsulator;

    /**
     * Copies out what one solve computed: the potential and subbands are read, never kept; the
     * report's arrays are taken over (the caller hands them on and keeps no reference).
     */
    Solution(Device d, double[] phi, double[] ref, QuantumStates qs, ChargeModel.Report report,
            ConvergenceRecord record, boolean coldStart) {
        int nn = d.n;
        this.structure = d.structure;
        this.record = record;
        this.options = d.options;
        this.coldStart = coldStart;
        electronFermi = new double[d.n];
        holeFermi = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            int c = i < d.n - 1 ? i : i - 1;
            electronFermi[i] = d.efn[c];
            holeFermi[i] = d.efp[c];
        }
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
        List<HoleSubband> hb = new ArrayList<>();
        for (int w = 0; qs != null && qs.holes != null && w < nw; w++) {
            int a = d.windowStart[w];
            for (int b = 0; b < HoleStates.BANDS; b++) {
                for (int k = 0; k < qs.holes.count[w][b]; k++) {
                    double[] full = new double[nn];
                    System.arraycopy(qs.holes.psi[w][b][k], 0, full, a, qs.holes.psi[w][b][k].length);
                    double occ = qs.holes.sheet(d, w, b, k, phi, ref);
                    double mxy = qs.holes.dos[w][b][k] * Math.PI * Constants.HBAR * Constants.HBAR
                            / (Constants.ELECTRON_MASS * d.kT);
                    hb.add(new HoleSubband(w, ValenceBands.Kind.values()[b], k, -qs.holes.energy[w][b][k], full, occ, mxy));
                }
            }
        }
        holeSubbands = Collections.unmodifiableList(hb);
        sheets = Collections.unmodifiableList(gatherSheets(d, qs, bands, ref));
        double channel = 0;
        double parasitic = 0;
        for (CarrierSheet c : sheets) {
            if (c.role() == CarrierSheet.Role.CHANNEL) {
                channel = c.sheetDensity();
            } else if (c.role() == CarrierSheet.Role.UNDER_GATE) {
                parasitic += c.sheetDensity();
            }
        }
        channelSheet = channel;
        parasiticSheet = parasitic;
        checkFinite();
        warnings = collectWarnings(d, phi);
        interfaceEdges = readInterfaces(d, phi);
        List<WellMinimum> minima = new ArrayList<>(windows.length);
        for (int w = 0; w < windows.length; w++) {
            int best = d.windowStart[w];
            double lowest = Double.POSITIVE_INFINITY;
            for (int i = d.windowStart[w]; i <= d.windowEnd[w]; i++) {
                // both sides of a node: the cells above (i - 1) and below (i)
                double e = Math.min(i > 0 ? d.ec[i - 1] : d.ec[0], i < nn - 1 ? d.ec[i] : d.ec[nn - 2]) - phi[i];
                if (e < lowest) {
                    lowest = e;
                    best = i;
                }
            }
            minima.add(new WellMinimum(w, depth[best], lowest));
        }
        wellMinima = List.copyOf(minima);
    }

    private List<InterfaceEdges> readInterfaces(Device d, double[] phi) {
        double[] at = structure.interfaceDepths();
        // the layers top-down, the gate stack's insulators first: interface j lies between names j and j + 1
        List<String> names = new ArrayList<>();
        for (org.wurtzkit.structure.InsulatorLayer il : structure.gateStack()) {
            names.add(il.name());
        }
        for (org.wurtzkit.structure.LayerState st : structure.layerStates()) {
            names.add(st.layer().name());
        }
        List<InterfaceEdges> out = new ArrayList<>(at.length);
        for (int j = 0; j < at.length; j++) {
            int i = java.util.Arrays.binarySearch(depth, at[j]);
            if (i < 0) { // an interface is a mesh node; take the nearest one if round-off moved it
                int ins = -i - 1;
                i = ins == 0 ? 0 : ins >= depth.length ? depth.length - 1
                        : at[j] - depth[ins - 1] <= depth[ins] - at[j] ? ins - 1 : ins;
            }
            out.add(new InterfaceEdges(j, depth[i], names.get(j), names.get(j + 1),
                    d.ec[i - 1] - phi[i], d.ec[i] - phi[i], d.ev[i - 1] - phi[i], d.ev[i] - phi[i]));
        }
        return List.copyOf(out);
    }

    /**
     * The band edges on both sides of every internal interface, shallowest first.
     *
     * @return one record per interface of {@link Structure#interfaceDepths()}
     */
    public List<InterfaceEdges> interfaceEdges() {
        return interfaceEdges;
    }

    /**
     * The lowest conduction-band edge of each quantum window (where its well bottoms out); empty
     * for a classical solve.
     *
     * @return one record per window of {@link #quantumWindows()}
     */
    public List<WellMinimum> wellMinima() {
        return wellMinima;
    }

    private List<Warning> collectWarnings(Device d, double[] phi) {
        List<Warning> out = new ArrayList<>(structure.warnings());
        int nn = depth.length;
        if (structure.top() instanceof TopBoundary.FreeSurface) {
            double bottomOfTop = structure.layerStates().get(0).depthBottom();
            double holes = 0;
            for (int i = 0; i < nn && depth[i] <= bottomOfTop; i++) {
                holes += p[i] * d.box(i);
            }
            if (holes > WARN_SURFACE_HOLES_PER_M2) {
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
            if (bound > WARN_SURFACE_HOLES_PER_M2 && bound > WARN_WINDOW_BOUND_FRACTION * wellSheetDensity[w]) {
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
                if (i >= 0 && i < nn && n[i] > WARN_EDGE_DENSITY_FRACTION * peak && n[i] > 0) {
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

    /**
     * What may make this solution mislead: the structure's own {@link Structure#warnings()}, then a
     * surface hole gas under a free surface, window-bound subbands, window edges inside free
     * electrons, and a reached subband limit (thresholds: the {@code WARN_...} constants).
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /**
     * Groups the carriers into sheets: each window's subbands by the layer of their centroid, and per layer the classical carriers outside every window interior; then marks the
     * channel and the sheets between it and a gate.
     */
    private List<CarrierSheet> gatherSheets(Device d, QuantumStates qs, List<Subband> bands, double[] ref) {
        int nn = d.n;
        List<org.wurtzkit.structure.LayerState> states = d.structure.layerStates();
        int nl = states.size();
        List<double[]> acc = new ArrayList<>(); // {carrier 0/1, layer, window, top, bottom, sum n*x, sum n}
        // quantum electrons: one group per (window, layer of the subband's centroid), in subband
        // order; in the window holding a metal-face channel interface, each subband is first split at
        // the conduction-band maximum between the window top and the interface: the part above it is
        // on the gate side (a parasitic channel under forward bias), the rest is the channel's
        int nw = qs == null ? 0 : qs.windows;
        int gateSideSplit = d.gateSideCells();
        for (int w = 0; w < nw; w++) {
            double[][] group = new double[nl][];
            double[] gateSide = null;
            int a = d.windowStart[w];
            int e = d.windowEnd[w];
            int split = a;
            boolean channelWindow = d.channelLayer >= 0 && d.x[a] <= d.channelDepth && d.x[e] >= d.channelDepth
                    && d.channelLayer > d.layerOfCell[Math.max(0, d.mesh.nearestNode(d.channelDepth) - 1)];
            if (channelWindow && gateSideSplit > 0) {
                // the split the solve used (QuasiFermiLevels.ForwardBiasElectrons)
                split = Math.max(a, gateSideSplit);
            } else if (channelWindow) {
                int ich = d.mesh.nearestNode(d.channelDepth);
                double top = Double.NEGATIVE_INFINITY;
                for (int i = a; i <= ich; i++) {
                    double up = d.ec[i > 0 ? i - 1 : 0] - potential[i];
                    double down = d.ec[Math.min(i, nn - 2)] - potential[i];
                    double edge = Math.max(up, down);
                    if (edge > top) {
                        top = edge;
                        split = i;
                    }
                }
            }
            for (Subband b : bands) {
                if (b.window() != w) {
                    continue;
                }
                double[] psi = qs.psi[w][b.index()];
                double mean = 0;
                double norm = 0;
                double meanAbove = 0;
                double normAbove = 0;
                for (int j = 1; j < psi.length - 1; j++) {
                    double pr = psi[j] * psi[j] * d.box(a + j);
                    mean += pr * d.x[a + j];
                    norm += pr;
                    if (a + j < split) {
                        meanAbove += pr * d.x[a + j];
                        normAbove += pr;
                    }
                }
                double occ = b.sheetDensity();
                if (gateSideSplit > 0 && normAbove > 0) {
                    // the forward-bias rule holds the gate side at the gate's level: split the
                    // occupied density itself, node by node, each side at its own level
                    double[] part = SubbandDensity.sheetPart(d, qs, w, b.index(), potential, ref, a + 1, split);
                    if (gateSide == null) {
                        gateSide = new double[] {0, d.structure.layerIndexAt(meanAbove / normAbove), w, d.x[a], d.x[split], 0,
                            0};
                        acc.add(gateSide);
                    }
                    gateSide[5] += part[1];
                    gateSide[6] += part[0];
                    occ = Math.max(0, occ - part[0]);
                    mean -= meanAbove;
                    norm -= normAbove;
                } else if (normAbove > 0) {
                    double f = normAbove / norm;
                    if (gateSide == null) {
                        gateSide = new double[] {0, d.structure.layerIndexAt(meanAbove / normAbove), w, d.x[a], d.x[split], 0,
                            0};
                        acc.add(gateSide);
                    }
                    gateSide[5] += occ * f * (meanAbove / normAbove);
                    gateSide[6] += occ * f;
                    occ *= 1 - f;
                    mean -= meanAbove;
                    norm -= normAbove;
                }
                double centre = norm > 0 ? mean / norm : d.x[a];
                int li = channelWindow ? d.channelLayer
                        : d.structure.layerIndexAt(Math.min(centre, d.structure.totalThickness()));
                if (group[li] == null) {
                    double top = Math.max(d.x[a], states.get(li).depthTop());
                    double bottom = Math.min(d.x[e], states.get(li).depthBottom());
                    group[li] = new double[] {0, li, w, top, bottom, 0, 0};
                    acc.add(group[li]);
                }
                group[li][5] += occ * centre;
                group[li][6] += occ;
            }
        }
        // quantum holes: one group per (window, layer of the subband's centroid)
        for (int w = 0; w < nw; w++) {
            double[][] group = new double[nl][];
            for (HoleSubband hs : holeSubbands) {
                if (hs.window() != w) {
                    continue;
                }
                int a = d.windowStart[w];
                double[] psi = qs.holes.psi[w][hs.band().ordinal()][hs.index()];
                double mean = 0;
                double norm = 0;
                for (int j = 1; j < psi.length - 1; j++) {
                    double pr = psi[j] * psi[j] * d.box(a + j);
                    mean += pr * d.x[a + j];
                    norm += pr;
                }
                double centre = norm > 0 ? mean / norm : d.x[a];
                int li = d.structure.layerIndexAt(Math.min(centre, d.structure.totalThickness()));
                if (group[li] == null) {
                    double top = Math.max(d.x[a], states.get(li).depthTop());
                    double bottom = Math.min(d.x[d.windowEnd[w]], states.get(li).depthBottom());
                    group[li] = new double[] {1, li, w, top, bottom, 0, 0};
                    acc.add(group[li]);
                }
                group[li][5] += hs.sheetDensity() * centre;
                group[li][6] += hs.sheetDensity();
            }
        }
        // classical carriers outside window interiors, per layer
        double[][] classical = new double[2 * nl][];
        for (int i = 0; i < nn; i++) {
            if (d.quantumNode[i] && qs != null) {
                continue;
            }
            int li = d.layerOfCell[Math.min(i, nn - 2)];
            if (li >= nl) {
                continue; // an insulator cell of the gate stack: no carriers there
            }
            double w = d.box(i);
            for (int c = 0; c < 2; c++) {
                double v = (c == 0 ? n[i] : p[i]) * w;
                if (classical[2 * li + c] == null) {
                    classical[2 * li + c] = new double[] {c, li, -1, states.get(li).depthTop(), states.get(li).depthBottom(),
                        0, 0};
                }
                classical[2 * li + c][5] += v * d.x[i];
                classical[2 * li + c][6] += v;
            }
        }
        for (double[] g : classical) {
            if (g != null) {
                acc.add(g);
            }
        }
        // the channel: the largest quantum electron sheet in the channel layer inside the window
        // holding the channel interface; without subbands, the classical electrons of that layer;
        // without an interface of positive polarization charge, the largest electron sheet
        int channel = -1;
        for (int j = 0; j < acc.size(); j++) {
            double[] g = acc.get(j);
            if (g[0] != 0 || g[6] < SHEET_REPORT_THRESHOLD) {
                continue;
            }
            boolean candidate;
            if (d.channelLayer < 0) {
                candidate = true;
            } else if (nw > 0) {
                int w = (int) g[2];
                candidate = g[1] == d.channelLayer && w >= 0 && d.x[d.windowStart[w]] <= d.channelDepth
                        && d.x[d.windowEnd[w]] >= d.channelDepth;
            } else {
                candidate = g[1] == d.channelLayer;
            }
            if (candidate && (channel < 0 || g[6] > acc.get(channel)[6])) {
                channel = j;
            }
        }
        boolean gated = d.topDirichlet;
        List<CarrierSheet> out = new ArrayList<>();
        for (int j = 0; j < acc.size(); j++) {
            double[] g = acc.get(j);
            if (g[6] < SHEET_REPORT_THRESHOLD) {
                continue;
            }
            int li = (int) g[1];
            Carrier carrier = g[0] == 0 ? Carrier.ELECTRONS : Carrier.HOLES;
            CarrierSheet.Role role = CarrierSheet.Role.OTHER;
            if (j == channel) {
                role = CarrierSheet.Role.CHANNEL;
            } else if (carrier == Carrier.ELECTRONS && gated && d.channelLayer >= 0 && li != d.channelLayer
                    && (states.get(li).depthBottom() <= d.channelDepth * (1 + 1e-12) || g[4] <= d.channelDepth)) {
                role = CarrierSheet.Role.UNDER_GATE;
            }
            double centroid = g[5] / g[6];
            int node = d.mesh.nearestNode(centroid);
            int cell = Math.min(node, nn - 2);
            if (d.layerOfCell[cell] != li && node > 0) {
                cell = node - 1; // the centroid sits on the layer's lower interface
            }
            FermiContact contact = carrier == Carrier.ELECTRONS ? d.contactN[cell] : d.contactP[cell];
            double level = carrier == Carrier.ELECTRONS ? d.efn[cell] : d.efp[cell];
            out.add(new CarrierSheet(carrier, role, states.get(li).layer().name(), (int) g[2], g[3], g[4], centroid, g[6],
                    contact, level));
        }
        return out;
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

    /** {@return the channel (bottom) contact's Fermi level (eV): 0 by construction, the zero of every energy} */
    public double fermiLevelEv() {
        return 0;
    }

    /**
     * The electrons' quasi-Fermi level at each node (eV; the level of the cell below the node, the
     * last node that of the cell above), as {@link SolverOptions#quasiFermiLevels()} assigns it.
     *
     * @return a fresh array, one value per node
     */
    public double[] electronFermiLevel() {
        return electronFermi.clone();
    }

    /**
     * The holes' quasi-Fermi level at each node (eV; the level of the cell below the node, the last
     * node that of the cell above), as {@link SolverOptions#quasiFermiLevels()} assigns it.
     *
     * @return a fresh array, one value per node
     */
    public double[] holeFermiLevel() {
        return holeFermi.clone();
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

    /**
     * {@return every hole subband of every window (windows in order; within a window heavy, light,
     * crystal-field hole; levels from the valence-band top down); empty for a classical solve or
     * where no hole state lies within the subband cut-off of the hole quasi-Fermi level}
     */
    public List<HoleSubband> holeSubbands() {
        return holeSubbands;
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

    /** {@return all holes of the stack (cm^-2); the twin of {@link #holeSheetDensity()}} */
    public double holeSheetDensityPerCm2() {
        return Units.perM2ToPerCm2(holeSheet);
    }

    /** {@return all electrons of the stack (cm^-2); the twin of {@link #electronSheetDensity()}} */
    public double electronSheetDensityPerCm2() {
        return Units.perM2ToPerCm2(electronSheet);
    }

    /**
     * The 2DEG sheet density in SI units; the twin of {@link #sheetDensityPerCm2()}.
     *
     * @return sheet density (m^-2)
     */
    public double sheetDensity() {
        if (wellSheetDensity.length == 0) {
            return electronSheet;
        }
        double s = 0;
        for (double v : wellSheetDensity) {
            s += v;
        }
        return s;
    }

    /**
     * The channel 2DEG's sheet density: the {@link CarrierSheet.Role#CHANNEL} sheet of
     * {@link #carrierSheets()}, i.e. the subband electrons on the well side (lower E_c) of the deepest
     * interface with a positive polarization sheet, in the window that holds that interface, below
     * the barrier's conduction-band maximum (for a solve without windows, the classical electrons of
     * that layer). Electrons elsewhere (a parasitic
     * channel in the barrier under the gate, a back channel, the buffer) are not counted: see
     * {@link #carrierSheets()} and {@link #parasiticSheetDensityPerCm2()}. Without an interface of
     * positive polarization charge the largest electron sheet counts as the channel. 0 when no sheet
     * exceeds {@link #SHEET_REPORT_THRESHOLD}.
     *
     * @return sheet density (cm^-2)
     */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(channelSheet);
    }

    /**
     * Electrons between the gate and the channel (sheets of role {@link CarrierSheet.Role#UNDER_GATE}),
     * e.g. the parasitic channel that forms in the barrier under forward gate bias.
     *
     * @return sheet density (cm^-2), 0 for a free surface
     */
    public double parasiticSheetDensityPerCm2() {
        return Units.perM2ToPerCm2(parasiticSheet);
    }

    /** {@return the SI twin of {@link #parasiticSheetDensityPerCm2()}: the parasitic sheet density (m^-2)} */
    public double parasiticSheetDensity() {
        return parasiticSheet;
    }

    /**
     * Every sheet of free carriers above {@link #SHEET_REPORT_THRESHOLD}: the subbands of each window
     * grouped by the layer that holds their centroid, and the classical carriers of each layer
     * outside the window interiors, with depth, role and the contact they follow.
     *
     * @return the sheets, quantum ones first (window order), then classical ones (layer order, top down)
     */
    public List<CarrierSheet> carrierSheets() {
        return sheets;
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

    /** {@return the solver options that produced this solution} */
    public SolverOptions options() {
        return options;
    }

    /**
     * {@return whether the solve started cold (true) or from a neighbouring solution or a given
     * potential (false, as in a sweep)}
     */
    public boolean coldStart() {
        return coldStart;
    }

    /**
     * What produced this solution: library version, structure, parameter set with its content hash,
     * solver options, the start and the warnings. A cold-started solution is reproduced bit for bit
     * by {@code new SelfConsistentSolver(SolverOptions.fromSettings(p.solverOptions())).solve(p.structure())};
     * a warm-started one (in a sweep) carries a warning that a cold re-solve agrees only within the
     * tolerance: repeat the whole sweep from its own provenance instead.
     *
     * @return the provenance (computed on each call; it hashes the parameter set)
     */
    public ResultProvenance provenance() {
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", "single solve");
        run.put("start", coldStart ? "cold" : "from a neighbouring solution");
        return ResultProvenance.of(structure, options.settings(), run, provenanceWarnings());
    }

    /**
     * The warnings a provenance record carries: every typed {@link #warnings()} as text, and a warm
     * start that a cold re-solve reproduces only within the tolerance.
     */
    private List<String> provenanceWarnings() {
        List<String> w = new ArrayList<>();
        for (Warning x : warnings) {
            w.add(x.toString());
        }
        if (!coldStart) {
            w.add("started from a neighbouring solution: a cold re-solve agrees within the tolerance "
                    + options.tolerance() + " V, not bit for bit");
        }
        return w;
    }

    /** {@return how the solve converged} */
    public ConvergenceRecord convergence() {
        return record;
    }

    /**
     * A summary to read in jshell or a notebook: the bias, temperature and mesh; the 2DEG sheet
     * density and the holes; one line for each of the first {@value #SUBBANDS_SHOWN} subbands (in
     * the order of {@link #subbands()}) and one for the rest together; the convergence record; and one
     * line for each of its {@link #warnings()}. For example:
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
        sb.append(Warning.lines(warnings));
        if (holesUnderInsulator > HOLE_WARNING_PER_M2) {
            sb.append("\n  warning: ").append(Decimals.format(Units.perM2ToPerCm2(holesUnderInsulator), "cm^-2"))
                    .append(" of holes within 5 nm under the gate stack; their supply is set by the hole quasi-Fermi")
                    .append(" level option, which an insulator makes uncertain");
        }
        return sb.toString();
    }
}
