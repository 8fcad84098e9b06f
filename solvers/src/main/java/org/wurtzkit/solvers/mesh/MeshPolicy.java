package org.wurtzkit.solvers.mesh;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * How fine the mesh is: the spacing at every interface (and at the surface, the bottom and every
 * delta sheet), the largest spacing anywhere, and how fast the spacing may grow away from an
 * interface. Inside a layer the local spacing is h(s) = min(h0 + (g - 1) s, h_max), s the distance
 * to the nearest layer boundary, so consecutive spacings grow roughly geometrically by the ratio g.
 *
 * <p>The defaults (0.1 nm, 1.06, 50 nm) resolve a 2DEG wavefunction with spacings below 0.5 nm
 * within 5 nm of the interface and mesh a 2 um buffer with a few hundred nodes. Halving every
 * spacing ({@link #refined(double)} with 2) is the mesh-convergence check.
 *
 * @param interfaceSpacing spacing h0 at layer boundaries (m), in [1e-12, 1e-6]
 * @param growthRatio      g, in (1, 2]
 * @param maxSpacing       h_max (m), &ge; interfaceSpacing and &le; 1e-5
 */
public record MeshPolicy(double interfaceSpacing, double growthRatio, double maxSpacing) {

    /** The default policy: 0.1 nm at interfaces, growth 1.06, at most 50 nm. */
    public static final MeshPolicy DEFAULT = new MeshPolicy(0.1 * Units.NM, 1.06, 50 * Units.NM);

    /** Validates. */
    public MeshPolicy {
        Require.inRange("mesh interface spacing (m)", interfaceSpacing, 1e-12, 1e-6);
        if (!(growthRatio > 1 && growthRatio <= 2)) {
            throw new InvalidParameterException("mesh growth ratio", Double.toString(growthRatio), "(1, 2]");
        }
        Require.inRange("mesh maximum spacing (m)", maxSpacing, interfaceSpacing, 1e-5);
    }

    /**
     * @param factor how many times finer, &ge; 1 (2 halves every spacing)
     * @return a policy whose local spacing is everywhere divided by factor
     */
    public MeshPolicy refined(double factor) {
        Require.inRange("mesh refinement factor", factor, 1, 64);
        // h(s)/factor = h0/factor + ((g-1)/factor) s
        return new MeshPolicy(interfaceSpacing / factor, 1 + (growthRatio - 1) / factor, maxSpacing / factor);
    }

    /** @return e.g. {@code "mesh 0.1 nm at interfaces, growing by 1.1 to at most 50 nm"} */
    @Override
    public String toString() {
        return "mesh " + Decimals.format(interfaceSpacing * 1e9, "nm") + " at interfaces, growing by "
                + Decimals.format(growthRatio) + " to at most " + Decimals.format(maxSpacing * 1e9, "nm");
    }
}
