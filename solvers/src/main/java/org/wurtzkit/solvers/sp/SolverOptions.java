package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.mesh.MeshPolicy;

/**
 * Settings of a self-consistent solve, with documented defaults ({@link #defaults()}); change one
 * with a {@code with...} method, which returns a copy.
 *
 * <p>Physical model choices (polarization model, band line-up, strain shifts of the band edges)
 * live on the {@link org.wurtzkit.structure.Structure}; these options are numerics only.
 *
 * @param tolerance             convergence of the outer loop, max |delta phi| between iterations (V); default 1e-6, in [1e-12, 1e-2]
 * @param maxIterations         outer iterations allowed; default 100, in [1, 10000]
 * @param newtonTolerance       convergence of each Newton-Poisson solve, max |delta phi| (V); default 1e-9, in [1e-14, 1e-3]
 * @param maxNewtonIterations   Newton steps allowed per Poisson solve; default 200, in [1, 100000]
 * @param maxNewtonStep         largest change of the potential at any node in one Newton step (V); default 0.5, in [1e-3, 10]
 * @param mesh                  mesh policy; default {@link MeshPolicy#DEFAULT}
 * @param quantumWindows         where electrons are quantum; default {@link QuantumWindows#automatic()}
 * @param maxSubbands           most subbands kept per window; default 60, in [1, 2000]
 * @param subbandCutoffKT       subbands are kept up to E_F + this many kT; default 15 (a subband there holds exp(-15) = 3e-7 of one at E_F), in [1, 200]
 * @param quasiFermiLevels      which contact electrons and holes follow in each part of the stack; default
 *                              {@link QuasiFermiLevels#defaults()} (electrons the channel; holes the gate above
 *                              the channel and the channel below it)
 * @param quantumHoles          whether holes inside quantum windows come from hole subbands (three single
 *                              bands, heavy, light and crystal-field hole) instead of the classical density;
 *                              default false: the single-band hole subbands with hard-walled windows
 *                              under-count holes where a window edge cuts a neutral p-region, so they are
 *                              for hole wells (a 2DHG) and are switched on where one is expected
 * @param densityOfStatesMass   which in-plane mass sets each subband's 2D density of states; default
 *                              {@link DensityOfStatesMass#WAVEFUNCTION_WEIGHTED}
 */
public record SolverOptions(double tolerance, int maxIterations, double newtonTolerance, int maxNewtonIterations,
        double maxNewtonStep, MeshPolicy mesh, QuantumWindows quantumWindows, int maxSubbands, double subbandCutoffKT,
        QuasiFermiLevels quasiFermiLevels, boolean quantumHoles, DensityOfStatesMass densityOfStatesMass) {

    private static final SolverOptions DEFAULTS = new SolverOptions(1e-6, 100, 1e-9, 200, 0.5, MeshPolicy.DEFAULT,
            QuantumWindows.automatic(), 60, 15, QuasiFermiLevels.defaults(), false,
            DensityOfStatesMass.WAVEFUNCTION_WEIGHTED);

    /**
     * Creates the settings and validates every field against the range given in the class
     * documentation.
     *
     * @param tolerance           convergence of the outer loop, max |delta phi| between iterations (V), in [1e-12, 1e-2]
     * @param maxIterations       outer iterations allowed, in [1, 10000]
     * @param newtonTolerance     convergence of each Newton-Poisson solve, max |delta phi| (V), in [1e-14, 1e-3]
     * @param maxNewtonIterations Newton steps allowed per Poisson solve, in [1, 100000]
     * @param maxNewtonStep       largest change of the potential at any node in one Newton step (V), in [1e-3, 10]
     * @param mesh                mesh policy, not null
     * @param quantumWindows      where electrons are quantum, not null
     * @param maxSubbands         most subbands kept per window, in [1, 2000]
     * @param subbandCutoffKT     subbands are kept up to E_F + this many kT, in [1, 200]
     * @param quasiFermiLevels    the quasi-Fermi level of each carrier in each region, not null
     * @param quantumHoles        whether holes in quantum windows come from hole subbands
     * @param densityOfStatesMass which in-plane mass sets each subband's 2D density of states, not null
     * @throws org.wurtzkit.errors.InvalidParameterException if a value is outside its range or null
     */
    public SolverOptions {
        Require.inRange("tolerance (V)", tolerance, 1e-12, 1e-2);
        Require.inRange("maxIterations", maxIterations, 1, 10000);
        Require.inRange("newtonTolerance (V)", newtonTolerance, 1e-14, 1e-3);
        Require.inRange("maxNewtonIterations", maxNewtonIterations, 1, 100000);
        Require.inRange("maxNewtonStep (V)", maxNewtonStep, 1e-3, 10);
        Require.nonNull("mesh policy", mesh);
        Require.nonNull("quantum windows", quantumWindows);
        Require.inRange("maxSubbands", maxSubbands, 1, 2000);
        Require.inRange("subbandCutoffKT", subbandCutoffKT, 1, 200);
        Require.nonNull("quasi-Fermi levels", quasiFermiLevels);
        Require.nonNull("density-of-states mass", densityOfStatesMass);
    }

    /** {@return the defaults listed in the class documentation} */
    public static SolverOptions defaults() {
        return DEFAULTS;
    }

    /**
     * Returns a copy with another value of the outer-loop tolerance; every other setting is kept.
     *
     * @param v tolerance (V), in [1e-12, 1e-2]
     * @return a copy with {@code tolerance} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withTolerance(double v) {
        return new SolverOptions(v, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the outer iteration budget; every other setting is kept.
     *
     * @param v outer iterations allowed, in [1, 10000]
     * @return a copy with {@code maxIterations} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withMaxIterations(int v) {
        return new SolverOptions(tolerance, v, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the Newton-Poisson tolerance; every other setting is kept.
     *
     * @param v Newton tolerance (V), in [1e-14, 1e-3]
     * @return a copy with {@code newtonTolerance} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withNewtonTolerance(double v) {
        return new SolverOptions(tolerance, maxIterations, v, maxNewtonIterations, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the Newton step budget; every other setting is kept.
     *
     * @param v Newton steps allowed per Poisson solve, in [1, 100000]
     * @return a copy with {@code maxNewtonIterations} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withMaxNewtonIterations(int v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, v, maxNewtonStep, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the largest Newton update; every other setting is kept.
     *
     * @param v largest change of the potential in one Newton step (V), in [1e-3, 10]
     * @return a copy with {@code maxNewtonStep} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withMaxNewtonStep(double v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, v, mesh, quantumWindows,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the mesh policy; every other setting is kept.
     *
     * @param v mesh policy, not null
     * @return a copy with {@code mesh} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withMesh(MeshPolicy v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, v,
                quantumWindows, maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with other quantum windows; every other setting is kept.
     *
     * @param v where electrons are quantum, not null
     * @return a copy with {@code quantumWindows} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is null
     */
    public SolverOptions withQuantumWindows(QuantumWindows v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh, v,
                maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the subband budget; every other setting is kept.
     *
     * @param v most subbands kept per window, in [1, 2000]
     * @return a copy with {@code maxSubbands} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withMaxSubbands(int v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, v, subbandCutoffKT, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with another value of the subband cut-off; every other setting is kept.
     *
     * @param v subband cut-off above E_F in kT, in [1, 200]
     * @return a copy with {@code subbandCutoffKT} set to {@code v}
     * @throws org.wurtzkit.errors.InvalidParameterException if {@code v} is outside its range
     */
    public SolverOptions withSubbandCutoffKT(double v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, v, quasiFermiLevels, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with other quasi-Fermi level rules; every other setting is kept.
     *
     * @param v the quasi-Fermi level of each carrier in each region, not null
     * @return a copy with {@code quasiFermiLevels} set to {@code v}
     */
    public SolverOptions withQuasiFermiLevels(QuasiFermiLevels v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, v, quantumHoles, densityOfStatesMass);
    }

    /**
     * Returns a copy with quantum holes switched on or off; every other setting is kept.
     *
     * @param v whether holes in quantum windows come from hole subbands
     * @return a copy with {@code quantumHoles} set to {@code v}
     */
    public SolverOptions withQuantumHoles(boolean v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, quasiFermiLevels, v, densityOfStatesMass);
    }

    /**
     * Returns a copy with another 2D density-of-states mass rule; every other setting is kept.
     *
     * @param v which mass sets the 2D density of states
     * @return a copy with {@code densityOfStatesMass} set to {@code v}
     */
    public SolverOptions withDensityOfStatesMass(DensityOfStatesMass v) {
        return new SolverOptions(tolerance, maxIterations, newtonTolerance, maxNewtonIterations, maxNewtonStep, mesh,
                quantumWindows, maxSubbands, subbandCutoffKT, quasiFermiLevels, quantumHoles, v);
    }
    /**
     * Every option as ordered name/value text, for the provenance of a result: numbers written with
     * {@link Double#toString(double)} (which reads back to the same double), the mesh policy as its
     * three numbers, the quantum windows as {@code automatic <extension m>}, {@code none} or
     * {@code windows <top m> <bottom m>, ...}, the quasi-Fermi rules as {@code <carrier>|layer|<name>|<contact>} or
     * {@code <carrier>|depths|<top m>|<bottom m>|<contact>} joined by {@code ;} (contact {@code gate},
     * {@code channel} or {@code floating <eV>}; empty for the defaults), quantum holes as true or false.
     * {@link #fromSettings(Map)} reads it back to an equal record.
     *
     * @return the settings, in the order of the record's components
     */
    public Map<String, String> settings() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("tolerance", Double.toString(tolerance));
        m.put("maxIterations", Integer.toString(maxIterations));
        m.put("newtonTolerance", Double.toString(newtonTolerance));
        m.put("maxNewtonIterations", Integer.toString(maxNewtonIterations));
        m.put("maxNewtonStep", Double.toString(maxNewtonStep));
        m.put("mesh.interfaceSpacing", Double.toString(mesh.interfaceSpacing()));
        m.put("mesh.growthRatio", Double.toString(mesh.growthRatio()));
        m.put("mesh.maxSpacing", Double.toString(mesh.maxSpacing()));
        m.put("quantumWindows", quantumWindowsText(quantumWindows));
        m.put("maxSubbands", Integer.toString(maxSubbands));
        m.put("subbandCutoffKT", Double.toString(subbandCutoffKT));
        m.put("quasiFermiLevels", QuasiFermiLevelsText.write(quasiFermiLevels));
        m.put("quantumHoles", Boolean.toString(quantumHoles));
        m.put("densityOfStatesMass", densityOfStatesMass.name());
        return Collections.unmodifiableMap(m);
    }

    private static String quantumWindowsText(QuantumWindows q) {
        if (q instanceof QuantumWindows.Automatic a) {
            return "automatic " + Double.toString(a.extension());
        }
        if (q instanceof QuantumWindows.Explicit w) {
            StringBuilder sb = new StringBuilder("windows");
            for (int i = 0; i < w.windows().size(); i++) {
                QuantumWindows.Window x = w.windows().get(i);
                sb.append(i == 0 ? " " : ", ").append(Double.toString(x.depthTop())).append(' ')
                        .append(Double.toString(x.depthBottom()));
            }
            return sb.toString();
        }
        return "none";
    }

    /**
     * Reads the options back from {@link #settings()}, e.g. from a result's provenance.
     *
     * @param settings every name of {@link #settings()} with its text
     * @return the options, equal to those that wrote the settings
     * @throws InvalidParameterException naming the setting that is missing, unknown or unreadable
     */
    public static SolverOptions fromSettings(Map<String, String> settings) {
        Require.nonNull("solver settings", settings);
        Set<String> known = DEFAULTS.settings().keySet();
        for (String k : settings.keySet()) {
            if (!known.contains(k)) {
                throw new InvalidParameterException("solver setting name", k, "one of " + known);
            }
        }
        return new SolverOptions(real(settings, "tolerance"), integer(settings, "maxIterations"),
                real(settings, "newtonTolerance"), integer(settings, "maxNewtonIterations"),
                real(settings, "maxNewtonStep"),
                new MeshPolicy(real(settings, "mesh.interfaceSpacing"), real(settings, "mesh.growthRatio"),
                        real(settings, "mesh.maxSpacing")),
                quantumWindows(text(settings, "quantumWindows")), integer(settings, "maxSubbands"),
                real(settings, "subbandCutoffKT"), QuasiFermiLevelsText.read(text(settings, "quasiFermiLevels")),
                bool(settings, "quantumHoles"),
                densityOfStatesMass(text(settings, "densityOfStatesMass")));
    }

    private static String text(Map<String, String> m, String key) {
        String v = m.get(key);
        if (v == null) {
            throw new InvalidParameterException("solver setting \"" + key + "\"", "missing",
                    "present (every setting of SolverOptions.settings() is needed)");
        }
        return v.trim();
    }

    private static double real(Map<String, String> m, String key) {
        String v = text(m, key);
        try {
            return Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new InvalidParameterException("solver setting \"" + key + "\"", v, "a decimal number");
        }
    }

    private static int integer(Map<String, String> m, String key) {
        String v = text(m, key);
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new InvalidParameterException("solver setting \"" + key + "\"", v, "an integer");
        }
    }

    private static boolean bool(Map<String, String> m, String key) {
        String v = text(m, key);
        if (!"true".equals(v) && !"false".equals(v)) {
            throw new InvalidParameterException("solver setting \"" + key + "\"", v, "true or false");
        }
        return Boolean.parseBoolean(v);
    }

    private static DensityOfStatesMass densityOfStatesMass(String v) {
        for (DensityOfStatesMass m : DensityOfStatesMass.values()) {
            if (m.name().equals(v)) {
                return m;
            }
        }
        throw new InvalidParameterException("solver setting \"densityOfStatesMass\"", v,
                "one of " + java.util.Arrays.toString(DensityOfStatesMass.values()));
    }

    private static QuantumWindows quantumWindows(String v) {
        String allowed = "\"none\", \"automatic <extension m>\" or \"windows <top m> <bottom m>, ...\"";
        try {
            if ("none".equals(v)) {
                return QuantumWindows.none();
            }
            if (v.startsWith("automatic ")) {
                return new QuantumWindows.Automatic(Double.parseDouble(v.substring("automatic ".length()).trim()));
            }
            if (v.startsWith("windows ")) {
                List<QuantumWindows.Window> ws = new ArrayList<>();
                for (String part : v.substring("windows ".length()).split(",")) {
                    String[] tb = part.trim().split(" ");
                    if (tb.length != 2) {
                        throw new InvalidParameterException("solver setting \"quantumWindows\"", v, allowed);
                    }
                    ws.add(new QuantumWindows.Window(Double.parseDouble(tb[0]), Double.parseDouble(tb[1])));
                }
                return new QuantumWindows.Explicit(ws);
            }
        } catch (NumberFormatException e) {
            throw new InvalidParameterException("solver setting \"quantumWindows\"", v, allowed);
        }
        throw new InvalidParameterException("solver setting \"quantumWindows\"", v, allowed);
    }
}
