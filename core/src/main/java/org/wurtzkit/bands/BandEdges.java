package org.wurtzkit.bands;

import org.wurtzkit.errors.Require;

/**
 * The conduction- and valence-band edges at one point, on a parameter set's energy scale.
 *
 * @param conductionEv E_c (eV)
 * @param valenceEv    E_v (eV)
 */
public record BandEdges(double conductionEv, double valenceEv) {
    /** Validates. */
    public BandEdges {
        Require.finite("conduction-band edge (eV)", conductionEv);
        Require.finite("valence-band edge (eV)", valenceEv);
    }

    /**
     * @param conductionShiftEv added to E_c (eV)
     * @param valenceShiftEv    added to E_v (eV)
     * @return the shifted edges
     */
    public BandEdges shiftedBy(double conductionShiftEv, double valenceShiftEv) {
        return new BandEdges(conductionEv + conductionShiftEv, valenceEv + valenceShiftEv);
    }

    /** @return E_c - E_v (eV) */
    public double gapEv() {
        return conductionEv - valenceEv;
    }
}
