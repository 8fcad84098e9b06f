/**
 * 2DEG mobility and sheet resistance from momentum relaxation rates, per subband, with the
 * subbands' own numerical wavefunctions.
 *
 * <p>Entry point: {@link org.wurtzkit.solvers.transport.mobility.Mobility#of}. The mechanisms are an
 * explicit, open list ({@link org.wurtzkit.solvers.transport.mobility.ScatteringMechanism}); each
 * returns the momentum relaxation rate 1/tau of one subband. Elastic rates follow the 2D golden-rule
 * form of T. Ando, A. B. Fowler and F. Stern, Rev. Mod. Phys. 54, 437 (1982):
 * 1/tau = (m/(2 pi hbar^3)) integral over theta of |U(q)|^2 (1 - cos theta), q = 2 k_F sin(theta/2),
 * evaluated at the subband's Fermi wave vector, which with u = q/(2 k_F) is
 * 1/tau = (4 m/(pi hbar^3)) integral_0^1 u^2 |U(2 k_F u)|^2 du / sqrt(1 - u^2); the integral is done
 * by Gauss-Legendre quadrature after u = sin t, which removes the end-point singularity.
 *
 * <p>Multi-subband treatment: every subband keeps its own rates (intrasubband scattering with its own
 * k_F, mass and form factors); intersubband scattering is neglected and the subbands conduct in
 * parallel, so sigma = e sum n_i mu_i, R_sh = 1/sigma and the total mobility is the n_i-weighted mean
 * of the mu_i. This is the diagonal approximation discussed for multi-subband transport by Ando,
 * Fowler and Stern (1982); it is good when one subband holds most electrons (in AlGaN/GaN at
 * 1e13 cm^-2 the ground subband holds most of them) and it overestimates the mobility of the excited
 * subbands, whose intersubband channels are left out. Screening is static and diagonal
 * (Thomas-Fermi, with each subband's screening form factor).
 *
 * <p>Interfaces. Each subband scatters at the interface nearest its peak; the material across it is
 * {@link org.wurtzkit.solvers.transport.mobility.SubbandScattering#interfaceBarrier()}. The roughness of an
 * AlN/GaN interface (under an AlN interlayer) is not that of an AlGaN/GaN one; the default applies the one
 * {@link org.wurtzkit.solvers.transport.mobility.InterfaceRoughness#DEFAULT} to both and says so in a
 * warning, and {@link org.wurtzkit.solvers.transport.mobility.InterfaceRoughnessByBarrier} sets it per
 * barrier. With a 1 nm AlN interlayer the alloy scattering vanishes and the roughness of that interface
 * decides how much of the measured low-temperature gain the model shows.
 */
package org.wurtzkit.solvers.transport.mobility;
