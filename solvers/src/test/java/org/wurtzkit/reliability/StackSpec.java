package org.wurtzkit.reliability;

import static org.wurtzkit.units.Units.NM;

import java.util.List;
import java.util.Locale;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * A plain description of a random stack for the solver fuzz: it builds the {@link Structure} and
 * prints itself as Java code, so that a failing case is a copy-paste reproducer.
 *
 * @param setName     parameter set
 * @param polarity    polarity
 * @param temperature temperature (K)
 * @param layers      layers in growth order, the first (bottom) one the buffer
 * @param schottky    true for a Schottky gate, false for a free surface
 * @param top1        phi_B (eV) or surface donor energy below E_c (eV)
 * @param top2        gate bias (V) or surface donor density (cm^-2)
 * @param bottomFixed true for a fixed Fermi level at the bottom, false for zero field
 * @param bottomEc    E_c - E_F at the bottom (eV) when fixed
 */
record StackSpec(String setName, Polarity polarity, double temperature, List<LayerSpec> layers, boolean schottky,
        double top1, double top2, boolean bottomFixed, double bottomEc) {

    /**
     * One layer.
     *
     * @param name        name
     * @param bottom      composition at the bottom
     * @param top         composition at the top (equal to bottom for a uniform layer)
     * @param thicknessNm thickness (nm)
     * @param donors      shallow donors (cm^-3), 0 for none
     * @param acceptors   shallow acceptors (cm^-3), 0 for none
     * @param deepDensity deep level density (cm^-3), 0 for none
     * @param deepAcceptorLike acceptor-like (true) or donor-like deep level
     * @param deepEnergy  deep level E_c - E_T (eV)
     * @param deltaDonors delta donor sheet at mid-layer (cm^-2), 0 for none
     * @param relaxation  in-plane relaxation in [0, 1], 0 for pseudomorphic
     */
    record LayerSpec(String name, Composition bottom, Composition top, double thicknessNm, double donors,
            double acceptors, double deepDensity, boolean deepAcceptorLike, double deepEnergy, double deltaDonors,
            double relaxation) {

        /** A pseudomorphic layer. */
        LayerSpec(String name, Composition bottom, Composition top, double thicknessNm, double donors,
                double acceptors, double deepDensity, boolean deepAcceptorLike, double deepEnergy, double deltaDonors) {
            this(name, bottom, top, thicknessNm, donors, acceptors, deepDensity, deepAcceptorLike, deepEnergy, deltaDonors,
                    0);
        }

        Layer build() {
            Layer l = bottom.equals(top) ? Layer.of(name, bottom, thicknessNm * NM)
                    : Layer.graded(name, bottom, top, thicknessNm * NM);
            if (donors > 0) {
                l = l.withDopant(Dopant.donorsPerCm3(donors, 0.02));
            }
            if (acceptors > 0) {
                l = l.withDopant(Dopant.acceptorsPerCm3(acceptors, 0.17));
            }
            if (deepDensity > 0) {
                l = l.withDeepLevel(deepAcceptorLike ? DeepLevel.acceptorLikePerCm3(deepDensity, deepEnergy)
                        : DeepLevel.donorLikePerCm3(deepDensity, deepEnergy));
            }
            if (deltaDonors > 0) {
                l = l.withDeltaDoping(DeltaDoping.donorsPerCm2(deltaDonors, 0.02).atOffset(0.5 * thicknessNm * NM));
            }
            if (relaxation > 0) {
                l = l.withRelaxation(relaxation);
            }
            return l;
        }

        String toJava() {
            StringBuilder sb = new StringBuilder();
            if (bottom.equals(top)) {
                sb.append(String.format(Locale.ROOT, "Layer.of(\"%s\", %s, %s * NM)", name, comp(bottom), num(thicknessNm)));
            } else {
                sb.append(String.format(Locale.ROOT, "Layer.graded(\"%s\", %s, %s, %s * NM)", name, comp(bottom), comp(top),
                        num(thicknessNm)));
            }
            if (donors > 0) {
                sb.append(".withDopant(Dopant.donorsPerCm3(").append(num(donors)).append(", 0.02))");
            }
            if (acceptors > 0) {
                sb.append(".withDopant(Dopant.acceptorsPerCm3(").append(num(acceptors)).append(", 0.17))");
            }
            if (deepDensity > 0) {
                sb.append(".withDeepLevel(DeepLevel.").append(deepAcceptorLike ? "acceptorLikePerCm3(" : "donorLikePerCm3(")
                        .append(num(deepDensity)).append(", ").append(num(deepEnergy)).append("))");
            }
            if (deltaDonors > 0) {
                sb.append(".withDeltaDoping(DeltaDoping.donorsPerCm2(").append(num(deltaDonors)).append(", 0.02).atOffset(")
                        .append(num(0.5 * thicknessNm)).append(" * NM))");
            }
            if (relaxation > 0) {
                sb.append(".withRelaxation(").append(num(relaxation)).append(")");
            }
            return sb.toString();
        }
    }

    ParameterSet parameterSet() {
        return ParameterSets.named(setName);
    }

    TopBoundary topBoundary() {
        return schottky ? TopBoundary.schottky(top1).atBiasV(top2) : TopBoundary.freeSurfacePerCm2(top1, top2);
    }

    Structure build() {
        Structure.Builder b = Structure.builder(parameterSet()).polarity(polarity).temperatureK(temperature);
        for (LayerSpec l : layers) {
            b.grow(l.build());
        }
        b.top(topBoundary());
        b.bottom(bottomFixed ? BottomBoundary.fixedFermiLevel(bottomEc) : BottomBoundary.zeroField());
        return b.build();
    }

    double totalNm() {
        double t = 0;
        for (LayerSpec l : layers) {
            t += l.thicknessNm();
        }
        return t;
    }

    /** @return Java code that builds the same structure */
    String toJava() {
        StringBuilder sb = new StringBuilder("Structure s = Structure.builder(ParameterSets.named(\"" + setName + "\"))");
        sb.append("\n        .polarity(Polarity.").append(polarity).append(").temperatureK(").append(num(temperature))
                .append(")");
        for (LayerSpec l : layers) {
            sb.append("\n        .grow(").append(l.toJava()).append(")");
        }
        sb.append("\n        .top(TopBoundary.").append(schottky
                ? "schottky(" + num(top1) + ").atBiasV(" + num(top2) + "))"
                : "freeSurfacePerCm2(" + num(top1) + ", " + num(top2) + "))");
        sb.append("\n        .bottom(BottomBoundary.")
                .append(bottomFixed ? "fixedFermiLevel(" + num(bottomEc) + ")" : "zeroField()").append(")");
        sb.append("\n        .build();\nnew SelfConsistentSolver().solve(s);");
        return sb.toString();
    }

    @Override
    public String toString() {
        return toJava();
    }

    static String comp(Composition c) {
        if (c.equals(Composition.GAN)) {
            return "Composition.GAN";
        }
        if (c.equals(Composition.ALN)) {
            return "Composition.ALN";
        }
        if (c.equals(Composition.INN)) {
            return "Composition.INN";
        }
        if (c.indium() == 0) {
            return "Composition.alGaN(" + num(c.aluminium()) + ")";
        }
        if (c.aluminium() == 0) {
            return "Composition.inGaN(" + num(c.indium()) + ")";
        }
        return "Composition.alInGaN(" + num(c.aluminium()) + ", " + num(c.indium()) + ")";
    }

    /** Shortest text that parses back to the same double. */
    static String num(double v) {
        return Double.toString(v);
    }
}
