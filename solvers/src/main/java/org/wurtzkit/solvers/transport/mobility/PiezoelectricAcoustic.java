package org.wurtzkit.solvers.transport.mobility;

import org.wurtzkit.units.Constants;

/**
 * Acoustic-phonon scattering through the piezoelectric field, elastic, equipartition, with the
 * angular-averaged coupling K^2 and static screening (L. Hsu and W. Walukiewicz, Phys. Rev. B 56, 1520
 * (1997); the squared bare matrix element e^2 K^2 k_B T G(q)/(2 epsilon q) put into the 2D golden-rule
 * integral of Ando, Fowler &amp; Stern 1982):
 * 1/tau = (m e^2 K^2 k_B T/(pi hbar^3 epsilon k_F)) integral_0^1 u G(q) S(q) du/sqrt(1 - u^2), with S the
 * squared screening factor ({@link SubbandScattering#screeningFactorSquared}) and q = 2 k_F u. Published
 * forms of this rate differ in how the phonon's component along c is averaged (through G or a
 * separate form factor); this one is stated with the formula so that a fit can use the same.
 */
public record PiezoelectricAcoustic() implements ScatteringMechanism {
    @Override
    public String name() {
        return "piezoelectric acoustic";
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        double sum = 0;
        for (int j = 0; j < s.quadratureSize(); j++) {
            sum += s.weight(j) * s.node(j) * s.formFactor(j) * s.screeningFactorSquared(j);
        }
        double m = s.mass();
        return m * Rates.E * Rates.E * s.channel().electromechanicalCoupling() * Constants.BOLTZMANN * s.temperatureK()
                / (Math.PI * Rates.HBAR3 * s.permittivity() * s.fermiWaveVector()) * sum;
    }
}
