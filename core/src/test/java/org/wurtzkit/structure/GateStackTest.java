package org.wurtzkit.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.bands.BandEdges;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.reliability.BadInput;
import org.wurtzkit.testing.A00TestSet;

/** Insulators, gate stacks and interface sheets in the structure description. */
class GateStackTest {
    private static final ParameterSet SET = A00TestSet.INSTANCE;

    private static Structure.Builder hemt() {
        return Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 20 * NM));
    }

    private static Structure mis(double toxNm) {
        return hemt().sheetOnTop(InterfaceSheet.fixedPerCm2(4.6e12)).deposit(InsulatorLayer.ofNm(Insulators.AL2O3, toxNm))
                .top(TopBoundary.schottky(3.0)).build();
    }

    /**
     * The built-in values as published: SiO2 3.9 / 9 eV / CBO 3.6 eV, Si3N4 7.5 / 5.3 / 2.4 eV
     * (T. E. Cook Jr. et al., J. Appl. Phys. 93, 3949 (2003), type II), Al2O3 9 / 8.8 / 2.13 eV
     * (S. Esposto et al., Appl. Phys. Lett. 99, 133503 (2011)), HfO2 22 / 5.8 / 2.1 eV; SiO2's
     * valence-band offset 2.0 +/- 0.2 eV measured by Cook et al. follows from gap and CBO with
     * GaN's 3.4 eV gap; Si3N4's is negative (type II, -0.5 +/- 0.2 eV measured).
     */
    @Test
    void builtInInsulatorsCarryPublishedValues() {
        assertEquals(3.9, Insulators.SIO2.relativePermittivity());
        assertEquals(3.6, Insulators.SIO2.conductionBandOffsetToGaNEv());
        assertEquals(2.0, Insulators.SIO2.valenceBandOffsetToGaNEv(3.4), 0.2);
        assertEquals(-0.5, Insulators.SI3N4.valenceBandOffsetToGaNEv(3.4), 0.2);
        assertEquals(2.13, Insulators.AL2O3.conductionBandOffsetToGaNEv());
        assertEquals(0.3, Insulators.HFO2.valenceBandOffsetToGaNEv(3.4), 0.2);
        assertEquals(Insulators.HFO2, Insulators.named("hfo2"));
        assertEquals(4, Insulators.all().size());
        for (Insulator i : Insulators.all()) {
            assertTrue(i.source().contains("Robertson"), i.source());
        }
    }

    /** Electron-affinity rule: CBO = chi(GaN) - chi(insulator); with the UPS affinities of Cook et al. (GaN 3.0, SiO2 1.1 eV) 1.9 eV. */
    @Test
    void electronAffinityRule() {
        Insulator i = Insulator.fromElectronAffinity("SiO2 (affinity rule)", 3.9, 9, 1.1, 3.0, "Cook et al., UPS");
        assertEquals(1.9, i.conductionBandOffsetToGaNEv(), 1e-12);
    }

    /**
     * Polarization bound charge at the insulator/nitride interface: the nitride's P_z with zero on
     * the amorphous side, the same as the free surface of the same nitride; the sum over all
     * interfaces is P_z(bottom) - P_z(top) with P_z(insulator) = 0 (common practice, no source).
     */
    @Test
    void boundChargeUnderInsulatorIsTheFreeSurfaceCharge() {
        Structure free = hemt().top(TopBoundary.freeSurface(1.6, 1e13)).build();
        Structure gated = mis(10);
        InterfaceCharge under = gated.interfaceCharges().get(0);
        assertEquals(free.surfaceCharge().sigma(), under.sigma(), 0);
        assertEquals(10 * NM, under.depth(), 1e-20);
        assertEquals("Al2O3", under.upperLayer());
        assertEquals(0, gated.surfaceCharge().sigma());
        double sum = 0;
        for (InterfaceCharge c : gated.interfaceCharges()) {
            sum += c.sigma();
        }
        assertEquals(gated.layerStates().get(1).top().alongGrowth(), sum, 1e-15);
    }

    @Test
    void depthsAndBandEdgesOfTheGateStack() {
        Structure s = mis(10);
        assertEquals(10 * NM, s.gateStackThickness(), 1e-20);
        assertEquals(530 * NM, s.totalThickness(), 1e-18);
        assertEquals(10 * NM, s.layerStates().get(0).depthTop());
        assertEquals(10 * NM, s.interfaceDepths()[0], 1e-20);
        assertEquals(30 * NM, s.interfaceDepths()[1], 1e-18);
        assertEquals("Al2O3", s.insulatorAt(5 * NM).name());
        BandEdges e = s.bandEdgesOf(s.gateStack().get(0));
        BandEdges gan = s.bandAlignment().edges(SET, SET.binary(Binary.GAN), 300);
        assertEquals(gan.conductionEv() + 2.13, e.conductionEv(), 1e-12);
        assertEquals(8.8, e.conductionEv() - e.valenceEv(), 1e-12);
        assertEquals(1, s.interfaceSheets().size());
        assertEquals(10 * NM, s.interfaceSheets().get(0).depth(), 1e-20);
        assertEquals(4.6e12, s.interfaceSheets().get(0).sheet().fixedChargePerCm2(), 1e-3);
        assertThrows(InvalidParameterException.class, () -> s.pointAt(5 * NM));
        assertTrue(s.toString().contains("Al2O3: Al2O3 insulator, 10 nm"), s.toString());
        assertTrue(s.toString().contains("sheet under Al2O3 at 10 nm: fixed +4.6e+12 e/cm^2")
                || s.toString().contains("sheet under Al2O3 at 10 nm: fixed +4.6e12 e/cm^2"), s.toString());
        // a derived copy keeps gate stack and sheets
        Structure warm = s.withTemperature(350);
        assertEquals(s.gateStack(), warm.gateStack());
        assertEquals(s.interfaceSheets().get(0).sheet(), warm.interfaceSheets().get(0).sheet());
    }

    @Test
    void frozenStatesBecomeFixedCharge() {
        Structure s = hemt().sheetOnTop(InterfaceSheet.fixedPerCm2(1e12)
                .withStates(InterfaceStates.uniformPerCm2PerEv(1e12, 1.0)))
                .deposit(InsulatorLayer.ofNm(Insulators.SIO2, 5)).top(TopBoundary.schottky(3.0)).build();
        double q = 1.602176634e-19 * 1e16; // 1e12 cm^-2 of charge (C/m^2)
        Structure f = s.withInterfaceStatesFrozen(new double[] {-q});
        assertEquals(0, f.interfaceSheets().get(0).sheet().fixedChargePerCm2(), 1e-3);
        assertTrue(f.interfaceSheets().get(0).sheet().states().isEmpty());
        assertThrows(InvalidParameterException.class, () -> s.withInterfaceStatesFrozen(new double[2]));
    }

    // ------------------------------------------------------------------------- bad input

    @Test
    void insulatorWithNonPositivePermittivityOrGap() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> new Insulator("X", 0, 5, 2, "t"));
        assertTrue(e.parameter().contains("relative permittivity of insulator \"X\""), e.getMessage());
        assertEquals("0.0", e.value());
        e = assertThrows(InvalidParameterException.class, () -> new Insulator("X", -3.9, 5, 2, "t"));
        assertEquals("-3.9", e.value());
        e = assertThrows(InvalidParameterException.class, () -> new Insulator("X", 3.9, 0, 2, "t"));
        assertTrue(e.parameter().contains("band gap of insulator \"X\""), e.getMessage());
        e = assertThrows(InvalidParameterException.class, () -> new Insulator("X", 3.9, -1, 2, "t"));
        assertTrue(e.allowedRange().contains("(0, +inf)"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> new Insulator("X", Double.NaN, 5, 2, "t"));
        // below vacuum's 1 (common practice, no source): a permittivity typed in F/m
        e = assertThrows(InvalidParameterException.class, () -> new Insulator("X", 3.9 * 8.854e-12, 5, 2, "t"));
        assertTrue(e.parameter().contains("relative permittivity"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> new InsulatorLayer("ox", Insulators.SIO2, 0));
    }

    @Test
    void interfaceStatesWithNegativeDensityOrLevelOutsideTheGap() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> InterfaceStates.uniformPerCm2PerEv(-1e11, 1.0));
        assertTrue(e.parameter().contains("uniform interface-state density"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> new InterfaceStates.Gaussian(-1, 1, 0.1));
        assertThrows(InvalidParameterException.class, () -> new InterfaceStates.UShaped(1e15, -1, 0.1, 0.1));
        assertThrows(InvalidParameterException.class, () -> new InterfaceStates.Discrete(-1, 1));
        // a level below E_v of the AlGaN barrier (gap about 3.9 eV): refused when the stack is built
        Structure.Builder b = hemt().sheetOnTop(InterfaceSheet.of(new InterfaceStates(
                new InterfaceStates.Gaussian(1e16, 4.5, 0.1), 1.0))).top(TopBoundary.freeSurface(0, 0));
        e = assertThrows(InvalidParameterException.class, b::build);
        assertTrue(e.parameter().contains("Gaussian interface-state centre below E_c at the top of layer \"barrier\""),
                e.getMessage());
        Structure.Builder cnl = hemt().sheetOnTop(InterfaceSheet.of(InterfaceStates.uniformPerCm2PerEv(1e12, 5)))
                .top(TopBoundary.freeSurface(0, 0));
        e = assertThrows(InvalidParameterException.class, cnl::build);
        assertTrue(e.parameter().contains("charge-neutrality level"), e.getMessage());
        // the error says which sheet and which state set: here the second set of the second sheet on the barrier
        Structure.Builder second = hemt().sheetOnTop(InterfaceSheet.fixedPerCm2(1e12))
                .sheetOnTop(new InterfaceSheet(0, List.of(InterfaceStates.uniformPerCm2PerEv(1e12, 1.0),
                        InterfaceStates.uniformPerCm2PerEv(1e12, 5)))).top(TopBoundary.freeSurface(0, 0));
        InvalidStructurePartException located = assertThrows(InvalidStructurePartException.class, second::build);
        assertEquals(new StructurePart(StructurePart.Kind.INTERFACE_STATES, 0, 1, 1), located.part());
        assertTrue(located.parameter().contains("charge-neutrality level"), located.getMessage());
    }

    @Test
    void nitrideOnAnAmorphousLayerIsRefused() {
        Structure.Builder b = hemt().deposit(InsulatorLayer.ofNm(Insulators.SI3N4, 5));
        BadInput.checkKind(() -> b.grow(Layer.of("cap", Composition.GAN, 2 * NM)), ErrorKind.INVALID_STRUCTURE,
                "\"cap\"", "amorphous insulator \"Si3N4\"", "epitaxy");
        BadInput.checkKind(() -> Structure.builder(SET).deposit(InsulatorLayer.ofNm(Insulators.SIO2, 5)),
                ErrorKind.INVALID_STRUCTURE, "bottom of the stack");
        BadInput.checkKind(() -> hemt().deposit(InsulatorLayer.ofNm(Insulators.SIO2, 5))
                .sheetOnTop(InterfaceSheet.fixedPerCm2(1e12)), ErrorKind.INVALID_STRUCTURE, "before any deposit");
        assertThrows(InvalidParameterException.class, () -> InterfaceSheet.fixedPerCm2(Double.NaN));
        BadInput.checkKind(() -> hemt().deposit(InsulatorLayer.ofNm(Insulators.SIO2, 5))
                .top(TopBoundary.freeSurface(1.6, 1e13)).build(), ErrorKind.INVALID_STRUCTURE, "surface donors");
        StructurePartException donors = assertThrows(StructurePartException.class, () -> hemt()
                .deposit(InsulatorLayer.ofNm(Insulators.SIO2, 5)).top(TopBoundary.freeSurface(1.6, 1e13)).build());
        assertEquals(StructurePart.topBoundary(), donors.part());
        assertThrows(InvalidParameterException.class, () -> new StructurePart(StructurePart.Kind.INTERFACE_STATES, -1, 0, 0));
        assertThrows(InvalidParameterException.class, () -> new StructurePart(StructurePart.Kind.TOP_BOUNDARY, 0, -1, -1));
        assertEquals(List.of(), mis(5).withGateStack(List.of()).gateStack());
    }
}
