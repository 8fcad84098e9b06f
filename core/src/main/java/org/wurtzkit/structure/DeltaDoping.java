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
    /**
     * Creates the record and checks every component.
     *
     * @param kind               donor or acceptor
     * @param sheetDensityPerM2  sheet density (m^-2), &ge; 0
     * @param ionizationEnergyEv ionization energy (eV), in [0, 2]
     * @param offsetFromLayerTop distance of the sheet below the top of its layer (m), &ge; 0 and
     *                                                     not beyond the layer's thickness (checked by the layer)
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public DeltaDoping {
        Require.nonNull("delta doping kind", kind);
        Require.inRange("delta sheet density (m^-2)", sheetDensityPerM2, 0, 1e19);
        Require.inRange("delta doping ionization energy (eV)", ionizationEnergyEv, 0, 2);
        Require.nonNegative("delta sheet offset from layer top (m)", offsetFromLayerTop);
    }

    /**
     * A donor sheet at the top of its layer; place it with {@link #atOffsetNm(double)} or
     * {@link #atOffset(double)}: {@code DeltaDoping.donorsPerCm2(5e12, 0.015).atOffsetNm(3)}.
     *
     * @param sheetPerCm2        sheet density (cm^-2), in [0, 1e15]
     * @param ionizationEnergyEv E_c - E_D (eV), in [0, 2]
     * @return a donor sheet (degeneracy 2) at offset 0
     */
    public static DeltaDoping donorsPerCm2(double sheetPerCm2, double ionizationEnergyEv) {
        return new DeltaDoping(Dopant.Kind.DONOR, Units.perCm2ToPerM2(sheetPerCm2), ionizationEnergyEv, 0);
    }

    /**
     * An acceptor sheet at the top of its layer; place it with {@link #atOffsetNm(double)}.
     *
     * @param sheetPerCm2        sheet density (cm^-2), in [0, 1e15]
     * @param ionizationEnergyEv E_A - E_v (eV), in [0, 2]
     * @return an acceptor sheet (degeneracy 4) at offset 0
     */
    public static DeltaDoping acceptorsPerCm2(double sheetPerCm2, double ionizationEnergyEv) {
        return new DeltaDoping(Dopant.Kind.ACCEPTOR, Units.perCm2ToPerM2(sheetPerCm2), ionizationEnergyEv, 0);
    }

    /**
     * @param sheetPerCm2         sheet density (cm^-2)
     * @param ionizationEnergyEv  E_c - E_D (eV)
     * @param offsetFromLayerTop  depth below the layer's top (m)
     * @return a donor sheet (degeneracy 2)
     * @deprecated mixes cm^-2 and metres in one call: use
     *             {@code donorsPerCm2(sheetPerCm2, ionizationEnergyEv).atOffset(offsetFromLayerTop)}
     *             or {@code .atOffsetNm(...)}
     */
    @Deprecated(since = "0.2", forRemoval = true)
    public static DeltaDoping donorsPerCm2(double sheetPerCm2, double ionizationEnergyEv, double offsetFromLayerTop) {
        return donorsPerCm2(sheetPerCm2, ionizationEnergyEv).atOffset(offsetFromLayerTop);
    }

    /**
     * @param offsetFromLayerTop distance below the top of the layer (m), &ge; 0
     * @return this sheet at that depth in its layer
     */
    public DeltaDoping atOffset(double offsetFromLayerTop) {
        return new DeltaDoping(kind, sheetDensityPerM2, ionizationEnergyEv, offsetFromLayerTop);
    }

    /**
     * @param offsetNm distance below the top of the layer (nm), &ge; 0
     * @return this sheet at that depth in its layer
     */
    public DeltaDoping atOffsetNm(double offsetNm) {
        return atOffset(offsetNm * Units.NM);
    }

    /** {@return sheet density (cm^-2)} */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(sheetDensityPerM2);
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
