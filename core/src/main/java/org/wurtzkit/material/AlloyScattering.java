package org.wurtzkit.material;

import org.wurtzkit.errors.Require;

/**
 * The alloy-disorder scattering potentials U of the three ternary pairs of a parameter set (eV),
 * each with its source. In the virtual-crystal picture an electron in A<sub>x</sub>B<sub>1-x</sub>N
 * sees, on every cation site, the random deviation of the site potential from its average; its
 * momentum relaxation rate is proportional to Omega_0 U^2 x(1-x) (G. Bastard, Appl. Phys. Lett. 43,
 * 591 (1983); L. Hsu and W. Walukiewicz, Phys. Rev. B 56, 1520 (1997)). For a quaternary the
 * mobility code sums the three pair terms x_i x_j U_ij^2 (uncorrelated disorder on one cation
 * sublattice).
 *
 * <p>The value of U is not a material constant that can be read off a band structure: published
 * values come from fits to transport data and scatter by tens of percent. Each {@link Bowing} here
 * holds one potential in eV with its source (the record is the library's "value with one source"
 * holder for alloy pairs).
 *
 * @param alGaN AlGaN potential (eV)
 * @param inGaN InGaN potential (eV)
 * @param inAlN InAlN potential (eV)
 */
public record AlloyScattering(Bowing alGaN, Bowing inGaN, Bowing inAlN) {
    /**
     * Validates: all three present, each non-negative (the rate depends on U^2; the sign is a
     * convention).
     *
     * @param alGaN AlGaN potential (eV)
     * @param inGaN InGaN potential (eV)
     * @param inAlN InAlN potential (eV)
     * @throws org.wurtzkit.errors.InvalidParameterException if one is missing or negative
     */
    public AlloyScattering {
        Require.nonNull("AlGaN alloy scattering potential", alGaN);
        Require.nonNull("InGaN alloy scattering potential", inGaN);
        Require.nonNull("InAlN alloy scattering potential", inAlN);
        Require.nonNegative("AlGaN alloy scattering potential (eV)", alGaN.value());
        Require.nonNegative("InGaN alloy scattering potential (eV)", inGaN.value());
        Require.nonNegative("InAlN alloy scattering potential (eV)", inAlN.value());
    }

    /**
     * The disorder strength sum over pairs x_i x_j U_ij^2 of a composition.
     *
     * @param c the alloy
     * @return x z U_AlGa^2 + y z U_InGa^2 + x y U_InAl^2 (eV^2); 0 for a binary
     */
    public double disorderEv2(Composition c) {
        double x = c.aluminium();
        double y = c.indium();
        double z = c.gallium();
        return x * z * alGaN.value() * alGaN.value() + y * z * inGaN.value() * inGaN.value()
                + x * y * inAlN.value() * inAlN.value();
    }
}
