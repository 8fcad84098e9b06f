// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.benchmarks;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes the tridiagonal of {@link Scenarios#channelWell(int)} (the EigenBenchmark matrix, an
 * invented demo channel) as CSV, one file per N, so that a baseline outside the JVM (the scipy
 * script beside this module) times the very same numbers: a header line {@code i,diag,off}, then
 * one row per index with the off-diagonal empty on the last row. Values are written with
 * {@link Double#toString(double)}, which reads back to the same double.
 *
 * <p>Usage: {@code java -cp benchmarks.jar org.wurtzkit.benchmarks.ExportChannelWell DIR N...}
 */
public final class ExportChannelWell {

    private ExportChannelWell() {
    }

    /**
     * Entry point.
     *
     * @param args output directory, then one or more orders N
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        if (args.length < 2) {
            throw new IllegalArgumentException("usage: ExportChannelWell DIR N [N ...]");
        }
        Path dir = Path.of(args[0]);
        Files.createDirectories(dir);
        for (int a = 1; a < args.length; a++) {
            int n = Integer.parseInt(args[a]);
            Scenarios.ChannelWell well = Scenarios.channelWell(n);
            Path file = dir.resolve("channel-well-" + n + ".csv");
            try (PrintWriter out = new PrintWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8))) {
                out.println("i,diag,off");
                for (int i = 0; i < n; i++) {
                    out.println(i + "," + well.diag[i] + "," + (i < n - 1 ? Double.toString(well.off[i]) : ""));
                }
            }
            System.out.println(file);
        }
    }
}
