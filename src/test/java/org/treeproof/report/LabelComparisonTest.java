package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;

class LabelComparisonTest {

    @Test
    void handWorkedTableAndIndex() {
        // clusters {0,1,2} {3,4,5}; classes a = {0,1}, b = {2,3,4,5}; table [[2,1],[0,3]].
        // Hubert & Arabie (1985), J. Classification 2:193-218, with C(x) = x(x-1)/2 and n = 6:
        // sum C(n_ij) = 1 + 0 + 0 + 3 = 4; rows C(3) + C(3) = 6; columns C(2) + C(4) = 7; C(6) = 15;
        // expected 6 * 7 / 15 = 2.8; maximum (6 + 7) / 2 = 6.5; ARI = (4 - 2.8) / (6.5 - 2.8) = 12 / 37.
        var l = LabelComparison.of(Partition.of(new int[] {0, 0, 0, 1, 1, 1}),
                new String[] {"a", "a", "b", "b", "b", "b"});
        assertEquals(List.of("a", "b"), l.classNames());
        assertArrayEquals(new int[][] {{2, 1}, {0, 3}}, l.table());
        assertEquals(12.0 / 37.0, l.ari(), 1e-15);
        assertEquals(2, l.clusters());
    }

    @Test
    void classesKeepTheOrderOfTheirFirstSampleAndTheirExactNames() {
        String hostile = "<script>alert(1)</script>";
        var l = LabelComparison.of(Partition.of(new int[] {0, 1, 1, 0}),
                new String[] {"\"q\" & 'a'", hostile, hostile, "\"q\" & 'a'"});
        assertEquals(List.of("\"q\" & 'a'", hostile), l.classNames());
        // the classes are the clusters: the same grouping has index 1 whatever the names
        assertEquals(1.0, l.ari(), 0);
        assertArrayEquals(new int[][] {{2, 0}, {0, 2}}, l.table());
    }

    @Test
    void theRecommendedSolutionOfThreeSeparatedGroupsIsTheirTrueGrouping() {
        Studies.Study s = Studies.separated();
        int n = s.evidence().samples();
        String[] truth = new String[n];
        for (int i = 0; i < n; i++) {
            truth[i] = "group " + (char) ('A' + i % 3); // Studies.threeGroups puts sample i in group i % 3
        }
        var l = LabelComparison.of(s.recommendation().clustering(), truth);
        assertEquals(1.0, l.ari(), 0);
        for (int r = 0; r < 3; r++) {
            int[] row = l.table()[r];
            assertEquals(15, java.util.Arrays.stream(row).max().orElseThrow());
            assertEquals(15, java.util.Arrays.stream(row).sum());
        }
        ReportModel m = ReportModel.of(s.evidence(), s.recommendation(), s.run(), l);
        assertEquals(l, m.labelComparison().orElseThrow());
    }

    @Test
    void tablesAreCopiedAndValidated() {
        int[][] t = {{1, 0}, {0, 1}};
        var l = new LabelComparison(List.of("x", "y"), 1.0, t);
        t[0][0] = 9;
        assertEquals(1, l.count(0, 0));
        l.table()[0][0] = 9;
        assertEquals(1, l.count(0, 0));
        assertThrows(IllegalArgumentException.class, () -> new LabelComparison(List.of("x"), 1.0, new int[][] {{1, 0}}));
        assertThrows(IllegalArgumentException.class, () -> new LabelComparison(List.of("x"), Double.NaN, new int[][] {{1}}));
        assertThrows(IllegalArgumentException.class, () -> new LabelComparison(List.of("x"), 1.0, new int[][] {{-1}}));
    }

    @Test
    void labelsMustCoverEverySample() {
        Partition p = Partition.of(new int[] {0, 1, 1});
        assertThrows(IllegalArgumentException.class, () -> LabelComparison.of(p, new String[] {"a", "b"}));
        assertThrows(NullPointerException.class, () -> LabelComparison.of(p, new String[] {"a", null, "b"}));
    }
}
