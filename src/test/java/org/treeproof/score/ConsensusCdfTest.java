package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.partition.Partition;

/** The consensus CDF, its area and the change in area, by hand and against numpy. */
class ConsensusCdfTest {

    /**
     * Four items, two replicates holding all of them:
     * <pre>
     *   R0  k=2 {0,1}{2,3}    k=3 {0}{1}{2,3}
     *   R1  k=2 {0,1,2}{3}    k=3 {0,1}{2}{3}
     * </pre>
     * k = 2: consensus (0,1) 1, (0,2) (1,2) (2,3) 1/2, (0,3) (1,3) 0, so F(0) = 2/6, F(1/2) = 5/6, F(1) = 1 and the
     * area is (1/2)(1/3) + (1/2)(5/6) = 7/12. k = 3: (0,1) (2,3) 1/2, the rest 0: F(0) = 4/6, F(1/2) = 1, area
     * (1/2)(2/3) + (1/2)(1) = 5/6. ΔA(2) = 7/12, ΔA(3) = (5/6 − 7/12)/(7/12) = 3/7.
     */
    @Test
    void handWorkedMatrix() {
        var acc = ConsensusAccumulator.create(4, 3, 2);
        int[] all = {0, 1, 2, 3};
        acc.addNestedCuts(all, new Partition[] {Partition.of(new int[] {0, 0, 1, 1}), Partition.of(new int[] {0, 1, 2, 2})});
        acc.addNestedCuts(all, new Partition[] {Partition.of(new int[] {0, 0, 0, 1}), Partition.of(new int[] {0, 0, 1, 2})});
        ConsensusMatrix m = acc.finish();
        List<ConsensusCdf> s = ConsensusCdf.series(List.of(m.distribution(2), m.distribution(3)));
        ConsensusCdf k2 = s.get(0);
        assertArrayEquals(new double[] {0, 0.5, 1}, k2.x(), 0);
        assertArrayEquals(new double[] {2.0 / 6, 5.0 / 6, 1}, k2.f(), 1e-15);
        assertEquals(7.0 / 12, k2.area(), 1e-15);
        assertEquals(7.0 / 12, k2.deltaArea(), 1e-15);
        ConsensusCdf k3 = s.get(1);
        assertArrayEquals(new double[] {0, 0.5}, k3.x(), 0);
        assertArrayEquals(new double[] {4.0 / 6, 1}, k3.f(), 1e-15);
        assertEquals(5.0 / 6, k3.area(), 1e-15);
        assertEquals(3.0 / 7, k3.deltaArea(), 1e-15);
        double[][] pts = k2.points(m.distribution(2), ConsensusCdf.OUTPUT_POINTS);
        assertEquals(3, pts.length);
        assertArrayEquals(new double[] {0.5, 5.0 / 6}, pts[1], 1e-15);
    }

    /** Replicates and expected values from {@code reference/consensus/consensus_cdf_numpy.py}. */
    @Test
    void matchesNumpyOnTheCommittedReplicates() throws IOException {
        JsonNode root;
        try (InputStream in = getClass().getResourceAsStream("/reference/consensus/consensus_cdf_numpy.json")) {
            root = new ObjectMapper().readTree(in);
        }
        int n = root.get("n").asInt();
        JsonNode ks = root.get("ks");
        int maxK = ks.get(ks.size() - 1).asInt();
        var acc = ConsensusAccumulator.create(n, maxK, root.get("replicates").size());
        for (JsonNode r : root.get("replicates")) {
            int[] items = MultiscaleFitTest.ints(r.get("items"));
            Partition[] cuts = new Partition[ks.size()];
            for (int t = 0; t < cuts.length; t++) {
                cuts[t] = Partition.of(MultiscaleFitTest.ints(r.get("labels").get(t)));
            }
            acc.add(items, cuts);
        }
        ConsensusMatrix m = acc.finish();
        var dists = new ArrayList<ConsensusDistribution>();
        for (int k = 2; k <= maxK; k++) {
            dists.add(m.distribution(k));
        }
        List<ConsensusCdf> series = ConsensusCdf.series(dists);
        for (JsonNode e : root.get("expected")) {
            int k = e.get("k").asInt();
            ConsensusCdf c = series.get(k - 2);
            assertArrayEquals(MultiscaleFitTest.doubles(e.get("x")), c.x(), 1e-15, "x at k=" + k);
            assertArrayEquals(MultiscaleFitTest.doubles(e.get("f")), c.f(), 1e-15, "F at k=" + k);
            assertEquals(e.get("area").asDouble(), c.area(), 1e-13, "area at k=" + k);
            assertEquals(e.get("oneMinusMean").asDouble(), c.area(), 1e-13, "area = 1 - mean at k=" + k);
            assertEquals(e.get("deltaArea").asDouble(), c.deltaArea(), 1e-12, "deltaArea at k=" + k);
        }
    }

    @Test
    void outputPointsOnAGridAreExactAndEndAtOne() throws IOException {
        // 60 replicates of 2 items each: consensus values j/60 for several j, more than 5 distinct values
        var acc = ConsensusAccumulator.create(8, 2, 60);
        var rng = new java.util.SplittableRandom(3);
        for (int b = 0; b < 60; b++) {
            int[] labels = new int[8];
            for (int i = 0; i < 8; i++) {
                labels[i] = rng.nextInt(2);
            }
            labels[0] = 0;
            labels[1] = 1;
            acc.addNestedCuts(new int[] {0, 1, 2, 3, 4, 5, 6, 7}, new Partition[] {Partition.of(labels)});
        }
        ConsensusDistribution d = acc.finish().distribution(2);
        ConsensusCdf c = ConsensusCdf.of(d);
        assertTrue(c.x().length > 5);
        double[][] pts = c.points(d, 5);
        assertEquals(5, pts.length);
        for (int j = 0; j < 5; j++) {
            assertEquals(j / 4.0, pts[j][0], 0);
            assertEquals(d.shareAtMost(java.math.BigDecimal.valueOf(j / 4.0)), pts[j][1], 0);
            if (j > 0) {
                assertTrue(pts[j][1] >= pts[j - 1][1]);
            }
        }
        assertEquals(1.0, pts[4][1], 0);
    }
}
