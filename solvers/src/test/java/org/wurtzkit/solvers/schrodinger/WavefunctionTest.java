package org.wurtzkit.solvers.schrodinger;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

/** Properties of the wavefunctions: normalisation, orthogonality, parity, nodes, reuse. */
class WavefunctionTest {

    /**
     * Orthonormality in the box-width-weighted inner product sum_i psi_a psi_b w_i = delta_ab,
     * which is the discrete counterpart of the L2 inner product for the box scheme (the
     * Hamiltonian is self-adjoint in it), on random graded meshes with random smooth potentials
     * and random mass steps.
     */
    @Property(tries = 30)
    void statesAreOrthonormalInTheWeightedInnerProduct(@ForAll @IntRange(min = 20, max = 600) int cells,
                                                       @ForAll @DoubleRange(min = -3, max = 3) double grading,
                                                       @ForAll @DoubleRange(min = 0.05, max = 1.0) double massStep,
                                                       @ForAll @IntRange(min = 1, max = 10) int kRequested) {
        double[] z = Reference.graded(0, 20 * Reference.NM, cells, grading == 0 ? 1e-3 : grading);
        double[] mass = new double[cells];
        double[] v = new double[cells + 1];
        for (int i = 0; i < cells; i++) {
            mass[i] = i < cells / 3 ? 0.2 : 0.2 + massStep;
        }
        for (int i = 0; i <= cells; i++) {
            double x = z[i] / (20 * Reference.NM);
            v[i] = 0.3 * Math.sin(7 * x) + 0.5 * x;
        }
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(z, mass);
        int k = Math.min(kRequested, h.maxStates());
        BoundStates s = h.lowest(v, k);
        double[] w = h.boxWidths();
        for (int a = 0; a < k; a++) {
            assertEquals(0.0, s.amplitude(a, 0), 0.0);
            assertEquals(0.0, s.amplitude(a, cells), 0.0);
            for (int b = 0; b <= a; b++) {
                double dot = 0.0;
                for (int i = 0; i <= cells; i++) {
                    dot += s.amplitude(a, i) * s.amplitude(b, i) * w[i];
                }
                assertEquals(a == b ? 1.0 : 0.0, dot, 1e-10, "<psi" + a + "|psi" + b + ">_w");
            }
        }
    }

    @Test
    void statesOfASymmetricWellHaveAlternatingParityAndNodeCount() {
        // 5 nm well, 0.4 eV deep, mass step 0.20/0.25, on a mirror-symmetric mesh: the states
        // are alternately even and odd (common practice, no source: [H, P] = 0 and the levels
        // are simple in 1D), and state n has n interior sign changes (Sturm oscillation theorem,
        // e.g. F. V. Atkinson, Discrete and Continuous Boundary Problems, Academic Press 1964
        // [from memory]).
        double[][] s = FiniteWellMassStepTest.structure(5.0, 0.4, 0.20, 0.25, 0.05, true);
        double[] z = s[0];
        int n = z.length;
        for (int i = 0; i < n; i++) {
            assertEquals(-z[n - 1 - i], z[i], 1e-22, "mesh must be mirror symmetric");
        }
        BoundStates b = EffectiveMassHamiltonian.of(z, s[2]).lowest(s[1], 5);
        for (int st = 0; st < 5; st++) {
            double[] psi = b.wavefunction(st);
            double max = 0.0;
            for (double p : psi) {
                max = Math.max(max, Math.abs(p));
            }
            double parity = st % 2 == 0 ? 1.0 : -1.0;
            for (int i = 0; i < n; i++) {
                assertEquals(parity * psi[i], psi[n - 1 - i], 1e-9 * max, "state " + st + " node " + i);
            }
            int signChanges = 0;
            double last = 0.0;
            for (int i = 1; i < n - 1; i++) {
                if (Math.abs(psi[i]) > 1e-8 * max) {
                    if (last != 0.0 && Math.signum(psi[i]) != Math.signum(last)) {
                        signChanges++;
                    }
                    last = psi[i];
                }
            }
            assertEquals(st, signChanges, "sign changes of state " + st);
        }
    }

    @Test
    void normalisationGivesUnitsOfInverseSquareRootMetre() {
        // Infinite well ground state: psi = sqrt(2/L) sin(pi z / L), peak sqrt(2/L) (exact).
        double l = 10 * Reference.NM;
        double[] z = Reference.uniform(0, l, 400);
        BoundStates b = EffectiveMassHamiltonian.of(z, Reference.filled(400, 0.067)).lowest(new double[401], 1);
        double peak = b.amplitude(0, 200);
        assertEquals(Math.sqrt(2 / l), peak, 1e-4 * Math.sqrt(2 / l));
        assertTrue(b.amplitude(0, 100) > 0, "ground state is positive");
    }

    @Test
    void preparedHamiltonianCanBeReusedForNewPotentials() {
        double[][] s = FiniteWellMassStepTest.structure(3.0, 0.5, 0.20, 0.30, 0.05, false);
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(s[0], s[2]);
        double[] tilted = s[1].clone();
        for (int i = 0; i < tilted.length; i++) {
            tilted[i] += 2e7 * (s[0][i] - s[0][0]); // 0.2 MV/cm tilt
        }
        BoundStates first = h.lowest(s[1], 4);
        BoundStates second = h.lowest(tilted, 3);
        BoundStates third = h.below(s[1], 0.5, 6);
        BoundStates freshSecond = EffectiveMassHamiltonian.of(s[0], s[2]).lowest(tilted, 3);
        assertArrayEquals(freshSecond.energies(), second.energies(), 0.0);
        for (int i = 0; i < 3; i++) {
            assertArrayEquals(freshSecond.wavefunction(i), second.wavefunction(i), 0.0);
        }
        assertEquals(2, third.size());
        // Same levels; bisection starts from another upper bracket, so agreement is to the
        // bisection tolerance rather than bit for bit.
        assertArrayEquals(new double[] {first.energy(0), first.energy(1)}, third.energies(), 1e-12);
        // The tilt changes the levels (the test above is not vacuous).
        assertTrue(Math.abs(second.energy(0) - first.energy(0)) > 1e-3);
        // Results are immutable: changing a returned copy does not change the result.
        double[] copy = first.wavefunction(0);
        copy[5] = 42;
        assertTrue(first.amplitude(0, 5) != 42);
    }

    @Test
    void belowReturnsNothingUnderTheWellBottom() {
        double[][] s = FiniteWellMassStepTest.structure(5.0, 0.4, 0.20, 0.20, 0.1, false);
        BoundStates none = EffectiveMassHamiltonian.of(s[0], s[2]).below(s[1], 0.0, 5);
        assertEquals(0, none.size());
        assertEquals(0, none.energies().length);
    }
}
