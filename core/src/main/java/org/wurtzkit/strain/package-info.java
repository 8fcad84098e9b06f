/**
 * Strain of pseudomorphic c-plane layers and what strain does. {@link org.wurtzkit.strain.Strain}
 * is the biaxial state of a layer on an in-plane lattice, eps<sub>xx</sub> = eps<sub>yy</sub> =
 * (a<sub>s</sub> - a)/a and eps<sub>zz</sub> = -2 (C<sub>13</sub>/C<sub>33</sub>) eps<sub>xx</sub>,
 * with optional partial relaxation; {@link org.wurtzkit.strain.BandEdgeShift} gives the
 * deformation-potential shifts of the band edges (S. L. Chuang and C. S. Chang, Phys. Rev. B 54,
 * 2491 (1996)); {@link org.wurtzkit.strain.CriticalThicknessModel} estimates where a layer starts to
 * relax: by default channel cracking for layers under tension (AlGaN on GaN relaxes by fracture
 * first, S. R. Lee et al., Appl. Phys. Lett. 85, 6164 (2004)) and Matthews-Blakeslee for a+c
 * pyramidal slip under compression (D. Holec et al., J. Cryst. Growth 303, 314 (2007));
 * {@link org.wurtzkit.strain.CriticalThickness} keeps the zinc-blende 60-degree geometry for
 * comparison. All types are immutable records in SI units.
 */
package org.wurtzkit.strain;
