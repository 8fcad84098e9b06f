package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.bands.BandEdges;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.InterfaceStates;
import org.wurtzkit.structure.LayerMaterial;
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
        // the same structure written as format version 1 (it holds nothing version 2 added) reads back equal
        String v1 = StructureJson.write(s, 1);
        assertTrue(v1.contains("\"formatVersion\" : 1,"), v1);
        assertEquals(s, StructureJson.reader().read(v1, "property v1"));
    }

    /**
     * Format version 2: the structures above plus gate stacks (built-in and inline insulators),
     * interface sheets with every shape of interface states, fully ionized dopants, every
     * critical-thickness model and layers of a custom material (with sources) survive JSON and back
     * equal, writing is a fixed point, and version 1 refuses exactly those that hold something only
     * version 2 can.
     */
    @Property(tries = 100)
    void anyVersionTwoStructureSurvivesWriteAndRead(@ForAll("versionTwoStructures") Structure s) {
        Statistics.label("gate stack").collect(!s.gateStack().isEmpty());
        Statistics.label("interface states").collect(s.interfaceSheets().stream()
                .anyMatch(p -> !p.sheet().states().isEmpty()));
        Statistics.label("custom material").collect(s.layersBottomUp().stream()
                .anyMatch(l -> l.material() instanceof LayerMaterial.Custom));
        Statistics.label("custom per-binary gap").collect(s.layersBottomUp().stream()
                .anyMatch(l -> l.material() instanceof LayerMaterial.Custom c && c.material().bandGap().perBinary() != null));
        String text = StructureJson.write(s);
        Structure back = StructureJson.reader().read(text, "property");
        assertEquals(s, back);
        assertEquals(text, StructureJson.write(back));
        assertEquals(s, StructureJson.reader().read(StructureJson.writeCompact(s), "property"));
        boolean onlyV2 = !s.gateStack().isEmpty() || !s.interfaceSheets().isEmpty()
                || !s.criticalThicknessModel().equals(CriticalThicknessModel.C_PLANE_WURTZITE)
                || !s.strainShiftsValenceSplittings()
                || s.layersBottomUp().stream().anyMatch(l -> l.material() instanceof LayerMaterial.Custom
                        || l.dopants().stream().anyMatch(d -> d.ionization() == Dopant.Ionization.FULL));
        if (onlyV2) {
            StructureFormatException e = assertThrows(StructureFormatException.class, () -> StructureJson.write(s, 1));
            assertEquals(StructureFormatException.Reason.NOT_WRITABLE, e.reason());
        } else {
            assertEquals(s, StructureJson.reader().read(StructureJson.write(s, 1), "property v1"));
        }
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

    static Arbitrary<CriticalThicknessModel> criticalThicknessModels() {
        Arbitrary<CriticalThicknessModel.ChannelCracking> cracking = real(1e-3, 1000)
                .map(CriticalThicknessModel.ChannelCracking::new);
        Arbitrary<CriticalThicknessModel> simple = Arbitraries.oneOf(
                Arbitraries.just(new CriticalThicknessModel.PyramidalSlip()), cracking.map(c -> c),
                Combinators.combine(real(1e-3, 90), real(0, 89.99)).as(CriticalThickness::new));
        return Arbitraries.oneOf(Arbitraries.just(CriticalThicknessModel.C_PLANE_WURTZITE), simple,
                Combinators.combine(simple, cracking).as(CriticalThicknessModel.CPlaneWurtzite::new));
    }

    static Arbitrary<Insulator> insulators() {
        Arbitrary<Insulator> inline = Combinators.combine(Arbitraries.strings().ofMaxLength(10), real(1, 1000),
                real(1e-3, 20), real(-5, 10), Arbitraries.strings().ofMaxLength(40)).as(Insulator::new);
        return Arbitraries.oneOf(Arbitraries.of(Insulators.all()), inline);
    }

    static Arbitrary<InsulatorLayer> insulatorLayers() {
        return Combinators.combine(Arbitraries.strings().ofMaxLength(10), insulators(), real(1e-10, 2e-6))
                .as(InsulatorLayer::new);
    }

    /** Interface states whose energies are fractions of the gap below (scaled when the stack is known). */
    record StatesSpec(int shape, double density, double fraction1, double width1, double width2, double neutral) {
        InterfaceStates at(double gapEv) {
            InterfaceStates.Distribution d = switch (shape) {
                case 0 -> new InterfaceStates.Uniform(density);
                case 1 -> new InterfaceStates.Gaussian(density, fraction1 * gapEv, width1);
                case 2 -> new InterfaceStates.UShaped(density, density * fraction1, width1, width2);
                default -> new InterfaceStates.Discrete(density, fraction1 * gapEv);
            };
            return new InterfaceStates(d, neutral * gapEv);
        }
    }

    record SheetSpec(double fixedPerM2, List<StatesSpec> states) {
    }

    static Arbitrary<SheetSpec> sheets() {
        Arbitrary<StatesSpec> states = Combinators.combine(Arbitraries.integers().between(0, 3), real(0, 1e18),
                real(0, 1), real(0.001, 5), real(0.001, 5), real(0, 1)).as(StatesSpec::new);
        return Combinators.combine(real(-1e19, 1e19), states.list().ofMaxSize(2)).as(SheetSpec::new);
    }

    /** The default set with the per-binary Varshni rule, whose alloys carry a per-binary gap form. */
    static final org.wurtzkit.material.ParameterSet PER_BINARY_GAP = ParameterSets.defaultSet()
            .derive("per-binary-gap").alloyGapTemperatureRule(
                    org.wurtzkit.material.AlloyGapTemperatureRule.VARSHNI_PER_BINARY_THEN_BOWING).build();

    /**
     * A custom material: an alloy of the default set, or of its per-binary-gap variant, re-made under
     * its own name, with C13 and the parallel electron mass changed by up to 5 % under a team's own
     * source, and at times its own 0 K gap (which replaces a per-binary gap form by one Varshni law).
     */
    static Arbitrary<WurtziteMaterial> customMaterials() {
        return Combinators.combine(Arbitraries.strings().ofMinLength(1).ofMaxLength(12), compositions(),
                real(0.95, 1.05), real(0.95, 1.05), Arbitraries.integers().between(0, 3),
                Arbitraries.strings().alpha().ofMinLength(1).ofMaxLength(6), Arbitraries.strings().ofMaxLength(30),
                Arbitraries.of(true, false)).as((name, c, f13, fm, choice, key, citation, keepComposition) -> {
                    boolean ownGap = (choice & 1) != 0;
                    WurtziteMaterial base = ((choice & 2) != 0 ? PER_BINARY_GAP : ParameterSets.defaultSet()).material(c);
                    Source team = new Source(key, citation, "invented for a property test");
                    WurtziteMaterial.Builder b = base.toBuilder(name)
                            .composition(keepComposition ? c : null)
                            .set(MaterialParameter.C13, base.get(MaterialParameter.C13) * f13, team)
                            .set(MaterialParameter.ELECTRON_MASS_PARALLEL,
                                    base.get(MaterialParameter.ELECTRON_MASS_PARALLEL) * fm,
                                    new Provenance("team fit", List.of(team, new Source("X", "", ""))));
                    if (ownGap) {
                        b.set(MaterialParameter.BAND_GAP_0K, base.get(MaterialParameter.BAND_GAP_0K), team);
                    }
                    return b.build();
                });
    }

    @Provide
    Arbitrary<Structure> versionTwoStructures() {
        Arbitrary<Layer> layer = Arbitraries.oneOf(layers(), layers(),
                Combinators.combine(layers(), customMaterials()).as((l, m) -> new Layer(l.name(),
                        new LayerMaterial.Custom(m), l.thickness(), l.dopants(), l.deepLevels(), l.deltaSheets(),
                        l.relaxation())));
        Arbitrary<Layer> ionized = Combinators.combine(layer, Arbitraries.of(true, false)).as((l, full) -> {
            if (!full) {
                return l;
            }
            return new Layer(l.name(), l.material(), l.thickness(),
                    l.dopants().stream().map(Dopant::fullyIonized).toList(), l.deepLevels(), l.deltaSheets(),
                    l.relaxation());
        });
        return Combinators.combine(structures(), ionized.list().ofMinSize(1).ofMaxSize(4),
                sheets().list().ofMaxSize(4), insulatorLayers().list().ofMaxSize(3), criticalThicknessModels(),
                Arbitraries.of(true, false))
                .as((base, ls, sheetSpecs, gate, model, strainedSplittings) -> {
                    // the layers and choices of a version-1 structure, with version-2 layers on top
                    // the same valence-splitting choice as the stack built below: it moves E_v, so the gap the
                    // interface states are placed in must be read with it
                    Structure.Builder plain = base.toBuilder().strainShiftsValenceSplittings(strainedSplittings);
                    ls.forEach(plain::grow);
                    Structure noSheets = plain.build();
                    List<Layer> bottomUp = noSheets.layersBottomUp();
                    int n = bottomUp.size();
                    Structure.Builder b = Structure.builder(base.parameters()).onInPlaneLattice(
                            noSheets.referenceLatticeA()).polarity(base.polarity())
                            .polarizationModel(base.polarizationModel()).bandAlignment(base.bandAlignment())
                            .strainShiftsBandEdges(base.strainShiftsBandEdges()).temperatureK(base.temperatureK())
                            .bottom(base.bottom()).criticalThicknessModel(model)
                            .strainShiftsValenceSplittings(strainedSplittings);
                    for (int i = 0; i < n; i++) {
                        b.grow(bottomUp.get(i));
                        if (i < sheetSpecs.size()) {
                            int fromTop = n - 1 - i;
                            BandEdges e = noSheets.bandEdgesAt(noSheets.layerStates().get(fromTop).top());
                            double gap = e.conductionEv() - e.valenceEv();
                            SheetSpec sp = sheetSpecs.get(i);
                            List<InterfaceStates> states = gap > 0
                                    ? sp.states().stream().map(st -> st.at(gap)).toList() : List.of();
                            b.sheetOnTop(new InterfaceSheet(sp.fixedPerM2(), states));
                        }
                    }
                    gate.forEach(b::deposit);
                    TopBoundary top = base.top();
                    if (!gate.isEmpty() && top instanceof TopBoundary.FreeSurface fs) {
                        top = new TopBoundary.FreeSurface(fs.donorEnergyBelowEcEv(), 0);
                    }
                    return b.top(top).build();
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
