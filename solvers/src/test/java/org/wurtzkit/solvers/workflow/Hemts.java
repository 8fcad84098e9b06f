package org.wurtzkit.solvers.workflow;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.testing.StandardStacks;

/** Test stacks and a coarse-mesh solver that keeps the workflow tests fast. */
final class Hemts {
    private Hemts() {
    }

    /**
     * A coarse mesh (0.2 nm at interfaces, growth 1.15, at most 100 nm): n_s within 4e-4 relative of
     * the default mesh for 10-200 nm AlGaN barriers (checked while writing these tests).
     */
    static final SolverOptions COARSE = SolverOptions.defaults().withMesh(new MeshPolicy(0.2 * NM, 1.15, 100 * NM));
    static final SelfConsistentSolver SOLVER = new SelfConsistentSolver(COARSE);
    static final ParameterSet DEFAULT_SET = ParameterSets.defaultSet();

    /** GaN buffer (500 nm) / Al_xGa_(1-x)N barrier, Schottky gate phi_B at bias 0 ({@link StandardStacks}). */
    static Structure hemt(ParameterSet set, double x, double barrierNm, double phiB) {
        return StandardStacks.gatedHemt(set, x, barrierNm, 0, phiB);
    }

    /** The same with a GaN cap (thickness 0: none). */
    static Structure cappedHemt(ParameterSet set, double x, double barrierNm, double capNm, double phiB) {
        return StandardStacks.gatedHemt(set, x, barrierNm, capNm, phiB);
    }

    /** Al0.25Ga0.75N (25 nm) on GaN with the default set and a 1.0 eV Schottky gate. */
    static Structure standard() {
        return hemt(DEFAULT_SET, 0.25, 25, 1.0);
    }
}
