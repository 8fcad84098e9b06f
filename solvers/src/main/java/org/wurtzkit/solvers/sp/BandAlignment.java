package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.structure.PointState;
import org.wurtzkit.structure.Structure;

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

    /**
     * The band edges at a point of a stack under this alignment, on the parameter set's energy scale
     * (eV): the one line-up rule of the full solver and of the analytic charge-balance model.
     *
     * @param s            the stack (its parameter set supplies GaN for {@link ConductionBandFraction})
     * @param p            the point
     * @param temperatureK temperature of the gaps (K)
     * @param strainShifts whether the point's strain shifts of the band edges are added
     * @param out          receives E_c in out[0] and E_v in out[1]
     */
    default void edgesEv(Structure s, PointState p, double temperatureK, boolean strainShifts, double[] out) {
        WurtziteMaterial m = p.material();
        double gap = m.bandGap().atTemperature(temperatureK);
        double ec;
        double ev;
        if (this instanceof ConductionBandFraction f) {
            WurtziteMaterial gan = s.parameters().binary(Binary.GAN);
            double ganGap = gan.bandGap().atTemperature(temperatureK);
            ec = gan.valenceBandEdgeEv() + ganGap + f.fraction() * (gap - ganGap);
            ev = ec - gap;
        } else {
            ev = m.valenceBandEdgeEv();
            ec = ev + gap;
        }
        if (strainShifts) {
            ec += p.bandShift().conductionEv();
            ev += p.bandShift().valenceEv();
        }
        out[0] = ec;
        out[1] = ev;
    }

    /** {@return the tabulated-valence-band alignment} */
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
