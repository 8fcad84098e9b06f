/**
 * Band line-ups: how the conduction- and valence-band edges of different nitrides sit on one energy
 * scale. {@link org.wurtzkit.bands.BandAlignment} is a sealed choice set on the structure builder
 * beside the polarization model; each rule computes the unstrained edges of one material and
 * returns them as a {@link org.wurtzkit.bands.BandEdges} record (eV, on the parameter set's scale),
 * with no shared state. Strain shifts are added by the structure when its switch asks for them.
 *
 * <p>A new line-up must be an immutable, thread-safe value (a record), validate its own parameters
 * in its constructor, take its inputs only from the parameter set and the material it is given,
 * and cite the paper whose rule it implements in its Javadoc. Adding one means adding it to the
 * {@code permits} clause, which keeps the closed-form model and the full solver on one rule.
 */
package org.wurtzkit.bands;
