package org.wurtzkit.material;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.wurtzkit.errors.Require;

/**
 * The content hash of a parameter set: SHA-256 (FIPS 180-4) over a canonical text of every value
 * the set provides, so that a stack or result written to a file can tell whether the set it names
 * still holds the same numbers.
 *
 * <p>The canonical text has one line per value, ended by '\n', in this fixed order:
 * <ol>
 * <li>{@code binary.<formula>.<key>=<value>} for every {@link Binary} in declaration order and every
 * {@link MaterialParameter} in declaration order, in the parameter's SI unit;</li>
 * <li>{@code bowing.<name>=<value>} for the six bowing parameters of {@link AlloyBowing}, in the
 * order of its components;</li>
 * <li>{@code polarizationModel=<spontaneous>,<piezoelectric>} (the set's recommended model);</li>
 * <li>{@code alloyGapTemperatureRule=<rule>};</li>
 * <li>for every insulator of {@link ParameterSet#insulators()}, in the set's order,
 * {@code insulator.<name>=<kappa>,<gap eV>,<conduction-band offset to GaN eV>} (no line for a set
 * without insulators, so the hash of such a set is what it was before insulators existed).</li>
 * </ol>
 * Numbers are written with {@link Double#toString(double)} (the shortest text that reads back to
 * the same double), so the hash changes exactly when some value changes. The set's name,
 * description and bibliography are not hashed: renaming a set or correcting a citation does not
 * change a number the solver uses.
 */
public final class ParameterSetHash {
    private ParameterSetHash() {
    }

    /**
     * @param set a parameter set
     * @return the canonical text described in the class documentation
     */
    public static String canonicalText(ParameterSet set) {
        Require.nonNull("parameter set", set);
        StringBuilder sb = new StringBuilder(4096);
        for (Binary b : Binary.values()) {
            WurtziteMaterial m = set.binary(b);
            for (MaterialParameter p : MaterialParameter.values()) {
                sb.append("binary.").append(b.formula()).append('.').append(p.key()).append('=')
                        .append(Double.toString(m.get(p))).append('\n');
            }
        }
        AlloyBowing w = set.bowing();
        line(sb, "gapAlGaN", w.gapAlGaN());
        line(sb, "gapInGaN", w.gapInGaN());
        line(sb, "gapInAlN", w.gapInAlN());
        line(sb, "polarizationAlGaN", w.polarizationAlGaN());
        line(sb, "polarizationInGaN", w.polarizationInGaN());
        line(sb, "polarizationInAlN", w.polarizationInAlN());
        PolarizationModel pm = set.recommendedPolarizationModel();
        sb.append("polarizationModel=").append(pm.spontaneous().name()).append(',')
                .append(pm.piezoelectric().name()).append('\n');
        sb.append("alloyGapTemperatureRule=").append(set.alloyGapTemperatureRule().name()).append('\n');
        for (Insulator i : set.insulators()) {
            sb.append("insulator.").append(i.name()).append('=').append(Double.toString(i.relativePermittivity()))
                    .append(',').append(Double.toString(i.bandGapEv())).append(',')
                    .append(Double.toString(i.conductionBandOffsetToGaNEv())).append('\n');
        }
        return sb.toString();
    }

    private static void line(StringBuilder sb, String name, Bowing b) {
        sb.append("bowing.").append(name).append('=').append(Double.toString(b.value())).append('\n');
    }

    /**
     * @param set a parameter set
     * @return the SHA-256 of its {@link #canonicalText(ParameterSet) canonical text} (UTF-8), as 64
     *         lower-case hexadecimal digits
     */
    public static String sha256(ParameterSet set) {
        byte[] text = canonicalText(set).getBytes(StandardCharsets.UTF_8);
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text));
        } catch (NoSuchAlgorithmException e) {
            // every Java platform must provide SHA-256 (java.security.MessageDigest documentation)
            throw new AssertionError("the Java platform lacks SHA-256", e);
        }
    }
}
