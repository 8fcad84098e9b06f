/**
 * Strain of pseudomorphic c-plane layers and what strain does. {@link org.wurtzkit.strain.Strain}
 * is the biaxial state of a layer on an in-plane lattice, eps<sub>xx</sub> = eps<sub>yy</sub> =
 * (a<sub>s</sub> - a)/a and eps<sub>zz</sub> = -2 (C<sub>13</sub>/C<sub>33</sub>) eps<sub>xx</sub>,
 * with optional partial relaxation; {@link org.wurtzkit.strain.BandEdgeShift} gives the
 * deformation-potential shifts of the band edges (S. L. Chuang and C. S. Chang, Phys. Rev. B 54,
 * 2491 (1996)); {@link org.wurtzkit.strain.CriticalThickness} is the Matthews-Blakeslee estimate
 * (J. W. Matthews and A. E. Blakeslee, J. Cryst. Growth 27, 118 (1974)), only an estimate for
 * AlGaN on GaN, which may relax by cracking first. All types are immutable records in SI units.
 */
package org.wurtzkit.strain;
