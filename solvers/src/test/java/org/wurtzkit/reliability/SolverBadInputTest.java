package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.reliability.BadInput.row;
import static org.wurtzkit.units.Units.NM;

import java.time.Duration;
import java.util.function.Supplier;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.mesh.Mesh;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.schrodinger.EffectiveMassHamiltonian;
import org.wurtzkit.solvers.sp.Carrier;
import org.wurtzkit.solvers.sp.FermiContact;
import org.wurtzkit.solvers.sp.QuasiFermiLevels;
import org.wurtzkit.solvers.sp.NotConvergedException;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.PotentialPredictor;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/**
 * Bad-input table of the solvers module (issue #7): solver options, mesh policy, quantum windows
 * (including windows outside the stack), band alignment, the effective-mass Hamiltonian, and
 * structures that only the solver can judge. Expected ranges are those of each entry point's
 * Javadoc. A second table drives the solver with the extreme values that the documentation allows:
 * each must converge or fail with the documented {@link NotConvergedException}, never anything
 * else and never a hang.
 */
@Tag("reliability")
class SolverBadInputTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final double NAN = Double.NaN;
    private static final double INF = Double.POSITIVE_INFINITY;
    private static final SolverOptions D = SolverOptions.defaults();

    private static Structure hemt() {
        return StandardStacks.hemt(SET, 1000, 0.25, 25, 0, TopBoundary.schottky(1).atBiasV(0));
    }

    private static SolverOptions newtonTolerance(double v) {
        return new SolverOptions(D.tolerance(), D.maxIterations(), v, D.maxNewtonIterations(), D.maxNewtonStep(), D.mesh(),
                D.quantumWindows(), D.maxSubbands(), D.subbandCutoffKT(), D.quasiFermiLevels(), D.quantumHoles(), D.densityOfStatesMass());
    }

    private static SolverOptions nulls(int which) {
        return new SolverOptions(D.tolerance(), D.maxIterations(), D.newtonTolerance(), D.maxNewtonIterations(),
                D.maxNewtonStep(), which == 0 ? null : D.mesh(), which == 1 ? null : D.quantumWindows(), D.maxSubbands(),
                D.subbandCutoffKT(), which == 2 ? null : D.quasiFermiLevels(), D.quantumHoles(), D.densityOfStatesMass());
    }

    static Stream<Arguments> options() {
        String tol = "tolerance (V)";
        String tolr = "[1.0E-12, 0.01]";
        String it = "maxIterations";
        String nt = "newtonTolerance (V)";
        String ntr = "[1.0E-14, 0.001]";
        String step = "maxNewtonStep (V)";
        String stepr = "[0.001, 10]";
        String cut = "subbandCutoffKT";
        return Stream.of(
                row("tolerance NaN", () -> D.withTolerance(NAN), tol, NAN, tolr),
                row("tolerance +inf", () -> D.withTolerance(INF), tol, INF, tolr),
                row("tolerance -inf", () -> D.withTolerance(-INF), tol, -INF, tolr),
                row("tolerance zero", () -> D.withTolerance(0), tol, 0.0, tolr),
                row("tolerance negative", () -> D.withTolerance(-1e-6), tol, -1e-6, tolr),
                row("tolerance below 1e-12", () -> D.withTolerance(1e-13), tol, 1e-13, tolr),
                row("tolerance above 1e-2", () -> D.withTolerance(0.1), tol, 0.1, tolr),
                row("no outer iterations", () -> D.withMaxIterations(0), it, "0", "[1, 10000]"),
                row("negative outer iterations", () -> D.withMaxIterations(-5), it, "-5", "[1, 10000]"),
                row("too many outer iterations", () -> D.withMaxIterations(10001), it, "10001", "[1, 10000]"),
                row("Newton tolerance NaN", () -> newtonTolerance(NAN), nt, NAN, ntr),
                row("Newton tolerance zero", () -> newtonTolerance(0), nt, 0.0, ntr),
                row("Newton tolerance +inf", () -> newtonTolerance(INF), nt, INF, ntr),
                row("Newton tolerance 1e-2", () -> newtonTolerance(1e-2), nt, 1e-2, ntr),
                row("no Newton steps", () -> D.withMaxNewtonIterations(0), "maxNewtonIterations", "0", "[1, 100000]"),
                row("too many Newton steps", () -> D.withMaxNewtonIterations(100001), "maxNewtonIterations", "100001",
                        "[1, 100000]"),
                row("Newton step NaN", () -> D.withMaxNewtonStep(NAN), step, NAN, stepr),
                row("Newton step zero", () -> D.withMaxNewtonStep(0), step, 0.0, stepr),
                row("Newton step negative", () -> D.withMaxNewtonStep(-0.5), step, -0.5, stepr),
                row("Newton step +inf", () -> D.withMaxNewtonStep(INF), step, INF, stepr),
                row("Newton step 11 V", () -> D.withMaxNewtonStep(11), step, 11.0, stepr),
                row("no subbands", () -> D.withMaxSubbands(0), "maxSubbands", "0", "[1, 2000]"),
                row("too many subbands", () -> D.withMaxSubbands(2001), "maxSubbands", "2001", "[1, 2000]"),
                row("cut-off NaN", () -> D.withSubbandCutoffKT(NAN), cut, NAN, "[1, 200]"),
                row("cut-off 0.5 kT", () -> D.withSubbandCutoffKT(0.5), cut, 0.5, "[1, 200]"),
                row("cut-off +inf", () -> D.withSubbandCutoffKT(INF), cut, INF, "[1, 200]"),
                row("cut-off 201 kT", () -> D.withSubbandCutoffKT(201), cut, 201.0, "[1, 200]"),
                row("null mesh policy", () -> D.withMesh(null), "mesh policy", "null", "(non-null)"),
                row("null quantum windows", () -> D.withQuantumWindows(null), "quantum windows", "null", "(non-null)"),
                row("null quasi-Fermi levels", () -> D.withQuasiFermiLevels(null), "quasi-Fermi levels", "null", "(non-null)"),
                row("null band alignment", () -> Structure.builder(SET).bandAlignment(null), "band alignment", "null", "(non-null)"),
                row("null mesh policy (constructor)", () -> nulls(0), "mesh policy", "null", "(non-null)"),
                row("null quantum windows (constructor)", () -> nulls(1), "quantum windows", "null", "(non-null)"),
                row("null quasi-Fermi levels (constructor)", () -> nulls(2), "quasi-Fermi levels", "null", "(non-null)"),
                row("conduction-band fraction NaN", () -> BandAlignment.conductionBandFraction(NAN),
                        "conduction-band offset fraction", NAN, "[0, 1]"),
                row("conduction-band fraction 1.1", () -> BandAlignment.conductionBandFraction(1.1),
                        "conduction-band offset fraction", 1.1, "[0, 1]"),
                row("conduction-band fraction negative", () -> BandAlignment.conductionBandFraction(-0.3),
                        "conduction-band offset fraction", -0.3, "[0, 1]"),
                row("null options", () -> new SelfConsistentSolver(null), "solver options", "null", "(non-null)"),
                row("null structure", () -> new SelfConsistentSolver().solve(null), "structure", "null", "(non-null)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("options")
    void solverOptionsReject(BadInput.Case c) {
        BadInput.check(c);
    }

    static Stream<Arguments> mesh() {
        String h0 = "mesh interface spacing (m)";
        String h0r = "[1.0E-12, 1.0E-6]";
        String g = "mesh growth ratio";
        String hm = "mesh maximum spacing (m)";
        String f = "mesh refinement factor";
        return Stream.of(
                row("spacing NaN", () -> new MeshPolicy(NAN, 1.06, 5e-8), h0, NAN, h0r),
                row("spacing zero", () -> new MeshPolicy(0, 1.06, 5e-8), h0, 0.0, h0r),
                row("spacing negative", () -> new MeshPolicy(-1e-10, 1.06, 5e-8), h0, -1e-10, h0r),
                row("spacing +inf", () -> new MeshPolicy(INF, 1.06, 5e-8), h0, INF, h0r),
                row("spacing below 1 pm", () -> new MeshPolicy(1e-13, 1.06, 5e-8), h0, 1e-13, h0r),
                row("spacing above 1 um", () -> new MeshPolicy(2e-6, 1.06, 5e-6), h0, 2e-6, h0r),
                row("growth ratio below 1", () -> new MeshPolicy(1e-10, 0.9, 5e-8), g, 0.9, "[1, 2] (1 for a uniform mesh)"),
                row("growth ratio above 2", () -> new MeshPolicy(1e-10, 2.5, 5e-8), g, 2.5, "[1, 2] (1 for a uniform mesh)"),
                row("growth ratio NaN", () -> new MeshPolicy(1e-10, NAN, 5e-8), g, NAN, "[1, 2] (1 for a uniform mesh)"),
                row("growth ratio +inf", () -> new MeshPolicy(1e-10, INF, 5e-8), g, INF, "[1, 2] (1 for a uniform mesh)"),
                row("max spacing below the interface spacing", () -> new MeshPolicy(1e-10, 1.06, 5e-11), hm, 5e-11,
                        "[1.0E-10, 1.0E-5]"),
                row("max spacing NaN", () -> new MeshPolicy(1e-10, 1.06, NAN), hm, NAN, "[1.0E-10, 1.0E-5]"),
                row("max spacing above 10 um", () -> new MeshPolicy(1e-10, 1.06, 1e-4), hm, 1e-4, "[1.0E-10, 1.0E-5]"),
                row("refinement below 1", () -> MeshPolicy.DEFAULT.refined(0.5), f, 0.5, "[1, 64]"),
                row("refinement NaN", () -> MeshPolicy.DEFAULT.refined(NAN), f, NAN, "[1, 64]"),
                row("refinement 100", () -> MeshPolicy.DEFAULT.refined(100), f, 100.0, "[1, 64]"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("mesh")
    void meshPolicyRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    /**
     * Issue #14: 1000 layers of 1 mm (20 million nodes) or a 1 pm mesh on a 100 um layer ended in an
     * OutOfMemoryError after minutes. The mesh counts its nodes before it allocates them and refuses
     * more than {@link Mesh#MAX_NODES}, naming the count, the stack and the policy. (The preemptive
     * timeout guards against a hang, it measures nothing.)
     */
    @Test
    void meshBeyondItsNodeLimitIsRefusedBeforeItIsBuilt() {
        Structure.Builder b = Structure.builder(SET);
        for (int i = 0; i < 1000; i++) {
            b.grow(Layer.of("L" + i, i % 2 == 0 ? Composition.GAN : Composition.alGaN(0.1), Layer.MAX_THICKNESS));
        }
        Structure thick = b.top(TopBoundary.schottky(1, 0)).build();
        SelfConsistentSolver classical = new SelfConsistentSolver(D.withQuantumWindows(QuantumWindows.none()));
        InvalidParameterException e = assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> assertThrows(InvalidParameterException.class, () -> classical.solve(thick)));
        assertTrue(e.parameter().equals("mesh node count") && e.getMessage().contains("[3, " + Mesh.MAX_NODES + "]")
                && e.getMessage().contains("a stack of 1.000 m") && e.getMessage().contains("mesh policy"), e.getMessage());

        Structure wide = Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 100e-6))
                .top(TopBoundary.schottky(1, 0)).build();
        SelfConsistentSolver fine = new SelfConsistentSolver(D.withQuantumWindows(QuantumWindows.none())
                .withMesh(new MeshPolicy(1e-12, 1.06, 1e-12)));
        InvalidParameterException f = assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> assertThrows(InvalidParameterException.class, () -> fine.solve(wide)));
        assertTrue(f.parameter().equals("mesh node count") && f.getMessage().contains("maximum spacing 1.00e-12 m"),
                f.getMessage());
    }

    /** The limit is exact: a mesh of just fewer nodes than the limit is built, one of more is not. */
    @Test
    void meshNodeLimitIsExact() {
        MeshPolicy uniform = new MeshPolicy(1e-9, 1.06, 1e-9);
        // with h0 = hMax every cell is 1 nm: a segment of k nm has k cells and the mesh k + 1 nodes
        double[] justBelow = {0, (Mesh.MAX_NODES - 1) * 1e-9};
        assertEquals(Mesh.MAX_NODES, Mesh.generate(justBelow, uniform).size());
        double[] justAbove = {0, Mesh.MAX_NODES * 1e-9};
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> Mesh.generate(justAbove, uniform));
        assertEquals("mesh node count", e.parameter());
    }

    static Stream<Arguments> quantumWindowsCases() {
        String ext = "quantum window extension around an interface (m)";
        String extr = "[1.0E-9, 1.0E-6]";
        String top = "quantum window top depth (m)";
        String bot = "quantum window bottom depth (m)";
        double total = hemt().totalThickness();
        double ten = 10 * NM;
        double twenty = 20 * NM;
        return Stream.of(
                row("extension NaN", () -> new QuantumWindows.Automatic(NAN), ext, NAN, extr),
                row("extension zero", () -> new QuantumWindows.Automatic(0), ext, 0.0, extr),
                row("extension 0.5 nm", () -> new QuantumWindows.Automatic(0.5e-9), ext, 0.5e-9, extr),
                row("extension 2 um", () -> new QuantumWindows.Automatic(2e-6), ext, 2e-6, extr),
                row("window top negative", () -> new QuantumWindows.Window(-1e-9, 5e-9), top, -1e-9, "[0, +inf), finite"),
                row("window top NaN", () -> new QuantumWindows.Window(NAN, 5e-9), top, NAN, "[0, +inf), finite"),
                row("window bottom NaN", () -> new QuantumWindows.Window(0, NAN), bot, NAN, "(finite)"),
                row("window bottom +inf", () -> new QuantumWindows.Window(0, INF), bot, INF, "(finite)"),
                row("window thinner than 1 nm", () -> new QuantumWindows.Window(5e-9, 5.5e-9), bot, 5.5e-9,
                        "[" + (5e-9 + 1e-9) + ", ...) (at least 1 nm below its top)"),
                row("window upside down", () -> new QuantumWindows.Window(5e-9, 4e-9), bot, 4e-9,
                        "[" + (5e-9 + 1e-9) + ", ...) (at least 1 nm below its top)"),
                // issue #14: NullPointerException from List.copyOf
                row("windows list null", () -> new QuantumWindows.Explicit(null), "quantum windows", "null", "(non-null)"),
                row("a null window", () -> new QuantumWindows.Explicit(java.util.Arrays.asList(
                        QuantumWindows.Window.nm(0, 20), null)), "quantum windows[1]", "null", "(non-null)"),
                row("no windows", () -> QuantumWindows.explicit(), "number of quantum windows", "0",
                        "[1, ...) (use QuantumWindows.none())"),
                row("overlapping windows", () -> QuantumWindows.explicit(QuantumWindows.Window.nm(0, 20),
                        QuantumWindows.Window.nm(10, 30)), "top of quantum window 1 (m)", ten,
                        "[" + twenty + ", ...) (below the previous window, no overlap)"),
                row("window reaching below the stack", () -> new SelfConsistentSolver(D.withQuantumWindows(
                        QuantumWindows.explicit(QuantumWindows.Window.nm(0, 1100)))).solve(hemt()), bot, 1100 * NM,
                        "[" + 1e-9 + ", " + total + "] (inside the stack, whose thickness is " + total + " m)"),
                row("window entirely below the stack", () -> new SelfConsistentSolver(D.withQuantumWindows(
                        QuantumWindows.explicit(QuantumWindows.Window.nm(5000, 5050)))).solve(hemt()), bot, 5050 * NM,
                        "[" + (5000 * NM + 1e-9) + ", " + total + "] (inside the stack, whose thickness is " + total
                                + " m)"),
                row("window too thin for a coarse mesh", () -> new SelfConsistentSolver(D.withMesh(
                        new MeshPolicy(1e-6, 2, 1e-5)).withQuantumWindows(QuantumWindows.explicit(
                                QuantumWindows.Window.nm(100, 101.5)))).solve(hemt()), "quantum window 0 node count", "3",
                        "[5, ...) (window too thin for the mesh)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("quantumWindowsCases")
    void quantumWindowsReject(BadInput.Case c) {
        BadInput.check(c);
    }

    static Stream<Arguments> hamiltonian() {
        double[] z = {0, 1e-10, 2e-10, 3e-10, 4e-10};
        double[] m = {0.2, 0.2, 0.2, 0.2};
        double[] v = new double[5];
        return Stream.of(
                row("mesh too short", () -> EffectiveMassHamiltonian.of(new double[] {0, 1e-10}, new double[] {0.2}),
                        "meshMetres.length", "2", "[3, 2147483647] (at least one interior node)"),
                row("mesh NaN", () -> EffectiveMassHamiltonian.of(new double[] {0, NAN, 2e-10}, new double[] {0.2, 0.2}),
                        "meshMetres[1]", NAN, "(-Infinity, +Infinity) (finite values only)"),
                row("mesh not increasing", () -> EffectiveMassHamiltonian.of(new double[] {0, 2e-10, 1e-10},
                        new double[] {0.2, 0.2}), "meshMetres[2]", 1e-10, "(" + 2e-10
                                + ", +Infinity): the mesh must be strictly increasing"),
                row("mass zero", () -> EffectiveMassHamiltonian.of(z, new double[] {0.2, 0, 0.2, 0.2}), "massRatio[1]",
                        0.0, "(0, +Infinity)"),
                row("mass NaN", () -> EffectiveMassHamiltonian.of(z, new double[] {0.2, 0.2, NAN, 0.2}), "massRatio[2]",
                        NAN, "(0, +Infinity)"),
                row("mass +inf", () -> EffectiveMassHamiltonian.of(z, new double[] {INF, 0.2, 0.2, 0.2}), "massRatio[0]",
                        INF, "(0, +Infinity)"),
                row("mass count", () -> EffectiveMassHamiltonian.of(z, new double[] {0.2}), "massRatio.length", "1",
                        "[4, 4] (one value per mesh interval)"),
                row("potential NaN", () -> EffectiveMassHamiltonian.of(z, m).lowest(new double[] {0, 0, NAN, 0, 0}, 1),
                        "potentialEv[2]", NAN, "(-Infinity, +Infinity) (finite values only)"),
                row("potential -inf", () -> EffectiveMassHamiltonian.of(z, m).lowest(new double[] {0, -INF, 0, 0, 0}, 1),
                        "potentialEv[1]", -INF, "(-Infinity, +Infinity) (finite values only)"),
                row("no states asked", () -> EffectiveMassHamiltonian.of(z, m).lowest(v, 0), "k", "0", "[1, 3]"),
                row("more states than nodes", () -> EffectiveMassHamiltonian.of(z, m).lowest(v, 4), "k", "4", "[1, 3]"),
                row("bound NaN", () -> EffectiveMassHamiltonian.of(z, m).below(v, NAN, 2), "energyBoundEv", NAN,
                        "[-Infinity, +Infinity] (not NaN)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hamiltonian")
    void hamiltonianRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    static Stream<Arguments> initialGuesses() {
        double[] z = {0, 500 * NM, 1025 * NM};
        double[] v = {0, 0, 0};
        SelfConsistentSolver solver = new SelfConsistentSolver();
        return Stream.of(
                row("guess depth NaN", () -> solver.solve(hemt(), new double[] {0, NAN, 1025 * NM}, v),
                        "initial guess depth[1] (m)", NAN, "(finite)"),
                row("guess potential +inf", () -> solver.solve(hemt(), z, new double[] {0, INF, 0}),
                        "initial guess potential[1] (V)", INF, "(finite)"),
                // issue #14: a finite but absurd guess was refused inside as "potentialEv[1] = Infinity"
                row("guess potential 1.7e308 V", () -> solver.solve(hemt(), z, new double[] {0, 1.7e308, 0}),
                        "initial guess potential[1] (V)", 1.7e308, "[-1000, 1000]"),
                row("guess potential -1.7e308 V", () -> solver.solve(hemt(), z, new double[] {0, 0, -1.7e308}),
                        "initial guess potential[2] (V)", -1.7e308, "[-1000, 1000]"),
                // issue #14: 1e-300 K ended in an internal NaN reported as non-convergence
                row("temperature 1e-300 K", () -> solver.solve(Structure.builder(SET).temperature(1e-300)
                        .grow(Layer.of("buffer", Composition.GAN, 1000 * NM)).top(TopBoundary.schottky(1, 0)).build()),
                        "temperature of the structure (K)", 1e-300, "[1.0, 2000] (the solver's range)"),
                row("guess potential without depths", () -> solver.solve(hemt(), null, v), "initial guess",
                        "null depths, 3 potentials", "both null, or arrays of equal length"),
                row("guess of unequal lengths", () -> solver.solve(hemt(), z, new double[] {0, 0}), "initial guess",
                        "3 depths, 2 potentials", "both null, or arrays of equal length"),
                row("extrapolation ratio NaN", () -> PotentialPredictor.extrapolate(solver.solve(hemt()),
                        solver.solve(hemt()), NAN), "extrapolation step ratio", NAN, "(finite)"),
                row("extrapolation through no solution", () -> PotentialPredictor.extrapolate(new double[0],
                        new Solution[0], 0.0), "extrapolation points", "0 solutions, 0 parameters",
                        "1 to 4 solutions with one parameter each"),
                row("extrapolation with a parameter missing", () -> PotentialPredictor.extrapolate(
                        new double[] {0.0}, new Solution[] {solved(), solved()}, -0.1), "extrapolation points",
                        "2 solutions, 1 parameters", "1 to 4 solutions with one parameter each"),
                row("extrapolation through five solutions", () -> PotentialPredictor.extrapolate(
                        new double[] {0, 1, 2, 3, 4}, new Solution[] {solved(), solved(), solved(), solved(), solved()},
                        5.0), "extrapolation points", "5 solutions, 5 parameters",
                        "1 to 4 solutions with one parameter each"),
                row("extrapolation target NaN", () -> PotentialPredictor.extrapolate(new double[] {0.0, -0.1},
                        new Solution[] {solved(), solved()}, NAN), "extrapolation target parameter", NAN, "(finite)"),
                row("extrapolation parameter infinite", () -> PotentialPredictor.extrapolate(
                        new double[] {0.0, INF}, new Solution[] {solved(), solved()}, -0.1),
                        "extrapolation parameter 1", INF, "(finite)"),
                // issue #14: returned an array of NaN; the Lagrange weights overflow
                row("extrapolation from two points 1e-300 apart", () -> PotentialPredictor.extrapolate(
                        new double[] {0, 1e-300}, new Solution[] {solved(), solved()}, 1e9),
                        "extrapolation target parameter", 1e9, "a value whose Lagrange weights through the parameters "
                                + "[0.0, 1.0E-300] are finite (it lies too many parameter spacings away)"),
                row("extrapolation parameter repeated", () -> PotentialPredictor.extrapolate(
                        new double[] {-0.1, -0.1}, new Solution[] {solved(), solved()}, -0.2),
                        "extrapolation parameter 1", -0.1, "distinct from the other parameters"));
    }

    private static Solution solvedOnce;

    /** One converged solution of the reference stack, shared by the extrapolation rows. */
    private static synchronized Solution solved() {
        if (solvedOnce == null) {
            solvedOnce = new SelfConsistentSolver().solve(hemt());
        }
        return solvedOnce;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("initialGuesses")
    void initialGuessRejects(BadInput.Case c) {
        BadInput.check(c);
    }

    /**
     * solve(structure, depth, potential) documents "depths of the guess (m), increasing"; a guess
     * with fewer than two points, or with depths that do not increase, cannot be interpolated and
     * must be rejected by name. (Found: an ArrayIndexOutOfBoundsException for fewer than two points;
     * with a repeated depth the interpolation divides 0 by 0 and, on a free surface where no
     * Dirichlet value overwrites it, the NaN start surfaces as "potentialEv[0] = NaN", an internal
     * parameter of the Schroedinger solver; decreasing depths are silently accepted.)
     */
    static Stream<Arguments> uninterpolableGuesses() {
        return Stream.of(
                Arguments.of("empty guess", new double[0], new double[0]),
                Arguments.of("one-point guess", new double[] {0}, new double[] {0.1}),
                Arguments.of("repeated depth", new double[] {0, 0, 1025 * NM}, new double[] {0, 0.1, 0.2}),
                Arguments.of("decreasing depths", new double[] {1025 * NM, 500 * NM, 0}, new double[] {0, 0.1, 0.2}));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("uninterpolableGuesses")
    void uninterpolableInitialGuessIsRejectedByName(String label, double[] depth, double[] potential) {
        Structure s = hemt().withTop(TopBoundary.freeSurfacePerCm2(1.65, 1e13));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> new SelfConsistentSolver().solve(s, depth, potential), label);
        assertTrue(e.parameter().contains("initial guess"), e.getMessage());
    }

    @Test
    void donorAndAcceptorSheetsAtOneDepthAreAStructuralError() {
        Layer cap = Layer.of("cap", Composition.GAN, 10 * NM)
                .withDeltaDoping(DeltaDoping.donorsPerCm2(1e12, 0.02).atOffset(5 * NM))
                .withDeltaDoping(new DeltaDoping(Dopant.Kind.ACCEPTOR, 1e16, 0.17, 5 * NM));
        Structure s = hemt().toBuilder().grow(cap).build();
        BadInput.checkKind(() -> new SelfConsistentSolver().solve(s), ErrorKind.INVALID_STRUCTURE,
                "a donor and an acceptor delta sheet sit at the same depth");
    }

    /**
     * DeepLevel documents "E_c - E_T ... must lie inside the gap of the host". A level 5 eV below
     * E_c in GaN (gap about 3.4 eV) lies below the valence band: it must be rejected, naming the
     * level's energy and the host's gap, not silently solved as a fixed charge.
     */
    @Test
    void deepLevelOutsideTheHostGapIsRejected() {
        Layer cap = Layer.of("cap", Composition.GAN, 5 * NM).withDeepLevel(DeepLevel.acceptorLikePerCm3(1e18, 5.0));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> new SelfConsistentSolver().solve(hemt().toBuilder().grow(cap).build()));
        assertTrue(e.getMessage().contains("5.0") && e.getMessage().contains("deep level"), e.getMessage());
    }

    static Stream<Arguments> extremesAllowed() {
        return Stream.of(
                Arguments.of("1 K", (Supplier<Structure>) () -> hemt().withTemperatureK(1)),
                Arguments.of("2000 K", (Supplier<Structure>) () -> hemt().withTemperatureK(2000)),
                Arguments.of("gate -100 V", (Supplier<Structure>) () -> hemt().withTop(TopBoundary.schottky(1).atBiasV(-100))),
                Arguments.of("gate +20 V", (Supplier<Structure>) () -> hemt().withTop(TopBoundary.schottky(1).atBiasV(20))),
                Arguments.of("barrier 0 eV", (Supplier<Structure>) () -> hemt().withTop(TopBoundary.schottky(0).atBiasV(0))),
                Arguments.of("barrier 6 eV", (Supplier<Structure>) () -> hemt().withTop(TopBoundary.schottky(6).atBiasV(0))),
                Arguments.of("surface donors 6 eV deep",
                        (Supplier<Structure>) () -> hemt().withTop(TopBoundary.freeSurfacePerCm2(6, 1e13))),
                Arguments.of("surface donors 1e16 cm^-2",
                        (Supplier<Structure>) () -> hemt().withTop(TopBoundary.freeSurfacePerCm2(1.65, 1e16))),
                Arguments.of("bottom E_c - E_F = -1 eV", (Supplier<Structure>) () -> hemt().toBuilder()
                        .bottom(BottomBoundary.fixedFermiLevel(-1)).build()),
                Arguments.of("bottom E_c - E_F = 7 eV", (Supplier<Structure>) () -> hemt().toBuilder()
                        .bottom(BottomBoundary.fixedFermiLevel(7)).build()),
                Arguments.of("1 mm buffer", (Supplier<Structure>) () -> Structure.builder(SET)
                        .grow(Layer.of("buffer", Composition.GAN, Layer.MAX_THICKNESS))
                        .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM)).top(TopBoundary.schottky(1).atBiasV(0)).build()),
                Arguments.of("1e22 cm^-3 donors", (Supplier<Structure>) () -> hemt().toBuilder()
                        .grow(Layer.of("cap", Composition.GAN, 5 * NM).withDopant(Dopant.donorsPerCm3(1e22, 0.02))).build()),
                Arguments.of("1e22 cm^-3 acceptors", (Supplier<Structure>) () -> hemt().toBuilder()
                        .grow(Layer.of("cap", Composition.GAN, 5 * NM).withDopant(Dopant.acceptorsPerCm3(1e22, 0.17)))
                        .build()),
                Arguments.of("1e15 cm^-2 delta sheet", (Supplier<Structure>) () -> hemt().toBuilder()
                        .grow(Layer.of("cap", Composition.GAN, 5 * NM).withDeltaDoping(DeltaDoping.donorsPerCm2(1e15, 0.02).atOffset(2 * NM))).build()),
                Arguments.of("AlN 200 nm on GaN", (Supplier<Structure>) () -> Structure.builder(SET)
                        .grow(Layer.of("buffer", Composition.GAN, 1000 * NM)).grow(Layer.of("b", Composition.ALN, 200 * NM))
                        .top(TopBoundary.schottky(1).atBiasV(0)).build()),
                Arguments.of("InN 10 nm on GaN", (Supplier<Structure>) () -> Structure.builder(SET)
                        .grow(Layer.of("buffer", Composition.GAN, 1000 * NM)).grow(Layer.of("b", Composition.INN, 10 * NM))
                        .top(TopBoundary.schottky(1).atBiasV(0)).build()),
                Arguments.of("1 pm layer", (Supplier<Structure>) () -> hemt().toBuilder()
                        .grow(Layer.of("c", Composition.alGaN(0.5), 1e-12)).build()),
                Arguments.of("single 0.5 nm layer", (Supplier<Structure>) () -> Structure.builder(SET)
                        .grow(Layer.of("b", Composition.GAN, 0.5 * NM)).top(TopBoundary.schottky(1).atBiasV(0)).build()));
    }

    /** Every documented end point is either solved (with its invariants) or fails as documented. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("extremesAllowed")
    void extremeButAllowedInputsConvergeOrFailAsDocumented(String label, Supplier<Structure> structure) {
        Structure s = structure.get();
        SelfConsistentSolver solver = new SelfConsistentSolver();
        try {
            Solution sol = assertTimeoutPreemptively(Duration.ofSeconds(30), () -> solver.solve(s), label);
            Invariants.check(s, sol, solver.options());
        } catch (NotConvergedException e) {
            Invariants.check(e, solver.options());
        }
    }

    static Stream<Arguments> quasiFermiRules() {
        QuasiFermiLevels q = QuasiFermiLevels.defaults();
        double total = hemt().totalThickness();
        return Stream.of(
                row("floating level NaN", () -> FermiContact.floating(NAN), "floating quasi-Fermi level (eV)", NAN, "(finite)"),
                row("floating level +inf", () -> FermiContact.floating(INF), "floating quasi-Fermi level (eV)", INF,
                        "(finite)"),
                row("blank layer name", () -> q.withLayer(Carrier.HOLES, " ", FermiContact.GATE),
                        "quasi-Fermi rule layer name", "\" \"", "a layer name (non-blank)"),
                row("depth range upside down", () -> q.withDepths(Carrier.HOLES, 20 * NM, 10 * NM, FermiContact.GATE),
                        "quasi-Fermi rule depthBottom (m)", 10 * NM, "(" + 20 * NM + ", ...) (below depthTop)"),
                row("depth range above the surface", () -> q.withDepths(Carrier.HOLES, -1 * NM, 10 * NM, FermiContact.GATE),
                        "quasi-Fermi rule depthTop (m)", -1 * NM, "[0, 0.001]"),
                row("overlapping depth ranges", () -> q.withDepths(Carrier.HOLES, 0, 20 * NM, FermiContact.GATE)
                        .withDepths(Carrier.HOLES, 10 * NM, 30 * NM, FermiContact.CHANNEL), "quasi-Fermi rule 1 region (HOLES)",
                        "depths [" + 10 * NM + ", " + 30 * NM + "] m", "not overlapping rule 0 for the same carrier, depths [0.0, "
                                + 20 * NM + "] m"),
                row("one layer named twice", () -> q.withLayer(Carrier.ELECTRONS, "barrier", FermiContact.GATE)
                        .withLayer(Carrier.ELECTRONS, "barrier", FermiContact.CHANNEL), "quasi-Fermi rule 1 region (ELECTRONS)",
                        "layer \"barrier\"", "not overlapping rule 0 for the same carrier, layer \"barrier\""),
                row("no such layer", () -> new SelfConsistentSolver(D.withQuasiFermiLevels(
                        q.withLayer(Carrier.HOLES, "p-GaN", FermiContact.GATE))).solve(hemt()), "quasi-Fermi rule 0 layer",
                        "\"p-GaN\"", "one of the stack's layers [barrier, buffer]"),
                row("depth range below the stack", () -> new SelfConsistentSolver(D.withQuasiFermiLevels(
                        q.withDepths(Carrier.ELECTRONS, 0, 2 * total, FermiContact.GATE))).solve(hemt()),
                        "quasi-Fermi rule 0 depthBottom (m)", 2 * total, "(0.0, " + total + "] (inside the stack, whose thickness is "
                                + total + " m)"),
                row("layer rule and depth rule overlapping", () -> new SelfConsistentSolver(D
                        .withQuantumWindows(QuantumWindows.none()).withQuasiFermiLevels(
                                q.withLayer(Carrier.HOLES, "barrier", FermiContact.GATE)
                                        .withDepths(Carrier.HOLES, 20 * NM, 40 * NM, FermiContact.CHANNEL))).solve(hemt()),
                        "quasi-Fermi rule 1 region (HOLES)", "depths [" + 20 * NM + ", " + 40 * NM + "] m",
                        "not overlapping rule 0 for the same carrier, layer \"barrier\""));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("quasiFermiRules")
    void quasiFermiRulesReject(BadInput.Case c) {
        BadInput.check(c);
    }

    @Test
    void theDocumentedQuasiFermiChoicesAreAccepted() {
        QuasiFermiLevels q = QuasiFermiLevels.defaults();
        for (QuasiFermiLevels levels : new QuasiFermiLevels[] {q, q.withLayer(Carrier.HOLES, "barrier", FermiContact.CHANNEL),
                q.withDepths(Carrier.HOLES, 0, 10 * NM, FermiContact.floating(-0.5))
                        .withLayer(Carrier.ELECTRONS, "buffer", FermiContact.CHANNEL)}) {
            SelfConsistentSolver solver = new SelfConsistentSolver(D.withQuasiFermiLevels(levels));
            Invariants.check(hemt(), solver.solve(hemt()), solver.options());
        }
    }
}
