package org.wurtzkit.structure;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.units.Decimals;

/**
 * One epitaxial layer: name, material, thickness, doping, deep levels and relaxation. Immutable;
 * the {@code with...} methods return modified copies.
 *
 * <pre>{@code
 * Layer barrier = Layer.of("barrier", Composition.alGaN(0.25), 25 * Units.NM)
 *         .withDopant(Dopant.donorsPerCm3(1e18, 0.03));
 * }</pre>
 *
 * @param name       a name for reports (need not be unique)
 * @param material   what the layer is made of
 * @param thickness  thickness (m), at least {@link #MIN_THICKNESS} (1 pm) and at most 1 mm
 * @param dopants    shallow dopants (uniform); the lists are non-null and hold no null element
 * @param deepLevels deep levels (uniform)
 * @param deltaSheets delta-doping sheets inside the layer
 * @param relaxation relaxation r in [0, 1] with respect to the layer below (0 = pseudomorphic)
 */
public record Layer(String name, LayerMaterial material, double thickness, List<Dopant> dopants,
        List<DeepLevel> deepLevels, List<DeltaDoping> deltaSheets, double relaxation) {

    /** Largest accepted layer thickness (m). */
    public static final double MAX_THICKNESS = 1e-3;
    /**
     * Smallest accepted layer thickness (m): 1 pm, far below one monolayer (c/2 = 0.26 nm in GaN);
     * a thinner value is a unit slip, and below it the depths of the interfaces can no longer be
     * told apart in a millimetre-thick stack.
     */
    public static final double MIN_THICKNESS = 1e-12;

    /**
     * Creates the record and checks and copies the lists.
     *
     * @param name        a name for reports (need not be unique)
     * @param material    what the layer is made of
     * @param thickness   thickness (m), &gt; 0 and at most 1 mm
     * @param dopants     shallow dopants (uniform)
     * @param deepLevels  deep levels (uniform)
     * @param deltaSheets delta-doping sheets inside the layer
     * @param relaxation  relaxation r in [0, 1] with respect to the layer below (0 = pseudomorphic)
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public Layer {
        Require.nonNull("layer name", name);
        Require.nonNull("material of layer \"" + name + "\"", material);
        if (!(thickness > 0 && thickness <= MAX_THICKNESS)) {
            throw new InvalidParameterException("thickness of layer \"" + name + "\" (m)", Double.toString(thickness),
                    "(0, " + MAX_THICKNESS + "]");
        }
        if (thickness < MIN_THICKNESS) {
            throw new InvalidParameterException("thickness of layer \"" + name + "\" (m)", Double.toString(thickness),
                    "[" + MIN_THICKNESS + ", " + MAX_THICKNESS + "] (below 1 pm: a unit slip?)");
        }
        dopants = Require.nonNullElements("dopants of layer \"" + name + "\"", dopants);
        deepLevels = Require.nonNullElements("deep levels of layer \"" + name + "\"", deepLevels);
        deltaSheets = Require.nonNullElements("delta sheets of layer \"" + name + "\"", deltaSheets);
        for (DeltaDoping d : deltaSheets) {
            if (d.offsetFromLayerTop() > thickness) {
                throw new InvalidParameterException("delta sheet offset in layer \"" + name + "\" (m)",
                        Double.toString(d.offsetFromLayerTop()), "[0, " + thickness + "] (the layer's thickness)");
            }
        }
        Require.inRange("relaxation of layer \"" + name + "\"", relaxation, 0, 1);
    }

    /**
     * @param name        layer name
     * @param composition alloy, resolved by the structure's parameter set
     * @param thickness   thickness (m)
     * @return an undoped pseudomorphic layer
     */
    public static Layer of(String name, Composition composition, double thickness) {
        return new Layer(name, new LayerMaterial.Alloy(composition), thickness, List.of(), List.of(), List.of(), 0);
    }

    /**
     * @param name      layer name
     * @param material  a custom material
     * @param thickness thickness (m)
     * @return an undoped pseudomorphic layer
     */
    public static Layer of(String name, WurtziteMaterial material, double thickness) {
        return new Layer(name, new LayerMaterial.Custom(material), thickness, List.of(), List.of(), List.of(), 0);
    }

    /**
     * @param name      layer name
     * @param bottom    composition at the layer's bottom
     * @param top       composition at the layer's top
     * @param thickness thickness (m)
     * @return an undoped pseudomorphic layer graded linearly from bottom to top
     */
    public static Layer graded(String name, Composition bottom, Composition top, double thickness) {
        return new Layer(name, new LayerMaterial.Graded(bottom, top), thickness, List.of(), List.of(), List.of(), 0);
    }

    /**
     * Returns a copy of this layer with one more dopant.
     *
     * @param d a dopant
     * @return a copy with the dopant added
     */
    public Layer withDopant(Dopant d) {
        List<Dopant> l = new ArrayList<>(dopants);
        l.add(Require.nonNull("dopant", d));
        return new Layer(name, material, thickness, l, deepLevels, deltaSheets, relaxation);
    }

    /**
     * Returns a copy of this layer with one more deep level.
     *
     * @param d a deep level
     * @return a copy with the level added
     */
    public Layer withDeepLevel(DeepLevel d) {
        List<DeepLevel> l = new ArrayList<>(deepLevels);
        l.add(Require.nonNull("deep level", d));
        return new Layer(name, material, thickness, dopants, l, deltaSheets, relaxation);
    }

    /**
     * Returns a copy of this layer with one more delta-doped sheet.
     *
     * @param d a delta sheet
     * @return a copy with the sheet added
     */
    public Layer withDeltaDoping(DeltaDoping d) {
        List<DeltaDoping> l = new ArrayList<>(deltaSheets);
        l.add(Require.nonNull("delta doping", d));
        return new Layer(name, material, thickness, dopants, deepLevels, l, relaxation);
    }

    /**
     * Returns a copy of this layer with another degree of strain relaxation.
     *
     * @param r relaxation in [0, 1]
     * @return a copy with that relaxation
     */
    public Layer withRelaxation(double r) {
        return new Layer(name, material, thickness, dopants, deepLevels, deltaSheets, r);
    }

    /**
     * Returns a copy of this layer with another thickness.
     *
     * @param t thickness (m)
     * @return a copy with that thickness
     */
    public Layer withThickness(double t) {
        return new Layer(name, material, t, dopants, deepLevels, deltaSheets, relaxation);
    }

    /** {@return thickness (nm)} */
    public double thicknessNm() {
        return org.wurtzkit.units.Units.mToNm(thickness);
    }

    /**
     * @return e.g. {@code "barrier: Al0.26Ga0.74N, 22 nm"}, followed by the relaxation when it is not
     *         zero and by every dopant, deep level and delta sheet
     */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(name).append(": ").append(material.describe()).append(", ")
                .append(Decimals.format(thicknessNm(), "nm"));
        if (relaxation != 0) {
            sb.append(", relaxed ").append(Decimals.format(100 * relaxation, "%"));
        }
        for (Dopant d : dopants) {
            sb.append(", ").append(d);
        }
        for (DeepLevel d : deepLevels) {
            sb.append(", ").append(d);
        }
        for (DeltaDoping d : deltaSheets) {
            sb.append(", ").append(d);
        }
        return sb.toString();
    }
}
