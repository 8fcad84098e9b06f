package org.wurtzkit.solvers.transport.mobility;

import org.wurtzkit.errors.Require;

/**
 * A sheet of singly charged centres parallel to the interfaces (e.g. ionised surface donors, a delta
 * doping, charged interface states of a dielectric), for {@link RemoteCharge}.
 *
 * @param depth   depth below the surface (m), &ge; 0
 * @param density number of charges per area (m^-2), in [0, 1e19] (up to 1e15 cm^-2); the sign of the
 *                charge does not matter, the rate goes with its square
 */
public record ChargeSheet(double depth, double density) {
    /**
     * Validates.
     *
     * @param depth depth below the surface (m), &ge; 0
     * @param density number of charges per area (m^-2), in [0, 1e19] (up to 1e15 cm^-2); the sign of the charge does not matter, the rate goes with its square
     */
    public ChargeSheet {
        Require.nonNegative("charge sheet depth (m)", depth);
        Require.inRange("charge sheet density (m^-2)", density, 0, 1e19);
    }

    /**
     * @param depthNm       depth (nm), &ge; 0
     * @param densityPerCm2 charges per area (cm^-2), in [0, 1e15]
     * @return the sheet
     */
    public static ChargeSheet ofNm(double depthNm, double densityPerCm2) {
        Require.nonNegative("charge sheet depth (nm)", depthNm);
        Require.inRange("charge sheet density (cm^-2)", densityPerCm2, 0, 1e15);
        return new ChargeSheet(depthNm * 1e-9, densityPerCm2 * 1e4);
    }
}
