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

/** The provenance of a sweep over one parameter, shared by the bias and temperature sweeps. */
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
        StringBuilder b = new StringBuilder();
        for (double v : values) {
            b.append(b.length() == 0 ? "" : " ").append(Double.toString(v));
        }
        run.put(key, b.toString());
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
