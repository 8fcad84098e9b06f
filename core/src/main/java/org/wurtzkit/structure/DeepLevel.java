package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * A deep level (trap) of uniform density in a layer. A donor-like level is positive when empty, an
 * acceptor-like level negative when filled; occupation follows Fermi-Dirac statistics with
 * degeneracy factor 1.
 *
 * @param kind                 donor-like or acceptor-like
 * @param densityPerM3         density (m^-3), &ge; 0
 * @param energyBelowConductionEv E_c - E_T (eV), &ge; 0; must lie inside the gap of the host
 */
public record DeepLevel(Kind kind, double densityPerM3, double energyBelowConductionEv) {
    /** Charge character of the level. */
    public enum Kind {
        /** Neutral when filled, +q when empty. */
        DONOR_LIKE,
        /** Neutral when empty, -q when filled. */
        ACCEPTOR_LIKE
    }

    /** Validates. */
    public DeepLevel {
        Require.nonNull("deep level kind", kind);
        Require.inRange("deep level density (m^-3)", densityPerM3, 0, Dopant.MAX_DENSITY_PER_M3);
        Require.inRange("deep level energy below E_c (eV)", energyBelowConductionEv, 0, 7);
    }

    /**
     * @param densityPerCm3     density (cm^-3)
     * @param energyBelowEcEv   E_c - E_T (eV)
     * @return an acceptor-like level (e.g. C_N in GaN, about E_v + 0.9 eV; from memory, no source)
     */
    public static DeepLevel acceptorLikePerCm3(double densityPerCm3, double energyBelowEcEv) {
        return new DeepLevel(Kind.ACCEPTOR_LIKE, Units.perCm3ToPerM3(densityPerCm3), energyBelowEcEv);
    }

    /**
     * @param densityPerCm3     density (cm^-3)
     * @param energyBelowEcEv   E_c - E_T (eV)
     * @return a donor-like level
     */
    public static DeepLevel donorLikePerCm3(double densityPerCm3, double energyBelowEcEv) {
        return new DeepLevel(Kind.DONOR_LIKE, Units.perCm3ToPerM3(densityPerCm3), energyBelowEcEv);
    }

    /** @return e.g. {@code "acceptor-like level 1e17 cm^-3 at E_c - 2.6 eV"} */
    @Override
    public String toString() {
        return (kind == Kind.DONOR_LIKE ? "donor-like" : "acceptor-like") + " level "
                + Decimals.format(Units.perM3ToPerCm3(densityPerM3), "cm^-3") + " at E_c - "
                + Decimals.format(energyBelowConductionEv, "eV");
    }
}
