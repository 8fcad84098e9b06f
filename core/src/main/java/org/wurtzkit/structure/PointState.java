package org.wurtzkit.structure;

import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarization;
import org.wurtzkit.strain.BandEdgeShift;
import org.wurtzkit.strain.Strain;

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
}
