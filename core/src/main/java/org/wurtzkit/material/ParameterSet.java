package org.wurtzkit.material;

import java.util.List;
import org.wurtzkit.material.PolarizationModel;

/**
 * A named, published (or a team's own measured) set of wurtzite parameters: the three binaries,
 * the alloy bowing parameters and the bibliography behind them.
 *
 * <p>Implementations must be immutable and thread-safe. The built-in sets live in the
 * {@code materials-data} module; a team registers its own by implementing
 * {@link ParameterSetProvider} and listing it in
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider}. Find sets with
 * {@link ParameterSets}.
 */
public interface ParameterSet {
    /** {@return the unique name by which the set is selected, e.g. "vurgaftman-meyer-2003"} */
    String name();

    /** {@return one sentence saying what the set follows} */
    String description();

    /**
     * @param binary GaN, AlN or InN
     * @return that binary's parameters
     */
    WurtziteMaterial binary(Binary binary);

    /** {@return the bowing parameters of the three ternary pairs} */
    AlloyBowing bowing();

    /**
     * @return the polarization model that goes with the set's constants (used when a structure
     *         does not name one)
     */
    PolarizationModel recommendedPolarizationModel();

    /** {@return every source cited by the set, without duplicates} */
    List<Source> sources();

    /**
     * {@return how the gap of an alloy depends on temperature} The default,
     * {@link AlloyGapTemperatureRule#INTERPOLATED_VARSHNI}, is the library's historical rule; a set
     * derived with {@link #derive(String)} can choose the other.
     */
    default AlloyGapTemperatureRule alloyGapTemperatureRule() {
        return AlloyGapTemperatureRule.INTERPOLATED_VARSHNI;
    }

    /**
     * Starts a set derived from this one with a few values changed, each change with its source:
     * {@code set.derive("vm03-lab").set(Binary.GAN, MaterialParameter.C13, 101e9, labSource).build()}.
     *
     * @param name the new set's name (unique among the sets a program uses)
     * @return a builder whose unchanged values, bowing, model and sources are this set's
     */
    default DerivedParameterSet.Builder derive(String name) {
        return DerivedParameterSet.builder(this, name);
    }

    /**
     * Resolves an alloy by {@link AlloyRules}.
     *
     * @param composition the alloy
     * @return its parameters
     */
    default WurtziteMaterial material(Composition composition) {
        return AlloyRules.resolve(this, composition);
    }
}
