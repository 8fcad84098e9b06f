package org.wurtzkit.solvers.transport.mobility;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.AlloyScattering;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.solvers.workflow.TemperatureSweepResult;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.units.Constants;
import org.wurtzkit.warnings.Warning;
import org.wurtzkit.warnings.WarningKind;

/**
 * The in-plane mobility and sheet resistance of the 2DEG of a converged solution, from the momentum
 * relaxation rates of {@link MobilityOptions#mechanisms()} in every subband (see the package
 * description for the multi-subband treatment).
 *
 * <p>What is taken from the solution: each subband's wavefunction, sheet density, energy and in-plane
 * mass; the layer under each mesh cell (for the alloy disorder, Omega_0 = (sqrt 3/4) a^2 c times
 * x_i x_j U_ij^2 of the parameter set, box-weighted at interface nodes); the material at the peak of
 * each subband (its {@link ChannelParameters}, unless the options override them); the interface nearest
 * that peak and the mean field over the subband on the peak's side of it (interface roughness); the ionised
 * donors and acceptors and the charged surface states (remote charge); the lattice temperature of the
 * structure.
 *
 * <p>Cost: O(N M) per subband and mechanism that needs form factors (N nodes of the subband's window,
 * M quadrature nodes), no N x N work; the remote-charge factor runs over the whole mesh once per
 * quadrature node. Stateless and thread-safe.
 */
public final class Mobility {
    /** Lowest temperature of the model (K): below it equipartition of acoustic phonons fails outright. */
    public static final double MIN_TEMPERATURE_K = 40;
    /** Highest temperature of the model (K): the material constants have no temperature dependence. */
    public static final double MAX_TEMPERATURE_K = 800;

    private Mobility() {
    }

    /**
     * @param solution a converged solution with at least one occupied subband
     * @param options  mechanisms and models
     * @return mobilities, sheet resistance and warnings
     * @throws InvalidParameterException if the temperature is outside [40, 800] K or the solution has
     *                                   no occupied subband
     */
    public static MobilityResult of(Solution solution, MobilityOptions options) {
        Require.nonNull("solution", solution);
        Require.nonNull("mobility options", options);
        Structure st = solution.structure();
        double t = Require.inRange("temperature of the solution (K)", st.temperatureK(), MIN_TEMPERATURE_K,
                MAX_TEMPERATURE_K);
        double[] x = solution.depth();
        int n = x.length;
        double[] w = SubbandScattering.boxes(x);
        Set<Warning> warnings = new LinkedHashSet<>();

        // per cell: the material of the layer holding it
        WurtziteMaterial[] cellMaterial = new WurtziteMaterial[n - 1];
        List<LayerState> states = st.layerStates();
        int li = 0;
        for (int k = 0; k < n - 1; k++) {
            double mid = 0.5 * (x[k] + x[k + 1]);
            while (li < states.size() - 1 && mid > states.get(li).depthBottom()) {
                li++;
            }
            LayerState s = states.get(li);
            cellMaterial[k] = s.layer().material().isGraded() ? st.pointAt(mid).material() : s.top().material();
        }
        // alloy strength per node, box-weighted over its two half cells
        AlloyScattering potentials = st.parameters().alloyScattering();
        double[] cellAlloy = new double[n - 1];
        Map<WurtziteMaterial, Double> strength = new IdentityHashMap<>();
        for (int k = 0; k < n - 1; k++) {
            WurtziteMaterial m = cellMaterial[k];
            Double v = strength.get(m);
            if (v == null) {
                Composition c = m.composition();
                if (c == null) {
                    warnings.add(new Warning(WarningKind.ELECTRONS_LEFT_OUT, "alloy disorder: material '" + m.name()
                            + "' declares no composition; its alloy scattering is taken as 0"));
                    v = 0.0;
                } else {
                    double omega = Math.sqrt(3) / 4 * m.latticeA() * m.latticeA() * m.latticeC();
                    v = omega * potentials.disorderEv2(c) * Constants.ELEMENTARY_CHARGE * Constants.ELEMENTARY_CHARGE;
                }
                strength.put(m, v);
            }
            cellAlloy[k] = v;
        }
        double[] alloy = new double[n];
        for (int k = 0; k < n; k++) {
            double hl = k > 0 ? x[k] - x[k - 1] : 0;
            double hr = k < n - 1 ? x[k + 1] - x[k] : 0;
            double al = k > 0 ? cellAlloy[k - 1] : 0;
            double ar = k < n - 1 ? cellAlloy[k] : 0;
            alloy[k] = (hl * al + hr * ar) / (hl + hr);
        }
        // charged centres
        double[] nd = solution.ionizedDonors();
        double[] na = solution.ionizedAcceptors();
        double[] ions = new double[n];
        for (int k = 0; k < n; k++) {
            ions[k] = nd[k] + na[k];
        }
        double[] ne = solution.electronDensity();
        double[] p = solution.holeDensity();
        double[] rhoFree = solution.chargeDensity();
        double surface = Math.abs((rhoFree[0] / Constants.ELEMENTARY_CHARGE - nd[0] + na[0] + ne[0] - p[0]) * w[0]);
        double[] field = solution.electricField();
        double[] interfaces = st.interfaceDepths();

        double all = 0;
        for (Subband b : solution.subbands()) {
            all += Math.max(0, b.sheetDensity());
        }
        List<Subband> bands = new ArrayList<>();
        double total = 0;
        double excluded = 0;
        for (Subband b : solution.subbands()) {
            if (b.sheetDensity() > 0 && b.sheetDensity() >= options.minimumSubbandFraction() * all) {
                bands.add(b);
                total += b.sheetDensity();
            } else {
                excluded += Math.max(0, b.sheetDensity());
            }
        }
        if (excluded > 0.005 * all) {
            warnings.add(new Warning(WarningKind.ELECTRONS_LEFT_OUT, String.format(Locale.ROOT, "%.2f %% of the "
                    + "subband electrons sit in subbands below the minimum fraction %.3g and are left out of the "
                    + "mobility", 100 * excluded / all, options.minimumSubbandFraction())));
        }
        if (bands.isEmpty()) {
            throw new InvalidParameterException("occupied subbands of the solution", "0",
                    "[1, ...): solve with a quantum window around the channel");
        }
        if (solution.subbandLimitReached()) {
            warnings.add(new Warning(WarningKind.SUBBAND_LIMIT_REACHED,
                    "the solution reached its subband limit: some electrons are missing from the subbands"));
        }
        double kt = Constants.BOLTZMANN * t;
        double hbar2 = Constants.HBAR * Constants.HBAR;

        // geometry and material of every subband
        int nb = bands.size();
        int[] peak = new int[nb];
        ChannelParameters[] chan = new ChannelParameters[nb];
        Map<WurtziteMaterial, ChannelParameters> chanOf = new IdentityHashMap<>();
        double dnde = 0;
        for (int i = 0; i < nb; i++) {
            Subband b = bands.get(i);
            double[] psi = b.wavefunction();
            int pk = 0;
            for (int k = 1; k < n; k++) {
                if (psi[k] * psi[k] > psi[pk] * psi[pk]) {
                    pk = k;
                }
            }
            peak[i] = pk;
            WurtziteMaterial m = cellMaterial[Math.min(pk, n - 2)];
            chan[i] = options.channel() != null ? options.channel() : chanOf.computeIfAbsent(m, ChannelParameters::of);
            double mass = b.inPlaneMass() * Constants.ELECTRON_MASS;
            double dos = mass / (Math.PI * hbar2);
            switch (options.screening()) {
                case NONE -> { }
                case THOMAS_FERMI_DEGENERATE -> dnde += b.energyEv() < 0 ? dos : 0;
                case THOMAS_FERMI -> dnde += dos * -Math.expm1(-b.sheetDensity() / (dos * kt));
            }
            double gap = -b.energyEv() * Constants.ELEMENTARY_CHARGE;
            if (gap < 2 * kt && b.sheetDensity() > 0.01 * total) {
                warnings.add(new Warning(WarningKind.SCATTERING_MODEL_OUT_OF_VALIDITY, String.format(Locale.ROOT,
                        "subband %d of window %d holds %.0f %% of the electrons but E_F - E_i = %.1f meV < 2 k_B T: "
                        + "its rates use degenerate (Fermi-surface) formulas", b.index(), b.window(),
                        100 * b.sheetDensity() / total, -b.energyEv() * 1e3)));
            }
        }
        double epsGround = Constants.VACUUM_PERMITTIVITY * chan[0].staticPermittivity();
        double qs = Constants.ELEMENTARY_CHARGE * Constants.ELEMENTARY_CHARGE / (2 * epsGround) * dnde;
        if (options.screening() == Screening.THOMAS_FERMI_DEGENERATE && dnde == 0) {
            warnings.add(new Warning(WarningKind.SCREENING_ABSENT,
                    "degenerate screening: no subband lies below the Fermi level; the rates are unscreened"));
        }

        List<ScatteringMechanism> mechs = options.mechanisms();
        List<String> names = new ArrayList<>();
        for (ScatteringMechanism m : mechs) {
            names.add(m.name());
        }
        double[][] rate = new double[nb][mechs.size()];
        double[] dens = new double[nb];
        double[] mass = new double[nb];
        int[] win = new int[nb];
        int[] idx = new int[nb];
        double[] psi2 = new double[n];
        for (int i = 0; i < nb; i++) {
            Subband b = bands.get(i);
            double[] psi = b.wavefunction();
            for (int k = 0; k < n; k++) {
                psi2[k] = psi[k] * psi[k];
            }
            // the rough interface: the one nearest the subband's peak (above it for a metal-face channel,
            // below it for an N-face one); the field is averaged on the peak's side
            double iface = -1;
            int ifaceIndex = -1;
            double xp = x[peak[i]];
            for (int j = 0; j < interfaces.length; j++) {
                double d = interfaces[j];
                if (iface < 0 || Math.abs(d - xp) < Math.abs(iface - xp)) {
                    iface = d;
                    ifaceIndex = j;
                }
            }
            boolean below = iface >= 0 && xp >= iface;
            double fieldEff = 0;
            if (iface >= 0) {
                double num = 0;
                double den = 0;
                for (int k = 0; k < n - 1; k++) {
                    if (below ? x[k] >= iface : x[k + 1] <= iface) {
                        double pm = 0.5 * (psi2[k] + psi2[k + 1]) * (x[k + 1] - x[k]);
                        num += pm * field[k];
                        den += pm;
                    }
                }
                fieldEff = den > 0 ? Math.abs(num / den) : 0;
            }
            // the material on the barrier side of the rough interface: the cell just across it from the peak
            WurtziteMaterial barrier = null;
            if (iface >= 0) {
                int c = 0;
                while (c < n - 2 && x[c + 1] <= iface) {
                    c++;
                }
                // cell c is the first whose bottom lies below the interface: the cell just under it
                barrier = below ? (c > 0 ? cellMaterial[c - 1] : null) : cellMaterial[c];
            }
            // the node at the rough interface and the conduction-band step across it (band-step field term)
            int ifaceNode = -1;
            double step = 0;
            if (iface >= 0) {
                ifaceNode = 0;
                for (int k = 1; k < n; k++) {
                    if (Math.abs(x[k] - iface) < Math.abs(x[ifaceNode] - iface)) {
                        ifaceNode = k;
                    }
                }
                step = solution.interfaceEdges().get(ifaceIndex).conductionStepEv() * Constants.ELEMENTARY_CHARGE;
            }
            SubbandScattering s = new SubbandScattering(t, chan[i], b.inPlaneMass(), b.sheetDensity(), qs, x, psi2,
                    alloy, fieldEff, barrier, ifaceNode, step, ions, surface, options.quadraturePoints());
            for (int k = 0; k < mechs.size(); k++) {
                ScatteringMechanism m = mechs.get(k);
                double r = m.momentumRelaxationRate(s);
                if (!(r >= 0) || !Double.isFinite(r)) {
                    throw new IllegalStateException("mechanism '" + m.name() + "' returned the rate " + r
                            + " 1/s for subband " + b.index() + " of window " + b.window() + "; a rate must be finite"
                            + " and >= 0");
                }
                rate[i][k] = r;
                m.typedWarning(s).ifPresent(warnings::add);
            }
            dens[i] = b.sheetDensity();
            mass[i] = b.inPlaneMass() * Constants.ELECTRON_MASS;
            win[i] = b.window();
            idx[i] = b.index();
        }
        return new MobilityResult(t, names, dens, mass, win, idx, rate, excluded, new ArrayList<>(warnings),
                solution::provenance, options.toString());
    }

    /**
     * The mobility against temperature: one result per converged point of a temperature sweep (the
     * structure re-solved at each temperature, e.g. by
     * {@link org.wurtzkit.solvers.workflow.TemperatureSweep}).
     *
     * @param sweep   a temperature sweep
     * @param options mechanisms and models
     * @return one result per converged point, in the order of the sweep; failed points are left out
     *         (the sweep lists them)
     * @throws InvalidParameterException if a converged point lies outside [40, 800] K
     */
    public static List<MobilityResult> versusTemperature(TemperatureSweepResult sweep, MobilityOptions options) {
        Require.nonNull("temperature sweep", sweep);
        List<MobilityResult> out = new ArrayList<>();
        java.util.function.Supplier<org.wurtzkit.provenance.ResultProvenance> source = () -> sweep.provenance()
                .orElseThrow();
        for (int i = 0; i < sweep.size(); i++) {
            Optional<Solution> s = sweep.solution(i);
            if (s.isPresent()) {
                out.add(of(s.get(), options).withSource(source));
            }
        }
        return List.copyOf(out);
    }
}
