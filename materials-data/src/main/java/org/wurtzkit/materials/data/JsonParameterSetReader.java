package org.wurtzkit.materials.data;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.StreamReadConstraints;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.AlloyBowing;
import org.wurtzkit.material.AlloyScattering;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Bowing;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.material.PolarizationModel;

/**
 * Reads a parameter set from a JSON data file (format version {@value #FORMAT_VERSION}) with
 * Jackson's streaming {@link JsonParser}, and returns it as an immutable {@link FileParameterSet}.
 * The built-in sets of {@link BuiltInParameterSets} are read this way; a team reads its own
 * measured set the same way.
 *
 * <h2>File format</h2>
 *
 * <pre>{@code
 * {
 *   "formatVersion": 1,
 *   "name": "lab-2025",                              // unique set name
 *   "description": "One sentence saying what the set follows.",
 *   "recommendedPolarizationModel": "LINEAR",        // or "NONLINEAR"
 *   "conductionBandOffsetFraction": { "value": 0.7, "source": "A00" },  // optional line-up rule:
 *                                                    // dE_c = f dE_g to GaN; absent: tabulated E_v
 *   "sources": {                                     // the bibliography: key -> citation (+ note)
 *     "VM03": { "citation": "I. Vurgaftman and J. R. Meyer, J. Appl. Phys. 94, 3675 (2003)",
 *               "note": "how the values were taken" },
 *     "LAB":  { "citation": "Our X-ray and Brillouin measurements, 2025" }
 *   },
 *   "binaries": {
 *     "GaN": {
 *       "a":   { "value": 3.189, "source": "VM03", "note": "..." },
 *       "C13": { "value": 101,   "source": "LAB", "unit": "GPa" },
 *       "Ev":  { "value": 0, "source": ["VM03", "LAB"], "rule": "reference of the scale" },
 *       ...                                          // every MaterialParameter key but Psp_bowing
 *     },
 *     "AlN": { ... },
 *     "InN": { ... }
 *   },
 *   "bowing": {
 *     "gap":          { "AlGaN": { "value": 0.7, "source": "VM03" }, "InGaN": {...}, "InAlN": {...} },
 *     "polarization": { "AlGaN": { "value": 0,   "source": "VM03" }, "InGaN": {...}, "InAlN": {...} }
 *   },
 *   "insulators": {                                  // optional: gate dielectrics, by name
 *     "Al2O3":   { "builtIn": "Al2O3" },            // the library's own record (Insulators)
 *     "LAB-SiN": {                                   // a team's own film, every value with its source
 *       "relativePermittivity":      { "value": 7.1, "source": "LAB" },
 *       "bandGap":                   { "value": 5.1, "source": "LAB", "unit": "eV" },
 *       "conductionBandOffsetToGaN": { "value": 2.3, "source": "LAB", "unit": "eV" }
 *     }
 *   }
 * }
 * }</pre>
 *
 * (The {@code //} remarks above are explanations only: the file itself is strict JSON, without
 * comments.)
 *
 * <ul>
 * <li>The keys of a binary are the {@link MaterialParameter#key()}s; every parameter must be given
 * except {@code Psp_bowing}, which must not be given: the loader sets it to 0 for each binary (rule
 * "zero for a binary by definition", citing the sources of that binary's {@code Psp}).</li>
 * <li>Values are in the file unit {@link MaterialParameter#fileUnit()} (Angstrom, GPa, meV/K, ...)
 * and are converted with {@link MaterialParameter#fileToSi()}. The optional {@code "unit"} must
 * equal the file unit; it only guards against slips.</li>
 * <li>Gap bowing is in eV (Eg = Vegard - b x(1 - x)), polarization bowing in C/m&sup2;
 * (Psp = Vegard + b x(1 - x)); see {@link AlloyBowing}.</li>
 * <li>{@code "source"} is one source key or an array of them; each must be in {@code "sources"},
 * and each source must be cited at least once. {@code "rule"} (default "tabulated") becomes
 * {@link Provenance#rule()}; {@code "note"} is kept in {@link FileParameterSet#notes()}.</li>
 * <li>{@code "insulators"} (optional) declares the set's gate dielectrics
 * ({@link org.wurtzkit.material.ParameterSet#insulators()}), keyed by name (unique, case
 * ignored): either a reference {@code {"builtIn": "<name>"}} to one of
 * {@link Insulators#all()}, whose values and sources are the library's (one home for each number:
 * the built-in sets refer to them this way, and the key must be the built-in's name), or the three
 * values of an {@link Insulator} with their sources: {@code relativePermittivity} (unit "1"),
 * {@code bandGap} and {@code conductionBandOffsetToGaN} (E_c(insulator) - E_c(GaN), eV). The values
 * must pass the {@link Insulator} record's ranges. The insulator's {@link Insulator#source()} lists
 * each value's citations and note.</li>
 * <li>Unknown keys, duplicated keys, non-numeric or non-finite values and values that
 * {@link WurtziteMaterial.Builder} or {@link Insulator} rejects are errors. Every error is a
 * {@link ParameterSetFormatException} naming the set, the file, the key and the line.</li>
 * </ul>
 *
 * <h2>Registering a team's own set</h2>
 *
 * Put the JSON file beside a provider class and list the class in
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider}:
 *
 * <pre>{@code
 * public final class LabSets implements ParameterSetProvider {
 *     @Override public List<ParameterSet> parameterSets() {   // read lazily, on each call
 *         return List.of(JsonParameterSetReader.readResource(LabSets.class, "lab-2025.json"));
 *     }
 * }
 * }</pre>
 *
 * Then {@code ParameterSets.named("lab-2025")} finds it. Read the file inside
 * {@code parameterSets()}, not in a static field: {@code ParameterSets} calls it once per
 * (re)load and keeps the sets, and a typo in the file is then reported when the set is named (with
 * set, file, key and line), whereas a failing static initializer leaves the class unusable until
 * the JVM restarts. The reader is stateless and thread-safe.
 */
public final class JsonParameterSetReader {
    /** The only format version this reader understands. */
    public static final int FORMAT_VERSION = 1;

    /**
     * Largest parameter-set file read (bytes): 1 MiB, some 40 times the built-in sets (about 25 kB).
     * A larger file is refused while it is read, before it can fill the heap.
     */
    public static final long MAX_FILE_BYTES = 1L << 20;
    /**
     * Most JSON values (objects, arrays, strings, numbers, literals) a parameter-set file may hold:
     * 20 000, some 40 times the built-in sets (under 500 each).
     */
    public static final int MAX_JSON_VALUES = 20_000;

    /**
     * Default JSON (no comments, no NaN/Infinity literals, no single quotes), with Jackson's stream
     * read constraints bounding the document length, string length and nesting.
     */
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder().maxDocumentLength(MAX_FILE_BYTES)
                    .maxStringLength((int) MAX_FILE_BYTES).maxNestingDepth(64).build())
            .build();

    private static final String[] ROOT_KEYS = {"formatVersion", "name", "description",
        "recommendedPolarizationModel", "conductionBandOffsetFraction", "sources", "binaries", "alloyScattering", "bowing",
        "insulators"};
    private static final String[] INSULATOR_KEYS = {"relativePermittivity", "bandGap", "conductionBandOffsetToGaN"};
    private static final String[] BUILT_IN_KEYS = {"builtIn"};
    private static final String[] SOURCE_KEYS = {"citation", "note"};
    private static final String[] ENTRY_KEYS = {"value", "source", "note", "rule", "unit"};
    private static final String[] BOWING_KINDS = {"gap", "polarization"};
    private static final String[] BOWING_PAIRS = {"AlGaN", "InGaN", "InAlN"};
    private static final String[] MODELS = {"LINEAR", "NONLINEAR"};

    private JsonParameterSetReader() {
    }

    /**
     * Reads a parameter set.
     *
     * @param source   opens the file (the stream is closed here)
     * @param fileName the file's name, used in every error message
     * @return the immutable set
     * @throws ParameterSetFormatException if the file is missing, unreadable or malformed
     */
    public static FileParameterSet read(InputStreamSupplier source, String fileName) {
        Require.nonNull("parameter-set stream supplier", source);
        Require.nonNull("parameter-set file name", fileName);
        JsonTree.Parsed parsed;
        try (InputStream in = source.open()) {
            if (in == null) {
                throw new ParameterSetFormatException(ParameterSetFormatException.UNNAMED, fileName, "(root)", 0,
                        "the file does not exist (the stream supplier returned null)", null);
            }
            try (JsonParser parser = FACTORY.createParser(in)) {
                parsed = JsonTree.read(parser);
            }
        } catch (JsonTree.SyntaxFailure f) {
            throw new ParameterSetFormatException(nameOf(f.partialRoot()), fileName, f.path(), f.line(),
                    f.problem(), f.getCause());
        } catch (IOException e) {
            throw new ParameterSetFormatException(ParameterSetFormatException.UNNAMED, fileName, "(root)", 0,
                    "the file cannot be read: " + e, e);
        }
        return new Validator(fileName, parsed).run();
    }

    /**
     * Reads a parameter set from a class-path resource.
     *
     * @param anchor       class whose {@link Class#getResourceAsStream(String)} resolves the name
     * @param resourceName resource name, relative to the anchor's package or absolute ("/...")
     * @return the immutable set
     * @throws ParameterSetFormatException if the resource is missing or malformed
     */
    public static FileParameterSet readResource(Class<?> anchor, String resourceName) {
        Require.nonNull("resource anchor class", anchor);
        Require.nonNull("resource name", resourceName);
        return read(() -> anchor.getResourceAsStream(resourceName), resourceName);
    }

    /**
     * Reads a parameter set from a file.
     *
     * @param path the file
     * @return the immutable set
     * @throws ParameterSetFormatException if the file is missing or malformed
     */
    public static FileParameterSet readFile(Path path) {
        Require.nonNull("parameter-set file path", path);
        return read(() -> Files.exists(path) ? Files.newInputStream(path) : null, path.toString());
    }

    private static String nameOf(JsonTree.Obj root) {
        if (root != null) {
            JsonTree.Member m = root.get("name");
            if (m != null && m.value() instanceof JsonTree.Str s && !s.text().isBlank()) {
                return s.text();
            }
        }
        return ParameterSetFormatException.UNNAMED;
    }

    /** One value entry: file value, sources, rule, note. */
    private record Entry(double fileValue, List<Source> sources, String rule, int line) {
    }

    /** Checks the tree against the schema; every failure names set, file, key and line. */
    private static final class Validator {
        private final String fileName;
        private final JsonTree.Parsed parsed;
        private String setName = ParameterSetFormatException.UNNAMED;
        private final Map<String, Source> sources = new LinkedHashMap<>();
        private final Map<String, Integer> sourceLines = new LinkedHashMap<>();
        private final Set<String> usedSources = new HashSet<>();
        private final Map<String, String> notes = new LinkedHashMap<>();

        Validator(String fileName, JsonTree.Parsed parsed) {
            this.fileName = fileName;
            this.parsed = parsed;
        }

        private ParameterSetFormatException fail(String key, int line, String problem) {
            return new ParameterSetFormatException(setName, fileName, key, line, problem, null);
        }

        FileParameterSet run() {
            if (!(parsed.root() instanceof JsonTree.Obj root)) {
                throw fail("(root)", parsed.root().line(),
                        "the file must hold one JSON object, found " + parsed.root().describe());
            }
            setName = nameOf(root);
            JsonTree.Duplicate d = parsed.firstDuplicate();
            if (d != null) {
                throw fail(d.path(), d.line(), "duplicated key (first given on line " + d.firstLine() + ")");
            }
            checkKeys(root, "", ROOT_KEYS);

            JsonTree.Member version = required(root, "", "formatVersion");
            if (!(version.value() instanceof JsonTree.Num n) || n.value() != FORMAT_VERSION) {
                throw fail("formatVersion", version.line(), "formatVersion = " + text(version.value())
                        + " is not supported; allowed: {" + FORMAT_VERSION + "}");
            }
            String name = string(required(root, "", "name"), "name");
            setName = name;
            String description = string(required(root, "", "description"), "description");
            JsonTree.Member modelMember = required(root, "", "recommendedPolarizationModel");
            String modelText = string(modelMember, "recommendedPolarizationModel");
            PolarizationModel model;
            if (modelText.equals("LINEAR")) {
                model = PolarizationModel.LINEAR;
            } else if (modelText.equals("NONLINEAR")) {
                model = PolarizationModel.NONLINEAR;
            } else {
                throw fail("recommendedPolarizationModel", modelMember.value().line(), "recommendedPolarizationModel = \""
                        + modelText + "\" is not allowed; allowed: {" + String.join(", ", MODELS) + "}");
            }

            readSources(object(required(root, "", "sources"), "sources"));

            JsonTree.Member binariesMember = required(root, "", "binaries");
            JsonTree.Obj binaries = object(binariesMember, "binaries");
            String[] formulas = new String[Binary.values().length];
            for (Binary b : Binary.values()) {
                formulas[b.ordinal()] = b.formula();
            }
            checkKeys(binaries, "binaries", formulas);
            Map<Binary, WurtziteMaterial> materials = new EnumMap<>(Binary.class);
            for (JsonTree.Member m : binaries.members().values()) {
                Binary b = Binary.ofFormula(m.key());
                materials.put(b, binary(b, m));
            }
            for (Binary b : Binary.values()) {
                if (!materials.containsKey(b)) {
                    throw fail("binaries." + b.formula(), binariesMember.line(),
                            "missing binary " + b.formula() + "; a set must give GaN, AlN and InN");
                }
            }

            AlloyBowing bowing = readBowing(required(root, "", "bowing"));
            AlloyScattering alloyScattering = readAlloyScattering(required(root, "", "alloyScattering"));
            java.util.OptionalDouble lineUp = java.util.OptionalDouble.empty();
            JsonTree.Member lineUpMember = root.get("conductionBandOffsetFraction");
            if (lineUpMember != null) {
                Entry e = entry(lineUpMember, "conductionBandOffsetFraction", "1");
                if (!(e.fileValue() >= 0 && e.fileValue() <= 1)) {
                    throw fail("conductionBandOffsetFraction", e.line(), "value " + e.fileValue()
                            + " is outside the allowed range [0, 1]");
                }
                lineUp = java.util.OptionalDouble.of(e.fileValue());
            }

            JsonTree.Member insulatorsMember = root.get("insulators");
            List<Insulator> insulators = insulatorsMember == null ? List.of() : readInsulators(insulatorsMember);

            for (Map.Entry<String, Source> s : sources.entrySet()) {
                if (!usedSources.contains(s.getKey())) {
                    throw fail("sources." + s.getKey(), sourceLines.get(s.getKey()),
                            "source \"" + s.getKey() + "\" is cited by no value; cite it or remove it");
                }
            }
            return new FileParameterSet(name, description, fileName, model, materials, bowing, alloyScattering,
                    new ArrayList<>(sources.values()), notes, lineUp, insulators);
        }

        private List<Insulator> readInsulators(JsonTree.Member member) {
            JsonTree.Obj obj = object(member, "insulators");
            List<Insulator> out = new ArrayList<>();
            Map<String, String> seen = new LinkedHashMap<>();
            for (JsonTree.Member m : obj.members().values()) {
                String path = "insulators." + m.key();
                if (m.key().isBlank()) {
                    throw fail(path, m.line(), "an insulator name must not be blank");
                }
                String earlier = seen.put(m.key().toLowerCase(Locale.ROOT), m.key());
                if (earlier != null) {
                    throw fail(path, m.line(), "insulator \"" + m.key() + "\" differs from \"" + earlier
                            + "\" only in case; names are looked up ignoring case");
                }
                JsonTree.Obj e = object(m, path);
                JsonTree.Member builtIn = e.get("builtIn");
                if (builtIn != null) {
                    checkKeys(e, path, BUILT_IN_KEYS);
                    String ref = string(builtIn, path + ".builtIn");
                    Insulator i;
                    try {
                        i = Insulators.named(ref);
                    } catch (InvalidParameterException ex) {
                        throw fail(path + ".builtIn", builtIn.value().line(), ex.getMessage());
                    }
                    if (!i.name().equals(m.key())) {
                        throw fail(path, m.line(), "the built-in insulator \"" + i.name() + "\" keeps its name;"
                                + " allowed key: {" + i.name() + "}");
                    }
                    out.add(i);
                    continue;
                }
                checkKeys(e, path, INSULATOR_KEYS);
                Entry kappa = entry(required(e, path, INSULATOR_KEYS[0]), path + "." + INSULATOR_KEYS[0], "1");
                Entry gap = entry(required(e, path, INSULATOR_KEYS[1]), path + "." + INSULATOR_KEYS[1], "eV");
                Entry cbo = entry(required(e, path, INSULATOR_KEYS[2]), path + "." + INSULATOR_KEYS[2], "eV");
                String source = INSULATOR_KEYS[0] + ": " + cite(kappa, path + "." + INSULATOR_KEYS[0]) + "; "
                        + INSULATOR_KEYS[1] + ": " + cite(gap, path + "." + INSULATOR_KEYS[1]) + "; "
                        + INSULATOR_KEYS[2] + ": " + cite(cbo, path + "." + INSULATOR_KEYS[2]);
                try {
                    out.add(new Insulator(m.key(), kappa.fileValue(), gap.fileValue(), cbo.fileValue(), source));
                } catch (InvalidParameterException ex) {
                    String p = ex.parameter();
                    Entry bad = p.startsWith("relative permittivity") ? kappa : p.startsWith("band gap") ? gap : cbo;
                    String key = bad == kappa ? INSULATOR_KEYS[0] : bad == gap ? INSULATOR_KEYS[1] : INSULATOR_KEYS[2];
                    throw fail(path + "." + key, bad.line(), ex.getMessage());
                }
            }
            return List.copyOf(out);
        }

        /** The citations of an entry's sources, then its note in brackets if it has one. */
        private String cite(Entry e, String path) {
            List<String> c = new ArrayList<>();
            for (Source src : e.sources()) {
                c.add(src.citation());
            }
            String note = notes.get(path);
            return String.join(" + ", c) + (note == null ? "" : " [" + note + "]");
        }

        private void readSources(JsonTree.Obj obj) {
            if (obj.members().isEmpty()) {
                throw fail("sources", obj.line(), "the bibliography is empty; every value needs a source");
            }
            for (JsonTree.Member m : obj.members().values()) {
                String path = "sources." + m.key();
                if (m.key().isBlank()) {
                    throw fail(path, m.line(), "a source key must not be blank");
                }
                JsonTree.Obj s = object(m, path);
                checkKeys(s, path, SOURCE_KEYS);
                String citation = string(required(s, path, "citation"), path + ".citation");
                JsonTree.Member note = s.get("note");
                String noteText = note == null ? "" : stringAllowEmpty(note, path + ".note");
                sources.put(m.key(), new Source(m.key(), citation, noteText));
                sourceLines.put(m.key(), m.line());
            }
        }

        private WurtziteMaterial binary(Binary b, JsonTree.Member member) {
            String path = "binaries." + b.formula();
            JsonTree.Obj obj = object(member, path);
            WurtziteMaterial.Builder builder = WurtziteMaterial.builder(b.formula() + " (" + setName + ")")
                    .composition(composition(b));
            Map<MaterialParameter, Integer> lines = new EnumMap<>(MaterialParameter.class);
            Entry psp = null;
            for (JsonTree.Member m : obj.members().values()) {
                String key = path + "." + m.key();
                MaterialParameter p = MaterialParameter.ofKey(m.key());
                if (p == null) {
                    throw fail(key, m.line(), "unknown parameter key \"" + m.key() + "\"; allowed keys: "
                            + allowedParameterKeys());
                }
                if (p == MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING) {
                    throw fail(key, m.line(), "\"" + p.key() + "\" must not be given for a binary: it is zero by"
                            + " definition and set by the loader; alloy values come from \"bowing.polarization\"");
                }
                Entry e = entry(m, key, p.fileUnit());
                try {
                    builder.set(p, e.fileValue() * p.fileToSi(), new Provenance(e.rule(), e.sources()));
                } catch (InvalidParameterException ex) {
                    throw fail(key, e.line(), ex.getMessage());
                }
                lines.put(p, e.line());
                if (p == MaterialParameter.SPONTANEOUS_POLARIZATION) {
                    psp = e;
                }
            }
            for (MaterialParameter p : MaterialParameter.values()) {
                if (p != MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING && !lines.containsKey(p)) {
                    throw fail(path + "." + p.key(), member.line(), "missing value for parameter \"" + p.key()
                            + "\" (" + p.name() + ", file unit " + p.fileUnit() + ") of " + b.formula());
                }
            }
            MaterialParameter bowingKey = MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING;
            builder.set(bowingKey, 0.0, new Provenance("zero for a binary by definition", psp.sources()));
            notes.put(path + "." + bowingKey.key(),
                    "set to zero by the loader: the bowing term vanishes for a binary by definition");
            try {
                return builder.build();
            } catch (InvalidParameterException ex) {
                String material = b.formula() + " (" + setName + ")";
                for (MaterialParameter p : MaterialParameter.values()) {
                    if (ex.parameter().equals(p.key() + " of " + material) && lines.containsKey(p)) {
                        throw fail(path + "." + p.key(), lines.get(p), ex.getMessage());
                    }
                }
                throw fail(path, member.line(), ex.getMessage());
            }
        }

        private AlloyBowing readBowing(JsonTree.Member member) {
            JsonTree.Obj obj = object(member, "bowing");
            checkKeys(obj, "bowing", BOWING_KINDS);
            Bowing[][] out = new Bowing[BOWING_KINDS.length][BOWING_PAIRS.length];
            for (int k = 0; k < BOWING_KINDS.length; k++) {
                String kindPath = "bowing." + BOWING_KINDS[k];
                JsonTree.Obj kind = object(required(obj, "bowing", BOWING_KINDS[k]), kindPath);
                checkKeys(kind, kindPath, BOWING_PAIRS);
                String unit = k == 0 ? "eV" : "C/m^2";
                for (int i = 0; i < BOWING_PAIRS.length; i++) {
                    String path = kindPath + "." + BOWING_PAIRS[i];
                    Entry e = entry(required(kind, kindPath, BOWING_PAIRS[i]), path, unit);
                    if (e.sources().size() != 1) {
                        throw fail(path, e.line(), "a bowing parameter takes exactly one source key, found "
                                + e.sources().size());
                    }
                    out[k][i] = new Bowing(e.fileValue(), e.sources().get(0));
                }
            }
            return new AlloyBowing(out[0][0], out[0][1], out[0][2], out[1][0], out[1][1], out[1][2]);
        }

        private AlloyScattering readAlloyScattering(JsonTree.Member member) {
            JsonTree.Obj obj = object(member, "alloyScattering");
            checkKeys(obj, "alloyScattering", BOWING_PAIRS);
            Bowing[] out = new Bowing[BOWING_PAIRS.length];
            for (int i = 0; i < BOWING_PAIRS.length; i++) {
                String path = "alloyScattering." + BOWING_PAIRS[i];
                Entry e = entry(required(obj, "alloyScattering", BOWING_PAIRS[i]), path, "eV");
                if (e.sources().size() != 1) {
                    throw fail(path, e.line(), "an alloy scattering potential takes exactly one source key, found "
                            + e.sources().size());
                }
                if (e.fileValue() < 0) {
                    throw fail(path, e.line(), "alloy scattering potential " + e.fileValue()
                            + " eV is negative; allowed: [0, +inf) eV");
                }
                out[i] = new Bowing(e.fileValue(), e.sources().get(0));
            }
            return new AlloyScattering(out[0], out[1], out[2]);
        }

        private Entry entry(JsonTree.Member m, String path, String fileUnit) {
            if (!(m.value() instanceof JsonTree.Obj obj)) {
                throw fail(path, m.value().line(), "each value must be an object {\"value\": <number>, \"source\":"
                        + " <source key>}, found " + m.value().describe());
            }
            checkKeys(obj, path, ENTRY_KEYS);
            JsonTree.Member value = obj.get("value");
            if (value == null) {
                throw fail(path, m.line(), "missing \"value\" (a number in " + fileUnit + ")");
            }
            if (!(value.value() instanceof JsonTree.Num num)) {
                throw fail(path, value.value().line(), "value must be a JSON number (in " + fileUnit + "), found "
                        + value.value().describe());
            }
            if (!Double.isFinite(num.value())) {
                throw fail(path, num.line(), "value " + num.text() + " is outside the range of finite doubles");
            }
            JsonTree.Member unit = obj.get("unit");
            if (unit != null) {
                String u = string(unit, path + ".unit");
                if (!u.equals(fileUnit)) {
                    throw fail(path, unit.value().line(), "unit \"" + u + "\" is not the file unit of this value;"
                            + " allowed: {" + fileUnit + "}");
                }
            }
            JsonTree.Member source = obj.get("source");
            if (source == null) {
                throw fail(path, m.line(), "missing \"source\" (a key of \"sources\": " + sources.keySet() + ")");
            }
            List<Source> cited = new ArrayList<>();
            if (source.value() instanceof JsonTree.Arr arr) {
                if (arr.elements().isEmpty()) {
                    throw fail(path, arr.line(), "\"source\" is an empty array; name at least one source key");
                }
                for (JsonTree.Node n : arr.elements()) {
                    addSource(cited, n, path);
                }
            } else {
                addSource(cited, source.value(), path);
            }
            JsonTree.Member rule = obj.get("rule");
            String ruleText = rule == null ? "tabulated" : string(rule, path + ".rule");
            JsonTree.Member note = obj.get("note");
            String noteText = note == null ? "" : stringAllowEmpty(note, path + ".note");
            if (!noteText.isEmpty()) {
                notes.put(path, noteText);
            }
            return new Entry(num.value(), List.copyOf(cited), ruleText, num.line());
        }

        private void addSource(List<Source> out, JsonTree.Node n, String path) {
            if (!(n instanceof JsonTree.Str s)) {
                throw fail(path, n.line(), "a source must be a source key (a string), found " + n.describe());
            }
            Source src = sources.get(s.text());
            if (src == null) {
                throw fail(path, n.line(), "source key \"" + s.text() + "\" is not in the set's bibliography"
                        + " (\"sources\"); known keys: " + sources.keySet());
            }
            if (out.contains(src)) {
                throw fail(path, n.line(), "source key \"" + s.text() + "\" is cited twice for one value");
            }
            usedSources.add(s.text());
            out.add(src);
        }

        private void checkKeys(JsonTree.Obj obj, String path, String[] allowed) {
            for (JsonTree.Member m : obj.members().values()) {
                boolean ok = false;
                for (String a : allowed) {
                    ok |= a.equals(m.key());
                }
                if (!ok) {
                    throw fail(path.isEmpty() ? m.key() : path + "." + m.key(), m.line(), "unknown key \""
                            + m.key() + "\"; allowed keys here: {" + String.join(", ", allowed) + "}");
                }
            }
        }

        private JsonTree.Member required(JsonTree.Obj obj, String path, String key) {
            JsonTree.Member m = obj.get(key);
            if (m == null) {
                throw fail(path.isEmpty() ? key : path + "." + key, obj.line(), "missing required key \"" + key + "\"");
            }
            return m;
        }

        private JsonTree.Obj object(JsonTree.Member m, String path) {
            if (!(m.value() instanceof JsonTree.Obj o)) {
                throw fail(path, m.value().line(), "must be an object, found " + m.value().describe());
            }
            return o;
        }

        private String string(JsonTree.Member m, String path) {
            String s = stringAllowEmpty(m, path);
            if (s.isBlank()) {
                throw fail(path, m.value().line(), "must be non-blank text");
            }
            return s;
        }

        private String stringAllowEmpty(JsonTree.Member m, String path) {
            if (!(m.value() instanceof JsonTree.Str s)) {
                throw fail(path, m.value().line(), "must be a string, found " + m.value().describe());
            }
            return s.text();
        }

        private static String text(JsonTree.Node n) {
            return n instanceof JsonTree.Num num ? num.text() : n.describe();
        }

        private static Composition composition(Binary b) {
            return switch (b) {
                case GAN -> Composition.GAN;
                case ALN -> Composition.ALN;
                case INN -> Composition.INN;
            };
        }

        private static String allowedParameterKeys() {
            List<String> keys = new ArrayList<>();
            for (MaterialParameter p : MaterialParameter.values()) {
                if (p != MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING) {
                    keys.add(p.key());
                }
            }
            return String.format(Locale.ROOT, "{%s}", String.join(", ", keys));
        }
    }
}
