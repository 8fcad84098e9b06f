package org.wurtzkit.warnings;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import org.wurtzkit.errors.Require;

/**
 * One warning on a result: its kind, to branch on, and a message in English that names the values
 * involved.
 *
 * @param kind    what the warning is about
 * @param message the explanation, not blank
 */
public record Warning(WarningKind kind, String message) {
    /**
     * Validates.
     *
     * @param kind what the warning is about
     * @param message the explanation, not blank
     */
    public Warning {
        Require.nonNull("warning kind", kind);
        Require.nonNull("warning message", message);
        if (message.isBlank()) {
            throw new org.wurtzkit.errors.InvalidParameterException("warning message", "\"\"", "a non-blank text");
        }
    }

    /**
     * @param lists lists of warnings
     * @return their union in order of first appearance, equal warnings once
     */
    @SafeVarargs
    public static List<Warning> union(List<Warning>... lists) {
        LinkedHashSet<Warning> all = new LinkedHashSet<>();
        for (List<Warning> l : lists) {
            all.addAll(l);
        }
        return List.copyOf(new ArrayList<>(all));
    }

    /**
     * Gathers the warnings of the points of a sweep, map or study: each kind once, at the first point
     * that raised it (its message prefixed with {@code "at <label>: "}), with the count of the other
     * points that raised it.
     *
     * @param perPoint the warnings of each point, in point order; null for a point without a result
     * @param labels   how each point is named, e.g. {@code "V_g = -2 V"}; as many as points
     * @return one warning per kind that some point raised, in order of first appearance
     * @throws org.wurtzkit.errors.InvalidParameterException if the two lists differ in length
     */
    public static List<Warning> aggregate(List<List<Warning>> perPoint, List<String> labels) {
        Require.nonNull("warnings per point", perPoint);
        Require.nonNull("point labels", labels);
        if (perPoint.size() != labels.size()) {
            throw new org.wurtzkit.errors.InvalidParameterException("number of point labels",
                    Integer.toString(labels.size()), "[" + perPoint.size() + ", " + perPoint.size() + "] (one per point)");
        }
        Map<WarningKind, Warning> first = new EnumMap<>(WarningKind.class);
        Map<WarningKind, Integer> count = new EnumMap<>(WarningKind.class);
        List<WarningKind> order = new ArrayList<>();
        for (int i = 0; i < perPoint.size(); i++) {
            List<Warning> here = perPoint.get(i);
            if (here == null) {
                continue;
            }
            List<WarningKind> seenHere = new ArrayList<>();
            for (Warning w : here) {
                if (seenHere.contains(w.kind())) {
                    continue;
                }
                seenHere.add(w.kind());
                if (!first.containsKey(w.kind())) {
                    first.put(w.kind(), new Warning(w.kind(), "at " + labels.get(i) + ": " + w.message()));
                    order.add(w.kind());
                    count.put(w.kind(), 0);
                } else {
                    count.merge(w.kind(), 1, Integer::sum);
                }
            }
        }
        List<Warning> out = new ArrayList<>();
        for (WarningKind k : order) {
            int more = count.get(k);
            Warning w = first.get(k);
            out.add(more == 0 ? w : new Warning(k, w.message() + " (and at " + more
                    + (more == 1 ? " other point)" : " other points)")));
        }
        return List.copyOf(out);
    }

    /**
     * @param warnings warnings
     * @return one line per warning, each {@code "\n  warning: ..."}, or the empty string
     */
    public static String lines(List<Warning> warnings) {
        StringBuilder sb = new StringBuilder();
        for (Warning w : warnings) {
            sb.append("\n  warning: ").append(w.message());
        }
        return sb.toString();
    }

    /** @return {@code "warning (KIND): message"} */
    @Override
    public String toString() {
        return "warning (" + kind + "): " + message;
    }
}
