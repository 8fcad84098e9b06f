package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/** The typed band diagram and quantum windows of a solution, with the line-up set on the structure. */
class BandDiagramTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();

    private static Structure hemt(BandAlignment alignment) {
        return Structure.builder(SET)
                .grow(Layer.of("channel", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 20 * NM))
                .top(TopBoundary.schottky(1.0, 0))
                .bandAlignment(alignment)
                .build();
    }

    /**
     * The conduction-band step at the barrier/channel interface of the solved diagram (both sides
     * of the step are points of the polyline) is 0.7 of the gap difference under the fixed-fraction
     * rule dE_c = 0.7 dE_g used by O. Ambacher et al., J. Appl. Phys. 87, 334 (2000) (from memory),
     * and the valence step takes the rest: the line-up chosen on the structure reaches the solver.
     */
    @Test
    void interfaceStepFollowsTheStructuresLineUp() {
        Structure s = hemt(BandAlignment.conductionBandFraction(0.7));
        BandDiagram bd = new SelfConsistentSolver().solve(s).bandDiagram();
        double[] depth = bd.depth();
        double[] ec = bd.conductionEv();
        double[] ev = bd.valenceEv();
        int step = -1;
        for (int i = 1; i < bd.size(); i++) {
            if (Math.abs(depth[i] - 20 * NM) < 1e-12 && depth[i] == depth[i - 1]) {
                step = i;
            }
        }
        assertTrue(step > 0, "the interface at 20 nm appears twice in the polyline");
        double gapBarrier = SET.material(Composition.alGaN(0.25)).bandGap().atTemperature(300);
        double gapChannel = SET.material(Composition.GAN).bandGap().atTemperature(300);
        double dGap = gapBarrier - gapChannel;
        assertEquals(0.7 * dGap, ec[step - 1] - ec[step], 1e-9);
        assertEquals(0.3 * dGap, ev[step] - ev[step - 1], 1e-9);
        assertEquals(bd.depthNm()[step], 20.0, 1e-9);
    }

    /** Windows are named ranges inside the stack; the default automatic region covers the 2DEG. */
    @Test
    void quantumWindowsAreDepthRanges() {
        Solution sol = new SelfConsistentSolver().solve(hemt(BandAlignment.valenceBandTable()));
        List<DepthRange> w = sol.quantumWindows();
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).contains(20 * NM) && w.get(0).top() >= 0 && w.get(0).bottom() <= 520 * NM, w.toString());
        assertEquals(w.get(0).bottom() - w.get(0).top(), w.get(0).thickness(), 0.0);
        assertThrows(InvalidParameterException.class, () -> new DepthRange(2e-9, 1e-9));
        assertThrows(InvalidParameterException.class,
                () -> new BandDiagram(new double[2], new double[2], new double[3]));
    }
}
