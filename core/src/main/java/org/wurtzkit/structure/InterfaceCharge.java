package org.wurtzkit.structure;

import org.wurtzkit.units.Units;

/**
 * The polarization bound sheet charge at one interface, sigma = P_z(lower) - P_z(upper) with z along
 * growth (rho_b = -div P); electrons accumulate where sigma &gt; 0.
 *
 * @param depth      depth of the interface below the surface (m)
 * @param upperLayer name of the layer above ("surface" side), or "vacuum" for the surface
 * @param lowerLayer name of the layer below
 * @param sigma      bound sheet charge (C/m&sup2;)
 */
public record InterfaceCharge(double depth, String upperLayer, String lowerLayer, double sigma) {
    /** {@return sigma / e (cm^-2), signed} */
    public double sheetDensityPerCm2() {
        return Units.chargeToPerCm2(sigma);
    }

    /** {@return depth (nm)} */
    public double depthNm() {
        return Units.mToNm(depth);
    }
}
