package org.wurtzkit.material;

import java.util.List;

/**
 * Service interface through which {@link java.util.ServiceLoader} discovers parameter sets.
 * Implementations need a public no-argument constructor and an entry in
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider}.
 */
public interface ParameterSetProvider {
    /** {@return the sets this provider offers (loaded eagerly or lazily, but thread-safely)} */
    List<ParameterSet> parameterSets();
}
