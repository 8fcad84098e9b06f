package org.wurtzkit.material;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * The parameters of one wurtzite material (a binary or a composition-resolved alloy), each with
 * its {@link Provenance}. Immutable and thread-safe.
 *
 * <p>Units: lengths in m, elastic constants in Pa, piezoelectric constants and polarization in
 * C/m&sup2;, energies in eV, masses relative to m0, permittivities relative to epsilon_0 (see
 * {@link MaterialParameter#siUnit()}). Grouped views ({@link #elastic()}, {@link #bandGap()}, ...)
 * are small records; {@link #get(MaterialParameter)} reads any single value.
 *
 * <p>Obtain one from a {@link ParameterSet} ({@code set.material(Composition.alGaN(0.25))}) or
 * build a custom one with {@link #builder(String)}.
 */
public final class WurtziteMaterial {
    private static final MaterialParameter[] ALL = MaterialParameter.values();

    private final String name;
    private final Composition composition;
    private final double[] values;
    private final Provenance[] provenance;
    private final BandGap.PerBinary perBinaryGap;

    private WurtziteMaterial(String name, Composition composition, double[] values, Provenance[] provenance,
            BandGap.PerBinary perBinaryGap) {
        this.name = name;
        this.composition = composition;
        this.values = values;
        this.provenance = provenance;
        this.perBinaryGap = perBinaryGap;
    }

    /** {@return a readable name, e.g. "Al0.25Ga0.75N (vurgaftman-meyer-2003)"} */
    public String name() {
        return name;
    }

    /** {@return the composition, or null for a custom material that declares none} */
    public Composition composition() {
        return composition;
    }

    /**
     * @param p a parameter
     * @return its value in the unit {@link MaterialParameter#siUnit()}
     */
    public double get(MaterialParameter p) {
        return values[p.ordinal()];
    }

    /**
     * @param p a parameter
     * @return where its value comes from
     */
    public Provenance source(MaterialParameter p) {
        return provenance[p.ordinal()];
    }

    /** {@return in-plane lattice constant a (m)} */
    public double latticeA() {
        return get(MaterialParameter.LATTICE_A);
    }

    /** {@return lattice constant c (m)} */
    public double latticeC() {
        return get(MaterialParameter.LATTICE_C);
    }

    /** {@return the elastic stiffness constants (Pa)} */
    public ElasticConstants elastic() {
        return new ElasticConstants(get(MaterialParameter.C11), get(MaterialParameter.C12),
                get(MaterialParameter.C13), get(MaterialParameter.C33), get(MaterialParameter.C44));
    }

    /** {@return the piezoelectric constants (C/m&sup2;)} */
    public PiezoelectricConstants piezoelectric() {
        return new PiezoelectricConstants(get(MaterialParameter.E31), get(MaterialParameter.E33),
                get(MaterialParameter.E15), get(MaterialParameter.PIEZO_NONLINEAR_LINEAR),
                get(MaterialParameter.PIEZO_NONLINEAR_QUADRATIC_TENSILE),
                get(MaterialParameter.PIEZO_NONLINEAR_QUADRATIC_COMPRESSIVE));
    }

    /**
     * Spontaneous polarization by Vegard's law from the binaries (for a binary: the tabulated value).
     *
     * @return P_sp (C/m&sup2;), component along [0001]
     */
    public double spontaneousPolarization() {
        return get(MaterialParameter.SPONTANEOUS_POLARIZATION);
    }

    /**
     * Spontaneous polarization including the alloy bowing term of Bernardini &amp; Fiorentini,
     * Phys. Rev. B 64, 085207 (2001) (equal to {@link #spontaneousPolarization()} for a binary).
     *
     * @return P_sp (C/m&sup2;), component along [0001]
     */
    public double spontaneousPolarizationWithBowing() {
        return get(MaterialParameter.SPONTANEOUS_POLARIZATION) + get(MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING);
    }

    /**
     * {@return the band gap model (eV, Varshni)} For an alloy of a set whose
     * {@link ParameterSet#alloyGapTemperatureRule()} is
     * {@link AlloyGapTemperatureRule#VARSHNI_PER_BINARY_THEN_BOWING}, it carries the binaries' own
     * Varshni laws ({@link BandGap#perBinary()}).
     */
    public BandGap bandGap() {
        return new BandGap(get(MaterialParameter.BAND_GAP_0K), get(MaterialParameter.VARSHNI_ALPHA),
                get(MaterialParameter.VARSHNI_BETA), perBinaryGap);
    }

    /** {@return effective masses relative to m0} */
    public EffectiveMasses masses() {
        return new EffectiveMasses(get(MaterialParameter.ELECTRON_MASS_PARALLEL),
                get(MaterialParameter.ELECTRON_MASS_PERPENDICULAR), get(MaterialParameter.HEAVY_HOLE_MASS_PARALLEL),
                get(MaterialParameter.HEAVY_HOLE_MASS_PERPENDICULAR));
    }

    /**
     * {@return the static relative permittivity along c} The same as
     * {@link #permittivityStaticAlongC()}: the component that matters for c-plane stacks.
     */
    public double permittivityStatic() {
        return permittivityStaticAlongC();
    }

    /** {@return the static relative permittivity along c (epsilon_33), used by the Poisson equation of c-plane stacks} */
    public double permittivityStaticAlongC() {
        return get(MaterialParameter.PERMITTIVITY_STATIC);
    }

    /** {@return the static relative permittivity across c (epsilon_11)} */
    public double permittivityStaticAcrossC() {
        return get(MaterialParameter.PERMITTIVITY_STATIC_PERPENDICULAR);
    }

    /** {@return high-frequency relative permittivity} */
    public double permittivityHighFrequency() {
        return get(MaterialParameter.PERMITTIVITY_HIGH_FREQUENCY);
    }

    /** {@return unstrained valence-band maximum relative to that of GaN (eV)} */
    public double valenceBandEdgeEv() {
        return get(MaterialParameter.VALENCE_BAND_EDGE);
    }

    /** {@return the conduction- and valence-band deformation potentials (eV)} */
    public DeformationPotentials deformationPotentials() {
        return new DeformationPotentials(get(MaterialParameter.DEFORMATION_CB_PARALLEL),
                get(MaterialParameter.DEFORMATION_CB_PERPENDICULAR), get(MaterialParameter.DEFORMATION_D1),
                get(MaterialParameter.DEFORMATION_D2), get(MaterialParameter.DEFORMATION_D3),
                get(MaterialParameter.DEFORMATION_D4));
    }

    /**
     * Unstrained conduction-band minimum on the common scale (zero at the GaN valence-band maximum),
     * with the temperature-dependent gap. The valence-band edge is taken as independent of
     * temperature, so the whole Varshni shift goes to the conduction band (common practice, no
     * source).
     *
     * @param temperatureK temperature (K), &gt; 0
     * @return E_c (eV)
     */
    public double conductionBandEdgeEv(double temperatureK) {
        return valenceBandEdgeEv() + bandGap().atTemperature(temperatureK);
    }

    /**
     * @return a builder pre-filled with this material's values and provenance, to derive a
     *         variant (e.g. a team's measured C13)
     * @param newName the variant's name
     */
    public Builder toBuilder(String newName) {
        Builder b = new Builder(newName);
        b.composition = composition;
        System.arraycopy(values, 0, b.values, 0, values.length);
        System.arraycopy(provenance, 0, b.provenance, 0, provenance.length);
        b.perBinaryGap = perBinaryGap;
        return b;
    }

    /**
     * @param name the material's name
     * @return an empty builder; every parameter must be set before {@link Builder#build()}
     */
    public static Builder builder(String name) {
        return new Builder(name);
    }

    /** {@return all values keyed by parameter (a copy)} */
    public Map<MaterialParameter, Double> values() {
        Map<MaterialParameter, Double> m = new EnumMap<>(MaterialParameter.class);
        for (MaterialParameter p : ALL) {
            m.put(p, values[p.ordinal()]);
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WurtziteMaterial w && w.name.equals(name) && Objects.equals(w.composition, composition)
                && Arrays.equals(w.values, values) && Objects.equals(w.perBinaryGap, perBinaryGap);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, composition, Arrays.hashCode(values));
    }

    @Override
    public String toString() {
        return name;
    }

    /**
     * Mutable builder for a custom material. {@link #build()} checks that every parameter is set
     * and finite, that the physically signed ones have the right sign, and that each lies in its
     * plausible range ({@link MaterialParameter#plausibleMinInFileUnit()}): a GaN lattice constant
     * typed in nm instead of Angstrom is rejected, not turned into a wrong polarization charge.
     */
    public static final class Builder {
        /** Parameters that must be strictly positive (lengths, stiffnesses, gap, masses, permittivities). */
        private static final MaterialParameter[] POSITIVE = {MaterialParameter.LATTICE_A, MaterialParameter.LATTICE_C,
                MaterialParameter.C11, MaterialParameter.C12, MaterialParameter.C13, MaterialParameter.C33,
                MaterialParameter.C44, MaterialParameter.BAND_GAP_0K, MaterialParameter.VARSHNI_BETA,
                MaterialParameter.ELECTRON_MASS_PARALLEL, MaterialParameter.ELECTRON_MASS_PERPENDICULAR,
                MaterialParameter.HEAVY_HOLE_MASS_PARALLEL, MaterialParameter.HEAVY_HOLE_MASS_PERPENDICULAR,
                MaterialParameter.PERMITTIVITY_STATIC, MaterialParameter.PERMITTIVITY_STATIC_PERPENDICULAR,
                MaterialParameter.PERMITTIVITY_HIGH_FREQUENCY,
                MaterialParameter.LO_PHONON_ENERGY, MaterialParameter.MASS_DENSITY,
                MaterialParameter.ACOUSTIC_DEFORMATION_POTENTIAL};

        private final String name;
        private Composition composition;
        private final double[] values = new double[ALL.length];
        private final Provenance[] provenance = new Provenance[ALL.length];
        private BandGap.PerBinary perBinaryGap;

        private Builder(String name) {
            this.name = Require.nonNull("material name", name);
            Arrays.fill(values, Double.NaN);
        }

        /**
         * @param c the composition this material stands for (optional)
         * @return this builder
         */
        public Builder composition(Composition c) {
            this.composition = c;
            return this;
        }

        /**
         * @param p      the parameter
         * @param value  its value in {@link MaterialParameter#siUnit()}
         * @param origin where it comes from
         * @return this builder
         */
        public Builder set(MaterialParameter p, double value, Provenance origin) {
            Require.nonNull("material parameter", p);
            Require.finite(p.key() + " of " + name, value);
            if (p == MaterialParameter.BAND_GAP_0K || p == MaterialParameter.VARSHNI_ALPHA
                    || p == MaterialParameter.VARSHNI_BETA) {
                perBinaryGap = null; // a gap set by hand replaces the binaries' laws
            }
            values[p.ordinal()] = value;
            provenance[p.ordinal()] = Require.nonNull("provenance of " + p.key(), origin);
            return this;
        }

        /**
         * @param p      the parameter
         * @param value  its value in {@link MaterialParameter#siUnit()}
         * @param source the table it was read from
         * @return this builder
         */
        public Builder set(MaterialParameter p, double value, Source source) {
            Require.nonNull("material parameter", p);
            return set(p, value, Provenance.tabulated(Require.nonNull("source of " + p.key(), source)));
        }

        /**
         * Sets the per-binary form of the gap ({@link BandGap#perBinary()}): the alloy's gap at T as
         * the binaries' Varshni gaps weighted by their fractions, minus the bowing term. Set it after
         * the gap parameters, since setting {@link MaterialParameter#BAND_GAP_0K},
         * {@link MaterialParameter#VARSHNI_ALPHA} or {@link MaterialParameter#VARSHNI_BETA} clears it.
         * Used by the alloy rules and by readers that restore a material exactly.
         *
         * @param form the per-binary form, or null for the single Varshni law of the gap parameters
         * @return this builder
         */
        public Builder perBinaryGap(BandGap.PerBinary form) {
            this.perBinaryGap = form;
            return this;
        }

        /**
         * @return the immutable material
         * @throws InvalidParameterException if a parameter is missing or out of its physical range
         */
        public WurtziteMaterial build() {
            for (MaterialParameter p : ALL) {
                if (Double.isNaN(values[p.ordinal()])) {
                    throw new InvalidParameterException(p.key() + " of " + name, "missing", "(a finite value must be set)");
                }
            }
            for (MaterialParameter p : POSITIVE) {
                Require.positive(p.key() + " of " + name, values[p.ordinal()]);
            }
            Require.nonNegative(MaterialParameter.VARSHNI_ALPHA.key() + " of " + name,
                    values[MaterialParameter.VARSHNI_ALPHA.ordinal()]);
            Require.nonNegative(MaterialParameter.ELECTROMECHANICAL_COUPLING.key() + " of " + name,
                    values[MaterialParameter.ELECTROMECHANICAL_COUPLING.ordinal()]);
            for (MaterialParameter p : ALL) {
                double inFileUnit = values[p.ordinal()] / p.fileToSi();
                if (!(inFileUnit >= p.plausibleMinInFileUnit() && inFileUnit <= p.plausibleMaxInFileUnit())) {
                    throw new InvalidParameterException(p.key() + " of " + name,
                            new java.math.BigDecimal(inFileUnit).round(new java.math.MathContext(10))
                                    .stripTrailingZeros().toPlainString()
                                    + ("1".equals(p.fileUnit()) ? "" : " " + p.fileUnit()),
                            p.plausibleRangeText() + " (the plausible range for a wurtzite nitride; a value outside"
                                    + " it is usually a unit slip)");
                }
            }
            return new WurtziteMaterial(name, composition, values.clone(), provenance.clone(), perBinaryGap);
        }
    }
}
