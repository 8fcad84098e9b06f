package org.wurtzkit.warnings;

/** What a {@link Warning} is about; each constant names the condition that raises it. */
public enum WarningKind {
    /** A layer is thicker than the critical thickness of the structure's critical-thickness model. */
    BEYOND_CRITICAL_THICKNESS,
    /** A layer is thicker than 10 um (likely a unit slip: a thickness in nm given as m, or similar). */
    LAYER_THICKER_THAN_10_UM,
    /**
     * The temperature is below 20 K or above 1000 K, outside the range over which the band-gap
     * temperature laws and the Fermi-Dirac tables of the library were checked.
     */
    TEMPERATURE_OUT_OF_RANGE,
    /**
     * The gate bias is at or above the Schottky barrier height: the gate conducts forward and the
     * equilibrium picture (no current) no longer describes the device.
     */
    GATE_BIAS_AT_OR_ABOVE_BARRIER,
    /**
     * Holes gather at a free surface because the surface donors given cannot supply the positive
     * charge the polarization field asks for.
     */
    SURFACE_HOLE_GAS,
    /**
     * A subband that holds electrons lies above the conduction-band edge at an edge of its window:
     * it is bound only by the window's wall, so its energy and density depend on where the window ends.
     */
    WINDOW_BOUND_SUBBAND,
    /** An edge of a quantum window cuts through free electrons, which the window then misses or clips. */
    WINDOW_EDGE_IN_ELECTRONS,
    /** A quantum window had more subbands below the cut-off than the solver's limit; its density is too low. */
    SUBBAND_LIMIT_REACHED,
    /** A threshold voltage was extrapolated to a bias outside the swept range. */
    THRESHOLD_OUTSIDE_SWEPT_RANGE,
    /**
     * A scattering mechanism's formula is used outside the conditions it was derived for (e.g. a
     * non-degenerate estimate for a degenerate subband, or a limit taken where it does not hold).
     */
    SCATTERING_MODEL_OUT_OF_VALIDITY,
    /**
     * Part of the electrons is left out of a transport result: subbands below the minimum fraction,
     * a solution that reached its subband limit, or a layer material without a composition whose
     * alloy scattering is taken as zero.
     */
    ELECTRONS_LEFT_OUT,
    /** Screening was asked for but nothing screens: the rates are unscreened. */
    SCREENING_ABSENT,
    /**
     * No electron gas lies under the gate: the collector of the gate current is taken at the lowest
     * conduction-band edge, which lies above the Fermi level.
     */
    NO_ELECTRON_GAS_UNDER_GATE,
    /** Image-force lowering of the gate barrier is off, though at the gate field it exceeds 0.1 eV. */
    IMAGE_FORCE_LOWERING_LEFT_OUT,
    /** A value was interpolated between the computed points of a sweep rather than computed there. */
    INTERPOLATED_BETWEEN_POINTS,
    /** A sensitivity index carries a standard error large enough to reorder or blur the inputs' ranking. */
    SENSITIVITY_STANDARD_ERROR_LARGE,
    /**
     * Points of a study or map failed and were left out of its statistics; if the failures depend on
     * the inputs, the statistics are biased.
     */
    POINTS_LEFT_OUT,
    /** A trade-off has no threshold-voltage band: its front compares stacks of different threshold voltage. */
    NO_THRESHOLD_BAND,
    /** No computed stack of a trade-off lies in its threshold-voltage band: the front is empty. */
    THRESHOLD_BAND_EMPTY,
    /**
     * Holes gather within 5 nm under a gate stack (insulator) at the hole quasi-Fermi level the
     * solve assigned to them (by default the channel's): a steady state, which a measurement faster
     * than their supply (generation, leakage through the barrier) does not reach.
     */
    HOLES_UNDER_GATE_STACK,
    /**
     * A model parameter measured or fitted on one kind of sample or interface is applied to another
     * kind, outside where it was determined (e.g. an interface roughness fitted at AlGaN/GaN applied
     * at the AlN/GaN interface under an AlN interlayer).
     */
    PARAMETER_OUTSIDE_MEASURED_RANGE
}
