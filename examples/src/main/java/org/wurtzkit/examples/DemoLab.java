package org.wurtzkit.examples;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * The invented scenario of the examples: the fictional <b>Tarnwick Nitride Lab</b> plans its
 * wafer run {@value #WAFER}, a capped AlGaN/AlN/GaN HEMT. The lab, the wafer name and the stack are
 * made up for these examples (they describe no real lab, wafer or measurement); every result
 * computed from them is a model estimate.
 *
 * <p>The stack of wafer {@value #WAFER}, top down: GaN cap 2 nm / Al<sub>0.26</sub>Ga<sub>0.74</sub>N
 * barrier 22 nm / AlN spacer 1 nm / GaN buffer 1800 nm, metal face, 300 K, under a Schottky gate
 * with a 1.0 eV barrier at 0 V. The design studies vary the barrier, the cap and the gate bias of
 * this stack ({@link #wafer(ParameterSet, double, double, double, double)}).
 */
public final class DemoLab {
    /** The fictional lab. */
    public static final String LAB = "Tarnwick Nitride Lab";
    /** The fictional wafer whose stack the examples study. */
    public static final String WAFER = "TNL-0731";
    /** One line printed by every example and written into every plot title. */
    public static final String INVENTED = "invented demo data (fictional " + LAB + ")";

    /** Al fraction of the barrier of {@value #WAFER}. */
    public static final double AL_FRACTION = 0.26;
    /** Barrier thickness of {@value #WAFER} (nm). */
    public static final double BARRIER_NM = 22;
    /** Cap thickness of {@value #WAFER} (nm). */
    public static final double CAP_NM = 2;
    /** AlN spacer thickness (nm). */
    public static final double SPACER_NM = 1;
    /** GaN buffer thickness (nm). */
    public static final double BUFFER_NM = 1800;
    /** Schottky barrier height of the gate (eV). */
    public static final double GATE_BARRIER_EV = 1.0;

    private DemoLab() {
    }

    /**
     * The stack of wafer {@value #WAFER} with the default parameter set, at 0 V.
     *
     * @return the structure
     */
    public static Structure wafer() {
        return wafer(ParameterSets.defaultSet(), AL_FRACTION, BARRIER_NM, CAP_NM, 0);
    }

    /**
     * A variant of the {@value #WAFER} stack.
     *
     * @param set       parameter set
     * @param x         Al fraction of the barrier
     * @param barrierNm barrier thickness (nm)
     * @param capNm     GaN cap thickness (nm); 0 grows no cap
     * @param biasV     gate bias (V)
     * @return the structure
     */
    public static Structure wafer(ParameterSet set, double x, double barrierNm, double capNm, double biasV) {
        Structure.Builder b = Structure.builder(set)
                .grow(Layer.of("buffer", Composition.GAN, BUFFER_NM * NM))
                .grow(Layer.of("spacer", Composition.ALN, SPACER_NM * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), barrierNm * NM));
        if (capNm > 0) {
            b.grow(Layer.of("cap", Composition.GAN, capNm * NM));
        }
        return b.top(TopBoundary.schottky(GATE_BARRIER_EV).atBiasV(biasV)).build();
    }
}
