package org.wurtzkit.material;

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
}
