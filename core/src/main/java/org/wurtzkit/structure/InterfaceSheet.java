package org.wurtzkit.structure;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * Charge sitting on the top face of a nitride layer, beside the polarization bound charge that the
 * structure computes itself: a fixed sheet (signed; e.g. the positive charge found at ALD
 * Al2O3/GaN and SiN/AlGaN interfaces) and any number of {@link InterfaceStates}, whose occupancy the
 * solver sets from the Fermi level. Attach one with {@code Structure.Builder.sheetOnTop}.
 *
 * <p>A {@link DeltaDoping} sheet cannot serve as the fixed charge: it is a dopant whose ionization
 * follows the Fermi level, and it can only be positive (donor) or negative (acceptor) by kind.
 *
 * @param fixedChargePerM2 fixed sheet charge divided by e (m^-2), signed, |value| at most 1e19
 * @param states           interface states (may be empty)
 */
public record InterfaceSheet(double fixedChargePerM2, List<InterfaceStates> states) {
    /**
     * Validates and copies.
     *
     * @param fixedChargePerM2 fixed sheet charge divided by e (m^-2), signed, |value| at most 1e19
     * @param states interface states (may be empty)
     */
    public InterfaceSheet {
        Require.inRange("fixed interface charge / e (m^-2)", fixedChargePerM2, -1e19, 1e19);
        states = List.copyOf(states);
    }

    /**
     * @param chargePerCm2 fixed sheet charge divided by e (cm^-2), signed: +4.6e12 is a positive sheet
     * @return a sheet with that fixed charge and no states
     */
    public static InterfaceSheet fixedPerCm2(double chargePerCm2) {
        Require.finite("fixed interface charge / e (cm^-2)", chargePerCm2);
        return new InterfaceSheet(Units.perCm2ToPerM2(chargePerCm2), List.of());
    }

    /**
     * @param s interface states
     * @return a sheet with no fixed charge and those states
     */
    public static InterfaceSheet of(InterfaceStates s) {
        return new InterfaceSheet(0, List.of(Require.nonNull("interface states", s)));
    }

    /**

     * {@return a copy with them added}

     *

     * @param s interface states

     */
    public InterfaceSheet withStates(InterfaceStates s) {
        List<InterfaceStates> l = new ArrayList<>(states);
        l.add(Require.nonNull("interface states", s));
        return new InterfaceSheet(fixedChargePerM2, l);
    }

    /** {@return the fixed charge divided by e (cm^-2), signed} */
    public double fixedChargePerCm2() {
        return Units.perM2ToPerCm2(fixedChargePerM2);
    }

    /** @return e.g. {@code "fixed +4.6e12 e/cm^2; interface states uniform 1e12 cm^-2 eV^-1, ..."} */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("fixed ").append(fixedChargePerM2 > 0 ? "+" : "")
                .append(Decimals.format(fixedChargePerCm2(), "e/cm^2"));
        for (InterfaceStates s : states) {
            sb.append("; ").append(s);
        }
        return sb.toString();
    }
}
