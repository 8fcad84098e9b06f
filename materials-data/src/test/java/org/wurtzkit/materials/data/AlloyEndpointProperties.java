package org.wurtzkit.materials.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleFunction;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Bowing;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * For every registered set ({@link ParameterSets#all()}), alloys at and near each corner of the
 * composition triangle reduce to the binaries: exactly at the end points, and continuously close to
 * them (a ternary of the bowing form v(d) = (1 - d) v_A + d v_B -/+ b d (1 - d) deviates from v_A by
 * at most d (|v_B - v_A| + |b|); common practice, no source).
 */
class AlloyEndpointProperties {

    /** A path from a corner: the composition at distance d from it, the corner and the far binary. */
    private record Path(String name, DoubleFunction<Composition> at, Binary corner, Binary far) {
    }

    private static final List<Path> PATHS = List.of(
            new Path("AlGaN from GaN", d -> Composition.alGaN(d), Binary.GAN, Binary.ALN),
            new Path("AlGaN from AlN", d -> Composition.alGaN(1 - d), Binary.ALN, Binary.GAN),
            new Path("InGaN from GaN", d -> Composition.inGaN(d), Binary.GAN, Binary.INN),
            new Path("InGaN from InN", d -> Composition.inGaN(1 - d), Binary.INN, Binary.GAN),
            new Path("InAlN from AlN", d -> Composition.inAlN(d), Binary.ALN, Binary.INN),
            new Path("InAlN from InN", d -> Composition.inAlN(1 - d), Binary.INN, Binary.ALN));

    @Provide
    Arbitrary<ParameterSet> sets() {
        return Arbitraries.of(ParameterSets.all());
    }

    @Provide
    Arbitrary<Path> paths() {
        return Arbitraries.of(PATHS);
    }

    /** The bowing coefficient that multiplies d (1 - d) for parameter p on a path (0 if none). */
    private static double bowing(ParameterSet set, Path path, MaterialParameter p) {
        boolean al = path.corner == Binary.ALN || path.far == Binary.ALN;
        boolean in = path.corner == Binary.INN || path.far == Binary.INN;
        boolean ga = path.corner == Binary.GAN || path.far == Binary.GAN;
        Bowing b;
        if (p == MaterialParameter.BAND_GAP_0K) {
            b = al && ga ? set.bowing().gapAlGaN() : in && ga ? set.bowing().gapInGaN() : set.bowing().gapInAlN();
        } else if (p == MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING) {
            b = al && ga ? set.bowing().polarizationAlGaN() : in && ga ? set.bowing().polarizationInGaN()
                    : set.bowing().polarizationInAlN();
        } else {
            return 0;
        }
        return b.value();
    }

    /**
     * Largest magnitude of p over the three binaries: the parameter's natural scale. For the
     * polarization bowing, zero in every binary, the scale is that of the polarization it corrects.
     */
    private static double scale(ParameterSet set, MaterialParameter p) {
        if (p == MaterialParameter.SPONTANEOUS_POLARIZATION_BOWING) {
            p = MaterialParameter.SPONTANEOUS_POLARIZATION;
        }
        double m = 0;
        for (Binary b : Binary.values()) {
            m = Math.max(m, Math.abs(set.binary(b).get(p)));
        }
        return m;
    }

    @Property
    void exactEndPointsAreTheBinaries(@ForAll("sets") ParameterSet set, @ForAll("paths") Path path) {
        WurtziteMaterial corner = set.material(path.at.apply(0.0));
        WurtziteMaterial far = set.material(path.at.apply(1.0));
        assertEquals(set.binary(path.corner).values(), corner.values(), path.name);
        assertEquals(set.binary(path.far).values(), far.values(), path.name);
        for (MaterialParameter p : MaterialParameter.values()) {
            assertEquals(set.binary(path.corner).source(p), corner.source(p), path.name + " " + p.key());
        }
    }

    @Property
    void quaternaryCornersAreTheBinaries(@ForAll("sets") ParameterSet set) {
        assertEquals(set.binary(Binary.GAN).values(), set.material(Composition.alInGaN(0, 0)).values());
        assertEquals(set.binary(Binary.ALN).values(), set.material(Composition.alInGaN(1, 0)).values());
        assertEquals(set.binary(Binary.INN).values(), set.material(Composition.alInGaN(0, 1)).values());
    }

    @Property
    void nearTheCornerTheAlloyIsWithinTheBowingBound(@ForAll("sets") ParameterSet set, @ForAll("paths") Path path,
            @ForAll @DoubleRange(min = -12, max = -2) double log10Distance) {
        Composition c = path.at.apply(Math.pow(10, log10Distance));
        // the distance actually reached (1 - d is rounded): the fraction of the far binary
        double d = c.fraction(path.far);
        WurtziteMaterial alloy = set.material(c);
        WurtziteMaterial corner = set.binary(path.corner);
        WurtziteMaterial far = set.binary(path.far);
        for (MaterialParameter p : MaterialParameter.values()) {
            double vA = corner.get(p);
            double v = alloy.get(p);
            double bound = d * (Math.abs(far.get(p) - vA) + Math.abs(bowing(set, path, p)));
            // round-off of 1 - d and of the sums: a few ulps of the parameter's scale
            double slack = 1e-15 * scale(set, p);
            assertTrue(Math.abs(v - vA) <= bound * (1 + 1e-9) + slack,
                    set.name() + " " + path.name + " d = " + d + " " + p.key() + ": " + v + " vs " + vA + ", bound " + bound);
        }
    }

    @Example
    void oneBillionthOfAlIsWithinOnePpmOfGaN() {
        // continuity check of the brief: x = 1e-9 within 1e-6 relative of the binary (relative to the
        // parameter's scale where the binary's own value is zero, e.g. Ev of GaN)
        for (ParameterSet set : ParameterSets.all()) {
            for (Path path : PATHS) {
                WurtziteMaterial alloy = set.material(path.at.apply(1e-9));
                WurtziteMaterial corner = set.binary(path.corner);
                for (MaterialParameter p : MaterialParameter.values()) {
                    double ref = Math.max(Math.abs(corner.get(p)), scale(set, p));
                    assertEquals(corner.get(p), alloy.get(p), 1e-6 * ref, set.name() + " " + path.name + " " + p.key());
                }
            }
        }
    }
}
