package org.wurtzkit.solvers.sp;

import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.solvers.schrodinger.EffectiveMassHamiltonian;
import org.wurtzkit.units.Constants;

/**
 * The hole subbands of every quantum window: three single parabolic bands (heavy, light and
 * crystal-field hole, {@link ValenceBands}), each solved with the BenDaniel-Duke equation in hole
 * energy epsilon = -(E_v,b - e phi) with its mass along c, its band offset below the top valence
 * band, and its mass across c in the two-dimensional density of states (T. Ando, A. B. Fowler and
 * F. Stern, Rev. Mod. Phys. 54, 437 (1982)). A window whose valence band lies more than the subband
 * cut-off below the hole quasi-Fermi level everywhere is skipped without an eigen-solve, so stacks
 * without hole wells pay one O(N) scan per window and iteration. One Hamiltonian per window and
 * band, assembled once: the seam where a coupled 6x6 k.p Hamiltonian would replace the three
 * single bands. Mutable scratch owned by one solve.
 */
final class HoleStates {
    static final int BANDS = 3;
    final int windows;
    final int[][] count; // [window][band]
    final double[][][] energy; // [window][band][state] hole energy (eV)
    final double[][][][] psi; // [window][band][state][local node]
    final double[][][] dos; // [window][band][state] m^-2
    private final EffectiveMassHamiltonian[][] hamiltonians;
    private final double[][] potential; // [window][local node], hole energy of one band (eV)
    private final double[][][] massWeight; // [window][band][local node]
    /** The potential (V) of each window's last eigen-solve, for the Weyl bracket of a warm update. */
    private final double[][] lastPhi; // [window][local node]
    /** Number of energies of the last eigen-solve of each band, the hints of a warm update (0: none). */
    private final int[][] hintCount; // [window][band]

    HoleStates(Device d) {
        windows = d.windowStart.length;
        count = new int[windows][BANDS];
        energy = new double[windows][BANDS][];
        psi = new double[windows][BANDS][][];
        dos = new double[windows][BANDS][];
        hamiltonians = new EffectiveMassHamiltonian[windows][BANDS];
        massWeight = new double[windows][BANDS][];
        potential = new double[windows][];
        lastPhi = new double[windows][];
        hintCount = new int[windows][BANDS];
        for (int w = 0; w < windows; w++) {
            int a = d.windowStart[w];
            int e = d.windowEnd[w];
            potential[w] = new double[e - a + 1];
            lastPhi[w] = new double[e - a + 1];
            double[] z = new double[e - a + 1];
            for (int i = a; i <= e; i++) {
                z[i - a] = d.x[i];
            }
            for (int b = 0; b < BANDS; b++) {
                double[] m = new double[e - a];
                for (int i = a; i < e; i++) {
                    m[i - a] = d.holeMassZ[b][i];
                }
                hamiltonians[w][b] = EffectiveMassHamiltonian.of(z, m);
                massWeight[w][b] = new double[e - a + 1];
                for (int i = a; i <= e; i++) {
                    massWeight[w][b][i - a] = d.box(i) * d.nodeHoleMassXY(b, i);
                }
                int kMax = Math.min(d.options.maxSubbands(), hamiltonians[w][b].maxStates());
                energy[w][b] = new double[kMax];
                psi[w][b] = new double[kMax][];
                dos[w][b] = new double[kMax];
            }
        }
    }

    /** {@return whether the last update found any hole subband (a window holds a hole well)} */
    boolean any() {
        for (int[] c : count) {
            for (int v : c) {
                if (v > 0) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Solves every window for the potential phi (V), each eigen-solve cold; counts stay 0 where no hole state can be occupied. */
    void update(Device d, double[] phi) {
        update(d, phi, false);
    }

    /**
     * Solves every window for the potential phi (V); counts stay 0 where no hole state can be
     * occupied. With {@code warm}, a band solved before starts from its previous energies,
     * bracketed by the largest change of phi over the window since that solve (the band offsets
     * and edges are fixed, so the hole potential energy of every band moves by exactly the change
     * of phi; Weyl's inequality, checked by Sturm counts). Equal to a cold update to round-off.
     */
    void update(Device d, double[] phi, boolean warm) {
        double cut = d.options.subbandCutoffKT() * d.vt;
        double dosUnit = Constants.ELECTRON_MASS * d.kT / (Math.PI * Constants.HBAR * Constants.HBAR);
        for (int w = 0; w < windows; w++) {
            int a = d.windowStart[w];
            int e = d.windowEnd[w];
            // hole energies of interest: epsilon < -E_Fp + cut, loosest over the window
            double minLevel = Double.POSITIVE_INFINITY;
            double minEdge = Double.POSITIVE_INFINITY;
            for (int i = a; i <= e; i++) {
                int c = i < d.n - 1 ? i : i - 1;
                minLevel = Math.min(minLevel, d.efp[c]);
                minEdge = Math.min(minEdge, phi[i] - d.nodeEv(i));
            }
            double bound = -minLevel + cut;
            for (int b = 0; b < BANDS; b++) {
                count[w][b] = 0;
            }
            if (minEdge >= bound) {
                continue; // the valence band is far below the hole level everywhere in the window
            }
            int len = e - a + 1;
            double[] v = potential[w];
            double[] last = lastPhi[w];
            double change = 0.0;
            for (int j = 0; j < len; j++) {
                change = Math.max(change, Math.abs(phi[a + j] - last[j]));
                last[j] = phi[a + j];
            }
            for (int b = 0; b < BANDS; b++) {
                for (int j = 0; j < len; j++) {
                    v[j] = phi[a + j] - d.nodeEv(a + j) + d.nodeHoleOffset(b, a + j);
                }
                int kMax = energy[w][b].length;
                int hints = hintCount[w][b];
                int found = warm && hints > 0 && change < Double.POSITIVE_INFINITY
                        ? hamiltonians[w][b].belowInto(v, bound, kMax, energy[w][b], psi[w][b], energy[w][b], hints,
                                change)
                        : hamiltonians[w][b].belowInto(v, bound, kMax, energy[w][b], psi[w][b]);
                count[w][b] = found;
                hintCount[w][b] = found;
                for (int k = 0; k < found; k++) {
                    double mxy = 0;
                    for (int j = 0; j < len; j++) {
                        double p = psi[w][b][k][j];
                        mxy += p * p * massWeight[w][b][j];
                    }
                    dos[w][b][k] = mxy * dosUnit;
                }
            }
        }
    }

    /**
     * Writes the subband hole density at node i (m^-3) and its derivative d p/d phi_i (m^-3/V) into
     * {@code out.p} and {@code out.dp}. With the same first-order predictor as the electrons
     * (Trellakis et al. 1997): eta = (-epsilon_k - E_Fp)/kT - (phi_i - phiRef_i)/kT.
     */
    void atNode(Device d, int i, double phi, double phiRef, PointDensities out) {
        double invVt = 1 / d.vt;
        double fp = d.efp[i < d.n - 1 ? i : i - 1];
        double pq = 0;
        double dpq = 0;
        for (int w = 0; w < windows; w++) {
            int a = d.windowStart[w];
            if (i <= a || i >= d.windowEnd[w]) {
                continue;
            }
            double shift = -(phi - phiRef) * invVt;
            for (int b = 0; b < BANDS; b++) {
                for (int k = 0; k < count[w][b]; k++) {
                    double ps = psi[w][b][k][i - a];
                    double eta = (-energy[w][b][k] - fp) * invVt + shift;
                    double g = dos[w][b][k] * ps * ps;
                    double ex = Math.exp(-Math.abs(eta));
                    pq += g * (eta > 0 ? eta + Math.log1p(ex) : Math.log1p(ex));
                    dpq -= g * invVt * (eta > 0 ? 1 / (1 + ex) : ex / (1 + ex));
                }
            }
        }
        out.p = pq;
        out.dp = dpq;
    }

    /** The sheet density of hole subband k of band b in window w (m^-2). */
    double sheet(Device d, int w, int b, int k, double[] phi, double[] phiRef) {
        int a = d.windowStart[w];
        double invVt = 1 / d.vt;
        double sum = 0;
        for (int i = a + 1; i < d.windowEnd[w]; i++) {
            double fp = d.efp[i < d.n - 1 ? i : i - 1];
            double ps = psi[w][b][k][i - a];
            double eta = (-energy[w][b][k] - fp) * invVt - (phi[i] - phiRef[i]) * invVt;
            double ex = Math.exp(-Math.abs(eta));
            sum += dos[w][b][k] * ps * ps * (eta > 0 ? eta + Math.log1p(ex) : Math.log1p(ex)) * d.box(i);
        }
        return sum;
    }
}
