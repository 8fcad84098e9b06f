package org.wurtzkit.polarization;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.structure.InterfaceCharge;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.A00TestSet;
import org.wurtzkit.units.Units;

/** Physical invariants of strain, polarization and interface charge (common practice, no source). */
class PolarizationProperties {

    @Provide
    Arbitrary<Composition> compositions() {
        Arbitrary<Double> x = Arbitraries.doubles().between(0, 1);
        Arbitrary<Double> share = Arbitraries.doubles().between(0, 1);
        return Combinators.combine(x, share).as((a, s) -> new Composition(a, (1 - a) * s * 0.999));
    }

    @Provide
    Arbitrary<Layer> layers() {
        Arbitrary<Double> t = Arbitraries.doubles().between(0.5, 200);
        Arbitrary<Double> r = Arbitraries.of(0.0, 0.0, 0.3, 1.0);
        Arbitrary<Boolean> graded = Arbitraries.of(false, false, true);
        return Combinators.combine(compositions(), compositions(), t, r, graded).as((c1, c2, nm, rel, g) -> (g
                ? Layer.graded("L", c1, c2, nm * Units.NM)
                : Layer.of("L", c1, nm * Units.NM)).withRelaxation(rel));
    }

    @Provide
    Arbitrary<List<Layer>> stacks() {
        return layers().list().ofMinSize(1).ofMaxSize(8);
    }

    private static Structure build(List<Layer> layers, Polarity polarity, PolarizationModel model) {
        Structure.Builder b = Structure.builder(A00TestSet.INSTANCE).polarity(polarity).polarizationModel(model)
                .top(TopBoundary.schottky(1, 0));
        layers.forEach(b::grow);
        return b.build();
    }

    @Property(tries = 200)
    void invertingPolarityFlipsEveryBoundCharge(@ForAll("stacks") List<Layer> layers) {
        for (PolarizationModel model : new PolarizationModel[] {PolarizationModel.LINEAR, PolarizationModel.NONLINEAR}) {
            Structure metal = build(layers, Polarity.METAL_FACE, model);
            Structure nFace = build(layers, Polarity.N_FACE, model);
            List<InterfaceCharge> a = metal.interfaceCharges();
            List<InterfaceCharge> b = nFace.interfaceCharges();
            for (int i = 0; i < a.size(); i++) {
                assertEquals(-a.get(i).sigma(), b.get(i).sigma(), 0.0);
            }
            assertEquals(-metal.surfaceCharge().sigma(), nFace.surfaceCharge().sigma(), 0.0);
        }
    }

    /** Telescoping sum of sigma = P_z(lower) - P_z(upper), with the bulk charge of graded layers. */
    @Property(tries = 200)
    void interfaceChargesSumToBottomMinusTopPolarization(@ForAll("stacks") List<Layer> layers) {
        Structure s = build(layers, Polarity.METAL_FACE, PolarizationModel.NONLINEAR);
        double sum = 0;
        for (InterfaceCharge c : s.interfaceCharges()) {
            sum += c.sigma();
        }
        for (LayerState st : s.layerStates()) {
            sum += st.gradedBoundCharge();
        }
        List<LayerState> st = s.layerStates();
        double expected = st.get(st.size() - 1).bottom().alongGrowth() - st.get(0).top().alongGrowth();
        assertEquals(expected, sum, 1e-14);
    }

    @Property(tries = 200)
    void layerOnItsOwnLatticeHasNoStrainAndNoPiezoelectricPolarization(@ForAll("compositions") Composition c) {
        Structure s = Structure.builder(A00TestSet.INSTANCE).onRelaxed(c).grow(Layer.of("L", c, 10 * Units.NM))
                .top(TopBoundary.schottky(1, 0)).polarizationModel(PolarizationModel.NONLINEAR).build();
        LayerState st = s.layerStates().get(0);
        assertEquals(0.0, st.top().strain().xx(), 0.0);
        assertEquals(0.0, st.top().strain().zz(), 0.0);
        assertEquals(0.0, st.top().polarization().piezoelectric(), 0.0);
        assertTrue(s.layersBeyondCriticalThickness().isEmpty());
    }

    @Property(tries = 100)
    void sheetChargeGrowsWithAluminiumFraction(@ForAll @DoubleRange(min = 0.01, max = 0.99) double x,
            @ForAll @DoubleRange(min = 0.001, max = 0.01) @Scale(5) double dx) {
        for (PolarizationModel model : new PolarizationModel[] {PolarizationModel.LINEAR, PolarizationModel.NONLINEAR}) {
            assertTrue(sigma(x + dx, model) > sigma(x, model), "model " + model + " at x = " + x);
        }
    }

    private static double sigma(double x, PolarizationModel model) {
        return Structure.builder(A00TestSet.INSTANCE).polarizationModel(model)
                .grow(Layer.of("GaN", Composition.GAN, 100 * Units.NM))
                .grow(Layer.of("AlGaN", Composition.alGaN(x), 10 * Units.NM)).top(TopBoundary.schottky(1, 0)).build()
                .interfaceCharges().get(0).sigma();
    }
}
