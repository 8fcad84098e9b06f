package org.wurtzkit.material;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;

/**
 * An amorphous gate dielectric (SiO2, Si3N4, Al2O3, HfO2, ...): the few numbers a Poisson solve
 * needs. Unlike a {@link WurtziteMaterial} it has no lattice, no strain and no spontaneous or
 * piezoelectric polarization (an amorphous film has no polar axis), and it holds no free carriers:
 * with gaps of 5-9 eV and conduction-band offsets of 2-4 eV to GaN the thermal electron and hole
 * densities in it are below any density that moves the potential (for a 2 eV offset at 300 K,
 * exp(-2/0.0259) is about 1e-34 of the nitride's), so a solver treats it as a pure dielectric.
 *
 * <p>The band line-up is given as the conduction-band offset to GaN, E_c(insulator) - E_c(GaN),
 * positive when the insulator's conduction band lies above GaN's; the valence-band edge follows
 * from the gap, E_v = E_c - E_g. Offsets measured by photoemission include the interface dipole of
 * the particular interface, so they are the values to prefer over the electron-affinity rule
 * ({@link #fromElectronAffinity} is offered for insulators without measured offsets).
 *
 * @param name                        a name for reports, e.g. "SiO2"
 * @param relativePermittivity        static relative permittivity kappa, in [1, 1000]
 * @param bandGapEv                   band gap (eV), &gt; 0 and at most 20
 * @param conductionBandOffsetToGaNEv E_c(insulator) - E_c(GaN) (eV), in [-5, 10]
 * @param source                      where the values come from (authors, journal, year; verified or from memory)
 */
public record Insulator(String name, double relativePermittivity, double bandGapEv,
        double conductionBandOffsetToGaNEv, String source) {

    /**
     * Validates.
     *
     * @param name a name for reports, e.g. "SiO2"
     * @param relativePermittivity static relative permittivity kappa, in [1, 1000]
     * @param bandGapEv band gap (eV), &gt; 0 and at most 20
     * @param conductionBandOffsetToGaNEv E_c(insulator) - E_c(GaN) (eV), in [-5, 10]
     * @param source where the values come from (authors, journal, year; verified or from memory)
     */
    public Insulator {
        Require.nonNull("insulator name", name);
        Require.nonNull("source of insulator \"" + name + "\"", source);
        Require.positive("relative permittivity of insulator \"" + name + "\"", relativePermittivity);
        // no passive medium has a static relative permittivity below vacuum's 1 (common practice, no
        // source); a permittivity typed in F/m (e.g. 8e-11) is caught here
        Require.inRange("relative permittivity of insulator \"" + name + "\"", relativePermittivity, 1, 1000);
        Require.positive("band gap of insulator \"" + name + "\" (eV)", bandGapEv);
        Require.inRange("band gap of insulator \"" + name + "\" (eV)", bandGapEv, 0, 20);
        Require.inRange("conduction-band offset of insulator \"" + name + "\" to GaN (eV)",
                conductionBandOffsetToGaNEv, -5, 10);
    }

    /**
     * An insulator placed by the electron-affinity rule (R. L. Anderson, Solid-State Electron. 5,
     * 341 (1962)): E_c(insulator) - E_c(GaN) = chi(GaN) - chi(insulator). The rule ignores interface
     * dipoles, which on GaN amount to 1-2 eV for common dielectrics (T. E. Cook Jr. et al.,
     * photoemission of GaN(0001)-dielectric interfaces [verified: abstract]); prefer a measured offset.
     *
     * @param name                 name
     * @param relativePermittivity static relative permittivity
     * @param bandGapEv            band gap (eV)
     * @param affinityEv           electron affinity of the insulator (eV), in [0, 10]
     * @param ganAffinityEv        electron affinity of GaN on the same scale (eV), in [0, 10]
     * @param source               where the values come from
     * @return the insulator
     */
    public static Insulator fromElectronAffinity(String name, double relativePermittivity, double bandGapEv,
            double affinityEv, double ganAffinityEv, String source) {
        Require.inRange("electron affinity of insulator \"" + name + "\" (eV)", affinityEv, 0, 10);
        Require.inRange("electron affinity of GaN (eV)", ganAffinityEv, 0, 10);
        return new Insulator(name, relativePermittivity, bandGapEv, ganAffinityEv - affinityEv, source);
    }

    /**
     * @param ganGapEv the band gap of GaN on the structure's scale at its temperature (eV)
     * @return E_v(GaN) - E_v(insulator) (eV), positive when the insulator's valence band lies below GaN's
     */
    public double valenceBandOffsetToGaNEv(double ganGapEv) {
        return bandGapEv - ganGapEv - conductionBandOffsetToGaNEv;
    }

    /**

     * {@return a copy with it (e.g. for an ALD film)}

     *

     * @param kappa the new relative permittivity

     */
    public Insulator withRelativePermittivity(double kappa) {
        return new Insulator(name, kappa, bandGapEv, conductionBandOffsetToGaNEv, source);
    }

    /** @return e.g. {@code "SiO2: kappa 3.9, E_g 9 eV, CBO to GaN 3.6 eV"} */
    @Override
    public String toString() {
        return name + ": kappa " + Decimals.format(relativePermittivity) + ", E_g "
                + Decimals.format(bandGapEv, "eV") + ", CBO to GaN " + Decimals.format(conductionBandOffsetToGaNEv, "eV");
    }
}
