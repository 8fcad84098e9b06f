package org.wurtzkit.solvers.sp;

import java.util.List;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * Where electrons are treated quantum mechanically. Inside a window the electron density is the sum
 * over the subbands of the effective-mass Schroedinger equation (wavefunction zero at the window's
 * two ends); outside it, and for holes everywhere, densities are classical (Fermi-Dirac, 3D).
 */
public sealed interface QuantumRegion permits QuantumRegion.Automatic, QuantumRegion.None, QuantumRegion.Windows {

    /**
     * The default: a window reaching a given distance above and below every interface of the stack
     * (where wells form), overlapping windows merged, clipped to the stack; no window for a stack
     * without interfaces. For a HEMT barrier under 40 nm this is one window from the surface to 40 nm
     * below the channel interface.
     *
     * @param extension how far each window reaches on both sides of its interface (m), in [1 nm, 1 um]
     */
    record Automatic(double extension) implements QuantumRegion {
        /** Validates. */
        public Automatic {
            Require.inRange("quantum window extension around an interface (m)", extension, 1e-9, 1e-6);
        }

        /** @return e.g. {@code "automatic quantum windows, 40 nm on both sides of every interface"} */
        @Override
        public String toString() {
            return "automatic quantum windows, " + Decimals.format(extension * 1e9, "nm")
                    + " on both sides of every interface";
        }
    }

    /** Fully classical electrons (no Schroedinger equation). */
    record None() implements QuantumRegion {
        /** @return {@code "no quantum region (classical electrons)"} */
        @Override
        public String toString() {
            return "no quantum region (classical electrons)";
        }
    }

    /**
     * Explicit windows, each given by its top and bottom depth; they must not overlap.
     *
     * @param windows the windows, shallowest first
     */
    record Windows(List<Window> windows) implements QuantumRegion {
        /** Validates order and overlap. */
        public Windows {
            windows = Require.nonNullElements("quantum windows", windows);
            if (windows.isEmpty()) {
                throw new InvalidParameterException("number of quantum windows", "0", "[1, ...) (use QuantumRegion.none())");
            }
            for (int i = 1; i < windows.size(); i++) {
                if (windows.get(i).depthTop() < windows.get(i - 1).depthBottom()) {
                    throw new InvalidParameterException("top of quantum window " + i + " (m)",
                            Double.toString(windows.get(i).depthTop()),
                            "[" + windows.get(i - 1).depthBottom() + ", ...) (below the previous window, no overlap)");
                }
            }
        }
    }

    /**
     * One window.
     *
     * @param depthTop    depth of its top (m), &ge; 0
     * @param depthBottom depth of its bottom (m), &gt; depthTop by at least 1 nm
     */
    record Window(double depthTop, double depthBottom) {
        /** Validates. */
        public Window {
            Require.nonNegative("quantum window top depth (m)", depthTop);
            Require.finite("quantum window bottom depth (m)", depthBottom);
            if (!(depthBottom >= depthTop + 1e-9)) {
                throw new InvalidParameterException("quantum window bottom depth (m)", Double.toString(depthBottom),
                        "[" + (depthTop + 1e-9) + ", ...) (at least 1 nm below its top)");
            }
        }

        /**
         * @param topNm    top depth (nm)
         * @param bottomNm bottom depth (nm)
         * @return the window
         */
        public static Window nm(double topNm, double bottomNm) {
            return new Window(topNm * Units.NM, bottomNm * Units.NM);
        }

        /** @return e.g. {@code "window 0 to 40 nm"} */
        @Override
        public String toString() {
            return "window " + Decimals.format(depthTop * 1e9) + " to " + Decimals.format(depthBottom * 1e9, "nm");
        }
    }

    /** {@return the default automatic region: 40 nm on both sides of every interface} */
    static QuantumRegion automatic() {
        return new Automatic(40 * Units.NM);
    }

    /** {@return no quantum region} */
    static QuantumRegion none() {
        return new None();
    }

    /**
     * @param windows explicit windows
     * @return the region
     */
    static QuantumRegion windows(Window... windows) {
        return new Windows(List.of(windows));
    }
}
