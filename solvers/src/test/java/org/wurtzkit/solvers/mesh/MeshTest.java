package org.wurtzkit.solvers.mesh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.Arrays;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;

/** Mesh generation: nodes on every breakpoint, bounded spacing and growth (design rules, no source). */
class MeshTest {

    @Test
    void hemtOnThickBufferNeedsHundredsNotThousandsOfNodes() {
        double[] bp = {0, 2 * NM, 27 * NM, 28 * NM, 2028 * NM};
        Mesh m = Mesh.generate(bp, MeshPolicy.DEFAULT);
        assertTrue(m.size() > 150 && m.size() < 2000, "nodes: " + m.size());
        for (double b : bp) {
            assertEquals(b, m.node(m.nearestNode(b)), 0.0, "breakpoint " + b + " is a node");
        }
        assertTrue(m.maxSpacing() <= MeshPolicy.DEFAULT.maxSpacing() * (1 + 1e-9));
        // fine at interfaces
        int k = m.nearestNode(28 * NM);
        assertTrue(m.spacing(k) <= 0.11 * NM && m.spacing(k - 1) <= 0.11 * NM);
    }

    @Property(tries = 100)
    void spacingGrowsBoundedly(@ForAll @DoubleRange(min = 0.5, max = 3000) double lengthNm,
            @ForAll @DoubleRange(min = 1.01, max = 1.3) double ratio) {
        MeshPolicy p = new MeshPolicy(0.1 * NM, ratio, 20 * NM);
        Mesh m = Mesh.generate(new double[] {0, lengthNm * NM}, p);
        assertEquals(lengthNm * NM, m.node(m.size() - 1), 0.0);
        for (int i = 0; i + 1 < m.size() - 1; i++) {
            double r = m.spacing(i + 1) / m.spacing(i);
            // the local rule h(s) = h0 + (g - 1) s keeps consecutive spacings within about g of each other
            assertTrue(r < ratio * 1.05 + 1e-9 && r > 1 / (ratio * 1.05) - 1e-9, "ratio " + r + " at " + i);
        }
        // the first cell spans one unit of integral ds/h(s): h0 (e^c - 1)/c with c = g - 1
        double c = ratio - 1;
        assertTrue(m.spacing(0) <= 0.1 * NM * Math.expm1(c) / c * (1 + 1e-9), "first spacing " + m.spacing(0));
    }

    @Test
    void refiningHalvesTheSpacing() {
        double[] bp = {0, 25 * NM, 2025 * NM};
        Mesh coarse = Mesh.generate(bp, MeshPolicy.DEFAULT);
        Mesh fine = Mesh.generate(bp, MeshPolicy.DEFAULT.refined(2));
        double ratio = (fine.size() - 1.0) / (coarse.size() - 1.0);
        assertTrue(ratio > 1.9 && ratio < 2.1, "cell ratio " + ratio);
    }

    @Test
    void badInputIsRejected() {
        assertThrows(InvalidParameterException.class, () -> Mesh.of(new double[] {0, 1}));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> Mesh.of(new double[] {0, 2, 1}));
        assertTrue(e.getMessage().contains("mesh node 2"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> Mesh.of(new double[] {0, Double.NaN, 1}));
        assertThrows(InvalidParameterException.class,
                () -> Mesh.generate(new double[] {0, 5 * NM, 5 * NM}, MeshPolicy.DEFAULT));
        assertThrows(InvalidParameterException.class, () -> new MeshPolicy(0, 1.1, 1e-8));
        assertThrows(InvalidParameterException.class, () -> new MeshPolicy(1e-10, 1.1, 1e-11));
        assertThrows(InvalidParameterException.class, () -> MeshPolicy.DEFAULT.refined(0.5));
        assertTrue(Arrays.stream(Mesh.generate(new double[] {0, NM}, MeshPolicy.DEFAULT).nodes()).allMatch(Double::isFinite));
    }
}
