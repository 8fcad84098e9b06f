package org.wurtzkit.material;

import org.wurtzkit.units.Units;

/**
 * Every scalar parameter of a wurtzite material, with its SI unit, the unit used in parameter-set
 * files, and the factor that converts the file unit to SI.
 *
 * <p>The {@link #key()} is the name used in parameter-set files ({@code GaN.C13 = 106}).
 * Energies stay in eV (the trade's unit); masses are relative to the free electron mass m0;
 * permittivities are relative to epsilon_0.
 */
public enum MaterialParameter {
    /** In-plane lattice constant a. */
    LATTICE_A("a", "m", "Angstrom", Units.ANGSTROM),
    /** Lattice constant c along the c axis. */
    LATTICE_C("c", "m", "Angstrom", Units.ANGSTROM),
    /** Elastic stiffness C11. */
    C11("C11", "Pa", "GPa", Units.GPA),
    /** Elastic stiffness C12. */
    C12("C12", "Pa", "GPa", Units.GPA),
    /** Elastic stiffness C13. */
    C13("C13", "Pa", "GPa", Units.GPA),
    /** Elastic stiffness C33. */
    C33("C33", "Pa", "GPa", Units.GPA),
    /** Elastic stiffness C44. */
    C44("C44", "Pa", "GPa", Units.GPA),
    /** Piezoelectric constant e31. */
    E31("e31", "C/m^2", "C/m^2", 1),
    /** Piezoelectric constant e33. */
    E33("e33", "C/m^2", "C/m^2", 1),
    /** Piezoelectric constant e15 (shear; not used for c-plane strain, kept for completeness). */
    E15("e15", "C/m^2", "C/m^2", 1),
    /** Spontaneous polarization along [0001] (negative for all three nitrides in the BFV convention). */
    SPONTANEOUS_POLARIZATION("Psp", "C/m^2", "C/m^2", 1),
    /**
     * Nonlinear (bowing) part of the spontaneous polarization of an alloy, sum of b_ij x_i x_j
     * (Bernardini &amp; Fiorentini, Phys. Rev. B 64, 085207 (2001)); zero for a binary. The linear
     * model uses {@link #SPONTANEOUS_POLARIZATION} alone, the nonlinear model adds this term.
     */
    SPONTANEOUS_POLARIZATION_BOWING("Psp_bowing", "C/m^2", "C/m^2", 1),
    /**
     * Linear coefficient of the nonlinear piezoelectric polarization P = a1 eps + a2 eps^2 with
     * eps the basal strain (Bernardini &amp; Fiorentini 2001; Ambacher et al. 2002).
     */
    PIEZO_NONLINEAR_LINEAR("Ppz_nl_1", "C/m^2", "C/m^2", 1),
    /** Quadratic coefficient of the nonlinear piezoelectric polarization for eps &gt; 0 (tensile). */
    PIEZO_NONLINEAR_QUADRATIC_TENSILE("Ppz_nl_2_tensile", "C/m^2", "C/m^2", 1),
    /** Quadratic coefficient of the nonlinear piezoelectric polarization for eps &lt; 0 (compressive). */
    PIEZO_NONLINEAR_QUADRATIC_COMPRESSIVE("Ppz_nl_2_compressive", "C/m^2", "C/m^2", 1),
    /** Band gap at 0 K. */
    BAND_GAP_0K("Eg0", "eV", "eV", 1),
    /** Varshni alpha: Eg(T) = Eg(0) - alpha T^2 / (T + beta). */
    VARSHNI_ALPHA("varshni_alpha", "eV/K", "meV/K", 1e-3),
    /** Varshni beta. */
    VARSHNI_BETA("varshni_beta", "K", "K", 1),
    /** Electron effective mass parallel to c (relative to m0). */
    ELECTRON_MASS_PARALLEL("me_par", "m0", "m0", 1),
    /** Electron effective mass perpendicular to c (relative to m0). */
    ELECTRON_MASS_PERPENDICULAR("me_perp", "m0", "m0", 1),
    /** Heavy-hole effective mass parallel to c (relative to m0). */
    HEAVY_HOLE_MASS_PARALLEL("mhh_par", "m0", "m0", 1),
    /** Heavy-hole effective mass perpendicular to c (relative to m0). */
    HEAVY_HOLE_MASS_PERPENDICULAR("mhh_perp", "m0", "m0", 1),
    /**
     * Static relative permittivity along c (the extraordinary component, epsilon_33): the component
     * that the Poisson equation of a c-plane stack uses, since its fields point along c.
     */
    PERMITTIVITY_STATIC("eps_static", "1", "1", 1),
    /** Static relative permittivity across c (the ordinary component, epsilon_11 = epsilon_22). */
    PERMITTIVITY_STATIC_PERPENDICULAR("eps_static_perp", "1", "1", 1),
    /** High-frequency relative permittivity. */
    PERMITTIVITY_HIGH_FREQUENCY("eps_inf", "1", "1", 1),
    /**
     * Unstrained valence-band maximum on a common energy scale whose zero is the GaN valence-band
     * maximum (eV). The valence-band offset of any pair is the difference of these.
     */
    VALENCE_BAND_EDGE("Ev", "eV", "eV", 1),
    /** Conduction-band deformation potential along c, a_cz (a_c parallel). */
    DEFORMATION_CB_PARALLEL("a_cz", "eV", "eV", 1),
    /** Conduction-band deformation potential perpendicular to c, a_ct. */
    DEFORMATION_CB_PERPENDICULAR("a_ct", "eV", "eV", 1),
    /** Valence-band deformation potential D1. */
    DEFORMATION_D1("D1", "eV", "eV", 1),
    /** Valence-band deformation potential D2. */
    DEFORMATION_D2("D2", "eV", "eV", 1),
    /** Valence-band deformation potential D3. */
    DEFORMATION_D3("D3", "eV", "eV", 1),
    /** Valence-band deformation potential D4. */
    DEFORMATION_D4("D4", "eV", "eV", 1),
    /**
     * Longitudinal-optical phonon energy at the zone centre, hbar omega_LO (polar optical phonon
     * scattering of the 2DEG).
     */
    LO_PHONON_ENERGY("hw_LO", "eV", "meV", 1e-3),
    /** Mass density (acoustic-phonon scattering; with the C_ij it gives the sound velocities). */
    MASS_DENSITY("rho", "kg/m^3", "g/cm^3", 1e3),
    /** Conduction-band acoustic deformation potential Xi (deformation-potential phonon scattering). */
    ACOUSTIC_DEFORMATION_POTENTIAL("Xi_ac", "eV", "eV", 1),
    /**
     * Angular-averaged electromechanical coupling coefficient K^2 (piezoelectric acoustic-phonon
     * scattering), dimensionless.
     */
    ELECTROMECHANICAL_COUPLING("K2_pe", "1", "1", 1),

    // ---- valence band (issue 12): the parameters of the 6x6 k.p Hamiltonian of S. L. Chuang and
    // C. S. Chang, Phys. Rev. B 54, 2491 (1996), from which ValenceBands derives the hole masses ----
    /** Valence-band parameter A1 (units of hbar^2/2m0; negative: the band curves down). */
    VALENCE_A1("A1", "1", "1", 1),
    /** Valence-band parameter A2 (units of hbar^2/2m0). */
    VALENCE_A2("A2", "1", "1", 1),
    /** Valence-band parameter A3 (units of hbar^2/2m0). */
    VALENCE_A3("A3", "1", "1", 1),
    /** Valence-band parameter A4 (units of hbar^2/2m0). */
    VALENCE_A4("A4", "1", "1", 1),
    /** Valence-band parameter A5 (units of hbar^2/2m0). */
    VALENCE_A5("A5", "1", "1", 1),
    /** Valence-band parameter A6 (units of hbar^2/2m0). */
    VALENCE_A6("A6", "1", "1", 1),
    /** Linear-in-k valence-band parameter A7. */
    VALENCE_A7("A7", "eV m", "eV Angstrom", Units.ANGSTROM),
    /** Crystal-field splitting Delta_cr of the valence band (negative for AlN). */
    CRYSTAL_FIELD_SPLITTING("Delta_cr", "eV", "eV", 1),
    /** Spin-orbit splitting Delta_so of the valence band. */
    SPIN_ORBIT_SPLITTING("Delta_so", "eV", "eV", 1);

    private final String key;
    private final String siUnit;
    private final String fileUnit;
    private final double fileToSi;

    MaterialParameter(String key, String siUnit, String fileUnit, double fileToSi) {
        this.key = key;
        this.siUnit = siUnit;
        this.fileUnit = fileUnit;
        this.fileToSi = fileToSi;
    }

    /** {@return the key in parameter-set files, e.g. "C13"} */
    public String key() {
        return key;
    }

    /** {@return the unit of {@link WurtziteMaterial#get(MaterialParameter)}} */
    public String siUnit() {
        return siUnit;
    }

    /** {@return the unit in which parameter-set files state the value} */
    public String fileUnit() {
        return fileUnit;
    }

    /** {@return the factor that converts a file value to the library unit} */
    public double fileToSi() {
        return fileToSi;
    }

    /**
     * {@return the smallest plausible value, in the file unit {@link #fileUnit()}} A value outside
     * [{@link #plausibleMinInFileUnit()}, {@link #plausibleMaxInFileUnit()}] is almost surely a unit
     * slip or a typo (a lattice constant in nm instead of Angstrom, a stiffness in Pa instead of GPa)
     * and is rejected by {@link WurtziteMaterial.Builder#build()}.
     */
    public double plausibleMinInFileUnit() {
        return plausibleRange(this)[0];
    }

    /** {@return the largest plausible value, in the file unit {@link #fileUnit()}} */
    public double plausibleMaxInFileUnit() {
        return plausibleRange(this)[1];
    }

    /** {@return the plausible range as text in the file unit, e.g. "[2.5, 4] Angstrom"} */
    public String plausibleRangeText() {
        double[] r = plausibleRange(this);
        return "[" + trim(r[0]) + ", " + trim(r[1]) + "]" + ("1".equals(fileUnit) ? "" : " " + fileUnit);
    }

    private static String trim(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /**
     * Plausible ranges for wurtzite III-nitrides and their alloys, in file units. They are wide on
     * purpose (common practice, no source): they bracket every published value of GaN, AlN and InN
     * that the project knows of by a factor of two or more, and still catch a slip of a unit prefix
     * (a factor of ten or a thousand). A switch expression, so that a new parameter does not compile
     * without its range.
     */
    private static double[] plausibleRange(MaterialParameter p) {
        return switch (p) {
            case LATTICE_A -> new double[] {2.5, 4};
            case LATTICE_C -> new double[] {4, 6.5};
            case C11, C12, C13, C33, C44 -> new double[] {1, 1000};
            case E31, E33, E15 -> new double[] {-3, 3};
            case SPONTANEOUS_POLARIZATION, SPONTANEOUS_POLARIZATION_BOWING -> new double[] {-0.2, 0.2};
            case PIEZO_NONLINEAR_LINEAR -> new double[] {-10, 10};
            case PIEZO_NONLINEAR_QUADRATIC_TENSILE, PIEZO_NONLINEAR_QUADRATIC_COMPRESSIVE -> new double[] {-50, 50};
            case BAND_GAP_0K -> new double[] {0.3, 7};
            case VARSHNI_ALPHA -> new double[] {0, 5};
            case VARSHNI_BETA -> new double[] {1, 5000};
            case ELECTRON_MASS_PARALLEL, ELECTRON_MASS_PERPENDICULAR, HEAVY_HOLE_MASS_PARALLEL,
                    HEAVY_HOLE_MASS_PERPENDICULAR -> new double[] {0.01, 20};
            case PERMITTIVITY_STATIC, PERMITTIVITY_STATIC_PERPENDICULAR, PERMITTIVITY_HIGH_FREQUENCY -> new double[] {3, 30};
            case VALENCE_BAND_EDGE -> new double[] {-5, 5};
            case DEFORMATION_CB_PARALLEL, DEFORMATION_CB_PERPENDICULAR, DEFORMATION_D1, DEFORMATION_D2,
                    DEFORMATION_D3, DEFORMATION_D4 -> new double[] {-40, 40};
            // scattering parameters (file units meV, g/cm^3, eV, 1): nitride LO phonons lie near 70-115 meV,
            // densities 3.2-6.9 g/cm^3, deformation potentials 5-15 eV (common practice, no source)
            case LO_PHONON_ENERGY -> new double[] {20, 200};
            case MASS_DENSITY -> new double[] {1, 12};
            case ACOUSTIC_DEFORMATION_POTENTIAL -> new double[] {1, 40};
            case ELECTROMECHANICAL_COUPLING -> new double[] {0, 1};
            // valence-band parameters (file units hbar^2/2m0, eV Angstrom, eV): published nitride A1..A6
            // lie within about +-10, A7 below 0.1 eV Angstrom, |Delta_cr| below 0.25 eV, Delta_so below
            // 0.03 eV (common practice, no source); the ranges leave room around them
            case VALENCE_A1, VALENCE_A2, VALENCE_A3, VALENCE_A4, VALENCE_A5, VALENCE_A6 -> new double[] {-20, 20};
            case VALENCE_A7 -> new double[] {-1, 1};
            case CRYSTAL_FIELD_SPLITTING -> new double[] {-5, 5}; // wide: tests push split-off bands away with -3 eV
            case SPIN_ORBIT_SPLITTING -> new double[] {0, 0.1};
        };
    }

    /**
     * @param key a file key such as "C13"
     * @return the parameter, or null if no parameter has that key
     */
    public static MaterialParameter ofKey(String key) {
        for (MaterialParameter p : values()) {
            if (p.key.equals(key)) {
                return p;
            }
        }
        return null;
    }
}
