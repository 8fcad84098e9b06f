package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.reliability.BadInput.row;
import static org.wurtzkit.units.Units.NM;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.BandGap;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarization;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.strain.Strain;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.A00TestSet;
import org.wurtzkit.units.Units;

/**
 * Bad-input table of core (issue #7): every public entry point of compositions, materials,
 * temperatures, strain, polarization and the structure description rejects NaN, infinities and
 * out-of-range values with an {@link InvalidParameterException} that names the parameter, the value
 * and the allowed range (or, for a structural mistake, a {@link org.wurtzkit.errors.WurtzkitException}
 * of kind INVALID_STRUCTURE). The allowed ranges expected here are the ones the Javadoc of each
 * entry point documents; a second table checks that the documented end points themselves are
 * accepted, so that no check is broader than its documentation.
 */
@Tag("reliability")
class CoreBadInputTest {
    private static final ParameterSet SET = A00TestSet.INSTANCE;
    private static final WurtziteMaterial GAN = SET.binary(Binary.GAN);
    private static final double INF = Double.POSITIVE_INFINITY;
    private static final double NAN = Double.NaN;
    private static final Source SRC = Source.of("T", "reliability test");

    private static Structure.Builder oneLayer() {
        return Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 100 * NM));
    }

    // ---------------------------------------------------------------- compositions

    static Stream<Arguments> compositions() {
        String x = "Al fraction x";
        String y = "In fraction y";
        return Stream.of(
                row("Al NaN", () -> new Composition(NAN, 0), x, NAN, "[0, 1]"),
                row("Al +inf", () -> Composition.alGaN(INF), x, INF, "[0, 1]"),
                row("Al -inf", () -> Composition.alGaN(-INF), x, -INF, "[0, 1]"),
                row("Al negative", () -> Composition.alGaN(-0.01), x, -0.01, "[0, 1]"),
                row("Al above 1", () -> Composition.alGaN(1.2), x, 1.2, "[0, 1]"),
                row("In NaN", () -> Composition.inGaN(NAN), y, NAN, "[0, 1]"),
                row("In +inf", () -> Composition.inGaN(INF), y, INF, "[0, 1]"),
                row("In negative", () -> Composition.inGaN(-1e-9), y, -1e-9, "[0, 1]"),
                row("In above 1", () -> Composition.inGaN(1.0000001), y, 1.0000001, "[0, 1]"),
                row("InAlN with In above 1", () -> Composition.inAlN(1.5), y, 1.5, "[0, 1]"),
                row("InAlN with In NaN", () -> Composition.inAlN(NAN), y, NAN, "[0, 1]"),
                row("x + y above 1", () -> Composition.alInGaN(0.7, 0.4), "Al + In fraction x + y",
                        Double.toString(0.7 + 0.4), "[0, 1] (x = 0.7, y = 0.4)"),
                row("x + y just above round-off", () -> new Composition(0.5, 0.5 + 1e-9), "Al + In fraction x + y",
                        Double.toString(0.5 + (0.5 + 1e-9)), "[0, 1] (x = 0.5, y = " + (0.5 + 1e-9) + ")"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("compositions")
    void compositionRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    // ---------------------------------------------------------------- materials

    private static WurtziteMaterial.Builder ganVariant() {
        return GAN.toBuilder("v");
    }

    static Stream<Arguments> materials() {
        String fin = "(finite)";
        String pos = "(0, +inf), finite";
        return Stream.of(
                row("null name", () -> WurtziteMaterial.builder(null), "material name", "null", "(non-null)"),
                row("C13 NaN", () -> ganVariant().set(MaterialParameter.C13, NAN, SRC), "C13 of v", NAN, fin),
                row("C13 +inf", () -> ganVariant().set(MaterialParameter.C13, INF, SRC), "C13 of v", INF, fin),
                row("Eg0 -inf", () -> ganVariant().set(MaterialParameter.BAND_GAP_0K, -INF, SRC), "Eg0 of v", -INF, fin),
                row("Psp NaN", () -> ganVariant().set(MaterialParameter.SPONTANEOUS_POLARIZATION, NAN, SRC),
                        "Psp of v", NAN, fin),
                row("null provenance", () -> ganVariant().set(MaterialParameter.C13, 1e11, (Provenance) null),
                        "provenance of C13", "null", "(non-null)"),
                row("nothing set", () -> WurtziteMaterial.builder("empty").build(), "a of empty", "missing",
                        "(a finite value must be set)"),
                row("negative lattice constant", () -> ganVariant().set(MaterialParameter.LATTICE_A, -3.189e-10, SRC)
                        .build(), "a of v", -3.189e-10, pos),
                row("zero C33", () -> ganVariant().set(MaterialParameter.C33, 0, SRC).build(), "C33 of v", 0.0, pos),
                row("negative electron mass", () -> ganVariant().set(MaterialParameter.ELECTRON_MASS_PARALLEL, -0.2, SRC)
                        .build(), "me_par of v", -0.2, pos),
                row("zero permittivity", () -> ganVariant().set(MaterialParameter.PERMITTIVITY_STATIC, 0, SRC).build(),
                        "eps_static of v", 0.0, pos),
                row("negative gap", () -> ganVariant().set(MaterialParameter.BAND_GAP_0K, -1, SRC).build(),
                        "Eg0 of v", -1.0, pos),
                row("negative Varshni alpha", () -> ganVariant().set(MaterialParameter.VARSHNI_ALPHA, -1e-4, SRC)
                        .build(), "varshni_alpha of v", -1e-4, "[0, +inf), finite"),
                row("blank source key", () -> new Source(" ", "c", ""), "source key", "\"\"", "(non-blank text)"),
                row("null source key", () -> new Source(null, "c", ""), "source key", "null", "(non-null)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("materials")
    void materialRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    // ---------------------------------------------------------------- temperatures

    static Stream<Arguments> temperatures() {
        String t = "temperature (K)";
        String r = "(0, 2000]";
        return Stream.of(
                row("band gap at 0 K", () -> GAN.bandGap().atTemperature(0), t, 0.0, r),
                row("band gap at -1 K", () -> GAN.bandGap().atTemperature(-1), t, -1.0, r),
                row("band gap at NaN", () -> GAN.bandGap().atTemperature(NAN), t, NAN, r),
                row("band gap at +inf", () -> GAN.bandGap().atTemperature(INF), t, INF, r),
                row("conduction edge at 2000.5 K", () -> GAN.conductionBandEdgeEv(2000.5), t, 2000.5, r),
                row("structure at 0 K", () -> oneLayer().temperatureK(0), t, 0.0, r),
                row("structure at -0.0 K", () -> oneLayer().temperatureK(-0.0), t, -0.0, r),
                row("structure at NaN", () -> oneLayer().temperatureK(NAN), t, NAN, r),
                row("structure at +inf", () -> oneLayer().temperatureK(INF), t, INF, r),
                row("structure at -inf", () -> oneLayer().temperatureK(-INF), t, -INF, r),
                row("structure at 1e6 K", () -> oneLayer().temperatureK(1e6), t, 1e6, r),
                row("withTemperatureK(NaN)", () -> oneLayer().top(TopBoundary.schottky(1).atBiasV(0)).build()
                        .withTemperatureK(NAN), t, NAN, r));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("temperatures")
    void temperatureRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    // ---------------------------------------------------------------- strain, critical thickness, polarization

    static Stream<Arguments> strain() {
        String a = "in-plane lattice constant a_s (m)";
        String pos = "(0, +inf), finite";
        String r = "relaxation r";
        return Stream.of(
                row("eps_xx NaN", () -> new Strain(NAN, 0), "strain eps_xx", NAN, "(finite)"),
                row("eps_xx +inf", () -> new Strain(INF, 0), "strain eps_xx", INF, "(finite)"),
                row("eps_zz -inf", () -> new Strain(0, -INF), "strain eps_zz", -INF, "(finite)"),
                row("a_s NaN", () -> Strain.pseudomorphic(GAN, NAN, 0), a, NAN, pos),
                row("a_s zero", () -> Strain.pseudomorphic(GAN, 0, 0), a, 0.0, pos),
                row("a_s negative", () -> Strain.pseudomorphic(GAN, -3.189e-10, 0), a, -3.189e-10, pos),
                row("a_s +inf", () -> Strain.pseudomorphic(GAN, INF, 0), a, INF, pos),
                row("relaxation NaN", () -> Strain.pseudomorphic(GAN, 3.189e-10, NAN), r, NAN, "[0, 1]"),
                row("relaxation negative", () -> Strain.pseudomorphic(GAN, 3.189e-10, -0.1), r, -0.1, "[0, 1]"),
                row("relaxation above 1", () -> Strain.pseudomorphic(GAN, 3.189e-10, 1.5), r, 1.5, "[0, 1]"),
                row("MB alpha NaN", () -> new CriticalThickness(NAN, 60), "dislocation angle alpha (degrees)", NAN,
                        "(0, 90]"),
                row("MB alpha above 90", () -> new CriticalThickness(91, 60), "dislocation angle alpha (degrees)", 91.0,
                        "(0, 90]"),
                row("MB lambda 90", () -> new CriticalThickness(60, 90), "slip angle lambda (degrees)", 90.0, "[0, 90)"),
                row("MB lambda NaN", () -> new CriticalThickness(60, NAN), "slip angle lambda (degrees)", NAN,
                        "[0, 90)"),
                row("MB lambda negative", () -> new CriticalThickness(60, -1), "slip angle lambda (degrees)", -1.0,
                        "[0, 90)"),
                row("cracking Gamma zero", () -> new CriticalThicknessModel.ChannelCracking(0),
                        "fracture resistance Gamma (J/m^2)", 0.0, "(0, 1000]"),
                row("cracking Gamma NaN", () -> new CriticalThicknessModel.ChannelCracking(NAN),
                        "fracture resistance Gamma (J/m^2)", NAN, "(0, 1000]"),
                row("cracking Gamma above 1000", () -> new CriticalThicknessModel.ChannelCracking(2000),
                        "fracture resistance Gamma (J/m^2)", 2000.0, "(0, 1000]"),
                row("c-plane model without slip part", () -> new CriticalThicknessModel.CPlaneWurtzite(null,
                        CriticalThicknessModel.ChannelCracking.EINFELDT_2000), "slip model", "null", "(non-null)"),
                row("derived set with blank name", () -> A00TestSet.INSTANCE.derive(" "), "derived set name", "\" \"",
                        "non-blank text"),
                row("derived set value NaN", () -> A00TestSet.INSTANCE.derive("d").set(Binary.GAN,
                        MaterialParameter.C13, NAN, Source.of("S", "test")), "C13 of GaN", NAN, "(finite)"),
                row("derived set value implausible", () -> A00TestSet.INSTANCE.derive("d").set(Binary.GAN,
                        MaterialParameter.LATTICE_A, 0.3189e-10, Source.of("S", "test")).build(), "a of GaN (d)",
                        "0.3189 Angstrom", "[2.5, 4] Angstrom (the plausible range for a wurtzite nitride; a value"
                                + " outside it is usually a unit slip)"),
                row("reload through a null loader", () -> ParameterSets.reload(null), "class loader", "null",
                        "(non-null)"),
                row("polarization model without spontaneous part",
                        () -> new PolarizationModel(null, PolarizationModel.Piezoelectric.LINEAR),
                        "spontaneous polarization model", "null", "(non-null)"),
                row("polarization model without piezoelectric part",
                        () -> new PolarizationModel(PolarizationModel.Spontaneous.VEGARD, null),
                        "piezoelectric polarization model", "null", "(non-null)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("strain")
    void strainAndPolarizationReject(BadInput.Case c) {
        BadInput.check(c);
    }

    /**
     * The Javadoc of {@link CriticalThickness} documents alpha in (0, 90]: alpha = 0 lies outside
     * (a dislocation line parallel to its Burgers vector is a screw dislocation, which relieves no
     * misfit). The check must follow the documented range.
     */
    @Test
    void criticalThicknessRejectsAlphaZeroAsDocumented() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> new CriticalThickness(0, 60));
        assertTrue(e.getMessage().contains("dislocation angle alpha (degrees) = 0.0"), e.getMessage());
        assertTrue(e.allowedRange().startsWith("(0"), e.getMessage());
    }

    /**
     * Polarization is a value record like {@link Strain}, which rejects non-finite components; a
     * NaN polarization would propagate silently into every bound charge (DEVELOPERS.md: nothing
     * returns a silent wrong number).
     */
    static Stream<Arguments> polarizationRecord() {
        return Stream.of(
                Arguments.of("P_sp NaN", (Executable) () -> new Polarization(NAN, 0)),
                Arguments.of("P_pz +inf", (Executable) () -> new Polarization(-0.029, INF)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("polarizationRecord")
    void polarizationRejectsNonFiniteComponents(String label, Executable action) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, action, label);
        assertTrue(e.getMessage().contains(" = ") && e.getMessage().contains("allowed range"), e.getMessage());
    }

    /**
     * Interpolation positions are documented in [0, 1] ({@link Composition#interpolate}: "t position
     * in [0, 1]"; {@code LayerMaterial.at}: "0 at its bottom and 1 at its top"); outside it they
     * extrapolate to a different, valid-looking alloy without a word.
     */
    static Stream<Arguments> positions() {
        org.wurtzkit.structure.LayerMaterial graded = new org.wurtzkit.structure.LayerMaterial.Graded(Composition.GAN,
                Composition.alGaN(0.2));
        return Stream.of(
                Arguments.of("interpolate at t = 2", (Executable) () -> Composition.GAN.interpolate(Composition.alGaN(0.2), 2)),
                Arguments.of("interpolate at t = -0.5", (Executable) () -> Composition.alGaN(0.2)
                        .interpolate(Composition.alGaN(0.1), -0.5)),
                Arguments.of("interpolate at t = NaN", (Executable) () -> Composition.GAN.interpolate(Composition.ALN, NAN)),
                Arguments.of("graded layer at 1.5", (Executable) () -> graded.at(1.5, SET)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("positions")
    void positionsOutsideTheirDocumentedRangeAreRejected(String label, Executable action) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, action, label);
        assertTrue(e.allowedRange().contains("[0, 1]") && !e.parameter().contains("fraction"),
                "the position, not a fraction, must be named: " + e.getMessage());
    }

    /**
     * A missing argument of a public entry point: the convention (DEVELOPERS.md, "Errors";
     * {@code Require.nonNull}, used by most entry points) is an InvalidParameterException naming the
     * parameter, not a NullPointerException from inside the computation.
     */
    static Stream<Arguments> nulls() {
        Strain s = Strain.pseudomorphic(GAN, 3.189e-10, 0);
        return Stream.of(
                Arguments.of("Polarization.of, null model", (Executable) () -> Polarization.of(GAN, s, null)),
                Arguments.of("Polarization.of, null material",
                        (Executable) () -> Polarization.of(null, s, PolarizationModel.LINEAR)),
                Arguments.of("Polarization.of, null strain",
                        (Executable) () -> Polarization.of(GAN, null, PolarizationModel.LINEAR)),
                Arguments.of("Strain.pseudomorphic, null material",
                        (Executable) () -> Strain.pseudomorphic(null, 3.189e-10, 0)),
                Arguments.of("material builder, null source",
                        (Executable) () -> ganVariant().set(MaterialParameter.C13, 1e11, (Source) null)),
                Arguments.of("material builder, null parameter", (Executable) () -> ganVariant().set(null, 1e11, SRC)),
                Arguments.of("structure on a null relaxed template", (Executable) () -> oneLayer().onRelaxed(null)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("nulls")
    void nullArgumentsAreRejectedByName(String label, Executable action) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, action, label);
        assertTrue(e.value().equals("null"), e.getMessage());
    }

    // ---------------------------------------------------------------- layers, dopants, deep levels, sheets

    static Stream<Arguments> layers() {
        String th = "thickness of layer \"b\" (m)";
        String thr = "(0, 0.001]";
        String rel = "relaxation of layer \"b\"";
        Layer ok = Layer.of("b", Composition.GAN, 10 * NM);
        return Stream.of(
                row("zero thickness", () -> Layer.of("b", Composition.GAN, 0), th, 0.0, thr),
                row("negative thickness", () -> Layer.of("b", Composition.GAN, -1 * NM), th, -1 * NM, thr),
                row("NaN thickness", () -> Layer.of("b", Composition.GAN, NAN), th, NAN, thr),
                row("+inf thickness", () -> Layer.of("b", Composition.GAN, INF), th, INF, thr),
                row("thickness above 1 mm", () -> Layer.of("b", Composition.GAN, 2e-3), th, 2e-3, thr),
                row("graded layer, zero thickness", () -> Layer.graded("b", Composition.GAN, Composition.alGaN(0.2), 0),
                        th, 0.0, thr),
                row("custom material, negative thickness", () -> Layer.of("b", GAN, -5 * NM), th, -5 * NM, thr),
                row("withThickness(NaN)", () -> ok.withThickness(NAN), th, NAN, thr),
                row("withThickness(-0.0)", () -> ok.withThickness(-0.0), th, -0.0, thr),
                row("relaxation NaN", () -> ok.withRelaxation(NAN), rel, NAN, "[0, 1]"),
                row("relaxation negative", () -> ok.withRelaxation(-0.5), rel, -0.5, "[0, 1]"),
                row("relaxation above 1", () -> ok.withRelaxation(1.01), rel, 1.01, "[0, 1]"),
                row("null composition", () -> Layer.of("b", (Composition) null, 10 * NM), "layer composition", "null",
                        "(non-null)"),
                row("null name", () -> Layer.of(null, Composition.GAN, 10 * NM), "layer name", "null", "(non-null)"),
                row("delta sheet below its layer", () -> ok.withDeltaDoping(DeltaDoping.donorsPerCm2(1e12, 0.02).atOffset(11 * NM)),
                        "delta sheet offset in layer \"b\" (m)", 11 * NM, "[0, " + 10 * NM + "] (the layer's thickness)"),
                // issue #14: the canonical constructor threw a NullPointerException from List.copyOf
                row("null dopant list", () -> new Layer("b", ok.material(), 10 * NM, null, List.of(), List.of(), 0),
                        "dopants of layer \"b\"", "null", "(non-null)"),
                row("null deep-level list", () -> new Layer("b", ok.material(), 10 * NM, List.of(), null, List.of(), 0),
                        "deep levels of layer \"b\"", "null", "(non-null)"),
                row("null delta-sheet list", () -> new Layer("b", ok.material(), 10 * NM, List.of(), List.of(), null, 0),
                        "delta sheets of layer \"b\"", "null", "(non-null)"),
                row("null dopant in the list", () -> new Layer("b", ok.material(), 10 * NM,
                        Arrays.asList(Dopant.donorsPerCm3(1e17, 0.02), null), List.of(), List.of(), 0),
                        "dopants of layer \"b\"[1]", "null", "(non-null)"),
                row("null deep level in the list", () -> new Layer("b", ok.material(), 10 * NM, List.of(),
                        Arrays.asList((DeepLevel) null), List.of(), 0), "deep levels of layer \"b\"[0]", "null",
                        "(non-null)"),
                // issue #14: a top layer of Double.MIN_VALUE m failed inside the mesh with a negative breakpoint
                row("thickness Double.MIN_VALUE", () -> Layer.of("b", Composition.GAN, Double.MIN_VALUE), th,
                        Double.MIN_VALUE, "[1.0E-12, 0.001] (below 1 pm: a unit slip?)"),
                row("thickness 0.5 pm", () -> ok.withThickness(0.5e-12), th, 0.5e-12,
                        "[1.0E-12, 0.001] (below 1 pm: a unit slip?)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("layers")
    void layerRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    static Stream<Arguments> dopants() {
        String dd = "dopant density (m^-3)";
        String ddr = "[0, 1.0E28]";
        String de = "dopant ionization energy (eV)";
        String dl = "deep level density (m^-3)";
        String dle = "deep level energy below E_c (eV)";
        String ds = "delta sheet density (m^-2)";
        return Stream.of(
                row("donors NaN", () -> Dopant.donorsPerCm3(NAN, 0.02), dd, NAN, ddr),
                row("donors +inf", () -> Dopant.donorsPerCm3(INF, 0.02), dd, INF, ddr),
                row("donors negative", () -> Dopant.donorsPerCm3(-1e17, 0.02), dd, Units.perCm3ToPerM3(-1e17), ddr),
                row("donors above 1e22 cm^-3", () -> Dopant.donorsPerCm3(1e23, 0.02), dd, Units.perCm3ToPerM3(1e23), ddr),
                row("acceptors NaN", () -> Dopant.acceptorsPerCm3(NAN, 0.17), dd, NAN, ddr),
                row("acceptors -inf", () -> Dopant.acceptorsPerCm3(-INF, 0.17), dd, -INF, ddr),
                row("donor energy negative", () -> Dopant.donorsPerCm3(1e17, -0.01), de, -0.01, "[0, 2]"),
                row("acceptor energy above 2 eV", () -> Dopant.acceptorsPerCm3(1e17, 2.5), de, 2.5, "[0, 2]"),
                row("donor energy NaN", () -> Dopant.donorsPerCm3(1e17, NAN), de, NAN, "[0, 2]"),
                row("zero degeneracy", () -> new Dopant(Dopant.Kind.DONOR, 1e23, 0.02, 0), "dopant degeneracy factor",
                        0.0, "(0, +inf), finite"),
                row("NaN degeneracy", () -> new Dopant(Dopant.Kind.DONOR, 1e23, 0.02, NAN), "dopant degeneracy factor",
                        NAN, "(0, +inf), finite"),
                row("null dopant kind", () -> new Dopant(null, 1e23, 0.02, 2), "dopant kind", "null", "(non-null)"),
                row("deep level density NaN", () -> DeepLevel.acceptorLikePerCm3(NAN, 1.0), dl, NAN, ddr),
                row("deep level density negative", () -> DeepLevel.donorLikePerCm3(-1, 1.0), dl,
                        Units.perCm3ToPerM3(-1), ddr),
                row("deep level energy negative", () -> DeepLevel.acceptorLikePerCm3(1e17, -0.1), dle, -0.1, "[0, 7]"),
                row("deep level energy above 7 eV", () -> DeepLevel.acceptorLikePerCm3(1e17, 7.5), dle, 7.5, "[0, 7]"),
                row("deep level energy +inf", () -> DeepLevel.donorLikePerCm3(1e17, INF), dle, INF, "[0, 7]"),
                row("delta sheet NaN", () -> DeltaDoping.donorsPerCm2(NAN, 0.02).atOffset(0), ds, NAN, "[0, 1.0E19]"),
                row("delta sheet negative", () -> DeltaDoping.donorsPerCm2(-1e12, 0.02).atOffset(0), ds,
                        Units.perCm2ToPerM2(-1e12), "[0, 1.0E19]"),
                row("delta sheet energy above 2", () -> DeltaDoping.donorsPerCm2(1e12, 3).atOffset(0),
                        "delta doping ionization energy (eV)", 3.0, "[0, 2]"),
                row("delta sheet offset negative", () -> DeltaDoping.donorsPerCm2(1e12, 0.02).atOffset(-1e-9),
                        "delta sheet offset from layer top (m)", -1e-9, "[0, +inf), finite"),
                row("delta sheet offset NaN", () -> DeltaDoping.donorsPerCm2(1e12, 0.02).atOffset(NAN),
                        "delta sheet offset from layer top (m)", NAN, "[0, +inf), finite"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("dopants")
    void dopingRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    // ---------------------------------------------------------------- boundaries and the builder

    static Stream<Arguments> boundaries() {
        String phi = "Schottky barrier height (eV)";
        String v = "gate bias (V)";
        String vr = "[-100, 20]";
        String ed = "surface donor energy below E_c (eV)";
        String ns = "surface donor density (m^-2)";
        String fb = "E_c - E_F at the bottom (eV)";
        String lat = "in-plane reference lattice constant (m)";
        String latr = "[2.5E-10, 4.0E-10]";
        return Stream.of(
                row("barrier NaN", () -> TopBoundary.schottky(NAN).atBiasV(0), phi, NAN, "[0, 6]"),
                row("barrier negative", () -> TopBoundary.schottky(-0.1).atBiasV(0), phi, -0.1, "[0, 6]"),
                row("barrier above 6 eV", () -> TopBoundary.schottky(6.5).atBiasV(0), phi, 6.5, "[0, 6]"),
                row("barrier +inf", () -> TopBoundary.schottky(INF).atBiasV(0), phi, INF, "[0, 6]"),
                row("bias NaN", () -> TopBoundary.schottky(1).atBiasV(NAN), v, NAN, vr),
                row("bias +inf", () -> TopBoundary.schottky(1).atBiasV(INF), v, INF, vr),
                row("bias -inf", () -> TopBoundary.schottky(1).atBiasV(-INF), v, -INF, vr),
                row("bias above 20 V", () -> TopBoundary.schottky(1).atBiasV(21), v, 21.0, vr),
                row("bias below -100 V", () -> TopBoundary.schottky(1).atBiasV(-150), v, -150.0, vr),
                row("withBias(NaN)", () -> TopBoundary.schottky(1).atBiasV(0).atBiasV(NAN), v, NAN, vr),
                row("surface donor energy NaN", () -> TopBoundary.freeSurfacePerCm2(NAN, 1e13), ed, NAN, "[0, 6]"),
                row("surface donor energy negative", () -> TopBoundary.freeSurfacePerCm2(-1, 1e13), ed, -1.0, "[0, 6]"),
                row("surface donor density NaN", () -> TopBoundary.freeSurfacePerCm2(1.65, NAN), ns, NAN, "[0, 1.0E20]"),
                row("surface donor density negative", () -> TopBoundary.freeSurfacePerCm2(1.65, -1e13), ns,
                        Units.perCm2ToPerM2(-1e13), "[0, 1.0E20]"),
                row("surface donor density +inf", () -> TopBoundary.freeSurfacePerCm2(1.65, INF), ns, INF, "[0, 1.0E20]"),
                row("bottom E_c - E_F NaN", () -> BottomBoundary.fixedFermiLevel(NAN), fb, NAN, "[-1, 7]"),
                row("bottom E_c - E_F below -1", () -> BottomBoundary.fixedFermiLevel(-1.5), fb, -1.5, "[-1, 7]"),
                row("bottom E_c - E_F +inf", () -> BottomBoundary.fixedFermiLevel(INF), fb, INF, "[-1, 7]"),
                row("reference lattice NaN", () -> oneLayer().onInPlaneLattice(NAN), lat, NAN, latr),
                row("reference lattice zero", () -> oneLayer().onInPlaneLattice(0), lat, 0.0, latr),
                row("reference lattice in nm by mistake", () -> oneLayer().onInPlaneLattice(0.3189), lat, 0.3189, latr),
                row("reference lattice -inf", () -> oneLayer().onInPlaneLattice(-INF), lat, -INF, latr),
                row("null parameter set", () -> Structure.builder(null), "parameter set", "null", "(non-null)"),
                row("null layer", () -> oneLayer().grow(null), "layer", "null", "(non-null)"),
                row("null top boundary", () -> oneLayer().top(null), "top boundary", "null", "(non-null)"),
                row("null bottom boundary", () -> oneLayer().bottom(null), "bottom boundary", "null", "(non-null)"),
                row("null polarity", () -> oneLayer().polarity(null), "polarity", "null", "(non-null)"),
                row("depth below the stack", () -> oneLayer().top(TopBoundary.schottky(1).atBiasV(0)).build()
                        .pointAt(100 * NM + 1e-12), "depth (m)", 100 * NM + 1e-12, "[0, " + 100 * NM + "]"),
                row("negative depth", () -> oneLayer().top(TopBoundary.schottky(1).atBiasV(0)).build().pointAt(-1e-10),
                        "depth (m)", -1e-10, "[0, " + 100 * NM + "]"),
                row("NaN depth", () -> oneLayer().top(TopBoundary.schottky(1).atBiasV(0)).build().layerIndexAt(NAN),
                        "depth (m)", NAN, "[0, " + 100 * NM + "]"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("boundaries")
    void boundaryAndBuilderReject(BadInput.Case c) {
        BadInput.check(c);
    }

    @Test
    void emptyStackIsRejected() {
        BadInput.checkKind(() -> Structure.builder(SET).top(TopBoundary.schottky(1).atBiasV(0)).build(),
                ErrorKind.INVALID_STRUCTURE, "number of layers = 0", "[1, ...]");
    }

    @Test
    void twoTopContactsAreRejected() {
        Structure.Builder b = oneLayer().top(TopBoundary.schottky(1).atBiasV(0));
        BadInput.checkKind(() -> b.top(TopBoundary.freeSurfacePerCm2(1.65, 1e13)), ErrorKind.INVALID_STRUCTURE,
                "already set", "one top boundary");
        BadInput.checkKind(() -> b.top(TopBoundary.schottky(1).atBiasV(0)), ErrorKind.INVALID_STRUCTURE, "already set");
        // the first contact stays in force: no half-applied state
        Structure s = b.build();
        assertTrue(s.top() instanceof TopBoundary.Schottky, s.top().toString());
    }

    @Test
    void missingTopContactIsRejected() {
        BadInput.checkKind(() -> oneLayer().build(), ErrorKind.INVALID_STRUCTURE, "no top boundary");
    }

    @Test
    void unknownParameterSetNamesTheRegisteredOnes() {
        BadInput.checkKind(() -> ParameterSets.named("no-such-set"), ErrorKind.UNKNOWN_PARAMETER_SET,
                "\"no-such-set\"", "registered sets: " + ParameterSets.names());
    }

    /**
     * Provenance documents "sources: the sources of every number used (never empty)"; an empty list
     * would give a value without a source, which the data-file rules forbid.
     */
    @Test
    void provenanceWithoutSourcesIsRejected() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> new Provenance("tabulated", List.of()));
        assertTrue(e.getMessage().contains("allowed range"), e.getMessage());
    }

    // ---------------------------------------------------------------- the documented end points are accepted

    static Stream<Arguments> documentedEndPoints() {
        Layer ok = Layer.of("b", Composition.GAN, 10 * NM);
        return Stream.of(
                Arguments.of("x = 1", (Executable) () -> Composition.alGaN(1)),
                Arguments.of("y = 1", (Executable) () -> Composition.inGaN(1)),
                Arguments.of("x + y = 1", (Executable) () -> Composition.alInGaN(0.5, 0.5)),
                Arguments.of("T = 2000 K", (Executable) () -> oneLayer().temperatureK(2000)),
                Arguments.of("T = 1e-3 K", (Executable) () -> GAN.bandGap().atTemperature(1e-3)),
                Arguments.of("t = 1 mm", (Executable) () -> Layer.of("b", Composition.GAN, Layer.MAX_THICKNESS)),
                Arguments.of("r = 0 and 1", (Executable) () -> ok.withRelaxation(0).withRelaxation(1)),
                Arguments.of("phi_B = 0, V = -100", (Executable) () -> TopBoundary.schottky(0).atBiasV(-100)),
                Arguments.of("phi_B = 6, V = 20", (Executable) () -> TopBoundary.schottky(6).atBiasV(20)),
                Arguments.of("E_c - E_F = -1 and 7", (Executable) () -> {
                    BottomBoundary.fixedFermiLevel(-1);
                    BottomBoundary.fixedFermiLevel(7);
                }),
                Arguments.of("N = 1e22 cm^-3", (Executable) () -> Dopant.donorsPerCm3(1e22, 2)),
                Arguments.of("lattice 2.5 and 4.0 A", (Executable) () -> oneLayer().onInPlaneLattice(2.5e-10)
                        .onInPlaneLattice(4.0e-10)),
                Arguments.of("MB lambda 0", (Executable) () -> new CriticalThickness(90, 0)),
                Arguments.of("delta sheet at the layer bottom",
                        (Executable) () -> ok.withDeltaDoping(DeltaDoping.donorsPerCm2(1e12, 0.02).atOffset(10 * NM))),
                Arguments.of("depth 0 and total", (Executable) () -> {
                    Structure s = oneLayer().top(TopBoundary.schottky(1).atBiasV(0)).build();
                    s.pointAt(0);
                    s.pointAt(s.totalThickness());
                }),
                Arguments.of("BandGap.checkTemperature(300)", (Executable) () -> BandGap.checkTemperature(300)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("documentedEndPoints")
    void documentedEndPointsAreAccepted(String label, Executable action) {
        assertDoesNotThrow(action, label);
    }
}
