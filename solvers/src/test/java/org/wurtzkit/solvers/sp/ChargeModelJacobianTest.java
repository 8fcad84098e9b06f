package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * The Newton-Poisson Jacobian is only as good as the charge derivatives: every species' dQ/dphi
 * must equal the central difference of Q (exact calculus, no source needed), and dQ/dphi &le; 0
 * (more potential, fewer holes and ionised donors, more electrons), which keeps the Jacobian an
 * M-matrix.
 */
class ChargeModelJacobianTest {

    private static Structure everySpecies() {
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 300 * NM)
                        .withDeepLevel(DeepLevel.acceptorLikePerCm3(2e17, 2.5))
                        .withDeepLevel(DeepLevel.donorLikePerCm3(1e17, 0.6))
                        .withDopant(Dopant.acceptorsPerCm3(1e17, 0.17)))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 20 * NM)
                        .withDopant(Dopant.donorsPerCm3(5e18, 0.03))
                        .withDeltaDoping(DeltaDoping.donorsPerCm2(2e12, 0.02).atOffset(5 * NM))
                        .withDeltaDoping(new DeltaDoping(Dopant.Kind.ACCEPTOR, 1e16, 0.17, 12 * NM)))
                .top(TopBoundary.freeSurfacePerCm2(1.6, 5e13))
                .build();
    }

    /** A scan of potential levels that takes every species through its partly ionised range. */
    @org.junit.jupiter.api.Test
    void derivativeMatchesCentralDifferenceOverAScan() {
        for (double level = -1.5; level <= 4.5; level += 0.02) {
            derivativeMatchesCentralDifference(level);
        }
    }

    /** The same with quantum holes, whose subbands fill as the scan brings the valence band up. */
    @org.junit.jupiter.api.Test
    void derivativeWithQuantumHolesMatchesCentralDifferenceOverAScan() {
        for (double level = -1.5; level <= 4.5; level += 0.05) {
            check(level, SolverOptions.defaults().withQuantumHoles(true));
        }
    }

    @Property(tries = 30)
    void derivativeMatchesCentralDifference(@ForAll @DoubleRange(min = -1.5, max = 4.5) double level) {
        check(level, SolverOptions.defaults());
    }

    private static void check(double level, SolverOptions options) {
        Device d = new Device(everySpecies(), options);
        ChargeModel c = new ChargeModel(d);
        QuantumStates qs = new QuantumStates(d);
        double[] phi = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            phi[i] = level - 0.3 * Math.sin(i * 0.05);
        }
        qs.update(d, phi);
        double[] ref = phi.clone();
        double hstep = 1e-4; // truncation error ~ (h/kT)^2/6 = 2.5e-6 relative at 300 K
        double[] q = new double[d.n];
        double[] dq = new double[d.n];
        double[] qp = new double[d.n];
        double[] qm = new double[d.n];
        double[] unused = new double[d.n];
        double[] plus = new double[d.n];
        double[] minus = new double[d.n];
        for (int i = 0; i < d.n; i++) {
            plus[i] = phi[i] + hstep;
            minus[i] = phi[i] - hstep;
        }
        for (QuantumStates states : new QuantumStates[] {null, qs}) {
            c.evaluate(phi, ref, states, q, dq, new PointDensities());
            c.evaluate(plus, ref, states, qp, unused, new PointDensities());
            c.evaluate(minus, ref, states, qm, unused, new PointDensities());
            for (int i = 0; i < d.n; i++) {
                double fd = (qp[i] - qm[i]) / (2 * hstep);
                // round-off of the difference: a few ulp of |Q| divided by 2h
                double noise = 1e-15 * Math.abs(q[i]) / hstep;
                assertEquals(fd, dq[i], 1e-4 * Math.abs(fd) + noise + 1e-300, "node " + i + " at level " + level);
                assertTrue(dq[i] <= 0, "dQ/dphi must not be positive, node " + i + ": " + dq[i]);
            }
        }
    }
}
