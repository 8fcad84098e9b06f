package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.Optional;
import org.wurtzkit.provenance.ResultProvenance;

/**
 * A small table already formatted in memory (a summary or a sensitivity table of a result): its
 * columns, its rows of cells and the provenance of the result it summarises.
 *
 * @param columns    the columns, in order
 * @param rows       the rows, each one formatted cell per column
 * @param provenance what produced the result it summarises, or empty
 */
record RowsTable(List<Column> columns, List<List<String>> rows, Optional<ResultProvenance> provenance)
        implements CsvTable {

    @Override
    public int rowCount() {
        return rows.size();
    }

    @Override
    public List<String> row(int row) {
        return rows.get(row);
    }
}
