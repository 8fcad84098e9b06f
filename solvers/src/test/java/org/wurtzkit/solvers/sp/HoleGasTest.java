package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.Arrays;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/** Quantum holes: hole subbands against analytic levels, and the polarization-induced 2DHG of GaN on AlN. */
class HoleGasTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    /** Mesh refinement of the square-well check: the default mesh leaves 1.5 % (the interface nodes' averaged potential), 4x finer 0.3 %. */
    private static final double REFINE = 4;
    private static final double HB2M0 = Constants.HBAR * Constants.HBAR / (2 * Constants.ELECTRON_MASS)
            / Constants.ELEMENTARY_CHARGE; // eV m^2

    /**
     * Heavy-hole ground level of a GaN well between AlN barriers at flat bands against the finite
     * square well with a mass step (BenDaniel-Duke matching psi and psi'/m; G. Bastard, Wave Mechanics
     * Applied to Semiconductor Heterostructures, 1988; exact transcendental equation solved here with
     * Brent's method): k tan(kL/2)/m_w = kappa/m_b. 0.5 % for the mesh.
     */
    @Test
    void squareWellHeavyHoleLevelMatchesTheFiniteWell() {
        double l = 5 * NM;
        Structure s = Structure.builder(SET).onRelaxed(Composition.GAN).grow(Layer.of("bottom", Composition.ALN, 20 * NM))
                .grow(Layer.of("well", Composition.GAN, l)).grow(Layer.of("top", Composition.ALN, 20 * NM))
                .top(TopBoundary.schottky(1, 0)).build();
        SolverOptions o = SolverOptions.defaults().withQuantumHoles(true).withQuantumWindows(QuantumWindows.explicit(
                new QuantumWindows.Window(0, s.totalThickness())));
        HoleStates h;
        // hole cut-off far above the barrier so the ground state is found whatever the quasi-Fermi level;
        // mesh refined so that the discretisation stays inside the 0.5 % allowed
        Device deep = new Device(s, o.withSubbandCutoffKT(200).withMesh(org.wurtzkit.solvers.mesh.MeshPolicy.DEFAULT.refined(REFINE)));
        h = new HoleStates(deep);
        h.update(deep, new double[deep.n]);
        int wellCell = deep.mesh.nearestNode(22 * NM);
        int barrierCell = deep.mesh.nearestNode(5 * NM);
        // heavy-hole barrier height (eV): the valence-band step plus the heavy hole's own offset below
        // each top band (in AlN the crystal field puts the light, Z-like band on top)
        double v0 = deep.ev[wellCell] - deep.ev[barrierCell] + deep.holeOffset[0][barrierCell] - deep.holeOffset[0][wellCell];
        double mw = ValenceBands.of(SET.material(Composition.GAN)).heavyHole().massParallel();
        double mb = deep.holeMassZ[0][barrierCell];
        assertTrue(v0 > 0.3, "AlN valence band lies below GaN's: " + v0);
        double e = new BrentSolver(1e-12, 1e-14).solve(200, eps -> {
            double k = Math.sqrt(eps / (HB2M0 / mw));
            double kappa = Math.sqrt((v0 - eps) / (HB2M0 / mb));
            return k * Math.tan(k * l / 2) / mw - kappa / mb;
        }, 1e-6, Math.min(v0 - 1e-9, (HB2M0 / mw) * Math.pow(Math.PI / l, 2) * 0.999));
        double ground = h.energy[0][0][0] - (-deep.ev[wellCell] + deep.holeOffset[0][wellCell]);
        assertTrue(h.count[0][0] >= 1);
        assertEquals(e, ground, 0.005 * e, "heavy-hole ground level above the GaN valence-band edge (eV)");
    }

    /**
     * Heavy and light holes in a triangular well (uniform field F against a hard wall) against the Airy
     * levels epsilon_n = (hbar^2/2m)^(1/3) (eF)^(2/3) |a_n| (a_1 = -2.33810741, a_2 = -4.08794944;
     * M. Abramowitz and I. A. Stegun, Handbook of Mathematical Functions, 1964, Table 10.13). 0.5 %.
     */
    @Test
    void triangularWellHoleLevelsMatchAiry() {
        Structure s = Structure.builder(SET).grow(Layer.of("bulk", Composition.GAN, 200 * NM)).top(TopBoundary.schottky(1, 0))
                .build();
        SolverOptions o = SolverOptions.defaults().withQuantumHoles(true).withSubbandCutoffKT(200)
                .withQuantumWindows(QuantumWindows.explicit(new QuantumWindows.Window(0, 60 * NM)));
        Device d = new Device(s, o);
        double field = 2e7; // V/m
        double[] phi = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            phi[i] = field * d.x[i] - 0.2; // hole energy phi - E_v rises with depth from the wall at 0
        }
        HoleStates h = new HoleStates(d);
        h.update(d, phi);
        double edge = phi[0] - d.ev[0];
        double[] airy = {2.33810741, 4.08794944};
        for (int b = 0; b < 2; b++) {
            double m = d.holeMassZ[b][0];
            double offset = d.holeOffset[b][0];
            for (int n = 0; n < 2; n++) {
                double expected = Math.cbrt(HB2M0 / m * field * field) * airy[n];
                double got = h.energy[0][b][n] - edge - offset;
                assertEquals(expected, got, 0.005 * expected, "band " + b + " level " + n + " " + Arrays.toString(airy));
            }
        }
    }

    /**
     * Metal-polar GaN (13 nm) on relaxed AlN: the negative polarization sheet at the GaN/AlN interface
     * binds a two-dimensional hole gas; measured about 5e13 cm^-2 at room temperature (R. Chaudhuri,
     * S. J. Bader, Z. Chen, D. A. Muller, H. G. Xing and D. Jena, Science 365, 1454 (2019); the value
     * from memory). Tolerance 25 %: the sheet charge itself moves by about that much between the
     * published polarization constants (the two built-in sets differ by 10-20 % in sigma here), and
     * the measured samples' surface condition is not known to this test (free surface with 1e13 cm^-2
     * donors at 1.65 eV assumed).
     */
    @Test
    void galliumNitrideOnAluminiumNitrideHoldsTheMeasuredHoleGas() {
        Structure s = Structure.builder(SET).onRelaxed(Composition.ALN).grow(Layer.of("AlN", Composition.ALN, 400 * NM))
                .grow(Layer.of("GaN", Composition.GAN, 13 * NM)).top(TopBoundary.freeSurface(1.65, 1e13)).build();
        Solution sol = new SelfConsistentSolver(SolverOptions.defaults().withQuantumHoles(true)).solve(s);
        double twoDhg = 0;
        for (CarrierSheet c : sol.carrierSheets()) {
            if (c.carrier() == Carrier.HOLES && c.window() >= 0 && c.layer().equals("GaN")) {
                twoDhg += c.sheetDensityPerCm2();
                assertTrue(c.centroidDepth() > 10 * NM && c.centroidDepth() < 13 * NM, "at the interface: " + c);
            }
        }
        assertEquals(5e13, twoDhg, 0.25 * 5e13, "2DHG (cm^-2)");
        assertTrue(!sol.holeSubbands().isEmpty());
        assertTrue(twoDhg * 1e4 < -s.interfaceCharges().get(0).sigma() / Constants.ELEMENTARY_CHARGE,
                "no more holes than the polarization sheet binds");
    }
}
