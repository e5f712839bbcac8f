package org.treeproof.chart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.stream.IntStream;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.tree.Linkage;

/**
 * The columns of the data heat map: which features are shown (all, or the most variable when there are too
 * many to see) and the tree that orders them.
 *
 * <p>The features are clustered the way the samples are, with the same core machinery: Euclidean distances
 * between the features' profiles over the samples, then average linkage (UPGMA; R. R. Sokal and C. D.
 * Michener, "A statistical method for evaluating systematic relationships", Univ. Kansas Sci. Bull. 38
 * (1958) 1409-1438). The profiles are z-scored first, as the heat map shows them, so the tree groups
 * columns that look alike in the picture rather than columns of similar scale; for data already z-scored
 * this changes nothing.
 *
 * @param columns     the shown features, indices into the data's columns, in input order
 * @param total       the data's number of features
 * @param tiedAtLimit true when the choice of the most variable features was partly decided by equal
 *                    variances (kept in input order), as after z-scoring, where every variance is 1
 * @param tree        the features' tree over {@code columns}, or {@code null} with fewer than two features or
 *                    when missing values prevent computing distances
 */
record HeatmapFeatures(int[] columns, int total, boolean tiedAtLimit, ChartTree tree) {
    /** The most features drawn; beyond this a column would be a fraction of a pixel wide. */
    static final int MAX_FEATURES = 500;

    HeatmapFeatures {
        columns = columns.clone();
    }

    @Override
    public int[] columns() {
        return columns.clone();
    }

    /** Whether only a selection of the features is shown. */
    boolean selected() {
        return columns.length < total;
    }

    /** Chooses and clusters the features of {@code data}, computing distances on {@code threads} threads. */
    static HeatmapFeatures of(DataMatrix data, int threads) {
        int p = data.features();
        int[] columns;
        boolean tied = false;
        if (p <= MAX_FEATURES) {
            columns = IntStream.range(0, p).toArray();
        } else {
            double[] variance = new double[p];
            for (int j = 0; j < p; j++) {
                variance[j] = variance(data.column(j));
            }
            // most variable first; equal variances in input order, so the choice is deterministic
            Integer[] byVariance = IntStream.range(0, p).boxed().toArray(Integer[]::new);
            Arrays.sort(byVariance, Comparator.<Integer>comparingDouble(j -> -variance[j]).thenComparingInt(j -> j));
            double last = variance[byVariance[MAX_FEATURES - 1]];
            double next = variance[byVariance[MAX_FEATURES]];
            tied = Math.abs(last - next) <= 1e-9 * Math.max(Math.abs(last), Math.abs(next));
            columns = new int[MAX_FEATURES];
            for (int t = 0; t < MAX_FEATURES; t++) {
                columns[t] = byVariance[t];
            }
            Arrays.sort(columns);
        }
        return new HeatmapFeatures(columns, p, tied, tree(data, columns, threads));
    }

    /** The shown columns of {@code data}, row-major samples by shown features. */
    double[] values(DataMatrix data) {
        int n = data.samples();
        int q = columns.length;
        double[] v = new double[n * q];
        for (int i = 0; i < n; i++) {
            for (int t = 0; t < q; t++) {
                v[i * q + t] = data.get(i, columns[t]);
            }
        }
        return v;
    }

    /** The names of the shown features. */
    String[] names(DataMatrix data) {
        String[] names = new String[columns.length];
        for (int t = 0; t < columns.length; t++) {
            names[t] = data.featureNames().get(columns[t]);
        }
        return names;
    }

    private static ChartTree tree(DataMatrix data, int[] columns, int threads) {
        int q = columns.length;
        if (q < 2 || data.missingCount() > 0) {
            return null;
        }
        int n = data.samples();
        double[] z = new double[n * q];
        for (int t = 0; t < q; t++) {
            double[] col = data.column(columns[t]);
            double mean = Arrays.stream(col).sum() / n;
            double sd = Math.sqrt(variance(col));
            for (int i = 0; i < n; i++) {
                // a constant feature has no z-score; 0 is what the heat map shows for it
                z[i * q + t] = sd > 0 ? (col[i] - mean) / sd : 0.0;
            }
        }
        List<String> names = new ArrayList<>(q);
        for (int c : columns) {
            names.add(data.featureNames().get(c));
        }
        DataMatrix profiles = new DataMatrix(data.sampleIds(), names, z).transpose();
        CondensedDistances d = Metric.EUCLIDEAN.compute(profiles, threads);
        return StudyChartInputs.chartTree(Linkage.AVERAGE.cluster(d));
    }

    /** Population variance over the non-missing values; 0 with fewer than two. */
    private static double variance(double[] x) {
        double sum = 0;
        int count = 0;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                sum += v;
                count++;
            }
        }
        if (count < 2) {
            return 0;
        }
        double mean = sum / count;
        double ss = 0;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                ss += (v - mean) * (v - mean);
            }
        }
        return ss / count;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof HeatmapFeatures h && Arrays.equals(h.columns, columns) && h.total == total
                && h.tiedAtLimit == tiedAtLimit && Objects.equals(h.tree, tree);
    }

    @Override
    public int hashCode() {
        return Objects.hash(Arrays.hashCode(columns), total, tiedAtLimit, tree);
    }
}
