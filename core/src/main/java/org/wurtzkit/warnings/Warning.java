package org.wurtzkit.warnings;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import org.wurtzkit.errors.Require;

/**
 * One warning on a result: its kind, to branch on, and a message in English that names the values
 * involved.
 *
 * @param kind    what the warning is about
 * @param message the explanation, not blank
 */
public record Warning(WarningKind kind, String message) {
    /**
     * Validates.
     *
     * @param kind what the warning is about
     * @param message the explanation, not blank
     */
    public Warning {
        Require.nonNull("warning kind", kind);
        Require.nonNull("warning message", message);
        if (message.isBlank()) {
            throw new org.wurtzkit.errors.InvalidParameterException("warning message", "\"\"", "a non-blank text");
        }
    }

    /**
     * @param lists lists of warnings
     * @return their union in order of first appearance, equal warnings once
     */
    @SafeVarargs
    public static List<Warning> union(List<Warning>... lists) {
        LinkedHashSet<Warning> all = new LinkedHashSet<>();
        for (List<Warning> l : lists) {
            all.addAll(l);
        }
        return List.copyOf(new ArrayList<>(all));
    }

    /**
     * @param warnings warnings
     * @return one line per warning, each {@code "\n  warning: ..."}, or the empty string
     */
    public static String lines(List<Warning> warnings) {
        StringBuilder sb = new StringBuilder();
        for (Warning w : warnings) {
            sb.append("\n  warning: ").append(w.message());
        }
        return sb.toString();
    }

    /** @return {@code "warning (KIND): message"} */
    @Override
    public String toString() {
        return "warning (" + kind + "): " + message;
    }
}
