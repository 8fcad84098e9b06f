package org.wurtzkit.solvers.transport.mobility;

import java.util.Optional;
import org.wurtzkit.units.Constants;

/**
 * Polar optical phonon scattering, as a momentum relaxation rate estimated for an electron near the
 * band edge that absorbs an LO phonon when hbar omega_LO &gt;&gt; k_B T (the limit of the analytic 2D
 * polar-optical mobility of B. Gelmont, M. Shur and M. Stroscio, J. Appl. Phys. 77, 657 (1995), form as
 * recalled, not re-checked against the paper):
 * mu = 4 epsilon_0 hbar^2 q_0 (exp(hbar omega/k_B T) - 1) / (e m^2 omega G(q_0) (1/eps_inf - 1/eps_s)),
 * q_0 = sqrt(2 m omega/hbar), G the subband's screening form factor; the rate is 1/tau = e/(m mu).
 *
 * <p>Scattering by optical phonons is inelastic (hbar omega_LO = 92 meV in GaN, comparable to the Fermi
 * energy of a 1e13 cm^-2 2DEG), so no momentum relaxation time exists in the strict sense; a full
 * answer solves the Boltzmann equation iteratively, with dynamic screening and plasmon-phonon coupling.
 * This estimate ignores degeneracy, emission and screening; the result carries a warning whenever the
 * mechanism is used.
 */
public record PolarOpticalPhonon() implements ScatteringMechanism {
    @Override
    public String name() {
        return "polar optical phonon";
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        ChannelParameters c = s.channel();
        double m = s.mass();
        double omega = c.loPhononEnergyEv() * Rates.E / Constants.HBAR;
        double q0 = Math.sqrt(2 * m * omega / Constants.HBAR);
        double occupation = 1 / Math.expm1(c.loPhononEnergyEv() / (Constants.BOLTZMANN_EV * s.temperatureK()));
        double polar = 1 / c.highFrequencyPermittivity() - 1 / c.staticPermittivity();
        return Rates.E * Rates.E * m * omega * s.formFactorAt(q0) * polar * occupation
                / (4 * Constants.VACUUM_PERMITTIVITY * Constants.HBAR * Constants.HBAR * q0);
    }

    @Override
    public Optional<String> warning(SubbandScattering s) {
        return Optional.of("polar optical phonons: inelastic scattering estimated as a momentum relaxation rate"
                + " near the band edge (Gelmont, Shur & Stroscio 1995 limit); degeneracy, phonon emission,"
                + " dynamic screening and plasmon coupling are neglected, so treat the POP-limited mobility as an"
                + " estimate, not a Boltzmann solution");
    }
}
