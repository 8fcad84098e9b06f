package org.wurtzkit.materials.data;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerMaterial;
import org.wurtzkit.structure.PlacedSheet;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.StructurePart;
import org.wurtzkit.structure.TopBoundary;

/**
 * A layer stack as data: wurtzkit's own versioned JSON format for a {@link Structure}, written and
 * read here (the module that reads files). Writing then reading gives an equal structure, bit for
 * bit: numbers are written with {@link Double#toString(double)} (the shortest text that reads back
 * to the same double) and read with {@link Double#parseDouble(String)}; a quantity is written in the
 * unit of its kind (nm, cm^-3, ... or SI) whose text is shortest among those that convert back to the
 * identical double, the customary unit first.
 *
 * <p>Read a stack in two lines:
 *
 * <pre>{@code
 * Structure hemt = StructureJson.reader().readFile(Path.of("tnl-0731.json"));
 * Solution s = new SelfConsistentSolver().solve(hemt, SolverOptions.defaults());
 * }</pre>
 *
 * <p>The shape (format version 2; the JSON Schema {@value #SCHEMA_RESOURCE} ships in this jar and
 * is the full reference, {@value #SCHEMA_RESOURCE_V1} that of version 1):
 *
 * <pre>
 * {
 *   "formatVersion": 2,
 *   "parameterSet": {"name": "vurgaftman-meyer-2003", "sha256": "64 hex digits (optional)"},
 *   "temperature": {"value": 300.0, "unit": "K"},
 *   "polarity": "metal-face" | "N-face",
 *   "polarizationModel": {"spontaneous": "vegard" | "bowing", "piezoelectric": "linear" | "nonlinear"},
 *   "bandLineUp": {"rule": "valence-band-table"} | {"rule": "conduction-band-fraction", "fraction": 0.63},
 *   "strainShiftsBandEdges": false,
 *   "strainShiftsValenceSplittings": true,   (optional, default true; written only when false)
 *   "substrateLattice": {"value": 3.189, "unit": "angstrom"},
 *   "top": {"kind": "schottky-gate", "barrierHeight": {..eV}, "bias": {..V}}
 *        | {"kind": "free-surface", "donorLevelBelowConductionBand": {..eV}, "donorDensity": {..cm^-2}},
 *   "bottom": {"kind": "zero-field"} | {"kind": "fixed-fermi-level", "conductionBandAboveFermi": {..eV}},
 *   "criticalThicknessModel": {"kind": "c-plane-wurtzite", "underCompression": {"kind": "pyramidal-slip"},
 *                              "underTension": {"kind": "channel-cracking", "fractureResistance": {..J/m^2}}}
 *                           | {"kind": "matthews-blakeslee", "lineToBurgersVectorAngle": {..deg},
 *                              "slipToInterfaceNormalAngle": {..deg}} | ...,            (version 2)
 *   "gateStackFromTop": [{"name": "gate oxide", "insulator": {"builtIn": "Al2O3"}
 *                          | {"name": .., "relativePermittivity": 9.0, "bandGap": {..eV},
 *                             "conductionBandOffsetToGaN": {..eV}, "source": "authors, journal, year"},
 *                         "thickness": {..nm}}],                                        (version 2)
 *   "layersFromSurface": [
 *     {"name": "barrier",
 *      "material": {"kind": "alloy", "composition": {"al": 0.25, "in": 0.0}}
 *                | {"kind": "graded", "bottom": {"al": .., "in": ..}, "top": {"al": .., "in": ..}}
 *                | {"kind": "custom", "definition": {every parameter with value, unit and sources}},  (version 2)
 *      "thickness": {"value": 25.0, "unit": "nm"}, "relaxation": 0.0,
 *      "dopants": [{"type": "donor" | "acceptor", "density": {..cm^-3}, "ionizationEnergy": {..eV}, "degeneracy": 2.0,
 *                   "ionization": "from-fermi-level" | "full" (version 2)}],
 *      "deepLevels": [{"type": "donor-like" | "acceptor-like", "density": {..cm^-3}, "belowConductionBand": {..eV}}],
 *      "deltaSheets": [{"type": "donor" | "acceptor", "sheetDensity": {..cm^-2}, "ionizationEnergy": {..eV},
 *                       "belowLayerTop": {..nm}}],
 *      "sheetsOnTop": [{"fixedCharge": {..cm^-2, signed}, "states": [{"neutralLevelBelowConductionBand": {..eV},
 *                       "distribution": {"shape": "uniform", "density": {..cm^-2 eV^-1}}
 *                                     | {"shape": "gaussian", "peakDensity", "centreBelowConductionBand", "width"}
 *                                     | {"shape": "u-shaped", "floorDensity", "bandEdgeDensity",
 *                                        "conductionTailWidth", "valenceTailWidth"}
 *                                     | {"shape": "discrete", "density": {..cm^-2}, "levelBelowConductionBand"}}]}]
 *                                                                                       (version 2)
 *     }
 *   ]
 * }
 * </pre>
 *
 * Layers are listed from the surface down, as a stack is drawn, and so is the gate stack. Only
 * {@code formatVersion}, {@code parameterSet}, {@code top} and {@code layersFromSurface} (each
 * layer's {@code name}, {@code material} and {@code thickness}) are required; an omitted key takes
 * the default of {@link Structure.Builder} (300 K, metal-face, the set's recommended polarization
 * model, the set's band line-up, no strain shifts, the bottom layer's own lattice, zero field at the
 * bottom, the default critical-thickness model, no gate stack, no dopants, no sheets, ionization
 * from the Fermi level, relaxation 0). The writer always writes every key.
 *
 * <p>Versions: the reader reads versions {@value #OLDEST_FORMAT_VERSION} and {@value #FORMAT_VERSION}
 * (a version-1 file gives the same structure as before version 2 existed; a key that version 2
 * added is an error in a version-1 file). {@link #write(Structure)} writes the newest version;
 * {@link #write(Structure, int)} writes version 1 on request, and refuses (NOT_WRITABLE) a structure
 * that version 1 cannot hold instead of dropping what it cannot hold. The reader never writes, so a
 * version-1 file stays version 1 until someone writes it again; {@link #formatVersionOf} tells which
 * version a text declares, to write a changed stack back in the same version.
 *
 * <p>Rules of change: an unknown key is an error, so that a typo never passes silently. A later
 * version adds a new section either as an optional key of a new {@code formatVersion} (this reader
 * then refuses the newer file with a clear message, and the newer reader keeps reading the older
 * versions) or, for a choice whose absence means today's behaviour, as an optional key that the
 * writer omits when it holds the default. Version 2 holds every structure the builder makes, with
 * one exception that no rule of the library produces: a custom material whose per-binary gap has a
 * binary that is itself per-binary (NOT_WRITABLE). Insulators equal to a built-in one
 * ({@link org.wurtzkit.material.Insulators}) are written by name, others inline with their source;
 * a custom material is written inline with every parameter's value and provenance, so that the file
 * stands alone.
 *
 * <p>The parameter set is found by name among the registered sets ({@link ParameterSets}) and the
 * sets given to {@link Reader#withSet(ParameterSet)}; when the file records a hash and the set's
 * values hash differently ({@link ParameterSetHash}), reading fails with
 * {@link StructureFormatException.Reason#CHANGED_PARAMETER_SET} unless
 * {@link Reader#acceptChangedParameterSet()} was asked for. Every failure is a
 * {@link StructureFormatException} naming file, key path and line.
 */
public final class StructureJson {
    /**
     * The format version this class writes unless asked for another: the newest, {@value}. Version 2
     * adds gate stacks, interface sheets, fully ionized dopants, the critical-thickness model and
     * layers of a custom material to version 1.
     */
    public static final int FORMAT_VERSION = 2;

    /** The oldest format version this class reads and can write on request: {@value}. */
    public static final int OLDEST_FORMAT_VERSION = 1;

    /** Class-path resource of the JSON Schema (draft 2020-12) of the newest format version ({@value}). */
    public static final String SCHEMA_RESOURCE = "/org/wurtzkit/materials/data/schema/stack-v2.schema.json";

    /** Class-path resource of the JSON Schema (draft 2020-12) of format version 1 ({@value}). */
    public static final String SCHEMA_RESOURCE_V1 = "/org/wurtzkit/materials/data/schema/stack-v1.schema.json";

    static final JsonFactory FACTORY = JsonFactory.builder().build();

    private static final Reader DEFAULT_READER = new Reader(Map.of(), false);

    private StructureJson() {
    }

    // ------------------------------------------------------------------ writing

    /**
     * Writes the structure in the newest format version ({@value #FORMAT_VERSION}).
     *
     * @param structure a structure
     * @return its JSON text, indented by two spaces, ending with a line break
     * @throws StructureFormatException of reason NOT_WRITABLE for a custom material whose per-binary
     *         gap form has a binary that is itself per-binary (no rule of the library makes one)
     */
    public static String write(Structure structure) {
        return text(structure, true, FORMAT_VERSION);
    }

    /**
     * Writes the structure in the format version asked for, e.g. version 1 for a reader that
     * predates version 2. Version 1 cannot hold what version 2 added (gate stacks, interface sheets,
     * fully ionized dopants, a critical-thickness model other than the default, custom materials):
     * such a structure is refused, never written without them.
     *
     * @param structure     a structure
     * @param formatVersion {@value #OLDEST_FORMAT_VERSION} to {@value #FORMAT_VERSION}
     * @return its JSON text, indented by two spaces, ending with a line break
     * @throws StructureFormatException of reason NOT_WRITABLE if that version cannot hold the structure
     * @throws InvalidParameterException for an unknown format version
     */
    public static String write(Structure structure, int formatVersion) {
        return text(structure, true, checkVersion(formatVersion));
    }

    /**
     * @param structure a structure
     * @return its JSON text on one line, in the newest format version
     * @throws StructureFormatException of reason NOT_WRITABLE as for {@link #write(Structure)}
     */
    public static String writeCompact(Structure structure) {
        return text(structure, false, FORMAT_VERSION);
    }

    /**
     * @param structure     a structure
     * @param formatVersion {@value #OLDEST_FORMAT_VERSION} to {@value #FORMAT_VERSION}
     * @return its JSON text on one line, in that format version
     * @throws StructureFormatException of reason NOT_WRITABLE as for {@link #write(Structure, int)}
     * @throws InvalidParameterException for an unknown format version
     */
    public static String writeCompact(Structure structure, int formatVersion) {
        return text(structure, false, checkVersion(formatVersion));
    }

    /**
     * Writes the structure to a file (UTF-8) in the newest format version, replacing it if it exists.
     *
     * @param structure a structure
     * @param path      the file
     * @throws IOException from the file system
     */
    public static void writeFile(Structure structure, Path path) throws IOException {
        Require.nonNull("path", path);
        Files.writeString(path, write(structure), StandardCharsets.UTF_8);
    }

    /**
     * Writes the structure to a file (UTF-8) in the format version asked for, replacing it if it exists.
     *
     * @param structure     a structure
     * @param path          the file
     * @param formatVersion {@value #OLDEST_FORMAT_VERSION} to {@value #FORMAT_VERSION}
     * @throws IOException from the file system
     * @throws StructureFormatException of reason NOT_WRITABLE if that version cannot hold the structure
     */
    public static void writeFile(Structure structure, Path path, int formatVersion) throws IOException {
        Require.nonNull("path", path);
        Files.writeString(path, write(structure, formatVersion), StandardCharsets.UTF_8);
    }

    /**
     * @param formatVersion a format version
     * @return the class-path resource of its JSON Schema
     * @throws InvalidParameterException for an unknown format version
     */
    public static String schemaResource(int formatVersion) {
        return checkVersion(formatVersion) == 1 ? SCHEMA_RESOURCE_V1 : SCHEMA_RESOURCE;
    }

    private static int checkVersion(int formatVersion) {
        return Require.inRange("stack format version", formatVersion, OLDEST_FORMAT_VERSION, FORMAT_VERSION);
    }

    private static String text(Structure structure, boolean pretty, int version) {
        Require.nonNull("structure", structure);
        StringWriter w = new StringWriter();
        try (JsonGenerator g = generator(w, pretty)) {
            writeStructure(g, structure, version);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringWriter does not throw
        }
        return pretty ? w + "\n" : w.toString();
    }

    static JsonGenerator generator(StringWriter w, boolean pretty) throws IOException {
        JsonGenerator g = FACTORY.createGenerator(w);
        if (pretty) {
            DefaultPrettyPrinter pp = new DefaultPrettyPrinter()
                    .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                    .withArrayIndenter(new DefaultIndenter("  ", "\n"));
            g.setPrettyPrinter(pp);
        }
        return g;
    }

    /** Writes the structure in the newest format version as one JSON object at the generator's position. */
    static void writeStructure(JsonGenerator g, Structure s) throws IOException {
        writeStructure(g, s, FORMAT_VERSION);
    }

    /** Writes the structure in format version {@code version} as one JSON object at the generator's position. */
    static void writeStructure(JsonGenerator g, Structure s, int version) throws IOException {
        if (version == 1) {
            refuseWhatVersionOneCannotHold(s);
        } else {
            for (Layer l : s.layersBottomUp()) {
                if (l.material() instanceof LayerMaterial.Custom c) {
                    MaterialJson.checkWritable(c.material(), l.name());
                }
            }
        }
        g.writeStartObject();
        g.writeNumberField("formatVersion", version);
        g.writeObjectFieldStart("parameterSet");
        g.writeStringField("name", s.parameters().name());
        g.writeStringField("sha256", ParameterSetHash.sha256(s.parameters()));
        g.writeEndObject();
        quantity(g, "temperature", s.temperatureK(), Units.KELVIN);
        g.writeStringField("polarity", s.polarity() == Polarity.METAL_FACE ? "metal-face" : "N-face");
        g.writeObjectFieldStart("polarizationModel");
        g.writeStringField("spontaneous", s.polarizationModel().spontaneous().name().toLowerCase(java.util.Locale.ROOT));
        g.writeStringField("piezoelectric",
                s.polarizationModel().piezoelectric().name().toLowerCase(java.util.Locale.ROOT));
        g.writeEndObject();
        g.writeObjectFieldStart("bandLineUp");
        if (s.bandAlignment() instanceof BandAlignment.ConductionBandFraction f) {
            g.writeStringField("rule", "conduction-band-fraction");
            number(g, "fraction", f.fraction());
        } else {
            g.writeStringField("rule", "valence-band-table");
        }
        g.writeEndObject();
        g.writeBooleanField("strainShiftsBandEdges", s.strainShiftsBandEdges());
        if (!s.strainShiftsValenceSplittings()) {
            g.writeBooleanField("strainShiftsValenceSplittings", false);
        }
        quantity(g, "substrateLattice", s.referenceLatticeA(), Units.ANGSTROM, Units.LENGTH);
        g.writeObjectFieldStart("top");
        if (s.top() instanceof TopBoundary.Schottky sch) {
            g.writeStringField("kind", "schottky-gate");
            quantity(g, "barrierHeight", sch.barrierHeightEv(), Units.EV);
            quantity(g, "bias", sch.biasV(), Units.VOLT);
        } else {
            TopBoundary.FreeSurface fs = (TopBoundary.FreeSurface) s.top();
            g.writeStringField("kind", "free-surface");
            quantity(g, "donorLevelBelowConductionBand", fs.donorEnergyBelowEcEv(), Units.EV);
            quantity(g, "donorDensity", fs.donorDensityPerM2(), Units.PER_CM2, Units.SHEET);
        }
        g.writeEndObject();
        g.writeObjectFieldStart("bottom");
        if (s.bottom() instanceof BottomBoundary.FixedFermiLevel ff) {
            g.writeStringField("kind", "fixed-fermi-level");
            quantity(g, "conductionBandAboveFermi", ff.conductionAboveFermiEv(), Units.EV);
        } else {
            g.writeStringField("kind", "zero-field");
        }
        g.writeEndObject();
        if (version >= 2) {
            StackParts.criticalThicknessModel(g, "criticalThicknessModel", s.criticalThicknessModel());
            g.writeArrayFieldStart("gateStackFromTop");
            for (InsulatorLayer il : s.gateStack()) {
                StackParts.insulatorLayer(g, il);
            }
            g.writeEndArray();
        }
        g.writeArrayFieldStart("layersFromSurface");
        List<Layer> topDown = s.layersTopDown();
        for (int i = 0; i < topDown.size(); i++) {
            List<PlacedSheet> sheets = new java.util.ArrayList<>();
            for (PlacedSheet p : s.interfaceSheets()) {
                if (p.nitrideIndex() == i) {
                    sheets.add(p);
                }
            }
            writeLayer(g, topDown.get(i), version, sheets);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    /**
     * Format version 1 predates gate stacks, interface sheets, fully ionized dopants, the
     * critical-thickness model and custom materials: refuse rather than drop them, so that a written
     * stack never reads back as a different one.
     */
    private static void refuseWhatVersionOneCannotHold(Structure s) {
        List<String> cannot = new java.util.ArrayList<>();
        for (Layer l : s.layersBottomUp()) {
            if (l.material() instanceof LayerMaterial.Custom c) {
                cannot.add("layer \"" + l.name() + "\" of the custom material \"" + c.material().name() + "\"");
            }
        }
        if (!s.gateStack().isEmpty()) {
            cannot.add("a gate stack of " + s.gateStack().size() + " insulator layer(s)");
        }
        if (!s.interfaceSheets().isEmpty()) {
            cannot.add(s.interfaceSheets().size() + " interface sheet(s) (fixed charge, interface states)");
        }
        if (!s.criticalThicknessModel().equals(CriticalThicknessModel.C_PLANE_WURTZITE)) {
            cannot.add("a critical-thickness model other than the default");
        }
        if (!s.strainShiftsValenceSplittings()) {
            cannot.add("valence splittings left unstrained (strainShiftsValenceSplittings false)");
        }
        for (Layer l : s.layersBottomUp()) {
            for (Dopant d : l.dopants()) {
                if (d.ionization() != Dopant.Ionization.FROM_FERMI_LEVEL) {
                    cannot.add("a fully ionized dopant in layer \"" + l.name() + "\"");
                }
            }
        }
        if (!cannot.isEmpty()) {
            throw new StructureFormatException("(writing)", "(root)", 0, StructureFormatException.Reason.NOT_WRITABLE,
                    "format version 1 cannot hold " + String.join(", ", cannot) + "; write format version "
                            + FORMAT_VERSION + " (StructureJson.write(structure))",
                    null);
        }
    }

    private static void writeLayer(JsonGenerator g, Layer l, int version, List<PlacedSheet> sheets)
            throws IOException {
        g.writeStartObject();
        g.writeStringField("name", l.name());
        g.writeObjectFieldStart("material");
        if (l.material() instanceof LayerMaterial.Graded gr) {
            g.writeStringField("kind", "graded");
            composition(g, "bottom", gr.bottom());
            composition(g, "top", gr.top());
        } else if (l.material() instanceof LayerMaterial.Custom c) {
            g.writeStringField("kind", "custom");
            MaterialJson.write(g, "definition", c.material());
        } else {
            g.writeStringField("kind", "alloy");
            composition(g, "composition", ((LayerMaterial.Alloy) l.material()).composition());
        }
        g.writeEndObject();
        quantity(g, "thickness", l.thickness(), Units.NANOMETRE, Units.LENGTH);
        number(g, "relaxation", l.relaxation());
        g.writeArrayFieldStart("dopants");
        for (Dopant d : l.dopants()) {
            g.writeStartObject();
            g.writeStringField("type", d.kind() == Dopant.Kind.DONOR ? "donor" : "acceptor");
            quantity(g, "density", d.densityPerM3(), Units.PER_CM3, Units.VOLUME);
            quantity(g, "ionizationEnergy", d.ionizationEnergyEv(), Units.EV);
            number(g, "degeneracy", d.degeneracy());
            if (version >= 2) {
                g.writeStringField("ionization", d.ionization() == Dopant.Ionization.FULL ? "full" : "from-fermi-level");
            }
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("deepLevels");
        for (DeepLevel d : l.deepLevels()) {
            g.writeStartObject();
            g.writeStringField("type", d.kind() == DeepLevel.Kind.DONOR_LIKE ? "donor-like" : "acceptor-like");
            quantity(g, "density", d.densityPerM3(), Units.PER_CM3, Units.VOLUME);
            quantity(g, "belowConductionBand", d.energyBelowConductionEv(), Units.EV);
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("deltaSheets");
        for (DeltaDoping d : l.deltaSheets()) {
            g.writeStartObject();
            g.writeStringField("type", d.kind() == Dopant.Kind.DONOR ? "donor" : "acceptor");
            quantity(g, "sheetDensity", d.sheetDensityPerM2(), Units.PER_CM2, Units.SHEET);
            quantity(g, "ionizationEnergy", d.ionizationEnergyEv(), Units.EV);
            quantity(g, "belowLayerTop", d.offsetFromLayerTop(), Units.NANOMETRE, Units.LENGTH);
            g.writeEndObject();
        }
        g.writeEndArray();
        if (version >= 2) {
            g.writeArrayFieldStart("sheetsOnTop");
            for (PlacedSheet p : sheets) {
                StackParts.interfaceSheet(g, p.sheet());
            }
            g.writeEndArray();
        }
        g.writeEndObject();
    }

    private static void composition(JsonGenerator g, String key, Composition c) throws IOException {
        g.writeObjectFieldStart(key);
        number(g, "al", c.aluminium());
        number(g, "in", c.indium());
        g.writeEndObject();
    }

    static void number(JsonGenerator g, String key, double v) throws IOException {
        g.writeFieldName(key);
        g.writeNumber(Double.toString(v));
    }

    /**
     * A quantity in the unit of its family whose shortest text converts back to the identical
     * double ({@code value * factor}, as the reader computes it) with the fewest characters, the
     * preferred unit winning a tie: 22 nm stays "22.0 nm", whereas 1800e-9 m, which no double times
     * 1e-9 gives exactly, goes out as "1.8E-6 m" rather than "1799.9999999999998 nm". The SI unit
     * (factor 1) always converts back exactly, so a unit is always found.
     */
    static void quantity(JsonGenerator g, String key, double si, Unit preferred, List<Unit> family)
            throws IOException {
        g.writeObjectFieldStart(key);
        valueAndUnit(g, si, preferred, family);
        g.writeEndObject();
    }

    /**
     * The shortest decimal text t with {@code parseDouble(t) * factor == si} bit for bit, or null:
     * the quotient si / factor rounded to 1, 2, ... 17 significant digits, the first that converts
     * back exactly. 15 nm made as 15 * 1e-9 m goes out as "15.0" although 1.5e-8 / 1e-9 is
     * 15.000000000000002 (division does not undo multiplication in binary floating point; common
     * practice, no source).
     */
    private static String shortestText(double si, double factor) {
        double x = si / factor;
        if (x != 0 && Double.isFinite(x)) {
            java.math.BigDecimal exact = new java.math.BigDecimal(x);
            for (int digits = 1; digits <= 17; digits++) {
                String t = Double.toString(exact.round(new java.math.MathContext(digits)).doubleValue());
                if (Double.doubleToRawLongBits(Double.parseDouble(t) * factor) == Double.doubleToRawLongBits(si)) {
                    return t;
                }
            }
        }
        String t = Double.toString(x);
        return Double.doubleToRawLongBits(Double.parseDouble(t) * factor) == Double.doubleToRawLongBits(si) ? t : null;
    }

    /** The shortest exact text of {@code si} in a unit of the family: {text, unit symbol}. */
    private static String[] shortestExact(double si, Unit preferred, List<Unit> family) {
        Unit unit = null;
        String text = null;
        List<Unit> order = new java.util.ArrayList<>(family);
        order.remove(preferred);
        order.add(0, preferred);
        for (Unit u : order) {
            String t = shortestText(si, u.toSi);
            if (t != null && (text == null || t.length() < text.length())) {
                unit = u;
                text = t;
            }
        }
        if (unit == null) {
            throw new AssertionError("no unit of " + family + " holds " + si + " exactly; the SI unit always does");
        }
        return new String[] {text, unit.symbol};
    }

    /** Writes the fields "value" and "unit" of a quantity into the object being written (see quantity). */
    static void valueAndUnit(JsonGenerator g, double si, Unit preferred, List<Unit> family) throws IOException {
        String[] vu = shortestExact(si, preferred, family);
        g.writeFieldName("value");
        g.writeNumber(vu[0]);
        g.writeStringField("unit", vu[1]);
    }

    // ------------------------------------------------------------------ units

    /** A unit: its symbol in the file and the factor to SI. */
    record Unit(String symbol, double toSi) {
    }

    /** The units the format accepts, by quantity. */
    static final class Units {
        static final Unit KELVIN_U = new Unit("K", 1);
        static final Unit EV_U = new Unit("eV", 1);
        static final Unit VOLT_U = new Unit("V", 1);
        static final Unit METRE = new Unit("m", 1);
        static final Unit NANOMETRE = new Unit("nm", org.wurtzkit.units.Units.NM);
        static final Unit MICROMETRE = new Unit("um", 1e-6);
        static final Unit ANGSTROM = new Unit("angstrom", org.wurtzkit.units.Units.ANGSTROM);
        static final Unit PER_M3 = new Unit("m^-3", 1);
        static final Unit PER_CM3 = new Unit("cm^-3", 1e6);
        static final Unit PER_M2 = new Unit("m^-2", 1);
        static final Unit PER_CM2 = new Unit("cm^-2", 1e4);
        static final List<Unit> KELVIN = List.of(KELVIN_U);
        static final List<Unit> EV = List.of(EV_U);
        static final List<Unit> VOLT = List.of(VOLT_U);
        static final List<Unit> LENGTH = List.of(METRE, NANOMETRE, MICROMETRE, ANGSTROM);
        static final List<Unit> VOLUME = List.of(PER_M3, PER_CM3);
        static final List<Unit> SHEET = List.of(PER_M2, PER_CM2);
        static final Unit PER_M2_EV = new Unit("m^-2 eV^-1", 1);
        static final Unit PER_CM2_EV = new Unit("cm^-2 eV^-1", 1e4);
        static final List<Unit> SHEET_PER_EV = List.of(PER_M2_EV, PER_CM2_EV);
        static final List<Unit> J_PER_M2 = List.of(new Unit("J/m^2", 1));
        static final List<Unit> DEGREE = List.of(new Unit("deg", 1));
        static final Unit MEV_PER_K = new Unit("meV/K", 1e-3);
        static final List<Unit> EV_PER_K = List.of(MEV_PER_K, new Unit("eV/K", 1));

        private Units() {
        }
    }

    static void quantity(JsonGenerator g, String key, double si, List<Unit> family) throws IOException {
        quantity(g, key, si, family.get(0), family);
    }

    // ------------------------------------------------------------------ reading

    /**
     * {@return the default reader: registered parameter sets only, a changed set is an error}
     */
    public static Reader reader() {
        return DEFAULT_READER;
    }

    /**
     * Reads a stack with the default {@link #reader()}.
     *
     * @param path the file
     * @return the structure
     */
    public static Structure readFile(Path path) {
        return DEFAULT_READER.readFile(path);
    }

    /**
     * Reads stack files. Immutable and thread-safe; each option returns a new reader.
     */
    public static final class Reader {
        private final Map<String, ParameterSet> extraSets;
        private final boolean acceptChanged;

        private Reader(Map<String, ParameterSet> extraSets, boolean acceptChanged) {
            this.extraSets = Map.copyOf(extraSets);
            this.acceptChanged = acceptChanged;
        }

        /**
         * @param set a parameter set to find by its name before the registered ones (a derived set
         *            or a team's set built in code)
         * @return a reader that also knows this set
         */
        public Reader withSet(ParameterSet set) {
            Require.nonNull("parameter set", set);
            Map<String, ParameterSet> m = new LinkedHashMap<>(extraSets);
            m.put(set.name(), set);
            return new Reader(m, acceptChanged);
        }

        /**
         * On purpose: read a file even when the named parameter set's values no longer hash to the
         * recorded {@code sha256} (the structure then uses today's values).
         *
         * @return a reader that accepts a changed parameter set
         */
        public Reader acceptChangedParameterSet() {
            return new Reader(extraSets, true);
        }

        /**
         * @param path a stack file
         * @return the structure
         * @throws StructureFormatException if the file is missing, unreadable or not a valid stack
         */
        public Structure readFile(Path path) {
            Require.nonNull("stack file path", path);
            String text;
            try {
                text = Files.readString(path, StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new StructureFormatException(path.toString(), "(root)", 0, StructureFormatException.Reason.SYNTAX,
                        "the file cannot be read: " + e, e);
            }
            return read(text, path.toString());
        }

        /**
         * @param json     the JSON text of a stack
         * @param fileName where it comes from, for error messages
         * @return the structure
         * @throws StructureFormatException if the text is not a valid stack
         */
        public Structure read(String json, String fileName) {
            Require.nonNull("stack JSON text", json);
            Require.nonNull("stack file name", fileName);
            JsonTree.Node root = parse(json, fileName);
            return readStructure(root, fileName, "");
        }

        /** Reads a structure from a node of a tree (path prefix "" at the root). */
        Structure readStructure(JsonTree.Node node, String fileName, String prefix) {
            return new StackReader(this, fileName, prefix).structure(node);
        }

        ParameterSet set(String name, String file, String path, int line) {
            ParameterSet s = extraSets.get(name);
            if (s != null) {
                return s;
            }
            try {
                return ParameterSets.named(name);
            } catch (WurtzkitException e) {
                if (e.kind() != ErrorKind.UNKNOWN_PARAMETER_SET) {
                    throw e;
                }
                throw new StructureFormatException(file, path, line, StructureFormatException.Reason.UNKNOWN_PARAMETER_SET,
                        "the parameter set \"" + name + "\" is not registered (" + e.getMessage()
                                + "); register it or give it to StructureJson.reader().withSet(...)",
                        e);
            }
        }

        boolean acceptsChanged() {
            return acceptChanged;
        }
    }

    /** Parses JSON text into a line-annotated tree; a syntax failure or duplicate key is an error. */
    static JsonTree.Node parse(String json, String fileName) {
        JsonTree.Parsed parsed;
        try (JsonParser p = FACTORY.createParser(new StringReader(json))) {
            parsed = JsonTree.read(p);
        } catch (JsonTree.SyntaxFailure f) {
            throw new StructureFormatException(fileName, arrayPath(f.path()), f.line(),
                    StructureFormatException.Reason.SYNTAX, f.problem(), f.getCause());
        } catch (IOException e) {
            throw new StructureFormatException(fileName, "(root)", 0, StructureFormatException.Reason.SYNTAX,
                    "the text cannot be read: " + e, e);
        }
        if (parsed.firstDuplicate() != null) {
            JsonTree.Duplicate d = parsed.firstDuplicate();
            throw new StructureFormatException(fileName, arrayPath(d.path()), d.line(),
                    StructureFormatException.Reason.SYNTAX,
                    "the key is given twice (first on line " + d.firstLine() + ")", null);
        }
        return parsed.root();
    }

    /** The declared format version of a stack object, checked to be one this class reads. */
    private static int version(TreeReader t, JsonTree.Obj root) {
        JsonTree.Member version = t.required(root, "", "formatVersion");
        double v = t.number(version.value(), "formatVersion");
        if (v != 1 && v != 2) {
            throw t.fail("formatVersion", version.value().line(), StructureFormatException.Reason.UNSUPPORTED_VERSION,
                    "format version " + ((JsonTree.Num) version.value()).text() + " is not known to this reader;"
                            + " allowed: " + OLDEST_FORMAT_VERSION + " to " + FORMAT_VERSION
                            + " (a newer wurtzkit may read it)");
        }
        return (int) v;
    }

    /**
     * The format version a stack text declares, e.g. to write a changed stack back in the version it
     * was read in: {@code StructureJson.write(changed, StructureJson.formatVersionOf(text, name))}.
     *
     * @param json     the JSON text of a stack
     * @param fileName where it comes from, for error messages
     * @return its {@code formatVersion}, {@value #OLDEST_FORMAT_VERSION} to {@value #FORMAT_VERSION}
     * @throws StructureFormatException if the text is not JSON, has no {@code formatVersion} or
     *         declares one this class does not read
     */
    public static int formatVersionOf(String json, String fileName) {
        Require.nonNull("stack JSON text", json);
        Require.nonNull("stack file name", fileName);
        TreeReader t = new TreeReader(fileName, "");
        return version(t, t.object(parse(json, fileName), ""));
    }

    /** A tree path in the stack reader's spelling: "layers[0].name", not "layers.[0].name". */
    private static String arrayPath(String treePath) {
        return treePath.replace(".[", "[");
    }

    /** Checks and converts one stack object; every failure names file, key path and line. */
    private static final class StackReader {
        private final Reader options;
        private final TreeReader t;
        /** The file's format version, known once its root is read. */
        private int version;

        StackReader(Reader options, String fileName, String prefix) {
            this.options = options;
            this.t = new TreeReader(fileName, prefix);
        }

        Structure structure(JsonTree.Node node) {
            JsonTree.Obj root = t.object(node, "");
            this.version = version(t, root);
            t.onlyKeys(root, "", keys(root, "", Set.of("formatVersion", "parameterSet", "temperature", "polarity",
                    "polarizationModel", "bandLineUp", "strainShiftsBandEdges", "substrateLattice", "top", "bottom",
                    "layersFromSurface"), "criticalThicknessModel", "gateStackFromTop",
                    "strainShiftsValenceSplittings"));
            ParameterSet set = parameterSet(root);
            Structure.Builder b = Structure.builder(set);
            JsonTree.Member m;
            if ((m = root.get("temperature")) != null) {
                double tk = t.quantity(m.value(), "temperature", Units.KELVIN);
                t.apply("temperature", m.value().line(), () -> b.temperature(tk));
            }
            if ((m = root.get("polarity")) != null) {
                String p = t.choice(m.value(), "polarity", "metal-face", "N-face");
                b.polarity("metal-face".equals(p) ? Polarity.METAL_FACE : Polarity.N_FACE);
            }
            if ((m = root.get("polarizationModel")) != null) {
                JsonTree.Obj o = t.object(m.value(), "polarizationModel");
                t.onlyKeys(o, "polarizationModel", Set.of("spontaneous", "piezoelectric"));
                String sp = t.choice(t.required(o, "polarizationModel", "spontaneous").value(),
                        "polarizationModel.spontaneous", "vegard", "bowing");
                String pz = t.choice(t.required(o, "polarizationModel", "piezoelectric").value(),
                        "polarizationModel.piezoelectric", "linear", "nonlinear");
                b.polarizationModel(new PolarizationModel(
                        "vegard".equals(sp) ? PolarizationModel.Spontaneous.VEGARD : PolarizationModel.Spontaneous.BOWING,
                        "linear".equals(pz) ? PolarizationModel.Piezoelectric.LINEAR
                                : PolarizationModel.Piezoelectric.NONLINEAR));
            }
            if ((m = root.get("bandLineUp")) != null) {
                JsonTree.Obj o = t.object(m.value(), "bandLineUp");
                String rule = t.choice(t.required(o, "bandLineUp", "rule").value(), "bandLineUp.rule",
                        "valence-band-table", "conduction-band-fraction");
                if ("valence-band-table".equals(rule)) {
                    t.onlyKeys(o, "bandLineUp", Set.of("rule"));
                    b.bandAlignment(BandAlignment.valenceBandTable());
                } else {
                    t.onlyKeys(o, "bandLineUp", Set.of("rule", "fraction"));
                    JsonTree.Member f = t.required(o, "bandLineUp", "fraction");
                    double fr = t.number(f.value(), "bandLineUp.fraction");
                    t.apply("bandLineUp.fraction", f.value().line(),
                            () -> b.bandAlignment(BandAlignment.conductionBandFraction(fr)));
                }
            }
            if ((m = root.get("strainShiftsBandEdges")) != null) {
                b.strainShiftsBandEdges(t.bool(m.value(), "strainShiftsBandEdges"));
            }
            if ((m = root.get("strainShiftsValenceSplittings")) != null) {
                b.strainShiftsValenceSplittings(t.bool(m.value(), "strainShiftsValenceSplittings"));
            }
            if ((m = root.get("substrateLattice")) != null) {
                double a = t.quantity(m.value(), "substrateLattice", Units.LENGTH);
                t.apply("substrateLattice", m.value().line(), () -> b.onInPlaneLattice(a));
            }
            top(b, t.required(root, "", "top"));
            if ((m = root.get("bottom")) != null) {
                bottom(b, m);
            }
            if ((m = root.get("criticalThicknessModel")) != null) {
                b.criticalThicknessModel(StackParts.criticalThicknessModel(t, m.value(), "criticalThicknessModel",
                        false));
            }
            JsonTree.Member layers = t.required(root, "", "layersFromSurface");
            List<JsonTree.Node> list = t.array(layers.value(), "layersFromSurface");
            if (list.isEmpty()) {
                throw t.fail("layersFromSurface", layers.value().line(), StructureFormatException.Reason.INVALID_VALUE,
                        "the stack has no layers: number of layers = 0, allowed range [1, ...)");
            }
            for (int i = list.size() - 1; i >= 0; i--) {
                String path = "layersFromSurface[" + i + "]";
                Layer l = layer(list.get(i), path);
                b.grow(l);
                JsonTree.Member sm = ((JsonTree.Obj) list.get(i)).get("sheetsOnTop");
                if (sm != null) {
                    List<JsonTree.Node> sheets = t.array(sm.value(), path + ".sheetsOnTop");
                    for (int k = 0; k < sheets.size(); k++) {
                        String sp = path + ".sheetsOnTop[" + k + "]";
                        InterfaceSheet sheet = StackParts.interfaceSheet(t, sheets.get(k), sp);
                        t.apply(sp, sheets.get(k).line(), () -> b.sheetOnTop(sheet));
                    }
                }
            }
            if ((m = root.get("gateStackFromTop")) != null) {
                List<JsonTree.Node> gs = t.array(m.value(), "gateStackFromTop");
                for (int i = gs.size() - 1; i >= 0; i--) {
                    String path = "gateStackFromTop[" + i + "]";
                    InsulatorLayer il = StackParts.insulatorLayer(t, gs.get(i), path);
                    t.apply(path, gs.get(i).line(), () -> b.deposit(il));
                }
            }
            try {
                return t.apply("", root.line(), b::build);
            } catch (StructureFormatException e) {
                // a check of the whole stack that says which part it concerns: point at that entry
                if (e.getCause() instanceof StructurePart.Located located) {
                    throw locate(root, located.part(), (RuntimeException) e.getCause());
                }
                throw e;
            }
        }

        /**
         * Points an error found when the whole stack is assembled at the entry it concerns: the interface
         * states of one sheet (their neutral level, or the level inside their distribution), or the top
         * boundary (its donor density when given).
         */
        private StructureFormatException locate(JsonTree.Obj root, StructurePart part, RuntimeException e) {
            String path = "";
            JsonTree.Node at = root;
            if (part.kind() == StructurePart.Kind.INTERFACE_STATES) {
                JsonTree.Node layer = element(root.get("layersFromSurface"), part.layerFromTop());
                JsonTree.Node sheet = layer instanceof JsonTree.Obj lo ? element(lo.get("sheetsOnTop"), part.sheet()) : null;
                JsonTree.Node states = sheet instanceof JsonTree.Obj so ? element(so.get("states"), part.states()) : null;
                if (states instanceof JsonTree.Obj st) {
                    path = "layersFromSurface[" + part.layerFromTop() + "].sheetsOnTop[" + part.sheet() + "].states["
                            + part.states() + "]";
                    at = st;
                    boolean neutral = e instanceof InvalidParameterException ip
                            && ip.parameter().contains("charge-neutrality");
                    JsonTree.Member m = st.get(neutral ? "neutralLevelBelowConductionBand" : "distribution");
                    if (m != null) {
                        path += "." + m.key();
                        at = m.value();
                        if (!neutral && m.value() instanceof JsonTree.Obj d) {
                            for (JsonTree.Member level : d.members().values()) {
                                if (level.key().endsWith("BelowConductionBand")) {
                                    path += "." + level.key();
                                    at = level.value();
                                }
                            }
                        }
                    }
                }
            } else if (part.kind() == StructurePart.Kind.TOP_BOUNDARY && root.get("top") != null) {
                JsonTree.Member top = root.get("top");
                path = "top";
                at = top.value();
                if (top.value() instanceof JsonTree.Obj o && o.get("donorDensity") != null) {
                    path = "top.donorDensity";
                    at = o.get("donorDensity").value();
                }
            }
            return new StructureFormatException(t.fileName, t.full(path), at.line(),
                    StructureFormatException.Reason.INVALID_VALUE, e.getMessage(), e);
        }

        /** {@return element i of the array the member holds, or null} */
        private static JsonTree.Node element(JsonTree.Member m, int i) {
            if (m != null && m.value() instanceof JsonTree.Arr a && i >= 0 && i < a.elements().size()) {
                return a.elements().get(i);
            }
            return null;
        }

        /**
         * The keys allowed in an object: those of version 1, plus those version 2 added when the file
         * is of version 2 (in a version-1 file they are unknown keys, named as such by onlyKeys).
         */
        private Set<String> keys(JsonTree.Obj o, String path, Set<String> v1, String... addedInV2) {
            if (version < 2) {
                for (String k : addedInV2) {
                    JsonTree.Member m = o.get(k);
                    if (m != null) {
                        throw t.fail(path.isEmpty() ? k : path + "." + k, m.line(),
                                StructureFormatException.Reason.UNKNOWN_KEY, "the key \"" + k + "\" belongs to format"
                                        + " version 2, but the file declares formatVersion " + version
                                        + "; set \"formatVersion\": 2 to use it");
                    }
                }
                return v1;
            }
            Set<String> all = new java.util.HashSet<>(v1);
            all.addAll(List.of(addedInV2));
            return all;
        }

        private ParameterSet parameterSet(JsonTree.Obj root) {
            JsonTree.Member m = t.required(root, "", "parameterSet");
            JsonTree.Obj o = t.object(m.value(), "parameterSet");
            t.onlyKeys(o, "parameterSet", Set.of("name", "sha256"));
            JsonTree.Member nameM = t.required(o, "parameterSet", "name");
            String name = t.string(nameM.value(), "parameterSet.name");
            ParameterSet set = options.set(name, t.fileName, t.full("parameterSet.name"), nameM.value().line());
            JsonTree.Member hashM = o.get("sha256");
            if (hashM != null) {
                String recorded = t.string(hashM.value(), "parameterSet.sha256");
                if (!recorded.matches("[0-9a-f]{64}")) {
                    throw t.fail("parameterSet.sha256", hashM.value().line(), StructureFormatException.Reason.WRONG_VALUE,
                            "\"" + recorded + "\" is not a SHA-256 hash; allowed: 64 lower-case hexadecimal digits");
                }
                String now = ParameterSetHash.sha256(set);
                if (!now.equals(recorded) && !options.acceptsChanged()) {
                    throw t.fail("parameterSet.sha256", hashM.value().line(),
                            StructureFormatException.Reason.CHANGED_PARAMETER_SET,
                            "the values of parameter set \"" + name + "\" have changed since the file was written:"
                                    + " recorded sha256 " + recorded + ", now " + now
                                    + "; read it anyway with StructureJson.reader().acceptChangedParameterSet()");
                }
            }
            return set;
        }

        private void top(Structure.Builder b, JsonTree.Member m) {
            JsonTree.Obj o = t.object(m.value(), "top");
            String kind = t.choice(t.required(o, "top", "kind").value(), "top.kind", "schottky-gate", "free-surface");
            if ("schottky-gate".equals(kind)) {
                t.onlyKeys(o, "top", Set.of("kind", "barrierHeight", "bias"));
                double phi = t.quantity(t.required(o, "top", "barrierHeight").value(), "top.barrierHeight", Units.EV);
                JsonTree.Member biasM = o.get("bias");
                double bias = biasM == null ? 0 : t.quantity(biasM.value(), "top.bias", Units.VOLT);
                t.apply("top", o.line(), () -> b.top(TopBoundary.schottky(phi, bias)));
            } else {
                t.onlyKeys(o, "top", Set.of("kind", "donorLevelBelowConductionBand", "donorDensity"));
                double e = t.quantity(t.required(o, "top", "donorLevelBelowConductionBand").value(),
                        "top.donorLevelBelowConductionBand", Units.EV);
                double n = t.quantity(t.required(o, "top", "donorDensity").value(), "top.donorDensity", Units.SHEET);
                t.apply("top", o.line(), () -> b.top(new TopBoundary.FreeSurface(e, n)));
            }
        }

        private void bottom(Structure.Builder b, JsonTree.Member m) {
            JsonTree.Obj o = t.object(m.value(), "bottom");
            String kind = t.choice(t.required(o, "bottom", "kind").value(), "bottom.kind", "zero-field",
                    "fixed-fermi-level");
            if ("zero-field".equals(kind)) {
                t.onlyKeys(o, "bottom", Set.of("kind"));
                b.bottom(BottomBoundary.zeroField());
            } else {
                t.onlyKeys(o, "bottom", Set.of("kind", "conductionBandAboveFermi"));
                double e = t.quantity(t.required(o, "bottom", "conductionBandAboveFermi").value(),
                        "bottom.conductionBandAboveFermi", Units.EV);
                t.apply("bottom.conductionBandAboveFermi", o.line(), () -> b.bottom(BottomBoundary.fixedFermiLevel(e)));
            }
        }

        private Layer layer(JsonTree.Node node, String path) {
            JsonTree.Obj o = t.object(node, path);
            t.onlyKeys(o, path, keys(o, path, Set.of("name", "material", "thickness", "relaxation", "dopants", "deepLevels",
                    "deltaSheets"), "sheetsOnTop"));
            String name = t.string(t.required(o, path, "name").value(), path + ".name");
            LayerMaterial material = material(t.required(o, path, "material").value(), path + ".material");
            JsonTree.Member th = t.required(o, path, "thickness");
            double thickness = t.quantity(th.value(), path + ".thickness", Units.LENGTH);
            JsonTree.Member rm = o.get("relaxation");
            double relax = rm == null ? 0 : t.number(rm.value(), path + ".relaxation");
            Layer l = t.apply(path + ".thickness", th.value().line(),
                    () -> new Layer(name, material, thickness, List.of(), List.of(), List.of(), 0));
            if (rm != null) {
                Layer base = l;
                l = t.apply(path + ".relaxation", rm.value().line(), () -> base.withRelaxation(relax));
            }
            JsonTree.Member m;
            if ((m = o.get("dopants")) != null) {
                List<JsonTree.Node> ds = t.array(m.value(), path + ".dopants");
                for (int i = 0; i < ds.size(); i++) {
                    String p = path + ".dopants[" + i + "]";
                    JsonTree.Obj d = t.object(ds.get(i), p);
                    t.onlyKeys(d, p, keys(d, p, Set.of("type", "density", "ionizationEnergy", "degeneracy"), "ionization"));
                    String type = t.choice(t.required(d, p, "type").value(), p + ".type", "donor", "acceptor");
                    double n = t.quantity(t.required(d, p, "density").value(), p + ".density", Units.VOLUME);
                    double e = t.quantity(t.required(d, p, "ionizationEnergy").value(), p + ".ionizationEnergy",
                            Units.EV);
                    JsonTree.Member gm = d.get("degeneracy");
                    Dopant.Kind kind = "donor".equals(type) ? Dopant.Kind.DONOR : Dopant.Kind.ACCEPTOR;
                    double g = gm == null ? (kind == Dopant.Kind.DONOR ? Dopant.DONOR_DEGENERACY
                            : Dopant.ACCEPTOR_DEGENERACY) : t.number(gm.value(), p + ".degeneracy");
                    JsonTree.Member im = d.get("ionization");
                    Dopant.Ionization ion = im == null || "from-fermi-level".equals(t.choice(im.value(),
                            p + ".ionization", "from-fermi-level", "full")) ? Dopant.Ionization.FROM_FERMI_LEVEL
                                    : Dopant.Ionization.FULL;
                    Layer base = l;
                    l = t.apply(p, d.line(), () -> base.withDopant(new Dopant(kind, n, e, g, ion)));
                }
            }
            if ((m = o.get("deepLevels")) != null) {
                List<JsonTree.Node> ds = t.array(m.value(), path + ".deepLevels");
                for (int i = 0; i < ds.size(); i++) {
                    String p = path + ".deepLevels[" + i + "]";
                    JsonTree.Obj d = t.object(ds.get(i), p);
                    t.onlyKeys(d, p, Set.of("type", "density", "belowConductionBand"));
                    String type = t.choice(t.required(d, p, "type").value(), p + ".type", "donor-like",
                            "acceptor-like");
                    double n = t.quantity(t.required(d, p, "density").value(), p + ".density", Units.VOLUME);
                    double e = t.quantity(t.required(d, p, "belowConductionBand").value(), p + ".belowConductionBand",
                            Units.EV);
                    DeepLevel.Kind kind = "donor-like".equals(type) ? DeepLevel.Kind.DONOR_LIKE
                            : DeepLevel.Kind.ACCEPTOR_LIKE;
                    Layer base = l;
                    l = t.apply(p, d.line(), () -> base.withDeepLevel(new DeepLevel(kind, n, e)));
                }
            }
            if ((m = o.get("deltaSheets")) != null) {
                List<JsonTree.Node> ds = t.array(m.value(), path + ".deltaSheets");
                for (int i = 0; i < ds.size(); i++) {
                    String p = path + ".deltaSheets[" + i + "]";
                    JsonTree.Obj d = t.object(ds.get(i), p);
                    t.onlyKeys(d, p, Set.of("type", "sheetDensity", "ionizationEnergy", "belowLayerTop"));
                    String type = t.choice(t.required(d, p, "type").value(), p + ".type", "donor", "acceptor");
                    double n = t.quantity(t.required(d, p, "sheetDensity").value(), p + ".sheetDensity", Units.SHEET);
                    double e = t.quantity(t.required(d, p, "ionizationEnergy").value(), p + ".ionizationEnergy",
                            Units.EV);
                    double off = t.quantity(t.required(d, p, "belowLayerTop").value(), p + ".belowLayerTop",
                            Units.LENGTH);
                    Dopant.Kind kind = "donor".equals(type) ? Dopant.Kind.DONOR : Dopant.Kind.ACCEPTOR;
                    Layer base = l;
                    l = t.apply(p, d.line(), () -> base.withDeltaDoping(new DeltaDoping(kind, n, e, off)));
                }
            }
            return l;
        }

        private LayerMaterial material(JsonTree.Node node, String path) {
            JsonTree.Obj o = t.object(node, path);
            JsonTree.Node kindNode = t.required(o, path, "kind").value();
            String kind = version < 2 ? t.choice(kindNode, path + ".kind", "alloy", "graded")
                    : t.choice(kindNode, path + ".kind", "alloy", "graded", "custom");
            if ("custom".equals(kind)) {
                t.onlyKeys(o, path, Set.of("kind", "definition"));
                return new LayerMaterial.Custom(MaterialJson.read(t, t.required(o, path, "definition").value(),
                        path + ".definition"));
            }
            if ("alloy".equals(kind)) {
                t.onlyKeys(o, path, Set.of("kind", "composition"));
                Composition c = composition(t.required(o, path, "composition").value(), path + ".composition");
                return new LayerMaterial.Alloy(c);
            }
            t.onlyKeys(o, path, Set.of("kind", "bottom", "top"));
            Composition bottom = composition(t.required(o, path, "bottom").value(), path + ".bottom");
            Composition top = composition(t.required(o, path, "top").value(), path + ".top");
            return new LayerMaterial.Graded(bottom, top);
        }

        private Composition composition(JsonTree.Node node, String path) {
            return StructureJson.composition(t, node, path);
        }
    }

    /** A composition {"al": x, "in": y} (an omitted fraction is 0). */
    static Composition composition(TreeReader t, JsonTree.Node node, String path) {
        JsonTree.Obj o = t.object(node, path);
        t.onlyKeys(o, path, Set.of("al", "in"));
        JsonTree.Member al = o.get("al");
        JsonTree.Member in = o.get("in");
        double x = al == null ? 0 : t.number(al.value(), path + ".al");
        double y = in == null ? 0 : t.number(in.value(), path + ".in");
        return t.apply(path, o.line(), () -> new Composition(x, y));
    }

    /** Typed access to a line-annotated tree; every failure names file, full key path and line. */
    static final class TreeReader {
        final String fileName;
        private final String prefix;

        TreeReader(String fileName, String prefix) {
            this.fileName = fileName;
            this.prefix = prefix;
        }

        String full(String path) {
            if (prefix.isEmpty()) {
                return path.isEmpty() ? "(root)" : path;
            }
            return path.isEmpty() ? prefix : prefix + "." + path;
        }

        StructureFormatException fail(String path, int line, StructureFormatException.Reason reason, String problem) {
            return new StructureFormatException(fileName, full(path), line, reason, problem, null);
        }

        /** Runs a builder step; a rejected value becomes an error at this key and line. */
        <T> T apply(String path, int line, java.util.function.Supplier<T> step) {
            try {
                return step.get();
            } catch (InvalidParameterException e) {
                throw new StructureFormatException(fileName, full(path), line, StructureFormatException.Reason.INVALID_VALUE,
                        e.getMessage(), e);
            } catch (WurtzkitException e) {
                if (e instanceof StructureFormatException) {
                    throw e;
                }
                throw new StructureFormatException(fileName, full(path), line, StructureFormatException.Reason.INVALID_VALUE,
                        e.getMessage(), e);
            }
        }

        JsonTree.Obj object(JsonTree.Node n, String path) {
            if (n instanceof JsonTree.Obj o) {
                return o;
            }
            throw fail(path, n.line(), StructureFormatException.Reason.WRONG_VALUE,
                    "expected an object, found " + n.describe());
        }

        List<JsonTree.Node> array(JsonTree.Node n, String path) {
            if (n instanceof JsonTree.Arr a) {
                return a.elements();
            }
            throw fail(path, n.line(), StructureFormatException.Reason.WRONG_VALUE,
                    "expected an array, found " + n.describe());
        }

        String string(JsonTree.Node n, String path) {
            if (n instanceof JsonTree.Str s) {
                return s.text();
            }
            throw fail(path, n.line(), StructureFormatException.Reason.WRONG_VALUE,
                    "expected a string, found " + n.describe());
        }

        boolean bool(JsonTree.Node n, String path) {
            if (n instanceof JsonTree.Other o && ("true".equals(o.text()) || "false".equals(o.text()))) {
                return "true".equals(o.text());
            }
            throw fail(path, n.line(), StructureFormatException.Reason.WRONG_VALUE,
                    "expected true or false, found " + n.describe());
        }

        /** A number read from its text with {@link Double#parseDouble(String)} (bit-exact). */
        double number(JsonTree.Node n, String path) {
            if (n instanceof JsonTree.Num num) {
                double v = Double.parseDouble(num.text());
                if (!Double.isFinite(v)) {
                    throw fail(path, n.line(), StructureFormatException.Reason.INVALID_VALUE,
                            "the number " + num.text() + " is not finite; allowed: a finite number");
                }
                return v;
            }
            throw fail(path, n.line(), StructureFormatException.Reason.WRONG_VALUE,
                    "expected a number, found " + n.describe());
        }

        String choice(JsonTree.Node n, String path, String... allowed) {
            String s = string(n, path);
            for (String a : allowed) {
                if (a.equals(s)) {
                    return a;
                }
            }
            throw fail(path, n.line(), StructureFormatException.Reason.WRONG_VALUE,
                    "\"" + s + "\" is not allowed; allowed: \"" + String.join("\", \"", allowed) + "\"");
        }

        JsonTree.Member required(JsonTree.Obj o, String path, String key) {
            JsonTree.Member m = o.get(key);
            if (m == null) {
                throw fail(path.isEmpty() ? key : path + "." + key, o.line(), StructureFormatException.Reason.MISSING_KEY,
                        "the required key \"" + key + "\" is missing" + (path.isEmpty() ? "" : " in \"" + full(path) + "\""));
            }
            return m;
        }

        void onlyKeys(JsonTree.Obj o, String path, Set<String> allowed) {
            for (JsonTree.Member m : o.members().values()) {
                if (!allowed.contains(m.key())) {
                    throw fail(path.isEmpty() ? m.key() : path + "." + m.key(), m.line(),
                            StructureFormatException.Reason.UNKNOWN_KEY,
                            "unknown key \"" + m.key() + "\"; allowed here: " + String.join(", ", new java.util.TreeSet<>(allowed)));
                }
            }
        }

        /** A quantity {"value": number, "unit": symbol}, converted to SI. */
        double quantity(JsonTree.Node n, String path, List<Unit> units) {
            JsonTree.Obj o;
            if (n instanceof JsonTree.Num) {
                throw fail(path, n.line(), StructureFormatException.Reason.MISSING_UNIT,
                        "a bare number has no unit; write {\"value\": " + ((JsonTree.Num) n).text() + ", \"unit\": \""
                                + units.get(units.size() > 1 ? 1 : 0).symbol() + "\"}; allowed units: " + symbols(units));
            }
            o = object(n, path);
            onlyKeys(o, path, Set.of("value", "unit"));
            return valueAndUnit(o, path, units);
        }

        /** The "value" and "unit" of a quantity object that may hold other keys too, converted to SI. */
        double valueAndUnit(JsonTree.Obj o, String path, List<Unit> units) {
            double v = number(required(o, path, "value").value(), path + ".value");
            JsonTree.Member um = o.get("unit");
            if (um == null) {
                throw fail(path + ".unit", o.line(), StructureFormatException.Reason.MISSING_UNIT,
                        "the quantity has no unit; allowed units: " + symbols(units));
            }
            String sym = string(um.value(), path + ".unit");
            for (Unit u : units) {
                if (u.symbol().equals(sym)) {
                    return v * u.toSi();
                }
            }
            throw fail(path + ".unit", um.value().line(), StructureFormatException.Reason.UNKNOWN_UNIT,
                    "unit \"" + sym + "\" is not allowed here; allowed units: " + symbols(units));
        }

        private static String symbols(List<Unit> units) {
            return "\"" + String.join("\", \"", units.stream().map(Unit::symbol).toList()) + "\"";
        }
    }
}
