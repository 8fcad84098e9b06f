/**
 * Wurtzite materials and the parameter sets they come from. A
 * {@link org.wurtzkit.material.ParameterSet} supplies the three binaries (GaN, AlN, InN), the alloy
 * bowing parameters and the bibliography; {@link org.wurtzkit.material.AlloyRules} resolves an
 * Al<sub>x</sub>In<sub>y</sub>Ga<sub>1-x-y</sub>N {@link org.wurtzkit.material.Composition} from
 * them (Vegard's law unless a bowing term is given); every value of the resulting
 * {@link org.wurtzkit.material.WurtziteMaterial} carries its {@link org.wurtzkit.material.Provenance}
 * (rule and {@link org.wurtzkit.material.Source}s). Sets are discovered at run time through
 * {@link org.wurtzkit.material.ParameterSetProvider} and {@link java.util.ServiceLoader}
 * ({@link org.wurtzkit.material.ParameterSets}, which loads providers one by one, lists a broken one
 * as broken and can {@code reload()}); the built-in ones live in the materials-data module. A set
 * with a few values changed is derived in code with {@link org.wurtzkit.material.ParameterSet#derive(String)}.
 *
 * <h2>What a new parameter set must guarantee</h2>
 * <ul>
 * <li><b>Immutable and thread-safe.</b> A set and every material it returns never change after
 * construction; array or list components are copied in and out. Solvers share one set between
 * threads without locking.</li>
 * <li><b>Units.</b> Every value is stored in SI (m, Pa, C/m<sup>2</sup>, K) except energies,
 * which are in eV (eV/K for the Varshni slope), masses, in units of m<sub>0</sub>, and
 * permittivities, relative to eps<sub>0</sub>; files use the
 * unit of {@link org.wurtzkit.material.MaterialParameter#fileUnit()} and are converted once, on
 * reading.</li>
 * <li><b>Complete and checked.</b> Every {@link org.wurtzkit.material.MaterialParameter} of each
 * binary is present, finite, of the right sign and inside its plausible range
 * ({@link org.wurtzkit.material.MaterialParameter#plausibleRangeText()}, wide enough for every
 * published nitride value, narrow enough to catch a unit slip); a missing or out-of-range value is an
 * error at load time, not a default.</li>
 * <li><b>Sourced.</b> Every value names a source listed in the set's bibliography and says how it
 * was taken (verified against the original, or recalled from memory).</li>
 * <li><b>Sign conventions.</b> Spontaneous polarization and piezoelectric constants follow
 * F. Bernardini, V. Fiorentini and D. Vanderbilt, Phys. Rev. B 56, R10024 (1997) (P<sub>sp</sub>
 * negative for all three nitrides); deformation potentials follow S. L. Chuang and C. S. Chang,
 * Phys. Rev. B 54, 2491 (1996).</li>
 * </ul>
 *
 * <h2>What a band line-up must guarantee</h2>
 * A line-up (the rule that places the band edges of different materials on one energy scale) must be
 * immutable and stateless, give energies in eV on the scale whose zero is the GaN valence-band
 * maximum, be defined for every composition the set resolves, and be an explicit, documented choice
 * of the caller or the set, never an unstated default.
 *
 * <p>Gate dielectrics are not wurtzite materials: an {@link org.wurtzkit.material.Insulator} record
 * (permittivity, gap, conduction-band offset to GaN, source) describes one, and
 * {@link org.wurtzkit.material.Insulators} holds the built-in SiO2, Si3N4, Al2O3 and HfO2 with
 * their published sources.
 */
package org.wurtzkit.material;
