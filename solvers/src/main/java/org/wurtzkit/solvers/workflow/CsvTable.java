package org.wurtzkit.solvers.workflow;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.wurtzkit.errors.Require;

/**
 * A result that can be written as a CSV table: one header line naming every column and its unit
 * ({@link Column#header()}), then one record per row. Written with Apache Commons CSV
 * ({@link CSVFormat#RFC4180}, line separator "\r\n" as RFC 4180 prescribes). Numbers are written
 * with {@link Double#toString(double)}, which reads back to the identical double; a value that
 * does not exist (a failed point) is an empty cell, and the row's {@code status} column says why.
 */
public interface CsvTable {
    /** {@return the columns, in order} */
    List<Column> columns();

    /** {@return number of data rows} */
    int rowCount();

    /**
     * @param row a row index in [0, rowCount())
     * @return the cells of that row, one per column, already formatted
     */
    List<String> row(int row);

    /** {@return the header line's cells} */
    default List<String> headers() {
        return columns().stream().map(Column::header).toList();
    }

    /**
     * Writes the table. The writer is flushed, not closed.
     *
     * @param out where to write
     * @throws IOException from the writer
     */
    default void writeCsv(Writer out) throws IOException {
        Require.nonNull("writer", out);
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader(headers().toArray(new String[0])).get();
        CSVPrinter printer = new CSVPrinter(out, format);
        for (int i = 0; i < rowCount(); i++) {
            printer.printRecord(row(i));
        }
        printer.flush();
    }

    /**
     * Writes the table to a file (UTF-8), replacing it if it exists.
     *
     * @param path the file
     * @throws IOException from the file system
     */
    default void writeCsv(Path path) throws IOException {
        Require.nonNull("path", path);
        try (Writer w = Files.newBufferedWriter(path, StandardCharsets.UTF_8)) {
            writeCsv(w);
        }
    }

    /**
     * The table as CSV text, exactly what {@link #writeCsv(Writer)} writes.
     *
     * @return the CSV text, header line first, lines ended by "\r\n"
     */
    default String toCsvString() {
        StringWriter w = new StringWriter();
        try {
            writeCsv(w);
        } catch (IOException e) {
            // a StringWriter does not throw; Commons CSV declares the exception for other writers
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }

    /**
     * The table as aligned text to read in jshell or a notebook: the header (names with units),
     * then the rows, each number shortened to six significant digits ({@link
     * org.wurtzkit.units.Decimals}); a long table shows its first and last rows and says how many
     * it leaves out. For reading only: CSV keeps every digit.
     *
     * @param maxRows most rows shown, &ge; 2
     * @return the text, lines separated by '\n', without a final line break
     */
    default String preview(int maxRows) {
        Require.inRange("rows shown in a preview", maxRows, 2, Integer.MAX_VALUE);
        return TableText.render(this, maxRows);
    }

    /**
     * @param v a value, NaN for "none"
     * @return its cell text: {@link Double#toString(double)}, or "" for NaN
     */
    static String cell(double v) {
        return Double.isNaN(v) ? "" : Double.toString(v);
    }
}
