/**
 * The layer stack a solver works on. {@link org.wurtzkit.structure.Structure#builder} grows
 * {@link org.wurtzkit.structure.Layer}s bottom-up (uniform, graded or custom
 * {@link org.wurtzkit.structure.LayerMaterial}; shallow {@link org.wurtzkit.structure.Dopant}s,
 * {@link org.wurtzkit.structure.DeltaDoping} sheets and {@link org.wurtzkit.structure.DeepLevel}s),
 * deposits an optional gate stack of amorphous {@link org.wurtzkit.structure.InsulatorLayer}s on
 * top (no nitride may be grown on them; no polarization, no strain, no carriers), puts
 * {@link org.wurtzkit.structure.InterfaceSheet}s (fixed charge and
 * {@link org.wurtzkit.structure.InterfaceStates}) on the top faces of nitride layers,
 * closes it with a {@link org.wurtzkit.structure.TopBoundary} (Schottky gate or free surface) and a
 * {@link org.wurtzkit.structure.BottomBoundary}, and fixes the parameter set, the in-plane reference
 * lattice, polarity, polarization model and temperature. The built {@code Structure} is immutable
 * and thread-safe; it resolves each layer once into {@link org.wurtzkit.structure.LayerState}s and
 * {@link org.wurtzkit.structure.PointState}s (material, strain, polarization) and reports the bound
 * {@link org.wurtzkit.structure.InterfaceCharge}s. Depth is measured from the surface downward, in
 * metres. Model choices that belong to the stack itself are set here, not in a solver's options:
 * the polarization model, the band line-up ({@link org.wurtzkit.bands.BandAlignment}) and whether
 * strain shifts the band edges.
 */
package org.wurtzkit.structure;
