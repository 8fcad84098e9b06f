package org.wurtzkit.solvers.schrodinger;

import java.util.Arrays;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Constants;

import org.wurtzkit.solvers.linalg.SymmetricTridiagonalEigen;

/**
 * One-dimensional effective-mass Hamiltonian with a position-dependent mass, in the
 * BenDaniel-Duke form (D. J. BenDaniel and C. B. Duke, Phys. Rev. 152, 683 (1966) [from memory])
 * <pre>
 *   -(hbar²/2) d/dz [ (1/m(z)) dpsi/dz ] + V(z) psi = E psi ,
 * </pre>
 * discretised by box integration on a non-uniform mesh {@code z[0..N-1]} (metres), with
 * Dirichlet conditions {@code psi(z[0]) = psi(z[N-1]) = 0} at the two ends of the quantum window.
 * The mass {@code m/m0} is given per mesh interval {@code [z_i, z_{i+1}]} (half-points), which is
 * how an abrupt heterointerface located on a node enters; the potential energy {@code V} (eV) is
 * given per node.
 *
 * <p><b>Discretisation</b> (box integration, S. Selberherr, <i>Analysis and Simulation of
 * Semiconductor Devices</i>, Springer 1984 [from memory]). With {@code h_i = z_{i+1} - z_i},
 * box width {@code w_i = (h_{i-1} + h_i)/2} and interval couplings
 * {@code t_i = hbar²/(2 m0 m_i h_i)} (in eV·m), integrating the equation over the box of interior
 * node {@code i} gives
 * <pre>
 *   -t_{i-1} psi_{i-1} + (t_{i-1} + t_i + V_i w_i) psi_i - t_i psi_{i+1} = E w_i psi_i ,
 * </pre>
 * a generalised problem {@code A psi = E W psi} with {@code A} symmetric tridiagonal and
 * {@code W = diag(w)}. The diagonal similarity {@code u = W^{1/2} psi} turns it into the standard
 * symmetric tridiagonal problem {@code W^{-1/2} A W^{-1/2} u = E u}, solved by
 * {@link SymmetricTridiagonalEigen} (Sturm bisection and inverse iteration). The ψ' / m flux
 * through each half-point is continuous by construction, which is the BenDaniel-Duke matching
 * condition at a heterointerface. For smooth meshes the eigenvalues converge at second order in
 * the spacing.
 *
 * <p><b>Potential steps.</b> If {@code V} jumps at a node {@code i}, pass the box average
 * {@code V_i = (V⁻ h_{i-1} + V⁺ h_i) / (h_{i-1} + h_i)} there (the integral of V over the box
 * divided by its width); this keeps the scheme second-order accurate. The values at the two end
 * nodes do not enter (Dirichlet) but must be finite.
 *
 * <p><b>Results</b> are {@link BoundStates}: energies in eV, ascending, and wavefunctions on all
 * N nodes (zero at the ends) normalised so that {@code sum_i psi_i² w_i = 1} (units m^-1/2).
 *
 * <p><b>Reuse.</b> An instance prepares the mesh and mass terms once; {@link #lowest} and
 * {@link #below} then cost O(N·k) per call with no allocation except the returned result, and
 * {@link #belowInto} writes into the caller's arrays without allocating, so a self-consistent
 * loop should keep one instance per mesh. Instances hold work arrays and are
 * not thread-safe; use one per thread.
 */
public final class EffectiveMassHamiltonian {

    // CODATA 2018 values from the library's single constants class
    private static final double HBAR = Constants.HBAR;
    private static final double ELECTRON_MASS = Constants.ELECTRON_MASS;
    private static final double ELEMENTARY_CHARGE = Constants.ELEMENTARY_CHARGE;
    /** hbar²/(2 m0 e) in eV·m². */
    private static final double KINETIC_EV_M2 = HBAR * HBAR / (2.0 * ELECTRON_MASS * ELEMENTARY_CHARGE);

    private final int nodes;
    private final int unknowns;
    private final double[] mesh;
    private final double[] massRatio;
    private final double[] boxWidth;
    /** Kinetic part of the scaled diagonal, per interior unknown (eV). */
    private final double[] kineticDiagonal;
    /** Scaled off-diagonal -t_i / sqrt(w_i w_{i+1}) between consecutive interior unknowns (eV). */
    private final double[] offDiagonal;
    /** 1/sqrt(w_i) per interior unknown (m^-1/2). */
    private final double[] inverseSqrtWidth;

    private final SymmetricTridiagonalEigen eigen = new SymmetricTridiagonalEigen();
    /** Hints of the warm-started call in progress (null for a cold call). */
    private double[] hints;
    private int hintCount;
    private double hintRadius;
    private final double[] diagonalWork;
    private double[] valuesWork = new double[0];
    private double[][] vectorsWork = new double[0][];

    private EffectiveMassHamiltonian(double[] mesh, double[] massRatio) {
        this.mesh = mesh;
        this.massRatio = massRatio;
        this.nodes = mesh.length;
        this.unknowns = nodes - 2;
        int n = nodes;
        boxWidth = new double[n];
        double[] coupling = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            double h = mesh[i + 1] - mesh[i];
            coupling[i] = KINETIC_EV_M2 / (massRatio[i] * h);
            boxWidth[i] += 0.5 * h;
            boxWidth[i + 1] += 0.5 * h;
        }
        kineticDiagonal = new double[unknowns];
        inverseSqrtWidth = new double[unknowns];
        offDiagonal = new double[unknowns - 1];
        for (int u = 0; u < unknowns; u++) {
            int i = u + 1;
            kineticDiagonal[u] = (coupling[i - 1] + coupling[i]) / boxWidth[i];
            inverseSqrtWidth[u] = 1.0 / Math.sqrt(boxWidth[i]);
        }
        for (int u = 0; u < unknowns - 1; u++) {
            int i = u + 1;
            offDiagonal[u] = -coupling[i] * inverseSqrtWidth[u] * inverseSqrtWidth[u + 1];
        }
        diagonalWork = new double[unknowns];
    }

    /**
     * Prepares the Hamiltonian for a mesh and a mass profile.
     *
     * @param meshMetres node positions in metres, strictly increasing, finite, length
     *                   {@code N >= 3}; copied
     * @param massRatio  effective mass {@code m/m0} per mesh interval, finite and positive,
     *                   length {@code N-1} ({@code massRatio[i]} applies between
     *                   {@code meshMetres[i]} and {@code meshMetres[i+1]}); copied
     * @return the prepared Hamiltonian
     * @throws IllegalArgumentException if an array is null, too short, of mismatched length,
     *                                  not strictly increasing, or holds a non-finite or
     *                                  non-positive mass
     */
    public static EffectiveMassHamiltonian of(double[] meshMetres, double[] massRatio) {
        if (meshMetres == null) {
            throw Require.invalid("meshMetres", "null", "(a non-null array)");
        }
        int n = meshMetres.length;
        if (n < 3) {
            throw Require.invalid("meshMetres.length", n, "[3, " + Integer.MAX_VALUE + "] (at least one interior node)");
        }
        for (int i = 0; i < n; i++) {
            double z = meshMetres[i];
            if (!(z - z == 0.0)) {
                throw Require.invalid("meshMetres[" + i + "]", z, "(-Infinity, +Infinity) (finite values only)");
            }
            if (i > 0 && !(z > meshMetres[i - 1])) {
                throw Require.invalid("meshMetres[" + i + "]", z, "(" + meshMetres[i - 1]
                        + ", +Infinity): the mesh must be strictly increasing");
            }
        }
        if (massRatio == null) {
            throw Require.invalid("massRatio", "null", "(a non-null array)");
        }
        if (massRatio.length != n - 1) {
            throw Require.invalid("massRatio.length", massRatio.length, "[" + (n - 1) + ", " + (n - 1)
                    + "] (one value per mesh interval)");
        }
        for (int i = 0; i < n - 1; i++) {
            double m = massRatio[i];
            if (!(m > 0.0) || Double.isInfinite(m)) {
                throw Require.invalid("massRatio[" + i + "]", m, "(0, +Infinity)");
            }
        }
        return new EffectiveMassHamiltonian(meshMetres.clone(), massRatio.clone());
    }

    /**
     * Number of mesh nodes N.
     *
     * @return N
     */
    public int nodeCount() {
        return nodes;
    }

    /**
     * Largest number of states that can be requested: the number of interior nodes, N-2.
     *
     * @return N-2
     */
    public int maxStates() {
        return unknowns;
    }

    /**
     * The mesh.
     *
     * @return a copy of the node positions (m)
     */
    public double[] mesh() {
        return mesh.clone();
    }

    /**
     * The effective masses per interval.
     *
     * @return a copy of {@code m/m0}, length N-1
     */
    public double[] massRatios() {
        return massRatio.clone();
    }

    /**
     * Box widths {@code w_i = (h_{i-1} + h_i)/2} (half a cell at the two end nodes), the weights
     * of the discrete inner product in which the wavefunctions are orthonormal.
     *
     * @return a copy, length N (m)
     */
    public double[] boxWidths() {
        return boxWidth.clone();
    }

    /**
     * The {@code k} lowest states for a potential energy profile.
     *
     * @param potentialEv potential energy at the nodes (eV), finite, length N
     * @param k           number of states, in {@code [1, N-2]}
     * @return the states, energies ascending
     * @throws IllegalArgumentException on a wrong length, a non-finite potential value or
     *                                  {@code k} out of range
     */
    public BoundStates lowest(double[] potentialEv, int k) {
        checkPotential(potentialEv);
        if (k < 1 || k > unknowns) {
            throw Require.invalid("k", k, "[1, " + unknowns + "]");
        }
        ensureWork(k);
        fillDiagonal(potentialEv);
        int m = eigen.lowestInto(diagonalWork, offDiagonal, k, valuesWork, vectorsWork);
        return result(m);
    }

    /**
     * All states with energy below {@code energyBoundEv} (e.g. the barrier top: the bound
     * states), at most {@code kMax} of them (the lowest ones if there are more). May be empty.
     *
     * @param potentialEv   potential energy at the nodes (eV), finite, length N
     * @param energyBoundEv energy bound (eV), not NaN
     * @param kMax          largest number of states, in {@code [1, N-2]}
     * @return the states below the bound, energies ascending
     * @throws IllegalArgumentException on a wrong length, a non-finite potential value, a NaN
     *                                  bound or {@code kMax} out of range
     */
    public BoundStates below(double[] potentialEv, double energyBoundEv, int kMax) {
        checkBelow(potentialEv, energyBoundEv, kMax);
        return result(solveBelow(potentialEv, energyBoundEv, kMax));
    }

    /**
     * The same states as {@link #below(double[], double, int)}, written into caller-owned arrays
     * instead of a new {@link BoundStates}. A null row of {@code wavefunctionsOut} that receives a
     * state is replaced by a new array of length N (the output grows to what is found); after
     * that, and once the work space has grown to {@code kMax} states, nothing is allocated, so a
     * self-consistent loop that keeps its own arrays solves every iteration allocation-free.
     * Entries {@code [count, kMax)} of the outputs are left untouched.
     *
     * @param potentialEv      potential energy at the nodes (eV), finite, length N
     * @param energyBoundEv    energy bound (eV), not NaN
     * @param kMax             largest number of states, in {@code [1, N-2]}
     * @param energiesOut      receives the energies (eV), ascending; length &ge; {@code kMax}
     * @param wavefunctionsOut receives the wavefunctions on all N nodes (m^-1/2, zero at both
     *                         ends, normalised as in {@link BoundStates}); at least {@code kMax}
     *                         rows, each null or of length N
     * @return the number of states found, in {@code [0, kMax]}
     * @throws IllegalArgumentException as {@link #below(double[], double, int)}, or if an output
     *                                  array is null or too short
     */
    public int belowInto(double[] potentialEv, double energyBoundEv, int kMax, double[] energiesOut,
            double[][] wavefunctionsOut) {
        checkBelow(potentialEv, energyBoundEv, kMax);
        if (energiesOut == null) {
            throw Require.invalid("energiesOut", "null", "(a non-null array)");
        }
        if (energiesOut.length < kMax) {
            throw Require.invalid("energiesOut.length", energiesOut.length,
                    "[" + kMax + ", " + Integer.MAX_VALUE + "] (at least kMax)");
        }
        if (wavefunctionsOut == null) {
            throw Require.invalid("wavefunctionsOut", "null", "(a non-null array)");
        }
        if (wavefunctionsOut.length < kMax) {
            throw Require.invalid("wavefunctionsOut.length", wavefunctionsOut.length,
                    "[" + kMax + ", " + Integer.MAX_VALUE + "] (at least kMax rows)");
        }
        for (int j = 0; j < kMax; j++) {
            double[] row = wavefunctionsOut[j];
            if (row != null && row.length != nodes) {
                throw Require.invalid("wavefunctionsOut[" + j + "].length", row.length,
                        "[" + nodes + ", " + nodes + "] (one value per mesh node, or a null row)");
            }
        }
        int m = solveBelow(potentialEv, energyBoundEv, kMax);
        for (int j = 0; j < m; j++) {
            if (wavefunctionsOut[j] == null) {
                wavefunctionsOut[j] = new double[nodes];
            }
        }
        copyOut(m, energiesOut, wavefunctionsOut);
        return m;
    }

    /**
     * Warm-started form of
     * {@link #belowInto(double[], double, int, double[], double[][])} for a potential that
     * differs from an earlier one by at most {@code potentialChangeEv} at every node: the earlier
     * energies, each checked by Sturm counts, bracket the new ones (Weyl's inequality; see
     * {@link SymmetricTridiagonalEigen#belowInto(double[], double[], double, int, double[],
     * double[][], double[], int, double)}). A hint that does not hold costs only its two counts;
     * the states equal the cold call's to round-off.
     *
     * @param potentialEv       potential energy at the nodes (eV), finite, length N
     * @param energyBoundEv     energy bound (eV), not NaN
     * @param kMax              largest number of states, in {@code [1, N-2]}
     * @param energiesOut       receives the energies (eV), ascending; length &ge; {@code kMax}
     * @param wavefunctionsOut  as in {@link #belowInto(double[], double, int, double[], double[][])}
     * @param previousEnergiesEv earlier energies (eV), ascending; may be the same array as
     *                          {@code energiesOut} (they are read before it is written)
     * @param previousCount     number of earlier energies used, in {@code [0, previousEnergiesEv.length]}
     * @param potentialChangeEv largest {@code |V_new - V_old|} over the nodes (eV), finite, &ge; 0
     * @return the number of states found, in {@code [0, kMax]}
     * @throws IllegalArgumentException as the cold form, or on invalid hints
     */
    public int belowInto(double[] potentialEv, double energyBoundEv, int kMax, double[] energiesOut,
            double[][] wavefunctionsOut, double[] previousEnergiesEv, int previousCount,
            double potentialChangeEv) {
        if (previousEnergiesEv == null) {
            throw Require.invalid("previousEnergiesEv", "null", "(a non-null array)");
        }
        Require.inRange("previousCount", previousCount, 0, previousEnergiesEv.length);
        if (!(potentialChangeEv >= 0.0 && potentialChangeEv < Double.POSITIVE_INFINITY)) {
            throw Require.invalid("potentialChangeEv", potentialChangeEv, "[0, +Infinity) (finite)");
        }
        hints = previousEnergiesEv;
        hintCount = previousCount;
        hintRadius = potentialChangeEv;
        try {
            return belowInto(potentialEv, energyBoundEv, kMax, energiesOut, wavefunctionsOut);
        } finally {
            hints = null;
        }
    }

    /**
     * Number of earlier energies whose Weyl bracket did not hold in the last warm-started call.
     *
     * @return count, 0 after a cold call
     */
    public int rejectedHints() {
        return eigen.rejectedHints();
    }

    /**
     * Eigenpairs below the bound into the work arrays, which grow to the number of states found
     * (a Sturm count, O(N)) rather than to {@code kMax}: a generous cap costs no memory.
     */
    private int solveBelow(double[] potentialEv, double energyBoundEv, int kMax) {
        fillDiagonal(potentialEv);
        int need = Math.min(kMax, SymmetricTridiagonalEigen.countBelow(diagonalWork, offDiagonal, energyBoundEv));
        if (need == 0) {
            return 0;
        }
        ensureWork(need);
        if (hints != null) {
            return eigen.belowInto(diagonalWork, offDiagonal, energyBoundEv, need, valuesWork, vectorsWork,
                    hints, hintCount, hintRadius);
        }
        return eigen.belowInto(diagonalWork, offDiagonal, energyBoundEv, need, valuesWork, vectorsWork);
    }

    private void checkBelow(double[] potentialEv, double energyBoundEv, int kMax) {
        checkPotential(potentialEv);
        if (Double.isNaN(energyBoundEv)) {
            throw Require.invalid("energyBoundEv", energyBoundEv, "[-Infinity, +Infinity] (not NaN)");
        }
        if (kMax < 1 || kMax > unknowns) {
            throw Require.invalid("kMax", kMax, "[1, " + unknowns + "]");
        }
    }

    private void checkPotential(double[] potentialEv) {
        if (potentialEv == null) {
            throw Require.invalid("potentialEv", "null", "(a non-null array)");
        }
        if (potentialEv.length != nodes) {
            throw Require.invalid("potentialEv.length", potentialEv.length, "[" + nodes + ", " + nodes
                    + "] (one value per mesh node)");
        }
        for (int i = 0; i < nodes; i++) {
            double v = potentialEv[i];
            if (!(v - v == 0.0)) {
                throw Require.invalid("potentialEv[" + i + "]", v, "(-Infinity, +Infinity) (finite values only)");
            }
        }
    }

    private void ensureWork(int k) {
        if (valuesWork.length < k) {
            valuesWork = new double[k];
            double[][] grown = Arrays.copyOf(vectorsWork, k);
            for (int j = vectorsWork.length; j < k; j++) {
                grown[j] = new double[unknowns];
            }
            vectorsWork = grown;
        }
    }

    private void fillDiagonal(double[] potentialEv) {
        for (int u = 0; u < unknowns; u++) {
            diagonalWork[u] = kineticDiagonal[u] + potentialEv[u + 1];
        }
    }

    private BoundStates result(int m) {
        double[] energies = new double[m];
        double[][] psi = new double[m][nodes];
        copyOut(m, energies, psi);
        return new BoundStates(energies, psi);
    }

    /** psi = W^{-1/2} u on the interior nodes, zero at the two Dirichlet ends. */
    private void copyOut(int m, double[] energies, double[][] psi) {
        for (int j = 0; j < m; j++) {
            energies[j] = valuesWork[j];
            double[] u = vectorsWork[j];
            double[] p = psi[j];
            p[0] = 0.0;
            p[nodes - 1] = 0.0;
            for (int q = 0; q < unknowns; q++) {
                p[q + 1] = u[q] * inverseSqrtWidth[q];
            }
        }
    }
}
