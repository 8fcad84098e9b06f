package org.wurtzkit.benchmarks;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.openjdk.jmh.infra.BenchmarkParams;
import org.openjdk.jmh.infra.IterationParams;
import org.openjdk.jmh.profile.InternalProfiler;
import org.openjdk.jmh.results.AggregationPolicy;
import org.openjdk.jmh.results.IterationResult;
import org.openjdk.jmh.results.Result;
import org.openjdk.jmh.results.ScalarResult;

/**
 * JMH profiler for a shared, noisy machine: per measurement iteration, the CPU time of the
 * benchmark thread(s) and of the whole JVM per operation, and how many processors other
 * processes kept busy meanwhile.
 *
 * <ul>
 *   <li>{@code cpu.worker.norm} (ms/op): CPU time of JMH's worker threads (the threads that run
 *       the benchmark method) divided by the operations of the iteration. For a single-threaded
 *       benchmark this is its cost on one core; unlike wall-clock time it does not grow when other
 *       processes take turns on the cores, and unlike the process CPU time it leaves out the JIT
 *       compiler threads still busy in early iterations (and GC threads, if any).</li>
 *   <li>{@code cpu.process.norm} (ms/op): CPU time of the whole forked JVM per operation (worker,
 *       pool, GC and compiler threads): with the wall-clock time, the parallelism a multi-threaded
 *       benchmark achieved.</li>
 *   <li>{@code cpu.foreign} (processors): busy time of the whole machine ({@code /proc/stat})
 *       minus this JVM's CPU time, divided by the wall time of the iteration; 0 on an idle
 *       machine, up to the processor count. NaN where {@code /proc/stat} is not readable.</li>
 * </ul>
 *
 * Use: {@code -prof org.wurtzkit.benchmarks.CpuProfiler}.
 */
public final class CpuProfiler implements InternalProfiler {

    private static final double USER_HZ = 100.0; // clock ticks of /proc/stat on Linux
    private final com.sun.management.OperatingSystemMXBean os =
            (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
    private final java.lang.management.ThreadMXBean threads = ManagementFactory.getThreadMXBean();
    private long cpu0;
    private long worker0;
    private long wall0;
    private long busy0;

    /** Created by JMH. */
    public CpuProfiler() {
    }

    @Override
    public String getDescription() {
        return "process CPU time per operation and CPU used by other processes";
    }

    @Override
    public void beforeIteration(BenchmarkParams benchmarkParams, IterationParams iterationParams) {
        busy0 = machineBusyTicks();
        wall0 = System.nanoTime();
        cpu0 = os.getProcessCpuTime();
        worker0 = workerCpu();
    }

    @Override
    @SuppressWarnings("rawtypes") // the signature of JMH's InternalProfiler uses the raw Result
    public Collection<? extends Result> afterIteration(BenchmarkParams benchmarkParams,
            IterationParams iterationParams, IterationResult result) {
        long worker = workerCpu() - worker0;
        long cpu = os.getProcessCpuTime() - cpu0;
        long wall = System.nanoTime() - wall0;
        long busy1 = machineBusyTicks();
        long ops = result.getMetadata().getAllOps();
        List<ScalarResult> out = new ArrayList<>();
        if (ops > 0 && worker > 0) {
            out.add(new ScalarResult("cpu.worker.norm", worker / 1e6 / ops, "ms/op", AggregationPolicy.AVG));
        }
        if (ops > 0 && cpu >= 0) {
            out.add(new ScalarResult("cpu.process.norm", cpu / 1e6 / ops, "ms/op", AggregationPolicy.AVG));
        }
        double foreign = Double.NaN;
        if (busy0 >= 0 && busy1 >= 0 && wall > 0) {
            double busySeconds = (busy1 - busy0) / USER_HZ;
            foreign = Math.max(0.0, (busySeconds - cpu / 1e9) / (wall / 1e9));
        }
        out.add(new ScalarResult("cpu.foreign", foreign, "processors", AggregationPolicy.AVG));
        return out;
    }

    /**
     * Summed CPU time (ns) of the live JMH worker threads. JMH keeps the same workers for all
     * iterations of a trial, so before/after differences cover exactly the iteration.
     */
    private long workerCpu() {
        long sum = 0;
        for (java.lang.management.ThreadInfo t : threads.getThreadInfo(threads.getAllThreadIds())) {
            if (t != null && t.getThreadName().contains("jmh-worker")) {
                long c = threads.getThreadCpuTime(t.getThreadId());
                if (c > 0) {
                    sum += c;
                }
            }
        }
        return sum;
    }

    /** Busy clock ticks of all processors since boot (user+nice+system+irq+softirq+steal), or -1. */
    private static long machineBusyTicks() {
        try {
            String line = Files.readAllLines(Path.of("/proc/stat")).get(0);
            String[] f = line.trim().split("\\s+");
            if (!f[0].equals("cpu") || f.length < 8) {
                return -1;
            }
            long busy = 0;
            for (int i = 1; i < f.length && i <= 8; i++) {
                if (i != 4 && i != 5) { // idle and iowait
                    busy += Long.parseLong(f[i]);
                }
            }
            return busy;
        } catch (IOException | RuntimeException e) {
            return -1;
        }
    }
}
