// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.reliability;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.reliability.StackSpec.LayerSpec;

/**
 * Random stacks over the wider ranges of issue #14, for {@link WideFuzzTest}: every case is built
 * from one seed, so a failure is reproduced from one number.
 *
 * <p>Ranges (common practice, no source; chosen to cover what epi designers grow and measure, and
 * the corners the issue probed): 1-12 layers of 0.3 nm-5 um, total at most 10 um; a buffer of GaN,
 * AlN or AlGaN; above it AlGaN and InGaN over the whole range (InN-rich included), InAlN,
 * quaternary AlInGaN and graded AlGaN; a layer thicker than its pseudomorphic limit (the same caps
 * as {@link Stacks}) is partly or fully relaxed, and any layer may be partly relaxed; n and p doping
 * up to 1e20 cm^-3; an optional p-GaN cap (Mg-like acceptors, 0.17 eV, 1e18-1e20 cm^-3); carbon-like
 * (E_v + 0.9 eV) or iron-like (E_c - 0.6 eV) acceptor traps in the buffer and deep levels anywhere
 * inside a layer's gap; 4-1000 K; Schottky gates from -30 V to +3 V (barriers 0.5-1.8 eV) or free
 * surfaces with 1e10-1e15 cm^-2 donor-like states; zero-field or fixed-Fermi-level bottoms; both
 * polarities and both built-in parameter sets.
 */
final class WideStacks {
    private WideStacks() {
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
        double t = Stacks.round(r.nextInt(6) == 0 ? Stacks.logUniform(r, 4, 77) : Stacks.uniform(r, 77, 1000));
        double budget = 10_000;

        // the buffer: GaN mostly, sometimes AlN or AlGaN (templates on sapphire or SiC)
        int bk = r.nextInt(10);
        Composition buf = bk < 7 ? Composition.GAN : bk < 9 ? Composition.ALN : Composition.alGaN(Stacks.round(Stacks.uniform(r, 0.05, 0.9)));
        double bufferNm = Stacks.round(Stacks.logUniform(r, 50, 5000));
        budget -= bufferNm;
        double bufDonors = r.nextInt(10) < 3 ? Stacks.round(Stacks.logUniform(r, 1e14, 1e18)) : 0;
        double deep = 0;
        double deepE = 0;
        if (r.nextInt(10) < 5) {
            deep = Stacks.round(Stacks.logUniform(r, 1e15, 1e18));
            double gap = set.material(buf).bandGap().atTemperature(t);
            // carbon-like (E_v + 0.9 eV) or iron-like (E_c - 0.6 eV) acceptor traps
            deepE = r.nextBoolean() ? Stacks.round(gap - 0.9) : 0.6;
        }
        List<LayerSpec> layers = new ArrayList<>();
        layers.add(new LayerSpec("buffer", buf, buf, bufferNm, bufDonors, 0, deep, true, deepE, 0));

        int above = r.nextInt(12);
        boolean pCap = r.nextInt(6) == 0;
        for (int i = 0; i < above && budget > 1; i++) {
            LayerSpec l = layer(r, set, t, "L" + (i + 1), budget);
            layers.add(l);
            budget -= l.thicknessNm();
        }
        if (pCap && budget > 5) {
            double thick = Stacks.round(Stacks.logUniform(r, 5, 100));
            layers.add(new LayerSpec("pcap", Composition.GAN, Composition.GAN, thick, 0, Stacks.round(Stacks.logUniform(r, 1e18, 1e20)),
                    0, false, 0, 0, 0));
        }

        boolean schottky = r.nextInt(10) < 8;
        double top1;
        double top2;
        if (schottky) {
            top1 = Stacks.round(Stacks.uniform(r, 0.5, 1.8));
            int bias = r.nextInt(10);
            top2 = Stacks.round(bias < 2 ? Stacks.uniform(r, -30, -4) : bias < 9 ? Stacks.uniform(r, -4, 1.5) : Stacks.uniform(r, 1.5, 3));
        } else {
            top1 = Stacks.round(Stacks.uniform(r, 0.4, 2.0));
            top2 = Stacks.round(Stacks.logUniform(r, 1e10, 1e15));
        }
        boolean bottomFixed = r.nextInt(5) == 0;
        double bottomEc = bottomFixed ? Stacks.round(Stacks.uniform(r, 0.1, 2.5)) : 0;
        return new StackSpec(setName, polarity, t, List.copyOf(layers), schottky, top1, top2, bottomFixed, bottomEc);
    }

    private static LayerSpec layer(SplittableRandom r, ParameterSet set, double t, String name, double budget) {
        int kind = r.nextInt(100);
        Composition bottom;
        Composition top;
        double cap;
        if (kind < 30) { // AlGaN over the whole range
            double x = Stacks.round(Stacks.uniform(r, 0.05, 1));
            bottom = Composition.alGaN(x);
            cap = x > 0.5 ? 10 : x > 0.3 ? 50 : 200;
        } else if (kind < 48) {
            bottom = Composition.GAN;
            cap = 5000;
        } else if (kind < 56) {
            bottom = Composition.ALN;
            cap = 10;
        } else if (kind < 70) { // InGaN up to InN
            double y = Stacks.round(r.nextInt(4) == 0 ? Stacks.uniform(r, 0.2, 1) : Stacks.uniform(r, 0.01, 0.2));
            bottom = Composition.inGaN(y);
            cap = y > 0.1 ? 20 : 100;
        } else if (kind < 78) { // InAlN, near lattice match or not
            double y = Stacks.round(Stacks.uniform(r, 0.05, 0.4));
            bottom = Composition.inAlN(y);
            cap = 30;
        } else if (kind < 88) { // AlInGaN quaternaries
            double x = Stacks.round(Stacks.uniform(r, 0.05, 0.8));
            double y = Stacks.round(Stacks.uniform(r, 0.01, Math.min(0.3, 0.99 - x)));
            bottom = Composition.alInGaN(x, y);
            cap = 50;
        } else { // graded AlGaN
            double x0 = Stacks.round(Stacks.uniform(r, 0, 0.6));
            double x1 = Stacks.round(Stacks.uniform(r, 0, 0.6));
            bottom = Composition.alGaN(x0);
            top = Composition.alGaN(x1);
            double thickness = Stacks.round(Math.min(Stacks.logUniform(r, 0.3, 500), budget));
            return doping(r, set, t, name, bottom, top, thickness, thickness > 100 ? Stacks.round(Stacks.uniform(r, 0, 1)) : 0);
        }
        top = bottom;
        double thickness;
        double relaxation;
        if (r.nextInt(8) == 0) {
            // thicker than pseudomorphic growth allows: relaxed in part or in full
            thickness = Stacks.round(Math.min(Stacks.logUniform(r, cap, Math.max(cap, 5000)), budget));
            relaxation = Stacks.round(Stacks.uniform(r, 0.5, 1));
        } else {
            thickness = Stacks.round(Math.min(Stacks.logUniform(r, 0.3, cap), budget));
            relaxation = r.nextInt(10) == 0 ? Stacks.round(Stacks.uniform(r, 0, 1)) : 0;
        }
        return doping(r, set, t, name, bottom, top, thickness, relaxation);
    }

    private static LayerSpec doping(SplittableRandom r, ParameterSet set, double t, String name, Composition bottom,
            Composition top, double thicknessNm, double relaxation) {
        double donors = r.nextInt(4) == 0 ? Stacks.round(Stacks.logUniform(r, 1e14, 1e20)) : 0;
        double acceptors = r.nextInt(8) == 0 ? Stacks.round(Stacks.logUniform(r, 1e14, 1e20)) : 0;
        double deep = 0;
        boolean acc = false;
        double energy = 0;
        if (r.nextInt(6) == 0) {
            double gap = Math.min(set.material(bottom).bandGap().atTemperature(t),
                    set.material(top).bandGap().atTemperature(t));
            deep = Stacks.round(Stacks.logUniform(r, 1e14, 1e19));
            acc = r.nextBoolean();
            energy = Stacks.round(Stacks.uniform(r, 0.1, 0.9) * gap);
        }
        double delta = r.nextInt(20) == 0 ? Stacks.round(Stacks.logUniform(r, 1e11, 5e13)) : 0;
        return new LayerSpec(name, bottom, top, thicknessNm, donors, acceptors, deep, acc, energy, delta, relaxation);
    }
}
