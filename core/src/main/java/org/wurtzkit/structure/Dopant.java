package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * A shallow dopant species in a layer: density, ionization energy (from the conduction band for a
 * donor, from the valence band for an acceptor) and ground-state degeneracy factor. Ionization is
 * computed by the solver from the Fermi level (incomplete ionization).
 *
 * @param kind              donor or acceptor
 * @param densityPerM3      density (m^-3), &ge; 0
 * @param ionizationEnergyEv ionization energy (eV), in [0, 2]
 * @param degeneracy        degeneracy factor g, &gt; 0 (2 for donors, 4 for acceptors is usual)
 */
public record Dopant(Kind kind, double densityPerM3, double ionizationEnergyEv, double degeneracy) {
    /** Donor or acceptor. */
    public enum Kind {
        /** Positive when ionized. */
        DONOR,
        /** Negative when ionized. */
        ACCEPTOR
    }

    /** Largest accepted dopant density (m^-3): 1e22 cm^-3. */
    public static final double MAX_DENSITY_PER_M3 = 1e28;

    /** Validates. */
    public Dopant {
        Require.nonNull("dopant kind", kind);
        Require.inRange("dopant density (m^-3)", densityPerM3, 0, MAX_DENSITY_PER_M3);
        Require.inRange("dopant ionization energy (eV)", ionizationEnergyEv, 0, 2);
        Require.positive("dopant degeneracy factor", degeneracy);
    }

    /** Donor ground-state degeneracy g_D = 2 (spin; Sze &amp; Ng, Physics of Semiconductor Devices, 3rd ed., 2007, ch. 1). */
    public static final double DONOR_DEGENERACY = 2.0;
    /**
     * Acceptor ground-state degeneracy g_A = 4 (spin times the two degenerate valence bands at k = 0
     * of cubic semiconductors; Sze &amp; Ng 2007, ch. 1).
     */
    public static final double ACCEPTOR_DEGENERACY = 4.0;

    /**
     * Donors with degeneracy factor {@link #DONOR_DEGENERACY}.
     *
     * @param densityPerCm3      donor density (cm^-3)
     * @param ionizationEnergyEv E_c - E_D (eV); Si in GaN: about 0.015-0.030 eV (from memory, no source)
     * @return the dopant
     */
    public static Dopant donorsPerCm3(double densityPerCm3, double ionizationEnergyEv) {
        return new Dopant(Kind.DONOR, Units.perCm3ToPerM3(densityPerCm3), ionizationEnergyEv, DONOR_DEGENERACY);
    }

    /**
     * Acceptors with degeneracy factor {@link #ACCEPTOR_DEGENERACY}.
     *
     * @param densityPerCm3      acceptor density (cm^-3)
     * @param ionizationEnergyEv E_A - E_v (eV); Mg in GaN: about 0.17 eV (from memory, no source)
     * @return the dopant
     */
    public static Dopant acceptorsPerCm3(double densityPerCm3, double ionizationEnergyEv) {
        return new Dopant(Kind.ACCEPTOR, Units.perCm3ToPerM3(densityPerCm3), ionizationEnergyEv, ACCEPTOR_DEGENERACY);
    }

    /** {@return density (cm^-3)} */
    public double densityPerCm3() {
        return Units.perM3ToPerCm3(densityPerM3);
    }

    /** @return e.g. {@code "donors 1e18 cm^-3, ionization energy 0.015 eV, g = 2"} */
    @Override
    public String toString() {
        return (kind == Kind.DONOR ? "donors " : "acceptors ") + Decimals.format(Units.perM3ToPerCm3(densityPerM3), "cm^-3")
                + ", ionization energy " + Decimals.format(ionizationEnergyEv, "eV") + ", g = " + Decimals.format(degeneracy);
    }
}
