package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;

/**
 * Where in a stack a problem found only when the whole structure is assembled ({@link Structure.Builder#build()})
 * lies, so that a reader of stack files can point at the exact entry: the interface states of one sheet on the
 * top face of one layer, or the top boundary.
 *
 * @param kind         what part of the stack
 * @param layerFromTop the nitride layer, counted from the surface (0 = top nitride layer); -1 for the top boundary
 * @param sheet        the sheet on that layer's top face, in the order of {@link Structure.Builder#sheetOnTop}
 *                     calls for it (0 first); -1 for the top boundary
 * @param states       the interface-state set within that sheet (0 first); -1 for the top boundary
 */
public record StructurePart(Kind kind, int layerFromTop, int sheet, int states) {
    /** The parts a whole-structure check can point at. */
    public enum Kind {
        /** One interface-state set of one sheet on the top face of a nitride layer. */
        INTERFACE_STATES,
        /** The top boundary (gate or free surface). */
        TOP_BOUNDARY
    }

    /**
     * Validates: an interface-state set has indices &ge; 0, the top boundary has -1 for each.
     *
     * @param kind         what part of the stack, non-null
     * @param layerFromTop the layer counted from the surface, or -1
     * @param sheet        the sheet on its top face, or -1
     * @param states       the interface-state set within the sheet, or -1
     */
    public StructurePart {
        Require.nonNull("structure part kind", kind);
        int min = kind == Kind.INTERFACE_STATES ? 0 : -1;
        int max = kind == Kind.INTERFACE_STATES ? Integer.MAX_VALUE : -1;
        Require.inRange("layer index from the top of " + kind, layerFromTop, min, max);
        Require.inRange("sheet index of " + kind, sheet, min, max);
        Require.inRange("interface-state index of " + kind, states, min, max);
    }

    /** @return the top boundary */
    public static StructurePart topBoundary() {
        return new StructurePart(Kind.TOP_BOUNDARY, -1, -1, -1);
    }

    /** An error raised at assembly that says which part of the stack it concerns. */
    public interface Located {
        /** @return the part of the stack the error concerns */
        StructurePart part();
    }
}
