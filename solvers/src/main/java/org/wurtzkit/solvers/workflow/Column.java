package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * A named column of a result table and its unit. The CSV header is {@code name_unit}, e.g.
 * {@code gate_bias_V} or {@code sheet_density_cm^-2}; an empty unit marks a dimensionless or text
 * column, whose header is the bare name.
 *
 * @param name a name without commas, quotes or line breaks, not blank
 * @param unit the unit as written in the header (may be empty), without commas, quotes or line breaks
 */
public record Column(String name, String unit) {
    /** Validates. */
    public Column {
        Require.nonNull("column name", name);
        Require.nonNull("column unit", unit);
        if (name.isBlank() || !plain(name)) {
            throw new InvalidParameterException("column name", "\"" + name + "\"",
                    "non-blank text without commas, quotes or line breaks");
        }
        if (!plain(unit)) {
            throw new InvalidParameterException("column unit", "\"" + unit + "\"",
                    "text without commas, quotes or line breaks");
        }
    }

    private static boolean plain(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == ',' || c == '"' || c == '\n' || c == '\r') {
                return false;
            }
        }
        return true;
    }

    /**
     * @param name column name
     * @param unit unit ("" for none)
     * @return the column
     */
    public static Column of(String name, String unit) {
        return new Column(name, unit);
    }

    /** {@return the CSV header, {@code name_unit}, or {@code name} for an empty unit} */
    public String header() {
        return unit.isEmpty() ? name : name + "_" + unit;
    }

    /** @return the name with its unit in brackets, e.g. {@code "gate_bias (V)"}, or the bare name */
    @Override
    public String toString() {
        return unit.isEmpty() ? name : name + " (" + unit + ")";
    }
}
