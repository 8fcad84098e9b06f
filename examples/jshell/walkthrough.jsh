// wurtzkit in jshell: build a layer stack, solve it, read the 2DEG sheet density.
//
// From the repository root, after a build that wrote examples/target/classpath.txt
// (mvn -B -ntp -DskipTests package, or the demo command of README.md):
//
//   jshell --class-path "$(cat examples/target/classpath.txt)" examples/jshell/walkthrough.jsh
//
// The session stays open afterwards with every variable below defined; /exit leaves it.
// The stack is wafer TNL-0731 of the examples' invented demo scenario (the fictional Tarnwick
// Nitride Lab); the results are model estimates, to be confirmed by measurement.
//
// jshell runs a statement as soon as a line completes one, so a builder chain that spans lines
// ends each line with the dot of the next call.

import static org.wurtzkit.units.Units.NM;
import org.wurtzkit.material.*;
import org.wurtzkit.structure.*;
import org.wurtzkit.solvers.sp.*;

// 1. The parameter sets on the class path (found through ServiceLoader); take the default one.
System.out.println("parameter sets: " + ParameterSets.names());
ParameterSet set = ParameterSets.defaultSet();

// 2. The stack, grown bottom-up: GaN buffer, AlN spacer, AlGaN barrier, GaN cap, Schottky gate.
Structure wafer = Structure.builder(set).
        grow(Layer.of("buffer", Composition.GAN, 1800 * NM)).
        grow(Layer.of("spacer", Composition.ALN, 1 * NM)).
        grow(Layer.of("barrier", Composition.alGaN(0.26), 22 * NM)).
        grow(Layer.of("cap", Composition.GAN, 2 * NM)).
        top(TopBoundary.schottky(1.0)).
        build();
System.out.println(wafer);

// 3. The polarization sheet charge at every interface (electrons gather where it is positive).
for (InterfaceCharge c : wafer.interfaceCharges()) {
    System.out.println(String.format(java.util.Locale.ROOT, "  %-8s / %-8s at %6.2f nm: %+.3e e/cm^2",
            c.upperLayer(), c.lowerLayer(), c.depthNm(), c.sheetDensityPerCm2()));
}

// 4. Solve (self-consistent Schroedinger-Poisson) and read the result.
Solution s = new SelfConsistentSolver().solve(wafer);
System.out.println(String.format(java.util.Locale.ROOT, "n_s = %.6e cm^-2", s.sheetDensityPerCm2()));
for (Subband b : s.subbands().subList(0, Math.min(3, s.subbands().size()))) {
    System.out.println(String.format(java.util.Locale.ROOT, "  subband %d: E - E_F = %+.4f eV, %.3e cm^-2",
            b.index(), b.energyEv(), b.sheetDensityPerCm2()));
}

// 5. Go on from here: s.bandDiagram(), s.electronDensity(), s.depthNm(), or a sweep, e.g.
//    new org.wurtzkit.solvers.workflow.BiasSweep().run(wafer, 0.0, -1.0, -2.0).sheetDensityPerCm2()
