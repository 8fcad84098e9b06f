package org.wurtzkit.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.polarization.Polarity;
import org.wurtzkit.solvers.schrodinger.BoundStates;
import org.wurtzkit.solvers.schrodinger.EffectiveMassHamiltonian;
import org.wurtzkit.solvers.sp.QuantumWindows;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Physical symmetries (issue #7), each exact for the continuous equations and for their box
 * discretisation, so the solver must honour them up to its tolerances:
 * <ul>
 * <li>gauge: a constant added to every energy shifts the eigenvalues by that constant and changes
 * nothing else (Schroedinger's equation is linear in V); in the full solve, a common shift of all
 * tabulated band edges moves only the electrostatic potential, because the contacts fix E_c
 * relative to the Fermi level;</li>
 * <li>parity: a mirror-symmetric well has wavefunctions of definite parity and a symmetric density;</li>
 * <li>mirror with inverted polarity: reversing the stack (depth x to L - x) turns polarization, a
 * vector along x, into its negative, which is what inverting the polarity does; with Schottky
 * barrier and bottom E_c - E_F exchanged (both are Dirichlet data for E_c at zero bias, and the
 * whole stack at the Fermi level 0), the band diagram is the mirror image and the sheet density is
 * the same. In-plane strain is made independent of the growth order by growing every layer
 * pseudomorphically on the relaxed GaN lattice.</li>
 * </ul>
 */
@Tag("reliability")
class SymmetryProperties {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final Source SRC = Source.of("SYM", "reliability test variant");

    // ------------------------------------------------------------------ Hamiltonian level

    private static double[] randomMesh(SplittableRandom r, int n) {
        double[] z = new double[n];
        z[0] = -3e-9 + 6e-9 * r.nextDouble();
        for (int i = 1; i < n; i++) {
            z[i] = z[i - 1] + (0.05 + 0.95 * r.nextDouble()) * NM;
        }
        return z;
    }

    private static double[] randomMasses(SplittableRandom r, int cells) {
        double[] m = new double[cells];
        double current = 0.05 + 0.95 * r.nextDouble();
        for (int i = 0; i < cells; i++) {
            if (r.nextInt(10) == 0) {
                current = 0.05 + 0.95 * r.nextDouble();
            }
            m[i] = current;
        }
        return m;
    }

    private static double[] randomPotential(SplittableRandom r, int n) {
        double[] v = new double[n];
        for (int i = 1; i < n; i++) {
            v[i] = r.nextInt(8) == 0 ? -1 + 2 * r.nextDouble() : v[i - 1] + 0.05 * (r.nextDouble() - 0.5);
        }
        v[0] = v[1];
        return v;
    }

    private static double weightedDot(double[] a, double[] b, double[] w) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i] * w[i];
        }
        return s;
    }

    @Property(tries = 150, edgeCases = EdgeCasesMode.NONE, shrinking = ShrinkingMode.OFF)
    void constantEnergyShiftShiftsEigenvaluesAndNothingElse(@ForAll long seed, @ForAll @IntRange(min = 6, max = 300) int n,
            @ForAll @DoubleRange(min = -50, max = 50) double shift) {
        SplittableRandom r = new SplittableRandom(seed);
        double[] z = randomMesh(r, n);
        EffectiveMassHamiltonian h = EffectiveMassHamiltonian.of(z, randomMasses(r, n - 1));
        double[] v = randomPotential(r, n);
        double[] vs = v.clone();
        for (int i = 0; i < n; i++) {
            vs[i] += shift;
        }
        int k = Math.min(8, n - 3);
        BoundStates a = h.lowest(v, k + 1);
        BoundStates b = h.lowest(vs, k + 1);
        double[] w = h.boxWidths();
        double tol = 1e-9 * (1 + Math.abs(shift));
        for (int j = 0; j < k; j++) {
            assertEquals(a.energy(j) + shift, b.energy(j), tol, "E_" + j);
            // same state up to its sign (the sign convention can flip on a near tie of the largest amplitude)
            double overlap = Math.abs(weightedDot(a.wavefunction(j), b.wavefunction(j), w));
            boolean isolated = (j == 0 || a.energy(j) - a.energy(j - 1) > 1e-6) && a.energy(j + 1) - a.energy(j) > 1e-6;
            if (isolated) {
                assertEquals(1.0, overlap, 1e-8, "psi_" + j + " changed under a constant shift");
            }
        }
        // the bound-state count below a bound moves with the bound
        double bound = a.energy(k / 2);
        assertEquals(h.below(v, bound + 1e-7, k).size(), h.below(vs, bound + shift + 1e-7, k).size());
    }

    @Property(tries = 150, edgeCases = EdgeCasesMode.NONE, shrinking = ShrinkingMode.OFF)
    void symmetricWellHasParityStatesAndASymmetricDensity(@ForAll long seed, @ForAll @IntRange(min = 4, max = 150) int half,
            @ForAll @DoubleRange(min = 0.01, max = 0.1) double kT) {
        SplittableRandom r = new SplittableRandom(seed);
        int cellsHalf = half;
        double[] hs = new double[cellsHalf];
        double[] mh = randomMasses(r, cellsHalf);
        for (int i = 0; i < cellsHalf; i++) {
            hs[i] = (0.05 + 0.95 * r.nextDouble()) * NM;
        }
        int cells = 2 * cellsHalf;
        int n = cells + 1;
        double[] z = new double[n];
        double[] m = new double[cells];
        for (int i = 0; i < cellsHalf; i++) {
            m[i] = mh[i];
            m[cells - 1 - i] = mh[i];
        }
        for (int i = 0; i < cells; i++) {
            double h = i < cellsHalf ? hs[i] : hs[cells - 1 - i];
            z[i + 1] = z[i] + h;
        }
        double[] vh = randomPotential(r, cellsHalf + 1);
        double[] v = new double[n];
        for (int i = 0; i <= cellsHalf; i++) {
            v[i] = vh[i];
            v[n - 1 - i] = vh[i];
        }
        EffectiveMassHamiltonian ham = EffectiveMassHamiltonian.of(z, m);
        // one state more than is checked, so that the gap above the last checked state is known
        int k = Math.min(10, n - 3);
        BoundStates s = ham.lowest(v, k + 1);
        // the density sums whole degenerate multiplets only: cut the spectrum at a gap
        int cut = k;
        while (cut > 1 && s.energy(cut) - s.energy(cut - 1) <= 1e-6) {
            cut--;
        }
        double[] density = new double[n];
        double peak = 0;
        for (int j = 0; j < k; j++) {
            double[] p = s.wavefunction(j);
            double occ = Math.log1p(Math.exp(-(s.energy(j) - s.energy(0)) / kT));
            for (int i = 0; i < n && j < cut; i++) {
                density[i] += occ * p[i] * p[i];
                peak = Math.max(peak, density[i]);
            }
            boolean isolated = (j == 0 || s.energy(j) - s.energy(j - 1) > 1e-6) && s.energy(j + 1) - s.energy(j) > 1e-6;
            if (isolated) {
                double amax = 0;
                for (double a : p) {
                    amax = Math.max(amax, Math.abs(a));
                }
                for (int i = 0; i < n; i++) {
                    assertEquals(Math.abs(p[i]), Math.abs(p[n - 1 - i]), 1e-7 * amax, "|psi_" + j + "| not symmetric");
                }
            }
        }
        for (int i = 0; i < n; i++) {
            assertEquals(density[i], density[n - 1 - i], 1e-7 * peak, "density not symmetric at node " + i);
        }
    }

    // ------------------------------------------------------------------ full self-consistent solves

    /**
     * Default options with tight outer (1e-10 V) and Newton (1e-12 V) tolerances, so that two solves
     * related by a symmetry agree far below the tolerances used in the comparisons. (SolverOptions has
     * no withNewtonTolerance, hence the canonical constructor.)
     */
    static SolverOptions tight(QuantumWindows windows) {
        SolverOptions d = SolverOptions.defaults();
        return new SolverOptions(1e-10, d.maxIterations(), 1e-12, d.maxNewtonIterations(), d.maxNewtonStep(), d.mesh(),
                windows, d.maxSubbands(), d.subbandCutoffKT(), d.quasiFermiLevels(), d.quantumHoles(), d.densityOfStatesMass());
    }

    private static WurtziteMaterial shiftedEdges(Composition c, double shiftEv) {
        WurtziteMaterial m = SET.material(c);
        return m.toBuilder(c.formula() + " shifted").set(MaterialParameter.VALENCE_BAND_EDGE,
                m.valenceBandEdgeEv() + shiftEv, SRC).build();
    }

    /**
     * Every tabulated band edge moved by the same constant: the energy zero is the Fermi level and
     * the boundary conditions fix E_c relative to it, so only the potential moves (by the constant).
     */
    @Property(tries = 25, edgeCases = EdgeCasesMode.NONE, shrinking = ShrinkingMode.OFF)
    void commonBandEdgeShiftMovesOnlyThePotential(@ForAll @DoubleRange(min = 0.1, max = 0.45) double x,
            @ForAll @DoubleRange(min = 8, max = 30) double barrierNm, @ForAll @DoubleRange(min = -3, max = 3) double c,
            @ForAll @DoubleRange(min = -3, max = 1) double bias, @ForAll boolean fixedBottom) {
        Composition[] comps = {Composition.GAN, Composition.alGaN(x), Composition.GAN};
        double[] th = {1000, barrierNm, 2};
        Structure.Builder plain = Structure.builder(SET);
        Structure.Builder shifted = Structure.builder(SET);
        for (int i = 0; i < comps.length; i++) {
            plain.grow(Layer.of("L" + i, SET.material(comps[i]), th[i] * NM).withDopant(Dopant.donorsPerCm3(1e16, 0.02)));
            shifted.grow(Layer.of("L" + i, shiftedEdges(comps[i], c), th[i] * NM)
                    .withDopant(Dopant.donorsPerCm3(1e16, 0.02)));
        }
        for (Structure.Builder b : List.of(plain, shifted)) {
            b.top(TopBoundary.schottky(1.0).atBiasV(bias));
            if (fixedBottom) {
                b.bottom(BottomBoundary.fixedFermiLevel(0.4));
            }
        }
        SelfConsistentSolver solver = new SelfConsistentSolver(tight(QuantumWindows.automatic()));
        Solution a = solver.solve(plain.build());
        Solution b = solver.solve(shifted.build());
        double[] pa = a.potential();
        double[] pb = b.potential();
        assertEquals(pa.length, pb.length);
        double[] ea = a.conductionBand();
        double[] eb = b.conductionBand();
        double[] na = a.electronDensity();
        double[] nb = b.electronDensity();
        double nMax = 0;
        for (double v : na) {
            nMax = Math.max(nMax, v);
        }
        for (int i = 0; i < pa.length; i++) {
            assertEquals(pa[i] + c, pb[i], 1e-7, "potential moves by the shift at node " + i);
            assertEquals(ea[i], eb[i], 1e-7, "E_c unchanged at node " + i);
            assertEquals(na[i], nb[i], 1e-5 * nMax, "n unchanged at node " + i);
        }
        assertEquals(a.sheetDensityPerCm2(), b.sheetDensityPerCm2(), 1e-6 * a.sheetDensityPerCm2() + 1e3);
        List<Subband> sa = a.subbands();
        List<Subband> sb = b.subbands();
        assertEquals(sa.size(), sb.size());
        for (int j = 0; j < sa.size(); j++) {
            assertEquals(sa.get(j).energyEv(), sb.get(j).energyEv(), 1e-7, "subband " + j);
        }
    }

    /** Zero-polarization variant of a material: the same bands and masses, no P_sp, no piezoelectricity. */
    private static WurtziteMaterial unpolarized(Composition c) {
        WurtziteMaterial.Builder b = SET.material(c).toBuilder(c.formula() + " unpolarized");
        for (MaterialParameter p : new MaterialParameter[] {MaterialParameter.SPONTANEOUS_POLARIZATION,
                MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING, MaterialParameter.E31, MaterialParameter.E33,
                MaterialParameter.PIEZO_NONLINEAR_LINEAR, MaterialParameter.PIEZO_NONLINEAR_QUADRATIC_TENSILE,
                MaterialParameter.PIEZO_NONLINEAR_QUADRATIC_COMPRESSIVE}) {
            b.set(p, 0, SRC);
        }
        return b.build();
    }

    /**
     * A mirror-symmetric stack of unpolarized materials between two equal contacts (Schottky phi_B
     * on top, E_c - E_F = phi_B at the bottom, zero bias, one quantum window over the whole stack)
     * gives a symmetric electron density and band diagram.
     */
    @Property(tries = 25, edgeCases = EdgeCasesMode.NONE, shrinking = ShrinkingMode.OFF)
    void symmetricStackGivesSymmetricDensity(@ForAll @DoubleRange(min = 0.1, max = 0.4) double x,
            @ForAll @DoubleRange(min = 3, max = 20) double wellNm, @ForAll @DoubleRange(min = 5, max = 30) double barrierNm,
            @ForAll @DoubleRange(min = 0.3, max = 1.2) double phiB, @ForAll @DoubleRange(min = 1e17, max = 1e19) double nd,
            @ForAll @DoubleRange(min = 77, max = 500) double t) {
        WurtziteMaterial gan = unpolarized(Composition.GAN);
        WurtziteMaterial algan = unpolarized(Composition.alGaN(x));
        Structure s = Structure.builder(SET).temperatureK(t)
                .grow(Layer.of("outer", gan, 20 * NM))
                .grow(Layer.of("barrier", algan, barrierNm * NM).withDopant(Dopant.donorsPerCm3(nd, 0.02)))
                .grow(Layer.of("well", gan, wellNm * NM))
                .grow(Layer.of("barrier", algan, barrierNm * NM).withDopant(Dopant.donorsPerCm3(nd, 0.02)))
                .grow(Layer.of("outer", gan, 20 * NM))
                .top(TopBoundary.schottky(phiB).atBiasV(0)).bottom(BottomBoundary.fixedFermiLevel(phiB)).build();
        double total = s.totalThickness();
        SelfConsistentSolver solver = new SelfConsistentSolver(tight(QuantumWindows.explicit(
                new QuantumWindows.Window(0, total))));
        Solution sol = solver.solve(s);
        double[] z = sol.depth();
        double[] n = sol.electronDensity();
        double[] pot = sol.potential();
        int nn = z.length;
        double nMax = 0;
        for (double v : n) {
            nMax = Math.max(nMax, v);
        }
        for (int i = 0; i < nn; i++) {
            assertEquals(total - z[nn - 1 - i], z[i], 1e-6 * NM, "mesh symmetric");
            assertEquals(n[i], n[nn - 1 - i], 1e-6 * nMax, "electron density symmetric at node " + i);
            assertEquals(pot[i], pot[nn - 1 - i], 1e-8, "potential symmetric at node " + i);
        }
    }

    /** One layer of a random mirror test stack. */
    private record Spec(Composition bottom, Composition top, double nm, double donors, double acceptors, double deep,
            double deepEnergy) {
        Layer layer(String name, boolean reversed) {
            Layer l = bottom.equals(top) ? Layer.of(name, bottom, nm * NM)
                    : reversed ? Layer.graded(name, top, bottom, nm * NM) : Layer.graded(name, bottom, top, nm * NM);
            if (donors > 0) {
                l = l.withDopant(Dopant.donorsPerCm3(donors, 0.02));
            }
            if (acceptors > 0) {
                l = l.withDopant(Dopant.acceptorsPerCm3(acceptors, 0.17));
            }
            if (deep > 0) {
                l = l.withDeepLevel(DeepLevel.acceptorLikePerCm3(deep, deepEnergy));
            }
            return l;
        }
    }

    private static List<Spec> mirrorStack(SplittableRandom r) {
        int n = 2 + r.nextInt(4);
        List<Spec> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int kind = r.nextInt(5);
            Composition b;
            Composition t;
            double cap;
            if (kind == 0) {
                b = Composition.GAN;
                t = b;
                cap = 100;
            } else if (kind == 1 || kind == 2) {
                b = Composition.alGaN(0.05 + 0.4 * r.nextDouble());
                t = b;
                cap = 40;
            } else if (kind == 3) {
                b = Composition.inGaN(0.01 + 0.14 * r.nextDouble());
                t = b;
                cap = 15;
            } else {
                b = Composition.alGaN(0.3 * r.nextDouble());
                t = Composition.alGaN(0.3 * r.nextDouble());
                cap = 40;
            }
            double nm = 2 + (cap - 2) * r.nextDouble();
            double donors = r.nextInt(3) == 0 ? Math.pow(10, 16 + 3 * r.nextDouble()) : 0;
            double acceptors = r.nextInt(6) == 0 ? Math.pow(10, 16 + 2 * r.nextDouble()) : 0;
            double deep = r.nextInt(6) == 0 ? Math.pow(10, 16 + 2 * r.nextDouble()) : 0;
            out.add(new Spec(b, t, nm, donors, acceptors, deep, 0.6));
        }
        return out;
    }

    private static Structure mirrorBuild(List<Spec> bottomUp, boolean mirrored, double topEc, double bottomEc,
            double t, ParameterSet set) {
        Structure.Builder b = Structure.builder(set).temperatureK(t).onRelaxed(Composition.GAN)
                .polarity(mirrored ? Polarity.N_FACE : Polarity.METAL_FACE);
        for (int i = 0; i < bottomUp.size(); i++) {
            int k = mirrored ? bottomUp.size() - 1 - i : i;
            b.grow(bottomUp.get(k).layer("L" + k, mirrored));
        }
        return b.top(TopBoundary.schottky(topEc).atBiasV(0)).bottom(BottomBoundary.fixedFermiLevel(bottomEc)).build();
    }

    @Property(tries = 60, edgeCases = EdgeCasesMode.NONE, shrinking = ShrinkingMode.OFF)
    void mirroredStackWithInvertedPolarityGivesTheMirroredSolution(@ForAll long seed,
            @ForAll @DoubleRange(min = 0.3, max = 1.8) double phiB, @ForAll @DoubleRange(min = 0.3, max = 1.8) double ecBottom,
            @ForAll @DoubleRange(min = 77, max = 600) double t, @ForAll boolean quantum, @ForAll boolean ambacher) {
        ParameterSet set = ambacher ? ParameterSets.named("ambacher-2002") : SET;
        List<Spec> stack = mirrorStack(new SplittableRandom(seed));
        Structure s = mirrorBuild(stack, false, phiB, ecBottom, t, set);
        Structure m = mirrorBuild(stack, true, ecBottom, phiB, t, set);
        double total = s.totalThickness();
        assertEquals(total, m.totalThickness(), 1e-12 * total);
        // each window is its own stack's full depth (the two sums of the thicknesses may differ in the last bit)
        Solution a = new SelfConsistentSolver(tight(quantum ? QuantumWindows.explicit(new QuantumWindows.Window(0, total))
                : QuantumWindows.none())).solve(s);
        Solution b = new SelfConsistentSolver(tight(quantum ? QuantumWindows.explicit(new QuantumWindows.Window(0,
                m.totalThickness())) : QuantumWindows.none())).solve(m);
        double[] za = a.depth();
        double[] zb = b.depth();
        int n = za.length;
        assertEquals(n, zb.length, "mirrored mesh has the same nodes");
        double[] pa = a.potential();
        double[] pb = b.potential();
        double[] na = a.electronDensity();
        double[] nb = b.electronDensity();
        double[] ha = a.holeDensity();
        double[] hb = b.holeDensity();
        double[] fa = a.electricField();
        double[] fb = b.electricField();
        double nMax = 1;
        double pMax = 1;
        double fMax = 1;
        for (int i = 0; i < n; i++) {
            nMax = Math.max(nMax, na[i]);
            pMax = Math.max(pMax, ha[i]);
        }
        for (double v : fa) {
            fMax = Math.max(fMax, Math.abs(v));
        }
        String where = " (stack " + stack + ", phi_B " + phiB + ", bottom " + ecBottom + ", " + t + " K, quantum "
                + quantum + ")";
        for (int i = 0; i < n; i++) {
            int j = n - 1 - i;
            assertEquals(total - za[j], zb[i], 1e-6 * NM, "mirrored node depth" + where);
            assertEquals(pa[j], pb[i], 1e-7, "mirrored potential at node " + i + where);
            assertEquals(na[j], nb[i], 1e-5 * nMax, "mirrored electron density at node " + i + where);
            assertEquals(ha[j], hb[i], 1e-5 * pMax, "mirrored hole density at node " + i + where);
        }
        for (int k = 0; k < n - 1; k++) {
            assertEquals(-fa[n - 2 - k], fb[k], 1e-6 * fMax, "the field is a vector: it flips" + where);
        }
        // all subband electrons (sheetDensityPerCm2 is the channel 2DEG, which is defined from the
        // gate side and so is not mirror-symmetric by design)
        double sa = 0;
        double sb = 0;
        for (double v : a.wellSheetDensities()) {
            sa += v * 1e-4;
        }
        for (double v : b.wellSheetDensities()) {
            sb += v * 1e-4;
        }
        if (!quantum) {
            sa = a.electronSheetDensity() * 1e-4;
            sb = b.electronSheetDensity() * 1e-4;
        }
        assertEquals(sa, sb, 1e-6 * Math.max(sa, 1e6), "same sheet density" + where);
        assertEquals(a.electronSheetDensity(), b.electronSheetDensity(), 1e-6 * Math.max(a.electronSheetDensity(), 1e10));
        List<Subband> ba = a.subbands();
        List<Subband> bb = b.subbands();
        assertTrue(Math.abs(ba.size() - bb.size()) <= 1, "subband counts " + ba.size() + " vs " + bb.size());
        for (int k = 0; k < Math.min(ba.size(), bb.size()) - 1; k++) {
            assertEquals(ba.get(k).energyEv(), bb.get(k).energyEv(), 1e-7, "subband " + k + where);
        }
    }
}
