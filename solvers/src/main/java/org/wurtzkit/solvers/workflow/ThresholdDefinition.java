package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;

/**
 * How a threshold voltage is read off a computed n_s(V_g) curve. Both definitions are the HEMT
 * analogues (sheet density in place of drain current, which is proportional to it at low drain
 * bias) of methods reviewed for MOSFETs by A. Ortiz-Conde, F. J. Garcia Sanchez, J. J. Liou, A.
 * Cerdeira, M. Estrada and Y. Yue, "A review of recent MOSFET threshold voltage extraction
 * methods", Microelectron. Reliab. 42, 583 (2002) (citation from memory):
 *
 * <ul>
 * <li>{@link ConstantDensity}: the "constant-current" method, the bias at which n_s crosses a
 * chosen level;</li>
 * <li>{@link LinearExtrapolation}: the "extrapolation in the linear region" method, the bias at
 * which the tangent to n_s(V_g) at its maximum slope reaches n_s = 0.</li>
 * </ul>
 */
public sealed interface ThresholdDefinition permits ThresholdDefinition.ConstantDensity,
        ThresholdDefinition.LinearExtrapolation {

    /**
     * V_th is the lowest bias at which n_s rises through a fixed level. Between two computed
     * points ln n_s is interpolated linearly in V_g (exact for the exponential subthreshold tail;
     * linear interpolation of n_s is used where the lower point has n_s = 0). Near threshold n_s
     * turns from linear to exponential in V_g, where this interpolation is only as good as the bias
     * step: use steps of 0.25 V or less around threshold.
     *
     * @param levelPerCm2 the level (cm^-2), finite and &gt; 0
     */
    record ConstantDensity(double levelPerCm2) implements ThresholdDefinition {
        /** Validates. */
        public ConstantDensity {
            Require.positive("threshold sheet-density level (cm^-2)", levelPerCm2);
        }

        @Override
        public String describe() {
            return "n_s = " + Decimals.format(levelPerCm2, "cm^-2");
        }

        /** @return e.g. {@code "threshold at n_s = 1e11 cm^-2"} */
        @Override
        public String toString() {
            return "threshold at " + describe();
        }
    }

    /**
     * V_th is where the straight line through the two neighbouring points of largest slope
     * dn_s/dV_g meets n_s = 0. For a HEMT the slope grows slowly with V_g (the charge centroid
     * approaches the interface), so the result depends on the top of the bias range: keep the range
     * below the onset of conduction in the barrier (V_g well below phi_B).
     */
    record LinearExtrapolation() implements ThresholdDefinition {
        @Override
        public String describe() {
            return "linear extrapolation at maximum slope";
        }

        /** @return {@code "threshold by linear extrapolation at maximum slope"} */
        @Override
        public String toString() {
            return "threshold by " + describe();
        }
    }

    /** {@return a short description for reports} */
    String describe();

    /**
     * @param levelPerCm2 level (cm^-2)
     * @return the constant-density definition
     */
    static ThresholdDefinition constantDensity(double levelPerCm2) {
        return new ConstantDensity(levelPerCm2);
    }

    /** {@return the linear-extrapolation definition} */
    static ThresholdDefinition linearExtrapolation() {
        return new LinearExtrapolation();
    }
}
