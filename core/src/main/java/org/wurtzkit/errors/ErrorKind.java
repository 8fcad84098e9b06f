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
    NOT_CONVERGED
}
