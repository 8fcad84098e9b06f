package org.wurtzkit.structure;

import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarization;
import org.wurtzkit.strain.BandEdgeShift;
import org.wurtzkit.strain.Strain;
import org.wurtzkit.units.Decimals;

/**
 * Material, strain and polarization at one point of a structure.
 *
 * @param material           the material there
 * @param inPlaneLatticeA    the actual in-plane lattice constant there (m)
 * @param strain             its strain
 * @param polarization       its polarization along [0001] (C/m&sup2;)
 * @param alongGrowth        growth-direction component of the total polarization, P_z (C/m&sup2;)
 * @param bandShift          strain shifts of the band edges (eV)
 */
public record PointState(WurtziteMaterial material, double inPlaneLatticeA, Strain strain, Polarization polarization,
        double alongGrowth, BandEdgeShift bandShift) {

    /**
     * @return e.g. {@code "Al0.26Ga0.74N on a = 3.189 A: eps_xx = ..., P_sp = ..., P_z = -0.0541 C/m^2, dE_c = ..."}
     */
    @Override
    public String toString() {
        return material.name() + " on a = " + Decimals.format(inPlaneLatticeA * 1e10, "A") + ": " + strain + ", "
                + polarization + ", P_z = " + Decimals.format(alongGrowth, "C/m^2") + ", " + bandShift;
    }
}
