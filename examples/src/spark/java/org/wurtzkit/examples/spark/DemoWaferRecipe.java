package org.wurtzkit.examples.spark;

import java.io.Serializable;
import org.wurtzkit.examples.ToleranceStudyExample;
import org.wurtzkit.solvers.workflow.ProgressListener;
import org.wurtzkit.solvers.workflow.ToleranceStudy;

/**
 * The tolerance study of the invented demo wafer ({@link ToleranceStudyExample#study}) as a
 * serializable recipe: the example's settings as plain fields.
 *
 * @param rows             sample rows of the Sobol design
 * @param biasStepV        bias step of the threshold sweeps (V)
 * @param seed             the seed
 * @param thresholdVoltage whether each sample also gets V_th
 */
public record DemoWaferRecipe(int rows, double biasStepV, long seed, boolean thresholdVoltage)
        implements StudyRecipe, Serializable {
    private static final long serialVersionUID = 1L;

    /**
     * @param s the example's settings
     * @return the recipe
     */
    public static DemoWaferRecipe of(ToleranceStudyExample.Settings s) {
        return new DemoWaferRecipe(s.rows(), s.biasStepV(), s.seed(), s.thresholdVoltage());
    }

    /** @return the example's settings */
    public ToleranceStudyExample.Settings settings() {
        return new ToleranceStudyExample.Settings(rows, biasStepV, seed, thresholdVoltage);
    }

    /** Built with one thread: inside a Spark task, Spark's own task slots are the parallelism. */
    @Override
    public ToleranceStudy build() {
        return ToleranceStudyExample.study(settings(), 1, ProgressListener.NONE);
    }
}
