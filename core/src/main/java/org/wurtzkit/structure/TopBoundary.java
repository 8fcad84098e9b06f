package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * The boundary condition at the top surface of the stack.
 *
 * <p>Energies are referred to the Fermi level of the bottom (grounded) end of the stack, which is
 * 0 eV. A gate bias V on a Schottky contact puts the metal's Fermi level at -qV, so the
 * conduction-band edge at the surface is E_c(0) = phi_B - qV (eV).
 */
public sealed interface TopBoundary permits TopBoundary.Schottky, TopBoundary.FreeSurface {

    /**
     * A Schottky (metal) gate: the conduction band at the surface is pinned at phi_B above the
     * metal's Fermi level. On a gate stack the surface is the top insulator's, so phi_B is the
     * metal's Fermi level below that insulator's conduction band (work function minus electron
     * affinity of the insulator, by the electron-affinity rule).
     *
     * @param barrierHeightEv phi_B (eV), in [0, 6]
     * @param biasV           gate bias with respect to the bottom contact (V), in [-100, 20]
     */
    record Schottky(double barrierHeightEv, double biasV) implements TopBoundary {
        /**
         * Creates the record and checks every component.
         *
         * @param barrierHeightEv phi_B (eV), in [0, 6]
         * @param biasV           gate bias with respect to the bottom contact (V), in [-100, 20]
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public Schottky {
            Require.inRange("Schottky barrier height (eV)", barrierHeightEv, 0, 6);
            Require.inRange("gate bias (V)", biasV, -100, 20);
        }

        /**
         * Returns a copy of this gate contact at another bias.
         *
         * @param v bias (V)
         * @return a copy at that bias
         * @deprecated the unit belongs in the name: use {@link #atBiasV(double)}
         */
        @Deprecated(since = "0.2", forRemoval = true)
        public Schottky withBias(double v) {
            return new Schottky(barrierHeightEv, v);
        }

        /**
         * The same gate at another bias; reads {@code TopBoundary.schottky(1.0).atBiasV(-2)}, which
         * names the unit and cannot swap barrier and bias.
         *
         * @param biasV gate bias with respect to the bottom contact (V), in [-100, 20]
         * @return a copy at that bias
         */
        public Schottky atBiasV(double biasV) {
            return new Schottky(barrierHeightEv, biasV);
        }

        /** @return e.g. {@code "Schottky gate, barrier 1 eV, bias -2.5 V"} */
        @Override
        public String toString() {
            return "Schottky gate, barrier " + Decimals.format(barrierHeightEv, "eV") + ", bias "
                    + Decimals.format(biasV, "V");
        }
    }

    /**
     * A free surface with a single level of donor-like surface states at E_D below the conduction
     * band (the model of J. P. Ibbetson et al., Appl. Phys. Lett. 77, 250 (2000)); the states are
     * positive when empty.
     *
     * @param donorEnergyBelowEcEv E_c - E_D at the surface (eV), in [0, 6]
     * @param donorDensityPerM2    surface donor density (m^-2), in [0, 1e20]
     */
    record FreeSurface(double donorEnergyBelowEcEv, double donorDensityPerM2) implements TopBoundary {
        /**
         * Creates the record and checks every component.
         *
         * @param donorEnergyBelowEcEv E_c - E_D at the surface (eV), in [0, 6]
         * @param donorDensityPerM2    surface donor density (m^-2), in [0, 1e20]
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public FreeSurface {
            Require.inRange("surface donor energy below E_c (eV)", donorEnergyBelowEcEv, 0, 6);
            Require.inRange("surface donor density (m^-2)", donorDensityPerM2, 0, 1e20);
        }

        /** @return e.g. {@code "free surface, donor states 1.6e13 cm^-2 at E_c - 1.65 eV"} */
        @Override
        public String toString() {
            return "free surface, donor states " + Decimals.format(Units.perM2ToPerCm2(donorDensityPerM2), "cm^-2")
                    + " at E_c - " + Decimals.format(donorEnergyBelowEcEv, "eV");
        }
    }

    /**
     * A Schottky gate at 0 V; give it a bias with {@link Schottky#atBiasV(double)}:
     * {@code TopBoundary.schottky(1.0).atBiasV(-2)}. Prefer this form to
     * the deprecated {@code schottky(barrier, bias)}, whose two numbers can be swapped unnoticed.
     *
     * @param barrierHeightEv phi_B (eV), in [0, 6]
     * @return the gate at zero bias
     */
    static Schottky schottky(double barrierHeightEv) {
        return new Schottky(barrierHeightEv, 0);
    }

    /**
     * @param barrierHeightEv phi_B (eV)
     * @param biasV           gate bias (V)
     * @return a Schottky gate
     * @deprecated two numbers of the same size are easily swapped, and nothing would notice: use
     *             {@code schottky(barrierHeightEv).atBiasV(biasV)}
     */
    @Deprecated(since = "0.2", forRemoval = true)
    static Schottky schottky(double barrierHeightEv, double biasV) {
        return new Schottky(barrierHeightEv, biasV);
    }

    /**
     * @param donorEnergyBelowEcEv E_c - E_D (eV), in [0, 6]
     * @param densityPerCm2        surface donor density (cm^-2), in [0, 1e16]
     * @return a free surface with donor states
     */
    static FreeSurface freeSurfacePerCm2(double donorEnergyBelowEcEv, double densityPerCm2) {
        return new FreeSurface(donorEnergyBelowEcEv, Units.perCm2ToPerM2(densityPerCm2));
    }

    /**
     * @param donorEnergyBelowEcEv E_c - E_D (eV)
     * @param densityPerCm2        surface donor density (cm^-2)
     * @return a free surface with donor states
     * @deprecated the density's unit belongs in the name: use {@link #freeSurfacePerCm2(double, double)}
     */
    @Deprecated(since = "0.2", forRemoval = true)
    static FreeSurface freeSurface(double donorEnergyBelowEcEv, double densityPerCm2) {
        return freeSurfacePerCm2(donorEnergyBelowEcEv, densityPerCm2);
    }

    /**
     * The SI twin of {@link #freeSurfacePerCm2(double, double)}.
     *
     * @param donorEnergyBelowEcEv E_c - E_D (eV)
     * @param densityPerM2         surface donor density (m^-2)
     * @return a free surface with donor states
     */
    static FreeSurface freeSurfacePerM2(double donorEnergyBelowEcEv, double densityPerM2) {
        return new FreeSurface(donorEnergyBelowEcEv, densityPerM2);
    }
}
