package org.wurtzkit.solvers.transport.mobility;

import java.util.List;
import org.wurtzkit.errors.Require;

/**
 * Coulomb scattering by charged centres away from (or inside) the channel: the ionised donors and
 * acceptors of the solution (doping, traps, everywhere in the stack), the charged surface states of
 * the solution (the surface donors that supply the 2DEG of an undoped barrier) and any extra sheets,
 * statically screened (Ando, Fowler &amp; Stern, Rev. Mod. Phys. 54, 437 (1982)). A centre at depth z
 * has |U(q)|^2 = (e^2/(2 epsilon q))^2 |F(q, z)|^2 with F(q, z) = integral psi^2 exp(-q |z' - z|) dz', so
 * 1/tau = (m e^4/(4 pi hbar^3 epsilon^2 k_F^2)) integral_0^1 C(q) S(q) du/sqrt(1 - u^2), C = sum N |F|^2
 * ({@link SubbandScattering#coulombFactors}). For a Fang-Howard function and a sheet N at distance d
 * in the barrier, C = N exp(-2 q d) eta^6. One permittivity (the channel's) is used everywhere: image
 * charges at the barrier interface are neglected.
 *
 * <p>Default ({@link #DEFAULT}): ions and surface states of the solution, no extra sheets.
 *
 * @param solutionIons    include the solution's ionised donors and acceptors
 * @param solutionSurface include the solution's charged surface states (first node)
 * @param sheets          further sheets
 */
public record RemoteCharge(boolean solutionIons, boolean solutionSurface, List<ChargeSheet> sheets)
        implements ScatteringMechanism {
    /** The solution's ions and surface charge. */
    public static final RemoteCharge DEFAULT = new RemoteCharge(true, true, List.of());

    /**
     * Copies the list.
     *
     * @param solutionIons include the solution's ionised donors and acceptors
     * @param solutionSurface include the solution's charged surface states (first node)
     * @param sheets further sheets
     */
    public RemoteCharge {
        sheets = List.copyOf(Require.nonNull("charge sheets", sheets));
    }

    /**
     * @param sheets the sheets
     * @return only these sheets, nothing from the solution
     */
    public static RemoteCharge sheets(ChargeSheet... sheets) {
        return new RemoteCharge(false, false, List.of(sheets));
    }

    @Override
    public String name() {
        return "remote charge";
    }

    @Override
    public double momentumRelaxationRate(SubbandScattering s) {
        double[] z = new double[sheets.size()];
        double[] n = new double[sheets.size()];
        for (int i = 0; i < z.length; i++) {
            z[i] = sheets.get(i).depth();
            n[i] = sheets.get(i).density();
        }
        double[] c = s.coulombFactors(solutionIons, solutionSurface, z, n);
        double sum = 0;
        for (int j = 0; j < c.length; j++) {
            sum += s.weight(j) * c[j] * s.screeningFactorSquared(j);
        }
        double kf = s.fermiWaveVector();
        double eps = s.permittivity();
        double e2 = Rates.E * Rates.E;
        return s.mass() * e2 * e2 / (4 * Math.PI * Rates.HBAR3 * eps * eps * kf * kf) * sum;
    }
}
