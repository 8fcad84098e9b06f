package org.wurtzkit.solvers.transport.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.workflow.TemperatureSweep;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/**
 * Mobility of self-consistent AlGaN/GaN solutions (default parameter set, default options): sheet
 * resistance, temperature trend, screening, N-face. The measured check with and without an AlN
 * interlayer is {@link AlnInterlayerMobilityTest}.
 */
class MobilityOfSolutionTest {
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver();

    /** 2 um GaN, optional 1 nm AlN, 25 nm Al0.25Ga0.75N, 2 nm GaN cap, free surface (donors 1 eV, 1e14 cm^-2). */
    static Structure hemt(boolean alnInterlayer, double t) {
        Structure.Builder b = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 2000e-9));
        if (alnInterlayer) {
            b.grow(Layer.of("interlayer", Composition.ALN, 1e-9));
        }
        return b.grow(Layer.of("barrier", Composition.alGaN(0.25), 25e-9))
                .grow(Layer.of("cap", Composition.GAN, 2e-9))
                .top(TopBoundary.freeSurface(1.0, 1e14)).temperature(t).build();
    }

    static MobilityResult mobility(boolean aln, double t) {
        return Mobility.of(SOLVER.solve(hemt(aln, t)), MobilityOptions.defaults());
    }

    @Test
    void sheetResistanceIsAFewHundredOhmPerSquareAndConsistent() {
        Solution s = SOLVER.solve(hemt(false, 300));
        MobilityResult r = Mobility.of(s, MobilityOptions.defaults());
        // every subband electron is either conducting or reported as left out, none is counted twice
        assertEquals(s.sheetDensityPerCm2(), r.sheetDensityPerCm2() + r.excludedSheetDensity() * 1e-4,
                1e-9 * s.sheetDensityPerCm2());
        assertTrue(r.excludedSheetDensity() < MobilityOptions.DEFAULT_MINIMUM_SUBBAND_FRACTION * s.subbands().size()
                * r.sheetDensity());
        // leaving out the small subbands moves R_sh by about their share of the electrons (definition of the option)
        MobilityResult every = Mobility.of(s, MobilityOptions.defaults().withMinimumSubbandFraction(0));
        assertEquals(0, every.excludedSheetDensity());
        double share = r.excludedSheetDensity() / every.sheetDensity();
        assertEquals(every.sheetResistanceOhmPerSquare(), r.sheetResistanceOhmPerSquare(),
                2 * share * every.sheetResistanceOhmPerSquare());
        assertTrue(r.sheetDensityPerCm2() > 0.8e13 && r.sheetDensityPerCm2() < 1.3e13, "n_s " + r.sheetDensityPerCm2());
        // R_sh = 1/(e sum n_i mu_i) and mu = sum n_i mu_i / n (definitions)
        double g = 0;
        double nmu = 0;
        for (int i = 0; i < r.subbandCount(); i++) {
            g += Constants.ELEMENTARY_CHARGE * r.sheetDensity(i) * r.subbandMobility(i);
            nmu += r.sheetDensity(i) * r.subbandMobility(i);
        }
        assertEquals(1 / g, r.sheetResistanceOhmPerSquare(), 1e-12 / g);
        assertEquals(nmu / r.sheetDensity(), r.mobility(), 1e-12 * r.mobility());
        // typical AlGaN/GaN HEMT wafers at 300 K: n_s 0.8-1.2e13 cm^-2, R_sh 250-450 ohm/sq (common practice,
        // no source); the same factor 1.5 as for the mobility
        assertInBand(r.sheetResistanceOhmPerSquare(), 250 / 1.5, 450 * 1.5, "R_sh at 300 K");
        // Matthiessen per subband: the total rate is the sum of the mechanisms' rates
        for (int i = 0; i < r.subbandCount(); i++) {
            double inv = 0;
            for (String m : r.mechanisms()) {
                inv += 1 / r.subbandMobility(i, m);
            }
            assertEquals(1 / inv, r.subbandMobility(i), 1e-9 * r.subbandMobility(i));
        }
    }

    @Test
    void mobilityFallsWithTemperatureOverASweep() {
        // phonon scattering grows with T; 77-600 K (Hsu & Walukiewicz 1997; every measured AlGaN/GaN
        // Hall series, common practice)
        List<MobilityResult> curve = Mobility.versusTemperature(new TemperatureSweep().run(hemt(false, 77), 77, 300, 600),
                MobilityOptions.defaults());
        assertEquals(3, curve.size());
        assertEquals(600, curve.get(2).temperatureK());
        // the same as a table: one row per temperature, the CSV cells read back to the identical doubles
        MobilityTable table = new MobilityTable(curve);
        assertEquals(3, table.rowCount());
        assertEquals(4 + 7, table.headers().size());
        assertEquals("mobility alloy disorder_cm^2/Vs", table.headers().get(4 + 3));
        assertEquals(curve.get(1).mobilityCm2PerVs(), Double.parseDouble(table.row(1).get(2)));
        assertEquals(curve.get(2).mobilityCm2PerVs("polar optical phonon"), Double.parseDouble(table.row(2).get(4)));
        // the table's CSV starts with the sweep's provenance; repeating the sweep and the mobility from
        // it alone gives the same CSV bit for bit (the solver is deterministic; common practice, no source)
        org.wurtzkit.provenance.ResultProvenance p = table.provenance().orElseThrow();
        assertEquals("mobility table", p.run().get("computation"));
        assertEquals("temperature sweep", p.run().get("source.computation"));
        double[] temperatures = java.util.Arrays.stream(p.run().get("source.temperaturesK").split(" "))
                .mapToDouble(Double::parseDouble).toArray();
        List<MobilityResult> again = Mobility.versusTemperature(new TemperatureSweep(new org.wurtzkit.solvers.sp
                .SelfConsistentSolver(org.wurtzkit.solvers.sp.SolverOptions.fromSettings(p.solverOptions())))
                .run(p.structure(), temperatures), MobilityOptions.defaults());
        assertEquals(MobilityOptions.defaults().toString(), p.run().get("mobilityOptions"));
        assertEquals(table.toCsvString(), new MobilityTable(again).toCsvString());
        assertTrue(table.toCsvString().startsWith("# produced by wurtzkit "));
        for (int i = 1; i < curve.size(); i++) {
            assertTrue(curve.get(i).mobility() < curve.get(i - 1).mobility(), curve.toString());
            assertTrue(curve.get(i).mobility(new PolarOpticalPhonon().name())
                    < curve.get(i - 1).mobility(new PolarOpticalPhonon().name()), curve.toString());
        }
    }

    /**
     * At 600 K the electrons spread over many subbands (k_B T = 52 meV against subband spacings of
     * tens of meV); leaving out every subband below 1 % of the electrons leaves out more than the
     * 0.5 % the result reports, and the result says how much (typed ELECTRONS_LEFT_OUT). With the
     * default cut (0.1 %) at 300 K nothing is reported. Boltzmann occupation of subbands: common
     * practice, no source.
     */
    @Test
    void leavingOutSubbandsIsReportedWithItsShare() {
        Solution hot = SOLVER.solve(hemt(false, 600));
        MobilityResult cut = Mobility.of(hot, MobilityOptions.defaults().withMinimumSubbandFraction(0.01));
        org.wurtzkit.warnings.Warning w = cut.warnings().stream()
                .filter(x -> x.kind() == org.wurtzkit.warnings.WarningKind.ELECTRONS_LEFT_OUT).findFirst()
                .orElseThrow(() -> new AssertionError(cut.warnings().toString()));
        assertTrue(w.message().contains("are left out of the mobility"), w.message());
        assertTrue(cut.toString().contains("warning: " + w.message()), cut.toString());
        MobilityResult plain = Mobility.of(SOLVER.solve(hemt(false, 300)), MobilityOptions.defaults());
        assertTrue(plain.warnings().stream().noneMatch(x -> x.kind() == org.wurtzkit.warnings.WarningKind.ELECTRONS_LEFT_OUT),
                plain.warnings().toString());
    }

    @Test
    void screeningOnlyLowersCoulombRates() {
        Solution s = SOLVER.solve(hemt(false, 300));
        List<ScatteringMechanism> coulomb = List.of(RemoteCharge.DEFAULT, InterfaceRoughness.DEFAULT,
                new PiezoelectricAcoustic());
        MobilityOptions o = MobilityOptions.defaults().withMechanisms(coulomb);
        MobilityResult screened = Mobility.of(s, o);
        MobilityResult bare = Mobility.of(s, o.withScreening(Screening.NONE));
        for (ScatteringMechanism m : coulomb) {
            assertTrue(bare.mobility(m.name()) < screened.mobility(m.name()), m.name());
        }
        // an unscreened charged line scatters infinitely: refused, not a finite quadrature artefact
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> Mobility.of(s,
                o.withScreening(Screening.NONE).withMechanism(ChargedDislocations.perCm2(1e9, 1))));
        assertTrue(e.getMessage().contains("screening wave vector"), e.getMessage());
    }

    @Test
    void nFaceChannelScattersAtTheInterfaceBelowIt() {
        // N-face: the 2DEG sits in the GaN above the AlGaN (Ambacher et al., J. Appl. Phys. 85, 3222 (1999));
        // its rough interface is the one below it, pressed by a field of the same order as the metal-face one
        Structure.Builder b = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 1000e-9))
                .grow(Layer.of("barrier", Composition.alGaN(0.3), 25e-9))
                .grow(Layer.of("channel", Composition.GAN, 20e-9))
                .top(TopBoundary.schottky(1.0, 0));
        Structure metal = b.build();
        Structure nFace = metal.toBuilder().polarity(Polarity.N_FACE).build();
        MobilityOptions ifr = MobilityOptions.defaults().withMechanisms(List.of(InterfaceRoughness.DEFAULT));
        MobilityResult m = Mobility.of(SOLVER.solve(metal), ifr);
        MobilityResult nf = Mobility.of(SOLVER.solve(nFace), ifr);
        assertTrue(nf.warnings().stream().noneMatch(w -> w.message().startsWith("interface roughness")), nf.warnings().toString());
        double ratio = nf.subbandMobility(0) / m.subbandMobility(0);
        assertTrue(ratio > 0.1 && ratio < 10, "ground-subband roughness mobility N-face / metal-face " + ratio);
    }

    private static void assertInBand(double v, double lo, double hi, String what) {
        assertTrue(v >= lo && v <= hi, what + ": " + v + " outside [" + lo + ", " + hi + "]");
    }
}
