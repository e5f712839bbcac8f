package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The memory message's parts add up to its total, in MiB and in GiB. */
class MemoryEstimateMessageTest {
    private static final Pattern FIGURES = Pattern.compile("needs about ([0-9.]+) (MiB|GiB) of memory \\(([0-9.]+) \\2 "
            + "for the data, distances and consensus counters, ([0-9.]+) \\2 more during [a-z ]+, ([0-9.]+) \\2 of "
            + "headroom for Java itself\\)");

    @ParameterizedTest
    @CsvSource({"123456789,98765432", "3000000000,1234567890", "1,1", "1073741824,5"})
    void thePartsAddUpToTheTotal(long persistent, long peak) {
        var e = assertThrows(NotEnoughMemoryException.class,
                () -> new MemoryEstimate(persistent, peak, "stability replicates").requireFits(1, 100));
        Matcher m = FIGURES.matcher(e.getMessage());
        assertEquals(true, m.find(), e.getMessage());
        // in tenths, to compare decimals exactly
        long total = tenths(m.group(1));
        assertEquals(total, tenths(m.group(3)) + tenths(m.group(4)) + tenths(m.group(5)), e.getMessage());
    }

    private static long tenths(String s) {
        return Math.round(Double.parseDouble(s) * 10);
    }
}
