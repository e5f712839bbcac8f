package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class PoolingTest {

    @Test
    void meanPoolingAveragesEachBlock() {
        // 4 x 4 matrix with value 10*r + c, pooled to 2 x 2: each block mean worked by hand
        double[] m = Pooling.means(4, 4, 2, 2, (r, c) -> 10 * r + c);
        assertArrayEquals(new double[] {5.5, 7.5, 25.5, 27.5}, m, 1e-12);
    }

    @Test
    void upsamplingRepeatsCellsAndNaNIsLeftOut() {
        double[] m = Pooling.means(2, 1, 4, 2, (r, c) -> r == 0 ? 1 : 3);
        assertArrayEquals(new double[] {1, 1, 1, 1, 3, 3, 3, 3}, m, 0);
        double[] withGap = Pooling.means(2, 2, 1, 1, (r, c) -> r == c ? Double.NaN : 4);
        assertEquals(4, withGap[0]);
        assertTrue(Double.isNaN(Pooling.means(1, 1, 1, 1, (r, c) -> Double.NaN)[0]));
    }

    @Test
    void blocksCoverEveryCellOnceWhenShrinking() {
        SplittableRandom rnd = new SplittableRandom(3);
        for (int t = 0; t < 50; t++) {
            int n = 1 + rnd.nextInt(3000);
            int out = 1 + rnd.nextInt(Math.min(n, 700));
            int[] s = Pooling.starts(n, out);
            assertEquals(0, s[0]);
            assertEquals(n, s[out]);
            for (int p = 0; p < out; p++) {
                assertTrue(s[p + 1] > s[p], "empty block " + p + " for n=" + n + " out=" + out);
            }
        }
    }

    @Test
    void sideGivesEqualCellsWhenTheyAreLarge() {
        assertEquals(600, Pooling.side(150, 660));
        assertEquals(660, Pooling.side(300, 660));
        assertEquals(660, Pooling.side(2000, 660));
        assertEquals(660, Pooling.side(3, 660));
    }

    @Test
    void zScoresUseTheSampleStandardDeviationAndKeepGaps() {
        ChartTree samples = ChartTree.leftFirst(5, new int[] {0, 2, 5, 6}, new int[] {1, 3, 4, 7},
                new double[] {1, 1, 2, 3});
        // feature 0: 1, 2, 3, NaN, 4 -> mean 2.5, sum of squares 5, sd sqrt(5/3) (n - 1 = 3)
        // feature 1: constant 7 -> all 0
        double[] v = {1, 7, 2, 7, 3, 7, Double.NaN, 7, 4, 7};
        DataHeatmapInput in = new DataHeatmapInput("t", 5, 2, v, Synthetic.names("s", 5), Synthetic.names("f", 2),
                samples, null, null);
        double[] z = DataHeatmapChart.zScores(in);
        double sd = Math.sqrt(5.0 / 3);
        assertEquals(-1.5 / sd, z[0], 1e-12);
        assertEquals(-0.5 / sd, z[2], 1e-12);
        assertEquals(1.5 / sd, z[8], 1e-12);
        assertTrue(Double.isNaN(z[6]));
        for (int i = 0; i < 5; i++) {
            assertEquals(0.0, z[2 * i + 1]);
        }
    }
}
