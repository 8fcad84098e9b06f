package org.wurtzkit.errors;

/**
 * Implemented by every exception the library throws, so that a caller can catch the whole family
 * and branch on {@link #kind()} without parsing messages. The two roots are
 * {@link InvalidParameterException} (a bad argument; it extends {@link IllegalArgumentException}) and
 * {@link WurtzkitException} (any other failure); catch both with
 * {@code catch (InvalidParameterException | WurtzkitException e)}. A {@code NullPointerException}
 * or an index error from inside the library is a bug and is never converted into this family.
 */
public interface WurtzkitError {
    /** @return the kind of failure */
    ErrorKind kind();

    /** @return a complete English message */
    String getMessage();
}
