/**
 * Closed-form 2DEG models, instant to evaluate: the first look at a design and the cross-check of
 * the full Schroedinger-Poisson solver.
 *
 * <ul>
 * <li>{@link org.wurtzkit.solvers.analytic.ChargeBalanceModel}: the charge balance of a gated
 * stack of undoped layers on a channel (the model of O. Ambacher et al., J. Appl. Phys. 87, 334
 * (2000), re-derived and generalised to caps and spacers): sheet density, threshold voltage,
 * charge-control line. Built by hand, or from a {@link org.wurtzkit.structure.Structure} and its
 * parameter set.</li>
 * <li>{@link org.wurtzkit.solvers.analytic.Ambacher2000}: the composition-dependent expressions
 * of that paper for AlGaN/GaN, as recalled from memory (the paper was not at hand).</li>
 * </ul>
 */
package org.wurtzkit.solvers.analytic;
