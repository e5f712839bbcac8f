package org.treeproof.partition;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** {@link Clustering#nesting}, worked by hand. */
class ClusteringNestingTest {
    private static final int O = Clustering.OUTLIER;

    @Test
    void aRefinementNestsFully() {
        // coarse {0,1,2,3} {4,5}; fine {0,1} {2,3} {4,5}: every fine cluster lies in one coarse cluster
        Clustering coarse = new Clustering(new int[] {0, 0, 0, 0, 1, 1}, 2);
        Clustering fine = new Clustering(new int[] {0, 0, 1, 1, 2, 2}, 3);
        assertEquals(1.0, coarse.nesting(fine));
        assertEquals(1.0, fine.nesting(coarse));
    }

    @Test
    void aCrossingClusterCountsOnlyItsMajority() {
        // coarse {0,1,2} {3,4,5}; fine {0,1} {2,3,4} {5}... with 3 clusters: fine cluster 1 = {2,3,4} has 1 in coarse
        // 0 and 2 in coarse 1, so 2 of its 3 count; clusters {0,1} and {5} count fully: (2 + 2 + 1) / 6 = 5/6
        Clustering coarse = new Clustering(new int[] {0, 0, 0, 1, 1, 1}, 2);
        Clustering fine = new Clustering(new int[] {0, 0, 1, 1, 1, 2}, 3);
        assertEquals(5.0 / 6, coarse.nesting(fine), 1e-15);
    }

    @Test
    void outliersInEitherAreLeftOut() {
        // item 2 is an outlier of the fine clustering, item 5 of the coarse: over items 0, 1, 3, 4 fine {0,1} {3,4}
        // nests in coarse {0,1,(2)} {3,4}
        Clustering coarse = new Clustering(new int[] {0, 0, 0, 1, 1, O}, 2);
        Clustering fine = new Clustering(new int[] {0, 0, O, 1, 1, 2}, 3);
        assertEquals(1.0, fine.nesting(coarse));
        Clustering none = new Clustering(new int[] {O, O, O, O, O, O}, 0);
        assertTrue(Double.isNaN(none.nesting(coarse)));
        assertThrows(IllegalArgumentException.class, () -> coarse.nesting(new Clustering(new int[] {0, 0}, 1)));
    }
}
