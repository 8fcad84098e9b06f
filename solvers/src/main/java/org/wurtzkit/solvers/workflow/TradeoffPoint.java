// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.Locale;
import org.wurtzkit.errors.Require;
import org.wurtzkit.warnings.Warning;

/**
 * One stack of a {@link DesignTradeoff}. A failed stack has NaN numbers, is in no band and on no
 * front; {@link TradeoffResult#failure(int)} says why.
 *
 * @param index                       the point's index (row-major, last axis fastest)
 * @param design                      the axis values
 * @param sheetDensityPerCm2          2DEG sheet density at 0 V (cm^-2)
 * @param thresholdVoltageV           threshold voltage of the full solver (V)
 * @param mobilityCm2PerVs            2DEG mobility at 0 V (cm^2/Vs)
 * @param sheetResistanceOhmPerSquare sheet resistance at 0 V (Ohm/sq)
 * @param leakageAPerCm2              gate leakage current density at the reverse bias (A/cm^2),
 *                                    negative in reverse bias as for a Schottky diode
 * @param inBand                      whether the point counts for the front (its V_th in the band, or
 *                                    no band set) and it was computed
 * @param onFront                     whether it is on the Pareto front of R_sh against |J| in the band
 * @param warnings                    what the stack, its sweep, its mobility and its leakage rest on that may not hold (typed)
 */
public record TradeoffPoint(int index, double[] design, double sheetDensityPerCm2, double thresholdVoltageV,
        double mobilityCm2PerVs, double sheetResistanceOhmPerSquare, double leakageAPerCm2, boolean inBand,
        boolean onFront, List<Warning> warnings) {
    /**
     * Validates and copies.
     *
     * @param index the point's index (row-major, last axis fastest)
     * @param design the axis values
     * @param sheetDensityPerCm2 2DEG sheet density at 0 V (cm^-2)
     * @param thresholdVoltageV threshold voltage of the full solver (V)
     * @param mobilityCm2PerVs 2DEG mobility at 0 V (cm^2/Vs)
     * @param sheetResistanceOhmPerSquare sheet resistance at 0 V (Ohm/sq)
     * @param leakageAPerCm2 gate leakage current density at the reverse bias (A/cm^2), negative in reverse bias as for a Schottky diode
     * @param inBand whether the point counts for the front (its V_th in the band, or no band set) and it was computed
     * @param onFront whether it is on the Pareto front of R_sh against |J| in the band
     * @param warnings what the stack, its sweep, its mobility and its leakage rest on that may not hold (typed)
     */
    public TradeoffPoint {
        design = Require.nonNull("design values", design).clone();
        warnings = List.copyOf(Require.nonNull("warnings", warnings));
    }

    /** {@return a copy of the axis values} */
    @Override
    public double[] design() {
        return design.clone();
    }

    /** Equal when every component is equal, the design values compared element by element. */
    @Override
    public boolean equals(Object o) {
        return o instanceof TradeoffPoint p && index == p.index && java.util.Arrays.equals(design, p.design)
                && Double.compare(sheetDensityPerCm2, p.sheetDensityPerCm2) == 0
                && Double.compare(thresholdVoltageV, p.thresholdVoltageV) == 0
                && Double.compare(mobilityCm2PerVs, p.mobilityCm2PerVs) == 0
                && Double.compare(sheetResistanceOhmPerSquare, p.sheetResistanceOhmPerSquare) == 0
                && Double.compare(leakageAPerCm2, p.leakageAPerCm2) == 0 && inBand == p.inBand
                && onFront == p.onFront && warnings.equals(p.warnings);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(index, java.util.Arrays.hashCode(design), sheetDensityPerCm2, thresholdVoltageV,
                mobilityCm2PerVs, sheetResistanceOhmPerSquare, leakageAPerCm2, inBand, onFront, warnings);
    }

    /** {@return |J| at the reverse bias (A/cm^2), the leakage objective of the front} */
    public double leakageMagnitudeAPerCm2() {
        return Math.abs(leakageAPerCm2);
    }

    /** @return e.g. "point 7 [2.0, 0.25, 20.0]: n_s 9.1e12 cm^-2, V_th -3.9 V, R_sh 410 Ohm/sq, |J| 2.3e-6 A/cm^2, in band, on front" */
    @Override
    public String toString() {
        return String.format(Locale.ROOT, "point %d %s: n_s %.4g cm^-2, V_th %.4g V, mu %.5g cm^2/Vs, R_sh %.5g Ohm/sq, "
                + "|J| %.4g A/cm^2%s%s", index, java.util.Arrays.toString(design), sheetDensityPerCm2, thresholdVoltageV,
                mobilityCm2PerVs, sheetResistanceOhmPerSquare, Math.abs(leakageAPerCm2), inBand ? ", in band" : "",
                onFront ? ", on front" : "");
    }
}
