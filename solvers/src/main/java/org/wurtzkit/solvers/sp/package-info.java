/**
 * The self-consistent Schroedinger-Poisson solver for a c-plane stack: one entry point,
 * {@link org.wurtzkit.solvers.sp.SelfConsistentSolver}, its settings
 * ({@link org.wurtzkit.solvers.sp.SolverOptions}, every default documented) and its result
 * ({@link org.wurtzkit.solvers.sp.Solution}, an immutable holder of node arrays, subbands, sheet
 * densities and the {@link org.wurtzkit.solvers.sp.ConvergenceRecord}).
 *
 * <h2>Map of one solve</h2>
 * <ol>
 * <li><b>Resolve.</b> The {@code Structure} is laid once onto a non-uniform
 * {@link org.wurtzkit.solvers.mesh.Mesh} with a node on every interface, as a package-private
 * {@code Device}: per-cell arrays of permittivity, polarization, band edges, densities of states,
 * masses and dopant or trap species; polarization sheets become nodal charges.</li>
 * <li><b>Classical start.</b> A damped Newton solve of the box-integrated Poisson equation with
 * Fermi-Dirac electrons everywhere (package-private {@code ChargeModel} for the charge and its
 * derivative; each Newton step one O(N) tridiagonal solve). The damped Newton-Poisson solver
 * (residual, Jacobian, backtracking line search, neutrality shift, every threshold named) is the
 * package-private {@code NewtonPoisson}; it returns its step count or fails with the last finite
 * iterate. Its budget grows with the potential it must carry from the flat start to a gate
 * (issue #14: -30 V), and a step limited to the maximum is first tried clamped node by node.</li>
 * <li><b>Outer loop</b> (A. Trellakis, A. T. Galick, A. Pacelli and U. Ravaioli, J. Appl. Phys. 81,
 * 7880 (1997)): {@code QuantumStates} solves the BenDaniel-Duke equation in every quantum window
 * ({@link org.wurtzkit.solvers.sp.QuantumWindows}) for the lowest subbands, O(N k), electrons and the
 * three single-band hole bands when quantum holes are on ({@code HoleStates}, skipped where the
 * valence band is far from the hole quasi-Fermi level); then Newton-Poisson
 * runs with the predictor density g<sub>k</sub> ln(1 + e<sup>eta</sup>) |psi<sub>k</sub>|<sup>2</sup>,
 * whose one home is {@code SubbandDensity}; repeat until max |delta phi| is below the tolerance.
 * Once the change stalls, {@code AndersonMixing} (package-private, D. G. Anderson, J. ACM 12, 547
 * (1965)) gives the next input; a converged solve returns the unmixed Newton-Poisson solution, so
 * the change it reports is that of the potential it returns. An eigen-solver failure inside the
 * loop ends the solve as a {@code NotConvergedException} with the record so far.</li>
 * <li><b>Result or failure.</b> A converged solve hands its last potential, subbands and charge
 * report once to the package-private {@code SolutionAssembler}, the one place that derives the band
 * edges, field, neutrality check, plot lines, subbands, warnings and read-outs (the carrier sheets,
 * interface edges and well minima by static factories of their own records); it returns a
 * {@code Solution}, a plain holder of those values (copies out, no NaN). A solve
 * that runs out of budget throws {@link org.wurtzkit.solvers.sp.NotConvergedException} carrying its
 * record and last finite iterate.</li>
 * </ol>
 * Every carrier density uses its own carrier's quasi-Fermi level in its region
 * ({@link org.wurtzkit.solvers.sp.QuasiFermiLevels}); the solution groups the carriers into sheets
 * ({@link org.wurtzkit.solvers.sp.CarrierSheet}) and reports the channel 2DEG apart.
 * <h2>Gate stacks</h2>
 * Insulator cells of a gate stack ({@code Structure.gateStack()}) take the insulator's permittivity
 * and band edges (offset to GaN), no polarization, no carriers (N_c = N_v = 0) and no dopants;
 * quantum windows stop at the insulator (a hard wall). The fixed charge of every interface sheet
 * is a nodal charge; interface states are integrated over the gap (package-private
 * {@code InterfaceStateQuadrature}) and occupied from the Fermi level chosen in one package-private
 * method, {@code Device.interfaceStateFermiLevelEv}: the electrons' quasi-Fermi level of the
 * nitride region the states sit in (with the default rules the channel's, 0 eV). Under an insulator,
 * which cuts them off from the gate metal, the holes of a p-type layer follow the channel by default
 * and other layers go into deep depletion rather than inversion
 * ({@link org.wurtzkit.solvers.sp.QuasiFermiLevels.HolesUnderInsulator}); a structure whose barrier
 * face carries a strongly negative net sheet may show a hole layer under the insulator, a steady
 * state that the solution's text flags, since a fast measurement may not reach it.
 * <p>
 * A sweep starts each point from a potential extrapolated through the last converged solutions
 * ({@link org.wurtzkit.solvers.sp.PotentialPredictor}),
 * which skips the classical start; the convergence test is unchanged, so the start never moves the
 * answer beyond the tolerance. The solver holds no state between calls: one instance serves many
 * threads.
 */
package org.wurtzkit.solvers.sp;
