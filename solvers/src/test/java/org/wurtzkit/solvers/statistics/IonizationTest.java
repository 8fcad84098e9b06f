package org.wurtzkit.solvers.statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * Checks of {@link Ionization} against the occupancy law of Sze &amp; Ng, Physics of Semiconductor
 * Devices, 3rd ed. (2007), ch. 1, N_D+/N_D = 1/(1 + g_D exp((E_F - E_D)/kT)) and N_A-/N_A = 1/(1 +
 * g_A exp((E_A - E_F)/kT)).
 */
class IonizationTest {

    private static final double GD = Ionization.DEFAULT_DONOR_DEGENERACY;
    private static final double GA = Ionization.DEFAULT_ACCEPTOR_DEGENERACY;

    @Test
    void defaultsAreThoseOfSzeAndNg() {
        assertEquals(2.0, GD);
        assertEquals(4.0, GA);
    }

    /** E_F far below E_D (x -&gt; -infinity): full ionisation, 1 - f = g e^x to first order. */
    @Test
    void fullIonisationWhenFermiLevelFarBelowDonor() {
        assertEquals(1.0, Ionization.ionizedDonorFraction(-40.0, GD), 1e-16);
        assertEquals(1.0, Ionization.ionizedDonorFraction(Double.NEGATIVE_INFINITY, GD));
        double x = -20.0;
        double f = Ionization.ionizedDonorFraction(x, GD);
        double q = GD * Math.exp(x);
        assertEquals(q, 1.0 - f, 1e-6 * q); // 1 - f = q/(1+q): relative difference q ~ 4e-9
        assertEquals(1.0, Ionization.ionizedAcceptorFraction(-40.0, GA), 1e-16);
    }

    /** E_F = E_D (or E_A): fraction 1/(1 + g). */
    @Test
    void fractionAtTheLevelIsOneOverOnePlusG() {
        assertEquals(1.0 / 3.0, Ionization.ionizedDonorFraction(0.0, GD), 1e-16);
        assertEquals(1.0 / 5.0, Ionization.ionizedAcceptorFraction(0.0, GA), 1e-16);
        assertEquals(1.0 / 2.0, Ionization.ionizedDonorFraction(0.0, 1.0), 1e-16);
    }

    /** E_F far above E_D: f = e^-x/g to first order; no overflow or NaN at any x. */
    @Test
    void freezeOutWithoutOverflow() {
        double x = 40.0;
        double expected = Math.exp(-x) / GD;
        assertEquals(expected, Ionization.ionizedDonorFraction(x, GD), 1e-15 * expected);
        assertEquals(0.0, Ionization.ionizedDonorFraction(800.0, GD));
        assertEquals(0.0, Ionization.ionizedDonorFractionDerivative(800.0, GD), 0.0);
        assertEquals(0.0, Ionization.ionizedDonorFraction(Double.POSITIVE_INFINITY, GD));
        assertEquals(0.0, Ionization.ionizedDonorFractionDerivative(-800.0, GD), 0.0);
        assertEquals(0.0, Ionization.ionizedAcceptorFractionDerivative(Double.POSITIVE_INFINITY, GA), 0.0);
    }

    /** Derivative against a Richardson-extrapolated central difference. */
    @Property(tries = 500)
    void derivativeMatchesFiniteDifference(@ForAll @DoubleRange(min = -30.0, max = 30.0) double x,
            @ForAll @DoubleRange(min = 0.5, max = 8.0) double g) {
        double h = 1e-3;
        double d1 = (Ionization.ionizedDonorFraction(x + h, g) - Ionization.ionizedDonorFraction(x - h, g)) / (2 * h);
        double d2 = (Ionization.ionizedDonorFraction(x + h / 2, g)
                - Ionization.ionizedDonorFraction(x - h / 2, g)) / h;
        double numeric = (4 * d2 - d1) / 3;
        double analytic = Ionization.ionizedDonorFractionDerivative(x, g);
        assertEquals(analytic, numeric, 1e-8 * Math.abs(analytic) + 1e-12); // 1e-12: rounding of f near 1, /h
        assertEquals(Ionization.ionizedDonorFractionDerivative(x, g),
                Ionization.ionizedAcceptorFractionDerivative(x, g), 0.0);
    }

    /** df/dx = -f (1 - f), and f(x) + f(-x - 2 ln g) = 1 (exact identities of 1/(1 + g e^x)). */
    @Property(tries = 500)
    void exactIdentities(@ForAll @DoubleRange(min = -50.0, max = 50.0) double x,
            @ForAll @DoubleRange(min = 0.5, max = 8.0) double g) {
        double f = Ionization.ionizedAcceptorFraction(x, g);
        double d = Ionization.ionizedAcceptorFractionDerivative(x, g);
        double oneMinusF = Ionization.ionizedAcceptorFraction(-x - 2 * Math.log(g), g);
        assertEquals(1.0, f + oneMinusF, 1e-15);
        assertEquals(-f * oneMinusF, d, 1e-13 * Math.abs(d) + 1e-300);
    }

    /** Deep levels: donor-like charged when empty, acceptor-like charged when filled. */
    @Property(tries = 300)
    void deepLevelsUseTheSameForms(@ForAll @DoubleRange(min = -40.0, max = 40.0) double xFermiMinusTrap) {
        double g = 2.0;
        assertEquals(Ionization.ionizedDonorFraction(xFermiMinusTrap, g),
                Ionization.donorLikeTrapChargedFraction(xFermiMinusTrap, g), 0.0);
        assertEquals(Ionization.ionizedAcceptorFraction(-xFermiMinusTrap, g),
                Ionization.acceptorLikeTrapChargedFraction(xFermiMinusTrap, g), 0.0);
        // Acceptor-like trap charge grows as E_F rises: derivative is >= 0 and matches a difference.
        double h = 1e-4;
        double numeric = (Ionization.acceptorLikeTrapChargedFraction(xFermiMinusTrap + h, g)
                - Ionization.acceptorLikeTrapChargedFraction(xFermiMinusTrap - h, g)) / (2 * h);
        double analytic = Ionization.acceptorLikeTrapChargedFractionDerivative(xFermiMinusTrap, g);
        assertTrue(analytic >= 0);
        assertEquals(analytic, numeric, 1e-6 * analytic + 1e-11);
        double donorAnalytic = Ionization.donorLikeTrapChargedFractionDerivative(xFermiMinusTrap, g);
        assertTrue(donorAnalytic <= 0);
        assertEquals(Ionization.ionizedDonorFractionDerivative(xFermiMinusTrap, g), donorAnalytic, 0.0);
    }

    /** An acceptor-like trap at the Fermi level with g = 1 is half filled. */
    @Test
    void halfFilledTrapAtFermiLevel() {
        assertEquals(0.5, Ionization.acceptorLikeTrapChargedFraction(0.0, 1.0), 1e-16);
        assertEquals(0.5, Ionization.donorLikeTrapChargedFraction(0.0, 1.0), 1e-16);
    }

    @Test
    void badInputIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Ionization.ionizedDonorFraction(Double.NaN, GD));
        assertTrue(e.getMessage().contains("x") && e.getMessage().contains("NaN"), e.getMessage());
        for (double g : new double[] {0.0, -2.0, Double.NaN, Double.POSITIVE_INFINITY}) {
            IllegalArgumentException eg = assertThrows(IllegalArgumentException.class,
                    () -> Ionization.ionizedDonorFraction(0.0, g));
            assertTrue(eg.getMessage().startsWith("gD = " + g), eg.getMessage());
            IllegalArgumentException ea = assertThrows(IllegalArgumentException.class,
                    () -> Ionization.ionizedAcceptorFractionDerivative(0.0, g));
            assertTrue(ea.getMessage().startsWith("gA = " + g), ea.getMessage());
            IllegalArgumentException et = assertThrows(IllegalArgumentException.class,
                    () -> Ionization.acceptorLikeTrapChargedFraction(0.0, g));
            assertTrue(et.getMessage().startsWith("g = " + g), et.getMessage());
        }
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> Ionization.donorLikeTrapChargedFractionDerivative(Double.NaN, 2.0));
        assertTrue(ex.getMessage().startsWith("xFermiMinusTrap = NaN"), ex.getMessage());
    }
}
