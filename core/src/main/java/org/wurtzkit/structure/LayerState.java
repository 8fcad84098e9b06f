package org.wurtzkit.structure;

import org.wurtzkit.units.Decimals;

/**
 * A layer placed in its structure: depths of its top and bottom below the surface, and the state at
 * its two faces (equal for a uniform layer).
 *
 * @param layer       the layer
 * @param indexFromTop 0 for the top layer
 * @param depthTop    depth of the layer's top below the surface (m)
 * @param depthBottom depth of the layer's bottom below the surface (m)
 * @param top         state at the layer's top face
 * @param bottom      state at the layer's bottom face
 */
public record LayerState(Layer layer, int indexFromTop, double depthTop, double depthBottom, PointState top,
        PointState bottom) {

    /**
     * Bound charge per area inside a graded layer, the integral of -dP_z/dz over the layer,
     * P_z(bottom) - P_z(top) (C/m&sup2;); zero for a uniform layer.
     *
     * @return the integrated bulk bound charge (C/m&sup2;)
     */
    public double gradedBoundCharge() {
        return bottom.alongGrowth() - top.alongGrowth();
    }

    /**
     * @return e.g. {@code "barrier (layer 1 from the top), 3 to 25 nm deep: Al0.26Ga0.74N on a = ..."}; a
     *         graded layer shows the states at its top and bottom faces
     */
    @Override
    public String toString() {
        String head = layer.name() + " (layer " + indexFromTop + " from the top), " + Decimals.format(depthTop * 1e9)
                + " to " + Decimals.format(depthBottom * 1e9, "nm") + " deep: ";
        return top.equals(bottom) ? head + top : head + "top " + top + "; bottom " + bottom;
    }
}
