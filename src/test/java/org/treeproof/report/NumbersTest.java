package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class NumbersTest {
    @Test
    void nonFiniteValuesPrintAsADash() {
        for (double v : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY}) {
            assertEquals("–", Numbers.fixed(v, 2));
            assertEquals("–", Numbers.scaled(v));
            assertEquals("–", Numbers.p(v));
            assertEquals("–", Numbers.percent(v));
            assertEquals("–", Numbers.plain(v));
        }
    }

    @Test
    void fixedPrecisionIgnoresTheDefaultLocaleAndDropsTheSignOfZero() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("0.97", Numbers.fixed(0.9712, 2));
            assertEquals("0.00", Numbers.fixed(-0.0001, 2));
            assertEquals("0", Numbers.fixed(-0.2, 0));
            assertEquals("-0.01", Numbers.fixed(-0.0071, 2));
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void scaledValuesKeepFourSignificantDigits() {
        assertEquals("8.612", Numbers.scaled(8.611513982277128));
        assertEquals("13.85", Numbers.scaled(13.847111457103635));
        assertEquals("377.3", Numbers.scaled(377.31));
        assertEquals("1234", Numbers.scaled(1234.4));
        assertEquals("0.01230", Numbers.scaled(0.0123));
        assertEquals("1.235e+04", Numbers.scaled(12345.6));
        assertEquals("1.000e-04", Numbers.scaled(0.0001));
        assertEquals("0", Numbers.scaled(0));
    }

    @Test
    void settingsPrintAsTyped() {
        assertEquals("0.8", Numbers.plain(0.8));
        assertEquals("1", Numbers.plain(1.0));
        assertEquals("100", Numbers.plain(100.0));
        assertEquals("0.05", Numbers.plain(0.05));
        assertEquals("75%", Numbers.percent(0.75));
        // a share strictly between 0 and 1 never reads as none or all: 199 of 200 replicates is not "100%"
        assertEquals("1%", Numbers.percent(1 / 200.0));
        assertEquals("0.2%", Numbers.percent(1 / 500.0));
        assertEquals("99.5%", Numbers.percent(199 / 200.0));
        assertEquals("<0.1%", Numbers.percent(1 / 5000.0));
        assertEquals(">99.9%", Numbers.percent(4999 / 5000.0));
        assertEquals("100%", Numbers.percent(1));
        assertEquals("0%", Numbers.percent(0));
        assertEquals("1%", Numbers.percent(0.006));
        assertEquals("12.3 s", Numbers.seconds(12.34));
    }
}
