package org.wurtzkit.solvers.transport;

import java.util.Arrays;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.statistics.FermiDirac;
import org.wurtzkit.units.Constants;

/**
 * The current through a barrier by the integral of R. Tsu and L. Esaki, Appl. Phys. Lett. 22, 562
 * (1973):
 *
 * <pre>
 * J = (q m* kT / (2 pi^2 hbar^3)) &int; T(E) ln[(1 + e^{(mu_L - E)/kT}) / (1 + e^{(mu_R - E)/kT})] dE
 * </pre>
 *
 * for electrons with a parabolic in-plane dispersion of mass m* (the "supply" mass: the in-plane
 * mass of the emitter), the in-plane wave vector conserved, and T(E) depending only on the energy E
 * of the motion along the tunnelling direction. The prefactor equals A* T / k_B with the Richardson
 * constant A* = 4 pi q m* k_B^2 / h^3 of {@link ThermionicEmission}, so that with T(E) = 1 above a
 * barrier top and Boltzmann statistics the integral gives back the thermionic-emission law (checked
 * in the tests).
 *
 * <p>The integral is split at the barrier top: the part below it is the tunnelling current (field and
 * thermionic-field emission, in the terms of F. A. Padovani and R. Stratton, Solid-State Electron. 9,
 * 695 (1966)), the part above it the thermionic (over-the-top) current. It runs from the lowest
 * energy at which both leads carry states to 40 kT above the higher of the top and the two Fermi
 * levels (the rest is below e^-40 of the over-the-top part). The energy axis is cut into panels, 2 kT
 * wide within 16 kT of each Fermi level and of the top, at most 10 kT wide elsewhere; each panel is
 * integrated by Commons Math's {@link IterativeLegendreGaussIntegrator} (6-point Gauss-Legendre rule
 * on 1, 2, 3, ... sub-intervals until two successive estimates agree) to the requested relative
 * accuracy, or to an absolute accuracy of 1e-3 of that times the integrand's largest sampled value
 * times kT, so that panels contributing nothing stop at once. Below the top the panels are integrated
 * in s = sqrt(top - E): the WKB transmission of a flat-topped barrier, exp(-K sqrt(top - E)), has a
 * derivative singular at the top, smooth in s.
 */
public final class TunnelCurrent {
    /** Lowest temperature accepted (K): below it the Fermi edges need more panels than is sensible. */
    public static final double MIN_TEMPERATURE_K = 10;
    /** Highest temperature accepted (K). */
    public static final double MAX_TEMPERATURE_K = 1000;
    /** Cut-off above the top and the Fermi levels, in units of kT. */
    static final double TAIL_KT = 40;
    private static final double FINE_KT = 2;
    private static final double FINE_HALF_WIDTH_KT = 16;
    private static final double COARSE_KT = 10;
    private static final int GAUSS_POINTS = 6;
    private static final int MAX_ITERATIONS = 60;
    private static final int MAX_EVALUATIONS_PER_PANEL = 200_000;

    private TunnelCurrent() {
    }

    /**
     * Both parts of a Tsu-Esaki current.
     *
     * @param tunnelling  the part below the barrier top (A/m^2)
     * @param overTheTop  the part above it (A/m^2)
     * @param evaluations number of transmission evaluations used
     */
    public record Result(double tunnelling, double overTheTop, int evaluations) {
        /** @return tunnelling + overTheTop (A/m^2) */
        public double total() {
            return tunnelling + overTheTop;
        }
    }

    /**
     * The Tsu-Esaki prefactor q m* k T / (2 pi^2 hbar^3), which is A* T / k_B.
     *
     * @param supplyMass   in-plane mass of the emitter (m0)
     * @param temperatureK T (K)
     * @return the prefactor (A m^-2 J^-1)
     */
    public static double prefactor(double supplyMass, double temperatureK) {
        return Constants.ELEMENTARY_CHARGE * supplyMass * Constants.ELECTRON_MASS * Constants.BOLTZMANN * temperatureK
                / (2 * Math.PI * Math.PI * Constants.HBAR * Constants.HBAR * Constants.HBAR);
    }

    /**
     * The net current carried by electrons going from the left lead to the right one: q times the net
     * number of electrons per area and time that cross from left to right (A/m^2); it is positive when
     * mu_L &gt; mu_R. The conventional current flows the other way.
     *
     * @param transmission      T(E) of the barrier
     * @param leftFermiEv       mu_L (eV, on the barrier's energy scale), finite
     * @param rightFermiEv      mu_R (eV), finite
     * @param supplyMass        in-plane mass of the emitter (m0), in (0, 100]
     * @param temperatureK      T (K), in [{@value #MIN_TEMPERATURE_K}, {@value #MAX_TEMPERATURE_K}]
     * @param relativeAccuracy  requested relative accuracy of each panel, in [1e-12, 1e-2]
     * @return the two parts of the current
     * @throws InvalidParameterException for an input out of range
     * @throws WurtzkitException         of kind NOT_CONVERGED if a panel does not reach its accuracy
     *                                   within its budget; the message carries the parts integrated so far
     */
    public static Result leftToRight(Transmission transmission, double leftFermiEv, double rightFermiEv,
            double supplyMass, double temperatureK, double relativeAccuracy) {
        Require.nonNull("transmission", transmission);
        Require.finite("left Fermi level (eV)", leftFermiEv);
        Require.finite("right Fermi level (eV)", rightFermiEv);
        if (!(supplyMass > 0 && supplyMass <= 100)) {
            throw new InvalidParameterException("supply mass (m0)", Double.toString(supplyMass), "(0, 100]");
        }
        checkTemperature(temperatureK);
        Require.inRange("relative accuracy of the Tsu-Esaki integral", relativeAccuracy, 1e-12, 1e-2);
        TunnelBarrier barrier = transmission.barrier();
        double kT = Constants.BOLTZMANN_EV * temperatureK;
        double lo = barrier.bottomEv();
        double top = Math.max(barrier.topEv(), lo);
        double hi = Math.max(top, Math.max(leftFermiEv, rightFermiEv)) + TAIL_KT * kT;
        if (leftFermiEv == rightFermiEv) {
            return new Result(0, 0, 0);
        }
        double[] cuts = panels(lo, top, hi, kT, leftFermiEv, rightFermiEv);
        int[] count = new int[1];
        UnivariateFunction f = e -> {
            count[0]++;
            double supply = FermiDirac.log1pExp((leftFermiEv - e) / kT) - FermiDirac.log1pExp((rightFermiEv - e) / kT);
            return supply == 0 ? 0 : transmission.at(e) * supply;
        };
        double peak = 0;
        for (int i = 0; i + 1 < cuts.length; i++) {
            peak = Math.max(peak, Math.abs(f.value(0.5 * (cuts[i] + cuts[i + 1]))));
        }
        double absolute = 1e-3 * relativeAccuracy * peak * kT;
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(GAUSS_POINTS, relativeAccuracy,
                absolute, 1, MAX_ITERATIONS);
        // below the top, E = top - s^2: T(E) of a flat-topped barrier goes as exp(-K sqrt(top - E)), whose
        // derivative is singular at the top; in s it is smooth
        UnivariateFunction g = sv -> 2 * sv * f.value(top - sv * sv);
        double below = 0;
        double above = 0;
        for (int i = 0; i + 1 < cuts.length; i++) {
            double a = cuts[i];
            double b = cuts[i + 1];
            double part;
            try {
                part = b <= top
                        ? gauss.integrate(MAX_EVALUATIONS_PER_PANEL, g, Math.sqrt(top - b), Math.sqrt(top - a))
                        : gauss.integrate(MAX_EVALUATIONS_PER_PANEL, f, a, b);
            } catch (MaxCountExceededException e) {
                throw new WurtzkitException(ErrorKind.NOT_CONVERGED, "Tsu-Esaki integral: the panel [" + a + ", " + b
                        + "] eV did not reach relative accuracy " + relativeAccuracy + " (" + e.getMessage()
                        + "); integrated so far (electron flux current, A/m^2): below the top "
                        + scale(below, supplyMass, temperatureK) + ", above it "
                        + scale(above, supplyMass, temperatureK),
                        e);
            }
            if (b <= top) {
                below += part;
            } else {
                above += part;
            }
        }
        return new Result(scale(below, supplyMass, temperatureK), scale(above, supplyMass, temperatureK), count[0]);
    }

    private static double scale(double integralEv, double supplyMass, double temperatureK) {
        return prefactor(supplyMass, temperatureK) * integralEv * Constants.ELEMENTARY_CHARGE;
    }

    /**
     * @param temperatureK T (K)
     * @return T
     * @throws InvalidParameterException outside [{@value #MIN_TEMPERATURE_K}, {@value #MAX_TEMPERATURE_K}] K
     */
    static double checkTemperature(double temperatureK) {
        return Require.inRange("temperature for the leakage current (K)", temperatureK, MIN_TEMPERATURE_K,
                MAX_TEMPERATURE_K);
    }

    /** Panel boundaries on [lo, hi], including top when lo &lt; top &lt; hi, sorted, distinct. */
    static double[] panels(double lo, double top, double hi, double kT, double muL, double muR) {
        double[] special = {muL, muR, top};
        double fine = FINE_KT * kT;
        double coarse = COARSE_KT * kT;
        int cap = 4 + (int) Math.ceil((hi - lo) / coarse) + 3 * (int) Math.ceil(2 * FINE_HALF_WIDTH_KT / FINE_KT) + 6;
        double[] out = new double[cap];
        int n = 0;
        out[n++] = lo;
        out[n++] = hi;
        if (top > lo && top < hi) {
            out[n++] = top;
        }
        for (double s : special) {
            int half = (int) (FINE_HALF_WIDTH_KT / FINE_KT);
            for (int j = -half; j <= half; j++) {
                double e = s + j * fine;
                if (e > lo && e < hi) {
                    out[n++] = e;
                }
            }
        }
        Arrays.sort(out, 0, n);
        // fill gaps wider than the coarse width
        double[] res = new double[n + (int) Math.ceil((hi - lo) / coarse) + 2];
        int m = 0;
        res[m++] = out[0];
        for (int i = 1; i < n; i++) {
            double prev = res[m - 1];
            double next = out[i];
            if (next - prev <= 1e-9 * kT) {
                continue;
            }
            int parts = (int) Math.ceil((next - prev) / coarse);
            for (int j = 1; j < parts; j++) {
                res[m++] = prev + (next - prev) * j / parts;
            }
            res[m++] = next;
        }
        return Arrays.copyOf(res, m);
    }
}
