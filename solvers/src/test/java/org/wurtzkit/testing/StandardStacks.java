package org.wurtzkit.testing;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * The layer stacks that many solver tests share, built in one place so that a test names the stack
 * it uses instead of writing its own copy: a metal-face GaN buffer, an Al<sub>x</sub>Ga<sub>1-x</sub>N
 * barrier and an optional GaN cap, closed by a Schottky gate or a free surface. Layers are called
 * {@code "buffer"}, {@code "barrier"} and {@code "cap"}, which tests and workflow families look up
 * by name. Every method returns a new immutable {@link Structure}; the same arguments give the same
 * stack, hence the same solution bit for bit.
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
}
