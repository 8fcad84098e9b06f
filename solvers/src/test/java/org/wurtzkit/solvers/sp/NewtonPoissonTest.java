package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.testing.StandardStacks;

/**
 * The Newton-Poisson solver and the failure paths of a solve: a failed inner or eigen step must end
 * the solve with a {@link NotConvergedException} that carries the record so far and a finite last
 * iterate (the contract of the solver's public methods; no published source needed).
 */
class NewtonPoissonTest {
    private static final SolverOptions CLASSICAL = SolverOptions.defaults().withQuantumWindows(QuantumWindows.none());

    /**
     * Driven directly from the solver's cold start, it reaches the public classical solve's potential
     * bit for bit, and the step count it returns is the one the solve records.
     */
    @Test
    void directSolveMatchesThePublicClassicalSolve() {
        Solution reference = new SelfConsistentSolver(CLASSICAL).solve(StandardStacks.referenceHemt(0));
        Device d = new Device(StandardStacks.referenceHemt(0), CLASSICAL);
        NewtonPoisson poisson = new NewtonPoisson(d, new ChargeModel(d), CLASSICAL);
        double[] phi = new double[d.n];
        Arrays.fill(phi, d.bottomDirichlet ? d.phiBottom : d.ec[d.n - 2] - 0.25);
        phi[0] = d.phiTop;
        if (d.bottomDirichlet) {
            phi[d.n - 1] = d.phiBottom;
        }
        int steps = poisson.solve(phi, null, null, CLASSICAL.newtonTolerance());
        assertEquals(reference.convergence().newtonIterations(), steps);
        assertArrayEquals(reference.potential(), phi, 0.0);
    }

    /** A step budget too small to converge: the record counts exactly the steps taken. */
    @Test
    void exhaustedStepBudgetCarriesTheRecordAndAFiniteIterate() {
        SelfConsistentSolver solver = new SelfConsistentSolver(CLASSICAL.withMaxNewtonIterations(3));
        NotConvergedException e = assertThrows(NotConvergedException.class, () -> solver.solve(StandardStacks.referenceHemt(0)));
        ConvergenceRecord r = e.record();
        assertEquals(ErrorKind.NOT_CONVERGED, e.kind());
        assertFalse(r.converged());
        assertEquals(3, r.newtonIterations());
        assertEquals(0, r.iterations());
        assertTrue(r.message().contains("not converged in 3 steps"), r.message());
        double[] last = e.lastPotential();
        assertEquals(e.lastDepth().length, last.length);
        for (double v : last) {
            assertTrue(Double.isFinite(v));
        }
    }

    /**
     * An eigen-solver failure (here the ArithmeticException that inverse iteration throws when it
     * does not converge) becomes a NotConvergedException with the outer iterations completed, the
     * Newton steps so far, the residual history up to then, the potential it was given, and the
     * original exception as its cause.
     */
    @Test
    void eigenFailureBecomesNotConvergedWithTheRecord() {
        Device d = new Device(StandardStacks.referenceHemt(0), SolverOptions.defaults());
        double[] phi = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            phi[i] = 0.1 * Math.sin(i);
        }
        double[] history = {0.3, 0.02, 0.004, 0, 0};
        ArithmeticException cause = new ArithmeticException("inverse iteration did not converge for eigenvalue #2");
        NotConvergedException e = SelfConsistentSolver.eigenFailure(d, phi, 3, 41, history, cause);
        ConvergenceRecord r = e.record();
        assertFalse(r.converged());
        assertEquals(3, r.iterations());
        assertEquals(41, r.newtonIterations());
        assertArrayEquals(new double[] {0.3, 0.02, 0.004}, r.residualHistory(), 0.0);
        assertTrue(r.message().startsWith("Schroedinger step failed in outer iteration 4: inverse iteration"),
                r.message());
        assertSame(cause, e.getCause());
        assertArrayEquals(phi, e.lastPotential(), 0.0);
        assertArrayEquals(d.x, e.lastDepth(), 0.0);
    }
}
