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
        var facts = new Assessment.Facts(Linkage.WARD, k, 0, 0.8, 0.7, true, 1, 0.3, 0.1, true, 5.0, 0.05, 0.7);
        return new Assessment(facts, v, List.of(), failed);
    }

    @Test
    void criteriaThatPickTheSameKShareOneClause() {
        var linkage = List.of(at(2, Verdict.SUPPORTED, List.of()),
                at(3, Verdict.TENTATIVE, List.of(Condition.EVERY_CLUSTER_STABLE)),
                at(5, Verdict.UNSUPPORTED, List.of(Condition.NO_CLUSTER_DISSOLVES)));
        var reason = new Reason.Criteria(List.of(
                new CriterionChoice(Criterion.EXCESS, "excess over the null", 3, "largest"),
                new CriterionChoice(Criterion.MEAN_ARI, "stability (mean ARI)", 3, "largest"),
                new CriterionChoice(Criterion.DUNN, "Dunn", 5, "largest"),
                new CriterionChoice(Criterion.PAC, "PAC", 3, "smallest")), 2, linkage);
        String text = new ReasonWords(DecisionRule.DEFAULT).criteria(reason);
        assertEquals("Taken alone, excess over the null, stability (mean ARI) and PAC pick k = 3, tentative there: it "
                + "fails the condition that every cluster is stable (mean Jaccard at least 0.75); Dunn picks k = 5, "
                + "unsupported there: it fails the condition that no cluster dissolves (every mean Jaccard above 0.5).",
                text);
    }

    @Test
    void noDisagreementIsSaidOnce() {
        var reason = new Reason.Criteria(List.of(), 4, List.of(at(4, Verdict.SUPPORTED, List.of())));
        assertEquals("Every criterion taken alone agrees with k = 4.",
                new ReasonWords(DecisionRule.DEFAULT).criteria(reason));
    }
}
