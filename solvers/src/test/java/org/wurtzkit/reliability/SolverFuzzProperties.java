package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.GenerationMode;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tag;
import net.jqwik.api.lifecycle.AfterProperty;
import net.jqwik.api.lifecycle.BeforeProperty;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.solvers.sp.NotConvergedException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;

/**
 * Fuzzing the self-consistent solver (issue #7) with random physically reasonable stacks
 * ({@link Stacks}): every solve either converges or throws the documented
 * {@link NotConvergedException} within its iteration budget; it never returns or carries a NaN and
 * never hangs (each solve runs under a generous 20 s preemptive timeout; a cold solve takes
 * 5-500 ms). Every converged result passes {@link Invariants} (charge neutrality, Gauss's law in
 * every box, E_c - E_v equal to the local gap, sorted orthonormal subbands, non-negative densities
 * and occupations, contacts pinning E_c as documented). At the end the converged fraction is
 * printed with a reproducer for each stack that did not converge, and must be at least 99 % (the
 * issue: below that, for these stacks, is a solver bug).
 *
 * <p>The jqwik seed is fixed so that the suite is reproducible; remove it to explore new stacks.
 * Each try draws one long, from which {@link Stacks#random(long)} builds the whole stack, so a case
 * is reproduced from one number; shrinking is off because a smaller seed is not a simpler stack.
 */
@Tag("reliability")
class SolverFuzzProperties {
    private static final SolverOptions OPTIONS = SolverOptions.defaults();
    /** One shared solver: it is documented stateless and thread-safe. */
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver(OPTIONS);
    private static final Duration PER_SOLVE = Duration.ofSeconds(20);
    private static final double REQUIRED_FRACTION = 0.99;

    private static int tries;
    private static int converged;
    private static final List<String> failures = Collections.synchronizedList(new ArrayList<>());

    @BeforeProperty
    void reset() {
        tries = 0;
        converged = 0;
        failures.clear();
    }

    @Property(tries = 400, seed = "7007", generation = GenerationMode.RANDOMIZED, edgeCases = EdgeCasesMode.NONE,
            shrinking = ShrinkingMode.OFF)
    void everySolveConvergesWithItsInvariantsOrFailsAsDocumented(@ForAll long seed) {
        StackSpec spec = Stacks.random(seed);
        Structure s = spec.build();
        assertTrue(spec.totalNm() < 3000 && spec.layers().size() >= 1 && spec.layers().size() <= 8, spec.toJava());
        tries++;
        Solution sol;
        try {
            sol = assertTimeoutPreemptively(PER_SOLVE, () -> SOLVER.solve(s), () -> "solve hung (> " + PER_SOLVE
                    + ") for seed " + seed + ":\n" + spec.toJava());
        } catch (NotConvergedException e) {
            assertEquals(ErrorKind.NOT_CONVERGED, e.kind());
            Invariants.check(e, OPTIONS);
            failures.add(String.format(Locale.ROOT, "seed %d: %s%n%s", seed, e.getMessage(), spec.toJava()));
            return;
        } catch (RuntimeException e) {
            // anything else (an IllegalStateException for a NaN, a bare IllegalArgumentException from
            // inside the solver, ...) is a bug: a valid structure must converge or fail as documented
            fail("undocumented failure for seed " + seed + ": " + e + "\n" + spec.toJava(), e);
            return;
        }
        Invariants.check(s, sol, OPTIONS);
        converged++;
    }

    @AfterProperty
    void reportConvergedFraction() {
        if (tries == 0) {
            return;
        }
        double fraction = (double) converged / tries;
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "solver fuzz: %d of %d random stacks converged (%.2f %%), worst relative Gauss residual %.3g%n",
                converged, tries, 100 * fraction, Invariants.worstGauss));
        for (String f : failures) {
            sb.append("  not converged, ").append(f.replace("\n", "\n    ")).append('\n');
        }
        System.out.println(sb);
        assertTrue(fraction >= REQUIRED_FRACTION, String.format(Locale.ROOT,
                "converged fraction %.2f %% is below %.0f %% for physically reasonable stacks: a solver bug%n%s",
                100 * fraction, 100 * REQUIRED_FRACTION, sb));
    }
}
