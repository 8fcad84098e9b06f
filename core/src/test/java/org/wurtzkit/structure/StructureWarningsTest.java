package org.wurtzkit.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.testing.A00TestSet;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/** Each warning a structure raises, raised by a stack that should raise it and absent from a sound one. */
class StructureWarningsTest {

    private static Structure.Builder hemt(double barrierNm, double bufferNm) {
        return Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("buffer", Composition.GAN, bufferNm * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), barrierNm * NM));
    }

    private static List<WarningKind> kinds(Structure s) {
        return s.warnings().stream().map(Warning::kind).toList();
    }

    @Test
    void aRoutineHemtHasNoWarning() {
        Structure s = hemt(25, 2000).top(TopBoundary.schottky(1.0).atBiasV(-2)).build();
        assertEquals(List.of(), s.warnings(), s.toString());
        assertTrue(!s.toString().contains("warning"), s.toString());
    }

    /**
     * 80 nm of AlN on relaxed GaN (2.4 % lattice mismatch) is far beyond any critical thickness:
     * AlN cracks on GaN within a few nm (common practice, no source).
     */
    @Test
    void aLayerBeyondItsCriticalThicknessIsWarned() {
        Structure s = Structure.builder(A00TestSet.INSTANCE).grow(Layer.of("buffer", Composition.GAN, 2000 * NM))
                .grow(Layer.of("barrier", Composition.ALN, 80 * NM)).top(TopBoundary.schottky(1.0)).build();
        assertEquals(List.of(WarningKind.BEYOND_CRITICAL_THICKNESS), kinds(s));
        assertTrue(s.warnings().get(0).message().startsWith("barrier (80 nm)"), s.warnings().toString());
        assertTrue(s.toString().contains("\n  warning: barrier (80 nm)"), s.toString());
    }

    /**
     * The critical-thickness model is the structure's own option: the zinc-blende Matthews-Blakeslee
     * geometry flags a routine 25 nm Al0.25Ga0.75N barrier that the c-plane default accepts (such
     * barriers grow coherently in practice; S. R. Lee et al., Appl. Phys. Lett. 85, 6164 (2004), from
     * memory: cracking, not misfit dislocations, limits them, at larger thickness).
     */
    @Test
    void theCriticalThicknessModelIsAnOptionOfTheStructure() {
        Structure byDefault = hemt(25, 2000).top(TopBoundary.schottky(1.0)).build();
        Structure mb = hemt(25, 2000).criticalThicknessModel(CriticalThickness.MATTHEWS_BLAKESLEE_60)
                .top(TopBoundary.schottky(1.0)).build();
        assertEquals(List.of(), kinds(byDefault));
        assertEquals(List.of(WarningKind.BEYOND_CRITICAL_THICKNESS), kinds(mb));
        assertEquals(CriticalThickness.MATTHEWS_BLAKESLEE_60, mb.toBuilder().build().criticalThicknessModel());
    }

    @Test
    void aLayerThickerThan10UmIsWarned() {
        Structure s = hemt(25, 12_000).top(TopBoundary.schottky(1.0)).build();
        assertEquals(List.of(WarningKind.LAYER_THICKER_THAN_10_UM), kinds(s));
        assertTrue(s.warnings().get(0).message().startsWith("buffer is 12 um thick"), s.warnings().toString());
        assertEquals(List.of(), kinds(hemt(25, 9_000).top(TopBoundary.schottky(1.0)).build()));
    }

    @Test
    void aTemperatureOutside20To1000KIsWarned() {
        Structure s = hemt(25, 2000).top(TopBoundary.schottky(1.0)).build();
        assertEquals(List.of(WarningKind.TEMPERATURE_OUT_OF_RANGE), kinds(s.withTemperatureK(10)));
        assertEquals(List.of(WarningKind.TEMPERATURE_OUT_OF_RANGE), kinds(s.withTemperatureK(1200)));
        assertEquals(List.of(), kinds(s.withTemperatureK(20)));
        assertEquals(List.of(), kinds(s.withTemperatureK(1000)));
    }

    @Test
    void aGateBiasAtOrAboveTheBarrierIsWarned() {
        Structure s = hemt(25, 2000).top(TopBoundary.schottky(1.0).atBiasV(1.0)).build();
        assertEquals(List.of(WarningKind.GATE_BIAS_AT_OR_ABOVE_BARRIER), kinds(s));
        assertEquals(List.of(), kinds(s.withTop(TopBoundary.schottky(1.0).atBiasV(0.99))));
    }
}
