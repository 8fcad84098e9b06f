package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;

/** Parallel design maps over Al fraction and barrier thickness. */
class DesignMapTest {
    private static final StructureFactory HEMT = p -> Hemts.hemt(Hemts.DEFAULT_SET, p[0], p[1], 1.0);

    private static DesignMap.Builder grid() {
        return DesignMap.builder(HEMT)
                .axis(Axis.of("al_fraction", "", 0.20, 0.25, 0.30))
                .axis(Axis.of("barrier_thickness", "nm", 15, 25, 35))
                .solver(Hemts.SOLVER)
                .quantities(Quantity.SHEET_DENSITY, Quantity.GATE_CHARGE, Quantity.GROUND_SUBBAND);
    }

    /**
     * A map on three threads equals the serial map bit for bit (doubles compared with ==), and
     * every point equals a direct cold solve of its structure bit for bit.
     */
    @Test
    void parallelEqualsSerialBitForBit() {
        DesignMapResult serial = grid().threads(1).build().run();
        DesignMapResult parallel = grid().threads(3).build().run();
        assertEquals(9, serial.size());
        assertTrue(serial.failures().isEmpty(), () -> serial.failures().toString());
        for (int i = 0; i < serial.size(); i++) {
            double[] a = serial.values(i);
            double[] b = parallel.values(i);
            for (int c = 0; c < a.length; c++) {
                assertTrue(a[c] == b[c], "point " + i + " column " + c + ": " + a[c] + " vs " + b[c]);
            }
            double[] p = serial.parameters(i);
            double direct = Hemts.SOLVER.solve(HEMT.at(p)).sheetDensityPerCm2();
            assertTrue(direct == serial.value(i, 0), "point " + i + " against a direct solve");
        }
        // row-major order: last axis fastest
        assertEquals(0.25, serial.parameters(serial.index(1, 2))[0]);
        assertEquals(35.0, serial.parameters(serial.index(1, 2))[1]);
        assertEquals(5, serial.index(1, 2));
        // n_s rises with x and d (common practice, no source)
        double[] ns = serial.column("sheet_density");
        assertTrue(ns[serial.index(2, 1)] > ns[serial.index(0, 1)]);
        assertTrue(ns[serial.index(1, 2)] > ns[serial.index(1, 0)]);
    }

    /** Progress: one call per point, serialized, done = 1, 2, ..., total, from worker threads. */
    @Test
    void progressIsReportedOncePerPointInOrder() {
        List<int[]> calls = Collections.synchronizedList(new ArrayList<>());
        List<String> threads = Collections.synchronizedList(new ArrayList<>());
        DesignMapResult r = grid().threads(2).progress((done, total) -> {
            calls.add(new int[] {done, total});
            threads.add(Thread.currentThread().getName());
        }).build().run();
        assertEquals(r.size(), calls.size());
        for (int i = 0; i < calls.size(); i++) {
            assertEquals(i + 1, calls.get(i)[0]);
            assertEquals(9, calls.get(i)[1]);
        }
        assertTrue(threads.stream().allMatch(n -> n.startsWith("wurtzkit-workflow-")), threads.toString());
    }

    /** A point whose structure cannot be built, or whose solve fails, is recorded; the map goes on. */
    @Test
    void failedPointsAreRecordedAndDoNotAbortTheMap() throws IOException {
        DesignMapResult r = DesignMap.builder(HEMT)
                .axis(Axis.of("al_fraction", "", 0.25, 1.5))
                .axis(Axis.of("barrier_thickness", "nm", 25))
                .solver(Hemts.SOLVER).threads(2).build().run();
        assertTrue(r.succeeded(0));
        assertFalse(r.succeeded(1));
        assertEquals(1, r.failures().size());
        assertEquals(ErrorKind.INVALID_PARAMETER, r.failure(1).orElseThrow().kind());
        String why = r.failure(1).orElseThrow().message();
        assertTrue(why.startsWith("InvalidParameterException: Al fraction x = 1.5"), why);
        assertTrue(r.failures().get(0).where().contains("al_fraction = 1.5"), r.failures().get(0).where());
        assertTrue(Double.isNaN(r.value(1, 0)));
        assertTrue(r.value(0, 0) > 1e12);
        StringWriter w = new StringWriter();
        r.writeCsv(w);
        assertTrue(w.toString().startsWith("# produced by wurtzkit "), w::toString);
        String[] lines = w.toString().lines().filter(l -> !l.startsWith("# ")).toArray(String[]::new);
        assertEquals("al_fraction,barrier_thickness_nm,sheet_density_cm^-2,gate_charge_C/m^2,status", lines[0]);
        assertTrue(w.toString().contains("# warning: point failed: "), w::toString);
        assertTrue(lines[1].endsWith(",ok"), lines[1]);
        assertTrue(lines[2].startsWith("1.5,25.0,,,\"failed: InvalidParameterException"), lines[2]);

        DesignMapResult starved = DesignMap.builder(HEMT)
                .axis(Axis.of("al_fraction", "", 0.2, 0.3)).axis(Axis.of("barrier_thickness", "nm", 25))
                .solver(new SelfConsistentSolver(Hemts.COARSE.withMaxIterations(1))).threads(2).build().run();
        assertEquals(2, starved.failures().size());
        assertTrue(starved.failure(0).orElseThrow().message().startsWith("NotConvergedException"));
        assertEquals(ErrorKind.NOT_CONVERGED, starved.failure(0).orElseThrow().kind());
    }

    /** The threshold evaluator of a map equals a direct extraction, bit for bit. */
    @Test
    void thresholdMapEqualsDirectExtraction(@TempDir Path dir) throws IOException {
        ThresholdExtraction how = new ThresholdExtraction(BiasGrid.linear(0, -5, 21),
                ThresholdDefinition.constantDensity(1e11));
        DesignMapResult r = DesignMap.builder(HEMT)
                .axis(Axis.of("al_fraction", "", 0.2, 0.3)).axis(Axis.of("barrier_thickness", "nm", 15))
                .solver(Hemts.SOLVER).evaluator(PointEvaluator.thresholdVoltage(how)).threads(2).build().run();
        for (int i = 0; i < 2; i++) {
            double direct = how.thresholdVoltage(HEMT.at(r.parameters(i)), new BiasSweep(Hemts.SOLVER));
            assertTrue(direct == r.value(i, 0), direct + " vs " + r.value(i, 0));
        }
        Path file = dir.resolve("vth.csv");
        r.writeCsv(file);
        String text = Files.readString(file);
        assertTrue(text.startsWith("# produced by wurtzkit "), text);
        assertTrue(text.contains("evaluator=threshold voltage per point: " + how), text);
        assertTrue(text.lines().filter(l -> !l.startsWith("# ")).findFirst().orElseThrow()
                .equals("al_fraction,barrier_thickness_nm,threshold_voltage_V,status"), text);
    }

    @Test
    void badInputIsRejected() {
        assertThrows(InvalidParameterException.class, () -> DesignMap.builder(HEMT).build());
        assertThrows(InvalidParameterException.class, () -> Axis.of("x", ""));
        assertThrows(InvalidParameterException.class, () -> Axis.of("x", "", 0.2, Double.NaN));
        assertThrows(InvalidParameterException.class, () -> Axis.linear("x", "", 0.1, 0.3, 0));
        assertThrows(InvalidParameterException.class, () -> Axis.linear("x", "", Double.NaN, 0.3, 3));
        assertThrows(InvalidParameterException.class, () -> Axis.of("a,b", "", 1));
        assertThrows(InvalidParameterException.class, () -> DesignMap.builder(null));
        assertThrows(InvalidParameterException.class, () -> grid().threads(0));
        assertThrows(InvalidParameterException.class, () -> grid().quantities());
        DesignMapResult r = DesignMap.builder(HEMT).axis(Axis.of("al_fraction", "", 0.25))
                .axis(Axis.of("barrier_thickness", "nm", 25)).solver(Hemts.SOLVER).threads(1).build().run();
        assertThrows(InvalidParameterException.class, () -> r.index(0));
        assertThrows(InvalidParameterException.class, () -> r.index(0, 1));
        assertThrows(InvalidParameterException.class, () -> r.column("mobility"));
    }
}
