package org.wurtzkit.solvers.sp;

/**
 * The electron density of the subbands, the one place it is written. With the predictor of
 * A. Trellakis, A. T. Galick, A. Pacelli and U. Ravaioli, J. Appl. Phys. 81, 7880 (1997), the
 * subbands computed at the potential phi_ref give, at a node i of a quantum window and a potential
 * phi,
 * <pre>
 *   n_i(phi) = sum_k g_k ln(1 + e^eta_k,i) |psi_k,i|^2,   eta_k,i = (E_F - E_k)/kT + (phi_i - phi_ref,i)/kT,
 * </pre>
 * with g_k = m_xy,k kT / (pi hbar^2) the two-dimensional density of states of subband k (spin
 * included; T. Ando, A. B. Fowler and F. Stern, Rev. Mod. Phys. 54, 437 (1982)) and E_F the electron
 * quasi-Fermi level of node i's cell (0 eV, the channel's, unless a {@link QuasiFermiLevels} rule
 * says otherwise: a local-level approximation where a window spans two levels), and
 * dn_i/dphi_i = sum_k g_k |psi_k,i|^2 / (kT (1 + e^-eta_k,i)). Both come from one exponential,
 * e^-|eta|, so neither overflows. The sheet density of a subband is the box-integrated sum of its
 * terms, so the per-subband sheets add up to the integral of the node densities.
 *
 * <p>Stateless; every method reads the subbands of {@link QuantumStates} as they stand.
 */
final class SubbandDensity {
    /**
     * Below this e^eta, ln(1 + x) = x - x^2/2 + ... + x^5/5 and x/(1 + x) = x - x^2 + ... + x^5 are
     * exact to 2e-16 and 1e-15 relative (the first omitted terms, x^6/6 and x^6, over x): cheaper
     * than a logarithm and a division for the subbands several kT above the Fermi level.
     */
    static final double SERIES_LIMIT = 1e-3;

    private SubbandDensity() {
    }

    /**
     * Writes the subband electron density at node i and its derivative into {@code out.n} and
     * {@code out.dn} (other fields untouched). Zero at nodes outside every window's interior.
     *
     * @param d      the device
     * @param qs     the subbands, computed at phiRef
     * @param i      node index
     * @param phi    potential at node i (V)
     * @param phiRef potential at node i when the subbands were computed (V)
     * @param out    receives n (m^-3) and dn/dphi (m^-3/V)
     */
    static void atNode(Device d, QuantumStates qs, int i, double phi, double phiRef, PointDensities out) {
        double invVt = 1 / d.vt;
        double nq = 0;
        double dnq = 0;
        for (int w = 0; w < qs.windows; w++) {
            int a = d.windowStart[w];
            if (i <= a || i >= d.windowEnd[w]) {
                continue;
            }
            double shift = (phi - phiRef) * invVt;
            double fn = d.quasiFermiUniform ? 0 : d.efn[i < d.n - 1 ? i : i - 1];
            for (int k = 0; k < qs.count[w]; k++) {
                double psi = qs.psi[w][k][i - a];
                double eta = (fn - qs.energy[w][k]) * invVt + shift;
                double g = qs.dos[w][k] * psi * psi;
                double ex = Math.exp(-Math.abs(eta));
                // d ln(1 + e^eta)/d eta = 1/(1 + e^-eta), from the same exponential
                if (eta > 0) {
                    nq += g * (eta + log1p(ex));
                    dnq += g * invVt / (1 + ex);
                } else if (ex < SERIES_LIMIT) {
                    // a subband well above the Fermi level (most of them): both by their series
                    nq += g * ex * (1 - ex * (1.0 / 2 - ex * (1.0 / 3 - ex * (1.0 / 4 - ex * (1.0 / 5)))));
                    dnq += g * invVt * ex * (1 - ex * (1 - ex * (1 - ex * (1 - ex))));
                } else {
                    nq += g * log1p(ex);
                    dnq += g * invVt * ex / (1 + ex);
                }
            }
        }
        out.n = nq;
        out.dn = dnq;
    }

    /**
     * The sheet density of subband k of window w (m^-2): its node densities integrated over the
     * boxes of the window's interior nodes.
     *
     * @param d      the device
     * @param qs     the subbands, computed at phiRef
     * @param w      window index
     * @param k      subband index within the window
     * @param phi    potential (V), every node
     * @param phiRef potential at which the subbands were computed (V), every node
     * @return sheet density (m^-2)
     */
    static double sheet(Device d, QuantumStates qs, int w, int k, double[] phi, double[] phiRef) {
        double invVt = 1 / d.vt;
        int a = d.windowStart[w];
        double[] psiK = qs.psi[w][k];
        double sum = 0;
        for (int i = a + 1; i < d.windowEnd[w]; i++) {
            double psi = psiK[i - a];
            double fn = d.quasiFermiUniform ? 0 : d.efn[i < d.n - 1 ? i : i - 1];
            double eta = (fn - qs.energy[w][k]) * invVt + (phi[i] - phiRef[i]) * invVt;
            double g = qs.dos[w][k] * psi * psi;
            sum += g * lnOnePlusExp(eta, Math.exp(-Math.abs(eta))) * d.box(i);
        }
        return sum;
    }

    /**
     * The part of the sheet density of subband k of window w that lies on the nodes
     * [fromNode, toNode) of the window's interior, each node with its own quasi-Fermi level, and the
     * first moment of that part in depth: where a window spans two levels (a forward-biased gate's
     * side and the channel's), the occupied density of each side, not the probability of the wave
     * function there.
     *
     * @param d        the device
     * @param qs       the subbands, computed at phiRef
     * @param w        window index
     * @param k        subband index within the window
     * @param phi      potential (V), every node
     * @param phiRef   potential at which the subbands were computed (V), every node
     * @param fromNode first node (clipped to the window's interior)
     * @param toNode   node after the last
     * @return {sheet density (m^-2), its first moment in depth (m^-1)}
     */
    static double[] sheetPart(Device d, QuantumStates qs, int w, int k, double[] phi, double[] phiRef, int fromNode,
            int toNode) {
        double invVt = 1 / d.vt;
        int a = d.windowStart[w];
        double[] psiK = qs.psi[w][k];
        double sum = 0;
        double moment = 0;
        for (int i = Math.max(a + 1, fromNode); i < Math.min(d.windowEnd[w], toNode); i++) {
            double psi = psiK[i - a];
            double fn = d.quasiFermiUniform ? 0 : d.efn[i < d.n - 1 ? i : i - 1];
            double eta = (fn - qs.energy[w][k]) * invVt + (phi[i] - phiRef[i]) * invVt;
            double g = qs.dos[w][k] * psi * psi;
            double v = g * lnOnePlusExp(eta, Math.exp(-Math.abs(eta))) * d.box(i);
            sum += v;
            moment += v * d.x[i];
        }
        return new double[] {sum, moment};
    }

    /** ln(1 + e^eta) given ex = e^-|eta|. */
    private static double lnOnePlusExp(double eta, double ex) {
        return eta > 0 ? eta + log1p(ex) : log1p(ex);
    }

    /**
     * ln(1 + x) for x in [0, 1] from the natural logarithm: with u = 1 + x rounded,
     * ln(1 + x) = x ln(u) / (u - 1), exact to a few ulps (D. Goldberg, ACM Comput. Surv. 23, 5
     * (1991), Theorem 4). Math.log is a compiler intrinsic, while Math.log1p calls the slower
     * fdlibm routine; this is the innermost operation of every charge evaluation (one per subband
     * and window node).
     *
     * @param x the argument, in [0, 1]
     * @return ln(1 + x)
     */
    static double log1p(double x) {
        double u = 1 + x;
        return u == 1 ? x : Math.log(u) * x / (u - 1);
    }
}
