package org.wurtzkit.solvers.transport.mobility;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * Scattering by charged threading dislocations crossing the 2DEG: lines of charge e f/c along c
 * (one acceptor-like site per lattice constant c, a fraction f filled) with density N_dis, screened by
 * the 2DEG (D. Jena, A. C. Gossard and U. K. Mishra, Appl. Phys. Lett. 76, 1707 (2000); formula as
 * recalled and re-derived with the golden-rule integral of Ando, Fowler &amp; Stern 1982):
 * 1/tau = (N_dis m e^4 f^2/(4 pi hbar^3 epsilon^2 c^2 k_F^4)) integral_0^1 du/((u + q_s/(2 k_F))^2
 * sqrt(1 - u^2)). As in that paper the line's potential is uniform across the well (no form factor) and
 * the screening has no form factor either. Without screening the rate diverges (the integrand goes as
 * 1/u^2), so the mechanism refuses a zero screening wave vector.
 *
 * <p>Default ({@link #DEFAULT}): 5e8 cm^-2, f = 1, a typical threading-dislocation density of
 * MOCVD GaN on SiC or sapphire (common practice, no source) with every site filled (the upper bound
 * used by Jena et al.).
 *
 * @param density   N_dis (m^-2), in [0, 1e17] (up to 1e13 cm^-2)
 * @param occupancy f, in [0, 1]
 */
public record ChargedDislocations(double density, double occupancy) implements ScatteringMechanism {
    /** 5e8 cm^-2, f = 1. */
    public static final ChargedDislocations DEFAULT = perCm2(5e8, 1);

    /**
     * Validates the ranges.
     *
     * @param density N_dis (m^-2), in [0, 1e17] (up to 1e13 cm^-2)
     * @param occupancy f, in [0, 1]
     */
    public ChargedDislocations {
        Require.inRange("dislocation density (m^-2)", density, 0, 1e17);
        Require.inRange("dislocation occupancy f", occupancy, 0, 1);
    }

    /**
     * @param densityPerCm2 N_dis (cm^-2), in [0, 1e13]
     * @param occupancy     f, in [0, 1]
     * @return the mechanism
     */
    public static ChargedDislocations perCm2(double densityPerCm2, double occupancy) {
        Require.inRange("dislocation density (cm^-2)", densityPerCm2, 0, 1e13);
        return new ChargedDislocations(densityPerCm2 * 1e4, occupancy);
    }

    @Override
    public String name() {
        return "charged dislocations";
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        if (density > 0 && occupancy > 0 && !(s.screeningWaveVector() > 0)) {
            throw new InvalidParameterException("screening wave vector for dislocation scattering (1/m)",
                    Double.toString(s.screeningWaveVector()),
                    "(0, +inf): the rate of an unscreened charged line diverges as integral du/u^2");
        }
        double kf = s.fermiWaveVector();
        double a = s.screeningWaveVector() / (2 * kf);
        double sum = 0;
        for (int j = 0; j < s.quadratureSize(); j++) {
            double d = s.node(j) + a;
            sum += s.weight(j) / (d * d);
        }
        double eps = s.permittivity();
        double c = s.channel().latticeC();
        double e2 = Rates.E * Rates.E;
        return density * s.mass() * e2 * e2 * occupancy * occupancy
                / (4 * Math.PI * Rates.HBAR3 * eps * eps * c * c * kf * kf * kf * kf) * sum;
    }
}
