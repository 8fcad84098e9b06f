package org.wurtzkit.structure;

import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.units.Decimals;
import org.wurtzkit.units.Units;

/**
 * A deposited amorphous dielectric layer of the gate stack (above the nitride layers). It has no
 * strain and no polarization; the bound charge at its interface with a nitride is therefore the
 * nitride's P_z with zero on the amorphous side, as at a free surface. It carries no free carriers
 * and no dopants (see {@link Insulator}).
 *
 * @param name      a name for reports
 * @param insulator the dielectric
 * @param thickness thickness (m), &gt; 0 and at most {@link Layer#MAX_THICKNESS}
 */
public record InsulatorLayer(String name, Insulator insulator, double thickness) {
    /**
     * Validates.
     *
     * @param name a name for reports
     * @param insulator the dielectric
     * @param thickness thickness (m), &gt; 0 and at most {@link Layer#MAX_THICKNESS}
     */
    public InsulatorLayer {
        Require.nonNull("insulator layer name", name);
        Require.nonNull("insulator of layer \"" + name + "\"", insulator);
        if (!(thickness > 0 && thickness <= Layer.MAX_THICKNESS)) {
            throw new InvalidParameterException("thickness of insulator layer \"" + name + "\" (m)",
                    Double.toString(thickness), "(0, " + Layer.MAX_THICKNESS + "]");
        }
    }

    /**
     * @param insulator   the dielectric (named after it)
     * @param thicknessNm thickness (nm)
     * @return the layer
     */
    public static InsulatorLayer ofNm(Insulator insulator, double thicknessNm) {
        Require.nonNull("insulator", insulator);
        return new InsulatorLayer(insulator.name(), insulator, Units.nmToM(thicknessNm));
    }

    /**

     * {@return a copy with that thickness}

     *

     * @param t thickness (m)

     */
    public InsulatorLayer withThickness(double t) {
        return new InsulatorLayer(name, insulator, t);
    }

    /** {@return the insulator capacitance per area epsilon_0 kappa / t (F/m^2)} */
    public double capacitancePerArea() {
        return org.wurtzkit.units.Constants.VACUUM_PERMITTIVITY * insulator.relativePermittivity() / thickness;
    }

    /** @return e.g. {@code "gate oxide: SiO2 insulator, 10 nm"} */
    @Override
    public String toString() {
        return name + ": " + insulator.name() + " insulator, " + Decimals.format(Units.mToNm(thickness), "nm");
    }
}
