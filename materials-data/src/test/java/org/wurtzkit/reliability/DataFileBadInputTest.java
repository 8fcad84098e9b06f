package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.reliability.DataFiles.TEXT;
import static org.wurtzkit.reliability.DataFiles.lineCount;
import static org.wurtzkit.reliability.DataFiles.lineOfBlock;
import static org.wurtzkit.reliability.DataFiles.lineOfKey;
import static org.wurtzkit.reliability.DataFiles.setValue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.ToIntFunction;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.materials.data.FileParameterSet;
import org.wurtzkit.materials.data.JsonParameterSetReader;
import org.wurtzkit.materials.data.ParameterSetFormatException;

/**
 * Bad-input table of the parameter-set files (issue #7): edited copies of the shipped default file
 * — NaN and infinite literals, numbers that overflow a double, physically impossible values,
 * wrong types, missing, duplicated and unknown keys, truncation, empty and non-object files, I/O
 * failures — each give a {@link ParameterSetFormatException} (kind MALFORMED_DATA) naming the set,
 * the file, the key and the line. The expected line is found by plain text search in the edited
 * text, independently of the JSON parser.
 */
@Tag("reliability")
class DataFileBadInputTest {
    private static final String FILE = "edited.json";
    private static final String SET = DataFiles.DEFAULT_SET;

    /**
     * @param label   test name
     * @param edit    the edit of the default text
     * @param key     expected key (dotted path)
     * @param line    expected line, found in the edited text
     * @param problem fragment the problem text must contain
     */
    record Edit(String label, UnaryOperator<String> edit, String key, ToIntFunction<String> line, String problem) {
        @Override
        public String toString() {
            return label;
        }
    }

    private static Arguments edit(String label, UnaryOperator<String> edit, String key, ToIntFunction<String> line,
            String problem) {
        return Arguments.of(new Edit(label, edit, key, line, problem));
    }

    private static Arguments value(String label, String block, String param, String newValue, String problem) {
        return edit(label, t -> setValue(t, block, param, newValue), "binaries." + block + "." + param,
                t -> lineOfKey(t, block, param), problem);
    }

    private static Arguments literal(String label, String block, String param, String newValue) {
        return edit(label, t -> setValue(t, block, param, newValue), "binaries." + block + "." + param,
                t -> lineOfKey(t, block, param), "malformed JSON");
    }

    static Stream<Arguments> edits() {
        return Stream.of(
                literal("NaN literal", "GaN", "a", "NaN"),
                literal("Infinity literal", "AlN", "C33", "Infinity"),
                literal("-Infinity literal", "InN", "Eg0", "-Infinity"),
                literal("single-quoted string", "GaN", "C13", "'106'"),
                literal("hexadecimal number", "GaN", "C11", "0x186"),
                value("number overflowing a double", "GaN", "C13", "1e999", "outside the range of finite doubles"),
                value("negative number overflowing a double", "AlN", "Psp", "-1e400",
                        "outside the range of finite doubles"),
                value("file value finite, SI value overflows", "GaN", "C44", "1e300", "C44 of GaN"),
                value("negative lattice constant", "GaN", "a", "-3.189", "a of GaN"),
                value("zero lattice constant c", "InN", "c", "0", "c of InN"),
                value("zero C33", "AlN", "C33", "0", "C33 of AlN"),
                value("negative static permittivity", "GaN", "eps_static", "-10.4", "eps_static of GaN"),
                value("negative electron mass", "InN", "me_par", "-0.07", "me_par of InN"),
                value("negative gap", "AlN", "Eg0", "-6.25", "Eg0 of AlN"),
                value("negative Varshni alpha", "GaN", "varshni_alpha", "-0.909", "varshni_alpha of GaN"),
                value("zero Varshni beta", "GaN", "varshni_beta", "0", "varshni_beta of GaN"),
                value("value as string", "GaN", "C12", "\"145\"", "must be a JSON number"),
                value("value null", "AlN", "e31", "null", "must be a JSON number"),
                value("value true", "AlN", "e33", "true", "must be a JSON number"),
                value("value array", "InN", "a", "[3.545]", "must be a JSON number"),
                edit("missing parameter", t -> DataFiles.removeLine(t, lineOfKey(t, "AlN", "C13")),
                        "binaries.AlN.C13", t -> lineOfBlock(t, "AlN"), "missing value"),
                edit("unknown parameter key", t -> DataFiles.replaceOnLine(t, lineOfKey(t, "GaN", "C44"), "\"C44\"",
                        "\"C45\""), "binaries.GaN.C45", t -> lineOfKey(t, "GaN", "C45"), "unknown parameter key"),
                edit("duplicated parameter key", t -> DataFiles.replaceOnLine(t, lineOfKey(t, "GaN", "C12"), "\"C12\"",
                        "\"C11\""), "binaries.GaN.C11", t -> lineOfKey(t, "GaN", "C11") + 1,
                        "duplicated key"),
                edit("unknown source key", t -> DataFiles.replaceOnLine(t, lineOfKey(t, "InN", "C11"), "\"VM03\"",
                        "\"VM04\""), "binaries.InN.C11", t -> lineOfKey(t, "InN", "C11"), "\"VM04\""),
                edit("wrong unit", t -> DataFiles.replaceOnLine(t, lineOfKey(t, "GaN", "a"), "\"source\"",
                        "\"unit\": \"nm\", \"source\""), "binaries.GaN.a", t -> lineOfKey(t, "GaN", "a"), "unit \"nm\""),
                edit("Psp_bowing given for a binary", t -> DataFiles.replaceOnLine(t, lineOfKey(t, "GaN", "Psp"),
                        "\"Psp\"", "\"Psp_bowing\""), "binaries.GaN.Psp_bowing", t -> lineOfKey(t, "GaN", "Psp_bowing"),
                        "must not be given"),
                edit("unsupported format version", t -> DataFiles.replaceOnLine(t, 2, "1", "2"), "formatVersion",
                        t -> 2, "formatVersion = 2"),
                edit("unknown polarization model", t -> DataFiles.replaceOnLine(t, 5, "\"LINEAR\"", "\"QUADRATIC\""),
                        "recommendedPolarizationModel", t -> 5, "\"QUADRATIC\""),
                edit("NaN gap bowing", t -> DataFiles.replaceOnLine(t, lineOfKey(t, "gap", "AlGaN"), "0.8", "NaN"),
                        "bowing.gap.AlGaN", t -> lineOfKey(t, "gap", "AlGaN"), "malformed JSON"),
                edit("overflowing polarization bowing", t -> DataFiles.replaceOnLine(t,
                        lineOfKey(t, "polarization", "InGaN"), "\"value\": 0", "\"value\": 1e500"),
                        "bowing.polarization.InGaN", t -> lineOfKey(t, "polarization", "InGaN"),
                        "outside the range of finite doubles"),
                edit("truncated in the middle", t -> t.substring(0, t.length() / 2), null,
                        t -> lineCount(t), "end-of-input"),
                edit("truncated after the last brace is lost", t -> t.substring(0, t.lastIndexOf('}')), "(root)",
                        t -> lineCount(t), "end-of-input"),
                edit("trailing content", t -> t + "\n{}", "(root)", t -> lineCount(t), "after the end"),
                edit("empty file", t -> "", "(root)", t -> 1, "empty"),
                edit("only white space", t -> "\n\n   \n", "(root)", t -> 4, "empty"),
                edit("an array instead of an object", t -> "[\n" + t + "\n]", "(root)", t -> 1, "one JSON object"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("edits")
    void editedFileIsRejectedWithFileKeyAndLine(Edit row) {
        String text = row.edit().apply(TEXT);
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> DataFiles.read(text, FILE), row.label());
        int line = row.line().applyAsInt(text);
        DataFiles.assertNamesFileAndLine(e, FILE, line);
        if (row.key() != null) {
            assertEquals(row.key(), e.key(), e.getMessage());
        }
        assertTrue(e.problem().contains(row.problem()), "problem must mention \"" + row.problem() + "\": "
                + e.getMessage());
        // the set is named as soon as its name could be read (it is on line 3)
        if (line > 3 || text.isBlank() || text.startsWith("[")) {
            String expectedSet = text.contains("\"name\": \"" + SET + "\"") && !text.startsWith("[") ? SET
                    : ParameterSetFormatException.UNNAMED;
            assertEquals(expectedSet, e.setName(), e.getMessage());
            assertTrue(e.getMessage().startsWith("parameter set \"" + expectedSet + "\""), e.getMessage());
        }
    }

    @Test
    void invalidUtf8IsRejectedWithALine() {
        byte[] bytes = TEXT.getBytes(StandardCharsets.UTF_8);
        int at = TEXT.indexOf("Vurgaftman");
        bytes[at] = (byte) 0xC3; // a two-byte lead followed by an ASCII byte: invalid UTF-8
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> DataFiles.read(bytes, FILE));
        DataFiles.assertNamesFileAndLine(e, FILE, 4);
    }

    @Test
    void deeplyNestedGarbageIsRejectedNotOverflowingTheStack() {
        String text = "{\"name\": " + "[".repeat(100_000);
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class, () -> DataFiles.read(text, FILE));
        DataFiles.assertNamesFileAndLine(e, FILE, 1);
    }

    @Test
    void absurdlyLongNumberIsRejected() {
        String text = setValue(TEXT, "GaN", "C13", "1" + "0".repeat(5000));
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class, () -> DataFiles.read(text, FILE));
        DataFiles.assertNamesFileAndLine(e, FILE, lineOfKey(text, "GaN", "C13"));
    }

    /**
     * An endless stream that starts a parameter set whose description is {@code opening} followed
     * by {@code unit} repeated for ever; counts the bytes the reader takes.
     */
    private static final class EndlessDescription extends java.io.InputStream {
        private final byte[] head;
        private final byte[] unit;
        private long pos;

        EndlessDescription(String opening, String unit) {
            this.head = ("{\n  \"formatVersion\": 1,\n  \"name\": \"huge\",\n  \"description\": " + opening)
                    .getBytes(StandardCharsets.UTF_8);
            this.unit = unit.getBytes(StandardCharsets.UTF_8);
        }

        @Override
        public int read() {
            long p = pos++;
            return (p < head.length ? head[(int) p] : unit[(int) ((p - head.length) % unit.length)]) & 0xff;
        }

        long bytesRead() {
            return pos;
        }
    }

    /**
     * Issue #14: a 50 MB file whose description is a huge array exhausted the heap before it was
     * validated. The reader now stops at {@link JsonParameterSetReader#MAX_JSON_VALUES} values, long
     * before the limit on the file size, having read a few hundred kilobytes of an endless stream.
     */
    @Test
    void hugeArrayIsRefusedByItsElementCount() {
        EndlessDescription in = new EndlessDescription("[", "0, ");
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.read(() -> in, FILE));
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind());
        assertTrue(e.getMessage().contains(FILE) && e.getMessage().contains("more than "
                + JsonParameterSetReader.MAX_JSON_VALUES + " JSON values"), e.getMessage());
        assertTrue(in.bytesRead() < JsonParameterSetReader.MAX_FILE_BYTES, "read " + in.bytesRead() + " bytes");
    }

    /**
     * Issue #14: the same with one endless string: refused by Jackson's stream-read constraints once
     * {@link JsonParameterSetReader#MAX_FILE_BYTES} are read, with the limit in the message.
     */
    @Test
    void hugeStringIsRefusedByTheFileSizeLimit() {
        EndlessDescription in = new EndlessDescription("\"", "Tarnwick Nitride Lab, invented. ");
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.read(() -> in, FILE));
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind());
        assertTrue(e.getMessage().contains(FILE) && e.getMessage().contains("exceeds the reader's limits (at most "
                + JsonParameterSetReader.MAX_FILE_BYTES + " bytes"), e.getMessage());
        // Jackson reads in buffers of a few kilobytes: at most one buffer beyond the limit
        assertTrue(in.bytesRead() < 2 * JsonParameterSetReader.MAX_FILE_BYTES, "read " + in.bytesRead() + " bytes");
    }

    @Test
    void readFailureIsReportedWithoutALine() {
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.read(() -> {
                    throw new IOException("disk unplugged");
                }, FILE));
        DataFiles.assertNamesFileAndLine(e, FILE, 0);
        assertTrue(e.getMessage().contains("disk unplugged"), e.getMessage());
    }

    @Test
    void streamFailingHalfwayIsReported() {
        byte[] bytes = TEXT.getBytes(StandardCharsets.UTF_8);
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.read(() -> new java.io.InputStream() {
                    private int pos;

                    @Override
                    public int read() throws IOException {
                        if (pos >= bytes.length / 3) {
                            throw new IOException("connection reset");
                        }
                        return bytes[pos++] & 0xff;
                    }
                }, FILE));
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind());
        assertTrue(e.getMessage().contains(FILE) && e.getMessage().contains("connection reset"), e.getMessage());
    }

    @Test
    void missingFileIsReportedWithItsPath(@TempDir Path dir) {
        Path p = dir.resolve("no-such-set.json");
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.readFile(p));
        DataFiles.assertNamesFileAndLine(e, p.toString(), 0);
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
    }

    @Test
    void truncatedFileOnDiskIsReportedWithItsPathAndLastLine(@TempDir Path dir) throws IOException {
        Path p = dir.resolve("cut.json");
        String text = TEXT.substring(0, TEXT.indexOf("\"InN\": {") + 40);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        ParameterSetFormatException e = assertThrows(ParameterSetFormatException.class,
                () -> JsonParameterSetReader.readFile(p));
        DataFiles.assertNamesFileAndLine(e, p.toString(), lineCount(text));
        assertEquals(SET, e.setName());
    }

    @Test
    void nullArgumentsAreNamed() {
        InvalidParameterException a = assertThrows(InvalidParameterException.class,
                () -> JsonParameterSetReader.read(null, FILE));
        assertEquals("parameter-set stream supplier", a.parameter());
        InvalidParameterException b = assertThrows(InvalidParameterException.class,
                () -> JsonParameterSetReader.readFile(null));
        assertEquals("parameter-set file path", b.parameter());
        InvalidParameterException c = assertThrows(InvalidParameterException.class,
                () -> JsonParameterSetReader.readResource(DataFileBadInputTest.class, null));
        assertEquals("resource name", c.parameter());
    }

    @Test
    void unknownSetNameListsTheRegisteredSets() {
        BadInput.checkKind(() -> ParameterSets.named("vurgaftman-meyer-2030"), ErrorKind.UNKNOWN_PARAMETER_SET,
                "\"vurgaftman-meyer-2030\"", "vurgaftman-meyer-2003", "ambacher-2002");
    }

    /** The unedited text is accepted: every rejection above is caused by its edit. */
    @Test
    void uneditedTextIsAccepted() {
        FileParameterSet s = DataFiles.read(TEXT, FILE);
        assertEquals(SET, s.name());
        assertEquals(s.binary(Binary.GAN), ParameterSets.named(SET).binary(Binary.GAN));
    }
}
