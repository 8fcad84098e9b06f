package org.wurtzkit.solvers.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerMaterial;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/** Tolerance studies of a HEMT stack with the full solver. */
class ToleranceStudyTest {
    private static final double PSP_ALN = Hemts.DEFAULT_SET.binary(Binary.ALN).spontaneousPolarization();

    private static ToleranceStudy.Builder study() {
        return ToleranceStudy.builder(Hemts.standard())
                .tolerance(Tolerance.alFraction("barrier", Distribution.normalWithin(0.25, 0.01, 3)))
                .tolerance(Tolerance.layerThicknessNm("barrier", Distribution.normalWithin(25, 0.75, 3)))
                .tolerance(Tolerance.material(Binary.ALN, MaterialParameter.SPONTANEOUS_POLARIZATION,
                        Distribution.normal(PSP_ALN, 0.1 * Math.abs(PSP_ALN))))
                .solver(Hemts.SOLVER)
                .samples(6)
                .seed(731);
    }

    /**
     * The local run is the same bit for bit on one and on two threads; each evaluation computed
     * alone equals it; and evaluations assembled in another order give the same result. A
     * different seed gives different samples.
     */
    @Test
    void samplesAreReproducibleAloneAndIndependentOfThreads() {
        ToleranceStudy one = study().threads(1).build();
        ToleranceStudyResult serial = one.run();
        ToleranceStudyResult parallel = study().threads(2).build().run();
        assertTrue(serial.failures().isEmpty(), () -> serial.failures().toString());
        List<Evaluation> alone = new ArrayList<>();
        for (int j = 0; j < serial.size(); j++) {
            assertTrue(serial.value(j, 0) == parallel.value(j, 0), "evaluation " + j);
            Evaluation e = study().threads(1).build().evaluate(j);
            assertTrue(e.outputs()[0] == serial.value(j, 0), "evaluation " + j + " alone");
            alone.add(e);
            // and it is the cold solve of the sample's structure
            assertTrue(Hemts.SOLVER.solve(one.structure(j)).sheetDensityPerCm2() == serial.value(j, 0));
        }
        Collections.reverse(alone);
        ToleranceStudyResult assembled = one.result(alone);
        assertEquals(serial.summary(0), assembled.summary(0));
        for (int j = 0; j < serial.size(); j++) {
            assertTrue(serial.value(j, 0) == assembled.value(j, 0));
        }
        ToleranceStudyResult other = study().seed(732).threads(2).build().run();
        assertTrue(other.value(0, 0) != serial.value(0, 0));
    }

    /**
     * Each sample's structure carries exactly its draws: the barrier's Al fraction and thickness,
     * AlN's P_sp with the provenance "tolerance study sample"; everything else as in the template.
     */
    @Test
    void drawsAreAppliedToTheTemplate() {
        ToleranceStudy s = study().samples(20).build();
        for (int j = 0; j < s.size(); j++) {
            double[] x = s.design().values(j);
            Structure st = s.structure(j);
            Layer barrier = st.layersBottomUp().get(1);
            assertEquals(x[0], ((LayerMaterial.Alloy) barrier.material()).composition().aluminium());
            assertEquals(x[1] * Units.NM, barrier.thickness());
            assertTrue(x[0] >= 0.22 && x[0] <= 0.28);
            WurtziteMaterial aln = st.parameters().binary(Binary.ALN);
            assertEquals(x[2], aln.spontaneousPolarization());
            assertEquals("tolerance-sample",
                    aln.source(MaterialParameter.SPONTANEOUS_POLARIZATION).sources().get(0).key());
            assertEquals(Hemts.DEFAULT_SET.binary(Binary.GAN), st.parameters().binary(Binary.GAN));
            assertEquals(Hemts.standard().layersBottomUp().get(0), st.layersBottomUp().get(0));
            assertEquals(Hemts.standard().top(), st.top());
            assertEquals(Hemts.standard().referenceLatticeA(), st.referenceLatticeA());
        }
    }

    /**
     * The conduction-band offset ratio: E_c(AlN) - E_c(GaN) = f (E_g0(AlN) - E_g0(GaN)) at 0 K in each
     * sample (the definition of the ratio); the gate barrier, temperature and donor density reach
     * the structure.
     */
    @Test
    void bandOffsetGateTemperatureAndDopingReachTheStructure() {
        Structure doped = Structure.builder(Hemts.DEFAULT_SET)
                .grow(Layer.of("buffer", org.wurtzkit.material.Composition.GAN, 500 * Units.NM))
                .grow(Layer.of("barrier", org.wurtzkit.material.Composition.alGaN(0.25), 25 * Units.NM)
                        .withDopant(Dopant.donorsPerCm3(1e17, 0.02)))
                .top(TopBoundary.schottky(1.0).atBiasV(-0.5))
                .build();
        ToleranceStudy s = ToleranceStudy.builder(doped)
                .tolerance(Tolerance.conductionBandOffsetFraction(Distribution.uniform(0.6, 0.8)))
                .tolerance(Tolerance.gateBarrierEv(Distribution.normalWithin(1.0, 0.1, 2)))
                .tolerance(Tolerance.temperatureK(Distribution.uniform(280, 320)))
                .tolerance(Tolerance.donorDensityPerCm3("barrier", Distribution.uniform(5e16, 2e17)))
                .samples(10).build();
        for (int j = 0; j < s.size(); j++) {
            double[] x = s.design().values(j);
            Structure st = s.structure(j);
            ParameterSet p = st.parameters();
            double gapAlN = p.binary(Binary.ALN).get(MaterialParameter.BAND_GAP_0K);
            double gapGaN = p.binary(Binary.GAN).get(MaterialParameter.BAND_GAP_0K);
            double dEc = p.binary(Binary.ALN).valenceBandEdgeEv() + gapAlN - p.binary(Binary.GAN).valenceBandEdgeEv() - gapGaN;
            double dEg = gapAlN - gapGaN;
            assertEquals(x[0], dEc / dEg, 1e-12);
            assertEquals(x[1], ((TopBoundary.Schottky) st.top()).barrierHeightEv());
            assertEquals(-0.5, ((TopBoundary.Schottky) st.top()).biasV());
            assertEquals(x[2], st.temperatureK());
            Dopant d = st.layersBottomUp().get(1).dopants().get(0);
            assertEquals(x[3], d.densityPerCm3(), 1e-6 * x[3]);
            assertEquals(0.02, d.ionizationEnergyEv());
        }
    }

    /** A sample whose evaluation fails is kept with its reason and counted; the others go on. */
    @Test
    void failedSamplesAreKeptAndCounted() {
        PointEvaluator picky = new PointEvaluator() {
            @Override
            public List<Column> columns() {
                return List.of(Column.of("barrier", "nm"));
            }

            @Override
            public double[] evaluate(Structure structure, SelfConsistentSolver solver) {
                double nm = structure.layersBottomUp().get(1).thicknessNm();
                if (nm > 25) {
                    throw new org.wurtzkit.errors.WurtzkitException(org.wurtzkit.errors.ErrorKind.NOT_CONVERGED, "barrier thicker than 25 nm");
                }
                return new double[] {nm};
            }
        };
        ToleranceStudyResult r = study().samples(40).evaluators(picky).build().run();
        int thick = 0;
        for (int j = 0; j < r.size(); j++) {
            thick += r.design().values(j)[1] > 25 ? 1 : 0;
        }
        assertTrue(thick > 5 && thick < 35, "thick " + thick);
        assertEquals(thick, r.failures().size());
        assertEquals(thick, r.summary(0).failed());
        assertEquals(40 - thick, r.summary(0).count());
        assertTrue(r.failures().get(0).message().contains("barrier thicker than 25 nm"));
        assertEquals(org.wurtzkit.errors.ErrorKind.NOT_CONVERGED, r.failures().get(0).kind(), "the kind travels with the failure");
    }

    /** The per-evaluation CSV has the inputs, the outputs and the status of every evaluation. */
    @Test
    void writesEveryEvaluationAsCsv() throws IOException {
        ToleranceStudyResult r = study().samples(2).sensitivity(true).build().run();
        assertEquals(10, r.size());
        StringWriter w = new StringWriter();
        r.writeCsv(w);
        assertTrue(w.toString().startsWith("# produced by wurtzkit "), w::toString);
        String[] lines = w.toString().lines().filter(l -> !l.startsWith("# ")).toArray(String[]::new);
        assertEquals("evaluation,role,row,barrier_al_fraction,barrier_thickness_nm,AlN_Psp_C/m^2,sheet_density_cm^-2,status",
                lines[0]);
        assertEquals(11, lines.length);
        assertTrue(lines[3].startsWith("2,A_B(barrier_al_fraction),0,"), lines[3]);
        assertTrue(lines[10].endsWith(",ok"));
    }

    /** Bad input: each a clear exception naming parameter, value and allowed range. */
    @Test
    void badInputIsRejected() {
        Structure t = Hemts.standard();
        InvalidParameterException missing = assertThrows(InvalidParameterException.class,
                () -> ToleranceStudy.builder(t).tolerance(Tolerance.layerThicknessNm("cap", Distribution.uniform(1, 3)))
                        .build());
        assertTrue(missing.getMessage().contains("\"cap\"") && missing.getMessage().contains("[buffer, barrier]"),
                missing.getMessage());
        InvalidParameterException unbounded = assertThrows(InvalidParameterException.class,
                () -> ToleranceStudy.builder(t).tolerance(Tolerance.alFraction("barrier", Distribution.normal(0.25, 0.01)))
                        .build());
        assertTrue(unbounded.getMessage().contains("barrier_al_fraction") && unbounded.getMessage().contains("[0.0, 1.0]"),
                unbounded.getMessage());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t)
                .tolerance(Tolerance.alFraction("barrier", Distribution.uniform(0.9, 1.1))).build());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t)
                .tolerance(Tolerance.layerThicknessNm("barrier", Distribution.normal(25, 1))).build());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t)
                .tolerance(Tolerance.surfaceDonorLevelEv(Distribution.uniform(1, 2))).build());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t)
                .tolerance(Tolerance.donorDensityPerCm3("barrier", Distribution.uniform(1e16, 2e16))).build());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t)
                .tolerance(Tolerance.material(Binary.GAN, MaterialParameter.C13, Distribution.normal(1e11, 1e10))).build());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t)
                .tolerance(Tolerance.conductionBandOffsetFraction(Distribution.uniform(0.6, 0.8)))
                .tolerance(Tolerance.material(Binary.ALN, MaterialParameter.VALENCE_BAND_EDGE, Distribution.normal(-0.8, 0.1)))
                .build());
        assertThrows(InvalidParameterException.class, () -> ToleranceStudy.builder(t).build());
        assertThrows(InvalidParameterException.class, () -> study().samples(1).build());
        InvalidParameterException sd = assertThrows(InvalidParameterException.class,
                () -> Tolerance.alFraction("barrier", Distribution.truncatedNormal(0.25, -0.01, 0.2, 0.3)));
        assertTrue(sd.getMessage().contains("standard deviation"), sd.getMessage());
    }
}
