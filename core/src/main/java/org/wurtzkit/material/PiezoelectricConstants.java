package org.wurtzkit.material;

import org.wurtzkit.units.Decimals;

/**
 * Piezoelectric constants (C/m&sup2;): the linear tensor components and the coefficients of the
 * nonlinear model P_pz(eps) = a1 eps + a2 eps^2 of Bernardini &amp; Fiorentini, Phys. Rev. B 64,
 * 085207 (2001), reproduced in Ambacher et al., J. Phys.: Condens. Matter 14, 3399 (2002), with eps
 * the basal strain and a2 taking a different value under tension and compression (AlN).
 *
 * @param e31                      e31
 * @param e33                      e33
 * @param e15                      e15
 * @param nonlinearLinear          a1
 * @param nonlinearQuadraticTensile a2 for eps &gt; 0
 * @param nonlinearQuadraticCompressive a2 for eps &lt; 0
 */
public record PiezoelectricConstants(double e31, double e33, double e15, double nonlinearLinear,
        double nonlinearQuadraticTensile, double nonlinearQuadraticCompressive) {

    /** @return the six constants in C/m^2, e.g. {@code "e31 = -0.49 C/m^2, e33 = 0.73 C/m^2, ..."} */
    @Override
    public String toString() {
        return "e31 = " + Decimals.format(e31, "C/m^2") + ", e33 = " + Decimals.format(e33, "C/m^2") + ", e15 = "
                + Decimals.format(e15, "C/m^2") + ", nonlinear a1 = " + Decimals.format(nonlinearLinear, "C/m^2")
                + ", a2 = " + Decimals.format(nonlinearQuadraticTensile, "C/m^2") + " (tensile), "
                + Decimals.format(nonlinearQuadraticCompressive, "C/m^2") + " (compressive)";
    }
}
