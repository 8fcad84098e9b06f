package org.wurtzkit.errors;

/**
 * A parameter is NaN, infinite or outside its allowed range. The message always names the
 * parameter, the offending value and the allowed range, e.g.
 * {@code "Al fraction x = 1.2 is outside the allowed range [0, 1]"}.
 *
 * <p>It extends {@link IllegalArgumentException} so that ordinary Java code that already catches
 * that type keeps working.
 */
public class InvalidParameterException extends IllegalArgumentException implements WurtzkitError {
    private static final long serialVersionUID = 1L;
    private final String parameter;
    private final String value;
    private final String allowedRange;

    /**
     * @param parameter    the parameter's name as the user knows it
     * @param value        the offending value, as text
     * @param allowedRange the allowed range, as text (e.g. "[0, 1]" or "finite and > 0")
     */
    public InvalidParameterException(String parameter, String value, String allowedRange) {
        super(parameter + " = " + value + " is outside the allowed range " + allowedRange);
        this.parameter = parameter;
        this.value = value;
        this.allowedRange = allowedRange;
    }

    /** {@return the parameter's name} */
    public String parameter() {
        return parameter;
    }

    /** {@return the offending value, as text} */
    public String value() {
        return value;
    }

    /** {@return the allowed range, as text} */
    public String allowedRange() {
        return allowedRange;
    }

    /** {@return {@link ErrorKind#INVALID_PARAMETER}} */
    @Override
    public ErrorKind kind() {
        return ErrorKind.INVALID_PARAMETER;
    }
}
