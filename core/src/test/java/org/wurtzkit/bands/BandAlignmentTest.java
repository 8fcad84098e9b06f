package org.wurtzkit.bands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.PointState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.A00TestSet;

/** The band line-up as a model choice of the structure. */
class BandAlignmentTest {

    private static Structure.Builder hemt() {
        return Structure.builder(A00TestSet.INSTANCE)
                .grow(Layer.of("channel", Composition.GAN, 1000 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.3), 20 * NM))
                .top(TopBoundary.schottky(1.0).atBiasV(0));
    }

    /**
     * The fixed-fraction rule dE_c = f dE_g of O. Ambacher et al., J. Appl. Phys. 87, 334 (2000)
     * (f = 0.7 from memory): the conduction offset of AlGaN on GaN is f times the gap difference and
     * GaN itself keeps its tabulated edges; the default line-up keeps each material's tabulated E_v.
     */
    @Test
    void eachLineUpComputesItsOwnEdges() {
        Structure s = hemt().bandAlignment(BandAlignment.conductionBandFraction(0.7)).build();
        PointState barrier = s.pointAt(10 * NM);
        PointState channel = s.pointAt(500 * NM);
        BandEdges b = s.bandEdgesAt(barrier);
        BandEdges c = s.bandEdgesAt(channel);
        double gb = barrier.material().bandGap().atTemperature(300);
        double gc = channel.material().bandGap().atTemperature(300);
        assertEquals(0.7 * (gb - gc), b.conductionEv() - c.conductionEv(), 1e-12);
        assertEquals(gb, b.gapEv(), 1e-12);
        WurtziteMaterial gan = channel.material();
        assertEquals(gan.valenceBandEdgeEv(), c.valenceEv(), 1e-12);

        Structure d = hemt().build();
        assertEquals(BandAlignment.valenceBandTable(), d.bandAlignment());
        assertFalse(d.strainShiftsBandEdges());
        PointState p = d.pointAt(10 * NM);
        assertEquals(p.material().valenceBandEdgeEv(), d.bandEdgesAt(p).valenceEv(), 0.0);
    }

    /**
     * With the switch on (and the valence splittings left unstrained), the point's
     * deformation-potential shifts are added to both edges.
     */
    @Test
    void strainShiftsAreAddedOnlyWhenAsked() {
        Structure off = hemt().build();
        Structure on = hemt().strainShiftsBandEdges(true).strainShiftsValenceSplittings(false).build();
        assertTrue(on.strainShiftsBandEdges() && on.toBuilder().build().strainShiftsBandEdges());
        PointState p = on.pointAt(10 * NM);
        BandEdges a = off.bandEdgesAt(p);
        BandEdges b = on.bandEdgesAt(p);
        assertTrue(p.bandShift().conductionEv() != 0, "the strained barrier has a non-zero shift");
        assertEquals(a.conductionEv() + p.bandShift().conductionEv(), b.conductionEv(), 0.0);
        assertEquals(a.valenceEv() + p.bandShift().valenceEv(), b.valenceEv(), 0.0);
        // with the splittings strained too (the default), the valence edge follows the top band: in
        // the AlGaN barrier (crystal field negative, tension) that is not the heavy hole, so the edge
        // moves by the heavy-hole shift plus the top band's own (S. L. Chuang and C. S. Chang, Phys.
        // Rev. B 54, 2491 (1996))
        Structure split = hemt().strainShiftsBandEdges(true).build();
        assertTrue(split.strainShiftsValenceSplittings() && split.valenceBandsFollowStrain());
        double beyond = split.valenceBandsAt(p).topShiftBeyondHeavyHoleEv();
        assertTrue(beyond != 0, "the barrier's top band is not the heavy hole");
        assertEquals(b.conductionEv(), split.bandEdgesAt(p).conductionEv(), 0.0);
        assertEquals(b.valenceEv() + beyond, split.bandEdgesAt(p).valenceEv(), 1e-15);
    }

    @Test
    void badChoicesAreRejected() {
        assertThrows(InvalidParameterException.class, () -> hemt().bandAlignment(null));
        assertThrows(InvalidParameterException.class, () -> BandAlignment.conductionBandFraction(1.5));
        assertThrows(InvalidParameterException.class, () -> new BandEdges(Double.NaN, 0));
    }
}
