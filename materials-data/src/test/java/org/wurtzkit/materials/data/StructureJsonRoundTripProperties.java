package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.PolarizationModel;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Any structure the builder can make (random doubles with every bit pattern the ranges allow,
 * every kind of layer content, boundary and model choice) survives JSON and back equal, and
 * writing is a fixed point. Exact by construction (Double.toString reads back to the same double;
 * common practice, no source).
 */
class StructureJsonRoundTripProperties {

    @Property(tries = 300)
    void anyStructureSurvivesWriteAndRead(@ForAll("structures") Structure s) {
        String text = StructureJson.write(s);
        Structure back = StructureJson.reader().read(text, "property");
        assertEquals(s, back);
        assertEquals(text, StructureJson.write(back));
        assertEquals(s, StructureJson.reader().read(StructureJson.writeCompact(s), "property"));
    }

    /**
     * Doubles in [lo, hi] with all 53 bits of the significand random (jqwik's own doubles are
     * decimals of a fixed scale, which would hide a round trip that loses the last bits).
     */
    static Arbitrary<Double> real(double lo, double hi) {
        return Arbitraries.oneOf(Arbitraries.of(lo, hi), Arbitraries.longs().between(0, (1L << 53) - 1)
                .map(k -> Math.min(hi, lo + (hi - lo) * (k * 0x1.0p-53))));
    }

    static Arbitrary<Composition> compositions() {
        Arbitrary<Double> f = real(0, 1);
        return Combinators.combine(f, f).as((a, b) -> a + b <= 1 ? new Composition(a, b) : new Composition(a, 0));
    }

    static Arbitrary<Layer> layers() {
        Arbitrary<Double> thickness = Arbitraries.oneOf(real(0.3e-9, 3e-6),
                Arbitraries.integers().between(1, 2000).map(n -> n * 1e-9));
        Arbitrary<Layer> base = Combinators.combine(Arbitraries.strings().ofMaxLength(12), compositions(),
                compositions(), Arbitraries.of(true, false), thickness, real(0, 1))
                .as((name, c1, c2, graded, t, r) -> (graded ? Layer.graded(name, c1, c2, t) : Layer.of(name, c1, t))
                        .withRelaxation(r));
        Arbitrary<Dopant> dopant = Combinators.combine(Arbitraries.of(Dopant.Kind.values()),
                real(0, 1e26), real(0, 2),
                real(0.5, 8)).as(Dopant::new);
        Arbitrary<DeepLevel> deep = Combinators.combine(Arbitraries.of(DeepLevel.Kind.values()),
                real(0, 1e25), real(0, 6)).as(DeepLevel::new);
        Arbitrary<Double> fraction = real(0, 1);
        Arbitrary<Double> sheet = real(0, 1e18);
        Arbitrary<Double> ionization = real(0, 2);
        Arbitrary<Dopant.Kind> kinds = Arbitraries.of(Dopant.Kind.values());
        return Combinators.combine(base, dopant.list().ofMaxSize(2), deep.list().ofMaxSize(2),
                Combinators.combine(kinds, sheet, ionization, fraction).as(Sheet::new).list().ofMaxSize(2))
                .as((l, ds, dl, sheets) -> {
                    Layer out = l;
                    for (Dopant d : ds) {
                        out = out.withDopant(d);
                    }
                    for (DeepLevel d : dl) {
                        out = out.withDeepLevel(d);
                    }
                    for (Sheet s : sheets) {
                        double offset = s.fractionOfLayer() * out.thickness();
                        out = out.withDeltaDoping(new DeltaDoping(s.kind(), s.density(), s.ionization(),
                                Math.min(offset, out.thickness())));
                    }
                    return out;
                });
    }

    /** A delta sheet placed at a fraction of its layer's thickness below the layer's top. */
    record Sheet(Dopant.Kind kind, double density, double ionization, double fractionOfLayer) {
    }

    @Provide
    Arbitrary<Structure> structures() {
        Arbitrary<TopBoundary> top = Arbitraries.oneOf(
                Combinators.combine(real(0, 6), real(-100, 20))
                        .as(TopBoundary.Schottky::new),
                Combinators.combine(real(0, 6), real(0, 1e20))
                        .as(TopBoundary.FreeSurface::new));
        Arbitrary<BottomBoundary> bottom = Arbitraries.oneOf(Arbitraries.just(BottomBoundary.zeroField()),
                real(-1, 7).map(BottomBoundary::fixedFermiLevel));
        Arbitrary<BandAlignment> lineUp = Arbitraries.oneOf(Arbitraries.just(BandAlignment.valenceBandTable()),
                real(0, 1).map(BandAlignment::conductionBandFraction));
        Arbitrary<PolarizationModel> model = Combinators.combine(
                Arbitraries.of(PolarizationModel.Spontaneous.values()),
                Arbitraries.of(PolarizationModel.Piezoelectric.values())).as(PolarizationModel::new);
        Arbitrary<Double> lattice = Arbitraries.oneOf(Arbitraries.just(-1.0),
                real(3.0e-10, 3.6e-10));
        return Combinators.combine(layers().list().ofMinSize(1).ofMaxSize(5), top, bottom, lineUp, model,
                real(1, 2000), Arbitraries.of(Polarity.values()),
                Combinators.combine(lattice, Arbitraries.of(true, false)).as(List::of))
                .as((ls, t, b, a, m, temp, pol, extra) -> {
                    Structure.Builder sb = Structure.builder(ParameterSets.defaultSet());
                    ls.forEach(sb::grow);
                    double latticeA = (Double) extra.get(0);
                    if (latticeA > 0) {
                        sb.onInPlaneLattice(latticeA);
                    }
                    return sb.top(t).bottom(b).bandAlignment(a).polarizationModel(m).temperature(temp).polarity(pol)
                            .strainShiftsBandEdges((Boolean) extra.get(1)).build();
                });
    }
}
