package org.wurtzkit.solvers.sp;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.wurtzkit.bands.BandEdges;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.EffectiveMasses;
import org.wurtzkit.material.ValenceBands;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.solvers.mesh.Mesh;
import org.wurtzkit.solvers.statistics.CarrierDensity;
import org.wurtzkit.structure.BottomBoundary;
import org.wurtzkit.structure.DeepLevel;
import org.wurtzkit.structure.DeltaDoping;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerState;
import org.wurtzkit.structure.PointState;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/**
 * A structure resolved once onto a mesh: per-cell material arrays and per-node sheet charges. Depth
 * x grows from the surface into the stack; energies are in eV with the bottom contact's Fermi level
 * at 0; the electrostatic potential phi is in V, so a band edge at node i in cell k is E_k - phi_i.
 * Immutable after construction.
 */
final class Device {
    static final double Q = Constants.ELEMENTARY_CHARGE;

    final Structure structure;
    final SolverOptions options;
    final Mesh mesh;
    final int n;
    final double[] x;
    final double[] h;
    final double vt;
    final double kT; // J

    // per cell
    final double[] eps; // F/m
    final double[] px; // polarization component along +x (depth) = -P_z (C/m^2)
    final double[] ec; // conduction-band edge at phi = 0 (eV)
    final double[] ev; // valence-band edge at phi = 0 (eV)
    final double[] nc; // m^-3
    final double[] nv; // m^-3
    final double[] massZ; // m/m0 along c (Schroedinger)
    final double[] massXY; // m/m0 in plane (2D density of states)
    final double[][] holeMassZ; // [band][cell] hole mass along c (m0): heavy, light, crystal-field
    final double[][] holeMassXY; // [band][cell] hole mass across c for the 2D density of states (m0)
    final double[][] holeOffset; // [band][cell] band edge below the top valence band (eV)
    final int[] layerOfCell;

    // dopant species per layer (top-down index), flattened
    final double[][] speciesDensity; // m^-3
    final double[][] speciesEnergy; // eV from the band edge (donor: below Ec; acceptor: above Ev; deep: below Ec)
    final double[][] speciesDegeneracy;
    final ChargeSpecies[][] speciesKind;

    // per node delta sheets
    final double[] deltaDensity; // m^-2 (donor > 0 sheets only: acceptor sheets stored negative-kind below)
    final double[] deltaEnergy;
    final boolean[] deltaIsDonor;

    // fixed interface charge per node (m^-2, signed) and interface states, flattened: state j of
    // sheet k (k in [0, sheetNode.length)) is at index sheetStart[k] <= j < sheetStart[k + 1]
    final double[] fixedSheet;
    final int[] sheetNode;
    final int[] sheetStart;
    final int[] sheetOwner; // index of the placed sheet (Structure.interfaceSheets()) that holds sheet k
    final double[] sheetFermiEv; // Fermi level that occupies the sheet's states (eV)
    final double[] stateBelowEc; // e: energy below the nitride's E_c at the sheet (eV)
    final double[] stateWeight; // states in the quadrature interval (m^-2)
    final boolean[] stateDonorLike;
    /** Whether cell k is an insulator of the gate stack (no carriers, no dopants). */
    final boolean[] insulatorCell;

    // boundaries
    final boolean topDirichlet;
    final double phiTop;
    final double surfaceDonorDensity; // m^-2
    final double surfaceDonorEnergy; // eV below Ec
    final boolean bottomDirichlet;
    final double phiBottom;
    final double gateBiasV; // 0 for a free surface
    final double[] efn; // electron quasi-Fermi level per cell (eV)
    final double[] efp; // hole quasi-Fermi level per cell (eV)
    final FermiContact[] contactN; // the contact electrons follow, per cell
    final FermiContact[] contactP; // the contact holes follow, per cell
    final double channelDepth; // deepest interface with sigma > 0 (m), NaN if none
    final int channelLayer; // the layer on the well side (lower E_c) of that interface, -1 if none
    final boolean[] deepFollowHoles; // per layer: deep levels follow the hole level (layer grown p-type)
    boolean quasiFermiUniform; // every cell's electron level is 0 (the channel's); moves with the forward-bias split

    // forward-bias rule (QuasiFermiLevels.ForwardBiasElectrons): the only state of a Device that a
    // solve changes. Cells [forwardTopCell, forwardSplit) follow the gate; the split node is searched
    // in [forwardTopCell, forwardChannelNode]; forwardTopCell < 0 when the rule does not apply
    private boolean[] electronRuleCell; // cell covered by a user's electron rule (never reassigned)
    private int forwardTopCell = -1;
    private int forwardChannelNode = -1;
    private int forwardSplit;
    private int forwardMoves;
    private boolean forwardFrozen;

    /** true where the two cells around node i hold the same material and species (no interface). */
    final boolean[] sameCellsAround;

    // quantum windows: node index ranges [start, end] inclusive
    final int[] windowStart;
    final int[] windowEnd;
    final boolean[] quantumNode; // interior node of some window

    Device(Structure s, SolverOptions o) {
        this.structure = s;
        this.options = o;
        this.vt = Constants.thermalVoltage(s.temperatureK());
        this.kT = Constants.BOLTZMANN * s.temperatureK();

        List<double[]> windows = clipToNitride(resolveWindows(s, o.quantumWindows()), s.gateStackThickness());
        TreeSet<Double> breaks = new TreeSet<>();
        breaks.add(0.0);
        breaks.add(s.totalThickness());
        for (double d : s.interfaceDepths()) {
            breaks.add(d);
        }
        for (LayerState st : s.layerStates()) {
            for (DeltaDoping dd : st.layer().deltaSheets()) {
                breaks.add(st.depthTop() + dd.offsetFromLayerTop());
            }
        }
        for (double[] w : windows) {
            breaks.add(w[0]);
            breaks.add(w[1]);
        }
        double[] bp = mergeClose(breaks, 1e-13);
        this.mesh = Mesh.generate(bp, o.mesh());
        this.n = mesh.size();
        this.x = mesh.nodes();
        this.h = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            h[i] = x[i + 1] - x[i];
        }

        int cells = n - 1;
        eps = new double[cells];
        px = new double[cells];
        ec = new double[cells];
        ev = new double[cells];
        nc = new double[cells];
        nv = new double[cells];
        massZ = new double[cells];
        massXY = new double[cells];
        holeMassZ = new double[3][cells];
        holeMassXY = new double[3][cells];
        holeOffset = new double[3][cells];
        layerOfCell = new int[cells];
        insulatorCell = new boolean[cells];
        double t = s.temperatureK();
        WurtziteMaterial lastMaterial = null;
        ValenceBands lastBands = null;
        org.wurtzkit.strain.Strain lastStrain = null;
        boolean followStrain = s.valenceBandsFollowStrain();
        double lastNv = 0;
        PointState lastPoint = null;
        int nitrideLayers = s.layerStates().size();
        double gateT = s.gateStackThickness();
        int walk = 0;
        for (int k = 0; k < cells; k++) {
            double mid = 0.5 * (x[k] + x[k + 1]);
            if (mid < gateT) {
                // an amorphous insulator: permittivity, band edges from its offset to GaN, no
                // polarization, no carriers (nc = nv = 0), no dopants (an empty species row)
                org.wurtzkit.structure.InsulatorLayer il = s.insulatorAt(mid);
                insulatorCell[k] = true;
                layerOfCell[k] = nitrideLayers + s.gateStack().indexOf(il);
                eps[k] = il.insulator().relativePermittivity() * Constants.VACUUM_PERMITTIVITY;
                px[k] = 0;
                BandEdges edges = s.bandEdgesOf(il);
                ec[k] = edges.conductionEv();
                ev[k] = edges.valenceEv();
                nc[k] = 0;
                nv[k] = 0;
                massZ[k] = 1; // never used: quantum windows stop at the insulator
                massXY[k] = 1;
                for (int b = 0; b < 3; b++) {
                    holeMassZ[b][k] = 1; // never used either: no holes in an insulator
                    holeMassXY[b][k] = 1;
                    holeOffset[b][k] = 0;
                }
                continue;
            }
            // the cells run down the stack: the layer pointer only moves on, O(cells + layers) in all
            // (the upper layer at an interface, as Structure.layerIndexAt)
            while (walk < nitrideLayers - 1 && mid > s.layerStates().get(walk).depthBottom()) {
                walk++;
            }
            int li = walk;
            layerOfCell[k] = li;
            LayerState layerState = s.layerStates().get(li);
            // a uniform layer has one state, its top's (as Structure.pointAt returns): its cells after
            // the first copy the first one's values instead of resolving them again
            PointState p = layerState.layer().material().isGraded() ? s.pointAt(li, mid) : layerState.top();
            if (p == lastPoint && k > 0 && !insulatorCell[k - 1]) {
                eps[k] = eps[k - 1];
                px[k] = px[k - 1];
                ec[k] = ec[k - 1];
                ev[k] = ev[k - 1];
                nc[k] = nc[k - 1];
                nv[k] = nv[k - 1];
                for (int b = 0; b < 3; b++) {
                    holeMassZ[b][k] = holeMassZ[b][k - 1];
                    holeMassXY[b][k] = holeMassXY[b][k - 1];
                    holeOffset[b][k] = holeOffset[b][k - 1];
                }
                massZ[k] = massZ[k - 1];
                massXY[k] = massXY[k - 1];
                continue;
            }
            lastPoint = p;
            WurtziteMaterial m = p.material();
            eps[k] = m.permittivityStaticAlongC() * Constants.VACUUM_PERMITTIVITY;
            px[k] = -p.alongGrowth();
            BandEdges edges = s.bandEdgesAt(p);
            ec[k] = edges.conductionEv();
            ev[k] = edges.valenceEv();
            EffectiveMasses em = m.masses();
            nc[k] = CarrierDensity.effectiveDensityOfStates(em.electronDensityOfStates(), t);
            // heavy, light and crystal-field holes summed with their offsets (ValenceBands); a layer of
            // one composition hands the same material to each of its cells, so compute it once
            // (strain too, where the stack's valence bands follow it: Structure.valenceBandsAt)
            if (m != lastMaterial || (followStrain && !p.strain().equals(lastStrain))) {
                lastMaterial = m;
                lastStrain = p.strain();
                lastBands = s.valenceBandsAt(p);
                lastNv = lastBands.effectiveDensityOfStates(t);
            }
            nv[k] = lastNv;
            ValenceBands.Band[] vb = {lastBands.heavyHole(), lastBands.lightHole(), lastBands.crystalFieldHole()};
            for (int b = 0; b < 3; b++) {
                holeMassZ[b][k] = vb[b].massParallel();
                holeMassXY[b][k] = vb[b].massPerpendicular();
                holeOffset[b][k] = vb[b].offsetEv();
            }
            massZ[k] = em.electronParallel();
            massXY[k] = em.electronPerpendicular();
        }

        sameCellsAround = new boolean[n];
        for (int i = 1; i < n - 1; i++) {
            int a = i - 1;
            sameCellsAround[i] = ec[a] == ec[i] && ev[a] == ev[i] && nc[a] == nc[i] && nv[a] == nv[i]
                    && layerOfCell[a] == layerOfCell[i];
        }

        List<LayerState> states = s.layerStates();
        int nl = states.size();
        int rows = nl + s.gateStack().size(); // one empty row per insulator
        speciesDensity = new double[rows][0];
        speciesEnergy = new double[rows][0];
        speciesDegeneracy = new double[rows][0];
        speciesKind = new ChargeSpecies[rows][0];
        for (int li = 0; li < nl; li++) {
            Layer l = states.get(li).layer();
            int ns = l.dopants().size() + l.deepLevels().size();
            speciesDensity[li] = new double[ns];
            speciesEnergy[li] = new double[ns];
            speciesDegeneracy[li] = new double[ns];
            speciesKind[li] = new ChargeSpecies[ns];
            int j = 0;
            for (Dopant d : l.dopants()) {
                speciesDensity[li][j] = d.densityPerM3();
                speciesEnergy[li][j] = d.ionizationEnergyEv();
                speciesDegeneracy[li][j] = d.degeneracy();
                boolean full = d.ionization() == Dopant.Ionization.FULL;
                speciesKind[li][j] = d.kind() == Dopant.Kind.DONOR
                        ? (full ? ChargeSpecies.FULLY_IONIZED_DONOR : ChargeSpecies.SHALLOW_DONOR)
                        : (full ? ChargeSpecies.FULLY_IONIZED_ACCEPTOR : ChargeSpecies.SHALLOW_ACCEPTOR);
                j++;
            }
            for (DeepLevel d : l.deepLevels()) {
                double gap = Math.min(states.get(li).top().material().bandGap().atTemperature(t),
                        states.get(li).bottom().material().bandGap().atTemperature(t));
                if (d.energyBelowConductionEv() > gap) {
                    throw new InvalidParameterException("deep level energy below E_c in layer \"" + l.name() + "\" (eV)",
                            Double.toString(d.energyBelowConductionEv()),
                            "[0, " + gap + "] (inside the layer's band gap at " + t + " K)");
                }
                speciesDensity[li][j] = d.densityPerM3();
                speciesEnergy[li][j] = d.energyBelowConductionEv();
                speciesDegeneracy[li][j] = 1;
                speciesKind[li][j] = d.kind() == DeepLevel.Kind.DONOR_LIKE ? ChargeSpecies.DONOR_LIKE_TRAP
                        : ChargeSpecies.ACCEPTOR_LIKE_TRAP;
                j++;
            }
        }

        deltaDensity = new double[n];
        deltaEnergy = new double[n];
        deltaIsDonor = new boolean[n];
        for (LayerState st : states) {
            for (DeltaDoping dd : st.layer().deltaSheets()) {
                int node = mesh.nearestNode(st.depthTop() + dd.offsetFromLayerTop());
                if (deltaDensity[node] > 0 && deltaIsDonor[node] != (dd.kind() == Dopant.Kind.DONOR)) {
                    throw new WurtzkitException(ErrorKind.INVALID_STRUCTURE,
                            "a donor and an acceptor delta sheet sit at the same depth " + x[node] + " m");
                }
                deltaDensity[node] += dd.sheetDensityPerM2();
                deltaEnergy[node] = dd.ionizationEnergyEv();
                deltaIsDonor[node] = dd.kind() == Dopant.Kind.DONOR;
            }
        }

        fixedSheet = new double[n];
        List<org.wurtzkit.structure.PlacedSheet> placed = s.interfaceSheets();
        int nk = 0;
        for (org.wurtzkit.structure.PlacedSheet ps : placed) {
            nk += ps.sheet().states().size();
        }
        sheetNode = new int[nk];
        sheetStart = new int[nk + 1];
        sheetFermiEv = new double[nk];
        sheetOwner = new int[nk];
        int owner = 0;
        List<double[]> quad = new ArrayList<>(); // {e, weight, donor ? 1 : 0}
        int k = 0;
        for (org.wurtzkit.structure.PlacedSheet ps : placed) {
            int node = mesh.nearestNode(ps.depth());
            fixedSheet[node] += ps.sheet().fixedChargePerM2();
            for (org.wurtzkit.structure.InterfaceStates is : ps.sheet().states()) {
                sheetNode[k] = node;
                sheetStart[k] = quad.size();
                sheetOwner[k] = owner;
                InterfaceStateQuadrature.append(is, ps.nitrideGapEv(), kT / Q, quad);
                k++;
            }
            owner++;
        }
        sheetStart[nk] = quad.size();
        stateBelowEc = new double[quad.size()];
        stateWeight = new double[quad.size()];
        stateDonorLike = new boolean[quad.size()];
        for (int j = 0; j < quad.size(); j++) {
            stateBelowEc[j] = quad.get(j)[0];
            stateWeight[j] = quad.get(j)[1];
            stateDonorLike[j] = quad.get(j)[2] > 0;
        }

        TopBoundary top = s.top();
        if (top instanceof TopBoundary.Schottky sch) {
            topDirichlet = true;
            // E_c(0) = phi_B - qV: ec[0] - phi_0 = phi_B - V
            phiTop = ec[0] - (sch.barrierHeightEv() - sch.biasV());
            surfaceDonorDensity = 0;
            surfaceDonorEnergy = 0;
        } else {
            TopBoundary.FreeSurface fs = (TopBoundary.FreeSurface) top;
            topDirichlet = false;
            phiTop = Double.NaN;
            surfaceDonorDensity = fs.donorDensityPerM2();
            surfaceDonorEnergy = fs.donorEnergyBelowEcEv();
        }
        gateBiasV = top instanceof TopBoundary.Schottky sch2 ? sch2.biasV() : 0;
        efn = new double[cells];
        efp = new double[cells];
        contactN = new FermiContact[cells];
        contactP = new FermiContact[cells];
        double chDepth = Double.NaN;
        int chLayer = -1;
        List<org.wurtzkit.structure.InterfaceCharge> sheets = s.interfaceCharges();
        for (int j = 0; j < sheets.size(); j++) {
            if (sheets.get(j).sigma() > 0) {
                chDepth = sheets.get(j).depth();
                // the cells just above and below the interface name its two layers (a gate stack's
                // insulators come first in the interface list, so the list index is no layer index)
                int node = mesh.nearestNode(chDepth);
                chLayer = ec[node] < ec[node - 1] ? layerOfCell[node] : layerOfCell[node - 1];
            }
        }
        channelDepth = chDepth;
        channelLayer = chLayer;
        resolveQuasiFermiLevels(s, o.quasiFermiLevels());
        if (o.quasiFermiLevels().forwardBiasElectrons() == QuasiFermiLevels.ForwardBiasElectrons.GATE_SIDE_FOLLOWS_GATE
                && top instanceof TopBoundary.Schottky && gateBiasV > 0 && s.gateStackThickness() == 0
                && !Double.isNaN(channelDepth)) {
            forwardChannelNode = mesh.nearestNode(channelDepth);
            forwardTopCell = 0;
            forwardSplit = 0;
        }
        for (int j = 0; j < sheetNode.length; j++) {
            sheetFermiEv[j] = interfaceStateFermiLevelEv(sheetNode[j]);
        }
        boolean uniform = true;
        for (double v : efn) {
            uniform &= v == 0;
        }
        quasiFermiUniform = uniform;
        deepFollowHoles = new boolean[rows]; // insulator rows hold no deep levels: false
        for (int li = 0; li < nl; li++) {
            deepFollowHoles[li] = grownPType(states.get(li));
        }
        BottomBoundary bottom = s.bottom();
        if (bottom instanceof BottomBoundary.FixedFermiLevel f) {
            bottomDirichlet = true;
            phiBottom = ec[n - 2] - f.conductionAboveFermiEv();
        } else {
            bottomDirichlet = false;
            phiBottom = Double.NaN;
        }

        for (int i = 1; i < n - 1; i++) {
            // a rule's boundary inside a layer splits the box as an interface does
            sameCellsAround[i] &= efn[i - 1] == efn[i] && efp[i - 1] == efp[i];
        }
        windowStart = new int[windows.size()];
        windowEnd = new int[windows.size()];
        quantumNode = new boolean[n];
        for (int w = 0; w < windows.size(); w++) {
            windowStart[w] = mesh.nearestNode(windows.get(w)[0]);
            windowEnd[w] = mesh.nearestNode(windows.get(w)[1]);
            if (windowEnd[w] - windowStart[w] < 4) {
                throw new InvalidParameterException("quantum window " + w + " node count",
                        Integer.toString(windowEnd[w] - windowStart[w] + 1), "[5, ...) (window too thin for the mesh)");
            }
            for (int i = windowStart[w] + 1; i < windowEnd[w]; i++) {
                quantumNode[i] = true;
            }
        }
    }

    /** Whether a layer is grown p-type: its shallow acceptors outnumber its shallow donors. */
    private static boolean grownPType(LayerState state) {
        double donors = 0;
        double acceptors = 0;
        for (Dopant dp : state.layer().dopants()) {
            if (dp.kind() == Dopant.Kind.DONOR) {
                donors += dp.densityPerM3();
            } else {
                acceptors += dp.densityPerM3();
            }
        }
        return acceptors > donors;
    }

    /**
     * Fills efn and efp per cell: the documented defaults of {@link QuasiFermiLevels}, then each rule
     * over the cells whose midpoints it covers.
     */
    private void resolveQuasiFermiLevels(Structure s, QuasiFermiLevels q) {
        int cells = n - 1;
        List<LayerState> states = s.layerStates();
        double channel = channelDepth;
        double gateSideBottom = Double.isNaN(channel) ? states.get(0).depthBottom() : channel;
        double gateLevel = FermiContact.GATE.levelEv(gateBiasV);
        // an insulator between gate metal and nitride (QuasiFermiLevels.HolesUnderInsulator): the
        // holes above the channel follow the channel in p-type layers (all of them with
        // CHANNEL_EVERYWHERE) and take the level giving fewer holes, max(gate, channel), elsewhere
        QuasiFermiLevels.HolesUnderInsulator under = q.holesUnderInsulator();
        boolean insulated = !s.gateStack().isEmpty() && under != QuasiFermiLevels.HolesUnderInsulator.GATE;
        double scarceLevel = Math.max(gateLevel, 0);
        for (int k = 0; k < cells; k++) {
            efn[k] = 0;
            contactN[k] = FermiContact.CHANNEL;
            if (insulatorCell[k]) {
                // no carriers in an insulator (nc = nv = 0): the levels there are never used
                efp[k] = 0;
                contactP[k] = FermiContact.CHANNEL;
                continue;
            }
            double bottomOfLayer = states.get(layerOfCell[k]).depthBottom();
            boolean gateSide = bottomOfLayer <= gateSideBottom * (1 + 1e-12);
            if (gateSide && insulated) {
                boolean toChannel = under == QuasiFermiLevels.HolesUnderInsulator.CHANNEL_EVERYWHERE
                        || grownPType(states.get(layerOfCell[k]));
                efp[k] = toChannel ? 0 : scarceLevel;
                contactP[k] = toChannel || scarceLevel == 0 ? FermiContact.CHANNEL : FermiContact.GATE;
            } else {
                efp[k] = gateSide ? gateLevel : 0;
                contactP[k] = gateSide ? FermiContact.GATE : FermiContact.CHANNEL;
            }
        }
        List<QuasiFermiLevels.Rule> rules = q.rules();
        if (rules.isEmpty()) {
            return;
        }
        int[] ruleN = new int[cells];
        int[] ruleP = new int[cells];
        java.util.Arrays.fill(ruleN, -1);
        java.util.Arrays.fill(ruleP, -1);
        electronRuleCell = new boolean[cells];
        double total = s.totalThickness();
        for (int r = 0; r < rules.size(); r++) {
            QuasiFermiLevels.Rule rule = rules.get(r);
            boolean found = false;
            if (rule.region() instanceof QuasiFermiLevels.Region.Layer l) {
                List<String> names = new ArrayList<>();
                for (LayerState st : states) {
                    names.add(st.layer().name());
                    found |= st.layer().name().equals(l.name());
                }
                if (!found) {
                    throw new InvalidParameterException("quasi-Fermi rule " + r + " layer", "\"" + l.name() + "\"",
                            "one of the stack's layers " + names);
                }
            } else {
                QuasiFermiLevels.Region.Depths dr = (QuasiFermiLevels.Region.Depths) rule.region();
                if (dr.depthBottom() > total * (1 + 1e-12)) {
                    throw new InvalidParameterException("quasi-Fermi rule " + r + " depthBottom (m)",
                            Double.toString(dr.depthBottom()), "(" + dr.depthTop() + ", " + total
                                    + "] (inside the stack, whose thickness is " + total + " m)");
                }
            }
            double level = rule.contact().levelEv(gateBiasV);
            boolean electrons = rule.carrier() == Carrier.ELECTRONS;
            int[] owner = electrons ? ruleN : ruleP;
            for (int k = 0; k < cells; k++) {
                if (insulatorCell[k]) {
                    continue;
                }
                boolean covers;
                if (rule.region() instanceof QuasiFermiLevels.Region.Layer l) {
                    covers = states.get(layerOfCell[k]).layer().name().equals(l.name());
                } else {
                    QuasiFermiLevels.Region.Depths dr = (QuasiFermiLevels.Region.Depths) rule.region();
                    double mid = 0.5 * (x[k] + x[k + 1]);
                    covers = mid >= dr.depthTop() && mid <= dr.depthBottom();
                }
                if (!covers) {
                    continue;
                }
                if (owner[k] >= 0) {
                    throw new InvalidParameterException("quasi-Fermi rule " + r + " region (" + rule.carrier() + ")",
                            rule.region().toString(), "not overlapping rule " + owner[k] + " for the same carrier, "
                                    + rules.get(owner[k]).region());
                }
                owner[k] = r;
                if (electrons) {
                    electronRuleCell[k] = true;
                    efn[k] = level;
                    contactN[k] = rule.contact();
                } else {
                    efp[k] = level;
                    contactP[k] = rule.contact();
                }
            }
        }
    }

    /**
     * The forward-bias rule of {@link QuasiFermiLevels.ForwardBiasElectrons#GATE_SIDE_FOLLOWS_GATE}
     * on the potential {@code phi}: finds the node of the highest conduction-band edge between the
     * top of the stack and the channel interface (each node's edge the higher of its two cells'
     * E_c - phi there) and lets the cells above it follow the gate, the others the channel (cells a
     * user's electron rule covers keep that rule). The first of equal maxima wins. Once
     * {@link #freezeGateSideSplit()} was called, or after
     * {@value QuasiFermiLevels#FORWARD_SPLIT_MAX_MOVES} moves, the split stays where it is. O(N).
     *
     * @param phi the current potential (V)
     * @return whether the split moved (the densities then changed)
     */
    boolean updateGateSideSplit(double[] phi) {
        if (forwardTopCell < 0 || forwardFrozen) {
            return false;
        }
        int best = forwardTopCell;
        double top = Double.NEGATIVE_INFINITY;
        for (int i = forwardTopCell; i <= forwardChannelNode; i++) {
            double e = Double.NEGATIVE_INFINITY;
            if (i > forwardTopCell) {
                e = ec[i - 1] - phi[i];
            }
            if (i < forwardChannelNode) {
                e = Math.max(e, ec[i] - phi[i]);
            }
            if (e > top) {
                top = e;
                best = i;
            }
        }
        if (best == forwardSplit) {
            return false;
        }
        int from = Math.min(best, forwardSplit);
        int to = Math.max(best, forwardSplit);
        double gateLevel = FermiContact.GATE.levelEv(gateBiasV);
        for (int k = from; k < to; k++) {
            if (electronRuleCell != null && electronRuleCell[k]) {
                continue;
            }
            boolean gate = k < best;
            efn[k] = gate ? gateLevel : 0;
            contactN[k] = gate ? FermiContact.GATE : FermiContact.CHANNEL;
        }
        forwardSplit = best;
        if (++forwardMoves >= QuasiFermiLevels.FORWARD_SPLIT_MAX_MOVES) {
            forwardFrozen = true;
        }
        // the levels moved: the quantities that depend on them follow
        boolean uniform = true;
        for (double v : efn) {
            uniform &= v == 0;
        }
        quasiFermiUniform = uniform;
        for (int i = Math.max(1, from); i <= Math.min(n - 2, to); i++) {
            sameCellsAround[i] = sameCellsAroundBase(i) && efn[i - 1] == efn[i] && efp[i - 1] == efp[i];
        }
        for (int j = 0; j < sheetNode.length; j++) {
            sheetFermiEv[j] = interfaceStateFermiLevelEv(sheetNode[j]);
        }
        return true;
    }

    /** Freezes the forward-bias split where it is (the outer loop is near convergence). */
    void freezeGateSideSplit() {
        forwardFrozen = true;
    }

    /** {@return the number of cells from the top that follow the gate by the forward-bias rule} */
    int gateSideCells() {
        return forwardTopCell < 0 ? 0 : forwardSplit;
    }

    private boolean sameCellsAroundBase(int i) {
        int a = i - 1;
        return ec[a] == ec[i] && ev[a] == ev[i] && nc[a] == nc[i] && nv[a] == nv[i] && layerOfCell[a] == layerOfCell[i];
    }

    /**
     * The Fermi level that occupies the interface states of a sheet at a node (eV, on the solver's
     * scale with the bottom contact at 0), the one place where that choice is made: the electrons'
     * quasi-Fermi level of the nitride cell just below the sheet, i.e. of the region the states sit
     * in ({@link QuasiFermiLevels}). States under an insulator exchange electrons with the nitride,
     * not with the gate metal, and a free surface has no contact of its own; with the default rules
     * that level is the channel's, 0 eV.
     */
    private double interfaceStateFermiLevelEv(int node) {
        return efn[Math.min(node, n - 2)];
    }

    /**
     * Windows never reach into the gate stack: a top above the insulator's bottom is moved down to
     * it (a hard wall; with conduction-band offsets of 2 eV and more the wave functions enter an
     * insulator by a few angstroms only), and a window inside the insulator is dropped.
     */
    private static List<double[]> clipToNitride(List<double[]> windows, double gateT) {
        if (gateT == 0) {
            return windows;
        }
        List<double[]> out = new ArrayList<>();
        for (double[] w : windows) {
            if (w[1] > gateT) {
                out.add(new double[] {Math.max(w[0], gateT), w[1]});
            }
        }
        return out;
    }

    private static double[] mergeClose(TreeSet<Double> breaks, double tol) {
        double[] tmp = new double[breaks.size()];
        int k = 0;
        for (double b : breaks) {
            if (k == 0 || b - tmp[k - 1] > tol) {
                tmp[k++] = b;
            }
        }
        // keep the exact total thickness as the last point
        tmp[k - 1] = breaks.last();
        return java.util.Arrays.copyOf(tmp, k);
    }

    private static List<double[]> resolveWindows(Structure s, QuantumWindows choice) {
        List<double[]> out = new ArrayList<>();
        double total = s.totalThickness();
        if (choice instanceof QuantumWindows.None) {
            return out;
        }
        if (choice instanceof QuantumWindows.Automatic a) {
            // one window around every interface, overlapping ones merged
            double ext = a.extension();
            for (double itf : s.interfaceDepths()) {
                double top = Math.max(0, itf - ext);
                double bottom = Math.min(total, itf + ext);
                if (!out.isEmpty() && top <= out.get(out.size() - 1)[1] + 1e-9) {
                    out.get(out.size() - 1)[1] = bottom;
                } else {
                    out.add(new double[] {top, bottom});
                }
            }
            return out;
        }
        if (choice instanceof QuantumWindows.BelowDeepestInterface b) {
            double[] itf = s.interfaceDepths();
            double deepest = itf.length == 0 ? 0 : itf[itf.length - 1];
            out.add(new double[] {0, Math.min(total, deepest + b.depthBelow())});
            return out;
        }
        for (QuantumWindows.Window w : ((QuantumWindows.Explicit) choice).windows()) {
            if (w.depthBottom() > total * (1 + 1e-12)) {
                throw new InvalidParameterException("quantum window bottom depth (m)", Double.toString(w.depthBottom()),
                        "[" + (w.depthTop() + 1e-9) + ", " + total + "] (inside the stack, whose thickness is " + total
                                + " m)");
            }
            // a bottom within round-off of the stack's thickness is the bottom itself
            out.add(new double[] {w.depthTop(), Math.min(total, w.depthBottom())});
        }
        return out;
    }

    /** Box-weighted conduction-band edge at node i for phi = 0 (eV). */
    double nodeEc(int i) {
        if (i == 0) {
            return ec[0];
        }
        if (i == n - 1) {
            return ec[n - 2];
        }
        return (h[i - 1] * ec[i - 1] + h[i] * ec[i]) / (h[i - 1] + h[i]);
    }

    /** Box-weighted valence-band edge at node i for phi = 0 (eV). */
    double nodeEv(int i) {
        if (i == 0) {
            return ev[0];
        }
        if (i == n - 1) {
            return ev[n - 2];
        }
        return (h[i - 1] * ev[i - 1] + h[i] * ev[i]) / (h[i - 1] + h[i]);
    }

    /** Box-weighted offset of hole band b below the top valence band at node i (eV). */
    double nodeHoleOffset(int b, int i) {
        double[] o = holeOffset[b];
        if (i == 0) {
            return o[0];
        }
        if (i == n - 1) {
            return o[n - 2];
        }
        return (h[i - 1] * o[i - 1] + h[i] * o[i]) / (h[i - 1] + h[i]);
    }

    /** Box-weighted in-plane mass of hole band b at node i (m0). */
    double nodeHoleMassXY(int b, int i) {
        double[] m = holeMassXY[b];
        if (i == 0) {
            return m[0];
        }
        if (i == n - 1) {
            return m[n - 2];
        }
        return (h[i - 1] * m[i - 1] + h[i] * m[i]) / (h[i - 1] + h[i]);
    }

    /** Box-weighted in-plane mass at node i. */
    double nodeMassXY(int i) {
        if (i == 0) {
            return massXY[0];
        }
        if (i == n - 1) {
            return massXY[n - 2];
        }
        return (h[i - 1] * massXY[i - 1] + h[i] * massXY[i]) / (h[i - 1] + h[i]);
    }

    /** Box width of node i (m). */
    double box(int i) {
        double w = 0;
        if (i > 0) {
            w += 0.5 * h[i - 1];
        }
        if (i < n - 1) {
            w += 0.5 * h[i];
        }
        return w;
    }
}
