package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * The answers of the default solver pinned across the speed work of issue 18: n<sub>s</sub> within
 * 1e-6 relative and every subband energy within 1e-6 eV of the values the solver gave before that
 * work (commit fb972fd), on the reference HEMT (GaN cap 2 nm / Al<sub>x</sub>Ga<sub>1-x</sub>N /
 * AlN 1 nm / GaN 2 um, Schottky gate 1.0 eV) at several biases and barriers. This is a regression
 * pin, not an independent check (those are HemtPhysicsTest and the analytic tests): the reference
 * values in {@code pinned-results.txt} were produced by {@link #main(String[])} of this class, run
 * on the code before the change; its header says so. The tolerances are those of issue 18.
 */
class PinnedResultsTest {
    /** Relative tolerance on n_s (issue 18). */
    private static final double NS_RELATIVE = 1e-6;
    /** Absolute tolerance on a subband energy (eV, issue 18). */
    private static final double ENERGY_EV = 1e-6;

    /** The pinned stacks: Al fraction, barrier thickness (nm), gate bias (V). */
    private static final double[][] CASES = {
        {0.25, 25, 0.0}, {0.25, 25, -2.0}, {0.25, 25, 0.5}, {0.35, 10, 0.0}, {0.15, 29, -1.0}, {0.30, 18, -0.5},
    };

    private static Structure hemt(double x, double barrierNm, double biasV) {
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 2000 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierNm * NM))
                .grow(Layer.of("cap", Composition.GAN, 2 * NM))
                .top(TopBoundary.schottky(1.0).atBiasV(biasV))
                .build();
    }

    /** One line per case: x, thickness, bias, n_s (cm^-2), then E_k - E_F (eV) of every subband. */
    private static List<double[]> compute() {
        SelfConsistentSolver solver = new SelfConsistentSolver();
        List<double[]> rows = new ArrayList<>();
        for (double[] c : CASES) {
            Solution s = solver.solve(hemt(c[0], c[1], c[2]));
            List<Subband> sb = s.subbands();
            double[] row = new double[4 + sb.size()];
            row[0] = c[0];
            row[1] = c[1];
            row[2] = c[2];
            row[3] = s.sheetDensityPerCm2();
            for (int k = 0; k < sb.size(); k++) {
                row[4 + k] = sb.get(k).energyEv();
            }
            rows.add(row);
        }
        return rows;
    }

    /**
     * Prints the reference file (run on the code to be pinned, redirect into the resource).
     *
     * @param args unused
     */
    public static void main(String[] args) {
        System.out.println("# Pinned answers of the default SelfConsistentSolver, computed (not published): produced by");
        System.out.println("# PinnedResultsTest.main on commit fb972fd, before the speed work of issue 18.");
        System.out.println("# Columns: Al fraction, barrier thickness (nm), gate bias (V), n_s (cm^-2),");
        System.out.println("# then E_k - E_F (eV) of every subband of the solution, lowest first.");
        for (double[] row : compute()) {
            StringBuilder b = new StringBuilder();
            for (int i = 0; i < row.length; i++) {
                b.append(i == 0 ? "" : " ").append(String.format(Locale.ROOT, "%.17g", row[i]));
            }
            System.out.println(b);
        }
    }

    private static List<double[]> pinned() throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = PinnedResultsTest.class.getResourceAsStream("pinned-results.txt");
                BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                double[] row = new double[f.length];
                for (int i = 0; i < f.length; i++) {
                    row[i] = Double.parseDouble(f[i]);
                }
                rows.add(row);
            }
        }
        return rows;
    }

    @Test
    void answersEqualThoseBeforeTheSpeedWork() throws IOException {
        List<double[]> want = pinned();
        List<double[]> got = compute();
        assertEquals(CASES.length, want.size(), "pinned cases");
        for (int c = 0; c < want.size(); c++) {
            double[] w = want.get(c);
            double[] g = got.get(c);
            String where = String.format(Locale.ROOT, "x = %.2f, d = %.0f nm, V = %.1f V", w[0], w[1], w[2]);
            assertEquals(w[0], g[0], where);
            assertTrue(Math.abs(g[3] - w[3]) <= NS_RELATIVE * Math.abs(w[3]),
                    () -> where + ": n_s " + g[3] + " vs pinned " + w[3]);
            // every pinned subband must still be found; a subband beyond them must be empty in the pin's sense
            assertTrue(g.length >= w.length, () -> where + ": " + (g.length - 4) + " subbands, pinned " + (w.length - 4));
            for (int k = 4; k < w.length; k++) {
                int kk = k;
                assertEquals(w[k], g[k], ENERGY_EV, () -> where + ": subband " + (kk - 4));
            }
        }
    }
}
