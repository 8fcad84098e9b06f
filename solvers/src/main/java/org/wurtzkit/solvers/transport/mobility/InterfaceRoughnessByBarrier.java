package org.wurtzkit.solvers.transport.mobility;

import java.util.Map;
import java.util.Optional;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Composition;
import org.wurtzkit.warnings.Warning;

/**
 * Interface roughness with its (Delta, Lambda) chosen by the material on the barrier side of each
 * subband's rough interface: an AlN/GaN interface (the interface under an AlN interlayer) and an
 * AlGaN/GaN interface are different interfaces, grown differently, and their roughness is a sample
 * property of each (Miyoshi et al., Appl. Phys. Lett. 85, 1710 (2004), abstract: a 1 nm AlN interfacial
 * layer reduced both the alloy-disorder and the interface-roughness scattering). The rate of each is that
 * of {@link InterfaceRoughness}, with the same effective field. The name is that of
 * {@link InterfaceRoughness}, so {@link MobilityOptions#withMechanism} replaces the single-interface
 * mechanism with this one and result tables keep their columns.
 *
 * @param otherwise for a barrier not in the map, or a subband whose barrier is unknown
 * @param byBarrier roughness per composition of the barrier material (e.g. {@link Composition#ALN}), at
 *                  least one entry; a barrier whose material declares no composition takes {@code otherwise}
 */
public record InterfaceRoughnessByBarrier(InterfaceRoughness otherwise, Map<Composition, InterfaceRoughness> byBarrier)
        implements ScatteringMechanism {
    /**
     * Validates and copies.
     *
     * @param otherwise for a barrier not in the map, or a subband whose barrier is unknown
     * @param byBarrier roughness per barrier composition, at least one entry, no null key or value
     */
    public InterfaceRoughnessByBarrier {
        Require.nonNull("roughness of the other interfaces", otherwise);
        Require.nonNull("roughness per barrier", byBarrier);
        for (Map.Entry<Composition, InterfaceRoughness> e : byBarrier.entrySet()) {
            Require.nonNull("barrier composition", e.getKey());
            Require.nonNull("roughness of barrier " + e.getKey(), e.getValue());
        }
        byBarrier = Map.copyOf(byBarrier);
        if (byBarrier.isEmpty()) {
            throw new InvalidParameterException("number of barriers with their own roughness", "0",
                    "[1, ...): use InterfaceRoughness for one roughness everywhere");
        }
    }

    /**
     * @param otherwise the roughness of every other interface
     * @param barrier   the composition of a barrier, e.g. {@link Composition#ALN}
     * @param roughness the roughness of the interface that faces it
     * @return the mechanism
     */
    public static InterfaceRoughnessByBarrier of(InterfaceRoughness otherwise, Composition barrier,
            InterfaceRoughness roughness) {
        return new InterfaceRoughnessByBarrier(otherwise, Map.of(Require.nonNull("barrier composition", barrier),
                Require.nonNull("roughness", roughness)));
    }

    /**
     * @param s the subband
     * @return the roughness that applies to its rough interface
     */
    public InterfaceRoughness roughnessFor(SubbandScattering s) {
        return hasOwnRoughness(s) ? byBarrier.get(s.interfaceBarrier().get().composition()) : otherwise;
    }

    @Override
    public String name() {
        return InterfaceRoughness.NAME;
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        return roughnessFor(s).momentumRelaxationRate(s);
    }

    @Override
    public Optional<String> warning(SubbandScattering s) {
        return typedWarning(s).map(Warning::message);
    }

    @Override
    public Optional<Warning> typedWarning(SubbandScattering s) {
        boolean own = hasOwnRoughness(s);
        InterfaceRoughness r = roughnessFor(s);
        // a barrier with a roughness of its own was set on purpose: only the missing-interface warning remains
        return r.typedWarning(s).filter(w -> !own || r.force(s) == 0);
    }

    private boolean hasOwnRoughness(SubbandScattering s) {
        return s.interfaceBarrier().map(m -> m.composition() != null && byBarrier.containsKey(m.composition()))
                .orElse(false);
    }
}
