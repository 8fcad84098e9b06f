package org.wurtzkit.material;

import org.wurtzkit.errors.Require;

/**
 * One bowing parameter with its source.
 *
 * @param value  the bowing coefficient (eV for a gap, C/m&sup2; for a polarization)
 * @param source where it comes from
 */
public record Bowing(double value, Source source) {
    /**
     * Creates the record and checks every component.
     *
     * @param value  the bowing coefficient (eV for a gap, C/m&sup2; for a polarization)
     * @param source where it comes from
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public Bowing {
        Require.finite("bowing coefficient", value);
        Require.nonNull("bowing source", source);
    }
}
