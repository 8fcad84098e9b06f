package org.wurtzkit.solvers.sp;

import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * One subband of a quantum window.
 *
 * @param window           index of its window
 * @param index            0 for the ground state
 * @param energyEv         E_k - E_F (eV)
 * @param wavefunction     psi on the full mesh (1/sqrt(m)), zero outside the window, normalised to
 *                         sum psi^2 w = 1 over the box widths
 * @param sheetDensity     occupation (m^-2)
 * @param inPlaneMass      in-plane mass averaged over |psi|^2 (relative to m0)
 */
public record Subband(int window, int index, double energyEv, double[] wavefunction, double sheetDensity,
        double inPlaneMass) {
    /** Copies the wavefunction. */
    public Subband {
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

    /** @return e.g. {@code "subband 0 of window 0: E - E_F = -0.152 eV, 6.12e12 cm^-2, in-plane mass 0.2 m0"} */
    @Override
    public String toString() {
        return "subband " + index + " of window " + window + ": E - E_F = " + Decimals.format(energyEv, "eV") + ", "
                + Decimals.format(sheetDensityPerCm2(), "cm^-2") + ", in-plane mass "
                + Decimals.format(inPlaneMass, "m0");
    }
}
