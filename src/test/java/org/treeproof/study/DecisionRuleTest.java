package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.tree.Linkage;

/**
 * The decision rule on hand-built facts: each condition at its boundary, and the ordering. The thresholds are
 * written out here as their sources give them (alpha 0.05 by convention; Hennig 2007's bands are the Jaccard
 * statuses, so the facts carry the statuses), not read from the rule's constants.
 */
class DecisionRuleTest {
    private static final DecisionRule RULE = DecisionRule.DEFAULT;

    private static Assessment.Facts calibrated(int k, double excess, double p, boolean allStable, boolean whole) {
        return new Assessment.Facts(Linkage.AVERAGE, k, 0, 0.9, allStable ? 0.9 : whole ? 0.6 : 0.3,
                whole, allStable || !whole ? 0 : 1, 0.1, 0.05, true, excess, p, 0.8, 0.001);
    }

    private static Assessment.Facts uncalibrated(double ari, boolean allStable, double silhouette) {
        return new Assessment.Facts(Linkage.AVERAGE, 2, 0, ari, allStable ? 0.9 : 0.6, true, allStable ? 0 : 1, silhouette,
                silhouette, false, Double.NaN, Double.NaN, 0.8, 0.001);
    }

    @Test
    void beatingTheNullWithEveryClusterStableIsSupported() {
        Assessment a = RULE.assess(calibrated(3, 8.0, 0.05, true, true));
        assertEquals(Verdict.SUPPORTED, a.verdict());
        assertEquals(List.of(Condition.BEATS_NULL, Condition.NO_CLUSTER_DISSOLVES, Condition.EVERY_CLUSTER_COHESIVE,
                Condition.EVERY_CLUSTER_SEPARATED, Condition.AT_MOST_ONE_DOUBTFUL, Condition.EVERY_CLUSTER_STABLE),
                a.met());
        assertTrue(a.failed().isEmpty());
    }

    private static Assessment.Facts withSeparation(boolean calibrated, double separationP) {
        return new Assessment.Facts(Linkage.WARD, 3, 0, 0.95, 0.9, true, 0, 0.6, 0.5, calibrated,
                calibrated ? 12 : Double.NaN, calibrated ? 0.01 : Double.NaN, 0.8, separationP);
    }

    @Test
    void piecesWithoutADipBetweenThemAreNoClustersWhateverTheirStability() {
        // boundary of EVERY_CLUSTER_SEPARATED at alpha = 0.05, inclusive like the null's p-value: a stable solution
        // that beats the null is supported at p = 0.05 and unsupported just above it (a chain cut into pieces)
        assertEquals(Verdict.SUPPORTED, RULE.assess(withSeparation(true, 0.05)).verdict());
        Assessment chain = RULE.assess(withSeparation(true, 0.0501));
        assertEquals(Verdict.UNSUPPORTED, chain.verdict());
        assertEquals(List.of(Condition.EVERY_CLUSTER_SEPARATED), chain.failed());
        // without null data it is needed for tentative too
        assertEquals(Verdict.TENTATIVE, RULE.assess(withSeparation(false, 0.01)).verdict());
        assertEquals(Verdict.UNSUPPORTED, RULE.assess(withSeparation(false, 0.5)).verdict());
        // not assessed (only distances given): neither met nor failed, and it decides nothing
        Assessment unknown = RULE.assess(withSeparation(true, Double.NaN));
        assertEquals(Verdict.SUPPORTED, unknown.verdict());
        assertFalse(unknown.met().contains(Condition.EVERY_CLUSTER_SEPARATED));
        assertTrue(unknown.failed().isEmpty());
    }

    @Test
    void theAdjustedPValueIsComparedInclusivelyWithAlpha() {
        assertEquals(Verdict.SUPPORTED, RULE.assess(calibrated(2, 5, 0.05, true, true)).verdict());
        Assessment above = RULE.assess(calibrated(2, 5, 0.1, true, true));
        assertEquals(Verdict.UNSUPPORTED, above.verdict());
        assertEquals(List.of(Condition.BEATS_NULL), above.failed());
    }

    @Test
    void aDoubtfulClusterMakesItTentativeAndADissolvedOneUnsupported() {
        Assessment doubtful = RULE.assess(calibrated(3, 8, 0.05, false, true));
        assertEquals(Verdict.TENTATIVE, doubtful.verdict());
        assertEquals(List.of(Condition.EVERY_CLUSTER_STABLE), doubtful.failed());
        Assessment dissolved = RULE.assess(calibrated(3, 8, 0.05, false, false));
        assertEquals(Verdict.UNSUPPORTED, dissolved.verdict());
        assertEquals(List.of(Condition.NO_CLUSTER_DISSOLVES, Condition.EVERY_CLUSTER_STABLE), dissolved.failed());
    }

    @Test
    void oneDoubtfulClusterIsTentativeTwoAreUnsupported() {
        // boundary of AT_MOST_ONE_DOUBTFUL: 1 doubtful beside stable ones passes, 2 fail, whatever the excess
        var one = new Assessment.Facts(Linkage.WARD, 5, 0, 0.8, 0.6, true, 1, 0.3, 0.1, true, 9, 0.05, 0.7, 0.001);
        var two = new Assessment.Facts(Linkage.WARD, 5, 0, 0.8, 0.6, true, 2, 0.3, 0.1, true, 9, 0.05, 0.7, 0.001);
        assertEquals(Verdict.TENTATIVE, RULE.assess(one).verdict());
        Assessment a = RULE.assess(two);
        assertEquals(Verdict.UNSUPPORTED, a.verdict());
        assertEquals(List.of(Condition.AT_MOST_ONE_DOUBTFUL, Condition.EVERY_CLUSTER_STABLE), a.failed());
    }

    @Test
    void aClusterWhoseMembersLieCloserToAnotherClusterIsNoCluster() {
        // Rousseeuw (1987): a negative width means closer to a neighbouring cluster; a cluster whose members are so
        // on average (0 included: as close to the neighbour as to each other) fails, whatever its stability
        Assessment scattered = RULE.assess(new Assessment.Facts(Linkage.COMPLETE, 4, 3, 0.9, 0.9, true, 0, 0.35,
                0.0, true, 8, 0.05, 0.8, 0.001));
        assertEquals(Verdict.UNSUPPORTED, scattered.verdict());
        assertEquals(List.of(Condition.EVERY_CLUSTER_COHESIVE), scattered.failed());
        Assessment barely = RULE.assess(new Assessment.Facts(Linkage.COMPLETE, 4, 3, 0.9, 0.9, true, 0, 0.35,
                1e-9, true, 8, 0.05, 0.8, 0.001));
        assertEquals(Verdict.SUPPORTED, barely.verdict());
        Assessment noWidths = RULE.assess(new Assessment.Facts(Linkage.COMPLETE, 2, 0, 0.9, 0.9, true, 0,
                Double.NaN, Double.NaN, true, 8, 0.05, 0.8, 0.001));
        assertEquals(Verdict.SUPPORTED, noWidths.verdict(), "no widths (clusters of one sample) do not fail it");
        Assessment withoutNull = RULE.assess(new Assessment.Facts(Linkage.COMPLETE, 2, 0, 0.9, 0.9, true, 0, 0.6,
                -0.1, false, Double.NaN, Double.NaN, 0.8, 0.001));
        assertEquals(Verdict.UNSUPPORTED, withoutNull.verdict());
    }

    @Test
    void noSilhouetteBandGatesACalibratedVerdict() {
        // a silhouette of 0.02, as in wide data, does not stop a solution that beats the null with stable clusters
        var f = new Assessment.Facts(Linkage.WARD, 3, 0, 1.0, 1.0, true, 0, 0.02, 0.01, true, 30, 0.05, 0.5, 0.001);
        assertEquals(Verdict.SUPPORTED, RULE.assess(f).verdict());
    }

    @Test
    void withoutNullDataTheBestIsTentativeAndNeedsStabilityAndSeparation() {
        assertEquals(Verdict.TENTATIVE, RULE.assess(uncalibrated(0.75, true, 0.51)).verdict());
        assertEquals(Verdict.UNSUPPORTED, RULE.assess(uncalibrated(0.74, true, 0.9)).verdict());
        assertEquals(Verdict.UNSUPPORTED, RULE.assess(uncalibrated(0.9, false, 0.9)).verdict());
        // Kaufman and Rousseeuw: above 0.50 is a reasonable structure; 0.50 itself is not above it
        Assessment at = RULE.assess(uncalibrated(0.9, true, 0.5));
        assertEquals(Verdict.UNSUPPORTED, at.verdict());
        assertEquals(List.of(Condition.SEPARATED_WITHOUT_NULL), at.failed());
    }

    @Test
    void theOrderPrefersTheVerdictThenTheExcessThenTheSmallestJaccard() {
        var list = new ArrayList<Assessment>();
        list.add(RULE.assess(calibrated(2, 20, 0.05, false, true)));   // tentative, large excess
        list.add(RULE.assess(calibrated(3, 9, 0.05, true, true)));     // supported
        list.add(RULE.assess(calibrated(4, 12, 0.05, true, true)));    // supported, larger excess
        list.add(RULE.assess(calibrated(5, 40, 0.5, true, true)));     // unsupported
        list.sort(RULE.order());
        assertEquals(List.of(4, 3, 2, 5), list.stream().map(Assessment::k).toList());
    }

    @Test
    void tiesKeepTheEarlierSolution() {
        var list = new ArrayList<Assessment>();
        list.add(RULE.assess(calibrated(2, 9, 0.05, true, true)));
        list.add(RULE.assess(calibrated(3, 9, 0.05, true, true)));
        list.sort(RULE.order());
        assertEquals(2, list.get(0).k());
    }
}
