package org.wurtzkit.solvers.transport;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Constants;

/**
 * Poole-Frenkel emission from traps in the barrier: J = C F exp{-q[phi_t - sqrt(qF/(pi eps0
 * eps_r))]/kT} (J. Frenkel, Phys. Rev. 54, 647 (1938); the form used for AlGaN/GaN gate leakage by
 * e.g. O. Mitrofanov and M. Manfra, J. Appl. Phys. 95, 6414 (2004) [citation from memory]). The
 * barrier lowering sqrt(qF/(pi eps0 eps_r)) uses the high-frequency permittivity: the emission is
 * fast compared with the lattice's response (common practice, no source; a fit that returns the
 * static value instead is a warning sign that the mechanism is not Poole-Frenkel).
 *
 * <p>Two parameters are properties of the material's traps and must come from measurements: the
 * zero-field trap barrier phi_t and the prefactor C. Published AlGaN trap barriers are about 0.5 eV
 * (Mitrofanov and Manfra, above, from memory) and 0.34 eV (R. Kumar et al., Electron. Mater. Lett.
 * (2016), doi 10.1007/s13391-015-5249-9, from its abstract); C is specific to a wafer (trap and
 * dislocation density) and has no default.
 *
 * @param trapBarrierEv phi_t (eV), in (0, 3]
 * @param prefactor     C (A V^-1 m^-1, i.e. S/m: J in A/m^2 for F in V/m), in (0, 1e6]
 */
public record PooleFrenkelEmission(double trapBarrierEv, double prefactor) {
    /**
     * Validates.
     *
     * @param trapBarrierEv phi_t (eV), in (0, 3]
     * @param prefactor C (A V^-1 m^-1, i.e. S/m: J in A/m^2 for F in V/m), in (0, 1e6]
     */
    public PooleFrenkelEmission {
        if (!(trapBarrierEv > 0 && trapBarrierEv <= 3)) {
            throw new InvalidParameterException("Poole-Frenkel trap barrier (eV)", Double.toString(trapBarrierEv),
                    "(0, 3]");
        }
        if (!(prefactor > 0 && prefactor <= 1e6)) {
            throw new InvalidParameterException("Poole-Frenkel prefactor (S/m)", Double.toString(prefactor),
                    "(0, 1e6]");
        }
    }

    /**
     * @param fieldVPerM             field magnitude F (V/m), &ge; 0
     * @param highFrequencyPermittivity eps_r, in [1, 100]
     * @return the barrier lowering sqrt(qF/(pi eps0 eps_r)) (eV)
     */
    public static double lowering(double fieldVPerM, double highFrequencyPermittivity) {
        Require.nonNegative("field (V/m)", fieldVPerM);
        Require.inRange("high-frequency relative permittivity", highFrequencyPermittivity, 1, 100);
        return Math.sqrt(Constants.ELEMENTARY_CHARGE * fieldVPerM
                / (Math.PI * Constants.VACUUM_PERMITTIVITY * highFrequencyPermittivity));
    }

    /**
     * @param fieldVPerM                field magnitude F (V/m), &ge; 0
     * @param highFrequencyPermittivity eps_r, in [1, 100]
     * @param temperatureK              T (K)
     * @return the current density magnitude C F exp(-(phi_t - lowering)/kT) (A/m^2)
     */
    public double current(double fieldVPerM, double highFrequencyPermittivity, double temperatureK) {
        TunnelCurrent.checkTemperature(temperatureK);
        double kT = Constants.BOLTZMANN_EV * temperatureK;
        double barrier = trapBarrierEv - lowering(fieldVPerM, highFrequencyPermittivity);
        return prefactor * fieldVPerM * Math.exp(-barrier / kT);
    }
}
