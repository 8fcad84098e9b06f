package org.wurtzkit.structure;

import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * An {@link InterfaceSheet} where the structure put it: on the top face of a nitride layer.
 *
 * @param depth           depth of the interface below the top surface (m)
 * @param upperName       the layer or insulator above it, or "vacuum" at a free surface
 * @param nitrideIndex    index from the top (in {@link Structure#layerStates()}) of the nitride below it
 * @param nitrideGapEv    that nitride's gap at its top face at the structure's temperature (eV); the
 *                        interface states' energies run over [0, this] below its E_c
 * @param sheet           the charge
 */
public record PlacedSheet(double depth, String upperName, int nitrideIndex, double nitrideGapEv, InterfaceSheet sheet) {
    /** @return e.g. {@code "sheet under SiO2 at 10 nm: fixed +4.6e12 e/cm^2"} */
    @Override
    public String toString() {
        return "sheet under " + upperName + " at " + Decimals.format(Units.mToNm(depth), "nm") + ": " + sheet;
    }
}
