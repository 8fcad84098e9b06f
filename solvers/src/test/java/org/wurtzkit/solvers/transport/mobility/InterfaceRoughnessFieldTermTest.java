package org.wurtzkit.solvers.transport.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.wurtzkit.solvers.transport.mobility.InterfaceRoughness.FieldTerm;
import org.wurtzkit.units.Constants;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * The two field terms of interface-roughness scattering against closed forms, on the exact ground state of a
 * finite square well (no field inside, one step at each wall): the textbook even solution
 * k tan(k L/2) = kappa, psi = A cos(k z) inside and A cos(k L/2) exp(-kappa (|z| - L/2)) outside (common
 * practice, no source), its eigenvalue found with a general-purpose root finder (Apache Commons Math
 * BrentSolver).
 *
 * <p>Band-step form (R. E. Prange and T.-W. Nee, Phys. Rev. 166, 737 (1968)): the force is
 * DeltaE_c |psi(L/2)|^2, which for an exact eigenstate is the first-order energy shift per unit shift of one
 * wall, -dE/dL (Hellmann-Feynman; the well-width fluctuation form of H. Sakaki et al., Appl. Phys. Lett. 51,
 * 1934 (1987), from memory); the rate is then that of T. Ando, A. B. Fowler and F. Stern, Rev. Mod. Phys. 54,
 * 437 (1982) with e F_eff replaced by it. Unscreened, the angular integral is
 * integral_0^(pi/2) sin^2(theta) exp(-(k_F Lambda)^2 sin^2(theta)) d theta, integrated here with a
 * general-purpose Gauss-Legendre integrator (Apache Commons Math). Mean-field form: no field in the well, so
 * its rate is 0 and it says so.
 */
class InterfaceRoughnessFieldTermTest {
    private static final double MASS = 0.2;
    private static final double EV = Constants.ELEMENTARY_CHARGE;

    /** Ground-state energy (J) of a finite square well of width l (m) and depth v0 (J), mass MASS m0. */
    private static double groundEnergy(double l, double v0) {
        double m = MASS * Constants.ELECTRON_MASS;
        double h = Constants.HBAR;
        return new BrentSolver(1e-15, 1e-40).solve(500, e -> {
            double k = Math.sqrt(2 * m * e) / h;
            double kappa = Math.sqrt(2 * m * (v0 - e)) / h;
            return k * Math.sin(k * l / 2) - kappa * Math.cos(k * l / 2);
        }, 1e-6 * v0, Math.min(v0 * (1 - 1e-9), 0.999 * Math.pow(Math.PI * h / l, 2) / (2 * m)));
    }

    @Test
    void bandStepFormIsTheWallShiftOfTheSquareWellLevel() {
        double l = 5e-9;
        double v0 = 0.5 * EV;
        double m = MASS * Constants.ELECTRON_MASS;
        double e = groundEnergy(l, v0);
        double k = Math.sqrt(2 * m * e) / Constants.HBAR;
        double kappa = Math.sqrt(2 * m * (v0 - e)) / Constants.HBAR;
        double a = l / 2;
        double c2 = Math.cos(k * a) * Math.cos(k * a);
        double amp2 = 1 / (a + Math.sin(2 * k * a) / (2 * k) + c2 / kappa);
        double wallDensity = amp2 * c2;
        // Hellmann-Feynman: DeltaE_c |psi(wall)|^2 = -dE/dL (moving one wall), central difference of the exact levels
        double dl = 1e-13;
        double dEdL = (groundEnergy(l + dl, v0) - groundEnergy(l - dl, v0)) / (2 * dl);
        assertEquals(-dEdL, v0 * wallDensity, 1e-5 * v0 * wallDensity, "closed form against the level's shift");

        // the same well on a mesh of 0.005 nm from -3 nm to 8 nm (walls at 0 and 5 nm), handed to the library
        int n = 2201;
        double[] x = new double[n];
        double[] psi2 = new double[n];
        int wall = -1;
        for (int i = 0; i < n; i++) {
            x[i] = -3e-9 + i * 5e-12;
            double z = x[i] - a;
            psi2[i] = Math.abs(z) <= a ? amp2 * Math.pow(Math.cos(k * z), 2) : wallDensity * Math.exp(-2 * kappa * (Math.abs(z) - a));
            if (Math.abs(x[i]) < 1e-15) {
                wall = i;
            }
        }
        double ns = 1e16;
        ChannelParameters chan = FangHowardLimitsTest.SET_D;
        SubbandScattering s = new SubbandScattering(77, chan, MASS, ns, 0, x, psi2, null, 0, null, wall, v0, null, 0,
                SubbandScattering.DEFAULT_QUADRATURE_POINTS);
        assertEquals(wallDensity, s.interfaceDensity(), 1e-4 * wallDensity, "|psi|^2 at the wall after normalisation");

        InterfaceRoughness step = InterfaceRoughness.ofNm(0.3, 4).withFieldTerm(FieldTerm.BAND_STEP);
        double kl = Math.sqrt(2 * Math.PI * ns) * step.correlationLength();
        double angular = new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-14).integrate(100000,
                t -> Math.pow(Math.sin(t), 2) * Math.exp(-kl * kl * Math.pow(Math.sin(t), 2)), 0, Math.PI / 2);
        double force = -dEdL;
        double expected = 4 * m * Math.pow(step.rmsHeight() * step.correlationLength() * force, 2)
                / Math.pow(Constants.HBAR, 3) * angular;
        assertEquals(expected, step.momentumRelaxationRate(s), 2e-4 * expected, "band-step rate");
        assertTrue(step.typedWarning(s).isEmpty(), step.typedWarning(s).toString());

        // the mean field form: no field in a flat-band well, rate 0, and a warning that says so
        InterfaceRoughness mean = InterfaceRoughness.ofNm(0.3, 4);
        assertEquals(0, mean.momentumRelaxationRate(s));
        Warning w = mean.typedWarning(s).orElseThrow();
        assertEquals(WarningKind.SCATTERING_MODEL_OUT_OF_VALIDITY, w.kind());
        assertTrue(w.message().contains("no interface"), w.message());
    }

    @Test
    void bothFormsShareTheRateAndDifferOnlyInTheForceTerm() {
        // on a Fang-Howard subband the mean-field form is the closed form of Ando, Fowler & Stern (checked in
        // FangHowardLimitsTest); with a band step given, the ratio of the two rates is (DeltaE |psi|^2/(e F))^2
        double ns = 1e16;
        double b = FangHoward.b(FangHowardLimitsTest.MASS, FangHowardLimitsTest.SET_D.staticPermittivity(), ns);
        double[] x = FangHoward.depth();
        double[] psi2 = FangHoward.psiSquared(x, b);
        int node = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] < FangHoward.INTERFACE + 0.5e-9) {
                node = i;
            }
        }
        double field = 3e7;
        double step = 0.4 * EV;
        SubbandScattering s = new SubbandScattering(300, FangHowardLimitsTest.SET_D, FangHowardLimitsTest.MASS, ns,
                1e8, x, psi2, null, field, null, node, step, null, 0, SubbandScattering.DEFAULT_QUADRATURE_POINTS);
        InterfaceRoughness mean = InterfaceRoughness.DEFAULT;
        InterfaceRoughness band = mean.withFieldTerm(FieldTerm.BAND_STEP);
        double ratio = Math.pow(step * s.interfaceDensity() / (EV * field), 2);
        assertTrue(s.interfaceDensity() > 0);
        assertEquals(ratio * mean.momentumRelaxationRate(s), band.momentumRelaxationRate(s),
                1e-12 * band.momentumRelaxationRate(s));
        // the default is the mean field, the two-argument constructor keeps meaning it, and the text of the
        // default is unchanged (result tables and provenance keep their columns)
        assertEquals(FieldTerm.MEAN_FIELD, InterfaceRoughness.DEFAULT.fieldTerm());
        assertEquals(new InterfaceRoughness(2.6e-10, 3e-9), new InterfaceRoughness(2.6e-10, 3e-9, FieldTerm.MEAN_FIELD));
        assertEquals("InterfaceRoughness[rmsHeight=2.6E-10, correlationLength=3.0E-9]", new InterfaceRoughness(2.6e-10, 3e-9).toString());
        assertNotEquals(mean, band);
        assertTrue(band.toString().contains("BAND_STEP"), band.toString());
        assertEquals(List.of(FieldTerm.MEAN_FIELD, FieldTerm.BAND_STEP), List.of(FieldTerm.values()));
    }
}
