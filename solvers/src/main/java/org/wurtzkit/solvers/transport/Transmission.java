package org.wurtzkit.solvers.transport;

/**
 * The transmission probability T(E) of one barrier as a function of the energy of the motion along
 * the tunnelling direction, E_x (eV, on the barrier's own energy scale). Implementations are bound to
 * one {@link TunnelBarrier}, hold no mutable state and may be shared between threads.
 */
public interface Transmission {
    /**
     * @param energyEv E_x (eV)
     * @return T in [0, 1]; 0 where a lead carries no propagating state
     */
    double at(double energyEv);

    /** @return the barrier this transmission belongs to */
    TunnelBarrier barrier();
}
