package org.wurtzkit.solvers.workflow;

import org.wurtzkit.structure.Structure;

/**
 * Builds the structure of one design-map point from the values of the map's axes. It is called
 * from several threads at once, so it must be thread-safe (a pure function of its argument, as a
 * lambda building a {@link Structure} usually is). A library exception it throws
 * ({@link org.wurtzkit.errors.InvalidParameterException} or
 * {@link org.wurtzkit.errors.WurtzkitException}) marks that point as failed; any other exception is
 * a defect and ends the map.
 */
@FunctionalInterface
public interface StructureFactory {
    /**
     * @param values one value per axis, in axis order (a fresh array for every call)
     * @return the structure
     */
    Structure at(double[] values);
}
