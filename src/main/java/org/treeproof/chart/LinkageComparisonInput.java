package org.treeproof.chart;

import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * What the linkage comparison shows: each linkage at its own best number of clusters, measured three ways,
 * and how far the linkages' chosen clusterings agree with each other.
 *
 * @param title     the chart title in plain words, e.g. "Linkage methods compared at their best k"
 * @param rows      one row per linkage, in the order to show them; names distinct
 * @param agreement the adjusted Rand index between the chosen clusterings of linkages {@code a} and
 *                  {@code b}, {@code rows.size()} square, symmetric, values in [-1, 1] or NaN where undefined
 *                  (where a clustering has a single cluster), diagonal 1
 */
public record LinkageComparisonInput(String title, List<LinkageComparisonInput.Row> rows, double[][] agreement) {

    /**
     * One linkage at its best number of clusters. Any measure may be NaN where it is not defined (for
     * instance the silhouette when k = 1).
     *
     * @param linkage                the linkage name, e.g. "average"
     * @param k                      its best number of clusters, at least 1
     * @param copheneticCorrelation  how well the tree keeps the input distances, in [-1, 1]
     * @param stability              the mean adjusted Rand index over replicates at that k, in [-1, 1]
     * @param silhouette             the average silhouette width at that k, in [-1, 1]
     */
    public record Row(String linkage, int k, double copheneticCorrelation, double stability, double silhouette) {
        public Row {
            Check.text(linkage, "linkage");
            if (k < 1) {
                throw new IllegalArgumentException(linkage + ": k must be at least 1, got " + k);
            }
            Check.within(new double[] {copheneticCorrelation, stability, silhouette}, 3, -1, 1, true,
                    linkage + " measures (cophenetic correlation, stability, silhouette)");
        }
    }

    public LinkageComparisonInput {
        Check.text(title, "title");
        Objects.requireNonNull(rows, "rows");
        rows = List.copyOf(rows);
        if (rows.isEmpty()) {
            throw new IllegalArgumentException("rows must hold at least one linkage");
        }
        Set<String> names = new HashSet<>();
        for (Row r : rows) {
            if (!names.add(r.linkage())) {
                throw new IllegalArgumentException("linkage " + r.linkage() + " appears twice");
            }
        }
        Objects.requireNonNull(agreement, "agreement");
        int m = rows.size();
        Check.length(agreement.length, m, "agreement");
        double[][] copy = new double[m][];
        for (int a = 0; a < m; a++) {
            copy[a] = Check.within(agreement[a], m, -1, 1, true, "agreement[" + a + "]");
        }
        for (int a = 0; a < m; a++) {
            if (copy[a][a] != 1.0) {
                throw new IllegalArgumentException("agreement[" + a + "][" + a + "] is " + copy[a][a]
                        + "; a clustering agrees fully with itself (1)");
            }
            for (int b = 0; b < a; b++) {
                double x = copy[a][b];
                double y = copy[b][a];
                boolean same = (Double.isNaN(x) && Double.isNaN(y)) || Math.abs(x - y) <= 1e-12;
                if (!same) {
                    throw new IllegalArgumentException("agreement is not symmetric at [" + a + "][" + b + "]: " + x
                            + " against " + y);
                }
            }
        }
        agreement = copy;
    }

    @Override
    public double[][] agreement() {
        double[][] c = new double[agreement.length][];
        for (int a = 0; a < c.length; a++) {
            c[a] = agreement[a].clone();
        }
        return c;
    }

    double agreementAt(int a, int b) {
        return agreement[a][b];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LinkageComparisonInput l && l.title.equals(title) && l.rows.equals(rows)
                && Arrays.deepEquals(l.agreement, agreement);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, rows, Arrays.deepHashCode(agreement));
    }

    @Override
    public String toString() {
        return "LinkageComparisonInput[" + title + ", linkages=" + rows.size() + "]";
    }
}
