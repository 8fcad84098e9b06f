package org.wurtzkit.solvers.transport.mobility;

import java.util.Optional;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * One scattering mechanism of a 2DEG: the momentum relaxation rate 1/tau of one subband.
 *
 * <p>The interface is open: a caller adds a mechanism of their own by implementing it and putting
 * it into {@link MobilityOptions#mechanisms()}. The built-in mechanisms are the records of this
 * package; each names its paper. Implementations must be immutable and thread-safe and return a
 * finite rate &ge; 0.
 */
public interface ScatteringMechanism {
    /** @return a short unique name, used as the key of the results */
    String name();

    /**
     * @param subband the subband, with its form factors and surroundings
     * @return the momentum relaxation rate 1/tau (1/s), finite, &ge; 0
     */
    double momentumRelaxationRate(SubbandScattering subband);

    /**
     * @param subband the subband
     * @return a warning when the mechanism's formula is on shaky ground for this subband, else empty
     */
    default Optional<String> warning(SubbandScattering subband) {
        return Optional.empty();
    }

    /**
     * The mechanism's warning, typed: by default {@link #warning(SubbandScattering)} as a
     * {@link WarningKind#SCATTERING_MODEL_OUT_OF_VALIDITY}; a mechanism overrides this to give a more
     * precise kind (e.g. {@link WarningKind#PARAMETER_OUTSIDE_MEASURED_RANGE}).
     *
     * @param subband the subband
     * @return the typed warning, or empty
     */
    default Optional<Warning> typedWarning(SubbandScattering subband) {
        return warning(subband).map(text -> new Warning(WarningKind.SCATTERING_MODEL_OUT_OF_VALIDITY, text));
    }
}
