package org.wurtzkit.material;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.wurtzkit.errors.Require;

/**
 * A parameter set derived in code from another one with a few values changed, each change with its
 * source; built by {@link ParameterSet#derive(String)}. Immutable and thread-safe.
 *
 * <pre>{@code
 * Source lab = Source.of("LAB-2025", "Our Brillouin measurement of GaN C13, run 17 (2025)");
 * ParameterSet mine = ParameterSets.defaultSet().derive("vm03-lab-c13")
 *         .set(Binary.GAN, MaterialParameter.C13, 101e9, lab)            // SI units (Pa)
 *         .build();
 * }</pre>
 *
 * Every changed value passes the checks of {@link WurtziteMaterial.Builder#build()} (sign and
 * plausible range); its {@link Provenance} names the new source; {@link #changes()} lists what
 * differs from the base set.
 */
public final class DerivedParameterSet implements ParameterSet {
    private final String name;
    private final String description;
    private final ParameterSet base;
    private final Map<Binary, WurtziteMaterial> binaries;
    private final AlloyBowing bowing;
    private final AlloyScattering alloyScattering;
    private final PolarizationModel model;
    private final AlloyGapTemperatureRule gapRule;
    private final List<Source> sources;
    private final List<String> changes;

    private DerivedParameterSet(Builder b, Map<Binary, WurtziteMaterial> binaries) {
        this.name = b.name;
        this.base = b.base;
        this.binaries = Collections.unmodifiableMap(binaries);
        this.bowing = b.bowing;
        this.alloyScattering = b.alloyScattering;
        this.model = b.model;
        this.gapRule = b.gapRule;
        this.changes = List.copyOf(b.changes);
        List<Source> all = new ArrayList<>(b.base.sources());
        for (Source s : b.newSources) {
            if (!all.contains(s)) {
                all.add(s);
            }
        }
        this.sources = List.copyOf(all);
        this.description = b.description != null ? b.description
                : "Derived from " + b.base.name() + " with " + (changes.isEmpty() ? "no changes" : String.join("; ", changes))
                        + ".";
    }

    static Builder builder(ParameterSet base, String name) {
        return new Builder(base, name);
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String description() {
        return description;
    }

    /** {@return the set this one was derived from} */
    public ParameterSet base() {
        return base;
    }

    /** {@return one line per change against the base set, in the order they were made} */
    public List<String> changes() {
        return changes;
    }

    @Override
    public WurtziteMaterial binary(Binary binary) {
        return binaries.get(Require.nonNull("binary", binary));
    }

    @Override
    public AlloyBowing bowing() {
        return bowing;
    }

    @Override
    public AlloyScattering alloyScattering() {
        return alloyScattering;
    }

    @Override
    public PolarizationModel recommendedPolarizationModel() {
        return model;
    }

    @Override
    public AlloyGapTemperatureRule alloyGapTemperatureRule() {
        return gapRule;
    }

    /** {@return the base set's line-up rule} */
    @Override
    public java.util.OptionalDouble conductionBandOffsetFraction() {
        return base.conductionBandOffsetFraction();
    }

    @Override
    public List<Source> sources() {
        return sources;
    }

    /** {@return the base set's insulators} */
    @Override
    public List<Insulator> insulators() {
        return base.insulators();
    }

    @Override
    public String toString() {
        return name + " (derived from " + base.name() + ")";
    }

    /** Mutable builder; {@link #build()} gives the immutable set. Not thread-safe. */
    public static final class Builder {
        private final ParameterSet base;
        private final String name;
        private String description;
        private final Map<Binary, Map<MaterialParameter, Object[]>> edits = new EnumMap<>(Binary.class);
        private AlloyBowing bowing;
        private AlloyScattering alloyScattering;
        private PolarizationModel model;
        private AlloyGapTemperatureRule gapRule;
        private final List<Source> newSources = new ArrayList<>();
        private final List<String> changes = new ArrayList<>();

        private Builder(ParameterSet base, String name) {
            this.base = Require.nonNull("base parameter set", base);
            this.name = Require.nonNull("derived set name", name);
            if (name.isBlank()) {
                throw new org.wurtzkit.errors.InvalidParameterException("derived set name", "\"" + name + "\"",
                        "non-blank text");
            }
            this.bowing = base.bowing();
            this.alloyScattering = base.alloyScattering();
            this.model = base.recommendedPolarizationModel();
            this.gapRule = base.alloyGapTemperatureRule();
        }

        /**
         * @param text one sentence saying what the set is (default: generated from the changes)
         * @return this builder
         */
        public Builder description(String text) {
            this.description = Require.nonNull("description", text);
            return this;
        }

        /**
         * Changes one binary value.
         *
         * @param binary    GaN, AlN or InN
         * @param parameter the parameter
         * @param value     the new value in {@link MaterialParameter#siUnit()}
         * @param source    where the new value comes from
         * @return this builder
         */
        public Builder set(Binary binary, MaterialParameter parameter, double value, Source source) {
            Require.nonNull("binary", binary);
            Require.nonNull("material parameter", parameter);
            Require.finite(parameter.key() + " of " + binary.formula(), value);
            Require.nonNull("source of " + parameter.key(), source);
            edits.computeIfAbsent(binary, k -> new LinkedHashMap<>()).put(parameter, new Object[] {value, source});
            newSources.add(source);
            changes.add(binary.formula() + " " + parameter.key() + " = " + value / parameter.fileToSi() + " "
                    + parameter.fileUnit() + " (" + source.key() + ")");
            return this;
        }

        /**
         * Replaces the bowing parameters (each {@link Bowing} carries its source).
         *
         * @param newBowing the six bowing parameters
         * @return this builder
         */
        public Builder bowing(AlloyBowing newBowing) {
            this.bowing = Require.nonNull("alloy bowing", newBowing);
            for (Bowing b : List.of(newBowing.gapAlGaN(), newBowing.gapInGaN(), newBowing.gapInAlN(),
                    newBowing.polarizationAlGaN(), newBowing.polarizationInGaN(), newBowing.polarizationInAlN())) {
                newSources.add(b.source());
            }
            changes.add("bowing " + newBowing);
            return this;
        }

        /**
         * Replaces the alloy-disorder scattering potentials of the 2DEG mobility (each {@link Bowing}
         * carries its source).
         *
         * @param potentials the three pairs' potentials (eV)
         * @return this builder
         */
        public Builder alloyScattering(AlloyScattering potentials) {
            this.alloyScattering = Require.nonNull("alloy scattering potentials", potentials);
            for (Bowing b : List.of(potentials.alGaN(), potentials.inGaN(), potentials.inAlN())) {
                newSources.add(b.source());
            }
            changes.add("alloy scattering " + potentials);
            return this;
        }

        /**
         * @param newModel the polarization model a structure uses when it names none
         * @return this builder
         */
        public Builder recommendedPolarizationModel(PolarizationModel newModel) {
            this.model = Require.nonNull("polarization model", newModel);
            changes.add("recommended polarization model " + newModel);
            return this;
        }

        /**
         * @param rule how alloy gaps depend on temperature
         * @return this builder
         */
        public Builder alloyGapTemperatureRule(AlloyGapTemperatureRule rule) {
            this.gapRule = Require.nonNull("alloy gap temperature rule", rule);
            changes.add("alloy gap temperature rule " + rule);
            return this;
        }

        /**
         * @return the immutable set
         * @throws org.wurtzkit.errors.InvalidParameterException if a changed value is out of its
         *         sign or plausible range (the message names the parameter, binary and set)
         */
        public DerivedParameterSet build() {
            Map<Binary, WurtziteMaterial> out = new EnumMap<>(Binary.class);
            for (Binary b : Binary.values()) {
                WurtziteMaterial m = Require.nonNull("binary " + b.formula() + " of the base set", base.binary(b));
                Map<MaterialParameter, Object[]> e = edits.get(b);
                if (e == null) {
                    out.put(b, m);
                    continue;
                }
                WurtziteMaterial.Builder mb = m.toBuilder(b.formula() + " (" + name + ")");
                for (Map.Entry<MaterialParameter, Object[]> x : e.entrySet()) {
                    mb.set(x.getKey(), (Double) x.getValue()[0], Provenance.tabulated((Source) x.getValue()[1]));
                }
                out.put(b, mb.build());
            }
            return new DerivedParameterSet(this, out);
        }
    }
}
