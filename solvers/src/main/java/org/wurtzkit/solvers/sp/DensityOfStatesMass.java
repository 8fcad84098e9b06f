package org.wurtzkit.solvers.sp;

/**
 * Which in-plane effective mass sets the 2D density of states m/(pi hbar^2) of a subband.
 *
 * <p>The default, {@link #WAVEFUNCTION_WEIGHTED}, averages the in-plane mass over the subband's
 * probability density |psi|^2, so that the part of the state that leaks into an AlGaN or AlN barrier
 * counts with the barrier's heavier mass (the first-order effect of the penetration; the choice of
 * G. Bastard, Wave Mechanics Applied to Semiconductor Heterostructures, Les Editions de Physique,
 * 1988, for in-plane motion, from memory). For AlGaN/GaN channels it is 1-3 % above the GaN mass;
 * cyclotron-resonance masses of AlGaN/GaN 2DEGs lie at 0.20-0.23 m0, above the bulk GaN value
 * (common practice, no source), which is consistent with a small penetration term.
 * {@link #CHANNEL} uses the mass of the material at the bottom of the well (the node of lowest
 * conduction-band edge in the window) for every subband of that window: the simpler textbook model,
 * for comparison with closed-form 2DEG models that use the GaN mass.
 */
public enum DensityOfStatesMass {
    /** m_xy = integral of |psi|^2 m_xy(x) dx over the window (the default). */
    WAVEFUNCTION_WEIGHTED,
    /** m_xy of the material at the lowest conduction-band edge of the window, for every subband. */
    CHANNEL
}
