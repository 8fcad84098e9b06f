package org.wurtzkit.examples;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The command line shared by the examples: {@code [output folder] [--quick]}. The folder defaults
 * to {@code out} ({@link #createdOut()} creates it if missing); {@code --quick} selects the small
 * settings the tests use (coarse grids, few points).
 *
 * @param out   the output folder
 * @param quick true for the small settings
 */
record ExampleArgs(Path out, boolean quick) {
    /** Folder used when none is given. */
    static final String DEFAULT_OUT = "out";

    /**
     * @param args the command line
     * @return the parsed arguments
     * @throws IllegalArgumentException for an unknown option or a second folder
     */
    static ExampleArgs parse(String[] args) {
        Path out = null;
        boolean quick = false;
        for (String a : args) {
            if (a.equals("--quick")) {
                quick = true;
            } else if (a.startsWith("--")) {
                throw new IllegalArgumentException("unknown option " + a + "; usage: [output folder] [--quick]");
            } else if (out == null) {
                out = Path.of(a);
            } else {
                throw new IllegalArgumentException("a second output folder " + a
                        + "; usage: [output folder] [--quick]");
            }
        }
        return new ExampleArgs(out == null ? Path.of(DEFAULT_OUT) : out, quick);
    }

    /**
     * @return the output folder, created if missing
     * @throws IOException if it cannot be created
     */
    Path createdOut() throws IOException {
        return Files.createDirectories(out);
    }
}
