package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/** Gathers the warnings of the points of a sweep: each kind once, at its first point, with a count of the others. */
final class PointWarnings {
    private PointWarnings() {
    }

    /**
     * @param solutions the converged points (null for failed ones)
     * @param labels    how each point is named, e.g. {@code "V_g = -2 V"}
     * @return one warning per kind that some point raised, in order of first appearance
     */
    static List<Warning> of(Solution[] solutions, String[] labels) {
        Map<WarningKind, Warning> first = new EnumMap<>(WarningKind.class);
        Map<WarningKind, Integer> count = new EnumMap<>(WarningKind.class);
        List<WarningKind> order = new ArrayList<>();
        for (int i = 0; i < solutions.length; i++) {
            if (solutions[i] == null) {
                continue;
            }
            List<WarningKind> seenHere = new ArrayList<>();
            for (Warning w : solutions[i].warnings()) {
                if (seenHere.contains(w.kind())) {
                    continue;
                }
                seenHere.add(w.kind());
                if (!first.containsKey(w.kind())) {
                    first.put(w.kind(), new Warning(w.kind(), "at " + labels[i] + ": " + w.message()));
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
            out.add(more == 0 ? w : new Warning(k, w.message() + " (and at " + more + (more == 1 ? " other point)" : " other points)")));
        }
        return List.copyOf(out);
    }
}
