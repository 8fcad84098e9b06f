package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * Malformed parameter-set files (test resources under {@code malformed/}, each an edited copy of
 * the valid team fixture): every failure is a {@link ParameterSetFormatException} whose message
 * names the set, the file, the key and the line. The expected line is found by plain text search
 * in the resource, independently of the JSON parser.
 */
class MalformedFileTest {
    private static final String SET = "malformed-example";

    private static ParameterSetFormatException load(String file) {
        return assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.readResource(MalformedFileTest.class, "malformed/" + file));
    }

    private static void assertNames(ParameterSetFormatException e, String file, String key, int line) {
        String m = e.getMessage();
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind());
        assertTrue(e instanceof WurtzkitException);
        assertEquals(SET, e.setName(), m);
        assertEquals("malformed/" + file, e.fileName(), m);
        assertEquals(key, e.key(), m);
        assertEquals(line, e.line(), m);
        assertTrue(m.contains("\"" + SET + "\""), m);
        assertTrue(m.contains("\"malformed/" + file + "\""), m);
        assertTrue(m.contains("\"" + key + "\""), m);
        assertTrue(m.contains("line " + line + ":"), m);
    }

    @Test
    void missingParameterNamesTheParameterAndTheLineOfItsBinary() {
        String file = "missing-value.json";
        ParameterSetFormatException e = load(file);
        // GaN.C33 was deleted: reported at the line that opens the GaN block
        assertNames(e, file, "binaries.GaN.C33", TestText.lineOfBlock(TestText.resource("malformed/" + file), "GaN"));
        assertTrue(e.problem().contains("missing value"), e.problem());
    }

    @Test
    void entryWithoutValueIsReportedAtItsLine() {
        String file = "missing-value-field.json";
        ParameterSetFormatException e = load(file);
        String text = TestText.resource("malformed/" + file);
        assertNames(e, file, "binaries.GaN.C44", TestText.lineOfKey(text, "GaN", "C44", 1));
        assertTrue(e.problem().contains("missing \"value\""), e.problem());
    }

    @Test
    void duplicatedKeyIsReportedAtItsSecondOccurrence() {
        String file = "duplicate-key.json";
        ParameterSetFormatException e = load(file);
        String text = TestText.resource("malformed/" + file);
        int first = TestText.lineOfKey(text, "GaN", "C13", 1);
        int second = TestText.lineOfKey(text, "GaN", "C13", 2);
        assertNames(e, file, "binaries.GaN.C13", second);
        assertTrue(e.problem().contains("duplicated key (first given on line " + first + ")"), e.problem());
    }

    @Test
    void nonNumericValueIsReported() {
        String file = "non-numeric.json";
        ParameterSetFormatException e = load(file);
        String text = TestText.resource("malformed/" + file);
        assertNames(e, file, "binaries.AlN.C33", TestText.lineOfKey(text, "AlN", "C33", 1));
        assertTrue(e.problem().contains("must be a JSON number") && e.problem().contains("\"373 GPa\""), e.problem());
    }

    @Test
    void unknownParameterKeyIsReportedWithTheAllowedKeys() {
        String file = "unknown-key.json";
        ParameterSetFormatException e = load(file);
        String text = TestText.resource("malformed/" + file);
        assertNames(e, file, "binaries.InN.C14", TestText.lineOfKey(text, "InN", "C14", 1));
        assertTrue(e.problem().contains("unknown parameter key \"C14\"") && e.problem().contains("C44"), e.problem());
    }

    @Test
    void unknownSourceKeyIsReportedWithTheBibliography() {
        String file = "unknown-source.json";
        ParameterSetFormatException e = load(file);
        String text = TestText.resource("malformed/" + file);
        assertNames(e, file, "binaries.AlN.Eg0", TestText.lineOfKey(text, "AlN", "Eg0", 1));
        assertTrue(e.problem().contains("\"VM3\"") && e.problem().contains("VM03"), e.problem());
    }

    @Test
    void truncatedFileIsReportedAtItsEndInsideTheOpenEntry() {
        String file = "truncated.json";
        ParameterSetFormatException e = load(file);
        String text = TestText.resource("malformed/" + file);
        // the file ends inside the entry AlN.C12, on its last line
        assertNames(e, file, "binaries.AlN.C12", TestText.lastLine(text));
        assertTrue(e.problem().contains("malformed JSON") || e.problem().contains("ends inside"), e.problem());
    }

    @Test
    void missingResourceIsReportedWithoutLine() {
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.readResource(MalformedFileTest.class, "malformed/no-such-file.json"));
        assertEquals(0, e.line());
        assertTrue(e.getMessage().contains("malformed/no-such-file.json") && e.getMessage().contains("does not exist"),
                e.getMessage());
    }
}
