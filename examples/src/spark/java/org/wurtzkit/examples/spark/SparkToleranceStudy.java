package org.wurtzkit.examples.spark;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.wurtzkit.errors.Require;
import org.wurtzkit.examples.DemoLab;
import org.wurtzkit.examples.ToleranceStudyExample;
import org.wurtzkit.solvers.workflow.Evaluation;
import org.wurtzkit.solvers.workflow.ToleranceStudy;
import org.wurtzkit.solvers.workflow.ToleranceStudyResult;

/**
 * A {@link ToleranceStudy} on Apache Spark, for studies that outgrow one machine. Each evaluation is
 * a pure function of (recipe, evaluation index): the indices are spread over Spark partitions
 * ({@code SparkContext.range}, so the driver never holds a list of them), every partition builds the
 * study once from the serializable {@link StudyRecipe} and calls {@link ToleranceStudy#evaluate(int)}
 * for its indices, and the driver assembles the returned {@link Evaluation}s with
 * {@link ToleranceStudy#result(java.util.Collection)}. The result equals the local
 * {@link ToleranceStudy#run()} bit for bit, for any number of partitions or executors.
 *
 * <p>The driver collects one {@link Evaluation} per index (about 100 bytes plus 8 per output), so a
 * study of 10<sup>7</sup> evaluations needs a driver with a few GB of heap
 * ({@code --driver-memory}); beyond that, write the evaluations per partition and assemble them
 * later in the same way.
 *
 * <p>Spark stays out of the library: this class lives in the examples module's {@code spark}
 * profile, with Spark as a {@code provided} dependency (the cluster supplies it). On Java 17 the
 * driver and executors need the {@code --add-opens} options of {@link #JAVA_17_OPTIONS} (spark-submit
 * adds them itself; a JVM started otherwise, e.g. a test, must pass them).
 *
 * <p>{@link #main(String[])} runs the demo wafer's study on Spark and, for comparison, locally: it
 * checks that the two agree bit for bit and prints the time of each and their ratio.
 */
public final class SparkToleranceStudy {
    /**
     * The JVM options Spark needs on Java 17 (module access for its serializers, off-heap memory and
     * Netty), as Spark's launcher ({@code org.apache.spark.launcher.JavaModuleOptions}) lists them [from memory;
     * the Spark test of this module runs with them].
     */
    public static final List<String> JAVA_17_OPTIONS = List.of("-XX:+IgnoreUnrecognizedVMOptions",
            "--add-opens=java.base/java.lang=ALL-UNNAMED", "--add-opens=java.base/java.lang.invoke=ALL-UNNAMED",
            "--add-opens=java.base/java.lang.reflect=ALL-UNNAMED", "--add-opens=java.base/java.io=ALL-UNNAMED",
            "--add-opens=java.base/java.net=ALL-UNNAMED", "--add-opens=java.base/java.nio=ALL-UNNAMED",
            "--add-opens=java.base/java.util=ALL-UNNAMED", "--add-opens=java.base/java.util.concurrent=ALL-UNNAMED",
            "--add-opens=java.base/java.util.concurrent.atomic=ALL-UNNAMED",
            "--add-opens=java.base/jdk.internal.ref=ALL-UNNAMED", "--add-opens=java.base/sun.nio.ch=ALL-UNNAMED",
            "--add-opens=java.base/sun.nio.cs=ALL-UNNAMED", "--add-opens=java.base/sun.security.action=ALL-UNNAMED",
            "--add-opens=java.base/sun.util.calendar=ALL-UNNAMED",
            "--add-opens=java.security.jgss/sun.security.krb5=ALL-UNNAMED", "-Djdk.reflect.useDirectMethodHandle=false",
            "-Dio.netty.tryReflectionSetAccessible=true");

    private SparkToleranceStudy() {
    }

    /**
     * Runs every evaluation of the recipe's study in Spark tasks and assembles the result on the
     * driver.
     *
     * @param spark      the Spark context
     * @param recipe     builds the study (on the driver and once per partition)
     * @param partitions number of partitions, &ge; 1 (a few per executor core balances the load)
     * @return the result, identical to {@code recipe.build().run()}
     */
    public static ToleranceStudyResult run(JavaSparkContext spark, StudyRecipe recipe, int partitions) {
        Require.nonNull("Spark context", spark);
        Require.nonNull("study recipe", recipe);
        Require.inRange("number of partitions", partitions, 1, 1_000_000);
        ToleranceStudy study = recipe.build();
        JavaRDD<Object> indices = spark.sc().range(0, study.size(), 1, partitions).toJavaRDD();
        List<Evaluation> evaluations = indices.mapPartitions((Iterator<Object> it) -> {
            ToleranceStudy local = recipe.build();
            List<Evaluation> out = new ArrayList<>();
            while (it.hasNext()) {
                out.add(local.evaluate(((Long) it.next()).intValue()));
            }
            return out.iterator();
        }).collect();
        return study.result(evaluations);
    }

    /**
     * @param master Spark master URL, e.g. "local[2]"
     * @return a configuration for the examples (no web UI, log level WARN; driver bound to the loopback address in
     *         local mode)
     */
    public static SparkConf conf(String master) {
        SparkConf c = new SparkConf().setAppName("wurtzkit tolerance study").setMaster(master)
                .set("spark.ui.enabled", "false").set("spark.log.level", "WARN");
        if (master.startsWith("local")) {
            c.set("spark.driver.host", "127.0.0.1").set("spark.driver.bindAddress", "127.0.0.1");
        }
        return c;
    }

    /**
     * Runs the demo wafer's study (n_s) on Spark; unless told otherwise, also locally with as many
     * threads as Spark's default parallelism, after a warm-up of both, checks that the two agree bit
     * for bit and prints the times and their ratio.
     *
     * @param args {@code [master (default local[2]; "-" = from spark-submit)] [rows (default 64)]
     *             [partitions (default 8)] [--spark-only]}
     */
    public static void main(String[] args) {
        String master = args.length > 0 && !args[0].equals("-") ? args[0] : null;
        int rows = args.length > 1 ? Integer.parseInt(args[1]) : 64;
        int partitions = args.length > 2 ? Integer.parseInt(args[2]) : 8;
        boolean compare = !(args.length > 3 && args[3].equals("--spark-only"));
        SparkConf conf = master != null ? conf(master) : new SparkConf().setAppName("wurtzkit tolerance study");
        DemoWaferRecipe recipe = new DemoWaferRecipe(rows, 1.0, 731, false);
        DemoWaferRecipe warmUp = new DemoWaferRecipe(8, 1.0, 1, false);
        System.out.println("Tolerance study of wafer " + DemoLab.WAFER + ", " + DemoLab.INVENTED + ": n_s, "
                + recipe.build().size() + " evaluations");
        try (JavaSparkContext spark = new JavaSparkContext(conf)) {
            int threads = Math.max(1, spark.defaultParallelism());
            // warm-up: JIT of the solver and Spark's start-up, not timed
            run(spark, warmUp, partitions);
            ToleranceStudyResult local = null;
            double localS = Double.NaN;
            if (compare) {
                ToleranceStudyExample.study(warmUp.settings(), threads, (d, t) -> {
                }).run();
                long t0 = System.nanoTime();
                local = ToleranceStudyExample.study(recipe.settings(), threads, (d, t) -> {
                }).run();
                localS = (System.nanoTime() - t0) * 1e-9;
                System.out.printf(Locale.ROOT, "  local run, %d threads: %.2f s%n", threads, localS);
            }
            long t1 = System.nanoTime();
            ToleranceStudyResult distributed = run(spark, recipe, partitions);
            double sparkS = (System.nanoTime() - t1) * 1e-9;
            System.out.printf(Locale.ROOT, "  Spark (%s), %d partitions: %.2f s%n", spark.master(), partitions, sparkS);
            ToleranceStudyResult.Summary s = distributed.summary(0);
            System.out.printf(Locale.ROOT, "  n_s mean %.4g cm^-2, sd %.3g cm^-2 over %d samples, %d failed%n", s.mean(),
                    s.standardDeviation(), s.count(), distributed.failures().size());
            ToleranceStudyResult.Sensitivity sens = distributed.sensitivity(0);
            for (ToleranceStudyResult.SobolIndex x : sens.ranking()) {
                System.out.printf(Locale.ROOT, "    %-22s S_i %.3f +- %.3f, S_Ti %.3f%n", x.input(), x.firstOrder(),
                        x.firstOrderStandardError(), x.totalEffect());
            }
            sens.warnings().forEach(w -> System.out.println("    warning: " + w.message()));
            if (compare) {
                boolean same = identical(local, distributed);
                System.out.printf(Locale.ROOT, "  Spark / local time ratio: %.2f (after start-up and warm-up)%n",
                        sparkS / localS);
                System.out.println("  identical bit for bit: " + same);
                if (!same) {
                    throw new IllegalStateException("the Spark run differs from the local run");
                }
            }
        }
    }

    /**
     * @param a a result
     * @param b another
     * @return true if every evaluation's outputs (bit patterns) and failure agree
     */
    public static boolean identical(ToleranceStudyResult a, ToleranceStudyResult b) {
        if (a.size() != b.size() || a.outputs().size() != b.outputs().size()) {
            return false;
        }
        for (int j = 0; j < a.size(); j++) {
            for (int q = 0; q < a.outputs().size(); q++) {
                if (Double.doubleToRawLongBits(a.value(j, q)) != Double.doubleToRawLongBits(b.value(j, q))) {
                    return false;
                }
            }
            if (!java.util.Objects.equals(a.failure(j), b.failure(j))) {
                return false;
            }
        }
        return a.design().seed() == b.design().seed();
    }
}
