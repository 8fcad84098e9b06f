package org.wurtzkit.solvers.transport.mobility;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.workflow.Column;
import org.wurtzkit.solvers.workflow.CsvTable;

/**
 * Mobility results as a table, one row per result (e.g. per temperature of
 * {@link Mobility#versusTemperature}): temperature, conducting sheet density, total mobility, sheet
 * resistance and the mobility limited by each mechanism. Every result must have the same mechanisms.
 * Immutable.
 */
public final class MobilityTable implements CsvTable {
    private final List<MobilityResult> results;
    private final List<Column> columns;

    /**
     * @param results the rows, at least one, all with the same mechanism names
     */
    public MobilityTable(List<MobilityResult> results) {
        this.results = List.copyOf(Require.nonNull("mobility results", results));
        if (this.results.isEmpty()) {
            throw new InvalidParameterException("number of mobility results", "0", "[1, ...)");
        }
        List<String> names = this.results.get(0).mechanisms();
        for (int i = 1; i < this.results.size(); i++) {
            if (!this.results.get(i).mechanisms().equals(names)) {
                throw new InvalidParameterException("mechanisms of mobility result " + i,
                        this.results.get(i).mechanisms().toString(), "the mechanisms of result 0, " + names);
            }
        }
        List<Column> c = new ArrayList<>(List.of(Column.of("temperature", "K"), Column.of("sheet_density", "cm^-2"),
                Column.of("mobility", "cm^2/Vs"), Column.of("sheet_resistance", "ohm/sq")));
        for (String n : names) {
            c.add(Column.of("mobility " + n, "cm^2/Vs"));
        }
        columns = List.copyOf(c);
    }

    /**
     * What produced this table, when every row comes from one source (the temperature sweep of
     * {@link Mobility#versusTemperature}, or one solution): that source's provenance with the run's
     * {@code computation} "mobility table", the source's run under keys prefixed {@code source.},
     * the mobility options and every row's warnings (each prefixed with its temperature). Rows of
     * several sources have no common provenance: then empty.
     *
     * @return the provenance, or empty
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        Object source = results.get(0).source();
        String options = results.get(0).optionsText();
        for (MobilityResult r : results) {
            if (r.source() != source || !r.optionsText().equals(options)) {
                return Optional.empty();
            }
        }
        return Optional.of(MobilityResult.provenance("mobility table", results));
    }

    /** @return the results, in row order */
    public List<MobilityResult> results() {
        return results;
    }

    @Override
    public List<Column> columns() {
        return columns;
    }

    @Override
    public int rowCount() {
        return results.size();
    }

    @Override
    public List<String> row(int i) {
        if (i < 0 || i >= results.size()) {
            throw new InvalidParameterException("row", Integer.toString(i), "[0, " + (results.size() - 1) + "]");
        }
        MobilityResult r = results.get(i);
        List<String> out = new ArrayList<>(List.of(CsvTable.cell(r.temperatureK()), CsvTable.cell(r.sheetDensityPerCm2()),
                CsvTable.cell(r.mobilityCm2PerVs()), CsvTable.cell(r.sheetResistanceOhmPerSquare())));
        for (String n : r.mechanisms()) {
            out.add(CsvTable.cell(r.mobilityCm2PerVs(n)));
        }
        return List.copyOf(out);
    }
}
