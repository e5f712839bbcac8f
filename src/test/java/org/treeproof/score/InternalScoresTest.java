package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/** Silhouette, Calinski-Harabasz, Davies-Bouldin, Dunn and W_k against outside references. */
class InternalScoresTest {
    private static final JsonNode FIXTURE = Fixtures.read("internal_scores.json");

    private static DataMatrix matrix(JsonNode set) {
        int n = set.get("samples").intValue();
        int p = set.get("features").intValue();
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        List<String> features = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            features.add("f" + j);
        }
        return new DataMatrix(ids, features, Fixtures.doubles(set.get("data")));
    }

    @Test
    void matchScikitLearnAndNumpyOnIrisCutsAndEdgeCases() {
        // references: scikit-learn 1.2.1 silhouette_samples/silhouette_score (precomputed scipy pdist
        // distances), calinski_harabasz_score, davies_bouldin_score; Dunn and Tibshirani's W_k from the
        // independent numpy code in internal_scores.py; Iris (Fisher 1936) via sklearn load_iris, cut
        // with scipy average and ward linkage
        int checked = 0;
        for (JsonNode set : FIXTURE.get("datasets")) {
            DataMatrix data = matrix(set);
            CondensedDistances d = CondensedDistances.of(data.samples(), Fixtures.doubles(set.get("condensed")));
            for (JsonNode part : set.get("partitions")) {
                String name = part.get("name").asText();
                Partition p = Partition.of(Fixtures.ints(part.get("labels")));
                assertEquals(part.get("k").intValue(), p.clusterCount(), name);

                Silhouette.Result s = Silhouette.of(d, p).compute();
                assertArrayEquals(Fixtures.doubles(part.get("silhouetteSamples")), s.values(), 1e-12, name);
                assertEquals(part.get("silhouette").doubleValue(), s.mean(), 1e-12, name);
                Silhouette.Result rowByRow = Silhouette.of(d, p, 0).compute();
                assertArrayEquals(s.values(), rowByRow.values(), 1e-12, name);

                double ch = part.get("calinskiHarabasz").doubleValue();
                assertEquals(ch, CalinskiHarabasz.of(data, p).compute().value(), 1e-10 * ch, name);
                double db = part.get("daviesBouldin").doubleValue();
                assertEquals(db, DaviesBouldin.of(data, p).compute().value(), 1e-10 * db, name);

                DunnIndex.Result dunn = DunnIndex.of(d, p).compute();
                assertEquals(part.get("dunn").doubleValue(), dunn.value(), 1e-12, name);
                assertEquals(part.get("dunnSeparation").doubleValue(), dunn.separation(), 1e-12, name);
                assertEquals(part.get("dunnDiameter").doubleValue(), dunn.diameter(), 1e-12, name);

                double w = part.get("pooledW").doubleValue();
                WithinClusterSumOfSquares.Result wk = WithinClusterSumOfSquares.of(data, p).compute();
                assertEquals(w, wk.total(), 1e-10 * w, name);
                double sum = 0;
                for (double v : wk.perCluster()) {
                    sum += v;
                }
                assertEquals(wk.total(), sum, 1e-10 * w, name);
                // Calinski-Harabasz's W is the same pooled sum (both are squared deviations from centroids)
                assertEquals(wk.total(), CalinskiHarabasz.of(data, p).compute().within(), 1e-10 * w, name);
                checked++;
            }
        }
        assertEquals(13, checked);
    }

    @Test
    void silhouetteByHand() {
        // Rousseeuw (1987) definition on points 0, 1, 5 with clusters {0, 1}, {5}:
        // s(0): a = 1, b = 5 -> (5 - 1)/5 = 0.8; s(1): a = 1, b = 4 -> 3/4; s(5) = 0 (singleton)
        // mean = (0.8 + 0.75 + 0)/3
        CondensedDistances d = CondensedDistances.of(3, new double[] {1, 5, 4});
        Silhouette.Result s = Silhouette.of(d, Partition.of(new int[] {0, 0, 1})).compute();
        assertArrayEquals(new double[] {0.8, 0.75, 0.0}, s.values(), 1e-15);
        assertEquals(1.55 / 3, s.mean(), 1e-15);
        assertTrue(s.defined());
    }

    @Test
    void oneClusterIsUndefined() {
        // convention (scikit-learn refuses k = 1): NaN for every index that needs two clusters
        CondensedDistances d = CondensedDistances.of(3, new double[] {1, 5, 4});
        Partition one = Partition.of(new int[] {0, 0, 0});
        Silhouette.Result s = Silhouette.of(d, one).compute();
        assertFalse(s.defined());
        assertTrue(Double.isNaN(s.value(0)) && Double.isNaN(s.mean()));
        assertTrue(Double.isNaN(DunnIndex.of(d, one).compute().value()));
        DataMatrix x = new DataMatrix(List.of("a", "b", "c"), List.of("f"), new double[] {0, 1, 5});
        assertTrue(Double.isNaN(CalinskiHarabasz.of(x, one).compute().value()));
        assertTrue(Double.isNaN(DaviesBouldin.of(x, one).compute().value()));
        // W_k of one cluster is the total sum of squares: mean 2, deviations 4 + 1 + 9
        assertEquals(14.0, WithinClusterSumOfSquares.of(x, one).compute().total(), 1e-12);
    }

    @Test
    void degenerateConventions() {
        // one sample per cluster: silhouette 0 everywhere (singleton rule), Dunn +Infinity (zero
        // diameter), Calinski-Harabasz 1.0 and Davies-Bouldin 0.0 as scikit-learn 1.2.1 returns them
        CondensedDistances d = CondensedDistances.of(3, new double[] {1, 5, 4});
        Partition singles = Partition.of(new int[] {0, 1, 2});
        assertArrayEquals(new double[] {0, 0, 0}, Silhouette.of(d, singles).compute().values());
        assertEquals(Double.POSITIVE_INFINITY, DunnIndex.of(d, singles).compute().value());
        DataMatrix x = new DataMatrix(List.of("a", "b", "c"), List.of("f"), new double[] {0, 1, 5});
        assertEquals(1.0, CalinskiHarabasz.of(x, singles).compute().value());
        assertEquals(0.0, DaviesBouldin.of(x, singles).compute().value());
        // duplicates in different clusters and no spread: separation 0 over diameter 0 is undefined
        CondensedDistances zeros = CondensedDistances.of(3, new double[] {0, 0, 0});
        assertTrue(Double.isNaN(DunnIndex.of(zeros, singles).compute().value()));
    }

    @Test
    void refusesMismatchesAndMissingValues() {
        CondensedDistances d = CondensedDistances.of(3, new double[] {1, 5, 4});
        Partition two = Partition.of(new int[] {0, 1});
        assertThrows(IllegalArgumentException.class, () -> Silhouette.of(d, two));
        assertThrows(IllegalArgumentException.class, () -> DunnIndex.of(d, two));
        DataMatrix x = new DataMatrix(List.of("a", "b", "c"), List.of("f", "g"),
                new double[] {0, 1, Double.NaN, 2, 3, 4});
        Partition p = Partition.of(new int[] {0, 0, 1});
        assertThrows(IllegalArgumentException.class, () -> CalinskiHarabasz.of(x, p).compute());
        assertThrows(IllegalArgumentException.class, () -> DaviesBouldin.of(x, p).compute());
        assertThrows(IllegalArgumentException.class, () -> WithinClusterSumOfSquares.of(x, two).compute());
    }
}
