package org.wurtzkit.material;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.wurtzkit.errors.Require;

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
     * @return the alloy-disorder scattering potentials of the three ternary pairs (eV), used by the
     *         2DEG mobility
     */
    AlloyScattering alloyScattering();

    /**
     * @return the polarization model that goes with the set's constants (used when a structure
     *         does not name one)
     */
    PolarizationModel recommendedPolarizationModel();

    /** {@return every source cited by the set, without duplicates} */
    List<Source> sources();

    /**
     * The band line-up rule the set follows, as data: when present, the share f of a gap difference
     * to GaN that goes to the conduction band (E_c - E_c(GaN) = f (E_g - E_g(GaN)), the rule of the
     * papers a set may follow); when empty, the set's tabulated valence-band edges, interpolated
     * linearly in alloys, set the line-up (so all gap bowing goes to the conduction band). A
     * structure built on the set uses this rule unless it is given another
     * ({@code org.wurtzkit.bands.BandAlignment.recommendedFor}).
     *
     * @return f in [0, 1], or empty for the tabulated valence-band edges (the default)
     */
    default OptionalDouble conductionBandOffsetFraction() {
        return OptionalDouble.empty();
    }

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
     * The gate dielectrics the set declares, each with its values and sources: the built-in sets
     * carry the four of {@link Insulators} (SiO2, Si3N4, Al2O3, HfO2), a team's file may add its
     * own. A set that declares none (the default) returns an empty list.
     *
     * @return the insulators, in the order the set declares them, names unique
     */
    default List<Insulator> insulators() {
        return List.of();
    }

    /**
     * An insulator of the set by name, for a structure's gate stack:
     * {@code builder.deposit(InsulatorLayer.ofNm(set.insulator("Al2O3"), 10))}.
     *
     * @param name the insulator's name as the set declares it (case-insensitive)
     * @return that insulator
     * @throws org.wurtzkit.errors.InvalidParameterException if the set declares no insulator of that
     *         name; the message lists the set's insulators and the nearest of them ("did you mean")
     */
    default Insulator insulator(String name) {
        Require.nonNull("insulator name", name);
        List<String> names = new ArrayList<>();
        for (Insulator i : insulators()) {
            if (i.name().equalsIgnoreCase(name)) {
                return i;
            }
            names.add(i.name());
        }
        List<String> near = ParameterSets.nearest(name, names);
        String guess = near.isEmpty() ? "" : " (did you mean " + String.join(" or ", near.stream()
                .map(n -> "\"" + n + "\"").toList()) + "?)";
        throw Require.invalid("insulator name in parameter set \"" + name() + "\"", "\"" + name + "\"",
                (names.isEmpty() ? "none: the set declares no insulators" : "one of " + names) + guess);
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
