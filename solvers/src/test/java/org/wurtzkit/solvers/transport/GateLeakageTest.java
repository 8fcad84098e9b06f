package org.wurtzkit.solvers.transport;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.mesh.MeshPolicy;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.StandardStacks;
import org.wurtzkit.units.Constants;

/** Gate leakage of computed band diagrams: a Schottky diode on n-GaN and Al0.25Ga0.75N/GaN HEMTs. */
class GateLeakageTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    /** Coarse mesh (0.2 nm at interfaces, growth 1.15, at most 100 nm), as in the workflow tests. */
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver(
            SolverOptions.defaults().withMesh(new MeshPolicy(0.2 * NM, 1.15, 100 * NM)));
    private static final BiasSweep SWEEP = new BiasSweep(SOLVER);
    private static final double[] CAPS_NM = {0, 2, 4, 8};
    private static BiasSweepResult[] capped;

    static Structure hemt(double capNm) {
        return StandardStacks.gatedHemt(SET, 0.25, 20, capNm, 1.0);
    }

    static Structure diode(double donorsPerCm3, double phiB) {
        return Structure.builder(SET)
                .grow(Layer.of("n-GaN", Composition.GAN, 2000 * NM).withDopant(Dopant.donorsPerCm3(donorsPerCm3, 0.0)))
                .top(TopBoundary.schottky(phiB, 0))
                .build();
    }

    @BeforeAll
    static void sweeps() {
        capped = new BiasSweepResult[CAPS_NM.length];
        for (int i = 0; i < CAPS_NM.length; i++) {
            capped[i] = SWEEP.run(hemt(CAPS_NM[i]), BiasGrid.linear(0, -4, 9));
            BiasSweepResult r = capped[i];
            assertTrue(r.failures().isEmpty(), () -> r.failures().toString());
        }
    }

    /**
     * An ideal Schottky diode on n-GaN: the part of the Tsu-Esaki integral above the computed barrier
     * top is thermionic emission, J = A* T^2 exp(-q phi_B / kT)(exp(qV/kT) - 1) with A* = 4 pi q m*
     * k^2 / h^3 (S. M. Sze and K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch.
     * 3), here with m* = 0.20 (GaN in the default parameter set), A* = 24.0 A cm^-2 K^-2. The top is
     * E_c at the gate, phi_B - V; the Fermi-Dirac correction is below e^{-(phi_B - V)/kT} &lt; 1e-6
     * for V &le; 0.4 V, so we ask for 1e-5, in forward and reverse bias.
     */
    @Test
    void schottkyDiodeOnNGaNGivesThermionicEmission() {
        double mass = SET.material(Composition.GAN).masses().electronPerpendicular();
        assertEquals(24.0e4, ThermionicEmission.richardsonConstant(mass), 0.05e4, "A* of GaN");
        for (double nd : new double[] {1e16, 1e17}) {
            BiasSweepResult r = SWEEP.run(diode(nd, 0.8), BiasGrid.of(0.4, 0.3, 0.2, 0.1, -0.5, -2));
            assertTrue(r.failures().isEmpty(), () -> r.failures().toString());
            LeakageCurve c = GateLeakage.curve(r, LeakageOptions.defaults());
            for (int i = 0; i < c.size(); i++) {
                LeakageCurrent j = c.point(i).orElseThrow();
                double v = j.gateBiasV();
                double te = ThermionicEmission.diodeCurrent(0.8, v, mass, 300);
                assertEquals(0.8 - v, j.barrierTopEv(), 1e-9, "top = E_c(0) = phi_B - V");
                assertEquals(te, j.thermionic(), 1e-5 * Math.abs(te), "N_D " + nd + ", V " + v);
                assertEquals(Math.signum(v), Math.signum(j.total()), "forward positive, reverse negative");
            }
        }
    }

    /**
     * Field emission rises with doping: at N_D = 1e18 cm^-3 (E00 = 13.5 meV with eps 9.5, m* 0.2,
     * against kT = 25.9 meV: thermionic-field emission, F. A. Padovani and R. Stratton, Solid-State
     * Electron. 9, 695 (1966)) the reverse current at -2 V is dominated by tunnelling, at 1e16 (E00 =
     * 1.35 meV) the tunnelling part is smaller than at 1e18 by orders of magnitude.
     */
    @Test
    void tunnellingGrowsWithDopingIntoThermionicFieldEmission() {
        double[] tunnel = new double[2];
        double[] thermal = new double[2];
        double[] nd = {1e16, 1e18};
        for (int k = 0; k < 2; k++) {
            Solution s = SOLVER.solve(diode(nd[k], 0.8).withTop(TopBoundary.schottky(0.8, -2)));
            LeakageCurrent j = GateLeakage.of(s, LeakageOptions.defaults());
            tunnel[k] = -j.tunnelling();
            thermal[k] = -j.thermionic();
        }
        assertTrue(tunnel[1] > 10 * thermal[1], "1e18: tunnelling " + tunnel[1] + " vs thermionic " + thermal[1]);
        assertTrue(tunnel[1] > 1e3 * tunnel[0], "tunnelling at 1e18 " + tunnel[1] + " vs 1e16 " + tunnel[0]);
    }

    /**
     * Reverse field emission of a heavily doped n-GaN Schottky diode (N_D = 1e19 cm^-3, 77 K, phi_B =
     * 0.8 eV; E00 = (q hbar / 2) sqrt(N_D / (m* eps_s eps0)) = 40.7 meV, six times kT) against the
     * field-emission formula of F. A. Padovani and R. Stratton, Solid-State Electron. 9, 695 (1966), as
     * quoted by S. M. Sze and K. K. Ng, Physics of Semiconductor Devices, 3rd ed. (2007), ch. 3 (from
     * memory): J = A* (E00/k)^2 ((phi_B + V_R)/phi_B) exp[-2 phi_B^{3/2} / (3 E00 sqrt(phi_B + V_R))].
     * The formula takes the barrier as a triangle with the surface field and linearises the exponent;
     * the computed parabola is thicker, so the computed current is lower, and the formula improves as
     * V_R grows past phi_B (the part of the parabola that matters becomes a triangle). Checked: the
     * ratio lies in (0.5, 1) for V_R = 4, 8 and 16 V and rises with V_R.
     */
    @Test
    void reverseFieldEmissionOfADegenerateDiodeApproachesPadovaniStratton() {
        double nd = 1e19;
        double phi = 0.8;
        double t = 77;
        var gan = SET.material(Composition.GAN);
        double m = gan.masses().electronPerpendicular();
        double e00 = Constants.HBAR / 2 * Math.sqrt(nd * 1e6
                / (m * Constants.ELECTRON_MASS * gan.permittivityStatic() * Constants.VACUUM_PERMITTIVITY));
        assertEquals(0.0407, e00, 0.0005, "E00 (eV)");
        SelfConsistentSolver classical = new SelfConsistentSolver(
                SolverOptions.defaults().withQuantumWindows(QuantumWindows.none()));
        Structure d = Structure.builder(SET)
                .grow(Layer.of("n+ GaN", Composition.GAN, 300 * NM).withDopant(Dopant.donorsPerCm3(nd, 0.0)))
                .top(TopBoundary.schottky(phi, 0)).temperature(t).build();
        double previous = 0;
        for (double vr : new double[] {4, 8, 16}) {
            Solution s = classical.solve(d.withTop(TopBoundary.schottky(phi, -vr)));
            double j = -GateLeakage.of(s, LeakageOptions.defaults()).total();
            double fe = ThermionicEmission.richardsonConstant(m) * Math.pow(e00 / Constants.BOLTZMANN_EV, 2)
                    * (phi + vr) / phi * Math.exp(-2 * Math.pow(phi, 1.5) / (3 * e00 * Math.sqrt(phi + vr)));
            double ratio = j / fe;
            assertTrue(ratio > 0.5 && ratio < 1 && ratio > previous, "V_R " + vr + " V: computed " + j
                    + " A/m^2, Padovani-Stratton " + fe + ", ratio " + ratio + " after " + previous);
            previous = ratio;
        }
    }

    /**
     * A thicker GaN cap lowers the reverse leakage at equal gate bias: it adds to the tunnelling
     * distance and its polarization raises the barrier (common practice, no source). Checked at
     * every bias from -1 to -4 V for caps of 0, 2, 4 and 8 nm.
     */
    @Test
    void thickerCapLowersTheLeakageAtEqualBias() {
        LeakageCurve[] curves = new LeakageCurve[CAPS_NM.length];
        for (int i = 0; i < CAPS_NM.length; i++) {
            curves[i] = GateLeakage.curve(capped[i], LeakageOptions.defaults());
        }
        for (int p = 2; p < 9; p++) {
            for (int i = 1; i < CAPS_NM.length; i++) {
                double thin = -curves[i - 1].totalAPerCm2()[p];
                double thick = -curves[i].totalAPerCm2()[p];
                assertTrue(thick > 0 && thick < thin, "V " + curves[i].gateBiasV()[p] + ": cap " + CAPS_NM[i - 1]
                        + " nm " + thin + " A/cm^2, cap " + CAPS_NM[i] + " nm " + thick);
            }
        }
        // and the reverse current grows with reverse bias for each cap
        for (LeakageCurve c : curves) {
            double[] j = c.totalAPerCm2();
            for (int p = 2; p < 9; p++) {
                assertTrue(j[p] < j[p - 1], "more reverse bias, more leakage: " + j[p - 1] + " then " + j[p]);
            }
        }
    }

    /**
     * The transfer matrix is the check of WKB on the computed profile: they differ only by the
     * prefactors of the abrupt steps (the gate interface and heterointerfaces), each between about 0
     * and 2 (the step factor 4 k kappa / (k^2 + kappa^2), standard matching, from memory), so on
     * these profiles the two agree within a factor 2. The transfer matrix converges with the slab
     * width (0.02 nm against 0.01 nm within 1 %).
     */
    @Test
    void transferMatrixAndWkbAgreeOnTheComputedBarrier() {
        for (int i = 0; i < CAPS_NM.length; i++) {
            Solution s = capped[i].solution(6).orElseThrow(); // -3 V
            double wkb = GateLeakage.of(s, LeakageOptions.defaults()).tunnelling();
            LeakageOptions tmm = LeakageOptions.defaults().withTransmission(TransmissionMethod.TRANSFER_MATRIX);
            double t1 = GateLeakage.of(s, tmm).tunnelling();
            double t2 = GateLeakage.of(s, tmm.withSlabWidth(0.01 * NM)).tunnelling();
            assertEquals(t2, t1, 0.01 * Math.abs(t2), "slab convergence, cap " + CAPS_NM[i]);
            assertTrue(t1 / wkb > 0.5 && t1 / wkb < 2, "cap " + CAPS_NM[i] + " nm: TMM " + t1 + ", WKB " + wkb);
        }
    }

    /** The current integral on a computed barrier converges: 1e-6 against 1e-9 to 3e-6. */
    @Test
    void currentIntegralConvergesOnAComputedBarrier() {
        for (BiasSweepResult r : capped) {
            Solution s = r.solution(8).orElseThrow();
            double a = GateLeakage.of(s, LeakageOptions.defaults()).total();
            double b = GateLeakage.of(s, LeakageOptions.defaults().withRelativeAccuracy(1e-9)).total();
            assertEquals(b, a, 3e-6 * Math.abs(b));
        }
    }

    /**
     * Equal Fermi levels carry no current (equilibrium); the sign follows the bias; the image force
     * lowers the top by sqrt(qF/(4 pi eps0 eps_inf)) at the gate field F (Sze and Ng, above, sec.
     * 3.2.4), within 5 % (the field is not uniform over the few nm of the image well), and raises the
     * reverse current.
     */
    @Test
    void equilibriumSignAndImageForce() {
        assertEquals(0, GateLeakage.of(capped[0].solution(0).orElseThrow(), LeakageOptions.defaults()).total());
        Solution s = capped[0].solution(8).orElseThrow();
        LeakageCurrent plain = GateLeakage.of(s, LeakageOptions.defaults());
        LeakageCurrent image = GateLeakage.of(s, LeakageOptions.defaults().withImageForceLowering(true));
        double f = Math.abs(s.electricField()[0]);
        double eps = SET.material(Composition.alGaN(0.25)).permittivityHighFrequency();
        double expected = Math.sqrt(Constants.ELEMENTARY_CHARGE * f
                / (4 * Math.PI * Constants.VACUUM_PERMITTIVITY * eps));
        assertEquals(expected, plain.barrierTopEv() - image.barrierTopEv(), 0.05 * expected);
        assertTrue(image.total() < plain.total() && plain.total() < 0);
        assertTrue(plain.warnings().stream().anyMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.IMAGE_FORCE_LOWERING_LEFT_OUT
                && w.message().contains("image-force lowering is off")), plain.warnings()
                .toString());
        assertTrue(image.warnings().stream().noneMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.IMAGE_FORCE_LOWERING_LEFT_OUT));

        // the curve gathers its points' warnings by kind, names the first point, and writes them in its CSV
        LeakageCurve curve = GateLeakage.curve(capped[0], LeakageOptions.defaults());
        org.wurtzkit.warnings.Warning gathered = curve.warnings().stream()
                .filter(w -> w.kind() == org.wurtzkit.warnings.WarningKind.IMAGE_FORCE_LOWERING_LEFT_OUT).findFirst()
                .orElseThrow(() -> new AssertionError(curve.warnings().toString()));
        assertTrue(gathered.message().startsWith("at V_g = "), gathered.message());
        String csv = curve.toCsvString();
        assertTrue(csv.contains("# warning: " + gathered), csv);
        assertTrue(csv.contains("computation=gate leakage curve"), csv);
        LeakageCurve withImage = GateLeakage.curve(capped[0], LeakageOptions.defaults().withImageForceLowering(true));
        assertTrue(withImage.warnings().stream()
                .noneMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.IMAGE_FORCE_LOWERING_LEFT_OUT));
        assertTrue(withImage.provenance().orElseThrow().run().get("leakageOptions").contains("imageForceLowering=true"));
    }

    /**
     * Poole-Frenkel lowering sqrt(qF/(pi eps0 eps_r)) at 1 MV/cm: 0.328 eV for eps_r = 5.35 and 0.246 eV
     * for 9.5 (computed by hand from the formula of J. Frenkel, Phys. Rev. 54, 647 (1938)); in a
     * leakage result it appears in reverse bias only, with the sign of the reverse current.
     */
    @Test
    void pooleFrenkelEmission() {
        assertEquals(0.328, PooleFrenkelEmission.lowering(1e8, 5.35), 0.0005);
        assertEquals(0.246, PooleFrenkelEmission.lowering(1e8, 9.5), 0.0005);
        PooleFrenkelEmission pf = new PooleFrenkelEmission(0.5, 1e-3);
        Solution s = capped[1].solution(8).orElseThrow();
        LeakageCurrent j = GateLeakage.of(s, LeakageOptions.defaults().withPooleFrenkel(pf));
        double eps = SET.material(Composition.GAN).permittivityHighFrequency();
        assertEquals(-pf.current(j.barrierFieldVPerM(), eps, 300), j.pooleFrenkel(),
                1e-12 * Math.abs(j.pooleFrenkel()));
        assertTrue(j.barrierFieldVPerM() > 1e8 && j.barrierFieldVPerM() < 5e8, "field in the barrier "
                + j.barrierFieldVPerM());
        assertEquals(0, GateLeakage.of(s, LeakageOptions.defaults()).pooleFrenkel());
        LeakageOptions withPf = LeakageOptions.defaults().withPooleFrenkel(pf);
        assertEquals(0, GateLeakage.of(capped[1].solution(0).orElseThrow(), withPf).pooleFrenkel());
        assertThrows(InvalidParameterException.class, () -> new PooleFrenkelEmission(0, 1));
        assertThrows(InvalidParameterException.class,
                () -> LeakageOptions.defaults().withMechanisms(LeakageMechanism.POOLE_FRENKEL));
    }

    /**
     * Far beyond pinch-off (V_g = -8 V on a stack whose n_s vanishes near -3 V) no electron gas lies
     * under the gate: the collector of the current is a band edge above the Fermi level, and the
     * point and the curve say so with a typed warning; at 0 V (2DEG present) there is none. Charge
     * control of a HEMT channel: common practice, no source.
     */
    @Test
    void aPinchedOffChannelIsReportedAsNoElectronGasUnderTheGate() {
        BiasSweepResult deep = SWEEP.run(hemt(0), BiasGrid.linear(0, -8, 17));
        assertTrue(deep.failures().isEmpty(), () -> deep.failures().toString());
        assertTrue(deep.sheetDensityPerCm2()[16] < 1e9, "pinched off at -8 V: " + deep.sheetDensityPerCm2()[16]);
        LeakageCurve c = GateLeakage.curve(deep, LeakageOptions.defaults());
        assertTrue(c.point(16).orElseThrow().warnings().stream()
                .anyMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.NO_ELECTRON_GAS_UNDER_GATE),
                () -> c.point(16).orElseThrow().warnings().toString());
        assertTrue(c.point(0).orElseThrow().warnings().stream()
                .noneMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.NO_ELECTRON_GAS_UNDER_GATE));
        assertTrue(c.warnings().stream().anyMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.NO_ELECTRON_GAS_UNDER_GATE
                && w.message().startsWith("at V_g = ")), c.warnings()::toString);
    }

    /** The J-V table: one row per sweep point, a header with units, numbers that read back. */
    @Test
    void curveWritesCsv() throws IOException {
        LeakageCurve c = GateLeakage.curve(capped[1], LeakageOptions.defaults());
        StringWriter w = new StringWriter();
        c.writeCsv(w);
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(w.toString())).getRecords();
        assertEquals(List.of("gate_bias_V", "total_A/cm^2", "thermionic_A/cm^2", "tunnelling_A/cm^2",
                "poole_frenkel_A/cm^2", "barrier_top_eV", "status"), c.headers());
        assertEquals(9, rows.size());
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(c.totalAPerCm2()[i], Double.parseDouble(rows.get(i).get("total_A/cm^2")));
            assertEquals(c.tunnellingAPerCm2()[i], Double.parseDouble(rows.get(i).get("tunnelling_A/cm^2")));
            assertEquals(c.thermionicAPerCm2()[i], Double.parseDouble(rows.get(i).get("thermionic_A/cm^2")));
            assertEquals(0.0, Double.parseDouble(rows.get(i).get("poole_frenkel_A/cm^2")));
            assertTrue(rows.get(i).get("status").startsWith("ok"));
        }
    }

    /** One call for a structure at a reverse bias equals the curve's point at that bias. */
    @Test
    void oneCallAtAReverseBias() {
        LeakageCurrent one = GateLeakage.atReverseBias(hemt(2), 3, SWEEP, LeakageOptions.defaults());
        LeakageCurrent fromSweep = GateLeakage.atBias(capped[1], -3, LeakageOptions.defaults());
        assertEquals(-3, one.gateBiasV());
        // both solves converge to 1e-6 V in the potential; the current moves by |dJ/dV| dV, far below 1e-3
        assertEquals(fromSweep.total(), one.total(), 1e-3 * Math.abs(fromSweep.total()));
        LeakageCurrent between = GateLeakage.atBias(capped[1], -3.25, LeakageOptions.defaults());
        double a = GateLeakage.atBias(capped[1], -3, LeakageOptions.defaults()).total();
        double b = GateLeakage.atBias(capped[1], -3.5, LeakageOptions.defaults()).total();
        assertTrue(between.total() < a && between.total() > b, between.total() + " between " + a + " and " + b);
        assertTrue(between.warnings().stream().anyMatch(w -> w.kind() == org.wurtzkit.warnings.WarningKind.INTERPOLATED_BETWEEN_POINTS
                && w.message().contains("interpolated")));
    }

    /**
     * GateLeakage holds no state: four threads computing the curves of all four stacks at once get
     * the serial results bit for bit (the library's thread-safety rule, DEVELOPERS.md).
     */
    @Test
    void parallelCurvesEqualSerialOnesBitForBit() throws Exception {
        double[][] serial = new double[CAPS_NM.length][];
        for (int i = 0; i < CAPS_NM.length; i++) {
            serial[i] = GateLeakage.curve(capped[i], LeakageOptions.defaults()).totalAPerCm2();
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<double[]>> fs = new ArrayList<>();
            for (int r = 0; r < 2; r++) {
                for (int i = 0; i < CAPS_NM.length; i++) {
                    BiasSweepResult sweep = capped[i];
                    fs.add(pool.submit(() -> GateLeakage.curve(sweep, LeakageOptions.defaults()).totalAPerCm2()));
                }
            }
            for (int k = 0; k < fs.size(); k++) {
                assertArrayEquals(serial[k % CAPS_NM.length], fs.get(k).get());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void badInputGetsAClearException() {
        InvalidParameterException far = assertThrows(InvalidParameterException.class,
                () -> GateLeakage.atBias(capped[0], -10, LeakageOptions.defaults()));
        assertTrue(far.getMessage().contains("gate bias") && far.getMessage().contains("[-4.0, 0.0]"),
                far.getMessage());
        for (double t : new double[] {5, 1500}) {
            InvalidParameterException e = assertThrows(InvalidParameterException.class,
                    () -> GateLeakage.atReverseBias(hemt(0).withTemperature(t), 2, SWEEP, LeakageOptions.defaults()));
            assertTrue(e.getMessage().contains("temperature"), e.getMessage());
        }
        assertThrows(InvalidParameterException.class,
                () -> GateLeakage.atReverseBias(hemt(0), -1, SWEEP, LeakageOptions.defaults()));
        Structure free = StandardStacks.hemt(SET, 500, 0.25, 20, 0, new TopBoundary.FreeSurface(1.0, 1e17));
        WurtzkitException e = assertThrows(WurtzkitException.class,
                () -> GateLeakage.of(SOLVER.solve(free), LeakageOptions.defaults()));
        assertEquals(ErrorKind.INVALID_STRUCTURE, e.kind());
        assertThrows(InvalidParameterException.class, () -> LeakageOptions.defaults().withRelativeAccuracy(0.5));
        assertThrows(InvalidParameterException.class, () -> LeakageOptions.defaults().withRichardsonMass(-0.2));
    }
}
