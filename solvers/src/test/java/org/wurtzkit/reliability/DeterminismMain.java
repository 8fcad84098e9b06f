package org.wurtzkit.reliability;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Structure;

/**
 * Run in a fresh JVM by {@link DeterminismTest}: prints {@code HASH <name> <sha256>} for every
 * reference stack. With the argument {@code concurrent} the stacks are built and solved by several
 * threads that start together, so that the very first use of the parameter-set discovery and of the
 * lazily loaded data files happens concurrently in a cold JVM.
 */
public final class DeterminismMain {
    private DeterminismMain() {
    }

    /**
     * @param args optional "concurrent"
     * @throws Exception on failure
     */
    public static void main(String[] args) throws Exception {
        boolean concurrent = args.length > 0 && args[0].equals("concurrent");
        SelfConsistentSolver solver = new SelfConsistentSolver();
        if (!concurrent) {
            for (Map.Entry<String, Structure> e : ReferenceStacks.withClassical().entrySet()) {
                System.out.println("HASH " + e.getKey() + "\t"
                        + Fingerprint.of(ReferenceStacks.solve(e.getKey(), e.getValue(), solver)));
            }
            return;
        }
        int threads = 4;
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        CountDownLatch go = new CountDownLatch(1);
        List<Future<List<String>>> fs = new ArrayList<>();
        for (int t = 0; t < threads; t++) {
            fs.add(pool.submit(() -> {
                go.await();
                List<String> out = new ArrayList<>();
                // each thread builds its own structures: the first one triggers provider discovery
                for (Map.Entry<String, Structure> e : ReferenceStacks.withClassical().entrySet()) {
                    out.add("HASH " + e.getKey() + "\t" + Fingerprint.of(ReferenceStacks.solve(e.getKey(), e.getValue(),
                            solver)));
                }
                return out;
            }));
        }
        go.countDown();
        List<String> first = null;
        for (Future<List<String>> f : fs) {
            List<String> lines = f.get();
            if (first == null) {
                first = lines;
            } else if (!first.equals(lines)) {
                System.out.println("MISMATCH between threads");
            }
        }
        pool.shutdown();
        for (String l : first) {
            System.out.println(l);
        }
    }
}
