package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.GenerationMode;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tag;
import net.jqwik.api.EdgeCasesMode;
import org.wurtzkit.materials.data.StructureJson;
import org.wurtzkit.solvers.sp.NotConvergedException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;

/**
 * A random stack of the solver fuzz ({@link Stacks#random(long)}: doping, deep levels, delta sheets,
 * gradings, both polarities and boundaries) written to JSON and read back is equal to the original,
 * and a solve of both gives the same numbers bit for bit (or the same failure). Common practice, no
 * source: equal inputs to a deterministic solver.
 */
@Tag("reliability")
class JsonRoundTripSolveProperties {
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver(SolverOptions.defaults());

    @Property(tries = 12, seed = "2020", generation = GenerationMode.RANDOMIZED, edgeCases = EdgeCasesMode.NONE,
            shrinking = ShrinkingMode.OFF)
    void aStackReadBackFromJsonSolvesBitForBitLikeTheOriginal(@ForAll long seed) {
        StackSpec spec = Stacks.random(seed);
        Structure s = spec.build();
        Structure back = StructureJson.reader().read(StructureJson.write(s), "seed " + seed);
        assertEquals(s, back, spec.toJava());
        assertSolvesBitForBit(SOLVER, s, back);
    }

    /**
     * A structure and its copy read back from JSON solve bit for bit alike: the same potential,
     * densities, interface-state charge, channel sheet density and warnings, or the same failure
     * (common practice, no source: a self-check of the round trip).
     *
     * @param solver the solver
     * @param s      the original structure
     * @param back   the structure read back from its JSON text
     */
    static void assertSolvesBitForBit(SelfConsistentSolver solver, Structure s, Structure back) {
        Solution a;
        try {
            a = solver.solve(s);
        } catch (NotConvergedException e) {
            NotConvergedException f = org.junit.jupiter.api.Assertions.assertThrows(NotConvergedException.class,
                    () -> solver.solve(back));
            assertEquals(e.getMessage(), f.getMessage());
            return;
        }
        Solution b = solver.solve(back);
        assertArrayEquals(a.depth(), b.depth());
        assertArrayEquals(a.potential(), b.potential());
        assertArrayEquals(a.electronDensity(), b.electronDensity());
        assertArrayEquals(a.holeDensity(), b.holeDensity());
        assertArrayEquals(a.interfaceStateCharge(), b.interfaceStateCharge());
        assertEquals(Double.doubleToRawLongBits(a.sheetDensityPerCm2()), Double.doubleToRawLongBits(b.sheetDensityPerCm2()));
        assertEquals(a.warnings(), b.warnings());
    }
}
