package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetHash;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.StructureCodec;
import org.wurtzkit.structure.TopBoundary;

/**
 * The stack format against the builder: the committed golden files (format stability) read to the
 * structures the builder makes from the same numbers, and every structure written reads back equal.
 * The expected structures are written out by hand from the files (common practice, no source);
 * the TNL-0731 stack is the invented demo wafer of the examples module.
 */
class StructureJsonTest {
    static final String STACKS = "/org/wurtzkit/materials/data/stacks/";
    static final List<String> GOLDEN = List.of("tnl-0731-wafer.json", "every-section.json", "minimal.json");
    private static final double NM = 1e-9;

    static String resource(String name) {
        try (InputStream in = StructureJsonTest.class.getResourceAsStream(STACKS + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static Structure golden(String name) {
        return StructureJson.reader().read(resource(name), name);
    }

    @Test
    void theDemoWaferFileReadsToTheBuildersWafer() {
        ParameterSet vm = ParameterSets.named("vurgaftman-meyer-2003");
        Structure expected = Structure.builder(vm)
                .grow(Layer.of("buffer", Composition.GAN, 1800 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.26), 22 * NM))
                .grow(Layer.of("cap", Composition.GAN, 2 * NM))
                .top(TopBoundary.schottky(1.0, 0))
                .build();
        assertEquals(expected, golden("tnl-0731-wafer.json"));
    }

    @Test
    void theFileWithEverySectionReadsToTheSameBuilderCalls() {
        ParameterSet vm = ParameterSets.named("vurgaftman-meyer-2003");
        Layer buffer = Layer.of("buffer", Composition.GAN, 1.0e-6)
                .withDeepLevel(DeepLevel.acceptorLikePerCm3(1e17, 2.6))
                .withDeepLevel(DeepLevel.donorLikePerCm3(1e16, 0.5));
        Layer grade = Layer.graded("grade", Composition.alGaN(0.1), Composition.alGaN(0.3), 0.02 * 1e-6)
                .withDopant(Dopant.donorsPerCm3(1e18, 0.03))
                .withDopant(new Dopant(Dopant.Kind.ACCEPTOR, 1e22, 0.17, Dopant.ACCEPTOR_DEGENERACY));
        Layer channel = Layer.of("channel", Composition.inGaN(0.1), 3 * NM).withRelaxation(0.25)
                .withDeltaDoping(DeltaDoping.donorsPerCm2(5e12, 0.015, 1 * NM));
        Structure expected = Structure.builder(vm).grow(buffer).grow(grade).grow(channel)
                .temperature(350).polarity(Polarity.N_FACE).polarizationModel(PolarizationModel.LINEAR)
                .bandAlignment(BandAlignment.conductionBandFraction(0.63)).strainShiftsBandEdges(true)
                .onInPlaneLattice(3.189 * 1e-10)
                .top(TopBoundary.freeSurface(1.65, 1.6e13))
                .bottom(BottomBoundary.fixedFermiLevel(0.2))
                .build();
        assertEquals(expected, golden("every-section.json"));
    }

    @Test
    void omittedKeysTakeTheBuildersDefaults() {
        ParameterSet vm = ParameterSets.named("vurgaftman-meyer-2003");
        Structure expected = Structure.builder(vm).grow(Layer.of("only layer", Composition.alGaN(0.3), 100 * NM))
                .top(TopBoundary.schottky(0.8)).build();
        Structure read = golden("minimal.json");
        assertEquals(expected, read);
        assertEquals(300, read.temperatureK());
        assertEquals(vm.recommendedPolarizationModel(), read.polarizationModel());
        assertTrue(read.strainShiftsValenceSplittings());
    }

    @ParameterizedTest
    @ValueSource(strings = {"tnl-0731-wafer.json", "every-section.json", "minimal.json"})
    void everyGoldenFileSurvivesWriteAndReadBitForBit(String name) {
        Structure s = golden(name);
        String text = StructureJson.write(s);
        Structure back = StructureJson.reader().read(text, "written");
        assertEquals(s, back);
        assertEquals(text, StructureJson.write(back), "writing is stable");
        assertEquals(s, StructureJson.reader().read(StructureJson.writeCompact(s), "compact"));
        assertTrue(!StructureJson.writeCompact(s).contains("\n"));
    }

    @Test
    void theWriterRecordsTheSetsHashAndUsesCustomaryUnitsWhenExact() {
        Structure s = golden("tnl-0731-wafer.json");
        String text = StructureJson.write(s);
        assertTrue(text.contains("\"sha256\" : \"" + ParameterSetHash.sha256(s.parameters()) + "\""), text);
        assertTrue(text.contains("\"value\" : 22.0,\n") && text.contains("\"unit\" : \"nm\""), text);
    }

    @Test
    void aThicknessThatNanometresCannotHoldShortlyIsWrittenInAnotherUnit() {
        // 1800e-9 is the double nearest 1.8 um; 1800 * 1e-9 is another double (1.8000000000000001E-6),
        // so "1800 nm" would not read back to it (IEEE 754 rounding; common practice, no source);
        // 1.8 * 1e-6 is exactly 1800e-9, so micrometres hold it in the shortest text
        Structure s = Structure.builder(ParameterSets.defaultSet()).grow(Layer.of("buffer", Composition.GAN, 1800e-9))
                .top(TopBoundary.schottky(1)).build();
        String text = StructureJson.write(s);
        assertTrue(text.contains("\"value\" : 1.8,\n        \"unit\" : \"um\""), text);
        assertEquals(s, StructureJson.reader().read(text, "m"));
    }

    @Test
    void aValueThatTheCustomaryUnitCannotHoldExactlyIsWrittenInSi() {
        // 0.1 + 0.2 nm in metres is not k * 1e-9 for any double k that converts back exactly
        double t = (0.1 + 0.2) * 1e-9 + Math.ulp(1e-9) * 3;
        Structure s = Structure.builder(ParameterSets.defaultSet()).grow(Layer.of("odd", Composition.GAN, 10 * NM))
                .grow(Layer.of("thin", Composition.ALN, t)).top(TopBoundary.schottky(1)).build();
        Structure back = StructureJson.reader().read(StructureJson.write(s), "si");
        assertEquals(s, back);
        assertEquals(Double.doubleToRawLongBits(t), Double.doubleToRawLongBits(back.layersBottomUp().get(1).thickness()));
    }

    @Test
    void filesAndTheServiceLoaderGiveTheSameResult(@TempDir Path dir) throws IOException {
        Structure s = golden("every-section.json");
        Path f = dir.resolve("stack.json");
        StructureJson.writeFile(s, f);
        assertEquals(s, StructureJson.readFile(f));
        StructureCodec codec = StructureCodec.installed().orElseThrow();
        assertEquals(StructureJson.FORMAT_VERSION, codec.formatVersion());
        assertEquals(2, codec.formatVersion());
        assertEquals(Files.readString(f), codec.write(s));
        assertEquals(s, codec.read(codec.writeCompact(s), "codec"));
    }

    /**
     * Model choices that format version 1 cannot hold are refused when version 1 is asked for, not
     * dropped: a gate stack, an interface sheet and a fully ionized dopant would otherwise read back
     * as another stack. The default writer (version 2) holds them.
     */
    @Test
    void modelChoicesBeyondVersionOneAreRefusedByVersionOneAndHeldByVersionTwo() {
        Structure.Builder b = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", org.wurtzkit.material.Composition.GAN, 500 * NM));
        Structure gated = b.grow(Layer.of("barrier", org.wurtzkit.material.Composition.alGaN(0.25), 20 * NM))
                .deposit(org.wurtzkit.structure.InsulatorLayer.ofNm(org.wurtzkit.material.Insulators.AL2O3, 10))
                .top(TopBoundary.schottky(3)).build();
        StructureFormatException e = assertThrows(StructureFormatException.class, () -> StructureJson.write(gated, 1));
        assertEquals(StructureFormatException.Reason.NOT_WRITABLE, e.reason());
        assertTrue(e.getMessage().contains("gate stack"), e.getMessage());
        assertEquals(gated, StructureJson.reader().read(StructureJson.write(gated), "v2"));
        assertTrue(StructureJson.write(gated).contains("\"builtIn\" : \"Al2O3\""), "a built-in insulator goes by name");
        Structure full = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", org.wurtzkit.material.Composition.GAN, 500 * NM)
                        .withDopant(org.wurtzkit.structure.Dopant.donorsPerCm3(1e17, 0.02).fullyIonized()))
                .top(TopBoundary.schottky(1)).build();
        StructureFormatException f = assertThrows(StructureFormatException.class, () -> StructureJson.write(full, 1));
        assertTrue(f.getMessage().contains("fully ionized dopant in layer \"buffer\""), f.getMessage());
        assertEquals(full, StructureJson.reader().read(StructureJson.write(full), "v2"));
        assertTrue(StructureJson.write(full).contains("\"ionization\" : \"full\""));
    }

    @Test
    void aCustomMaterialLayerIsRefusedByVersionOneAndStandsAloneInVersionTwo() {
        WurtziteMaterial gan = ParameterSets.defaultSet().binary(org.wurtzkit.material.Binary.GAN);
        Structure s = Structure.builder(ParameterSets.defaultSet()).grow(Layer.of("own", gan, 100 * NM))
                .top(TopBoundary.schottky(1)).build();
        StructureFormatException e = assertThrows(StructureFormatException.class, () -> StructureJson.write(s, 1));
        assertEquals(StructureFormatException.Reason.NOT_WRITABLE, e.reason());
        assertTrue(e.getMessage().contains("\"own\""), e.getMessage());
        String text = StructureJson.write(s);
        Structure back = StructureJson.reader().read(text, "v2");
        assertEquals(s, back);
        WurtziteMaterial read = ((org.wurtzkit.structure.LayerMaterial.Custom) back.layersBottomUp().get(0).material())
                .material();
        for (org.wurtzkit.material.MaterialParameter p : org.wurtzkit.material.MaterialParameter.values()) {
            assertEquals(gan.source(p), read.source(p), p.key() + ": the provenance travels with the value");
        }
        assertEquals(gan.bandGap(), read.bandGap());
    }

    @Test
    void theWriterWritesTheNewestVersionUnlessAskedAndRefusesAnUnknownOne() {
        Structure s = golden("tnl-0731-wafer.json");
        assertTrue(StructureJson.write(s).contains("\"formatVersion\" : 2,"));
        assertTrue(StructureJson.write(s, 1).contains("\"formatVersion\" : 1,"));
        assertTrue(StructureJson.writeCompact(s, 1).startsWith("{\"formatVersion\":1,"));
        assertEquals(s, StructureJson.reader().read(StructureJson.write(s, 1), "v1"));
        org.wurtzkit.errors.InvalidParameterException e = assertThrows(
                org.wurtzkit.errors.InvalidParameterException.class, () -> StructureJson.write(s, 3));
        assertTrue(e.getMessage().contains("stack format version"), e.getMessage());
        assertEquals(1, StructureJson.formatVersionOf(resource("tnl-0731-wafer.json"), "v1"));
        assertEquals(2, StructureJson.formatVersionOf(StructureJson.write(s), "v2"));
        StructureFormatException old = assertThrows(StructureFormatException.class,
                () -> StructureJson.formatVersionOf("{\"formatVersion\": 3}", "v3.json"));
        assertEquals(StructureFormatException.Reason.UNSUPPORTED_VERSION, old.reason());
        assertEquals(StructureJson.SCHEMA_RESOURCE_V1, StructureJson.schemaResource(1));
        assertEquals(StructureJson.SCHEMA_RESOURCE, StructureJson.schemaResource(2));
    }
}
