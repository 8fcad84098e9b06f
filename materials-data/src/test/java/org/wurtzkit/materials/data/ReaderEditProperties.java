package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.Set;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;

/**
 * Edits of the valid team fixture, read through the public reader: whichever entry is removed,
 * turned into a string, given a wrong unit or a physically impossible value, the error names the
 * set, the file, that entry's key and its line (found by text search, independently of Jackson).
 */
class ReaderEditProperties {
    private static final String TEXT = TestText.resource(TestText.TEAM_FILE);
    private static final String SET = "example-lab-2025";
    private static final String FILE = "edited.json";

    /** Parameters that WurtziteMaterial.Builder requires to be &gt; 0 (see its build()). */
    private static final Set<MaterialParameter> POSITIVE = EnumSet.of(MaterialParameter.LATTICE_A,
            MaterialParameter.LATTICE_C, MaterialParameter.C11, MaterialParameter.C12, MaterialParameter.C13,
            MaterialParameter.C33, MaterialParameter.C44, MaterialParameter.BAND_GAP_0K, MaterialParameter.VARSHNI_BETA,
            MaterialParameter.ELECTRON_MASS_PARALLEL, MaterialParameter.ELECTRON_MASS_PERPENDICULAR,
            MaterialParameter.HEAVY_HOLE_MASS_PARALLEL, MaterialParameter.HEAVY_HOLE_MASS_PERPENDICULAR,
            MaterialParameter.PERMITTIVITY_STATIC, MaterialParameter.PERMITTIVITY_HIGH_FREQUENCY);

    private static ParameterSetFormatException fails(String text) {
        return assertThrows(ParameterSetFormatException.class, () -> TestText.read(text, FILE));
    }

    private static void assertLocated(ParameterSetFormatException e, String key, int line) {
        String m = e.getMessage();
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind());
        assertEquals(key, e.key(), m);
        assertEquals(line, e.line(), m);
        assertTrue(m.contains("\"" + SET + "\"") && m.contains("\"" + FILE + "\"") && m.contains("\"" + key + "\"")
                && m.contains("line " + line + ":"), m);
    }

    @Provide
    Arbitrary<MaterialParameter> fileParameters() {
        return Arbitraries.of(MaterialParameter.class)
                .filter(p -> p != MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING);
    }

    @Provide
    Arbitrary<MaterialParameter> positiveParameters() {
        return Arbitraries.of(POSITIVE);
    }

    @Example
    void fixtureItselfIsValid() {
        FileParameterSet s = TestText.read(TEXT, FILE);
        assertEquals(SET, s.name());
    }

    @Property
    void removingAnyEntryNamesItAtItsBinarysLine(@ForAll Binary b, @ForAll("fileParameters") MaterialParameter p) {
        int line = TestText.lineOfKey(TEXT, b.formula(), p.key(), 1);
        ParameterSetFormatException e = fails(TestText.removeLine(TEXT, line));
        assertLocated(e, "binaries." + b.formula() + "." + p.key(), TestText.lineOfBlock(TEXT, b.formula()));
    }

    @Property
    void aQuotedNumberIsNonNumericAtItsLine(@ForAll Binary b, @ForAll("fileParameters") MaterialParameter p) {
        int line = TestText.lineOfKey(TEXT, b.formula(), p.key(), 1);
        String l = TestText.lines(TEXT).get(line - 1);
        String number = l.replaceAll(".*\"value\": ([^,]+),.*", "$1");
        String edited = TestText.replaceOnLine(TEXT, line, "\"value\": " + number + ",", "\"value\": \"" + number + "\",");
        ParameterSetFormatException e = fails(edited);
        assertLocated(e, "binaries." + b.formula() + "." + p.key(), line);
        assertTrue(e.problem().contains("must be a JSON number"), e.problem());
    }

    @Property
    void aWrongUnitIsReportedWithTheFileUnit(@ForAll Binary b, @ForAll("fileParameters") MaterialParameter p) {
        int line = TestText.lineOfKey(TEXT, b.formula(), p.key(), 1);
        String edited = TestText.replaceOnLine(TEXT, line, "\"unit\": \"" + p.fileUnit() + "\"", "\"unit\": \"furlong\"");
        ParameterSetFormatException e = fails(edited);
        assertLocated(e, "binaries." + b.formula() + "." + p.key(), line);
        assertTrue(e.problem().contains("{" + p.fileUnit() + "}"), e.problem());
    }

    @Property
    void aValueTheBuilderRejectsIsReportedAtItsLine(@ForAll Binary b, @ForAll("positiveParameters") MaterialParameter p,
            @ForAll("nonPositive") String bad) {
        int line = TestText.lineOfKey(TEXT, b.formula(), p.key(), 1);
        String l = TestText.lines(TEXT).get(line - 1);
        String number = l.replaceAll(".*\"value\": ([^,]+),.*", "$1");
        Assume.that(!number.equals(bad));
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "\"value\": " + number + ",",
                "\"value\": " + bad + ","));
        assertLocated(e, "binaries." + b.formula() + "." + p.key(), line);
        // the builder's own message: parameter, value and allowed range
        assertTrue(e.problem().contains(p.key() + " of ") && e.problem().contains("(0, +inf)"), e.problem());
    }

    @Provide
    Arbitrary<String> nonPositive() {
        return Arbitraries.of("0", "-1", "-0.5", "-390", "-1e-3");
    }

    @Example
    void negativeVarshniAlphaIsRejected() {
        int line = TestText.lineOfKey(TEXT, "InN", "varshni_alpha", 1);
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "\"value\": 0.245,", "\"value\": -0.245,"));
        assertLocated(e, "binaries.InN.varshni_alpha", line);
        assertTrue(e.problem().contains("[0, +inf)"), e.problem());
    }

    @Example
    void spontaneousPolarizationBowingMustNotBeGivenForABinary() {
        int line = TestText.lineOfKey(TEXT, "AlN", "Psp", 1);
        String edited = TestText.replaceOnLine(TEXT, line, "\"Psp\":", "\"Psp_bowing\": { \"value\": 0, \"source\": \"BFV97\" },\n      \"Psp\":");
        ParameterSetFormatException e = fails(edited);
        assertLocated(e, "binaries.AlN.Psp_bowing", line);
        assertTrue(e.problem().contains("zero by definition"), e.problem());
    }

    @Example
    void aSourceCitedByNoValueIsReported() {
        int line = TestText.lineOfBlock(TEXT, "LAB");
        int c13 = TestText.lineOfKey(TEXT, "GaN", "C13", 1);
        String edited = TestText.replaceOnLine(TEXT, c13, "\"source\": \"LAB\"", "\"source\": \"VM03\"");
        ParameterSetFormatException e = fails(edited);
        assertLocated(e, "sources.LAB", line);
        assertTrue(e.problem().contains("cited by no value"), e.problem());
    }

    @Example
    void unknownPolarizationModelListsTheAllowedOnes() {
        int line = TestText.lines(TEXT).indexOf("  \"recommendedPolarizationModel\": \"LINEAR\",") + 1;
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "\"LINEAR\"", "\"QUADRATIC\""));
        assertLocated(e, "recommendedPolarizationModel", line);
        assertTrue(e.problem().contains("\"QUADRATIC\"") && e.problem().contains("{LINEAR, NONLINEAR}"), e.problem());
    }

    @Example
    void unsupportedFormatVersionIsReported() {
        int line = TestText.lines(TEXT).indexOf("  \"formatVersion\": 1,") + 1;
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "1,", "2,"));
        assertLocated(e, "formatVersion", line);
        assertTrue(e.problem().contains("allowed: {1}"), e.problem());
    }

    @Example
    void aValueBeyondTheDoubleRangeIsReported() {
        int line = TestText.lineOfKey(TEXT, "GaN", "C11", 1);
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "\"value\": 390,", "\"value\": 1e999,"));
        assertLocated(e, "binaries.GaN.C11", line);
        assertTrue(e.problem().contains("finite"), e.problem());
    }

    @Example
    void nanLiteralIsMalformedJson() {
        int line = TestText.lineOfKey(TEXT, "GaN", "C11", 1);
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "\"value\": 390,", "\"value\": NaN,"));
        assertLocated(e, "binaries.GaN.C11", line);
        assertTrue(e.problem().contains("malformed JSON"), e.problem());
    }

    @Example
    void contentAfterTheTopLevelObjectIsReported() {
        String edited = TEXT.stripTrailing() + "\n{}\n";
        ParameterSetFormatException e = fails(edited);
        assertLocated(e, "(root)", TestText.lastLine(TEXT.stripTrailing()) + 1);
    }

    @Example
    void aMissingBinaryIsReported() {
        int start = TestText.lineOfBlock(TEXT, "InN");
        java.util.List<String> ls = TestText.lines(TEXT);
        int end = start;
        while (!ls.get(end - 1).equals("    }")) {
            end++;
        }
        // drop the InN block and the comma that separated it from AlN
        java.util.List<String> kept = new java.util.ArrayList<>(ls.subList(0, start - 1));
        String last = kept.get(kept.size() - 1);
        kept.set(kept.size() - 1, last.substring(0, last.length() - 1));
        kept.addAll(ls.subList(end, ls.size()));
        ParameterSetFormatException e = fails(String.join("\n", kept));
        assertLocated(e, "binaries.InN", TestText.lineOfBlock(TEXT, "binaries"));
    }

    @Example
    void aBowingWithTwoSourcesIsReported() {
        int line = TestText.lineOfKey(TEXT, "gap", "AlGaN", 1);
        ParameterSetFormatException e = fails(TestText.replaceOnLine(TEXT, line, "\"source\": \"VM03\"",
                "\"source\": [\"VM03\", \"LAB\"]"));
        assertLocated(e, "bowing.gap.AlGaN", line);
    }

    @Example
    void aDuplicatedSourceKeyIsReported() {
        int line = TestText.lineOfBlock(TEXT, "LAB");
        String edited = TestText.replaceOnLine(TEXT, line, "\"LAB\": {", "\"VM03\": {");
        ParameterSetFormatException e = fails(edited);
        assertLocated(e, "sources.VM03", line);
        assertTrue(e.problem().contains("duplicated key (first given on line " + TestText.lineOfBlock(TEXT, "VM03") + ")"),
                e.problem());
    }

    @Example
    void theSetIsNamedEvenWhenItsNameComesAfterTheProblem() {
        java.util.List<String> ls = TestText.lines(TEXT);
        int nameLine = ls.indexOf("  \"name\": \"example-lab-2025\",");
        String nameText = ls.remove(nameLine);
        ls.add(ls.indexOf("  \"bowing\": {"), nameText);
        String moved = String.join("\n", ls);
        int line = TestText.lineOfKey(moved, "GaN", "C11", 1);
        ParameterSetFormatException e = fails(TestText.replaceOnLine(moved, line, "\"value\": 390,", "\"value\": \"x\","));
        assertLocated(e, "binaries.GaN.C11", line);
    }

    @Example
    void aFileTruncatedBeforeItsNameSaysSo() {
        String cut = String.join("\n", TestText.lines(TEXT).subList(0, 2));
        ParameterSetFormatException e = fails(cut);
        assertEquals(ParameterSetFormatException.UNNAMED, e.setName());
        assertEquals(2, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains(ParameterSetFormatException.UNNAMED) && e.getMessage().contains(FILE),
                e.getMessage());
    }
}
