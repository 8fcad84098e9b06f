package org.wurtzkit.solvers.sp;

/** A kind of free carrier, for options and results that treat the two apart. */
public enum Carrier {
    /** Conduction-band electrons. */
    ELECTRONS,
    /** Valence-band holes. */
    HOLES
}
