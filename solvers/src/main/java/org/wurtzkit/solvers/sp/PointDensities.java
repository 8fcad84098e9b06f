package org.wurtzkit.solvers.sp;

/**
 * Densities at one point of the stack (m^-3) and their derivatives with respect to the local
 * potential phi (m^-3 per V): the result of one evaluation by {@link ChargeModel} or
 * {@link SubbandDensity}. Caller-owned scratch: the evaluating method overwrites the fields it
 * names, so one instance serves every node of a sweep over the mesh without allocation.
 */
final class PointDensities {
    /** Electrons. */
    double n;
    /** dn/dphi. */
    double dn;
    /** Holes. */
    double p;
    /** dp/dphi. */
    double dp;
    /** Ionised donors and empty donor-like traps. */
    double donors;
    /** d(donors)/dphi. */
    double dDonors;
    /** Ionised acceptors and filled acceptor-like traps. */
    double acceptors;
    /** d(acceptors)/dphi. */
    double dAcceptors;
}
