/**
 * The published parameter sets shipped with wurtzkit, and the reader for parameter-set files.
 * {@link org.wurtzkit.materials.data.BuiltInParameterSets} registers the built-in sets (JSON
 * resources beside this package) with {@link java.util.ServiceLoader};
 * {@link org.wurtzkit.materials.data.JsonParameterSetReader} reads any set in the same file format
 * with Jackson's streaming parser, converts file units to SI once, validates every value (present,
 * finite, in range, citing a listed source) and returns an immutable, thread-safe
 * {@link org.wurtzkit.materials.data.FileParameterSet}. A file that cannot become a set raises
 * {@link org.wurtzkit.materials.data.ParameterSetFormatException} naming the set, the file, the key
 * and the line. This is the only module that reads data files; a team adds its own set by shipping a
 * JSON file and a small provider in its own jar.
 *
 * <p>Stacks and results as data: {@link org.wurtzkit.materials.data.StructureJson} writes and reads
 * a {@link org.wurtzkit.structure.Structure} in wurtzkit's own versioned JSON format (schemas
 * {@code schema/stack-v2.schema.json} and {@code schema/stack-v1.schema.json} beside this package;
 * version 2 is written by default, both are read), bit for bit, checking the recorded
 * content hash of the parameter set; {@link org.wurtzkit.materials.data.StructureJsonCodec} offers it
 * to other modules as the {@link org.wurtzkit.structure.StructureCodec} service; and
 * {@link org.wurtzkit.materials.data.ProvenanceJson} writes and reads a result's
 * {@link org.wurtzkit.provenance.ResultProvenance} as a JSON side file. Their failures are
 * {@link org.wurtzkit.materials.data.StructureFormatException}s naming file, key path, line and a
 * typed reason.
 */
package org.wurtzkit.materials.data;
