package org.wurtzkit.units;

/**
 * Conversions between the SI units used inside the library and the units the trade speaks
 * (nm, Angstrom, cm^-2, cm^-3, GPa). Every method name says which way it converts.
 */
public final class Units {
    private Units() {
    }

    /** Metres per nanometre. */
    public static final double NM = 1e-9;
    /** Metres per Angstrom. */
    public static final double ANGSTROM = 1e-10;
    /** Pascal per gigapascal. */
    public static final double GPA = 1e9;
    /** Volts per metre in one MV/cm (field). */
    public static final double MV_PER_CM = 1e8;
    /** Farads per square metre in one uF/cm^2 (capacitance per area). */
    public static final double UF_PER_CM2 = 1e-2;

    /**
     * Converts a length from nanometres to metres.
     *
     * @param nm length (nm)
     * @return length (m)
     */
    public static double nmToM(double nm) {
        return nm * NM;
    }

    /**
     * Converts a length from metres to nanometres.
     *
     * @param m length (m)
     * @return length (nm)
     */
    public static double mToNm(double m) {
        return m / NM;
    }

    /**
     * Converts an areal density from cm<sup>-2</sup> to m<sup>-2</sup>.
     *
     * @param perCm2 areal density (cm^-2)
     * @return areal density (m^-2)
     */
    public static double perCm2ToPerM2(double perCm2) {
        return perCm2 * 1e4;
    }

    /**
     * Converts an areal density from m<sup>-2</sup> to cm<sup>-2</sup>.
     *
     * @param perM2 areal density (m^-2)
     * @return areal density (cm^-2)
     */
    public static double perM2ToPerCm2(double perM2) {
        return perM2 * 1e-4;
    }

    /**
     * Converts a volume density from cm<sup>-3</sup> to m<sup>-3</sup>.
     *
     * @param perCm3 volume density (cm^-3)
     * @return volume density (m^-3)
     */
    public static double perCm3ToPerM3(double perCm3) {
        return perCm3 * 1e6;
    }

    /**
     * Converts a volume density from m<sup>-3</sup> to cm<sup>-3</sup>.
     *
     * @param perM3 volume density (m^-3)
     * @return volume density (cm^-3)
     */
    public static double perM3ToPerCm3(double perM3) {
        return perM3 * 1e-6;
    }

    /**
     * Sheet charge expressed as a number of elementary charges per cm^2.
     *
     * @param sigma sheet charge (C/m^2)
     * @return sigma / e (cm^-2), signed
     */
    public static double chargeToPerCm2(double sigma) {
        return perM2ToPerCm2(sigma / Constants.ELEMENTARY_CHARGE);
    }
}
