package org.wurtzkit.structure;

import java.util.Optional;
import java.util.ServiceLoader;

/**
 * Writes a {@link Structure} as text and reads it back, equal bit for bit. The library's own
 * implementation, the versioned JSON format of the {@code materials-data} module (the module that
 * reads and writes files), registers itself in
 * {@code META-INF/services/org.wurtzkit.structure.StructureCodec}; modules that must not depend on
 * it (the solvers, for the provenance of their results) find it with {@link #installed()}.
 * Implementations are immutable and thread-safe.
 */
public interface StructureCodec {
    /** {@return the name of the format, e.g. "wurtzkit-stack"} */
    String formatName();

    /** {@return the version of the format this codec writes} */
    int formatVersion();

    /**
     * @param structure a structure
     * @return its text, indented for reading, ending with a line break
     */
    String write(Structure structure);

    /**
     * @param structure a structure
     * @return its text on one line (no line breaks), for a comment line of a CSV file
     */
    String writeCompact(Structure structure);

    /**
     * @param text   text written by {@link #write} or {@link #writeCompact} (or by hand)
     * @param origin where the text comes from, for error messages (a file name, "provenance", ...)
     * @return the structure
     */
    Structure read(String text, String origin);

    /**
     * {@return the first codec registered through {@link ServiceLoader} (this class's loader, then
     * the thread's context loader), or empty when none is on the class path}
     */
    static Optional<StructureCodec> installed() {
        Optional<StructureCodec> own = ServiceLoader.load(StructureCodec.class, StructureCodec.class.getClassLoader())
                .findFirst();
        if (own.isPresent()) {
            return own;
        }
        ClassLoader context = Thread.currentThread().getContextClassLoader();
        return context == null ? Optional.empty() : ServiceLoader.load(StructureCodec.class, context).findFirst();
    }
}
