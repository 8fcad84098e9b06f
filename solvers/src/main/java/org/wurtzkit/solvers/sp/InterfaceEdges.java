package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.structure.Structure;
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

    /**
     * Reads the band edges on both sides of every interface of a solved device.
     *
     * @param d     the resolved device
     * @param depth the node depths (m)
     * @param phi   the converged potential (V)
     * @return one record per interface of {@link org.wurtzkit.structure.Structure#interfaceDepths()}, shallowest first
     */
    static List<InterfaceEdges> of(Device d, double[] depth, double[] phi) {
        Structure structure = d.structure;
        double[] at = structure.interfaceDepths();
        // the layers top-down, the gate stack's insulators first: interface j lies between names j and j + 1
        List<String> names = new ArrayList<>();
        for (InsulatorLayer il : structure.gateStack()) {
            names.add(il.name());
        }
        for (LayerState st : structure.layerStates()) {
            names.add(st.layer().name());
        }
        List<InterfaceEdges> out = new ArrayList<>(at.length);
        for (int j = 0; j < at.length; j++) {
            int i = Arrays.binarySearch(depth, at[j]);
            if (i < 0) { // an interface is a mesh node; take the nearest one if round-off moved it
                int ins = -i - 1;
                i = ins == 0 ? 0 : ins >= depth.length ? depth.length - 1
                        : at[j] - depth[ins - 1] <= depth[ins] - at[j] ? ins - 1 : ins;
            }
            out.add(new InterfaceEdges(j, depth[i], names.get(j), names.get(j + 1),
                    d.ec[i - 1] - phi[i], d.ec[i] - phi[i], d.ev[i - 1] - phi[i], d.ev[i] - phi[i]));
        }
        return List.copyOf(out);
    }
}
