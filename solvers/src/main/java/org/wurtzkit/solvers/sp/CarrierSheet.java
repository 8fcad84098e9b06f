package org.wurtzkit.solvers.sp;

import org.wurtzkit.errors.Require;
import org.wurtzkit.units.Units;

/**
 * Free carriers of one kind gathered in one layer: the subbands of one quantum window whose
 * centroid lies in that layer, or the classical carriers of the layer outside every window. In the
 * window that holds a metal-face channel interface each subband is first split at the
 * conduction-band maximum between the window's top and the interface: the part on the gate side of
 * that maximum is a sheet of its own (the parasitic channel under forward bias), the rest belongs
 * to the channel.
 * {@link Solution#carrierSheets()} lists every such sheet above {@link Solution#SHEET_REPORT_THRESHOLD}.
 *
 * @param carrier        electrons or holes
 * @param role           the channel 2DEG, a parasitic sheet between the gate and the channel, or another
 * @param layer          name of the layer holding it
 * @param window         index of the quantum window whose subbands it holds, or -1 for classical carriers
 * @param depthTop       upper depth of the part of the layer it was gathered from (m)
 * @param depthBottom    lower depth of that part (m)
 * @param centroidDepth  mean depth of its carriers (m)
 * @param sheetDensity   carriers per area (m^-2), &ge; 0
 * @param contact        the contact its carriers follow at the centroid ({@link QuasiFermiLevels})
 * @param quasiFermiLevelEv that contact's level (eV)
 */
public record CarrierSheet(Carrier carrier, Role role, String layer, int window, double depthTop, double depthBottom,
        double centroidDepth, double sheetDensity, FermiContact contact, double quasiFermiLevelEv) {

    /** What a sheet is for the device. */
    public enum Role {
        /**
         * The channel 2DEG: the subband electrons on the well side (lower E_c) of the deepest interface
         * with a positive polarization sheet, in the window holding that interface, below the
         * barrier's conduction-band maximum; for a solve without windows, the classical electrons of
         * that layer; without such an interface, the largest electron sheet.
         */
        CHANNEL,
        /** Electrons between a gate and the channel (e.g. in the barrier under forward bias): a parasitic channel. */
        UNDER_GATE,
        /** Anything else: holes, a second or back channel, carriers in the buffer. */
        OTHER
    }

    /**
     * Validates the components.
     *
     * @param carrier electrons or holes
     * @param role the channel 2DEG, a parasitic sheet between the gate and the channel, or another
     * @param layer name of the layer holding it
     * @param window index of the quantum window whose subbands it holds, or -1 for classical carriers
     * @param depthTop upper depth of the part of the layer it was gathered from (m)
     * @param depthBottom lower depth of that part (m)
     * @param centroidDepth mean depth of its carriers (m)
     * @param sheetDensity carriers per area (m^-2), &ge; 0
     * @param contact the contact its carriers follow at the centroid ({@link QuasiFermiLevels})
     * @param quasiFermiLevelEv that contact's level (eV)
     */
    public CarrierSheet {
        Require.nonNull("carrier", carrier);
        Require.nonNull("role", role);
        Require.nonNull("layer", layer);
        Require.nonNull("contact", contact);
        Require.nonNegative("sheet density (m^-2)", sheetDensity);
    }

    /** {@return the sheet density (cm^-2)} */
    public double sheetDensityPerCm2() {
        return Units.perM2ToPerCm2(sheetDensity);
    }
}
