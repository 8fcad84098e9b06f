package org.wurtzkit.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;

/** Acceptors as grown: E_A = E_A0 - alpha N_A^(1/3) (G. L. Pearson and J. Bardeen, Phys. Rev. 75, 865 (1949)). */
class DopantTest {
    @Test
    void magnesiumLevelFallsWithDensityAsThePearsonBardeenLaw() {
        // alpha = 1.612 q^2/(4 pi eps0 eps_s), eps_s = 9.5 [computed here from CODATA 2018:
        // q/(4 pi eps0) = 1.439964e-9 eV m]
        double alpha = 1.612 * 1.439964e-7 / 9.5;
        assertEquals(alpha, Dopant.MG_GAN_ALPHA_EV_CM, 0.005 * alpha);
        assertEquals(0.215 - alpha * 1e6, Dopant.magnesiumInGaNPerCm3(1e18).ionizationEnergyEv(), 5e-4);
        Dopant heavy = Dopant.magnesiumInGaNPerCm3(3e19);
        // 0.17 eV measured near a few 1e19 cm^-3 (Korotkov, Gregie and Wessels, Appl. Phys. Lett. 78,
        // 222 (2001), abstract): the screened level brackets it between 1e18 and 3e19
        assertTrue(heavy.ionizationEnergyEv() < 0.17 && Dopant.magnesiumInGaNPerCm3(1e18).ionizationEnergyEv() > 0.17);
        assertEquals(Dopant.ACCEPTOR_DEGENERACY, heavy.degeneracy());
        assertEquals(Dopant.Kind.ACCEPTOR, heavy.kind());
        assertEquals(3e25, heavy.densityPerM3(), 1e13);
    }

    @Test
    void aDensityThatWouldMakeTheLevelNegativeIsRejectedNotClamped() {
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> Dopant.acceptorsWithScreenedLevelPerCm3(1e21, 0.215, 2.44e-8));
        assertEquals("acceptor density (cm^-3)", e.parameter());
        assertEquals("1.0E21", e.value());
        assertTrue(e.allowedRange().contains("E_A0 - alpha N_A^(1/3) must stay positive"), e.getMessage());
        assertThrows(InvalidParameterException.class, () -> Dopant.acceptorsWithScreenedLevelPerCm3(1e18, 0.2, -1e-8));
        assertThrows(InvalidParameterException.class, () -> Dopant.acceptorsWithScreenedLevelPerCm3(Double.NaN, 0.2, 1e-8));
    }
}
