package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.mesh.MeshPolicy;

/**
 * Settings of a self-consistent solve, with documented defaults ({@link #defaults()}); change one
 * with a {@code with...} method, which returns a copy.
 *
 * @param tolerance             convergence of the outer loop, max |delta phi| between iterations (V); default 1e-6, in [1e-12, 1e-2]
 * @param maxIterations         outer iterations allowed; default 100, in [1, 10000]
 * @param newtonTolerance       convergence of each Newton-Poisson solve, max |delta phi| (V); default 1e-9, in [1e-14, 1e-3]
 * @param maxNewtonIterations   Newton steps allowed per Poisson solve; default 200, in [1, 100000]
 * @param maxNewtonStep         largest change of the potential at any node in one Newton step (V); default 0.5, in [1e-3, 10]
 * @param mesh                  mesh policy; default {@link MeshPolicy#DEFAULT}
 * @param quantumWindows         where electrons are quantum; default {@link QuantumWindows#automatic()}
 * @param maxSubbands           most subbands kept per window; default 60, in [1, 2000]
 * @param subbandCutoffKT       subbands are kept up to E_F + this many kT; default 15 (a subband there holds exp(-15) = 3e-7 of one at E_F), in [1, 200]
 * @param holeFermiLevel        holes' quasi-Fermi level; default {@link HoleFermiLevel#GATE}
 * @param densityOfStatesMass   which in-plane mass sets each subband's 2D density of states; default
 *                              {@link DensityOfStatesMass#WAVEFUNCTION_WEIGHTED}
 *
 * <p>Physical model choices (polarization model, band line-up, strain shifts of the band edges)
 * live on the {@link org.wurtzkit.structure.Structure}; these options are numerics only.
 */
public record SolverOptions(double tolerance, int maxIterations, double newtonTolerance, int maxNewtonIterations,
        double maxNewtonStep, MeshPolicy mesh, QuantumWindows quantumWindows, int maxSubbands, double subbandCutoffKT,
        HoleFermiLevel holeFermiLevel, DensityOfStatesMass densityOfStatesMass) {

    private static final SolverOptions DEFAULTS = new SolverOptions(1e-6, 100, 1e-9, 200, 0.5, MeshPolicy.DEFAULT,
            QuantumWindows.automatic(), 60, 15, HoleFermiLevel.GATE, DensityOfStatesMass.WAVEFUNCTION_WEIGHTED);

    /** Validates every field. */
    public SolverOptions {
        Require.inRange("tolerance (V)", tolerance, 1e-12, 1e-2);
        Require.inRange("maxIterations", maxIterations, 1, 10000);
        Require.inRange("newtonTolerance (V)", newtonTolerance, 1e-14, 1e-3);
        Require.inRange("maxNewtonIterations", maxNewtonIterations, 1, 100000);
        Require.inRange("maxNewtonStep (V)", maxNewtonStep, 1e-3, 10);
        Require.nonNull("mesh policy", mesh);
        Require.nonNull("quantum windows", quantumWindows);
        Require.inRange("maxSubbands", maxSubbands, 1, 2000);
        Require.inRange("subbandCutoffKT", subbandCutoffKT, 1, 200);
        Require.nonNull("hole Fermi level", holeFermiLevel);
        Require.nonNull("density-of-states mass", densityOfStatesMass);
    }

    /**
     * The options with the default {@link DensityOfStatesMass#WAVEFUNCTION_WEIGHTED}.
     *
     * @param tolerance           see the class documentation
     * @param maxIterations       see the class documentation
     * @param newtonTolerance     see the class documentation
     * @param maxNewtonIterations see the class documentation
     * @param maxNewtonStep       see the class documentation
     * @param mesh                see the class documentation
     * @param quantumWindows       see the class documentation
     * @param maxSubbands         see the class documentation
     * @param subbandCutoffKT     see the class documentation
     * @param holeFermiLevel      see the class documentation
     */
    public SolverOptions(double tolerance, int maxIterations, double newtonTolerance, int maxNewtonIterations,
            double maxNewtonStep, MeshPolicy mesh, QuantumWindows quantumWindows, int maxSubbands, double subbandCutoffKT,
            HoleFermiLevel holeFermiLevel) {
        this(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, holeFermiLevel, DensityOfStatesMass.WAVEFUNCTION_WEIGHTED);
    }

    /** {@return the defaults listed in the class documentation} */
    public static SolverOptions defaults() {
        return DEFAULTS;
    }

    /** @param v tolerance (V) @return a copy */
    public SolverOptions withTolerance(double v) {
        return new SolverOptions(v, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v outer iteration budget @return a copy */
    public SolverOptions withMaxIterations(int v) {
        return new SolverOptions(tolerance, v, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v Newton tolerance (V) @return a copy */
    public SolverOptions withNewtonTolerance(double v) {
        return new SolverOptions(tolerance, maxIterations, v, maxNewtonIterations, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v Newton step budget per Poisson solve @return a copy */
    public SolverOptions withMaxNewtonIterations(int v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, v, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v largest Newton update (V) @return a copy */
    public SolverOptions withMaxNewtonStep(double v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, v, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v mesh policy @return a copy */
    public SolverOptions withMesh(MeshPolicy v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, v,
                quantumWindows, maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v quantum windows @return a copy */
    public SolverOptions withQuantumWindows(QuantumWindows v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, v,
                maxSubbands, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v most subbands per window @return a copy */
    public SolverOptions withMaxSubbands(int v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, v, subbandCutoffKT, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v subband cut-off above E_F in kT @return a copy */
    public SolverOptions withSubbandCutoffKT(double v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, v, holeFermiLevel, densityOfStatesMass);
    }

    /** @param v holes' quasi-Fermi level @return a copy */
    public SolverOptions withHoleFermiLevel(HoleFermiLevel v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, v, densityOfStatesMass);
    }

    /** @param v which mass sets the 2D density of states @return a copy */
    public SolverOptions withDensityOfStatesMass(DensityOfStatesMass v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, holeFermiLevel, v);
    }
}
