// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import org.junit.jupiter.api.Test;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulators;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.sp.QuasiFermiLevels.HolesUnderInsulator;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Constants;

/**
 * Holes of a p-GaN layer under an insulator ({@link QuasiFermiLevels.HolesUnderInsulator}): by
 * default they follow the channel, as in the ideal MIS capacitor, and the option {@code GATE} keeps
 * the rule of a gate touching the p-GaN.
 */
class HolesUnderInsulatorTest {
    private static final ParameterSet SET = ParameterSets.defaultSet();
    private static final double TOX = 10 * NM;
    private static final double P_GAN = 70 * NM;
    /** Gate Fermi level below the Al2O3 conduction band (eV); invented for the test. */
    private static final double PHI_B = 3.0;
    private static final SelfConsistentSolver CHANNEL = new SelfConsistentSolver();
    private static final SelfConsistentSolver GATE = new SelfConsistentSolver(SolverOptions.defaults()
            .withQuasiFermiLevels(QuasiFermiLevels.defaults().withHolesUnderInsulator(HolesUnderInsulator.GATE)));

    /**
     * GaN 1 um / Al0.2Ga0.8N 15 nm / p-GaN 70 nm (Mg 3e19 cm^-3, 0.17 eV) / 10 nm Al2O3 / gate. The
     * p-GaN's top face carries a fixed charge equal and opposite to its spontaneous polarization
     * (invented, so that the face is neutral as in the textbook MIS capacitor and only the gate moves
     * the holes there).
     */
    static Structure stack(double biasV) {
        double psp = SET.material(Composition.GAN).get(MaterialParameter.SPONTANEOUS_POLARIZATION);
        double compensatingPerCm2 = -psp / Constants.ELEMENTARY_CHARGE * 1e-4;
        return Structure.builder(SET).grow(Layer.of("buffer", Composition.GAN, 1000 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.2), 15 * NM))
                .grow(Layer.of("p-GaN", Composition.GAN, P_GAN).withDopant(Dopant.acceptorsPerCm3(3e19, 0.17)))
                .sheetOnTop(InterfaceSheet.fixedPerCm2(compensatingPerCm2))
                .deposit(InsulatorLayer.ofNm(Insulators.AL2O3, TOX / NM)).top(TopBoundary.schottky(PHI_B, biasV))
                .build();
    }

    /** Holes (m^-2) in the p-GaN within a depth below its top face (trapezoid over the nodes). */
    static double holesBelowTop(Solution s, double depth) {
        double[] x = s.depth();
        double[] p = s.holeDensity();
        double sum = 0;
        for (int i = 0; i + 1 < x.length; i++) {
            double mid = 0.5 * (x[i] + x[i + 1]);
            if (mid >= TOX && mid <= TOX + depth) {
                sum += 0.5 * (p[i] + p[i + 1]) * (x[i + 1] - x[i]);
            }
        }
        return sum;
    }

    static double bias(Solution s) {
        return ((TopBoundary.Schottky) s.structure().top()).biasV();
    }

    static int nodeAt(Solution s, double depth) {
        return HoleQuasiFermiTest.nodeAt(s, depth);
    }

    /** E_v on the p-GaN side of its top face (eV). */
    static double surfaceValenceBand(Solution s) {
        for (InterfaceEdges e : s.interfaceEdges()) {
            if ("p-GaN".equals(e.lowerLayer()) && Math.abs(e.depth() - TOX) < 1e-12) {
                return e.valenceBelowEv();
            }
        }
        throw new AssertionError("no insulator/p-GaN interface in " + s.interfaceEdges());
    }

    /**
     * The default: the p-GaN's holes follow the channel (0 eV) at every gate bias, so its neutral
     * bulk stays where it is and the gate bias drops across the insulator and the p-GaN's top face:
     * holes accumulate there at reverse bias and are depleted at forward bias, as in the ideal MIS
     * capacitor on p-type material (S. M. Sze and K. K. Ng, Physics of Semiconductor Devices, 3rd ed.,
     * Wiley 2007, ch. 4: accumulation, depletion, one flat Fermi level in the semiconductor). Checks:
     * (1) in accumulation the capacitance approaches C_ox from below (the accumulation layer's own
     * capacitance in series; Sze and Ng, ch. 4), between 0.85 and 1 C_ox here; (2) the change of the
     * valence-band edge at the p-GaN face is -dV + dQ_gate / C_ox (Gauss's law across a charge-free
     * insulator, derived here: the insulator's field is Q_gate / eps_ox, and the gate's level is -V).
     */
    @Test
    void pGanUnderAnInsulatorAccumulatesAtReverseBiasAndDepletesAtForwardBias() {
        double cox = 9.0 * Constants.VACUUM_PERMITTIVITY / TOX; // kappa of the built-in Al2O3
        assertEquals(Insulators.AL2O3.relativePermittivity(), 9.0, 0.0);
        Solution reverse4 = CHANNEL.solve(stack(-4));
        Solution reverse = CHANNEL.solve(stack(-3));
        Solution zero = CHANNEL.solve(stack(0));
        Solution forward = CHANNEL.solve(stack(2));
        int mid = nodeAt(zero, TOX + P_GAN / 2);
        for (Solution s : new Solution[] {reverse4, reverse, zero, forward}) {
            assertEquals(0.0, s.holeFermiLevel()[mid], 0.0, "holes of the p-GaN follow the channel");
            // the neutral bulk of the p-GaN does not move with the gate (within 1 meV)
            assertEquals(zero.valenceBand()[mid], s.valenceBand()[mid], 1e-3, "E_v in the middle of the p-GaN");
        }
        double top0 = holesBelowTop(zero, 5 * NM);
        assertTrue(holesBelowTop(reverse, 5 * NM) > 50 * top0, "accumulation at -3 V: "
                + holesBelowTop(reverse, 5 * NM) + " vs " + top0 + " m^-2 at 0 V");
        assertTrue(holesBelowTop(forward, 5 * NM) < 0.1 * top0, "depletion at +2 V: "
                + holesBelowTop(forward, 5 * NM) + " vs " + top0 + " m^-2 at 0 V");
        double c = (reverse.gateCharge() - reverse4.gateCharge()) / 1.0; // F/m^2 between -4 and -3 V
        assertTrue(c > 0.85 * cox && c < cox, "accumulation capacitance " + c + " F/m^2 vs C_ox " + cox);
        for (Solution[] pair : new Solution[][] {{reverse4, reverse}, {reverse, zero}, {zero, forward}}) {
            double dv = bias(pair[1]) - bias(pair[0]);
            double expected = -dv + (pair[1].gateCharge() - pair[0].gateCharge()) / cox;
            assertEquals(expected, surfaceValenceBand(pair[1]) - surfaceValenceBand(pair[0]), 1e-3,
                    "E_v at the p-GaN face, " + dv + " V step");
        }
    }

    /**
     * The option {@code GATE} keeps the rule without an insulator: the p-GaN's holes take the gate's
     * level -V, so the p-GaN stays neutral against its own level and screens the gate like a metal
     * extension of it: the gate's charge does not move with the bias (the bias drops below the
     * p-GaN, across the barrier), and at forward bias the p-GaN holds more holes than under the
     * default (common practice, no source: a neutral layer in equilibrium with an electrode
     * shields it). The two rules agree at 0 V, where gate and channel levels coincide.
     */
    @Test
    void theGateOptionTiesThePGanToTheGateInstead() {
        Solution zero = GATE.solve(stack(0));
        Solution reverse = GATE.solve(stack(-3));
        Solution forward = GATE.solve(stack(2));
        int mid = nodeAt(zero, TOX + P_GAN / 2);
        assertEquals(3.0, reverse.holeFermiLevel()[mid], 0.0);
        assertEquals(-2.0, forward.holeFermiLevel()[mid], 0.0);
        for (Solution s : new Solution[] {reverse, forward}) {
            assertEquals(zero.gateCharge(), s.gateCharge(), 1e-6 * Math.abs(zero.gateCharge()), "gate charge at "
                    + bias(s) + " V");
            assertEquals(holesBelowTop(zero, 5 * NM), holesBelowTop(s, 5 * NM), 1e-3 * holesBelowTop(zero, 5 * NM));
        }
        Solution defaultZero = CHANNEL.solve(stack(0));
        assertEquals(defaultZero.holeSheetDensity(), zero.holeSheetDensity(), 1e-9 * zero.holeSheetDensity());
        Solution defaultForward = CHANNEL.solve(stack(2));
        assertTrue(holesBelowTop(forward, P_GAN) > 1.5 * holesBelowTop(defaultForward, P_GAN),
                "GATE floods the p-GaN at +2 V: " + holesBelowTop(forward, P_GAN) + " vs "
                        + holesBelowTop(defaultForward, P_GAN) + " m^-2");
    }

    /**
     * An undoped AlGaN barrier under an insulator (the MIS-HEMT of {@link MisHemtTest}, 10 nm Al2O3,
     * +2.5e13 cm^-2 fixed charge): its holes are minority carriers with no fast supply, so at reverse
     * bias it goes into deep depletion and the 2DEG pinches off, as a real MIS-HEMT does; in full
     * equilibrium ({@code CHANNEL_EVERYWHERE}) a hole inversion layer forms at the barrier's face
     * instead and screens the gate, so the 2DEG never pinches off (the MOS capacitor's inversion
     * against deep depletion: Sze and Ng, ch. 4). At forward bias the default gives the barrier the
     * channel's level, under which fewer holes than at the gate's level gather.
     */
    @Test
    void anUndopedBarrierUnderAnInsulatorGoesIntoDeepDepletionNotInversion() {
        SelfConsistentSolver equilibrium = new SelfConsistentSolver(SolverOptions.defaults().withQuasiFermiLevels(
                QuasiFermiLevels.defaults().withHolesUnderInsulator(HolesUnderInsulator.CHANNEL_EVERYWHERE)));
        InterfaceSheet sheet = InterfaceSheet.fixedPerCm2(2.5e13);
        Structure reverse = MisHemtTest.misHemt(10, sheet, -8);
        Solution deep = CHANNEL.solve(reverse);
        Solution inverted = equilibrium.solve(reverse);
        assertTrue(deep.sheetDensityPerCm2() < 1e9, "pinched off: " + deep.sheetDensityPerCm2());
        assertTrue(deep.holesUnderGateStack() < 1, "no holes: " + deep.holesUnderGateStack());
        assertTrue(inverted.holesUnderGateStack() > 1e16, "inversion: " + inverted.holesUnderGateStack());
        assertTrue(inverted.sheetDensityPerCm2() > 1e12, "not pinched off: " + inverted.sheetDensityPerCm2());
        // at reverse bias the scarcer level is the gate's: the default agrees with GATE there
        assertEquals(deep.sheetDensityPerCm2(), GATE.solve(reverse).sheetDensityPerCm2(), 0.0);
        Structure forward = MisHemtTest.misHemt(10, sheet, 1);
        int face = nodeAt(deep, TOX);
        assertEquals(0.0, CHANNEL.solve(forward).holeFermiLevel()[face], 0.0, "the channel's level at +1 V");
        assertEquals(-1.0, GATE.solve(forward).holeFermiLevel()[face], 0.0, "the gate's level at +1 V");
        assertTrue(CHANNEL.solve(forward).holesUnderGateStack() < 1e-6 * GATE.solve(forward).holesUnderGateStack());
    }

    /** The option is part of the solver settings a result carries and reads back. */
    @Test
    void theOptionRoundTripsThroughTheSettingsText() {
        QuasiFermiLevels q = QuasiFermiLevels.defaults().withHolesUnderInsulator(HolesUnderInsulator.GATE)
                .withLayer(Carrier.HOLES, "p-GaN", FermiContact.floating(-0.5));
        assertEquals(q, QuasiFermiLevelsText.read(QuasiFermiLevelsText.write(q)));
        assertEquals(HolesUnderInsulator.GATE, q.holesUnderInsulator(), "with(rule) keeps the choice");
        assertEquals("", QuasiFermiLevelsText.write(QuasiFermiLevels.defaults()));
        assertEquals(HolesUnderInsulator.CHANNEL_FOR_P_LAYERS, QuasiFermiLevels.defaults().holesUnderInsulator());
    }
}
