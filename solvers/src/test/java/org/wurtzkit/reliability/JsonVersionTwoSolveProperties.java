package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.GenerationMode;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tag;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.materials.data.StructureJson;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.InterfaceStates;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;

/**
 * What format version 2 of the stack files added, through a solve: random MIS-HEMTs (gate stacks of
 * built-in and inline insulators, a fixed charge and interface states of every shape at the
 * barrier's top face, a fully ionized buffer doping, a critical-thickness model, at times a barrier
 * of a custom material) written to JSON and read back are equal to the original, and a solve of
 * both gives the same numbers bit for bit (or the same failure). Common practice, no source: equal
 * inputs to a deterministic solver. The inline insulator and custom material are invented.
 */
@Tag("reliability")
class JsonVersionTwoSolveProperties {
    private static final SelfConsistentSolver SOLVER = new SelfConsistentSolver(SolverOptions.defaults());
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final double NM = 1e-9;

    record Spec(double al, double barrierNm, List<InsulatorLayer> gate, double fixedPerCm2, int shape,
            double ditPerCm2PerEv, double levelFraction, double bufferDonorsPerCm3, int model, boolean custom,
            double biasV) {
    }

    @Provide
    Arbitrary<Spec> specs() {
        Arbitrary<Insulator> insulators = Arbitraries.oneOf(Arbitraries.of(Insulators.all()),
                Combinators.combine(Arbitraries.doubles().between(4, 25), Arbitraries.doubles().between(5, 9),
                        Arbitraries.doubles().between(1.5, 3.5))
                        .as((k, g, cbo) -> new Insulator("TNL film (invented)", k, g, cbo, "invented for a property test")));
        Arbitrary<InsulatorLayer> layers = Combinators.combine(insulators, Arbitraries.doubles().between(1, 20))
                .as(InsulatorLayer::ofNm);
        return Combinators.combine(
                Combinators.combine(Arbitraries.doubles().between(0.15, 0.35), Arbitraries.doubles().between(8, 25),
                        layers.list().ofMaxSize(2)).as(List::of),
                Combinators.combine(Arbitraries.doubles().between(-1e13, 3e13), Arbitraries.integers().between(0, 4),
                        Arbitraries.doubles().between(1e10, 1e13), Arbitraries.doubles().between(0.05, 0.95))
                        .as(List::of),
                Arbitraries.doubles().between(1e14, 1e17), Arbitraries.integers().between(0, 3),
                Arbitraries.of(true, false), Arbitraries.doubles().between(-4, 1))
                .as((a, b, nd, model, custom, bias) -> {
                    @SuppressWarnings("unchecked")
                    List<InsulatorLayer> gate = (List<InsulatorLayer>) a.get(2);
                    return new Spec((Double) a.get(0), (Double) a.get(1), gate, (Double) b.get(0), (Integer) b.get(1),
                            (Double) b.get(2), (Double) b.get(3), nd, model, custom, bias);
                });
    }

    static Structure build(Spec s) {
        Composition c = Composition.alGaN(s.al());
        Layer barrier = Layer.of("barrier", c, s.barrierNm() * NM);
        if (s.custom()) {
            WurtziteMaterial base = SET.material(c);
            WurtziteMaterial own = base.toBuilder("TNL barrier (invented)")
                    .set(MaterialParameter.C13, base.get(MaterialParameter.C13) * 1.02,
                            new Source("TNL-0731", "invented: Tarnwick Nitride Lab fit", "invented")).build();
            barrier = Layer.of("barrier", own, s.barrierNm() * NM);
        }
        double gap = SET.material(c).bandGap().atTemperature(300);
        double level = s.levelFraction() * 0.8 * gap; // well inside the gap, strain shifts aside
        double dit = Units.perCm2ToPerM2(s.ditPerCm2PerEv());
        List<InterfaceStates> states = switch (s.shape()) {
            case 0 -> List.of();
            case 1 -> List.of(new InterfaceStates(new InterfaceStates.Uniform(dit), level));
            case 2 -> List.of(new InterfaceStates(new InterfaceStates.Gaussian(dit, level, 0.1), level));
            case 3 -> List.of(new InterfaceStates(new InterfaceStates.UShaped(dit, 10 * dit, 0.15, 0.15), level));
            default -> List.of(new InterfaceStates(new InterfaceStates.Discrete(dit, level), 0));
        };
        CriticalThicknessModel model = switch (s.model()) {
            case 0 -> CriticalThicknessModel.C_PLANE_WURTZITE;
            case 1 -> CriticalThickness.MATTHEWS_BLAKESLEE_60;
            case 2 -> new CriticalThicknessModel.ChannelCracking(5);
            default -> new CriticalThicknessModel.PyramidalSlip();
        };
        Structure.Builder b = Structure.builder(SET)
                .grow(Layer.of("buffer", Composition.GAN, 500 * NM)
                        .withDopant(Dopant.donorsPerCm3(s.bufferDonorsPerCm3(), 0.02).fullyIonized()))
                .grow(barrier)
                .sheetOnTop(new InterfaceSheet(Units.perCm2ToPerM2(s.fixedPerCm2()), states))
                .criticalThicknessModel(model);
        s.gate().forEach(b::deposit);
        double barrierHeight = s.gate().isEmpty() ? 1.2 : 3.5;
        return b.top(TopBoundary.schottky(barrierHeight).atBiasV(s.biasV())).build();
    }

    @Property(tries = 8, seed = "2026", generation = GenerationMode.RANDOMIZED, edgeCases = EdgeCasesMode.NONE,
            shrinking = ShrinkingMode.OFF)
    void aVersionTwoStackReadBackFromJsonSolvesBitForBitLikeTheOriginal(@ForAll("specs") Spec spec) {
        Structure s = build(spec);
        String text = StructureJson.write(s);
        Structure back = StructureJson.reader().read(text, "spec " + spec);
        assertEquals(s, back, spec.toString());
        JsonRoundTripSolveProperties.assertSolvesBitForBit(SOLVER, s, back);
    }
}
