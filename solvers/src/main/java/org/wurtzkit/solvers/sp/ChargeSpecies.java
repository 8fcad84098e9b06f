package org.wurtzkit.solvers.sp;

/**
 * The kinds of fixed charge a layer can hold, each with its own ionisation statistics in
 * {@link ChargeModel} (the occupancy functions of {@link org.wurtzkit.solvers.statistics.Ionization}).
 * The level's energy is measured from the band edge named below, in eV.
 */
enum ChargeSpecies {
    /** Shallow donor at E_D = E_c - e; positive when ionised. */
    SHALLOW_DONOR,
    /** Shallow acceptor at E_A = E_v + e; negative when ionised. */
    SHALLOW_ACCEPTOR,
    /** Donor-like deep level at E_T = E_c - e; positive when empty. */
    DONOR_LIKE_TRAP,
    /** Acceptor-like deep level at E_T = E_c - e; negative when filled. */
    ACCEPTOR_LIKE_TRAP,
    /** Donor charged whatever the Fermi level ({@link org.wurtzkit.structure.Dopant.Ionization#FULL}). */
    FULLY_IONIZED_DONOR,
    /** Acceptor charged whatever the Fermi level ({@link org.wurtzkit.structure.Dopant.Ionization#FULL}). */
    FULLY_IONIZED_ACCEPTOR
}
