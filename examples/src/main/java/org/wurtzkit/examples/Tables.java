package org.wurtzkit.examples;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.CsvTable;

/**
 * The examples' own CSV tables, written with Apache Commons CSV in the same form as the library's
 * workflow results ({@link CsvTable}): RFC 4180, one header line of {@code name_unit} cells
 * ({@link Column#header()}), numbers as {@link Double#toString(double)}, an empty cell for a value
 * that does not exist. Every file starts with one comment line ({@link #NOTE}, marked with
 * {@code #}) saying that the data is invented demo data; read it with a comment marker, e.g.
 * {@code pandas.read_csv(f, comment="#")} or Commons CSV's {@code setCommentMarker('#')}.
 */
final class Tables {
    /** The comment line at the top of every CSV file of the examples (without its marker). */
    static final String NOTE = DemoLab.INVENTED + ": model estimates of wurtzkit, not measurements";

    private final List<Column> columns;
    private final List<List<String>> rows = new ArrayList<>();

    private Tables(List<Column> columns) {
        this.columns = List.copyOf(columns);
    }

    /** @param columns the columns, in order @return an empty table */
    static Tables of(Column... columns) {
        return new Tables(List.of(columns));
    }

    /**
     * Adds a row; numbers become {@link CsvTable#cell(double)}, everything else its string.
     *
     * @param cells one per column
     * @return this table
     */
    Tables row(Object... cells) {
        if (cells.length != columns.size()) {
            throw new IllegalArgumentException("row of " + cells.length + " cells, the table has " + columns.size()
                    + " columns");
        }
        List<String> r = new ArrayList<>(cells.length);
        for (Object o : cells) {
            r.add(o instanceof Double d ? CsvTable.cell(d) : String.valueOf(o));
        }
        rows.add(r);
        return this;
    }

    /** @return number of data rows */
    int rowCount() {
        return rows.size();
    }

    /**
     * Writes the table (UTF-8), replacing the file.
     *
     * @param file the file
     * @return the file
     * @throws IOException from the file system
     */
    Path write(Path file) throws IOException {
        String[] header = columns.stream().map(Column::header).toArray(String[]::new);
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
                CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180.builder()
                        .setCommentMarker('#').setHeaderComments(NOTE).setHeader(header).get())) {
            for (List<String> r : rows) {
                p.printRecord(r);
            }
        }
        return file;
    }

    /**
     * Writes a library result table after the comment line.
     *
     * @param table the result
     * @param file  the file
     * @return the file
     * @throws IOException from the file system
     */
    static Path write(CsvTable table, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("# " + NOTE + "\r\n");
            table.writeCsv(w);
        }
        return file;
    }
}
