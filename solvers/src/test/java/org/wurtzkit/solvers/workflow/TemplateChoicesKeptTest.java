package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/**
 * Structures derived from a template by a family or a tolerance study keep the template's model
 * choices: band line-up, strain shifts, critical-thickness model and full ionization (a variant that
 * silently dropped them would answer a different question; common practice, no source).
 */
class TemplateChoicesKeptTest {

    private static Structure template() {
        return Structure.builder(ParameterSets.named("ambacher-2002"))
                .grow(Layer.of("buffer", Composition.GAN, 500 * Units.NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * Units.NM)
                        .withDopant(Dopant.donorsPerCm3(1e17, 0.02).fullyIonized()))
                .bandAlignment(BandAlignment.conductionBandFraction(0.65))
                .strainShiftsBandEdges(true)
                .strainShiftsValenceSplittings(false)
                .criticalThicknessModel(CriticalThickness.MATTHEWS_BLAKESLEE_60)
                .top(TopBoundary.schottky(1.0))
                .build();
    }

    private static void assertSameChoices(Structure expected, Structure actual) {
        assertEquals(expected.bandAlignment(), actual.bandAlignment());
        assertEquals(expected.strainShiftsBandEdges(), actual.strainShiftsBandEdges());
        assertEquals(expected.strainShiftsValenceSplittings(), actual.strainShiftsValenceSplittings());
        assertEquals(expected.criticalThicknessModel(), actual.criticalThicknessModel());
    }

    @Test
    void aFamilyMemberKeepsTheTemplatesChoices() {
        Structure t = template();
        assertSameChoices(t, StructureFamilies.layerThicknessNm(t, "barrier").at(30));
        assertSameChoices(t, StructureFamilies.alFraction(t, "barrier").at(0.3));
    }

    @Test
    void aToleranceSampleKeepsTheTemplatesChoicesAndVariesAFractionLineUpItself() {
        Structure t = template();
        ToleranceStudy s = ToleranceStudy.builder(t)
                .tolerance(Tolerance.conductionBandOffsetFraction(Distribution.uniform(0.6, 0.8)))
                .tolerance(Tolerance.donorDensityPerCm3("barrier", Distribution.uniform(5e16, 2e17)))
                .samples(4).build();
        for (int j = 0; j < s.size(); j++) {
            double[] x = s.design().values(j);
            Structure st = s.structure(j);
            assertEquals(BandAlignment.conductionBandFraction(x[0]), st.bandAlignment());
            assertEquals(t.strainShiftsBandEdges(), st.strainShiftsBandEdges());
            assertEquals(t.strainShiftsValenceSplittings(), st.strainShiftsValenceSplittings());
            assertEquals(t.criticalThicknessModel(), st.criticalThicknessModel());
            assertEquals(Dopant.Ionization.FULL, st.layersBottomUp().get(1).dopants().get(0).ionization());
            assertEquals(t.parameters().conductionBandOffsetFraction(), st.parameters().conductionBandOffsetFraction());
        }
    }

    /**
     * A target reached with a barrier beyond the template's critical-thickness model says so: with
     * the zinc-blende Matthews-Blakeslee geometry a 25 nm AlGaN barrier of 25 % Al or more is beyond it
     * (S. R. Lee et al., Appl. Phys. Lett. 85, 6164 (2004), from memory: such barriers in fact grow
     * coherently), and the default c-plane model accepts it.
     */
    @Test
    void aTargetResultCarriesTheWarningsOfTheStructureFound() {
        Structure mb = Hemts.standard().toBuilder().criticalThicknessModel(CriticalThickness.MATTHEWS_BLAKESLEE_60)
                .build();
        TargetSearch search = new TargetSearch(Hemts.SOLVER, 60);
        org.junit.jupiter.api.Assertions.assertFalse(mb.warnings().isEmpty(), "25 nm Al0.25 is beyond the 60-degree estimate");
        TargetResult r = search.sheetDensity(StructureFamilies.alFraction(mb, "barrier"), 0.2, 0.35, 1.2e13, 1e-3);
        assertEquals(java.util.List.of(org.wurtzkit.warnings.WarningKind.BEYOND_CRITICAL_THICKNESS),
                r.warnings().stream().map(org.wurtzkit.warnings.Warning::kind).toList(), r.toString());
        org.junit.jupiter.api.Assertions.assertTrue(r.toString().contains("\n  warning: barrier ("), r.toString());
        TargetResult ok = search.sheetDensity(StructureFamilies.alFraction(Hemts.standard(), "barrier"), 0.2, 0.35,
                1.2e13, 1e-3);
        assertEquals(java.util.List.of(), ok.warnings());
    }
}
