package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.material.PolarizationModel;

/**
 * A team's own set, read through the public reader from a test resource, works end to end: it
 * resolves alloys, keeps the team's source in the provenance and is found by name once registered.
 * The fixture is the vurgaftman-meyer-2003 data with one team value, GaN C13 = 100 GPa (source
 * "LAB").
 */
class TeamSetTest {
    private final FileParameterSet team = JsonParameterSetReader.readResource(TeamSetTest.class, TestText.TEAM_FILE);

    @Test
    void readsNameModelAndBibliography() {
        assertEquals("example-lab-2025", team.name());
        assertEquals(TestText.TEAM_FILE, team.fileName());
        assertSame(PolarizationModel.LINEAR, team.recommendedPolarizationModel());
        List<String> keys = team.sources().stream().map(Source::key).toList();
        assertEquals(List.of("VM03", "BFV97", "BF01", "BI73", "Lev01", "E15EST", "LAB"), keys);
    }

    @Test
    void resolvesAnAlloyWithTheTeamValue() {
        WurtziteMaterial al30 = team.material(Composition.alGaN(0.3));
        // Vegard: 0.3 x 108 (AlN, VM03 [from memory]) + 0.7 x 100 (team GaN) = 102.4 GPa
        assertEquals(102.4e9, al30.get(MaterialParameter.C13), 1e-3);
        List<String> c13Sources = al30.source(MaterialParameter.C13).sources().stream().map(Source::key).toList();
        assertTrue(c13Sources.containsAll(List.of("LAB", "VM03")), c13Sources.toString());
        assertEquals("Vegard's law", al30.source(MaterialParameter.C13).rule());
        // [computed]: Al0.3Ga0.7N on GaN with VM03 lattice constants, eps_xx = 7.30e-3
        double epsXx = (team.binary(Binary.GAN).latticeA() - al30.latticeA()) / al30.latticeA();
        assertEquals(7.30e-3, epsXx, 0.005e-3);
        // gap with VM03 bowing 0.7 eV [from memory]: 0.3 x 6.25 + 0.7 x 3.510 - 0.7 x 0.21 = 4.185 eV at 0 K
        assertEquals(0.3 * 6.25 + 0.7 * 3.510 - 0.7 * 0.3 * 0.7, al30.bandGap().gap0KEv(), 1e-12);
    }

    @Test
    void registeredTeamSetIsTheSameData() {
        assertEquals(team.binary(Binary.GAN).values(), ParameterSets.named("example-lab-2025").binary(Binary.GAN).values());
        assertEquals(100e9, ParameterSets.named("example-lab-2025").binary(Binary.GAN).get(MaterialParameter.C13), 1e-3);
    }

    @Test
    void readsFromAFileAsWell(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("lab.json");
        Files.writeString(f, TestText.resource(TestText.TEAM_FILE), StandardCharsets.UTF_8);
        FileParameterSet fromFile = JsonParameterSetReader.readFile(f);
        assertEquals(team.binary(Binary.INN).values(), fromFile.binary(Binary.INN).values());
        assertEquals(f.toString(), fromFile.fileName());
        ParameterSetFormatException e = org.junit.jupiter.api.Assertions.assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.readFile(dir.resolve("missing.json")));
        assertTrue(e.getMessage().contains("missing.json"), e.getMessage());
    }

    @Test
    void notesAreKeptPerValue() {
        assertEquals("team Brillouin measurement (illustrative)", team.note(Binary.GAN, MaterialParameter.C13));
        assertEquals("", team.note(Binary.ALN, MaterialParameter.C13));
    }
}
