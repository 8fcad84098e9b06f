package org.wurtzkit.solvers.transport;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Constants;

/**
 * Thermionic emission over a Schottky barrier in closed form (H. A. Bethe's theory as given by S. M.
 * Sze and K. K. Ng, <i>Physics of Semiconductor Devices</i>, 3rd ed., Wiley 2007, ch. 3):
 *
 * <pre>
 * J = A* T^2 exp(-q phi_B / kT) [exp(qV / kT) - 1],   A* = 4 pi q m* k^2 / h^3
 * </pre>
 *
 * with V the forward bias (positive: the metal positive against the n-type semiconductor) and J the
 * conventional current from the metal into the semiconductor. A* = 120.17 A cm^-2 K^-2 times (m* / m0)
 * (computed from the CODATA constants). {@link GateLeakage} does not use this formula; it integrates
 * the computed barrier (see {@link TunnelCurrent}), and this class is the reference it reduces to.
 */
public final class ThermionicEmission {
    private ThermionicEmission() {
    }

    /**
     * @param mass effective mass m* (m0), in (0, 100]
     * @return the Richardson constant A* = 4 pi q m* k^2 / h^3 (A m^-2 K^-2)
     */
    public static double richardsonConstant(double mass) {
        if (!(mass > 0 && mass <= 100)) {
            throw new InvalidParameterException("Richardson mass (m0)", Double.toString(mass), "(0, 100]");
        }
        double h = Constants.PLANCK;
        return 4 * Math.PI * Constants.ELEMENTARY_CHARGE * mass * Constants.ELECTRON_MASS * Constants.BOLTZMANN
                * Constants.BOLTZMANN / (h * h * h);
    }

    /**
     * The ideal thermionic-emission current of a Schottky diode.
     *
     * @param barrierEv    phi_B (eV), in [0, 6]
     * @param biasV        forward bias V (V), finite
     * @param mass         m* for A* (m0)
     * @param temperatureK T (K), in [{@value TunnelCurrent#MIN_TEMPERATURE_K},
     *                     {@value TunnelCurrent#MAX_TEMPERATURE_K}]
     * @return J (A/m^2), positive in forward bias
     */
    public static double diodeCurrent(double barrierEv, double biasV, double mass, double temperatureK) {
        Require.inRange("Schottky barrier height (eV)", barrierEv, 0, 6);
        Require.finite("bias (V)", biasV);
        TunnelCurrent.checkTemperature(temperatureK);
        double kT = Constants.BOLTZMANN_EV * temperatureK;
        return richardsonConstant(mass) * temperatureK * temperatureK * Math.exp(-barrierEv / kT)
                * Math.expm1(biasV / kT);
    }
}
