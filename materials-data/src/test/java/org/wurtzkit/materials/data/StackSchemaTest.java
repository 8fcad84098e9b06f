package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.InputFormat;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.InputStream;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.wurtzkit.structure.Structure;

/**
 * The shipped JSON Schema ({@link StructureJson#SCHEMA_RESOURCE}) checked with a general-purpose
 * validator (networknt json-schema-validator, JSON Schema draft 2020-12): every committed stack file
 * and every file the writer produces validates, and a file that breaks the schema also breaks the
 * reader, at the same key.
 */
class StackSchemaTest {
    static final JsonSchema SCHEMA = load(StructureJson.SCHEMA_RESOURCE);
    static final JsonSchema SCHEMA_V1 = load(StructureJson.SCHEMA_RESOURCE_V1);

    private static JsonSchema load(String resource) {
        try (InputStream in = StructureJson.class.getResourceAsStream(resource)) {
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(in);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** Validates against the schema of the newest format version. */
    static Set<ValidationMessage> validate(String json) {
        return SCHEMA.validate(json, InputFormat.JSON);
    }

    /** Validates against the schema of the format version the text declares. */
    static Set<ValidationMessage> validateAsDeclared(String json) {
        return (json.replace(" ", "").contains("\"formatVersion\":1,") ? SCHEMA_V1 : SCHEMA).validate(json,
                InputFormat.JSON);
    }

    static final String[] V1_FILES = {"tnl-0731-wafer.json", "every-section.json", "minimal.json"};
    static final String[] V2_FILES = {"every-section-v2.json", "custom-material-v2.json"};

    @ParameterizedTest
    @ValueSource(strings = {"tnl-0731-wafer.json", "every-section.json", "minimal.json", "every-section-v2.json",
        "custom-material-v2.json"})
    void everyCommittedStackFileValidatesAgainstTheSchemaOfItsVersion(String name) {
        assertEquals(Set.of(), validateAsDeclared(StructureJsonTest.resource(name)), name);
    }

    @ParameterizedTest
    @ValueSource(strings = {"tnl-0731-wafer.json", "every-section.json", "minimal.json"})
    void aVersionOneFileIsNotAVersionTwoFileNorTheOtherWayRound(String name) {
        assertFalse(validate(StructureJsonTest.resource(name)).isEmpty(), "version 2 schema accepts a version 1 file");
        assertFalse(SCHEMA_V1.validate(StructureJsonTest.resource("every-section-v2.json"), InputFormat.JSON).isEmpty());
    }

    @ParameterizedTest
    @ValueSource(strings = {"tnl-0731-wafer.json", "every-section.json", "minimal.json", "every-section-v2.json",
        "custom-material-v2.json"})
    void whatTheWriterWritesValidates(String name) {
        Structure s = StructureJsonTest.golden(name);
        assertEquals(Set.of(), validate(StructureJson.write(s)), name);
        assertEquals(Set.of(), validate(StructureJson.writeCompact(s)), name);
        if (name.endsWith("-v2.json")) {
            return;
        }
        assertEquals(Set.of(), SCHEMA_V1.validate(StructureJson.write(s, 1), InputFormat.JSON), name);
    }

    /**
     * The schema lists the custom material's parameters by hand; they must be exactly the library's
     * parameters, each with the units the reader takes (the parameter-set files' unit, then SI).
     */
    @Test
    void theSchemasParametersAreTheLibrarysParameters() {
        JsonTree.Obj root = (JsonTree.Obj) StructureJson.parse(new String(readSchema(),
                java.nio.charset.StandardCharsets.UTF_8), "schema");
        JsonTree.Obj props = (JsonTree.Obj) at(root, "$defs", "customMaterial", "properties", "parameters",
                "properties");
        java.util.Set<String> keys = new java.util.TreeSet<>(props.members().keySet());
        java.util.Set<String> expected = new java.util.TreeSet<>();
        for (org.wurtzkit.material.MaterialParameter p : org.wurtzkit.material.MaterialParameter.values()) {
            expected.add(p.key());
            JsonTree.Obj unit = (JsonTree.Obj) at(props, p.key(), "properties", "unit");
            java.util.List<String> units = new java.util.ArrayList<>();
            if (unit.get("const") != null) {
                units.add(((JsonTree.Str) unit.get("const").value()).text());
            } else {
                ((JsonTree.Arr) unit.get("enum").value()).elements().forEach(u -> units.add(((JsonTree.Str) u).text()));
            }
            assertEquals(MaterialJson.units(p).stream().map(StructureJson.Unit::symbol).toList(), units, p.key());
        }
        assertEquals(expected, keys);
    }

    private static JsonTree.Node at(JsonTree.Obj o, String... keys) {
        JsonTree.Node n = o;
        for (String k : keys) {
            n = ((JsonTree.Obj) n).get(k).value();
        }
        return n;
    }

    @Test
    void theSchemaStatesTheRuleOfChange() {
        String text = new String(readSchema(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(text.contains("an unknown key is an error"), "the schema's description documents the rule");
        assertTrue(text.contains("\"const\": 2"), "the version 2 schema takes formatVersion 2");
    }

    private static byte[] readSchema() {
        try (InputStream in = StructureJson.class.getResourceAsStream(StructureJson.SCHEMA_RESOURCE)) {
            return in.readAllBytes();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /**
     * Each row breaks the demo wafer file in one way; the schema and the reader must both refuse it,
     * and both messages must name the same key.
     */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"name\": \"spacer\"|\"name\": \"spacer\", \"colour\": \"blue\"|UNKNOWN_KEY|colour",
        "{\"value\": 22, \"unit\": \"nm\"}|{\"value\": 22, \"unit\": \"furlong\"}|UNKNOWN_UNIT|unit",
        "{\"value\": 22, \"unit\": \"nm\"}|{\"value\": 22}|MISSING_UNIT|unit",
        "\"polarity\": \"metal-face\"|\"polarity\": \"gallium-face\"|WRONG_VALUE|polarity",
        "\"formatVersion\": 1|\"formatVersion\": 7|UNSUPPORTED_VERSION|formatVersion",
        "\"composition\": {\"al\": 0.26}|\"composition\": {\"al\": \"0.26\"}|WRONG_VALUE|al",
        "\"temperature\"|\"temperatur\"|UNKNOWN_KEY|temperatur",
    })
    void aFileThatBreaksTheSchemaBreaksTheReaderAtTheSameKey(String from, String to, String reason, String key) {
        String good = StructureJsonTest.resource("tnl-0731-wafer.json");
        assertTrue(good.contains(from), from);
        String bad = good.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to));
        Set<ValidationMessage> schemaErrors = validateAsDeclared(bad);
        assertFalse(schemaErrors.isEmpty(), "the schema accepts " + to);
        String schemaText = schemaErrors.stream().map(ValidationMessage::getMessage).collect(Collectors.joining("\n"));
        assertTrue(schemaText.contains(key), schemaText);
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "bad.json"));
        assertEquals(StructureFormatException.Reason.valueOf(reason), e.reason(), e.getMessage());
        assertTrue(e.keyPath().endsWith(key), e.keyPath());
        assertTrue(e.line() > 0, e.getMessage());
    }

    /**
     * The same for what format version 2 added, on its golden file: an unknown interface-state
     * shape, a negative density of states, a missing unit, an unknown built-in insulator, an unknown
     * ionization, an unknown critical-thickness model.
     */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"shape\": \"uniform\"|\"shape\": \"flat\"|WRONG_VALUE|shape",
        "{\"value\": 1e12, \"unit\": \"cm^-2 eV^-1\"}|{\"value\": -1e12, \"unit\": \"cm^-2 eV^-1\"}|INVALID_VALUE|density",
        "{\"value\": 1e12, \"unit\": \"cm^-2 eV^-1\"}|{\"value\": 1e12}|MISSING_UNIT|unit",
        "{\"builtIn\": \"Si3N4\"}|{\"builtIn\": \"SiN\"}|WRONG_VALUE|builtIn",
        "\"ionization\": \"full\"|\"ionization\": \"partial\"|WRONG_VALUE|ionization",
        "\"kind\": \"matthews-blakeslee\"|\"kind\": \"people-bean\"|WRONG_VALUE|kind",
        "\"source\": \"invented: Tarnwick|\"origin\": \"invented: Tarnwick|UNKNOWN_KEY|origin",
    })
    void aVersionTwoFileThatBreaksTheSchemaBreaksTheReaderAtTheSameKey(String from, String to, String reason,
            String key) {
        String good = StructureJsonTest.resource("every-section-v2.json");
        assertTrue(good.contains(from), from);
        String bad = good.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to));
        Set<ValidationMessage> schemaErrors = validate(bad);
        assertFalse(schemaErrors.isEmpty(), "the schema accepts " + to);
        String schemaText = schemaErrors.stream().map(ValidationMessage::getMessage).collect(Collectors.joining("\n"));
        assertTrue(schemaText.contains(key), schemaText);
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "bad.json"));
        assertEquals(StructureFormatException.Reason.valueOf(reason), e.reason(), e.getMessage());
        assertTrue(e.keyPath().contains(key), e.keyPath());
        assertTrue(e.line() > 0, e.getMessage());
    }
}
