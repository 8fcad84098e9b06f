package org.wurtzkit.solvers.sp;

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
}
