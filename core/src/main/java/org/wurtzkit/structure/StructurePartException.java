package org.wurtzkit.structure;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * An inconsistency of kind {@link ErrorKind#INVALID_STRUCTURE} found only when the whole structure is
 * assembled (e.g. surface donors on a free surface above an insulator), with the {@link StructurePart} it
 * concerns.
 */
public final class StructurePartException extends WurtzkitException implements StructurePart.Located {
    private static final long serialVersionUID = 1L;
    /** Where the inconsistency lies. */
    private final transient StructurePart part;

    /**
     * @param part    where in the stack the inconsistency lies
     * @param message what is wrong and how to fix it
     */
    public StructurePartException(StructurePart part, String message) {
        super(ErrorKind.INVALID_STRUCTURE, message);
        this.part = part;
    }

    @Override
    public StructurePart part() {
        return part;
    }
}
