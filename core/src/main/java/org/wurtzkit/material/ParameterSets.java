package org.wurtzkit.material;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.Set;
import java.util.WeakHashMap;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;

/**
 * Convenience discovery of the parameter sets registered on the class path through
 * {@link ParameterSetProvider} and {@link ServiceLoader}.
 *
 * <p>This is a convenience, never used inside a solver: solvers and structures are always handed
 * their set explicitly. The providers are loaded on first use with this class's class loader, one
 * by one: a provider that cannot be instantiated or whose {@link ParameterSetProvider#parameterSets()}
 * throws (a typo in a team's file inside a jar) is recorded as broken and does not stop the others.
 * {@link #names()} lists it with the suffix {@value #BROKEN_SUFFIX}; {@link #named(String)} of its set
 * throws with the original message (for a data-file error: set, file, key and line) as cause;
 * {@link #brokenProviders()} lists every failure. {@link #reload()} discovers again, also through the
 * thread's context class loader (a notebook that adds a jar in a later cell), and
 * {@link #reload(ClassLoader)} through a given loader. Thread-safe: each (re)load publishes one
 * immutable snapshot.
 */
public final class ParameterSets {
    /** Name of the default set (Vurgaftman &amp; Meyer 2003 with BFV97 polarization constants). */
    public static final String DEFAULT_NAME = "vurgaftman-meyer-2003";

    /** Suffix by which {@link #names()} marks a set (or provider) that failed to load. */
    public static final String BROKEN_SUFFIX = " (broken)";

    /** Stop scanning a loader after this many consecutive discovery errors (a guard, never reached in practice). */
    private static final int MAX_CONSECUTIVE_ERRORS = 1000;

    private ParameterSets() {
    }

    /**
     * A provider that could not be loaded, or whose sets could not be read.
     *
     * @param provider the provider's class name (or the services entry, if the class itself is missing)
     * @param setName  the name of the set it was loading, if the failure says so, else null
     * @param message  the original failure's message (for a data-file error: set, file, key and line)
     * @param cause    the original failure
     */
    public record BrokenProvider(String provider, String setName, String message, Throwable cause) {
        /** {@return the name under which {@link #names()} lists this failure} */
        public String listedName() {
            return (setName != null ? setName : provider) + BROKEN_SUFFIX;
        }
    }

    /** One immutable result of discovery. */
    private record Registry(Map<String, ParameterSet> sets, List<BrokenProvider> broken) {
    }

    private static final Object LOCK = new Object();
    private static volatile Registry registry;
    /**
     * The first failure of each provider class: a class whose static initializer failed answers
     * every later attempt with a bare {@link NoClassDefFoundError}, so a reload reports the original.
     */
    private static final Map<Class<?>, BrokenProvider> FIRST_FAILURE = Collections.synchronizedMap(new WeakHashMap<>());

    private static Registry registry() {
        Registry r = registry;
        if (r == null) {
            synchronized (LOCK) {
                r = registry;
                if (r == null) {
                    r = discover(List.of(ParameterSets.class.getClassLoader()));
                    registry = r;
                }
            }
        }
        return r;
    }

    /**
     * Discovers the providers again, through this class's loader and the current thread's context
     * class loader (if it is a different one), and replaces the registry. Use it after adding a jar
     * with a provider at run time, or after fixing a broken team file.
     */
    public static void reload() {
        ClassLoader context = Thread.currentThread().getContextClassLoader();
        publish(context == null ? List.of(ParameterSets.class.getClassLoader()) : loaders(context));
    }

    /**
     * Discovers the providers again, through this class's loader and the given one, and replaces
     * the registry.
     *
     * @param loader an additional class loader to search (e.g. a {@link java.net.URLClassLoader} over a jar)
     */
    public static void reload(ClassLoader loader) {
        publish(loaders(Require.nonNull("class loader", loader)));
    }

    private static List<ClassLoader> loaders(ClassLoader extra) {
        ClassLoader own = ParameterSets.class.getClassLoader();
        return extra == own ? List.of(own) : List.of(own, extra);
    }

    private static void publish(List<ClassLoader> loaders) {
        Registry r = discover(loaders);
        synchronized (LOCK) {
            registry = r;
        }
    }

    private static Registry discover(List<ClassLoader> loaders) {
        Map<String, ParameterSet> sets = new LinkedHashMap<>();
        Map<String, String> owners = new LinkedHashMap<>();
        List<BrokenProvider> broken = new ArrayList<>();
        Set<Class<?>> seen = new HashSet<>();
        for (ClassLoader loader : loaders) {
            Iterator<ServiceLoader.Provider<ParameterSetProvider>> it = ServiceLoader
                    .load(ParameterSetProvider.class, loader).stream().iterator();
            int errors = 0;
            while (errors < MAX_CONSECUTIVE_ERRORS) {
                ServiceLoader.Provider<ParameterSetProvider> provider;
                try {
                    if (!it.hasNext()) {
                        break;
                    }
                    provider = it.next();
                    errors = 0;
                } catch (ServiceConfigurationError e) {
                    // the services file names a class that is missing or not a provider
                    errors++;
                    broken.add(failure(e.getMessage(), e));
                    continue;
                }
                Class<? extends ParameterSetProvider> type = provider.type();
                if (!seen.add(type)) {
                    continue; // the same provider class seen through a second loader
                }
                List<ParameterSet> offered;
                try {
                    offered = List.copyOf(provider.get().parameterSets());
                } catch (ServiceConfigurationError | RuntimeException | LinkageError e) {
                    BrokenProvider b = failure(type.getName(), e);
                    BrokenProvider first = FIRST_FAILURE.get(type);
                    if (first != null && b.cause() instanceof NoClassDefFoundError) {
                        broken.add(first);
                    } else {
                        FIRST_FAILURE.putIfAbsent(type, b);
                        broken.add(b);
                    }
                    continue;
                }
                for (ParameterSet s : offered) {
                    String owner = owners.putIfAbsent(s.name(), type.getName());
                    if (owner == null) {
                        sets.put(s.name(), s);
                    } else {
                        broken.add(new BrokenProvider(type.getName(), s.name(), "two providers register a parameter set"
                                + " named \"" + s.name() + "\": " + owner + " (kept) and " + type.getName()
                                + " (ignored)", null));
                    }
                }
            }
        }
        return new Registry(Collections.unmodifiableMap(sets), List.copyOf(broken));
    }

    /** Unwraps the service-loader and class-initialization wrappers to the failure that says what is wrong. */
    private static BrokenProvider failure(String provider, Throwable e) {
        Throwable root = e;
        while ((root instanceof ServiceConfigurationError || root instanceof ExceptionInInitializerError
                || root instanceof java.lang.reflect.InvocationTargetException) && root.getCause() != null) {
            root = root.getCause();
        }
        String setName = null;
        if (root instanceof NamedSetFailure n) {
            String s = n.setName();
            setName = s == null || s.isBlank() || s.startsWith("(") ? null : s;
        }
        String message = root.getMessage() != null ? root.getMessage() : root.toString();
        return new BrokenProvider(provider, setName, message, root);
    }

    /**
     * {@return the names of every registered set, in discovery order, followed by one entry per
     * broken provider: its set's name (or the provider class, if the set's name could not be read)
     * with the suffix {@value #BROKEN_SUFFIX}}
     */
    public static List<String> names() {
        Registry r = registry();
        List<String> out = new ArrayList<>(r.sets().keySet());
        for (BrokenProvider b : r.broken()) {
            out.add(b.listedName());
        }
        return out;
    }

    /** {@return every registered set that loaded, in discovery order} */
    public static List<ParameterSet> all() {
        return new ArrayList<>(registry().sets().values());
    }

    /** {@return the providers (or duplicate registrations) that failed at the last (re)load, in discovery order} */
    public static List<BrokenProvider> brokenProviders() {
        return registry().broken();
    }

    /**
     * @param name a set's name
     * @return the set
     * @throws WurtzkitException of kind {@link ErrorKind#MALFORMED_DATA} if the set's provider is
     *         broken (the original failure is the cause and its message is quoted), or of kind
     *         {@link ErrorKind#UNKNOWN_PARAMETER_SET}, naming the registered sets and, for a
     *         near miss, the nearest of them ("did you mean ...?")
     */
    public static ParameterSet named(String name) {
        Registry r = registry();
        ParameterSet s = r.sets().get(name);
        if (s != null) {
            return s;
        }
        for (BrokenProvider b : r.broken()) {
            if (name != null && (name.equals(b.setName()) || name.equals(b.listedName()))) {
                throw new WurtzkitException(ErrorKind.MALFORMED_DATA, "parameter set \""
                        + (b.setName() != null ? b.setName() : name) + "\" could not be loaded; provider "
                        + b.provider() + " failed: " + b.message(), b.cause());
            }
        }
        throw unknown(name, r);
    }

    private static WurtzkitException unknown(String name, Registry r) {
        List<String> near = name == null ? List.of() : nearest(name, List.copyOf(r.sets().keySet()));
        String guess = near.isEmpty() ? "" : " (did you mean " + String.join(" or ", near.stream()
                .map(n -> "\"" + n + "\"").toList()) + "?)";
        StringBuilder sb = new StringBuilder("no parameter set named \"" + name + "\" is registered" + guess
                + "; registered sets: " + names());
        if (r.sets().isEmpty() && r.broken().isEmpty()) {
            sb.append(" (is wurtzkit-materials-data on the class path?)");
        }
        for (BrokenProvider b : r.broken()) {
            if (b.setName() == null) {
                sb.append("; provider ").append(b.provider()).append(" failed: ").append(b.message());
            }
        }
        return new WurtzkitException(ErrorKind.UNKNOWN_PARAMETER_SET, sb.toString());
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
