package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;

/**
 * The sampling and the statistics of the tolerance studies, on responses whose answers are known in
 * closed form.
 */
class SampleDesignTest {
    private static final List<Column> Y = List.of(Column.of("y", ""));

    /**
     * The per-row streams are SplitMix64 as the JDK implements it: the seed of row r is the
     * (r + 1)-th output of {@code new SplittableRandom(seed)}, and draw d of a stream the (d + 1)-th
     * output of {@code new SplittableRandom(streamSeed)} (reference: java.util.SplittableRandom of
     * the running JDK, a general-purpose library).
     */
    @Test
    void streamsAreSplitMix64AsTheJdkComputesIt() {
        for (long seed : new long[] {0L, 1L, -7L, 0x123456789ABCDEFL}) {
            SplittableRandom outer = new SplittableRandom(seed);
            for (int row = 0; row < 50; row++) {
                long streamSeed = SampleDesign.stream(seed, row);
                assertEquals(outer.nextLong(), streamSeed, "row " + row);
                SplittableRandom inner = new SplittableRandom(streamSeed);
                for (int d = 0; d < 6; d++) {
                    assertEquals(inner.nextLong(), SampleDesign.streamDraw(streamSeed, d), "row " + row + " draw " + d);
                }
            }
        }
    }

    /**
     * Uniform numbers stay strictly inside (0, 1) at the extremes of the generator and of the
     * strata, so that no quantile is infinite (exact floating-point arithmetic, no source).
     */
    @Test
    void uniformNumbersNeverReachZeroOrOne() {
        assertTrue(SampleDesign.openUnit(-1L) < 1.0);
        assertTrue(SampleDesign.openUnit(0L) > 0.0);
        // why the Latin hypercube keeps u below 1 explicitly: the top stratum would round to 1.0
        assertEquals(1.0, (50_000_000 - 1 + SampleDesign.openUnit(-1L)) / 50_000_000);
        SampleDesign big = new SampleDesign(List.of(UncertainInput.of("x", "", Distribution.normal(0, 1))), 50_000_000,
                SamplingPlan.LATIN_HYPERCUBE, 3, false);
        for (int r = 0; r < 2000; r++) {
            double u = big.uniform(r, 0);
            assertTrue(u > 0 && u < 1, "row " + r + ": " + u);
            assertTrue(Double.isFinite(big.values(r)[0]));
        }
        assertTrue(Double.isFinite(Distribution.standardNormalQuantile(Double.MIN_VALUE)));
        assertTrue(Double.isFinite(Distribution.standardNormalQuantile(Math.nextDown(1.0))));
    }

    /** Standard normal quantiles against the table of Abramowitz &amp; Stegun (1964), Table 26.5. */
    @Test
    void normalQuantilesMatchTheHandbook() {
        assertEquals(1.959963985, Distribution.standardNormalQuantile(0.975), 1e-9);
        assertEquals(1.644853627, Distribution.standardNormalQuantile(0.95), 1e-9);
        assertEquals(-2.326347874, Distribution.standardNormalQuantile(0.01), 1e-9);
        assertEquals(3.090232306, Distribution.standardNormalQuantile(0.999), 1e-8);
        assertEquals(0.0, Distribution.standardNormalQuantile(0.5), 1e-15);
    }

    /**
     * Every Latin-hypercube column puts exactly one sample in each of the n strata (the defining
     * property, McKay, Beckman &amp; Conover, Technometrics 21, 239 (1979)); and the keyed Feistel
     * map is a permutation for sizes that are and are not powers of two.
     */
    @Test
    void latinHypercubeFillsEveryStratumOnce() {
        for (int n : new int[] {2, 3, 7, 64, 97, 1000}) {
            SampleDesign d = new SampleDesign(List.of(UncertainInput.of("a", "", Distribution.uniform(0, 1)),
                    UncertainInput.of("b", "", Distribution.uniform(0, 1))), n, SamplingPlan.LATIN_HYPERCUBE, 11, true);
            for (int coord = 0; coord < 4; coord++) {
                boolean[] hit = new boolean[n];
                for (int r = 0; r < n; r++) {
                    double u = d.uniform(r, coord);
                    assertTrue(u > 0 && u < 1);
                    int stratum = (int) Math.floor(u * n);
                    assertTrue(!hit[stratum], "n " + n + " coordinate " + coord + " stratum " + stratum + " twice");
                    hit[stratum] = true;
                }
            }
        }
        // different keys give different permutations (not the identity every time)
        int same = 0;
        for (int x = 0; x < 100; x++) {
            same += SampleDesign.permute(x, 100, 1) == SampleDesign.permute(x, 100, 2) ? 1 : 0;
        }
        assertTrue(same < 20, "two keys agree on " + same + " of 100 values");
    }

    /**
     * The values of an evaluation are a pure function of (seed, index): the same from a fresh
     * design, asked in any order; and the A_B^(i) rows take column i from B and the rest from A
     * (Saltelli et al., Comput. Phys. Commun. 181, 259 (2010), sec. 3).
     */
    @Test
    void valuesAreAPureFunctionOfSeedAndIndex() {
        List<UncertainInput> in = List.of(UncertainInput.of("a", "", Distribution.normal(0, 1)),
                UncertainInput.of("b", "", Distribution.uniform(-1, 1)),
                UncertainInput.of("c", "", Distribution.truncatedNormal(5, 2, 4, 9)));
        SampleDesign d1 = new SampleDesign(in, 40, SamplingPlan.MONTE_CARLO, 99, true);
        SampleDesign d2 = new SampleDesign(in, 40, SamplingPlan.MONTE_CARLO, 99, true);
        assertEquals(200, d1.evaluations());
        List<Integer> order = new ArrayList<>();
        for (int j = 0; j < d1.evaluations(); j++) {
            order.add(j);
        }
        Collections.shuffle(order, new java.util.Random(3));
        for (int j : order) {
            double[] a = d2.values(j);
            double[] b = d1.values(j);
            for (int i = 0; i < 3; i++) {
                assertTrue(a[i] == b[i]);
            }
        }
        for (int r = 0; r < 40; r++) {
            double[] a = d1.values(r * 5);
            double[] b = d1.values(r * 5 + 1);
            for (int i = 0; i < 3; i++) {
                double[] abi = d1.values(r * 5 + 2 + i);
                for (int c = 0; c < 3; c++) {
                    assertTrue(abi[c] == (c == i ? b[c] : a[c]), "row " + r + " A_B(" + i + ") column " + c);
                }
            }
            assertTrue(a[0] != b[0]);
        }
        // a different seed gives different numbers
        SampleDesign other = new SampleDesign(in, 40, SamplingPlan.MONTE_CARLO, 100, true);
        assertTrue(other.values(0)[0] != d1.values(0)[0]);
    }

    /**
     * y = 3 + 2 x1 - 0.5 x2 with x1 ~ N(1, 0.2^2), x2 ~ N(-2, 1.5^2) independent: mean 6, variance
     * 4 (0.04) + 0.25 (2.25) = 0.7225, normal, so the 5 % / 95 % quantiles are 6 -/+ 1.6449 * 0.85;
     * first-order indices 0.16 / 0.7225 and 0.5625 / 0.7225, equal to the total effects (an additive
     * response; exact, elementary probability). Tolerances: four standard errors of each estimate.
     */
    /**
     * The same linear response with only 8 Sobol rows: each first-order estimate is a mean of 8
     * terms, so its standard error (sd / sqrt(N) / V, central limit theorem, common practice, no
     * source) lies far above 0.05 and the ranking gets a typed warning naming the row count.
     */
    @Test
    void aSmallSobolDesignWarnsThatItsRankingIsRough() {
        List<UncertainInput> in = List.of(UncertainInput.of("x1", "", Distribution.normal(1, 0.2)),
                UncertainInput.of("x2", "", Distribution.normal(-2, 1.5)));
        ToleranceStudyResult r = new SampleDesign(in, 8, SamplingPlan.MONTE_CARLO, 2026, true)
                .run(Y, x -> new double[] {3 + 2 * x[0] - 0.5 * x[1]}, 1, ProgressListener.NONE);
        ToleranceStudyResult.Sensitivity sens = r.sensitivity(0);
        assertTrue(sens.indices().stream().anyMatch(i -> i.firstOrderStandardError() > 0.05), sens.toString());
        assertEquals(List.of(org.wurtzkit.warnings.WarningKind.SENSITIVITY_STANDARD_ERROR_LARGE),
                sens.warnings().stream().map(org.wurtzkit.warnings.Warning::kind).toList(), sens.warnings().toString());
        assertTrue(sens.warnings().get(0).message().contains("with 8 rows"), sens.warnings().toString());
    }

    @Test
    void linearResponseToNormalInputsHasTheAnalyticMeanAndVariance() {
        List<UncertainInput> in = List.of(UncertainInput.of("x1", "", Distribution.normal(1, 0.2)),
                UncertainInput.of("x2", "", Distribution.normal(-2, 1.5)));
        for (SamplingPlan plan : SamplingPlan.values()) {
            SampleDesign d = new SampleDesign(in, 20000, plan, 2026, true);
            ToleranceStudyResult r = d.run(Y, x -> new double[] {3 + 2 * x[0] - 0.5 * x[1]}, 2, ProgressListener.NONE);
            ToleranceStudyResult.Summary s = r.summary(0);
            double sd = Math.sqrt(0.7225);
            int n = s.count();
            assertEquals(40000, n);
            assertEquals(6.0, s.mean(), 4 * sd / Math.sqrt(n), plan.toString());
            // standard error of a sample standard deviation of normal data: sd / sqrt(2 (n - 1))
            assertEquals(sd, s.standardDeviation(), 4 * sd / Math.sqrt(2.0 * (n - 1)), plan.toString());
            assertEquals(6.0, s.median(), 0.02, plan.toString());
            assertEquals(6 - 1.6448536 * sd, s.p05(), 0.03, plan.toString());
            assertEquals(6 + 1.6448536 * sd, s.p95(), 0.03, plan.toString());
            ToleranceStudyResult.Sensitivity sens = r.sensitivity(0);
            assertEquals(20000, sens.rows());
            ToleranceStudyResult.SobolIndex s1 = sens.index("x1");
            ToleranceStudyResult.SobolIndex s2 = sens.index("x2");
            assertEquals(0.16 / 0.7225, s1.firstOrder(), Math.max(4 * s1.firstOrderStandardError(), 1e-3), plan.toString());
            assertEquals(0.5625 / 0.7225, s2.firstOrder(), Math.max(4 * s2.firstOrderStandardError(), 1e-3),
                    plan.toString());
            assertEquals(0.16 / 0.7225, s1.totalEffect(), 0.02, plan.toString());
            assertEquals(0.5625 / 0.7225, s2.totalEffect(), 0.02, plan.toString());
            assertEquals("x2", sens.ranking().get(0).input());
            assertTrue(sens.warnings().isEmpty(), sens.warnings().toString());
        }
    }

    /**
     * The Ishigami function f = sin x1 + a sin^2 x2 + b x3^4 sin x1, x_i ~ U(-pi, pi), a = 7, b = 0.1
     * (T. Ishigami, T. Homma, Proc. ISUMA '90, 398 (1990); the benchmark of Saltelli et al. 2010).
     * Its partial variances follow in closed form: V1 = (1 + b pi^4 / 5)^2 / 2, V2 = a^2 / 8, V3 = 0,
     * V13 = b^2 pi^8 (1/18 - 1/50), V = V1 + V2 + V13; so S1 = 0.3139, S2 = 0.4424, S3 = 0 and
     * S_T1 = 0.5576, S_T2 = 0.4424, S_T3 = 0.2437, the values the two papers quote.
     */
    @Test
    void ishigamiIndicesMatchTheirAnalyticValues() {
        double a = 7;
        double b = 0.1;
        double pi4 = Math.pow(Math.PI, 4);
        double pi8 = pi4 * pi4;
        double v1 = 0.5 * Math.pow(1 + b * pi4 / 5, 2);
        double v2 = a * a / 8;
        double v13 = b * b * pi8 * (1.0 / 18 - 1.0 / 50);
        double v = v1 + v2 + v13;
        double[] first = {v1 / v, v2 / v, 0};
        double[] total = {(v1 + v13) / v, v2 / v, v13 / v};
        // the values as published, to four digits: a check on the closed form above
        assertEquals(0.3139, first[0], 5e-5);
        assertEquals(0.4424, first[1], 5e-5);
        assertEquals(0.2437, total[2], 5e-5);

        List<UncertainInput> in = new ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            in.add(UncertainInput.of("x" + i, "rad", Distribution.uniform(-Math.PI, Math.PI)));
        }
        for (SamplingPlan plan : SamplingPlan.values()) {
            SampleDesign d = new SampleDesign(in, 20000, plan, 1990, true);
            ToleranceStudyResult r = d.run(Y, x -> new double[] {Math.sin(x[0]) + a * Math.pow(Math.sin(x[1]), 2)
                    + b * Math.pow(x[2], 4) * Math.sin(x[0])}, 2, ProgressListener.NONE);
            ToleranceStudyResult.Sensitivity s = r.sensitivity(0);
            assertEquals(v, s.variance(), 0.05 * v, plan.toString());
            for (int i = 0; i < 3; i++) {
                ToleranceStudyResult.SobolIndex x = s.indices().get(i);
                double tol = Math.max(4 * x.firstOrderStandardError(), 0.01);
                assertTrue(tol < 0.05, "standard error too large to test: " + x);
                assertEquals(first[i], x.firstOrder(), tol, plan + " S" + (i + 1));
                assertEquals(total[i], x.totalEffect(), 0.03, plan + " S_T" + (i + 1));
            }
            assertEquals(List.of("x2", "x1", "x3"), s.ranking().stream().map(ToleranceStudyResult.SobolIndex::input).toList());
            // mean of f: a/2 (the other terms average to zero)
            assertEquals(a / 2, r.summary(0).mean(), 0.05, plan.toString());
        }
    }

    /** The result is the same, bit for bit, on one thread and on three. */
    @Test
    void resultIsIndependentOfThreadCount() {
        List<UncertainInput> in = List.of(UncertainInput.of("x", "", Distribution.normal(0, 1)),
                UncertainInput.of("z", "", Distribution.uniform(0, 2)));
        SampleDesign d = new SampleDesign(in, 500, SamplingPlan.LATIN_HYPERCUBE, 5, true);
        SampleDesign.Response f = x -> new double[] {Math.exp(0.3 * x[0]) * x[1], x[0] * x[1]};
        List<Column> out = List.of(Column.of("f", ""), Column.of("g", ""));
        ToleranceStudyResult one = d.run(out, f, 1, ProgressListener.NONE);
        ToleranceStudyResult three = d.run(out, f, 3, ProgressListener.NONE);
        for (int j = 0; j < d.evaluations(); j++) {
            for (int c = 0; c < 2; c++) {
                assertTrue(one.value(j, c) == three.value(j, c));
            }
        }
        assertTrue(one.summary(0).equals(three.summary(0)));
        assertTrue(one.sensitivity(1).equals(three.sensitivity(1)));
    }

    /**
     * Failed evaluations are kept, counted and left out of the statistics and of the Sobol rows;
     * nothing is dropped silently.
     */
    @Test
    void failuresAreCountedNotDropped() {
        List<UncertainInput> in = List.of(UncertainInput.of("x", "", Distribution.uniform(0, 1)),
                UncertainInput.of("z", "", Distribution.uniform(0, 1)));
        SampleDesign d = new SampleDesign(in, 400, SamplingPlan.MONTE_CARLO, 8, true);
        int[] calls = {0};
        ToleranceStudyResult r = d.run(Y, x -> {
            if (x[0] > 0.9) {
                throw new org.wurtzkit.errors.WurtzkitException(org.wurtzkit.errors.ErrorKind.NOT_CONVERGED, "x above 0.9");
            }
            return new double[] {x[0] + 0.1 * x[1]};
        }, 1, (done, total) -> calls[0] = done);
        assertEquals(d.evaluations(), calls[0]);
        int failedIndependent = 0;
        int failedAll = 0;
        for (int j = 0; j < d.evaluations(); j++) {
            if (d.values(j)[0] > 0.9) {
                failedAll++;
                failedIndependent += d.slot(j) <= 1 ? 1 : 0;
                assertTrue(Double.isNaN(r.value(j, 0)));
                assertTrue(r.failure(j).orElseThrow().message().contains("x above 0.9"));
            }
        }
        assertTrue(failedAll > 0);
        assertEquals(failedAll, r.failures().size());
        ToleranceStudyResult.Summary s = r.summary(0);
        assertEquals(failedIndependent, s.failed());
        assertEquals(800 - failedIndependent, s.count());
        ToleranceStudyResult.Sensitivity sens = r.sensitivity(0);
        assertEquals(400, sens.rows() + sens.skipped());
        assertTrue(sens.skipped() > 0);
        assertTrue(sens.warnings().stream().anyMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.POINTS_LEFT_OUT && w.message().contains("rows left out")), sens.warnings().toString());
    }

    /** Bad input: each a clear exception naming the parameter. */
    @Test
    void badInputIsRejected() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> Distribution.normal(0, -1));
        assertTrue(e.getMessage().contains("standard deviation"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> Distribution.uniform(1, 1));
        assertThrows(InvalidParameterException.class, () -> Distribution.truncatedNormal(0, 1, 10, 11));
        List<UncertainInput> in = List.of(UncertainInput.of("x", "", Distribution.uniform(0, 1)));
        assertThrows(InvalidParameterException.class, () -> new SampleDesign(in, 1, SamplingPlan.MONTE_CARLO, 0, false));
        assertThrows(InvalidParameterException.class, () -> new SampleDesign(List.of(), 10, SamplingPlan.MONTE_CARLO, 0,
                false));
        assertThrows(InvalidParameterException.class, () -> new SampleDesign(List.of(in.get(0), in.get(0)), 10,
                SamplingPlan.MONTE_CARLO, 0, false));
        SampleDesign plain = new SampleDesign(in, 10, SamplingPlan.MONTE_CARLO, 0, false);
        ToleranceStudyResult r = plain.run(Y, x -> x, 1, ProgressListener.NONE);
        assertThrows(org.wurtzkit.errors.WurtzkitException.class, () -> r.sensitivity(0));
        assertThrows(InvalidParameterException.class, () -> plain.values(10));
    }

    /**
     * A truncated normal stays inside its cuts, and its sample mean and variance approach the
     * closed forms of Johnson, Kotz &amp; Balakrishnan (Continuous Univariate Distributions vol. 1,
     * 2nd ed., Wiley 1994, sec. 10.1 [from memory]); a symmetric cut keeps the mean, and a cut at
     * +-1 sigma leaves variance 1 - 2 phi(1) / (2 Phi(1) - 1) = 0.29112 (standard tables).
     */
    @Test
    void truncatedNormalMomentsMatchTheClosedForms() {
        Distribution.TruncatedNormal t = Distribution.truncatedNormal(0, 1, -1, 1);
        assertEquals(0.0, t.mean(), 1e-15);
        assertEquals(0.29112, t.variance(), 1e-5);
        Distribution.TruncatedNormal skew = Distribution.truncatedNormal(0.26, 0.02, 0.25, 0.33);
        SampleDesign d = new SampleDesign(List.of(new UncertainInput(Column.of("x", ""), skew)), 20000,
                SamplingPlan.MONTE_CARLO, 4, false);
        ToleranceStudyResult r = d.run(Y, x -> x, 2, ProgressListener.NONE);
        ToleranceStudyResult.Summary s = r.summary(0);
        assertTrue(s.min() >= 0.25 && s.max() <= 0.33);
        double sd = Math.sqrt(skew.variance());
        assertEquals(skew.mean(), s.mean(), 4 * sd / Math.sqrt(20000));
        assertEquals(sd, s.standardDeviation(), 0.02 * sd);
    }
}
