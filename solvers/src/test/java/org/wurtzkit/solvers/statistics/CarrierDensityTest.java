package org.wurtzkit.solvers.statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Checks of {@link CarrierDensity}. */
class CarrierDensityTest {

    private static final double CM3 = 1e6; // m^-3 per cm^-3
    private static final double CM2 = 1e4; // m^-2 per cm^-2

    // ---------------------------------------------------------------------------------------
    // Values computed by the project from the textbook formulas (kT/q; Nc = 2 (2 pi m kT / h^2)^{3/2};
    // m / (pi hbar^2), T. Ando, A. B. Fowler, F. Stern, Rev. Mod. Phys. 54, 437 (1982)) with
    // CODATA 2018 constants (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)), each asserted to half a unit of its last printed digit.
    // ---------------------------------------------------------------------------------------

    @Test
    void thermalVoltageAt300K() {
        // kT/q(300 K) = 25.852 mV (computed).
        assertEquals(25.852e-3, CarrierDensity.thermalEnergyEv(300.0), 0.0005e-3);
    }

    @Test
    void effectiveDensityOfStatesAt300K() {
        // Nc(300 K) = 2.24e18 cm^-3 (m* = 0.20) and 2.59e18 cm^-3 (m* = 0.22) (computed).
        assertEquals(2.24e18 * CM3, CarrierDensity.effectiveDensityOfStates(0.20, 300.0), 0.005e18 * CM3);
        assertEquals(2.59e18 * CM3, CarrierDensity.effectiveDensityOfStates(0.22, 300.0), 0.005e18 * CM3);
    }

    @Test
    void twoDimensionalDensityOfStates() {
        // m* / (pi hbar^2) = 8.355e13 (m* = 0.20), 9.190e13 (0.22) cm^-2 eV^-1 (computed).
        assertEquals(8.355e13 * CM2, CarrierDensity.subbandDensityOfStates(0.20, 1), 0.0005e13 * CM2);
        assertEquals(9.190e13 * CM2, CarrierDensity.subbandDensityOfStates(0.22, 1), 0.0005e13 * CM2);
        // Valley degeneracy multiplies the density of states (Ando, Fowler, Stern 1982).
        assertEquals(6 * CarrierDensity.subbandDensityOfStates(0.2, 1),
                CarrierDensity.subbandDensityOfStates(0.2, 6), 1e-15 * CarrierDensity.subbandDensityOfStates(0.2, 6));
    }

    /**
     * Computed here from the A00 Fermi level E_F = E0 + pi hbar^2 n_s / m* (Ambacher et al., J. Appl.
     * Phys. 87, 334 (2000), from memory): in the A00 model with m* = 0.22 and n_s = 1e13 cm^-2, E_F - E0 =
     * 0.1088 eV. At low temperature one subband holds n = D (E_F - E0); the four printed digits
     * of 0.1088 allow 4.6e-4 relative.
     */
    @Test
    void degenerateSubbandMatchesSheetDensityOfReferences56() {
        double dos = CarrierDensity.subbandDensityOfStates(0.22, 1);
        double kT = CarrierDensity.thermalEnergyEv(1.0);
        double ns = CarrierDensity.subbandSheetDensity(dos, 0.1088, 0.0, kT);
        assertEquals(1e13 * CM2, ns, 4.6e-4 * 1e13 * CM2);
    }

    /** N ~ (m T)^(3/2): exact scaling of 2 (2 pi m kT/h^2)^(3/2). */
    @Property(tries = 200)
    void effectiveDensityOfStatesScaling(@ForAll @DoubleRange(min = 0.05, max = 3.0) double m,
            @ForAll @DoubleRange(min = 1.0, max = 1000.0) double t) {
        double base = CarrierDensity.effectiveDensityOfStates(m, t);
        assertEquals(Math.pow(2.0, 1.5) * base, CarrierDensity.effectiveDensityOfStates(m, 2 * t), 1e-14 * base);
        assertEquals(Math.pow(3.0, 1.5) * base, CarrierDensity.effectiveDensityOfStates(3 * m, t), 1e-14 * base);
    }

    // ---------------------------------------------------------------------------------------
    // Bulk densities.
    // ---------------------------------------------------------------------------------------

    /** Boltzmann limit n = Nc exp((E_F - E_c)/kT) when E_c - E_F &gt;&gt; kT (Sze &amp; Ng 2007, ch. 1). */
    @Test
    void nonDegenerateLimit() {
        double nc = CarrierDensity.effectiveDensityOfStates(0.2, 300.0);
        double kT = CarrierDensity.thermalEnergyEv(300.0);
        double n = CarrierDensity.electronDensity(nc, 0.0, 1.0, kT); // E_c 1 eV above E_F
        double boltzmann = nc * Math.exp(-1.0 / kT);
        assertEquals(boltzmann, n, 1e-14 * boltzmann);
        double p = CarrierDensity.holeDensity(nc, 0.0, -1.0, kT);
        assertEquals(boltzmann, p, 1e-14 * boltzmann);
    }

    /** Electron-hole mirror symmetry: p(E_F, E_v) = n(-E_F, -E_v) with the same N (exact). */
    @Property(tries = 300)
    void holeIsMirrorOfElectron(@ForAll @DoubleRange(min = -2.0, max = 2.0) double ef,
            @ForAll @DoubleRange(min = -2.0, max = 2.0) double edge) {
        double n0 = 3e24;
        double kT = 0.025852;
        assertEquals(CarrierDensity.electronDensity(n0, -ef, -edge, kT), CarrierDensity.holeDensity(n0, ef, edge, kT), 0.0);
        assertEquals(-CarrierDensity.electronDensityDerivativeEc(n0, -ef, -edge, kT),
                CarrierDensity.holeDensityDerivativeEv(n0, ef, edge, kT), 0.0);
        assertEquals(n0 * FermiDirac.f12((ef - edge) / kT), CarrierDensity.electronDensity(n0, ef, edge, kT), 0.0);
    }

    /** dn/dE_c and dp/dE_v against Richardson-extrapolated central differences. */
    @Property(tries = 300)
    void bulkDerivativesMatchFiniteDifferences(@ForAll @DoubleRange(min = -0.8, max = 1.5) double efMinusEc) {
        double nc = 2.2e24;
        double kT = 0.025852;
        double ec = 0.3;
        double ef = ec + efMinusEc;
        double h = 1e-4; // eV, about kT/260
        double d1 = (CarrierDensity.electronDensity(nc, ef, ec + h, kT) - CarrierDensity.electronDensity(nc, ef, ec - h, kT)) / (2 * h);
        double d2 = (CarrierDensity.electronDensity(nc, ef, ec + h / 2, kT)
                - CarrierDensity.electronDensity(nc, ef, ec - h / 2, kT)) / h;
        double numeric = (4 * d2 - d1) / 3;
        double analytic = CarrierDensity.electronDensityDerivativeEc(nc, ef, ec, kT);
        assertTrue(analytic < 0);
        assertEquals(analytic, numeric, 1e-7 * Math.abs(analytic));

        double ev = ef - efMinusEc; // same reduced argument for holes
        double e1 = (CarrierDensity.holeDensity(nc, ef, ev + h, kT) - CarrierDensity.holeDensity(nc, ef, ev - h, kT)) / (2 * h);
        double e2 = (CarrierDensity.holeDensity(nc, ef, ev + h / 2, kT) - CarrierDensity.holeDensity(nc, ef, ev - h / 2, kT)) / h;
        double numericP = (4 * e2 - e1) / 3;
        double analyticP = CarrierDensity.holeDensityDerivativeEv(nc, ef, ev, kT);
        assertTrue(analyticP > 0);
        assertEquals(analyticP, numericP, 1e-7 * analyticP);
    }

    // ---------------------------------------------------------------------------------------
    // 2D subband.
    // ---------------------------------------------------------------------------------------

    /** At E_F = E_k, n_k = D kT ln 2; far below, n_k = D kT e^eta (Ando, Fowler, Stern 1982). */
    @Test
    void subbandLimits() {
        double dos = CarrierDensity.subbandDensityOfStates(0.2, 1);
        double kT = 0.025852;
        assertEquals(dos * kT * Math.log(2.0), CarrierDensity.subbandSheetDensity(dos, 0.5, 0.5, kT),
                1e-15 * dos * kT);
        double boltzmann = dos * kT * Math.exp(-1.0 / kT);
        assertEquals(boltzmann, CarrierDensity.subbandSheetDensity(dos, 0.0, 1.0, kT), 1e-13 * boltzmann);
        // Degenerate: n = D (E_F - E_k) (1 + O(kT e^-eta / (E_F - E_k))).
        double deg = CarrierDensity.subbandSheetDensity(dos, 1.0, 0.0, kT);
        assertEquals(dos * 1.0, deg, 1e-15 * dos);
        // No overflow far above the subband (eta = 4e4).
        assertEquals(dos * 1000.0, CarrierDensity.subbandSheetDensity(dos, 1000.0, 0.0, kT), 1e-12 * dos * 1000);
    }

    @Property(tries = 300)
    void subbandDerivativeMatchesFiniteDifference(@ForAll @DoubleRange(min = -0.5, max = 0.5) double efMinusEk) {
        double dos = CarrierDensity.subbandDensityOfStates(0.2, 1);
        double kT = 0.025852;
        double ek = -0.1;
        double ef = ek + efMinusEk;
        double h = 1e-4;
        double d1 = (CarrierDensity.subbandSheetDensity(dos, ef, ek + h, kT)
                - CarrierDensity.subbandSheetDensity(dos, ef, ek - h, kT)) / (2 * h);
        double d2 = (CarrierDensity.subbandSheetDensity(dos, ef, ek + h / 2, kT)
                - CarrierDensity.subbandSheetDensity(dos, ef, ek - h / 2, kT)) / h;
        double numeric = (4 * d2 - d1) / 3;
        double analytic = CarrierDensity.subbandSheetDensityDerivativeEk(dos, ef, ek, kT);
        assertTrue(analytic < 0);
        assertEquals(analytic, numeric, 1e-7 * Math.abs(analytic));
        assertEquals(-dos * FermiDirac.logistic(efMinusEk / kT), analytic, 1e-12 * dos);
    }

    // ---------------------------------------------------------------------------------------
    // Bad input.
    // ---------------------------------------------------------------------------------------

    private static void assertRejected(String expectedStart, Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().startsWith(expectedStart), e.getMessage());
        assertTrue(e.getMessage().contains("allowed range"), e.getMessage());
    }

    @Test
    void badInputIsRejected() {
        assertRejected("massRatio = -0.2", () -> CarrierDensity.effectiveDensityOfStates(-0.2, 300));
        assertRejected("massRatio = 0.0", () -> CarrierDensity.subbandDensityOfStates(0.0, 1));
        assertRejected("massRatio = NaN", () -> CarrierDensity.effectiveDensityOfStates(Double.NaN, 300));
        assertRejected("temperatureK = -300.0", () -> CarrierDensity.effectiveDensityOfStates(0.2, -300));
        assertRejected("temperatureK = 0.0", () -> CarrierDensity.thermalEnergyEv(0.0));
        assertRejected("temperatureK = Infinity", () -> CarrierDensity.thermalEnergyEv(Double.POSITIVE_INFINITY));
        assertRejected("valleyDegeneracy = 0", () -> CarrierDensity.subbandDensityOfStates(0.2, 0));
        assertRejected("ncPerM3 = -1.0", () -> CarrierDensity.electronDensity(-1.0, 0, 0, 0.0258));
        assertRejected("nvPerM3 = NaN", () -> CarrierDensity.holeDensity(Double.NaN, 0, 0, 0.0258));
        assertRejected("kTEv = 0.0", () -> CarrierDensity.electronDensityDerivativeEc(1e24, 0, 0, 0.0));
        assertRejected("kTEv = NaN", () -> CarrierDensity.subbandSheetDensity(1e17, 0, 0, Double.NaN));
        assertRejected("fermiEv = NaN", () -> CarrierDensity.electronDensity(1e24, Double.NaN, 0, 0.0258));
        assertRejected("conductionEdgeEv = NaN", () -> CarrierDensity.electronDensity(1e24, 0, Double.NaN, 0.0258));
        assertRejected("valenceEdgeEv = Infinity",
                () -> CarrierDensity.holeDensityDerivativeEv(1e24, 0, Double.POSITIVE_INFINITY, 0.0258));
        assertRejected("subbandEv = NaN", () -> CarrierDensity.subbandSheetDensityDerivativeEk(1e17, 0, Double.NaN, 0.0258));
        assertRejected("dosPerM2Ev = -1.0", () -> CarrierDensity.subbandSheetDensity(-1.0, 0, 0, 0.0258));
    }
}
