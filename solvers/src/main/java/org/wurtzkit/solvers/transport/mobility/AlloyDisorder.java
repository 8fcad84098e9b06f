package org.wurtzkit.solvers.transport.mobility;

/**
 * Alloy-disorder scattering from the part of the wavefunction inside alloy layers (the barrier, an
 * alloy channel or back barrier), short-range and unscreened: 1/tau = (m/hbar^3) integral Omega_0(z)
 * sum x_i x_j U_ij^2 psi^4 dz (G. Bastard, Appl. Phys. Lett. 43, 591 (1983); L. Hsu and W. Walukiewicz,
 * Phys. Rev. B 56, 1520 (1997)), with Omega_0 = (sqrt 3/4) a^2 c the volume per cation and U_ij the
 * potentials of the parameter set ({@link org.wurtzkit.material.AlloyScattering}). For an exponential
 * tail psi^2 = 2 kappa P_b exp(-2 kappa |z|) holding the probability P_b, integral psi^4 = kappa P_b^2.
 * A binary spacer (an AlN interlayer) has no disorder and pushes the wavefunction out of the alloy,
 * which is why it raises the mobility.
 */
public record AlloyDisorder() implements ScatteringMechanism {
    @Override
    public String name() {
        return "alloy disorder";
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        return s.mass() / Rates.HBAR3 * s.alloyIntegral();
    }
}
