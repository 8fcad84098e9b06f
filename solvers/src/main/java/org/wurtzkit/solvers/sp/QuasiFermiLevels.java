package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.errors.Require;

/**
 * Which contact each carrier type follows in each part of the stack: a typed, validated option of
 * the solve ({@link SolverOptions#quasiFermiLevels()}). A solve is one-dimensional and carries no
 * current, so every part of the stack is in equilibrium with one contact per carrier type: the gate
 * (the top Schottky boundary, Fermi level -V), the channel's ohmic contacts (the bottom contact,
 * 0 eV), or a level the user gives for a floating layer ({@link FermiContact}).
 *
 * <h2>Defaults (no rule given)</h2>
 * <ul>
 * <li><b>Electrons</b> follow the channel everywhere ({@link ForwardBiasElectrons#NONE}, the default).
 * The opt-in rule {@link ForwardBiasElectrons#GATE_SIDE_FOLLOWS_GATE} changes that under a
 * forward-biased Schottky gate: there the electrons between
 * the gate and the conduction-band maximum of the layers above the channel follow the gate (level
 * -V). The metal holds the electrons on its side of that maximum at its own level (the thermionic
 * picture of a Schottky contact: at the metal the electron density is N_c exp(-phi_B / kT) whatever
 * the bias, E. H. Rhoderick and R. H. Williams, Metal-Semiconductor Contacts, 2nd ed., Clarendon
 * Press 1988), while those beyond it exchange with the channel. The maximum is found on the current
 * potential in each outer iteration of the solve, so the split is part of the self-consistent loop;
 * it is frozen once the outer change of the potential falls below
 * {@value #FORWARD_SPLIT_FREEZE_V} V or after it has moved {@value #FORWARD_SPLIT_MAX_MOVES} times,
 * so that it cannot oscillate. The rule applies only for a gate bias above 0 V on a Schottky gate
 * directly on the nitride (an insulator under the gate holds no current, so the electrons under
 * it follow the channel), only where a channel exists (a positive polarization sheet), and never
 * in cells that an electron rule covers. At V &le; 0 it changes nothing.
 * Why it is not the default: with it the barrier under the gate holds no electrons and the 2DEG
 * keeps growing with the barrier's capacitance beyond the barrier height, while measured
 * capacitance-voltage curves of forward-biased HEMT gates saturate, as the default gives (channel
 * electrons spill into the barrier under the gate, a parasitic sheet reported apart); and on the
 * wide solver fuzz (random stacks at gate biases up to about 2.4 V above the barrier height) three
 * stacks in 2000 did not converge with it, against none without it.</li>
 * <li><b>Holes</b> follow the gate in every layer above the channel, and the channel in the channel
 * layer and every layer below it. The channel is taken at the deepest interface whose polarization
 * sheet is positive (sigma &gt; 0, where a 2DEG gathers); a layer lies above it when its bottom is
 * no deeper than that interface. Without such an interface only the top layer counts as above. With
 * a free surface (no gate) the two contacts coincide at 0 eV. So a p-GaN gate layer, and the
 * barrier under it, follow the gate (holes drain into the gate metal), while a buried p-type back
 * barrier under the channel follows the channel and keeps its holes whatever the gate does.</li>
 * <li><b>Holes under an insulator</b> ({@link HolesUnderInsulator}, default
 * {@link HolesUnderInsulator#CHANNEL_FOR_P_LAYERS}): with a gate stack ({@code Structure.gateStack()}
 * not empty) the gate metal cannot exchange holes with the nitride, since no steady current crosses
 * an ideal insulator. A layer above the channel grown p-type (shallow acceptors outnumbering shallow
 * donors) then follows the channel: its holes are majority carriers, which come to equilibrium with
 * the semiconductor's own contacts in a steady state without current, and the gate bias drops across
 * the insulator and the accumulation or depletion layer under it (the ideal MIS capacitor of S. M. Sze
 * and K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch. 4: one flat Fermi level in
 * the semiconductor at every gate bias). So a p-GaN layer under 10 nm of Al2O3 accumulates holes at
 * its top face at reverse bias and is depleted at forward bias, where the rule without an insulator
 * (holes at the gate's level) would leave its top face unchanged and shift the whole layer with the
 * gate. In the other layers above the channel (an undoped or n-type barrier) holes are minority
 * carriers whose only supply under an insulator is thermal generation, negligible in a wide-gap
 * nitride on the time scale of a gate sweep: such a layer goes into deep depletion rather than
 * inversion (Sze and Ng, ch. 4), and the solve gives it the level of the contact that supplies fewer
 * holes, max(gate, channel): the gate's at reverse bias (no hole inversion layer screens the gate,
 * so an MIS-HEMT pinches off), the channel's at forward bias (the gate cannot inject holes through
 * the insulator). {@link HolesUnderInsulator#CHANNEL_EVERYWHERE} puts every layer above the channel
 * at the channel's level (full equilibrium, hole inversion included); {@link HolesUnderInsulator#GATE}
 * keeps the rule without an insulator (an insulator that leaks holes freely). A layer whose holes
 * are cut off from both contacts on the time scale of interest (a floating p-GaN) takes a rule with
 * {@link FermiContact#floating(double)}. The supply of a p-layer's holes behind a barrier is slow
 * too, so a fast measurement may not reach this steady state; {@code Solution.toString()} says so
 * when holes gather under the insulator.</li>
 * </ul>
 * Rules override the defaults where they apply; a rule names a layer (every layer of that name) or
 * a depth range, and applies to the mesh cells whose midpoints lie inside it.
 *
 * <h2>What follows a quasi-Fermi level</h2>
 * Free electrons and ionised shallow donors follow the electron level of their cell; free holes and
 * ionised shallow acceptors (and acceptor delta sheets) the hole level, since a shallow level
 * exchanges carriers with its own band. A deep level exchanges with both bands; in steady state its
 * occupancy is set by the majority carrier (W. Shockley and W. T. Read, Phys. Rev. 87, 835 (1952)),
 * so deep levels follow the hole level in a layer grown p-type (shallow acceptors outnumbering
 * shallow donors) and the electron level elsewhere. Donor delta sheets and surface donors follow the
 * electron level.
 *
 * <h2>Limits</h2>
 * No current flows: where the two levels of a cell differ, the solve shows the densities that the
 * levels imply (a depleted junction, a quasi-equilibrium under the gate), not the recombination or
 * the leakage that would flow. A gate biased beyond its barrier height conducts, and the two
 * forward-bias rules bracket it: with {@link ForwardBiasElectrons#GATE_SIDE_FOLLOWS_GATE} the barrier
 * under the gate holds no electrons and the 2DEG keeps growing with the barrier's capacitance; with
 * the default {@link ForwardBiasElectrons#NONE} channel electrons spill into the barrier under the gate (a parasitic sheet, reported apart) and
 * the 2DEG saturates, as measured capacitance-voltage curves of forward-biased HEMT gates show. Such
 * solutions carry the warning that the gate bias is at or above the barrier height. A level changes abruptly at a rule's boundary; put boundaries where
 * the carrier concerned is depleted.
 *
 * @param rules                the rules, in the order given; for each carrier no two may overlap
 * @param holesUnderInsulator  the default contact of the holes above the channel when an insulator
 *                             separates them from the gate metal; default
 *                             {@link HolesUnderInsulator#CHANNEL_FOR_P_LAYERS}
 * @param forwardBiasElectrons which contact the electrons on the gate side of the barrier's
 *                             conduction-band maximum follow under forward bias; default
 *                             {@link ForwardBiasElectrons#NONE}
 */
public record QuasiFermiLevels(List<Rule> rules, HolesUnderInsulator holesUnderInsulator,
        ForwardBiasElectrons forwardBiasElectrons) {
    /**
     * Outer change of the potential (V) below which the forward-bias split between gate-side and
     * channel-side electrons is frozen: far below the 0.1 V scale on which the barrier's maximum
     * moves, and far above the 1e-6 V tolerance, so the last iterations run with a fixed split.
     */
    public static final double FORWARD_SPLIT_FREEZE_V = 1e-3;
    /** Moves of the forward-bias split after which it is frozen, whatever the outer change. */
    public static final int FORWARD_SPLIT_MAX_MOVES = 8;

    private static final QuasiFermiLevels DEFAULTS = new QuasiFermiLevels(List.of());

    /**
     * Which contact the electrons between a forward-biased Schottky gate and the conduction-band
     * maximum of the layers above the channel follow, where no electron rule covers them.
     */
    public enum ForwardBiasElectrons {
        /** The gate (opt-in): a forward-biased gate holds its side of the barrier. */
        GATE_SIDE_FOLLOWS_GATE,
        /** No forward-bias rule, the documented default: those electrons follow the channel. */
        NONE
    }

    /**
     * The contact of the holes above the channel when a gate stack separates them from the gate
     * metal (the rules override it where they apply).
     */
    public enum HolesUnderInsulator {
        /**
         * Layers grown p-type follow the channel's contacts (0 eV); the other layers take the level
         * giving fewer holes, max(gate, channel) (deep depletion rather than inversion). The default.
         */
        CHANNEL_FOR_P_LAYERS,
        /** Every layer above the channel follows the channel's contacts (full equilibrium). */
        CHANNEL_EVERYWHERE,
        /** The gate's level, as without an insulator: an insulator leaking holes freely. */
        GATE
    }

    /**
     * Copies and validates the rules: none null, no two for the same carrier overlapping.
     *
     * @param rules the rules, in the order given; for each carrier no two may overlap
     * @param holesUnderInsulator the default contact of the holes above the channel under a gate
     *        stack, not null
     * @param forwardBiasElectrons the forward-bias rule for gate-side electrons, not null
     */
    public QuasiFermiLevels {
        Require.nonNull("holes-under-insulator rule", holesUnderInsulator);
        Require.nonNull("forward-bias electron rule", forwardBiasElectrons);
        Require.nonNull("quasi-Fermi rules", rules);
        rules = List.copyOf(rules);
        for (int i = 0; i < rules.size(); i++) {
            Rule a = rules.get(i);
            for (int j = 0; j < i; j++) {
                Rule b = rules.get(j);
                if (a.carrier() == b.carrier() && a.region().overlaps(b.region())) {
                    throw Require.invalid("quasi-Fermi rule " + i + " region (" + a.carrier() + ")", a.region(),
                            "not overlapping rule " + j + " for the same carrier, " + b.region());
                }
            }
        }
    }

    /**
     * Rules with the default holes under an insulator ({@link HolesUnderInsulator#CHANNEL_FOR_P_LAYERS})
     * and the default forward-bias rule ({@link ForwardBiasElectrons#NONE}).
     *
     * @param rules the rules, in the order given; for each carrier no two may overlap
     */
    public QuasiFermiLevels(List<Rule> rules) {
        this(rules, HolesUnderInsulator.CHANNEL_FOR_P_LAYERS, ForwardBiasElectrons.NONE);
    }

    /**
     * {@return the documented defaults: no rules, {@link HolesUnderInsulator#CHANNEL_FOR_P_LAYERS},
     * {@link ForwardBiasElectrons#NONE}}
     */
    public static QuasiFermiLevels defaults() {
        return DEFAULTS;
    }

    /**
     * {@return a copy with the given contact for the holes above the channel under a gate stack}
     *
     * @param choice {@link HolesUnderInsulator#CHANNEL_FOR_P_LAYERS} (the default),
     *        {@link HolesUnderInsulator#CHANNEL_EVERYWHERE} or {@link HolesUnderInsulator#GATE}
     */
    public QuasiFermiLevels withHolesUnderInsulator(HolesUnderInsulator choice) {
        return new QuasiFermiLevels(rules, Require.nonNull("holes-under-insulator rule", choice), forwardBiasElectrons);
    }

    /**
     * @param carrier electrons or holes
     * @param layer   the name of a layer of the stack (checked when a structure is solved)
     * @param contact the contact they follow there
     * @return a copy with the rule added
     */
    public QuasiFermiLevels withLayer(Carrier carrier, String layer, FermiContact contact) {
        return with(new Rule(carrier, new Region.Layer(layer), contact));
    }

    /**
     * @param carrier  electrons or holes
     * @param depthTop upper depth of the range (m)
     * @param depthBottom lower depth of the range (m)
     * @param contact  the contact they follow there
     * @return a copy with the rule added
     */
    public QuasiFermiLevels withDepths(Carrier carrier, double depthTop, double depthBottom, FermiContact contact) {
        return with(new Rule(carrier, new Region.Depths(depthTop, depthBottom), contact));
    }

    /**

     * {@return a copy with it added}

     *

     * @param rule a rule

     */
    public QuasiFermiLevels with(Rule rule) {
        List<Rule> r = new ArrayList<>(rules);
        r.add(Require.nonNull("quasi-Fermi rule", rule));
        return new QuasiFermiLevels(r, holesUnderInsulator, forwardBiasElectrons);
    }

    /**
     * Returns a copy with another forward-bias rule; the rules are kept.
     *
     * @param v which contact the gate-side electrons follow under forward bias, not null
     * @return a copy with {@code forwardBiasElectrons} set to {@code v}
     */
    public QuasiFermiLevels withForwardBiasElectrons(ForwardBiasElectrons v) {
        return new QuasiFermiLevels(rules, holesUnderInsulator, v);
    }

    /**
     * One assignment.
     *
     * @param carrier electrons or holes
     * @param region  where
     * @param contact the contact they follow there
     */
    public record Rule(Carrier carrier, Region region, FermiContact contact) {
        /**
         * Validates that no component is null.
         *
         * @param carrier electrons or holes
         * @param region where
         * @param contact the contact they follow there
         */
        public Rule {
            Require.nonNull("quasi-Fermi rule carrier", carrier);
            Require.nonNull("quasi-Fermi rule region", region);
            Require.nonNull("quasi-Fermi rule contact", contact);
        }
    }

    /** Where a rule applies. */
    public sealed interface Region permits Region.Layer, Region.Depths {
        /**
         * {@return whether the two surely share cells (layers of one name do; two ranges that intersect do)}
         *
         * @param other another region
         */
        boolean overlaps(Region other);

        /**
         * Every layer of this name.
         *
         * @param name a layer name, non-blank
         */
        record Layer(String name) implements Region {
            /**
             * Validates the name.
             *
             * @param name a layer name, non-blank
             */
            public Layer {
                Require.nonNull("quasi-Fermi rule layer name", name);
                if (name.isBlank()) {
                    throw Require.invalid("quasi-Fermi rule layer name", "\"" + name + "\"", "a layer name (non-blank)");
                }
            }

            @Override
            public boolean overlaps(Region other) {
                return other instanceof Layer l && l.name.equals(name);
            }

            @Override
            public String toString() {
                return "layer \"" + name + "\"";
            }
        }

        /**
         * A depth range [depthTop, depthBottom] from the surface (m).
         *
         * @param depthTop    upper depth (m), finite, &ge; 0
         * @param depthBottom lower depth (m), finite, &gt; depthTop
         */
        record Depths(double depthTop, double depthBottom) implements Region {
            /**
             * Validates the range.
             *
             * @param depthTop upper depth of the range (m)
             * @param depthBottom lower depth of the range (m)
             */
            public Depths {
                Require.inRange("quasi-Fermi rule depthTop (m)", depthTop, 0, 1e-3);
                Require.finite("quasi-Fermi rule depthBottom (m)", depthBottom);
                if (!(depthBottom > depthTop)) {
                    throw Require.invalid("quasi-Fermi rule depthBottom (m)", depthBottom, "(" + depthTop + ", ...) (below depthTop)");
                }
            }

            @Override
            public boolean overlaps(Region other) {
                return other instanceof Depths d && d.depthTop < depthBottom && depthTop < d.depthBottom;
            }

            @Override
            public String toString() {
                return "depths [" + depthTop + ", " + depthBottom + "] m";
            }
        }
    }
}
