package org.wurtzkit.solvers.transport.mobility;

import java.util.Optional;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.units.Constants;

/**
 * Everything a {@link ScatteringMechanism} needs to know about one subband: its probability density
 * on the mesh, sheet density, in-plane mass, the channel material, the temperature, the screening
 * wave vector, the alloy disorder and the charges around it, and the quadrature of the elastic
 * golden-rule integral with the subband's screening form factor at every quadrature node.
 *
 * <p>Quadrature. An elastic momentum rate is (4 m/(pi hbar^3)) integral_0^1 u^2 |U(2 k_F u)|^2
 * du/sqrt(1 - u^2) (Ando, Fowler &amp; Stern, Rev. Mod. Phys. 54, 437 (1982), with u = sin(theta/2)).
 * With u = sin t the weight 1/sqrt(1 - u^2) disappears: integral_0^1 f(u) du/sqrt(1 - u^2) =
 * integral_0^{pi/2} f(sin t) dt, integrated by a composite Gauss-Legendre rule whose panels shrink
 * geometrically towards t = 0 (see {@link #rule}), so that both the smooth integrands and the sharply
 * decaying ones of distant charges converge. {@link #node(int)} is u_j = sin t_j and
 * {@link #weight(int)} the weight.
 *
 * <p>Form factors, computed from the numerical wavefunction in O(N) per wave vector, never as an
 * O(N^2) double sum. With rho_k = psi_k^2 w_k (w_k the box widths, so sum rho_k = 1) the screening form
 * factor G(q) = double integral psi^2(z) psi^2(z') exp(-q |z - z'|) (Ando, Fowler &amp; Stern 1982; for the
 * Fang-Howard function (2 eta^3 + 3 eta^2 + 3 eta)/8, eta = b/(b + q)) is evaluated for a density that is
 * uniform in each box: the pairs of different boxes through the running sum
 * S_k = S_{k-1} exp(-q (x_k - x_{k-1})) + rho_k s(q w_k), s(y) = sinh(y/2)/(y/2), and each box with
 * itself exactly; on a uniform mesh this is exact for piecewise-constant psi^2, so the error is that of
 * sampling psi^2, O(h^2). The Coulomb form factor of a charge at depth z, F(q, z) = sum_k rho_k
 * exp(-q |x_k - z|), comes for every node at once from one forward and one backward running sum.
 *
 * <p>Immutable once built; the mesh arrays are shared with the caller and must not be changed.
 */
public final class SubbandScattering {
    /** Default number of Gauss-Legendre nodes on [0, pi/2]. */
    public static final int DEFAULT_QUADRATURE_POINTS = 36;
    /** Trimmed tail: node weights psi^2 w below this fraction of the norm at the ends of the support. */
    private static final double TAIL = 1e-17;
    /** Gauss-Legendre nodes per panel of the graded rule. */
    static final int POINTS_PER_PANEL = 6;
    /** Beyond exp(-2 x 40) a charge's weight is below 1e-34 of a charge at the 2DEG: left out. */
    private static final double DECAY_CUTOFF = 40;
    private static final double[][] DEFAULT_RULE = rule(DEFAULT_QUADRATURE_POINTS);

    private final double temperatureK;
    private final ChannelParameters channel;
    private final double mass;
    private final double sheetDensity;
    private final double kF;
    private final double screening;
    private final double[] x;
    private final double[] w;
    private final int lo;
    private final int hi;
    private final double[] rho;
    private final double psi4;
    private final double alloyIntegral;
    private final double interfaceField;
    private final WurtziteMaterial interfaceBarrier;
    private final double interfaceBandStep;
    private final double interfaceDensity;
    private final double[] ionSheet;
    private final double surfaceSheet;
    private final double[] u;
    private final double[] weight;
    private final double[] g;
    /** exp(-q_j (x_{k+1} - x_k)) for the cells of the subband's support, per quadrature node. */
    private final double[][] windowDecay;

    /**
     * @param temperatureK      lattice temperature (K)
     * @param channel           material constants where the subband lives
     * @param massRelative      in-plane mass (m0)
     * @param sheetDensity      electrons in the subband (m^-2), &gt; 0
     * @param screening         screening wave vector q_s (1/m), &ge; 0
     * @param depth             mesh nodes (m), strictly increasing
     * @param psiSquared        |psi|^2 per node (1/m); normalised here to sum psi^2 w = 1 (must be within 1 %)
     * @param alloyStrength     per node Omega_0 sum x_i x_j U_ij^2 (J^2 m^3), or null for none
     * @param interfaceField    effective field at the rough interface (V/m), 0 if there is none
     * @param ionDensity        ionised impurities per node (m^-3, box-averaged), or null for none
     * @param surfaceSheet      charged surface states at the first node (m^-2, magnitude)
     * @param sheetDepths       depths of extra charge sheets (m)
     * @param sheetDensities    their densities (m^-2)
     * @param quadraturePoints  nodes of the graded rule, in [12, 1000], used in panels of 6
     */
    SubbandScattering(double temperatureK, ChannelParameters channel, double massRelative, double sheetDensity,
            double screening, double[] depth, double[] psiSquared, double[] alloyStrength, double interfaceField,
            double[] ionDensity, double surfaceSheet, int quadraturePoints) {
        this(temperatureK, channel, massRelative, sheetDensity, screening, depth, psiSquared, alloyStrength,
                interfaceField, null, ionDensity, surfaceSheet, quadraturePoints);
    }

    /**
     * As the constructor above, with the material on the far side of the rough interface.
     *
     * @param temperatureK      lattice temperature (K)
     * @param channel           material constants where the subband lives
     * @param massRelative      in-plane mass (m0)
     * @param sheetDensity      electrons in the subband (m^-2), &gt; 0
     * @param screening         screening wave vector q_s (1/m), &ge; 0
     * @param depth             mesh nodes (m), strictly increasing
     * @param psiSquared        |psi|^2 per node (1/m)
     * @param alloyStrength     per node Omega_0 sum x_i x_j U_ij^2 (J^2 m^3), or null for none
     * @param interfaceField    effective field at the rough interface (V/m), 0 if there is none
     * @param interfaceBarrier  material on the barrier side of the rough interface, or null if unknown
     * @param ionDensity        ionised impurities per node (m^-3, box-averaged), or null for none
     * @param surfaceSheet      charged surface states at the first node (m^-2, magnitude)
     * @param quadraturePoints  nodes of the graded rule, in [12, 1000], used in panels of 6
     */
    SubbandScattering(double temperatureK, ChannelParameters channel, double massRelative, double sheetDensity,
            double screening, double[] depth, double[] psiSquared, double[] alloyStrength, double interfaceField,
            WurtziteMaterial interfaceBarrier, double[] ionDensity, double surfaceSheet, int quadraturePoints) {
        this(temperatureK, channel, massRelative, sheetDensity, screening, depth, psiSquared, alloyStrength,
                interfaceField, interfaceBarrier, -1, 0, ionDensity, surfaceSheet, quadraturePoints);
    }

    /**
     * As the constructor above, with the node of the rough interface and the conduction-band step there
     * (for the band-step field term of {@link InterfaceRoughness}).
     *
     * @param temperatureK      lattice temperature (K)
     * @param channel           material constants where the subband lives
     * @param massRelative      in-plane mass (m0)
     * @param sheetDensity      electrons in the subband (m^-2), &gt; 0
     * @param screening         screening wave vector q_s (1/m), &ge; 0
     * @param depth             mesh nodes (m), strictly increasing
     * @param psiSquared        |psi|^2 per node (1/m)
     * @param alloyStrength     per node Omega_0 sum x_i x_j U_ij^2 (J^2 m^3), or null for none
     * @param interfaceField    effective field at the rough interface (V/m), 0 if there is none
     * @param interfaceBarrier  material on the barrier side of the rough interface, or null if unknown
     * @param interfaceNode     index of the node at the rough interface, -1 if there is none
     * @param interfaceBandStep conduction-band step across the rough interface (J, magnitude; 0 if none)
     * @param ionDensity        ionised impurities per node (m^-3, box-averaged), or null for none
     * @param surfaceSheet      charged surface states at the first node (m^-2, magnitude)
     * @param quadraturePoints  nodes of the graded rule, in [12, 1000], used in panels of 6
     */
    SubbandScattering(double temperatureK, ChannelParameters channel, double massRelative, double sheetDensity,
            double screening, double[] depth, double[] psiSquared, double[] alloyStrength, double interfaceField,
            WurtziteMaterial interfaceBarrier, int interfaceNode, double interfaceBandStep, double[] ionDensity,
            double surfaceSheet, int quadraturePoints) {
        this.interfaceBarrier = interfaceBarrier;
        this.interfaceBandStep = Math.abs(Require.finite("interface conduction-band step (J)", interfaceBandStep));
        if (interfaceNode < -1 || interfaceNode >= depth.length) {
            throw new InvalidParameterException("interface node", Integer.toString(interfaceNode),
                    "[-1, " + (depth.length - 1) + "]");
        }
        this.temperatureK = Require.positive("temperature (K)", temperatureK);
        this.channel = Require.nonNull("channel parameters", channel);
        this.mass = Require.positive("in-plane mass (m0)", massRelative) * Constants.ELECTRON_MASS;
        this.sheetDensity = Require.positive("subband sheet density (m^-2)", sheetDensity);
        this.kF = Math.sqrt(2 * Math.PI * sheetDensity);
        this.screening = Require.nonNegative("screening wave vector (1/m)", screening);
        this.interfaceField = Require.finite("interface field (V/m)", interfaceField);
        int n = depth.length;
        if (n < 3 || psiSquared.length != n) {
            throw new InvalidParameterException("wavefunction length", psiSquared.length + " for " + n + " nodes",
                    "equal to the node count, at least 3");
        }
        this.x = depth;
        this.w = boxes(depth);
        int first = -1;
        int last = -1;
        double norm = 0;
        for (int k = 0; k < n; k++) {
            double p = psiSquared[k];
            if (!(p >= 0) || !Double.isFinite(p)) {
                throw new InvalidParameterException("|psi|^2 at node " + k, Double.toString(p), "[0, +inf), finite");
            }
            if (p > 0) {
                last = k;
                if (first < 0) {
                    first = k;
                }
            }
            norm += p * w[k];
        }
        if (first < 0 || Math.abs(norm - 1) > 0.01) {
            throw new InvalidParameterException("norm of |psi|^2 (sum psi^2 w)", Double.toString(norm), "[0.99, 1.01]");
        }
        // trim the evanescent tails where psi^2 w < 1e-17 of the norm: together they hold under N 1e-17 of
        // the electron (1e-13 for 10^4 nodes), far below the accuracy of any rate here
        double tail = TAIL * norm;
        while (first < last && psiSquared[first] * w[first] < tail) {
            first++;
        }
        while (last > first && psiSquared[last] * w[last] < tail) {
            last--;
        }
        lo = first;
        hi = last;
        rho = new double[hi - lo + 1];
        double p4 = 0;
        double alloy = 0;
        for (int k = lo; k <= hi; k++) {
            double p = psiSquared[k] / norm;
            rho[k - lo] = p * w[k];
            p4 += p * p * w[k];
            if (alloyStrength != null) {
                alloy += nonNegative("alloy strength at node ", k, alloyStrength[k]) * p * p * w[k];
            }
        }
        psi4 = p4;
        alloyIntegral = alloy;
        interfaceDensity = interfaceNode < 0 ? 0 : psiSquared[interfaceNode] / norm;
        if (ionDensity != null) {
            ionSheet = new double[n];
            for (int k = 0; k < n; k++) {
                ionSheet[k] = nonNegative("ionised impurity density at node ", k, ionDensity[k]) * w[k];
            }
        } else {
            ionSheet = null;
        }
        this.surfaceSheet = Require.nonNegative("surface charge sheet (m^-2)", surfaceSheet);
        double[][] r = quadraturePoints == DEFAULT_QUADRATURE_POINTS ? DEFAULT_RULE
                : rule(Require.inRange("quadrature points", quadraturePoints, 12, 1000));
        u = r[0];
        weight = r[1];
        g = new double[u.length];
        windowDecay = new double[u.length][hi - lo];
        for (int j = 0; j < u.length; j++) {
            double q = 2 * kF * u[j];
            double[] d = windowDecay[j];
            double lastDx = -1;
            double e = 1;
            for (int k = lo; k < hi; k++) {
                // one exp per run of equal steps (the mesh is uniform inside layers)
                double dx = x[k + 1] - x[k];
                if (dx != lastDx) {
                    e = Math.exp(-q * dx);
                    lastDx = dx;
                }
                d[k - lo] = e;
            }
            g[j] = formFactor(q, d);
        }
    }

    /** Like Require.nonNegative, but builds the message only on failure (called once per node). */
    private static double nonNegative(String what, int node, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new InvalidParameterException(what + node, Double.toString(v), "[0, +inf), finite");
        }
        return v;
    }

    /**
     * Composite Gauss-Legendre rule on [0, pi/2] with geometrically graded panels towards t = 0:
     * [0, h], [h, 2h], [2h, 4h], ..., [pi/4, pi/2], h = (pi/2)/2^(P-1), POINTS_PER_PANEL nodes each. The
     * grading resolves integrands that live at small u, such as exp(-4 k_F d u) of a charge at distance d
     * (for d = 30 nm and k_F = 0.8 nm^-1 it falls by e over u = 0.01), which one Gauss rule on the whole
     * interval misses.
     */
    private static double[][] rule(int points) {
        int panels = Math.max(1, points / POINTS_PER_PANEL);
        int m = points / panels;
        int total = panels * m;
        GaussIntegrator gi = new GaussIntegratorFactory().legendre(m, 0, 1);
        double[][] r = new double[2][total];
        int j = 0;
        for (int p = 0; p < panels; p++) {
            double a = p == 0 ? 0 : Math.PI / 2 * Math.pow(2, p - panels);
            double b = Math.PI / 2 * Math.pow(2, p + 1 - panels);
            for (int i = 0; i < m; i++) {
                r[0][j] = Math.sin(a + (b - a) * gi.getPoint(i));
                r[1][j] = (b - a) * gi.getWeight(i);
                j++;
            }
        }
        return r;
    }

    /**
     * @param x node depths
     * @return box widths: half the two neighbouring cells, half a cell at the ends
     */
    static double[] boxes(double[] x) {
        int n = x.length;
        double[] w = new double[n];
        for (int k = 0; k + 1 < n; k++) {
            double h = x[k + 1] - x[k];
            if (!(h > 0)) {
                throw new InvalidParameterException("mesh step at node " + k + " (m)", Double.toString(h), "(0, +inf)");
            }
            w[k] += h / 2;
            w[k + 1] += h / 2;
        }
        return w;
    }

    /** @return lattice temperature (K) */
    public double temperatureK() {
        return temperatureK;
    }

    /** @return material constants of the layer holding the subband */
    public ChannelParameters channel() {
        return channel;
    }

    /** @return in-plane mass (kg) */
    public double mass() {
        return mass;
    }

    /** @return electrons in the subband (m^-2) */
    public double sheetDensity() {
        return sheetDensity;
    }

    /** @return Fermi wave vector sqrt(2 pi n) (1/m), spin 2, one valley */
    public double fermiWaveVector() {
        return kF;
    }

    /** @return screening wave vector q_s (1/m) */
    public double screeningWaveVector() {
        return screening;
    }

    /** @return static permittivity of the channel (F/m) */
    public double permittivity() {
        return Constants.VACUUM_PERMITTIVITY * channel.staticPermittivity();
    }

    /** @return number of quadrature nodes */
    public int quadratureSize() {
        return u.length;
    }

    /**
     * @param j node index
     * @return u_j = q_j/(2 k_F) in (0, 1)
     */
    public double node(int j) {
        return u[j];
    }

    /**
     * @param j node index
     * @return weight of integral_0^1 f(u) du/sqrt(1 - u^2) = sum_j weight_j f(u_j)
     */
    public double weight(int j) {
        return weight[j];
    }

    /**
     * @param j node index
     * @return screening form factor G(q_j) of this subband, q_j = 2 k_F u_j
     */
    public double formFactor(int j) {
        return g[j];
    }

    /**
     * The square of the static screening factor: |U_screened/U_bare|^2 = (u/(u + q_s G(q)/(2 k_F)))^2,
     * i.e. 1/epsilon(q)^2 with epsilon(q) = 1 + q_s G(q)/q (Ando, Fowler &amp; Stern 1982).
     *
     * @param j node index
     * @return the factor at q_j
     */
    public double screeningFactorSquared(int j) {
        double r = u[j] / (u[j] + screening * g[j] / (2 * kF));
        return r * r;
    }

    /**
     * @param q wave vector (1/m), &ge; 0
     * @return G(q) = double integral of psi^2(z) psi^2(z') exp(-q |z - z'|), in O(N)
     */
    public double formFactorAt(double q) {
        Require.nonNegative("wave vector (1/m)", q);
        double[] d = new double[hi - lo];
        for (int k = lo; k < hi; k++) {
            d[k - lo] = Math.exp(-q * (x[k + 1] - x[k]));
        }
        return formFactor(q, d);
    }

    /** G(q) with the cell decays of the support given. */
    private double formFactor(double q, double[] decay) {
        double s = 0;
        double off = 0;
        double diag = 0;
        for (int k = lo; k <= hi; k++) {
            if (k > lo) {
                s *= decay[k - lo - 1];
            }
            double a = q * w[k];
            double r = rho[k - lo];
            double rs = r * boxSpread(a);
            off += rs * s;
            s += rs;
            diag += r * r * selfOverlap(a);
        }
        return 2 * off + diag;
    }

    /*
     * Each node stands for a box of uniform density. Two different boxes j, k of a uniform mesh
     * interact with exp(-q d) times sinh(q w_j/2)/(q w_j/2) sinh(q w_k/2)/(q w_k/2) (exact), which
     * factorises, so the running sum carries rho_k sinh(q w_k/2)/(q w_k/2); the box with itself gives
     * the self overlap below.
     */

    /**
     * Mean of exp(-q |z - z'|) over two points of one box of width w, a = q w: 2 (a - 1 + exp(-a))/a^2
     * (exact for a uniform density in the box). Using it for the diagonal term instead of 1 removes the
     * O(q h) error of the kink of exp(-q |z - z'|) at z = z'.
     */
    private static double selfOverlap(double a) {
        if (a < 0.25) {
            // 2 sum_n (-a)^n/(n + 2)!, to a^7: truncation below 2e-11
            return 1 + a * (-1.0 / 3 + a * (1.0 / 12 + a * (-1.0 / 60 + a * (1.0 / 360 + a * (-1.0 / 2520
                    + a * (1.0 / 20160 - a / 181440))))));
        }
        return 2 * (a + Math.expm1(-a)) / (a * a);
    }

    /** sinh(a/2)/(a/2): the factor of a box of width w at wave vector q, a = q w. */
    private static double boxSpread(double a) {
        if (a < 0.25) {
            double a2 = a * a;
            // 1 + a^2/24 + a^4/1920 + a^6/322560: truncation below 1e-13
            return 1 + a2 * (1.0 / 24 + a2 * (1.0 / 1920 + a2 / 322560));
        }
        return Math.sinh(a / 2) / (a / 2);
    }

    /** @return integral of psi^4 dz (1/m) */
    public double psiFourthIntegral() {
        return psi4;
    }

    /** @return integral of Omega_0 sum x_i x_j U_ij^2 psi^4 dz (J^2 m^2) */
    public double alloyIntegral() {
        return alloyIntegral;
    }

    /** @return the effective field at the rough interface (V/m); 0 if the subband has none */
    public double interfaceField() {
        return interfaceField;
    }

    /**
     * @return the magnitude of the conduction-band step across the rough interface (J); 0 if the subband
     *         has no interface or the caller did not give it
     */
    public double interfaceBandStep() {
        return interfaceBandStep;
    }

    /** @return |psi|^2 at the rough interface (1/m, normalised to 1 over the mesh); 0 if there is none */
    public double interfaceDensity() {
        return interfaceDensity;
    }

    /**
     * @return the material on the barrier side of the rough interface (e.g. an AlN interlayer or the
     *         AlGaN barrier), empty if the subband has no interface or the caller did not say
     */
    public Optional<WurtziteMaterial> interfaceBarrier() {
        return Optional.ofNullable(interfaceBarrier);
    }

    /**
     * The weighted Coulomb form factors of charges at every quadrature node:
     * C_j = sum over charges of N |F(q_j, z)|^2, with N the sheet density of a charge sheet or N(z) w of a
     * node's box, F(q, z) = integral psi^2 exp(-q |z' - z|) dz' (Ando, Fowler &amp; Stern 1982). O(N) per
     * node and sheet.
     *
     * @param ions           include the ionised impurities of the solution (every node)
     * @param surface        include the charged surface states of the solution (at the first node)
     * @param sheetDepths    depths of further charge sheets (m)
     * @param sheetDensities their densities (m^-2, magnitude)
     * @return C_j (m^-2) for every quadrature node
     */
    public double[] coulombFactors(boolean ions, boolean surface, double[] sheetDepths, double[] sheetDensities) {
        if (sheetDepths.length != sheetDensities.length) {
            throw new InvalidParameterException("number of sheet densities", Integer.toString(sheetDensities.length),
                    "equal to the number of sheet depths, " + sheetDepths.length);
        }
        double[] ionSheet = ions ? this.ionSheet : null;
        int ns = sheetDepths.length + (surface && surfaceSheet > 0 ? 1 : 0);
        double[] sheetDepth = new double[ns];
        double[] sheetDensityOf = new double[ns];
        System.arraycopy(sheetDepths, 0, sheetDepth, 0, sheetDepths.length);
        System.arraycopy(sheetDensities, 0, sheetDensityOf, 0, sheetDensities.length);
        if (ns > sheetDepths.length) {
            sheetDepth[ns - 1] = x[0];
            sheetDensityOf[ns - 1] = surfaceSheet;
        }
        int n = x.length;
        int nw = hi - lo + 1;
        double[] left = new double[nw];
        double[] out = new double[u.length];
        double floor = Math.exp(-DECAY_CUTOFF);
        for (int j = 0; j < u.length; j++) {
            double q = 2 * kF * u[j];
            double[] decay = windowDecay[j];
            double c = 0;
            // forward: left[k] = sum_{i <= k} rho_i exp(-q (x_k - x_i))
            double s = 0;
            for (int k = lo; k <= hi; k++) {
                if (k > lo) {
                    s *= decay[k - lo - 1];
                }
                s += rho[k - lo];
                left[k - lo] = s;
            }
            double belowF = s;
            // backward: right = sum_{i >= k} rho_i exp(-q (x_i - x_k)); F_k = left + right - rho_k
            double r = 0;
            for (int k = hi; k >= lo; k--) {
                if (k < hi) {
                    r *= decay[k - lo];
                }
                r += rho[k - lo];
                if (ionSheet != null && ionSheet[k] > 0) {
                    double f = left[k - lo] + r - rho[k - lo];
                    c += ionSheet[k] * f * f;
                }
            }
            double aboveF = r;
            if (ionSheet != null) {
                // outside the support F decays by exp(-q dx) per cell; stop below exp(-40) of its edge value
                double f = aboveF;
                for (int k = lo - 1; k >= 0 && f > aboveF * floor; k--) {
                    f *= Math.exp(-q * (x[k + 1] - x[k]));
                    c += ionSheet[k] * f * f;
                }
                f = belowF;
                for (int k = hi + 1; k < n && f > belowF * floor; k++) {
                    f *= Math.exp(-q * (x[k] - x[k - 1]));
                    c += ionSheet[k] * f * f;
                }
            }
            for (int i = 0; i < sheetDepth.length; i++) {
                double f = 0;
                for (int k = lo; k <= hi; k++) {
                    f += rho[k - lo] * Math.exp(-q * Math.abs(x[k] - sheetDepth[i]));
                }
                c += sheetDensityOf[i] * f * f;
            }
            out[j] = c;
        }
        return out;
    }
}
