package org.wurtzkit.testing;

import java.util.List;
import org.wurtzkit.material.AlloyBowing;
import org.wurtzkit.material.AlloyScattering;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Bowing;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.material.PolarizationModel;

/**
 * A parameter set for tests of core without the materials-data module.
 *
 * <p>The polarization-relevant values (a, C13, C33, e31, e33, Psp, eps, Eg at 300 K, gap bowing) are
 * the end points x = 0 and x = 1 of the linear Al<sub>x</sub>Ga<sub>1-x</sub>N formulas of O.
 * Ambacher et al., J. Appl. Phys. 87, 334 (2000), as recalled from memory (the paper
 * itself not seen): a(x) = -0.077x + 3.189 A, C13 = 5x + 103
 * GPa, C33 = -32x + 405 GPa, e31 = -0.11x - 0.49, e33 = 0.73x + 0.73 C/m^2, Psp = -0.052x - 0.029
 * C/m^2, eps = -0.5x + 9.5, Eg = 6.13x + 3.42(1-x) - 1.0x(1-x) eV. Because Vegard's law is linear,
 * resolving an AlGaN alloy from these end points reproduces the linear formulas exactly.
 *
 * <p>Every other value (needed only to build a complete record) is a VM03 value from
 * I. Vurgaftman and J. R. Meyer, J. Appl. Phys. 94, 3675 (2003) (from memory), or a plain filler marked as such; InN is the VM03
 * set. No test of a published number relies on a filler.
 */
public final class A00TestSet implements ParameterSet {
    /** A00's linear fits, recalled from memory. */
    public static final Source A00 = new Source("A00", "O. Ambacher et al., J. Appl. Phys. 87, 334 (2000)",
            "linear x-dependent formulas, from memory");
    /** VM03's recommended values, recalled from memory. */
    public static final Source VM03 = new Source("VM03", "I. Vurgaftman and J. R. Meyer, J. Appl. Phys. 94, 3675 (2003)",
            "recommended values, from memory");
    /**
     * Scattering parameters of GaN and InN (the AlN values are the rough estimates of the built-in
     * sets, with no physical weight in any test).
     */
    public static final Source DON12 = new Source("DON12", "O. Donmez et al., Nanoscale Res. Lett. 7, 490 (2012), Table 1",
            "table seen; GaN and InN values; AlN values are estimates of the built-in sets");
    /** Values with no physical weight in any test. */
    public static final Source FILLER = new Source("filler", "test filler value", "no physical meaning");

    /** The one instance. */
    public static final A00TestSet INSTANCE = new A00TestSet();

    private final WurtziteMaterial gan;
    private final WurtziteMaterial aln;
    private final WurtziteMaterial inn;

    private A00TestSet() {
        // Eg0 chosen so that Varshni (VM03 alpha, beta) gives A00's 300 K gaps 3.42 and 6.13 eV
        gan = binary("GaN", 3.189, 5.185, 367, 135, 103, 405, 95, -0.49, 0.73, -0.029, 3.42 + varshni(0.909, 830),
                0.909, 830, 0.22, 0.22, 1.89, 0.26, 9.5, 5.35, 0.0, 92, 6.15, 8.3, 0.038);
        // A00: Delta Ec = 0.7 Delta Eg, so the valence band of AlN lies 0.3 Delta Eg below that of GaN
        aln = binary("AlN", 3.112, 4.982, 396, 137, 108, 373, 116, -0.60, 1.46, -0.081, 6.13 + varshni(1.799, 1462),
                1.799, 1462, 0.32, 0.30, 3.57, 0.64, 9.0, 4.77, -0.3 * (6.13 - 3.42), 110.3, 3.23, 9.5, 0.1);
        inn = binary("InN", 3.545, 5.703, 223, 115, 92, 224, 48, -0.57, 0.97, -0.032, 0.78, 0.245, 624, 0.07, 0.07,
                1.56, 0.17, 15, 8.4, 0.5, 73, 6.81, 7.1, 0.028);
    }

    /** Varshni shift alpha T^2/(T + beta) at 300 K, alpha in meV/K. */
    private static double varshni(double alphaMeV, double beta) {
        return alphaMeV * 1e-3 * 300 * 300 / (300 + beta);
    }

    private static WurtziteMaterial binary(String name, double a, double c, double c11, double c12, double c13,
            double c33, double c44, double e31, double e33, double psp, double eg0, double alphaMeV, double beta,
            double mePar, double mePerp, double mhhPar, double mhhPerp, double eps, double epsInf, double ev,
            double hwLoMeV, double rhoGcm3, double xiAc, double k2) {
        WurtziteMaterial.Builder b = WurtziteMaterial.builder(name + " (A00 test set)")
                .set(MaterialParameter.LATTICE_A, a * 1e-10, A00)
                .set(MaterialParameter.LATTICE_C, c * 1e-10, VM03)
                .set(MaterialParameter.C11, c11 * 1e9, VM03)
                .set(MaterialParameter.C12, c12 * 1e9, VM03)
                .set(MaterialParameter.C13, c13 * 1e9, A00)
                .set(MaterialParameter.C33, c33 * 1e9, A00)
                .set(MaterialParameter.C44, c44 * 1e9, VM03)
                .set(MaterialParameter.E31, e31, A00)
                .set(MaterialParameter.E33, e33, A00)
                .set(MaterialParameter.E15, e31, FILLER)
                .set(MaterialParameter.SPONTANEOUS_POLARIZATION, psp, A00)
                .set(MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING, 0, A00)
                .set(MaterialParameter.PIEZO_NONLINEAR_LINEAR, 2 * (e31 - e33 * c13 / c33), FILLER)
                .set(MaterialParameter.PIEZO_NONLINEAR_QUADRATIC_TENSILE, 0, FILLER)
                .set(MaterialParameter.PIEZO_NONLINEAR_QUADRATIC_COMPRESSIVE, 0, FILLER)
                .set(MaterialParameter.BAND_GAP_0K, eg0, A00)
                .set(MaterialParameter.VARSHNI_ALPHA, alphaMeV * 1e-3, VM03)
                .set(MaterialParameter.VARSHNI_BETA, beta, VM03)
                .set(MaterialParameter.ELECTRON_MASS_PARALLEL, mePar, A00)
                .set(MaterialParameter.ELECTRON_MASS_PERPENDICULAR, mePerp, A00)
                .set(MaterialParameter.HEAVY_HOLE_MASS_PARALLEL, mhhPar, VM03)
                .set(MaterialParameter.HEAVY_HOLE_MASS_PERPENDICULAR, mhhPerp, VM03)
                .set(MaterialParameter.PERMITTIVITY_STATIC, eps, A00)
                .set(MaterialParameter.PERMITTIVITY_STATIC_PERPENDICULAR, eps, FILLER)
                .set(MaterialParameter.PERMITTIVITY_HIGH_FREQUENCY, epsInf, FILLER)
                .set(MaterialParameter.VALENCE_BAND_EDGE, ev, A00)
                .set(MaterialParameter.DEFORMATION_CB_PARALLEL, -8.6, VM03)
                .set(MaterialParameter.DEFORMATION_CB_PERPENDICULAR, -6.8, VM03)
                .set(MaterialParameter.DEFORMATION_D1, -3.7, VM03)
                .set(MaterialParameter.DEFORMATION_D2, 4.5, VM03)
                .set(MaterialParameter.DEFORMATION_D3, 8.2, VM03)
                .set(MaterialParameter.DEFORMATION_D4, -4.1, VM03)
                .set(MaterialParameter.LO_PHONON_ENERGY, hwLoMeV * 1e-3, DON12)
                .set(MaterialParameter.MASS_DENSITY, rhoGcm3 * 1e3, DON12)
                .set(MaterialParameter.ACOUSTIC_DEFORMATION_POTENTIAL, xiAc, DON12)
                .set(MaterialParameter.ELECTROMECHANICAL_COUPLING, k2, DON12);
        // valence-band parameters of VM03 (from memory), by binary
        double[] v = switch (name) {
            case "GaN" -> new double[] {-7.21, -0.44, 6.68, -3.46, -3.40, -4.90, 0.0937e-10, 0.010, 0.017};
            case "AlN" -> new double[] {-3.86, -0.25, 3.58, -1.32, -1.47, -1.64, 0, -0.169, 0.019};
            default -> new double[] {-8.21, -0.68, 7.57, -5.23, -5.11, -5.96, 0, 0.040, 0.005};
        };
        MaterialParameter[] keys = {MaterialParameter.VALENCE_A1, MaterialParameter.VALENCE_A2,
            MaterialParameter.VALENCE_A3, MaterialParameter.VALENCE_A4, MaterialParameter.VALENCE_A5,
            MaterialParameter.VALENCE_A6, MaterialParameter.VALENCE_A7, MaterialParameter.CRYSTAL_FIELD_SPLITTING,
            MaterialParameter.SPIN_ORBIT_SPLITTING};
        for (int i = 0; i < keys.length; i++) {
            b.set(keys[i], v[i], VM03);
        }
        return b.build();
    }

    @Override
    public String name() {
        return "a00-test";
    }

    @Override
    public String description() {
        return "AlGaN end points of the linear formulas of Ambacher et al. 2000 (test only)";
    }

    @Override
    public WurtziteMaterial binary(Binary binary) {
        return switch (binary) {
            case GAN -> gan;
            case ALN -> aln;
            case INN -> inn;
        };
    }

    @Override
    public AlloyBowing bowing() {
        Bowing zero = new Bowing(0, A00);
        // A00: AlGaN gap bowing 1.0 eV; VM03: InGaN 1.4, InAlN 2.5 eV (from memory)
        return new AlloyBowing(new Bowing(1.0, A00), new Bowing(1.4, VM03), new Bowing(2.5, VM03), zero, zero, zero);
    }

    @Override
    public AlloyScattering alloyScattering() {
        // AlGaN 1.8 eV (Jena et al., Phys. Rev. B 67, 153306 (2003)); InGaN 1.70 eV (DON12); InAlN stand-in
        return new AlloyScattering(new Bowing(1.8, FILLER), new Bowing(1.70, DON12), new Bowing(1.8, FILLER));
    }

    @Override
    public PolarizationModel recommendedPolarizationModel() {
        return PolarizationModel.LINEAR;
    }

    @Override
    public List<Source> sources() {
        return List.of(A00, VM03, DON12, FILLER);
    }
}
