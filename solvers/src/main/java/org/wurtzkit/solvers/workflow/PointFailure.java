package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.Require;

/**
 * A point of a workflow that could not be computed, with the reason.
 *
 * @param index   the point's index in its workflow (sweep order, map order or member order)
 * @param where   what the point is, e.g. "gate bias = -2.5 V"
 * @param message the exception's type and message
 */
public record PointFailure(int index, String where, String message) {
    /** Validates. */
    public PointFailure {
        Require.nonNull("failure location", where);
        Require.nonNull("failure message", message);
    }

    /**
     * @param e an exception
     * @return its simple class name and message, e.g. "NotConvergedException: ..."
     */
    static String describe(Throwable e) {
        return e.getClass().getSimpleName() + ": " + e.getMessage();
    }

    @Override
    public String toString() {
        return "point " + index + " (" + where + "): " + message;
    }
}
