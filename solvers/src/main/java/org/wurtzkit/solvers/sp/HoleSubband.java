package org.wurtzkit.solvers.sp;

import java.util.Objects;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * One hole subband of a quantum window (see {@link HoleStates}). Immutable; keeps only the
 * window's part of the wavefunction and builds the full-mesh array on each call of
 * {@link #wavefunction()}. Two hole subbands are equal when every component is equal, the
 * wavefunction compared value by value.
 */
public final class HoleSubband {
    private final int window;
    private final ValenceBands.Kind band;
    private final int index;
    private final double energyEv;
    private final WindowedWavefunction psi;
    private final double sheetDensity;
    private final double inPlaneMass;

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
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code wavefunction} is null
     */
    public HoleSubband(int window, ValenceBands.Kind band, int index, double energyEv, double[] wavefunction,
            double sheetDensity, double inPlaneMass) {
        this(window, band, index, energyEv,
                WindowedWavefunction.ofFull(Require.nonNull("wavefunction", wavefunction)), sheetDensity, inPlaneMass);
    }

    /** The solver's form: psi given on its window only (the part is taken over, not copied). */
    HoleSubband(int window, ValenceBands.Kind band, int index, double energyEv, WindowedWavefunction psi,
            double sheetDensity, double inPlaneMass) {
        this.window = window;
        this.band = band;
        this.index = index;
        this.energyEv = energyEv;
        this.psi = psi;
        this.sheetDensity = sheetDensity;
        this.inPlaneMass = inPlaneMass;
    }

    /** {@return index of the window} */
    public int window() {
        return window;
    }

    /** {@return heavy, light or crystal-field hole} */
    public ValenceBands.Kind band() {
        return band;
    }

    /** {@return index within the window and band, from the top of the valence band down} */
    public int index() {
        return index;
    }

    /** {@return its level on the band diagram's electron-energy scale (eV): below the valence-band edge of the well} */
    public double energyEv() {
        return energyEv;
    }

    /** {@return psi on every node of the solution (1/sqrt(m)), zero outside the window; a new array on each call} */
    public double[] wavefunction() {
        return psi.full();
    }

    /** {@return holes in the subband (m^-2)} */
    public double sheetDensity() {
        return sheetDensity;
    }

    /** {@return mass of its two-dimensional density of states (m0), |psi|^2-weighted} */
    public double inPlaneMass() {
        return inPlaneMass;
    }

    /** {@return occupation (cm^-2)} */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(sheetDensity);
    }

    /**
     * Equal when window, band, index, energy, occupation, mass and every value of the wavefunction
     * are equal (doubles compared as by {@link Double#equals}).
     *
     * @param o the other object
     * @return whether it is an equal hole subband
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof HoleSubband s && window == s.window && band == s.band && index == s.index
                && Double.compare(energyEv, s.energyEv) == 0 && Double.compare(sheetDensity, s.sheetDensity) == 0
                && Double.compare(inPlaneMass, s.inPlaneMass) == 0 && psi.sameValues(s.psi);
    }

    /** {@return a hash consistent with {@link #equals(Object)}} */
    @Override
    public int hashCode() {
        int h = 31 * window + Objects.hashCode(band);
        h = 31 * h + index;
        h = 31 * h + Double.hashCode(energyEv);
        h = 31 * h + Double.hashCode(sheetDensity);
        h = 31 * h + Double.hashCode(inPlaneMass);
        return 31 * h + psi.valueHash();
    }

    /** @return e.g. {@code "HEAVY hole subband 0 of window 0: E = -3.512 eV, 6.1e12 cm^-2, in-plane mass 2.0 m0"} */
    @Override
    public String toString() {
        return band + " hole subband " + index + " of window " + window + ": E = " + Decimals.format(energyEv, "eV")
                + ", " + Decimals.format(sheetDensityPerCm2(), "cm^-2") + ", in-plane mass "
                + Decimals.format(inPlaneMass, "m0");
    }
}
