package org.wurtzkit.solvers.linalg;

/**
 * The SplitMix64 generator (G. L. Steele, D. Lea, C. H. Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014 [from memory]), for the reproducible start vectors of the
 * eigen-solvers. Mutable, not thread-safe: one per solver instance.
 */
final class SplitMix64 {
    private long state;

    /** @param seed the start of the sequence, restored by {@link #reset(long)} for each solve */
    void reset(long seed) {
        state = seed;
    }

    /** {@return a uniform number in (-1, 1)} */
    double nextSigned() {
        long z = (state += 0x9E3779B97F4A7C15L);
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        z = z ^ (z >>> 31);
        double u = (z >>> 11) * 0x1.0p-53; // [0, 1)
        return 2.0 * u - 1.0 + 0x1.0p-53;
    }
}
