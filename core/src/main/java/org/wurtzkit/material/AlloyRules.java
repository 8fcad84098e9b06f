package org.wurtzkit.material;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Resolution of Al<sub>x</sub>In<sub>y</sub>Ga<sub>1-x-y</sub>N from the three binaries of a
 * parameter set.
 *
 * <ul>
 * <li>Every parameter follows Vegard's law, v = x v_AlN + y v_InN + z v_GaN (L. Vegard, Z. Phys. 5,
 * 17 (1921)); for the lattice constants this is the law itself, for the others it is the usual
 * linear interpolation (I. Vurgaftman &amp; J. R. Meyer, J. Appl. Phys. 94, 3675 (2003)).</li>
 * <li>The gap bows: Eg = Vegard - b_AlGa x z - b_InGa y z - b_InAl x y. Its temperature
 * dependence follows the set's {@link ParameterSet#alloyGapTemperatureRule()}: one Varshni law with
 * interpolated alpha and beta (the default), or each binary's Varshni law, then the bowing. For a ternary this is the
 * usual one-parameter bowing form; for the quaternary it is the sum of the three pairwise terms
 * (one of the two schemes in common use; the other is the weighted-ternary scheme of Glisson et al.,
 * J. Electron. Mater. 7, 1 (1978)).</li>
 * <li>The nonlinear spontaneous polarization adds b_AlGa x z + b_InGa y z + b_InAl x y
 * (Bernardini &amp; Fiorentini, Phys. Rev. B 64, 085207 (2001); quaternary form of Fiorentini,
 * Bernardini &amp; Ambacher, Appl. Phys. Lett. 80, 1204 (2002)), kept separately as
 * {@link MaterialParameter#SPONTANEOUS_POLARIZATION_BOWING} so that the linear model stays
 * available.</li>
 * <li>The nonlinear piezoelectric coefficients follow Vegard's law, which is exactly the alloy rule
 * P_pz(alloy) = sum x_i P_pz,i(eps) of Ambacher et al., J. Phys.: Condens. Matter 14, 3399 (2002),
 * since P_pz,i is linear in its coefficients.</li>
 * </ul>
 */
public final class AlloyRules {
    private AlloyRules() {
    }

    /**
     * @param set         the parameter set supplying binaries and bowing
     * @param composition the alloy
     * @return the resolved material; for a binary composition, the set's binary itself
     */
    public static WurtziteMaterial resolve(ParameterSet set, Composition composition) {
        if (composition.equals(Composition.GAN)) {
            return set.binary(Binary.GAN);
        }
        if (composition.equals(Composition.ALN)) {
            return set.binary(Binary.ALN);
        }
        if (composition.equals(Composition.INN)) {
            return set.binary(Binary.INN);
        }
        WurtziteMaterial gan = set.binary(Binary.GAN);
        WurtziteMaterial aln = set.binary(Binary.ALN);
        WurtziteMaterial inn = set.binary(Binary.INN);
        double x = composition.aluminium();
        double y = composition.indium();
        double z = composition.gallium();
        AlloyBowing bow = set.bowing();

        WurtziteMaterial.Builder b = WurtziteMaterial.builder(composition.formula() + " (" + set.name() + ")")
                .composition(composition);
        for (MaterialParameter p : MaterialParameter.values()) {
            double v = x * aln.get(p) + y * inn.get(p) + z * gan.get(p);
            List<Source> sources = new ArrayList<>();
            addSources(sources, x, aln, p);
            addSources(sources, y, inn, p);
            addSources(sources, z, gan, p);
            String rule = "Vegard's law";
            if (p == MaterialParameter.BAND_GAP_0K) {
                v -= bow.gapAlGaN().value() * x * z + bow.gapInGaN().value() * y * z + bow.gapInAlN().value() * x * y;
                rule = bowingRule(sources, x, y, z, bow.gapAlGaN(), bow.gapInGaN(), bow.gapInAlN(), "eV",
                        "Vegard's law with gap bowing");
            } else if (p == MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING) {
                v = bow.polarizationAlGaN().value() * x * z + bow.polarizationInGaN().value() * y * z
                        + bow.polarizationInAlN().value() * x * y;
                sources.clear();
                rule = bowingRule(sources, x, y, z, bow.polarizationAlGaN(), bow.polarizationInGaN(),
                        bow.polarizationInAlN(), "C/m^2", "nonlinear spontaneous polarization, bowing");
            }
            b.set(p, v, new Provenance(rule, dedupe(sources)));
        }
        if (set.alloyGapTemperatureRule() == AlloyGapTemperatureRule.VARSHNI_PER_BINARY_THEN_BOWING) {
            double bowing = bow.gapAlGaN().value() * x * z + bow.gapInGaN().value() * y * z
                    + bow.gapInAlN().value() * x * y;
            b.perBinaryGap(new BandGap.PerBinary(new double[] {x, y, z},
                    new BandGap[] {aln.bandGap(), inn.bandGap(), gan.bandGap()}, bowing));
        }
        return b.build();
    }

    private static void addSources(List<Source> out, double fraction, WurtziteMaterial m, MaterialParameter p) {
        if (fraction > 0) {
            out.addAll(m.source(p).sources());
        }
    }

    private static String bowingRule(List<Source> sources, double x, double y, double z, Bowing alGa, Bowing inGa,
            Bowing inAl, String unit, String label) {
        StringBuilder sb = new StringBuilder(label);
        String sep = " ";
        // pairs of present elements (not products, which could underflow): an alloy has at least one
        if (x > 0 && z > 0) {
            sb.append(sep).append(String.format(Locale.ROOT, "b(AlGaN) = %g %s", alGa.value(), unit));
            sources.add(alGa.source());
            sep = ", ";
        }
        if (y > 0 && z > 0) {
            sb.append(sep).append(String.format(Locale.ROOT, "b(InGaN) = %g %s", inGa.value(), unit));
            sources.add(inGa.source());
            sep = ", ";
        }
        if (x > 0 && y > 0) {
            sb.append(sep).append(String.format(Locale.ROOT, "b(InAlN) = %g %s", inAl.value(), unit));
            sources.add(inAl.source());
        }
        return sb.toString();
    }

    private static List<Source> dedupe(List<Source> in) {
        List<Source> out = new ArrayList<>();
        for (Source s : in) {
            if (!out.contains(s)) {
                out.add(s);
            }
        }
        return out;
    }
}
