package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Composition;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerMaterial;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Units;

/**
 * Ready-made {@link StructureFamily} instances that vary one layer of a template structure. The
 * layer is found by name, which must be unique in the template. Every other property of the
 * template is kept: the other layers, the in-plane reference lattice ({@link Structure#referenceLatticeA()}
 * of the template, also when the varied layer is the bottom one), polarity, polarization model,
 * temperature and both boundaries.
 */
public final class StructureFamilies {
    private StructureFamilies() {
    }

    /**
     * The thickness of one layer, in nm (parameter {@code <layer>_thickness}, unit {@code nm}). A
     * value of 0 removes the layer (e.g. "no cap"), unless it is the template's only layer.
     *
     * @param template  the template
     * @param layerName the layer to vary
     * @return the family
     */
    public static StructureFamily layerThicknessNm(Structure template, String layerName) {
        int index = find(template, layerName);
        Column c = Column.of(layerName + "_thickness", "nm");
        return new TemplateFamily(c, "StructureFamilies.layerThicknessNm(template, \"" + layerName + "\")",
                template, nm -> {
            Require.inRange("thickness of layer \"" + layerName + "\" (nm)", nm, 0, Units.mToNm(Layer.MAX_THICKNESS));
            Layer old = template.layersBottomUp().get(index);
            if (nm == 0 && template.layersBottomUp().size() == 1) {
                throw new InvalidParameterException("thickness of layer \"" + layerName + "\" (nm)", "0",
                        "(0, " + Units.mToNm(Layer.MAX_THICKNESS) + "] (it is the only layer)");
            }
            return rebuild(template, index, nm == 0 ? null : old.withThickness(nm * Units.NM));
        });
    }

    /**
     * The Al fraction x of one alloy layer (parameter {@code <layer>_al_fraction}, dimensionless),
     * keeping its In fraction.
     *
     * @param template  the template
     * @param layerName the layer to vary; must be a uniform alloy of the parameter set
     * @return the family
     */
    public static StructureFamily alFraction(Structure template, String layerName) {
        int index = find(template, layerName);
        Layer old = template.layersBottomUp().get(index);
        if (!(old.material() instanceof LayerMaterial.Alloy alloy)) {
            throw new InvalidParameterException("material of layer \"" + layerName + "\"", old.material().describe(),
                    "a uniform alloy of the parameter set (not graded, not custom)");
        }
        double indium = alloy.composition().indium();
        Column c = Column.of(layerName + "_al_fraction", "");
        return new TemplateFamily(c, "StructureFamilies.alFraction(template, \"" + layerName + "\")",
                template, x -> {
            Composition comp = new Composition(x, indium);
            Layer l = new Layer(old.name(), new LayerMaterial.Alloy(comp), old.thickness(), old.dopants(),
                    old.deepLevels(), old.deltaSheets(), old.relaxation());
            return rebuild(template, index, l);
        });
    }

    private static int find(Structure template, String layerName) {
        Require.nonNull("template structure", template);
        Require.nonNull("layer name", layerName);
        return unique(template.layersBottomUp(), Layer::name, "layers", layerName);
    }

    /**
     * The index of the one item of a list with a given name.
     *
     * @throws InvalidParameterException when none or several items have that name
     */
    private static <T> int unique(List<T> items, java.util.function.Function<T, String> name, String what,
            String wanted) {
        int found = -1;
        int count = 0;
        for (int i = 0; i < items.size(); i++) {
            if (name.apply(items.get(i)).equals(wanted)) {
                found = i;
                count++;
            }
        }
        if (count != 1) {
            throw new InvalidParameterException("number of " + what + " named \"" + wanted + "\"",
                    Integer.toString(count), "[1, 1] (" + what + " of the template: "
                            + items.stream().map(name).toList() + ")");
        }
        return found;
    }

    /**
     * The thickness of one insulator of the gate stack, in nm (parameter
     * {@code <insulator>_thickness}, unit {@code nm}), everything else kept.
     *
     * @param template      a template with a gate stack
     * @param insulatorName the insulator layer to vary
     * @return the family
     */
    public static StructureFamily insulatorThicknessNm(Structure template, String insulatorName) {
        Require.nonNull("template structure", template);
        List<InsulatorLayer> stack = template.gateStack();
        int index = unique(stack, InsulatorLayer::name, "insulator layers", insulatorName);
        Column c = Column.of(insulatorName + "_thickness", "nm");
        return new TemplateFamily(c, "StructureFamilies.insulatorThicknessNm(template, \"" + insulatorName + "\")",
                template, nm -> {
            Require.inRange("thickness of insulator \"" + insulatorName + "\" (nm)", nm, Double.MIN_VALUE,
                    Units.mToNm(Layer.MAX_THICKNESS));
            List<InsulatorLayer> l = new ArrayList<>(stack);
            l.set(index, stack.get(index).withThickness(nm * Units.NM));
            return template.withGateStack(l);
        });
    }

    /**
     * The depth of a gate recess into one layer (typically the barrier), in nm (parameter
     * {@code <layer>_recess_depth}, unit {@code nm}): the layer keeps its template thickness minus
     * the recess, everything else (gate stack, interface sheets) is kept, so the sheets on the
     * recessed face describe the etched surface. A recess through the whole layer is refused.
     *
     * @param template  the un-recessed stack (its thickness of the layer is the access region's)
     * @param layerName the layer the recess etches into
     * @return the family
     */
    public static StructureFamily recessDepthNm(Structure template, String layerName) {
        int index = find(template, layerName);
        Layer old = template.layersBottomUp().get(index);
        double full = old.thicknessNm();
        Column c = Column.of(layerName + "_recess_depth", "nm");
        return new TemplateFamily(c, "StructureFamilies.recessDepthNm(template, \"" + layerName + "\")",
                template, nm -> {
            Require.inRange("recess depth into layer \"" + layerName + "\" (nm)", nm, 0, full);
            if (nm >= full) {
                throw new InvalidParameterException("recess depth into layer \"" + layerName + "\" (nm)",
                        Double.toString(nm), "[0, " + full + ") (the layer's thickness; a recess must leave some)");
            }
            return template.withLayer(index, old.withThickness((full - nm) * Units.NM));
        });
    }

    /**
     * A family of this class: its parameter, its factory call in words and its template (so a
     * result's provenance can rebuild it from data), and the structure for each value.
     */
    private record TemplateFamily(Column parameter, String description, Structure base,
            DoubleFunction<Structure> build) implements StructureFamily {
        @Override
        public Optional<Structure> template() {
            return Optional.of(base);
        }

        @Override
        public Structure at(double value) {
            return build.apply(value);
        }
    }

    /**
     * The template with layer {@code index} (bottom-up) replaced, or removed when {@code layer} is
     * null. A template with a gate stack or interface sheets keeps them (a layer of such a template
     * cannot be removed).
     */
    static Structure rebuild(Structure template, int index, Layer layer) {
        if (!template.gateStack().isEmpty() || !template.interfaceSheets().isEmpty()) {
            if (layer == null) {
                throw new InvalidParameterException("thickness of layer \""
                        + template.layersBottomUp().get(index).name() + "\" (nm)", "0",
                        "(0, ...) (a layer of a stack with a gate stack or interface sheets cannot be removed)");
            }
            return template.withLayer(index, layer);
        }
        Structure.Builder b = Structure.builder(template.parameters());
        List<Layer> layers = template.layersBottomUp();
        for (int i = 0; i < layers.size(); i++) {
            Layer l = i == index ? layer : layers.get(i);
            if (l != null) {
                b.grow(l);
            }
        }
        return b.onInPlaneLattice(template.referenceLatticeA())
                .polarity(template.polarity())
                .polarizationModel(template.polarizationModel())
                .bandAlignment(template.bandAlignment())
                .strainShiftsBandEdges(template.strainShiftsBandEdges())
                .strainShiftsValenceSplittings(template.strainShiftsValenceSplittings())
                .criticalThicknessModel(template.criticalThicknessModel())
                .temperatureK(template.temperatureK())
                .top(template.top())
                .bottom(template.bottom())
                .build();
    }
}
