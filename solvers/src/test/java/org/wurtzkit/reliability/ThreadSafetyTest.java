package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.InterfaceCharge;
import org.wurtzkit.structure.Structure;

/**
 * Thread safety (issue #7): many threads solving the same shared structures (built on shared
 * parameter sets, materials and layers) with one shared solver give results identical, bit for
 * bit, to a serial run — including when all threads solve the very same structure at once, when
 * they warm-start from one shared solution, and while other threads query the shared sets and
 * structures. The solver, structures, sets and solutions are documented immutable/stateless.
 */
@Tag("reliability")
class ThreadSafetyTest {
    private static final int THREADS = 8;
    private static final SelfConsistentSolver SHARED = new SelfConsistentSolver();
    private static Map<String, Structure> structures;
    private static Map<String, String> serial;
    private static Map<String, double[]> serialPotential;

    @BeforeAll
    static void serialRun() {
        structures = ReferenceStacks.withClassical();
        serial = new LinkedHashMap<>();
        serialPotential = new LinkedHashMap<>();
        for (Map.Entry<String, Structure> e : structures.entrySet()) {
            Solution s = ReferenceStacks.solve(e.getKey(), e.getValue(), SHARED);
            serial.put(e.getKey(), Fingerprint.of(s));
            serialPotential.put(e.getKey(), s.potential());
        }
    }

    private static <T> List<T> inParallel(List<Callable<T>> tasks) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        try {
            CountDownLatch go = new CountDownLatch(1);
            List<Future<T>> fs = new ArrayList<>();
            for (Callable<T> t : tasks) {
                fs.add(pool.submit(() -> {
                    go.await();
                    return t.call();
                }));
            }
            go.countDown();
            List<T> out = new ArrayList<>();
            for (Future<T> f : fs) {
                out.add(f.get(120, TimeUnit.SECONDS));
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void sharedStructuresAndSolverInManyThreadsMatchTheSerialRun() throws Exception {
        List<String> names = new ArrayList<>(structures.keySet());
        List<Callable<Map<String, String>>> tasks = new ArrayList<>();
        for (int t = 0; t < THREADS; t++) {
            List<String> order = new ArrayList<>(names);
            Collections.shuffle(order, new Random(t));
            tasks.add(() -> {
                Map<String, String> got = new LinkedHashMap<>();
                for (String n : order) {
                    Solution s = ReferenceStacks.solve(n, structures.get(n), SHARED);
                    got.put(n, Fingerprint.of(s));
                    assertArrayEquals(serialPotential.get(n), s.potential(), n);
                }
                return got;
            });
        }
        for (Map<String, String> got : inParallel(tasks)) {
            for (String n : names) {
                assertEquals(serial.get(n), got.get(n), n);
            }
        }
    }

    @Test
    void allThreadsOnTheSameStructureAtOnce() throws Exception {
        String name = "hemt 0.0 V";
        Structure s = structures.get(name);
        List<Callable<String>> tasks = new ArrayList<>();
        for (int t = 0; t < 4 * THREADS; t++) {
            tasks.add(() -> Fingerprint.of(SHARED.solve(s)));
        }
        for (String f : inParallel(tasks)) {
            assertEquals(serial.get(name), f);
        }
    }

    @Test
    void warmStartsFromOneSharedSolution() throws Exception {
        Solution start = SHARED.solve(structures.get("hemt 0.0 V"));
        Structure target = structures.get("hemt -5.0 V");
        String expected = Fingerprint.of(SHARED.solve(target, start));
        List<Callable<String>> tasks = new ArrayList<>();
        for (int t = 0; t < 2 * THREADS; t++) {
            tasks.add(() -> Fingerprint.of(SHARED.solve(target, start)));
        }
        for (String f : inParallel(tasks)) {
            assertEquals(expected, f);
        }
        // the shared start is not modified by its users
        assertEquals(serial.get("hemt 0.0 V"), Fingerprint.of(start));
    }

    @Test
    void queriesOnSharedSetsAndStructuresDuringSolvesAreConsistent() throws Exception {
        ParameterSet set = ParameterSets.defaultSet();
        Structure hemt = structures.get("hemt 0.0 V");
        List<InterfaceCharge> charges = hemt.interfaceCharges();
        double gapSerial = set.material(Composition.alGaN(0.37)).get(MaterialParameter.BAND_GAP_0K);
        List<Callable<Boolean>> tasks = new ArrayList<>();
        for (int t = 0; t < THREADS; t++) {
            final int id = t;
            tasks.add(() -> {
                if (id % 2 == 0) {
                    for (String n : List.of("custom material", "free surface", "fuzz seed 3")) {
                        assertEquals(serial.get(n), Fingerprint.of(ReferenceStacks.solve(n, structures.get(n), SHARED)), n);
                    }
                } else {
                    for (int k = 0; k < 2000; k++) {
                        assertEquals(gapSerial, set.material(Composition.alGaN(0.37)).get(MaterialParameter.BAND_GAP_0K));
                        assertEquals(charges, hemt.interfaceCharges());
                        hemt.pointAt(k * 1e-9 % hemt.totalThickness());
                    }
                }
                return true;
            });
        }
        inParallel(tasks);
    }
}
