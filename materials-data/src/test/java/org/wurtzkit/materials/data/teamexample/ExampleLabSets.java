package org.wurtzkit.materials.data.teamexample;

import java.util.List;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;
import org.wurtzkit.materials.data.JsonParameterSetReader;

/**
 * A team's own provider, written exactly as the example in the Javadoc of
 * {@link JsonParameterSetReader} and registered in the test class path's
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider}.
 */
public final class ExampleLabSets implements ParameterSetProvider {
    /** Public no-argument constructor for the service loader. */
    public ExampleLabSets() {
    }

    @Override
    public List<ParameterSet> parameterSets() {
        // read on each call (lazily): a typo in the file is then reported when the set is named,
        // instead of failing the class's initialization and with it every later lookup
        return List.of(JsonParameterSetReader.readResource(ExampleLabSets.class,
                "/org/wurtzkit/materials/data/example-lab-2025.json"));
    }
}
