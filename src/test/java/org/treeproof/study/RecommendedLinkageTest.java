package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.treeproof.tree.Linkage;

/**
 * Which linkage's choice is recommended (item 3 of {@link DecisionRule}), on facts built by hand: the best solution
 * in the rule's order names the verdict; when it is supported, the finest supported level over every linkage is
 * recommended. The case is the lopsided groups of suite draw 5 (400, 40 and 12 samples) as measured: Ward's best is
 * k = 2 (the 12 inside the 400) with excess 18.4, average linkage's k = 3 (the three planted groups, every cluster
 * stable) with excess 6.7.
 */
class RecommendedLinkageTest {
    private static final DecisionRule RULE = DecisionRule.DEFAULT;

    private static Assessment supported(Linkage linkage, int k, double excess) {
        return RULE.assess(new Assessment.Facts(linkage, k, 0, 0.96, 0.95, true, 0, 0.5, 0.3, true, excess, 0.05,
                0.8, 0.001));
    }

    private static Assessment tentative(Linkage linkage, int k, double excess) {
        return RULE.assess(new Assessment.Facts(linkage, k, 0, 0.8, 0.6, true, 1, 0.3, 0.1, true, excess, 0.05,
                0.8, 0.001));
    }

    @Test
    void theFinestSupportedLevelOfAnyLinkageIsRecommended() {
        Assessment ward2 = supported(Linkage.WARD, 2, 18.4);
        Assessment average3 = supported(Linkage.AVERAGE, 3, 6.7);
        assertEquals(Verdict.SUPPORTED, ward2.verdict());
        Assessment[] best = {average3, null, ward2};
        // Ward's best comes first in the order (larger excess), but average linkage's level is finer
        assertTrue(RULE.order().compare(ward2, average3) < 0);
        assertEquals(0, Recommender.recommendedLinkage(best, best, RULE.order()));
    }

    @Test
    void aLinkageIsJudgedByItsFinestLevelNotItsBestSolution() {
        // Ward's best is k = 2 but its finest supported level is k = 4; average's best and finest is k = 3
        Assessment[] best = {supported(Linkage.AVERAGE, 3, 6.7), null, supported(Linkage.WARD, 2, 18.4)};
        Assessment[] choice = {best[0], null, supported(Linkage.WARD, 4, 9.0)};
        assertEquals(2, Recommender.recommendedLinkage(best, choice, RULE.order()));
    }

    @Test
    void equallyFineLevelsGoToTheLinkageWhoseBestComesFirst() {
        Assessment[] best = {supported(Linkage.AVERAGE, 3, 6.7), supported(Linkage.COMPLETE, 3, 30.0),
            supported(Linkage.WARD, 3, 18.4)};
        assertEquals(1, Recommender.recommendedLinkage(best, best, RULE.order()));
    }

    @Test
    void aTentativeSolutionNeverOutranksASupportedOneByBeingFiner() {
        Assessment[] best = {tentative(Linkage.AVERAGE, 6, 40.0), null, supported(Linkage.WARD, 2, 5.0)};
        assertEquals(Verdict.TENTATIVE, best[0].verdict());
        assertEquals(2, Recommender.recommendedLinkage(best, best, RULE.order()));
    }

    @Test
    void withoutASupportedSolutionTheOrderAloneDecides() {
        Assessment[] best = {tentative(Linkage.AVERAGE, 4, 10.0), null, tentative(Linkage.WARD, 2, 12.0)};
        assertEquals(2, Recommender.recommendedLinkage(best, best, RULE.order()));
        assertEquals(-1, Recommender.recommendedLinkage(new Assessment[] {null, null}, new Assessment[] {null, null},
                RULE.order()));
    }
}
