package org.wurtzkit.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.testing.A00TestSet;

class MaterialTest {
    private static final ParameterSet SET = A00TestSet.INSTANCE;

    @Test
    void binaryCompositionsResolveToTheBinaries() {
        assertSame(SET.binary(Binary.GAN), SET.material(Composition.GAN));
        assertSame(SET.binary(Binary.ALN), SET.material(Composition.alGaN(1)));
        assertSame(SET.binary(Binary.INN), SET.material(Composition.inGaN(1)));
        // -0.0 passes the range check; it must still mean the binary (it used to resolve as an
        // "alloy" with an empty bowing-source list)
        assertEquals(Composition.GAN, Composition.alGaN(-0.0));
        assertSame(SET.binary(Binary.GAN), SET.material(Composition.alGaN(-0.0)));
        assertSame(SET.binary(Binary.GAN), SET.material(Composition.inGaN(-0.0)));
    }

    /** A00's linear a(x) = -0.077x + 3.189 Angstrom is Vegard's law between its end points. */
    @Test
    void latticeConstantFollowsVegard() {
        assertEquals((-0.077 * 0.37 + 3.189) * 1e-10, SET.material(Composition.alGaN(0.37)).latticeA(), 1e-24);
    }

    /**
     * Eg(x) = x Eg(AlN) + (1-x) Eg(GaN) - b x(1-x), b = 1.0 eV in A00 (Ambacher et al., J. Appl. Phys. 87, 334 (2000), from memory). The bowing
     * acts on Eg(0 K); Varshni's alpha and beta follow Vegard's law, so at 300 K A00's formula (written for
     * 300 K) is met to within the few meV by which the interpolated Varshni shift differs.
     */
    @Test
    void gapBowsDownward() {
        double x = 0.3;
        WurtziteMaterial m = SET.material(Composition.alGaN(x));
        double eg0 = x * SET.binary(Binary.ALN).bandGap().gap0KEv() + (1 - x) * SET.binary(Binary.GAN).bandGap().gap0KEv()
                - 1.0 * x * (1 - x);
        assertEquals(eg0, m.bandGap().gap0KEv(), 1e-12);
        double a00At300 = 6.13 * x + 3.42 * (1 - x) - 1.0 * x * (1 - x);
        assertEquals(a00At300, m.bandGap().atTemperature(300), 0.005);
        assertTrue(m.source(MaterialParameter.BAND_GAP_0K).rule().contains("b(AlGaN) = 1"),
                m.source(MaterialParameter.BAND_GAP_0K).rule());
        assertTrue(m.source(MaterialParameter.BAND_GAP_0K).sources().contains(A00TestSet.A00));
    }

    /** Varshni, Physica 34, 149 (1967) with VM03 GaN constants: Eg(300 K) = 3.438 eV (computed). */
    @Test
    void varshni() {
        BandGap g = new BandGap(3.510, 0.909e-3, 830);
        assertEquals(3.438, g.atTemperature(300), 0.0005);
        assertThrows(InvalidParameterException.class, () -> g.atTemperature(0));
        assertThrows(InvalidParameterException.class, () -> g.atTemperature(-5));
        assertThrows(InvalidParameterException.class, () -> g.atTemperature(1e5));
    }

    @Test
    void quaternaryAppliesAllThreeBowingTerms() {
        Composition c = Composition.alInGaN(0.2, 0.1);
        double z = 0.7;
        double vegard = 0.2 * SET.binary(Binary.ALN).get(MaterialParameter.BAND_GAP_0K)
                + 0.1 * SET.binary(Binary.INN).get(MaterialParameter.BAND_GAP_0K)
                + z * SET.binary(Binary.GAN).get(MaterialParameter.BAND_GAP_0K);
        double expected = vegard - 1.0 * 0.2 * z - 1.4 * 0.1 * z - 2.5 * 0.2 * 0.1;
        assertEquals(expected, SET.material(c).get(MaterialParameter.BAND_GAP_0K), 1e-12);
    }

    @Test
    void everyParameterHasAProvenance() {
        WurtziteMaterial m = SET.material(Composition.alInGaN(0.3, 0.05));
        for (MaterialParameter p : MaterialParameter.values()) {
            java.util.List<Source> cited = m.source(p).sources();
            if (p == MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING) {
                // a quaternary uses all three polarization bowing terms, each with its source
                assertTrue(cited.contains(SET.bowing().polarizationAlGaN().source()), p.key());
                assertTrue(cited.contains(SET.bowing().polarizationInGaN().source()), p.key());
                assertTrue(cited.contains(SET.bowing().polarizationInAlN().source()), p.key());
            } else {
                // Vegard's law over three binaries cites each binary's source of that value
                for (Binary b : Binary.values()) {
                    assertTrue(cited.containsAll(SET.binary(b).source(p).sources()), p.key() + " from " + b);
                }
            }
        }
    }

    @Test
    void customMaterialFromBuilder() {
        WurtziteMaterial ours = SET.binary(Binary.GAN).toBuilder("GaN, our C13")
                .set(MaterialParameter.C13, 98e9, Source.of("lab", "in-house Brillouin scattering (demo)"))
                .build();
        assertEquals(98e9, ours.elastic().c13());
        assertEquals("lab", ours.source(MaterialParameter.C13).sources().get(0).key());
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> WurtziteMaterial.builder("incomplete").build());
        assertTrue(e.getMessage().contains("missing"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource({"-0.1, 0, Al fraction x", "1.1, 0, Al fraction x", "0, -0.2, In fraction y", "0, 1.01, In fraction y",
            "0.6, 0.5, Al + In fraction x + y", "NaN, 0, Al fraction x", "0, Infinity, In fraction y"})
    void compositionOutOfRangeIsRejected(double x, double y, String parameter) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> new Composition(x, y));
        assertEquals(parameter, e.parameter());
        assertTrue(e.getMessage().contains("[0, 1]"), e.getMessage());
        assertTrue(e.getMessage().contains(parameter + " = "), e.getMessage());
    }

    @Test
    void nonFiniteMaterialValueIsRejected() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> WurtziteMaterial.builder("m").set(MaterialParameter.C11, Double.NaN, A00TestSet.FILLER));
        assertTrue(e.getMessage().contains("C11 of m = NaN"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> SET.binary(Binary.GAN).toBuilder("neg")
                .set(MaterialParameter.C33, -1, A00TestSet.FILLER).build());
    }

    @Test
    void formulas() {
        assertEquals("Al0.25Ga0.75N", Composition.alGaN(0.25).formula());
        assertEquals("In0.18Al0.82N", Composition.inAlN(0.18).formula());
        assertEquals("GaN", Composition.GAN.formula());
        assertEquals("Al0.1In0.2Ga0.7N", Composition.alInGaN(0.1, 0.2).formula());
    }
}
