package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.solvers.sp.BandDiagram;
import org.wurtzkit.solvers.sp.Carrier;
import org.wurtzkit.solvers.sp.CarrierSheet;
import org.wurtzkit.solvers.sp.ConvergenceRecord;
import org.wurtzkit.solvers.sp.DepthRange;
import org.wurtzkit.solvers.sp.NotConvergedException;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.PointState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/**
 * The invariants every converged {@link Solution} must satisfy (issue #7), checked from the public
 * outputs only, and the contract of a {@link NotConvergedException}. Each check names its source.
 *
 * <p>Tolerances. The outer Schroedinger-Poisson loop stops when max |delta phi| &lt; the outer
 * tolerance (1e-6 V by default) and each Newton solve when its update is below the Newton
 * tolerance; the reported charge is evaluated with the subbands of the final potential. A
 * box-integrated Gauss residual is therefore of the order of (largest differential capacitance of
 * a box) x (outer tolerance), far below 1e-6 of the largest displacement in the stack; energies
 * set by Dirichlet conditions or by table look-up are exact up to round-off (1e-9 eV allowed).
 */
final class Invariants {
    private Invariants() {
    }

    /** Largest Gauss residual relative to the largest displacement field in the stack. */
    static final double GAUSS_RELATIVE = 1e-6;
    /** Library's own neutrality residual bound, as used by its own tests (HemtPhysicsTest). */
    static final double NEUTRALITY = 1e-6;
    /** Round-off allowance for exact energy relations (eV). */
    static final double ENERGY_EXACT = 1e-9;
    /** Orthonormality of the subbands in the box-width inner product. */
    static final double ORTHONORMAL = 1e-8;

    /** Worst relative Gauss residual seen (diagnostics for the report). */
    static volatile double worstGauss;

    /**
     * @param s   the structure solved
     * @param sol its solution
     * @param o   the options used
     */
    static void check(Structure s, Solution sol, SolverOptions o) {
        double[] x = sol.depth();
        int n = x.length;
        String where = " [" + s + "]";
        ConvergenceRecord rec = sol.convergence();
        assertTrue(rec.converged(), rec.message());
        assertTrue(rec.iterations() <= o.maxIterations(), "iterations " + rec.iterations());
        assertEquals(rec.iterations(), rec.residualHistory().length, rec.message());
        if (rec.iterations() > 0) {
            assertTrue(rec.finalResidual() < o.tolerance(), rec.message());
        }

        // mesh: from the surface to the bottom, strictly increasing, a node on every interface
        assertEquals(0.0, x[0]);
        assertEquals(s.totalThickness(), x[n - 1], 1e-15 * s.totalThickness());
        for (int i = 1; i < n; i++) {
            assertTrue(x[i] > x[i - 1], "mesh not increasing at " + i + where);
        }
        for (double itf : s.interfaceDepths()) {
            assertTrue(nearestDistance(x, itf) <= 1e-13, "no node at interface " + itf + where);
        }

        // nothing is NaN (Solution's own contract, and DEVELOPERS.md)
        double[] ec = sol.conductionBand();
        double[] ev = sol.valenceBand();
        double[] ne = sol.electronDensity();
        double[] p = sol.holeDensity();
        double[] nd = sol.ionizedDonors();
        double[] na = sol.ionizedAcceptors();
        double[] rho = sol.chargeDensity();
        double[] f = sol.electricField();
        for (double[] a : new double[][] {sol.potential(), ec, ev, ne, p, nd, na, rho, f, sol.cellMidpoints()}) {
            for (double v : a) {
                assertTrue(Double.isFinite(v), "non-finite value" + where);
            }
        }
        assertTrue(Double.isFinite(sol.gateCharge()) && Double.isFinite(sol.sheetDensityPerCm2())
                && Double.isFinite(sol.chargeNeutralityResidual()), "non-finite scalar" + where);

        double t = s.temperatureK();
        double[] w = boxWidths(x);
        double[] eps = new double[n - 1];
        double[] px = new double[n - 1];
        double[] gap = new double[n - 1];
        double[] donorTotal = new double[n - 1];
        double[] acceptorTotal = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            double mid = 0.5 * (x[k] + x[k + 1]);
            PointState ps = s.pointAt(mid);
            eps[k] = ps.material().permittivityStatic() * Constants.VACUUM_PERMITTIVITY;
            px[k] = -ps.alongGrowth();
            gap[k] = ps.material().bandGap().atTemperature(t)
                    + (s.strainShiftsBandEdges() ? ps.bandShift().gapEv() : 0);
            Layer l = s.layerStates().get(s.layerIndexAt(mid)).layer();
            for (Dopant d : l.dopants()) {
                if (d.kind() == Dopant.Kind.DONOR) {
                    donorTotal[k] += d.densityPerM3();
                } else {
                    acceptorTotal[k] += d.densityPerM3();
                }
            }
            for (DeepLevel d : l.deepLevels()) {
                if (d.kind() == DeepLevel.Kind.DONOR_LIKE) {
                    donorTotal[k] += d.densityPerM3();
                } else {
                    acceptorTotal[k] += d.densityPerM3();
                }
            }
        }

        // E_c - E_v is the local gap: at a node, the band edges are those of the cell below it
        for (int i = 0; i < n; i++) {
            int k = Math.min(i, n - 2);
            assertEquals(gap[k], ec[i] - ev[i], ENERGY_EXACT, "E_c - E_v at node " + i + " (" + x[i] + " m)" + where);
        }

        // densities and occupations are non-negative; ionised species never exceed their density
        for (int i = 0; i < n; i++) {
            assertTrue(ne[i] >= 0 && p[i] >= 0 && nd[i] >= 0 && na[i] >= 0, "negative density at node " + i + where);
            double wd = 0;
            double wa = 0;
            double wt = 0;
            for (int k = Math.max(0, i - 1); k <= Math.min(i, n - 2); k++) {
                double h = 0.5 * (x[k + 1] - x[k]);
                wd += h * donorTotal[k];
                wa += h * acceptorTotal[k];
                wt += h;
            }
            assertTrue(nd[i] <= wd / wt * (1 + 1e-12) + 1e-300, "ionised donors " + nd[i] + " > " + wd / wt + where);
            assertTrue(na[i] <= wa / wt * (1 + 1e-12) + 1e-300, "ionised acceptors " + na[i] + " > " + wa / wt + where);
        }

        // Gauss's law in every box (box integration of div D = rho_free with D = eps E + P_x):
        // D(cell below) - D(cell above) = free charge of the node's box
        double[] d = new double[n - 1];
        double dMax = 0;
        for (int k = 0; k < n - 1; k++) {
            d[k] = eps[k] * f[k] + px[k];
            dMax = Math.max(dMax, Math.max(Math.abs(d[k]), Math.abs(px[k])));
        }
        dMax = Math.max(dMax, Math.abs(sol.gateCharge()));
        double worst = 0;
        int worstAt = -1;
        for (int i = 0; i < n; i++) {
            double q = rho[i] * w[i];
            double r;
            if (i == 0) {
                if (s.top() instanceof TopBoundary.Schottky) {
                    // the metal carries the rest: sigma_gate = D(first cell) - Q_0
                    r = sol.gateCharge() - (d[0] - q);
                } else {
                    // free surface: no field in the vacuum above, surface states inside Q_0
                    r = d[0] - q;
                    assertEquals(0.0, sol.gateCharge(), "gate charge of a free surface" + where);
                }
            } else if (i == n - 1) {
                if (s.bottom() instanceof BottomBoundary.FixedFermiLevel) {
                    continue; // a contact: it carries whatever charge closes the field
                }
                // zero field below the bottom: D there is the bulk polarization
                r = px[n - 2] - d[n - 2] - q;
            } else {
                r = d[i] - d[i - 1] - q;
            }
            double rel = Math.abs(r) / dMax;
            if (rel > worst) {
                worst = rel;
                worstAt = i;
            }
        }
        if (worst > worstGauss) {
            worstGauss = worst;
        }
        assertTrue(worst <= GAUSS_RELATIVE, String.format(Locale.ROOT,
                "Gauss's law violated at node %d (%.4g nm): residual %.3g of the largest D %.3g C/m^2%s", worstAt,
                worstAt >= 0 ? x[worstAt] * 1e9 : 0.0, worst, dMax, where));
        assertTrue(sol.chargeNeutralityResidual() < NEUTRALITY, "neutrality residual "
                + sol.chargeNeutralityResidual() + where);

        // the Fermi level is the bottom contact's, 0 eV; the contacts pin E_c as documented
        assertEquals(0.0, sol.fermiLevelEv());
        if (s.top() instanceof TopBoundary.Schottky g) {
            assertEquals(g.barrierHeightEv() - g.biasV(), ec[0], ENERGY_EXACT, "E_c(0) = phi_B - V" + where);
        }
        // quasi-Fermi levels (QuasiFermiLevels defaults): electrons at the channel's 0 eV, except
        // under a forward-biased gate a top segment (gate to the barrier's E_c maximum) at the
        // gate's -V; holes at the gate's -V or the channel's 0 eV, and at 0 eV with a free surface
        double[] efn = sol.electronFermiLevel();
        double[] efp = sol.holeFermiLevel();
        if (o.quasiFermiLevels().rules().isEmpty()) {
            double gate = s.top() instanceof TopBoundary.Schottky g ? -g.biasV() : 0;
            boolean forward = gate < 0 && o.quasiFermiLevels().forwardBiasElectrons()
                    == org.wurtzkit.solvers.sp.QuasiFermiLevels.ForwardBiasElectrons.GATE_SIDE_FOLLOWS_GATE;
            boolean gateSegment = forward;
            for (int i = 0; i < n; i++) {
                gateSegment &= Math.abs(efn[i] - gate) <= ENERGY_EXACT;
                assertEquals(gateSegment ? gate : 0.0, efn[i], ENERGY_EXACT,
                        "electrons at the channel level below a top segment at the gate's" + where);
                assertTrue(Math.abs(efp[i]) <= ENERGY_EXACT || Math.abs(efp[i] - gate) <= ENERGY_EXACT,
                        "holes at the gate or channel level, not " + efp[i] + where);
            }
        }
        if (s.bottom() instanceof BottomBoundary.FixedFermiLevel b) {
            assertEquals(b.conductionAboveFermiEv(), ec[n - 1], ENERGY_EXACT, "E_c at the bottom" + where);
        }

        checkSubbands(sol, x, w, where);
    }

    private static void checkSubbands(Solution sol, double[] x, double[] w, String where) {
        List<DepthRange> windows = sol.quantumWindows();
        double[] well = sol.wellSheetDensities();
        BandDiagram bd = sol.bandDiagram();
        double[] bdDepth = bd.depth();
        double[] bdEc = bd.conductionEv();
        List<List<Subband>> byWindow = new ArrayList<>();
        for (int i = 0; i < windows.size(); i++) {
            byWindow.add(new ArrayList<>());
        }
        for (Subband b : sol.subbands()) {
            assertTrue(b.window() >= 0 && b.window() < windows.size(), "window index " + b.window() + where);
            byWindow.get(b.window()).add(b);
        }
        double wellSum = 0;
        for (int win = 0; win < windows.size(); win++) {
            List<Subband> bands = byWindow.get(win);
            double top = windows.get(win).top();
            double bottom = windows.get(win).bottom();
            // variational bound of the discrete Hamiltonian (positive kinetic term): every level
            // lies above the lowest conduction-band edge in its window
            double ecMin = Double.POSITIVE_INFINITY;
            for (int j = 0; j < bdDepth.length; j++) {
                if (bdDepth[j] >= top && bdDepth[j] <= bottom) {
                    ecMin = Math.min(ecMin, bdEc[j]);
                }
            }
            double sum = 0;
            for (int a = 0; a < bands.size(); a++) {
                Subband ba = bands.get(a);
                assertEquals(a, ba.index(), "subband indices in order" + where);
                assertTrue(Double.isFinite(ba.energyEv()) && Double.isFinite(ba.sheetDensity()), where);
                assertTrue(ba.sheetDensity() >= 0, "negative occupation " + ba.sheetDensity() + where);
                assertTrue(ba.inPlaneMass() > 0, where);
                assertTrue(ba.energyEv() > ecMin - ENERGY_EXACT, "subband " + a + " at " + ba.energyEv()
                        + " eV below the lowest E_c " + ecMin + " of its window" + where);
                if (a > 0) {
                    assertTrue(ba.energyEv() >= bands.get(a - 1).energyEv(), "subbands not sorted" + where);
                }
                double[] pa = ba.wavefunction();
                for (int i = 0; i < x.length; i++) {
                    if (x[i] <= top || x[i] >= bottom) {
                        assertEquals(0.0, pa[i], "wavefunction nonzero outside its window at node " + i + where);
                    }
                }
                for (int b = 0; b <= a; b++) {
                    double[] pb = bands.get(b).wavefunction();
                    double dot = 0;
                    for (int i = 0; i < x.length; i++) {
                        dot += pa[i] * pb[i] * w[i];
                    }
                    assertEquals(a == b ? 1.0 : 0.0, dot, ORTHONORMAL, "<psi_" + a + "|psi_" + b + "> in window " + win
                            + where);
                }
                sum += ba.sheetDensity();
            }
            assertEquals(well[win], sum, 1e-12 * Math.max(sum, 1), "window sheet density = sum of subbands" + where);
            wellSum += sum;
        }
        if (!windows.isEmpty()) {
            // the subband electrons split into sheets (per window and layer, the gate side of the
            // barrier apart); sheets below the report threshold are left out; the channel is one of them
            double quantum = 0;
            double channel = 0;
            int channels = 0;
            for (CarrierSheet c : sol.carrierSheets()) {
                if (c.window() >= 0 && c.carrier() == Carrier.ELECTRONS) {
                    quantum += c.sheetDensity();
                }
                if (c.role() == CarrierSheet.Role.CHANNEL) {
                    channel = c.sheetDensity();
                    channels++;
                }
            }
            assertTrue(channels <= 1, "one channel at most: " + sol.carrierSheets() + where);
            assertEquals(channel * 1e-4, sol.sheetDensityPerCm2(), 0.0, "the 2DEG is the channel sheet" + where);
            double left = 2.0 * windows.size() * sol.structure().layerStates().size() * Solution.SHEET_REPORT_THRESHOLD;
            assertTrue(quantum <= wellSum * (1 + 1e-9) && quantum >= wellSum * (1 - 1e-9) - left,
                    "sheets " + quantum + " vs subbands " + wellSum + where);
        }
        // the subband electrons are part of all electrons: integral of n >= sum of occupations
        assertTrue(sol.electronSheetDensity() >= wellSum * (1 - 1e-9), "electron sheet " + sol.electronSheetDensity()
                + " < subband sheet " + wellSum + where);
    }

    /** The documented contract of a non-converged solve. */
    static void check(NotConvergedException e, SolverOptions o) {
        ConvergenceRecord r = e.record();
        assertTrue(r != null && !r.converged(), e.getMessage());
        assertTrue(r.iterations() <= o.maxIterations(), "iterations " + r.iterations());
        assertTrue(e.getMessage() != null && !e.getMessage().isBlank());
        double[] z = e.lastDepth();
        double[] v = e.lastPotential();
        assertEquals(z.length, v.length);
        for (double val : v) {
            assertTrue(Double.isFinite(val), "last iterate not finite: " + e.getMessage());
        }
        for (double val : r.residualHistory()) {
            assertTrue(!Double.isNaN(val), "NaN in the residual history: " + e.getMessage());
        }
    }

    static double[] boxWidths(double[] x) {
        int n = x.length;
        double[] w = new double[n];
        for (int i = 0; i < n - 1; i++) {
            double h = x[i + 1] - x[i];
            w[i] += 0.5 * h;
            w[i + 1] += 0.5 * h;
        }
        return w;
    }

    private static double nearestDistance(double[] x, double v) {
        double best = Double.POSITIVE_INFINITY;
        for (double xi : x) {
            best = Math.min(best, Math.abs(xi - v));
        }
        return best;
    }
}
