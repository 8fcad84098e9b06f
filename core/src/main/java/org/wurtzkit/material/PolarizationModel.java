package org.wurtzkit.material;

import org.wurtzkit.errors.Require;

/**
 * Which polarization model to use: the spontaneous part with or without alloy bowing and the
 * piezoelectric part linear in strain or nonlinear.
 *
 * @param spontaneous  spontaneous-polarization model
 * @param piezoelectric piezoelectric model
 */
public record PolarizationModel(Spontaneous spontaneous, Piezoelectric piezoelectric) {
    /** Linear everywhere: Vegard P_sp and P_pz = 2 eps_xx (e31 - e33 C13/C33). */
    public static final PolarizationModel LINEAR = new PolarizationModel(Spontaneous.VEGARD, Piezoelectric.LINEAR);
    /**
     * Nonlinear everywhere: P_sp with bowing (Bernardini &amp; Fiorentini 2001) and the quadratic
     * piezoelectric response (Bernardini &amp; Fiorentini 2001; Ambacher et al. 2002).
     */
    public static final PolarizationModel NONLINEAR = new PolarizationModel(Spontaneous.BOWING,
            Piezoelectric.NONLINEAR);

    /** Validates. */
    public PolarizationModel {
        Require.nonNull("spontaneous polarization model", spontaneous);
        Require.nonNull("piezoelectric polarization model", piezoelectric);
    }

    /** Spontaneous-polarization model. */
    public enum Spontaneous {
        /** Vegard's law between the binaries. */
        VEGARD,
        /** Vegard's law plus the bowing terms of the parameter set. */
        BOWING
    }

    /** Piezoelectric model. */
    public enum Piezoelectric {
        /** P_pz = 2 eps_xx (e31 - e33 C13/C33). */
        LINEAR,
        /** P_pz = a1 eps + a2 eps&sup2; with eps the basal strain (Ambacher et al. 2002). */
        NONLINEAR
    }
}
