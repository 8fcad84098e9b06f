package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.provider.Arguments;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;

/**
 * Rows of the bad-input tables of issue #7, shared by the reliability tests of every module (the
 * test sources of materials-data and solvers take it from core/src/testFixtures/java).
 *
 * <p>A row holds an action that must be rejected and what the rejection must say. The contract
 * checked is the one of {@link InvalidParameterException} (DEVELOPERS.md, "Errors"): the exception
 * names the parameter, the offending value and the allowed range, both through its accessors and
 * in its message, and nothing is clamped silently.
 */
public final class BadInput {
    private BadInput() {
    }

    /**
     * One invalid call and the expected report.
     *
     * @param label     what is wrong, shown as the test name
     * @param action    the call that must be rejected
     * @param parameter expected {@link InvalidParameterException#parameter()}
     * @param value     expected {@link InvalidParameterException#value()}
     * @param range     expected {@link InvalidParameterException#allowedRange()}
     */
    public record Case(String label, Executable action, String parameter, String value, String range) {
        @Override
        public String toString() {
            return label;
        }
    }

    /**
     * @param label     test name
     * @param action    the invalid call
     * @param parameter expected parameter name
     * @param value     expected value text
     * @param range     expected allowed range text
     * @return a row for {@code @MethodSource}
     */
    public static Arguments row(String label, Executable action, String parameter, String value, String range) {
        return Arguments.of(new Case(label, action, parameter, value, range));
    }

    /**
     * @param label     test name
     * @param action    the invalid call
     * @param parameter expected parameter name
     * @param value     the offending double (its {@link Double#toString(double)} is the expected text)
     * @param range     expected allowed range text
     * @return a row for {@code @MethodSource}
     */
    public static Arguments row(String label, Executable action, String parameter, double value, String range) {
        return row(label, action, parameter, Double.toString(value), range);
    }

    /**
     * Runs the row: the call throws {@link InvalidParameterException} (an
     * {@link IllegalArgumentException}, kind INVALID_PARAMETER) whose accessors and message name the
     * parameter, the value and the range.
     *
     * @param c the row
     * @return the exception, for further checks
     */
    public static InvalidParameterException check(Case c) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, c.action(), c.label());
        String m = e.getMessage();
        assertTrue(e instanceof IllegalArgumentException);
        assertEquals(ErrorKind.INVALID_PARAMETER, e.kind(), m);
        assertEquals(c.parameter(), e.parameter(), m);
        assertEquals(c.value(), e.value(), m);
        assertEquals(c.range(), e.allowedRange(), m);
        assertTrue(m.contains(c.parameter()), "message names the parameter: " + m);
        assertTrue(m.contains(" = " + c.value()), "message names the value: " + m);
        assertTrue(m.contains(c.range()), "message names the allowed range: " + m);
        return e;
    }

    /**
     * A structural failure: {@link WurtzkitException} of the given kind whose message contains every
     * given fragment.
     *
     * @param action    the call
     * @param kind      expected kind
     * @param fragments text the message must contain
     * @return the exception
     */
    public static WurtzkitException checkKind(Executable action, ErrorKind kind, String... fragments) {
        WurtzkitException e = assertThrows(WurtzkitException.class, action);
        assertEquals(kind, e.kind(), e.getMessage());
        for (String f : fragments) {
            assertTrue(e.getMessage().contains(f), "message must contain \"" + f + "\": " + e.getMessage());
        }
        return e;
    }
}
