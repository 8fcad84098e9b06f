package org.wurtzkit.materials.data;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.wurtzkit.material.BandGap;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * A custom material ({@code LayerMaterial.Custom}) inline in a stack file of format version 2, so
 * that the file stands alone: its name, its composition if it declares one, every parameter with
 * its value, unit and provenance (rule and every source in full), and the per-binary form of its
 * gap when it has one. Written and read bit for bit; every failure names file, key path and line.
 *
 * <pre>
 * "definition": {
 *   "name": "TNL strained-cap GaN",
 *   "composition": {"al": 0.0, "in": 0.0},                       (optional)
 *   "parameters": {
 *     "a": {"value": 3.189, "unit": "Angstrom", "rule": "tabulated",
 *           "sources": [{"key": "VM03", "citation": "...", "note": "..."}]},
 *     ... one entry per parameter key of the parameter-set files ...
 *   },
 *   "gapByBinaries": {"bowing": {..eV}, "binaries": [{"fraction": 0.3, "gapAtZeroKelvin": {..eV},
 *                     "varshniAlpha": {..eV/K}, "varshniBeta": {..K}}, ...]}   (optional)
 * }
 * </pre>
 */
final class MaterialJson {
    private MaterialJson() {
    }

    /** The units a parameter's value may be written in: the parameter-set files' unit first, then SI. */
    static List<StructureJson.Unit> units(MaterialParameter p) {
        StructureJson.Unit si = new StructureJson.Unit(p.siUnit(), 1);
        if (p.fileUnit().equals(p.siUnit())) {
            return List.of(si);
        }
        return List.of(new StructureJson.Unit(p.fileUnit(), p.fileToSi()), si);
    }

    /**
     * Refuses what the format cannot hold: a per-binary gap whose binaries are themselves
     * per-binary (no rule of the library makes one).
     */
    static void checkWritable(WurtziteMaterial m, String layerName) {
        BandGap.PerBinary pb = m.bandGap().perBinary();
        if (pb == null) {
            return;
        }
        for (BandGap b : pb.binaries()) {
            if (b.perBinary() != null) {
                throw new StructureFormatException("(writing)", "layersFromSurface", 0,
                        StructureFormatException.Reason.NOT_WRITABLE, "layer \"" + layerName
                                + "\" is made of the custom material \"" + m.name() + "\", whose per-binary gap has"
                                + " a binary that is itself per-binary; the format holds one level (each binary one"
                                + " Varshni law)",
                        null);
            }
        }
    }

    static void write(JsonGenerator g, String key, WurtziteMaterial m) throws IOException {
        g.writeObjectFieldStart(key);
        g.writeStringField("name", m.name());
        if (m.composition() != null) {
            g.writeObjectFieldStart("composition");
            StructureJson.number(g, "al", m.composition().aluminium());
            StructureJson.number(g, "in", m.composition().indium());
            g.writeEndObject();
        }
        g.writeObjectFieldStart("parameters");
        for (MaterialParameter p : MaterialParameter.values()) {
            List<StructureJson.Unit> units = units(p);
            g.writeObjectFieldStart(p.key());
            StructureJson.valueAndUnit(g, m.get(p), units.get(0), units);
            Provenance pv = m.source(p);
            g.writeStringField("rule", pv.rule());
            g.writeArrayFieldStart("sources");
            for (Source s : pv.sources()) {
                g.writeStartObject();
                g.writeStringField("key", s.key());
                g.writeStringField("citation", s.citation());
                g.writeStringField("note", s.note());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndObject();
        BandGap.PerBinary pb = m.bandGap().perBinary();
        if (pb != null) {
            g.writeObjectFieldStart("gapByBinaries");
            StructureJson.quantity(g, "bowing", pb.bowingEv(), StructureJson.Units.EV);
            g.writeArrayFieldStart("binaries");
            double[] x = pb.fractions();
            BandGap[] b = pb.binaries();
            for (int i = 0; i < x.length; i++) {
                g.writeStartObject();
                StructureJson.number(g, "fraction", x[i]);
                StructureJson.quantity(g, "gapAtZeroKelvin", b[i].gap0KEv(), StructureJson.Units.EV);
                StructureJson.quantity(g, "varshniAlpha", b[i].alphaEvPerK(), StructureJson.Units.MEV_PER_K,
                        StructureJson.Units.EV_PER_K);
                StructureJson.quantity(g, "varshniBeta", b[i].betaK(), StructureJson.Units.KELVIN);
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndObject();
    }

    static WurtziteMaterial read(StructureJson.TreeReader t, JsonTree.Node node, String path) {
        JsonTree.Obj o = t.object(node, path);
        t.onlyKeys(o, path, Set.of("name", "composition", "parameters", "gapByBinaries"));
        String name = t.string(t.required(o, path, "name").value(), path + ".name");
        WurtziteMaterial.Builder b = t.apply(path + ".name", o.line(), () -> WurtziteMaterial.builder(name));
        JsonTree.Member cm = o.get("composition");
        if (cm != null) {
            b.composition(StructureJson.composition(t, cm.value(), path + ".composition"));
        }
        String pp = path + ".parameters";
        JsonTree.Obj params = t.object(t.required(o, path, "parameters").value(), pp);
        Set<String> keys = new java.util.TreeSet<>();
        for (MaterialParameter p : MaterialParameter.values()) {
            keys.add(p.key());
        }
        t.onlyKeys(params, pp, keys);
        for (MaterialParameter p : MaterialParameter.values()) {
            String kp = pp + "." + p.key();
            JsonTree.Obj po = t.object(t.required(params, pp, p.key()).value(), kp);
            t.onlyKeys(po, kp, Set.of("value", "unit", "rule", "sources"));
            double v = t.valueAndUnit(po, kp, units(p));
            double inFileUnit = v / p.fileToSi();
            if (!(inFileUnit >= p.plausibleMinInFileUnit() && inFileUnit <= p.plausibleMaxInFileUnit())) {
                // the material builder refuses it too; said here at the parameter's own key and line
                throw t.fail(kp, po.line(), StructureFormatException.Reason.INVALID_VALUE, p.key() + " = "
                        + inFileUnit + " " + p.fileUnit() + " is outside its plausible range "
                        + p.plausibleRangeText() + " for a wurtzite nitride (a value outside it is usually a unit slip)");
            }
            String rule = t.string(t.required(po, kp, "rule").value(), kp + ".rule");
            List<JsonTree.Node> list = t.array(t.required(po, kp, "sources").value(), kp + ".sources");
            List<Source> sources = new ArrayList<>();
            for (int i = 0; i < list.size(); i++) {
                String sp = kp + ".sources[" + i + "]";
                JsonTree.Obj so = t.object(list.get(i), sp);
                t.onlyKeys(so, sp, Set.of("key", "citation", "note"));
                String key = t.string(t.required(so, sp, "key").value(), sp + ".key");
                String citation = t.string(t.required(so, sp, "citation").value(), sp + ".citation");
                JsonTree.Member nm = so.get("note");
                String note = nm == null ? "" : t.string(nm.value(), sp + ".note");
                sources.add(t.apply(sp, so.line(), () -> new Source(key, citation, note)));
            }
            Provenance pv = t.apply(kp + ".sources", po.line(), () -> new Provenance(rule, sources));
            t.apply(kp, po.line(), () -> b.set(p, v, pv));
        }
        JsonTree.Member gm = o.get("gapByBinaries");
        if (gm != null) {
            String gp = path + ".gapByBinaries";
            JsonTree.Obj go = t.object(gm.value(), gp);
            t.onlyKeys(go, gp, Set.of("bowing", "binaries"));
            double bowing = t.quantity(t.required(go, gp, "bowing").value(), gp + ".bowing", StructureJson.Units.EV);
            List<JsonTree.Node> list = t.array(t.required(go, gp, "binaries").value(), gp + ".binaries");
            double[] x = new double[list.size()];
            BandGap[] gaps = new BandGap[list.size()];
            for (int i = 0; i < list.size(); i++) {
                String bp = gp + ".binaries[" + i + "]";
                JsonTree.Obj bo = t.object(list.get(i), bp);
                t.onlyKeys(bo, bp, Set.of("fraction", "gapAtZeroKelvin", "varshniAlpha", "varshniBeta"));
                x[i] = t.number(t.required(bo, bp, "fraction").value(), bp + ".fraction");
                double e0 = t.quantity(t.required(bo, bp, "gapAtZeroKelvin").value(), bp + ".gapAtZeroKelvin",
                        StructureJson.Units.EV);
                double alpha = t.quantity(t.required(bo, bp, "varshniAlpha").value(), bp + ".varshniAlpha",
                        StructureJson.Units.EV_PER_K);
                double beta = t.quantity(t.required(bo, bp, "varshniBeta").value(), bp + ".varshniBeta",
                        StructureJson.Units.KELVIN);
                gaps[i] = new BandGap(e0, alpha, beta);
            }
            BandGap.PerBinary form = t.apply(gp, go.line(), () -> new BandGap.PerBinary(x, gaps, bowing));
            b.perBinaryGap(form);
        }
        return t.apply(path, o.line(), b::build);
    }
}
