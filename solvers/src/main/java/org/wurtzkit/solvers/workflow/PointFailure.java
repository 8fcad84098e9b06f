package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitError;

/**
 * A point of a workflow that could not be computed, with the kind of failure and the reason.
 *
 * @param index   the point's index in its workflow (sweep order, map order or member order)
 * @param where   what the point is, e.g. "gate bias = -2.5 V"
 * @param kind    the kind of the library exception that failed the point (for a point retried
 *                from a cold start, the kind of the last attempt)
 * @param message the exception's type and message
 */
public record PointFailure(int index, String where, ErrorKind kind, String message) {
    /** Validates. */
    public PointFailure {
        Require.nonNull("failure location", where);
        Require.nonNull("failure kind", kind);
        Require.nonNull("failure message", message);
    }

    /**
     * Why a point failed, before it is placed in its workflow.
     *
     * @param kind    the kind of failure
     * @param message the exception's type and message
     */
    record Reason(ErrorKind kind, String message) {
        /**
         * @param e a library exception
         * @return its kind, and its simple class name and message, e.g. "NotConvergedException: ..."
         */
        static Reason of(WurtzkitError e) {
            return new Reason(e.kind(), e.getClass().getSimpleName() + ": " + e.getMessage());
        }

        /**
         * @param index the point's index
         * @param where what the point is
         * @return the failure of that point
         */
        PointFailure at(int index, String where) {
            return new PointFailure(index, where, kind, message);
        }
    }

    @Override
    public String toString() {
        return "point " + index + " (" + where + "): " + message;
    }
}
