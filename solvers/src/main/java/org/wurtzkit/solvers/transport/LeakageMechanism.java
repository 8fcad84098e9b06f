package org.wurtzkit.solvers.transport;

/** The conduction mechanisms of a gate-leakage calculation ({@link LeakageOptions#mechanisms()}). */
public enum LeakageMechanism {
    /** Electrons over the top of the computed barrier: the Tsu-Esaki integral above the top. */
    THERMIONIC,
    /** Field and thermionic-field emission through the computed barrier: the Tsu-Esaki integral below the top. */
    TUNNELLING,
    /** Poole-Frenkel emission from traps in the barrier, with measured parameters ({@link PooleFrenkelEmission}). */
    POOLE_FRENKEL
}
