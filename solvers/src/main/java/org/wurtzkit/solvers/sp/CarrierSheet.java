package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.List;
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

    /**
     * Groups the carriers of one solve into sheets: each window's subbands by the layer of their
     * centroid, and per layer the classical carriers outside every window interior; then marks the
     * channel and the sheets between it and a gate. Sheets below {@link Solution#SHEET_REPORT_THRESHOLD}
     * are left out.
     *
     * @param d            the resolved device
     * @param phi          the converged potential (V)
     * @param qs           the subbands of the last iteration, or null for a classical solve
     * @param n            electron density at the nodes (m^-3)
     * @param p            hole density at the nodes (m^-3)
     * @param bands        the electron subbands, windows in order
     * @param holeSubbands the hole subbands, windows in order
     * @param ref          the potential the subbands were computed on (V)
     * @return the sheets, quantum ones first (window order), then classical ones (layer order, top down)
     */
    static List<CarrierSheet> gather(Device d, double[] phi, QuantumStates qs, double[] n, double[] p, List<Subband> bands,
            List<HoleSubband> holeSubbands, double[] ref) {
        int nn = d.n;
        List<org.wurtzkit.structure.LayerState> states = d.structure.layerStates();
        int nl = states.size();
        List<double[]> acc = new ArrayList<>(); // {carrier 0/1, layer, window, top, bottom, sum n*x, sum n}
        // quantum electrons: one group per (window, layer of the subband's centroid), in subband
        // order; in the window holding a metal-face channel interface, each subband is first split at
        // the conduction-band maximum between the window top and the interface: the part above it is
        // on the gate side (a parasitic channel under forward bias), the rest is the channel's
        int nw = qs == null ? 0 : qs.windows;
        int gateSideSplit = d.gateSideCells();
        for (int w = 0; w < nw; w++) {
            double[][] group = new double[nl][];
            double[] gateSide = null;
            int a = d.windowStart[w];
            int e = d.windowEnd[w];
            int split = a;
            boolean channelWindow = d.channelLayer >= 0 && d.x[a] <= d.channelDepth && d.x[e] >= d.channelDepth
                    && d.channelLayer > d.layerOfCell[Math.max(0, d.mesh.nearestNode(d.channelDepth) - 1)];
            if (channelWindow && gateSideSplit > 0) {
                // the split the solve used (QuasiFermiLevels.ForwardBiasElectrons)
                split = Math.max(a, gateSideSplit);
            } else if (channelWindow) {
                int ich = d.mesh.nearestNode(d.channelDepth);
                double top = Double.NEGATIVE_INFINITY;
                for (int i = a; i <= ich; i++) {
                    double up = d.ec[i > 0 ? i - 1 : 0] - phi[i];
                    double down = d.ec[Math.min(i, nn - 2)] - phi[i];
                    double edge = Math.max(up, down);
                    if (edge > top) {
                        top = edge;
                        split = i;
                    }
                }
            }
            for (Subband b : bands) {
                if (b.window() != w) {
                    continue;
                }
                double[] psi = qs.psi[w][b.index()];
                double mean = 0;
                double norm = 0;
                double meanAbove = 0;
                double normAbove = 0;
                for (int j = 1; j < psi.length - 1; j++) {
                    double pr = psi[j] * psi[j] * d.box(a + j);
                    mean += pr * d.x[a + j];
                    norm += pr;
                    if (a + j < split) {
                        meanAbove += pr * d.x[a + j];
                        normAbove += pr;
                    }
                }
                double occ = b.sheetDensity();
                if (gateSideSplit > 0 && normAbove > 0) {
                    // the forward-bias rule holds the gate side at the gate's level: split the
                    // occupied density itself, node by node, each side at its own level
                    double[] part = SubbandDensity.sheetPart(d, qs, w, b.index(), phi, ref, a + 1, split);
                    if (gateSide == null) {
                        gateSide = new double[] {0, d.structure.layerIndexAt(meanAbove / normAbove), w, d.x[a], d.x[split], 0,
                            0};
                        acc.add(gateSide);
                    }
                    gateSide[5] += part[1];
                    gateSide[6] += part[0];
                    occ = Math.max(0, occ - part[0]);
                    mean -= meanAbove;
                    norm -= normAbove;
                } else if (normAbove > 0) {
                    double f = normAbove / norm;
                    if (gateSide == null) {
                        gateSide = new double[] {0, d.structure.layerIndexAt(meanAbove / normAbove), w, d.x[a], d.x[split], 0,
                            0};
                        acc.add(gateSide);
                    }
                    gateSide[5] += occ * f * (meanAbove / normAbove);
                    gateSide[6] += occ * f;
                    occ *= 1 - f;
                    mean -= meanAbove;
                    norm -= normAbove;
                }
                double centre = norm > 0 ? mean / norm : d.x[a];
                int li = channelWindow ? d.channelLayer
                        : d.structure.layerIndexAt(Math.min(centre, d.structure.totalThickness()));
                if (group[li] == null) {
                    double top = Math.max(d.x[a], states.get(li).depthTop());
                    double bottom = Math.min(d.x[e], states.get(li).depthBottom());
                    group[li] = new double[] {0, li, w, top, bottom, 0, 0};
                    acc.add(group[li]);
                }
                group[li][5] += occ * centre;
                group[li][6] += occ;
            }
        }
        // quantum holes: one group per (window, layer of the subband's centroid)
        for (int w = 0; w < nw; w++) {
            double[][] group = new double[nl][];
            for (HoleSubband hs : holeSubbands) {
                if (hs.window() != w) {
                    continue;
                }
                int a = d.windowStart[w];
                double[] psi = qs.holes.psi[w][hs.band().ordinal()][hs.index()];
                double mean = 0;
                double norm = 0;
                for (int j = 1; j < psi.length - 1; j++) {
                    double pr = psi[j] * psi[j] * d.box(a + j);
                    mean += pr * d.x[a + j];
                    norm += pr;
                }
                double centre = norm > 0 ? mean / norm : d.x[a];
                int li = d.structure.layerIndexAt(Math.min(centre, d.structure.totalThickness()));
                if (group[li] == null) {
                    double top = Math.max(d.x[a], states.get(li).depthTop());
                    double bottom = Math.min(d.x[d.windowEnd[w]], states.get(li).depthBottom());
                    group[li] = new double[] {1, li, w, top, bottom, 0, 0};
                    acc.add(group[li]);
                }
                group[li][5] += hs.sheetDensity() * centre;
                group[li][6] += hs.sheetDensity();
            }
        }
        // classical carriers outside window interiors, per layer
        double[][] classical = new double[2 * nl][];
        for (int i = 0; i < nn; i++) {
            if (d.quantumNode[i] && qs != null) {
                continue;
            }
            int li = d.layerOfCell[Math.min(i, nn - 2)];
            if (li >= nl) {
                continue; // an insulator cell of the gate stack: no carriers there
            }
            double w = d.box(i);
            for (int c = 0; c < 2; c++) {
                double v = (c == 0 ? n[i] : p[i]) * w;
                if (classical[2 * li + c] == null) {
                    classical[2 * li + c] = new double[] {c, li, -1, states.get(li).depthTop(), states.get(li).depthBottom(),
                        0, 0};
                }
                classical[2 * li + c][5] += v * d.x[i];
                classical[2 * li + c][6] += v;
            }
        }
        for (double[] g : classical) {
            if (g != null) {
                acc.add(g);
            }
        }
        // the channel: the largest quantum electron sheet in the channel layer inside the window
        // holding the channel interface; without subbands, the classical electrons of that layer;
        // without an interface of positive polarization charge, the largest electron sheet
        int channel = -1;
        for (int j = 0; j < acc.size(); j++) {
            double[] g = acc.get(j);
            if (g[0] != 0 || g[6] < Solution.SHEET_REPORT_THRESHOLD) {
                continue;
            }
            boolean candidate;
            if (d.channelLayer < 0) {
                candidate = true;
            } else if (nw > 0) {
                int w = (int) g[2];
                candidate = g[1] == d.channelLayer && w >= 0 && d.x[d.windowStart[w]] <= d.channelDepth
                        && d.x[d.windowEnd[w]] >= d.channelDepth;
            } else {
                candidate = g[1] == d.channelLayer;
            }
            if (candidate && (channel < 0 || g[6] > acc.get(channel)[6])) {
                channel = j;
            }
        }
        boolean gated = d.topDirichlet;
        List<CarrierSheet> out = new ArrayList<>();
        for (int j = 0; j < acc.size(); j++) {
            double[] g = acc.get(j);
            if (g[6] < Solution.SHEET_REPORT_THRESHOLD) {
                continue;
            }
            int li = (int) g[1];
            Carrier carrier = g[0] == 0 ? Carrier.ELECTRONS : Carrier.HOLES;
            CarrierSheet.Role role = CarrierSheet.Role.OTHER;
            if (j == channel) {
                role = CarrierSheet.Role.CHANNEL;
            } else if (carrier == Carrier.ELECTRONS && gated && d.channelLayer >= 0 && li != d.channelLayer
                    && (states.get(li).depthBottom() <= d.channelDepth * (1 + 1e-12) || g[4] <= d.channelDepth)) {
                role = CarrierSheet.Role.UNDER_GATE;
            }
            double centroid = g[5] / g[6];
            int node = d.mesh.nearestNode(centroid);
            int cell = Math.min(node, nn - 2);
            if (d.layerOfCell[cell] != li && node > 0) {
                cell = node - 1; // the centroid sits on the layer's lower interface
            }
            FermiContact contact = carrier == Carrier.ELECTRONS ? d.contactN[cell] : d.contactP[cell];
            double level = carrier == Carrier.ELECTRONS ? d.efn[cell] : d.efp[cell];
            out.add(new CarrierSheet(carrier, role, states.get(li).layer().name(), (int) g[2], g[3], g[4], centroid, g[6],
                    contact, level));
        }
        return out;
    }
}
