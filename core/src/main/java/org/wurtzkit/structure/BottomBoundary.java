package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;

/** The boundary condition at the bottom of the stack, whose Fermi level is the energy zero. */
public sealed interface BottomBoundary permits BottomBoundary.ZeroField, BottomBoundary.FixedFermiLevel {

    /** The electric field vanishes at the bottom (a thick buffer, or a neutral substrate). */
    record ZeroField() implements BottomBoundary {
        /** @return {@code "zero field at the bottom"} */
        @Override
        public String toString() {
            return "zero field at the bottom";
        }
    }

    /**
     * The conduction band at the bottom sits a fixed distance above the Fermi level (a back
     * contact, or a Fermi level pinned by bulk traps).
     *
     * @param conductionAboveFermiEv E_c - E_F at the bottom (eV), in [-1, 7]
     */
    record FixedFermiLevel(double conductionAboveFermiEv) implements BottomBoundary {
        /** Validates. */
        public FixedFermiLevel {
            Require.inRange("E_c - E_F at the bottom (eV)", conductionAboveFermiEv, -1, 7);
        }

        /** @return e.g. {@code "Fermi level fixed at the bottom, E_c - E_F = 0.2 eV"} */
        @Override
        public String toString() {
            return "Fermi level fixed at the bottom, E_c - E_F = " + Decimals.format(conductionAboveFermiEv, "eV");
        }
    }

    /** {@return the zero-field boundary} */
    static ZeroField zeroField() {
        return new ZeroField();
    }

    /**
     * @param conductionAboveFermiEv E_c - E_F at the bottom (eV)
     * @return a fixed-Fermi-level boundary
     */
    static FixedFermiLevel fixedFermiLevel(double conductionAboveFermiEv) {
        return new FixedFermiLevel(conductionAboveFermiEv);
    }
}
