package org.wurtzkit.material;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
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
     */
    public static ParameterSet named(String name) {
        ParameterSet s = Holder.SETS.get(name);
        if (s == null) {
            throw new WurtzkitException(ErrorKind.UNKNOWN_PARAMETER_SET, "no parameter set named \"" + name
                    + "\" is registered; registered sets: " + names()
                    + (Holder.SETS.isEmpty() ? " (is wurtzkit-materials-data on the class path?)" : ""));
        }
        return s;
    }

    /** {@return the set named {@value #DEFAULT_NAME}} */
    public static ParameterSet defaultSet() {
        return named(DEFAULT_NAME);
    }
}
