package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;

/**
 * How the band edges of different materials line up.
 *
 * <ul>
 * <li>{@link ValenceBandTable} (default): each material's valence-band maximum is the tabulated (or
 * Vegard-interpolated) value of its parameter set; E_c = E_v + E_g(T).</li>
 * <li>{@link ConductionBandFraction}: E_c - E_c(GaN) = f (E_g - E_g(GaN)) at the solve's temperature,
 * the rule used e.g. by O. Ambacher et al., J. Appl. Phys. 87, 334 (2000) with f = 0.7 for AlGaN/GaN
 * (from memory).</li>
 * </ul>
 */
public sealed interface BandAlignment permits BandAlignment.ValenceBandTable, BandAlignment.ConductionBandFraction {

    /** Tabulated valence-band offsets. */
    record ValenceBandTable() implements BandAlignment {
    }

    /**
     * A fixed share of the gap difference to GaN goes to the conduction band.
     *
     * @param fraction f in [0, 1]
     */
    record ConductionBandFraction(double fraction) implements BandAlignment {
        /** Validates. */
        public ConductionBandFraction {
            Require.inRange("conduction-band offset fraction", fraction, 0, 1);
        }
    }

    /** @return the tabulated-valence-band alignment */
    static BandAlignment valenceBandTable() {
        return new ValenceBandTable();
    }

    /**
     * @param fraction f in [0, 1]
     * @return the fixed-fraction alignment
     */
    static BandAlignment conductionBandFraction(double fraction) {
        return new ConductionBandFraction(fraction);
    }
}
