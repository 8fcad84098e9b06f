// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wurtzkit.errors.InvalidParameterException;

/**
 * The text form of {@link QuasiFermiLevels} in a result's provenance ({@link SolverOptions#settings()}):
 * rules joined by {@code ;}, each {@code <carrier>|layer|<name>|<contact>} or
 * {@code <carrier>|depths|<top m>|<bottom m>|<contact>}, with the contact {@code gate}, {@code channel}
 * or {@code floating <eV>} and numbers written by {@link Double#toString(double)}, so that reading
 * gives back an equal record; the defaults (no rules) are the empty text. A non-default
 * {@link QuasiFermiLevels.HolesUnderInsulator} adds the item {@code holesUnderInsulator|<choice>}
 * (lower case); a forward-bias rule other than the default adds a last item
 * {@code forward-bias|<rule>} with the rule's name in lower case ({@code gate_side_follows_gate}); defaults write
 * nothing, so the text of the default options stays empty.
 */
final class QuasiFermiLevelsText {
    private static final String ALLOWED = "rules \"<carrier>|layer|<name>|<contact>\" or "
            + "\"<carrier>|depths|<top m>|<bottom m>|<contact>\" joined by ';', then optionally "
            + "\"holesUnderInsulator|<channel_everywhere or gate>\" and "
            + "\"forward-bias|<gate_side_follows_gate or none>\"";

    private static final String HOLES_UNDER_INSULATOR = "holesUnderInsulator";
    private static final String FORWARD = "forward-bias";

    private QuasiFermiLevelsText() {
    }

    static String write(QuasiFermiLevels q) {
        StringBuilder sb = new StringBuilder();
        for (QuasiFermiLevels.Rule r : q.rules()) {
            if (sb.length() > 0) {
                sb.append(';');
            }
            sb.append(r.carrier().name().toLowerCase(Locale.ROOT)).append('|');
            if (r.region() instanceof QuasiFermiLevels.Region.Layer l) {
                if (l.name().indexOf('|') >= 0 || l.name().indexOf(';') >= 0) {
                    throw new InvalidParameterException("layer name in a quasi-Fermi rule", l.name(),
                            "a name without '|' or ';' (those separate the rules in a result's provenance)");
                }
                sb.append("layer|").append(l.name());
            } else {
                QuasiFermiLevels.Region.Depths d = (QuasiFermiLevels.Region.Depths) r.region();
                sb.append("depths|").append(Double.toString(d.depthTop())).append('|')
                        .append(Double.toString(d.depthBottom()));
            }
            sb.append('|').append(contact(r.contact()));
        }
        if (q.holesUnderInsulator() != QuasiFermiLevels.HolesUnderInsulator.CHANNEL_FOR_P_LAYERS) {
            if (sb.length() > 0) {
                sb.append(';');
            }
            sb.append(HOLES_UNDER_INSULATOR).append('|').append(q.holesUnderInsulator().name().toLowerCase(Locale.ROOT));
        }
        if (q.forwardBiasElectrons() != QuasiFermiLevels.ForwardBiasElectrons.NONE) {
            if (sb.length() > 0) {
                sb.append(';');
            }
            sb.append(FORWARD).append('|').append(q.forwardBiasElectrons().name().toLowerCase(Locale.ROOT));
        }
        return sb.toString();
    }

    private static String contact(FermiContact c) {
        if (c instanceof FermiContact.Floating f) {
            return "floating " + Double.toString(f.fixedLevelEv());
        }
        return c instanceof FermiContact.Gate ? "gate" : "channel";
    }

    static QuasiFermiLevels read(String text) {
        QuasiFermiLevels q = QuasiFermiLevels.defaults();
        if (text.isEmpty()) {
            return q;
        }
        try {
            for (String rule : text.split(";", -1)) {
                String[] f = rule.split("\\|", -1);
                if (f.length == 2 && HOLES_UNDER_INSULATOR.equals(f[0])) {
                    q = q.withHolesUnderInsulator(
                            QuasiFermiLevels.HolesUnderInsulator.valueOf(f[1].toUpperCase(Locale.ROOT)));
                    continue;
                }
                if (f.length == 2 && FORWARD.equals(f[0])) {
                    q = q.withForwardBiasElectrons(
                            QuasiFermiLevels.ForwardBiasElectrons.valueOf(f[1].toUpperCase(Locale.ROOT)));
                    continue;
                }
                Carrier carrier = Carrier.valueOf(f[0].toUpperCase(Locale.ROOT));
                if (f.length == 4 && "layer".equals(f[1])) {
                    q = q.withLayer(carrier, f[2], contact(f[3], text));
                } else if (f.length == 5 && "depths".equals(f[1])) {
                    q = q.withDepths(carrier, Double.parseDouble(f[2]), Double.parseDouble(f[3]), contact(f[4], text));
                } else {
                    throw new InvalidParameterException("solver setting \"quasiFermiLevels\"", text, ALLOWED);
                }
            }
        } catch (IllegalArgumentException e) {
            if (e instanceof InvalidParameterException ipe) {
                throw ipe;
            }
            throw new InvalidParameterException("solver setting \"quasiFermiLevels\"", text, ALLOWED);
        }
        return q;
    }

    private static FermiContact contact(String s, String text) {
        if ("gate".equals(s)) {
            return FermiContact.GATE;
        }
        if ("channel".equals(s)) {
            return FermiContact.CHANNEL;
        }
        if (s.startsWith("floating ")) {
            return FermiContact.floating(Double.parseDouble(s.substring("floating ".length())));
        }
        throw new InvalidParameterException("solver setting \"quasiFermiLevels\"", text, ALLOWED);
    }
}
