// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Insulators declared by a parameter set ({@link ParameterSet#insulators()}): the built-in sets
 * carry the four built-in dielectrics, a team's file adds its own with values and sources, the
 * values pass the {@link Insulator} ranges with set, file, key and line in the errors, and the
 * content hash covers them. Expected lines are found by plain text search.
 */
class InsulatorDataTest {
    private static final String FILE = "lab-with-insulators.json";

    /**
     * The team fixture with an invented source and an "insulators" block: the built-in Al2O3 and an
     * invented PECVD SiN of the demo lab (Tarnwick Nitride Lab; the numbers are invented demo data).
     */
    static String withInsulators(String kappa, String gap, String cbo) {
        String text = TestText.resource(TestText.TEAM_FILE).stripTrailing();
        text = text.replaceFirst("\"sources\": \\{\n", "\"sources\": {\n    \"TNL25\": { \"citation\": \"Tarnwick"
                + " Nitride Lab, PECVD SiN on GaN: C-V and photoemission runs of wafer TNL-0731 (invented demo data)\" },\n");
        return text.substring(0, text.length() - 1).stripTrailing() + ",\n"
                + "  \"insulators\": {\n"
                + "    \"Al2O3\": { \"builtIn\": \"Al2O3\" },\n"
                + "    \"TNL-SiN\": {\n"
                + "      \"relativePermittivity\": { \"value\": " + kappa + ", \"source\": \"TNL25\" },\n"
                + "      \"bandGap\": { \"value\": " + gap + ", \"source\": \"TNL25\", \"unit\": \"eV\", \"note\": \"invented\" },\n"
                + "      \"conductionBandOffsetToGaN\": { \"value\": " + cbo + ", \"source\": [\"TNL25\", \"VM03\"] }\n"
                + "    }\n"
                + "  }\n"
                + "}\n";
    }

    /**
     * Each built-in set carries SiO2, Si3N4, Al2O3 and HfO2, equal to the {@link Insulators}
     * constants (by reference: one home for each number), and those equal the published values:
     * permittivity and gap from J. Robertson and B. Falabretti, J. Appl. Phys. 100, 014111 (2006)
     * [from memory; HfO2's permittivity is quoted as 20-25 there and elsewhere, 22 taken]; offsets
     * to GaN(0001) by photoemission, T. E. Cook Jr. et al., J. Appl. Phys. 93, 3949 (2003) and the
     * same group's dielectric study [verified: abstracts], and for ALD Al2O3 S. Esposto et al., Appl.
     * Phys. Lett. 99, 133503 (2011) [verified: abstract].
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource({"SiO2, 3.9, 9.0, 3.6", "Si3N4, 7.5, 5.3, 2.4", "Al2O3, 9.0, 8.8, 2.13", "HfO2, 22, 5.8, 2.1"})
    void builtInSetsCarryThePublishedInsulators(String name, double kappa, double gap, double cbo) {
        for (ParameterSet set : new BuiltInParameterSets().parameterSets()) {
            assertEquals(Insulators.all(), set.insulators(), set.name());
            Insulator i = set.insulator(name);
            assertSame(Insulators.named(name), i, set.name() + ": the constant itself, not a copy of its numbers");
            assertEquals(kappa, i.relativePermittivity(), 0.0, name);
            assertEquals(gap, i.bandGapEv(), 0.0, name);
            assertEquals(cbo, i.conductionBandOffsetToGaNEv(), 0.0, name);
            assertTrue(i.source().contains("Robertson & B. Falabretti, J. Appl. Phys. 100, 014111 (2006)"), i.source());
        }
    }

    /** By name from the set, case ignored, in a structure too; a near miss gets a suggestion. */
    @Test
    void aStructureTakesAnInsulatorByNameFromItsSet() {
        ParameterSet set = ParameterSets.defaultSet();
        assertSame(Insulators.AL2O3, set.insulator("al2o3"));
        Structure s = Structure.builder(set).grow(Layer.of("GaN", Composition.GAN, 500e-9))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 20e-9)).depositNm("HfO2", 5)
                .top(TopBoundary.schottky(2.5)).build();
        assertSame(Insulators.HFO2, s.gateStack().get(0).insulator());
        assertEquals(5e-9, s.gateStackThickness(), 1e-21);
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> set.insulator("Al2O4"));
        assertTrue(e.getMessage().contains("did you mean \"Al2O3\"?"), e.getMessage());
        assertTrue(e.getMessage().contains("[SiO2, Si3N4, Al2O3, HfO2]"), e.getMessage());
        assertTrue(e.getMessage().contains(set.name()), e.getMessage());
        InvalidParameterException far = assertThrows(InvalidParameterException.class,
                () -> Structure.builder(set).grow(Layer.of("GaN", Composition.GAN, 500e-9)).depositNm("diamond", 5));
        assertTrue(!far.getMessage().contains("did you mean"), far.getMessage());
        // a derived set keeps its base's insulators
        assertEquals(set.insulators(), set.derive("derived-for-test").build().insulators());
    }

    /** A team's file adds its own insulator with every value and its sources. */
    @Test
    void aTeamFileAddsAnInsulatorWithItsSources() {
        FileParameterSet set = TestText.read(withInsulators("7.1", "5.1", "2.3"), FILE);
        assertEquals(List.of("Al2O3", "TNL-SiN"), set.insulators().stream().map(Insulator::name).toList());
        assertSame(Insulators.AL2O3, set.insulator("Al2O3"));
        Insulator sin = set.insulator("tnl-sin");
        assertEquals(7.1, sin.relativePermittivity(), 0.0);
        assertEquals(5.1, sin.bandGapEv(), 0.0);
        assertEquals(2.3, sin.conductionBandOffsetToGaNEv(), 0.0);
        assertTrue(sin.source().contains("bandGap: Tarnwick Nitride Lab") && sin.source().contains("[invented]"),
                sin.source());
        assertTrue(sin.source().contains("conductionBandOffsetToGaN: Tarnwick") && sin.source().contains("Vurgaftman"),
                sin.source());
        assertEquals("invented", set.notes().get("insulators.TNL-SiN.bandGap"));
        // the team file without the block declares none
        FileParameterSet plain = TestText.read(TestText.resource(TestText.TEAM_FILE), FILE);
        assertEquals(List.of(), plain.insulators());
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> plain.insulator("Al2O3"));
        assertTrue(e.getMessage().contains("declares no insulators"), e.getMessage());
    }

    /** The content hash covers the insulators; a set without them hashes as before. */
    @Test
    void theContentHashCoversTheInsulators() {
        String plain = ParameterSetHash.sha256(TestText.read(TestText.resource(TestText.TEAM_FILE), FILE));
        String with = ParameterSetHash.sha256(TestText.read(withInsulators("7.1", "5.1", "2.3"), FILE));
        String otherKappa = ParameterSetHash.sha256(TestText.read(withInsulators("7.2", "5.1", "2.3"), FILE));
        String otherGap = ParameterSetHash.sha256(TestText.read(withInsulators("7.1", "5.0", "2.3"), FILE));
        String otherOffset = ParameterSetHash.sha256(TestText.read(withInsulators("7.1", "5.1", "2.31"), FILE));
        assertNotEquals(plain, with);
        assertNotEquals(with, otherKappa);
        assertNotEquals(with, otherGap);
        assertNotEquals(with, otherOffset);
        assertTrue(!ParameterSetHash.canonicalText(TestText.read(TestText.resource(TestText.TEAM_FILE), FILE))
                .contains("insulator."));
        assertTrue(ParameterSetHash.canonicalText(ParameterSets.defaultSet()).contains("insulator.Al2O3=9.0,8.8,2.13\n"));
    }

    /**
     * Values outside the {@link Insulator} ranges: set, file, key and line of the value. The
     * permittivity typed in F/m (6.2e-11, i.e. kappa 7 times eps_0) is below vacuum's 1.
     */
    @ParameterizedTest(name = "{0} = {1}")
    @CsvSource({"relativePermittivity, -7.1, relative permittivity", "relativePermittivity, 0, relative permittivity",
        "relativePermittivity, 6.2e-11, [1, 1000]",
        "bandGap, 0, band gap", "bandGap, 25, band gap", "conductionBandOffsetToGaN, 12, conduction-band offset"})
    void outOfRangeValuesNameSetFileKeyAndLine(String key, String value, String words) {
        String text = withInsulators(key.equals("relativePermittivity") ? value : "7.1",
                key.equals("bandGap") ? value : "5.1", key.equals("conductionBandOffsetToGaN") ? value : "2.3");
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class, () -> TestText.read(text, FILE));
        assertEquals("example-lab-2025", e.setName());
        assertEquals(FILE, e.fileName());
        assertEquals("insulators.TNL-SiN." + key, e.key(), e.getMessage());
        assertEquals(TestText.lineOfKey(text, "TNL-SiN", key, 1), e.line(), e.getMessage());
        assertTrue(e.problem().contains(words), e.problem());
        assertTrue(e.problem().contains("TNL-SiN"), e.problem());
    }

    /** Malformed blocks: each a clear error with key and line. */
    @Test
    void malformedInsulatorBlocksAreRejected() {
        String good = withInsulators("7.1", "5.1", "2.3");
        int builtInLine = TestText.lineOfKey(good, "insulators", "Al2O3", 1);
        check(TestText.replaceOnLine(good, builtInLine, "\"builtIn\": \"Al2O3\"", "\"builtIn\": \"Al2O4\""),
                "insulators.Al2O3.builtIn", builtInLine, "one of SiO2, Si3N4, Al2O3, HfO2");
        check(TestText.replaceOnLine(good, builtInLine, "\"Al2O3\": {", "\"alumina\": {"), "insulators.alumina",
                builtInLine, "keeps its name");
        check(TestText.replaceOnLine(good, builtInLine, "\"builtIn\": \"Al2O3\"",
                "\"builtIn\": \"Al2O3\", \"bandGap\": 7"), "insulators.Al2O3.bandGap", builtInLine, "allowed keys here: {builtIn}");
        int gapLine = TestText.lineOfKey(good, "TNL-SiN", "bandGap", 1);
        check(TestText.replaceOnLine(good, gapLine, "\"unit\": \"eV\"", "\"unit\": \"meV\""), "insulators.TNL-SiN.bandGap",
                gapLine, "allowed: {eV}");
        check(TestText.replaceOnLine(good, gapLine, "\"bandGap\"", "\"gap\""), "insulators.TNL-SiN.gap", gapLine,
                "allowed keys here: {relativePermittivity, bandGap, conductionBandOffsetToGaN}");
        String missing = TestText.removeLine(good, gapLine);
        check(missing, "insulators.TNL-SiN.bandGap", TestText.lineOfBlock(missing, "TNL-SiN"), "missing required key");
        int sinLine = TestText.lineOfBlock(good, "TNL-SiN");
        String twice = TestText.replaceOnLine(good, builtInLine, "\"Al2O3\": { \"builtIn\": \"Al2O3\" }",
                "\"Al2O3\": { \"builtIn\": \"Al2O3\" },\n    \"AL2O3\": { \"builtIn\": \"Al2O3\" }");
        check(twice, "insulators.AL2O3", builtInLine + 1, "only in case");
        check(TestText.replaceOnLine(good, sinLine, "\"TNL-SiN\": {", "\"TNL-SiN\": 7, \"x\": {"), "insulators.TNL-SiN",
                sinLine, "must be an object");
    }

    private static void check(String text, String key, int line, String words) {
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class, () -> TestText.read(text, FILE));
        assertEquals(key, e.key(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.problem().contains(words), e.problem());
    }
}
