package org.wurtzkit.solvers.workflow;

import java.util.Optional;
import java.util.function.DoubleFunction;
import org.wurtzkit.errors.Require;
import org.wurtzkit.structure.Structure;

/**
 * A one-parameter family of structures, the search space of a {@link TargetSearch}: a named
 * parameter (with its unit) and the structure for each of its values. Must be thread-safe and
 * deterministic. Ready-made families are in {@link StructureFamilies}.
 */
public interface StructureFamily {
    /** {@return the parameter's name and unit} */
    Column parameter();

    /**
     * @param value the parameter's value, in {@link #parameter()}'s unit
     * @return the structure
     */
    Structure at(double value);

    /**
     * What this family is, in words, for a result's provenance. The default says that the family is
     * code the provenance cannot hold; the families of {@link StructureFamilies} name their factory
     * method and its layer, e.g. {@code StructureFamilies.layerThicknessNm(template, "barrier")}, which
     * with {@link #template()} rebuilds them from data.
     *
     * @return the description
     */
    default String description() {
        return "code (a StructureFamily), not recorded";
    }

    /**
     * {@return the template the family varies, when it is one of {@link StructureFamilies}; empty for
     * a family of code}
     */
    default Optional<Structure> template() {
        return Optional.empty();
    }

    /**
     * @param name     the parameter's name
     * @param unit     its unit
     * @param function the structure for each value
     * @return the family
     */
    static StructureFamily of(String name, String unit, DoubleFunction<Structure> function) {
        Column c = Column.of(name, unit);
        Require.nonNull("structure function", function);
        return new StructureFamily() {
            @Override
            public Column parameter() {
                return c;
            }

            @Override
            public Structure at(double value) {
                return function.apply(value);
            }
        };
    }
}
