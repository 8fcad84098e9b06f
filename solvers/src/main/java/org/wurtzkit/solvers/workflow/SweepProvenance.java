// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.warnings.Warning;

/**
 * The provenance of a workflow result: of a sweep over one parameter (bias and temperature sweeps),
 * and of maps, spreads, searches and studies, whose run descriptions their results compose. The one
 * place where a failed point and a typed warning become provenance lines.
 */
final class SweepProvenance {
    private SweepProvenance() {
    }

    /**
     * @param computation what ran, e.g. "bias sweep"
     * @param key         the run key of the swept values, e.g. "biasesV"
     * @param values      the swept values in solving order
     * @param structure   the structure as given to the sweep
     * @param options     the solver options
     * @param failures    the failed points
     * @param warnings    the sweep's typed warnings
     * @return the provenance: every value written by {@link Double#toString(double)}, a warning for
     *         every failed point, then the sweep's warnings
     */
    static ResultProvenance of(String computation, String key, double[] values, Structure structure,
            SolverOptions options, List<PointFailure> failures, List<Warning> warnings) {
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", computation);
        run.put(key, values(values));
        return of(run, structure, options, failures, warnings);
    }

    /**
     * @param values numbers
     * @return each written by {@link Double#toString(double)}, separated by one space
     */
    static String values(double[] values) {
        StringBuilder b = new StringBuilder();
        for (double v : values) {
            b.append(b.length() == 0 ? "" : " ").append(Double.toString(v));
        }
        return b.toString();
    }

    /**
     * @param text numbers as {@link #values(double[])} writes them
     * @return the numbers
     */
    static double[] parseValues(String text) {
        if (text.isEmpty()) {
            return new double[0];
        }
        String[] parts = text.split(" ");
        double[] out = new double[parts.length];
        for (int i = 0; i < parts.length; i++) {
            out[i] = Double.parseDouble(parts[i]);
        }
        return out;
    }

    /**
     * @param run       what was computed, {@code computation} first
     * @param structure the structure recorded
     * @param options   the solver options
     * @param failures  the failed points
     * @param warnings  the result's typed warnings
     * @return the provenance: a warning line for every failed point, then the result's warnings
     */
    static ResultProvenance of(Map<String, String> run, Structure structure, SolverOptions options,
            List<PointFailure> failures, List<Warning> warnings) {
        List<String> w = new ArrayList<>();
        for (PointFailure f : failures) {
            w.add("point failed: " + f);
        }
        for (Warning x : warnings) {
            w.add(x.toString());
        }
        return ResultProvenance.of(structure, options.settings(), run, w);
    }
}
