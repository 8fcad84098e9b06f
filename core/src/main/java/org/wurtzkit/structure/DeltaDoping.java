package org.wurtzkit.structure;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * A delta-doping sheet inside a layer.
 *
 * @param kind               donor or acceptor
 * @param sheetDensityPerM2  sheet density (m^-2), &ge; 0
 * @param ionizationEnergyEv ionization energy (eV), in [0, 2]
 * @param offsetFromLayerTop distance of the sheet below the top of its layer (m), &ge; 0 and
 *                           not beyond the layer's thickness (checked by the layer)
 */
public record DeltaDoping(Dopant.Kind kind, double sheetDensityPerM2, double ionizationEnergyEv,
        double offsetFromLayerTop) {
    /** Validates. */
    public DeltaDoping {
        Require.nonNull("delta doping kind", kind);
        Require.inRange("delta sheet density (m^-2)", sheetDensityPerM2, 0, 1e19);
        Require.inRange("delta doping ionization energy (eV)", ionizationEnergyEv, 0, 2);
        Require.nonNegative("delta sheet offset from layer top (m)", offsetFromLayerTop);
    }

    /**
     * @param sheetPerCm2         sheet density (cm^-2)
     * @param ionizationEnergyEv  E_c - E_D (eV)
     * @param offsetFromLayerTop  depth below the layer's top (m)
     * @return a donor sheet (degeneracy 2)
     */
    public static DeltaDoping donorsPerCm2(double sheetPerCm2, double ionizationEnergyEv, double offsetFromLayerTop) {
        return new DeltaDoping(Dopant.Kind.DONOR, Units.perCm2ToPerM2(sheetPerCm2), ionizationEnergyEv,
                offsetFromLayerTop);
    }

    /** {@return the degeneracy factor: {@link Dopant#DONOR_DEGENERACY} or {@link Dopant#ACCEPTOR_DEGENERACY}} */
    public double degeneracy() {
        return kind == Dopant.Kind.DONOR ? Dopant.DONOR_DEGENERACY : Dopant.ACCEPTOR_DEGENERACY;
    }

    /** @return e.g. {@code "donor sheet 5e12 cm^-2 at 3 nm below the layer top, ionization energy 0.015 eV"} */
    @Override
    public String toString() {
        return (kind == Dopant.Kind.DONOR ? "donor" : "acceptor") + " sheet "
                + Decimals.format(Units.perM2ToPerCm2(sheetDensityPerM2), "cm^-2") + " at "
                + Decimals.format(Units.mToNm(offsetFromLayerTop), "nm") + " below the layer top, ionization energy "
                + Decimals.format(ionizationEnergyEv, "eV");
    }
}
