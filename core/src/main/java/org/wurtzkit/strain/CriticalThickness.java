package org.wurtzkit.strain;

import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.units.Decimals;

/**
 * Matthews-Blakeslee estimate of the critical thickness of a strained layer (J. W. Matthews and
 * A. E. Blakeslee, J. Cryst. Growth 27, 118 (1974)) with the geometry of the 60-degree misfit
 * dislocations of zinc-blende layers. Kept for comparison: on c-plane wurtzite the basal-plane misfit
 * dislocations it stands for feel no resolved shear under biaxial stress, and it flags routine 20-25 nm
 * Al0.25-0.30 barriers 2-5x too early. The default is {@link CriticalThicknessModel#C_PLANE_WURTZITE}.
 *
 * <pre>
 *   h_c = b (1 - nu cos^2 alpha) / (8 pi f (1 + nu) cos lambda) * [ln(h_c / b) + 1]
 * </pre>
 *
 * with b the Burgers vector length (here the layer's lattice constant a, for a/3&lt;11-20&gt;
 * dislocations), f = |eps_xx| the misfit strain, nu the Poisson ratio for biaxial c-plane strain
 * C13/(C13 + C33), alpha the angle between dislocation line and Burgers vector and lambda the angle
 * between the slip direction and the interface normal. The defaults alpha = lambda = 60 degrees are
 * a common choice for a 60-degree dislocation (from memory).
 *
 * <p>This is an estimate only: AlGaN on GaN is observed to relax first by surface cracking at all
 * compositions (S. R. Lee et al., Appl. Phys. Lett. 85, 6164 (2004), from memory), so the true
 * limit can differ by a large factor. Use it as a warning threshold, not a growth rule.
 *
 * @param alphaDegrees  angle between dislocation line and Burgers vector (degrees), in (0, 90]
 * @param lambdaDegrees angle between slip direction and interface normal (degrees), in [0, 90)
 */
public record CriticalThickness(double alphaDegrees, double lambdaDegrees) implements CriticalThicknessModel {
    /** The default geometry, alpha = lambda = 60 degrees. */
    public static final CriticalThickness MATTHEWS_BLAKESLEE_60 = new CriticalThickness(60, 60);

    /** Validates the angles. */
    public CriticalThickness {
        if (!(alphaDegrees > 0 && alphaDegrees <= 90)) {
            throw new org.wurtzkit.errors.InvalidParameterException("dislocation angle alpha (degrees)",
                    Double.toString(alphaDegrees), "(0, 90]");
        }
        if (!(lambdaDegrees >= 0 && lambdaDegrees < 90)) {
            throw new org.wurtzkit.errors.InvalidParameterException("slip angle lambda (degrees)",
                    Double.toString(lambdaDegrees), "[0, 90)");
        }
    }

    /**
     * @param m      the layer material
     * @param strain its strain
     * @return the critical thickness (m); +infinity when unstrained; a value below the Burgers
     *         vector length means the layer is unstable at any thickness
     */
    @Override
    public double of(WurtziteMaterial m, Strain strain) {
        double f = Math.abs(strain.xx());
        if (f == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double b = m.latticeA();
        double nu = m.elastic().poissonRatio();
        double cosA = Math.cos(Math.toRadians(alphaDegrees));
        double cosL = Math.cos(Math.toRadians(lambdaDegrees));
        return solve(b * (1 - nu * cosA * cosA) / (8 * Math.PI * f * (1 + nu) * cosL), b);
    }

    /**
     * Solves the Matthews-Blakeslee equation h = k (ln(h/b) + 1).
     *
     * @param k the prefactor (m)
     * @param b the Burgers vector length (m)
     * @return the root above b, or k itself when there is none (no thickness is stable)
     */
    static double solve(double k, double b) {
        if (k <= b) {
            // h = k (ln(h/b) + 1) has no root above b: no thickness is stable
            return k;
        }
        // Fixed-point iteration h <- k (ln(h/b) + 1); contracting for h > k (derivative k/h < 1).
        double h = Math.max(10 * k, 10 * b);
        for (int i = 0; i < 200; i++) {
            double next = k * (Math.log(h / b) + 1);
            if (Math.abs(next - h) <= 1e-14 * h) {
                return next;
            }
            h = next;
        }
        return h;
    }

    /** @return e.g. {@code "Matthews-Blakeslee, alpha = 60 deg, lambda = 60 deg"} */
    @Override
    public String toString() {
        return "Matthews-Blakeslee, alpha = " + Decimals.format(alphaDegrees, "deg") + ", lambda = "
                + Decimals.format(lambdaDegrees, "deg");
    }
}
