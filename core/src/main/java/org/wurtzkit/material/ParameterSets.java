package org.wurtzkit.material;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.ServiceLoader;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;

/**
 * Convenience discovery of the parameter sets registered on the class path through
 * {@link ParameterSetProvider} and {@link ServiceLoader}.
 *
 * <p>This is a convenience, never used inside a solver: solvers and structures are always handed
 * their set explicitly. The providers are loaded once, on first use, with this class's class loader.
 */
public final class ParameterSets {
    /** Name of the default set (Vurgaftman &amp; Meyer 2003 with BFV97 polarization constants). */
    public static final String DEFAULT_NAME = "vurgaftman-meyer-2003";

    private ParameterSets() {
    }

    private static final class Holder {
        static final Map<String, ParameterSet> SETS = load();

        private static Map<String, ParameterSet> load() {
            Map<String, ParameterSet> m = new LinkedHashMap<>();
            for (ParameterSetProvider p : ServiceLoader.load(ParameterSetProvider.class,
                    ParameterSets.class.getClassLoader())) {
                for (ParameterSet s : p.parameterSets()) {
                    ParameterSet old = m.putIfAbsent(s.name(), s);
                    if (old != null) {
                        throw new WurtzkitException(ErrorKind.MALFORMED_DATA, "two providers register a parameter set named \""
                                + s.name() + "\": " + old.getClass().getName() + " and " + p.getClass().getName());
                    }
                }
            }
            return Collections.unmodifiableMap(m);
        }
    }

    /** {@return the names of every registered set, in discovery order} */
    public static List<String> names() {
        return new ArrayList<>(Holder.SETS.keySet());
    }

    /** {@return every registered set, in discovery order} */
    public static List<ParameterSet> all() {
        return new ArrayList<>(Holder.SETS.values());
    }

    /**
     * @param name a set's name
     * @return the set
     * @throws WurtzkitException of kind {@link ErrorKind#UNKNOWN_PARAMETER_SET}, naming the registered sets
     *                            and, for a near miss, the nearest of them ("did you mean ...?")
     */
    public static ParameterSet named(String name) {
        ParameterSet s = Holder.SETS.get(name);
        if (s == null) {
            List<String> near = name == null ? List.of() : nearest(name, names());
            String guess = near.isEmpty() ? "" : " (did you mean " + String.join(" or ", near.stream()
                    .map(n -> "\"" + n + "\"").toList()) + "?)";
            throw new WurtzkitException(ErrorKind.UNKNOWN_PARAMETER_SET, "no parameter set named \"" + name
                    + "\" is registered" + guess + "; registered sets: " + names()
                    + (Holder.SETS.isEmpty() ? " (is wurtzkit-materials-data on the class path?)" : ""));
        }
        return s;
    }

    /**
     * The registered names closest to a misspelt one, for the "did you mean" of {@link #named}: those
     * within the smallest Levenshtein distance found (case ignored), if that distance is at most
     * max(2, length / 3) of the typed name; otherwise none.
     *
     * @param typed      the name asked for
     * @param registered the registered names
     * @return the nearest names, in registration order; empty when none is near
     */
    static List<String> nearest(String typed, List<String> registered) {
        String t = typed.toLowerCase(Locale.ROOT);
        int limit = Math.max(2, t.length() / 3);
        int best = Integer.MAX_VALUE;
        List<String> out = new ArrayList<>();
        for (String r : registered) {
            int d = levenshtein(t, r.toLowerCase(Locale.ROOT));
            if (d > limit || d > best) {
                continue;
            }
            if (d < best) {
                best = d;
                out.clear();
            }
            out.add(r);
        }
        return out;
    }

    /**
     * Levenshtein edit distance (insertions, deletions and substitutions of one character each
     * cost 1; V. I. Levenshtein, Soviet Physics Doklady 10, 707 (1966)), by the two-row dynamic
     * programme, O(|a| |b|) time.
     *
     * @param a first string
     * @param b second string
     * @return the distance
     */
    static int levenshtein(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(substitution, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] swap = prev;
            prev = cur;
            cur = swap;
        }
        return prev[b.length()];
    }

    /** {@return the set named {@value #DEFAULT_NAME}} */
    public static ParameterSet defaultSet() {
        return named(DEFAULT_NAME);
    }
}
