package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.A00TestSet;
import org.wurtzkit.units.Constants;
import org.wurtzkit.units.Units;

/** The Poisson part of the solver against exact electrostatics. */
class PoissonAnalyticTest {
    private static final ParameterSet SET = A00TestSet.INSTANCE;
    private static final WurtziteMaterial GAN = SET.material(Composition.GAN);
    private static final double EPS = GAN.permittivityStatic() * Constants.VACUUM_PERMITTIVITY;

    /**
     * Gauss's law (any electrostatics text, e.g. J. D. Jackson, Classical Electrodynamics, 3rd ed.
     * 1999, sec. 1.3): a sheet of charge sigma between two charge-free regions of permittivity eps
     * makes the field jump by sigma/eps. With both ends pinned 2 eV above the Fermi level the band
     * dips only about 0.5 eV at the sheet, so the sheet is fully ionised and free carriers are
     * negligible (below 1e-10 of sigma).
     */
    @Test
    void sheetChargeGivesFieldJumpSigmaOverEps() {
        double sheetPerCm2 = 5e11;
        Structure s = Structure.builder(SET)
                .grow(Layer.of("GaN", Composition.GAN, 200 * NM)
                        .withDeltaDoping(DeltaDoping.donorsPerCm2(sheetPerCm2, 0.0).atOffset(80 * NM)))
                .top(TopBoundary.schottky(2.0).atBiasV(0))
                .bottom(BottomBoundary.fixedFermiLevel(2.0))
                .build();
        Solution sol = new SelfConsistentSolver().solve(s);
        double[] mid = sol.cellMidpoints();
        double[] e = sol.electricField();
        double above = Double.NaN;
        double below = Double.NaN;
        for (int k = 0; k < mid.length; k++) {
            if (mid[k] < 80 * NM) {
                above = e[k];
            } else if (Double.isNaN(below)) {
                below = e[k];
            }
        }
        double sigma = Units.perCm2ToPerM2(sheetPerCm2) * Constants.ELEMENTARY_CHARGE;
        assertEquals(sigma / EPS, below - above, 1e-9 * sigma / EPS);
        // both sides are uniform (charge-free regions): the first and last cells carry the same fields
        assertEquals(above, e[0], 1e-6 * Math.abs(sigma / EPS));
        assertEquals(below, e[e.length - 1], 1e-6 * Math.abs(sigma / EPS));
    }

    /**
     * A uniform charge density rho between two fixed potentials gives the parabola
     * phi(x) = phi_0 + (phi_L - phi_0) x/L + rho x (L - x)/(2 eps) (exact solution of
     * eps phi'' = -rho). Box integration is exact for a parabola even on a non-uniform mesh, so the
     * nodal values agree to the size of the neglected free carriers.
     */
    @Test
    void uniformChargeGivesParabola() {
        double nd = 1e17;
        double len = 100 * NM;
        Structure s = Structure.builder(SET)
                .grow(Layer.of("GaN", Composition.GAN, len).withDopant(Dopant.donorsPerCm3(nd, 0.0)))
                .top(TopBoundary.schottky(1.2).atBiasV(0))
                .bottom(BottomBoundary.fixedFermiLevel(1.2))
                .build();
        Solution sol = new SelfConsistentSolver(SolverOptions.defaults().withMesh(new MeshPolicy(0.3 * NM, 1.2, 5 * NM)))
                .solve(s);
        double rho = Constants.ELEMENTARY_CHARGE * Units.perCm3ToPerM3(nd);
        double[] x = sol.depth();
        double[] phi = sol.potential();
        double p0 = phi[0];
        double pl = phi[phi.length - 1];
        double sag = rho * len * len / (8 * EPS);
        assertTrue(sag > 0.1, "the test needs a visible sag, got " + sag + " V");
        for (int i = 0; i < x.length; i++) {
            double exact = p0 + (pl - p0) * x[i] / len + rho * x[i] * (len - x[i]) / (2 * EPS);
            assertEquals(exact, phi[i], 1e-7 * sag, "node " + i);
        }
    }

    /**
     * Schottky contact on uniformly doped n-GaN: the depletion approximation (S. M. Sze and K. K. Ng,
     * Physics of Semiconductor Devices, 3rd ed., Wiley 2007, eq. 2.30 with the kT/q correction of
     * the majority-carrier tail) gives W = sqrt(2 eps (V_bi - kT/q) / (q N_D)). The solver's
     * charge-equivalent width, integral of (N_D+ - n) dx / N_D, must agree within a few percent.
     */
    @Test
    void schottkyDepletionWidthMatchesDepletionApproximation() {
        double nd = 1e17;
        double phiB = 1.0;
        Structure s = Structure.builder(SET)
                .grow(Layer.of("n-GaN", Composition.GAN, 1000 * NM).withDopant(Dopant.donorsPerCm3(nd, 0.0)))
                .top(TopBoundary.schottky(phiB).atBiasV(0))
                .build();
        Solution sol = new SelfConsistentSolver().solve(s);
        double[] x = sol.depth();
        double[] donors = sol.ionizedDonors();
        double[] n = sol.electronDensity();
        double ecBulk = sol.conductionBand()[x.length - 1];
        double ndM3 = Units.perCm3ToPerM3(nd);
        double integral = 0;
        for (int i = 0; i + 1 < x.length; i++) {
            double h = x[i + 1] - x[i];
            integral += 0.5 * h * ((donors[i] - n[i]) + (donors[i + 1] - n[i + 1]));
        }
        double wSolver = integral / ndM3;
        double vt = Constants.thermalVoltage(300);
        double vbi = phiB - ecBulk;
        double wSze = Math.sqrt(2 * EPS * (vbi - vt) / (Constants.ELEMENTARY_CHARGE * ndM3));
        assertEquals(wSze, wSolver, 0.03 * wSze);
        // the bulk is neutral: n = N_D+ at the bottom
        assertEquals(donors[x.length - 1], n[x.length - 1], 1e-6 * ndM3);
    }
}
