/**
 * Design workflows on top of the self-consistent solver: what a device engineer does with it.
 *
 * <ul>
 * <li>{@link org.wurtzkit.solvers.workflow.BiasSweep}: n_s(V_g) and gate charge with continuation,
 * quasi-static C-V ({@link org.wurtzkit.solvers.workflow.CapacitanceVoltage}), threshold voltage
 * by two definitions ({@link org.wurtzkit.solvers.workflow.ThresholdDefinition}).</li>
 * <li>{@link org.wurtzkit.solvers.workflow.TemperatureSweep}: the same against temperature.</li>
 * <li>{@link org.wurtzkit.solvers.workflow.DesignMap}: a parallel grid over any structure
 * parameters, identical to a serial run, with progress and per-point failure reports.</li>
 * <li>{@link org.wurtzkit.solvers.workflow.TargetSearch}: the barrier thickness, Al fraction or cap
 * thickness that meets a target n_s or V_th.</li>
 * <li>{@link org.wurtzkit.solvers.workflow.ParameterSetSpread}: one design solved with every
 * parameter set; min / median / max.</li>
 * <li>{@link org.wurtzkit.solvers.workflow.ToleranceStudy}: Monte Carlo or Latin hypercube over growth
 * tolerances and material constants ({@link org.wurtzkit.solvers.workflow.Tolerance}); mean,
 * standard deviation, quantiles and Sobol indices; every sample reproducible alone from the seed, so
 * the same study can run on a distributed engine (see the examples module).</li>
 * <li>{@link org.wurtzkit.solvers.workflow.DesignTradeoff}: over a family of stacks, n_s, V_th,
 * mobility and R_sh at 0 V and the gate leakage at a reverse bias from one bias sweep per stack; the
 * Pareto front ({@link org.wurtzkit.solvers.workflow.ParetoFront}) of R_sh against |J| among the
 * stacks in a V_th band ({@link org.wurtzkit.solvers.workflow.TradeoffResult}).</li>
 * </ul>
 *
 * <p>Every workflow returns an immutable result that writes itself as CSV
 * ({@link org.wurtzkit.solvers.workflow.CsvTable}); column headers carry their units. Failed
 * points are kept in the results with their reason, never dropped. Quantities are SI inside;
 * accessors in other units say so in their names.
 *
 * <p>A point fails only by a library exception ({@code InvalidParameterException} or
 * {@code WurtzkitException}); anything else is a defect and propagates. Every long workflow (sweeps,
 * design maps, spreads, tolerance studies, target searches) checks its thread's interrupt flag
 * before each point and then stops with a {@link java.util.concurrent.CancellationException} (not
 * part of the library's exception family: nothing failed, the caller asked to stop) that says how
 * many points were done; the interrupt flag stays set.
 */
package org.wurtzkit.solvers.workflow;
