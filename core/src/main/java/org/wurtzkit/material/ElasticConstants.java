package org.wurtzkit.material;

import org.wurtzkit.units.Decimals;

/**
 * Elastic stiffness constants of a hexagonal crystal (Pa).
 *
 * @param c11 C11 (Pa)
 * @param c12 C12 (Pa)
 * @param c13 C13 (Pa)
 * @param c33 C33 (Pa)
 * @param c44 C44 (Pa)
 */
public record ElasticConstants(double c11, double c12, double c13, double c33, double c44) {
    /**
     * Ratio -eps_zz/eps_xx = 2 C13/C33 of a c-plane layer under biaxial in-plane strain with a free
     * surface (no stress along c).
     *
     * @return 2 C13 / C33
     */
    public double biaxialRatio() {
        return 2 * c13 / c33;
    }

    /**
     * Poisson ratio for biaxial c-plane strain, nu = C13/(C13 + C33), defined so that
     * eps_zz/eps_xx = -2 nu/(1 - nu) (common practice, no source).
     *
     * @return nu
     */
    public double poissonRatio() {
        return c13 / (c13 + c33);
    }

    /** @return e.g. {@code "C11 = 390 GPa, C12 = 145 GPa, C13 = 106 GPa, C33 = 398 GPa, C44 = 105 GPa"} */
    @Override
    public String toString() {
        return "C11 = " + Decimals.format(c11 / 1e9, "GPa") + ", C12 = " + Decimals.format(c12 / 1e9, "GPa")
                + ", C13 = " + Decimals.format(c13 / 1e9, "GPa") + ", C33 = " + Decimals.format(c33 / 1e9, "GPa")
                + ", C44 = " + Decimals.format(c44 / 1e9, "GPa");
    }
}
