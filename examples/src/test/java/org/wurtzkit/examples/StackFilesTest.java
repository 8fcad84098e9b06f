package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

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
import org.wurtzkit.structure.Structure;

/**
 * The committed stack files of the invented demo wafer TNL-0731 (fictional Tarnwick Nitride Lab) must
 * keep reading to the examples' stacks (format stability) and validate against the shipped JSON
 * Schema of their format version with a general-purpose validator (networknt json-schema-validator,
 * draft 2020-12): the plain wafer as format version 1, the MIS-HEMT (invented fixed charge and
 * U-shaped interface states under built-in Al2O3) and the p-GaN gate wafer as format version 2. So
 * must the files the writer writes. The golden files of version 2 are what the writer wrote, less
 * the parameter set's hash (so that a change of the set's data does not break them).
 */
class StackFilesTest {
    private static String read(InputStream in) throws IOException {
        try (in) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static JsonSchema schema(int version) {
        return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012)
                .getSchema(StructureJson.class.getResourceAsStream(StructureJson.schemaResource(version)));
    }

    private static String withoutHash(String json) {
        return json.replaceAll(",\n\\s*\"sha256\" : \"[0-9a-f]{64}\"", "");
    }

    @Test
    void theCommittedWaferFileReadsToTheDemoWaferAndValidates() throws IOException {
        String golden = read(StackFilesTest.class.getResourceAsStream("/stacks/tnl-0731.json"));
        assertEquals(DemoLab.wafer(), StructureJson.reader().read(golden, "tnl-0731.json"));
        assertEquals(Set.of(), schema(1).validate(golden, InputFormat.JSON));
        assertEquals(Set.of(), schema(1).validate(StructureJson.write(DemoLab.wafer(), 1), InputFormat.JSON));
        assertEquals(Set.of(), schema(2).validate(StructureJson.write(DemoLab.wafer()), InputFormat.JSON));
        assertFalse(schema(2).validate(golden, InputFormat.JSON).isEmpty(), "a version 1 file is no version 2 file");
    }

    @Test
    void theCommittedMisHemtFileReadsToTheExamplesStackAndValidates() throws IOException {
        Structure mis = MisHemtExample.misHemt(3.0e13, MisHemtExample.inventedStates(), 15);
        check("tnl-0731-mis-hemt-v2.json", mis);
    }

    @Test
    void theCommittedPGanGateFileReadsToTheExamplesStackAndValidates() throws IOException {
        check("tnl-0731-p-gan-gate-v2.json", PGanGateExample.wafer(3e19, 15));
    }

    private static void check(String name, Structure expected) throws IOException {
        String golden = read(StackFilesTest.class.getResourceAsStream("/stacks/" + name));
        assertEquals(expected, StructureJson.reader().read(golden, name));
        assertEquals(Set.of(), schema(2).validate(golden, InputFormat.JSON), name);
        String written = StructureJson.write(expected);
        assertEquals(Set.of(), schema(2).validate(written, InputFormat.JSON), name);
        assertEquals(golden, withoutHash(written), "the format of " + name + " is stable");
    }
}
