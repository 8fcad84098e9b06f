package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.materials.data.BuiltInParameterSets;
import org.wurtzkit.materials.data.FileParameterSet;
import org.wurtzkit.materials.data.JsonParameterSetReader;
import org.wurtzkit.materials.data.ParameterSetFormatException;

/**
 * Text helpers of the data-file reliability tests: the built-in default file as text, line search
 * by plain text (independent of the JSON parser), edits, and reading edited text through the
 * public reader.
 */
final class DataFiles {
    private DataFiles() {
    }

    /** The default set's file, shipped in the materials-data jar. */
    static final String DEFAULT_FILE = "vurgaftman-meyer-2003.json";
    /** Its set name. */
    static final String DEFAULT_SET = "vurgaftman-meyer-2003";
    /** The text of the default file. */
    static final String TEXT = resource(DEFAULT_FILE);

    static String resource(String name) {
        try (InputStream in = BuiltInParameterSets.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static List<String> lines(String text) {
        return Arrays.asList(text.split("\n", -1));
    }

    /** @return number of lines the text spans (a final newline starts one more, empty, line) */
    static int lineCount(String text) {
        return lines(text).size();
    }

    /** @return 1-based line of {@code "block": {} */
    static int lineOfBlock(String text, String block) {
        List<String> ls = lines(text);
        for (int i = 0; i < ls.size(); i++) {
            if (ls.get(i).trim().equals("\"" + block + "\": {")) {
                return i + 1;
            }
        }
        throw new IllegalStateException("no block " + block);
    }

    /** @return 1-based line of the first {@code "key":} after the line opening block */
    static int lineOfKey(String text, String block, String key) {
        List<String> ls = lines(text);
        for (int i = lineOfBlock(text, block); i < ls.size(); i++) {
            if (ls.get(i).trim().startsWith("\"" + key + "\":")) {
                return i + 1;
            }
        }
        throw new IllegalStateException("no key " + key + " in " + block);
    }

    /** Replaces the first occurrence of target on a 1-based line. */
    static String replaceOnLine(String text, int line, String target, String replacement) {
        String[] ls = text.split("\n", -1);
        String l = ls[line - 1];
        int at = l.indexOf(target);
        if (at < 0) {
            throw new IllegalStateException("\"" + target + "\" not on line " + line + ": " + l);
        }
        ls[line - 1] = l.substring(0, at) + replacement + l.substring(at + target.length());
        return String.join("\n", ls);
    }

    /** Replaces the number after {@code "value": } of an entry. */
    static String setValue(String text, String block, String key, String newValueText) {
        int line = lineOfKey(text, block, key);
        String l = lines(text).get(line - 1);
        int start = l.indexOf("\"value\": ") + "\"value\": ".length();
        int end = l.indexOf(',', start);
        return replaceOnLine(text, line, l.substring(start, end), newValueText);
    }

    /** Removes a 1-based line. */
    static String removeLine(String text, int line) {
        String[] ls = text.split("\n", -1);
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < ls.length; i++) {
            if (i != line - 1) {
                sb.append(ls[i]);
                if (i < ls.length - 1) {
                    sb.append('\n');
                }
            }
        }
        return sb.toString();
    }

    static FileParameterSet read(String text, String fileName) {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        return JsonParameterSetReader.read(() -> new ByteArrayInputStream(bytes), fileName);
    }

    static FileParameterSet read(byte[] bytes, String fileName) {
        return JsonParameterSetReader.read(() -> new ByteArrayInputStream(bytes), fileName);
    }

    /**
     * The contract of {@link ParameterSetFormatException}: kind MALFORMED_DATA, and a message that
     * names the file and the line (or says that there is none).
     */
    static void assertNamesFileAndLine(ParameterSetFormatException e, String fileName, int line) {
        String m = e.getMessage();
        assertEquals(ErrorKind.MALFORMED_DATA, e.kind(), m);
        assertEquals(fileName, e.fileName(), m);
        assertTrue(m.contains("file \"" + fileName + "\""), m);
        assertEquals(line, e.line(), m);
        if (line > 0) {
            assertTrue(m.contains("line " + line + ":"), m);
        } else {
            assertTrue(m.contains("no line"), m);
        }
        assertTrue(m.contains("key \"" + e.key() + "\""), m);
        if (e.key() == null || e.key().isEmpty()) {
            fail("no key: " + m);
        }
    }
}
