package org.wurtzkit.material;

/**
 * Implemented by a failure that knows which parameter set it concerns (such as the data-file errors
 * of {@code wurtzkit-materials-data}), so that {@link ParameterSets} can report a broken provider
 * under the name of its set.
 */
public interface NamedSetFailure {
    /** {@return the set's name as far as it could be read; null, blank or "(...)" when unknown} */
    String setName();
}
