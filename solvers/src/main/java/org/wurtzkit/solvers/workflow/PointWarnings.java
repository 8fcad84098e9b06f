package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.warnings.Warning;

/**
 * Gathers the warnings of the points of a sweep, map or study: each kind once, at its first point,
 * with a count of the others ({@link Warning#aggregate}).
 */
final class PointWarnings {
    private PointWarnings() {
    }

    /**
     * @param solutions the converged points (null for failed ones)
     * @param labels    how each point is named, e.g. {@code "V_g = -2 V"}
     * @return one warning per kind that some point raised, in order of first appearance
     */
    static List<Warning> of(Solution[] solutions, String[] labels) {
        List<List<Warning>> per = new ArrayList<>(solutions.length);
        for (Solution s : solutions) {
            per.add(s == null ? null : s.warnings());
        }
        return Warning.aggregate(per, Arrays.asList(labels));
    }

    /**
     * @param perPoint the warnings of each point (null for failed ones)
     * @param labels   how each point is named
     * @return one warning per kind that some point raised, in order of first appearance
     */
    static List<Warning> of(List<Warning>[] perPoint, String[] labels) {
        return Warning.aggregate(Arrays.asList(perPoint), Arrays.asList(labels));
    }
}
