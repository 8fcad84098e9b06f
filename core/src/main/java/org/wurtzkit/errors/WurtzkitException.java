package org.wurtzkit.errors;

/**
 * Base of the library's exceptions that are not plain invalid arguments: unchecked, English only.
 * Each carries an {@link ErrorKind} so that callers (and tests) can branch on the kind of failure
 * without parsing messages.
 */
public class WurtzkitException extends RuntimeException implements WurtzkitError {
    private static final long serialVersionUID = 1L;
    private final ErrorKind kind;

    /**
     * @param kind    the kind of failure
     * @param message a complete English message
     */
    public WurtzkitException(ErrorKind kind, String message) {
        super(message);
        this.kind = kind;
    }

    /**
     * @param kind    the kind of failure
     * @param message a complete English message
     * @param cause   the underlying failure
     */
    public WurtzkitException(ErrorKind kind, String message, Throwable cause) {
        super(message, cause);
        this.kind = kind;
    }

    /** {@return the kind of failure} */
    @Override
    public ErrorKind kind() {
        return kind;
    }
}
