package org.wurtzkit.materials.data;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Test helpers: read a test resource as text, find the line of a key independently of Jackson
 * (plain text search), and read edited copies through the public reader.
 */
final class TestText {
    private TestText() {
    }

    /** The team fixture, a complete valid set. */
    static final String TEAM_FILE = "example-lab-2025.json";

    /**
     * @param resource resource name relative to this package
     * @return its text (UTF-8)
     */
    static String resource(String resource) {
        try (InputStream in = TestText.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + resource);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** @return the lines of a text (a trailing newline gives no extra line) */
    static List<String> lines(String text) {
        return new ArrayList<>(Arrays.asList(text.split("\n", -1)));
    }

    /**
     * @param text      file text
     * @param blockName key opening the block to search in, e.g. "GaN" (searched as {@code "GaN": {})
     * @param key       key to find inside the block, e.g. "C13"
     * @param occurrence 1 for the first occurrence after the block start, 2 for the second, ...
     * @return 1-based line number
     */
    static int lineOfKey(String text, String blockName, String key, int occurrence) {
        List<String> ls = lines(text);
        int start = lineOfBlock(text, blockName) - 1;
        int seen = 0;
        for (int i = start; i < ls.size(); i++) {
            if (ls.get(i).trim().startsWith("\"" + key + "\":")) {
                if (++seen == occurrence) {
                    return i + 1;
                }
            }
        }
        throw new IllegalStateException("key " + key + " not found in block " + blockName);
    }

    /**
     * @param text      file text
     * @param blockName key opening an object, e.g. "GaN"
     * @return 1-based line of {@code "GaN": {}
     */
    static int lineOfBlock(String text, String blockName) {
        List<String> ls = lines(text);
        for (int i = 0; i < ls.size(); i++) {
            if (ls.get(i).trim().equals("\"" + blockName + "\": {")) {
                return i + 1;
            }
        }
        throw new IllegalStateException("block " + blockName + " not found");
    }

    /** @return the number of the last line of the text (the line on which the file ends) */
    static int lastLine(String text) {
        return lines(text).size();
    }

    /**
     * @param text     JSON text
     * @param fileName name for messages
     * @return the set read through the public reader
     */
    static FileParameterSet read(String text, String fileName) {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        return JsonParameterSetReader.read(() -> new ByteArrayInputStream(bytes), fileName);
    }

    /**
     * Removes one line and, if it closed a block, the now dangling comma of the line before.
     *
     * @param text file text
     * @param line 1-based line to remove
     * @return the edited text
     */
    static String removeLine(String text, int line) {
        List<String> ls = lines(text);
        ls.remove(line - 1);
        String next = ls.get(line - 1).trim();
        if (next.startsWith("}")) {
            String prev = ls.get(line - 2);
            if (prev.endsWith(",")) {
                ls.set(line - 2, prev.substring(0, prev.length() - 1));
            }
        }
        return String.join("\n", ls);
    }

    /**
     * @param text        file text
     * @param line        1-based line
     * @param target      text to replace on that line
     * @param replacement its replacement
     * @return the edited text
     */
    static String replaceOnLine(String text, int line, String target, String replacement) {
        List<String> ls = lines(text);
        String l = ls.get(line - 1);
        if (!l.contains(target)) {
            throw new IllegalStateException("line " + line + " does not contain " + target + ": " + l);
        }
        ls.set(line - 1, l.replace(target, replacement));
        return String.join("\n", ls);
    }
}
