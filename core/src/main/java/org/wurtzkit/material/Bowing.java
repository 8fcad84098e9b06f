package org.wurtzkit.material;

import org.wurtzkit.errors.Require;

/**
 * One bowing parameter with its source.
 *
 * @param value  the bowing coefficient (eV for a gap, C/m&sup2; for a polarization)
 * @param source where it comes from
 */
public record Bowing(double value, Source source) {
    /** Validates. */
    public Bowing {
        Require.finite("bowing coefficient", value);
        Require.nonNull("bowing source", source);
    }
}
