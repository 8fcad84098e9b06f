/**
 * Spontaneous and piezoelectric polarization of strained layers. A
 * {@link org.wurtzkit.material.PolarizationModel} chooses linear or bowed spontaneous
 * polarization and a piezoelectric part linear in strain or nonlinear (F. Bernardini and
 * V. Fiorentini, Phys. Rev. B 64, 085207 (2001)); the default comes from the parameter set.
 * {@link org.wurtzkit.polarization.Polarization} holds the components along [0001] in C/m<sup>2</sup>
 * in the sign convention of F. Bernardini, V. Fiorentini and D. Vanderbilt, Phys. Rev. B 56, R10024
 * (1997); {@link org.wurtzkit.polarization.Polarity} turns them into the component along the growth
 * direction, which flips sign for N-face growth. The bound sheet charge at an interface is
 * sigma = P<sub>z</sub>(lower) - P<sub>z</sub>(upper); electrons gather where sigma &gt; 0.
 */
package org.wurtzkit.polarization;
