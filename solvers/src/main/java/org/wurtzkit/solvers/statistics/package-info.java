/**
 * Carrier statistics in SI units with energies in eV.
 * {@link org.wurtzkit.solvers.statistics.FermiDirac} evaluates the complete Fermi-Dirac integrals
 * F<sub>1/2</sub> and F<sub>-1/2</sub> in Blakemore's normalisation (J. S. Blakemore, Solid-State
 * Electron. 25, 1067 (1982)) and inverts F<sub>1/2</sub> by Newton iteration from a Joyce-Dixon seed
 * (W. B. Joyce and R. W. Dixon, Appl. Phys. Lett. 31, 354 (1977));
 * {@link org.wurtzkit.solvers.statistics.CarrierDensity} gives bulk densities of parabolic bands and
 * the two-dimensional density of states per subband;
 * {@link org.wurtzkit.solvers.statistics.Ionization} gives the occupancy of shallow dopants and deep
 * levels with a degeneracy factor. All methods are static and stateless, so safe from any thread.
 */
package org.wurtzkit.solvers.statistics;
