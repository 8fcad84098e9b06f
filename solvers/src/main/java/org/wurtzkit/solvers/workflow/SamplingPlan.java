package org.wurtzkit.solvers.workflow;

/**
 * How a {@link SampleDesign} spreads its samples over the inputs' distributions.
 */
public enum SamplingPlan {
    /** Independent uniform numbers for every sample and input (plain Monte Carlo). */
    MONTE_CARLO,
    /**
     * Latin hypercube sampling (M. D. McKay, R. J. Beckman, W. J. Conover, Technometrics 21, 239
     * (1979)): for every input, the n samples fall one into each of n equally probable strata, in
     * an order that is a random permutation per input; inside its stratum a sample is uniform.
     * Means and quantiles converge faster than with {@link #MONTE_CARLO} for responses that are
     * roughly additive in the inputs.
     */
    LATIN_HYPERCUBE
}
