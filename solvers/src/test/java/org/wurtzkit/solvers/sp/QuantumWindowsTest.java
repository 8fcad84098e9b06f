package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.lang.reflect.Method;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/** The choice of where electrons are quantum is named by the project's own word, "quantum windows". */
class QuantumWindowsTest {

    @Test
    void theOptionIsCalledQuantumWindowsThroughout() {
        for (Method m : SolverOptions.class.getMethods()) {
            assertTrue(!m.getName().toLowerCase(java.util.Locale.ROOT).contains("region"), m.getName());
        }
        assertEquals(QuantumWindows.automatic(), SolverOptions.defaults().quantumWindows());
        assertEquals("no quantum windows (classical electrons)", QuantumWindows.none().toString());
        assertEquals("one quantum window from the surface to 40 nm below the deepest interface",
                QuantumWindows.belowDeepestInterfaceNm(40).toString());
    }

    /** Explicit windows are solved as given (to the nearest mesh node); none gives a classical solve. */
    @Test
    void eachChoiceGivesTheWindowsItNames() {
        Structure s = StandardStacks.hemt(ParameterSets.defaultSet(), 500, 0.25, 25, 0, TopBoundary.schottky(1.0));
        SolverOptions coarse = SolverOptions.defaults().withMesh(new MeshPolicy(0.2 * NM, 1.15, 100 * NM));
        Solution explicit = new SelfConsistentSolver(coarse.withQuantumWindows(
                QuantumWindows.explicit(QuantumWindows.Window.nm(0, 70)))).solve(s);
        List<DepthRange> w = explicit.quantumWindows();
        assertEquals(1, w.size());
        assertEquals(70, w.get(0).bottomNm(), 0.5);
        Solution classical = new SelfConsistentSolver(coarse.withQuantumWindows(QuantumWindows.none())).solve(s);
        assertEquals(List.of(), classical.quantumWindows());
        assertEquals(List.of(), classical.subbands());
    }
}
