package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/** Each warning a solution raises, raised by a stack or option that should raise it, absent from a sound solve. */
class SolutionWarningsTest {
    private static final SolverOptions COARSE = SolverOptions.defaults()
            .withMesh(new MeshPolicy(0.2 * NM, 1.15, 100 * NM));

    /** 500 nm GaN / 25 nm Al0.25Ga0.75N, channel interface at 25 nm. */
    private static Structure hemt(TopBoundary top) {
        return StandardStacks.hemt(ParameterSets.defaultSet(), 500, 0.25, 25, 0, top);
    }

    private static List<WarningKind> kinds(Solution s) {
        return s.warnings().stream().map(Warning::kind).toList();
    }

    @Test
    void aGatedHemtWithDefaultWindowsHasNoWarning() {
        Solution s = new SelfConsistentSolver(COARSE).solve(hemt(TopBoundary.schottky(1.0)));
        assertEquals(List.of(), s.warnings(), s.toString());
        assertTrue(!s.toString().contains("warning"), s.toString());
    }

    /**
     * Without surface donors the positive charge that balances the barrier's polarization must come
     * from holes at the surface; the surface donors are what supply the 2DEG instead (J. P. Ibbetson,
     * P. T. Fini, K. D. Ness, S. P. DenBaars, J. S. Speck and U. K. Mishra, Appl. Phys. Lett. 77, 250
     * (2000), from memory). Enough deep-enough donors remove the holes.
     */
    @Test
    void aFreeSurfaceWithoutDonorsWarnsOfAHoleGas() {
        SelfConsistentSolver solver = new SelfConsistentSolver(COARSE);
        Solution bare = solver.solve(hemt(TopBoundary.freeSurfacePerCm2(1.65, 0)));
        assertEquals(List.of(WarningKind.SURFACE_HOLE_GAS), kinds(bare), bare.toString());
        assertTrue(bare.holeSheetDensity() > Solution.WARN_SURFACE_HOLES_PER_M2);
        assertTrue(bare.toString().contains("\n  warning: a hole gas of "), bare.toString());
        Solution pinned = solver.solve(hemt(TopBoundary.freeSurfacePerCm2(1.0, 5e13)));
        assertEquals(List.of(), kinds(pinned), pinned.toString());
    }

    /**
     * A window that ends 5 nm below the channel interface cuts the 2DEG, whose electrons reach
     * about 5-10 nm into GaN (common practice, no source): its subbands are held up by the window's
     * wall and free electrons lie just outside it. A window to 40 nm below the interface raises neither.
     */
    @Test
    void aWindowEndingInsideTheTwoDegWarnsOfBoundStatesAndEdgeElectrons() {
        Structure s = hemt(TopBoundary.schottky(1.0));
        Solution cut = new SelfConsistentSolver(COARSE.withQuantumWindows(
                QuantumWindows.explicit(QuantumWindows.Window.nm(0, 30)))).solve(s);
        assertEquals(List.of(WarningKind.WINDOW_BOUND_SUBBAND, WarningKind.WINDOW_EDGE_IN_ELECTRONS), kinds(cut),
                cut.toString());
        assertTrue(cut.warnings().get(1).message().startsWith("the bottom edge of window 0 (at 30 nm)"),
                cut.warnings().toString());
        Solution wide = new SelfConsistentSolver(COARSE.withQuantumWindows(
                QuantumWindows.explicit(QuantumWindows.Window.nm(0, 65)))).solve(s);
        assertEquals(List.of(), kinds(wide), wide.toString());
    }

    @Test
    void aReachedSubbandLimitIsAWarning() {
        Solution s = new SelfConsistentSolver(COARSE.withMaxSubbands(1)).solve(hemt(TopBoundary.schottky(1.0)));
        assertTrue(s.subbandLimitReached());
        assertEquals(List.of(WarningKind.SUBBAND_LIMIT_REACHED), kinds(s));
    }

    @Test
    void aStructureWarningIsCarriedByItsSolution() {
        Solution s = new SelfConsistentSolver(COARSE).solve(hemt(TopBoundary.schottky(1.0)).withTemperatureK(1100));
        assertTrue(kinds(s).contains(WarningKind.TEMPERATURE_OUT_OF_RANGE), s.toString());
    }
}
