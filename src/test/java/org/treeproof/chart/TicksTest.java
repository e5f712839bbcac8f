package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class TicksTest {

    @Test
    void stepsAreOneTwoOrFiveTimesAPowerOfTen() {
        // Heckbert, "Nice numbers for graph labels", Graphics Gems (1990): 1, 2, 5 times a power of ten
        assertEquals(0.2, Ticks.step(0, 1, 6), 1e-12);
        assertEquals(5.0, Ticks.step(0, 37, 8), 1e-12);
        assertEquals(0.05, Ticks.step(0.1, 0.4, 7), 1e-12);
        assertEquals(1000.0, Ticks.step(-2000, 3000, 6), 1e-9);
    }

    @Test
    void ticksLieInsideTheRangeOnTheStepGrid() {
        assertArrayEquals(new double[] {0, 0.2, 0.4, 0.6, 0.8, 1.0}, Ticks.between(0, 1, 6), 1e-12);
        assertArrayEquals(new double[] {-0.2, 0, 0.2, 0.4, 0.6, 0.8, 1.0}, Ticks.between(-0.3, 1, 7), 1e-12);
        assertArrayEquals(new double[] {5}, Ticks.between(5, 5, 6), 0);
    }

    @Test
    void labelsCarryTheDecimalsTheStepNeeds() {
        assertEquals("0.2", Ticks.label(0.2, 0.2));
        assertEquals("15", Ticks.label(15, 5));
        assertEquals("0.05", Ticks.label(0.05, 0.05));
        assertEquals("1.0", Ticks.label(1, 0.5));
    }

    @Test
    void numbersUseATrueMinusAndNoNegativeZero() {
        assertEquals("\u22120.25", Ticks.number(-0.25, 2));
        assertEquals("0.00", Ticks.number(-0.0001, 2));
        assertEquals("0", Ticks.number(-0.2, 0));
        assertEquals("3.14", Ticks.compact(3.14159));
        assertEquals("1.20e\u221205", Ticks.compact(0.000012));
    }
}
