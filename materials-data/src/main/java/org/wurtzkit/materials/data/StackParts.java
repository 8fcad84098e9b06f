package org.wurtzkit.materials.data;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.strain.CriticalThickness;
import org.wurtzkit.strain.CriticalThicknessModel;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.InterfaceStates;

/**
 * The sections that format version 2 of the stack format added to version 1, written and read:
 * the critical-thickness model, the gate stack (insulators inline or by built-in name) and the
 * interface sheets (fixed charge and interface states). Every failure names file, key path and line.
 */
final class StackParts {
    private StackParts() {
    }

    // ------------------------------------------------------------------ critical-thickness model

    static void criticalThicknessModel(JsonGenerator g, String key, CriticalThicknessModel m) throws IOException {
        g.writeObjectFieldStart(key);
        if (m instanceof CriticalThicknessModel.CPlaneWurtzite c) {
            g.writeStringField("kind", "c-plane-wurtzite");
            criticalThicknessModel(g, "underCompression", c.slip());
            criticalThicknessModel(g, "underTension", c.cracking());
        } else if (m instanceof CriticalThicknessModel.PyramidalSlip) {
            g.writeStringField("kind", "pyramidal-slip");
        } else if (m instanceof CriticalThicknessModel.ChannelCracking cc) {
            g.writeStringField("kind", "channel-cracking");
            StructureJson.quantity(g, "fractureResistance", cc.fractureResistanceJPerM2(), StructureJson.Units.J_PER_M2);
        } else {
            CriticalThickness mb = (CriticalThickness) m;
            g.writeStringField("kind", "matthews-blakeslee");
            StructureJson.quantity(g, "lineToBurgersVectorAngle", mb.alphaDegrees(), StructureJson.Units.DEGREE);
            StructureJson.quantity(g, "slipToInterfaceNormalAngle", mb.lambdaDegrees(), StructureJson.Units.DEGREE);
        }
        g.writeEndObject();
    }

    static CriticalThicknessModel criticalThicknessModel(StructureJson.TreeReader t, JsonTree.Node node, String path,
            boolean tensionOnly) {
        JsonTree.Obj o = t.object(node, path);
        JsonTree.Node kindNode = t.required(o, path, "kind").value();
        String kind = tensionOnly ? t.choice(kindNode, path + ".kind", "channel-cracking")
                : t.choice(kindNode, path + ".kind", "c-plane-wurtzite", "pyramidal-slip", "channel-cracking",
                        "matthews-blakeslee");
        switch (kind) {
            case "c-plane-wurtzite" -> {
                t.onlyKeys(o, path, Set.of("kind", "underCompression", "underTension"));
                CriticalThicknessModel slip = criticalThicknessModel(t,
                        t.required(o, path, "underCompression").value(), path + ".underCompression", false);
                CriticalThicknessModel crack = criticalThicknessModel(t, t.required(o, path, "underTension").value(),
                        path + ".underTension", true);
                return t.apply(path, o.line(), () -> new CriticalThicknessModel.CPlaneWurtzite(slip,
                        (CriticalThicknessModel.ChannelCracking) crack));
            }
            case "pyramidal-slip" -> {
                t.onlyKeys(o, path, Set.of("kind"));
                return new CriticalThicknessModel.PyramidalSlip();
            }
            case "channel-cracking" -> {
                t.onlyKeys(o, path, Set.of("kind", "fractureResistance"));
                JsonTree.Member m = t.required(o, path, "fractureResistance");
                double gamma = t.quantity(m.value(), path + ".fractureResistance", StructureJson.Units.J_PER_M2);
                return t.apply(path + ".fractureResistance", m.value().line(),
                        () -> new CriticalThicknessModel.ChannelCracking(gamma));
            }
            default -> {
                t.onlyKeys(o, path, Set.of("kind", "lineToBurgersVectorAngle", "slipToInterfaceNormalAngle"));
                JsonTree.Member a = t.required(o, path, "lineToBurgersVectorAngle");
                JsonTree.Member l = t.required(o, path, "slipToInterfaceNormalAngle");
                double alpha = t.quantity(a.value(), path + ".lineToBurgersVectorAngle", StructureJson.Units.DEGREE);
                double lambda = t.quantity(l.value(), path + ".slipToInterfaceNormalAngle", StructureJson.Units.DEGREE);
                return t.apply(path, o.line(), () -> new CriticalThickness(alpha, lambda));
            }
        }
    }

    // ------------------------------------------------------------------ gate stack

    /** The built-in insulator equal to this one (every value and the source), or null. */
    static Insulator builtIn(Insulator i) {
        for (Insulator b : Insulators.all()) {
            if (b.equals(i)) {
                return b;
            }
        }
        return null;
    }

    static void insulatorLayer(JsonGenerator g, InsulatorLayer il) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", il.name());
        g.writeObjectFieldStart("insulator");
        Insulator i = il.insulator();
        Insulator b = builtIn(i);
        if (b != null) {
            g.writeStringField("builtIn", b.name());
        } else {
            g.writeStringField("name", i.name());
            StructureJson.number(g, "relativePermittivity", i.relativePermittivity());
            StructureJson.quantity(g, "bandGap", i.bandGapEv(), StructureJson.Units.EV);
            StructureJson.quantity(g, "conductionBandOffsetToGaN", i.conductionBandOffsetToGaNEv(),
                    StructureJson.Units.EV);
            g.writeStringField("source", i.source());
        }
        g.writeEndObject();
        StructureJson.quantity(g, "thickness", il.thickness(), StructureJson.Units.NANOMETRE,
                StructureJson.Units.LENGTH);
        g.writeEndObject();
    }

    static InsulatorLayer insulatorLayer(StructureJson.TreeReader t, JsonTree.Node node, String path) {
        JsonTree.Obj o = t.object(node, path);
        t.onlyKeys(o, path, Set.of("name", "insulator", "thickness"));
        String name = t.string(t.required(o, path, "name").value(), path + ".name");
        Insulator ins = insulator(t, t.required(o, path, "insulator").value(), path + ".insulator");
        JsonTree.Member th = t.required(o, path, "thickness");
        double thickness = t.quantity(th.value(), path + ".thickness", StructureJson.Units.LENGTH);
        return t.apply(path + ".thickness", th.value().line(), () -> new InsulatorLayer(name, ins, thickness));
    }

    private static Insulator insulator(StructureJson.TreeReader t, JsonTree.Node node, String path) {
        JsonTree.Obj o = t.object(node, path);
        JsonTree.Member bm = o.get("builtIn");
        if (bm != null) {
            t.onlyKeys(o, path, Set.of("builtIn"));
            String[] names = Insulators.all().stream().map(Insulator::name).toArray(String[]::new);
            return Insulators.named(t.choice(bm.value(), path + ".builtIn", names));
        }
        t.onlyKeys(o, path, Set.of("name", "relativePermittivity", "bandGap", "conductionBandOffsetToGaN", "source"));
        String name = t.string(t.required(o, path, "name").value(), path + ".name");
        double kappa = t.number(t.required(o, path, "relativePermittivity").value(), path + ".relativePermittivity");
        double gap = t.quantity(t.required(o, path, "bandGap").value(), path + ".bandGap", StructureJson.Units.EV);
        double cbo = t.quantity(t.required(o, path, "conductionBandOffsetToGaN").value(),
                path + ".conductionBandOffsetToGaN", StructureJson.Units.EV);
        String source = t.string(t.required(o, path, "source").value(), path + ".source");
        return t.apply(path, o.line(), () -> new Insulator(name, kappa, gap, cbo, source));
    }

    // ------------------------------------------------------------------ interface sheets

    static void interfaceSheet(JsonGenerator g, InterfaceSheet sheet) throws IOException {
        g.writeStartObject();
        StructureJson.quantity(g, "fixedCharge", sheet.fixedChargePerM2(), StructureJson.Units.PER_CM2,
                StructureJson.Units.SHEET);
        g.writeArrayFieldStart("states");
        for (InterfaceStates s : sheet.states()) {
            g.writeStartObject();
            StructureJson.quantity(g, "neutralLevelBelowConductionBand", s.neutralLevelBelowEcEv(),
                    StructureJson.Units.EV);
            g.writeObjectFieldStart("distribution");
            distribution(g, s.distribution());
            g.writeEndObject();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void distribution(JsonGenerator g, InterfaceStates.Distribution d) throws IOException {
        List<StructureJson.Unit> perEv = StructureJson.Units.SHEET_PER_EV;
        StructureJson.Unit perCm2Ev = StructureJson.Units.PER_CM2_EV;
        if (d instanceof InterfaceStates.Uniform u) {
            g.writeStringField("shape", "uniform");
            StructureJson.quantity(g, "density", u.perM2PerEv(), perCm2Ev, perEv);
        } else if (d instanceof InterfaceStates.Gaussian ga) {
            g.writeStringField("shape", "gaussian");
            StructureJson.quantity(g, "peakDensity", ga.peakPerM2PerEv(), perCm2Ev, perEv);
            StructureJson.quantity(g, "centreBelowConductionBand", ga.centreBelowEcEv(), StructureJson.Units.EV);
            StructureJson.quantity(g, "width", ga.widthEv(), StructureJson.Units.EV);
        } else if (d instanceof InterfaceStates.UShaped us) {
            g.writeStringField("shape", "u-shaped");
            StructureJson.quantity(g, "floorDensity", us.minimumPerM2PerEv(), perCm2Ev, perEv);
            StructureJson.quantity(g, "bandEdgeDensity", us.edgePerM2PerEv(), perCm2Ev, perEv);
            StructureJson.quantity(g, "conductionTailWidth", us.conductionTailEv(), StructureJson.Units.EV);
            StructureJson.quantity(g, "valenceTailWidth", us.valenceTailEv(), StructureJson.Units.EV);
        } else {
            InterfaceStates.Discrete di = (InterfaceStates.Discrete) d;
            g.writeStringField("shape", "discrete");
            StructureJson.quantity(g, "density", di.densityPerM2(), StructureJson.Units.PER_CM2,
                    StructureJson.Units.SHEET);
            StructureJson.quantity(g, "levelBelowConductionBand", di.levelBelowEcEv(), StructureJson.Units.EV);
        }
    }

    static InterfaceSheet interfaceSheet(StructureJson.TreeReader t, JsonTree.Node node, String path) {
        JsonTree.Obj o = t.object(node, path);
        t.onlyKeys(o, path, Set.of("fixedCharge", "states"));
        JsonTree.Member fm = o.get("fixedCharge");
        double fixed = fm == null ? 0 : t.quantity(fm.value(), path + ".fixedCharge", StructureJson.Units.SHEET);
        List<InterfaceStates> states = new ArrayList<>();
        JsonTree.Member sm = o.get("states");
        if (sm != null) {
            List<JsonTree.Node> list = t.array(sm.value(), path + ".states");
            for (int i = 0; i < list.size(); i++) {
                String p = path + ".states[" + i + "]";
                JsonTree.Obj so = t.object(list.get(i), p);
                t.onlyKeys(so, p, Set.of("neutralLevelBelowConductionBand", "distribution"));
                JsonTree.Member nm = t.required(so, p, "neutralLevelBelowConductionBand");
                double neutral = t.quantity(nm.value(), p + ".neutralLevelBelowConductionBand", StructureJson.Units.EV);
                InterfaceStates.Distribution d = distribution(t, t.required(so, p, "distribution").value(),
                        p + ".distribution");
                states.add(t.apply(p + ".neutralLevelBelowConductionBand", nm.value().line(),
                        () -> new InterfaceStates(d, neutral)));
            }
        }
        int line = fm == null ? o.line() : fm.value().line();
        return t.apply(path + ".fixedCharge", line, () -> new InterfaceSheet(fixed, states));
    }

    private static InterfaceStates.Distribution distribution(StructureJson.TreeReader t, JsonTree.Node node,
            String path) {
        JsonTree.Obj o = t.object(node, path);
        String shape = t.choice(t.required(o, path, "shape").value(), path + ".shape", "uniform", "gaussian",
                "u-shaped", "discrete");
        List<StructureJson.Unit> perEv = StructureJson.Units.SHEET_PER_EV;
        switch (shape) {
            case "uniform" -> {
                t.onlyKeys(o, path, Set.of("shape", "density"));
                JsonTree.Member m = t.required(o, path, "density");
                double d = t.quantity(m.value(), path + ".density", perEv);
                return t.apply(path + ".density", m.value().line(), () -> new InterfaceStates.Uniform(d));
            }
            case "gaussian" -> {
                t.onlyKeys(o, path, Set.of("shape", "peakDensity", "centreBelowConductionBand", "width"));
                double peak = quantity(t, o, path, "peakDensity", perEv);
                double centre = quantity(t, o, path, "centreBelowConductionBand", StructureJson.Units.EV);
                double width = quantity(t, o, path, "width", StructureJson.Units.EV);
                return t.apply(path, o.line(), () -> new InterfaceStates.Gaussian(peak, centre, width));
            }
            case "u-shaped" -> {
                t.onlyKeys(o, path, Set.of("shape", "floorDensity", "bandEdgeDensity", "conductionTailWidth",
                        "valenceTailWidth"));
                double floor = quantity(t, o, path, "floorDensity", perEv);
                double edge = quantity(t, o, path, "bandEdgeDensity", perEv);
                double wc = quantity(t, o, path, "conductionTailWidth", StructureJson.Units.EV);
                double wv = quantity(t, o, path, "valenceTailWidth", StructureJson.Units.EV);
                return t.apply(path, o.line(), () -> new InterfaceStates.UShaped(floor, edge, wc, wv));
            }
            default -> {
                t.onlyKeys(o, path, Set.of("shape", "density", "levelBelowConductionBand"));
                double n = quantity(t, o, path, "density", StructureJson.Units.SHEET);
                double e = quantity(t, o, path, "levelBelowConductionBand", StructureJson.Units.EV);
                return t.apply(path, o.line(), () -> new InterfaceStates.Discrete(n, e));
            }
        }
    }

    /** A required quantity of an object, converted to SI. */
    private static double quantity(StructureJson.TreeReader t, JsonTree.Obj o, String path, String key,
            List<StructureJson.Unit> units) {
        return t.quantity(t.required(o, path, key).value(), path + "." + key, units);
    }
}
