package org.wurtzkit.solvers.sp;

import java.util.Arrays;

/**
 * A wavefunction that is zero outside one run of nodes: the values of the run, where it starts and
 * the length of the full mesh. A subband keeps only its window's part (a few hundred doubles
 * instead of the whole mesh) and builds the full array when asked for it.
 */
final class WindowedWavefunction {
    private final double[] part;
    private final int offset;
    private final int nodes;

    /** Takes {@code part} without copying: the caller hands over a fresh array. */
    WindowedWavefunction(double[] part, int offset, int nodes) {
        if (offset < 0 || offset + part.length > nodes) {
            throw new IllegalArgumentException("window part [" + offset + ", " + (offset + part.length)
                    + ") outside a mesh of " + nodes + " nodes");
        }
        this.part = part;
        this.offset = offset;
        this.nodes = nodes;
    }

    /** A copy of a full-mesh array. */
    static WindowedWavefunction ofFull(double[] full) {
        return new WindowedWavefunction(full.clone(), 0, full.length);
    }

    /** {@return psi on every node, zero outside the window, a new array} */
    double[] full() {
        double[] out = new double[nodes];
        System.arraycopy(part, 0, out, offset, part.length);
        return out;
    }

    /** {@return psi at node i} */
    double at(int i) {
        int j = i - offset;
        return j >= 0 && j < part.length ? part[j] : 0.0;
    }

    boolean sameValues(WindowedWavefunction o) {
        if (nodes != o.nodes) {
            return false;
        }
        if (offset == o.offset && part.length == o.part.length) {
            return Arrays.equals(part, o.part);
        }
        for (int i = 0; i < nodes; i++) {
            if (Double.doubleToLongBits(at(i)) != Double.doubleToLongBits(o.at(i))) {
                return false;
            }
        }
        return true;
    }

    /** The hash of {@code Arrays.hashCode(full())}, without building the array. */
    int valueHash() {
        int h = 1;
        for (int i = 0; i < nodes; i++) {
            long bits = Double.doubleToLongBits(at(i));
            h = 31 * h + (int) (bits ^ (bits >>> 32));
        }
        return h;
    }
}
