package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.DesignMap;
import org.wurtzkit.solvers.workflow.DesignMapResult;
import org.wurtzkit.solvers.workflow.ParameterSetSpread;
import org.wurtzkit.solvers.workflow.PointFailure;
import org.wurtzkit.solvers.workflow.SpreadResult;
import org.wurtzkit.solvers.workflow.StructureFamilies;
import org.wurtzkit.solvers.workflow.StructureFamily;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.structure.Structure;

/**
 * Thread safety and determinism of the workflows (issue #7): a design map gives the same bits for
 * 1 and 4 threads (its Javadoc promises this), a shared bias sweep run from several threads at
 * once equals a serial run, and a parameter-set spread does not depend on its thread count.
 */
@Tag("reliability")
class WorkflowThreadSafetyTest {
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver();

    @Test
    void designMapIsIdenticalForOneAndFourThreads() {
        Structure template = WorkflowBadInputTest.hemt();
        StructureFamily x = StructureFamilies.alFraction(template, "barrier");
        DesignMap.Builder b = DesignMap.builder(p -> StructureFamilies.layerThicknessNm(x.at(p[0]), "barrier").at(p[1]))
                .axis(Axis.of("al", "", 0.2, 0.3)).axis(Axis.of("barrier", "nm", 10, 20, 30)).solver(SOLVER);
        DesignMapResult one = b.threads(1).build().run();
        DesignMapResult four = b.threads(4).build().run();
        assertEquals(one.size(), four.size());
        for (int i = 0; i < one.size(); i++) {
            assertTrue(one.succeeded(i), one.failure(i).map(PointFailure::message).orElse(""));
            assertArrayEquals(one.values(i), four.values(i), "point " + i);
            for (int c = 0; c < one.values(i).length; c++) {
                assertEquals(Double.doubleToRawLongBits(one.value(i, c)), Double.doubleToRawLongBits(four.value(i, c)));
            }
        }
    }

    @Test
    void sharedBiasSweepFromManyThreadsEqualsSerial() throws Exception {
        BiasSweep sweep = new BiasSweep(SOLVER);
        Structure s = WorkflowBadInputTest.hemt();
        BiasGrid grid = BiasGrid.linear(-4, 0.5, 6);
        BiasSweepResult serial = sweep.run(s, grid);
        assertTrue(serial.failures().isEmpty(), serial.failures().toString());
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            CountDownLatch go = new CountDownLatch(1);
            List<Future<BiasSweepResult>> fs = new ArrayList<>();
            for (int t = 0; t < 4; t++) {
                fs.add(pool.submit(() -> {
                    go.await();
                    return sweep.run(s, grid);
                }));
            }
            go.countDown();
            for (Future<BiasSweepResult> f : fs) {
                BiasSweepResult r = f.get(120, TimeUnit.SECONDS);
                assertArrayEquals(serial.sheetDensityPerCm2(), r.sheetDensityPerCm2());
                assertArrayEquals(serial.gateCharge(), r.gateCharge());
                for (int i = 0; i < grid.size(); i++) {
                    assertEquals(Fingerprint.of(serial.solution(i).orElseThrow()), Fingerprint.of(r.solution(i).orElseThrow()),
                            "bias point " + i);
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void parameterSetSpreadDoesNotDependOnTheThreadCount() {
        ParameterSetSpread spread = new ParameterSetSpread(SOLVER,
                new ThresholdExtraction(BiasGrid.linear(-7, 0, 8), ThresholdDefinition.linearExtrapolation()));
        SpreadResult one = spread.withThreads(1).run(ReliabilityStructures::forSet, ParameterSets.all());
        SpreadResult two = spread.withThreads(2).run(ReliabilityStructures::forSet, ParameterSets.all());
        assertEquals(one.members(), two.members());
        for (SpreadResult.Member m : one.members()) {
            assertTrue(m.succeeded(), m.toString());
        }
    }
}
