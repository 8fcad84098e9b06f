package org.wurtzkit.benchmarks;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/**
 * The inputs every benchmark shares: the reference HEMT stack fixed by issue #6, an invented
 * design-map family around it, and the effective-mass tridiagonal of a triangular channel well.
 */
public final class Scenarios {

    /** Schottky barrier height of the reference gate (eV). */
    public static final double GATE_BARRIER_EV = 1.0;

    /** Number of lowest eigenpairs asked of every eigen-solver. */
    public static final int EIGENPAIRS = 10;

    private Scenarios() {
    }

    /**
     * The reference stack of issue #6, top down: GaN cap 2 nm / Al0.25Ga0.75N 25 nm / AlN 1 nm /
     * GaN 2 um buffer, Schottky top contact (1.0 eV, 0 V), default parameter set.
     *
     * @return the structure
     */
    public static Structure referenceHemt() {
        return hemt(0.25, 25, 0.0);
    }

    /**
     * The reference stack with another barrier composition and thickness and gate bias (the
     * design-map and sweep family; the cap, spacer and buffer stay as in the reference).
     *
     * @param x         aluminium fraction of the barrier
     * @param barrierNm barrier thickness (nm)
     * @param biasV     gate bias (V)
     * @return the structure
     */
    public static Structure hemt(double x, double barrierNm, double biasV) {
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 2000 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierNm * NM))
                .grow(Layer.of("cap", Composition.GAN, 2 * NM))
                .top(TopBoundary.schottky(GATE_BARRIER_EV).atBiasV(biasV))
                .build();
    }

    /**
     * A quantum window of an invented demo channel: a 5 nm barrier region (mass 0.23 m0,
     * potential 0.45 eV) on a triangular well (mass 0.2 m0, slope 0.05 eV/nm), 60 nm in total,
     * meshed uniformly with {@code unknowns + 2} nodes (Dirichlet ends).
     *
     * @param unknowns number of interior nodes N, the order of the tridiagonal matrix
     * @return the window
     */
    public static ChannelWell channelWell(int unknowns) {
        return new ChannelWell(unknowns);
    }

    /**
     * Uniform-mesh quantum window and its BenDaniel-Duke box-integration tridiagonal,
     * {@code d_u = (t_{i-1} + t_i)/w_i + V_i}, {@code e_u = -t_i / sqrt(w_i w_{i+1})},
     * {@code t_i = hbar^2 / (2 m0 m_i h_i)}: the matrix {@code EffectiveMassHamiltonian} builds for
     * the same mesh, masses and potential, written out so that the baselines get the same numbers.
     */
    public static final class ChannelWell {
        /** hbar^2/(2 m0 e) in eV m^2, from the library's constants (as EffectiveMassHamiltonian uses). */
        private static final double KINETIC_EV_M2 = Constants.HBAR * Constants.HBAR
                / (2.0 * Constants.ELECTRON_MASS * Constants.ELEMENTARY_CHARGE);
        private static final double LENGTH = 60 * NM;
        private static final double BARRIER = 5 * NM;

        /** Node positions (m), length N + 2. */
        public final double[] mesh;
        /** Mass ratio per interval, length N + 1. */
        public final double[] massRatio;
        /** Potential energy per node (eV), length N + 2. */
        public final double[] potentialEv;
        /** Diagonal of the symmetric tridiagonal matrix (eV), length N. */
        public final double[] diag;
        /** Off-diagonal (eV), length N - 1. */
        public final double[] off;

        private ChannelWell(int unknowns) {
            int nodes = unknowns + 2;
            double h = LENGTH / (nodes - 1);
            mesh = new double[nodes];
            potentialEv = new double[nodes];
            massRatio = new double[nodes - 1];
            for (int i = 0; i < nodes; i++) {
                double z = i == nodes - 1 ? LENGTH : i * h;
                mesh[i] = z;
                potentialEv[i] = z < BARRIER ? 0.45 : 0.05 * (z - BARRIER) / NM;
            }
            for (int i = 0; i < nodes - 1; i++) {
                massRatio[i] = 0.5 * (mesh[i] + mesh[i + 1]) < BARRIER ? 0.23 : 0.2;
            }
            double[] t = new double[nodes - 1];
            double[] w = new double[nodes];
            for (int i = 0; i < nodes - 1; i++) {
                double hi = mesh[i + 1] - mesh[i];
                t[i] = KINETIC_EV_M2 / (massRatio[i] * hi);
                w[i] += 0.5 * hi;
                w[i + 1] += 0.5 * hi;
            }
            diag = new double[unknowns];
            off = new double[unknowns - 1];
            for (int u = 0; u < unknowns; u++) {
                int i = u + 1;
                diag[u] = (t[i - 1] + t[i]) / w[i] + potentialEv[i];
            }
            for (int u = 0; u < unknowns - 1; u++) {
                int i = u + 1;
                off[u] = -t[i] / Math.sqrt(w[i] * w[i + 1]);
            }
        }

        /** @return the order N of the matrix */
        public int order() {
            return diag.length;
        }
    }
}
