package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.File;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's promises: its dependency example compiles (with every lint warning an error) and
 * runs against the library's class path and prints the wafer's n_s; its quick start has exactly
 * two commands, the second the one CI runs; the picture it shows exists; it keeps the caution.
 */
class ReadmeTest {
    private static String readme() throws Exception {
        Path p = Path.of(System.getProperty("wurtzkit.readme", "../README.md"));
        assertTrue(Files.isRegularFile(p), p.toString());
        return Files.readString(p, StandardCharsets.UTF_8);
    }

    /** The text of a "## " section, up to the next one. */
    private static String section(String readme, String heading) {
        int start = readme.indexOf("\n## " + heading + "\n");
        assertTrue(start >= 0, "README has no section \"" + heading + "\"");
        int end = readme.indexOf("\n## ", start + 4);
        return readme.substring(start, end < 0 ? readme.length() : end);
    }

    /** The first fenced block of a language in a text. */
    private static String firstBlock(String text, String language) {
        Matcher m = Pattern.compile("```" + language + "\\n(.*?)```", Pattern.DOTALL).matcher(text);
        assertTrue(m.find(), "no ```" + language + " block");
        return m.group(1);
    }

    @Test
    void dependencyExampleCompilesAndRuns(@TempDir Path work) throws Exception {
        String code = firstBlock(section(readme(), "Use it as a dependency"), "java");
        long lines = code.lines().filter(l -> !l.isBlank() && !l.strip().startsWith("import")).count();
        assertTrue(lines <= 16, "the example should stay short, it has " + lines + " lines besides imports");
        Matcher name = Pattern.compile("public class (\\w+)").matcher(code);
        assertTrue(name.find(), "the example is a public class");
        Path source = work.resolve(name.group(1) + ".java");
        Files.writeString(source, code, StandardCharsets.UTF_8);
        Path classes = Files.createDirectories(work.resolve("classes"));

        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "the tests need a JDK");
        ByteArrayOutputStream diagnostics = new ByteArrayOutputStream();
        int status = javac.run(null, null, new PrintStream(diagnostics, true, StandardCharsets.UTF_8), "-Xlint:all",
                "-Werror", "--release", "17", "-classpath", ProcessRuns.libraryClassPath(), "-d", classes.toString(),
                source.toString());
        assertEquals(0, status, "the README example does not compile:\n" + diagnostics.toString(StandardCharsets.UTF_8));

        String out = ProcessRuns.run(List.of(ProcessRuns.jdkTool("java"), "-cp",
                classes + File.pathSeparator + ProcessRuns.libraryClassPath(), name.group(1)), work);
        assertEquals(ProcessRuns.expectedSheetDensityLine(), out.strip());
    }

    @Test
    void quickStartHasTwoCommandsAndTheSecondIsWhatCiRuns() throws Exception {
        String block = firstBlock(section(readme(), "Quick start"), "sh");
        List<String> commands = block.lines().map(String::strip).filter(l -> !l.isEmpty() && !l.startsWith("#"))
                .map(l -> l.replaceAll("\\s+#.*$", "")).toList();
        assertEquals(2, commands.size(), "two commands: " + commands);
        assertTrue(commands.get(0).contains("-Pdemo"), "the first runs the demo: " + commands.get(0));
        Path ci = Path.of(System.getProperty("wurtzkit.readme", "../README.md")).resolveSibling(".ci").resolve("run");
        assertTrue(Files.readString(ci, StandardCharsets.UTF_8).lines().anyMatch(l -> l.strip().equals(commands.get(1))),
                "CI runs the README's test command " + commands.get(1));
    }

    @Test
    void shownPictureExistsAndCautionStays() throws Exception {
        String readme = readme();
        Matcher img = Pattern.compile("!\\[[^\\]]*\\]\\((docs/images/[^)]+\\.png)\\)").matcher(readme);
        assertTrue(img.find(), "README shows a PNG from docs/images");
        Path png = Path.of(System.getProperty("wurtzkit.readme", "../README.md")).resolveSibling(img.group(1));
        assertTrue(Files.size(png) > 10_000, png.toString());
        assertTrue(readme.contains("Model estimates only"), "the caution stays");
        assertTrue(readme.contains("own safety rules"), "the caution names the lab's safety rules");
    }
}
