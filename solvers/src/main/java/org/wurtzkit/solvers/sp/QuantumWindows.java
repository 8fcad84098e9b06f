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
public sealed interface QuantumWindows permits QuantumWindows.Automatic, QuantumWindows.BelowDeepestInterface,
        QuantumWindows.None, QuantumWindows.Explicit {

    /**
     * The default: a window reaching a given distance above and below every interface of the stack
     * (where wells form), overlapping windows merged, clipped to the stack; no window for a stack
     * without interfaces. For a HEMT barrier under 40 nm this is one window from the surface to 40 nm
     * below the channel interface.
     *
     * @param extension how far each window reaches on both sides of its interface (m), in [1 nm, 1 um]
     */
    record Automatic(double extension) implements QuantumWindows {
        /**
         * Creates the record and checks every component.
         *
         * @param extension how far each window reaches on both sides of its interface (m), in [1 nm, 1 um]
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
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

    /**
     * One window from the surface to a given distance below the deepest interface of the stack,
     * clipped to the stack (for a stack without interfaces: from the surface down to that distance).
     * Unlike {@link Automatic} it follows the stack: a thicker barrier moves the window's bottom with
     * the channel, and the window never splits in two however far apart the interfaces are.
     *
     * @param depthBelow how far the window reaches below the deepest interface (m), in [1 nm, 10 um]
     */
    record BelowDeepestInterface(double depthBelow) implements QuantumWindows {
        /**
         * Validates.
         *
         * @param depthBelow how far the window reaches below the deepest interface (m), in [1 nm, 10 um]
         */
        public BelowDeepestInterface {
            Require.inRange("quantum window depth below the deepest interface (m)", depthBelow, 1e-9, 1e-5);
        }

        /** @return e.g. {@code "one quantum window from the surface to 40 nm below the deepest interface"} */
        @Override
        public String toString() {
            return "one quantum window from the surface to " + Decimals.format(depthBelow * 1e9, "nm")
                    + " below the deepest interface";
        }
    }

    /** Fully classical electrons (no Schroedinger equation). */
    record None() implements QuantumWindows {
        /** @return {@code "no quantum windows (classical electrons)"} */
        @Override
        public String toString() {
            return "no quantum windows (classical electrons)";
        }
    }

    /**
     * Explicit windows, each given by its top and bottom depth; they must not overlap.
     *
     * @param windows the windows, shallowest first
     */
    record Explicit(List<Window> windows) implements QuantumWindows {
        /**
         * Creates the record and checks order and overlap.
         *
         * @param windows the windows, shallowest first
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public Explicit {
            windows = Require.nonNullElements("quantum windows", windows);
            if (windows.isEmpty()) {
                throw new InvalidParameterException("number of quantum windows", "0", "[1, ...) (use QuantumWindows.none())");
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
        /**
         * Creates the record and checks every component.
         *
         * @param depthTop    depth of its top (m), &ge; 0
         * @param depthBottom depth of its bottom (m), &gt; depthTop by at least 1 nm
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
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

    /** {@return the default automatic windows: 40 nm on both sides of every interface} */
    static QuantumWindows automatic() {
        return new Automatic(40 * Units.NM);
    }

    /**
     * @param nm how far the window reaches below the deepest interface (nm), in [1, 10000]
     * @return one window from the surface to that depth below the deepest interface
     */
    static QuantumWindows belowDeepestInterfaceNm(double nm) {
        return new BelowDeepestInterface(nm * Units.NM);
    }

    /** {@return no quantum windows} */
    static QuantumWindows none() {
        return new None();
    }

    /**
     * @param windows explicit windows
     * @return the windows
     */
    static QuantumWindows explicit(Window... windows) {
        return new Explicit(List.of(windows));
    }
}
