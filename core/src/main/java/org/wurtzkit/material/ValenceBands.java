package org.wurtzkit.material;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Constants;

/**
 * The three valence bands of an unstrained wurtzite material as single parabolic bands, derived
 * from the stored parameters A1..A6, Delta_cr and Delta_so of the 6x6 k.p Hamiltonian of
 * S. L. Chuang and C. S. Chang, Phys. Rev. B 54, 2491 (1996) (formulas from memory), with
 * Delta_1 = Delta_cr and Delta_2 = Delta_3 = Delta_so / 3.
 *
 * <p>Zone-centre energies (electron energies, the reference of the Hamiltonian):
 * <pre>
 *   E_HH = Delta_1 + Delta_2
 *   E_LH, E_CH = (Delta_1 - Delta_2)/2 +- sqrt(((Delta_1 - Delta_2)/2)^2 + 2 Delta_3^2)
 * </pre>
 * Masses (units of m0), band-edge curvatures of the same paper:
 * <pre>
 *   m_hh,par = -1/(A1 + A3)
 *   m_lh,par = -1/(A1 + E_LH/(E_LH - E_CH) A3),   m_lh,perp = -1/(A2 + E_LH/(E_LH - E_CH) A4)
 *   m_ch,par = -1/(A1 + E_CH/(E_CH - E_LH) A3),   m_ch,perp = -1/(A2 + E_CH/(E_CH - E_LH) A4)
 * </pre>
 * and for the heavy hole across c two values: the band-edge curvature -1/(A2 + A4), which holds
 * only within the few meV of the spin-orbit window, and the curvature that the band follows over
 * the few kT the density of states samples, -1/(A2 + A4 - A5) (the limit |K| &gt;&gt; Delta_2,
 * Delta_3 of the same Hamiltonian). <b>Which mass each use takes:</b> quantization along c uses
 * the mass along c of each band (exact for the heavy hole, whose dispersion along c is parabolic);
 * densities of states use (m_perp^2 m_par)^(1/3) with the heavy hole's asymptotic m_perp and the
 * band-edge m_perp of the light and crystal-field holes. The classical valence density is the sum
 * of the three bands with their offsets below the top band. Strain shifts of the splittings are
 * not included (the deformation potentials D3, D4 that set them were recalled, not verified).
 *
 * @param a1 A1 (hbar^2/2m0 units)
 * @param a2 A2
 * @param a3 A3
 * @param a4 A4
 * @param a5 A5
 * @param a6 A6
 * @param crystalFieldEv Delta_cr (eV)
 * @param spinOrbitEv    Delta_so (eV), &ge; 0
 */
public record ValenceBands(double a1, double a2, double a3, double a4, double a5, double a6, double crystalFieldEv,
        double spinOrbitEv) {

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

    /** {@return the zone-centre energy of the heavy hole, E_HH = Delta_1 + Delta_2 (eV)} */
    public double heavyHoleEnergyEv() {
        return crystalFieldEv + spinOrbitEv / 3;
    }

    /** {@return the zone-centre energy of the light hole, the upper Gamma_7 band (eV)} */
    public double lightHoleEnergyEv() {
        double d1 = crystalFieldEv;
        double d2 = spinOrbitEv / 3;
        double half = 0.5 * (d1 - d2);
        return half + Math.sqrt(half * half + 2 * d2 * d2);
    }

    /** {@return the zone-centre energy of the crystal-field hole, the lower Gamma_7 band (eV)} */
    public double crystalFieldHoleEnergyEv() {
        double d1 = crystalFieldEv;
        double d2 = spinOrbitEv / 3;
        double half = 0.5 * (d1 - d2);
        return half - Math.sqrt(half * half + 2 * d2 * d2);
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
        double w = e2 == e3 ? 0.5 : e2 / (e2 - e3);
        return new Band(Kind.LIGHT, mass(a1 + w * a3, "A1 + w A3 (light hole)"), mass(a2 + w * a4,
                "A2 + w A4 (light hole)"), top() - e2);
    }

    /** {@return the crystal-field split-off hole (lower Gamma_7)} */
    public Band crystalFieldHole() {
        double e2 = lightHoleEnergyEv();
        double e3 = crystalFieldHoleEnergyEv();
        double w = e2 == e3 ? 0.5 : e3 / (e3 - e2);
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
