package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.wurtzkit.structure.Structure;

/**
 * Every failure in what format version 2 added names file, key path, line and a typed reason: gate
 * stacks, interface sheets, the ionization of dopants, the critical-thickness model and custom
 * materials. The insulator "TNL liner" is invented.
 */
class StructureJsonV2BadInputTest {
    /** One key per line where it matters, so that each line number below is unambiguous. */
    private static final String GOOD = String.join("\n",
            "{", // 1
            "  \"formatVersion\": 2,", // 2
            "  \"parameterSet\": {\"name\": \"vurgaftman-meyer-2003\"},", // 3
            "  \"top\": {\"kind\": \"schottky-gate\", \"barrierHeight\": {\"value\": 3.0, \"unit\": \"eV\"}},", // 4
            "  \"criticalThicknessModel\": {\"kind\": \"channel-cracking\", \"fractureResistance\": {\"value\": 9, \"unit\": \"J/m^2\"}},", // 5
            "  \"gateStackFromTop\": [", // 6
            "    {\"name\": \"oxide\", \"insulator\": {\"builtIn\": \"Al2O3\"},", // 7
            "     \"thickness\": {\"value\": 10, \"unit\": \"nm\"}},", // 8
            "    {\"name\": \"liner\", \"insulator\": {\"name\": \"TNL liner (invented)\", \"relativePermittivity\": 7.0,", // 9
            "      \"bandGap\": {\"value\": 5.0, \"unit\": \"eV\"}, \"conductionBandOffsetToGaN\": {\"value\": 2.2, \"unit\": \"eV\"},", // 10
            "      \"source\": \"invented\"},", // 11
            "     \"thickness\": {\"value\": 1, \"unit\": \"nm\"}}", // 12
            "  ],", // 13
            "  \"layersFromSurface\": [", // 14
            "    {\"name\": \"barrier\", \"material\": {\"kind\": \"alloy\", \"composition\": {\"al\": 0.25}},", // 15
            "     \"thickness\": {\"value\": 20, \"unit\": \"nm\"},", // 16
            "     \"sheetsOnTop\": [{\"fixedCharge\": {\"value\": 1e13, \"unit\": \"cm^-2\"},", // 17
            "       \"states\": [{\"neutralLevelBelowConductionBand\": {\"value\": 1.5, \"unit\": \"eV\"},", // 18
            "         \"distribution\": {\"shape\": \"uniform\",", // 19
            "           \"density\": {\"value\": 1e12, \"unit\": \"cm^-2 eV^-1\"}}}]}]},", // 20
            "    {\"name\": \"buffer\", \"material\": {\"kind\": \"alloy\", \"composition\": {\"al\": 0}},", // 21
            "     \"thickness\": {\"value\": 500, \"unit\": \"nm\"},", // 22
            "     \"dopants\": [{\"type\": \"donor\", \"density\": {\"value\": 1e16, \"unit\": \"cm^-3\"},", // 23
            "       \"ionizationEnergy\": {\"value\": 0.02, \"unit\": \"eV\"}, \"ionization\": \"full\"}]}", // 24
            "  ]", // 25
            "}"); // 26

    private static final String STATE = "layersFromSurface[0].sheetsOnTop[0].states[0]";
    /** The uniform distribution of the good text (lines 19-20). */
    private static final String DISTRIBUTION = "\"distribution\": {\"shape\": \"uniform\",\n"
            + "           \"density\": {\"value\": 1e12, \"unit\": \"cm^-2 eV^-1\"}}";
    /** A discrete level 6 eV below E_c in its place, the level on a line of its own. */
    private static final String DISCRETE_6_EV = "\"distribution\": {\"shape\": \"discrete\",\n"
            + "           \"density\": {\"value\": 1e12, \"unit\": \"cm^-2\"},\n"
            + "           \"levelBelowConductionBand\": {\"value\": 6, \"unit\": \"eV\"}}";

    @Test
    void theGoodTextReads() {
        Structure s = StructureJson.reader().read(GOOD, "gate.json");
        assertEquals(2, s.gateStack().size());
        assertEquals(1, s.interfaceSheets().size());
        assertEquals(s, StructureJson.reader().read(StructureJson.write(s), "again"));
    }

    /** Each row: the text replaced, its replacement, the reason, the key path, the line, a word of the message. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        // an interface-state shape that does not exist
        "\"shape\": \"uniform\"|\"shape\": \"flat\"|WRONG_VALUE|" + STATE + ".distribution.shape|19|\"u-shaped\"",
        // a negative density of states
        "\"value\": 1e12, \"unit\": \"cm^-2 eV^-1\"|\"value\": -1e12, \"unit\": \"cm^-2 eV^-1\"|INVALID_VALUE|"
                + STATE + ".distribution.density|20|uniform interface-state density",
        // a density of states without its unit, or in a unit of another quantity
        "\"value\": 1e12, \"unit\": \"cm^-2 eV^-1\"|\"value\": 1e12|MISSING_UNIT|" + STATE
                + ".distribution.density.unit|20|cm^-2 eV^-1",
        "\"unit\": \"cm^-2 eV^-1\"|\"unit\": \"cm^-2\"|UNKNOWN_UNIT|" + STATE + ".distribution.density.unit|20|m^-2 eV^-1",
        // a fixed charge as a bare number
        "{\"value\": 1e13, \"unit\": \"cm^-2\"}|1e13|MISSING_UNIT|layersFromSurface[0].sheetsOnTop[0].fixedCharge|17|cm^-2",
        "\"neutralLevelBelowConductionBand\"|\"neutralLevel\"|UNKNOWN_KEY|" + STATE + ".neutralLevel|18|distribution",
        // insulators
        "\"builtIn\": \"Al2O3\"|\"builtIn\": \"ZrO2\"|WRONG_VALUE|gateStackFromTop[0].insulator.builtIn|7|\"HfO2\"",
        "\"relativePermittivity\": 7.0|\"relativePermittivity\": -7.0|INVALID_VALUE|gateStackFromTop[1].insulator|9|relative permittivity",
        "\"value\": 10, \"unit\": \"nm\"|\"value\": 0, \"unit\": \"nm\"|INVALID_VALUE|gateStackFromTop[0].thickness|8|thickness",
        // dopant ionization
        "\"ionization\": \"full\"|\"ionization\": \"partial\"|WRONG_VALUE|layersFromSurface[1].dopants[0].ionization|24|\"from-fermi-level\"",
        // critical-thickness model
        "\"value\": 9, \"unit\": \"J/m^2\"|\"value\": 0, \"unit\": \"J/m^2\"|INVALID_VALUE|criticalThicknessModel.fractureResistance|5|(0, 1000]",
        "\"kind\": \"channel-cracking\"|\"kind\": \"people-model\"|WRONG_VALUE|criticalThicknessModel.kind|5|\"matthews-blakeslee\"",
        "\"kind\": \"channel-cracking\", \"fractureResistance\": {\"value\": 9, \"unit\": \"J/m^2\"}|"
                + "\"kind\": \"c-plane-wurtzite\", \"underCompression\": {\"kind\": \"pyramidal-slip\"}, "
                + "\"underTension\": {\"kind\": \"pyramidal-slip\"}|WRONG_VALUE|criticalThicknessModel.underTension.kind|5|"
                + "\"channel-cracking\"",
    })
    void eachBadInputNamesFileKeyAndLine(String from, String to, String reason, String keyPath, int line,
            String word) {
        assertTrue(GOOD.contains(from), from);
        String bad = GOOD.replace(from, to);
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "gate.json"));
        assertEquals(StructureFormatException.Reason.valueOf(reason), e.reason(), e.getMessage());
        assertEquals("gate.json", e.fileName());
        assertEquals(keyPath, e.keyPath(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.problem().contains(word), e.problem());
    }

    @Test
    void anInlineInsulatorWithoutItsSourceIsRefused() {
        String bad = GOOD.replace("\"unit\": \"eV\"},\n      \"source\": \"invented\"},", "\"unit\": \"eV\"}},");
        assertTrue(!bad.equals(GOOD));
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "gate.json"));
        assertEquals(StructureFormatException.Reason.MISSING_KEY, e.reason(), e.getMessage());
        assertEquals("gateStackFromTop[1].insulator.source", e.keyPath());
        assertEquals(9, e.line());
    }

    @Test
    void anInterfaceStateOutsideTheGapIsRefusedWhenTheStackIsAssembled() {
        // Al0.25Ga0.75N has a gap of about 4 eV (common practice, no source): a level 6 eV below E_c lies in no gap
        String bad = GOOD.replace("{\"value\": 1.5, \"unit\": \"eV\"}", "{\"value\": 6, \"unit\": \"eV\"}");
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "gate.json"));
        assertEquals(StructureFormatException.Reason.INVALID_VALUE, e.reason());
        assertTrue(e.problem().contains("charge-neutrality level"), e.problem());
        assertEquals(STATE + ".neutralLevelBelowConductionBand", e.keyPath(), e.getMessage());
        assertEquals(lineOf(bad, "\"neutralLevelBelowConductionBand\": {\"value\": 6"), e.line(), e.getMessage());
    }

    @Test
    void aDiscreteStateOutsideTheGapPointsAtItsLevel() {
        // the same sheet with a discrete level 6 eV below E_c in its distribution (outside the gap of about 4 eV)
        String bad = GOOD.replace(DISTRIBUTION, DISCRETE_6_EV);
        assertTrue(!bad.equals(GOOD));
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "gate.json"));
        assertEquals(StructureFormatException.Reason.INVALID_VALUE, e.reason());
        assertTrue(e.problem().contains("discrete interface-state level"), e.problem());
        assertEquals(STATE + ".distribution.levelBelowConductionBand", e.keyPath(), e.getMessage());
        assertEquals(lineOf(bad, "\"levelBelowConductionBand\": {\"value\": 6"), e.line(), e.getMessage());
    }

    /** {@return the 1-based line of the text's first line that contains the fragment} */
    private static int lineOf(String text, String fragment) {
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(fragment)) {
                return i + 1;
            }
        }
        throw new AssertionError("no line holds " + fragment);
    }

    @Test
    void surfaceDonorsAboveAnInsulatorAreRefused() {
        String bad = GOOD.replace(
                "\"top\": {\"kind\": \"schottky-gate\", \"barrierHeight\": {\"value\": 3.0, \"unit\": \"eV\"}}",
                "\"top\": {\"kind\": \"free-surface\", \"donorLevelBelowConductionBand\": {\"value\": 1.6, \"unit\": \"eV\"},"
                        + " \"donorDensity\": {\"value\": 1e13, \"unit\": \"cm^-2\"}}");
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "gate.json"));
        assertEquals(StructureFormatException.Reason.INVALID_VALUE, e.reason());
        assertTrue(e.problem().contains("sheetOnTop"), e.problem());
        assertEquals("top.donorDensity", e.keyPath(), e.getMessage());
        assertEquals(4, e.line(), e.getMessage());
    }

    /** Custom materials: the committed golden file, broken one way at a time. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // C13 given in Pa but labelled GPa: outside the plausible range of the material builder
        "\"value\" : 103.0,|\"value\" : 1.03E11,|INVALID_VALUE|layersFromSurface[0].material.definition.parameters.C13|plausible",
        "\"unit\" : \"GPa\"|\"unit\" : \"kbar\"|UNKNOWN_UNIT|layersFromSurface[0].material.definition.parameters.C11.unit|\"Pa\"",
        "\"rule\" : \"tabulated\",|\"sources\" : [ ], \"rule\" : \"tabulated\", \"x\" : 1,|SYNTAX|layersFromSurface[0].material.definition.parameters.a.sources|twice",
        "\"kind\" : \"custom\",|\"kind\" : \"own\",|WRONG_VALUE|layersFromSurface[0].material.kind|\"custom\"",
    })
    void aBrokenCustomMaterialNamesItsKey(String from, String to, String reason, String keyPath, String word) {
        String good = StructureJsonTest.resource("custom-material-v2.json");
        assertTrue(good.contains(from), from);
        int at = good.indexOf(from);
        String bad = good.substring(0, at) + to + good.substring(at + from.length());
        int line = (int) good.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "custom.json"));
        assertEquals(StructureFormatException.Reason.valueOf(reason), e.reason(), e.getMessage());
        assertTrue(e.keyPath().startsWith(keyPath), e.keyPath() + " vs " + keyPath);
        assertTrue(Math.abs(e.line() - line) <= 12 && e.line() > 0, e.getMessage() + " (edit on line " + line + ")");
        assertTrue(e.problem().contains(word), e.problem());
    }

    @Test
    void aCustomMaterialWithoutOneParameterNamesIt() {
        String good = StructureJsonTest.resource("custom-material-v2.json");
        String bad = good.replaceFirst("\"C44\" : \\{", "\"C44x\" : {");
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "custom.json"));
        assertEquals(StructureFormatException.Reason.UNKNOWN_KEY, e.reason(), e.getMessage());
        assertEquals("layersFromSurface[0].material.definition.parameters.C44x", e.keyPath());
        String removed = good.replaceFirst("(?s)\"C44\" : \\{.*?\\n            \\},\\n            ", "");
        StructureFormatException f = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(removed, "custom.json"));
        assertEquals(StructureFormatException.Reason.MISSING_KEY, f.reason(), f.getMessage());
        assertEquals("layersFromSurface[0].material.definition.parameters.C44", f.keyPath());
    }
}
