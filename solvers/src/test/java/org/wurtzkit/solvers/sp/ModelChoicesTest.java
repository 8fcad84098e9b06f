package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.mesh.Mesh;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;

/** The model choices of issue 13, each an explicit option whose effect is checked. */
class ModelChoicesTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final SolverOptions COARSE = SolverOptions.defaults()
            .withMesh(new MeshPolicy(0.2 * NM, 1.15, 100 * NM));

    /** 1 um of n-GaN, donors 1e18 cm^-3 at 0.1 eV (deliberately deep), under a 1 eV gate; no interface. */
    private static Structure nGaN(Dopant donors) {
        return Structure.builder(SET).grow(Layer.of("n-GaN", Composition.GAN, 1000 * NM).withDopant(donors))
                .top(TopBoundary.schottky(1.0)).build();
    }

    /**
     * Far from the gate the layer is neutral, n = N_D+ (p negligible): with full ionization the
     * electron density equals the donor density (charge neutrality, common practice, no source);
     * from the Fermi level, a level 0.1 eV deep holds a large share of its electrons at 300 K.
     */
    @Test
    void fullIonizationIsAnExplicitChoiceOfTheDopant() {
        Dopant deep = Dopant.donorsPerCm3(1e18, 0.1);
        assertEquals(Dopant.Ionization.FROM_FERMI_LEVEL, deep.ionization());
        assertTrue(deep.fullyIonized().toString().endsWith("fully ionized"), deep.fullyIonized().toString());
        SelfConsistentSolver solver = new SelfConsistentSolver(COARSE);
        Solution full = solver.solve(nGaN(deep.fullyIonized()));
        Solution partial = solver.solve(nGaN(deep));
        int bottom = full.nodeCount() - 1;
        assertEquals(1e24, full.ionizedDonors()[bottom], 0);
        assertEquals(1e24, full.ionizedDonors()[0], 0, "fully ionized even in the depletion region");
        assertEquals(1e24, full.electronDensity()[bottom], 1e-6 * 1e24);
        double nPartial = partial.electronDensity()[partial.nodeCount() - 1];
        assertTrue(nPartial < 0.8e24, "n = " + nPartial + " m^-3 with incomplete ionization");
        assertEquals(partial.ionizedDonors()[partial.nodeCount() - 1], nPartial, 1e-6 * nPartial);
    }

    @Test
    void aUniformMeshHasEqualCellsInEveryLayer() {
        Mesh m = Mesh.generate(new double[] {0, 10 * NM, 25 * NM}, MeshPolicy.uniform(0.5 * NM));
        assertEquals(51, m.size());
        for (int i = 0; i + 1 < m.size(); i++) {
            assertEquals(0.5 * NM, m.spacing(i), 1e-21, "cell " + i);
        }
        assertTrue(MeshPolicy.uniform(0.5 * NM).isUniform());
        assertEquals("uniform mesh, 0.5 nm", MeshPolicy.uniform(0.5 * NM).toString());
    }

    /**
     * A uniform 0.2 nm mesh gives the n_s of the graded default mesh within 0.5 % (both are
     * converged meshes, see the mesh-convergence tests) with many more nodes.
     */
    @Test
    void aUniformMeshSolvesTheSameHemt() {
        Structure s = StandardStacks.hemt(SET, 300, 0.25, 25, 0, TopBoundary.schottky(1.0));
        Solution graded = new SelfConsistentSolver().solve(s);
        Solution uniform = new SelfConsistentSolver(SolverOptions.defaults().withMesh(MeshPolicy.uniform(0.2 * NM)))
                .solve(s);
        assertEquals(1626, uniform.nodeCount());
        assertTrue(uniform.nodeCount() > 3 * graded.nodeCount());
        assertEquals(graded.sheetDensityPerCm2(), uniform.sheetDensityPerCm2(), 5e-3 * graded.sheetDensityPerCm2());
    }

    /**
     * One window from the surface to 40 nm below the deepest interface: for a 100 nm barrier the
     * default (40 nm around every interface) makes two windows, this one window, and the 2DEG is
     * the same within 0.5 % because both windows hold the whole channel.
     */
    @Test
    void aWindowCanBeSetBelowTheDeepestInterface() {
        Structure s = StandardStacks.hemt(SET, 500, 0.25, 100, 2, TopBoundary.schottky(1.0));
        Solution auto = new SelfConsistentSolver(COARSE).solve(s);
        Solution below = new SelfConsistentSolver(COARSE.withQuantumWindows(QuantumWindows.belowDeepestInterfaceNm(40)))
                .solve(s);
        assertEquals(2, auto.quantumWindows().size());
        List<DepthRange> w = below.quantumWindows();
        assertEquals(1, w.size());
        assertEquals(0, w.get(0).top());
        assertEquals(142, w.get(0).bottomNm(), 0.2);
        assertEquals(auto.sheetDensityPerCm2(), below.sheetDensityPerCm2(), 5e-3 * auto.sheetDensityPerCm2());
    }

    /**
     * With the channel's mass every subband has GaN's in-plane mass; the weighted default adds the
     * heavier barrier mass for the part of each state in the AlGaN, so it is heavier. A lighter mass
     * holds fewer electrons per eV, so E_F rises further above the ground subband; n_s, fixed by
     * electrostatics, moves by less than 1 % (as DensityOfStatesMass documents).
     */
    @Test
    void theDensityOfStatesMassIsAnOption() {
        Structure s = StandardStacks.hemt(SET, 500, 0.25, 25, 0, TopBoundary.schottky(1.0));
        Solution weighted = new SelfConsistentSolver(COARSE).solve(s);
        Solution channel = new SelfConsistentSolver(COARSE.withDensityOfStatesMass(DensityOfStatesMass.CHANNEL)).solve(s);
        double gan = SET.material(Composition.GAN).masses().electronPerpendicular();
        for (Subband b : channel.subbands()) {
            assertEquals(gan, b.inPlaneMass(), 0, b.toString());
        }
        assertTrue(weighted.subbands().get(0).inPlaneMass() > gan, weighted.subbands().get(0).toString());
        assertTrue(channel.subbands().get(0).energyEv() < weighted.subbands().get(0).energyEv());
        double ns = weighted.sheetDensityPerCm2();
        assertTrue(Math.abs(channel.sheetDensityPerCm2() - ns) < 0.01 * ns);
        assertTrue(channel.sheetDensityPerCm2() != ns);
    }
}
