package org.wurtzkit.material;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Constants;

/**
 * The three valence bands of a wurtzite material as single parabolic bands, derived from the stored
 * parameters A1..A6, Delta_cr and Delta_so of the 6x6 k.p Hamiltonian of S. L. Chuang and C. S.
 * Chang, Phys. Rev. B 54, 2491 (1996) (formulas from memory), with Delta_1 = Delta_cr and
 * Delta_2 = Delta_3 = Delta_so / 3, unstrained or under biaxial c-plane strain.
 *
 * <p>Zone-centre energies (electron energies, the reference of the Hamiltonian), with the strain
 * terms of the same paper for eps_xx = eps_yy and no shear, lambda_eps = D1 eps_zz + D2 (eps_xx +
 * eps_yy) and theta_eps = D3 eps_zz + D4 (eps_xx + eps_yy) (both 0 unstrained; D5 and D6 multiply
 * shear and in-plane anisotropy, which biaxial c-plane strain lacks):
 * <pre>
 *   E_HH = Delta_1 + Delta_2 + lambda_eps + theta_eps
 *   E_LH, E_CH = lambda_eps + (Delta_1 - Delta_2 + theta_eps)/2
 *                +- sqrt(((Delta_1 - Delta_2 + theta_eps)/2)^2 + 2 Delta_3^2)
 * </pre>
 * (the k = 0 eigenvalues of the Hamiltonian: a heavy-hole diagonal F = Delta_1 + Delta_2 + lambda +
 * theta, and the Gamma_7 pair [[Delta_1 - Delta_2 + lambda + theta, sqrt2 Delta_3], [sqrt2 Delta_3,
 * lambda]]). Compression (eps_xx &lt; 0, theta_eps &gt; 0 with the D3 &gt; 0 &gt; D4 of GaN) pushes
 * the |Z&gt;-like band down and keeps the heavy hole on top; tension lifts it, and beyond a few
 * tenths of a percent the top band is the |Z&gt;-like upper Gamma_7 band (here still called
 * {@link Kind#LIGHT}: the kinds name the order of the Gamma_7 pair, not its character).
 *
 * <p>Masses (units of m0), band-edge curvatures of the same paper, with w the weight of the
 * |X +- iY&gt; part of a Gamma_7 band, w = (E - lambda_eps)/(E - E') for a band at E whose partner
 * is at E' (the eigenvector of the 2x2 block above):
 * <pre>
 *   m_hh,par = -1/(A1 + A3)
 *   m_lh,par = -1/(A1 + w_LH A3),   m_lh,perp = -1/(A2 + w_LH A4)
 *   m_ch,par = -1/(A1 + w_CH A3),   m_ch,perp = -1/(A2 + w_CH A4)
 * </pre>
 * and for the heavy hole across c two values: the band-edge curvature -1/(A2 + A4), which holds
 * only within the few meV of the spin-orbit window, and the curvature that the band follows over
 * the few kT the density of states samples, -1/(A2 + A4 - A5) (the limit |K| &gt;&gt; Delta_2,
 * Delta_3 of the same Hamiltonian). <b>Which mass each use takes:</b> quantization along c uses
 * the mass along c of each band (exact for the heavy hole, whose dispersion along c is parabolic);
 * densities of states use (m_perp^2 m_par)^(1/3) with the heavy hole's asymptotic m_perp and the
 * band-edge m_perp of the light and crystal-field holes. The classical valence density is the sum
 * of the three bands with their offsets below the top band.
 *
 * @param a1 A1 (hbar^2/2m0 units)
 * @param a2 A2
 * @param a3 A3
 * @param a4 A4
 * @param a5 A5
 * @param a6 A6
 * @param crystalFieldEv Delta_cr (eV)
 * @param spinOrbitEv    Delta_so (eV), &ge; 0
 * @param strainLambdaEv lambda_eps = D1 eps_zz + D2 (eps_xx + eps_yy) (eV), 0 unstrained
 * @param strainThetaEv  theta_eps = D3 eps_zz + D4 (eps_xx + eps_yy) (eV), 0 unstrained
 */
public record ValenceBands(double a1, double a2, double a3, double a4, double a5, double a6, double crystalFieldEv,
        double spinOrbitEv, double strainLambdaEv, double strainThetaEv) {

    /** One band as a single parabolic band. */
    public enum Kind {
        /** Heavy hole (Gamma_9, |X + iY>-like). */
        HEAVY,
        /** Light hole: the upper of the two Gamma_7 bands. */
        LIGHT,
        /** Crystal-field split-off hole: the lower Gamma_7 band. */
        CRYSTAL_FIELD
    }

    /**
     * One valence band.
     *
     * @param kind                  which band
     * @param massParallel          mass along c (m0), for quantization
     * @param massPerpendicular     mass across c (m0), for the two-dimensional density of states
     * @param offsetEv              energy below the top valence band at k = 0 (eV), &ge; 0
     */
    public record Band(Kind kind, double massParallel, double massPerpendicular, double offsetEv) {
        /** {@return the density-of-states mass (m_perp^2 m_par)^(1/3)} */
        public double densityOfStatesMass() {
            return Math.cbrt(massPerpendicular * massPerpendicular * massParallel);
        }
    }

    /**
     * Validates the parameters: all finite, Delta_so &ge; 0.
     *
     * @param a1 A1 (hbar^2/2m0 units)
     * @param a2 A2
     * @param a3 A3
     * @param a4 A4
     * @param a5 A5
     * @param a6 A6
     * @param crystalFieldEv Delta_cr (eV)
     * @param spinOrbitEv Delta_so (eV), &ge; 0
     * @param strainLambdaEv lambda_eps (eV), finite
     * @param strainThetaEv theta_eps (eV), finite
     */
    public ValenceBands {
        Require.finite("valence parameter A1", a1);
        Require.finite("valence parameter A2", a2);
        Require.finite("valence parameter A3", a3);
        Require.finite("valence parameter A4", a4);
        Require.finite("valence parameter A5", a5);
        Require.finite("valence parameter A6", a6);
        Require.finite("crystal-field splitting (eV)", crystalFieldEv);
        Require.nonNegative("spin-orbit splitting (eV)", spinOrbitEv);
        Require.finite("strain term lambda_eps (eV)", strainLambdaEv);
        Require.finite("strain term theta_eps (eV)", strainThetaEv);
    }

    /**
     * Unstrained bands (lambda_eps = theta_eps = 0).
     *
     * @param a1 A1 (hbar^2/2m0 units)
     * @param a2 A2
     * @param a3 A3
     * @param a4 A4
     * @param a5 A5
     * @param a6 A6
     * @param crystalFieldEv Delta_cr (eV)
     * @param spinOrbitEv Delta_so (eV), &ge; 0
     */
    public ValenceBands(double a1, double a2, double a3, double a4, double a5, double a6, double crystalFieldEv,
            double spinOrbitEv) {
        this(a1, a2, a3, a4, a5, a6, crystalFieldEv, spinOrbitEv, 0, 0);
    }

    /**
     * The bands of a material under biaxial c-plane strain: lambda_eps and theta_eps from its
     * deformation potentials D1..D4 (Chuang and Chang 1996).
     *
     * @param m     a material
     * @param epsXX in-plane strain eps_xx = eps_yy, finite
     * @param epsZZ strain along c, finite
     * @return its valence bands under that strain
     */
    public static ValenceBands of(WurtziteMaterial m, double epsXX, double epsZZ) {
        Require.finite("in-plane strain eps_xx", epsXX);
        Require.finite("strain along c eps_zz", epsZZ);
        DeformationPotentials d = m.deformationPotentials();
        double inPlane = 2 * epsXX;
        return of(m).strained(d.d1() * epsZZ + d.d2() * inPlane, d.d3() * epsZZ + d.d4() * inPlane);
    }

    /**
     * Returns a copy with other strain terms.
     *
     * @param lambdaEv lambda_eps = D1 eps_zz + D2 (eps_xx + eps_yy) (eV)
     * @param thetaEv  theta_eps = D3 eps_zz + D4 (eps_xx + eps_yy) (eV)
     * @return the bands under that strain
     */
    public ValenceBands strained(double lambdaEv, double thetaEv) {
        return new ValenceBands(a1, a2, a3, a4, a5, a6, crystalFieldEv, spinOrbitEv, lambdaEv, thetaEv);
    }

    /**
     * @param m a material
     * @return its valence bands, from its stored parameters
     */
    public static ValenceBands of(WurtziteMaterial m) {
        return new ValenceBands(m.get(MaterialParameter.VALENCE_A1), m.get(MaterialParameter.VALENCE_A2),
                m.get(MaterialParameter.VALENCE_A3), m.get(MaterialParameter.VALENCE_A4),
                m.get(MaterialParameter.VALENCE_A5), m.get(MaterialParameter.VALENCE_A6),
                m.get(MaterialParameter.CRYSTAL_FIELD_SPLITTING), m.get(MaterialParameter.SPIN_ORBIT_SPLITTING));
    }

    /** {@return the zone-centre energy of the heavy hole, E_HH = Delta_1 + Delta_2 + lambda_eps + theta_eps (eV)} */
    public double heavyHoleEnergyEv() {
        return crystalFieldEv + spinOrbitEv / 3 + (strainLambdaEv + strainThetaEv);
    }

    /** {@return the zone-centre energy of the light hole, the upper Gamma_7 band (eV)} */
    public double lightHoleEnergyEv() {
        return strainLambdaEv + gamma7(+1);
    }

    /** {@return the zone-centre energy of the crystal-field hole, the lower Gamma_7 band (eV)} */
    public double crystalFieldHoleEnergyEv() {
        return strainLambdaEv + gamma7(-1);
    }

    /**
     * The shift of the top valence band at k = 0 that strain causes (eV): the highest of the three
     * strained energies less the highest unstrained one. Where the heavy hole is on top both with
     * and without strain, this is lambda_eps + theta_eps, the heavy-hole shift
     * (D1 + D3) eps_zz + (D2 + D4)(eps_xx + eps_yy).
     *
     * @return the shift of the valence-band maximum (eV)
     */
    public double topShiftEv() {
        return top() - strained(0, 0).top();
    }

    /**
     * The shift of the top band beyond the heavy hole's own shift (eV): 0 exactly where the heavy
     * hole is on top with and without strain; otherwise what a valence edge shifted by the heavy-hole
     * deformation potentials alone must add to follow the top band.
     *
     * @return (E_top - E_HH) strained less (E_top - E_HH) unstrained (eV)
     */
    public double topShiftBeyondHeavyHoleEv() {
        ValenceBands free = strained(0, 0);
        return (top() - heavyHoleEnergyEv()) - (free.top() - free.heavyHoleEnergyEv());
    }

    /** A Gamma_7 energy less lambda_eps: the sign picks the upper (+1) or lower (-1) band (eV). */
    private double gamma7(int sign) {
        double d1 = crystalFieldEv;
        double d2 = spinOrbitEv / 3;
        double half = 0.5 * (d1 - d2 + strainThetaEv);
        double root = Math.sqrt(half * half + 2 * d2 * d2);
        return sign > 0 ? half + root : half - root;
    }

    /** {@return the heavy-hole band-edge mass across c, -1/(A2 + A4) (m0)} */
    public double heavyHolePerpendicularBandEdgeMass() {
        return mass(a2 + a4, "A2 + A4");
    }

    /** {@return the heavy hole; across c its asymptotic mass -1/(A2 + A4 - A5)} */
    public Band heavyHole() {
        return new Band(Kind.HEAVY, mass(a1 + a3, "A1 + A3"), mass(a2 + a4 - a5, "A2 + A4 - A5"),
                top() - heavyHoleEnergyEv());
    }

    /** {@return the light hole (upper Gamma_7)} */
    public Band lightHole() {
        double e2 = lightHoleEnergyEv();
        double e3 = crystalFieldHoleEnergyEv();
        double w = e2 == e3 ? 0.5 : (e2 - strainLambdaEv) / (e2 - e3);
        return new Band(Kind.LIGHT, mass(a1 + w * a3, "A1 + w A3 (light hole)"), mass(a2 + w * a4,
                "A2 + w A4 (light hole)"), top() - e2);
    }

    /** {@return the crystal-field split-off hole (lower Gamma_7)} */
    public Band crystalFieldHole() {
        double e2 = lightHoleEnergyEv();
        double e3 = crystalFieldHoleEnergyEv();
        double w = e2 == e3 ? 0.5 : (e3 - strainLambdaEv) / (e3 - e2);
        return new Band(Kind.CRYSTAL_FIELD, mass(a1 + w * a3, "A1 + w A3 (crystal-field hole)"),
                mass(a2 + w * a4, "A2 + w A4 (crystal-field hole)"), top() - e3);
    }

    /** {@return the three bands: heavy, light, crystal-field hole} */
    public Band[] bands() {
        return new Band[] {heavyHole(), lightHole(), crystalFieldHole()};
    }

    /**
     * The classical effective density of states of the valence band, the three bands summed with
     * their Boltzmann weights: N_v = sum_b 2 (m_b kT / 2 pi hbar^2)^(3/2) exp(-offset_b / kT). Exact
     * for non-degenerate holes in parabolic bands; measured from the top band's edge.
     *
     * @param temperatureK temperature (K), in (0, 5000]
     * @return N_v (m^-3)
     */
    public double effectiveDensityOfStates(double temperatureK) {
        Require.inRange("temperature (K)", temperatureK, Double.MIN_NORMAL, 5000);
        double kT = Constants.BOLTZMANN * temperatureK;
        double kTeV = Constants.thermalVoltage(temperatureK);
        double sum = 0;
        for (Band b : bands()) {
            double m = b.densityOfStatesMass() * Constants.ELECTRON_MASS;
            double nv = 2 * Math.pow(m * kT / (2 * Math.PI * Constants.HBAR * Constants.HBAR), 1.5);
            sum += nv * Math.exp(-b.offsetEv() / kTeV);
        }
        return sum;
    }

    /** Energy of the top band at k = 0 (eV). */
    private double top() {
        return Math.max(heavyHoleEnergyEv(), lightHoleEnergyEv());
    }

    private static double mass(double curvature, String expression) {
        if (!(curvature < 0)) {
            throw new InvalidParameterException("valence-band curvature " + expression + " (hbar^2/2m0)",
                    Double.toString(curvature), "(-inf, 0) (a hole band must curve down)");
        }
        return -1 / curvature;
    }
}
