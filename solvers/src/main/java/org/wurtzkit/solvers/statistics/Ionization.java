package org.wurtzkit.solvers.statistics;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * Equilibrium occupancy of localised levels (shallow dopants and deep traps) with a ground-state
 * degeneracy factor g, in the form given by S. M. Sze and K. K. Ng, <i>Physics of Semiconductor
 * Devices</i>, 3rd ed. (Wiley, 2007), ch. 1 (section on carrier concentration and impurity
 * ionisation):
 *
 * <pre>
 *   N_D+/N_D = 1 / (1 + g_D exp((E_F - E_D)/kT)),     g_D = 2 by default,
 *   N_A-/N_A = 1 / (1 + g_A exp((E_A - E_F)/kT)),     g_A = 4 by default.
 * </pre>
 *
 * <p>Both are the same function f(x; g) = 1/(1 + g e^x) of a dimensionless argument x; the
 * derivatives df/dx = -f (1 - f) feed the Newton-Poisson Jacobian (with x depending on the
 * electrostatic potential through E_F - E_D or E_A - E_F, the caller multiplies by dx/dpotential).
 * The evaluation splits at x = 0 so that only e^-|x| is formed: nothing overflows for any finite or
 * infinite x, and 1 - f is never obtained by cancellation.
 *
 * <p>Deep levels use the same occupancy forms (Sze &amp; Ng, ch. 1): a donor-like trap is positive
 * when empty, with charged fraction f((E_F - E_T)/kT; g); an acceptor-like trap is negative when
 * filled, with charged fraction f((E_T - E_F)/kT; g). {@link #donorLikeTrapChargedFraction} and
 * {@link #acceptorLikeTrapChargedFraction} take the single argument (E_F - E_T)/kT for both.
 *
 * <p>All methods are allocation-free and meant for the per-node Newton loop; the argument checks
 * are two comparisons.
 */
public final class Ionization {

    private Ionization() {
    }

    /** Default donor ground-state degeneracy, {@link org.wurtzkit.structure.Dopant#DONOR_DEGENERACY} (2). */
    public static final double DEFAULT_DONOR_DEGENERACY = org.wurtzkit.structure.Dopant.DONOR_DEGENERACY;
    /** Default acceptor ground-state degeneracy, {@link org.wurtzkit.structure.Dopant#ACCEPTOR_DEGENERACY} (4). */
    public static final double DEFAULT_ACCEPTOR_DEGENERACY = org.wurtzkit.structure.Dopant.ACCEPTOR_DEGENERACY;

    /**
     * Ionised fraction of donors, N_D+/N_D = 1/(1 + g_D exp(x)) with x = (E_F - E_D)/kT (Sze &amp;
     * Ng 2007, ch. 1).
     *
     * @param x reduced level (E_F - E_D)/kT; any value except NaN
     * @param gD donor degeneracy factor, finite and &gt; 0 (default
     *           {@link #DEFAULT_DONOR_DEGENERACY})
     * @return N_D+/N_D in [0, 1]
     * @throws IllegalArgumentException if x is NaN or gD is not finite and positive
     */
    public static double ionizedDonorFraction(double x, double gD) {
        check(x, "x", gD, "gD");
        return occupancy(x, gD);
    }

    /**
     * d(N_D+/N_D)/dx for x = (E_F - E_D)/kT, equal to -f (1 - f) with f = N_D+/N_D (derivative of
     * the Sze &amp; Ng 2007 ch. 1 form). Always &le; 0.
     *
     * @param x reduced level (E_F - E_D)/kT; any value except NaN
     * @param gD donor degeneracy factor, finite and &gt; 0
     * @return derivative of the ionised fraction with respect to x, in [-1/4, 0]
     * @throws IllegalArgumentException if x is NaN or gD is not finite and positive
     */
    public static double ionizedDonorFractionDerivative(double x, double gD) {
        check(x, "x", gD, "gD");
        return occupancyDerivative(x, gD);
    }

    /**
     * Ionised fraction of acceptors, N_A-/N_A = 1/(1 + g_A exp(x)) with x = (E_A - E_F)/kT (Sze
     * &amp; Ng 2007, ch. 1).
     *
     * @param x reduced level (E_A - E_F)/kT; any value except NaN
     * @param gA acceptor degeneracy factor, finite and &gt; 0 (default
     *           {@link #DEFAULT_ACCEPTOR_DEGENERACY})
     * @return N_A-/N_A in [0, 1]
     * @throws IllegalArgumentException if x is NaN or gA is not finite and positive
     */
    public static double ionizedAcceptorFraction(double x, double gA) {
        check(x, "x", gA, "gA");
        return occupancy(x, gA);
    }

    /**
     * d(N_A-/N_A)/dx for x = (E_A - E_F)/kT, equal to -f (1 - f) with f = N_A-/N_A. Always &le; 0.
     *
     * @param x reduced level (E_A - E_F)/kT; any value except NaN
     * @param gA acceptor degeneracy factor, finite and &gt; 0
     * @return derivative of the ionised fraction with respect to x, in [-1/4, 0]
     * @throws IllegalArgumentException if x is NaN or gA is not finite and positive
     */
    public static double ionizedAcceptorFractionDerivative(double x, double gA) {
        check(x, "x", gA, "gA");
        return occupancyDerivative(x, gA);
    }

    /**
     * Positively charged (empty) fraction of a donor-like deep level at E_T, 1/(1 + g exp((E_F -
     * E_T)/kT)) (Sze &amp; Ng 2007, ch. 1, same form as a shallow donor).
     *
     * @param xFermiMinusTrap (E_F - E_T)/kT; any value except NaN
     * @param g degeneracy factor of the level, finite and &gt; 0
     * @return charged fraction in [0, 1]; the trap charge density is +q N_T times this
     * @throws IllegalArgumentException if the argument is NaN or g is not finite and positive
     */
    public static double donorLikeTrapChargedFraction(double xFermiMinusTrap, double g) {
        check(xFermiMinusTrap, "xFermiMinusTrap", g, "g");
        return occupancy(xFermiMinusTrap, g);
    }

    /**
     * d/d((E_F - E_T)/kT) of {@link #donorLikeTrapChargedFraction}; always &le; 0.
     *
     * @param xFermiMinusTrap (E_F - E_T)/kT; any value except NaN
     * @param g degeneracy factor of the level, finite and &gt; 0
     * @return derivative with respect to (E_F - E_T)/kT
     * @throws IllegalArgumentException if the argument is NaN or g is not finite and positive
     */
    public static double donorLikeTrapChargedFractionDerivative(double xFermiMinusTrap, double g) {
        check(xFermiMinusTrap, "xFermiMinusTrap", g, "g");
        return occupancyDerivative(xFermiMinusTrap, g);
    }

    /**
     * Negatively charged (filled) fraction of an acceptor-like deep level at E_T, 1/(1 + g exp((E_T
     * - E_F)/kT)) (Sze &amp; Ng 2007, ch. 1, same form as a shallow acceptor), written with the
     * argument (E_F - E_T)/kT.
     *
     * @param xFermiMinusTrap (E_F - E_T)/kT; any value except NaN
     * @param g degeneracy factor of the level, finite and &gt; 0
     * @return charged fraction in [0, 1]; the trap charge density is -q N_T times this
     * @throws IllegalArgumentException if the argument is NaN or g is not finite and positive
     */
    public static double acceptorLikeTrapChargedFraction(double xFermiMinusTrap, double g) {
        check(xFermiMinusTrap, "xFermiMinusTrap", g, "g");
        return occupancy(-xFermiMinusTrap, g);
    }

    /**
     * d/d((E_F - E_T)/kT) of {@link #acceptorLikeTrapChargedFraction}; always &ge; 0.
     *
     * @param xFermiMinusTrap (E_F - E_T)/kT; any value except NaN
     * @param g degeneracy factor of the level, finite and &gt; 0
     * @return derivative with respect to (E_F - E_T)/kT
     * @throws IllegalArgumentException if the argument is NaN or g is not finite and positive
     */
    public static double acceptorLikeTrapChargedFractionDerivative(double xFermiMinusTrap, double g) {
        check(xFermiMinusTrap, "xFermiMinusTrap", g, "g");
        return -occupancyDerivative(-xFermiMinusTrap, g);
    }

    // ---------------------------------------------------------------------------------------

    /** 1/(1 + g e^x) without overflow. */
    private static double occupancy(double x, double g) {
        if (x <= 0.0) {
            return 1.0 / (1.0 + g * Math.exp(x));
        }
        double e = Math.exp(-x);
        return e / (e + g);
    }

    /** d/dx 1/(1 + g e^x) = -f (1 - f), each factor formed without cancellation. */
    private static double occupancyDerivative(double x, double g) {
        if (x <= 0.0) {
            double q = g * Math.exp(x);
            double f = 1.0 / (1.0 + q);
            return -(f * q) * f;
        }
        double e = Math.exp(-x);
        double d = e + g;
        return -(e / d) * (g / d);
    }

    private static void check(double x, String xName, double g, String gName) {
        if (x != x) {
            throw new InvalidParameterException(xName, "NaN", "(-inf, +inf), not NaN");
        }
        if (!(g > 0.0 && g < Double.POSITIVE_INFINITY)) {
            throw new InvalidParameterException(gName, Double.toString(g), "(0, +inf), finite");
        }
    }
}
