package org.wurtzkit.polarization;

import org.wurtzkit.material.PiezoelectricConstants;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.strain.Strain;
import org.wurtzkit.units.Decimals;

/**
 * The polarization of one strained layer, components along [0001] (C/m&sup2;), in the sign
 * convention of F. Bernardini, V. Fiorentini and D. Vanderbilt, Phys. Rev. B 56, R10024 (1997)
 * (negative P_sp for all three nitrides).
 *
 * <ul>
 * <li>Linear piezoelectric: P_pz = 2 eps_xx (e31 - e33 C13/C33) (Ambacher et al., J. Appl. Phys.
 * 85, 3222 (1999)).</li>
 * <li>Nonlinear piezoelectric: P_pz = a1 eps + a2 eps&sup2; with eps = eps_xx the basal strain of
 * the layer (Bernardini &amp; Fiorentini, Phys. Rev. B 64, 085207 (2001); Ambacher et al., J. Phys.:
 * Condens. Matter 14, 3399 (2002)); a2 takes its tensile or compressive value by the sign of eps.</li>
 * <li>Spontaneous: Vegard's law, or with the bowing of Bernardini &amp; Fiorentini 2001.</li>
 * </ul>
 *
 * @param spontaneous   P_sp along [0001] (C/m&sup2;)
 * @param piezoelectric P_pz along [0001] (C/m&sup2;)
 */
public record Polarization(double spontaneous, double piezoelectric) {

    /** Validates: both components finite. */
    public Polarization {
        org.wurtzkit.errors.Require.finite("spontaneous polarization (C/m^2)", spontaneous);
        org.wurtzkit.errors.Require.finite("piezoelectric polarization (C/m^2)", piezoelectric);
    }

    /**
     * @param m      the material
     * @param strain its strain
     * @param model  the model
     * @return the polarization along [0001]
     */
    public static Polarization of(WurtziteMaterial m, Strain strain, PolarizationModel model) {
        org.wurtzkit.errors.Require.nonNull("material", m);
        org.wurtzkit.errors.Require.nonNull("strain", strain);
        org.wurtzkit.errors.Require.nonNull("polarization model", model);
        double psp = model.spontaneous() == PolarizationModel.Spontaneous.BOWING ? m.spontaneousPolarizationWithBowing()
                : m.spontaneousPolarization();
        return new Polarization(psp, piezoelectric(m, strain, model.piezoelectric()));
    }

    /**
     * @param m      the material
     * @param strain its strain
     * @param model  linear or nonlinear
     * @return P_pz along [0001] (C/m&sup2;)
     */
    public static double piezoelectric(WurtziteMaterial m, Strain strain, PolarizationModel.Piezoelectric model) {
        PiezoelectricConstants e = m.piezoelectric();
        double eps = strain.xx();
        if (model == PolarizationModel.Piezoelectric.LINEAR) {
            double ratio = m.elastic().c13() / m.elastic().c33();
            return 2 * eps * (e.e31() - e.e33() * ratio);
        }
        double a2 = eps > 0 ? e.nonlinearQuadraticTensile() : e.nonlinearQuadraticCompressive();
        return e.nonlinearLinear() * eps + a2 * eps * eps;
    }

    /** {@return P_sp + P_pz along [0001] (C/m&sup2;)} */
    public double total() {
        return spontaneous + piezoelectric;
    }

    /**
     * @param polarity the stack's polarity
     * @return the growth-direction component of the total polarization (C/m&sup2;)
     */
    public double alongGrowth(Polarity polarity) {
        return polarity.sign() * total();
    }

    /** @return e.g. {@code "P_sp = -0.0426 C/m^2, P_pz = -0.0115 C/m^2 along [0001]"} */
    @Override
    public String toString() {
        return "P_sp = " + Decimals.format(spontaneous, "C/m^2") + ", P_pz = " + Decimals.format(piezoelectric, "C/m^2")
                + " along [0001]";
    }
}
