package org.treeproof.score;

import java.util.Objects;
import java.util.function.LongFunction;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.partition.Partition;

/**
 * The gap statistic of R. Tibshirani, G. Walther and T. Hastie, "Estimating the number of clusters in a data
 * set via the gap statistic", J. R. Stat. Soc. B 63 (2001) 411-423, doi:10.1111/1467-9868.00293.
 *
 * <p>For k = 1..K, with W_k the pooled within-cluster sum of squares of the observed data cut into k
 * clusters and W*_kb the same for reference set b = 1..B (drawn from a structureless distribution and
 * clustered the same way):
 * <pre>
 *   Gap(k) = (1/B) Σ_b log W*_kb − log W_k
 *   sd_k   = [(1/B) Σ_b (log W*_kb − l̄_k)²]^{1/2}      (population SD, as in the paper)
 *   s_k    = sd_k · sqrt(1 + 1/B)
 *   k̂      = the smallest k with Gap(k) ≥ Gap(k+1) − s_{k+1}
 * </pre>
 * k = 1 may be chosen, so data without structure give 1. When no k &lt; K meets the rule the result
 * reports K with {@link GapResult#ruleMet()} false, meaning "at least K, look further" rather than a choice.
 *
 * <p>W_k = Σ_r (1/(2 n_r)) Σ_{i,i' ∈ r} ||x_i − x_i'||² = Σ_r Σ_{i ∈ r} ||x_i − c_r||² is computed through the
 * centroids c_r with the corrected two-pass algorithm of T. F. Chan, G. H. Golub and R. J. LeVeque,
 * "Algorithms for computing the sample variance: analysis and recommendations", Am. Stat. 37 (1983)
 * 242-247, doi:10.1080/00031305.1983.10483115 (DOI from memory), so a large common offset in the data
 * costs no accuracy. Logarithms are natural and taken with {@link StrictMath#log} so that the rule's
 * decision cannot differ between JVMs.
 *
 * <p>All methods are pure. The clustering is not done here: callers pass k-cuts (from a tree, say), which
 * keeps this package free of the tree code.
 */
public final class GapStatistic {

    private GapStatistic() {
    }

    /**
     * Cuts a data set into k = 2..maxK clusters; the same procedure must serve the observed and the reference
     * data.
     */
    @FunctionalInterface
    public interface Clustering {
        /**
         * @return {@code maxK − 1} label arrays; element {@code k − 2} labels every sample of {@code data} with
         *         its cluster 0..k−1 in the cut into exactly k clusters
         */
        int[][] cuts(DataMatrix data, int maxK);
    }

    /**
     * The gap statistic from log W values.
     *
     * @param observedLogW  log W_k of the observed data, entry k − 1 for k = 1..K (K ≥ 1)
     * @param referenceLogW referenceLogW[b][k − 1] = log W*_kb, B ≥ 1 rows of length K
     * @throws InputException if an observed or reference log W is −∞ (a W of 0: no more distinct samples than
     *                        clusters)
     */
    public static GapResult compute(double[] observedLogW, double[][] referenceLogW) {
        int kMax = observedLogW.length;
        int b = referenceLogW.length;
        if (kMax < 1) {
            throw new IllegalArgumentException("no k values");
        }
        if (b < 1) {
            throw new IllegalArgumentException("no reference sets");
        }
        for (int k = 0; k < kMax; k++) {
            requireUsable(observedLogW[k], k + 1, "the observed data");
        }
        for (int s = 0; s < b; s++) {
            if (referenceLogW[s].length != kMax) {
                throw new IllegalArgumentException("reference set " + (s + 1) + " has " + referenceLogW[s].length
                        + " values, expected " + kMax);
            }
            for (int k = 0; k < kMax; k++) {
                requireUsable(referenceLogW[s][k], k + 1, "reference set " + (s + 1));
            }
        }
        double[] mean = new double[kMax];
        double[] gap = new double[kMax];
        double[] sd = new double[kMax];
        double[] se = new double[kMax];
        double inflate = Math.sqrt(1.0 + 1.0 / b);
        for (int k = 0; k < kMax; k++) {
            double sum = 0;
            for (double[] row : referenceLogW) {
                sum += row[k];
            }
            double m = sum / b;
            double ss = 0;
            for (double[] row : referenceLogW) {
                double d = row[k] - m;
                ss += d * d;
            }
            mean[k] = m;
            gap[k] = m - observedLogW[k];
            sd[k] = Math.sqrt(ss / b);
            se[k] = sd[k] * inflate;
        }
        int chosen = kMax;
        boolean met = false;
        for (int k = 0; k + 1 < kMax; k++) {
            if (gap[k] >= gap[k + 1] - se[k + 1]) {
                chosen = k + 1;
                met = true;
                break;
            }
        }
        return new GapResult(observedLogW, mean, gap, sd, se, b, chosen, met);
    }

    private static void requireUsable(double v, int k, String whose) {
        if (v == Double.NEGATIVE_INFINITY) {
            throw new InputException("gap statistic: the within-cluster sum of squares of " + whose + " is 0 at k = "
                    + k + ", so its samples have at most " + k + " distinct values; lower --max-k");
        }
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("log W of " + whose + " at k = " + k + " is " + v);
        }
    }

    /**
     * The whole procedure, sequentially: log W_k of {@code observed} and of one reference set per seed, each
     * cut by {@code clustering}, then {@link #compute}.
     *
     * @param reference      draws a reference set from a seed (for instance {@code ReferenceData::draw})
     * @param referenceSeeds one seed per reference set, B ≥ 1
     * @param maxK           K ≥ 1
     */
    public static GapResult evaluate(DataMatrix observed, LongFunction<DataMatrix> reference, long[] referenceSeeds,
            int maxK, Clustering clustering) {
        Objects.requireNonNull(reference, "reference");
        Objects.requireNonNull(clustering, "clustering");
        if (maxK < 1) {
            throw new IllegalArgumentException("maxK must be positive, got " + maxK);
        }
        double[] obs = logWithinByK(observed, cutsOf(clustering, observed, maxK));
        double[][] ref = new double[referenceSeeds.length][];
        for (int s = 0; s < referenceSeeds.length; s++) {
            DataMatrix z = reference.apply(referenceSeeds[s]);
            ref[s] = logWithinByK(z, cutsOf(clustering, z, maxK));
        }
        return compute(obs, ref);
    }

    private static int[][] cutsOf(Clustering clustering, DataMatrix data, int maxK) {
        return maxK == 1 ? new int[0][] : clustering.cuts(data, maxK);
    }

    /**
     * log W_k for k = 1..K of {@code data}: W_1 is the total sum of squares about the grand mean, and
     * {@code cutsFromTwo[k − 2]} gives the labels of the k-cluster cut for k = 2..K.
     *
     * @throws IllegalArgumentException if a cut does not use exactly the labels 0..k−1
     */
    public static double[] logWithinByK(DataMatrix data, int[][] cutsFromTwo) {
        double[] out = new double[cutsFromTwo.length + 1];
        out[0] = StrictMath.log(withinSumOfSquares(data, new int[data.samples()]));
        for (int c = 0; c < cutsFromTwo.length; c++) {
            int k = c + 2;
            int[] labels = cutsFromTwo[c];
            boolean[] used = new boolean[k];
            int distinct = 0;
            for (int l : labels) {
                if (l < 0 || l >= k) {
                    throw new IllegalArgumentException("cut for k = " + k + " has label " + l);
                }
                if (!used[l]) {
                    used[l] = true;
                    distinct++;
                }
            }
            if (distinct != k) {
                throw new IllegalArgumentException("cut for k = " + k + " has " + distinct + " clusters");
            }
            out[c + 1] = StrictMath.log(withinSumOfSquares(data, labels));
        }
        return out;
    }

    /** W_k of a partition; see {@link #withinSumOfSquares(DataMatrix, int[])}. */
    public static double withinSumOfSquares(DataMatrix data, Partition partition) {
        return withinSumOfSquares(data, partition.labels());
    }

    /**
     * W_k = Σ_r Σ_{i ∈ r} ||x_i − c_r||², the pooled within-cluster sum of squared Euclidean distances to the
     * centroids, for any labels in 0..n−1 (a label with no member contributes nothing). All-zero labels give the
     * total sum of squares, W_1.
     *
     * @throws InputException if a value is missing
     */
    public static double withinSumOfSquares(DataMatrix data, int[] labels) {
        int n = data.samples();
        int p = data.features();
        if (labels.length != n) {
            throw new IllegalArgumentException(labels.length + " labels for " + n + " samples");
        }
        int k = 0;
        for (int l : labels) {
            if (l < 0 || l >= n) {
                throw new IllegalArgumentException("label " + l + " outside 0.." + (n - 1));
            }
            k = Math.max(k, l + 1);
        }
        double[] x = data.rowMajorCopy();
        for (int a = 0; a < x.length; a++) {
            if (Double.isNaN(x[a])) {
                throw new InputException("gap statistic needs complete data, but sample '"
                        + data.sampleIds().get(a / p) + "' has no value for feature '"
                        + data.featureNames().get(a % p) + "' (choose a --missing policy)");
            }
        }
        int[] size = new int[k];
        double[] centroid = new double[k * p];
        for (int i = 0; i < n; i++) {
            int o = labels[i] * p;
            size[labels[i]]++;
            for (int j = 0; j < p; j++) {
                centroid[o + j] += x[i * p + j];
            }
        }
        for (int r = 0; r < k; r++) {
            for (int j = 0; j < p; j++) {
                if (size[r] > 0) {
                    centroid[r * p + j] /= size[r];
                }
            }
        }
        // Second pass: squared deviations, and their plain sum, whose square corrects for the rounding of
        // the centroid (Chan, Golub & LeVeque's corrected two-pass formula).
        double[] sumSq = new double[k * p];
        double[] sum = new double[k * p];
        for (int i = 0; i < n; i++) {
            int o = labels[i] * p;
            for (int j = 0; j < p; j++) {
                double d = x[i * p + j] - centroid[o + j];
                sumSq[o + j] += d * d;
                sum[o + j] += d;
            }
        }
        double w = 0;
        for (int r = 0; r < k; r++) {
            if (size[r] == 0) {
                continue;
            }
            for (int j = 0; j < p; j++) {
                int a = r * p + j;
                w += Math.max(0.0, sumSq[a] - sum[a] * sum[a] / size[r]);
            }
        }
        return w;
    }

    /**
     * W_1 .. W_K of nested partitions in one pass over the data: {@code nested[k - 1]} labels (0..k-1) the
     * partition into k clusters, each a coarsening of the next, as the cuts of one tree are. The finest
     * partition's centroids and within sums of squares are computed as {@link #withinSumOfSquares(DataMatrix,
     * int[])} does; coarser ones follow exactly from Huygens' decomposition,
     * W(C) = Σ_{f ⊂ C} [W(f) + n_f ||m_f − m_C||²], which costs O(K² p) instead of O(n p) per k.
     *
     * @throws IllegalArgumentException if the partitions are not nested
     */
    public static double[] withinSumsOfSquaresNested(DataMatrix data, int[][] nested) {
        int n = data.samples();
        int p = data.features();
        int maxK = nested.length;
        int[] finest = nested[maxK - 1];
        int kf = 0;
        for (int l : finest) {
            kf = Math.max(kf, l + 1);
        }
        double[] x = data.rowMajorCopy();
        int[] size = new int[kf];
        double[] mean = new double[kf * p];
        for (int i = 0; i < n; i++) {
            size[finest[i]]++;
            int o = finest[i] * p;
            for (int j = 0; j < p; j++) {
                mean[o + j] += x[i * p + j];
            }
        }
        for (int f = 0; f < kf; f++) {
            for (int j = 0; j < p; j++) {
                mean[f * p + j] /= Math.max(1, size[f]);
            }
        }
        double[] wf = new double[kf];
        double[] sumSq = new double[p];
        double[] sum = new double[p];
        int[][] members = new int[kf][];
        int[] fill = new int[kf];
        for (int f = 0; f < kf; f++) {
            members[f] = new int[size[f]];
        }
        for (int i = 0; i < n; i++) {
            members[finest[i]][fill[finest[i]]++] = i;
        }
        for (int f = 0; f < kf; f++) {
            java.util.Arrays.fill(sumSq, 0);
            java.util.Arrays.fill(sum, 0);
            for (int i : members[f]) {
                for (int j = 0; j < p; j++) {
                    double d = x[i * p + j] - mean[f * p + j];
                    sumSq[j] += d * d;
                    sum[j] += d;
                }
            }
            for (int j = 0; j < p; j++) {
                wf[f] += Math.max(0.0, sumSq[j] - sum[j] * sum[j] / Math.max(1, size[f]));
            }
        }
        double[] out = new double[maxK];
        for (int k = 1; k <= maxK; k++) {
            int[] labels = nested[k - 1];
            int[] coarseOf = new int[kf];
            java.util.Arrays.fill(coarseOf, -1);
            for (int i = 0; i < n; i++) {
                int f = finest[i];
                if (coarseOf[f] < 0) {
                    coarseOf[f] = labels[i];
                } else if (coarseOf[f] != labels[i]) {
                    throw new IllegalArgumentException("the partition at k = " + k + " splits a cluster of the finest");
                }
            }
            int kc = 0;
            for (int l : labels) {
                kc = Math.max(kc, l + 1);
            }
            double[] cm = new double[kc * p];
            int[] cn = new int[kc];
            for (int f = 0; f < kf; f++) {
                int c = coarseOf[f];
                if (c < 0) {
                    continue;
                }
                cn[c] += size[f];
                for (int j = 0; j < p; j++) {
                    cm[c * p + j] += size[f] * mean[f * p + j];
                }
            }
            for (int c = 0; c < kc; c++) {
                for (int j = 0; j < p; j++) {
                    cm[c * p + j] /= Math.max(1, cn[c]);
                }
            }
            double w = 0;
            for (int f = 0; f < kf; f++) {
                int c = coarseOf[f];
                if (c < 0) {
                    continue;
                }
                double between = 0;
                for (int j = 0; j < p; j++) {
                    double d = mean[f * p + j] - cm[c * p + j];
                    between += d * d;
                }
                w += wf[f] + size[f] * between;
            }
            out[k - 1] = w;
        }
        return out;
    }
}
