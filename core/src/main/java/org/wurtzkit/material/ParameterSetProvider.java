package org.wurtzkit.material;

import java.util.List;

/**
 * Service interface through which {@link java.util.ServiceLoader} discovers parameter sets.
 * Implementations need a public no-argument constructor and an entry in
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider}.
 */
public interface ParameterSetProvider {
    /**
     * {@return the sets this provider offers} Read data files here (lazily), not in a static
     * initializer: {@link ParameterSets} calls this once per (re)load, and a failure thrown here is
     * recorded against this provider and reported when its set is named, while the other providers
     * keep working. Must be thread-safe.
     */
    List<ParameterSet> parameterSets();
}
