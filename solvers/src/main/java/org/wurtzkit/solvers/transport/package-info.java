/**
 * Transport quantities computed from a converged {@link org.wurtzkit.solvers.sp.Solution}: the
 * in-plane mobility and sheet resistance of the 2DEG from scattering rates
 * ({@link org.wurtzkit.solvers.transport.mobility}), and the vertical gate leakage current through
 * the barrier (tunnelling and thermionic emission, in its own classes of this package tree).
 *
 * <p>Nothing here changes the self-consistent solution: every calculation reads the band edges,
 * subbands and wavefunctions of a solution and the material parameters of its structure, and
 * returns an immutable result with the warnings of the models it used.
 */
package org.wurtzkit.solvers.transport;
