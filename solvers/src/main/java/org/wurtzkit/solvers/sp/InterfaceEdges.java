package org.wurtzkit.solvers.sp;

import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * The band edges on both sides of one internal interface of a solved stack (eV, bottom contact's
 * Fermi level at 0). The potential is continuous, so each step is the band offset of the line-up.
 *
 * @param index             interface index from the surface (0 is the shallowest)
 * @param depth             depth of the interface (m)
 * @param upperLayer        name of the layer above
 * @param lowerLayer        name of the layer below
 * @param conductionAboveEv E_c just above the interface, in the upper layer (eV)
 * @param conductionBelowEv E_c just below the interface, in the lower layer (eV)
 * @param valenceAboveEv    E_v just above the interface (eV)
 * @param valenceBelowEv    E_v just below the interface (eV)
 */
public record InterfaceEdges(int index, double depth, String upperLayer, String lowerLayer, double conductionAboveEv,
        double conductionBelowEv, double valenceAboveEv, double valenceBelowEv) {

    /** {@return depth of the interface (nm)} */
    public double depthNm() {
        return Units.mToNm(depth);
    }

    /** {@return the conduction-band step, E_c above minus E_c below (eV)} */
    public double conductionStepEv() {
        return conductionAboveEv - conductionBelowEv;
    }

    /** {@return the valence-band step, E_v above minus E_v below (eV)} */
    public double valenceStepEv() {
        return valenceAboveEv - valenceBelowEv;
    }

    /** @return e.g. {@code "interface barrier/buffer at 25 nm: E_c 0.312 eV above, -0.105 eV below"} */
    @Override
    public String toString() {
        return "interface " + upperLayer + "/" + lowerLayer + " at " + Decimals.format(depthNm(), "nm") + ": E_c "
                + Decimals.format(conductionAboveEv, "eV") + " above, " + Decimals.format(conductionBelowEv, "eV")
                + " below";
    }
}
