package org.treeproof.score;

import java.util.Arrays;
import java.util.Objects;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Clustering;
import org.treeproof.partition.Partition;

/**
 * Silhouette widths of a partition from a dissimilarity matrix.
 *
 * <p>P. J. Rousseeuw, "Silhouettes: a graphical aid to the interpretation and validation of cluster
 * analysis", Journal of Computational and Applied Mathematics 20 (1987) 53-65,
 * doi:10.1016/0377-0427(87)90125-7. For sample {@code i} in cluster {@code A}, {@code a(i)} is its mean
 * dissimilarity to the other members of {@code A}, {@code b(i)} the smallest mean dissimilarity to the
 * members of another cluster, and {@code s(i) = (b(i) - a(i)) / max(a(i), b(i))}.
 *
 * <p>Conventions, as in scikit-learn 1.2.1 ({@code silhouette_samples}, {@code silhouette_score}):
 * a sample alone in its cluster has {@code s(i) = 0} (Rousseeuw's own rule); a sample with
 * {@code a(i) = b(i) = 0} (duplicates split across clusters) has {@code s(i) = 0}; the mean is over all
 * samples, singletons included. With one cluster there is no {@code b(i)}: the silhouette is undefined
 * and every value and the mean are {@code NaN} (scikit-learn refuses this case). With as many clusters
 * as samples every value is 0 by the singleton rule (scikit-learn refuses this case too).
 *
 * <p>One pass over the condensed matrix, O(n²) time, O(n·k) extra memory.
 */
public final class Silhouette {
    /** Above this many per-sample cluster sums the O(n) memory, row-by-row pass is used instead. */
    static final long SUMS_LIMIT = 1L << 23;

    private final CondensedDistances distances;
    private final Partition partition;
    private final long sumsLimit;
    /** Items set aside as outliers (no width, not in the mean, not a cluster), or null. */
    private final boolean[] outlier;

    private Silhouette(CondensedDistances distances, Partition partition, long sumsLimit) {
        this(distances, partition, sumsLimit, null);
    }

    private Silhouette(CondensedDistances distances, Partition partition, long sumsLimit, boolean[] outlier) {
        this.outlier = outlier;
        this.distances = Objects.requireNonNull(distances, "distances");
        this.partition = Objects.requireNonNull(partition, "partition");
        if (distances.size() != partition.size()) {
            throw new IllegalArgumentException("distances are over " + distances.size()
                    + " items but the partition over " + partition.size());
        }
        this.sumsLimit = sumsLimit;
    }

    /** The silhouette of {@code partition} under {@code distances} (same items, same order). */
    public static Silhouette of(CondensedDistances distances, Partition partition) {
        return new Silhouette(distances, partition, SUMS_LIMIT);
    }

    /**
     * The silhouette of the clusters of {@code clustering}, outliers ignored: an outlier has no width
     * ({@code NaN}), is left out of the mean, and is neither a cluster-mate nor a neighbouring cluster of anyone.
     * The same as the silhouette of {@link Clustering#clusteredPartition()} on the clustered items' distances.
     */
    public static Silhouette of(CondensedDistances distances, Clustering clustering) {
        int n = clustering.size();
        int k = clustering.k();
        boolean[] out = new boolean[n];
        int[] raw = new int[n];
        for (int i = 0; i < n; i++) {
            out[i] = clustering.isOutlier(i);
            raw[i] = out[i] ? k : clustering.label(i);
        }
        return new Silhouette(distances, Partition.of(raw), SUMS_LIMIT, clustering.outlierCount() > 0 ? out : null);
    }

    /** As {@link #of}, choosing the pass by the given limit; lets tests exercise both passes. */
    static Silhouette of(CondensedDistances distances, Partition partition, long sumsLimit) {
        return new Silhouette(distances, partition, sumsLimit);
    }

    /**
     * Per-sample silhouette widths and their mean.
     *
     * @param values one width per sample, in sample order, each in [-1, 1], or all {@code NaN} when
     *               the partition has one cluster
     * @param mean   the average width, {@code NaN} when the partition has one cluster
     */
    public record Result(double[] values, double mean) {
        public Result {
            values = values.clone();
            for (double v : values) {
                if (v < -1 || v > 1) {   // NaN (an outlier's or an undefined width) passes
                    throw new IllegalArgumentException("silhouette width " + v + " is outside [-1, 1]");
                }
            }
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        /** Width of sample {@code i}. */
        public double value(int i) {
            return values[i];
        }

        /** Whether the silhouette is defined (the partition has at least two clusters). */
        public boolean defined() {
            return !Double.isNaN(mean);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Result r && Arrays.equals(r.values, values)
                    && Double.compare(r.mean, mean) == 0;
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(values) * 31 + Double.hashCode(mean);
        }

        @Override
        public String toString() {
            return "Silhouette.Result[n=" + values.length + ", mean=" + mean + "]";
        }
    }

    /** Computes the widths. */
    public Result compute() {
        return compute(null);
    }

    /**
     * The silhouette of each clustering under the same {@code distances}, as {@link #of(CondensedDistances,
     * Clustering)} then {@link #compute()} one by one (null where the clustering is null), with one pass over the
     * matrix for all of them instead of one each. The pass sums each sample's distances to the blocks of the
     * clusterings' common refinement (the groups of samples that every clustering puts together; for the nested
     * cuts of a few trees a few dozen blocks), two additions per pair whatever the number of clusterings; a
     * clustering's sum to one of its clusters is then the sum of its blocks' sums, in block order. The sums are
     * the same as a pass of its own up to rounding (they are added in another order), so a width can differ from
     * {@link #compute()}'s in the last bits; the result does not depend on threads or on the order of the
     * clusterings. When the refinement has too many blocks for the sums' memory, each clustering's own sums are
     * accumulated in the same pass instead.
     */
    public static Result[] computeEach(CondensedDistances distances, Clustering[] clusterings) {
        int count = clusterings.length;
        Silhouette[] each = new Silhouette[count];
        int[][] labels = new int[count][];
        int[] widths = new int[count];
        boolean any = false;
        for (int q = 0; q < count; q++) {
            if (clusterings[q] == null) {
                continue;
            }
            each[q] = of(distances, clusterings[q]);
            int width = each[q].partition.clusterCount();
            if (each[q].usesAllPairs(width)) {
                labels[q] = each[q].partition.labels();
                widths[q] = width;
                any = true;
            }
        }
        double[][] sums = !any ? new double[count][] : refinedSums(distances, labels, widths);
        Result[] out = new Result[count];
        for (int q = 0; q < count; q++) {
            out[q] = each[q] == null ? null : each[q].compute(sums[q]);
        }
        return out;
    }

    /**
     * Each labelling's per-sample cluster sums ({@code labels[q]} null: none for q) through the blocks of the
     * labellings' common refinement, or directly when the blocks' sums would exceed {@link #SUMS_LIMIT}.
     */
    private static double[][] refinedSums(CondensedDistances distances, int[][] labels, int[] widths) {
        int n = distances.size();
        int[] block = new int[n];
        int blocks = 1;
        for (int[] lab : labels) {
            if (lab == null) {
                continue;
            }
            // refine: the pair (block, label) gets a new block number, in the order of first appearance
            var ids = new java.util.HashMap<Long, Integer>();
            for (int i = 0; i < n; i++) {
                long key = (long) block[i] * n + lab[i];
                Integer id = ids.get(key);
                if (id == null) {
                    id = ids.size();
                    ids.put(key, id);
                }
                block[i] = id;
            }
            blocks = ids.size();
        }
        if ((long) n * blocks > SUMS_LIMIT) {
            return clusterSumsAllPairs(distances, labels, widths);
        }
        double[] blockSums = clusterSumsAllPairs(distances, new int[][] {block}, new int[] {blocks})[0];
        int[] first = new int[blocks];
        Arrays.fill(first, -1);
        for (int i = 0; i < n; i++) {
            if (first[block[i]] < 0) {
                first[block[i]] = i;
            }
        }
        double[][] sums = new double[labels.length][];
        for (int q = 0; q < labels.length; q++) {
            int[] lab = labels[q];
            if (lab == null) {
                continue;
            }
            int k = widths[q];
            int[] labelOf = new int[blocks];
            for (int b = 0; b < blocks; b++) {
                labelOf[b] = lab[first[b]];
            }
            double[] s = new double[n * k];
            for (int i = 0; i < n; i++) {
                int from = i * blocks;
                int to = i * k;
                for (int b = 0; b < blocks; b++) {
                    s[to + labelOf[b]] += blockSums[from + b];
                }
            }
            sums[q] = s;
        }
        return sums;
    }

    /** Whether {@link #compute} takes the all-pairs sums, over {@code width} label columns. */
    private boolean usesAllPairs(int width) {
        int n = partition.size();
        int clusters = outlier != null ? width - 1 : width;
        return clusters >= 2 && (long) n * width <= sumsLimit;
    }

    /** The widths, from the given all-pairs sums when not null (as {@link #clusterSumsAllPairs} gives them). */
    private Result compute(double[] given) {
        int n = partition.size();
        int k = partition.clusterCount();
        double[] s = new double[n];
        if (outlier != null) {
            return computeIgnoringOutliers(given);
        }
        if (k < 2) {
            Arrays.fill(s, Double.NaN);
            return new Result(s, Double.NaN);
        }
        int[] labels = partition.labels();
        int[] sizes = partition.clusterSizes();
        double[] rowSums = new double[k];
        if ((long) n * k <= sumsLimit) {
            double[] sums = given != null ? given : clusterSumsAllPairs(labels, k);
            for (int i = 0; i < n; i++) {
                System.arraycopy(sums, i * k, rowSums, 0, k);
                s[i] = width(rowSums, labels[i], sizes);
            }
        } else {
            for (int i = 0; i < n; i++) {
                clusterSumsOfRow(i, labels, rowSums);
                s[i] = width(rowSums, labels[i], sizes);
            }
        }
        double total = 0;
        for (double v : s) {
            total += v;
        }
        return new Result(s, total / n);
    }

    private Result computeIgnoringOutliers(double[] given) {
        int n = partition.size();
        int all = partition.clusterCount();   // the clusters and one group of outliers
        int[] labels = partition.labels();
        int[] sizes = partition.clusterSizes();
        int outlierLabel = -1;
        for (int i = 0; i < n; i++) {
            if (outlier[i]) {
                outlierLabel = labels[i];
                break;
            }
        }
        int clusters = all - 1;
        double[] s = new double[n];
        if (clusters < 2) {
            Arrays.fill(s, Double.NaN);
            return new Result(s, Double.NaN);
        }
        double[] rowSums = new double[all];
        double[] sums = given != null ? given : (long) n * all <= sumsLimit ? clusterSumsAllPairs(labels, all) : null;
        double total = 0;
        int counted = 0;
        for (int i = 0; i < n; i++) {
            if (outlier[i]) {
                s[i] = Double.NaN;
                continue;
            }
            if (sums != null) {
                System.arraycopy(sums, i * all, rowSums, 0, all);
            } else {
                clusterSumsOfRow(i, labels, rowSums);
            }
            rowSums[outlierLabel] = Double.NaN;
            s[i] = width(rowSums, labels[i], sizes);
            total += s[i];
            counted++;
        }
        return new Result(s, total / counted);
    }

    /** {@code sums[i*k + c]} = Σ of d(i, j) over the members j of cluster c; one sequential pass. */
    private double[] clusterSumsAllPairs(int[] labels, int k) {
        int n = labels.length;
        double[] sums = new double[n * k];
        double[] acc = new double[k];
        int t = 0;
        for (int i = 0; i < n; i++) {
            int li = labels[i];
            int rowI = i * k;
            Arrays.fill(acc, 0.0);
            for (int j = i + 1; j < n; j++) {
                double d = distances.at(t++);
                int lj = labels[j];
                acc[lj] += d;
                sums[j * k + li] += d;
            }
            for (int c = 0; c < k; c++) {
                sums[rowI + c] += acc[c];
            }
        }
        return sums;
    }

    /**
     * {@link #clusterSumsAllPairs} for several labellings in one pass ({@code labels[q]} null: none for q); each
     * accumulator receives the same additions in the same order as in a pass of its own.
     */
    private static double[][] clusterSumsAllPairs(CondensedDistances distances, int[][] labels, int[] widths) {
        int count = labels.length;
        int q0 = 0;
        int[] used = new int[count];
        for (int q = 0; q < count; q++) {
            if (labels[q] != null) {
                used[q0++] = q;
            }
        }
        int m = q0;
        int n = distances.size();
        double[][] sums = new double[count][];
        double[][] sumsOf = new double[m][];
        double[][] acc = new double[m][];
        int[][] lab = new int[m][];
        int[] k = new int[m];
        for (int u = 0; u < m; u++) {
            int q = used[u];
            k[u] = widths[q];
            lab[u] = labels[q];
            sums[q] = new double[n * k[u]];
            sumsOf[u] = sums[q];
            acc[u] = new double[k[u]];
        }
        int[] li = new int[m];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int u = 0; u < m; u++) {
                li[u] = lab[u][i];
                Arrays.fill(acc[u], 0.0);
            }
            for (int j = i + 1; j < n; j++) {
                double d = distances.at(t++);
                for (int u = 0; u < m; u++) {
                    acc[u][lab[u][j]] += d;
                    sumsOf[u][j * k[u] + li[u]] += d;
                }
            }
            for (int u = 0; u < m; u++) {
                double[] s = sumsOf[u];
                int rowI = i * k[u];
                for (int c = 0; c < k[u]; c++) {
                    s[rowI + c] += acc[u][c];
                }
            }
        }
        return sums;
    }

    /** The same sums for one sample, reading its row of the matrix; O(k) memory, strided reads. */
    private void clusterSumsOfRow(int i, int[] labels, double[] rowSums) {
        int n = labels.length;
        Arrays.fill(rowSums, 0.0);
        for (int j = 0; j < i; j++) {
            rowSums[labels[j]] += distances.at(CondensedDistances.index(n, j, i));
        }
        if (i + 1 < n) {
            int t = CondensedDistances.index(n, i, i + 1);
            for (int j = i + 1; j < n; j++) {
                rowSums[labels[j]] += distances.at(t++);
            }
        }
    }

    private static double width(double[] sums, int own, int[] sizes) {
        if (sizes[own] == 1) {
            return 0.0;
        }
        double a = sums[own] / (sizes[own] - 1);
        double b = Double.POSITIVE_INFINITY;
        for (int c = 0; c < sums.length; c++) {
            if (c != own && !Double.isNaN(sums[c])) {   // NaN marks the outliers' column
                b = Math.min(b, sums[c] / sizes[c]);
            }
        }
        double max = Math.max(a, b);
        return max == 0 ? 0.0 : (b - a) / max;
    }
}
