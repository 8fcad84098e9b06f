package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Electron-hole duality (an exact symmetry of the model, common practice, no source): with the
 * masses, densities of states and degeneracies of the two bands made equal and the band offsets
 * split evenly, a stack and its mirror with polarity, doping and energies inverted (E -> -E: a
 * Schottky barrier phi_B for electrons becomes E_g - phi_B, donors become acceptors) hold the same
 * sheets with electrons and holes swapped. Checks the hole statistics, the acceptor occupancy and
 * the hole subbands against the electron side, which the rest of the suite checks against
 * published physics.
 */
class ElectronHoleDualityTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final Source TEST = Source.of("DUALITY", "test material with equal electron and hole bands (invented)");
    private static final double MASS = 0.25;

    /**
     * A material with one isotropic conduction band of mass MASS and, 3 eV apart from the others, one
     * valence band of the same mass (crystal field -3 eV, no spin-orbit splitting: the top valence band
     * is the light hole, whose masses are -1/A1 and -1/A2), gap fixed (no Varshni shift), no strain.
     */
    static WurtziteMaterial material(String name, double gap, double valenceEdge, double psp) {
        return SET.material(Composition.GAN).toBuilder(name)
                .set(MaterialParameter.BAND_GAP_0K, gap, TEST).set(MaterialParameter.VARSHNI_ALPHA, 0, TEST)
                .set(MaterialParameter.VALENCE_BAND_EDGE, valenceEdge, TEST)
                .set(MaterialParameter.SPONTANEOUS_POLARIZATION, psp, TEST)
                .set(MaterialParameter.ELECTRON_MASS_PARALLEL, MASS, TEST)
                .set(MaterialParameter.ELECTRON_MASS_PERPENDICULAR, MASS, TEST)
                .set(MaterialParameter.VALENCE_A1, -1 / MASS, TEST).set(MaterialParameter.VALENCE_A2, -1 / MASS, TEST)
                .set(MaterialParameter.VALENCE_A3, 0, TEST).set(MaterialParameter.VALENCE_A4, -1, TEST)
                .set(MaterialParameter.VALENCE_A5, 0, TEST).set(MaterialParameter.VALENCE_A6, 0, TEST)
                .set(MaterialParameter.CRYSTAL_FIELD_SPLITTING, -3, TEST)
                .set(MaterialParameter.SPIN_ORBIT_SPLITTING, 0, TEST).build();
    }

    static Structure stack(boolean mirrored) {
        double egW = 3.4;
        double egB = 4.0;
        // even offsets: the barrier's valence edge lies (egB - egW)/2 below the well's
        WurtziteMaterial well = material("W", egW, 0, -0.029);
        WurtziteMaterial barrier = material("B", egB, -(egB - egW) / 2, -0.045);
        Dopant.Kind kind = mirrored ? Dopant.Kind.ACCEPTOR : Dopant.Kind.DONOR;
        return Structure.builder(SET).polarity(mirrored ? Polarity.N_FACE : Polarity.METAL_FACE)
                .grow(Layer.of("buffer", well, 300 * NM).withDopant(new Dopant(kind, 1e22, 0.02, 2)))
                .grow(Layer.of("barrier", barrier, 20 * NM))
                .top(TopBoundary.schottky(mirrored ? egB - 1.0 : 1.0, 0))
                .bottom(BottomBoundary.fixedFermiLevel(mirrored ? egW - 0.1 : 0.1)).build();
    }

    @Test
    void aStackAndItsInvertedMirrorHoldTheSameSheetsWithCarriersSwapped() {
        SelfConsistentSolver solver = new SelfConsistentSolver(SolverOptions.defaults().withQuantumHoles(true)
                .withTolerance(1e-9));
        Solution e = solver.solve(stack(false));
        Solution h = solver.solve(stack(true));
        assertTrue(e.sheetDensityPerCm2() > 1e12, "a 2DEG forms: " + e.sheetDensityPerCm2());
        assertEquals(e.electronSheetDensity(), h.holeSheetDensity(), 1e-6 * e.electronSheetDensity(), "all carriers");
        assertEquals(e.holeSheetDensity(), h.electronSheetDensity(), 1e-6 * e.electronSheetDensity(), "minority carriers");
        double wellE = 0;
        for (double v : e.wellSheetDensities()) {
            wellE += v;
        }
        double wellH = 0;
        for (HoleSubband b : h.holeSubbands()) {
            wellH += b.sheetDensity();
        }
        assertEquals(wellE, wellH, 1e-6 * wellE, "subband carriers");
        assertEquals(e.subbands().get(0).energyEv(), -h.holeSubbands().get(0).energyEv() + 0, 1e-6,
                "ground levels mirror each other (E -> -E about the Fermi level)");
        double[] ne = e.ionizedDonors();
        double[] na = h.ionizedAcceptors();
        assertEquals(ne[ne.length / 2], na[na.length / 2], 1e-6 * ne[ne.length / 2], "ionized dopants in the buffer");
    }
}
