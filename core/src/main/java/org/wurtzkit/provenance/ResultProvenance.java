package org.wurtzkit.provenance;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.StructureCodec;

/**
 * What produced a result: the library version, the structure, the parameter set's name and content
 * hash ({@link ParameterSetHash}), the solver's options and the warnings the result carries. A
 * structure plus these options is enough to compute the result again, bit for bit, on any machine
 * running the same library version.
 *
 * <p>The solver options are kept as ordered name/value text pairs (numbers written with
 * {@link Double#toString(double)}, which reads back to the same double), because the options type
 * belongs to the solvers module; {@code SolverOptions.fromSettings} in that module reads them back.
 *
 * @param libraryVersion     the version of wurtzkit that computed the result
 * @param structure          the structure that was solved
 * @param parameterSetName   name of the structure's parameter set
 * @param parameterSetSha256 content hash of that set's values when the result was computed
 * @param solverOptions      the solver options as ordered name/value pairs
 * @param run                what was computed, as ordered name/value pairs: {@code computation} (e.g.
 *                           "single solve", "bias sweep") and what else is needed to repeat it (the
 *                           start of a single solve, the biases of a sweep in solving order)
 * @param warnings           warnings the result carries, possibly none
 */
public record ResultProvenance(String libraryVersion, Structure structure, String parameterSetName,
        String parameterSetSha256, Map<String, String> solverOptions, Map<String, String> run, List<String> warnings) {

    /**
     * Validates and copies (the options keep their order).
     *
     * @param libraryVersion the version of wurtzkit that computed the result
     * @param structure the structure that was solved
     * @param parameterSetName name of the structure's parameter set
     * @param parameterSetSha256 content hash of that set's values when the result was computed
     * @param solverOptions the solver options as ordered name/value pairs
     * @param run what was computed, as ordered name/value pairs: {@code computation} (e.g. "single solve", "bias sweep") and what else is needed to repeat it (the start of a single solve, the biases of a sweep in solving order)
     * @param warnings warnings the result carries, possibly none
     */
    public ResultProvenance {
        Require.nonNull("library version", libraryVersion);
        Require.nonNull("structure", structure);
        Require.nonNull("parameter set name", parameterSetName);
        Require.nonNull("parameter set hash", parameterSetSha256);
        Require.nonNull("solver options", solverOptions);
        Require.nonNull("run description", run);
        Require.nonNull("warnings", warnings);
        solverOptions = Collections.unmodifiableMap(new LinkedHashMap<>(solverOptions));
        run = Collections.unmodifiableMap(new LinkedHashMap<>(run));
        warnings = List.copyOf(warnings);
    }

    /**
     * The provenance of a result computed now by this library.
     *
     * @param structure     the structure solved
     * @param solverOptions the solver options as ordered name/value pairs
     * @param run           what was computed (see the record's documentation)
     * @param warnings      the result's warnings
     * @return the provenance, with this library's version and the set's current hash
     */
    public static ResultProvenance of(Structure structure, Map<String, String> solverOptions, Map<String, String> run,
            List<String> warnings) {
        Require.nonNull("structure", structure);
        return new ResultProvenance(LibraryVersion.get(), structure, structure.parameters().name(),
                ParameterSetHash.sha256(structure.parameters()), solverOptions, run, warnings);
    }

    /**
     * The lines of a CSV file's header, without the comment marker: who produced the result, the
     * parameter set and its hash, the solver options, every warning and the structure. The
     * structure is written on one line in the JSON format of the installed {@link StructureCodec};
     * when none is on the class path (materials-data absent), or the format cannot hold the stack (of
     * the stack format's version 2: only a custom material whose per-binary gap has a binary that is
     * itself per-binary, which no rule of the library makes), its summary is written instead and the
     * line says why.
     *
     * @return the lines, none containing a line break
     */
    public List<String> headerLines() {
        List<String> out = new ArrayList<>();
        out.add("produced by wurtzkit " + libraryVersion);
        out.add("parameter set: " + parameterSetName + ", sha256 " + parameterSetSha256);
        out.add(pairs("solver options:", solverOptions));
        out.add(pairs("run:", run));
        for (String w : warnings) {
            out.add("warning: " + w.replace('\r', ' ').replace('\n', ' '));
        }
        Optional<StructureCodec> codec = StructureCodec.installed();
        String why = "no StructureCodec on the class path to write its JSON";
        if (codec.isPresent()) {
            try {
                out.add("structure: " + codec.get().writeCompact(structure));
                return Collections.unmodifiableList(out);
            } catch (WurtzkitException e) {
                // a stack the format cannot hold: say so, keep the table
                why = e.getMessage().replace('\r', ' ').replace('\n', ' ');
            }
        }
        out.add("structure (summary; " + why + "): " + structure.toString().replace('\n', '|'));
        return Collections.unmodifiableList(out);
    }

    private static String pairs(String title, Map<String, String> m) {
        StringBuilder sb = new StringBuilder(title);
        m.forEach((k, v) -> sb.append(' ').append(k).append('=').append(v).append(';'));
        if (!m.isEmpty()) {
            sb.setLength(sb.length() - 1);
        }
        return sb.toString().replace('\r', ' ').replace('\n', ' ');
    }

    /** @return the {@link #headerLines()} joined by '\n' */
    @Override
    public String toString() {
        return String.join("\n", headerLines());
    }
}
