package org.wurtzkit.materials.data;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.wurtzkit.errors.Require;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.structure.Structure;

/**
 * A result's {@link ResultProvenance} as a JSON side file, written and read here. Shape (format
 * version 1):
 *
 * <pre>
 * {
 *   "formatVersion": 1,
 *   "libraryVersion": "0.1.0",
 *   "parameterSet": {"name": "...", "sha256": "..."},
 *   "solverOptions": {"tolerance": "1.0E-6", ...},
 *   "run": {"computation": "single solve", "start": "cold"},
 *   "warnings": ["..."],
 *   "structure": { the stack, exactly as {@link StructureJson} writes it }
 * }
 * </pre>
 *
 * The solver options are text values, each as the solvers wrote it ({@link Double#toString(double)}
 * for numbers), read back by {@code SolverOptions.fromSettings}. Unknown keys are errors, as in
 * {@link StructureJson}; the structure's own {@code parameterSet.sha256} is checked the same way.
 */
public final class ProvenanceJson {
    /** The format version this class writes. */
    public static final int FORMAT_VERSION = 1;

    private ProvenanceJson() {
    }

    /**
     * @param p a provenance
     * @return its JSON text, indented, ending with a line break
     */
    public static String write(ResultProvenance p) {
        Require.nonNull("provenance", p);
        StringWriter w = new StringWriter();
        try (JsonGenerator g = StructureJson.generator(w, true)) {
            g.writeStartObject();
            g.writeNumberField("formatVersion", FORMAT_VERSION);
            g.writeStringField("libraryVersion", p.libraryVersion());
            g.writeObjectFieldStart("parameterSet");
            g.writeStringField("name", p.parameterSetName());
            g.writeStringField("sha256", p.parameterSetSha256());
            g.writeEndObject();
            g.writeObjectFieldStart("solverOptions");
            for (Map.Entry<String, String> e : p.solverOptions().entrySet()) {
                g.writeStringField(e.getKey(), e.getValue());
            }
            g.writeEndObject();
            g.writeObjectFieldStart("run");
            for (Map.Entry<String, String> e : p.run().entrySet()) {
                g.writeStringField(e.getKey(), e.getValue());
            }
            g.writeEndObject();
            g.writeArrayFieldStart("warnings");
            for (String s : p.warnings()) {
                g.writeString(s);
            }
            g.writeEndArray();
            g.writeFieldName("structure");
            StructureJson.writeStructure(g, p.structure());
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringWriter does not throw
        }
        return w + "\n";
    }

    /**
     * Writes the provenance to a file (UTF-8), replacing it if it exists.
     *
     * @param p    a provenance
     * @param path the file
     * @throws IOException from the file system
     */
    public static void writeFile(ResultProvenance p, Path path) throws IOException {
        Require.nonNull("path", path);
        Files.writeString(path, write(p), StandardCharsets.UTF_8);
    }

    /**
     * @param json     provenance JSON text
     * @param fileName where it comes from, for messages
     * @param reader   the stack reader (parameter sets it knows; whether a changed set is accepted)
     * @return the provenance as recorded (its library version and hash are those of the file)
     * @throws StructureFormatException naming file, key path and line
     */
    public static ResultProvenance read(String json, String fileName, StructureJson.Reader reader) {
        Require.nonNull("provenance JSON text", json);
        Require.nonNull("file name", fileName);
        Require.nonNull("stack reader", reader);
        JsonTree.Node root = StructureJson.parse(json, fileName);
        StructureJson.TreeReader t = new StructureJson.TreeReader(fileName, "");
        JsonTree.Obj o = t.object(root, "");
        t.onlyKeys(o, "", Set.of("formatVersion", "libraryVersion", "parameterSet", "solverOptions", "run",
                "warnings", "structure"));
        JsonTree.Member v = t.required(o, "", "formatVersion");
        if (t.number(v.value(), "formatVersion") != FORMAT_VERSION) {
            throw t.fail("formatVersion", v.value().line(), StructureFormatException.Reason.UNSUPPORTED_VERSION,
                    "provenance format version " + ((JsonTree.Num) v.value()).text() + " is not known; allowed: "
                            + FORMAT_VERSION);
        }
        String version = t.string(t.required(o, "", "libraryVersion").value(), "libraryVersion");
        JsonTree.Obj ps = t.object(t.required(o, "", "parameterSet").value(), "parameterSet");
        t.onlyKeys(ps, "parameterSet", Set.of("name", "sha256"));
        String name = t.string(t.required(ps, "parameterSet", "name").value(), "parameterSet.name");
        String hash = t.string(t.required(ps, "parameterSet", "sha256").value(), "parameterSet.sha256");
        Map<String, String> options = new LinkedHashMap<>();
        JsonTree.Obj so = t.object(t.required(o, "", "solverOptions").value(), "solverOptions");
        for (JsonTree.Member m : so.members().values()) {
            options.put(m.key(), t.string(m.value(), "solverOptions." + m.key()));
        }
        Map<String, String> run = new LinkedHashMap<>();
        JsonTree.Obj ro = t.object(t.required(o, "", "run").value(), "run");
        for (JsonTree.Member m : ro.members().values()) {
            run.put(m.key(), t.string(m.value(), "run." + m.key()));
        }
        List<String> warnings = new ArrayList<>();
        List<JsonTree.Node> ws = t.array(t.required(o, "", "warnings").value(), "warnings");
        for (int i = 0; i < ws.size(); i++) {
            warnings.add(t.string(ws.get(i), "warnings[" + i + "]"));
        }
        Structure s = reader.readStructure(t.required(o, "", "structure").value(), fileName, "structure");
        return new ResultProvenance(version, s, name, hash, options, run, warnings);
    }

    /**
     * @param path   a provenance file
     * @param reader the stack reader
     * @return the provenance
     */
    public static ResultProvenance readFile(Path path, StructureJson.Reader reader) {
        Require.nonNull("provenance file path", path);
        try {
            return read(Files.readString(path, StandardCharsets.UTF_8), path.toString(), reader);
        } catch (IOException e) {
            throw new StructureFormatException(path.toString(), "(root)", 0, StructureFormatException.Reason.SYNTAX,
                    "the file cannot be read: " + e, e);
        }
    }
}
