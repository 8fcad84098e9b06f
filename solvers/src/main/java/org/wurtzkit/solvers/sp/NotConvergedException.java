package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * A solve did not reach its tolerance within its budget. It carries the convergence record and the
 * last finite iterate (node depths and potential), so that a caller can inspect or restart from it.
 */
public class NotConvergedException extends WurtzkitException {
    private static final long serialVersionUID = 1L;
    private final transient ConvergenceRecord record;
    /** Node depths of the last finite iterate (m); part of the serialized form. */
    private final double[] depth;
    /** Electrostatic potential at those nodes (V); part of the serialized form. */
    private final double[] potential;

    NotConvergedException(String message, ConvergenceRecord record, double[] depth, double[] potential) {
        super(ErrorKind.NOT_CONVERGED, message);
        this.record = record;
        this.depth = depth.clone();
        this.potential = potential.clone();
    }

    /** {@return iterations, residual history and the reason} */
    public ConvergenceRecord record() {
        return record;
    }

    /** {@return node depths of the last iterate (m)} */
    public double[] lastDepth() {
        return depth.clone();
    }

    /** {@return electrostatic potential of the last iterate (V), finite} */
    public double[] lastPotential() {
        return potential.clone();
    }
}
