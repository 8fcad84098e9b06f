package org.wurtzkit.solvers.sp;

import org.wurtzkit.solvers.statistics.FermiDirac;
import org.wurtzkit.solvers.statistics.Ionization;

/**
 * Free charge in each node's box as a function of the node potential, with its derivative, by box
 * integration: each half of a box takes the material of its own cell, so abrupt heterointerfaces
 * need no averaging. Electrons inside quantum windows come from the subbands through the
 * predictor of A. Trellakis, A. T. Galick, A. Pacelli and U. Ravaioli, J. Appl. Phys. 81, 7880
 * (1997): n_i(phi) = sum_k g_k ln(1 + exp((E_F - E_k + (phi_i - phi_ref,i))/kT)) |psi_k,i|^2.
 */
final class ChargeModel {
    private final Device d;
    private final double invVt;

    // accumulator of one half-cell evaluation, reused (no allocation per node)
    private double n;
    private double dn;
    private double p;
    private double dp;
    private double donors;
    private double dDonors;
    private double acceptors;
    private double dAcceptors;

    ChargeModel(Device d) {
        this.d = d;
        this.invVt = 1 / d.vt;
    }

    /**
     * Fills q[i] = free charge per area in box i (C/m^2) and dq[i] = dq[i]/dphi_i.
     *
     * @param phi    potential (V)
     * @param phiRef potential at which the subbands were computed (V), or null without subbands
     * @param qs     the subbands, or null for classical electrons everywhere
     */
    void evaluate(double[] phi, double[] phiRef, QuantumStates qs, double[] q, double[] dq) {
        int nn = d.n;
        boolean quantum = qs != null;
        for (int i = 0; i < nn; i++) {
            boolean skipN = quantum && d.quantumNode[i];
            double qi = 0;
            double dqi = 0;
            if (d.sameCellsAround[i]) {
                // both half-boxes hold the same material: one evaluation serves the whole box
                half(i, phi[i], skipN);
                double w = 0.5 * (d.h[i - 1] + d.h[i]);
                qi += w * (p - n + donors - acceptors);
                dqi += w * (dp - dn + dDonors - dAcceptors);
            } else if (i > 0) {
                half(i - 1, phi[i], skipN);
                double w = 0.5 * d.h[i - 1];
                qi += w * (p - n + donors - acceptors);
                dqi += w * (dp - dn + dDonors - dAcceptors);
            }
            if (i < nn - 1 && !d.sameCellsAround[i]) {
                half(i, phi[i], skipN);
                double w = 0.5 * d.h[i];
                qi += w * (p - n + donors - acceptors);
                dqi += w * (dp - dn + dDonors - dAcceptors);
            }
            if (d.deltaDensity[i] > 0) {
                double e = d.nodeEc(i) - phi[i];
                if (d.deltaIsDonor[i]) {
                    double x = (d.deltaEnergy[i] - e) * invVt;
                    qi += d.deltaDensity[i] * Ionization.ionizedDonorFraction(x, Ionization.DEFAULT_DONOR_DEGENERACY);
                    dqi += d.deltaDensity[i]
                            * Ionization.ionizedDonorFractionDerivative(x, Ionization.DEFAULT_DONOR_DEGENERACY) * invVt;
                } else {
                    double x = (e - gapAt(i) + d.deltaEnergy[i]) * invVt;
                    qi -= d.deltaDensity[i] * Ionization.ionizedAcceptorFraction(x, Ionization.DEFAULT_ACCEPTOR_DEGENERACY);
                    // dx/dphi = -1/kT, and the sheet's charge is -N f(x)
                    dqi += d.deltaDensity[i]
                            * Ionization.ionizedAcceptorFractionDerivative(x, Ionization.DEFAULT_ACCEPTOR_DEGENERACY) * invVt;
                }
            }
            if (i == 0 && d.surfaceDonorDensity > 0) {
                // donor-like surface states at E_c(0) - E_s (Ibbetson et al. 2000), degeneracy 1
                double x = (d.surfaceDonorEnergy - (d.ec[0] - phi[0])) * invVt;
                qi += d.surfaceDonorDensity * Ionization.donorLikeTrapChargedFraction(x, 1);
                dqi += d.surfaceDonorDensity * Ionization.donorLikeTrapChargedFractionDerivative(x, 1) * invVt;
            }
            if (skipN) {
                double nq = 0;
                double dnq = 0;
                for (int w = 0; w < qs.windows; w++) {
                    int a = d.windowStart[w];
                    if (i <= a || i >= d.windowEnd[w]) {
                        continue;
                    }
                    double shift = (phi[i] - phiRef[i]) * invVt;
                    for (int k = 0; k < qs.count[w]; k++) {
                        double psi = qs.psi[w][k][i - a];
                        double eta = -qs.energy[w][k] * invVt + shift;
                        double g = qs.dos[w][k] * psi * psi;
                        // ln(1 + e^eta) and its derivative 1/(1 + e^-eta) from one exponential
                        double ex = Math.exp(-Math.abs(eta));
                        if (eta > 0) {
                            nq += g * (eta + Math.log1p(ex));
                            dnq += g * invVt / (1 + ex);
                        } else {
                            nq += g * Math.log1p(ex);
                            dnq += g * invVt * ex / (1 + ex);
                        }
                    }
                }
                double box = d.box(i);
                qi -= box * nq;
                dqi -= box * dnq;
            }
            q[i] = Device.Q * qi;
            dq[i] = Device.Q * dqi;
        }
    }

    private double gapAt(int i) {
        int k = i < d.n - 1 ? i : i - 1;
        return d.ec[k] - d.ev[k];
    }

    /** Densities of one cell's material at node potential phi (m^-3) and derivatives (per V). */
    private void half(int k, double phi, boolean skipElectrons) {
        double ecn = d.ec[k] - phi;
        double evn = d.ev[k] - phi;
        if (skipElectrons) {
            n = 0;
            dn = 0;
        } else {
            double eta = -ecn * invVt;
            n = d.nc[k] * FermiDirac.f12(eta);
            dn = d.nc[k] * FermiDirac.fm12(eta) * invVt;
        }
        double etaP = (evn - d.holeFermiEv) * invVt;
        p = d.nv[k] * FermiDirac.f12(etaP);
        dp = -d.nv[k] * FermiDirac.fm12(etaP) * invVt;
        donors = 0;
        dDonors = 0;
        acceptors = 0;
        dAcceptors = 0;
        int li = d.layerOfCell[k];
        double[] dens = d.speciesDensity[li];
        for (int j = 0; j < dens.length; j++) {
            double e = d.speciesEnergy[li][j];
            double g = d.speciesDegeneracy[li][j];
            switch (d.speciesKind[li][j]) {
                case 0 -> { // shallow donor, E_D = E_c - e, x = (E_F - E_D)/kT
                    double x = (e - ecn) * invVt;
                    donors += dens[j] * Ionization.ionizedDonorFraction(x, g);
                    dDonors += dens[j] * Ionization.ionizedDonorFractionDerivative(x, g) * invVt;
                }
                case 1 -> { // shallow acceptor, E_A = E_v + e, x = (E_A - E_F)/kT
                    double x = (evn + e) * invVt;
                    acceptors += dens[j] * Ionization.ionizedAcceptorFraction(x, g);
                    dAcceptors -= dens[j] * Ionization.ionizedAcceptorFractionDerivative(x, g) * invVt;
                }
                case 2 -> { // donor-like deep level at E_T = E_c - e, x = (E_F - E_T)/kT
                    double x = (e - ecn) * invVt;
                    donors += dens[j] * Ionization.donorLikeTrapChargedFraction(x, g);
                    dDonors += dens[j] * Ionization.donorLikeTrapChargedFractionDerivative(x, g) * invVt;
                }
                default -> { // acceptor-like deep level
                    double x = (e - ecn) * invVt;
                    acceptors += dens[j] * Ionization.acceptorLikeTrapChargedFraction(x, g);
                    dAcceptors += dens[j] * Ionization.acceptorLikeTrapChargedFractionDerivative(x, g) * invVt;
                }
            }
        }
    }

    /**
     * Box-averaged densities for reporting (m^-3): electrons (classical part outside windows plus
     * the subband part inside), holes, ionised donors (incl. empty donor-like traps) and ionised
     * acceptors (incl. filled acceptor-like traps).
     */
    void densities(double[] phi, double[] phiRef, QuantumStates qs, double[] nOut, double[] pOut, double[] donorsOut,
            double[] acceptorsOut) {
        int nn = d.n;
        for (int i = 0; i < nn; i++) {
            boolean skipN = qs != null && d.quantumNode[i];
            double sn = 0;
            double sp = 0;
            double sd = 0;
            double sa = 0;
            double wt = 0;
            if (i > 0) {
                half(i - 1, phi[i], skipN);
                double w = 0.5 * d.h[i - 1];
                sn += w * n;
                sp += w * p;
                sd += w * donors;
                sa += w * acceptors;
                wt += w;
            }
            if (i < nn - 1) {
                half(i, phi[i], skipN);
                double w = 0.5 * d.h[i];
                sn += w * n;
                sp += w * p;
                sd += w * donors;
                sa += w * acceptors;
                wt += w;
            }
            nOut[i] = sn / wt;
            pOut[i] = sp / wt;
            donorsOut[i] = sd / wt;
            acceptorsOut[i] = sa / wt;
            if (skipN) {
                double nq = 0;
                for (int w = 0; w < qs.windows; w++) {
                    int a = d.windowStart[w];
                    if (i <= a || i >= d.windowEnd[w]) {
                        continue;
                    }
                    double shift = (phi[i] - phiRef[i]) / d.vt;
                    for (int k = 0; k < qs.count[w]; k++) {
                        double psi = qs.psi[w][k][i - a];
                        nq += qs.dos[w][k] * psi * psi * FermiDirac.log1pExp(-qs.energy[w][k] / d.vt + shift);
                    }
                }
                nOut[i] += nq;
            }
        }
    }
}
