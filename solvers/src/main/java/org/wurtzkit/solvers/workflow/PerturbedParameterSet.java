package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.material.AlloyBowing;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.material.PolarizationModel;

/**
 * A parameter set with some binary values replaced by the draws of one tolerance-study sample.
 * Every replaced value carries the provenance "tolerance study sample" ({@link #SOURCE}); the
 * others keep theirs. Bowing, polarization model and the alloy rules are the base set's. Immutable.
 */
final class PerturbedParameterSet implements ParameterSet {
    /** The source of every drawn value. */
    static final Source SOURCE = new Source("tolerance-sample", "value drawn by a wurtzkit tolerance study",
            "one sample of the study's distribution, not a published value");
    private static final Provenance DRAWN = new Provenance("tolerance study sample", List.of(SOURCE));

    private final ParameterSet base;
    private final WurtziteMaterial[] binaries;

    /**
     * @param base      the set the template was built with
     * @param overrides per binary (ordinal), the values to set, NaN for "keep"; indexed by
     *                  MaterialParameter ordinal
     */
    PerturbedParameterSet(ParameterSet base, double[][] overrides) {
        this.base = base;
        Binary[] all = Binary.values();
        this.binaries = new WurtziteMaterial[all.length];
        for (Binary b : all) {
            WurtziteMaterial m = base.binary(b);
            double[] o = overrides[b.ordinal()];
            if (o != null) {
                WurtziteMaterial.Builder w = m.toBuilder(m.name());
                org.wurtzkit.material.MaterialParameter[] ps = org.wurtzkit.material.MaterialParameter.values();
                for (int p = 0; p < o.length; p++) {
                    if (!Double.isNaN(o[p])) {
                        w.set(ps[p], o[p], DRAWN);
                    }
                }
                m = w.build();
            }
            binaries[b.ordinal()] = m;
        }
    }

    @Override
    public String name() {
        return base.name() + " (tolerance sample)";
    }

    @Override
    public String description() {
        return base.description() + " Some values replaced by the draws of a tolerance-study sample.";
    }

    @Override
    public WurtziteMaterial binary(Binary binary) {
        return binaries[binary.ordinal()];
    }

    @Override
    public AlloyBowing bowing() {
        return base.bowing();
    }

    @Override
    public org.wurtzkit.material.AlloyScattering alloyScattering() {
        return base.alloyScattering();
    }

    @Override
    public PolarizationModel recommendedPolarizationModel() {
        return base.recommendedPolarizationModel();
    }

    @Override
    public java.util.OptionalDouble conductionBandOffsetFraction() {
        return base.conductionBandOffsetFraction();
    }

    @Override
    public org.wurtzkit.material.AlloyGapTemperatureRule alloyGapTemperatureRule() {
        return base.alloyGapTemperatureRule();
    }

    @Override
    public List<org.wurtzkit.material.Insulator> insulators() {
        return base.insulators();
    }

    @Override
    public List<Source> sources() {
        List<Source> s = new ArrayList<>(base.sources());
        s.add(SOURCE);
        return List.copyOf(s);
    }
}
