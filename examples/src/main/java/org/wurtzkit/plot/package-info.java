/**
 * Plots of wurtzkit results for notebooks, jshell and reports, drawn with XChart and kept in the
 * {@code examples} module so that no plotting library enters the dependency path of the library
 * itself. Each plot is a small builder over a result of the library that ends in a {@link
 * org.wurtzkit.plot.Figure}: an image ({@link org.wurtzkit.plot.Figure#image()}, what a notebook
 * displays) or a PNG or SVG file.
 *
 * <ul>
 * <li>{@link org.wurtzkit.plot.BandDiagramPlot}: band edges, Fermi level, subbands' |&psi;|&sup2; at
 * their energies and the electron density over the shaded layers of a solution.</li>
 * <li>{@link org.wurtzkit.plot.GateSweepPlot}: n_s&ndash;V_g with the threshold voltage, and
 * C&ndash;V, of a bias sweep.</li>
 * <li>{@link org.wurtzkit.plot.DesignMapPlot}: a quantity over a two-parameter map with contour
 * lines; two maps side by side with their relative difference.</li>
 * <li>{@link org.wurtzkit.plot.SpreadPlot}: n_s and V_th across parameter sets, with their band
 * and median.</li>
 * <li>{@link org.wurtzkit.plot.TradeoffPlot}: several quantities against one design parameter,
 * stacked panels over a shared x axis.</li>
 * <li>{@link org.wurtzkit.plot.ParetoPlot}: R_sh against gate leakage (log) over a family of stacks,
 * the V_th band highlighted and the Pareto front drawn as a staircase.</li>
 * </ul>
 *
 * <p>Every label follows {@link org.wurtzkit.plot.Labels}: subscripts with an underscore
 * ({@code n_s}, {@code V_th}), superscripts in Unicode (cm&#8315;&sup2;). The shaded jar of the
 * {@code examples} module ({@code wurtzkit-examples-*-all.jar}) holds this package with the
 * library and XChart: one class-path entry for a notebook or jshell.
 */
package org.wurtzkit.plot;
