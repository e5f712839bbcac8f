package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.treeproof.tree.TreeFixtures.assertRelative;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.OwnedDistances;

/**
 * Every linkage against scipy 1.10.1 (scipy.cluster.hierarchy linkage, cophenet, fcluster, leaves_list),
 * with values written by reference/tree/make_tree_reference.py:
 * <ul>
 * <li>Fisher's Iris data (R. A. Fisher, "The use of multiple measurements in taxonomic problems", Annals
 * of Eugenics 7 (1936) 179-188, doi:10.1111/j.1469-1809.1936.tb02137.x; the copy in scikit-learn 1.2.1),
 * raw and z-scored with the population SD (iris_linkage.json);</li>
 * <li>the hand-worked line and triangle, 30 seeded Gaussian points and 40 points on a 4 × 4 integer grid,
 * full of duplicates and tied distances (small_linkage.json).</li>
 * </ul>
 * Both sides cluster bit-identical distances (the script checks its loop against pdist).
 */
class ScipyReferenceTest {
    private static final JsonNode IRIS = TreeFixtures.json("/reference/tree/iris_linkage.json");
    private static final JsonNode SMALL = TreeFixtures.json("/reference/tree/small_linkage.json");
    /** The tolerance the heights must meet; they are in fact equal bit for bit (same arithmetic as scipy). */
    private static final double REL = 1e-12;

    static List<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        for (String v : List.of("raw", "zscore")) {
            for (Linkage l : Linkage.values()) {
                out.add(Arguments.of("iris-" + v, l));
            }
        }
        for (Iterator<String> it = SMALL.get("sets").fieldNames(); it.hasNext(); ) {
            String set = it.next();
            for (Linkage l : Linkage.values()) {
                out.add(Arguments.of(set, l));
            }
        }
        return out;
    }

    private static JsonNode set(String name) {
        return name.startsWith("iris-") ? IRIS.get("variants").get(name.substring(5)) : SMALL.get("sets").get(name);
    }

    private static CondensedDistances distances(String name) {
        JsonNode points = set(name).get("points");
        return TreeFixtures.euclidean(points == null ? TreeFixtures.iris() : TreeFixtures.matrix(points));
    }

    private static JsonNode reference(String name, Linkage l) {
        return set(name).get("linkages").get(l.id());
    }

    @ParameterizedTest(name = "{1} on {0}")
    @MethodSource("cases")
    void mergesHeightsAndLeafOrderMatchScipy(String name, Linkage linkage) {
        JsonNode ref = reference(name, linkage);
        MergeTree tree = linkage.cluster(distances(name));
        JsonNode merges = ref.get("merges");
        TreeFixtures.assertSameMerges(merges, tree, linkage.id());
        for (int s = 0; s < tree.merges(); s++) {
            double expected = merges.get(s).get(2).doubleValue();
            assertRelative(expected, tree.height(s), REL, "height of merge " + s);
            assertEquals(expected, tree.height(s), "bitwise height of merge " + s);
        }
        assertArrayEquals(TreeFixtures.ints(ref.get("leafOrder")), tree.leafOrder(), "leaves_list");
        if (linkage.monotone()) {
            assertTrue(tree.monotone());
        }
    }

    @ParameterizedTest(name = "{1} on {0}")
    @MethodSource("cases")
    void copheneticDistancesMatchScipy(String name, Linkage linkage) {
        JsonNode ref = reference(name, linkage);
        CondensedDistances d = distances(name);
        MergeTree tree = linkage.cluster(d);
        if (!ref.get("copheneticCorrelation").isNull()) {
            assertRelative(ref.get("copheneticCorrelation").doubleValue(), tree.copheneticCorrelation(d), REL,
                    "cophenetic correlation");
        }
        if (ref.has("cophenetic")) {
            double[] c = tree.copheneticCondensed();
            JsonNode expected = ref.get("cophenetic");
            assertEquals(expected.size(), c.length);
            for (int t = 0; t < c.length; t++) {
                assertEquals(expected.get(t).doubleValue(), c[t], "cophenetic distance at " + t);
            }
        }
    }

    /**
     * The linkage working in place on a matrix its owner gives up, and the cophenetic correlation read in two
     * separate passes (as the tree command does): the same merges, heights and coefficient, bit for bit.
     */
    @ParameterizedTest(name = "{1} on {0}")
    @MethodSource("cases")
    void inPlaceClusteringAndTwoPassCopheneticCorrelationKeepEveryBit(String name, Linkage linkage) {
        CondensedDistances d = distances(name);
        MergeTree onCopy = linkage.cluster(d);
        OwnedDistances owned = OwnedDistances.copyOf(d);
        double mean = MergeTree.meanDistance(owned);
        MergeTree inPlace = linkage.clusterInPlace(owned);
        assertTrue(owned.taken(), "the matrix was given up");
        assertEquals(onCopy, inPlace);
        TreeFixtures.assertSameMerges(reference(name, linkage).get("merges"), inPlace, linkage.id());
        assertEquals(Double.doubleToRawLongBits(onCopy.copheneticCorrelation(d)),
                Double.doubleToRawLongBits(inPlace.copheneticCorrelation(mean, d)), "cophenetic correlation bits");
    }

    @ParameterizedTest(name = "{1} on {0}")
    @MethodSource("cases")
    void cutsAtKMatchScipy(String name, Linkage linkage) {
        JsonNode ref = reference(name, linkage);
        MergeTree tree = linkage.cluster(distances(name));
        for (JsonNode c : ref.get("kCuts")) {
            int k = c.get("k").intValue();
            KCut cut = tree.cutAtK(k);
            assertEquals(k, cut.partition().clusterCount());
            boolean tie = c.get("tie").booleanValue();
            if (linkage.monotone()) {
                // scipy's heights of merges n-k-1 and n-k
                assertRelative(c.get("low").doubleValue(), cut.low(), REL, "low at k = " + k);
                assertRelative(c.get("high").doubleValue(), cut.high(), REL, "high at k = " + k);
                assertEquals(tie, cut.tieDependent(), "tie at k = " + k);
            }
            // the first n-k rows of scipy's merges, replayed by the script
            assertEquals(TreeFixtures.partition(c.get("state")), cut.partition(), "state at k = " + k);
            if (c.has("maxclust")) {
                // scipy's own k-cut (fcluster maxclust), written only where no heights tie at the cut
                assertFalse(tie);
                assertEquals(TreeFixtures.partition(c.get("maxclust")), cut.partition(), "maxclust k = " + k);
                assertTrue(cut.reproducibleByHeight());
                assertEquals(cut.partition(), tree.cutAtHeight(cut.chosen()), "chosen height reproduces k = " + k);
            }
        }
    }

    @ParameterizedTest(name = "{1} on {0}")
    @MethodSource("cases")
    void cutsAtHeightMatchFclusterDistance(String name, Linkage linkage) {
        JsonNode ref = reference(name, linkage);
        MergeTree tree = linkage.cluster(distances(name));
        // thresholds: 0, each merge height n-k exactly (the "at or below" edge) and the midpoints below them
        for (JsonNode c : ref.get("heightCuts")) {
            double h = c.get("height").doubleValue();
            assertEquals(TreeFixtures.partition(c.get("labels")), tree.cutAtHeight(h), "fcluster distance at " + h);
        }
    }
}
