package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * A converged band diagram. Immutable: every array accessor returns a copy. No field holds NaN.
 * A plain holder: the solver derives every value once at the end of a solve, and the accessors
 * only copy out (the few sums over a handful of values, such as {@link #sheetDensity()}, are
 * taken on each call).
 *
 * <p>Node arrays have one value per mesh node at depth {@link #depth()} (m, 0 at the surface).
 * Energies are in eV with the bottom contact's Fermi level at 0. At an interface node the band
 * edges reported by {@link #conductionBand()} and {@link #valenceBand()} are those of the layer
 * below the node; {@link #bandDiagram()} gives both sides of every step for plotting. Cell arrays
 * ({@link #electricField()}) have one value per interval between nodes, at {@link #cellMidpoints()}.
 */
public final class Solution {
    /** Depth below a gate stack within which holes are summed for the warning {@code HOLES_UNDER_GATE_STACK} (m). */
    static final double HOLE_WATCH_DEPTH = 5e-9;
    /** Hole sheet under a gate stack above which {@link #warnings()} holds {@code HOLES_UNDER_GATE_STACK} (m^-2): 1e10 cm^-2. */
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

    /**
     * Smallest sheet reported by {@link #carrierSheets()} (m^-2): 10^8 cm^-2, far below any sheet
     * that a Hall or C-V measurement resolves (common practice, no source).
     */
    public static final double SHEET_REPORT_THRESHOLD = 1e12;
    private final double[] interfaceStateCharge;
    private final double holesUnderInsulator;

    /**
     * Holds what {@link SolutionAssembler#assemble} derived from one solve; takes the arrays and
     * lists over as they are (the assembler keeps no reference).
     */
    Solution(Structure structure, SolverOptions options, ConvergenceRecord record, boolean coldStart, double[] depth,
            double[] potential, double[] ec, double[] ev, double[] electronFermi, double[] holeFermi, double[] n,
            double[] p, double[] donors, double[] acceptors, double[] charge, double[] midpoints, double[] field,
            double[] plotDepth, double[] plotEc, double[] plotEv, double[][] windows, List<Subband> subbands,
            double[] wellSheetDensity, List<HoleSubband> holeSubbands, boolean subbandLimitReached,
            List<CarrierSheet> sheets, double electronSheet, double holeSheet, double holesUnderInsulator,
            double[] interfaceStateCharge, double gateCharge, double neutralityResidual, List<Warning> warnings,
            List<InterfaceEdges> interfaceEdges, List<WellMinimum> wellMinima) {
        this.structure = structure;
        this.options = options;
        this.record = record;
        this.coldStart = coldStart;
        this.depth = depth;
        this.potential = potential;
        this.ec = ec;
        this.ev = ev;
        this.electronFermi = electronFermi;
        this.holeFermi = holeFermi;
        this.n = n;
        this.p = p;
        this.donors = donors;
        this.acceptors = acceptors;
        this.charge = charge;
        this.midpoints = midpoints;
        this.field = field;
        this.plotDepth = plotDepth;
        this.plotEc = plotEc;
        this.plotEv = plotEv;
        this.windows = windows;
        this.subbands = subbands;
        this.wellSheetDensity = wellSheetDensity;
        this.holeSubbands = holeSubbands;
        this.subbandLimitReached = subbandLimitReached;
        this.sheets = sheets;
        this.electronSheet = electronSheet;
        this.holeSheet = holeSheet;
        this.holesUnderInsulator = holesUnderInsulator;
        this.interfaceStateCharge = interfaceStateCharge;
        this.gateCharge = gateCharge;
        this.neutralityResidual = neutralityResidual;
        this.warnings = warnings;
        this.interfaceEdges = interfaceEdges;
        this.wellMinima = wellMinima;
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

    /**
     * What may make this solution mislead: the structure's own {@link Structure#warnings()}, then a
     * surface hole gas under a free surface, window-bound subbands, window edges inside free
     * electrons, a reached subband limit (thresholds: the {@code WARN_...} constants), and holes
     * within 5 nm under a gate stack ({@link WarningKind#HOLES_UNDER_GATE_STACK}, above 1e10 cm^-2).
     *
     * @return the warnings, empty when there is none
     */
    public List<Warning> warnings() {
        return warnings;
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
        double channel = 0;
        for (int k = 0; k < sheets.size(); k++) { // indexed: no iterator per call
            CarrierSheet c = sheets.get(k);
            if (c.role() == CarrierSheet.Role.CHANNEL) {
                channel = c.sheetDensity();
            }
        }
        return Units.perM2ToPerCm2(channel);
    }

    /**
     * Electrons between the gate and the channel (sheets of role {@link CarrierSheet.Role#UNDER_GATE}),
     * e.g. the parasitic channel that forms in the barrier under forward gate bias.
     *
     * @return sheet density (cm^-2), 0 for a free surface
     */
    public double parasiticSheetDensityPerCm2() {
        return Units.perM2ToPerCm2(parasiticSheetDensity());
    }

    /** {@return the SI twin of {@link #parasiticSheetDensityPerCm2()}: the parasitic sheet density (m^-2)} */
    public double parasiticSheetDensity() {
        double parasitic = 0;
        for (int k = 0; k < sheets.size(); k++) {
            CarrierSheet c = sheets.get(k);
            if (c.role() == CarrierSheet.Role.UNDER_GATE) {
                parasitic += c.sheetDensity();
            }
        }
        return parasitic;
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
        return sb.toString();
    }
}
