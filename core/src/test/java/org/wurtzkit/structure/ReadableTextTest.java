// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.strain.BandEdgeShift;
import org.wurtzkit.testing.A00TestSet;

/**
 * The toString of the structure and of its small records: short, with units, and the printed
 * numbers read back to the values (six significant digits). Conversions are checked against
 * constants typed here: e = 1.602176634e-19 C (exact, CODATA 2018 / SI 2019), 1 cm^-2 = 1e4 m^-2,
 * 1 nm = 1e-9 m.
 */
class ReadableTextTest {
    private static final double E = 1.602176634e-19;

    private static Structure stack() {
        return Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("buffer", Composition.GAN, 1800 * NM)
                        .withDeepLevel(DeepLevel.acceptorLikePerCm3(2e17, 2.6)))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.26), 22 * NM)
                        .withDopant(Dopant.donorsPerCm3(1e18, 0.03))
                        .withDeltaDoping(DeltaDoping.donorsPerCm2(5e12, 0.015, 3 * NM)))
                .grow(Layer.of("cap", Composition.GAN, 2 * NM))
                .top(TopBoundary.schottky(1.0).atBiasV(-2.5))
                .build();
    }

    /** The number that follows {@code label} in {@code text}. */
    private static double numberAfter(String text, String label) {
        Matcher m = Pattern.compile(Pattern.quote(label) + "\\s*(-?[0-9.]+(?:e-?[0-9]+)?)").matcher(text);
        assertTrue(m.find(), () -> "\"" + label + "\" followed by a number in: " + text);
        return Double.parseDouble(m.group(1));
    }

    private static void assertSixDigits(double expected, double printed, String what) {
        assertEquals(expected, printed, 5e-6 * Math.abs(expected), what);
    }

    @Test
    void structureListsBoundariesLayersAndDopantsTopDown() {
        String text = stack().toString();
        List<String> lines = text.lines().toList();
        assertEquals("Structure (" + A00TestSet.INSTANCE.name() + ", metal-face, 300 K), top down:", lines.get(0));
        assertEquals("  top: Schottky gate, barrier 1 eV, bias -2.5 V", lines.get(1));
        assertEquals("  cap: GaN, 2 nm", lines.get(2));
        assertTrue(lines.get(3).startsWith("  barrier: Al0.26Ga0.74N, 22 nm, donors 1e18 cm^-3, ionization energy 0.03 eV,"
                + " g = 2, donor sheet 5e12 cm^-2 at 3 nm below the layer top"), lines.get(3));
        assertEquals("  spacer: AlN, 1 nm", lines.get(4));
        assertEquals("  buffer: GaN, 1800 nm, acceptor-like level 2e17 cm^-3 at E_c - 2.6 eV", lines.get(5));
        assertEquals("  bottom: zero field at the bottom", lines.get(6));
        assertFalse(text.contains("E-") || text.contains("E1") || text.contains("000000"), text);
    }

    /** A layer beyond its critical thickness is printed as a warning line. */
    @Test
    void structureWarnsAboutLayersBeyondTheCriticalThickness() {
        Structure thick = Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("buffer", Composition.GAN, 1800 * NM))
                .grow(Layer.of("barrier", Composition.ALN, 80 * NM))
                .top(TopBoundary.schottky(1.0))
                .build();
        assertFalse(thick.layersBeyondCriticalThickness().isEmpty(), "80 nm of AlN on GaN (2.4 % mismatch)");
        assertTrue(thick.toString().endsWith("\n  warning: barrier (80 nm) is thicker than its Matthews-Blakeslee"
                + " critical thickness (an estimate); it may relax"), thick.toString());
        Structure s = stack();
        assertEquals(s.layersBeyondCriticalThickness().size(), s.toString().split("\n  warning: ", -1).length - 1,
                s.toString());
    }

    @Test
    void interfaceChargePrintsDepthSigmaAndSheetDensity() {
        Structure s = stack();
        for (InterfaceCharge q : s.interfaceCharges()) {
            String text = q.toString();
            assertTrue(text.startsWith("interface " + q.upperLayer() + "/" + q.lowerLayer() + " at "), text);
            assertSixDigits(q.depth() / 1e-9, numberAfter(text, " at "), "depth (nm) in " + text);
            assertTrue(text.contains(" nm: sigma = "), text);
            assertSixDigits(q.sigma(), numberAfter(text, "sigma = "), "sigma in " + text);
            assertTrue(text.contains(" C/m^2 ("), text);
            assertSixDigits(q.sigma() / E / 1e4, numberAfter(text, "C/m^2 ("), "sigma/e in " + text);
            assertTrue(text.endsWith(" e/cm^2)"), text);
        }
        String surface = s.surfaceCharge().toString();
        assertTrue(surface.startsWith("surface (vacuum/cap) at 0 nm: sigma = "), surface);
    }

    @Test
    void smallRecordsCarryTheirUnits() {
        LayerState barrier = stack().layerStates().get(1);
        String strain = barrier.top().strain().toString();
        assertSixDigits(barrier.top().strain().xx(), numberAfter(strain, "eps_xx = "), strain);
        assertSixDigits(100 * barrier.top().strain().xx(), numberAfter(strain, "("), strain);
        assertTrue(strain.contains(" %), eps_zz = "), strain);
        String p = barrier.top().polarization().toString();
        assertTrue(p.startsWith("P_sp = ") && p.contains(" C/m^2, P_pz = ") && p.endsWith(" C/m^2 along [0001]"), p);
        assertSixDigits(barrier.top().polarization().spontaneous(), numberAfter(p, "P_sp = "), p);
        assertEquals("dE_c = -0.012 eV, dE_v = 0.008 eV", new BandEdgeShift(-0.012, 0.008).toString());
        String state = barrier.toString();
        assertTrue(state.startsWith("barrier (layer 1 from the top), 2 to 24 nm deep: Al0.26Ga0.74N"), state);
        assertTrue(state.contains(" on a = 3.189 A: "), state);
        assertTrue(state.contains(" A: eps_xx = "), state);
        assertEquals("free surface, donor states 1.6e13 cm^-2 at E_c - 1.65 eV",
                TopBoundary.freeSurface(1.65, 1.6e13).toString());
        assertEquals("Fermi level fixed at the bottom, E_c - E_F = 0.2 eV", BottomBoundary.fixedFermiLevel(0.2).toString());
        assertEquals("acceptors 3e19 cm^-3, ionization energy 0.2 eV, g = 4", Dopant.acceptorsPerCm3(3e19, 0.2).toString());
    }

    /**
     * Material records print in the units of the tables they come from. Outside check: the GaN end
     * point of the linear formulas of O. Ambacher et al., J. Appl. Phys. 87, 334 (2000), C13 = 103 GPa
     * and C33 = 405 GPa, e31 = -0.49 and e33 = 0.73 C/m^2 (as transcribed in A00TestSet, from memory).
     */
    @Test
    void materialRecordsPrintTableUnits() {
        var gan = A00TestSet.INSTANCE.material(Composition.GAN);
        String c = gan.elastic().toString();
        assertTrue(c.startsWith("C11 = ") && c.contains(", C13 = 103 GPa, C33 = 405 GPa, C44 = "), c);
        String e = gan.piezoelectric().toString();
        assertTrue(e.startsWith("e31 = -0.49 C/m^2, e33 = 0.73 C/m^2, e15 = "), e);
        assertTrue(gan.masses().toString().matches("m_e \\S+ m0 along c, \\S+ m0 in the plane; m_hh \\S+ m0 along c,"
                + " \\S+ m0 in the plane"), gan.masses().toString());
        assertTrue(gan.bandGap().toString().matches("E_g\\(0 K\\) = \\S+ eV, Varshni alpha = \\S+ eV/K, beta = \\S+ K"),
                gan.bandGap().toString());
        assertEquals("Matthews-Blakeslee, alpha = 60 deg, lambda = 60 deg",
                org.wurtzkit.strain.CriticalThickness.MATTHEWS_BLAKESLEE_60.toString());
    }

    /** The one-number factory and atBiasV name the unit, so barrier and bias cannot be swapped unnoticed. */
    @Test
    void schottkyGateBuiltStepByStep() {
        TopBoundary.Schottky gate = TopBoundary.schottky(1.1).atBiasV(-3);
        assertEquals(new TopBoundary.Schottky(1.1, -3), gate);
        assertEquals(1.1, gate.barrierHeightEv());
        assertEquals(-3.0, gate.biasV());
        assertEquals(0.0, TopBoundary.schottky(1.1).biasV());
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> TopBoundary.schottky(1.0).atBiasV(50));
        assertEquals("gate bias (V)", e.parameter());
    }
}
