package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * Electronic states at an interface (insulator/nitride, or a free or passivated nitride surface),
 * spread over the band gap of the nitride below it: a density of states D(e) over the energy e
 * below that nitride's conduction-band edge (0 at E_c, E_g at E_v), and a charge-neutrality level
 * e_0. States between E_c and the neutrality level (e &lt; e_0) are acceptor-like (negative when
 * filled, neutral when empty); states between the neutrality level and E_v (e &gt; e_0) are
 * donor-like (positive when empty, neutral when filled), the usual convention for interface states
 * (S. M. Sze &amp; K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch. 4; see also
 * W. Moench, Semiconductor Surfaces and Interfaces, Springer). With f the Fermi-Dirac occupancy the
 * sheet charge is
 * Q_it = q [ integral over e &gt; e_0 of D (1 - f) - integral over e &lt; e_0 of D f ],
 * which at T = 0 is -q times the integral of D from the neutrality level to the Fermi level.
 * Every state has degeneracy 1. The neutrality level and every discrete level must lie inside the
 * gap of the nitride below; {@code Structure.Builder.build()} checks it.
 *
 * <p>The single donor level of J. P. Ibbetson et al., Appl. Phys. Lett. 77, 250 (2000) is the
 * special case {@code new InterfaceStates(new Discrete(N, e_D), 0)}: with the neutrality level at
 * E_c every state is donor-like.
 *
 * @param distribution          the density of states over the gap
 * @param neutralLevelBelowEcEv charge-neutrality level e_0, below the nitride's E_c (eV), &ge; 0
 */
public record InterfaceStates(Distribution distribution, double neutralLevelBelowEcEv) {

    /**
     * Validates.
     *
     * @param distribution the density of states over the gap
     * @param neutralLevelBelowEcEv charge-neutrality level e_0, below the nitride's E_c (eV), &ge; 0
     */
    public InterfaceStates {
        Require.nonNull("interface-state distribution", distribution);
        Require.inRange("interface-state charge-neutrality level below E_c (eV)", neutralLevelBelowEcEv, 0, 20);
    }

    /**
     * A uniform density of states over the gap.
     *
     * @param ditPerCm2PerEv       D_it (cm^-2 eV^-1), &ge; 0
     * @param neutralLevelBelowEcEv charge-neutrality level below E_c (eV)
     * @return the states
     */
    public static InterfaceStates uniformPerCm2PerEv(double ditPerCm2PerEv, double neutralLevelBelowEcEv) {
        return new InterfaceStates(new Uniform(Units.perCm2ToPerM2(ditPerCm2PerEv)), neutralLevelBelowEcEv);
    }

    /**
     * The distribution of states over the gap. Densities are per m^2 per eV (continuous) or per m^2
     * (discrete); e is the energy below the nitride's conduction-band edge (eV).
     */
    public sealed interface Distribution permits Uniform, Gaussian, UShaped, Discrete {
        /**
         * @param eBelowEcEv energy below E_c (eV), in [0, gap]
         * @param gapEv      the gap of the nitride below (eV)
         * @return D(e) (m^-2 eV^-1); 0 for a discrete level
         */
        double densityPerM2PerEv(double eBelowEcEv, double gapEv);

        /** {@return the narrowest energy scale of the distribution (eV), for quadrature; +inf if none} */
        double narrowestScaleEv();

        /**
         * Checks that every level lies in [0, gap].
         *
         * @param gapEv the gap of the nitride below (eV)
         * @param where the interface, for the message
         */
        default void checkInsideGap(double gapEv, String where) {
        }
    }

    /** @param perM2PerEv D_it (m^-2 eV^-1), &ge; 0, at every energy of the gap */
    public record Uniform(double perM2PerEv) implements Distribution {
        /**
         * Validates.
         *
         * @param perM2PerEv D_it (m^-2 eV^-1), &ge; 0, at every energy of the gap
         */
        public Uniform {
            Require.inRange("uniform interface-state density (m^-2 eV^-1)", perM2PerEv, 0, 1e20);
        }

        @Override
        public double densityPerM2PerEv(double e, double gapEv) {
            return perM2PerEv;
        }

        @Override
        public double narrowestScaleEv() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public String toString() {
            return "uniform " + Decimals.format(Units.perM2ToPerCm2(perM2PerEv), "cm^-2 eV^-1");
        }
    }

    /**
     * A Gaussian band of states, D(e) = D_peak exp(-(e - e_c)^2 / (2 w^2)).
     *
     * @param peakPerM2PerEv D_peak (m^-2 eV^-1), &ge; 0
     * @param centreBelowEcEv e_c below E_c (eV), inside the gap (checked at build)
     * @param widthEv        standard deviation w (eV), in [0.001, 5]
     */
    public record Gaussian(double peakPerM2PerEv, double centreBelowEcEv, double widthEv) implements Distribution {
        /**
         * Validates.
         *
         * @param widthEv standard deviation w (eV), in [0.001, 5]
         * @param centreBelowEcEv e_c below E_c (eV), inside the gap (checked at build)
         * @param peakPerM2PerEv D_peak (m^-2 eV^-1), &ge; 0
         */
        public Gaussian {
            Require.inRange("Gaussian interface-state peak density (m^-2 eV^-1)", peakPerM2PerEv, 0, 1e20);
            Require.inRange("Gaussian interface-state centre below E_c (eV)", centreBelowEcEv, 0, 20);
            Require.inRange("Gaussian interface-state width (eV)", widthEv, 0.001, 5);
        }

        @Override
        public double densityPerM2PerEv(double e, double gapEv) {
            double u = (e - centreBelowEcEv) / widthEv;
            return peakPerM2PerEv * Math.exp(-0.5 * u * u);
        }

        @Override
        public double narrowestScaleEv() {
            return widthEv;
        }

        @Override
        public void checkInsideGap(double gapEv, String where) {
            Require.inRange("Gaussian interface-state centre below E_c at " + where + " (eV)", centreBelowEcEv, 0,
                    gapEv);
        }

        @Override
        public String toString() {
            return "Gaussian peak " + Decimals.format(Units.perM2ToPerCm2(peakPerM2PerEv), "cm^-2 eV^-1") + " at E_c - "
                    + Decimals.format(centreBelowEcEv, "eV") + ", width " + Decimals.format(widthEv, "eV");
        }
    }

    /**
     * The U-shaped distribution common for amorphous/crystal interfaces, a floor plus two tails
     * rising toward the band edges: D(e) = D_min + D_edge [exp(-e / w_c) + exp(-(E_g - e) / w_v)]
     * (common practice, no source).
     *
     * @param minimumPerM2PerEv D_min (m^-2 eV^-1), &ge; 0
     * @param edgePerM2PerEv    D_edge, the tail's density at its band edge (m^-2 eV^-1), &ge; 0
     * @param conductionTailEv  w_c (eV), in [0.001, 5]
     * @param valenceTailEv     w_v (eV), in [0.001, 5]
     */
    public record UShaped(double minimumPerM2PerEv, double edgePerM2PerEv, double conductionTailEv,
            double valenceTailEv) implements Distribution {
        /**
         * Validates.
         *
         * @param edgePerM2PerEv D_edge, the tail's density at its band edge (m^-2 eV^-1), &ge; 0
         * @param valenceTailEv w_v (eV), in [0.001, 5]
         * @param conductionTailEv w_c (eV), in [0.001, 5]
         * @param minimumPerM2PerEv D_min (m^-2 eV^-1), &ge; 0
         */
        public UShaped {
            Require.inRange("U-shaped interface-state floor density (m^-2 eV^-1)", minimumPerM2PerEv, 0, 1e20);
            Require.inRange("U-shaped interface-state band-edge density (m^-2 eV^-1)", edgePerM2PerEv, 0, 1e20);
            Require.inRange("U-shaped interface-state conduction tail width (eV)", conductionTailEv, 0.001, 5);
            Require.inRange("U-shaped interface-state valence tail width (eV)", valenceTailEv, 0.001, 5);
        }

        @Override
        public double densityPerM2PerEv(double e, double gapEv) {
            return minimumPerM2PerEv
                    + edgePerM2PerEv * (Math.exp(-e / conductionTailEv) + Math.exp(-(gapEv - e) / valenceTailEv));
        }

        @Override
        public double narrowestScaleEv() {
            return Math.min(conductionTailEv, valenceTailEv);
        }

        @Override
        public String toString() {
            return "U-shaped floor " + Decimals.format(Units.perM2ToPerCm2(minimumPerM2PerEv), "cm^-2 eV^-1")
                    + ", band-edge " + Decimals.format(Units.perM2ToPerCm2(edgePerM2PerEv), "cm^-2 eV^-1")
                    + ", tails " + Decimals.format(conductionTailEv, "eV") + " / " + Decimals.format(valenceTailEv, "eV");
        }
    }

    /**
     * A single level (a sheet of identical states).
     *
     * @param densityPerM2   N (m^-2), &ge; 0
     * @param levelBelowEcEv its energy below E_c (eV), inside the gap (checked at build)
     */
    public record Discrete(double densityPerM2, double levelBelowEcEv) implements Distribution {
        /**
         * Validates.
         *
         * @param levelBelowEcEv its energy below E_c (eV), inside the gap (checked at build)
         * @param densityPerM2 N (m^-2), &ge; 0
         */
        public Discrete {
            Require.inRange("discrete interface-state density (m^-2)", densityPerM2, 0, 1e20);
            Require.inRange("discrete interface-state level below E_c (eV)", levelBelowEcEv, 0, 20);
        }

        @Override
        public double densityPerM2PerEv(double e, double gapEv) {
            return 0;
        }

        @Override
        public double narrowestScaleEv() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public void checkInsideGap(double gapEv, String where) {
            Require.inRange("discrete interface-state level below E_c at " + where + " (eV)", levelBelowEcEv, 0, gapEv);
        }

        @Override
        public String toString() {
            return "level " + Decimals.format(Units.perM2ToPerCm2(densityPerM2), "cm^-2") + " at E_c - "
                    + Decimals.format(levelBelowEcEv, "eV");
        }
    }

    /** @return e.g. {@code "interface states uniform 1e12 cm^-2 eV^-1, neutral level E_c - 1.5 eV"} */
    @Override
    public String toString() {
        return "interface states " + distribution + ", neutral level E_c - " + Decimals.format(neutralLevelBelowEcEv, "eV");
    }
}
