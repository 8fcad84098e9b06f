package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;

/** Helpers for the tests that run the documented commands in a child process. */
final class ProcessRuns {
    private ProcessRuns() {
    }

    /**
     * @return the library's class path as the build wrote it to target/classpath.txt, the class path
     *         the jshell walkthrough and README document
     */
    static String libraryClassPath() throws IOException {
        Path file = Path.of(System.getProperty("wurtzkit.classpath.file", "target/classpath.txt"));
        assertTrue(Files.isRegularFile(file), file + " is missing: the build writes it in generate-resources");
        String cp = Files.readString(file, StandardCharsets.UTF_8).strip();
        assertTrue(cp.contains("wurtzkit-solvers") || cp.contains("solvers"), cp);
        return cp;
    }

    /** @return a tool of the running JDK, e.g. "java" or "jshell" */
    static String jdkTool(String name) {
        boolean windows = File.separatorChar == '\\';
        Path p = Path.of(System.getProperty("java.home"), "bin", windows ? name + ".exe" : name);
        assertTrue(Files.isExecutable(p), p + " not found: the tests need a JDK");
        return p.toString();
    }

    /**
     * Runs a command with no standard input and returns what it printed (out and err together),
     * failing on a non-zero exit or on a hang.
     */
    static String run(List<String> command, Path work) throws IOException, InterruptedException {
        return runIn(command, work, null);
    }

    /** As {@link #run}, with the child's working directory {@code dir} (null: this JVM's). */
    static String runIn(List<String> command, Path work, Path dir) throws IOException, InterruptedException {
        Path log = Files.createTempFile(work, "process", ".log");
        ProcessBuilder pb = new ProcessBuilder(command).directory(dir == null ? null : dir.toFile())
                .redirectErrorStream(true)
                .redirectOutput(log.toFile()).redirectInput(ProcessBuilder.Redirect.from(emptyFile(work).toFile()));
        Process p = pb.start();
        boolean done = p.waitFor(180, TimeUnit.SECONDS);
        if (!done) {
            p.destroyForcibly();
        }
        String out = Files.readString(log, StandardCharsets.UTF_8);
        assertTrue(done, "timed out: " + command + "\n" + out);
        assertEquals(0, p.exitValue(), "exit status of " + command.get(0) + ":\n" + out);
        return out;
    }

    private static Path emptyFile(Path work) throws IOException {
        Path f = work.resolve("empty-input");
        if (!Files.exists(f)) {
            Files.createFile(f);
        }
        return f;
    }

    /** @return the wafer's n_s as every example prints it, "n_s = ... cm^-2" */
    static String expectedSheetDensityLine() {
        return "n_s = " + BandDiagramExample.formatSheetDensity(
                new SelfConsistentSolver().solve(DemoLab.wafer()).sheetDensityPerCm2());
    }
}
