package org.wurtzkit.solvers.workflow;

import java.util.List;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.warnings.Warning;

/**
 * A threshold voltage read off a computed n_s(V_g) curve, with what may make it mislead.
 *
 * @param voltageV   V_th (V)
 * @param definition how it was read off
 * @param warnings   e.g. {@link org.wurtzkit.warnings.WarningKind#THRESHOLD_OUTSIDE_SWEPT_RANGE}
 *                   when the straight line met n_s = 0 outside the biases computed
 */
public record Threshold(double voltageV, ThresholdDefinition definition, List<Warning> warnings) {
    /**
     * Validates and copies.
     *
     * @param voltageV V_th (V)
     * @param definition how it was read off
     * @param warnings e.g. {@link org.wurtzkit.warnings.WarningKind#THRESHOLD_OUTSIDE_SWEPT_RANGE} when the straight line met n_s = 0 outside the biases computed
     */
    public Threshold {
        Require.finite("threshold voltage (V)", voltageV);
        Require.nonNull("threshold definition", definition);
        warnings = List.copyOf(warnings);
    }

    /** @return e.g. {@code "V_th = -3.21 V (threshold at n_s = 1e11 cm^-2)"} and one line per warning */
    @Override
    public String toString() {
        return "V_th = " + Decimals.format(voltageV, "V") + " (" + definition + ")" + Warning.lines(warnings);
    }
}
