package org.wurtzkit.reliability;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/** Small structures shared by the workflow reliability tests. */
final class ReliabilityStructures {
    private ReliabilityStructures() {
    }

    /**
     * @param set a parameter set
     * @return a GaN / Al0.25GaN 25 nm HEMT with a 1 eV Schottky gate in that set
     */
    static Structure forSet(ParameterSet set) {
        return Structure.builder(set).grow(Layer.of("buffer", Composition.GAN, 1000 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 25 * NM)).top(TopBoundary.schottky(1).atBiasV(0)).build();
    }
}
