package org.wurtzkit.solvers.workflow;

import java.util.EnumSet;
import java.util.Set;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerMaterial;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * One uncertain parameter of a {@link ToleranceStudy}: what it acts on (a layer's thickness,
 * composition or doping, the temperature, the gate barrier, the surface donor level, one value of
 * the parameter set, or the conduction-band offset ratio) and its {@link Distribution}. Each sample
 * sets the parameter to the drawn value (it does not add the draw to the template's value): the
 * distribution's mean is the nominal value.
 *
 * <p>Every target has an allowed range, and a distribution that can leave it is rejected when the
 * study is built (e.g. a {@link Distribution.Normal} Al fraction, whose tails leave [0, 1]: cut it
 * with {@link Distribution#truncatedNormal(double, double, double, double)} or
 * {@link Distribution#normalWithin(double, double, double)}). Nothing is clamped.
 *
 * <p>Immutable.
 */
public final class Tolerance {
    /** What a tolerance acts on. */
    enum Kind {
        LAYER_THICKNESS, AL_FRACTION, DONOR_DENSITY, TEMPERATURE, GATE_BARRIER, SURFACE_DONOR_LEVEL, MATERIAL_VALUE,
        CONDUCTION_BAND_OFFSET_FRACTION
    }

    /** Material parameters that must stay strictly positive (as {@code WurtziteMaterial.Builder} checks). */
    private static final Set<MaterialParameter> POSITIVE = EnumSet.of(MaterialParameter.LATTICE_A,
            MaterialParameter.LATTICE_C, MaterialParameter.C11, MaterialParameter.C12, MaterialParameter.C13,
            MaterialParameter.C33, MaterialParameter.C44, MaterialParameter.BAND_GAP_0K, MaterialParameter.VARSHNI_BETA,
            MaterialParameter.ELECTRON_MASS_PARALLEL, MaterialParameter.ELECTRON_MASS_PERPENDICULAR,
            MaterialParameter.HEAVY_HOLE_MASS_PARALLEL, MaterialParameter.HEAVY_HOLE_MASS_PERPENDICULAR,
            MaterialParameter.PERMITTIVITY_STATIC, MaterialParameter.PERMITTIVITY_HIGH_FREQUENCY);

    private final Kind kind;
    private final String layer;
    private final Binary binary;
    private final MaterialParameter parameter;
    private final Distribution distribution;
    private final Column column;

    private Tolerance(Kind kind, String layer, Binary binary, MaterialParameter parameter, Distribution distribution,
            Column column) {
        this.kind = kind;
        this.layer = layer;
        this.binary = binary;
        this.parameter = parameter;
        this.distribution = Require.nonNull("distribution of " + column.name(), distribution);
        this.column = column;
    }

    /**
     * The thickness of a layer (input {@code <layer>_thickness}, nm), in (0, 10^6] nm.
     *
     * @param layer the layer's name in the template
     * @param nm    the distribution of the thickness (nm)
     * @return the tolerance
     */
    public static Tolerance layerThicknessNm(String layer, Distribution nm) {
        return new Tolerance(Kind.LAYER_THICKNESS, layerName(layer), null, null, nm, Column.of(layer + "_thickness", "nm"));
    }

    /**
     * The Al fraction of a uniform alloy layer, keeping its In fraction (input
     * {@code <layer>_al_fraction}), in [0, 1 - In fraction].
     *
     * @param layer    the layer's name in the template
     * @param fraction the distribution of the Al fraction
     * @return the tolerance
     */
    public static Tolerance alFraction(String layer, Distribution fraction) {
        return new Tolerance(Kind.AL_FRACTION, layerName(layer), null, null, fraction, Column.of(layer + "_al_fraction", ""));
    }

    /**
     * The density of the layer's donor (input {@code <layer>_donor_density}, cm^-3), in [0, 10^22]
     * cm^-3. The layer must hold exactly one donor species; its ionization energy and degeneracy are
     * kept.
     *
     * @param layer   the layer's name in the template
     * @param perCm3  the distribution of the donor density (cm^-3)
     * @return the tolerance
     */
    public static Tolerance donorDensityPerCm3(String layer, Distribution perCm3) {
        return new Tolerance(Kind.DONOR_DENSITY, layerName(layer), null, null, perCm3,
                Column.of(layer + "_donor_density", "cm^-3"));
    }

    /**
     * The lattice temperature (input {@code temperature}, K), in (0, 2000] K.
     *
     * @param kelvin the distribution of the temperature (K)
     * @return the tolerance
     */
    public static Tolerance temperatureK(Distribution kelvin) {
        return new Tolerance(Kind.TEMPERATURE, null, null, null, kelvin, Column.of("temperature", "K"));
    }

    /**
     * The Schottky barrier height of the gate (input {@code gate_barrier}, eV), in [0, 6] eV; the
     * template must have a Schottky top.
     *
     * @param ev the distribution of the barrier height (eV)
     * @return the tolerance
     */
    public static Tolerance gateBarrierEv(Distribution ev) {
        return new Tolerance(Kind.GATE_BARRIER, null, null, null, ev, Column.of("gate_barrier", "eV"));
    }

    /**
     * The energy of the surface donor level below the conduction band (input
     * {@code surface_donor_level}, eV), in [0, 6] eV; the template must have a free surface.
     *
     * @param ev the distribution of E_c - E_D at the surface (eV)
     * @return the tolerance
     */
    public static Tolerance surfaceDonorLevelEv(Distribution ev) {
        return new Tolerance(Kind.SURFACE_DONOR_LEVEL, null, null, null, ev, Column.of("surface_donor_level", "eV"));
    }

    /**
     * One value of a binary in the parameter set (input {@code <binary>_<key>}, e.g.
     * {@code AlN_Psp}, in the parameter's SI unit {@link MaterialParameter#siUnit()}); alloys follow
     * from the perturbed binaries by the set's alloy rules. Lattice constants, stiffnesses, the gap,
     * Varshni's beta, masses and permittivities must stay positive, Varshni's alpha non-negative.
     *
     * <p>The in-plane reference lattice of the template is kept when it was set explicitly; when it
     * was the bottom layer's own lattice (the builder's default), the sample takes the bottom layer's
     * own lattice under the perturbed set.
     *
     * @param binary    GaN, AlN or InN
     * @param parameter the parameter
     * @param value     the distribution of the value (SI unit of the parameter)
     * @return the tolerance
     */
    public static Tolerance material(Binary binary, MaterialParameter parameter, Distribution value) {
        Require.nonNull("binary", binary);
        Require.nonNull("material parameter", parameter);
        return new Tolerance(Kind.MATERIAL_VALUE, null, binary, parameter, value,
                Column.of(binary.formula() + "_" + parameter.key(), parameter.siUnit()));
    }

    /**
     * The share f of the AlN/GaN band-gap difference that lies in the conduction band (input
     * {@code conduction_band_offset_fraction}), in [0, 1]. Each sample sets the valence-band edge of
     * AlN to E_v(GaN) - (1 - f) (E_g0(AlN) - E_g0(GaN)) with the 0 K gaps of the (possibly perturbed)
     * set, so that E_c(AlN) - E_c(GaN) = f (E_g0(AlN) - E_g0(GaN)); alloys follow by the set's
     * rules. It cannot be combined with a tolerance on E_v of AlN.
     *
     * @param fraction the distribution of f
     * @return the tolerance
     */
    public static Tolerance conductionBandOffsetFraction(Distribution fraction) {
        return new Tolerance(Kind.CONDUCTION_BAND_OFFSET_FRACTION, null, null, null, fraction,
                Column.of("conduction_band_offset_fraction", ""));
    }

    private static String layerName(String layer) {
        return Require.nonNull("layer name", layer);
    }

    /** @return the input's name and unit */
    public Column column() {
        return column;
    }

    /** @return the distribution */
    public Distribution distribution() {
        return distribution;
    }

    /** @return the input of a {@link SampleDesign} */
    public UncertainInput input() {
        return new UncertainInput(column, distribution);
    }

    Kind kind() {
        return kind;
    }

    String layer() {
        return layer;
    }

    Binary binary() {
        return binary;
    }

    MaterialParameter parameter() {
        return parameter;
    }

    /**
     * Checks the tolerance against the template: the layer exists once and fits, the boundary has
     * the right kind, the distribution stays in the allowed range.
     *
     * @param template the template
     * @return the index (bottom-up) of the layer, or -1 for a tolerance that has no layer
     */
    int check(Structure template) {
        int index = -1;
        double min;
        double max;
        boolean openMin = false;
        switch (kind) {
            case LAYER_THICKNESS -> {
                index = find(template);
                min = 0;
                openMin = true;
                max = Layer.MAX_THICKNESS * 1e9;
            }
            case AL_FRACTION -> {
                index = find(template);
                Layer l = template.layersBottomUp().get(index);
                if (!(l.material() instanceof LayerMaterial.Alloy a)) {
                    throw new InvalidParameterException("material of layer \"" + layer + "\"", l.material().describe(),
                            "a uniform alloy of the parameter set (not graded, not custom), for a tolerance on its Al fraction");
                }
                min = 0;
                max = 1 - a.composition().indium();
            }
            case DONOR_DENSITY -> {
                index = find(template);
                Layer l = template.layersBottomUp().get(index);
                long donors = l.dopants().stream().filter(d -> d.kind() == Dopant.Kind.DONOR).count();
                if (donors != 1) {
                    throw new InvalidParameterException("number of donor species in layer \"" + layer + "\"",
                            Long.toString(donors), "[1, 1] (a tolerance on the donor density sets the one donor's density)");
                }
                min = 0;
                max = Dopant.MAX_DENSITY_PER_M3 * 1e-6;
            }
            case TEMPERATURE -> {
                min = 0;
                openMin = true;
                max = 2000;
            }
            case GATE_BARRIER -> {
                if (!(template.top() instanceof TopBoundary.Schottky)) {
                    throw new InvalidParameterException("top boundary of the template", template.top().toString(),
                            "a Schottky gate, for a tolerance on the gate barrier");
                }
                min = 0;
                max = 6;
            }
            case SURFACE_DONOR_LEVEL -> {
                if (!(template.top() instanceof TopBoundary.FreeSurface)) {
                    throw new InvalidParameterException("top boundary of the template", template.top().toString(),
                            "a free surface, for a tolerance on the surface donor level");
                }
                min = 0;
                max = 6;
            }
            case MATERIAL_VALUE -> {
                if (POSITIVE.contains(parameter)) {
                    min = 0;
                    openMin = true;
                } else if (parameter == MaterialParameter.VARSHNI_ALPHA) {
                    min = 0;
                } else {
                    min = Double.NEGATIVE_INFINITY;
                }
                max = Double.POSITIVE_INFINITY;
            }
            case CONDUCTION_BAND_OFFSET_FRACTION -> {
                min = 0;
                max = 1;
            }
            default -> throw new IllegalStateException(kind.toString());
        }
        double lo = distribution.lower();
        double hi = distribution.upper();
        boolean below = openMin ? !(lo > min) : !(lo >= min);
        if (below || !(hi <= max)) {
            String range = (openMin ? "(" : "[") + min + ", " + max + "]";
            throw new InvalidParameterException("support of the distribution of " + column.header(),
                    "[" + lo + ", " + hi + "]", "inside " + range + " (" + describe(distribution)
                            + " can leave the range; cut it with Distribution.truncatedNormal or use a uniform)");
        }
        return index;
    }

    private static String describe(Distribution d) {
        return d.getClass().getSimpleName().toLowerCase(java.util.Locale.ROOT) + " distribution";
    }

    private int find(Structure template) {
        java.util.List<Layer> layers = template.layersBottomUp();
        int found = -1;
        int count = 0;
        for (int i = 0; i < layers.size(); i++) {
            if (layers.get(i).name().equals(layer)) {
                found = i;
                count++;
            }
        }
        if (count != 1) {
            throw new InvalidParameterException("number of layers named \"" + layer + "\" (tolerance " + column.name() + ")",
                    Integer.toString(count), "[1, 1] (layers of the template: " + layers.stream().map(Layer::name).toList()
                            + ")");
        }
        return found;
    }

    @Override
    public String toString() {
        return "Tolerance[" + column.header() + " ~ " + distribution + "]";
    }
}
