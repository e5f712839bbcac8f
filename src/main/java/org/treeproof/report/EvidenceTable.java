package org.treeproof.report;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.treeproof.tree.Linkage;

/**
 * The evidence for one linkage, k = 2..maxK.
 *
 * @param linkage               the linkage
 * @param copheneticCorrelation the cophenetic correlation of its tree with the distances
 * @param monotone              false when the tree has inversions (centroid, median)
 * @param gapChoice             the gap statistic's choice of k (1..maxK), or 0 when it was not computed
 * @param gapRuleMet            false when the gap rule was not met below the largest k (or not computed)
 * @param rows                  one row per k, in increasing k
 */
public record EvidenceTable(Linkage linkage, double copheneticCorrelation, boolean monotone, int gapChoice,
        boolean gapRuleMet, List<EvidenceRow> rows) {

    public EvidenceTable {
        Objects.requireNonNull(linkage, "linkage");
        rows = List.copyOf(rows);
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).k() != i + 2) {
                throw new IllegalArgumentException("rows must run k = 2, 3, ... in order");
            }
        }
        // The gap statistic cuts the tree itself, so its choice may be a k with no row here (no cut into k
        // clusters of at least the minimum size).
        if (gapChoice < 0) {
            throw new IllegalArgumentException("gap choice " + gapChoice + " is negative");
        }
    }

    /** Whether the gap statistic was computed. */
    public boolean hasGap() {
        return gapChoice > 0;
    }

    /** Whether the gap statistic's k has a row: a cut of the tree into that many clusters of the minimum size. */
    public boolean gapChoiceHasRow() {
        return gapChoice >= 2 && gapChoice <= rows.size() + 1;
    }

    /** The row at {@code k}. */
    public EvidenceRow at(int k) {
        return rows.get(k - 2);
    }

    /** The recommended row, if it is in this table. */
    public Optional<EvidenceRow> recommended() {
        return rows.stream().filter(EvidenceRow::recommended).findFirst();
    }

    /** The row with the highest mean ARI (the earliest on ties): the most stable cut. */
    public EvidenceRow mostStable() {
        EvidenceRow best = rows.get(0);
        for (EvidenceRow r : rows) {
            if (r.ariMean() > best.ariMean()) {
                best = r;
            }
        }
        return best;
    }
}
