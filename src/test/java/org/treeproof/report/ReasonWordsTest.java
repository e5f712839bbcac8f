package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.study.Assessment;
import org.treeproof.study.Condition;
import org.treeproof.study.Criterion;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.Reason;
import org.treeproof.study.Recommendation.CriterionChoice;
import org.treeproof.study.Verdict;
import org.treeproof.tree.Linkage;

/** The wording of typed reasons, on hand-built facts. */
class ReasonWordsTest {
    private static Assessment at(int k, Verdict v, List<Condition> failed) {
        var facts = new Assessment.Facts(Linkage.WARD, k, 0, 0.8, 0.7, true, 1, 0.3, 0.1, true, 5.0, 0.05, 0.7, 0.001);
        return new Assessment(facts, v, List.of(), failed);
    }

    @Test
    void aLargeShareOfOutliersIsSaidToBeMoreThanStraySamples() {
        var words = new ReasonWords(DecisionRule.DEFAULT);
        // 72 of 200 (36%): a tester's broad group was set aside sample by sample and read as noise
        String many = words.outliers(new Reason.Outliers(72, 5, 0, 200));
        org.junit.jupiter.api.Assertions.assertTrue(many.contains("That is 36% of the samples, more than scattered "
                + "outliers"), many);
        // multivariate t with 3 degrees of freedom in 40 features (bench/judgement/unseen/fresh, Y02): 94 of 250 far
        // samples and no clusters; a heavy tail is named among the causes
        org.junit.jupiter.api.Assertions.assertTrue(many.contains("the long tail of a heavy-tailed population"), many);
        // 9 of 190 (under a tenth): scattered far samples, no such sentence
        String few = words.outliers(new Reason.Outliers(9, 5, 0, 190));
        org.junit.jupiter.api.Assertions.assertFalse(few.contains("more than scattered"), few);
    }

    @Test
    void theSilhouetteIsReadInKaufmanAndRousseeuwsBands() {
        // their reading (Finding Groups in Data, 1990): above 0.50 reasonable, 0.26-0.50 weak, 0.25 or less none
        var words = new ReasonWords(DecisionRule.DEFAULT);
        org.junit.jupiter.api.Assertions.assertTrue(words.silhouetteReading(0.551).contains(
                "average silhouette of 0.551 describes a reasonable structure"));
        org.junit.jupiter.api.Assertions.assertTrue(words.silhouetteReading(0.5).contains("describes a weak structure"));
        org.junit.jupiter.api.Assertions.assertTrue(words.silhouetteReading(0.26).contains("describes a weak structure"));
        org.junit.jupiter.api.Assertions.assertTrue(words.silhouetteReading(0.25).contains(
                "describes no substantial structure"));
        org.junit.jupiter.api.Assertions.assertTrue(words.silhouetteReading(0.03).contains("did not enter the verdict"));
    }

    @Test
    void criteriaThatPickTheSameKShareOneClause() {
        var linkage = List.of(at(2, Verdict.SUPPORTED, List.of()),
                at(3, Verdict.TENTATIVE, List.of(Condition.EVERY_CLUSTER_STABLE)),
                at(5, Verdict.UNSUPPORTED, List.of(Condition.NO_CLUSTER_DISSOLVES, Condition.EVERY_CLUSTER_STABLE)));
        var reason = new Reason.Criteria(List.of(
                new CriterionChoice(Criterion.EXCESS, "excess over the null", 3, "largest"),
                new CriterionChoice(Criterion.MEAN_ARI, "stability (mean ARI)", 3, "largest"),
                new CriterionChoice(Criterion.DUNN, "Dunn", 5, "largest"),
                new CriterionChoice(Criterion.PAC, "PAC", 3, "smallest")), 2, linkage);
        String text = new ReasonWords(DecisionRule.DEFAULT).criteria(reason);
        assertEquals("Taken alone, excess over the null, stability (mean ARI) and PAC pick k = 3, tentative there: that "
                + "solution fails the condition that every cluster is stable (mean Jaccard at least 0.75); Dunn picks k = 5, "
                + "unsupported there: that solution fails 2 conditions, among them that no cluster dissolves (every mean Jaccard "
                + "above 0.5).",
                text);
    }

    @Test
    void noDisagreementIsSaidOnce() {
        var reason = new Reason.Criteria(List.of(), 4, List.of(at(4, Verdict.SUPPORTED, List.of())));
        assertEquals("Every criterion taken alone agrees with k = 4.",
                new ReasonWords(DecisionRule.DEFAULT).criteria(reason));
        // the gap statistic disagreeing (it has a sentence of its own) is not called agreement
        var gapOnly = new Reason.Criteria(List.of(new CriterionChoice(null, "gap statistic", 3, "rule")), 4,
                List.of(at(4, Verdict.SUPPORTED, List.of())));
        assertEquals("Every criterion other than the gap statistic taken alone agrees with k = 4.",
                new ReasonWords(DecisionRule.DEFAULT).criteria(gapOnly));
    }

    @Test
    void theStructureTestSaysHowManyNullSetsReachTheStatisticAndWhenTooFewCanNeverBeBeaten() {
        var words = new ReasonWords(DecisionRule.DEFAULT);
        // 19 null sets, 3 of which reach 4.0 (4.0, 4.5, 6.1): Monte Carlo p = (1 + 3) / 20 = 0.2
        double[] nineteen = new double[19];
        java.util.Arrays.fill(nineteen, 1.0);
        nineteen[2] = 4.0;
        nineteen[7] = 4.5;
        nineteen[11] = 6.1;
        var reached = new org.treeproof.study.StructureTest(4.0, 0.2, 0.3, 19, 10, nineteen);
        assertEquals(3, reached.reachedBy());
        String text = words.structure(new Reason.Structure(reached, 0.05, false));
        org.junit.jupiter.api.Assertions.assertTrue(text.contains("is 4.00, which 3 of the 19 null data sets reach"),
                text);
        // 9 null sets, none reaching 5.0: p = 1 / 10 = 0.1, the smallest 9 sets allow, above 0.05; 19 are needed
        // because 1 / (1 + 19) = 0.05
        double[] nine = new double[9];
        java.util.Arrays.fill(nine, 2.0);
        var floor = new org.treeproof.study.StructureTest(5.0, 0.1, 1e-5, 9, 10, nine);
        assertEquals(0, floor.reachedBy());
        assertEquals(19, org.treeproof.study.StructureTest.setsNeededFor(0.05));
        text = words.structure(new Reason.Structure(floor, 0.05, false));
        org.junit.jupiter.api.Assertions.assertTrue(text.startsWith("No solution can beat the null data with 9 null "
                + "data sets: "), text);
        org.junit.jupiter.api.Assertions.assertTrue(text.contains("beyond every null set, but the Monte Carlo p-value "
                + "cannot go below 1/(1 + 9) = 0.100, above the level 0.05"), text);
        org.junit.jupiter.api.Assertions.assertTrue(text.endsWith("At least 19 null data sets are needed "
                + "(--null-sets)."), text);
    }

    @Test
    void otherLinkagesSayHowTheirSolutionsNestWithTheRecommendedOne() {
        var words = new ReasonWords(DecisionRule.DEFAULT);
        var average = new org.treeproof.study.Recommendation.LinkageSummary(Linkage.AVERAGE, 0.8, 5, Verdict.SUPPORTED,
                0.9, 0.05, 0.3, 0.8);
        var complete = new org.treeproof.study.Recommendation.LinkageSummary(Linkage.COMPLETE, 0.7, 3,
                Verdict.SUPPORTED, 0.9, 0.05, 0.3, 0.8);
        var single = new org.treeproof.study.Recommendation.LinkageSummary(Linkage.SINGLE, 0.6, 1, Verdict.UNSUPPORTED,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        // 0.996 is floored to 99%: "100%" is kept for every sample
        String text = words.otherLinkages(new Reason.OtherLinkages(Linkage.WARD, 3, List.of(average, complete, single),
                List.of(0.996, Double.NaN, Double.NaN)));
        org.junit.jupiter.api.Assertions.assertEquals("Among the linkages, Ward gives the recommended solution; average "
                + "is supported at k = 5 (finer; the finer solution's clusters fall within single clusters of the "
                + "coarser for 99% of the samples); complete is supported at k = 3; single finds no convincing k.", text);
        String coarser = words.otherLinkages(new Reason.OtherLinkages(Linkage.WARD, 6, List.of(average),
                List.of(1.0)));
        org.junit.jupiter.api.Assertions.assertTrue(coarser.contains("at k = 5 (coarser; the finer solution's clusters "
                + "fall within single clusters of the coarser for 100% of the samples)"), coarser);
    }
}
