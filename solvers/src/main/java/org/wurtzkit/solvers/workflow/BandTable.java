package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.Optional;
import org.wurtzkit.errors.Require;
import org.wurtzkit.provenance.ResultProvenance;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * The band diagram of a solution as a table on the mesh nodes: depth, E_c, E_v (eV, bottom
 * contact's Fermi level at 0) and the carrier and ionized-dopant densities, one row per node. At an
 * interface node the band edges are those of the layer below it (as in
 * {@link Solution#conductionBand()}); {@link Solution#interfaceEdges()} gives both sides. Immutable;
 * array accessors return copies.
 *
 * <p>CSV columns: {@code depth_nm, conduction_band_eV, valence_band_eV, electrons_cm^-3,
 * holes_cm^-3, ionized_donors_cm^-3, ionized_acceptors_cm^-3}, after the solution's provenance
 * ({@link Solution#provenance()}) as comment lines.
 */
public final class BandTable implements CsvTable {
    private static final List<Column> COLUMNS = List.of(Column.of("depth", "nm"), Column.of("conduction_band", "eV"),
            Column.of("valence_band", "eV"), Column.of("electrons", "cm^-3"), Column.of("holes", "cm^-3"),
            Column.of("ionized_donors", "cm^-3"), Column.of("ionized_acceptors", "cm^-3"));

    private final double[] depth;
    private final double[] ec;
    private final double[] ev;
    private final double[] n;
    private final double[] p;
    private final double[] donors;
    private final double[] acceptors;
    private final Solution solution;

    private BandTable(Solution s) {
        solution = s;
        depth = s.depth();
        ec = s.conductionBand();
        ev = s.valenceBand();
        n = s.electronDensity();
        p = s.holeDensity();
        donors = s.ionizedDonors();
        acceptors = s.ionizedAcceptors();
    }

    /**
     * @param solution a solution
     * @return its band diagram on the mesh nodes
     */
    public static BandTable of(Solution solution) {
        return new BandTable(Require.nonNull("solution", solution));
    }

    /**
     * {@return the provenance of the solution the table was read from ({@link Solution#provenance()}):
     * solving its structure again with its solver options gives this table bit for bit}
     */
    @Override
    public Optional<ResultProvenance> provenance() {
        return Optional.of(solution.provenance());
    }

    /** {@return depth of each node (m)} */
    public double[] depth() {
        return depth.clone();
    }

    /** {@return depth of each node (nm)} */
    public double[] depthNm() {
        return scaled(depth, 1 / Units.NM);
    }

    /** {@return E_c at each node (eV)} */
    public double[] conductionBandEv() {
        return ec.clone();
    }

    /** {@return E_v at each node (eV)} */
    public double[] valenceBandEv() {
        return ev.clone();
    }

    /** {@return electron density at each node (m^-3)} */
    public double[] electronDensity() {
        return n.clone();
    }

    /** {@return electron density at each node (cm^-3)} */
    public double[] electronDensityPerCm3() {
        return scaled(n, 1e-6);
    }

    /** {@return hole density at each node (m^-3)} */
    public double[] holeDensity() {
        return p.clone();
    }

    /** {@return hole density at each node (cm^-3)} */
    public double[] holeDensityPerCm3() {
        return scaled(p, 1e-6);
    }

    /** {@return ionized donors, empty donor-like traps included, at each node (m^-3)} */
    public double[] ionizedDonors() {
        return donors.clone();
    }

    /** {@return ionized donors at each node (cm^-3)} */
    public double[] ionizedDonorsPerCm3() {
        return scaled(donors, 1e-6);
    }

    /** {@return ionized acceptors, filled acceptor-like traps included, at each node (m^-3)} */
    public double[] ionizedAcceptors() {
        return acceptors.clone();
    }

    /** {@return ionized acceptors at each node (cm^-3)} */
    public double[] ionizedAcceptorsPerCm3() {
        return scaled(acceptors, 1e-6);
    }

    private static double[] scaled(double[] a, double f) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i] * f;
        }
        return out;
    }

    @Override
    public List<Column> columns() {
        return COLUMNS;
    }

    @Override
    public int rowCount() {
        return depth.length;
    }

    @Override
    public List<String> row(int i) {
        return List.of(CsvTable.cell(depth[i] / Units.NM), CsvTable.cell(ec[i]), CsvTable.cell(ev[i]),
                CsvTable.cell(n[i] * 1e-6), CsvTable.cell(p[i] * 1e-6), CsvTable.cell(donors[i] * 1e-6),
                CsvTable.cell(acceptors[i] * 1e-6));
    }

    /** @return e.g. {@code "Band table: 412 nodes over 1825 nm"} and a {@link #preview(int) preview} */
    @Override
    public String toString() {
        return "Band table: " + depth.length + " nodes over " + Decimals.format(depth[depth.length - 1] / Units.NM, "nm")
                + "\n" + preview(10);
    }
}
