package org.wurtzkit.solvers.transport.mobility;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;

/**
 * What {@link Mobility#of} computes: the mechanisms (an explicit, open list), the screening model, an
 * optional override of the channel's material constants and the quadrature size.
 *
 * <p>{@link #defaults()}: all seven built-in mechanisms, with the sample defaults
 * {@link InterfaceRoughness#DEFAULT}, {@link ChargedDislocations#DEFAULT} and
 * {@link RemoteCharge#DEFAULT}; {@link Screening#THOMAS_FERMI}; channel constants from the structure's
 * parameter set; {@link SubbandScattering#DEFAULT_QUADRATURE_POINTS} nodes; subbands below
 * {@link #DEFAULT_MINIMUM_SUBBAND_FRACTION} of the electrons left out. The roughness and the
 * dislocations are properties of a sample: set them for yours with {@link #withMechanisms}.
 *
 * @param mechanisms       at least one, names unique
 * @param screening        screening model
 * @param channel          constants to use for every subband instead of the parameter set's, or null
 * @param quadraturePoints nodes of the graded Gauss-Legendre rule, in [12, 1000]; used in panels of 6
 * @param minimumSubbandFraction subbands holding less than this fraction of the subband electrons are
 *                         left out of the mobility (their electrons are reported by
 *                         {@link MobilityResult#excludedSheetDensity()}), in [0, 0.01]
 */
public record MobilityOptions(List<ScatteringMechanism> mechanisms, Screening screening, ChannelParameters channel,
        int quadraturePoints, double minimumSubbandFraction) {
    /**
     * Default {@link #minimumSubbandFraction()}: 1e-3. The high subbands of a warm 2DEG (18 at 300 K in a
     * 1e13 cm^-2 AlGaN/GaN channel) each hold well under 0.1 % of the electrons and have lower mobilities
     * than the ground subband, so together they move the sheet conductance by about their share of
     * the electrons (0.2 % in that example) while costing most of the time.
     */
    public static final double DEFAULT_MINIMUM_SUBBAND_FRACTION = 1e-3;

    /**
     * Validates and copies.
     *
     * @param mechanisms at least one, names unique
     * @param screening screening model
     * @param channel constants to use for every subband instead of the parameter set's, or null
     * @param quadraturePoints nodes of the graded Gauss-Legendre rule, in [12, 1000]; used in panels of 6
     * @param minimumSubbandFraction subbands holding less than this fraction of the subband electrons are left out of the mobility (their electrons are reported by {
     */
    public MobilityOptions {
        mechanisms = List.copyOf(Require.nonNull("mechanisms", mechanisms));
        if (mechanisms.isEmpty()) {
            throw new InvalidParameterException("number of scattering mechanisms", "0", "[1, ...)");
        }
        Set<String> names = new HashSet<>();
        for (ScatteringMechanism m : mechanisms) {
            if (!names.add(Require.nonNull("mechanism name", m.name()))) {
                throw new InvalidParameterException("mechanism name", m.name(), "(unique within the list)");
            }
        }
        Require.nonNull("screening", screening);
        Require.inRange("quadrature points", quadraturePoints, 12, 1000);
        Require.inRange("minimum subband fraction", minimumSubbandFraction, 0, 0.01);
    }

    /** @return the seven built-in mechanisms with their defaults */
    public static List<ScatteringMechanism> allMechanisms() {
        return List.of(new PolarOpticalPhonon(), new AcousticDeformationPotential(), new PiezoelectricAcoustic(),
                new AlloyDisorder(), InterfaceRoughness.DEFAULT, ChargedDislocations.DEFAULT, RemoteCharge.DEFAULT);
    }

    /** @return the defaults */
    public static MobilityOptions defaults() {
        return new MobilityOptions(allMechanisms(), Screening.THOMAS_FERMI, null,
                SubbandScattering.DEFAULT_QUADRATURE_POINTS, DEFAULT_MINIMUM_SUBBAND_FRACTION);
    }

    /**
     * @param list the mechanisms
     * @return a copy with them
     */
    public MobilityOptions withMechanisms(List<ScatteringMechanism> list) {
        return new MobilityOptions(list, screening, channel, quadraturePoints, minimumSubbandFraction);
    }

    /**
     * @param m a mechanism
     * @return a copy where m replaces the mechanism of the same name, or is appended if there is none
     */
    public MobilityOptions withMechanism(ScatteringMechanism m) {
        Require.nonNull("mechanism", m);
        java.util.ArrayList<ScatteringMechanism> list = new java.util.ArrayList<>(mechanisms);
        int at = -1;
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).name().equals(m.name())) {
                at = i;
            }
        }
        if (at >= 0) {
            list.set(at, m);
        } else {
            list.add(m);
        }
        return withMechanisms(list);
    }

    /**
     * @param s the screening model
     * @return a copy with it
     */
    public MobilityOptions withScreening(Screening s) {
        return new MobilityOptions(mechanisms, s, channel, quadraturePoints, minimumSubbandFraction);
    }

    /**
     * @param c channel constants for every subband, or null for the parameter set's
     * @return a copy with them
     */
    public MobilityOptions withChannel(ChannelParameters c) {
        return new MobilityOptions(mechanisms, screening, c, quadraturePoints, minimumSubbandFraction);
    }

    /**
     * @param fraction subbands below this fraction of the electrons are left out, in [0, 0.01]
     * @return a copy with it
     */
    public MobilityOptions withMinimumSubbandFraction(double fraction) {
        return new MobilityOptions(mechanisms, screening, channel, quadraturePoints, fraction);
    }

    /**
     * @param points Gauss-Legendre nodes
     * @return a copy with them
     */
    public MobilityOptions withQuadraturePoints(int points) {
        return new MobilityOptions(mechanisms, screening, channel, points, minimumSubbandFraction);
    }
}
