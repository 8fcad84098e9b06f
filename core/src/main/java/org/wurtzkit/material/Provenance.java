package org.wurtzkit.material;

import java.util.List;

/**
 * Where a resolved parameter value comes from: the rule that produced it and the sources of the
 * numbers the rule used.
 *
 * @param rule    e.g. "tabulated", "Vegard's law", "Vegard's law with bowing b = 0.7 eV"
 * @param sources the sources of every number used (never empty)
 */
public record Provenance(String rule, List<Source> sources) {
    /**
     * Creates the record; copies the list.
     *
     * @param rule    e.g. "tabulated", "Vegard's law", "Vegard's law with bowing b = 0.7 eV"
     * @param sources the sources of every number used (never empty)
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public Provenance {
        org.wurtzkit.errors.Require.nonNull("provenance rule", rule);
        org.wurtzkit.errors.Require.nonNull("provenance sources", sources);
        if (sources.isEmpty()) {
            throw new org.wurtzkit.errors.InvalidParameterException("number of provenance sources", "0",
                    "[1, ...) (every value names at least one source)");
        }
        sources = List.copyOf(sources);
    }

    /**
     * @param source the table the value was read from
     * @return a "tabulated" provenance
     */
    public static Provenance tabulated(Source source) {
        return new Provenance("tabulated", List.of(source));
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(rule).append(" [");
        for (int i = 0; i < sources.size(); i++) {
            sb.append(i == 0 ? "" : "; ").append(sources.get(i).key());
        }
        return sb.append(']').toString();
    }
}
