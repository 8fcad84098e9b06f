package org.wurtzkit.structure;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * A value out of range found only when the whole structure is assembled (e.g. an interface-state level
 * outside the gap of the layer below it), with the {@link StructurePart} it belongs to.
 */
public final class InvalidStructurePartException extends InvalidParameterException implements StructurePart.Located {
    private static final long serialVersionUID = 1L;
    /** Where the value belongs. */
    private final transient StructurePart part;

    /**
     * @param part  where in the stack the value belongs
     * @param cause the range check that failed; its parameter, value and range are kept
     */
    public InvalidStructurePartException(StructurePart part, InvalidParameterException cause) {
        super(cause.parameter(), cause.value(), cause.allowedRange());
        initCause(cause);
        this.part = part;
    }

    @Override
    public StructurePart part() {
        return part;
    }
}
