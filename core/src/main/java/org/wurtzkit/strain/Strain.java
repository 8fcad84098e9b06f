package org.wurtzkit.strain;

import org.wurtzkit.errors.Require;
import org.wurtzkit.material.ElasticConstants;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.units.Decimals;

/**
 * Biaxial strain of a c-plane wurtzite layer (no shear): eps_xx = eps_yy in the basal plane and
 * eps_zz along c. Positive is tensile.
 *
 * <p>For a layer grown pseudomorphically on an in-plane lattice constant a_s and free to relax
 * along c, eps_xx = (a_s - a)/a and eps_zz = -2 (C13/C33) eps_xx (see e.g. O. Ambacher et al., J.
 * Appl. Phys. 85, 3222 (1999)). A partial relaxation r in [0, 1] moves the layer's actual in-plane
 * lattice constant from a_s (r = 0) to its own a (r = 1): a_actual = a_s + r (a - a_s).
 *
 * @param xx in-plane strain eps_xx = eps_yy
 * @param zz strain along c, eps_zz
 */
public record Strain(double xx, double zz) {
    /** No strain. */
    public static final Strain NONE = new Strain(0, 0);

    /** Validates. */
    public Strain {
        Require.finite("strain eps_xx", xx);
        Require.finite("strain eps_zz", zz);
    }

    /**
     * @param layer        the layer's material
     * @param inPlaneA     lattice constant a_s it is grown on (m), &gt; 0
     * @param relaxation   relaxation r in [0, 1] (0 = pseudomorphic, 1 = fully relaxed)
     * @return the strain
     */
    public static Strain pseudomorphic(WurtziteMaterial layer, double inPlaneA, double relaxation) {
        Require.nonNull("layer material", layer);
        Require.positive("in-plane lattice constant a_s (m)", inPlaneA);
        Require.inRange("relaxation r", relaxation, 0, 1);
        double a = layer.latticeA();
        double actual = actualInPlaneLattice(a, inPlaneA, relaxation);
        double exx = (actual - a) / a;
        ElasticConstants c = layer.elastic();
        return new Strain(exx, -c.biaxialRatio() * exx);
    }

    /**
     * @param layer    the layer's material
     * @param onTopOf  the material whose relaxed lattice constant a the layer adopts
     * @return the pseudomorphic (r = 0) strain of layer on onTopOf
     */
    public static Strain pseudomorphic(WurtziteMaterial layer, WurtziteMaterial onTopOf) {
        Require.nonNull("substrate material", onTopOf);
        return pseudomorphic(layer, onTopOf.latticeA(), 0);
    }

    /**
     * @param ownA       the layer's relaxed lattice constant (m)
     * @param inPlaneA   the lattice constant it grows on (m)
     * @param relaxation r in [0, 1]
     * @return the layer's actual in-plane lattice constant a_s + r (a - a_s) (m)
     */
    public static double actualInPlaneLattice(double ownA, double inPlaneA, double relaxation) {
        return inPlaneA + relaxation * (ownA - inPlaneA);
    }

    /** {@return eps_yy (equal to eps_xx for c-plane biaxial strain)} */
    public double yy() {
        return xx;
    }

    /** {@return the trace eps_xx + eps_yy + eps_zz (relative volume change)} */
    public double trace() {
        return 2 * xx + zz;
    }

    /** @return e.g. {@code "eps_xx = 0.0024 (0.24 %), eps_zz = -0.00124 (-0.124 %)"} */
    @Override
    public String toString() {
        return "eps_xx = " + Decimals.format(xx) + " (" + Decimals.format(100 * xx, "%") + "), eps_zz = "
                + Decimals.format(zz) + " (" + Decimals.format(100 * zz, "%") + ")";
    }
}
