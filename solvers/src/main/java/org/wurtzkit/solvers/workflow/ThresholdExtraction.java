package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Decimals;

/**
 * How to obtain a threshold voltage from the full solver: a bias sweep over a grid and a
 * definition to read V_th off it.
 *
 * @param grid       the gate biases to sweep
 * @param definition the threshold definition
 */
public record ThresholdExtraction(BiasGrid grid, ThresholdDefinition definition) {
    /**
     * Creates the record and checks every component.
     *
     * @param grid       the gate biases to sweep
     * @param definition the threshold definition
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public ThresholdExtraction {
        Require.nonNull("bias grid", grid);
        Require.nonNull("threshold definition", definition);
    }

    /**
     * Runs the sweep and extracts V_th. Every point of the sweep must converge: a failed point would
     * leave a gap in which the threshold might lie, so it is an error here, not a silent omission.
     *
     * @param structure the stack (Schottky gate)
     * @param sweep     the sweep runner
     * @return V_th (V)
     * @throws WurtzkitException of kind NOT_CONVERGED if a bias point failed
     */
    public double thresholdVoltage(Structure structure, BiasSweep sweep) {
        return threshold(structure, sweep).voltageV();
    }

    /**
     * As {@link #thresholdVoltage(Structure, BiasSweep)}, with the threshold's warnings (see
     * {@link BiasSweepResult#threshold(ThresholdDefinition)}).
     *
     * @param structure the stack (Schottky gate)
     * @param sweep     the sweep runner
     * @return V_th with its warnings
     * @throws WurtzkitException of kind NOT_CONVERGED if a bias point failed
     */
    public Threshold threshold(Structure structure, BiasSweep sweep) {
        return threshold(Require.nonNull("bias sweep", sweep).run(structure, grid));
    }

    /**
     * @param r the sweep over this extraction's grid
     * @return V_th with its warnings
     * @throws WurtzkitException of kind NOT_CONVERGED if a bias point failed
     */
    Threshold threshold(BiasSweepResult r) {
        if (!r.failures().isEmpty()) {
            throw new WurtzkitException(ErrorKind.NOT_CONVERGED, "threshold extraction needs every bias point; "
                    + r.failures().size() + " of " + r.size() + " failed, first: " + r.failures().get(0));
        }
        return r.threshold(definition);
    }

    /** @return e.g. {@code "threshold at n_s = 1e11 cm^-2, over 41 gate biases from 0 V to -8 V"} */
    @Override
    public String toString() {
        return definition + ", over " + grid.size() + " gate biases from " + Decimals.format(grid.get(0), "V") + " to "
                + Decimals.format(grid.get(grid.size() - 1), "V");
    }
}
