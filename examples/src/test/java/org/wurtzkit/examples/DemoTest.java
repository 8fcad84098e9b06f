package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;

/** The demo runs all five examples, lists what it wrote and prints the wafer's 2DEG density. */
class DemoTest {
    @Test
    void runsEverythingAndPrintsTheSheetDensity(@TempDir Path out) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        Demo.Result r = Demo.run(out, true, new PrintStream(bytes, true, StandardCharsets.UTF_8));
        String printed = bytes.toString(StandardCharsets.UTF_8);

        double expected = new SelfConsistentSolver().solve(DemoLab.wafer()).sheetDensityPerCm2();
        assertEquals(expected, r.sheetDensityPerCm2(), 0.0);
        String line = "n_s = " + BandDiagramExample.formatSheetDensity(expected);
        assertTrue(printed.contains("2DEG sheet density of wafer " + DemoLab.WAFER), printed);
        assertTrue(printed.strip().endsWith(line), "the summary ends with the 2DEG density:\n" + printed);

        for (int k = 1; k <= 5; k++) {
            assertTrue(printed.contains("[" + k + "/5]"), "progress of example " + k);
        }
        assertEquals(5, r.results().size());
        assertTrue(r.files().size() >= 15);
        for (Path f : r.files()) {
            assertTrue(Files.size(f) > 0, f + " is empty");
            assertTrue(printed.contains(f.getFileName().toString()), f + " is listed");
        }
        Path stack = out.resolve(Demo.STACK_FILE);
        assertTrue(r.files().contains(stack), "the demo lists the stack file");
        assertEquals(DemoLab.wafer(), org.wurtzkit.materials.data.StructureJson.readFile(stack),
                "the stack written beside the plots reads back to the wafer");
        assertTrue(printed.contains("invented"), "the demo says its data is invented");
        assertTrue(printed.contains("confirm it by measurement"), "the demo carries the caution");
    }

    @Test
    void commandLine(@TempDir Path dir) throws IOException {
        ExampleArgs a = ExampleArgs.parse(new String[] {dir.resolve("x").toString(), "--quick"});
        assertTrue(a.quick());
        assertTrue(Files.isDirectory(a.createdOut()), "the folder is created");
        ExampleArgs defaults = ExampleArgs.parse(new String[0]);
        assertEquals(Path.of("out"), defaults.out());
        assertTrue(!defaults.quick());
        try {
            ExampleArgs.parse(new String[] {"--fast"});
            throw new AssertionError("an unknown option must be refused");
        } catch (IllegalArgumentException expectedRefusal) {
            assertTrue(expectedRefusal.getMessage().contains("--fast"));
        }
    }
}
