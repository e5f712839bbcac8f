package org.treeproof.report;

import java.util.List;
import java.util.Objects;
import org.treeproof.study.Verdict;
import org.treeproof.tree.Linkage;

/**
 * How the linkages compare: each one's own best solution, how far their solutions agree, and why the
 * recommended one was preferred.
 *
 * @param rows      one per linkage, in the order of the settings
 * @param agreement adjusted Rand index between the linkages' own solutions, {@code [a][b]} in the order of
 *                  {@code rows}; {@code NaN} where a linkage has no convincing solution
 * @param best      the recommended linkage
 * @param why       plain sentences: which linkage is best supported and why
 */
public record LinkageComparison(List<Row> rows, double[][] agreement, Linkage best, List<String> why) {

    public LinkageComparison {
        rows = List.copyOf(rows);
        why = List.copyOf(why);
        Objects.requireNonNull(best, "best");
        if (agreement.length != rows.size()) {
            throw new IllegalArgumentException("agreement matrix of " + agreement.length + " rows for "
                    + rows.size() + " linkages");
        }
        agreement = copy(agreement, rows.size());
    }

    private static double[][] copy(double[][] a, int m) {
        double[][] out = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            if (a[i].length != m) {
                throw new IllegalArgumentException("the agreement matrix must be square");
            }
            out[i] = a[i].clone();
        }
        return out;
    }

    @Override
    public double[][] agreement() {
        return copy(agreement, rows.size());
    }

    /** The agreement between linkages {@code a} and {@code b} (indices into {@link #rows()}). */
    public double agreement(int a, int b) {
        return agreement[a][b];
    }

    /**
     * One linkage's own best solution under the decision rule.
     *
     * @param linkage               the linkage
     * @param copheneticCorrelation its tree's cophenetic correlation with the distances
     * @param k                     its own best k (1 when none is convincing)
     * @param verdict               that solution's verdict
     * @param ariMean               its mean ARI ({@code NaN} when none)
     * @param pac                   its PAC ({@code NaN} when none)
     * @param silhouette            its average silhouette ({@code NaN} when none)
     * @param worstJaccard          its smallest cluster Jaccard ({@code NaN} when none)
     * @param recommended           whether this is the recommended linkage
     */
    public record Row(Linkage linkage, double copheneticCorrelation, int k, Verdict verdict, double ariMean,
            double pac, double silhouette, double worstJaccard, boolean recommended) {
        public Row {
            Objects.requireNonNull(linkage, "linkage");
            Objects.requireNonNull(verdict, "verdict");
        }
    }
}
