package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs {@code examples/jshell/walkthrough.jsh} with the JDK's jshell and the class path the README
 * documents, as a person would, and checks that it prints the same n_s as the Java examples.
 */
class JshellWalkthroughTest {
    @Test
    void printsTheSameSheetDensityAsTheJavaExample(@TempDir Path work) throws Exception {
        Path script = Path.of(System.getProperty("wurtzkit.jshell.script", "jshell/walkthrough.jsh"));
        assertTrue(Files.isRegularFile(script), script.toString());
        String out = ProcessRuns.run(List.of(ProcessRuns.jdkTool("jshell"), "--class-path",
                ProcessRuns.libraryClassPath(), script.toAbsolutePath().toString()), work);

        assertFalse(out.contains("Error:"), "jshell reported an error:\n" + out);
        Matcher m = Pattern.compile("n_s = \\S+ cm\\^-2").matcher(out);
        assertTrue(m.find(), "no n_s line in:\n" + out);
        assertEquals(ProcessRuns.expectedSheetDensityLine(), m.group());
        assertTrue(out.contains("parameter sets: [vurgaftman-meyer-2003"), out);
        assertTrue(out.contains("subband 0: E - E_F"), out);
    }
}
