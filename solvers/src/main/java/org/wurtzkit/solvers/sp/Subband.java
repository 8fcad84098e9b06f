package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * One subband of a quantum window. Immutable; keeps only the window's part of the wavefunction
 * and builds the full-mesh array on each call of {@link #wavefunction()}. Two subbands are equal
 * when every component is equal, the wavefunction compared value by value.
 */
public final class Subband {
    private final int window;
    private final int index;
    private final double energyEv;
    private final WindowedWavefunction psi;
    private final double sheetDensity;
    private final double inPlaneMass;

    /**
     * Creates the subband; copies the wavefunction.
     *
     * @param window       index of its window
     * @param index        0 for the ground state
     * @param energyEv     E_k - E_F (eV)
     * @param wavefunction psi on the full mesh (1/sqrt(m)), zero outside the window, normalised to
     *                     sum psi^2 w = 1 over the box widths
     * @param sheetDensity occupation (m^-2)
     * @param inPlaneMass  in-plane mass averaged over |psi|^2 (relative to m0)
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code wavefunction} is null
     */
    public Subband(int window, int index, double energyEv, double[] wavefunction, double sheetDensity,
            double inPlaneMass) {
        this(window, index, energyEv, WindowedWavefunction.ofFull(Require.nonNull("wavefunction", wavefunction)),
                sheetDensity, inPlaneMass);
    }

    /** The solver's form: psi given on its window only (the part is taken over, not copied). */
    Subband(int window, int index, double energyEv, WindowedWavefunction psi, double sheetDensity, double inPlaneMass) {
        this.window = window;
        this.index = index;
        this.energyEv = energyEv;
        this.psi = psi;
        this.sheetDensity = sheetDensity;
        this.inPlaneMass = inPlaneMass;
    }

    /** {@return index of its window} */
    public int window() {
        return window;
    }

    /** {@return 0 for the ground state} */
    public int index() {
        return index;
    }

    /** {@return E_k - E_F (eV)} */
    public double energyEv() {
        return energyEv;
    }

    /**
     * {@return psi on the full mesh (1/sqrt(m)), zero outside the window, normalised to sum psi^2 w
     * = 1 over the box widths; a new array on each call}
     */
    public double[] wavefunction() {
        return psi.full();
    }

    /** {@return occupation (m^-2)} */
    public double sheetDensity() {
        return sheetDensity;
    }

    /** {@return in-plane mass averaged over |psi|^2 (relative to m0)} */
    public double inPlaneMass() {
        return inPlaneMass;
    }

    /** {@return occupation (cm^-2)} */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(sheetDensity);
    }

    /**
     * Equal when window, index, energy, occupation, mass and every value of the wavefunction are
     * equal (doubles compared as by {@link Double#equals}).
     *
     * @param o the other object
     * @return whether it is an equal subband
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof Subband s && window == s.window && index == s.index
                && Double.compare(energyEv, s.energyEv) == 0 && Double.compare(sheetDensity, s.sheetDensity) == 0
                && Double.compare(inPlaneMass, s.inPlaneMass) == 0 && psi.sameValues(s.psi);
    }

    /** {@return a hash consistent with {@link #equals(Object)}} */
    @Override
    public int hashCode() {
        int h = 31 * window + index;
        h = 31 * h + Double.hashCode(energyEv);
        h = 31 * h + Double.hashCode(sheetDensity);
        h = 31 * h + Double.hashCode(inPlaneMass);
        return 31 * h + psi.valueHash();
    }

    /** @return e.g. {@code "subband 0 of window 0: E - E_F = -0.152 eV, 6.12e12 cm^-2, in-plane mass 0.2 m0"} */
    @Override
    public String toString() {
        return "subband " + index + " of window " + window + ": E - E_F = " + Decimals.format(energyEv, "eV") + ", "
                + Decimals.format(sheetDensityPerCm2(), "cm^-2") + ", in-plane mass "
                + Decimals.format(inPlaneMass, "m0");
    }
}
