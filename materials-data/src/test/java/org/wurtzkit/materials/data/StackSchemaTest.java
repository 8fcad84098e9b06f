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
    static final JsonSchema SCHEMA = load();

    private static JsonSchema load() {
        try (InputStream in = StructureJson.class.getResourceAsStream(StructureJson.SCHEMA_RESOURCE)) {
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(in);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static Set<ValidationMessage> validate(String json) {
        return SCHEMA.validate(json, InputFormat.JSON);
    }

    @ParameterizedTest
    @ValueSource(strings = {"tnl-0731-wafer.json", "every-section.json", "minimal.json"})
    void everyCommittedStackFileValidates(String name) {
        assertEquals(Set.of(), validate(StructureJsonTest.resource(name)), name);
    }

    @ParameterizedTest
    @ValueSource(strings = {"tnl-0731-wafer.json", "every-section.json", "minimal.json"})
    void whatTheWriterWritesValidates(String name) {
        Structure s = StructureJsonTest.golden(name);
        assertEquals(Set.of(), validate(StructureJson.write(s)), name);
        assertEquals(Set.of(), validate(StructureJson.writeCompact(s)), name);
    }

    @Test
    void theSchemaStatesTheRuleOfChange() {
        String text = new String(readSchema(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(text.contains("an unknown key is an error"), "the schema's description documents the rule");
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
        Set<ValidationMessage> schemaErrors = validate(bad);
        assertFalse(schemaErrors.isEmpty(), "the schema accepts " + to);
        String schemaText = schemaErrors.stream().map(ValidationMessage::getMessage).collect(Collectors.joining("\n"));
        assertTrue(schemaText.contains(key), schemaText);
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "bad.json"));
        assertEquals(StructureFormatException.Reason.valueOf(reason), e.reason(), e.getMessage());
        assertTrue(e.keyPath().endsWith(key), e.keyPath());
        assertTrue(e.line() > 0, e.getMessage());
    }
}
