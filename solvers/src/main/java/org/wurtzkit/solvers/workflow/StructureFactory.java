package org.wurtzkit.solvers.workflow;

import org.wurtzkit.structure.Structure;

/**
 * Builds the structure of one design-map point from the values of the map's axes. It is called
 * from several threads at once, so it must be thread-safe (a pure function of its argument, as a
 * lambda building a {@link Structure} usually is). An exception it throws marks that point as
 * failed.
 */
@FunctionalInterface
public interface StructureFactory {
    /**
     * @param values one value per axis, in axis order (a fresh array for every call)
     * @return the structure
     */
    Structure at(double[] values);
}
