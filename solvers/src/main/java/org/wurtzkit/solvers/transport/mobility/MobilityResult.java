package org.wurtzkit.solvers.transport.mobility;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.units.Constants;
import org.wurtzkit.warnings.Warning;

/**
 * Mobility and sheet resistance of a 2DEG: rates per subband and mechanism, mobilities by
 * Matthiessen's rule per subband, the total as the n_i-weighted mean (parallel conduction), and the
 * warnings of the models used. Immutable. SI accessors, and cm^2/(V s) ones named so.
 *
 * <p>Definitions: mu_i = e/(m_i sum_k 1/tau_ik) (Matthiessen's rule on the rates);
 * mu = sum n_i mu_i/sum n_i; R_sh = 1/(e sum n_i mu_i); the mobility limited by one mechanism k is
 * sum n_i mu_ik/sum n_i with mu_ik = e/(m_i/tau_ik).
 */
public final class MobilityResult {
    private final double temperatureK;
    private final List<String> mechanisms;
    private final double[] density;
    private final double[] mass;
    private final int[] subbandIndex;
    private final int[] window;
    private final double[][] rate;
    private final List<Warning> warnings;
    private final double excluded;
    private final Supplier<ResultProvenance> source;
    private final String options;

    /**
     * @param source   the provenance of what the mobility was computed from (a solution, or the
     *                 temperature sweep that holds it)
     * @param options  the mobility options as text
     */
    MobilityResult(double temperatureK, List<String> mechanisms, double[] density, double[] mass, int[] window,
            int[] subbandIndex, double[][] rate, double excluded, List<Warning> warnings,
            Supplier<ResultProvenance> source, String options) {
        this.source = source;
        this.options = options;
        this.excluded = excluded;
        this.temperatureK = temperatureK;
        this.mechanisms = List.copyOf(mechanisms);
        this.density = density.clone();
        this.mass = mass.clone();
        this.window = window.clone();
        this.subbandIndex = subbandIndex.clone();
        this.rate = new double[rate.length][];
        for (int i = 0; i < rate.length; i++) {
            this.rate[i] = rate[i].clone();
        }
        this.warnings = List.copyOf(warnings);
    }

    /** @return the lattice temperature of the solution (K) */
    public double temperatureK() {
        return temperatureK;
    }

    /** @return the names of the mechanisms, in the order of the options */
    public List<String> mechanisms() {
        return mechanisms;
    }

    /** @return number of subbands that conduct */
    public int subbandCount() {
        return density.length;
    }

    /**
     * @param i subband (0 to {@link #subbandCount()} - 1)
     * @return its window in the solution
     */
    public int window(int i) {
        return window[check(i)];
    }

    /**
     * @param i subband
     * @return its index within its window (0 = ground)
     */
    public int subbandIndex(int i) {
        return subbandIndex[check(i)];
    }

    /**
     * @param i subband
     * @return its sheet density (m^-2)
     */
    public double sheetDensity(int i) {
        return density[check(i)];
    }

    /** @return all conducting electrons (m^-2) */
    public double sheetDensity() {
        double s = 0;
        for (double v : density) {
            s += v;
        }
        return s;
    }

    /**
     * @return electrons of the subbands left out by {@link MobilityOptions#minimumSubbandFraction()} (m^-2);
     *         they are not in {@link #sheetDensity()} and do not conduct in {@link #sheetResistanceOhmPerSquare()}
     */
    public double excludedSheetDensity() {
        return excluded;
    }

    /** @return all conducting electrons (cm^-2) */
    public double sheetDensityPerCm2() {
        return sheetDensity() * 1e-4;
    }

    /**
     * @param i         subband
     * @param mechanism a name of {@link #mechanisms()}
     * @return its momentum relaxation rate 1/tau (1/s)
     */
    public double rate(int i, String mechanism) {
        return rate[check(i)][index(mechanism)];
    }

    /**
     * @param i subband
     * @return Matthiessen mobility e/(m_i sum_k 1/tau_ik) (m^2/(V s)); +infinity if no rate is positive
     */
    public double subbandMobility(int i) {
        check(i);
        double s = 0;
        for (double r : rate[i]) {
            s += r;
        }
        return Constants.ELEMENTARY_CHARGE / (mass[i] * s);
    }

    /**
     * @param i         subband
     * @param mechanism a mechanism name
     * @return mobility of subband i limited by that mechanism alone (m^2/(V s))
     */
    public double subbandMobility(int i, String mechanism) {
        return Constants.ELEMENTARY_CHARGE / (mass[check(i)] * rate[i][index(mechanism)]);
    }

    /** @return the total mobility sum n_i mu_i/sum n_i (m^2/(V s)) */
    public double mobility() {
        double s = 0;
        for (int i = 0; i < density.length; i++) {
            s += density[i] * subbandMobility(i);
        }
        return s / sheetDensity();
    }

    /** @return the total mobility (cm^2/(V s)) */
    public double mobilityCm2PerVs() {
        return mobility() * 1e4;
    }

    /**
     * @param mechanism a mechanism name
     * @return the mobility limited by that mechanism alone, n_i-weighted (m^2/(V s))
     */
    public double mobility(String mechanism) {
        int k = index(mechanism);
        double s = 0;
        for (int i = 0; i < density.length; i++) {
            s += density[i] * Constants.ELEMENTARY_CHARGE / (mass[i] * rate[i][k]);
        }
        return s / sheetDensity();
    }

    /**
     * @param mechanism a mechanism name
     * @return the same in cm^2/(V s)
     */
    public double mobilityCm2PerVs(String mechanism) {
        return mobility(mechanism) * 1e4;
    }

    /** @return sheet resistance 1/(e sum n_i mu_i) (ohm per square) */
    public double sheetResistanceOhmPerSquare() {
        double g = 0;
        for (int i = 0; i < density.length; i++) {
            g += Constants.ELEMENTARY_CHARGE * density[i] * subbandMobility(i);
        }
        return 1 / g;
    }

    /**
     * The warnings of the models used, typed: {@link org.wurtzkit.warnings.WarningKind#PARAMETER_OUTSIDE_MEASURED_RANGE}
     * (interface roughness fitted at AlGaN/GaN applied at a binary barrier),
     * {@link org.wurtzkit.warnings.WarningKind#SCATTERING_MODEL_OUT_OF_VALIDITY}
     * (a mechanism's own warning, or a subband too close to the Fermi level for the degenerate
     * formulas), {@link org.wurtzkit.warnings.WarningKind#ELECTRONS_LEFT_OUT},
     * {@link org.wurtzkit.warnings.WarningKind#SUBBAND_LIMIT_REACHED} and
     * {@link org.wurtzkit.warnings.WarningKind#SCREENING_ABSENT}.
     *
     * @return the warnings, without duplicates; empty when none applies
     */
    public List<Warning> warnings() {
        return warnings;
    }

    /**
     * @param newSource the provenance of what this result was computed from
     * @return this result with that source
     */
    MobilityResult withSource(Supplier<ResultProvenance> newSource) {
        return new MobilityResult(temperatureK, mechanisms, density, mass, window, subbandIndex, rate, excluded,
                warnings, newSource, options);
    }

    /** {@return the mobility options as text} */
    String optionsText() {
        return options;
    }

    /** {@return the source supplier, to tell results of one source apart} */
    Supplier<ResultProvenance> source() {
        return source;
    }

    /**
     * What produced this mobility: the provenance of what it was computed from (the solution of
     * {@link Mobility#of}, or the temperature sweep of {@link Mobility#versusTemperature}), with the
     * run's {@code computation} set to "mobility", that source's run kept under keys prefixed
     * {@code source.}, the mobility options as {@code mobilityOptions} (their record text), and the
     * source's warnings followed by this result's.
     *
     * @return the provenance
     */
    public ResultProvenance provenance() {
        return provenance("mobility", List.of(this));
    }

    /**
     * @param computation what the run computed
     * @param results     the results whose warnings are added
     * @return the provenance of the source, extended
     */
    static ResultProvenance provenance(String computation, List<MobilityResult> results) {
        MobilityResult first = results.get(0);
        ResultProvenance p = first.source.get();
        Map<String, String> run = new LinkedHashMap<>();
        run.put("computation", computation);
        p.run().forEach((k, v) -> run.put("source." + k, v));
        run.put("mobilityOptions", first.options);
        List<String> w = new ArrayList<>(p.warnings());
        for (MobilityResult r : results) {
            for (Warning x : r.warnings) {
                String line = (results.size() == 1 ? "" : "at T = " + r.temperatureK + " K: ") + x;
                if (!w.contains(line)) {
                    w.add(line);
                }
            }
        }
        return new ResultProvenance(p.libraryVersion(), p.structure(), p.parameterSetName(), p.parameterSetSha256(),
                p.solverOptions(), run, w);
    }

    private int check(int i) {
        if (i < 0 || i >= density.length) {
            throw new InvalidParameterException("subband", Integer.toString(i), "[0, " + (density.length - 1) + "]");
        }
        return i;
    }

    private int index(String mechanism) {
        int k = mechanisms.indexOf(mechanism);
        if (k < 0) {
            throw new InvalidParameterException("mechanism", String.valueOf(mechanism), mechanisms.toString());
        }
        return k;
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "MobilityResult[T = %.0f K, n_s = %.3g cm^-2, mu = %.0f cm^2/Vs,"
                + " R_sh = %.0f ohm/sq, %d subbands, %d warnings]", temperatureK, sheetDensityPerCm2(),
                mobilityCm2PerVs(), sheetResistanceOhmPerSquare(), density.length, warnings.size())
                + Warning.lines(warnings);
    }
}
