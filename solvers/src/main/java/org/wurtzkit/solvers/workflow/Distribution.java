package org.wurtzkit.solvers.workflow;

import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.util.FastMath;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * A probability distribution of one uncertain input of a {@link ToleranceStudy}, sampled by
 * inversion: {@link #quantile(double)} maps a uniform number u in (0, 1) to a value. Inversion
 * keeps one uniform per input and sample, which is what Latin hypercube sampling and the Sobol
 * design of {@link SampleDesign} need.
 *
 * <p>The normal quantile is x = mean + sd &middot; &radic;2 &middot; erf<sup>-1</sup>(2u - 1), with
 * the inverse error function of Apache Commons Math ({@link Erf#erfInv(double)}, the
 * single-precision-free approximation of M. Giles, "Approximating the erfinv function", GPU
 * Computing Gems Jade Edition, 109 (2011) [from memory]). It is pure Java on {@link FastMath}, so
 * a sample gives the same bits on every JVM; the same formula is what Commons Math's
 * {@code NormalDistribution.inverseCumulativeProbability} evaluates.
 *
 * <p>Immutable records; validated on construction.
 */
public sealed interface Distribution permits Distribution.Normal, Distribution.Uniform, Distribution.TruncatedNormal {

    /**
     * @param u a probability in (0, 1)
     * @return the value whose cumulative probability is u
     */
    double quantile(double u);

    /** @return the mean */
    double mean();

    /** @return the variance */
    double variance();

    /** @return the smallest value the distribution can give (may be -infinity) */
    double lower();

    /** @return the largest value the distribution can give (may be +infinity) */
    double upper();

    /**
     * A normal (Gaussian) distribution; its support is the whole real line, so it cannot describe a
     * bounded quantity such as a composition (use {@link TruncatedNormal} there).
     *
     * @param mean              mean, finite
     * @param standardDeviation standard deviation, &gt; 0
     */
    record Normal(double mean, double standardDeviation) implements Distribution {
        /** Validates. */
        public Normal {
            Require.finite("mean of a normal distribution", mean);
            Require.positive("standard deviation of a normal distribution", standardDeviation);
        }

        @Override
        public double quantile(double u) {
            return mean + standardDeviation * standardNormalQuantile(u);
        }

        @Override
        public double variance() {
            return standardDeviation * standardDeviation;
        }

        @Override
        public double lower() {
            return Double.NEGATIVE_INFINITY;
        }

        @Override
        public double upper() {
            return Double.POSITIVE_INFINITY;
        }
    }

    /**
     * A uniform distribution on [lower, upper].
     *
     * @param lower lower end, finite
     * @param upper upper end, finite and &gt; lower
     */
    record Uniform(double lower, double upper) implements Distribution {
        /** Validates. */
        public Uniform {
            Require.finite("lower end of a uniform distribution", lower);
            Require.finite("upper end of a uniform distribution", upper);
            if (!(upper > lower)) {
                throw new InvalidParameterException("upper end of a uniform distribution", Double.toString(upper),
                        "(" + lower + ", ...) (above the lower end)");
            }
        }

        @Override
        public double quantile(double u) {
            return lower + u * (upper - lower);
        }

        @Override
        public double mean() {
            return 0.5 * (lower + upper);
        }

        @Override
        public double variance() {
            double w = upper - lower;
            return w * w / 12.0;
        }
    }

    /**
     * A normal distribution cut to [lower, upper] and renormalized: the usual model of a growth
     * tolerance whose tails are screened out (a wafer outside the window is rejected). Sampled by
     * inversion of the restricted cumulative distribution.
     *
     * @param mean              mean of the parent normal, finite
     * @param standardDeviation standard deviation of the parent normal, &gt; 0
     * @param lower             lower cut, finite
     * @param upper             upper cut, finite, &gt; lower, and the window must keep a probability
     *                          mass of at least 1e-6 of the parent normal
     */
    record TruncatedNormal(double parentMean, double parentStandardDeviation, double lower, double upper) implements Distribution {
        /** Validates. */
        public TruncatedNormal {
            Require.finite("mean of a truncated normal distribution", parentMean);
            Require.positive("standard deviation of a truncated normal distribution", parentStandardDeviation);
            Require.finite("lower cut of a truncated normal distribution", lower);
            Require.finite("upper cut of a truncated normal distribution", upper);
            if (!(upper > lower)) {
                throw new InvalidParameterException("upper cut of a truncated normal distribution",
                        Double.toString(upper), "(" + lower + ", ...) (above the lower cut)");
            }
            double mass = standardNormalCdf((upper - parentMean) / parentStandardDeviation)
                    - standardNormalCdf((lower - parentMean) / parentStandardDeviation);
            if (!(mass >= 1e-6)) {
                throw new InvalidParameterException("probability mass inside the cuts of a truncated normal distribution",
                        Double.toString(mass), "[1e-6, 1] (move the window [" + lower + ", " + upper + "] towards the mean "
                                + parentMean + ")");
            }
        }

        @Override
        public double quantile(double u) {
            double a = standardNormalCdf((lower - parentMean) / parentStandardDeviation);
            double b = standardNormalCdf((upper - parentMean) / parentStandardDeviation);
            double x = parentMean + parentStandardDeviation * standardNormalQuantile(a + u * (b - a));
            // the inverse of a rounded cumulative may step a few ulp past a cut: the cut is the bound
            return Math.min(upper, Math.max(lower, x));
        }

        /**
         * @return the mean of the truncated distribution, mu + sigma (phi(alpha) - phi(beta)) / Z
         *         (N. L. Johnson, S. Kotz, N. Balakrishnan, Continuous Univariate Distributions
         *         vol. 1, 2nd ed., Wiley 1994, sec. 10.1 [from memory])
         */
        @Override
        public double mean() {
            double al = (lower - parentMean) / parentStandardDeviation;
            double be = (upper - parentMean) / parentStandardDeviation;
            double z = standardNormalCdf(be) - standardNormalCdf(al);
            return parentMean + parentStandardDeviation * (pdf(al) - pdf(be)) / z;
        }

        /**
         * @return sigma^2 [1 + (alpha phi(alpha) - beta phi(beta)) / Z - ((phi(alpha) - phi(beta)) / Z)^2]
         *         (same source as {@link #mean()})
         */
        @Override
        public double variance() {
            double al = (lower - parentMean) / parentStandardDeviation;
            double be = (upper - parentMean) / parentStandardDeviation;
            double z = standardNormalCdf(be) - standardNormalCdf(al);
            double d = (pdf(al) - pdf(be)) / z;
            return parentStandardDeviation * parentStandardDeviation * (1 + (al * pdf(al) - be * pdf(be)) / z - d * d);
        }

        private static double pdf(double x) {
            return FastMath.exp(-0.5 * x * x) / FastMath.sqrt(2 * Math.PI);
        }
    }

    /**
     * @param mean              mean
     * @param standardDeviation standard deviation, &gt; 0
     * @return a normal distribution
     */
    static Normal normal(double mean, double standardDeviation) {
        return new Normal(mean, standardDeviation);
    }

    /**
     * @param lower lower end
     * @param upper upper end
     * @return a uniform distribution
     */
    static Uniform uniform(double lower, double upper) {
        return new Uniform(lower, upper);
    }

    /**
     * @param mean              mean of the parent normal
     * @param standardDeviation standard deviation of the parent normal, &gt; 0
     * @param lower             lower cut
     * @param upper             upper cut
     * @return a truncated normal distribution
     */
    static TruncatedNormal truncatedNormal(double mean, double standardDeviation, double lower, double upper) {
        return new TruncatedNormal(mean, standardDeviation, lower, upper);
    }

    /**
     * The normal distribution cut at mean &plusmn; k standard deviations.
     *
     * @param mean              mean
     * @param standardDeviation standard deviation, &gt; 0
     * @param sigmas            k, &gt; 0
     * @return a truncated normal distribution
     */
    static TruncatedNormal normalWithin(double mean, double standardDeviation, double sigmas) {
        Require.positive("number of standard deviations of the cut", sigmas);
        return new TruncatedNormal(mean, standardDeviation, mean - sigmas * standardDeviation,
                mean + sigmas * standardDeviation);
    }

    /**
     * @param u a probability in (0, 1)
     * @return the standard normal quantile, &radic;2 erf<sup>-1</sup>(2u - 1)
     */
    static double standardNormalQuantile(double u) {
        if (!(u > 0 && u < 1)) {
            throw new InvalidParameterException("probability of a quantile", Double.toString(u), "(0, 1)");
        }
        double p = 2 * u - 1;
        // 2u - 1 rounds to -1 for u < 2^-54 (and erfInv(-1) is infinite): stay one ulp inside, which
        // limits the quantile to about -8.3 there; the sample designs give u >= 2^-53 / n
        if (p <= -1) {
            p = Math.nextUp(-1.0);
        }
        return FastMath.sqrt(2.0) * Erf.erfInv(p);
    }

    /**
     * @param x a value
     * @return the standard normal cumulative probability, (1 + erf(x / &radic;2)) / 2
     */
    static double standardNormalCdf(double x) {
        return 0.5 * Erf.erfc(-x / FastMath.sqrt(2.0));
    }
}
