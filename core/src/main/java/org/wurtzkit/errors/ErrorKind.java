package org.wurtzkit.errors;

/** The kinds of failure the library reports. */
public enum ErrorKind {
    /** A parameter value is NaN, infinite or outside its allowed range. */
    INVALID_PARAMETER,
    /** A structure or option combination that cannot be represented (e.g. an empty stack). */
    INVALID_STRUCTURE,
    /** A parameter set was asked for by a name that no provider registers. */
    UNKNOWN_PARAMETER_SET,
    /** A parameter-set data file is malformed: missing, duplicated or non-numeric values. */
    MALFORMED_DATA,
    /** An iterative solve did not reach its tolerance within its budget. */
    NOT_CONVERGED,
    /** An eigen-solver could not resolve an eigenpair to its residual tolerance. */
    EIGEN_SOLVER_FAILED,
    /** A linear system met a zero or near-zero pivot (the matrix is numerically singular). */
    SINGULAR_MATRIX,
    /** A computed result holds NaN or infinite values (a defect to report, with the input). */
    NON_FINITE_RESULT,
    /** A caller-supplied callback broke its contract (returned null or the wrong number of values). */
    INVALID_CALLBACK_RESULT
}
