// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.junit.jupiter.api.Test;

/**
 * The short number text of every toString: six significant digits, no locale, no binary noise.
 * Reference: java.math.BigDecimal, a general-purpose decimal library independent of the code under
 * test: the value's shortest decimal form (BigDecimal.valueOf) rounded half-up to six significant
 * digits.
 */
class DecimalsTest {
    @Test
    void binaryNoiseIsGone() {
        assertEquals("0.3", Decimals.format(0.1 + 0.2)); // 0.30000000000000004
        assertEquals("-0.3", Decimals.format(-(0.1 + 0.2)));
        assertEquals("0.7", Decimals.format(0.7000000000000001));
    }

    @Test
    void shapes() {
        assertEquals("0", Decimals.format(0.0));
        assertEquals("0", Decimals.format(-0.0));
        assertEquals("70", Decimals.format(70.00000000000001));
        assertEquals("1800", Decimals.format(1800));
        assertEquals("-1.09263e13", Decimals.format(-1.0926261e13));
        assertEquals("-0.0175056", Decimals.format(-0.01750560397452727));
        assertEquals("2.5e-5", Decimals.format(2.5e-5));
        assertEquals("0.0001", Decimals.format(1e-4));
        assertEquals("999999", Decimals.format(999999));
        assertEquals("1e6", Decimals.format(1e6));
        assertEquals("1e6", Decimals.format(999999.7));
        assertEquals("NaN", Decimals.format(Double.NaN));
        assertEquals("-Infinity", Decimals.format(Double.NEGATIVE_INFINITY));
        assertEquals("0.3 V", Decimals.format(0.30000000000000004, "V"));
        assertEquals("12", Decimals.format(12, ""));
    }

    @Test
    void independentOfTheDefaultLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY); // decimal comma
            assertEquals("1.5 eV", Decimals.format(1.5, "eV"));
            assertEquals("-1.09263e13", Decimals.format(-1.0926261e13));
        } finally {
            Locale.setDefault(before);
        }
    }

    /** The text reads back to the value rounded to six significant digits, and is no longer than needed. */
    @Property(tries = 2000)
    void readsBackToSixSignificantDigits(@ForAll double v) {
        if (!Double.isFinite(v) || v == 0) {
            return;
        }
        String s = Decimals.format(v);
        BigDecimal six = BigDecimal.valueOf(v).round(new MathContext(6, RoundingMode.HALF_UP));
        assertEquals(0, new BigDecimal(s).compareTo(six), () -> v + " -> " + s + ", expected " + six);
        String mantissa = s.contains("e") ? s.substring(0, s.indexOf('e')) : s;
        if (mantissa.contains(".")) {
            assertFalse(mantissa.endsWith("0"), s);
        }
        assertFalse(s.contains("+"), s);
        assertFalse(s.contains(","), s);
    }
}
