package org.wurtzkit.solvers.transport.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.wurtzkit.units.Constants;

/**
 * Physical invariants of the rates on Fang-Howard subbands of any density (Ando, Fowler &amp; Stern,
 * Rev. Mod. Phys. 54, 437 (1982), and the papers of each mechanism): form factors are overlaps of a
 * normalised density and fall with q; Coulomb scattering weakens with distance and screening; rates
 * scale with the squares and densities of their sources exactly as the published forms say.
 */
class ScatteringProperties {
    private static SubbandScattering subband(double nsPerCm2, double screeningFraction) {
        return subband(nsPerCm2, screeningFraction, FangHowardLimitsTest.SET_D);
    }

    private static SubbandScattering subband(double nsPerCm2, double screeningFraction, ChannelParameters c) {
        double ns = nsPerCm2 * 1e4;
        double b = FangHoward.b(0.22, 8.9, ns);
        double[] x = FangHoward.depth(0.02e-9);
        double field = Constants.ELEMENTARY_CHARGE * ns / (2 * 8.9 * Constants.VACUUM_PERMITTIVITY);
        return new SubbandScattering(300, c, 0.22, ns,
                screeningFraction * FangHoward.thomasFermi(0.22, 8.9), x, FangHoward.psiSquared(x, b), null, field,
                null, 0, SubbandScattering.DEFAULT_QUADRATURE_POINTS);
    }

    @Property(tries = 40)
    void formFactorIsAnOverlapThatFallsWithQ(@ForAll @DoubleRange(min = 1e11, max = 3e13) double ns) {
        SubbandScattering s = subband(ns, 1);
        assertEquals(1, s.formFactorAt(0), 1e-9);
        double last = 1;
        for (int j = 0; j < s.quadratureSize(); j++) {
            double g = s.formFactor(j);
            assertTrue(g > 0 && g <= last, "G not in (0, G(previous q)] at node " + j + ": " + g);
            last = g;
        }
    }

    @Property(tries = 40)
    void remoteChargeWeakensWithDistanceAndScreening(@ForAll @DoubleRange(min = 1e11, max = 3e13) double ns,
            @ForAll @DoubleRange(min = 0.5, max = 25) double dNm) {
        SubbandScattering s = subband(ns, 1);
        double z = FangHoward.INTERFACE - dNm * 1e-9;
        double near = RemoteCharge.sheets(new ChargeSheet(z, 1e16)).momentumRelaxationRate(s);
        double far = RemoteCharge.sheets(new ChargeSheet(z - 2e-9, 1e16)).momentumRelaxationRate(s);
        assertTrue(far < near, "rate at " + (dNm + 2) + " nm " + far + " not below " + near);
        double bare = RemoteCharge.sheets(new ChargeSheet(z, 1e16)).momentumRelaxationRate(subband(ns, 0));
        assertTrue(bare > near, "unscreened " + bare + " not above screened " + near);
        // linear in the sheet density
        double twice = RemoteCharge.sheets(new ChargeSheet(z, 2e16)).momentumRelaxationRate(s);
        assertEquals(2 * near, twice, 1e-12 * twice);
    }

    @Property(tries = 40)
    void ratesScaleWithTheirSources(@ForAll @DoubleRange(min = 1e11, max = 3e13) double ns,
            @ForAll @DoubleRange(min = 0.05, max = 1) double f, @ForAll @DoubleRange(min = 0.05, max = 1) double deltaNm) {
        SubbandScattering s = subband(ns, 1);
        // dislocations: proportional to N_dis f^2 (Jena, Gossard & Mishra 2000)
        double one = ChargedDislocations.perCm2(1e9, 1).momentumRelaxationRate(s);
        assertEquals(3 * f * f * one, ChargedDislocations.perCm2(3e9, f).momentumRelaxationRate(s), 1e-12 * one);
        // roughness: proportional to Delta^2 at fixed Lambda (Ando, Fowler & Stern 1982)
        double r1 = InterfaceRoughness.ofNm(1, 2).momentumRelaxationRate(s);
        assertEquals(deltaNm * deltaNm * r1, InterfaceRoughness.ofNm(deltaNm, 2).momentumRelaxationRate(s), 1e-12 * r1);
        // acoustic deformation potential: proportional to Xi^2/v_L^2 (Price 1981)
        double dp = new AcousticDeformationPotential().momentumRelaxationRate(s);
        ChannelParameters c = FangHowardLimitsTest.SET_D.withDeformationPotentialEv(8.3 / f)
                .withLongitudinalSoundVelocity(6590 * deltaNm * 5);
        double scaled = new AcousticDeformationPotential().momentumRelaxationRate(subband(ns, 1, c));
        assertEquals(dp / (f * f) / (25 * deltaNm * deltaNm), scaled, 1e-12 * scaled);
    }
}
