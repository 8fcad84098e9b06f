package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.InterfaceStates;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerMaterial;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/**
 * Format version 2 against the builder: its committed golden files (format stability) read to the
 * structures the builder makes from the same numbers, written out by hand from the files (common
 * practice, no source). The insulator, interface states, fixed charges and custom materials of the
 * files are invented (fictional Tarnwick Nitride Lab, wafer TNL-0731), except the built-in Si3N4.
 */
class StructureJsonV2Test {
    private static final double NM = 1e-9;

    @Test
    void theFileWithEveryVersionTwoSectionReadsToTheSameBuilderCalls() {
        ParameterSet vm = ParameterSets.named("vurgaftman-meyer-2003");
        Insulator ald = new Insulator("TNL ALD Al2O3 (invented)", 8.0, 6.8, 2.0,
                "invented: Tarnwick Nitride Lab C-V fit, wafer TNL-0731");
        InterfaceSheet upper = new InterfaceSheet(Units.perCm2ToPerM2(2.5e13), List.of(
                InterfaceStates.uniformPerCm2PerEv(1e12, 1.5),
                new InterfaceStates(new InterfaceStates.Gaussian(Units.perCm2ToPerM2(3e12), 1.0, 0.2), 1.5)));
        InterfaceSheet lower = new InterfaceSheet(-1e16, List.of(
                new InterfaceStates(new InterfaceStates.UShaped(Units.perCm2ToPerM2(5e11), Units.perCm2ToPerM2(5e13),
                        0.15, 0.2), 1.8),
                new InterfaceStates(new InterfaceStates.Discrete(Units.perCm2ToPerM2(2e12), 0.6), 0)));
        Structure expected = Structure.builder(vm)
                .grow(Layer.of("buffer", Composition.GAN, 1e-6).withDopant(Dopant.donorsPerCm3(1e16, 0.02).fullyIonized()))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 20 * NM))
                .sheetOnTop(upper)
                .sheetOnTop(lower)
                .deposit(new InsulatorLayer("interlayer", Insulators.SI3N4, 2 * NM))
                .deposit(new InsulatorLayer("gate oxide", ald, 12 * NM))
                .criticalThicknessModel(new CriticalThicknessModel.CPlaneWurtzite(
                        CriticalThickness.MATTHEWS_BLAKESLEE_60, new CriticalThicknessModel.ChannelCracking(12)))
                .strainShiftsBandEdges(true).strainShiftsValenceSplittings(false)
                .top(TopBoundary.schottky(3.2).atBiasV(-1.5))
                .build();
        Structure read = StructureJsonTest.golden("every-section-v2.json");
        assertEquals(expected, read);
        assertEquals(List.of("gate oxide", "interlayer"), read.gateStack().stream().map(InsulatorLayer::name).toList());
        assertEquals(2, read.interfaceSheets().size());
        assertEquals(read, StructureJson.reader().read(StructureJson.write(read), "again"));
    }

    /**
     * The file holds its custom materials whole: every value with its source, the per-binary gap
     * form of the alloy. The gap of the barrier at 300 K must be the per-binary formula
     * 0.25 E_g(AlN, 300 K) + 0.75 E_g(GaN, 300 K) - bowing, evaluated here by hand from the file's
     * own numbers with Varshni's law (Y. P. Varshni, Physica 34, 149 (1967)).
     */
    @Test
    void theCustomMaterialFileStandsAloneAndRewritesToTheSameText() {
        String text = StructureJsonTest.resource("custom-material-v2.json");
        Structure s = StructureJson.reader().read(text, "custom-material-v2.json");
        WurtziteMaterial cap = ((LayerMaterial.Custom) s.layersTopDown().get(0).material()).material();
        assertEquals("TNL strained-cap GaN (invented)", cap.name());
        assertEquals(103e9, cap.get(MaterialParameter.C13));
        assertEquals("TNL-0731", cap.source(MaterialParameter.C13).sources().get(0).key());
        assertNull(cap.bandGap().perBinary(), "a binary has one Varshni law");
        WurtziteMaterial barrier = ((LayerMaterial.Custom) s.layersTopDown().get(1).material()).material();
        assertEquals(104e9, barrier.get(MaterialParameter.C13));
        double t = 300;
        double aln = 6.25 - 0.001799 * t * t / (t + 1462.0);
        double gan = 3.51 - 0.000909 * t * t / (t + 830.0);
        assertEquals(0.25 * aln + 0.75 * gan - 0.15000000000000002, barrier.bandGap().atTemperature(t), 1e-12);
        assertTrue(text.contains("\"varshniAlpha\" : {\n                  \"value\" : 0.909,\n                  \"unit\" : \"meV/K\""), "GaN alpha in the file");
        String rewritten = StructureJson.write(s).replaceAll(",\n\\s*\"sha256\" : \"[0-9a-f]{64}\"", "");
        assertEquals(text, rewritten, "the golden file is exactly what the writer writes (set hash aside)");
    }

    /**
     * What version 2 cannot hold, and says so: a custom material whose per-binary gap form has a
     * binary that is itself per-binary (no rule of the library makes one; built here by hand).
     */
    @Test
    void aNestedPerBinaryGapIsTheOneThingVersionTwoRefuses() {
        WurtziteMaterial gan = ParameterSets.defaultSet().binary(org.wurtzkit.material.Binary.GAN);
        org.wurtzkit.material.BandGap inner = new org.wurtzkit.material.BandGap(3.51, 0.909e-3, 830,
                new org.wurtzkit.material.BandGap.PerBinary(new double[] {1},
                        new org.wurtzkit.material.BandGap[] {gan.bandGap()}, 0));
        WurtziteMaterial nested = gan.toBuilder("nested").perBinaryGap(new org.wurtzkit.material.BandGap.PerBinary(
                new double[] {1}, new org.wurtzkit.material.BandGap[] {inner}, 0)).build();
        Structure s = Structure.builder(ParameterSets.defaultSet()).grow(Layer.of("own", nested, 100 * NM))
                .top(TopBoundary.schottky(1)).build();
        StructureFormatException e = assertThrows(StructureFormatException.class, () -> StructureJson.write(s));
        assertEquals(StructureFormatException.Reason.NOT_WRITABLE, e.reason());
        assertTrue(e.getMessage().contains("\"own\"") && e.getMessage().contains("itself per-binary"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"name\": \"spacer\"|\"name\": \"spacer\", \"sheetsOnTop\": []|layersFromSurface[2].sheetsOnTop",
        "\"formatVersion\": 1,|\"formatVersion\": 1, \"gateStackFromTop\": [],|gateStackFromTop",
        "\"degeneracy\": 2|\"degeneracy\": 2, \"ionization\": \"full\"|layersFromSurface[1].dopants[0].ionization",
    })
    void aVersionTwoKeyInAVersionOneFileIsNamedAsSuch(String from, String to, String keyPath) {
        String good = StructureJsonTest.resource("tnl-0731-wafer.json").replace("\"name\": \"barrier\"",
                "\"name\": \"barrier\", \"dopants\": [{\"type\": \"donor\", \"density\": {\"value\": 1e17,"
                        + " \"unit\": \"cm^-3\"}, \"ionizationEnergy\": {\"value\": 0.02, \"unit\": \"eV\"},"
                        + " \"degeneracy\": 2}]");
        assertEquals(1, StructureJson.reader().read(good, "good").layersTopDown().get(1).dopants().size());
        assertTrue(good.contains(from), from);
        String bad = good.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to));
        StructureFormatException e = assertThrows(StructureFormatException.class,
                () -> StructureJson.reader().read(bad, "old.json"));
        assertEquals(StructureFormatException.Reason.UNKNOWN_KEY, e.reason(), e.getMessage());
        assertEquals(keyPath, e.keyPath(), e.getMessage());
        assertTrue(e.getMessage().contains("belongs to format version 2"), e.getMessage());
        assertTrue(e.line() > 0);
    }
}
