package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * A shallow dopant species in a layer: density, ionization energy (from the conduction band for a
 * donor, from the valence band for an acceptor), ground-state degeneracy factor and how its
 * ionization is computed ({@link Ionization}): by default from the Fermi level (incomplete
 * ionization), or, as an explicit choice, fully ionized whatever the Fermi level
 * ({@link #fullyIonized()}).
 *
 * @param kind              donor or acceptor
 * @param densityPerM3      density (m^-3), &ge; 0
 * @param ionizationEnergyEv ionization energy (eV), in [0, 2]
 * @param degeneracy        degeneracy factor g, &gt; 0 (2 for donors, 4 for acceptors is usual)
 * @param ionization        how the charged fraction is computed; default {@link Ionization#FROM_FERMI_LEVEL}
 */
public record Dopant(Kind kind, double densityPerM3, double ionizationEnergyEv, double degeneracy,
        Ionization ionization) {

    /**
     * How the charged fraction of a dopant is computed.
     *
     * <p>The default is {@link #FROM_FERMI_LEVEL}: a dopant level well below the band edge in kT is
     * only partly ionized, and the difference is large for the acceptors of GaN: Mg at about
     * 0.16-0.2 eV above E_v is only a few per cent ionized at 300 K (W. Goetz, N. M. Johnson,
     * J. Walker, D. P. Bour and R. A. Street, Appl. Phys. Lett. 68, 667 (1996), from memory), so
     * assuming full ionization would overstate the fixed charge of a p-GaN gate tenfold or more.
     */
    public enum Ionization {
        /** Fermi-Dirac occupancy of a level at the ionization energy with the degeneracy factor g (the default). */
        FROM_FERMI_LEVEL,
        /**
         * Every dopant is charged whatever the Fermi level (the textbook "full ionization"
         * assumption); the ionization energy and degeneracy are kept but not used.
         */
        FULL
    }
    /** Donor or acceptor. */
    public enum Kind {
        /** Positive when ionized. */
        DONOR,
        /** Negative when ionized. */
        ACCEPTOR
    }

    /** Largest accepted dopant density (m^-3): 1e22 cm^-3. */
    public static final double MAX_DENSITY_PER_M3 = 1e28;

    /**
     * Creates the record and checks every component.
     *
     * @param kind               donor or acceptor
     * @param densityPerM3       density (m^-3), &ge; 0
     * @param ionizationEnergyEv ionization energy (eV), in [0, 2]
     * @param degeneracy         degeneracy factor g, &gt; 0 (2 for donors, 4 for acceptors is usual)
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     *
     * @param ionization how the charged fraction is computed; default {@link Ionization#FROM_FERMI_LEVEL}
     */
    public Dopant {
        Require.nonNull("dopant kind", kind);
        Require.inRange("dopant density (m^-3)", densityPerM3, 0, MAX_DENSITY_PER_M3);
        Require.inRange("dopant ionization energy (eV)", ionizationEnergyEv, 0, 2);
        Require.positive("dopant degeneracy factor", degeneracy);
        Require.nonNull("dopant ionization", ionization);
    }

    /**
     * A dopant ionized from the Fermi level ({@link Ionization#FROM_FERMI_LEVEL}).
     *
     * @param kind               donor or acceptor
     * @param densityPerM3       density (m^-3)
     * @param ionizationEnergyEv ionization energy (eV)
     * @param degeneracy         degeneracy factor g
     */
    public Dopant(Kind kind, double densityPerM3, double ionizationEnergyEv, double degeneracy) {
        this(kind, densityPerM3, ionizationEnergyEv, degeneracy, Ionization.FROM_FERMI_LEVEL);
    }

    /** {@return this dopant, fully ionized whatever the Fermi level ({@link Ionization#FULL})} */
    public Dopant fullyIonized() {
        return new Dopant(kind, densityPerM3, ionizationEnergyEv, degeneracy, Ionization.FULL);
    }

    /** Donor ground-state degeneracy g_D = 2 (spin; Sze &amp; Ng, Physics of Semiconductor Devices, 3rd ed., 2007, ch. 1). */
    public static final double DONOR_DEGENERACY = 2.0;
    /**
     * Acceptor ground-state degeneracy g_A = 4 (spin times the two degenerate valence bands at k = 0
     * of cubic semiconductors; Sze &amp; Ng 2007, ch. 1).
     */
    public static final double ACCEPTOR_DEGENERACY = 4.0;

    /**
     * Donors with degeneracy factor {@link #DONOR_DEGENERACY}.
     *
     * @param densityPerCm3      donor density (cm^-3)
     * @param ionizationEnergyEv E_c - E_D (eV); Si in GaN: about 0.015-0.030 eV (from memory, no source)
     * @return the dopant
     */
    public static Dopant donorsPerCm3(double densityPerCm3, double ionizationEnergyEv) {
        return new Dopant(Kind.DONOR, Units.perCm3ToPerM3(densityPerCm3), ionizationEnergyEv, DONOR_DEGENERACY);
    }

    /**
     * Acceptors with degeneracy factor {@link #ACCEPTOR_DEGENERACY}.
     *
     * @param densityPerCm3      acceptor density (cm^-3)
     * @param ionizationEnergyEv E_A - E_v (eV); Mg in GaN: about 0.17 eV (from memory, no source)
     * @return the dopant
     */
    public static Dopant acceptorsPerCm3(double densityPerCm3, double ionizationEnergyEv) {
        return new Dopant(Kind.ACCEPTOR, Units.perCm3ToPerM3(densityPerCm3), ionizationEnergyEv, ACCEPTOR_DEGENERACY);
    }

    /**
     * The SI twin of {@link #donorsPerCm3(double, double)}.
     *
     * @param densityPerM3       donor density (m^-3)
     * @param ionizationEnergyEv E_c - E_D (eV)
     * @return the dopant, degeneracy {@link #DONOR_DEGENERACY}
     */
    public static Dopant donorsPerM3(double densityPerM3, double ionizationEnergyEv) {
        return new Dopant(Kind.DONOR, densityPerM3, ionizationEnergyEv, DONOR_DEGENERACY);
    }

    /**
     * The SI twin of {@link #acceptorsPerCm3(double, double)}.
     *
     * @param densityPerM3       acceptor density (m^-3)
     * @param ionizationEnergyEv E_A - E_v (eV)
     * @return the dopant, degeneracy {@link #ACCEPTOR_DEGENERACY}
     */
    public static Dopant acceptorsPerM3(double densityPerM3, double ionizationEnergyEv) {
        return new Dopant(Kind.ACCEPTOR, densityPerM3, ionizationEnergyEv, ACCEPTOR_DEGENERACY);
    }

    /**
     * Dilute-limit ionization energy of Mg in GaN for {@link #magnesiumInGaNPerCm3(double)}: E_A0 =
     * 0.215 eV, inside the range 0.19-0.25 eV of published fits of E_A0 - alpha N_A^(1/3) to GaN:Mg
     * Hall data (P. Kozodoy et al., J. Appl. Phys. 87, 1832 (2000); from memory, low confidence:
     * values and citation not re-checked). With {@link #MG_GAN_ALPHA_EV_CM} it gives E_A = 0.19 eV at
     * 1e18 and 0.14 eV at 3e19 cm^-3, bracketing the 0.17 eV measured by Hall at a few 1e19
     * (R. Y. Korotkov, J. M. Gregie and B. W. Wessels, Appl. Phys. Lett. 78, 222 (2001), abstract).
     */
    public static final double MG_GAN_IONIZATION_DILUTE_EV = 0.215;

    /**
     * Screening coefficient alpha of E_A = E_A0 - alpha N_A^(1/3) (eV cm) for Mg in GaN: the Coulomb
     * estimate of G. L. Pearson and J. Bardeen, Phys. Rev. 75, 865 (1949), alpha = 1.612 q^2/(4 pi
     * eps0 eps_s) [computed, eps_s = 9.5] = 2.44e-8 eV cm, at the low end of the published GaN:Mg fits
     * (2-4)e-8 eV cm (Kozodoy et al. 2000, as above; from memory, low confidence).
     */
    public static final double MG_GAN_ALPHA_EV_CM = 2.44e-8;

    /**
     * Acceptors whose ionization energy falls with their density as E_A = E_A0 - alpha N_A^(1/3)
     * (Pearson and Bardeen 1949), degeneracy {@link #ACCEPTOR_DEGENERACY}. Compensation is a donor
     * species added to the same layer.
     *
     * @param densityPerCm3       acceptor density N_A (cm^-3), in [0, 1e22]
     * @param diluteIonizationEv   E_A0 (eV), in [0, 2]
     * @param alphaEvCm           alpha (eV cm), &ge; 0
     * @return the dopant
     * @throws org.wurtzkit.errors.InvalidParameterException if E_A would not be positive (nothing is clamped)
     */
    public static Dopant acceptorsWithScreenedLevelPerCm3(double densityPerCm3, double diluteIonizationEv,
            double alphaEvCm) {
        Require.inRange("acceptor density (cm^-3)", densityPerCm3, 0, 1e22);
        Require.inRange("dilute-limit ionization energy E_A0 (eV)", diluteIonizationEv, 0, 2);
        Require.nonNegative("screening coefficient alpha (eV cm)", alphaEvCm);
        double ea = diluteIonizationEv - alphaEvCm * Math.cbrt(densityPerCm3);
        if (!(ea > 0)) {
            throw Require.invalid("acceptor density (cm^-3)", densityPerCm3, "[0, " + Math.pow(diluteIonizationEv / alphaEvCm, 3)
                    + ") (E_A = E_A0 - alpha N_A^(1/3) must stay positive)");
        }
        return new Dopant(Kind.ACCEPTOR, Units.perCm3ToPerM3(densityPerCm3), ea, ACCEPTOR_DEGENERACY);
    }

    /**
     * Mg in GaN as grown: {@link #acceptorsWithScreenedLevelPerCm3} with E_A0 =
     * {@link #MG_GAN_IONIZATION_DILUTE_EV} and alpha = {@link #MG_GAN_ALPHA_EV_CM}, g_A = 4 (the usual
     * choice for GaN:Mg, after the cubic picture of Sze &amp; Ng; in wurtzite the top Gamma_9 doublet
     * alone would give 2 and the three doublets with Boltzmann weights about 4.5 at 300 K, so 4 is a
     * documented compromise, common practice, no source).
     *
     * @param densityPerCm3 Mg density (cm^-3)
     * @return the dopant
     */
    public static Dopant magnesiumInGaNPerCm3(double densityPerCm3) {
        return acceptorsWithScreenedLevelPerCm3(densityPerCm3, MG_GAN_IONIZATION_DILUTE_EV, MG_GAN_ALPHA_EV_CM);
    }

    /** {@return density (cm^-3)} */
    public double densityPerCm3() {
        return Units.perM3ToPerCm3(densityPerM3);
    }

    /** @return e.g. {@code "donors 1e18 cm^-3, ionization energy 0.015 eV, g = 2"} */
    @Override
    public String toString() {
        return (kind == Kind.DONOR ? "donors " : "acceptors ") + Decimals.format(Units.perM3ToPerCm3(densityPerM3), "cm^-3")
                + (ionization == Ionization.FULL ? ", fully ionized"
                        : ", ionization energy " + Decimals.format(ionizationEnergyEv, "eV") + ", g = "
                                + Decimals.format(degeneracy));
    }
}
