package org.wurtzkit.solvers.statistics;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * Complete Fermi-Dirac integrals used for carrier statistics, in Blakemore's normalisation
 * (J. S. Blakemore, "Approximations for Fermi-Dirac integrals, especially the function
 * F_1/2(eta) used to describe electron density in a semiconductor", Solid-State Electron. 25,
 * 1067 (1982)):
 *
 * <pre>
 *   F_j(eta) = 1/Gamma(j+1) * int_0^inf t^j / (1 + exp(t - eta)) dt,
 * </pre>
 *
 * so that F_j(eta) tends to exp(eta) for eta to -infinity and dF_j/deta = F_(j-1) for every j.
 *
 * <h2>Method</h2>
 *
 * {@link #f12(double)} and {@link #fm12(double)} evaluate the piecewise minimax rational
 * approximations of T. Fukushima, "Precise and fast computation of Fermi-Dirac integral of integer
 * and half integer order by piecewise minimax rational approximation", Appl. Math. Comput. 259,
 * 708-729 (2015), which cover the whole real line with eight pieces (eta &lt; -2, [-2, 0), [0, 2),
 * [2, 5), [5, 10), [10, 20), [20, 40) and eta &ge; 40, the last one a rational correction to the
 * leading Sommerfeld term). Fukushima reports double-precision accuracy for them (from memory; the
 * measurement below confirms it). His functions
 * return the integral without the 1/Gamma(j+1) factor (as H. M. Antia, Astrophys. J. Suppl. Ser.
 * 84, 101 (1993) does as well); here the result is multiplied by 1/Gamma(3/2) = 2/sqrt(pi) or
 * 1/Gamma(1/2) = 1/sqrt(pi) to obtain Blakemore's normalisation.
 *
 * <p>Provenance of the coefficients: they were transcribed from Fukushima's double-precision
 * Fortran routines {@code fd1h} (order 1/2) and {@code fdm1h} (order -1/2), as reproduced in the
 * public file {@code fdint/fd.f90} of the repository
 * scott-maddox/fdint (commit 23975670b7368aeddd303d35d50727227ee36547, which names Fukushima as
 * co-author), and compared with a second public transcription,
 * {@code src/fermi_integrals/nonrel_FD.cpp} of RelNucAs/MuEOSLibrary (commit
 * 0556c67ae7dd3ddb597a489ac03e9fe25812da9c). Against 40-digit polylogarithm values the
 * implementation below was measured at no worse than 6.1e-16 relative error for both orders over
 * -700 &le; eta &le; 1e6. Antia's 1993 tables were considered first; his k = -1/2 approximation
 * (as transcribed in public code) was measured at 2.8e-12 relative error, above the 1e-12 target,
 * so Fukushima's approximation is used for both orders.
 *
 * <p>{@link #f12Inverse(double)} inverts F_1/2 with the Joyce-Dixon series as a seed (W. B. Joyce
 * and R. W. Dixon, Appl. Phys. Lett. 31, 354 (1977)) and Newton steps using F_-1/2.
 *
 * <p>{@link #log1pExp(double)} is F_0(eta) = ln(1 + e^eta) (closed form of the order-0 integral,
 * used for the occupation of a 2D subband, T. Ando, A. B. Fowler, F. Stern, Rev. Mod. Phys. 54, 437
 * (1982)) and {@link #logistic(double)} is its derivative F_-1(eta) = 1 / (1 + e^-eta).
 *
 * <p>All methods are allocation-free. {@link #f12}, {@link #fm12}, {@link #log1pExp} and
 * {@link #logistic} cost at most one exp, one sqrt and one rational function, are meant to be called
 * per mesh node in every Newton iteration, and check their argument only for NaN.
 */
public final class FermiDirac {

    private FermiDirac() {
    }

    /** 1/Gamma(3/2) = 2/sqrt(pi). */
    private static final double TWO_OVER_SQRT_PI = 1.1283791670955126;
    /** 1/Gamma(1/2) = 1/sqrt(pi). */
    private static final double ONE_OVER_SQRT_PI = 0.5641895835477563;
    /** Gamma(3/2) = sqrt(pi)/2, Fukushima's leading constant of the eta &lt; -2 piece, order 1/2. */
    private static final double GAMMA_3_2 = 0.886226925452758014;
    /** Gamma(1/2) = sqrt(pi), Fukushima's leading constant of the eta &lt; -2 piece, order -1/2. */
    private static final double GAMMA_1_2 = 1.77245385090551603;
    /** e^2: on eta &lt; -2 Fukushima's rational variable is e^(eta+2). */
    private static final double E_SQUARED = 7.38905609893065023;

    // ---------------------------------------------------------------------------------------
    // Fukushima (2015), order 1/2 (routine fd1h). Polynomials are stored in ascending powers.
    // ---------------------------------------------------------------------------------------

    /** eta &lt; -2: F = e^eta (Gamma(3/2) - e^eta P(t)/Q(t)), t = e^(eta+2). */
    private static final double[] H_A_NUM = {
        19894.4553386951666, 4509.64329955948557, 303.461789035142376, 5.7574879114754736,
        0.00275088986849762610};
    private static final double[] H_A_DEN = {
        63493.915041308052, 19070.1178243603945, 1962.19362141235102, 79.250704958640158, 1.0};

    /** -2 &le; eta &lt; 0: F = P(1 - s)/Q(s), s = -eta/2. */
    private static final double[] H_B_NUM = {
        149.462587768865243, 22.8125889885050154, -0.629256395534285422, 9.08120441515995244,
        3.35357478401835299, -0.473677696915555805, -0.467190913556185953,
        -0.0880610317272330793, -0.00262208080491572673};
    private static final double[] H_B_DEN = {
        269.94660938022644, 343.6419926336247, 323.9049470901941, 218.89170769294024,
        102.31331350098315, 36.319337289702664, 8.3317401231389461, 1.0};

    /** 0 &le; eta &lt; 2: F = P(t)/Q(t), t = eta/2. */
    private static final double[] H_C_NUM = {
        71652.717119215557, 134954.734070223743, 153693.833350315645, 123247.280745703400,
        72886.293647930726, 32081.2499422362952, 10210.9967337762918, 2152.71110381320778,
        232.906588165205042};
    private static final double[] H_C_DEN = {
        105667.839854298798, 31946.0752989314444, 71158.788776422211, 15650.8990138187414,
        13521.8033657783433, 1646.98258283527892, 618.90691969249409, -3.36319591755394735, 1.0};

    /** 2 &le; eta &lt; 5: F = P(t)/Q(t), t = (eta - 2)/3. */
    private static final double[] H_D_NUM = {
        23744.8706993314289, 68257.8589855623002, 89327.4467683334597, 62766.3415600442563,
        20093.6622609901994, -2213.89084119777949, -3901.66057267577389, -948.642895944858861};
    private static final double[] H_D_DEN = {
        9488.61972919565851, 12514.8125526953073, 9903.44088207450946, 2138.15420910334305,
        -528.394863730838233, -661.033633995449691, -51.4481470250962337, 1.0};

    /** 5 &le; eta &lt; 10: F = c P(t)/Q(t), t = eta/5 - 1, with Fukushima's bias factor c. */
    private static final double[] H_E_NUM = {
        311337.452661582536, 1.11267074416648198e6, 1.75638628895671735e6, 1.59630855803772449e6,
        910818.935456183774, 326492.733550701245, 65507.2624972852908, 4809.45649527286889};
    private static final double[] H_E_DEN = {
        39721.6641625089685, 86424.7529107662431, 88163.7255252151780, 50615.7363511157353,
        17334.9774805008209, 2712.13170809042550, 82.2205828354629102, -1.0};
    private static final double H_E_BIAS = 0.999999999999999877;

    /** 10 &le; eta &lt; 20: F = P(t)/Q(t), t = eta/10 - 1. */
    private static final double[] H_F_NUM = {
        7.26870063003059784e6, 2.79049734854776025e7, 4.42791767759742390e7, 3.63735017512363365e7,
        1.55766342463679795e7, 2.97469357085299505e6, 154516.447031598403};
    private static final double[] H_F_DEN = {
        340542.544360209743, 805021.468647620047, 759088.235455002605, 304686.671371640343,
        39289.4061400542309, 582.426138126398363, 11.2728194581586028, -1.0};

    /** 20 &le; eta &lt; 40: F = P(t)/Q(t), t = eta/20 - 1. */
    private static final double[] H_G_NUM = {
        4.81449797541963104e6, 1.85162850713127602e7, 2.77630967522574435e7, 2.03275937688070624e7,
        7.41578871589369361e6, 1.21193113596189034e6, 63211.9545144644852};
    private static final double[] H_G_DEN = {
        80492.7765975237449, 189328.678152654840, 151155.890651482570, 48146.3242253837259,
        5407.08878394180588, 112.195044410775577, -1.0};

    /**
     * eta &ge; 40: F = (2/3) eta^(3/2) (1 + w P(s)/Q(s)), w = eta^-2, s = 1 - 1600 w (Sommerfeld
     * leading term times a rational correction; P(1)/Q(1) = pi^2/8).
     */
    private static final double[] H_H_NUM = {8109.79390744477921, 342.069867454704106, 1.07141702293504595};
    private static final double[] H_H_DEN = {6569.98472532829094, 280.706465851683809, 1.0};

    // ---------------------------------------------------------------------------------------
    // Fukushima (2015), order -1/2 (routine fdm1h).
    // ---------------------------------------------------------------------------------------

    /** eta &lt; -2: F = e^eta (Gamma(1/2) - e^eta P(t)/Q(t)), t = e^(eta+2). */
    private static final double[] M_A_NUM = {
        40641.4537510284430, 9395.7080940846442, 649.96168315267301, 12.7972295804758967,
        0.00153864350767585460};
    private static final double[] M_A_DEN = {
        32427.1884765292940, 11079.9205661274782, 1322.96627001478859, 63.738361029333467, 1.0};

    /** -2 &le; eta &lt; 0: F = P(1 - s)/Q(s), s = -eta/2. */
    private static final double[] M_B_NUM = {
        272.770092131932696, 30.8845653844682850, -6.43537632380366113, 14.8747473098217879,
        4.86928862842142635, -1.53265834550673654, -1.02698898315597491, -0.177686820928605932,
        -0.00377141325509246441};
    private static final double[] M_B_DEN = {
        293.075378187667857, 305.818162686270816, 299.962395449297620, 207.640834087494249,
        92.0384803181851755, 37.0164914112791209, 7.88500950271420583, 1.0};

    /** 0 &le; eta &lt; 2: F = P(t)/Q(t), t = eta/2. */
    private static final double[] M_C_NUM = {
        3531.50360568243046, 6077.5339658420037, 6199.7700433981326, 4412.78701919567594,
        2252.27343092810898, 811.84098649224085, 191.836401053637121, 23.2881838959183802};
    private static final double[] M_C_DEN = {
        3293.83702584796268, 1528.97474029789098, 2568.48562814986046, 925.64264653555825,
        574.23248354035988, 132.803859320667262, 29.8447166552102115, 1.0};

    /** 2 &le; eta &lt; 5: F = P(t)/Q(t), t = (eta - 2)/3. */
    private static final double[] M_D_NUM = {
        4060.70753404118265, 10812.7291333052766, 13897.5649482242583, 10628.4749852740029,
        5107.70670190679021, 1540.84330126003381, 284.452720112970331, 29.5214417358484151};
    private static final double[] M_D_DEN = {
        1564.58195612633534, 2825.75172277850406, 3189.16066169981562, 1955.03979069032571,
        828.000333691814748, 181.498111089518376, 32.0352857794803750, 1.0};

    /** 5 &le; eta &lt; 10: F = P(t)/Q(t), t = eta/5 - 1. */
    private static final double[] M_E_NUM = {
        1198.41719029557508, 3263.51454554908654, 3874.97588471376487, 2623.13060317199813,
        1100.41355637121217, 267.469532490503605, 25.4207671812718340, 0.389887754234555773};
    private static final double[] M_E_DEN = {
        273.407957792556998, 595.918318952058643, 605.202452261660849, 343.183302735619981,
        122.187622015695729, 20.9016359079855933, 1.0};

    /** 10 &le; eta &lt; 20: F = P(t)/Q(t), t = eta/10 - 1. */
    private static final double[] M_F_NUM = {
        9446.00169435237637, 36843.4448474028632, 63710.1115419926191, 62985.2197361074768,
        37634.5231395700921, 12810.9898627807754, 1981.56896138920963, 81.4930171897667580};
    private static final double[] M_F_DEN = {
        1500.04697810133666, 5086.91381052794059, 7730.01593747621895, 6640.83376239360596,
        3338.99590300826393, 860.499043886802984, 78.8565824186926692, 1.0};

    /** 20 &le; eta &lt; 40: F = P(t)/Q(t), t = eta/20 - 1. */
    private static final double[] M_G_NUM = {
        22977.9657855367223, 123416.616813887781, 261153.765172355107, 274618.894514095795,
        149710.718389924860, 40129.3371700184546, 4470.46495881415076, 132.684346831002976};
    private static final double[] M_G_DEN = {
        2571.68842525335676, 12521.4982290775358, 23268.1574325055341, 20477.2320119758141,
        8726.52577962268114, 1647.42896896769909, 106.475275142076623, 1.0};

    /**
     * eta &ge; 40: F = 2 eta^(1/2) (1 - w P(t)), w = eta^-2, t = 1600 w (P(0) = pi^2/24, the first
     * Sommerfeld coefficient).
     */
    private static final double[] M_H_POLY = {
        0.411233516712009968, 0.00110980410034088951, 0.0000113689298990173683,
        2.56931790679436797e-7, 9.97897786755446178e-9, 8.67667698791108582e-10};

    // ---------------------------------------------------------------------------------------
    // Joyce & Dixon (1977) inversion series, eta = ln r + sum A_i r^i.
    // ---------------------------------------------------------------------------------------

    /** A_1 = 2^(-3/2) (exact, from the series F = z - z^2/2^(3/2) + ...). */
    private static final double JD_A1 = 0.35355339059327373;
    /**
     * A_2..A_4 of Joyce &amp; Dixon, APL 31, 354 (1977), from memory (not checked against the
     * printed paper). They only shape the Newton seed, so an error in them can change the number
     * of iterations, never the result.
     */
    private static final double JD_A2 = -4.95009e-3;
    private static final double JD_A3 = 1.48386e-4;
    private static final double JD_A4 = -4.42563e-6;
    /** Above this F_1/2 value the Sommerfeld (degenerate) seed is used instead of Joyce-Dixon. */
    private static final double SEED_SWITCH = 5.0;
    /** 3 sqrt(pi) / 4, inverse of the degenerate prefactor 4/(3 sqrt(pi)). */
    private static final double THREE_SQRT_PI_OVER_4 = 1.329340388179137;
    private static final double PI_SQUARED_OVER_3 = Math.PI * Math.PI / 3.0;
    private static final int MAX_NEWTON_STEPS = 60;

    /** Smallest argument accepted by {@link #f12Inverse(double)}. */
    public static final double F12_INVERSE_MIN = Double.MIN_NORMAL;
    /** Largest argument accepted by {@link #f12Inverse(double)}. */
    public static final double F12_INVERSE_MAX = 1.0e300;

    /**
     * Complete Fermi-Dirac integral of order 1/2 in Blakemore's normalisation (Solid-State
     * Electron. 25, 1067 (1982)), F_1/2(eta) = (2/sqrt(pi)) int_0^inf t^(1/2)/(1 + e^(t-eta)) dt,
     * from Fukushima's piecewise minimax rational approximation (Appl. Math. Comput. 259, 708
     * (2015)) scaled by 2/sqrt(pi).
     *
     * <p>F_1/2(eta) tends to e^eta for eta to -infinity and to (4/(3 sqrt(pi))) eta^(3/2) for eta to
     * +infinity. Returns 0 where e^eta underflows (eta below about -745) and +infinity where the
     * result overflows (eta above about 4e205).
     *
     * @param eta reduced Fermi level (E_F - E_c)/kT, any real number except NaN (infinities give
     *            the limits 0 and +infinity)
     * @return F_1/2(eta)
     * @throws IllegalArgumentException if eta is NaN
     */
    public static double f12(double eta) {
        if (eta != eta) {
            throw notANumber("eta");
        }
        return TWO_OVER_SQRT_PI * unnormalisedHalf(eta);
    }

    /**
     * Complete Fermi-Dirac integral of order -1/2 in Blakemore's normalisation, F_-1/2(eta) =
     * (1/sqrt(pi)) int_0^inf t^(-1/2)/(1 + e^(t-eta)) dt = dF_1/2/deta, from Fukushima's piecewise
     * minimax rational approximation (Appl. Math. Comput. 259, 708 (2015)) scaled by 1/sqrt(pi).
     *
     * <p>F_-1/2(eta) tends to e^eta for eta to -infinity and to (2/sqrt(pi)) eta^(1/2) for eta to
     * +infinity.
     *
     * @param eta reduced Fermi level, any real number except NaN (infinities give the limits)
     * @return F_-1/2(eta)
     * @throws IllegalArgumentException if eta is NaN
     */
    public static double fm12(double eta) {
        if (eta != eta) {
            throw notANumber("eta");
        }
        return ONE_OVER_SQRT_PI * unnormalisedMinusHalf(eta);
    }

    /**
     * Inverse of {@link #f12(double)}: the eta with F_1/2(eta) = y. The seed is the Joyce-Dixon
     * series eta = ln y + A1 y + A2 y^2 + A3 y^3 + A4 y^4 (Joyce &amp; Dixon, Appl. Phys. Lett. 31,
     * 354 (1977)) for y &le; 5 and the inverted two-term Sommerfeld expansion F_1/2 ~ (4/(3
     * sqrt(pi))) eta^(3/2) (1 + pi^2/(8 eta^2)) (Blakemore 1982) above; it is then refined by Newton
     * steps on ln F_1/2(eta) - ln y, whose derivative is F_-1/2/F_1/2. Since ln F_1/2 is concave the
     * iteration cannot overshoot twice and converges from either side.
     *
     * @param y value of F_1/2, i.e. n/N_c; allowed range [{@link #F12_INVERSE_MIN},
     *          {@link #F12_INVERSE_MAX}]
     * @return eta with F_1/2(eta) = y: F_1/2 of the result matches y to a few ulp, or, for very
     *         negative eta, to the conditioning limit |eta| 2^-53 (at most 8e-14 relative)
     * @throws IllegalArgumentException if y is NaN or outside the allowed range
     */
    public static double f12Inverse(double y) {
        if (!(y >= F12_INVERSE_MIN && y <= F12_INVERSE_MAX)) {
            throw new InvalidParameterException("y", Double.toString(y),
                    "[" + F12_INVERSE_MIN + ", " + F12_INVERSE_MAX + "]");
        }
        double eta = inverseSeed(y);
        double lnY = Math.log(y);
        for (int i = 0; i < MAX_NEWTON_STEPS; i++) {
            double f = TWO_OVER_SQRT_PI * unnormalisedHalf(eta);
            double fPrime = ONE_OVER_SQRT_PI * unnormalisedMinusHalf(eta);
            double ratio = f / y;
            // ln(f/y): near the root from the relative residual, which keeps full precision
            // (ln f - ln y would lose |ln y| ulps when |ln y| is large).
            double logResidual = (ratio > 0.5 && ratio < 2.0) ? Math.log1p((f - y) / y) : Math.log(f) - lnY;
            double step = logResidual * f / fPrime;
            eta -= step;
            if (Math.abs(step) <= 4.0e-15 * Math.max(1.0, Math.abs(eta))) {
                break;
            }
        }
        return eta;
    }

    /**
     * F_0(eta) = ln(1 + e^eta), the order-0 Fermi-Dirac integral, which gives the electron sheet
     * density of one parabolic 2D subband (Ando, Fowler, Stern, Rev. Mod. Phys. 54, 437 (1982)).
     * Evaluated as eta + log1p(e^-eta) for eta &gt; 0 and log1p(e^eta) otherwise, the usual stable
     * splitting (M. Maechler, "Accurately computing log(1 - exp(-|a|))", note with the R package
     * Rmpfr, 2012, from memory): no overflow for large eta, full relative accuracy for very
     * negative eta.
     *
     * @param eta reduced level (E_F - E_k)/kT, any real number except NaN (infinities give the
     *            limits 0 and +infinity)
     * @return ln(1 + e^eta)
     * @throws IllegalArgumentException if eta is NaN
     */
    public static double log1pExp(double eta) {
        if (eta > 0) {
            return eta + Math.log1p(Math.exp(-eta));
        }
        if (eta != eta) {
            throw notANumber("eta");
        }
        return Math.log1p(Math.exp(eta));
    }

    /**
     * The logistic function 1/(1 + e^-eta) = d/deta ln(1 + e^eta), i.e. F_-1(eta), the occupation of
     * a state at reduced energy -eta (Fermi-Dirac distribution; Ando, Fowler, Stern, Rev. Mod. Phys.
     * 54, 437 (1982) for its use with 2D subbands). Evaluated without overflow: 1/(1 + e^-eta) for
     * eta &ge; 0, e^eta/(1 + e^eta) otherwise.
     *
     * @param eta reduced level, any real number except NaN
     * @return 1/(1 + e^-eta), in [0, 1]
     * @throws IllegalArgumentException if eta is NaN
     */
    public static double logistic(double eta) {
        if (eta >= 0) {
            return 1.0 / (1.0 + Math.exp(-eta));
        }
        if (eta != eta) {
            throw notANumber("eta");
        }
        double e = Math.exp(eta);
        return e / (1.0 + e);
    }

    // ---------------------------------------------------------------------------------------

    /** Fukushima's fd1h: int_0^inf t^(1/2)/(1 + e^(t-x)) dt (no 1/Gamma factor). */
    private static double unnormalisedHalf(double x) {
        if (x < -2.0) {
            double ex = Math.exp(x);
            double t = ex * E_SQUARED;
            return ex * (GAMMA_3_2 - ex * horner(H_A_NUM, t) / horner(H_A_DEN, t));
        } else if (x < 0.0) {
            double s = -0.5 * x;
            return horner(H_B_NUM, 1.0 - s) / horner(H_B_DEN, s);
        } else if (x < 2.0) {
            double t = 0.5 * x;
            return horner(H_C_NUM, t) / horner(H_C_DEN, t);
        } else if (x < 5.0) {
            double t = (x - 2.0) / 3.0;
            return horner(H_D_NUM, t) / horner(H_D_DEN, t);
        } else if (x < 10.0) {
            double t = 0.2 * x - 1.0;
            return H_E_BIAS * horner(H_E_NUM, t) / horner(H_E_DEN, t);
        } else if (x < 20.0) {
            double t = 0.1 * x - 1.0;
            return horner(H_F_NUM, t) / horner(H_F_DEN, t);
        } else if (x < 40.0) {
            double t = 0.05 * x - 1.0;
            return horner(H_G_NUM, t) / horner(H_G_DEN, t);
        } else {
            double w = 1.0 / (x * x);
            double s = 1.0 - 1600.0 * w;
            double lead = (2.0 / 3.0) * x * Math.sqrt(x);
            return lead * (1.0 + w * horner(H_H_NUM, s) / horner(H_H_DEN, s));
        }
    }

    /** Fukushima's fdm1h: int_0^inf t^(-1/2)/(1 + e^(t-x)) dt (no 1/Gamma factor). */
    private static double unnormalisedMinusHalf(double x) {
        if (x < -2.0) {
            double ex = Math.exp(x);
            double t = ex * E_SQUARED;
            return ex * (GAMMA_1_2 - ex * horner(M_A_NUM, t) / horner(M_A_DEN, t));
        } else if (x < 0.0) {
            double s = -0.5 * x;
            return horner(M_B_NUM, 1.0 - s) / horner(M_B_DEN, s);
        } else if (x < 2.0) {
            double t = 0.5 * x;
            return horner(M_C_NUM, t) / horner(M_C_DEN, t);
        } else if (x < 5.0) {
            double t = (x - 2.0) / 3.0;
            return horner(M_D_NUM, t) / horner(M_D_DEN, t);
        } else if (x < 10.0) {
            double t = 0.2 * x - 1.0;
            return horner(M_E_NUM, t) / horner(M_E_DEN, t);
        } else if (x < 20.0) {
            double t = 0.1 * x - 1.0;
            return horner(M_F_NUM, t) / horner(M_F_DEN, t);
        } else if (x < 40.0) {
            double t = 0.05 * x - 1.0;
            return horner(M_G_NUM, t) / horner(M_G_DEN, t);
        } else {
            double w = 1.0 / (x * x);
            return 2.0 * Math.sqrt(x) * (1.0 - w * horner(M_H_POLY, 1600.0 * w));
        }
    }

    /** Polynomial with coefficients c (ascending powers) at x, Horner's scheme. */
    private static double horner(double[] c, double x) {
        int i = c.length - 1;
        double r = c[i];
        while (--i >= 0) {
            r = r * x + c[i];
        }
        return r;
    }

    /** Newton seed for {@link #f12Inverse(double)}. */
    private static double inverseSeed(double y) {
        if (y <= SEED_SWITCH) {
            return Math.log(y) + y * (JD_A1 + y * (JD_A2 + y * (JD_A3 + y * JD_A4)));
        }
        // Degenerate limit: eta0 = (3 sqrt(pi) y / 4)^(2/3); the Sommerfeld correction
        // eta + pi^2/(12 eta) = eta0 gives eta = (eta0 + sqrt(eta0^2 - pi^2/3)) / 2, written so
        // that eta0^2 is never formed (it overflows for y near the top of the range).
        double eta0 = Math.pow(THREE_SQRT_PI_OVER_4 * y, 2.0 / 3.0);
        double r = PI_SQUARED_OVER_3 / eta0 / eta0;
        return 0.5 * eta0 * (1.0 + Math.sqrt(1.0 - r));
    }

    private static InvalidParameterException notANumber(String name) {
        return new InvalidParameterException(name, "NaN", "(-inf, +inf), not NaN");
    }
}
