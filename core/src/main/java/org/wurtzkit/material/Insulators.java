package org.wurtzkit.material;

import java.util.List;
import org.wurtzkit.errors.Require;

/**
 * Built-in gate dielectrics on GaN: the one home of their numbers. They live in core as records
 * because they are four rows of three numbers each that do not depend on the nitride parameter set
 * (offsets are measured to GaN, whatever set describes the nitrides), and core and solver code
 * needs them without service discovery. The built-in parameter-set files of materials-data carry
 * them by reference ({@code "insulators": {"Al2O3": {"builtIn": "Al2O3"}, ...}}), so
 * {@code ParameterSets.defaultSet().insulator("Al2O3")} is {@link #AL2O3}. A user adds another with
 * the {@link Insulator} constructor, or with its values and sources in a parameter-set file
 * ({@link ParameterSet#insulators()}).
 *
 * <p>Values and sources (verified = read in the published abstract or table; from memory = recalled,
 * not checked against the original):
 * <ul>
 * <li>Static permittivities and gaps of SiO2 (3.9, 9 eV), Si3N4 (7.5, 5.3 eV), Al2O3 (9, 8.8 eV for
 * the crystalline oxide; ALD films have lower gaps, about 6.5-7 eV [from memory]) and HfO2 (22,
 * 5.8 eV): the tables of J. Robertson &amp; B. Falabretti, J. Appl. Phys. 100, 014111 (2006), and S. M. Sze &amp; K. K. Ng,
 * Physics of Semiconductor Devices, 3rd ed. (Wiley 2007), appendix [verified through secondary web
 * tables; HfO2 permittivity 20-25 quoted, 22 taken as the middle].</li>
 * <li>Conduction-band offsets to GaN(0001) measured by X-ray and UV photoemission: SiO2 3.6 eV,
 * Si3N4 2.4 eV (type II, valence-band offset -0.5 eV), HfO2 2.1 eV (annealed): T. E. Cook Jr.,
 * C. C. Fulton, W. J. Mecouch, R. F. Davis, G. Lucovsky and R. J. Nemanich, electronic properties of
 * GaN(0001)-dielectric interfaces [offsets verified in the abstract; journal not seen], and for the
 * type-II Si3N4/GaN line-up T. E. Cook Jr. et al., J. Appl. Phys. 93, 3949 (2003) [verified:
 * abstract]; uncertainty about +/-0.2 eV.</li>
 * <li>Al2O3 (ALD) on GaN: 2.13 eV from C-V, S. Esposto, A. Krishnamoorthy, ... S. Rajan,
 * Appl. Phys. Lett. 99, 133503 (2011) [verified: abstract; journal from memory].</li>
 * </ul>
 * The theory of Robertson &amp; Falabretti (2006) gives type-I Si3N4/GaN with a 0.6-0.8 eV
 * valence-band offset where photoemission gives type II; the built-in value follows the measurement.
 */
public final class Insulators {
    private static final String ROBERTSON = "kappa, E_g: J. Robertson & B. Falabretti, J. Appl. Phys. 100, 014111 (2006)"
            + " and S. M. Sze & K. K. Ng, Physics of Semiconductor Devices (2007) [verified: secondary tables]";

    /** Thermal or deposited SiO2: kappa 3.9, E_g 9.0 eV, CBO 3.6 eV (Cook et al. 2003). */
    public static final Insulator SIO2 = new Insulator("SiO2", 3.9, 9.0, 3.6,
            ROBERTSON + "; CBO: T. E. Cook Jr. et al., GaN(0001)-dielectric interfaces, XPS/UPS [verified: abstract;"
                    + " journal not seen]");

    /** Stoichiometric Si3N4: kappa 7.5, E_g 5.3 eV, CBO 2.4 eV, type II on GaN (Cook et al. 2003). */
    public static final Insulator SI3N4 = new Insulator("Si3N4", 7.5, 5.3, 2.4,
            ROBERTSON + "; CBO: T. E. Cook Jr. et al., J. Appl. Phys. 93, 3949 (2003), XPS, type II [verified: abstract]");

    /** Al2O3: kappa 9, E_g 8.8 eV (crystalline), CBO 2.13 eV (ALD film, Esposto et al. 2011). */
    public static final Insulator AL2O3 = new Insulator("Al2O3", 9.0, 8.8, 2.13,
            ROBERTSON + "; CBO: S. Esposto et al., Appl. Phys. Lett. 99, 133503 (2011), C-V [verified: abstract;"
                    + " journal from memory]");

    /** HfO2: kappa 22 (20-25 quoted), E_g 5.8 eV, CBO 2.1 eV annealed (Cook et al. 2003). */
    public static final Insulator HFO2 = new Insulator("HfO2", 22, 5.8, 2.1,
            ROBERTSON + "; CBO: T. E. Cook Jr. et al., GaN(0001)-dielectric interfaces, XPS/UPS, annealed"
                    + " [verified: abstract; journal not seen]");

    private static final List<Insulator> ALL = List.of(SIO2, SI3N4, AL2O3, HFO2);

    private Insulators() {
    }

    /** {@return the built-in insulators} */
    public static List<Insulator> all() {
        return ALL;
    }

    /**
     * @param name "SiO2", "Si3N4", "Al2O3" or "HfO2" (case-insensitive)
     * @return that built-in insulator
     */
    public static Insulator named(String name) {
        Require.nonNull("insulator name", name);
        for (Insulator i : ALL) {
            if (i.name().equalsIgnoreCase(name)) {
                return i;
            }
        }
        throw Require.invalid("insulator name", name, "one of SiO2, Si3N4, Al2O3, HfO2");
    }
}
