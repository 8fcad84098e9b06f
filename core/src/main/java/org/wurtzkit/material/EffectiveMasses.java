package org.wurtzkit.material;

import org.wurtzkit.units.Decimals;

/**
 * Band-edge effective masses relative to the free electron mass m0 (dimensionless).
 *
 * @param electronParallel       m_e along c
 * @param electronPerpendicular  m_e in the basal plane
 * @param heavyHoleParallel      m_hh along c
 * @param heavyHolePerpendicular m_hh in the basal plane
 */
public record EffectiveMasses(double electronParallel, double electronPerpendicular, double heavyHoleParallel,
        double heavyHolePerpendicular) {
    /** {@return density-of-states mass of the conduction band (m_perp&sup2; m_par)^(1/3)} */
    public double electronDensityOfStates() {
        return Math.cbrt(electronPerpendicular * electronPerpendicular * electronParallel);
    }

    /** {@return density-of-states mass of the heavy-hole band (m_perp&sup2; m_par)^(1/3)} */
    public double heavyHoleDensityOfStates() {
        return Math.cbrt(heavyHolePerpendicular * heavyHolePerpendicular * heavyHoleParallel);
    }

    /** @return e.g. {@code "m_e 0.2 m0 along c, 0.2 m0 in the plane; m_hh 1.1 m0 along c, 1.6 m0 in the plane"} */
    @Override
    public String toString() {
        return "m_e " + Decimals.format(electronParallel, "m0") + " along c, " + Decimals.format(electronPerpendicular, "m0")
                + " in the plane; m_hh " + Decimals.format(heavyHoleParallel, "m0") + " along c, "
                + Decimals.format(heavyHolePerpendicular, "m0") + " in the plane";
    }
}
