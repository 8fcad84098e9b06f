package org.wurtzkit.solvers.transport.mobility;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.SolverOptions;
import org.wurtzkit.solvers.sp.QuantumWindows;

/** Bad input fails with a message that names the parameter, the value and the allowed range. */
class MobilityBadInputTest {
    private static void fails(String parameter, String value, Executable e) {
        InvalidParameterException ex = assertThrows(InvalidParameterException.class, e);
        assertTrue(ex.parameter().contains(parameter), ex.getMessage());
        assertTrue(ex.getMessage().contains(value), ex.getMessage());
        assertTrue(ex.getMessage().contains("allowed range"), ex.getMessage());
    }

    @Test
    void sampleProperties() {
        fails("dislocation density (cm^-2)", "-1.0E8", () -> ChargedDislocations.perCm2(-1e8, 1));
        fails("dislocation density (m^-2)", "-1.0", () -> new ChargedDislocations(-1, 1));
        fails("dislocation occupancy", "1.5", () -> ChargedDislocations.perCm2(1e9, 1.5));
        fails("rms height Delta (nm)", "3.0", () -> InterfaceRoughness.ofNm(3, 1.5));
        fails("rms height Delta (m)", "-1.0E-10", () -> new InterfaceRoughness(-1e-10, 1.5e-9));
        fails("correlation length Lambda (nm)", "0.0", () -> InterfaceRoughness.ofNm(0.3, 0));
        fails("correlation length Lambda (nm)", "NaN", () -> InterfaceRoughness.ofNm(0.3, Double.NaN));
        fails("charge sheet density (cm^-2)", "-1.0E12", () -> ChargeSheet.ofNm(5, -1e12));
        fails("charge sheet depth (m)", "-1.0E-9", () -> new ChargeSheet(-1e-9, 1e16));
    }

    @Test
    void options() {
        fails("number of scattering mechanisms", "0", () -> MobilityOptions.defaults().withMechanisms(List.of()));
        fails("mechanism name", "alloy disorder",
                () -> MobilityOptions.defaults().withMechanisms(List.of(new AlloyDisorder(), new AlloyDisorder())));
        fails("quadrature points", "2", () -> MobilityOptions.defaults().withQuadraturePoints(2));
        fails("quadrature points", "1001", () -> MobilityOptions.defaults().withQuadraturePoints(1001));
        fails("electromechanical coupling", "1.5",
                () -> new ChannelParameters(8.9, 5.5, 0.092, 6150, 6590, 8.3, 1.5, 5.185e-10));
        fails("high-frequency permittivity", "9.5",
                () -> new ChannelParameters(8.9, 9.5, 0.092, 6150, 6590, 8.3, 0.038, 5.185e-10));
    }

    @Test
    void temperatureOutsideTheModelsRange() {
        Solution hot = new SelfConsistentSolver().solve(MobilityOfSolutionTest.hemt(false, 900));
        fails("temperature of the solution (K)", "900.0", () -> Mobility.of(hot, MobilityOptions.defaults()));
        Solution cold = new SelfConsistentSolver().solve(MobilityOfSolutionTest.hemt(false, 30));
        fails("temperature of the solution (K)", "30.0", () -> Mobility.of(cold, MobilityOptions.defaults()));
    }

    @Test
    void solutionWithoutSubbands() {
        Solution classical = new SelfConsistentSolver(SolverOptions.defaults().withQuantumWindows(new QuantumWindows.None()))
                .solve(MobilityOfSolutionTest.hemt(false, 300));
        fails("occupied subbands of the solution", "0", () -> Mobility.of(classical, MobilityOptions.defaults()));
    }
}
