package org.wurtzkit.benchmarks;

/** Result checks run by the benchmarks' {@code @Setup} methods (not timed). */
final class Checks {
    private Checks() {
    }

    /**
     * Throws unless {@code got} and {@code reference} agree on their first
     * {@link Scenarios#EIGENPAIRS} entries to 1e-10 of the matrix's max-norm.
     */
    static void sameLowest(String what, double[] got, double[] reference, Scenarios.ChannelWell well) {
        double norm = 0;
        for (int i = 0; i < well.diag.length; i++) {
            double r = Math.abs(well.diag[i]) + (i > 0 ? Math.abs(well.off[i - 1]) : 0)
                    + (i < well.off.length ? Math.abs(well.off[i]) : 0);
            norm = Math.max(norm, r);
        }
        for (int j = 0; j < Scenarios.EIGENPAIRS; j++) {
            if (!(Math.abs(got[j] - reference[j]) <= 1e-10 * norm)) {
                throw new IllegalStateException(what + ": eigenvalue #" + j + " = " + got[j]
                        + " eV, library solver " + reference[j] + " eV (N = " + well.order() + ")");
            }
        }
    }

    /** Returns the result, or throws if the benchmark never stored one. */
    static double[][] ran(String benchmark, double[][] last) {
        if (last == null) {
            throw new IllegalStateException(benchmark + ": no result to check (the benchmark did not run)");
        }
        return last;
    }

    /** Throws unless the solve converged. */
    static void converged(String what, org.wurtzkit.solvers.sp.Solution s) {
        if (!s.convergence().converged()) {
            throw new IllegalStateException(what + " did not converge: " + s.convergence().message());
        }
    }
}
