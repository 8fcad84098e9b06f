/**
 * Effective-mass Schroedinger equation in one dimension: the BenDaniel-Duke operator with a
 * position-dependent mass, discretised by box integration on a non-uniform mesh
 * ({@link org.wurtzkit.solvers.schrodinger.EffectiveMassHamiltonian}), and its immutable result
 * ({@link org.wurtzkit.solvers.schrodinger.BoundStates}). Units: metres for positions, eV for
 * energies, the free-electron mass m0 for masses.
 */
package org.wurtzkit.solvers.schrodinger;
