package org.treeproof.report;

import java.util.List;
import java.util.Objects;
import org.treeproof.study.CutHeight;
import org.treeproof.study.Verdict;
import org.treeproof.tree.Linkage;

/**
 * The decision a report leads with.
 *
 * @param verdict   how well the evidence supports the solution
 * @param headline  the verdict in words, one sentence
 * @param linkage   the recommended linkage (with an unsupported verdict: the tree that represents the distances
 *                  best, by cophenetic correlation)
 * @param k         the recommended number of clusters (1 when unsupported)
 * @param cutHeight the heights that give k clusters and the chosen one, in the metric's units
 * @param levels    the numbers of clusters that are each supported with all clusters stable (nested levels)
 * @param reasons   plain sentences on what carried the decision and what disagreed
 * @param criteria  each criterion's own choice of k beside the decision
 * @param outliers  the ids of the samples set aside as outliers, in input order
 * @param minClusterSize the smallest cluster
 * @param structureTest the test of any cluster structure, or {@code null} without null data
 */
public record Decision(Verdict verdict, String headline, Linkage linkage, int k, CutHeight cutHeight,
        List<Integer> levels, List<String> reasons, List<CriterionRow> criteria, List<String> outliers,
        int minClusterSize, org.treeproof.study.StructureTest structureTest) {

    public Decision {
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(headline, "headline");
        Objects.requireNonNull(linkage, "linkage");
        Objects.requireNonNull(cutHeight, "cutHeight");
        levels = List.copyOf(levels);
        reasons = List.copyOf(reasons);
        criteria = List.copyOf(criteria);
        outliers = List.copyOf(outliers);
        if ((verdict == Verdict.UNSUPPORTED) != (k == 1)) {
            throw new IllegalArgumentException("k = 1 goes with an unsupported verdict and only with it, got k = " + k
                    + " and " + verdict.id());
        }
    }

    /** Whether a solution with more than one cluster is recommended. */
    public boolean hasClusters() {
        return verdict != Verdict.UNSUPPORTED;
    }

    /**
     * One criterion's own choice of k.
     *
     * @param criterion the criterion's name
     * @param k         the k it picks on its own
     * @param basis     how it picks
     * @param agrees    whether it picks the decision's k
     */
    public record CriterionRow(String criterion, int k, String basis, boolean agrees) {
        public CriterionRow {
            Objects.requireNonNull(criterion, "criterion");
            Objects.requireNonNull(basis, "basis");
        }
    }
}
