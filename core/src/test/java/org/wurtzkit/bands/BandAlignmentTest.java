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
                .top(TopBoundary.schottky(1.0, 0));
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

    /** With the switch on, the point's deformation-potential shifts are added to both edges. */
    @Test
    void strainShiftsAreAddedOnlyWhenAsked() {
        Structure off = hemt().build();
        Structure on = hemt().strainShiftsBandEdges(true).build();
        assertTrue(on.strainShiftsBandEdges() && on.toBuilder().build().strainShiftsBandEdges());
        PointState p = on.pointAt(10 * NM);
        BandEdges a = off.bandEdgesAt(p);
        BandEdges b = on.bandEdgesAt(p);
        assertTrue(p.bandShift().conductionEv() != 0, "the strained barrier has a non-zero shift");
        assertEquals(a.conductionEv() + p.bandShift().conductionEv(), b.conductionEv(), 0.0);
        assertEquals(a.valenceEv() + p.bandShift().valenceEv(), b.valenceEv(), 0.0);
    }

    @Test
    void badChoicesAreRejected() {
        assertThrows(InvalidParameterException.class, () -> hemt().bandAlignment(null));
        assertThrows(InvalidParameterException.class, () -> BandAlignment.conductionBandFraction(1.5));
        assertThrows(InvalidParameterException.class, () -> new BandEdges(Double.NaN, 0));
    }
}
