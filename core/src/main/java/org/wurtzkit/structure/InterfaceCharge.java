package org.wurtzkit.structure;

import org.wurtzkit.units.Decimals;
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

    /**
     * @return e.g. {@code "interface spacer/buffer at 25 nm: sigma = 0.0175056 C/m^2 (1.09263e13 e/cm^2)"};
     *         the surface reads {@code "surface (vacuum/cap) at 0 nm: ..."}
     */
    @Override
    public String toString() {
        String where = "vacuum".equals(upperLayer) ? "surface (vacuum/" + lowerLayer + ")"
                : "interface " + upperLayer + "/" + lowerLayer;
        return where + " at " + Decimals.format(depthNm(), "nm") + ": sigma = " + Decimals.format(sigma, "C/m^2")
                + " (" + Decimals.format(sheetDensityPerCm2(), "e/cm^2") + ")";
    }
}
