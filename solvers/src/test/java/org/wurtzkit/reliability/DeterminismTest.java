package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;

/**
 * Determinism (issue #7): the same input gives bit-identical output (every reported number, see
 * {@link Fingerprint}) on repeated solves, for warm starts, and across JVMs: a fresh JVM with the
 * same class path, one started with the JIT compilers disabled (-Xint), and one in which several
 * threads make the very first use of the library concurrently must print the same fingerprints as
 * this (warmed-up) JVM. Java floating-point arithmetic is strict since Java 17 (JEP 306), so any
 * difference would come from unordered parallel reductions, hash-order iteration or shared
 * mutable state in the library.
 */
@Tag("reliability")
class DeterminismTest {
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver();
    private static Map<String, String> here;

    @BeforeAll
    static void fingerprintsInThisJvm() {
        here = new LinkedHashMap<>();
        for (Map.Entry<String, Structure> e : ReferenceStacks.withClassical().entrySet()) {
            here.put(e.getKey(), Fingerprint.of(ReferenceStacks.solve(e.getKey(), e.getValue(), SOLVER)));
        }
    }

    @Test
    void repeatedSolvesAreBitIdentical() {
        for (int round = 0; round < 3; round++) {
            for (Map.Entry<String, Structure> e : ReferenceStacks.withClassical().entrySet()) {
                assertEquals(here.get(e.getKey()), Fingerprint.of(ReferenceStacks.solve(e.getKey(), e.getValue(), SOLVER)),
                        e.getKey() + ", round " + round);
            }
        }
    }

    @Test
    void warmStartsAreBitIdenticalAndIndependentOfEarlierSolves() {
        Map<String, Structure> all = ReferenceStacks.all();
        Structure base = all.get("hemt 0.0 V");
        Structure target = all.get("hemt -5.0 V");
        Solution start = SOLVER.solve(base);
        String first = Fingerprint.of(SOLVER.solve(target, start));
        // unrelated solves in between must not change anything (no state kept in the solver)
        for (Structure s : all.values()) {
            SOLVER.solve(s);
        }
        assertEquals(first, Fingerprint.of(SOLVER.solve(target, start)));
        assertEquals(first, Fingerprint.of(new SelfConsistentSolver().solve(target, SOLVER.solve(base))));
    }

    private static Map<String, String> runFreshJvm(List<String> jvmFlags, String... args) throws IOException,
            InterruptedException {
        String java = System.getProperty("java.home") + File.separator + "bin" + File.separator + "java";
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> cmd = new ArrayList<>();
        cmd.add(java);
        cmd.addAll(jvmFlags);
        cmd.add("-cp");
        cmd.add(cp);
        cmd.add(DeterminismMain.class.getName());
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
        Process p = pb.start();
        String out;
        try {
            out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertTrue(p.waitFor(300, TimeUnit.SECONDS), "child JVM did not finish");
        } finally {
            p.destroyForcibly();
        }
        assertEquals(0, p.exitValue(), "child JVM failed:\n" + out);
        assertTrue(!out.contains("MISMATCH"), "threads of the child disagree:\n" + out);
        Map<String, String> m = new LinkedHashMap<>();
        for (String line : out.split("\n")) {
            if (line.startsWith("HASH ")) {
                String[] kv = line.substring(5).split("\t");
                m.put(kv[0], kv[1].trim());
            }
        }
        return m;
    }

    @Test
    void aFreshJvmGivesTheSameBits() throws Exception {
        assertEquals(here, runFreshJvm(List.of()));
    }

    @Test
    void aFreshInterpretedJvmGivesTheSameBits() throws Exception {
        assertEquals(here, runFreshJvm(List.of("-Xint")));
    }

    @Test
    void concurrentFirstUseInAFreshJvmGivesTheSameBits() throws Exception {
        assertEquals(here, runFreshJvm(List.of(), "concurrent"));
    }
}
