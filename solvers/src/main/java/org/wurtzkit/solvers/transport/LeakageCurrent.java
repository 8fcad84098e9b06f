package org.wurtzkit.solvers.transport;

import java.util.List;
import org.wurtzkit.errors.Require;
import org.wurtzkit.warnings.Warning;

/**
 * The gate leakage current density of one converged solution, by mechanism. Sign as for a Schottky
 * diode: positive in forward bias (conventional current from the gate metal into the semiconductor,
 * electrons leaving the semiconductor for the gate), negative in reverse bias. Current densities are
 * in A/m^2 (SI); the {@code ...APerCm2} accessors give A/cm^2.
 *
 * @param gateBiasV         the gate bias V_g of the solution (V)
 * @param thermionic        over the top of the barrier (A/m^2); 0 if not computed
 * @param tunnelling        through the barrier, below its top (A/m^2); 0 if not computed
 * @param pooleFrenkel      Poole-Frenkel emission (A/m^2); 0 if not computed
 * @param barrierTopEv      the highest conduction-band edge between gate and channel, with image-force
 *                          lowering if chosen (eV, relative to the bottom contact's Fermi level)
 * @param barrierFieldVPerM the magnitude of the mean field in the barrier layers (V/m), the field of
 *                          Poole-Frenkel emission
 * @param warnings          what the result rests on that may not hold, typed (empty when nothing)
 */
public record LeakageCurrent(double gateBiasV, double thermionic, double tunnelling, double pooleFrenkel,
        double barrierTopEv, double barrierFieldVPerM, List<Warning> warnings) {
    private static final double A_PER_M2_PER_A_PER_CM2 = 1e4;

    /**
     * Validates and copies the warnings.
     *
     * @param gateBiasV the gate bias V_g of the solution (V)
     * @param thermionic over the top of the barrier (A/m^2); 0 if not computed
     * @param tunnelling through the barrier, below its top (A/m^2); 0 if not computed
     * @param pooleFrenkel Poole-Frenkel emission (A/m^2); 0 if not computed
     * @param barrierTopEv the highest conduction-band edge between gate and channel, with image-force lowering if chosen (eV, relative to the bottom contact's Fermi level)
     * @param barrierFieldVPerM the magnitude of the mean field in the barrier layers (V/m), the field of Poole-Frenkel emission
     * @param warnings what the result rests on that may not hold (empty when nothing)
     */
    public LeakageCurrent {
        Require.nonNull("warnings", warnings);
        warnings = List.copyOf(warnings);
    }

    /** @return the sum of the computed mechanisms (A/m^2) */
    public double total() {
        return thermionic + tunnelling + pooleFrenkel;
    }

    /** @return {@link #total()} in A/cm^2 */
    public double totalAPerCm2() {
        return total() / A_PER_M2_PER_A_PER_CM2;
    }

    /** @return {@link #thermionic()} in A/cm^2 */
    public double thermionicAPerCm2() {
        return thermionic / A_PER_M2_PER_A_PER_CM2;
    }

    /** @return {@link #tunnelling()} in A/cm^2 */
    public double tunnellingAPerCm2() {
        return tunnelling / A_PER_M2_PER_A_PER_CM2;
    }

    /** @return {@link #pooleFrenkel()} in A/cm^2 */
    public double pooleFrenkelAPerCm2() {
        return pooleFrenkel / A_PER_M2_PER_A_PER_CM2;
    }
}
