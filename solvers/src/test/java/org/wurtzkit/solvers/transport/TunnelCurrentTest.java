package org.wurtzkit.solvers.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.units.Constants;

/** The Tsu-Esaki integral against thermionic emission, Fowler-Nordheim and itself at tighter accuracy. */
class TunnelCurrentTest {
    private static final double Q = Constants.ELEMENTARY_CHARGE;

    /**
     * q m* k T / (2 pi^2 hbar^3) = A* T / k_B with A* = 4 pi q m* k^2 / h^3: pure algebra with
     * hbar = h / (2 pi) (R. Tsu and L. Esaki, Appl. Phys. Lett. 22, 562 (1973) against S. M. Sze and
     * K. K. Ng, Physics of Semiconductor Devices, 3rd ed. (2007), ch. 3).
     */
    @Test
    void prefactorIsRichardsonTimesTOverK() {
        for (double m : new double[] {0.2, 0.32, 1.0}) {
            for (double t : new double[] {77, 300, 600}) {
                double expected = ThermionicEmission.richardsonConstant(m) * t / Constants.BOLTZMANN;
                assertEquals(expected, TunnelCurrent.prefactor(m, t), 1e-14 * expected);
            }
        }
    }

    /**
     * A* = 120.17 A cm^-2 K^-2 for the free-electron mass, computed from the CODATA 2018 constants
     * (Sze and Ng, above, quote 120 A cm^-2 K^-2); A* scales with m*: 26.4 for m* = 0.22 (the value
     * quoted for n-GaN by Peta et al., Microelectron. Eng. 93, 100 (2012), from its abstract).
     */
    @Test
    void richardsonConstantOfFreeElectronsAndGaN() {
        assertEquals(120.17e4, ThermionicEmission.richardsonConstant(1.0), 0.01e4);
        assertEquals(26.4e4, ThermionicEmission.richardsonConstant(0.22), 0.05e4);
    }

    /**
     * T(E) = 1 above a barrier top and Boltzmann statistics give back thermionic emission, J = A* T^2
     * exp(-phi/kT) (1 - exp(-qV/kT)) for the net flux between Fermi levels 0 and -V below a top at phi
     * (Sze and Ng, above; the identity checked above). With phi &ge; 0.6 eV the Fermi-Dirac correction
     * is below e^{-phi/kT} &lt; 1e-10, the cut-off 40 kT above the top leaves e^{-40}, so the
     * over-the-top part must agree to the quadrature accuracy (1e-8 per panel; 1e-7 allowed).
     */
    @Test
    void overTheTopPartIsThermionicEmission() {
        for (double t : new double[] {200, 300, 450}) {
            double kT = Constants.BOLTZMANN_EV * t;
            for (double phi : new double[] {0.6, 1.0}) {
                TunnelBarrier b = TunnelBarrier.rectangular(phi, 40 * NM, 0.2);
                for (double v : new double[] {0.05, 0.3, 3.0}) {
                    TunnelCurrent.Result r = TunnelCurrent.leftToRight(new WkbTransmission(b), 0, -v, 0.2, t, 1e-8);
                    double te = ThermionicEmission.richardsonConstant(0.2) * t * t * Math.exp(-phi / kT)
                            * -Math.expm1(-v / kT);
                    assertEquals(te, r.overTheTop(), 1e-7 * te, "T " + t + " K, phi " + phi + " eV, V " + v + " V");
                    assertTrue(r.tunnelling() >= 0, "no negative tunnelling current");
                }
            }
        }
    }

    /** Swapping the leads' Fermi levels reverses the current; equal Fermi levels carry none. */
    @Test
    void currentIsOddInTheFermiLevelDifference() {
        TunnelBarrier b = TunnelBarrier.triangular(0.8, 1.5e8, -2, -2.5, 0.3);
        Transmission t = new WkbTransmission(b);
        TunnelCurrent.Result ab = TunnelCurrent.leftToRight(t, 0.1, -0.2, 0.2, 300, 1e-8);
        TunnelCurrent.Result ba = TunnelCurrent.leftToRight(t, -0.2, 0.1, 0.2, 300, 1e-8);
        assertEquals(ab.total(), -ba.total(), 1e-7 * ab.total());
        assertTrue(ab.tunnelling() > 0 && ab.overTheTop() > 0);
        assertEquals(0, TunnelCurrent.leftToRight(t, 0.1, 0.1, 0.2, 300, 1e-8).total());
    }

    /**
     * Fowler-Nordheim emission from a metal (free-electron supply, m0) through a triangular barrier
     * of height phi and mass m*: J = A F^2 exp(-B/F) with A = q^3 m0 / (8 pi h phi m*) and
     * B = 8 pi sqrt(2 m*) (q phi)^{3/2} / (3 q h) (R. H. Fowler and L. Nordheim, Proc. R. Soc. Lond.
     * A 119, 173 (1928), in the form of M. Lenzlinger and E. H. Snow, J. Appl. Phys. 40, 278 (1969),
     * from memory). Check values computed from these formulas: phi = 1 eV, m* = 0.30: A = 5.14e-6
     * A/V^2, B = 3.74e7 V/cm, J(3 MV/cm) = 177 A/cm^2.
     *
     * <p>The closed form linearises the WKB exponent -(B/F)(1 + y)^{3/2} in y = (depth below the Fermi
     * level)/phi. Keeping the next terms of (1 + y)^{3/2} = 1 + 3y/2 + 3y^2/8 - y^3/16 and expanding
     * in x = F/B gives J / J_FN = 1 - x + (19/9) x^2 + O(x^3) (derived for this test); the third
     * order is allowed as 6 x^3 (its coefficient not derived). At 10 K the finite-temperature factor
     * pi c kT / sin(pi c kT) differs from 1 by at most 1e-3 here (from memory), inside the allowance.
     */
    @Test
    void fowlerNordheimCurrentOfATriangularBarrier() {
        double phi = 1.0;
        double m = 0.3;
        double a = Q * Q * Q / (8 * Math.PI * Constants.PLANCK * phi * Q * m);
        double bb = 8 * Math.PI * Math.sqrt(2 * m * Constants.ELECTRON_MASS) * Math.pow(Q * phi, 1.5)
                / (3 * Q * Constants.PLANCK);
        assertEquals(5.14e-6, a, 0.005e-6);
        assertEquals(3.74e9, bb, 0.005e9);
        assertEquals(177e4, a * 9e16 * Math.exp(-bb / 3e8), 0.5e4);
        double[] fields = {2e8, 2.5e8, 3e8, 3.5e8, 4e8};
        double[] j = new double[fields.length];
        for (int i = 0; i < fields.length; i++) {
            double f = fields[i];
            TunnelBarrier b = TunnelBarrier.triangular(phi, f, -10, -10, m);
            j[i] = TunnelCurrent.leftToRight(new WkbTransmission(b), 0, -5, 1.0, 10, 1e-8).total();
            double fn = a * f * f * Math.exp(-bb / f);
            double x = f / bb;
            assertEquals(1 - x + 19.0 / 9 * x * x, j[i] / fn, 6 * x * x * x, "J / J_FN at " + f + " V/m");
        }
        // Fowler-Nordheim slope: d ln(J/F^2) / d(1/F) = -B (1 - (F/B)^2) with the same correction
        double slope = (Math.log(j[3] / (fields[3] * fields[3])) - Math.log(j[1] / (fields[1] * fields[1])))
                / (1 / fields[3] - 1 / fields[1]);
        assertEquals(-bb, slope, 0.02 * bb);
    }

    /**
     * The integral converges: a reverse-biased trapezoid (a 20 nm AlGaN-like barrier under 2 MV/cm)
     * integrated at relative accuracy 1e-4 and 1e-6 agrees with 1e-10 to those accuracies (factor 3
     * for the summing of panels).
     */
    @Test
    void integralConvergesWithTheRequestedAccuracy() {
        double[] x = {0, 20 * NM, 20 * NM, 30 * NM};
        double[] u = {6.0, 2.0, 1.6, 1.0};
        TunnelBarrier b = TunnelBarrier.of(x, u, new double[] {0.3, 0.2, 0.2}, -5, 0.3, 1.0, 0.2);
        Transmission t = new WkbTransmission(b);
        TunnelCurrent.Result ref = TunnelCurrent.leftToRight(t, 5.0, 0.0, 0.3, 300, 1e-10);
        for (double acc : new double[] {1e-4, 1e-6}) {
            TunnelCurrent.Result r = TunnelCurrent.leftToRight(t, 5.0, 0.0, 0.3, 300, acc);
            assertEquals(ref.tunnelling(), r.tunnelling(), 3 * acc * ref.tunnelling(), "accuracy " + acc);
            assertTrue(r.evaluations() < ref.evaluations());
        }
        assertTrue(ref.tunnelling() > 1e6 * ref.overTheTop(), "a 6 eV top carries nothing over it at 300 K");
    }

    @Test
    void temperatureOutOfRangeIsRefused() {
        Transmission t = new WkbTransmission(TunnelBarrier.rectangular(1, 2 * NM, 0.2));
        for (double bad : new double[] {5, 1500, Double.NaN}) {
            InvalidParameterException e = assertThrows(InvalidParameterException.class,
                    () -> TunnelCurrent.leftToRight(t, 0, -1, 0.2, bad, 1e-6));
            assertTrue(e.getMessage().contains("temperature") && e.getMessage().contains("[10, 1000]"), e.getMessage());
        }
        assertThrows(InvalidParameterException.class, () -> TunnelCurrent.leftToRight(t, 0, -1, 0.2, 300, 0.5));
        assertThrows(InvalidParameterException.class, () -> ThermionicEmission.richardsonConstant(-1));
    }
}
