package org.wurtzkit.materials.data;

import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.StructureCodec;

/**
 * {@link StructureJson} as the {@link StructureCodec} service, registered in
 * {@code META-INF/services/org.wurtzkit.structure.StructureCodec} so that modules without a
 * dependency on this one (the solvers, for the provenance of their results) can write a stack's
 * JSON. Reads with the default {@link StructureJson#reader()}.
 */
public final class StructureJsonCodec implements StructureCodec {
    /** For {@link java.util.ServiceLoader}. */
    public StructureJsonCodec() {
        // stateless
    }

    @Override
    public String formatName() {
        return "wurtzkit-stack";
    }

    @Override
    public int formatVersion() {
        return StructureJson.FORMAT_VERSION;
    }

    @Override
    public String write(Structure structure) {
        return StructureJson.write(structure);
    }

    @Override
    public String writeCompact(Structure structure) {
        return StructureJson.writeCompact(structure);
    }

    @Override
    public Structure read(String text, String origin) {
        return StructureJson.reader().read(text, origin);
    }
}
