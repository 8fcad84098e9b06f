package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.WurtziteMaterial;

/** What a layer is made of: an alloy of the structure's parameter set, a linear grading, or a custom material. */
public sealed interface LayerMaterial permits LayerMaterial.Alloy, LayerMaterial.Graded, LayerMaterial.Custom {

    /**
     * @param fromBottom position in the layer, 0 at its bottom and 1 at its top
     * @param set        the structure's parameter set
     * @return the material at that position
     */
    WurtziteMaterial at(double fromBottom, ParameterSet set);

    /** {@return true if the material changes across the layer} */
    boolean isGraded();

    /** {@return a short description, e.g. "Al0.25Ga0.75N" or "GaN -> Al0.3Ga0.7N"} */
    String describe();

    /**
     * A uniform alloy resolved by the structure's parameter set.
     *
     * @param composition the alloy
     */
    record Alloy(Composition composition) implements LayerMaterial {
        /**
         * Creates the record and checks every component.
         *
         * @param composition the alloy
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public Alloy {
            Require.nonNull("layer composition", composition);
        }

        @Override
        public WurtziteMaterial at(double fromBottom, ParameterSet set) {
            return set.material(composition);
        }

        @Override
        public boolean isGraded() {
            return false;
        }

        @Override
        public String describe() {
            return composition.formula();
        }
    }

    /**
     * A composition graded linearly from the layer's bottom to its top.
     *
     * @param bottom composition at the bottom of the layer
     * @param top    composition at the top of the layer
     */
    record Graded(Composition bottom, Composition top) implements LayerMaterial {
        /**
         * Creates the record and checks every component.
         *
         * @param bottom composition at the bottom of the layer
         * @param top    composition at the top of the layer
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public Graded {
            Require.nonNull("graded layer bottom composition", bottom);
            Require.nonNull("graded layer top composition", top);
        }

        @Override
        public WurtziteMaterial at(double fromBottom, ParameterSet set) {
            Require.inRange("position in the graded layer (0 = bottom, 1 = top)", fromBottom, 0, 1);
            return set.material(bottom.interpolate(top, fromBottom));
        }

        @Override
        public boolean isGraded() {
            return !bottom.equals(top);
        }

        @Override
        public String describe() {
            return bottom.formula() + " -> " + top.formula();
        }
    }

    /**
     * A user-built material, independent of the parameter set.
     *
     * @param material the material
     */
    record Custom(WurtziteMaterial material) implements LayerMaterial {
        /**
         * Creates the record and checks every component.
         *
         * @param material the material
         * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
         *         finite or outside its documented range
         */
        public Custom {
            Require.nonNull("layer material", material);
        }

        @Override
        public WurtziteMaterial at(double fromBottom, ParameterSet set) {
            return material;
        }

        @Override
        public boolean isGraded() {
            return false;
        }

        @Override
        public String describe() {
            return material.name();
        }
    }
}
