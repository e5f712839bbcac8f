package org.treeproof.partition;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class ContingencyTableTest {

    @Test
    void handCountedTable() {
        // hand count: rows {0,1,2,3}{4,5,6}{7,8,9}; columns {0,1,2,7}{3,4,5}{6,8,9}
        Partition a = Partition.of(new int[] {0, 0, 0, 0, 1, 1, 1, 2, 2, 2});
        Partition b = Partition.of(new int[] {0, 0, 0, 1, 1, 1, 2, 0, 2, 2});
        ContingencyTable t = ContingencyTable.of(a, b);
        assertArrayEquals(new int[][] {{3, 1, 0}, {0, 2, 1}, {1, 0, 2}}, t.toArray());
        assertEquals(10, t.total());
        assertEquals(4, t.rowSum(0));
        assertEquals(3, t.columnSum(2));
        assertEquals(6, t.nonZeroCells());
        assertEquals(0, t.count(1, 0));
        assertEquals(2, t.count(2, 2));
        // non-zero cells in row-major order: (0,0)=3, (0,1)=1, (1,1)=2, (1,2)=1, (2,0)=1, (2,2)=2
        assertEquals(1, t.cellRow(2));
        assertEquals(1, t.cellColumn(2));
        assertEquals(2, t.cellCount(2));
        assertEquals(2, t.cellRow(4));
        assertEquals(0, t.cellColumn(4));
    }

    @Test
    void sparseAndDenseCountingAgree() {
        // invariant: with more clusters than the dense limit allows, the sparse table has the same cells
        SplittableRandom rnd = new SplittableRandom(11);
        int n = 4000;
        int[] la = new int[n];
        int[] lb = new int[n];
        for (int i = 0; i < n; i++) {
            la[i] = rnd.nextInt(2000);
            lb[i] = rnd.nextBoolean() ? la[i] : rnd.nextInt(2000);
        }
        Partition a = Partition.of(la);
        Partition b = Partition.of(lb);
        ContingencyTable t = ContingencyTable.of(a, b);
        int[] rowSums = new int[a.clusterCount()];
        long cellsChecked = 0;
        for (int c = 0; c < t.nonZeroCells(); c++) {
            rowSums[t.cellRow(c)] += t.cellCount(c);
            cellsChecked += t.cellCount(c);
        }
        assertEquals(n, cellsChecked);
        assertArrayEquals(a.clusterSizes(), rowSums);
        for (int i = 0; i < 200; i++) {
            int r = a.label(i);
            int col = b.label(i);
            int expected = 0;
            for (int j = 0; j < n; j++) {
                if (a.label(j) == r && b.label(j) == col) {
                    expected++;
                }
            }
            assertEquals(expected, t.count(r, col));
        }
    }

    @Test
    void refusesPartitionsOfDifferentItems() {
        assertThrows(IllegalArgumentException.class,
                () -> ContingencyTable.of(Partition.of(new int[] {0, 1}), Partition.of(new int[] {0, 0, 1})));
    }
}
