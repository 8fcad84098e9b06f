package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.WurtziteMaterial;

/** Physical consistency of the built-in sets against facts and published formulas outside the project. */
class PhysicsSanityTest {
    private final ParameterSet vm = BuiltInParameterSets.vurgaftmanMeyer2003();
    private final ParameterSet a02 = BuiltInParameterSets.ambacher2002();

    @Test
    void inAlNIsLatticeMatchedToGaNNearSeventeenPercentIndium() {
        // common practice, no source: In(y)Al(1-y)N is lattice matched to GaN near y = 0.17-0.18
        double aGaN = vm.binary(Binary.GAN).latticeA();
        assertTrue(vm.material(Composition.inAlN(0.17)).latticeA() < aGaN);
        assertTrue(vm.material(Composition.inAlN(0.18)).latticeA() > aGaN);
        // [computed]: lattice match at x_In = 0.1778 with VM03 lattice constants
        double y = (aGaN - vm.binary(Binary.ALN).latticeA())
                / (vm.binary(Binary.INN).latticeA() - vm.binary(Binary.ALN).latticeA());
        assertEquals(0.1778, y, 5e-5);
    }

    @Test
    void gaNGapAtRoomTemperature() {
        // [computed from VM03, from memory]: Eg(300 K) of GaN = 3.438 eV by Varshni
        assertEquals(3.438, vm.binary(Binary.GAN).bandGap().atTemperature(300), 5e-4);
    }

    @Property
    void ambacherSetReproducesTheA00LinearFits(@ForAll @DoubleRange(min = 0, max = 1) double x) {
        // Ambacher et al., J. Appl. Phys. 87, 334 (2000) [from memory]: a = -0.077x + 3.189 A,
        // C13 = 5x + 103 GPa, C33 = -32x + 405 GPa, e31 = -0.11x - 0.49, e33 = 0.73x + 0.73 C/m^2, eps = -0.5x + 9.5
        WurtziteMaterial m = a02.material(Composition.alGaN(x));
        assertEquals((-0.077 * x + 3.189) * 1e-10, m.latticeA(), 1e-12 * 1e-10 * 4);
        assertEquals((5 * x + 103) * 1e9, m.get(MaterialParameter.C13), 1e-12 * 410e9);
        assertEquals((-32 * x + 405) * 1e9, m.get(MaterialParameter.C33), 1e-12 * 410e9);
        assertEquals(-0.11 * x - 0.49, m.get(MaterialParameter.E31), 1e-12);
        assertEquals(0.73 * x + 0.73, m.get(MaterialParameter.E33), 1e-12);
        assertEquals(-0.5 * x + 9.5, m.permittivityStatic(), 1e-12);
        // A00's room-temperature gap fit Eg = 6.13x + 3.42(1 - x) - 1.0x(1 - x) eV [from memory]; this set keeps the
        // VM03 end points (300 K: 3.438, 6.158 eV) with A00's bowing, so the two differ by at most 0.028 eV
        double a00Gap = 6.13 * x + 3.42 * (1 - x) - 1.0 * x * (1 - x);
        assertEquals(a00Gap, m.bandGap().atTemperature(300), 0.03);
    }

    @Property
    void ambacherSpontaneousPolarizationIsTheBernardiniFiorentiniQuaternaryFormula(
            @ForAll @DoubleRange(min = 0, max = 1) double x, @ForAll @DoubleRange(min = 0, max = 1) double t) {
        // Fiorentini, Bernardini & Ambacher, Appl. Phys. Lett. 80, 1204 (2002) [from memory]:
        // Psp = -0.090x - 0.042y - 0.034z + 0.019xz + 0.038yz + 0.071xy (x = Al, y = In, z = Ga)
        double y = (1 - x) * t;
        Composition c = Composition.alInGaN(x, y);
        double z = c.gallium();
        double expected = -0.090 * x - 0.042 * y - 0.034 * z + 0.019 * x * z + 0.038 * y * z + 0.071 * x * y;
        assertEquals(expected, a02.material(c).spontaneousPolarizationWithBowing(), 1e-12);
    }

    @Property
    void vurgaftmanMeyerPolarizationIsLinear(@ForAll @DoubleRange(min = 0, max = 1) double x) {
        // BFV97 [from memory] used linearly: Psp(AlGaN) = -0.081x - 0.029(1 - x), with no bowing term
        WurtziteMaterial m = vm.material(Composition.alGaN(x));
        assertEquals(-0.081 * x - 0.029 * (1 - x), m.spontaneousPolarizationWithBowing(), 1e-12);
        assertEquals(0.0, m.get(MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING), 0);
    }

    @Test
    void offsetsLieInThePublishedRanges() {
        // AlN/GaN valence-band offset 0.6-0.85 eV, GaN/InN 0.48-1.05 eV: published spread, e.g. S.-H. Wei and
        // A. Zunger, Appl. Phys. Lett. 69, 2719 (1996) (0.81, 0.48 eV theory), G. Martin et al., Appl. Phys.
        // Lett. 68, 2541 (1996) (0.70, 1.05 eV XPS) [from memory]
        for (ParameterSet s : new ParameterSet[] {vm, a02}) {
            double alnGan = s.binary(Binary.GAN).valenceBandEdgeEv() - s.binary(Binary.ALN).valenceBandEdgeEv();
            double ganInn = s.binary(Binary.INN).valenceBandEdgeEv() - s.binary(Binary.GAN).valenceBandEdgeEv();
            assertTrue(alnGan >= 0.6 && alnGan <= 0.85, s.name() + " AlN/GaN VBO " + alnGan);
            assertTrue(ganInn >= 0.48 && ganInn <= 1.05, s.name() + " GaN/InN VBO " + ganInn);
            // [computed] from that VBO spread (0.6-1.0 eV on dEg ~ 2.7-2.8 eV): Delta Ec / Delta Eg of AlGaN/GaN lies in 0.63-0.78
            double dEg = s.binary(Binary.ALN).bandGap().atTemperature(300) - s.binary(Binary.GAN).bandGap().atTemperature(300);
            double dEc = s.binary(Binary.ALN).conductionBandEdgeEv(300) - s.binary(Binary.GAN).conductionBandEdgeEv(300);
            assertTrue(dEc / dEg >= 0.63 && dEc / dEg <= 0.78, s.name() + " dEc/dEg " + dEc / dEg);
        }
    }
}
