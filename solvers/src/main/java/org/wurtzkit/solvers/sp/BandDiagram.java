package org.wurtzkit.solvers.sp;

import java.util.Arrays;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Units;

/**
 * A band diagram for plotting: a polyline through the band edges that holds both sides of every
 * step, so an interface depth appears twice (once with the edges of the layer above it, once with
 * those of the layer below). Energies are in eV with the bottom contact's Fermi level at 0. The
 * arrays are copied in and out.
 *
 * @param depth        depth of each point (m, 0 at the surface), non-decreasing
 * @param conductionEv E_c at each point (eV)
 * @param valenceEv    E_v at each point (eV)
 */
public record BandDiagram(double[] depth, double[] conductionEv, double[] valenceEv) {
    /** Validates lengths and copies the arrays. */
    public BandDiagram {
        Require.nonNull("band-diagram depths", depth);
        Require.nonNull("band-diagram conduction-band edges", conductionEv);
        Require.nonNull("band-diagram valence-band edges", valenceEv);
        int n = depth.length;
        if (conductionEv.length != n || valenceEv.length != n) {
            throw new InvalidParameterException("band-diagram array lengths (depth, E_c, E_v)",
                    n + ", " + conductionEv.length + ", " + valenceEv.length, "three equal lengths");
        }
        depth = depth.clone();
        conductionEv = conductionEv.clone();
        valenceEv = valenceEv.clone();
    }

    /** @return number of points of the polyline */
    public int size() {
        return depth.length;
    }

    /** @return depth of each point (m) */
    @Override
    public double[] depth() {
        return depth.clone();
    }

    /** @return depth of each point (nm) */
    public double[] depthNm() {
        double[] d = new double[depth.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = Units.mToNm(depth[i]);
        }
        return d;
    }

    /** @return E_c at each point (eV) */
    @Override
    public double[] conductionEv() {
        return conductionEv.clone();
    }

    /** @return E_v at each point (eV) */
    @Override
    public double[] valenceEv() {
        return valenceEv.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof BandDiagram b && Arrays.equals(depth, b.depth)
                && Arrays.equals(conductionEv, b.conductionEv) && Arrays.equals(valenceEv, b.valenceEv);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(depth) + Arrays.hashCode(conductionEv)) + Arrays.hashCode(valenceEv);
    }

    @Override
    public String toString() {
        return "BandDiagram[" + depth.length + " points]";
    }
}
