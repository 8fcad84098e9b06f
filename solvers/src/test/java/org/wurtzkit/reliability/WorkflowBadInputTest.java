package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.reliability.BadInput.row;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.DesignMap;
import org.wurtzkit.solvers.workflow.DesignMapResult;
import org.wurtzkit.solvers.workflow.ParameterSetSpread;
import org.wurtzkit.solvers.workflow.StructureFamilies;
import org.wurtzkit.solvers.workflow.StructureFamily;
import org.wurtzkit.solvers.workflow.TargetOutOfReachException;
import org.wurtzkit.solvers.workflow.TargetSearch;
import org.wurtzkit.solvers.workflow.TemperatureSweep;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/**
 * Bad-input table of the design workflows (issue #7): bias grids with no or one point, NaN and
 * non-monotonic biases, biases outside the gate's range, temperature lists, target searches,
 * structure families, design-map axes and options, parameter-set spreads and threshold
 * definitions. Every rejection is an {@link org.wurtzkit.errors.InvalidParameterException} naming
 * parameter, value and allowed range, raised before any solve; the ranges are those of the Javadoc.
 */
@Tag("reliability")
class WorkflowBadInputTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final double NAN = Double.NaN;
    private static final double INF = Double.POSITIVE_INFINITY;

    static Structure hemt() {
        return StandardStacks.hemt(SET, 1000, 0.25, 25, 0, TopBoundary.schottky(1).atBiasV(0));
    }

    static Stream<Arguments> biasGrids() {
        String n = "number of gate biases";
        return Stream.of(
                row("no biases", () -> BiasGrid.of(), n, "0", "[2, ...) (a sweep needs two points at least)"),
                row("one bias", () -> BiasGrid.of(0.0), n, "1", "[2, ...) (a sweep needs two points at least)"),
                row("null biases", () -> BiasGrid.of((double[]) null), "gate biases", "null", "(non-null)"),
                row("NaN bias", () -> BiasGrid.of(0, NAN), "gate bias [1] (V)", NAN, "(finite)"),
                row("+inf bias", () -> BiasGrid.of(INF, 0), "gate bias [0] (V)", INF, "(finite)"),
                row("repeated bias", () -> BiasGrid.of(0, 1, 1), "gate bias [2] (V)", 1.0,
                        "(1.0, +inf) (biases must be strictly monotonic)"),
                row("turning back", () -> BiasGrid.of(0, -1, 0.5), "gate bias [2] (V)", 0.5,
                        "(-inf, -1.0) (biases must be strictly monotonic)"),
                row("linear range with no points", () -> BiasGrid.linear(-2, 0, 0), n, "0", "[2, 1000000]"),
                row("linear range with one point", () -> BiasGrid.linear(-2, 0, 1), n, "1", "[2, 1000000]"),
                row("empty linear range", () -> BiasGrid.linear(0, 0, 5), "last gate bias (V)", 0.0,
                        "any finite value other than the first bias 0.0 (empty bias range)"),
                row("linear from NaN", () -> BiasGrid.linear(NAN, 0, 5), "first gate bias (V)", NAN, "(finite)"),
                row("linear to -inf", () -> BiasGrid.linear(0, -INF, 5), "last gate bias (V)", -INF, "(finite)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("biasGrids")
    void biasGridRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    /** Issue #14: a linear grid between finite biases whose difference overflows is finite and exact at the ends. */
    @Test
    void linearGridAcrossTheWholeDoubleRangeIsFinite() {
        double[] v = BiasGrid.linear(-1e308, 1e308, 3).values();
        org.junit.jupiter.api.Assertions.assertArrayEquals(new double[] {-1e308, 0, 1e308}, v, 0.0);
        double[] w = BiasGrid.linear(1.7e308, -1.7e308, 5).values();
        for (int i = 1; i < w.length; i++) {
            assertTrue(Double.isFinite(w[i]) && w[i] < w[i - 1], java.util.Arrays.toString(w));
        }
    }

    static Stream<Arguments> sweeps() {
        BiasSweep sweep = new BiasSweep();
        TemperatureSweep tSweep = new TemperatureSweep();
        Structure free = hemt().withTop(TopBoundary.freeSurfacePerCm2(1.65, 1e13));
        String t = "(0, 2000]";
        return Stream.of(
                row("bias sweep without a gate", () -> sweep.run(free, -1, 0), "top boundary", String.valueOf(free.top()),
                        "a Schottky gate (a bias sweep needs a gate)"),
                row("bias beyond the gate's range", () -> sweep.run(hemt(), -150, 0), "gate bias (V)", -150.0,
                        "[-100, 20]"),
                // issue #14: BiasGrid.linear(-1e308, 1e308, 3) reported NaN for finite inputs; the grid is
                // now {-1e308, 0, 1e308} and the sweep refuses its first bias by the gate's range
                row("bias grid spanning the doubles", () -> sweep.run(hemt(), BiasGrid.linear(-1e308, 1e308, 3)),
                        "gate bias (V)", -1e308, "[-100, 20]"),
                row("null grid", () -> sweep.run(hemt(), (BiasGrid) null), "bias grid", "null", "(non-null)"),
                row("null solver", () -> new BiasSweep(null), "solver", "null", "(non-null)"),
                row("no temperatures", () -> tSweep.run(hemt()), "number of temperatures", "0", "[1, ...)"),
                row("temperature NaN", () -> tSweep.run(hemt(), 300, NAN), "temperature [1] (K)", NAN, t),
                row("temperature 0 K", () -> tSweep.run(hemt(), 0), "temperature [0] (K)", 0.0, t),
                row("temperature -inf", () -> tSweep.run(hemt(), -INF, 300), "temperature [0] (K)", -INF, t),
                row("temperature 5000 K", () -> tSweep.run(hemt(), 300, 5000), "temperature [1] (K)", 5000.0, t),
                row("temperatures turning back", () -> tSweep.run(hemt(), 300, 200, 250), "temperature [2] (K)", 250.0,
                        "(0, 200.0) (temperatures must be strictly monotonic)"),
                row("threshold level zero", () -> ThresholdDefinition.constantDensity(0),
                        "threshold sheet-density level (cm^-2)", 0.0, "(0, +inf), finite"),
                row("threshold level NaN", () -> ThresholdDefinition.constantDensity(NAN),
                        "threshold sheet-density level (cm^-2)", NAN, "(0, +inf), finite"),
                row("extraction without grid", () -> new ThresholdExtraction(null, ThresholdDefinition.linearExtrapolation()),
                        "bias grid", "null", "(non-null)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sweeps")
    void sweepRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    static Stream<Arguments> targets() {
        TargetSearch search = new TargetSearch();
        StructureFamily d = StructureFamilies.layerThicknessNm(hemt(), "barrier");
        StructureFamily x = StructureFamilies.alFraction(hemt(), "barrier");
        ThresholdExtraction ex = new ThresholdExtraction(BiasGrid.linear(-6, 0, 7), ThresholdDefinition.constantDensity(1e11));
        String th = "thickness of layer \"barrier\" (nm)";
        Structure graded = Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 1000 * NM))
                .grow(Layer.graded("g", Composition.GAN, Composition.alGaN(0.3), 20 * NM)).top(TopBoundary.schottky(1).atBiasV(0))
                .build();
        return Stream.of(
                row("too few evaluations", () -> new TargetSearch(new SelfConsistentSolver(), 2),
                        "maximum number of evaluations", "2", "[3, 10000]"),
                row("target n_s zero", () -> search.sheetDensity(d, 10, 30, 0, 0.01), "target sheet density (cm^-2)", 0.0,
                        "(0, +inf), finite"),
                row("target n_s NaN", () -> search.sheetDensity(d, 10, 30, NAN, 0.01), "target sheet density (cm^-2)", NAN,
                        "(0, +inf), finite"),
                row("tolerance zero", () -> search.sheetDensity(d, 10, 30, 1e13, 0),
                        "relative tolerance on the sheet density", 0.0, "[1.0E-9, 0.5]"),
                row("interval reversed", () -> search.sheetDensity(d, 30, 10, 1e13, 0.01),
                        "upper end of the barrier_thickness interval", 10.0, "(30.0, +inf) (above the lower end)"),
                row("empty interval", () -> search.sheetDensity(d, 10, 10, 1e13, 0.01),
                        "upper end of the barrier_thickness interval", 10.0, "(10.0, +inf) (above the lower end)"),
                row("interval from NaN", () -> search.sheetDensity(d, NAN, 30, 1e13, 0.01),
                        "lower end of the barrier_thickness interval", NAN, "(finite)"),
                row("interval to +inf", () -> search.sheetDensity(x, 0.1, INF, 1e13, 0.01),
                        "upper end of the barrier_al_fraction interval", INF, "(finite)"),
                row("target V_th NaN", () -> search.thresholdVoltage(d, 10, 30, NAN, 0.01, ex),
                        "target threshold voltage (V)", NAN, "(finite)"),
                row("V_th tolerance zero", () -> search.thresholdVoltage(d, 10, 30, -3, 0, ex),
                        "tolerance on the threshold voltage (V)", 0.0, "[1.0E-9, 10]"),
                row("unknown layer", () -> StructureFamilies.layerThicknessNm(hemt(), "cap"),
                        "number of layers named \"cap\"", "0", "[1, 1] (layers of the template: [buffer, barrier])"),
                row("thickness NaN", () -> d.at(NAN), th, NAN, "[0, 1000000]"),
                row("thickness negative", () -> d.at(-1), th, -1.0, "[0, 1000000]"),
                row("Al fraction above 1", () -> x.at(1.5), "Al fraction x", 1.5, "[0, 1]"),
                row("Al fraction of a graded layer", () -> StructureFamilies.alFraction(graded, "g"),
                        "material of layer \"g\"", "GaN -> Al0.3Ga0.7N",
                        "a uniform alloy of the parameter set (not graded, not custom)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("targets")
    void targetSearchRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    static Stream<Arguments> maps() {
        DesignMap.Builder b = DesignMap.builder(p -> hemt());
        ParameterSetSpread spread = new ParameterSetSpread(new SelfConsistentSolver(),
                new ThresholdExtraction(BiasGrid.linear(-6, 0, 4), ThresholdDefinition.linearExtrapolation()));
        return Stream.of(
                row("map without axes", () -> DesignMap.builder(p -> hemt()).build(), "number of design-map axes", "0",
                        "[1, ...) (add an axis)"),
                row("axis without values", () -> Axis.of("x", ""), "number of values of axis x", "0", "[1, ...)"),
                row("axis value NaN", () -> Axis.of("x", "", 0.1, NAN), "value [1] of axis x", NAN, "(finite)"),
                row("linear axis with no points", () -> Axis.linear("x", "", 0, 1, 0), "number of values of axis x", "0",
                        "[1, 1000000]"),
                row("linear axis from -inf", () -> Axis.linear("x", "", -INF, 1, 3), "first value of axis x", -INF,
                        "(finite)"),
                row("too many points", () -> DesignMap.builder(p -> hemt()).axis(Axis.linear("a", "", 0, 1, 100_000))
                        .axis(Axis.linear("b", "", 0, 1, 100_000)).build(), "number of design-map points", "10000000000",
                        "[1, " + (Integer.MAX_VALUE - 8) + "]"),
                row("no threads", () -> b.threads(0), "thread count", "0", "[1, 1024]"),
                row("too many threads", () -> b.threads(2000), "thread count", "2000", "[1, 1024]"),
                row("no quantities", () -> b.quantities(), "number of quantities", "0", "[1, ...)"),
                row("blank column name", () -> Column.of(" ", ""), "column name", "\" \"",
                        "non-blank text without commas, quotes or line breaks"),
                row("column name with a comma", () -> Column.of("a,b", ""), "column name", "\"a,b\"",
                        "non-blank text without commas, quotes or line breaks"),
                row("null factory", () -> DesignMap.builder(null), "structure factory", "null", "(non-null)"),
                // issue #14: a null element gave a NullPointerException from List.copyOf
                row("spread over a null set", () -> spread.run(ReliabilityStructures::forSet,
                        java.util.Arrays.asList(ParameterSets.defaultSet(), null)), "parameter sets[1]", "null",
                        "(non-null)"),
                row("spread over no sets", () -> spread.run(ReliabilityStructures::forSet, List.of()),
                        "number of parameter sets", "0", "[1, ...) (is wurtzkit-materials-data on the class path?)"),
                row("spread with no threads", () -> spread.withThreads(0), "thread count", "0", "[1, 1024]"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("maps")
    void designMapAndSpreadReject(BadInput.Case c) {
        BadInput.check(c);
    }

    /** A target that the interval cannot reach is reported with the reachable range (two solves). */
    @Test
    void unreachableTargetNamesTheReachableRange() {
        StructureFamily d = StructureFamilies.layerThicknessNm(hemt(), "barrier");
        TargetOutOfReachException e = assertThrows(TargetOutOfReachException.class,
                () -> new TargetSearch().sheetDensity(d, 10, 30, 1e15, 0.01));
        assertEquals("target sheet_density (cm^-2)", e.parameter(), e.getMessage());
        assertEquals(Double.toString(1e15), e.value());
        assertTrue(e.reachableMin() < e.reachableMax() && e.reachableMax() < 1e15, e.getMessage());
        assertTrue(e.allowedRange().contains("barrier_thickness in [10, 30] nm"), e.getMessage());
    }

    /** A threshold level the sweep never crosses is reported with the densities the sweep spans. */
    @Test
    void uncrossedThresholdLevelNamesTheSweptRange() {
        BiasSweepResult r = new BiasSweep().run(hemt(), -1, 0);
        assertTrue(r.failures().isEmpty(), r.failures().toString());
        org.wurtzkit.errors.InvalidParameterException e = assertThrows(org.wurtzkit.errors.InvalidParameterException.class,
                () -> r.thresholdVoltage(ThresholdDefinition.constantDensity(1e9)));
        assertEquals("threshold sheet-density level (cm^-2)", e.parameter());
        assertTrue(e.allowedRange().contains("widen the bias range"), e.getMessage());
        assertThrows(org.wurtzkit.errors.InvalidParameterException.class, () -> r.capacitanceVoltage().chargeChange(-1, 1));
    }

    /** A point whose structure cannot be built is recorded with the reason, and the map goes on. */
    @Test
    void invalidDesignPointIsRecordedWithItsReason() {
        DesignMapResult r = DesignMap.builder(p -> StructureFamilies.alFraction(hemt(), "barrier").at(p[0]))
                .axis(Axis.of("al", "", 0.25, 1.2)).threads(1).build().run();
        assertTrue(r.succeeded(0));
        assertFalse(r.succeeded(1));
        assertEquals(ErrorKind.INVALID_PARAMETER, r.failure(1).orElseThrow().kind());
        String why = r.failure(1).orElseThrow().message();
        assertTrue(why.contains("Al fraction x = 1.2") && why.contains("[0, 1]"), why);
        // documented: a failed point's values are NaN, never a stale or default number
        assertTrue(Double.isNaN(r.value(1, 0)), "a failed point carries no number: " + r.value(1, 0));
        assertTrue(Double.isFinite(r.value(0, 0)) && r.value(0, 0) > 1e12, "point 0: " + r.value(0, 0));
    }
}
