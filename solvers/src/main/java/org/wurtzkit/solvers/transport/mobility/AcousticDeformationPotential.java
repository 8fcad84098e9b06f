package org.wurtzkit.solvers.transport.mobility;

import java.util.Locale;
import java.util.Optional;
import org.wurtzkit.units.Constants;

/**
 * Acoustic-phonon scattering through the deformation potential, elastic and in equipartition,
 * unscreened: 1/tau = m Xi^2 k_B T/(hbar^3 rho v_L^2) integral psi^4 dz (P. J. Price, Ann. Phys.
 * 133, 217 (1981); Ando, Fowler &amp; Stern, Rev. Mod. Phys. 54, 437 (1982); for the Fang-Howard
 * function integral psi^4 = 3b/16). Xi, rho and v_L are those of the channel
 * ({@link ChannelParameters}).
 *
 * <p>Equipartition needs k_B T above the largest phonon energy that can be exchanged, hbar v_L 2 k_F
 * (about 8 meV in GaN at 1e13 cm^-2, i.e. about 100 K); below it (the Bloch-Grueneisen regime) this
 * rate is too high, and the result says so.
 */
public record AcousticDeformationPotential() implements ScatteringMechanism {
    @Override
    public String name() {
        return "acoustic deformation potential";
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        ChannelParameters c = s.channel();
        double xi = c.deformationPotentialEv() * Rates.E;
        return s.mass() * xi * xi * Constants.BOLTZMANN * s.temperatureK() * s.psiFourthIntegral()
                / (Rates.HBAR3 * c.massDensity() * c.longitudinalSoundVelocity() * c.longitudinalSoundVelocity());
    }

    @Override
    public Optional<String> warning(SubbandScattering s) {
        double kt = Constants.BOLTZMANN * s.temperatureK();
        double phonon = Constants.HBAR * s.channel().longitudinalSoundVelocity() * 2 * s.fermiWaveVector();
        if (kt < phonon) {
            return Optional.of(String.format(Locale.ROOT, "acoustic phonons: k_B T = %.1f meV is below the largest"
                    + " exchanged phonon energy hbar v_L 2 k_F = %.1f meV; equipartition overestimates the rate"
                    + " (Bloch-Grueneisen regime)", kt / Rates.E * 1e3, phonon / Rates.E * 1e3));
        }
        return Optional.empty();
    }
}
