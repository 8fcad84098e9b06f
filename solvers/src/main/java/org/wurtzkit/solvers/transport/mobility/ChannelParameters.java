package org.wurtzkit.solvers.transport.mobility;

import org.wurtzkit.errors.Require;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * The material constants of the layer that holds a subband, as the scattering rates use them (SI).
 *
 * <p>{@link #of(WurtziteMaterial)} takes them from a parameter set. The longitudinal sound velocity
 * is not a parameter of its own: it is derived from the stiffness constants and the mass density as
 * v_L = sqrt(c_L/rho) with c_L = (8 C11 + 4 C13 + 3 C33 + 8 C44)/15, the average over all directions
 * n of the longitudinal stiffness C_ijkl n_i n_j n_k n_l of a hexagonal crystal (derived here with
 * the sphere averages n_x^4 = 1/5, n_x^2 n_y^2 = 1/15 and C66 = (C11 - C12)/2). Phonons that
 * scatter a 2DEG travel in every direction (their component along c is set by the confinement), so a
 * direction average is the natural single number. For GaN with the Brillouin constants of Polian et
 * al., J. Appl. Phys. 79, 3343 (1996), and rho = 6.15 g/cm^3 this gives 7.8 km/s; handbook tables
 * quote 6.56-6.59 km/s, which makes the deformation-potential mobility (proportional to rho v_L^2)
 * 1.4 times lower. A caller who wants a tabulated velocity builds the record directly.
 *
 * @param staticPermittivity        relative static permittivity
 * @param highFrequencyPermittivity relative high-frequency permittivity
 * @param loPhononEnergyEv          hbar omega_LO (eV)
 * @param massDensity               rho (kg/m^3)
 * @param longitudinalSoundVelocity v_L (m/s)
 * @param deformationPotentialEv    acoustic deformation potential Xi (eV)
 * @param electromechanicalCoupling angular-averaged K^2
 * @param latticeC                  lattice constant c (m): the spacing of charges on a dislocation line
 */
public record ChannelParameters(double staticPermittivity, double highFrequencyPermittivity, double loPhononEnergyEv,
        double massDensity, double longitudinalSoundVelocity, double deformationPotentialEv,
        double electromechanicalCoupling, double latticeC) {
    /**
     * Validates every value.
     *
     * @param staticPermittivity relative static permittivity
     * @param highFrequencyPermittivity relative high-frequency permittivity
     * @param loPhononEnergyEv hbar omega_LO (eV)
     * @param massDensity rho (kg/m^3)
     * @param longitudinalSoundVelocity v_L (m/s)
     * @param deformationPotentialEv acoustic deformation potential Xi (eV)
     * @param electromechanicalCoupling angular-averaged K^2
     * @param latticeC lattice constant c (m): the spacing of charges on a dislocation line
     */
    public ChannelParameters {
        Require.positive("static permittivity", staticPermittivity);
        Require.inRange("high-frequency permittivity", highFrequencyPermittivity, Double.MIN_VALUE,
                staticPermittivity);
        Require.positive("LO phonon energy (eV)", loPhononEnergyEv);
        Require.positive("mass density (kg/m^3)", massDensity);
        Require.positive("longitudinal sound velocity (m/s)", longitudinalSoundVelocity);
        Require.finite("acoustic deformation potential (eV)", deformationPotentialEv);
        Require.inRange("electromechanical coupling K^2", electromechanicalCoupling, 0, 1);
        Require.positive("lattice constant c (m)", latticeC);
    }

    /**
     * @param m a material of a parameter set
     * @return its scattering constants, v_L derived from its C_ij and density
     */
    public static ChannelParameters of(WurtziteMaterial m) {
        Require.nonNull("material", m);
        double rho = m.get(MaterialParameter.MASS_DENSITY);
        return new ChannelParameters(m.permittivityStatic(), m.permittivityHighFrequency(),
                m.get(MaterialParameter.LO_PHONON_ENERGY), rho,
                Math.sqrt(averageLongitudinalStiffness(m) / rho),
                m.get(MaterialParameter.ACOUSTIC_DEFORMATION_POTENTIAL),
                m.get(MaterialParameter.ELECTROMECHANICAL_COUPLING), m.latticeC());
    }

    /**
     * @param m a material
     * @return (8 C11 + 4 C13 + 3 C33 + 8 C44)/15 (Pa), the direction average of the longitudinal stiffness
     */
    public static double averageLongitudinalStiffness(WurtziteMaterial m) {
        return (8 * m.get(MaterialParameter.C11) + 4 * m.get(MaterialParameter.C13) + 3 * m.get(MaterialParameter.C33)
                + 8 * m.get(MaterialParameter.C44)) / 15;
    }

    /**
     * @param velocity a tabulated longitudinal sound velocity (m/s)
     * @return a copy with that velocity
     */
    public ChannelParameters withLongitudinalSoundVelocity(double velocity) {
        return new ChannelParameters(staticPermittivity, highFrequencyPermittivity, loPhononEnergyEv, massDensity,
                velocity, deformationPotentialEv, electromechanicalCoupling, latticeC);
    }

    /**
     * @param xiEv an acoustic deformation potential (eV)
     * @return a copy with it
     */
    public ChannelParameters withDeformationPotentialEv(double xiEv) {
        return new ChannelParameters(staticPermittivity, highFrequencyPermittivity, loPhononEnergyEv, massDensity,
                longitudinalSoundVelocity, xiEv, electromechanicalCoupling, latticeC);
    }
}
