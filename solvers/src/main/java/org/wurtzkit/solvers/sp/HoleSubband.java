package org.wurtzkit.solvers.sp;

import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.units.Units;

/**
 * One hole subband of a quantum window (see {@link HoleStates}).
 *
 * @param window       index of the window
 * @param band         heavy, light or crystal-field hole
 * @param index        index within the window and band, from the top of the valence band down
 * @param energyEv     its level on the band diagram's electron-energy scale (eV): below the valence-band
 *                     edge of the well
 * @param wavefunction psi on every node of the solution (1/sqrt(m)), zero outside the window
 * @param sheetDensity holes in the subband (m^-2)
 * @param inPlaneMass  mass of its two-dimensional density of states (m0), |psi|^2-weighted
 */
public record HoleSubband(int window, ValenceBands.Kind band, int index, double energyEv, double[] wavefunction,
        double sheetDensity, double inPlaneMass) {
    /**
     * Copies the wavefunction.
     *
     * @param window index of the window
     * @param band heavy, light or crystal-field hole
     * @param index index within the window and band, from the top of the valence band down
     * @param energyEv its level on the band diagram's electron-energy scale (eV): below the valence-band edge of the well
     * @param wavefunction psi on every node of the solution (1/sqrt(m)), zero outside the window
     * @param sheetDensity holes in the subband (m^-2)
     * @param inPlaneMass mass of its two-dimensional density of states (m0), |psi|^2-weighted
     */
    public HoleSubband {
        wavefunction = wavefunction.clone();
    }

    /** {@return a copy of psi (1/sqrt(m))} */
    @Override
    public double[] wavefunction() {
        return wavefunction.clone();
    }

    /** {@return occupation (cm^-2)} */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(sheetDensity);
    }
}
