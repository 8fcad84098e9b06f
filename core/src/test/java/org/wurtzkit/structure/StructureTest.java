package org.wurtzkit.structure;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.testing.A00TestSet;

class StructureTest {

    private static Structure hemt() {
        return Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("buffer", Composition.GAN, 2000 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM).withDopant(Dopant.donorsPerCm3(1e18, 0.03)))
                .grow(Layer.of("cap", Composition.GAN, 2 * NM))
                .top(TopBoundary.schottky(1.0).atBiasV(0))
                .build();
    }

    @Test
    void layersAreGrownBottomFirstAndReportedWithDepths() {
        Structure s = hemt();
        assertEquals(List.of("buffer", "spacer", "barrier", "cap"),
                s.layersBottomUp().stream().map(Layer::name).toList());
        assertEquals(List.of("cap", "barrier", "spacer", "buffer"),
                s.layersTopDown().stream().map(Layer::name).toList());
        assertEquals(2028 * NM, s.totalThickness(), 1e-18);
        assertArrayEquals(new double[] {2 * NM, 27 * NM, 28 * NM}, s.interfaceDepths(), 1e-18);
        assertEquals(0.0, s.layerStates().get(0).depthTop());
        assertEquals("barrier", s.layerStates().get(s.layerIndexAt(10 * NM)).layer().name());
        assertEquals(300.0, s.temperatureK());
        assertEquals(Polarity.METAL_FACE, s.polarity());
    }

    @Test
    void interfaceChargesHaveTheExpectedSigns() {
        List<InterfaceCharge> q = hemt().interfaceCharges();
        assertEquals(3, q.size());
        assertEquals("cap", q.get(0).upperLayer());
        assertTrue(q.get(0).sigma() < 0, "GaN cap on AlGaN: negative charge at the cap/barrier interface");
        assertTrue(q.get(2).sigma() > 0, "AlN on GaN: positive charge where the 2DEG forms");
        assertEquals(28.0, q.get(2).depthNm(), 1e-9);
    }

    @Test
    void everyLayerOfTheStackIsStrainedToTheBuffer() {
        Structure s = hemt();
        double aBuffer = A00TestSet.INSTANCE.material(Composition.GAN).latticeA();
        for (LayerState st : s.layerStates()) {
            assertEquals(aBuffer, st.top().inPlaneLatticeA(), 1e-22);
        }
        // The default c-plane model: AlGaN and AlN on GaN are under tension and relax by cracking first
        // (S. R. Lee et al., Appl. Phys. Lett. 85, 6164 (2004)); the channel-crack thickness with the
        // fracture resistance of Einfeldt et al. (J. Appl. Phys. 88, 7029 (2000)) is about 200 nm for
        // Al0.25Ga0.75N and about 12 nm for AlN, so neither the 25 nm barrier nor the 1 nm spacer is flagged.
        // The zinc-blende 60-degree Matthews-Blakeslee geometry (about 15 nm) flags the barrier.
        assertEquals(List.of(), s.layersBeyondCriticalThickness());
        assertEquals(List.of("barrier"), s.layersBeyondCriticalThickness(CriticalThickness.MATTHEWS_BLAKESLEE_60)
                .stream().map(l -> l.layer().name()).toList());
        Structure thick = s.toBuilder().grow(Layer.of("thick AlN", Composition.ALN, 30 * NM)).build();
        assertEquals("thick AlN", thick.layersBeyondCriticalThickness().get(0).layer().name());
    }

    @Test
    void relaxedLayerPassesItsLatticeUpward() {
        Structure s = Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("buffer", Composition.GAN, 100 * NM))
                .grow(Layer.of("relaxed AlN", Composition.ALN, 100 * NM).withRelaxation(1))
                .grow(Layer.of("GaN on AlN", Composition.GAN, 10 * NM))
                .top(TopBoundary.freeSurfacePerCm2(1.65, 1e14)).build();
        double aAlN = A00TestSet.INSTANCE.material(Composition.ALN).latticeA();
        assertEquals(0.0, s.layerStates().get(1).top().strain().xx(), 1e-15);
        assertEquals(aAlN, s.layerStates().get(0).top().inPlaneLatticeA(), 1e-22);
        assertTrue(s.layerStates().get(0).top().strain().xx() < 0, "GaN on relaxed AlN is compressed");
    }

    @Test
    void gradedLayerInterpolatesComposition() {
        Structure s = Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("buffer", Composition.GAN, 100 * NM))
                .grow(Layer.graded("grade", Composition.GAN, Composition.alGaN(0.4), 20 * NM))
                .top(TopBoundary.schottky(1).atBiasV(0)).build();
        assertEquals(0.2, s.pointAt(10 * NM).material().composition().aluminium(), 1e-12);
        assertEquals(0.4, s.layerStates().get(0).top().material().composition().aluminium(), 1e-12);
        // the graded layer holds the bound charge, the interface to the buffer none
        assertEquals(0.0, s.interfaceCharges().get(0).sigma(), 1e-15);
        assertTrue(s.layerStates().get(0).gradedBoundCharge() > 0);
    }

    @Test
    void emptyStackIsRejected() {
        WurtzkitException e = assertThrows(WurtzkitException.class,
                () -> Structure.builder(A00TestSet.INSTANCE).top(TopBoundary.schottky(1).atBiasV(0)).build());
        assertEquals(ErrorKind.INVALID_STRUCTURE, e.kind());
        assertTrue(e.getMessage().contains("number of layers = 0"), e.getMessage());
    }

    @Test
    void twoTopContactsAreRejected() {
        Structure.Builder b = Structure.builder(A00TestSet.INSTANCE).top(TopBoundary.schottky(1).atBiasV(0));
        WurtzkitException e = assertThrows(WurtzkitException.class, () -> b.top(TopBoundary.freeSurfacePerCm2(1.6, 1e13)));
        assertEquals(ErrorKind.INVALID_STRUCTURE, e.kind());
    }

    @Test
    void missingTopBoundaryIsRejected() {
        WurtzkitException e = assertThrows(WurtzkitException.class,
                () -> Structure.builder(A00TestSet.INSTANCE).grow(Layer.of("L", Composition.GAN, NM)).build());
        assertTrue(e.getMessage().contains("no top boundary"));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, -1e-9, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 2e-3})
    void badThicknessIsRejected(double t) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> Layer.of("barrier", Composition.GAN, t));
        assertTrue(e.getMessage().startsWith("thickness of layer \"barrier\" (m) = " + t), e.getMessage());
        assertTrue(e.getMessage().contains("(0, 0.001]"), e.getMessage());
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, -10, Double.NaN, 5000})
    void badTemperatureIsRejected(double t) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> Structure.builder(A00TestSet.INSTANCE).temperatureK(t));
        assertTrue(e.getMessage().contains("temperature (K) = " + t) && e.getMessage().contains("(0, 2000]"),
                e.getMessage());
    }

    @Test
    void badBoundaryAndDopingValuesAreRejected() {
        assertThrows(InvalidParameterException.class, () -> TopBoundary.schottky(-0.1).atBiasV(0));
        assertThrows(InvalidParameterException.class, () -> TopBoundary.schottky(1).atBiasV(Double.NaN));
        assertThrows(InvalidParameterException.class, () -> TopBoundary.freeSurfacePerCm2(-1, 1e13));
        assertThrows(InvalidParameterException.class, () -> BottomBoundary.fixedFermiLevel(99));
        assertThrows(InvalidParameterException.class, () -> Dopant.donorsPerCm3(-1, 0.03));
        assertThrows(InvalidParameterException.class, () -> Dopant.donorsPerCm3(1e18, Double.NaN));
        assertThrows(InvalidParameterException.class, () -> DeepLevel.acceptorLikePerCm3(1e17, -0.5));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> Layer.of("b", Composition.GAN, 5 * NM).withDeltaDoping(DeltaDoping.donorsPerCm2(1e12, 0.03).atOffset(6 * NM)));
        assertTrue(e.getMessage().contains("delta sheet offset in layer \"b\""), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> Layer.of("b", Composition.GAN, NM).withRelaxation(-0.1));
        assertThrows(InvalidParameterException.class,
                () -> Structure.builder(A00TestSet.INSTANCE).onInPlaneLattice(Double.NaN));
        assertThrows(InvalidParameterException.class, () -> hemt().layerIndexAt(-1e-9));
    }

    @Test
    void withersReturnModifiedCopies() {
        Structure s = hemt();
        Structure hot = s.withTemperatureK(450);
        assertEquals(450.0, hot.temperatureK());
        assertEquals(300.0, s.temperatureK());
        Structure biased = s.withTop(((TopBoundary.Schottky) s.top()).atBiasV(-2));
        assertEquals(-2.0, ((TopBoundary.Schottky) biased.top()).biasV());
    }

    /**
     * layerIndexAt is a binary search since issue #14 (it scanned every layer, and the mesh data of
     * a 20 000-layer superlattice took 16 s). Checked against its documented definition, the first
     * layer from the top whose bottom lies at or below the depth (the upper layer at an interface),
     * evaluated by a plain scan here: at every interface, just above and below it, and at the ends,
     * on a superlattice of 401 layers with thicknesses from 1 pm to 1 um.
     */
    @Test
    void layerIndexAtFollowsItsDefinitionOnASuperlattice() {
        Structure.Builder b = Structure.builder(A00TestSet.INSTANCE).grow(Layer.of("buffer", Composition.GAN, 1000 * NM));
        java.util.SplittableRandom r = new java.util.SplittableRandom(14);
        for (int i = 0; i < 400; i++) {
            double t = 1e-12 * Math.pow(1e6, r.nextDouble());
            b.grow(Layer.of("L" + i, i % 2 == 0 ? Composition.alGaN(0.2) : Composition.GAN, t));
        }
        Structure s = b.top(TopBoundary.schottky(1, 0)).build();
        List<LayerState> states = s.layerStates();
        java.util.List<Double> depths = new java.util.ArrayList<>(List.of(0.0, s.totalThickness()));
        for (LayerState st : states) {
            double z = st.depthBottom();
            depths.add(z);
            depths.add(Math.nextDown(z));
            if (z < s.totalThickness()) {
                depths.add(Math.nextUp(z));
            }
            depths.add(0.5 * (st.depthTop() + st.depthBottom()));
        }
        for (double z : depths) {
            int expected = states.size() - 1;
            for (int i = 0; i < states.size(); i++) {
                if (z <= states.get(i).depthBottom()) {
                    expected = i;
                    break;
                }
            }
            assertEquals(expected, s.layerIndexAt(z), "layer at depth " + z + " m");
        }
    }
}
