package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;

/**
 * The contact whose Fermi level a carrier type in some part of the stack is in equilibrium with.
 * Energies follow the solver's convention: the channel (bottom) contact's Fermi level is 0 eV and a
 * gate bias V puts the gate's Fermi level at -V (in eV, the electron energy of the gate metal).
 */
public sealed interface FermiContact permits FermiContact.Gate, FermiContact.Channel, FermiContact.Floating {
    /** The gate (top Schottky boundary): level -V for a gate bias V; 0 eV for a free surface. */
    FermiContact GATE = new Gate();
    /** The channel's ohmic source and drain (the bottom contact): level 0 eV. */
    FermiContact CHANNEL = new Channel();

    /**
     * A level held by neither contact, e.g. a floating p-GaN layer whose holes the user places.
     *
     * @param levelEv the quasi-Fermi level (eV, same scale as the band diagram), finite
     * @return the contact
     */
    static FermiContact floating(double levelEv) {
        return new Floating(levelEv);
    }

    /**
     * The quasi-Fermi level this contact imposes.
     *
     * @param gateBiasV the gate bias (V); 0 for a free surface
     * @return the level (eV)
     */
    double levelEv(double gateBiasV);

    /** In equilibrium with the gate metal. */
    record Gate() implements FermiContact {
        @Override
        public double levelEv(double gateBiasV) {
            return gateBiasV == 0 ? 0 : -gateBiasV;
        }
    }

    /** In equilibrium with the channel's ohmic contacts (the bottom contact). */
    record Channel() implements FermiContact {
        @Override
        public double levelEv(double gateBiasV) {
            return 0;
        }
    }

    /**
     * A level given by the user.
     *
     * @param fixedLevelEv the level (eV), finite
     */
    record Floating(double fixedLevelEv) implements FermiContact {
        /**
         * Validates the level.
         *
         * @param fixedLevelEv the level (eV), finite
         */
        public Floating {
            Require.finite("floating quasi-Fermi level (eV)", fixedLevelEv);
        }

        @Override
        public double levelEv(double gateBiasV) {
            return fixedLevelEv;
        }
    }
}
