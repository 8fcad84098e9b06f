package org.wurtzkit.testing;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * The layer stacks that many solver tests share, built in one place so that a test names the stack
 * it uses instead of writing its own copy: a metal-face GaN buffer, an Al<sub>x</sub>Ga<sub>1-x</sub>N
 * barrier and an optional GaN cap, closed by a Schottky gate or a free surface. Layers are called
 * {@code "buffer"}, {@code "barrier"} and {@code "cap"}, which tests and workflow families look up
 * by name. Every method returns a new immutable {@link Structure}; the same arguments give the same
 * stack, hence the same solution bit for bit. Beside that family: the reference HEMT whose solve
 * cost is pinned (with an AlN spacer), a p-GaN gate HEMT and an MIS-HEMT.
 *
 * <p>The reliability suite keeps its own fixed set of stacks (package {@code org.wurtzkit.reliability})
 * because its determinism fingerprints are pinned to them.
 */
public final class StandardStacks {
    private StandardStacks() {
    }

    /**
     * GaN buffer / Al<sub>x</sub>Ga<sub>1-x</sub>N barrier / optional GaN cap under a given top.
     *
     * @param set the parameter set of every layer
     * @param bufferNm GaN buffer thickness (nm)
     * @param x Al fraction of the barrier
     * @param barrierNm barrier thickness (nm)
     * @param capNm GaN cap thickness (nm); 0 means no cap layer at all
     * @param top the boundary at the surface
     * @return the built stack
     */
    public static Structure hemt(ParameterSet set, double bufferNm, double x, double barrierNm, double capNm,
            TopBoundary top) {
        Structure.Builder b = Structure.builder(set)
                .grow(Layer.of("buffer", Composition.GAN, bufferNm * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierNm * NM));
        if (capNm > 0) {
            b.grow(Layer.of("cap", Composition.GAN, capNm * NM));
        }
        return b.top(top).build();
    }

    /**
     * The workflow tests' HEMT: 500 nm GaN buffer, Al<sub>x</sub>Ga<sub>1-x</sub>N barrier, optional
     * GaN cap, Schottky gate of barrier height phiB at zero bias.
     *
     * @param set the parameter set
     * @param x Al fraction of the barrier
     * @param barrierNm barrier thickness (nm)
     * @param capNm cap thickness (nm); 0 means none
     * @param phiB Schottky barrier height (eV)
     * @return the built stack
     */
    public static Structure gatedHemt(ParameterSet set, double x, double barrierNm, double capNm, double phiB) {
        return hemt(set, 500, x, barrierNm, capNm, TopBoundary.schottky(phiB).atBiasV(0));
    }

    /**
     * The reference HEMT whose solve cost is pinned: 2 um GaN buffer, 1 nm AlN spacer, 25 nm
     * Al<sub>0.25</sub>Ga<sub>0.75</sub>N barrier, 2 nm GaN cap (layers {@code "buffer"},
     * {@code "spacer"}, {@code "barrier"}, {@code "cap"}) under a 1.0 eV Schottky gate, default
     * parameter set.
     *
     * @param biasV gate bias (V)
     * @return the built stack
     */
    public static Structure referenceHemt(double biasV) {
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 2000 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM))
                .grow(Layer.of("cap", Composition.GAN, 2 * NM))
                .top(TopBoundary.schottky(1.0).atBiasV(biasV))
                .build();
    }

    /**
     * A p-GaN gate HEMT: 1 um GaN buffer, Al<sub>x</sub>Ga<sub>1-x</sub>N barrier, a GaN layer
     * {@code "p-GaN"} with the given acceptors, under a Schottky gate.
     *
     * @param set the parameter set
     * @param x Al fraction of the barrier
     * @param barrierNm barrier thickness (nm)
     * @param pGanNm p-GaN thickness (nm)
     * @param acceptors the p-GaN's acceptors (e.g. Mg)
     * @param phiB gate barrier height to the p-GaN's conduction band (eV)
     * @param biasV gate bias (V)
     * @return the built stack
     */
    public static Structure pGanGate(ParameterSet set, double x, double barrierNm, double pGanNm, Dopant acceptors,
            double phiB, double biasV) {
        return Structure.builder(set).grow(Layer.of("buffer", Composition.GAN, 1000 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierNm * NM))
                .grow(Layer.of("p-GaN", Composition.GAN, pGanNm * NM).withDopant(acceptors))
                .top(TopBoundary.schottky(phiB).atBiasV(biasV)).build();
    }

    /**
     * A MIS-HEMT: 500 nm GaN buffer, Al<sub>x</sub>Ga<sub>1-x</sub>N barrier, an interface sheet on
     * the barrier, one gate insulator and a gate.
     *
     * @param set the parameter set
     * @param x Al fraction of the barrier
     * @param barrierNm barrier thickness (nm)
     * @param sheet fixed charge and interface states at the insulator/barrier interface
     * @param insulator the gate insulator
     * @param toxNm its thickness (nm)
     * @param phiB gate Fermi level below the insulator's conduction band (eV)
     * @param biasV gate bias (V)
     * @return the built stack
     */
    public static Structure misHemt(ParameterSet set, double x, double barrierNm, InterfaceSheet sheet,
            Insulator insulator, double toxNm, double phiB, double biasV) {
        return Structure.builder(set).grow(Layer.of("buffer", Composition.GAN, 500 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierNm * NM)).sheetOnTop(sheet)
                .deposit(InsulatorLayer.ofNm(insulator, toxNm)).top(TopBoundary.schottky(phiB).atBiasV(biasV)).build();
    }
}
