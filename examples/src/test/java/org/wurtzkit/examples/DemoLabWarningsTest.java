package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.structure.Structure;

/** The demo wafer is a sound stack: neither it nor its default solve raises a warning. */
class DemoLabWarningsTest {
    @Test
    void theDemoWaferRaisesNoWarning() {
        Structure wafer = DemoLab.wafer();
        assertEquals(List.of(), wafer.warnings(), wafer.toString());
        Solution s = new SelfConsistentSolver().solve(wafer);
        assertEquals(List.of(), s.warnings(), s.toString());
        Solution pinchingOff = new SelfConsistentSolver().solve(wafer.withTop(
                org.wurtzkit.structure.TopBoundary.schottky(DemoLab.GATE_BARRIER_EV).atBiasV(-3)));
        assertEquals(List.of(), pinchingOff.warnings(), pinchingOff.toString());
    }
}
