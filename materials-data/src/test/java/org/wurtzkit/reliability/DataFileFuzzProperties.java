package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.IntRange;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.materials.data.FileParameterSet;
import org.wurtzkit.materials.data.ParameterSetFormatException;

/**
 * Fuzzing the parameter-set reader (issue #7): a file cut at any byte, or with any one character
 * replaced by a JSON-significant one, is either read into a complete set of finite values or
 * rejected with a {@link ParameterSetFormatException} naming the file and a line that exists in the
 * damaged text. No other exception type (NullPointerException, NumberFormatException,
 * IllegalStateException, a bare InvalidParameterException, ...) may escape the reader.
 */
@Tag("reliability")
class DataFileFuzzProperties {
    private static final String FILE = "fuzzed.json";
    private static final String TEXT = DataFiles.TEXT;
    private static final char[] SIGNIFICANT = "{}[]:,\"\\ \n0123456789.-+eEaNInfl".toCharArray();

    private static void readOrReject(String text) {
        FileParameterSet set;
        try {
            set = DataFiles.read(text, FILE);
        } catch (ParameterSetFormatException e) {
            assertTrue(e.line() >= 1 && e.line() <= DataFiles.lineCount(text),
                    "line " + e.line() + " of " + DataFiles.lineCount(text) + ": " + e.getMessage());
            DataFiles.assertNamesFileAndLine(e, FILE, e.line());
            return;
        } catch (RuntimeException | Error e) {
            fail("the reader let " + e + " escape", e);
            return;
        }
        // accepted: then it is complete and finite
        for (Binary b : Binary.values()) {
            for (MaterialParameter p : MaterialParameter.values()) {
                assertTrue(Double.isFinite(set.binary(b).get(p)), b + " " + p);
            }
        }
    }

    /** Every prefix shorter than the file is incomplete JSON: always rejected, at its last line. */
    @Property(tries = 300)
    void truncationAtAnyOffsetIsRejectedAtTheLastLine(@ForAll("cuts") int cut) {
        String text = TEXT.substring(0, cut);
        try {
            DataFiles.read(text, FILE);
            fail("a truncated file was accepted (cut at " + cut + " of " + TEXT.length() + ")");
        } catch (ParameterSetFormatException e) {
            // the JSON ends where the text ends; an empty or blank prefix is reported at line 1..last
            int last = DataFiles.lineCount(text);
            assertTrue(e.line() >= 1 && e.line() <= last, e.getMessage());
            if (!text.isBlank()) {
                assertEquals(last, e.line(), e.getMessage());
            }
            DataFiles.assertNamesFileAndLine(e, FILE, e.line());
        }
    }

    @Provide
    Arbitrary<Integer> cuts() {
        // the final "}\n": a cut before the last closing brace leaves the root object open
        int lastBrace = TEXT.lastIndexOf('}');
        return Arbitraries.integers().between(0, lastBrace);
    }

    @Property(tries = 400)
    void oneCorruptedCharacterIsReadOrRejectedWithFileAndLine(@ForAll @IntRange(min = 0, max = 100_000) int where,
            @ForAll @IntRange(min = 0, max = 1000) int what) {
        char[] c = TEXT.toCharArray();
        c[where % c.length] = SIGNIFICANT[what % SIGNIFICANT.length];
        readOrReject(new String(c));
    }

    @Property(tries = 200)
    void oneCorruptedByteIsReadOrRejectedWithFileAndLine(@ForAll @IntRange(min = 0, max = 100_000) int where,
            @ForAll @IntRange(min = 0, max = 255) int what) {
        byte[] b = TEXT.getBytes(StandardCharsets.UTF_8);
        b[where % b.length] = (byte) what;
        FileParameterSet set;
        try {
            set = DataFiles.read(b, FILE);
        } catch (ParameterSetFormatException e) {
            assertTrue(e.line() >= 0, e.getMessage());
            DataFiles.assertNamesFileAndLine(e, FILE, e.line());
            return;
        } catch (RuntimeException | Error e) {
            fail("the reader let " + e + " escape", e);
            return;
        }
        assertTrue(Double.isFinite(set.binary(Binary.GAN).latticeA()));
    }

    /** Removing any one whole line is read (a note, say) or rejected with a line; never anything else. */
    @Property(tries = 150)
    void removingAnyLineIsReadOrRejected(@ForAll @IntRange(min = 1, max = 1000) int line) {
        int n = DataFiles.lineCount(TEXT);
        readOrReject(DataFiles.removeLine(TEXT, 1 + (line - 1) % n));
    }
}
