package org.wurtzkit.solvers.workflow;

import java.util.List;
import java.util.function.ToDoubleFunction;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.units.Units;

/**
 * A number read off a converged {@link Solution}, with its column name and unit: the output
 * columns of a design map. The extractor must be thread-safe; an exception it throws marks the
 * point as failed.
 *
 * @param column    name and unit of the output column
 * @param extractor reads the value from a solution
 */
public record Quantity(Column column, ToDoubleFunction<Solution> extractor) {
    /** 2DEG sheet density, {@link Solution#sheetDensityPerCm2()} (cm^-2). */
    public static final Quantity SHEET_DENSITY = of("sheet_density", "cm^-2", Solution::sheetDensityPerCm2);
    /** Sheet charge on the gate metal, {@link Solution#gateCharge()} (C/m&sup2;). */
    public static final Quantity GATE_CHARGE = of("gate_charge", "C/m^2", Solution::gateCharge);
    /** All electrons of the stack, {@link Solution#electronSheetDensity()} (cm^-2). */
    public static final Quantity ELECTRONS_TOTAL = of("electrons_total", "cm^-2",
            s -> Units.perM2ToPerCm2(s.electronSheetDensity()));
    /** Lowest subband energy minus the Fermi level (eV); fails the point if there is no subband. */
    public static final Quantity GROUND_SUBBAND = of("ground_subband_minus_fermi", "eV", Quantity::groundSubband);

    /** Validates. */
    public Quantity {
        Require.nonNull("quantity column", column);
        Require.nonNull("quantity extractor", extractor);
    }

    /**
     * @param name      column name
     * @param unit      column unit
     * @param extractor reads the value
     * @return the quantity
     */
    public static Quantity of(String name, String unit, ToDoubleFunction<Solution> extractor) {
        return new Quantity(Column.of(name, unit), extractor);
    }

    private static double groundSubband(Solution s) {
        List<Subband> bands = s.subbands();
        if (bands.isEmpty()) {
            throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                    "the solution has no subband (no quantum window or no bound state)");
        }
        double e = Double.POSITIVE_INFINITY;
        for (Subband b : bands) {
            e = Math.min(e, b.energyEv());
        }
        return e;
    }

    /** @return the column, e.g. {@code "Quantity[sheet_density (cm^-2)]"} (the extractor is code, not shown) */
    @Override
    public String toString() {
        return "Quantity[" + column + "]";
    }
}
