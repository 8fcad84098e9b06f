package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.networknt.schema.InputFormat;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.wurtzkit.materials.data.StructureJson;

/**
 * The committed stack file of the invented demo wafer TNL-0731 (fictional Tarnwick Nitride Lab) must
 * keep reading to {@link DemoLab#wafer()} (format stability) and validate against the shipped JSON
 * Schema with a general-purpose validator (networknt json-schema-validator, draft 2020-12); so must
 * the file the demo writes.
 */
class StackFilesTest {
    private static String read(InputStream in) throws IOException {
        try (in) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void theCommittedWaferFileReadsToTheDemoWaferAndValidates() throws IOException {
        String golden = read(StackFilesTest.class.getResourceAsStream("/stacks/tnl-0731.json"));
        assertEquals(DemoLab.wafer(), StructureJson.reader().read(golden, "tnl-0731.json"));
        JsonSchema schema = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012)
                .getSchema(StructureJson.class.getResourceAsStream(StructureJson.SCHEMA_RESOURCE));
        assertEquals(Set.of(), schema.validate(golden, InputFormat.JSON));
        assertEquals(Set.of(), schema.validate(StructureJson.write(DemoLab.wafer()), InputFormat.JSON));
    }
}
