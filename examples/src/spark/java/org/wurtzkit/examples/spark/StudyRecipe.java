package org.wurtzkit.examples.spark;

import java.io.Serializable;
import org.wurtzkit.solvers.workflow.ToleranceStudy;

/**
 * How a Spark task obtains the study: a small serializable recipe, shipped to the executors, that
 * builds the same {@link ToleranceStudy} on every JVM. The study itself (template structure,
 * parameter set, solver) is not serialized: it is rebuilt from the recipe once per partition, so
 * that the recipe only has to carry a few numbers or a class name.
 *
 * <p>Contract: {@link #build()} must be a pure function of the recipe's fields (same fields, same
 * study: same template, tolerances, seed, evaluators and solver options) and must not depend on
 * the machine, its thread count or its files. A lambda over serializable values, or a record such as
 * {@link DemoWaferRecipe}, fits.
 */
@FunctionalInterface
public interface StudyRecipe extends Serializable {
    /** @return the study */
    ToleranceStudy build();
}
