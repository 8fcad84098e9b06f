package org.wurtzkit.solvers.sp;

import org.wurtzkit.solvers.statistics.FermiDirac;
import org.wurtzkit.solvers.statistics.Ionization;

/**
 * Free charge in each node's box as a function of the node potential, with its derivative, by box
 * integration: each half of a box takes the material of its own cell, so abrupt heterointerfaces
 * need no averaging. Electrons inside quantum windows come from the subbands through the
 * predictor of A. Trellakis, A. T. Galick, A. Pacelli and U. Ravaioli, J. Appl. Phys. 81, 7880
 * (1997), written once in {@link SubbandDensity}. Each density uses the quasi-Fermi level of its
 * carrier in its cell (see {@link QuasiFermiLevels}): electrons and shallow donors the electron
 * level, holes and shallow acceptors the hole level, deep levels that of the layer's majority
 * carrier. Stateless after construction: every result goes
 * into caller arrays or a caller-owned {@link PointDensities}, so one instance may serve many
 * threads.
 */
final class ChargeModel {
    private final Device d;
    private final double invVt;

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
     * @param q      receives the box charges (C/m^2)
     * @param dq     receives their derivatives (C/m^2 per V)
     * @param cell   scratch for one half-cell's densities
     */
    void evaluate(double[] phi, double[] phiRef, QuantumStates qs, double[] q, double[] dq, PointDensities cell) {
        int nn = d.n;
        boolean quantum = qs != null;
        for (int i = 0; i < nn; i++) {
            boolean skipN = quantum && d.quantumNode[i];
            boolean skipP = skipN && qs.holes != null;
            double qi = 0;
            double dqi = 0;
            if (d.sameCellsAround[i]) {
                // both half-boxes hold the same material: one evaluation serves the whole box
                half(i, phi[i], skipN, skipP, cell);
                double w = 0.5 * (d.h[i - 1] + d.h[i]);
                qi += w * (cell.p - cell.n + cell.donors - cell.acceptors);
                dqi += w * (cell.dp - cell.dn + cell.dDonors - cell.dAcceptors);
            } else if (i > 0) {
                half(i - 1, phi[i], skipN, skipP, cell);
                double w = 0.5 * d.h[i - 1];
                qi += w * (cell.p - cell.n + cell.donors - cell.acceptors);
                dqi += w * (cell.dp - cell.dn + cell.dDonors - cell.dAcceptors);
            }
            if (i < nn - 1 && !d.sameCellsAround[i]) {
                half(i, phi[i], skipN, skipP, cell);
                double w = 0.5 * d.h[i];
                qi += w * (cell.p - cell.n + cell.donors - cell.acceptors);
                dqi += w * (cell.dp - cell.dn + cell.dDonors - cell.dAcceptors);
            }
            if (d.deltaDensity[i] > 0) {
                double e = d.nodeEc(i) - phi[i];
                int c = i < nn - 1 ? i : i - 1; // the cell whose quasi-Fermi levels the sheet takes
                if (d.deltaIsDonor[i]) {
                    double x = (d.deltaEnergy[i] - e + d.efn[c]) * invVt;
                    qi += d.deltaDensity[i] * Ionization.ionizedDonorFraction(x, Ionization.DEFAULT_DONOR_DEGENERACY);
                    dqi += d.deltaDensity[i]
                            * Ionization.ionizedDonorFractionDerivative(x, Ionization.DEFAULT_DONOR_DEGENERACY) * invVt;
                } else {
                    double x = (e - gapAt(i) + d.deltaEnergy[i] - d.efp[c]) * invVt;
                    qi -= d.deltaDensity[i] * Ionization.ionizedAcceptorFraction(x, Ionization.DEFAULT_ACCEPTOR_DEGENERACY);
                    // dx/dphi = -1/kT, and the sheet's charge is -N f(x)
                    dqi += d.deltaDensity[i]
                            * Ionization.ionizedAcceptorFractionDerivative(x, Ionization.DEFAULT_ACCEPTOR_DEGENERACY) * invVt;
                }
            }
            if (i == 0 && d.surfaceDonorDensity > 0) {
                // donor-like surface states at E_c(0) - E_s (Ibbetson et al. 2000), degeneracy 1
                double x = (d.surfaceDonorEnergy - (d.ec[0] - phi[0]) + d.efn[0]) * invVt;
                qi += d.surfaceDonorDensity * Ionization.donorLikeTrapChargedFraction(x, 1);
                dqi += d.surfaceDonorDensity * Ionization.donorLikeTrapChargedFractionDerivative(x, 1) * invVt;
            }
            if (skipN) {
                SubbandDensity.atNode(d, qs, i, phi[i], phiRef[i], cell);
                double box = d.box(i);
                qi -= box * cell.n;
                dqi -= box * cell.dn;
                if (skipP) {
                    qs.holes.atNode(d, i, phi[i], phiRef[i], cell);
                    qi += box * cell.p;
                    dqi += box * cell.dp;
                }
            }
            q[i] = Device.Q * (qi + d.fixedSheet[i]);
            dq[i] = Device.Q * dqi;
        }
        for (int k = 0; k < d.sheetNode.length; k++) {
            int i = d.sheetNode[k];
            q[i] += Device.Q * stateCharge(d, k, phi[i]);
            dq[i] += Device.Q * stateChargeDerivative(d, k, phi[i]);
        }
    }

    /**
     * Interface states of sheet k: donor-like states are +e when empty (1 - f), acceptor-like states
     * -e when filled (f), with f the Fermi-Dirac occupancy at the sheet's Fermi level.
     *
     * @param d       the device
     * @param k       the sheet of states
     * @param phiNode the potential at its node (V)
     * @return the states' charge divided by e (m^-2), signed
     */
    static double stateCharge(Device d, int k, double phiNode) {
        double ecSheet = d.ec[d.sheetNode[k]] - phiNode; // the nitride's E_c: the cell below the node
        double invVt = 1 / d.vt;
        double sum = 0;
        for (int j = d.sheetStart[k]; j < d.sheetStart[k + 1]; j++) {
            double f = 1 / (1 + Math.exp((ecSheet - d.stateBelowEc[j] - d.sheetFermiEv[k]) * invVt));
            sum += d.stateDonorLike[j] ? d.stateWeight[j] * (1 - f) : -d.stateWeight[j] * f;
        }
        return sum;
    }

    /** @return d(stateCharge)/dphi (m^-2 per V): with dx/dphi = -1/kT and df/dx = -f(1 - f), both kinds lose charge as phi rises */
    static double stateChargeDerivative(Device d, int k, double phiNode) {
        double ecSheet = d.ec[d.sheetNode[k]] - phiNode;
        double invVt = 1 / d.vt;
        double sum = 0;
        for (int j = d.sheetStart[k]; j < d.sheetStart[k + 1]; j++) {
            double f = 1 / (1 + Math.exp((ecSheet - d.stateBelowEc[j] - d.sheetFermiEv[k]) * invVt));
            sum -= d.stateWeight[j] * f * (1 - f) * invVt;
        }
        return sum;
    }

    private double gapAt(int i) {
        int k = i < d.n - 1 ? i : i - 1;
        return d.ec[k] - d.ev[k];
    }

    /**
     * Densities of one cell's material at node potential phi (m^-3) and derivatives (per V), into
     * every field of {@code out}.
     */
    private void half(int k, double phi, boolean skipElectrons, boolean skipHoles, PointDensities out) {
        double ecn = d.ec[k] - phi;
        double evn = d.ev[k] - phi;
        double n = 0;
        double dn = 0;
        double fn = d.efn[k];
        double fp = d.efp[k];
        if (!skipElectrons) {
            double eta = (fn - ecn) * invVt;
            n = d.nc[k] * FermiDirac.f12(eta);
            dn = d.nc[k] * FermiDirac.fm12(eta) * invVt;
        }
        double p = 0;
        double dp = 0;
        if (!skipHoles) { // with quantum holes, holes inside a window come from the hole subbands
            double etaP = (evn - fp) * invVt;
            p = d.nv[k] * FermiDirac.f12(etaP);
            dp = -d.nv[k] * FermiDirac.fm12(etaP) * invVt;
        }
        double donors = 0;
        double dDonors = 0;
        double acceptors = 0;
        double dAcceptors = 0;
        int li = d.layerOfCell[k];
        double fDeep = d.deepFollowHoles[li] ? fp : fn; // deep levels: the majority carrier's level
        double[] dens = d.speciesDensity[li];
        for (int j = 0; j < dens.length; j++) {
            double e = d.speciesEnergy[li][j];
            double g = d.speciesDegeneracy[li][j];
            switch (d.speciesKind[li][j]) {
                case SHALLOW_DONOR -> { // shallow donor, E_D = E_c - e, x = (E_Fn - E_D)/kT
                    double x = (e - ecn + fn) * invVt;
                    donors += dens[j] * Ionization.ionizedDonorFraction(x, g);
                    dDonors += dens[j] * Ionization.ionizedDonorFractionDerivative(x, g) * invVt;
                }
                case SHALLOW_ACCEPTOR -> { // shallow acceptor, E_A = E_v + e, x = (E_A - E_Fp)/kT
                    double x = (evn + e - fp) * invVt;
                    acceptors += dens[j] * Ionization.ionizedAcceptorFraction(x, g);
                    dAcceptors -= dens[j] * Ionization.ionizedAcceptorFractionDerivative(x, g) * invVt;
                }
                case DONOR_LIKE_TRAP -> { // donor-like deep level at E_T = E_c - e, x = (E_F - E_T)/kT
                    double x = (e - ecn + fDeep) * invVt;
                    donors += dens[j] * Ionization.donorLikeTrapChargedFraction(x, g);
                    dDonors += dens[j] * Ionization.donorLikeTrapChargedFractionDerivative(x, g) * invVt;
                }
                case ACCEPTOR_LIKE_TRAP -> { // acceptor-like deep level at E_T = E_c - e
                    double x = (e - ecn + fDeep) * invVt;
                    acceptors += dens[j] * Ionization.acceptorLikeTrapChargedFraction(x, g);
                    dAcceptors += dens[j] * Ionization.acceptorLikeTrapChargedFractionDerivative(x, g) * invVt;
                }
                case FULLY_IONIZED_DONOR -> donors += dens[j]; // no dependence on the potential
                case FULLY_IONIZED_ACCEPTOR -> acceptors += dens[j];
            }
        }
        out.n = n;
        out.dn = dn;
        out.p = p;
        out.dp = dp;
        out.donors = donors;
        out.dDonors = dDonors;
        out.acceptors = acceptors;
        out.dAcceptors = dAcceptors;
    }

    /**
     * What a converged potential holds, for reporting: box-averaged densities (m^-3) and the box
     * charges of {@link #evaluate} (C/m^2). Fresh arrays, handed to the caller.
     *
     * @param electrons electrons, the classical part outside windows plus the subband part inside
     * @param holes     holes, the classical part outside windows plus the hole subbands inside
     * @param donors    ionised donors, including empty donor-like traps
     * @param acceptors ionised acceptors, including filled acceptor-like traps
     * @param boxCharge free charge per area in each node's box, delta sheets, surface states, fixed
     *                  interface charge and interface states included (C/m^2)
     */
    record Report(double[] electrons, double[] holes, double[] donors, double[] acceptors, double[] boxCharge) {
    }

    /**
     * Evaluates the charge model once for reporting.
     *
     * @param phi    potential (V)
     * @param phiRef potential at which the subbands were computed (V), or null without subbands
     * @param qs     the subbands, or null for classical electrons everywhere
     * @return densities and box charges at phi
     */
    Report report(double[] phi, double[] phiRef, QuantumStates qs) {
        int nn = d.n;
        PointDensities cell = new PointDensities();
        double[] q = new double[nn];
        evaluate(phi, phiRef, qs, q, new double[nn], cell);
        double[] nOut = new double[nn];
        double[] pOut = new double[nn];
        double[] donorsOut = new double[nn];
        double[] acceptorsOut = new double[nn];
        for (int i = 0; i < nn; i++) {
            boolean skipN = qs != null && d.quantumNode[i];
            boolean skipP = skipN && qs.holes != null;
            double sn = 0;
            double sp = 0;
            double sd = 0;
            double sa = 0;
            double wt = 0;
            if (i > 0) {
                half(i - 1, phi[i], skipN, skipP, cell);
                double w = 0.5 * d.h[i - 1];
                sn += w * cell.n;
                sp += w * cell.p;
                sd += w * cell.donors;
                sa += w * cell.acceptors;
                wt += w;
            }
            if (i < nn - 1) {
                half(i, phi[i], skipN, skipP, cell);
                double w = 0.5 * d.h[i];
                sn += w * cell.n;
                sp += w * cell.p;
                sd += w * cell.donors;
                sa += w * cell.acceptors;
                wt += w;
            }
            nOut[i] = sn / wt;
            pOut[i] = sp / wt;
            donorsOut[i] = sd / wt;
            acceptorsOut[i] = sa / wt;
            if (skipN) {
                SubbandDensity.atNode(d, qs, i, phi[i], phiRef[i], cell);
                nOut[i] += cell.n;
                if (skipP) {
                    qs.holes.atNode(d, i, phi[i], phiRef[i], cell);
                    pOut[i] += cell.p;
                }
            }
        }
        return new Report(nOut, pOut, donorsOut, acceptorsOut, q);
    }
}
