package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Units;

/**
 * A depth interval of a solved stack, e.g. a quantum window as the solver resolved it onto the mesh.
 *
 * @param top    depth of its top (m, 0 at the surface)
 * @param bottom depth of its bottom (m), &ge; top
 */
public record DepthRange(double top, double bottom) {
    /** Validates. */
    public DepthRange {
        Require.finite("top depth of a depth range (m)", top);
        Require.finite("bottom depth of a depth range (m)", bottom);
        if (!(bottom >= top)) {
            throw new InvalidParameterException("bottom depth of a depth range (m)", Double.toString(bottom),
                    "[" + top + ", ...) (not above its top)");
        }
    }

    /** @return depth of the top (nm) */
    public double topNm() {
        return top / Units.NM;
    }

    /** @return depth of the bottom (nm) */
    public double bottomNm() {
        return bottom / Units.NM;
    }

    /** @return bottom - top (m) */
    public double thickness() {
        return bottom - top;
    }

    /**
     * @param depth a depth (m)
     * @return true if top &le; depth &le; bottom
     */
    public boolean contains(double depth) {
        return depth >= top && depth <= bottom;
    }
}
