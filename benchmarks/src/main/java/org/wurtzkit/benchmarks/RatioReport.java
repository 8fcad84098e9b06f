package org.wurtzkit.benchmarks;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.profile.GCProfiler;
import org.openjdk.jmh.results.BenchmarkResult;
import org.openjdk.jmh.results.IterationResult;
import org.openjdk.jmh.results.Result;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.ChainedOptionsBuilder;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.openjdk.jmh.runner.options.TimeValue;
import org.openjdk.jmh.runner.options.VerboseMode;
import org.openjdk.jmh.util.Statistics;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Runs the benchmarks programmatically and prints, as Markdown, the medians with their error
 * bars and the ratios against the targets of issue #6.
 *
 * <pre>
 *   java -cp benchmarks/target/benchmarks.jar org.wurtzkit.benchmarks.RatioReport           # short pass, under 3 min
 *   java -cp benchmarks/target/benchmarks.jar org.wurtzkit.benchmarks.RatioReport --full    # full run, about an hour
 * </pre>
 *
 * Options: {@code --full}, {@code --verbose} (JMH's own output), {@code --out FILE} (also write
 * the Markdown to FILE), {@code --only TEXT} (run only the jobs of the pass whose include pattern
 * contains TEXT, e.g. {@code --full --only GateStack} for the gate-stack ratio with its three forks).
 *
 * <p>Error bars: for every figure the median of the measurement iterations (all forks pooled),
 * the min-max range of those iterations and JMH's 99.9 % confidence half-width of the mean. A
 * ratio is the ratio of the medians; its range is the conservative one from the extremes,
 * {@code [min(a)/max(b), max(a)/min(b)]}; the same for the growth exponents.
 */
public final class RatioReport {

    private RatioReport() {
    }

    /**
     * One Runner invocation: an include pattern, parameter values and run settings. With
     * {@code interleaved}, the forks of the parameter values alternate instead of running one
     * value after the other (ABBA order: 1, 2, 2, 1, ...), so that a slow spell of a shared host
     * falls on both sides of a ratio; the forks of each value are then pooled as usual.
     */
    private record Job(String include, String param, String[] values, Mode mode, int forks, int warmups,
            TimeValue warmupTime, int iterations, TimeValue iterationTime, boolean gc, boolean interleaved) {
        Job(String include, String param, String[] values, Mode mode, int forks, int warmups,
                TimeValue warmupTime, int iterations, TimeValue iterationTime, boolean gc) {
            this(include, param, values, mode, forks, warmups, warmupTime, iterations, iterationTime, gc, false);
        }

        Job single(String value) {
            return new Job(include, param, new String[] {value}, mode, 1, warmups, warmupTime, iterations,
                    iterationTime, gc, false);
        }
    }

    /** Median and extremes of a set of per-iteration values. */
    private record Span(double median, double min, double max) {
        static Span of(Statistics s) {
            return s == null || s.getN() == 0 ? new Span(Double.NaN, Double.NaN, Double.NaN)
                    : new Span(s.getPercentile(50), s.getMin(), s.getMax());
        }

        Span scaled(double k) {
            return new Span(median * k, min * k, max * k);
        }

        /** Ratio of medians and its conservative range. */
        Span over(Span b) {
            return new Span(median / b.median, min / b.max, max / b.min);
        }

        /** Growth exponent log(this/b)/log(sizeRatio), with its conservative range. */
        Span exponentOver(Span b, double sizeRatio) {
            double l = Math.log(sizeRatio);
            return new Span(Math.log(median / b.median) / l, Math.log(min / b.max) / l, Math.log(max / b.min) / l);
        }
    }

    /**
     * Pooled statistics of one benchmark at one parameter value: wall-clock score, the same over
     * the quiet iterations only (other processes below {@link #QUIET} processors), CPU time of the
     * benchmark thread(s) and of the whole JVM, and the median foreign load.
     */
    private record Figure(String benchmark, String param, Mode mode, Span wall, double ci, long samples, String unit,
            Span quiet, int quietSamples, Span cpu, Span process, double foreign, double allocBytesPerOp) {
    }

    /**
     * JVM CPU per map, 2 threads over 1 thread, beyond which (above it or below its reciprocal) the
     * map's verdict warns that the two sides' solves ran at different speeds (quiet runs measure
     * 0.98 to 1.03; a slowed side has measured 0.84 and 1.12 to 1.33).
     */
    private static final double UNEQUAL_CPU_PER_MAP = 1.10;

    /** Foreign load (processors) below which an iteration counts as quiet. */
    private static final double QUIET = 0.25;

    private static final TimeValue MS100 = TimeValue.milliseconds(100);
    private static final TimeValue MS200 = TimeValue.milliseconds(200);
    private static final TimeValue MS500 = TimeValue.milliseconds(500);
    private static final TimeValue S1 = TimeValue.seconds(1);
    private static final TimeValue S2 = TimeValue.seconds(2);

    private static final String[] ALL_N = {"500", "1000", "2000", "4000", "8000"};

    private static List<Job> shortPass() {
        List<Job> jobs = new ArrayList<>();
        jobs.add(new Job("EigenBenchmark\\.tridiagonal$", "n", ALL_N, Mode.AverageTime, 1, 3, MS200, 5, MS200, false));
        jobs.add(new Job("EigenBenchmark\\.ejmlDense$", "n", new String[] {"2000"}, Mode.SingleShotTime, 1, 0, null, 2,
                null, false));
        jobs.add(new Job("EigenBenchmark\\.commonsMath$", "n", new String[] {"1000"}, Mode.SingleShotTime, 1, 0, null, 2,
                null, false));
        jobs.add(new Job("NewtonStepBenchmark\\.(thomasSolve|baselineMatVec)$", "n", ALL_N, Mode.AverageTime, 1, 3, MS100,
                5, MS100, false));
        jobs.add(new Job("NewtonStepBenchmark\\.classicalSolve$", "n", new String[] {"1000", "8000"}, Mode.AverageTime, 1,
                5, S1, 4, MS500, false));
        // the solver's code takes about 5 s of compilation before its time settles (CPU time > wall time till then)
        jobs.add(new Job("ColdSolveBenchmark\\.", null, null, Mode.AverageTime, 1, 5, S1, 4, S1, true));
        jobs.add(new Job("GateStackBenchmark\\.", null, null, Mode.AverageTime, 1, 4, S1, 4, S1, false));
        jobs.add(new Job("HoleWindowBenchmark\\.", null, null, Mode.AverageTime, 1, 4, S1, 4, S1, false));
        jobs.add(new Job("SweepBenchmark\\.(coldPoints|continuationWorkflow)$", null, null, Mode.AverageTime, 1, 4, S1, 4,
                S1, false));
        // 2-s warm-ups: with two 1 s ones the 1-thread map (about 3 maps) was still being compiled; two
        // interleaved forks per side (1, 2, 2, 1), as the map ratio is the one a shared host disturbs
        jobs.add(new Job("DesignMapBenchmark\\.(workflowMap|continuedMap)$", "threads", new String[] {"1", "2"},
                Mode.AverageTime, 2, 3, S2, 3, S1, false, true));
        // a 200-sample study against a 200-point map, both on 2 threads (the full run: 10 000 each)
        jobs.add(new Job("ToleranceStudyBenchmark\\.", "samples", new String[] {"200"}, Mode.AverageTime, 1, 3, S2, 4,
                S1, false));
        return jobs;
    }

    /**
     * The full run, 62.5 minutes on the machine of benchmarks/README.md: 5 forks for the
     * solver-level benchmarks (whose compiled code varies most from one JVM to the next), 3 for the
     * kernels, single shots where one operation takes seconds (Commons Math at N = 4000 took 16
     * minutes of it).
     */
    private static List<Job> fullRun() {
        List<Job> jobs = new ArrayList<>();
        jobs.add(new Job("EigenBenchmark\\.(tridiagonal|tridiagonalAllocating|hamiltonian)$", "n", ALL_N,
                Mode.AverageTime, 3, 3, S1, 6, S1, false));
        jobs.add(new Job("EigenBenchmark\\.ejmlDense$", "n", new String[] {"500", "1000"}, Mode.AverageTime, 3, 3, S2, 5,
                S2, false));
        jobs.add(new Job("EigenBenchmark\\.ejmlDense$", "n", new String[] {"2000"}, Mode.SingleShotTime, 3, 1, null, 3,
                null, false));
        jobs.add(new Job("EigenBenchmark\\.commonsMath$", "n", new String[] {"500", "1000"}, Mode.AverageTime, 3, 2, S2,
                5, S2, false));
        jobs.add(new Job("EigenBenchmark\\.commonsMath$", "n", new String[] {"2000"}, Mode.SingleShotTime, 2, 0, null, 2,
                null, false));
        jobs.add(new Job("EigenBenchmark\\.commonsMath$", "n", new String[] {"4000"}, Mode.SingleShotTime, 1, 0, null, 1,
                null, false));
        jobs.add(new Job("NewtonStepBenchmark\\.(thomasSolve|baselineMatVec)$", "n", ALL_N, Mode.AverageTime, 3, 3, S1,
                6, S1, false));
        jobs.add(new Job("NewtonStepBenchmark\\.classicalSolve$", "n", ALL_N, Mode.AverageTime, 3, 8, S1, 8, S1,
                false));
        jobs.add(new Job("ColdSolveBenchmark\\.", null, null, Mode.AverageTime, 5, 10, S1, 10, S1, true));
        jobs.add(new Job("GateStackBenchmark\\.", null, null, Mode.AverageTime, 3, 6, S1, 6, S1, false));
        jobs.add(new Job("HoleWindowBenchmark\\.", null, null, Mode.AverageTime, 3, 6, S1, 6, S1, false));
        jobs.add(new Job("SweepBenchmark\\.", null, null, Mode.AverageTime, 5, 4, S2, 6, S2, false));
        jobs.add(new Job("DesignMapBenchmark\\.", "threads", new String[] {"1", "2"}, Mode.AverageTime, 5, 4, S2, 6, S2,
                false, true));
        // 10 000 solves per operation (about 40 s on two threads): single shots
        jobs.add(new Job("ToleranceStudyBenchmark\\.", "samples", new String[] {"10000"}, Mode.SingleShotTime, 2, 1, null,
                2, null, false));
        return jobs;
    }

    /**
     * Entry point.
     *
     * @param args {@code --full}, {@code --verbose}, {@code --out FILE}
     * @throws RunnerException if a benchmark fails (every benchmark checks its result in its setup)
     * @throws IOException     if the output file cannot be written
     */
    public static void main(String[] args) throws RunnerException, IOException {
        boolean full = false;
        boolean verbose = false;
        Path out = null;
        String only = null;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--full" -> full = true;
                case "--verbose" -> verbose = true;
                case "--out" -> out = Path.of(args[++i]);
                case "--only" -> only = args[++i];
                default -> throw new IllegalArgumentException("unknown option " + args[i]
                        + " (use --full, --verbose, --out FILE, --only TEXT)");
            }
        }
        List<Job> jobs = new ArrayList<>(full ? fullRun() : shortPass());
        if (only != null) {
            String text = only;
            jobs.removeIf(j -> !j.include().contains(text));
            if (jobs.isEmpty()) {
                throw new IllegalArgumentException("--only " + only + " matches no job of the "
                        + (full ? "full run" : "short pass"));
            }
        }
        Map<String, Figure> figures = new LinkedHashMap<>();
        long start = System.nanoTime();
        for (int j = 0; j < jobs.size(); j++) {
            Job job = jobs.get(j);
            long t0 = System.nanoTime();
            System.err.printf(Locale.ROOT, "[%d/%d] %s %s ...%n", j + 1, jobs.size(), job.include(),
                    job.values() == null ? "" : job.param() + "=" + String.join(",", job.values()));
            for (RunResult r : job.interleaved() ? runInterleaved(job, verbose) : run(job, verbose)) {
                Figure f = figure(r, job.mode());
                figures.put(key(f.benchmark(), f.param()), f);
            }
            System.err.printf(Locale.ROOT, "      done in %.0f s%n", (System.nanoTime() - t0) / 1e9);
        }
        double totalSeconds = (System.nanoTime() - start) / 1e9;
        String md = markdown(figures, full, totalSeconds, iterationCounts());
        System.out.println(md);
        if (out != null) {
            Files.writeString(out, md, StandardCharsets.UTF_8);
        }
    }

    /** The job's forks one at a time, alternating its parameter values; forks of one value pooled. */
    private static Collection<RunResult> runInterleaved(Job job, boolean verbose) throws RunnerException {
        Map<String, List<BenchmarkResult>> forks = new LinkedHashMap<>();
        for (int round = 0; round < job.forks(); round++) {
            for (int v = 0; v < job.values().length; v++) {
                String value = job.values()[round % 2 == 0 ? v : job.values().length - 1 - v];
                for (RunResult r : run(job.single(value), verbose)) {
                    forks.computeIfAbsent(r.getParams().id(), x -> new ArrayList<>()).addAll(r.getBenchmarkResults());
                }
            }
        }
        List<RunResult> pooled = new ArrayList<>();
        for (List<BenchmarkResult> f : forks.values()) {
            pooled.add(new RunResult(f.get(0).getParams(), f));
        }
        return pooled;
    }

    private static Collection<RunResult> run(Job job, boolean verbose) throws RunnerException {
        ChainedOptionsBuilder o = new OptionsBuilder()
                .include(job.include())
                .mode(job.mode())
                .forks(job.forks())
                .warmupIterations(job.warmups())
                .measurementIterations(job.iterations())
                .shouldFailOnError(true)
                .verbosity(verbose ? VerboseMode.NORMAL : VerboseMode.SILENT);
        if (job.warmupTime() != null) {
            o.warmupTime(job.warmupTime());
        }
        if (job.iterationTime() != null) {
            o.measurementTime(job.iterationTime());
        }
        if (job.values() != null) {
            o.param(job.param(), job.values());
        }
        o.addProfiler(CpuProfiler.class);
        if (job.gc()) {
            o.addProfiler(GCProfiler.class);
        }
        return new Runner(o.build()).run();
    }

    private static Figure figure(RunResult r, Mode mode) {
        String name = r.getParams().getBenchmark();
        name = name.substring(name.lastIndexOf('.', name.lastIndexOf('.') - 1) + 1);
        String param = "";
        for (String k : r.getParams().getParamsKeys()) {
            param = k + "=" + r.getParams().getParam(k);
        }
        Result<?> p = r.getPrimaryResult();
        Statistics s = p.getStatistics();
        double ci = s.getN() > 2 ? s.getMeanErrorAt(0.999) : Double.NaN;
        Result<?> alloc = r.getSecondaryResults().get("gc.alloc.rate.norm");
        double bytes = alloc == null ? Double.NaN : alloc.getScore();
        Result<?> worker = r.getSecondaryResults().get("cpu.worker.norm");
        Result<?> process = r.getSecondaryResults().get("cpu.process.norm");
        Result<?> foreign = r.getSecondaryResults().get("cpu.foreign");
        org.openjdk.jmh.util.ListStatistics quiet = new org.openjdk.jmh.util.ListStatistics();
        for (BenchmarkResult br : r.getBenchmarkResults()) {
            for (IterationResult ir : br.getIterationResults()) {
                Result<?> f = ir.getSecondaryResults().get("cpu.foreign");
                if (f != null && f.getScore() < QUIET) {
                    quiet.addValue(ir.getPrimaryResult().getScore());
                }
            }
        }
        return new Figure(name, param, mode, Span.of(s), ci, s.getN(), p.getScoreUnit(), Span.of(quiet),
                (int) quiet.getN(), Span.of(worker == null ? null : worker.getStatistics()),
                Span.of(process == null ? null : process.getStatistics()),
                foreign == null ? Double.NaN : foreign.getStatistics().getPercentile(50), bytes);
    }

    private static String key(String benchmark, String param) {
        return benchmark + (param.isEmpty() ? "" : "@" + param);
    }

    // ------------------------------------------------------------------ iteration counts

    /** Deterministic iteration counts of the solves the timing benchmarks run. */
    private record Counts(int nodes, int coldOuter, int coldNewton, int restartOuter, int restartNewton,
            int classicalNewton, int sweepColdOuter, int sweepColdNewton, int sweepContOuter, int sweepContNewton,
            int workflowOuter, int workflowNewton, Map<String, int[]> classicalMesh, int[] gateStack) {
    }

    private static Counts iterationCounts() {
        SelfConsistentSolver solver = new SelfConsistentSolver();
        Structure ref = Scenarios.referenceHemt();
        Solution cold = solver.solve(ref);
        Solution restart = solver.solve(ref, cold);
        Solution classical = new SelfConsistentSolver(SolverOptions.defaults().withQuantumWindows(QuantumWindows.none()))
                .solve(ref);
        int co = 0;
        int cn = 0;
        int wo = 0;
        int wn = 0;
        Solution prev = null;
        for (int i = 0; i < SweepBenchmark.POINTS; i++) {
            double v = SweepBenchmark.FROM_V + (SweepBenchmark.TO_V - SweepBenchmark.FROM_V) * i
                    / (SweepBenchmark.POINTS - 1);
            Structure s = ref.withTop(TopBoundary.schottky(Scenarios.GATE_BARRIER_EV).atBiasV(v));
            Solution c = solver.solve(s);
            co += c.convergence().iterations();
            cn += c.convergence().newtonIterations();
            prev = solver.solve(s, prev);
            wo += prev.convergence().iterations();
            wn += prev.convergence().newtonIterations();
        }
        int fo = 0;
        int fn = 0;
        org.wurtzkit.solvers.workflow.BiasSweepResult sweep = new org.wurtzkit.solvers.workflow.BiasSweep(solver)
                .run(ref, org.wurtzkit.solvers.workflow.BiasGrid.linear(SweepBenchmark.FROM_V, SweepBenchmark.TO_V,
                        SweepBenchmark.POINTS));
        for (int i = 0; i < sweep.size(); i++) {
            Solution s = sweep.solution(i).orElseThrow();
            fo += s.convergence().iterations();
            fn += s.convergence().newtonIterations();
        }
        Map<String, int[]> mesh = new LinkedHashMap<>();
        for (String n : ALL_N) {
            Solution s = NewtonStepBenchmark.classicalSolver(Integer.parseInt(n)).solve(ref);
            mesh.put(n, new int[] {s.nodeCount(), s.convergence().newtonIterations()});
        }
        Solution mis = solver.solve(GateStackBenchmark.misHemt());
        int[] gateStack = {mis.nodeCount(), mis.convergence().iterations(), mis.convergence().newtonIterations()};
        return new Counts(cold.nodeCount(), cold.convergence().iterations(), cold.convergence().newtonIterations(),
                restart.convergence().iterations(), restart.convergence().newtonIterations(),
                classical.convergence().newtonIterations(), co, cn, wo, wn, fo, fn, mesh, gateStack);
    }

    // ------------------------------------------------------------------ report

    private static String markdown(Map<String, Figure> f, boolean full, double seconds, Counts c) {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "## %s, %s (%d processors seen by the JVM, %s %s), %.0f s%n%n",
                full ? "Full run" : "Short pass", LocalDate.now(), Runtime.getRuntime().availableProcessors(),
                System.getProperty("java.vm.name"), System.getProperty("java.version"), seconds));
        b.append("Wall: JMH's score (wall-clock time per operation), median, min – max and JMH's 99.9 % confidence "
                + "half-width over the measurement iterations. Quiet: median wall time over the iterations during "
                + "which other processes kept fewer than " + QUIET + " processors busy (count in brackets). CPU: CPU "
                + "time of the benchmark thread per operation, in ms/op whatever the unit of the score (CpuProfiler; "
                + "the cost on one core of a single-threaded benchmark, immune to other processes). Foreign: "
                + "processors busy with other processes during the measurement, median over iterations.\n\n");
        b.append("| benchmark | param | mode | wall median | wall min – max | ± 99.9 % CI | unit | n | quiet median (n) "
                + "| CPU median ms/op | CPU min – max | foreign |\n");
        b.append("| --- | --- | --- | ---: | ---: | ---: | --- | ---: | ---: | ---: | ---: | ---: |\n");
        for (Figure x : f.values()) {
            // the map's benchmark thread only waits for its pool: show the whole JVM's CPU instead
            boolean pooled = x.benchmark().startsWith("DesignMapBenchmark");
            Span cpu = pooled ? x.process() : x.cpu();
            b.append(String.format(Locale.ROOT, "| %s | %s | %s | %s | %s – %s | %s | %s | %d | %s (%d) | %s%s | %s – %s "
                    + "| %s |%n", x.benchmark(), x.param(), x.mode().shortLabel(), num(x.wall().median()),
                    num(x.wall().min()), num(x.wall().max()), Double.isNaN(x.ci()) ? "n/a" : num(x.ci()), x.unit(),
                    x.samples(), num(x.quiet().median()), x.quietSamples(), num(cpu.median()), pooled ? " (JVM)" : "",
                    num(cpu.min()), num(cpu.max()), num(x.foreign())));
        }
        b.append("\n");
        b.append("Ratios are ratios of medians, with the conservative range [min(a)/max(b), max(a)/min(b)]; growth "
                + "exponents likewise. Verdicts use the CPU time of the benchmark thread for single-threaded "
                + "benchmarks and the quiet wall-clock time for the 2-thread map.\n\n");
        b.append("| target (issue #6) | wall-clock (ratio of medians, range) | CPU time (ratio of medians, range) "
                + "| target | verdict |\n");
        b.append("| --- | ---: | ---: | --- | --- |\n");

        ratioRow(b, "dense EJML / tridiagonal, N = 2000", f.get("EigenBenchmark.ejmlDense@n=2000"),
                f.get("EigenBenchmark.tridiagonal@n=2000"), 100, true);
        Figure cm4000 = f.get("EigenBenchmark.commonsMath@n=4000");
        Figure tri4000 = f.get("EigenBenchmark.tridiagonal@n=4000");
        if (cm4000 != null) {
            ratioRow(b, "Commons Math / tridiagonal, N = 4000", cm4000, tri4000, 10, true);
        } else {
            Figure cmLow = largestBelow(f, "EigenBenchmark.commonsMath", 4000);
            if (cmLow != null && tri4000 != null) {
                // Commons Math's cost does not fall with N: its time at a smaller N bounds its time at 4000 from below.
                Span w = cmLow.wall().over(tri4000.wall());
                Span u = cmLow.cpu().over(tri4000.cpu());
                b.append(String.format(Locale.ROOT, "| Commons Math / tridiagonal, N = 4000: lower bound, Commons Math "
                        + "timed at %s only (its cost grows with N) | ≥ %s× (≥ %s×) | ≥ %s× (≥ %s×) | ≥ 10× | %s |%n",
                        cmLow.param(), num(w.median()), num(w.min()), num(u.median()), num(u.min()),
                        verdict(u.min() >= 10, "CPU")));
            }
        }
        exponentRow(b, "tridiagonal eigen-solve growth, N = 1000 → 8000", f.get("EigenBenchmark.tridiagonal@n=1000"),
                f.get("EigenBenchmark.tridiagonal@n=8000"), 1000, 8000, 1.15);
        exponentRow(b, "Newton step linear solve (Thomas) growth, N = 1000 → 8000",
                f.get("NewtonStepBenchmark.thomasSolve@n=1000"), f.get("NewtonStepBenchmark.thomasSolve@n=8000"), 1000,
                8000, 1.1);
        exponentRow(b, "(context) plain mat-vec baseline growth, N = 1000 → 8000",
                f.get("NewtonStepBenchmark.baselineMatVec@n=1000"), f.get("NewtonStepBenchmark.baselineMatVec@n=8000"),
                1000, 8000, Double.NaN);
        ratioRow(b, "(context) Thomas solve / plain mat-vec, N = 8000", f.get("NewtonStepBenchmark.thomasSolve@n=8000"),
                f.get("NewtonStepBenchmark.baselineMatVec@n=8000"), Double.NaN, true);
        int[] m1 = c.classicalMesh().get("1000");
        int[] m8 = c.classicalMesh().get("8000");
        exponentRow(b, String.format(Locale.ROOT, "whole Newton-Poisson step (classical solve / Newton count), "
                + "%d → %d nodes (%d and %d steps)", m1[0], m8[0], m1[1], m8[1]),
                perStep(f.get("NewtonStepBenchmark.classicalSolve@n=1000"), m1),
                perStep(f.get("NewtonStepBenchmark.classicalSolve@n=8000"), m8), m1[0], m8[0], 1.1);
        for (Map.Entry<String, int[]> e : c.classicalMesh().entrySet()) {
            Figure s = perStep(f.get("NewtonStepBenchmark.classicalSolve@n=" + e.getKey()), e.getValue());
            if (s != null) {
                b.append(String.format(Locale.ROOT, "| (context) one whole Newton step at %d nodes | %s ms (%s – %s) "
                        + "| %s ms (%s – %s) | — | — |%n", e.getValue()[0], num(s.wall().median()), num(s.wall().min()),
                        num(s.wall().max()), num(s.cpu().median()), num(s.cpu().min()), num(s.cpu().max())));
            }
        }

        Figure cold = f.get("ColdSolveBenchmark.coldSolve");
        if (cold != null) {
            b.append(String.format(Locale.ROOT, "| cold equilibrium solve, reference HEMT (%d nodes), one core "
                    + "| %s ms (%s – %s) | %s ms (%s – %s) | ≤ 5 ms | %s |%n", c.nodes(), num(cold.wall().median()),
                    num(cold.wall().min()), num(cold.wall().max()), num(cold.cpu().median()), num(cold.cpu().min()),
                    num(cold.cpu().max()), verdict(cold.cpu().median() <= 5, "CPU")));
            b.append(String.format(Locale.ROOT, "| (baseline) iteration counts of that solve | %d outer, %d Newton "
                    + "| restart from the solution: %d outer, %d Newton; classical solve: %d Newton | — | — |%n",
                    c.coldOuter(), c.coldNewton(), c.restartOuter(), c.restartNewton(), c.classicalNewton()));
            ratioRow(b, "(context) cold solve / classical solve", cold, f.get("ColdSolveBenchmark.classicalSolve"),
                    Double.NaN, true);
            ratioRow(b, "(context) cold solve / restart from the solution", cold,
                    f.get("ColdSolveBenchmark.restartFromSolution"), Double.NaN, true);
            if (!Double.isNaN(cold.allocBytesPerOp())) {
                double mb = cold.allocBytesPerOp() / 1e6;
                b.append(String.format(Locale.ROOT, "| allocation per cold solve (gc.alloc.rate.norm, 1 MB = 10^6 B) "
                        + "| %s MB | — | ≤ 2 MB | %s |%n", num(mb), mb <= 2 ? "met" : "**missed**"));
            }
        }
        ratioRow(b, "MIS-HEMT cold solve / same stack without the insulator (10 nm Al2O3)",
                f.get("GateStackBenchmark.misHemtColdSolve"), f.get("GateStackBenchmark.withoutInsulatorColdSolve"), 1.5,
                false);
        if (f.get("GateStackBenchmark.misHemtColdSolve") != null) {
            b.append(String.format(Locale.ROOT, "| (context) gate-stack iteration counts | MIS-HEMT: %d nodes, %d outer, "
                    + "%d Newton | without the insulator: %d nodes, %d outer, %d Newton | — | — |%n", c.gateStack()[0],
                    c.gateStack()[1], c.gateStack()[2], c.nodes(), c.coldOuter(), c.coldNewton()));
        }

        ratioRow(b, "GaN/AlN/GaN cold solve: quantum holes (2DHG window) / classical holes, same mesh",
                f.get("HoleWindowBenchmark.quantumHolesColdSolve"), f.get("HoleWindowBenchmark.electronsOnlyColdSolve"), 2,
                false);
        ratioRow(b, "101-point sweep: cold / continuation (workflow BiasSweep, quadratic predictor)",
                f.get("SweepBenchmark.coldPoints"), f.get("SweepBenchmark.continuationWorkflow"), 3, true);
        ratioRow(b, "(context) 101-point sweep: cold / plain continuation (solve(s, previous) loop)",
                f.get("SweepBenchmark.coldPoints"), f.get("SweepBenchmark.continuationDirect"), Double.NaN, true);
        if (c.sweepColdOuter() > 0) {
            b.append(String.format(Locale.ROOT, "| (context) sweep iteration counts, 101 points | cold %d outer / %d "
                    + "Newton; BiasSweep %d outer / %d Newton | plain continuation %d outer / %d Newton | — | — |%n",
                    c.sweepColdOuter(), c.sweepColdNewton(), c.workflowOuter(), c.workflowNewton(), c.sweepContOuter(),
                    c.sweepContNewton()));
        }
        mapRows(b, "workflow DesignMap", f.get("DesignMapBenchmark.workflowMap@threads=1"),
                f.get("DesignMapBenchmark.workflowMap@threads=2"));
        mapRows(b, "plain pool", f.get("DesignMapBenchmark.executorMap@threads=1"),
                f.get("DesignMapBenchmark.executorMap@threads=2"));
        for (String t : new String[] {"1", "2"}) {
            Figure mapCold = f.get("DesignMapBenchmark.workflowMap@threads=" + t);
            Figure mapContinued = f.get("DesignMapBenchmark.continuedMap@threads=" + t);
            if (mapCold != null && mapContinued != null) {
                Span w = mapCold.wall().over(mapContinued.wall());
                Span u = mapCold.process().over(mapContinued.process());
                b.append(String.format(Locale.ROOT, "| (context) 200-point design map, %s thread(s): cold / continued "
                        + "(DesignMap.Builder.continuation, issue 18) | %s× (%s× – %s×) | %s× (%s× – %s×) (JVM) | — | — |%n",
                        t, num(w.median()), num(w.min()), num(w.max()), num(u.median()), num(u.min()), num(u.max())));
            }
        }
        for (String n : new String[] {"200", "10000"}) {
            studyRow(b, n, f.get("ToleranceStudyBenchmark.toleranceStudy@samples=" + n),
                    f.get("ToleranceStudyBenchmark.designMap@samples=" + n));
        }
        return b.toString();
    }

    private static void mapRows(StringBuilder b, String what, Figure one, Figure two) {
        if (one == null || two == null) {
            return;
        }
        Span w = one.wall().over(two.wall());
        Span q = one.quiet().over(two.quiet());
        boolean quiet = one.quietSamples() > 0 && two.quietSamples() > 0;
        double basis = quiet ? q.median() : w.median();
        double cpuPerMap = two.process().median() / one.process().median();
        String verdict = verdict(basis >= 1.7, quiet ? "quiet wall" : "wall, no quiet iteration");
        if (cpuPerMap > UNEQUAL_CPU_PER_MAP || cpuPerMap < 1 / UNEQUAL_CPU_PER_MAP) {
            // The same 200 solves cost different CPU on the two sides: the solves of one side ran slower,
            // which the guest's /proc/stat does not see when the host's other tenants share the cores
            // (benchmarks/README.md). Above 1 the ratio is understated, below 1 overstated.
            verdict += String.format(Locale.ROOT, "; the 2-thread map took %s× the CPU of the 1-thread one: "
                    + "the solves ran at different speeds on the two sides, rerun on a quiet machine",
                    num(cpuPerMap));
        }
        b.append(String.format(Locale.ROOT, "| 200-point design map: 1 thread / 2 threads (%s) | all: %s× (%s× – %s×); "
                + "quiet iterations: %s× (%d and %d iterations) | — | ≥ 1.7× | %s |%n", what, num(w.median()),
                num(w.min()), num(w.max()), quiet ? num(q.median()) : "none", one.quietSamples(), two.quietSamples(),
                verdict));
        b.append(String.format(Locale.ROOT, "| (context) %s: JVM CPU per map 2 threads / 1 thread; parallelism "
                + "achieved (JVM CPU / wall, 2 threads); foreign load | %s×; %s processors | foreign: %s (1 thread), "
                + "%s (2 threads) processors | — | — |%n", what, num(cpuPerMap),
                num(two.process().median() / two.wall().median()), num(one.foreign()), num(two.foreign())));
    }

    /**
     * The tolerance study against the design map of the same size (issue #19: within 1.2x). Both use
     * two pool threads, so the verdict uses the whole JVM's CPU time per operation (which other
     * processes do not inflate); the wall-clock ratio is shown beside it.
     */
    private static void studyRow(StringBuilder b, String n, Figure study, Figure map) {
        if (study == null || map == null) {
            return;
        }
        Span w = study.wall().over(map.wall());
        Span u = study.process().over(map.process());
        b.append(String.format(Locale.ROOT, "| %s-sample tolerance study / %s-point design map, n_s, 2 threads "
                + "| %s× (%s× – %s×) | %s× (%s× – %s×) (JVM) | ≤ 1.2× | %s |%n", n, n, num(w.median()), num(w.min()),
                num(w.max()), num(u.median()), num(u.min()), num(u.max()), verdict(u.median() <= 1.2, "JVM CPU")));
    }

    private static String verdict(boolean ok, String basis) {
        return (ok ? "met" : "**missed**") + " (" + basis + ")";
    }

    /** A classical-solve figure divided by its Newton step count. */
    private static Figure perStep(Figure solve, int[] mesh) {
        if (solve == null || mesh == null) {
            return null;
        }
        double k = mesh[1];
        return new Figure(solve.benchmark(), solve.param(), solve.mode(), solve.wall().scaled(1 / k), solve.ci() / k,
                solve.samples(), solve.unit(), solve.quiet().scaled(1 / k), solve.quietSamples(),
                solve.cpu().scaled(1 / k), solve.process().scaled(1 / k), solve.foreign(), Double.NaN);
    }

    private static Figure largestBelow(Map<String, Figure> f, String benchmark, int n) {
        Figure best = null;
        int bestN = -1;
        for (Figure x : f.values()) {
            if (x.benchmark().equals(benchmark) && x.param().startsWith("n=")) {
                int v = Integer.parseInt(x.param().substring(2));
                if (v < n && v > bestN) {
                    best = x;
                    bestN = v;
                }
            }
        }
        return best;
    }

    private static void ratioRow(StringBuilder b, String what, Figure a, Figure bb, double target, boolean atLeast) {
        if (a == null || bb == null) {
            return;
        }
        Span w = a.wall().over(bb.wall());
        Span u = a.cpu().over(bb.cpu());
        String t = Double.isNaN(target) ? "—" : (atLeast ? "≥ " : "≤ ") + num(target) + "×";
        String v = Double.isNaN(target) ? "—" : verdict(atLeast ? u.median() >= target : u.median() <= target, "CPU");
        b.append(String.format(Locale.ROOT, "| %s | %s× (%s× – %s×) | %s× (%s× – %s×) | %s | %s |%n", what,
                num(w.median()), num(w.min()), num(w.max()), num(u.median()), num(u.min()), num(u.max()), t, v));
    }

    private static void exponentRow(StringBuilder b, String what, Figure t1, Figure t2, double n1, double n2,
            double target) {
        if (t1 == null || t2 == null) {
            return;
        }
        Span w = t2.wall().exponentOver(t1.wall(), n2 / n1);
        Span u = t2.cpu().exponentOver(t1.cpu(), n2 / n1);
        String v = Double.isNaN(target) ? "—" : verdict(u.median() <= target, "CPU");
        b.append(String.format(Locale.ROOT, "| %s | N^%.3f (N^%.3f – N^%.3f) | N^%.3f (N^%.3f – N^%.3f) | %s | %s |%n",
                what, w.median(), w.min(), w.max(), u.median(), u.min(), u.max(),
                Double.isNaN(target) ? "—" : "≤ N^" + target, v));
    }

    private static String num(double v) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        double a = Math.abs(v);
        if (a >= 1000) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        if (a >= 100) {
            return String.format(Locale.ROOT, "%.1f", v);
        }
        if (a >= 10) {
            return String.format(Locale.ROOT, "%.2f", v);
        }
        return String.format(Locale.ROOT, "%.3g", v);
    }
}
