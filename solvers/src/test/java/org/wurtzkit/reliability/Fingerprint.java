package org.wurtzkit.reliability;

import java.nio.ByteBuffer;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.wurtzkit.solvers.sp.BandDiagram;
import org.wurtzkit.solvers.sp.ConvergenceRecord;
import org.wurtzkit.solvers.sp.DepthRange;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;

/**
 * A SHA-256 of every number a {@link Solution} reports, taken bit for bit
 * ({@link Double#doubleToRawLongBits}), so that two solutions agree on the fingerprint exactly when
 * they are identical.
 */
final class Fingerprint {
    private Fingerprint() {
    }

    private static final class Hasher {
        private final MessageDigest md;
        private final ByteBuffer buf = ByteBuffer.allocate(8);

        Hasher() {
            try {
                md = MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException(e);
            }
        }

        void add(double v) {
            buf.clear();
            buf.putLong(Double.doubleToRawLongBits(v));
            md.update(buf.array());
        }

        void add(long v) {
            buf.clear();
            buf.putLong(v);
            md.update(buf.array());
        }

        void add(double[] a) {
            add((long) a.length);
            for (double v : a) {
                add(v);
            }
        }

        String hex() {
            return HexFormat.of().formatHex(md.digest());
        }
    }

    /**
     * @param s a solution
     * @return the hex SHA-256 of all its numbers
     */
    static String of(Solution s) {
        Hasher h = new Hasher();
        for (double[] a : new double[][] {s.depth(), s.potential(), s.conductionBand(), s.valenceBand(),
            s.electronDensity(), s.holeDensity(), s.ionizedDonors(), s.ionizedAcceptors(), s.chargeDensity(),
            s.cellMidpoints(), s.electricField(), s.wellSheetDensities()}) {
            h.add(a);
        }
        BandDiagram bd = s.bandDiagram();
        h.add(bd.depth());
        h.add(bd.conductionEv());
        h.add(bd.valenceEv());
        for (DepthRange w : s.quantumWindows()) {
            h.add(new double[] {w.top(), w.bottom()});
        }
        h.add((long) s.subbands().size());
        for (Subband b : s.subbands()) {
            h.add((long) b.window());
            h.add((long) b.index());
            h.add(b.energyEv());
            h.add(b.sheetDensity());
            h.add(b.inPlaneMass());
            h.add(b.wavefunction());
        }
        h.add(s.sheetDensityPerCm2());
        h.add(s.electronSheetDensity());
        h.add(s.holeSheetDensity());
        h.add(s.gateCharge());
        h.add(s.chargeNeutralityResidual());
        h.add(s.electronFermiLevel());
        h.add(s.holeFermiLevel());
        ConvergenceRecord r = s.convergence();
        h.add((long) r.iterations());
        h.add((long) r.newtonIterations());
        h.add(r.residualHistory());
        return h.hex();
    }
}
