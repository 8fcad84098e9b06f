package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/** The threshold and sweep results carry the warnings of their points. */
class ThresholdWarningTest {

    /**
     * A sweep from -1 V to 0 V stays far above the threshold (below -4 V for 25 nm Al0.25Ga0.75N
     * under a 1 eV gate with the default set; about -5.3 V by this extrapolation over 0 to -8 V): the
     * tangent is carried beyond the swept range, which must be said.
     */
    @Test
    void aLinearExtrapolationOutsideTheSweptRangeIsWarned() {
        BiasSweep sweep = new BiasSweep(Hemts.SOLVER);
        BiasSweepResult near = sweep.run(Hemts.standard(), BiasGrid.linear(0, -1, 5));
        Threshold t = near.threshold(ThresholdDefinition.linearExtrapolation());
        assertTrue(t.voltageV() < -1, t.toString());
        assertEquals(List.of(WarningKind.THRESHOLD_OUTSIDE_SWEPT_RANGE), t.warnings().stream().map(Warning::kind).toList());
        assertEquals(t.voltageV(), near.thresholdVoltage(ThresholdDefinition.linearExtrapolation()));
        assertTrue(t.toString().contains("\n  warning: the linear extrapolation meets n_s = 0 at "), t.toString());

        BiasSweepResult wide = sweep.run(Hemts.standard(), BiasGrid.linear(0, -8, 17));
        Threshold inside = wide.threshold(ThresholdDefinition.linearExtrapolation());
        assertEquals(List.of(), inside.warnings(), inside.toString());
    }

    /** A forward gate bias at or above the barrier height (1 eV) is named at its first point. */
    @Test
    void aSweepCarriesThePointWarningsOncePerKind() {
        BiasSweepResult r = new BiasSweep(Hemts.SOLVER).run(Hemts.standard(), BiasGrid.linear(0.5, 1.5, 3));
        assertEquals(List.of(WarningKind.GATE_BIAS_AT_OR_ABOVE_BARRIER), r.warnings().stream().map(Warning::kind).toList(),
                r.toString());
        assertTrue(r.warnings().get(0).message().startsWith("at V_g = 1 V: gate bias 1 V is at or above"),
                r.warnings().toString());
        assertTrue(r.warnings().get(0).message().endsWith("(and at 1 other point)"), r.warnings().toString());
        BiasSweepResult ok = new BiasSweep(Hemts.SOLVER).run(Hemts.standard().withTop(TopBoundary.schottky(1.0)),
                BiasGrid.linear(0, -2, 3));
        assertEquals(List.of(), ok.warnings(), ok.toString());
    }
}
