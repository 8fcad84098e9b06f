package org.wurtzkit.solvers.transport.mobility;

import org.wurtzkit.units.Constants;

/**
 * A Fang-Howard subband sampled on a uniform mesh, for the closed-form checks: psi^2 = (b^3/2) z^2
 * exp(-b z) below an interface at depth {@link #INTERFACE} (F. F. Fang and W. E. Howard, Phys. Rev.
 * Lett. 16, 797 (1966)), with b = (33 m e^2 n_s/(8 epsilon hbar^2))^(1/3) (Ando, Fowler &amp; Stern,
 * Rev. Mod. Phys. 54, 437 (1982), no depletion charge).
 */
final class FangHoward {
    /** Depth of the interface (m). */
    static final double INTERFACE = 30e-9;
    /** Mesh step (m). */
    static final double STEP = 0.005e-9;
    /** Mesh length (m). */
    static final double LENGTH = 80e-9;

    private FangHoward() {
    }

    static double b(double massRelative, double epsRelative, double ns) {
        double e = Constants.ELEMENTARY_CHARGE;
        return Math.cbrt(33 * massRelative * Constants.ELECTRON_MASS * e * e * ns
                / (8 * epsRelative * Constants.VACUUM_PERMITTIVITY * Constants.HBAR * Constants.HBAR));
    }

    static double[] depth() {
        return depth(STEP);
    }

    static double[] depth(double step) {
        int n = (int) Math.round(LENGTH / step) + 1;
        double[] x = new double[n];
        for (int k = 0; k < n; k++) {
            x[k] = k * step;
        }
        return x;
    }

    static double[] psiSquared(double[] x, double b) {
        double[] p = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            double z = x[k] - INTERFACE;
            p[k] = z > 0 ? 0.5 * b * b * b * z * z * Math.exp(-b * z) : 0;
        }
        return p;
    }

    /** 2D degenerate Thomas-Fermi wave vector m e^2/(2 pi epsilon hbar^2) (1/m). */
    static double thomasFermi(double massRelative, double epsRelative) {
        double e = Constants.ELEMENTARY_CHARGE;
        return massRelative * Constants.ELECTRON_MASS * e * e
                / (2 * Math.PI * epsRelative * Constants.VACUUM_PERMITTIVITY * Constants.HBAR * Constants.HBAR);
    }
}
