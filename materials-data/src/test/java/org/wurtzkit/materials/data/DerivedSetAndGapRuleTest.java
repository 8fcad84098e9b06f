package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.AlloyGapTemperatureRule;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.DerivedParameterSet;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.strain.Strain;

/** Sets derived in code from the default set, and the two rules for the temperature dependence of alloy gaps. */
class DerivedSetAndGapRuleTest {
    private static final ParameterSet VM03 = BuiltInParameterSets.vurgaftmanMeyer2003();
    /** An invented measurement, labelled so (the Tarnwick Nitride Lab is fictional). */
    private static final Source LAB = Source.of("TNL-C13", "INVENTED: Tarnwick Nitride Lab Brillouin run, wafer TNL-0731 (fictional)");

    /**
     * One changed value: GaN C13 = 101 GPa. Only that value changes; its provenance names the new
     * source; Vegard's law carries 70 % of the change into Al0.3Ga0.7N, and the strain ratio
     * eps_zz/eps_xx = -2 C13/C33 of a pseudomorphic layer follows (exact expressions).
     */
    @Test
    void oneChangedValueWithItsSource() {
        DerivedParameterSet lab = VM03.derive("vm03-tnl-c13").set(Binary.GAN, MaterialParameter.C13, 101e9, LAB).build();
        assertEquals(101e9, lab.binary(Binary.GAN).get(MaterialParameter.C13));
        assertEquals(LAB, lab.binary(Binary.GAN).source(MaterialParameter.C13).sources().get(0));
        for (Binary b : Binary.values()) {
            for (MaterialParameter p : MaterialParameter.values()) {
                if (!(b == Binary.GAN && p == MaterialParameter.C13)) {
                    assertEquals(VM03.binary(b).get(p), lab.binary(b).get(p), 0.0, b + " " + p);
                }
            }
        }
        assertSame(VM03.binary(Binary.ALN), lab.binary(Binary.ALN));
        assertTrue(lab.sources().contains(LAB) && lab.sources().containsAll(VM03.sources()));
        assertEquals(1, lab.changes().size());
        assertTrue(lab.description().contains("C13 = 101.0 GPa (TNL-C13)"), lab.description());
        assertEquals(VM03.bowing(), lab.bowing());
        assertEquals(VM03.recommendedPolarizationModel(), lab.recommendedPolarizationModel());

        WurtziteMaterial before = VM03.material(Composition.alGaN(0.3));
        WurtziteMaterial after = lab.material(Composition.alGaN(0.3));
        assertEquals(before.get(MaterialParameter.C13) + 0.7 * (101e9 - 106e9), after.get(MaterialParameter.C13), 1e-3);
        Strain s = Strain.pseudomorphic(after, lab.material(Composition.GAN));
        assertEquals(-2 * after.get(MaterialParameter.C13) / after.get(MaterialParameter.C33), s.zz() / s.xx(), 1e-12);
    }

    /** A changed value is checked like any other: 101 (Pa, a unit slip for GPa) is rejected, naming the parameter. */
    @Test
    void derivedValuesAreChecked() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> VM03.derive("slip").set(Binary.GAN, MaterialParameter.C13, 101, LAB).build());
        assertEquals("C13 of GaN (slip)", e.parameter());
    }

    /**
     * The gap rule is reachable through a derived set and moves the alloy gap as its Javadoc says:
     * Varshni per binary then bowing gives exactly sum x_i Eg_i(T) - b x (1 - x); both rules agree near
     * 0 K; for Al0.3Ga0.7N the per-binary gap lies about 2 meV above the interpolated one at 300 K and
     * about 7 meV at 600 K (worked out by hand from the VM03 values: shifts 78.3 vs 80.2 meV and
     * 254.4 vs 261.4 meV).
     */
    @Test
    void alloyGapTemperatureRuleIsAnOptionAndMovesTheGap() {
        assertEquals(AlloyGapTemperatureRule.INTERPOLATED_VARSHNI, VM03.alloyGapTemperatureRule());
        DerivedParameterSet perBinary = VM03.derive("vm03-per-binary-varshni")
                .alloyGapTemperatureRule(AlloyGapTemperatureRule.VARSHNI_PER_BINARY_THEN_BOWING).build();
        Composition c = Composition.alGaN(0.3);
        WurtziteMaterial interp = VM03.material(c);
        WurtziteMaterial binaries = perBinary.material(c);
        double b = VM03.bowing().gapAlGaN().value();
        for (double t : new double[] {77, 300, 600}) {
            double expected = 0.3 * VM03.binary(Binary.ALN).bandGap().atTemperature(t)
                    + 0.7 * VM03.binary(Binary.GAN).bandGap().atTemperature(t) - b * 0.3 * 0.7;
            assertEquals(expected, binaries.bandGap().atTemperature(t), 1e-12, "T = " + t);
        }
        assertEquals(interp.bandGap().atTemperature(0.01), binaries.bandGap().atTemperature(0.01), 1e-6);
        assertEquals(1.96e-3, binaries.bandGap().atTemperature(300) - interp.bandGap().atTemperature(300), 0.1e-3);
        assertEquals(6.98e-3, binaries.bandGap().atTemperature(600) - interp.bandGap().atTemperature(600), 0.1e-3);
        assertEquals(binaries.bandGap().atTemperature(300) - interp.bandGap().atTemperature(300),
                binaries.conductionBandEdgeEv(300) - interp.conductionBandEdgeEv(300), 1e-12);
        assertNotEquals(interp, binaries);
        // a gap set by hand on a derived alloy replaces the binaries' laws
        WurtziteMaterial edited = binaries.toBuilder("edited").set(MaterialParameter.BAND_GAP_0K, 4.0, LAB).build();
        assertEquals(null, edited.bandGap().perBinary());
    }
}
