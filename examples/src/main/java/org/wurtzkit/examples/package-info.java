/**
 * Runnable examples of wurtzkit, set in an invented demo scenario: the fictional Tarnwick Nitride
 * Lab ({@link org.wurtzkit.examples.DemoLab}) and its made-up wafers. The lab, the wafer names,
 * the layer stacks and the lab's own parameter set are invented; every number the examples print
 * or plot is a model estimate of the library, to be confirmed by measurement.
 *
 * <ul>
 * <li>{@link org.wurtzkit.examples.BandDiagramExample}: the band diagram of a capped
 * AlGaN/AlN/GaN HEMT with its subbands and electron density.</li>
 * <li>{@link org.wurtzkit.examples.BarrierMapExample}: n_s over Al fraction and barrier thickness,
 * full solver and analytic model side by side.</li>
 * <li>{@link org.wurtzkit.examples.CapTradeoffExample}: n_s and the barrier field against the cap
 * thickness.</li>
 * <li>{@link org.wurtzkit.examples.GateSweepExample}: n_s and C against the gate bias, with the
 * threshold voltage.</li>
 * <li>{@link org.wurtzkit.examples.ParameterSpreadExample}: how far n_s and V_th move between the
 * registered parameter sets.</li>
 * <li>{@link org.wurtzkit.examples.TradeoffExample}: R_sh against gate leakage over a family of
 * wafers (cap, Al fraction, barrier thickness), with the Pareto front at a V_th band (not part of
 * {@link org.wurtzkit.examples.Demo}).</li>
 * <li>{@link org.wurtzkit.examples.PGanGateExample}: the threshold voltage of a p-GaN gate HEMT
 * (invented wafer TNL-0817) against the Mg density for three barrier thicknesses; not part of the
 * demo run.</li>
 * <li>{@link org.wurtzkit.examples.Demo}: the first five in one run.</li>
 * </ul>
 *
 * <p>Each program takes the output folder as its first argument (default {@code out}) and
 * {@code --quick} for small settings; it writes PNG plots (XChart, headless) and CSV tables whose
 * headers carry their units, and prints a short summary.
 */
package org.wurtzkit.examples;
