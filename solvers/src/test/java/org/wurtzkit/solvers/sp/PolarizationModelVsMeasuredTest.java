package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.materials.data.BuiltInParameterSets;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.testing.ReferenceTable;
import org.wurtzkit.testing.StandardStacks;

/**
 * Which polarization model the default set recommends, decided against measured sheet densities:
 * O. Ambacher et al., J. Appl. Phys. 85, 3222 (1999) measured n_s rising from 6e12 to 2e13 cm^-2 for
 * x from 0.15 to 0.31 in undoped Ga-face AlGaN/GaN with 20-65 nm barriers (verified in the abstract;
 * table {@code reference/algan-gan-sheet-density-measured.csv}). The stacks here are a 500 nm GaN
 * buffer and an Al<sub>x</sub>Ga<sub>1-x</sub>N barrier of 20, 30 or 65 nm under a Schottky contact of
 * barrier height 0.84 + 1.3x eV (the Ni-contact fit of Ambacher et al., J. Appl. Phys. 87, 334 (2000),
 * from memory).
 *
 * <p>Result (vurgaftman-meyer-2003, whose piezoelectric constants are the linear ones of Bernardini,
 * Fiorentini &amp; Vanderbilt 1997): the linear model is within 30 % at both ends, the nonlinear one
 * falls 35 % short at x = 0.31, and the linear model has the smaller mean log deviation at every
 * thickness. So the set keeps {@link PolarizationModel#LINEAR}; the nonlinear model remains the
 * recommendation of the ambacher-2002 set, whose constants were fitted with it.
 */
class PolarizationModelVsMeasuredTest {
    private static final ParameterSet VM03 = BuiltInParameterSets.vurgaftmanMeyer2003();
    private static final double[][] MEASURED = ReferenceTable.rows("/reference/algan-gan-sheet-density-measured.csv");

    private static double ns(PolarizationModel model, double x, double barrierNm) {
        Structure s = StandardStacks.hemt(VM03, 500, x, barrierNm, 0, TopBoundary.schottky(0.84 + 1.3 * x, 0))
                .toBuilder().polarizationModel(model).build();
        return new SelfConsistentSolver().solve(s).sheetDensityPerCm2();
    }

    private static double rmsLogDeviation(PolarizationModel model, double barrierNm) {
        double sum = 0;
        for (double[] row : MEASURED) {
            double d = Math.log(ns(model, row[0], barrierNm) / row[1]);
            sum += d * d;
        }
        return Math.sqrt(sum / MEASURED.length);
    }

    @Test
    void theDefaultSetRecommendsTheModelThatFitsTheMeasuredSheetDensities() {
        assertEquals(PolarizationModel.LINEAR, VM03.recommendedPolarizationModel());
        assertEquals(PolarizationModel.NONLINEAR, BuiltInParameterSets.ambacher2002().recommendedPolarizationModel());
        for (double d : new double[] {20, 30, 65}) {
            double lin = rmsLogDeviation(PolarizationModel.LINEAR, d);
            double nonlin = rmsLogDeviation(PolarizationModel.NONLINEAR, d);
            assertTrue(lin < nonlin, "d = " + d + " nm: rms log deviation linear " + lin + ", nonlinear " + nonlin);
        }
        for (double[] row : MEASURED) {
            double lin = ns(PolarizationModel.LINEAR, row[0], 30);
            assertEquals(row[1], lin, 0.30 * row[1], "linear, x = " + row[0]);
        }
        double nonlin = ns(PolarizationModel.NONLINEAR, 0.31, 30);
        assertTrue(nonlin < 0.70 * 2.0e13, "nonlinear at x = 0.31: " + nonlin);
    }
}
