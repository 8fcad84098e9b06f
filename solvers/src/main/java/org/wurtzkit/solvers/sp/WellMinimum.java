package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * The lowest conduction-band edge inside one quantum window of a solved stack, where its well
 * bottoms out (eV, bottom contact's Fermi level at 0). At an interface node the lower of the two
 * sides counts.
 *
 * @param window          the window's index (as in {@link Solution#quantumWindows()})
 * @param depth           depth of the minimum (m)
 * @param conductionEv    E_c there (eV)
 */
public record WellMinimum(int window, double depth, double conductionEv) {

    /** {@return depth of the minimum (nm)} */
    public double depthNm() {
        return Units.mToNm(depth);
    }

    /** @return e.g. {@code "well of window 0: E_c minimum -0.402 eV at 25 nm"} */
    @Override
    public String toString() {
        return "well of window " + window + ": E_c minimum " + Decimals.format(conductionEv, "eV") + " at "
                + Decimals.format(depthNm(), "nm");
    }

    /**
     * Finds the lowest conduction-band edge of each quantum window of a solved device.
     *
     * @param d       the resolved device
     * @param depth   the node depths (m)
     * @param phi     the converged potential (V)
     * @param windows how many windows were solved (0 for a classical solve)
     * @return one record per window, shallowest first
     */
    static List<WellMinimum> of(Device d, double[] depth, double[] phi, int windows) {
        int nn = d.n;
        List<WellMinimum> minima = new ArrayList<>(windows);
        for (int w = 0; w < windows; w++) {
            int best = d.windowStart[w];
            double lowest = Double.POSITIVE_INFINITY;
            for (int i = d.windowStart[w]; i <= d.windowEnd[w]; i++) {
                // both sides of a node: the cells above (i - 1) and below (i)
                double e = Math.min(i > 0 ? d.ec[i - 1] : d.ec[0], i < nn - 1 ? d.ec[i] : d.ec[nn - 2]) - phi[i];
                if (e < lowest) {
                    lowest = e;
                    best = i;
                }
            }
            minima.add(new WellMinimum(w, depth[best], lowest));
        }
        return List.copyOf(minima);
    }
}
