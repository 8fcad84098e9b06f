package org.wurtzkit.materials.data.discovery;

import java.util.List;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;

/** A team provider written the recommended way (file read lazily) whose file has a typo. Not registered on the test class path. */
public final class TypoLabSets implements ParameterSetProvider {
    /** Set name of the broken file. */
    public static final String NAME = "typo-lab-2025";

    /** Public no-argument constructor for the service loader. */
    public TypoLabSets() {
    }

    @Override
    public List<ParameterSet> parameterSets() {
        return List.of(TeamFiles.read(NAME, true));
    }
}
