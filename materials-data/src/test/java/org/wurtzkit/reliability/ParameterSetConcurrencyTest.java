package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.materials.data.FileParameterSet;

/**
 * Thread safety of the data module (issue #7): many threads reading the same file text, and many
 * threads resolving alloys from one shared set, give values identical (bit for bit) to a serial
 * run. The reader and the sets are documented as stateless/immutable and thread-safe.
 */
@Tag("reliability")
class ParameterSetConcurrencyTest {
    private static final int THREADS = 8;

    private static <T> List<T> concurrently(int tasks, Callable<T> task) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        try {
            CountDownLatch start = new CountDownLatch(1);
            List<Future<T>> fs = new ArrayList<>();
            for (int i = 0; i < tasks; i++) {
                fs.add(pool.submit(() -> {
                    start.await();
                    return task.call();
                }));
            }
            start.countDown();
            List<T> out = new ArrayList<>();
            for (Future<T> f : fs) {
                out.add(f.get(60, TimeUnit.SECONDS));
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void concurrentReadsOfOneFileAgree() throws Exception {
        FileParameterSet serial = DataFiles.read(DataFiles.TEXT, "a.json");
        List<FileParameterSet> sets = concurrently(32, () -> DataFiles.read(DataFiles.TEXT, "a.json"));
        for (FileParameterSet s : sets) {
            for (Binary b : Binary.values()) {
                assertEquals(serial.binary(b), s.binary(b));
            }
            assertEquals(serial.bowing(), s.bowing());
            assertEquals(serial.notes(), s.notes());
            assertEquals(serial.sources(), s.sources());
        }
    }

    @Test
    void concurrentAlloyResolutionOnASharedSetAgrees() throws Exception {
        ParameterSet set = ParameterSets.defaultSet();
        List<Composition> cs = new ArrayList<>();
        for (int i = 0; i <= 20; i++) {
            cs.add(Composition.alGaN(i / 20.0));
            cs.add(Composition.inGaN(i / 100.0));
            cs.add(Composition.alInGaN(i / 40.0, i / 100.0));
        }
        List<WurtziteMaterial> serial = new ArrayList<>();
        for (Composition c : cs) {
            serial.add(set.material(c));
        }
        List<List<WurtziteMaterial>> runs = concurrently(16, () -> {
            List<WurtziteMaterial> out = new ArrayList<>();
            for (Composition c : cs) {
                out.add(set.material(c));
            }
            return out;
        });
        for (List<WurtziteMaterial> run : runs) {
            for (int i = 0; i < cs.size(); i++) {
                for (MaterialParameter p : MaterialParameter.values()) {
                    assertEquals(Double.doubleToRawLongBits(serial.get(i).get(p)),
                            Double.doubleToRawLongBits(run.get(i).get(p)), cs.get(i) + " " + p);
                }
            }
        }
    }

    @Test
    void concurrentLookupsReturnTheOneRegisteredInstance() throws Exception {
        List<ParameterSet> got = concurrently(64, () -> ParameterSets.named("ambacher-2002"));
        for (ParameterSet s : got) {
            assertSame(got.get(0), s);
        }
    }

    /**
     * {@link ParameterSets#reload()} publishes a new registry while other threads look sets up: every
     * lookup sees either the old or the new registry, both complete, never a half-built one.
     */
    @Test
    void lookupsDuringReloadsAlwaysFindTheDefaultSet() throws Exception {
        java.util.concurrent.atomic.AtomicBoolean done = new java.util.concurrent.atomic.AtomicBoolean();
        Thread reloader = new Thread(() -> {
            for (int i = 0; i < 50; i++) {
                org.wurtzkit.material.ParameterSets.reload();
            }
            done.set(true);
        });
        reloader.start();
        List<Integer> found = concurrently(THREADS, () -> {
            int n = 0;
            do {
                if (org.wurtzkit.material.ParameterSets.defaultSet().name().equals(
                        org.wurtzkit.material.ParameterSets.DEFAULT_NAME)
                        && org.wurtzkit.material.ParameterSets.names().contains("ambacher-2002")) {
                    n++;
                }
            } while (!done.get());
            return n;
        });
        reloader.join(60_000);
        for (int n : found) {
            org.junit.jupiter.api.Assertions.assertTrue(n > 0);
        }
        org.junit.jupiter.api.Assertions.assertTrue(org.wurtzkit.material.ParameterSets.brokenProviders().isEmpty());
    }
}
