package org.wurtzkit.solvers.transport;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * A one-dimensional potential-energy barrier for tunnelling: the conduction-band edge U(x) (eV),
 * piecewise linear between nodes, an effective mass along x for each segment, and two flat leads,
 * the emitter on the left (x below the first node) and the collector on the right (beyond the last
 * node). Immutable.
 *
 * <p>Nodes may repeat a position: a zero-length segment is a step of U, as at a heterointerface.
 * Between the lead and the first (last) node, U steps from the lead's edge to the node's value.
 *
 * <p>The model is the usual one of effective-mass tunnelling (parabolic bands, the motion along x
 * separated from the motion in the plane, which is conserved): the masses here are those along x,
 * the tunnelling direction (for c-plane layers, along the c axis).
 */
public final class TunnelBarrier {
    private final double[] x;
    private final double[] u;
    private final double[] mass;
    private final double leftEdgeEv;
    private final double leftMass;
    private final double rightEdgeEv;
    private final double rightMass;
    private final double top;

    private TunnelBarrier(double[] x, double[] u, double[] mass, double leftEdgeEv, double leftMass,
            double rightEdgeEv, double rightMass) {
        this.x = x;
        this.u = u;
        this.mass = mass;
        this.leftEdgeEv = leftEdgeEv;
        this.leftMass = leftMass;
        this.rightEdgeEv = rightEdgeEv;
        this.rightMass = rightMass;
        double m = Math.max(leftEdgeEv, rightEdgeEv);
        for (double v : u) {
            m = Math.max(m, v);
        }
        this.top = m;
    }

    /**
     * A barrier from node arrays (copied).
     *
     * @param positions       node positions (m), finite and non-decreasing, at least two, spanning a
     *                        positive length
     * @param energiesEv      U at the nodes (eV), finite
     * @param segmentMasses   mass along x of each of the positions.length - 1 segments (units of
     *                        m0), in (0, 100]
     * @param leftEdgeEv      band edge of the left lead (eV), finite
     * @param leftMass        mass of the left lead (m0), in (0, 100]
     * @param rightEdgeEv     band edge of the right lead (eV), finite
     * @param rightMass       mass of the right lead (m0), in (0, 100]
     * @return the barrier
     * @throws InvalidParameterException for any value out of its range
     */
    public static TunnelBarrier of(double[] positions, double[] energiesEv, double[] segmentMasses,
            double leftEdgeEv, double leftMass, double rightEdgeEv, double rightMass) {
        Require.nonNull("positions", positions);
        Require.nonNull("energies", energiesEv);
        Require.nonNull("segment masses", segmentMasses);
        int n = positions.length;
        Require.inRange("number of barrier nodes", n, 2, Integer.MAX_VALUE);
        if (energiesEv.length != n || segmentMasses.length != n - 1) {
            throw new InvalidParameterException("array lengths (positions, energies, segment masses)",
                    n + ", " + energiesEv.length + ", " + segmentMasses.length,
                    "n, n and n - 1 for n nodes");
        }
        for (int i = 0; i < n; i++) {
            Require.finite("barrier node position (m)", positions[i]);
            Require.finite("barrier node energy (eV)", energiesEv[i]);
            if (i > 0 && positions[i] < positions[i - 1]) {
                throw new InvalidParameterException("barrier node position " + i + " (m)",
                        Double.toString(positions[i]), "[" + positions[i - 1] + ", inf) (non-decreasing)");
            }
            if (i < n - 1) {
                mass("barrier segment mass (m0)", segmentMasses[i]);
            }
        }
        Require.positive("barrier length (m)", positions[n - 1] - positions[0]);
        Require.finite("left lead band edge (eV)", leftEdgeEv);
        mass("left lead mass (m0)", leftMass);
        Require.finite("right lead band edge (eV)", rightEdgeEv);
        mass("right lead mass (m0)", rightMass);
        return new TunnelBarrier(positions.clone(), energiesEv.clone(), segmentMasses.clone(), leftEdgeEv, leftMass,
                rightEdgeEv, rightMass);
    }

    /**
     * A rectangular barrier of height V0 and width a between two leads at U = 0, one mass
     * everywhere.
     *
     * @param heightEv V0 (eV), &gt; 0
     * @param width    a (m), &gt; 0
     * @param mass     effective mass (m0)
     * @return the barrier
     */
    public static TunnelBarrier rectangular(double heightEv, double width, double mass) {
        Require.positive("barrier height (eV)", heightEv);
        Require.positive("barrier width (m)", width);
        return of(new double[] {0, width}, new double[] {heightEv, heightEv}, new double[] {mass}, 0, mass, 0, mass);
    }

    /**
     * A triangular barrier: a step up from the left lead (at U = 0) to U = heightEv at x = 0, then a
     * linear fall with the slope of a uniform field F down to the right lead's edge (a value below 0,
     * so that the barrier ends inside the profile). One mass everywhere.
     *
     * @param heightEv      barrier height above the left lead's Fermi level reference U = 0 (eV), &gt; 0
     * @param fieldVPerM    field F (V/m), &gt; 0: U falls by F per metre (in eV)
     * @param rightEdgeEv   the right lead's edge (eV), &lt; 0
     * @param leftEdgeEv    the left lead's edge (eV), &le; 0
     * @param mass          effective mass (m0)
     * @return the barrier
     */
    public static TunnelBarrier triangular(double heightEv, double fieldVPerM, double leftEdgeEv, double rightEdgeEv,
            double mass) {
        Require.positive("barrier height (eV)", heightEv);
        Require.positive("field (V/m)", fieldVPerM);
        if (!(rightEdgeEv < 0) || !Double.isFinite(rightEdgeEv)) {
            throw new InvalidParameterException("right lead band edge (eV)", Double.toString(rightEdgeEv), "(-inf, 0)");
        }
        if (!(leftEdgeEv <= 0) || !Double.isFinite(leftEdgeEv)) {
            throw new InvalidParameterException("left lead band edge (eV)", Double.toString(leftEdgeEv), "(-inf, 0]");
        }
        double end = (heightEv - rightEdgeEv) / fieldVPerM;
        return of(new double[] {0, end}, new double[] {heightEv, rightEdgeEv}, new double[] {mass}, leftEdgeEv, mass,
                rightEdgeEv, mass);
    }

    private static void mass(String name, double m) {
        if (!(m > 0 && m <= 100)) {
            throw new InvalidParameterException(name, Double.toString(m), "(0, 100]");
        }
    }

    /** @return number of nodes */
    public int nodeCount() {
        return x.length;
    }

    /** @return node positions (m), a copy */
    public double[] positions() {
        return x.clone();
    }

    /** @return U at the nodes (eV), a copy */
    public double[] energiesEv() {
        return u.clone();
    }

    /** @return mass along x of each segment (m0), a copy */
    public double[] segmentMasses() {
        return mass.clone();
    }

    /** @return the left lead's band edge (eV) */
    public double leftEdgeEv() {
        return leftEdgeEv;
    }

    /** @return the left lead's mass (m0) */
    public double leftMass() {
        return leftMass;
    }

    /** @return the right lead's band edge (eV) */
    public double rightEdgeEv() {
        return rightEdgeEv;
    }

    /** @return the right lead's mass (m0) */
    public double rightMass() {
        return rightMass;
    }

    /** @return the highest U of the profile and the leads (eV): above it nothing is classically forbidden */
    public double topEv() {
        return top;
    }

    /** @return the lowest energy at which both leads carry propagating states (eV) */
    public double bottomEv() {
        return Math.max(leftEdgeEv, rightEdgeEv);
    }

    // package-private views without copies, for the transmission kernels
    double[] x() {
        return x;
    }

    double[] u() {
        return u;
    }

    double[] m() {
        return mass;
    }
}
