package org.wurtzkit.testing;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a reference table kept under a test resource folder: comma-separated numbers, one row a
 * line, with every line that starts with {@code #} a comment (the header saying what the numbers
 * are, their published source and how they were obtained). Parameterized tests read the same
 * files with JUnit's {@code @CsvFileSource}; this helper serves tests that need a table as an
 * array.
 */
public final class ReferenceTable {
    private ReferenceTable() {
    }

    /**
     * Reads every data row of a table as numbers.
     *
     * @param resource class-path name of the file, for example {@code "/reference/airy-zeros.csv"}
     * @return the rows in file order, each with one entry per column
     * @throws IllegalStateException if the file is missing, empty, ragged or holds a non-number
     */
    public static double[][] rows(String resource) {
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = ReferenceTable.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("reference table " + resource + " is not on the test class path");
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            int lineNumber = 0;
            while ((line = reader.readLine()) != null) {
                lineNumber++;
                String trimmed = line.strip();
                if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                    continue;
                }
                String[] cells = trimmed.split(",");
                if (!rows.isEmpty() && cells.length != rows.get(0).length) {
                    throw new IllegalStateException(resource + " line " + lineNumber + ": " + cells.length
                            + " columns, expected " + rows.get(0).length);
                }
                double[] row = new double[cells.length];
                for (int i = 0; i < cells.length; i++) {
                    try {
                        row[i] = Double.parseDouble(cells[i].strip());
                    } catch (NumberFormatException e) {
                        throw new IllegalStateException(resource + " line " + lineNumber + ": '" + cells[i]
                                + "' is not a number", e);
                    }
                }
                rows.add(row);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read reference table " + resource, e);
        }
        if (rows.isEmpty()) {
            throw new IllegalStateException("reference table " + resource + " has no data rows");
        }
        return rows.toArray(new double[0][]);
    }

    /**
     * Reads one column of a table.
     *
     * @param resource class-path name of the file
     * @param column zero-based column index
     * @return the column's values in file order
     */
    public static double[] column(String resource, int column) {
        double[][] rows = rows(resource);
        double[] out = new double[rows.length];
        for (int i = 0; i < rows.length; i++) {
            out[i] = rows[i][column];
        }
        return out;
    }
}
