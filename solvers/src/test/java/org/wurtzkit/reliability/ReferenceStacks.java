package org.wurtzkit.reliability;

import static org.wurtzkit.units.Units.NM;

import java.util.LinkedHashMap;
import java.util.Map;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * A fixed set of structures for the thread-safety and determinism tests: a HEMT at three biases,
 * N-face, a free surface, a team-variant (custom) material shared by two stacks, a classical solve,
 * and a few converging fuzz stacks. All share one parameter-set instance and, where they can, layer
 * and material objects.
 */
final class ReferenceStacks {
    private ReferenceStacks() {
    }

    /** The classical solver used for the "classical" cases. */
    static final SelfConsistentSolver CLASSICAL = new SelfConsistentSolver(SolverOptions.defaults()
            .withQuantumWindows(QuantumWindows.none()));

    /** Fuzz seeds (of {@link Stacks#random(long)}) whose stacks converge. */
    static final long[] FUZZ_SEEDS = {1, 2, 3, 5, 8};

    /**
     * @return name to structure, in a fixed order; every call builds new objects from the same
     *         shared parameter sets
     */
    static Map<String, Structure> all() {
        ParameterSet set = ParameterSets.defaultSet();
        WurtziteMaterial variant = set.material(Composition.alGaN(0.25)).toBuilder("Al0.25GaN lab C13")
                .set(MaterialParameter.C13, 1.05e11, Source.of("LAB", "reliability test variant")).build();
        Layer buffer = Layer.of("buffer", Composition.GAN, 1500 * NM)
                .withDeepLevel(DeepLevel.acceptorLikePerCm3(1e16, 2.5));
        Layer barrier = Layer.of("barrier", Composition.alGaN(0.25), 25 * NM);
        Layer cap = Layer.of("cap", Composition.GAN, 2 * NM);
        Map<String, Structure> m = new LinkedHashMap<>();
        for (double v : new double[] {-5, 0, 1}) {
            m.put("hemt " + v + " V", Structure.builder(set).grow(buffer).grow(barrier).grow(cap)
                    .top(TopBoundary.schottky(1.0).atBiasV(v)).build());
        }
        m.put("N-face", Structure.builder(set).polarity(Polarity.N_FACE).grow(buffer)
                .grow(Layer.of("barrier", Composition.alGaN(0.3), 25 * NM)).grow(Layer.of("channel", Composition.GAN, 15 * NM))
                .top(TopBoundary.schottky(0.9).atBiasV(0)).build());
        m.put("free surface", Structure.builder(set).grow(Layer.of("buffer", Composition.GAN, 1000 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM)).grow(barrier)
                .top(TopBoundary.freeSurfacePerCm2(1.65, 1e14)).build());
        Layer custom = Layer.of("custom barrier", variant, 20 * NM).withDopant(Dopant.donorsPerCm3(1e18, 0.02));
        m.put("custom material", Structure.builder(set).grow(buffer).grow(custom).top(TopBoundary.schottky(1.1).atBiasV(0))
                .build());
        m.put("custom material, 450 K, fixed bottom", Structure.builder(set).temperatureK(450).grow(buffer).grow(custom)
                .grow(cap).top(TopBoundary.schottky(1.1).atBiasV(-1)).bottom(BottomBoundary.fixedFermiLevel(1.5)).build());
        m.put("ambacher-2002 InAlN", Structure.builder(ParameterSets.named("ambacher-2002")).grow(buffer)
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM)).grow(Layer.of("barrier", Composition.inAlN(0.17), 10 * NM))
                .top(TopBoundary.schottky(1.2).atBiasV(0)).build());
        for (long seed : FUZZ_SEEDS) {
            m.put("fuzz seed " + seed, Stacks.random(seed).build());
        }
        return m;
    }

    /**
     * @param name a key of {@link #all()}
     * @param s    its structure
     * @param solver the shared quantum solver
     * @return the solution (classical for the "classical" copies)
     */
    static Solution solve(String name, Structure s, SelfConsistentSolver solver) {
        return name.startsWith("classical") ? CLASSICAL.solve(s) : solver.solve(s);
    }

    /** @return {@link #all()} plus a classical copy of each of the first three */
    static Map<String, Structure> withClassical() {
        Map<String, Structure> m = all();
        Map<String, Structure> out = new LinkedHashMap<>(m);
        int k = 0;
        for (Map.Entry<String, Structure> e : m.entrySet()) {
            if (k++ < 3) {
                out.put("classical " + e.getKey(), e.getValue());
            }
        }
        return out;
    }
}
