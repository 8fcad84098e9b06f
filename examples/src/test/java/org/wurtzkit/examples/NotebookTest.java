package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import javax.imageio.ImageIO;
import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs the code cells of {@code examples/notebooks/barrier-design.ipynb} as a reader would, so
 * that the notebook never rots: the JSON is parsed, the code cells are taken in order, the kernel's
 * line magics are set aside (the one that loads the jar is checked to point at the jar the build
 * made), and every cell is evaluated in a jshell (the JDK's {@code jdk.jshell} API, executing in a
 * separate JVM) whose class path is that one jar and nothing else. A cell that does not compile or
 * throws fails the test with the cell's number and jshell's message.
 *
 * <p>The jar is built in the {@code package} phase, so this test runs after it, in the
 * {@code integration-test} phase of {@code mvn verify} (see the module's pom).
 */
class NotebookTest {
    private static final String LOAD_MAGIC = "%jars ";

    @Test
    void everyCodeCellRunsInJshellFromTheOneJar(@TempDir Path work) throws Exception {
        Path notebook = Path.of(System.getProperty("wurtzkit.notebook", "notebooks/barrier-design.ipynb"));
        Path jar = Path.of(System.getProperty("wurtzkit.all.jar", "target/wurtzkit-examples-all.jar"));
        assertTrue(Files.isRegularFile(notebook), notebook.toString());
        assertTrue(Files.isRegularFile(jar), jar + " is missing: it is built in the package phase (mvn -B -ntp verify)");

        Map<String, Object> nb = json(notebook);
        Map<?, ?> kernel = (Map<?, ?>) ((Map<?, ?>) nb.get("metadata")).get("kernelspec");
        assertEquals("java", kernel.get("language"), "a notebook for a Java kernel");
        List<String> cells = new ArrayList<>();
        List<String> magics = new ArrayList<>();
        for (Object o : (List<?>) nb.get("cells")) {
            Map<?, ?> cell = (Map<?, ?>) o;
            if (!"code".equals(cell.get("cell_type"))) {
                continue;
            }
            Object src = cell.get("source");
            String text = src instanceof List<?> l ? l.stream().map(String::valueOf).collect(Collectors.joining())
                    : String.valueOf(src);
            StringBuilder java = new StringBuilder();
            for (String line : text.split("\n", -1)) {
                if (line.startsWith("%%")) {
                    fail("cell magic in a code cell (not Java, cannot be checked): " + line);
                } else if (line.startsWith("%")) {
                    magics.add(line.strip());
                } else {
                    java.append(line).append('\n');
                }
            }
            cells.add(java.toString());
        }
        assertTrue(cells.size() >= 6, "code cells: " + cells.size());
        // the notebook loads exactly the jar the build made, by a path relative to its own folder
        assertEquals(1, magics.size(), "magics: " + magics);
        assertTrue(magics.get(0).startsWith(LOAD_MAGIC), magics.get(0));
        Path loaded = notebook.toAbsolutePath().getParent().resolve(magics.get(0).substring(LOAD_MAGIC.length()).strip());
        assertEquals(jar.toAbsolutePath().normalize(), loaded.normalize(), "the jar the notebook loads");

        Path out = Files.createDirectories(work.resolve("figures"));
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        PrintStream ps = new PrintStream(printed, true, StandardCharsets.UTF_8);
        int images = 0;
        try (JShell shell = JShell.builder().out(ps).err(ps)
                .remoteVMOptions("-Djava.awt.headless=true", "-Dwurtzkit.notebook.out=" + out.toAbsolutePath())
                .build()) {
            shell.addToClasspath(jar.toAbsolutePath().toString());
            SourceCodeAnalysis analysis = shell.sourceCodeAnalysis();
            for (int k = 0; k < cells.size(); k++) {
                String remaining = cells.get(k);
                String lastValue = null;
                while (!remaining.isBlank()) {
                    SourceCodeAnalysis.CompletionInfo info = analysis.analyzeCompletion(remaining);
                    if (!info.completeness().isComplete()) {
                        fail("code cell " + (k + 1) + " ends in an incomplete statement:\n" + remaining);
                    }
                    for (SnippetEvent e : shell.eval(info.source())) {
                        if (e.status() == Snippet.Status.REJECTED) {
                            String why = shell.diagnostics(e.snippet()).map(d -> d.getMessage(null))
                                    .collect(Collectors.joining("; "));
                            fail("code cell " + (k + 1) + " does not compile: " + why + "\n" + info.source());
                        }
                        if (e.exception() != null) {
                            fail("code cell " + (k + 1) + " threw " + e.exception() + "\n" + info.source()
                                    + "\nprinted:\n" + printed.toString(StandardCharsets.UTF_8));
                        }
                        if (e.causeSnippet() == null && e.value() != null) {
                            lastValue = e.value();
                        }
                    }
                    remaining = info.remaining();
                }
                if (lastValue != null && lastValue.startsWith("BufferedImage@")) {
                    images++;
                }
            }
        }
        String text = printed.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("parameter sets: [") && text.contains("tarnwick-lab-2025"),
                "the one jar brings every parameter set, the invented one included:\n" + text);
        assertTrue(text.contains("n_s = ") && text.contains("V_th = "), text);
        assertEquals(5, images, "every plotting cell ends by showing its figure");
        for (String f : List.of("band-diagram.png", "gate-sweep.png", "barrier-map.png", "cap-tradeoff.png",
                "parameter-spread.png")) {
            BufferedImage img = ImageIO.read(out.resolve(f).toFile());
            assertNotNull(img, f);
            assertTrue(img.getWidth() >= 900 && img.getHeight() >= 600, f + " " + img.getWidth() + "x" + img.getHeight());
        }
        String svg = Files.readString(out.resolve("band-diagram.svg"), StandardCharsets.UTF_8);
        assertTrue(svg.contains("<svg") && svg.contains("</svg>"), "an SVG document");
        assertFalse(Files.exists(Path.of("notebook-out")), "nothing written into the module folder");
    }

    /**
     * The README's block for jshell and notebooks, run as a script by the jshell tool in an empty
     * folder with the one jar as its class path: no error, no exception, and the PNG and SVG it
     * writes there.
     */
    @Test
    void readmePlotBlockRunsInJshellFromTheOneJar(@TempDir Path work) throws Exception {
        Path jar = Path.of(System.getProperty("wurtzkit.all.jar", "target/wurtzkit-examples-all.jar"));
        assertTrue(Files.isRegularFile(jar), jar + " is missing: it is built in the package phase (mvn -B -ntp verify)");
        String readme = Files.readString(Path.of(System.getProperty("wurtzkit.readme", "../README.md")),
                StandardCharsets.UTF_8);
        int start = readme.indexOf("\n## Plots in a notebook or jshell\n");
        assertTrue(start >= 0, "README has no section \"Plots in a notebook or jshell\"");
        int end = readme.indexOf("\n## ", start + 4);
        String section = readme.substring(start, end);
        assertTrue(section.contains("jshell --class-path examples/target/wurtzkit-examples-all.jar"),
                "the one-line load names the jar the build makes");
        assertEquals("wurtzkit-examples-all.jar", jar.getFileName().toString());
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("```java\\n(.*?)```", java.util.regex.Pattern.DOTALL)
                .matcher(section);
        assertTrue(m.find(), "no java block in the section");
        Path dir = Files.createDirectories(work.resolve("session"));
        Path script = work.resolve("readme-plots.jsh");
        Files.writeString(script, m.group(1) + "\n/exit\n", StandardCharsets.UTF_8);
        String out = ProcessRuns.runIn(List.of(ProcessRuns.jdkTool("jshell"), "-R-Djava.awt.headless=true",
                "--class-path", jar.toAbsolutePath().toString(), script.toAbsolutePath().toString()), work, dir);
        assertFalse(out.contains("Error:") || out.contains("Exception"), "jshell reported a problem:\n" + out);
        BufferedImage img = ImageIO.read(dir.resolve("band-diagram.png").toFile());
        assertNotNull(img, "band-diagram.png written:\n" + out);
        assertEquals(1400, img.getWidth());
        assertTrue(Files.readString(dir.resolve("band-diagram.svg"), StandardCharsets.UTF_8).contains("</svg>"));
    }

    /** Parses a JSON document into maps, lists, strings, numbers, booleans and nulls. */
    static Map<String, Object> json(Path file) throws IOException {
        try (JsonParser p = new JsonFactory().createParser(file.toFile())) {
            assertEquals(JsonToken.START_OBJECT, p.nextToken(), file + " is not a JSON object");
            @SuppressWarnings("unchecked")
            Map<String, Object> m = (Map<String, Object>) value(p);
            return m;
        }
    }

    private static Object value(JsonParser p) throws IOException {
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT -> {
                Map<String, Object> m = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String name = p.currentName();
                    p.nextToken();
                    m.put(name, value(p));
                }
                return m;
            }
            case START_ARRAY -> {
                List<Object> l = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    l.add(value(p));
                }
                return l;
            }
            case VALUE_STRING -> {
                return p.getText();
            }
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> {
                return p.getNumberValue();
            }
            case VALUE_TRUE, VALUE_FALSE -> {
                return p.getBooleanValue();
            }
            case VALUE_NULL -> {
                return null;
            }
            default -> throw new IOException("unexpected JSON token " + t);
        }
    }
}
