package org.wurtzkit.bands;

import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * How the band edges of different materials line up: a physical model choice, set on the structure
 * ({@code Structure.Builder.bandAlignment}) beside the polarization model.
 *
 * <ul>
 * <li>{@link ValenceBandTable} (default): each material's valence-band maximum is the tabulated (or
 * Vegard-interpolated) value of its parameter set; E_c = E_v + E_g(T).</li>
 * <li>{@link ConductionBandFraction}: E_c - E_c(GaN) = f (E_g - E_g(GaN)) at the given temperature,
 * the rule used e.g. by O. Ambacher et al., J. Appl. Phys. 87, 334 (2000) with f = 0.7 for AlGaN/GaN
 * (from memory).</li>
 * </ul>
 *
 * <p>Each line-up computes the unstrained edges of a material itself; strain shifts are added by the
 * structure when it is asked to ({@code Structure.Builder.strainShiftsBandEdges}).
 */
public sealed interface BandAlignment permits BandAlignment.ValenceBandTable, BandAlignment.ConductionBandFraction {

    /**
     * The unstrained band edges of a material under this line-up.
     *
     * @param set          the parameter set the material comes from (it supplies GaN where needed)
     * @param material     the material
     * @param temperatureK temperature of the gaps (K)
     * @return E_c and E_v on the set's energy scale (eV)
     */
    BandEdges edges(ParameterSet set, WurtziteMaterial material, double temperatureK);

    /** Tabulated valence-band offsets. */
    record ValenceBandTable() implements BandAlignment {
        @Override
        public BandEdges edges(ParameterSet set, WurtziteMaterial material, double temperatureK) {
            double ev = material.valenceBandEdgeEv();
            return new BandEdges(ev + material.bandGap().atTemperature(temperatureK), ev);
        }
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

        @Override
        public BandEdges edges(ParameterSet set, WurtziteMaterial material, double temperatureK) {
            double gap = material.bandGap().atTemperature(temperatureK);
            WurtziteMaterial gan = set.binary(Binary.GAN);
            double ganGap = gan.bandGap().atTemperature(temperatureK);
            double ec = gan.valenceBandEdgeEv() + ganGap + fraction * (gap - ganGap);
            return new BandEdges(ec, ec - gap);
        }
    }

    /** {@return the tabulated-valence-band alignment (the default)} */
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
