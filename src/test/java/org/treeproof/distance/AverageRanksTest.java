package org.treeproof.distance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Average ranks (the {@code scipy.stats.rankdata(method='average')} convention) on seeded random rows
 * with many ties, against the counting definition: rank = 1 + #smaller + (#equal - 1) / 2.
 */
class AverageRanksTest {
    @Test
    void matchTheCountingDefinitionOnRowsWithTies() {
        SplittableRandom rnd = new SplittableRandom(21);
        for (int trial = 0; trial < 300; trial++) {
            int m = 1 + rnd.nextInt(140); // up to several merge passes over 16-element runs
            int distinct = 1 + rnd.nextInt(m + 3);
            double[] row = new double[m];
            for (int k = 0; k < m; k++) {
                row[k] = rnd.nextInt(distinct) - distinct / 2;
                if (row[k] == 0 && rnd.nextBoolean()) {
                    row[k] = -0.0; // equal to 0.0, so it must tie with it
                }
            }
            float[] ranks = new float[m + 3];
            RowSource.Ranks.averageRanks(row, new int[m], new int[m], ranks, 3);
            for (int k = 0; k < m; k++) {
                int less = 0;
                int equal = 0;
                for (double v : row) {
                    less += v < row[k] ? 1 : 0;
                    equal += v == row[k] ? 1 : 0;
                }
                assertEquals(1 + less + (equal - 1) / 2.0, ranks[3 + k], 0.0, "trial " + trial + " position " + k);
            }
        }
    }
}
