package org.wurtzkit.reliability;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.reliability.StackSpec.LayerSpec;

/**
 * Random physically reasonable c-plane stacks for the solver fuzz (issue #7), generated from a seed
 * so that every case is reproducible from one number.
 *
 * <p>What "reasonable" means here (common practice, no source): a thick GaN buffer at the bottom
 * (300-2000 nm, optionally with carbon-like or iron-like compensating acceptor traps); above it
 * 0-7 layers of GaN, AlGaN, thin AlN, InGaN with In &lt;= 0.2, near-lattice-matched InAlN,
 * AlInGaN and graded AlGaN, each 0.5-200 nm but no thicker than a composition-dependent cap that
 * keeps strongly mismatched layers thin (AlN &lt;= 10 nm, x &gt; 0.5 &lt;= 10 nm, x &gt; 0.3 &lt;= 50 nm,
 * In &gt; 0.1 &lt;= 20 nm), as grown stacks are (thicker layers crack or relax); total below 3 um.
 * Doping up to 1e19 cm^-3, deep levels inside the local gap up to 1e19 cm^-3, delta donor sheets,
 * 77-600 K, Schottky gates from deep pinch-off (-12 V) to forward bias (+1.5 V) or a free surface
 * with donor-like surface states, zero-field or fixed-Fermi-level bottoms, both polarities and both
 * built-in parameter sets.
 */
final class Stacks {
    private Stacks() {
    }

    static double logUniform(SplittableRandom r, double lo, double hi) {
        return lo * Math.pow(hi / lo, r.nextDouble());
    }

    static double uniform(SplittableRandom r, double lo, double hi) {
        return lo + (hi - lo) * r.nextDouble();
    }

    /** Rounds to 4 significant digits, so that reproducers print short numbers. */
    static double round(double v) {
        return new BigDecimal(v).round(new MathContext(4, RoundingMode.HALF_EVEN)).doubleValue();
    }

    /**
     * @param seed the seed
     * @return the stack
     */
    static StackSpec random(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        String setName = r.nextInt(4) == 0 ? "ambacher-2002" : ParameterSets.DEFAULT_NAME;
        ParameterSet set = ParameterSets.named(setName);
        Polarity polarity = r.nextInt(7) == 0 ? Polarity.N_FACE : Polarity.METAL_FACE;
        double t = round(uniform(r, 77, 600));
        List<LayerSpec> layers = new ArrayList<>();

        int above = r.nextInt(8);
        double budget = 3000;
        List<LayerSpec> upper = new ArrayList<>();
        for (int i = 0; i < above; i++) {
            LayerSpec l = layer(r, set, t, "L" + (i + 1));
            upper.add(l);
            budget -= l.thicknessNm();
        }
        double buffer = round(Math.min(logUniform(r, 300, 2000), budget - 50));
        double gapGaN = set.material(Composition.GAN).bandGap().atTemperature(t);
        double deep = 0;
        boolean deepAcc = true;
        double deepE = 0;
        if (r.nextInt(10) < 6) {
            deep = round(logUniform(r, 1e15, 1e18));
            // carbon-like (E_v + 0.9 eV) or iron-like (E_c - 0.6 eV) acceptor traps
            deepE = r.nextBoolean() ? round(gapGaN - 0.9) : 0.6;
        }
        double donors = r.nextInt(10) < 3 ? round(logUniform(r, 1e15, 1e17)) : 0;
        layers.add(new LayerSpec("buffer", Composition.GAN, Composition.GAN, buffer, donors, 0, deep, deepAcc, deepE, 0));
        layers.addAll(upper);

        boolean schottky = r.nextInt(20) < 17;
        double top1;
        double top2;
        if (schottky) {
            top1 = round(uniform(r, 0.5, 1.8));
            top2 = round(r.nextInt(5) == 0 ? uniform(r, -12, -4) : uniform(r, -4, 1.5));
        } else {
            top1 = round(uniform(r, 0.4, 2.0));
            top2 = round(logUniform(r, 1e12, 1e14));
        }
        boolean bottomFixed = r.nextInt(5) == 0;
        double bottomEc = bottomFixed ? round(uniform(r, 0.1, 2.5)) : 0;
        return new StackSpec(setName, polarity, t, List.copyOf(layers), schottky, top1, top2, bottomFixed, bottomEc);
    }

    private static LayerSpec layer(SplittableRandom r, ParameterSet set, double t, String name) {
        int kind = r.nextInt(100);
        Composition bottom;
        Composition top;
        double cap;
        if (kind < 40) { // AlGaN
            double x = round(uniform(r, 0.05, 0.7));
            bottom = Composition.alGaN(x);
            cap = x > 0.5 ? 10 : x > 0.3 ? 50 : 200;
        } else if (kind < 60) {
            bottom = Composition.GAN;
            cap = 200;
        } else if (kind < 68) {
            bottom = Composition.ALN;
            cap = 10;
        } else if (kind < 80) { // InGaN, In <= 0.2
            double y = round(uniform(r, 0.01, 0.2));
            bottom = Composition.inGaN(y);
            cap = y > 0.1 ? 20 : 100;
        } else if (kind < 88) { // InAlN near lattice match
            double y = round(uniform(r, 0.13, 0.2));
            bottom = Composition.inAlN(y);
            cap = 30;
        } else if (kind < 94) { // AlInGaN
            double x = round(uniform(r, 0.05, 0.4));
            double y = round(uniform(r, 0.01, 0.1));
            bottom = Composition.alInGaN(x, y);
            cap = 50;
        } else { // graded AlGaN
            double x0 = round(uniform(r, 0, 0.4));
            double x1 = round(uniform(r, 0, 0.4));
            bottom = Composition.alGaN(x0);
            Composition t1 = Composition.alGaN(x1);
            double thickness = round(logUniform(r, 0.5, 100));
            return doping(r, set, t, name, bottom, t1, thickness);
        }
        top = bottom;
        double thickness = round(logUniform(r, 0.5, cap));
        return doping(r, set, t, name, bottom, top, thickness);
    }

    private static LayerSpec doping(SplittableRandom r, ParameterSet set, double t, String name, Composition bottom,
            Composition top, double thicknessNm) {
        double donors = r.nextInt(4) == 0 ? round(logUniform(r, 1e15, 1e19)) : 0;
        double acceptors = r.nextInt(10) == 0 ? round(logUniform(r, 1e15, 1e19)) : 0;
        double deep = 0;
        boolean acc = false;
        double energy = 0;
        if (r.nextInt(7) == 0) {
            double gap = Math.min(set.material(bottom).bandGap().atTemperature(t),
                    set.material(top).bandGap().atTemperature(t));
            deep = round(logUniform(r, 1e15, 1e19));
            acc = r.nextBoolean();
            energy = round(uniform(r, 0.1, 0.9) * gap);
        }
        double delta = r.nextInt(20) == 0 ? round(logUniform(r, 1e11, 5e13)) : 0;
        return new LayerSpec(name, bottom, top, thicknessNm, donors, acceptors, deep, acc, energy, delta);
    }
}
