package org.wurtzkit.solvers.mesh;

import java.util.Arrays;
import java.util.Locale;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * An immutable 1D non-uniform mesh of node depths (m), strictly increasing from 0 (the surface).
 * Interfaces and other required points are nodes of the mesh.
 */
public final class Mesh {
    /**
     * Most nodes a generated mesh may have: 500 000, e.g. a 1 mm stack at 2 nm everywhere (the
     * default policy gives a 1 mm layer 20 000 nodes). A solve keeps some 30 arrays of this length,
     * about 120 MB at the limit; {@link #generate} counts the nodes before it allocates them and
     * refuses a larger mesh.
     */
    public static final int MAX_NODES = 500_000;

    private final double[] nodes;

    private Mesh(double[] nodes) {
        this.nodes = nodes;
    }

    /**
     * @param nodes strictly increasing, finite node positions (m), at least 3
     * @return the mesh (a copy of the array)
     */
    public static Mesh of(double[] nodes) {
        Require.nonNull("mesh nodes", nodes);
        if (nodes.length < 3) {
            throw new InvalidParameterException("number of mesh nodes", Integer.toString(nodes.length), "[3, ...)");
        }
        for (int i = 0; i < nodes.length; i++) {
            Require.finite("mesh node " + i, nodes[i]);
            if (i > 0 && !(nodes[i] > nodes[i - 1])) {
                throw new InvalidParameterException("mesh node " + i + " (m)", Double.toString(nodes[i]),
                        "(" + nodes[i - 1] + ", ...) (strictly increasing)");
            }
        }
        return new Mesh(nodes.clone());
    }

    /**
     * Meshes [0, depths[last]] with a node at every given depth and spacings by the policy.
     *
     * @param breakpoints strictly increasing depths that must be nodes, the first 0 and the last the
     *                    total thickness (m)
     * @param policy      the spacing policy
     * @return the mesh
     * @throws InvalidParameterException if the breakpoints are not strictly increasing from 0, or the
     *                                   mesh would have more than {@link #MAX_NODES} nodes (counted
     *                                   before any is allocated)
     */
    public static Mesh generate(double[] breakpoints, MeshPolicy policy) {
        Require.nonNull("mesh policy", policy);
        if (breakpoints.length < 2 || breakpoints[0] != 0) {
            throw new InvalidParameterException("mesh breakpoints", Arrays.toString(breakpoints),
                    "at least two strictly increasing depths starting at 0");
        }
        double h0 = policy.interfaceSpacing();
        double c = policy.growthRatio() - 1;
        double hMax = policy.maxSpacing();
        // count first, allocate after: a mesh beyond MAX_NODES is refused before it exhausts the heap
        double count = 1;
        for (int s = 0; s + 1 < breakpoints.length; s++) {
            double a = breakpoints[s];
            double len = breakpoints[s + 1] - a;
            if (!(len > 0)) {
                throw new InvalidParameterException("mesh breakpoint " + (s + 1) + " (m)",
                        Double.toString(breakpoints[s + 1]), "(" + a + ", ...) (strictly increasing)");
            }
            count += Math.max(2, Math.ceil(2 * phiHalf(len / 2, h0, c, hMax)));
        }
        if (count > MAX_NODES) {
            throw new InvalidParameterException("mesh node count", String.format(Locale.ROOT, "%.4g", count),
                    String.format(Locale.ROOT, "[3, %d] (a stack of %.4g m with %d breakpoints, mesh policy: "
                            + "interface spacing %.3g m, growth ratio %.3g, maximum spacing %.3g m; use fewer or thinner "
                            + "layers or a coarser policy)", MAX_NODES, breakpoints[breakpoints.length - 1],
                            breakpoints.length, h0, policy.growthRatio(), hMax));
        }
        double[] buf = new double[(int) count];
        int n = 0;
        buf[n++] = 0;
        for (int s = 0; s + 1 < breakpoints.length; s++) {
            double a = breakpoints[s];
            double len = breakpoints[s + 1] - a;
            double total = 2 * phiHalf(len / 2, h0, c, hMax);
            // uniform: len / h0 may land a round-off above an integer, which is not one more cell
            int cells = Math.max(2, (int) Math.ceil(c == 0 ? total * (1 - 1e-12) : total));
            for (int k = 1; k <= cells; k++) {
                double pos = k == cells ? breakpoints[s + 1] : a + inverse(total * k / cells, total, len, h0, c, hMax);
                if (n == buf.length) {
                    buf = Arrays.copyOf(buf, 2 * n);
                }
                buf[n++] = pos;
            }
        }
        return of(Arrays.copyOf(buf, n));
    }

    // Phi(s) = integral_0^s dt / h(t) with h(t) = min(h0 + c t, hMax), for s within one half segment.
    private static double phiHalf(double s, double h0, double c, double hMax) {
        if (c == 0) { // uniform: h = h0 (hMax >= h0 is never reached below it)
            return s / Math.min(h0, hMax);
        }
        double sStar = (hMax - h0) / c;
        if (s <= sStar) {
            return Math.log1p(c * s / h0) / c;
        }
        return Math.log1p(c * sStar / h0) / c + (s - sStar) / hMax;
    }

    private static double phiHalfInverse(double phi, double h0, double c, double hMax) {
        if (c == 0) {
            return phi * Math.min(h0, hMax);
        }
        double sStar = (hMax - h0) / c;
        double phiStar = Math.log1p(c * sStar / h0) / c;
        if (phi <= phiStar) {
            return h0 * Math.expm1(c * phi) / c;
        }
        return sStar + (phi - phiStar) * hMax;
    }

    private static double inverse(double phi, double total, double len, double h0, double c, double hMax) {
        if (phi <= total / 2) {
            return Math.min(len / 2, phiHalfInverse(phi, h0, c, hMax));
        }
        return len - Math.min(len / 2, phiHalfInverse(total - phi, h0, c, hMax));
    }

    /** {@return the number of nodes} */
    public int size() {
        return nodes.length;
    }

    /**
     * Returns the depth of one node.
     *
     * @param i node index
     * @return its depth (m)
     */
    public double node(int i) {
        return nodes[i];
    }

    /** {@return a copy of the node depths (m)} */
    public double[] nodes() {
        return nodes.clone();
    }

    /**
     * Returns the width of one cell, the spacing between two neighbouring nodes.
     *
     * @param i cell index in [0, size - 2]
     * @return spacing z[i+1] - z[i] (m)
     */
    public double spacing(int i) {
        return nodes[i + 1] - nodes[i];
    }

    /**
     * @param depth a depth (m)
     * @return the index of the node closest to it
     */
    public int nearestNode(double depth) {
        int k = Arrays.binarySearch(nodes, depth);
        if (k >= 0) {
            return k;
        }
        int ins = -k - 1;
        if (ins == 0) {
            return 0;
        }
        if (ins >= nodes.length) {
            return nodes.length - 1;
        }
        return depth - nodes[ins - 1] <= nodes[ins] - depth ? ins - 1 : ins;
    }

    /** {@return the largest spacing (m)} */
    public double maxSpacing() {
        double m = 0;
        for (int i = 0; i + 1 < nodes.length; i++) {
            m = Math.max(m, nodes[i + 1] - nodes[i]);
        }
        return m;
    }
}
