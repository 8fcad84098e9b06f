package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * Plausibility ranges of {@link MaterialParameter}: a unit slip in a custom set is rejected with set,
 * file, key and line instead of turning into a wrong polarization charge. Expected lines are found by
 * plain text search, independently of the JSON parser.
 */
class PlausibleRangeTest {
    private static final String FILE = "nm-for-angstrom.json";

    /**
     * The GaN lattice constant typed in nm (0.3189) instead of Angstrom (3.189): before the ranges
     * existed this set was accepted and gave sigma = -1.05 C/m^2 and no 2DEG for AlGaN on GaN.
     */
    @Test
    void latticeConstantInNanometresIsRejectedWithKeyAndLine() {
        String text = TestText.resource(TestText.TEAM_FILE);
        int line = TestText.lineOfKey(text, "GaN", "a", 1);
        String edited = TestText.replaceOnLine(text, line, "3.189", "0.3189");
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> TestText.read(edited, FILE));
        assertEquals("example-lab-2025", e.setName(), e.getMessage());
        assertEquals(FILE, e.fileName());
        assertEquals("binaries.GaN.a", e.key(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.problem().contains("0.3189 Angstrom") && e.problem().contains("[2.5, 4] Angstrom"),
                e.problem());
    }

    /** A stiffness typed in Pa/1e6 (MPa, i.e. 106000 instead of 106 GPa) is caught the same way. */
    @Test
    void stiffnessInWrongUnitIsRejectedWithKeyAndLine() {
        String text = TestText.resource(TestText.TEAM_FILE);
        int line = TestText.lineOfKey(text, "AlN", "C33", 1);
        String edited = TestText.replaceOnLine(text, line, "\"value\": 373", "\"value\": 373000");
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> TestText.read(edited, FILE));
        assertEquals("binaries.AlN.C33", e.key(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.problem().contains("[1, 1000] GPa"), e.problem());
    }

    /** Every value of every built-in set lies in its plausible range (so the ranges reject no real data). */
    @Test
    void builtInSetsLieInsideTheRanges() {
        for (ParameterSet set : new BuiltInParameterSets().parameterSets()) {
            for (Binary b : Binary.values()) {
                WurtziteMaterial m = set.binary(b);
                for (MaterialParameter p : MaterialParameter.values()) {
                    double v = m.get(p) / p.fileToSi();
                    assertTrue(v >= p.plausibleMinInFileUnit() && v <= p.plausibleMaxInFileUnit(),
                            set.name() + " " + b + " " + p.key() + " = " + v);
                }
            }
        }
    }

    /** The builder applies the same check to a material built in code, naming parameter, value and range. */
    @Test
    void builderRejectsAnImplausibleEpsilon() {
        WurtziteMaterial gan = BuiltInParameterSets.vurgaftmanMeyer2003().binary(Binary.GAN);
        Provenance typo = Provenance.tabulated(Source.of("TYPO", "a test value with a slipped decimal point"));
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> gan.toBuilder("GaN with eps 104").set(MaterialParameter.PERMITTIVITY_STATIC, 104, typo).build());
        assertEquals("eps_static of GaN with eps 104", e.parameter());
        assertEquals("104", e.value());
        assertTrue(e.allowedRange().startsWith("[3, 30]"), e.allowedRange());
    }
}
