package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.Require;

/**
 * One uncertain input of a {@link SampleDesign}: its name and unit (a result column) and its
 * distribution.
 *
 * @param column       name and unit
 * @param distribution how the input is distributed
 */
public record UncertainInput(Column column, Distribution distribution) {
    /** Validates. */
    public UncertainInput {
        Require.nonNull("input column", column);
        Require.nonNull("distribution of input " + column.name(), distribution);
    }

    /**
     * @param name         input name
     * @param unit         its unit ("" for none)
     * @param distribution its distribution
     * @return the input
     */
    public static UncertainInput of(String name, String unit, Distribution distribution) {
        return new UncertainInput(Column.of(name, unit), distribution);
    }
}
