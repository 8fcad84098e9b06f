package org.wurtzkit.solvers.workflow;

import java.util.List;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Composition;
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
        return new StructureFamily() {
            @Override
            public Column parameter() {
                return c;
            }

            @Override
            public Structure at(double nm) {
                Require.inRange("thickness of layer \"" + layerName + "\" (nm)", nm, 0, Units.mToNm(Layer.MAX_THICKNESS));
                Layer old = template.layersBottomUp().get(index);
                if (nm == 0 && template.layersBottomUp().size() == 1) {
                    throw new InvalidParameterException("thickness of layer \"" + layerName + "\" (nm)", "0",
                            "(0, " + Units.mToNm(Layer.MAX_THICKNESS) + "] (it is the only layer)");
                }
                return rebuild(template, index, nm == 0 ? null : old.withThickness(nm * Units.NM));
            }
        };
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
        return new StructureFamily() {
            @Override
            public Column parameter() {
                return c;
            }

            @Override
            public Structure at(double x) {
                Composition comp = new Composition(x, indium);
                Layer l = new Layer(old.name(), new LayerMaterial.Alloy(comp), old.thickness(), old.dopants(),
                        old.deepLevels(), old.deltaSheets(), old.relaxation());
                return rebuild(template, index, l);
            }
        };
    }

    private static int find(Structure template, String layerName) {
        Require.nonNull("template structure", template);
        Require.nonNull("layer name", layerName);
        List<Layer> layers = template.layersBottomUp();
        int found = -1;
        int count = 0;
        for (int i = 0; i < layers.size(); i++) {
            if (layers.get(i).name().equals(layerName)) {
                found = i;
                count++;
            }
        }
        if (count != 1) {
            throw new InvalidParameterException("number of layers named \"" + layerName + "\"", Integer.toString(count),
                    "[1, 1] (layers of the template: " + layers.stream().map(Layer::name).toList() + ")");
        }
        return found;
    }

    /** The template with layer {@code index} (bottom-up) replaced, or removed when {@code layer} is null. */
    static Structure rebuild(Structure template, int index, Layer layer) {
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
                .criticalThicknessModel(template.criticalThicknessModel())
                .temperatureK(template.temperatureK())
                .top(template.top())
                .bottom(template.bottom())
                .build();
    }
}
