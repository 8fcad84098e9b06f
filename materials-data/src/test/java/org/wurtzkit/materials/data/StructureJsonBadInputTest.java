package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Source;
import org.wurtzkit.structure.Structure;

/** Every failure of the stack reader names file, key path, line and a typed reason. */
class StructureJsonBadInputTest {
    /** The demo wafer file, one key per line so that each line number below is unambiguous. */
    private static final String GOOD = String.join("\n",
            "{", // 1
            "  \"formatVersion\": 1,", // 2
            "  \"parameterSet\": {\"name\": \"vurgaftman-meyer-2003\"},", // 3
            "  \"temperature\": {\"value\": 300, \"unit\": \"K\"},", // 4
            "  \"top\": {\"kind\": \"schottky-gate\", \"barrierHeight\": {\"value\": 1.0, \"unit\": \"eV\"}},", // 5
            "  \"layersFromSurface\": [", // 6
            "    {\"name\": \"barrier\",", // 7
            "     \"material\": {\"kind\": \"alloy\", \"composition\": {\"al\": 0.26}},", // 8
            "     \"thickness\": {\"value\": 22, \"unit\": \"nm\"}},", // 9
            "    {\"name\": \"buffer\",", // 10
            "     \"material\": {\"kind\": \"alloy\", \"composition\": {\"al\": 0}},", // 11
            "     \"thickness\": {\"value\": 1800, \"unit\": \"nm\"}}", // 12
            "  ]", // 13
            "}"); // 14

    private static StructureFormatException fails(String text, StructureJson.Reader reader) {
        return assertThrows(StructureFormatException.class, () -> reader.read(text, "wafer.json"));
    }

    private static void check(StructureFormatException e, StructureFormatException.Reason reason, String keyPath,
            int line) {
        assertEquals(reason, e.reason(), e.getMessage());
        assertEquals("wafer.json", e.fileName());
        assertEquals(keyPath, e.keyPath(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.getMessage().startsWith("file \"wafer.json\", key \"" + keyPath + "\", line " + line + ": "),
                e.getMessage());
    }

    @Test
    void theGoodTextReads() {
        assertEquals(2, StructureJson.reader().read(GOOD, "wafer.json").layersBottomUp().size());
    }

    @Test
    void malformedJsonNamesTheLine() {
        StructureFormatException e = fails(GOOD.replace("\"nm\"}},", "\"nm\"}"), StructureJson.reader());
        assertEquals(StructureFormatException.Reason.SYNTAX, e.reason());
        assertEquals(10, e.line(), e.getMessage());
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind());
    }

    @Test
    void aKeyGivenTwiceIsAnError() {
        StructureFormatException e = fails(GOOD.replace("\"temperature\": {\"value\": 300,",
                "\"temperature\": {\"value\": 300, \"value\": 301,"), StructureJson.reader());
        check(e, StructureFormatException.Reason.SYNTAX, "temperature.value", 4);
    }

    @Test
    void anUnknownKeyNamesItsPathAndLine() {
        StructureFormatException e = fails(GOOD.replace("\"name\": \"buffer\",", "\"name\": \"buffer\", \"colour\": 3,"),
                StructureJson.reader());
        check(e, StructureFormatException.Reason.UNKNOWN_KEY, "layersFromSurface[1].colour", 10);
        assertTrue(e.problem().contains("allowed here: deepLevels, deltaSheets, dopants, material, name, relaxation,"
                + " thickness"), e.problem());
    }

    @Test
    void aBareNumberWithoutUnitIsAMissingUnit() {
        StructureFormatException e = fails(GOOD.replace("{\"value\": 22, \"unit\": \"nm\"}", "22"),
                StructureJson.reader());
        check(e, StructureFormatException.Reason.MISSING_UNIT, "layersFromSurface[0].thickness", 9);
    }

    @Test
    void aQuantityWithoutItsUnitKeyIsAMissingUnit() {
        StructureFormatException e = fails(GOOD.replace("{\"value\": 300, \"unit\": \"K\"}", "{\"value\": 300}"),
                StructureJson.reader());
        check(e, StructureFormatException.Reason.MISSING_UNIT, "temperature.unit", 4);
    }

    @Test
    void aUnitTheQuantityDoesNotTakeIsAnUnknownUnit() {
        StructureFormatException e = fails(GOOD.replace("\"unit\": \"K\"", "\"unit\": \"C\""), StructureJson.reader());
        check(e, StructureFormatException.Reason.UNKNOWN_UNIT, "temperature.unit", 4);
        assertTrue(e.problem().contains("\"K\""), e.problem());
    }

    @Test
    void aMissingRequiredKeyNamesTheObject() {
        StructureFormatException e = fails(GOOD.replace("     \"thickness\": {\"value\": 22, \"unit\": \"nm\"}},",
                "     \"relaxation\": 0},"), StructureJson.reader());
        check(e, StructureFormatException.Reason.MISSING_KEY, "layersFromSurface[0].thickness", 7);
    }

    @Test
    void aValueOutsideTheBuildersRangeIsAnInvalidValueAtItsKey() {
        StructureFormatException e = fails(GOOD.replace("{\"value\": 300, \"unit\": \"K\"}",
                "{\"value\": -5, \"unit\": \"K\"}"), StructureJson.reader());
        check(e, StructureFormatException.Reason.INVALID_VALUE, "temperature", 4);
        StructureFormatException f = fails(GOOD.replace("{\"al\": 0.26}", "{\"al\": 1.26}"), StructureJson.reader());
        check(f, StructureFormatException.Reason.INVALID_VALUE, "layersFromSurface[0].material.composition", 8);
        assertTrue(f.problem().contains("Al fraction x"), f.problem());
    }

    @Test
    void anUnknownChoiceListsTheAllowedOnes() {
        StructureFormatException e = fails(GOOD.replace("\"schottky-gate\"", "\"ohmic\""), StructureJson.reader());
        check(e, StructureFormatException.Reason.WRONG_VALUE, "top.kind", 5);
        assertTrue(e.problem().contains("\"schottky-gate\", \"free-surface\""), e.problem());
    }

    @Test
    void aNewerFormatVersionIsRefused() {
        StructureFormatException e = fails(GOOD.replace("\"formatVersion\": 1", "\"formatVersion\": 3"),
                StructureJson.reader());
        check(e, StructureFormatException.Reason.UNSUPPORTED_VERSION, "formatVersion", 2);
    }

    @Test
    void anUnregisteredParameterSetIsItsOwnKindOfError() {
        StructureFormatException e = fails(GOOD.replace("vurgaftman-meyer-2003", "no-such-set"), StructureJson.reader());
        check(e, StructureFormatException.Reason.UNKNOWN_PARAMETER_SET, "parameterSet.name", 3);
        assertEquals(ErrorKind.UNKNOWN_PARAMETER_SET, e.kind());
    }

    @Test
    void aChangedParameterSetIsAnErrorUnlessAcceptedOnPurpose() {
        ParameterSet vm = ParameterSets.named("vurgaftman-meyer-2003");
        String withHash = GOOD.replace("{\"name\": \"vurgaftman-meyer-2003\"}",
                "{\"name\": \"vurgaftman-meyer-2003\", \"sha256\": \"" + ParameterSetHash.sha256(vm) + "\"}");
        assertEquals(vm, StructureJson.reader().read(withHash, "wafer.json").parameters());
        // someone changed one value of the set but kept its name
        double c13 = vm.binary(Binary.GAN).get(MaterialParameter.C13);
        ParameterSet edited = vm.derive("vurgaftman-meyer-2003")
                .set(Binary.GAN, MaterialParameter.C13, c13 * 1.01, Source.of("EDIT", "a test edit, no physical meaning"))
                .build();
        StructureJson.Reader r = StructureJson.reader().withSet(edited);
        StructureFormatException e = fails(withHash, r);
        check(e, StructureFormatException.Reason.CHANGED_PARAMETER_SET, "parameterSet.sha256", 3);
        assertTrue(e.problem().contains("acceptChangedParameterSet()"), e.problem());
        Structure accepted = r.acceptChangedParameterSet().read(withHash, "wafer.json");
        assertEquals(edited, accepted.parameters());
        assertNotEquals(ParameterSetHash.sha256(vm), ParameterSetHash.sha256(accepted.parameters()));
    }

    @Test
    void aMalformedHashIsRejected() {
        StructureFormatException e = fails(GOOD.replace("{\"name\": \"vurgaftman-meyer-2003\"}",
                "{\"name\": \"vurgaftman-meyer-2003\", \"sha256\": \"ABC\"}"), StructureJson.reader());
        check(e, StructureFormatException.Reason.WRONG_VALUE, "parameterSet.sha256", 3);
    }

    @Test
    void aMissingFileIsNamed(@TempDir Path dir) {
        Path f = dir.resolve("absent.json");
        StructureFormatException e = assertThrows(StructureFormatException.class, () -> StructureJson.readFile(f));
        assertEquals(f.toString(), e.fileName());
        assertEquals(0, e.line());
    }

    @Test
    void aWrongJsonTypeIsNamed() {
        StructureFormatException e = fails(GOOD.replace("\"name\": \"buffer\"", "\"name\": 7"), StructureJson.reader());
        check(e, StructureFormatException.Reason.WRONG_VALUE, "layersFromSurface[1].name", 10);
    }
}
