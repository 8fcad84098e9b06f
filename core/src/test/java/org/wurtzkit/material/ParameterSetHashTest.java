package org.wurtzkit.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;
import org.wurtzkit.testing.A00TestSet;

class ParameterSetHashTest {
    private static final ParameterSet SET = A00TestSet.INSTANCE;
    private static final Source TEST = Source.of("TEST", "a test change, no physical meaning");

    @Test
    void hashIsTheSha256OfTheCanonicalText() throws Exception {
        // SHA-256 as the JDK computes it (FIPS 180-4); hex of 32 bytes is 64 digits
        String expected = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                .digest(ParameterSetHash.canonicalText(SET).getBytes(StandardCharsets.UTF_8)));
        assertEquals(expected, ParameterSetHash.sha256(SET));
        assertTrue(ParameterSetHash.sha256(SET).matches("[0-9a-f]{64}"));
    }

    @Test
    void canonicalTextHoldsEveryValueOfEveryBinaryWithItsExactDigits() {
        String text = ParameterSetHash.canonicalText(SET);
        int lines = text.split("\n").length;
        // 3 binaries x every parameter, 6 bowing values, the model and the gap rule
        assertEquals(3 * MaterialParameter.values().length + 6 + 2, lines);
        double c13 = SET.binary(Binary.GAN).get(MaterialParameter.C13);
        assertTrue(text.contains("binary.GaN.C13=" + Double.toString(c13) + "\n"), text);
    }

    @Test
    void renamingTheSetKeepsTheHashChangingOneValueChangesIt() {
        ParameterSet renamed = SET.derive("renamed-copy").build();
        assertEquals(ParameterSetHash.sha256(SET), ParameterSetHash.sha256(renamed));
        double c13 = SET.binary(Binary.GAN).get(MaterialParameter.C13);
        ParameterSet changed = SET.derive("changed").set(Binary.GAN, MaterialParameter.C13, Math.nextUp(c13), TEST)
                .build();
        assertNotEquals(ParameterSetHash.sha256(SET), ParameterSetHash.sha256(changed));
        ParameterSet otherModel = SET.derive("other-model")
                .recommendedPolarizationModel(SET.recommendedPolarizationModel().equals(PolarizationModel.LINEAR)
                        ? PolarizationModel.NONLINEAR : PolarizationModel.LINEAR)
                .build();
        assertNotEquals(ParameterSetHash.sha256(SET), ParameterSetHash.sha256(otherModel));
    }
}
