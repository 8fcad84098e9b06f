// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.sp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.ValenceBands;

/**
 * A subband that keeps only its window's part of the wavefunction gives the same full-mesh array,
 * equality and hash as one built from the full array (common practice, no source: a storage
 * change must not be visible through the public accessors).
 */
class SubbandStorageTest {
    private static final double[] PART = {0.0, 0.3, -0.7, 1.25, 0.5, 0.0};
    private static final int OFFSET = 3;
    private static final int NODES = 12;

    private static double[] full() {
        double[] f = new double[NODES];
        System.arraycopy(PART, 0, f, OFFSET, PART.length);
        return f;
    }

    @Test
    void windowedElectronSubbandMatchesFullForm() {
        Subband windowed = new Subband(1, 2, -0.15, new WindowedWavefunction(PART.clone(), OFFSET, NODES), 6e16, 0.2);
        Subband plain = new Subband(1, 2, -0.15, full(), 6e16, 0.2);
        assertArrayEquals(full(), windowed.wavefunction(), 0.0);
        assertNotSame(windowed.wavefunction(), windowed.wavefunction());
        assertEquals(plain, windowed);
        assertEquals(plain.hashCode(), windowed.hashCode());
        assertEquals(java.util.Arrays.hashCode(full()), new WindowedWavefunction(PART.clone(), OFFSET, NODES).valueHash());
        double[] other = full();
        other[OFFSET + 2] = -0.71;
        assertNotEquals(plain, new Subband(1, 2, -0.15, other, 6e16, 0.2));
        assertNotEquals(plain, new Subband(1, 2, -0.15, new double[NODES + 1], 6e16, 0.2));
        assertThrows(InvalidParameterException.class, () -> new Subband(0, 0, 0, (double[]) null, 0, 0.2));
    }

    @Test
    void windowedHoleSubbandMatchesFullForm() {
        HoleSubband windowed = new HoleSubband(0, ValenceBands.Kind.values()[0], 1, -3.5,
                new WindowedWavefunction(PART.clone(), OFFSET, NODES), 2e17, 1.9);
        HoleSubband plain = new HoleSubband(0, ValenceBands.Kind.values()[0], 1, -3.5, full(), 2e17, 1.9);
        assertArrayEquals(full(), windowed.wavefunction(), 0.0);
        assertEquals(plain, windowed);
        assertEquals(plain.hashCode(), windowed.hashCode());
        assertNotEquals(plain, new HoleSubband(0, ValenceBands.Kind.values()[1], 1, -3.5, full(), 2e17, 1.9));
    }

    @Test
    void windowOutsideTheMeshIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new WindowedWavefunction(PART.clone(), 7, NODES));
    }
}
