package org.wurtzkit.solvers.transport;

import java.util.EnumSet;
import java.util.Set;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * The model choices of a gate-leakage calculation ({@link GateLeakage}). Immutable; change a copy
 * with the {@code with...} methods.
 *
 * @param mechanisms          which currents are computed; default thermionic and tunnelling. Poole-Frenkel
 *                            needs measured trap parameters, so it is off until
 *                            {@link #withPooleFrenkel(PooleFrenkelEmission)} gives them
 * @param transmission        how T(E) is evaluated; default {@link TransmissionMethod#WKB}
 * @param imageForceLowering  whether the image potential -q / (16 pi eps0 eps_inf x) of the gate metal is
 *                            added to the barrier (S. M. Sze and K. K. Ng, Physics of Semiconductor Devices,
 *                            3rd ed., Wiley 2007, sec. 3.2.4); default false, because the gate's barrier
 *                            height phi_B given to the structure is normally a measured effective barrier
 *                            (from I-V or internal photoemission), which already contains the lowering at
 *                            the fields of the measurement; turning it on counts it again. Each result warns
 *                            when the lowering it leaves out exceeds 0.1 eV
 * @param richardsonMass      the in-plane mass of the supply function (m0), i.e. the mass in A* =
 *                            4 pi q m* k^2 / h^3; NaN (the default) takes the in-plane (basal-plane) electron
 *                            mass of the semiconductor at the gate, the usual choice for a Schottky contact
 *                            (Sze and Ng, above, ch. 3). In (0, 100] otherwise
 * @param relativeAccuracy    relative accuracy of each panel of the Tsu-Esaki integral, in [1e-10, 1e-2];
 *                            default 1e-6
 * @param slabWidth           slab width of the transfer matrix (m), in (0, 1e-9]; default 0.02 nm
 * @param pooleFrenkel        measured trap parameters, or null when Poole-Frenkel emission is not computed
 */
public record LeakageOptions(Set<LeakageMechanism> mechanisms, TransmissionMethod transmission,
        boolean imageForceLowering, double richardsonMass, double relativeAccuracy, double slabWidth,
        PooleFrenkelEmission pooleFrenkel) {

    /**
     * Validates and copies.
     *
     * @param mechanisms which currents are computed; default thermionic and tunnelling. Poole-Frenkel needs measured trap parameters, so it is off until {
     * @param transmission how T(E) is evaluated; default {@link TransmissionMethod#WKB}
     * @param imageForceLowering whether the image potential -q / (16 pi eps0 eps_inf x) of the gate metal is added to the barrier (S. M. Sze and K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, sec. 3.2.4); default false, because the gate's barrier height phi_B given to the structure is normally a measured effective barrier (from I-V or internal photoemission), which already contains the lowering at the fields of the measurement; turning it on counts it again. Each result warns when the lowering it leaves out exceeds 0.1 eV
     * @param richardsonMass the in-plane mass of the supply function (m0), i.e. the mass in A* = 4 pi q m* k^2 / h^3; NaN (the default) takes the in-plane (basal-plane) electron mass of the semiconductor at the gate, the usual choice for a Schottky contact (Sze and Ng, above, ch. 3). In (0, 100] otherwise
     * @param relativeAccuracy relative accuracy of each panel of the Tsu-Esaki integral, in [1e-10, 1e-2]; default 1e-6
     * @param slabWidth slab width of the transfer matrix (m), in (0, 1e-9]; default 0.02 nm
     * @param pooleFrenkel measured trap parameters, or null when Poole-Frenkel emission is not computed
     */
    public LeakageOptions {
        Require.nonNull("leakage mechanisms", mechanisms);
        Require.nonNull("transmission method", transmission);
        if (mechanisms.isEmpty()) {
            throw new InvalidParameterException("leakage mechanisms", "[]", "at least one of " + EnumSet.allOf(
                    LeakageMechanism.class));
        }
        mechanisms = Set.copyOf(EnumSet.copyOf(mechanisms));
        if (!Double.isNaN(richardsonMass) && !(richardsonMass > 0 && richardsonMass <= 100)) {
            throw new InvalidParameterException("Richardson mass (m0)", Double.toString(richardsonMass),
                    "(0, 100], or NaN for the in-plane mass at the gate");
        }
        Require.inRange("relative accuracy of the Tsu-Esaki integral", relativeAccuracy, 1e-10, 1e-2);
        if (!(slabWidth > 0 && slabWidth <= 1e-9)) {
            throw new InvalidParameterException("transfer-matrix slab width (m)", Double.toString(slabWidth),
                    "(0, 1e-9]");
        }
        if (mechanisms.contains(LeakageMechanism.POOLE_FRENKEL) && pooleFrenkel == null) {
            throw new InvalidParameterException("Poole-Frenkel parameters", "null",
                    "measured trap parameters when POOLE_FRENKEL is among the mechanisms "
                            + "(use withPooleFrenkel(new PooleFrenkelEmission(trapBarrierEv, prefactor)))");
        }
    }

    /** @return thermionic and tunnelling, WKB, no image force, A* from the gate's semiconductor, 1e-6 */
    public static LeakageOptions defaults() {
        return new LeakageOptions(EnumSet.of(LeakageMechanism.THERMIONIC, LeakageMechanism.TUNNELLING),
                TransmissionMethod.WKB, false, Double.NaN, 1e-6, TransmissionMethod.DEFAULT_SLAB_WIDTH, null);
    }

    /**
     * {@return a copy computing exactly these mechanisms}
     *
     * @param first a mechanism
     * @param rest  more mechanisms
     */
    public LeakageOptions withMechanisms(LeakageMechanism first, LeakageMechanism... rest) {
        return new LeakageOptions(EnumSet.of(first, rest), transmission, imageForceLowering, richardsonMass,
                relativeAccuracy, slabWidth, pooleFrenkel);
    }

    /**

     * {@return a copy}

     *

     * @param v the method

     */
    public LeakageOptions withTransmission(TransmissionMethod v) {
        return new LeakageOptions(mechanisms, v, imageForceLowering, richardsonMass, relativeAccuracy, slabWidth,
                pooleFrenkel);
    }

    /**

     * {@return a copy}

     *

     * @param v whether to add the image potential

     */
    public LeakageOptions withImageForceLowering(boolean v) {
        return new LeakageOptions(mechanisms, transmission, v, richardsonMass, relativeAccuracy, slabWidth,
                pooleFrenkel);
    }

    /**

     * {@return a copy}

     *

     * @param v supply mass (m0), NaN for the default

     */
    public LeakageOptions withRichardsonMass(double v) {
        return new LeakageOptions(mechanisms, transmission, imageForceLowering, v, relativeAccuracy, slabWidth,
                pooleFrenkel);
    }

    /**

     * {@return a copy}

     *

     * @param v relative accuracy

     */
    public LeakageOptions withRelativeAccuracy(double v) {
        return new LeakageOptions(mechanisms, transmission, imageForceLowering, richardsonMass, v, slabWidth,
                pooleFrenkel);
    }

    /**

     * {@return a copy}

     *

     * @param v slab width (m)

     */
    public LeakageOptions withSlabWidth(double v) {
        return new LeakageOptions(mechanisms, transmission, imageForceLowering, richardsonMass, relativeAccuracy, v,
                pooleFrenkel);
    }

    /**
     * @param v measured trap parameters
     * @return a copy that also computes Poole-Frenkel emission with them
     */
    public LeakageOptions withPooleFrenkel(PooleFrenkelEmission v) {
        Require.nonNull("Poole-Frenkel parameters", v);
        EnumSet<LeakageMechanism> m = EnumSet.copyOf(mechanisms);
        m.add(LeakageMechanism.POOLE_FRENKEL);
        return new LeakageOptions(m, transmission, imageForceLowering, richardsonMass, relativeAccuracy, slabWidth, v);
    }

    /**

     * {@return whether it is computed}

     *

     * @param m a mechanism

     */
    public boolean computes(LeakageMechanism m) {
        return mechanisms.contains(m);
    }

    /**
     * The options as text for a result's provenance, the same on every JVM: the mechanisms in their
     * declaration order (the record's own {@code toString} lists an immutable set, whose order may
     * differ from one JVM to the next), then every other component, numbers by
     * {@link Double#toString(double)}.
     *
     * @return e.g. {@code "mechanisms=[THERMIONIC, TUNNELLING], transmission=WKB, imageForceLowering=false, ..."}
     */
    public String describe() {
        return "mechanisms=" + java.util.EnumSet.copyOf(mechanisms) + ", transmission=" + transmission
                + ", imageForceLowering=" + imageForceLowering + ", richardsonMass=" + richardsonMass
                + ", relativeAccuracy=" + relativeAccuracy + ", slabWidth=" + slabWidth + ", pooleFrenkel="
                + pooleFrenkel;
    }
}
