package org.wurtzkit.materials.data.discovery;

import java.util.List;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;

/** A valid team provider that a notebook adds later. Not registered on the test class path. */
public final class LateLabSets implements ParameterSetProvider {
    /** Its set's name. */
    public static final String NAME = "late-lab-2025";

    /** Public no-argument constructor for the service loader. */
    public LateLabSets() {
    }

    @Override
    public List<ParameterSet> parameterSets() {
        return List.of(TeamFiles.read(NAME, false));
    }
}
