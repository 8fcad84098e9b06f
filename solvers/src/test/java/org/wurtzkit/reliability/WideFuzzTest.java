// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.solvers.sp.NotConvergedException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;

/**
 * The wide solver fuzz of issue #14: {@value #STACKS} random stacks over the ranges of
 * {@link WideStacks} (up to 12 layers of 0.3 nm-5 um, InN-rich and quaternary alloys, graded and
 * relaxed layers, n and p doping to 1e20 cm^-3, p-GaN caps, carbon- and iron-like traps, 4-1000 K,
 * gates from -30 to +3 V, free surfaces with 1e10-1e15 cm^-2 states, fixed-Fermi-level bottoms),
 * solved with the default options. Every solve must converge with its {@link Invariants} or fail
 * with the documented {@link NotConvergedException}; at least {@value #REQUIRED_FRACTION} of them
 * must converge (the target), and the fraction is printed with a reproducer for every stack
 * that did not.
 *
 * <p>The seeds come from a fixed master seed, so the run is reproducible; every case is rebuilt from
 * its seed by {@link WideStacks#random(long)}. The solves run on every processor (the solver is
 * stateless and thread-safe; the result of each solve does not depend on the thread). The run takes
 * about 3 minutes on two cores, more than a test class of the normal build may take, so it carries
 * the tag {@code wide-fuzz}, which the build excludes by default; {@code .ci/run} runs it after the
 * build, and {@code mvn -B -ntp -pl solvers -am test -Dgroups=wide-fuzz -DexcludedGroups=} runs it
 * by hand.
 */
@Tag("reliability")
@Tag("wide-fuzz")
class WideFuzzTest {
    /** Stacks per run. */
    static final int STACKS = 2000;
    /** The target for sensible stacks with the default options. */
    static final double REQUIRED_FRACTION = 0.999;
    /** Master seed of the run. */
    static final long MASTER_SEED = 1;
    /** A guard against a hang of the whole run, not a measurement. */
    static final long GUARD_MINUTES = 25;

    @Test
    void wideFuzzConvergesWithTheDefaults() throws Exception {
        SolverOptions options = SolverOptions.defaults();
        SelfConsistentSolver solver = new SelfConsistentSolver(options);
        SplittableRandom master = new SplittableRandom(MASTER_SEED);
        long[] seeds = new long[STACKS];
        for (int i = 0; i < STACKS; i++) {
            seeds[i] = master.nextLong();
        }
        AtomicInteger converged = new AtomicInteger();
        List<String> failures = Collections.synchronizedList(new ArrayList<>());
        List<String> bugs = Collections.synchronizedList(new ArrayList<>());
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        ExecutorService exec = Executors.newFixedThreadPool(threads);
        long start = System.nanoTime();
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (long seed : seeds) {
                futures.add(exec.submit(() -> {
                    StackSpec spec = WideStacks.random(seed);
                    try {
                        Structure s = spec.build();
                        Solution sol = solver.solve(s);
                        Invariants.check(s, sol, options);
                        converged.incrementAndGet();
                    } catch (NotConvergedException e) {
                        assertEquals(ErrorKind.NOT_CONVERGED, e.kind());
                        Invariants.check(e, options);
                        failures.add(String.format(Locale.ROOT, "seed %d: %s%n%s", seed, e.getMessage(), spec.toJava()));
                    } catch (RuntimeException | AssertionError e) {
                        // anything else is a bug: a sensible stack converges or fails as documented
                        bugs.add(String.format(Locale.ROOT, "seed %d: %s%n%s", seed, e, spec.toJava()));
                    }
                }));
            }
            exec.shutdown();
            assertTrue(exec.awaitTermination(GUARD_MINUTES, TimeUnit.MINUTES), "the wide fuzz hung");
            for (Future<?> f : futures) {
                f.get();
            }
        } finally {
            exec.shutdownNow();
        }
        double fraction = (double) converged.get() / STACKS;
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "wide solver fuzz: %d of %d random stacks converged (%.2f %%) on %d threads in %.0f s, "
                        + "worst relative Gauss residual %.3g%n",
                converged.get(), STACKS, 100 * fraction, threads, (System.nanoTime() - start) / 1e9,
                Invariants.worstGauss));
        for (String f : failures) {
            sb.append("  not converged, ").append(f.replace("\n", "\n    ")).append('\n');
        }
        for (String b : bugs) {
            sb.append("  BUG (undocumented exception or broken invariant), ").append(b.replace("\n", "\n    ")).append('\n');
        }
        System.out.println(sb);
        assertTrue(bugs.isEmpty(), sb.toString());
        assertTrue(fraction >= REQUIRED_FRACTION, String.format(Locale.ROOT,
                "converged fraction %.2f %% is below %.1f %% for sensible stacks%n%s", 100 * fraction,
                100 * REQUIRED_FRACTION, sb));
    }
}
