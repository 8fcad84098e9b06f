package org.wurtzkit.solvers.sp;

import org.wurtzkit.solvers.schrodinger.EffectiveMassHamiltonian;
import org.wurtzkit.units.Constants;

/**
 * The subbands of every quantum window for one potential, with the per-state two-dimensional
 * density-of-states factor g_k = m_xy,k m0 kT / (pi hbar^2) (spin included, one valley; T. Ando,
 * A. B. Fowler and F. Stern, Rev. Mod. Phys. 54, 437 (1982)), so that the sheet density of subband k
 * is g_k ln(1 + exp((E_F - E_k)/kT)). Mutable scratch owned by one solve.
 */
final class QuantumStates {
    final int windows;
    final int[] count;
    final double[][] energy; // [window][state] eV
    final double[][][] psi; // [window][state][local node] 1/sqrt(m)
    final double[][] dos; // [window][state] m^-2
    final double[][] massXY;
    /** The hole subbands of the same windows, or null when holes are classical ({@link SolverOptions#quantumHoles()}). */
    final HoleStates holes;
    /** Whether some window had more subbands below the cut-off than it could keep. */
    boolean limitReached;
    private final EffectiveMassHamiltonian[] hamiltonians;
    private final double[][] potential; // [window][local node]
    private final double[][] massWeight; // [window][local node] box width (m) times in-plane mass (m0)
    /** Whether a window has been solved (its energy row holds hints for a warm update). */
    private final boolean[] solved;

    QuantumStates(Device d) {
        windows = d.windowStart.length;
        holes = d.options.quantumHoles() ? new HoleStates(d) : null;
        count = new int[windows];
        energy = new double[windows][];
        psi = new double[windows][][];
        dos = new double[windows][];
        massXY = new double[windows][];
        hamiltonians = new EffectiveMassHamiltonian[windows];
        potential = new double[windows][];
        massWeight = new double[windows][];
        solved = new boolean[windows];
        for (int w = 0; w < windows; w++) {
            int a = d.windowStart[w];
            int b = d.windowEnd[w];
            double[] z = new double[b - a + 1];
            double[] m = new double[b - a];
            for (int i = a; i <= b; i++) {
                z[i - a] = d.x[i];
                if (i < b) {
                    m[i - a] = d.massZ[i];
                }
            }
            hamiltonians[w] = EffectiveMassHamiltonian.of(z, m);
            potential[w] = new double[b - a + 1];
            massWeight[w] = new double[b - a + 1];
            for (int i = a; i <= b; i++) {
                massWeight[w][i - a] = d.box(i) * d.nodeMassXY(i);
            }
            int kMax = Math.min(d.options.maxSubbands(), hamiltonians[w].maxStates());
            energy[w] = new double[kMax];
            // rows owned here, allocated when first filled and overwritten by every later
            // update; Solution copies what it keeps
            psi[w] = new double[kMax][];
            dos[w] = new double[kMax];
            massXY[w] = new double[kMax];
        }
    }

    /** Solves every window for the potential phi (V), electrons and holes, each eigen-solve cold. */
    void update(Device d, double[] phi) {
        update(d, phi, false);
    }

    /**
     * Solves every window for the potential phi (V), electrons and holes. With {@code warm}, a
     * window solved before starts its electron eigen-solve from its previous energies, bracketed
     * by the largest change of its potential energy since then (Weyl's inequality; every bracket
     * is checked by Sturm counts, so a stale one costs two counts and nothing else). The states
     * agree with a cold update to round-off, not bit for bit; for the same sequence of calls the
     * results are deterministic. The hole windows ({@link HoleStates}) are warm-started the same way.
     */
    void update(Device d, double[] phi, boolean warm) {
        if (holes != null) {
            holes.update(d, phi, warm);
        }
        double bound = d.options.subbandCutoffKT() * d.vt;
        double dosUnit = Constants.ELECTRON_MASS * d.kT / (Math.PI * Constants.HBAR * Constants.HBAR);
        limitReached = false;
        for (int w = 0; w < windows; w++) {
            int a = d.windowStart[w];
            double[] v = potential[w];
            double change = 0.0;
            for (int j = 0; j < v.length; j++) {
                double vj = d.nodeEc(a + j) - phi[a + j];
                change = Math.max(change, Math.abs(vj - v[j]));
                v[j] = vj;
            }
            boolean useHints = warm && solved[w] && count[w] > 0 && change < Double.POSITIVE_INFINITY;
            int kMax = energy[w].length;
            double windowBound = bound;
            if (!d.quasiFermiUniform) {
                // the cut-off counts from the highest electron quasi-Fermi level in the window
                double top = Double.NEGATIVE_INFINITY;
                for (int c = a; c < d.windowEnd[w]; c++) {
                    top = Math.max(top, d.efn[c]);
                }
                windowBound = bound + top;
            }
            int found = useHints
                    ? hamiltonians[w].belowInto(v, windowBound, kMax, energy[w], psi[w], energy[w], count[w], change)
                    : hamiltonians[w].belowInto(v, windowBound, kMax, energy[w], psi[w]);
            count[w] = found;
            solved[w] = true;
            if (found == kMax && kMax < hamiltonians[w].maxStates()) {
                limitReached |= energy[w][kMax - 1] < windowBound;
            }
            double channelMass = 0;
            if (d.options.densityOfStatesMass() == DensityOfStatesMass.CHANNEL) {
                int lowest = 0;
                for (int j = 1; j < v.length; j++) {
                    if (v[j] < v[lowest]) {
                        lowest = j;
                    }
                }
                // the material of the cell beside the lowest node with the lower band edge
                int node = a + lowest;
                int cell = node == 0 ? 0 : node == d.n - 1 ? d.n - 2 : d.ec[node - 1] < d.ec[node] ? node - 1 : node;
                channelMass = d.massXY[cell];
            }
            for (int k = 0; k < found; k++) {
                double mxy = 0;
                if (channelMass > 0) {
                    mxy = channelMass;
                } else {
                    double[] weight = massWeight[w];
                    for (int j = 0; j < v.length; j++) {
                        double p = psi[w][k][j];
                        mxy += p * p * weight[j];
                    }
                }
                // normalised on the window's box widths; the end boxes are half-boxes but psi = 0 there
                massXY[w][k] = mxy;
                dos[w][k] = mxy * dosUnit;
            }
        }
    }
}
