package org.wurtzkit.solvers.linalg;

import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * An eigen-solver could not resolve an eigenpair to its residual tolerance within its iteration
 * budget. Its kind is {@link ErrorKind#EIGEN_SOLVER_FAILED}; inside a self-consistent solve the
 * solver reports it as a non-converged solve with its record.
 */
public final class EigenSolverException extends WurtzkitException {
    private static final long serialVersionUID = 1L;
    private final int eigenpairIndex;

    /**
     * @param eigenpairIndex zero-based index of the eigenpair that failed, or -1 if the failure is
     *                       not tied to one eigenpair
     * @param message        a complete English message
     */
    EigenSolverException(int eigenpairIndex, String message) {
        super(ErrorKind.EIGEN_SOLVER_FAILED, message);
        this.eigenpairIndex = eigenpairIndex;
    }

    /** @return zero-based index of the failing eigenpair (in ascending order), or -1 if not tied to one */
    public int eigenpairIndex() {
        return eigenpairIndex;
    }
}
