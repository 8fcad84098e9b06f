package org.wurtzkit.materials.data.discovery;

import java.util.List;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;

/**
 * A team provider that reads its (broken) file in a static initializer, the pattern the README used
 * to show: the class fails to initialize, and every later use of it is a bare NoClassDefFoundError.
 * Not registered on the test class path.
 */
public final class EagerTypoLabSets implements ParameterSetProvider {
    /** Set name of the broken file. */
    public static final String NAME = "eager-typo-lab-2025";
    private static final ParameterSet SET = TeamFiles.read(NAME, true);

    /** Public no-argument constructor for the service loader. */
    public EagerTypoLabSets() {
    }

    @Override
    public List<ParameterSet> parameterSets() {
        return List.of(SET);
    }
}
