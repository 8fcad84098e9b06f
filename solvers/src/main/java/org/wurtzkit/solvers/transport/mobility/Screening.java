package org.wurtzkit.solvers.transport.mobility;

/**
 * Static screening of the Coulomb-like matrix elements by the 2DEG: epsilon(q) = 1 + q_s G(q)/q
 * (Ando, Fowler &amp; Stern, Rev. Mod. Phys. 54, 437 (1982)), with q_s = (e^2/(2 epsilon)) dn/dE_F
 * summed over subbands.
 */
public enum Screening {
    /** No screening: q_s = 0 (an upper bound on the Coulomb rates). */
    NONE,
    /**
     * Degenerate 2D Thomas-Fermi: q_s = m e^2/(2 pi epsilon hbar^2) for each subband below the Fermi
     * level (the T = 0 limit; spin 2, one valley).
     */
    THOMAS_FERMI_DEGENERATE,
    /**
     * Thomas-Fermi at the lattice temperature: dn_i/dE_F = (m_i/(pi hbar^2)) (1 - exp(-n_i/(D_i k_B T))),
     * which follows from n_i = D_i k_B T ln(1 + exp((E_F - E_i)/k_B T)) (common practice, no source);
     * equal to the degenerate form for E_F - E_i &gt;&gt; k_B T and weaker for nearly empty subbands.
     * The default.
     */
    THOMAS_FERMI
}
