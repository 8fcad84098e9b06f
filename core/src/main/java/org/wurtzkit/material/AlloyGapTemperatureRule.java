package org.wurtzkit.material;

/**
 * How the gap of an alloy depends on temperature. A parameter set states its rule
 * ({@link ParameterSet#alloyGapTemperatureRule()}); change it with
 * {@link ParameterSet#derive(String)}.
 *
 * <p>Default: {@link #INTERPOLATED_VARSHNI}, the rule the library has always used, so that choosing
 * it moves no result. The two rules agree at 0 K and differ by 2 meV for Al0.3Ga0.7N at 300 K and by
 * about 7 meV at 600 K with the vurgaftman-meyer-2003 values (computed), far below the spread of
 * published bowing parameters (0.6-1.3 eV for AlGaN, i.e. +-60 meV at x = 0.3).
 */
public enum AlloyGapTemperatureRule {
    /**
     * Vegard's law for Eg(0 K) with the gap bowing, and for the Varshni alpha and beta; then one
     * Varshni law for the alloy.
     */
    INTERPOLATED_VARSHNI,
    /**
     * Each binary's gap at the temperature by its own Varshni law, then Vegard's law with the gap
     * bowing, taken as independent of temperature: Eg(x, T) = sum x_i Eg_i(T) - sum b_ij x_i x_j.
     */
    VARSHNI_PER_BINARY_THEN_BOWING
}
