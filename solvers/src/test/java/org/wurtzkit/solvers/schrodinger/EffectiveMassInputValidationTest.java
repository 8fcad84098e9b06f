package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Bad input must raise IllegalArgumentException naming the parameter, the value and the range. */
class EffectiveMassInputValidationTest {

    private static final double[] MESH = {0, 1e-9, 2e-9, 3e-9, 4e-9};
    private static final double[] MASS = {0.2, 0.2, 0.2, 0.2};

    static void assertMessage(Executable call, String... parts) {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, call);
        for (String part : parts) {
            assertTrue(ex.getMessage().contains(part), "message '" + ex.getMessage() + "' lacks '" + part + "'");
        }
    }

    @Test
    void meshMustBeStrictlyIncreasingFiniteAndLongEnough() {
        assertMessage(() -> EffectiveMassHamiltonian.of(new double[] {0, 2e-9, 2e-9, 3e-9}, new double[] {1, 1, 1}),
                "meshMetres[2] = 2.0E-9", "(2.0E-9, +Infinity)", "strictly increasing");
        assertMessage(() -> EffectiveMassHamiltonian.of(new double[] {0, 2e-9, 1e-9}, new double[] {1, 1}),
                "meshMetres[2] = 1.0E-9");
        assertMessage(() -> EffectiveMassHamiltonian.of(new double[] {0, Double.NaN, 1e-9}, new double[] {1, 1}),
                "meshMetres[1] = NaN", "finite");
        assertMessage(() -> EffectiveMassHamiltonian.of(new double[] {0, 1e-9}, new double[] {1}),
                "meshMetres.length = 2", "[3, ");
        assertMessage(() -> EffectiveMassHamiltonian.of(null, MASS), "meshMetres = null");
    }

    @Test
    void massMustMatchTheIntervalsAndBePositive() {
        assertMessage(() -> EffectiveMassHamiltonian.of(MESH, new double[] {0.2, 0.2, 0.2}),
                "massRatio.length = 3", "[4, 4]");
        assertMessage(() -> EffectiveMassHamiltonian.of(MESH, new double[] {0.2, 0.0, 0.2, 0.2}),
                "massRatio[1] = 0.0", "(0, +Infinity)");
        assertMessage(() -> EffectiveMassHamiltonian.of(MESH, new double[] {0.2, 0.2, -0.1, 0.2}),
                "massRatio[2] = -0.1", "(0, +Infinity)");
        assertMessage(() -> EffectiveMassHamiltonian.of(MESH, new double[] {0.2, 0.2, 0.2, Double.NaN}),
                "massRatio[3] = NaN");
        assertMessage(() -> EffectiveMassHamiltonian.of(MESH, new double[] {0.2, Double.POSITIVE_INFINITY, 0.2, 0.2}),
                "massRatio[1] = Infinity");
    }

    @Test
    void potentialAndStateCountAreChecked() {
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(MESH, MASS);
        assertMessage(() -> h.lowest(new double[4], 1), "potentialEv.length = 4", "[5, 5]");
        assertMessage(() -> h.lowest(new double[] {0, 0, Double.NaN, 0, 0}, 1), "potentialEv[2] = NaN", "finite");
        assertMessage(() -> h.lowest(new double[] {0, 0, 0, 0, Double.NEGATIVE_INFINITY}, 1), "potentialEv[4] = -Infinity");
        assertMessage(() -> h.lowest(new double[5], 0), "k = 0 is outside the allowed range [1, 3]");
        assertMessage(() -> h.lowest(new double[5], 4), "k = 4 is outside the allowed range [1, 3]");
        assertMessage(() -> h.below(new double[5], 1.0, 0), "kMax = 0 is outside the allowed range [1, 3]");
        assertMessage(() -> h.below(new double[5], Double.NaN, 2), "energyBoundEv = NaN");
        assertMessage(() -> h.lowest(null, 1), "potentialEv = null");
        BoundStates b = h.lowest(new double[5], 2);
        assertMessage(() -> b.energy(2), "i = 2 is outside the allowed range [0, 1]");
        assertMessage(() -> b.amplitude(0, 5), "node = 5 is outside the allowed range [0, 4]");
    }
}
