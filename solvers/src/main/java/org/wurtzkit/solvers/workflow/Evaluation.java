package org.wurtzkit.solvers.workflow;

import java.io.Serializable;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.Require;

/**
 * The outcome of one evaluation of a {@link SampleDesign}: its index and either its outputs or the
 * reason it failed. Serializable, so that evaluations computed on other machines (e.g. in Apache
 * Spark tasks, see the examples module) can be brought back and assembled with
 * {@link ToleranceStudyResult#of(SampleDesign, java.util.List, java.util.Collection)}.
 *
 * @param index   the evaluation's index in its design
 * @param outputs     one value per output column, or null if it failed (cloned in and out)
 * @param failureKind the kind of the library exception that failed it, or null if it succeeded
 * @param failure     why it failed (exception type and message), or null if it succeeded
 */
public record Evaluation(int index, double[] outputs, ErrorKind failureKind, String failure) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** Validates: exactly one of outputs and failure is given. */
    public Evaluation {
        Require.inRange("evaluation index", index, 0, Integer.MAX_VALUE);
        if ((outputs == null) == (failure == null)) {
            throw Require.invalid("evaluation outputs and failure", outputs == null ? "neither" : "both",
                    "exactly one of them");
        }
        if ((failureKind == null) != (failure == null)) {
            throw Require.invalid("evaluation failure kind", String.valueOf(failureKind),
                    "given exactly when a failure is given");
        }
        outputs = outputs == null ? null : outputs.clone();
    }

    /** @return the outputs (a copy), or null if the evaluation failed */
    @Override
    public double[] outputs() {
        return outputs == null ? null : outputs.clone();
    }

    /**
     * A successful evaluation.
     *
     * @param index   the evaluation's index in its design
     * @param outputs one value per output column
     * @return the evaluation
     */
    public static Evaluation of(int index, double[] outputs) {
        return new Evaluation(index, Require.nonNull("evaluation outputs", outputs), null, null);
    }

    /**
     * A failed evaluation.
     *
     * @param index the evaluation's index in its design
     * @param why   the library exception that failed it
     * @return the evaluation, keeping the exception's kind
     */
    static Evaluation failed(int index, PointFailure.Reason why) {
        return new Evaluation(index, null, why.kind(), why.message());
    }

    /**
     * Equal when index, failure and every output are equal; outputs compare as
     * {@link java.util.Arrays#equals(double[], double[])} does, bit pattern by bit pattern.
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof Evaluation e && e.index == index && java.util.Arrays.equals(e.outputs, outputs)
                && e.failureKind == failureKind && java.util.Objects.equals(e.failure, failure);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * index + java.util.Arrays.hashCode(outputs)) + java.util.Objects.hashCode(failure);
    }

    @Override
    public String toString() {
        return "Evaluation[" + index + (outputs != null ? ": " + java.util.Arrays.toString(outputs) : ", failed: " + failure)
                + "]";
    }

    /** @return true if the evaluation produced outputs */
    public boolean succeeded() {
        return failure == null;
    }
}
