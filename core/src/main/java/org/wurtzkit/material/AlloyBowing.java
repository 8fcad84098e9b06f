package org.wurtzkit.material;

import org.wurtzkit.errors.Require;

/**
 * The bowing parameters of a parameter set for the three ternary pairs.
 *
 * <p>Sign conventions: the gap bows downward, Eg = sum x_i Eg_i - sum b_ij x_i x_j; the spontaneous
 * polarization is written as in Bernardini &amp; Fiorentini, Phys. Rev. B 64, 085207 (2001),
 * Psp = sum x_i Psp_i + sum b_ij x_i x_j (their AlGaN value b = +0.019 C/m&sup2;).
 *
 * @param gapAlGaN            AlGaN gap bowing (eV)
 * @param gapInGaN            InGaN gap bowing (eV)
 * @param gapInAlN            InAlN gap bowing (eV)
 * @param polarizationAlGaN   AlGaN spontaneous-polarization bowing (C/m&sup2;)
 * @param polarizationInGaN   InGaN spontaneous-polarization bowing (C/m&sup2;)
 * @param polarizationInAlN   InAlN spontaneous-polarization bowing (C/m&sup2;)
 */
public record AlloyBowing(Bowing gapAlGaN, Bowing gapInGaN, Bowing gapInAlN, Bowing polarizationAlGaN,
        Bowing polarizationInGaN, Bowing polarizationInAlN) {
    /**
     * Creates the record and checks that all six are present.
     *
     * @param gapAlGaN          AlGaN gap bowing (eV)
     * @param gapInGaN          InGaN gap bowing (eV)
     * @param gapInAlN          InAlN gap bowing (eV)
     * @param polarizationAlGaN AlGaN spontaneous-polarization bowing (C/m&sup2;)
     * @param polarizationInGaN InGaN spontaneous-polarization bowing (C/m&sup2;)
     * @param polarizationInAlN InAlN spontaneous-polarization bowing (C/m&sup2;)
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public AlloyBowing {
        Require.nonNull("AlGaN gap bowing", gapAlGaN);
        Require.nonNull("InGaN gap bowing", gapInGaN);
        Require.nonNull("InAlN gap bowing", gapInAlN);
        Require.nonNull("AlGaN polarization bowing", polarizationAlGaN);
        Require.nonNull("InGaN polarization bowing", polarizationInGaN);
        Require.nonNull("InAlN polarization bowing", polarizationInAlN);
    }
}
