package org.treeproof.explain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.treeproof.data.DataMatrix;

/**
 * Compares every feature between each cluster and the rest of the clustered samples (outliers take no part).
 *
 * <p>Per feature and cluster: the means in the cluster and elsewhere; Cohen's d, the standardised mean
 * difference with the pooled standard deviation {@code s = √(((n₁−1)s₁² + (n₂−1)s₂²)/(n₁+n₂−2))} (J. Cohen,
 * Statistical Power Analysis for the Behavioral Sciences, 2nd ed., Erlbaum 1988, ISBN 0-8058-0283-5); the AUC,
 * {@code U₁/(n₁n₂)} from the Mann-Whitney statistic of the cluster, which is the area under the ROC curve of the
 * feature as a marker of the cluster (D. Bamber, Journal of Mathematical Psychology 12 (1975) 387-415,
 * doi:10.1016/0022-2496(75)90001-2); a two-sided {@link ContrastTest}; and Benjamini-Hochberg q-values over
 * the features within each cluster ({@link FalseDiscovery}).
 *
 * <p>Each feature is ranked once over all clustered samples and every cluster's rank sum read from those ranks,
 * so the work is O(m · N log N + m · N) for m features and N samples, whatever the number of clusters. Features
 * are handled in blocks on the given number of threads; each value depends only on its feature, so the result
 * does not depend on the thread count.
 */
public final class FeatureContrast {
    private static final int BLOCK = 32;
    private static final NormalDistribution NORMAL = new NormalDistribution(null, 0, 1);

    private final DataMatrix data;
    private final Solution solution;
    private final ContrastTest test;
    private final int threads;

    private FeatureContrast(DataMatrix data, Solution solution, ContrastTest test, int threads) {
        this.data = Objects.requireNonNull(data, "data");
        this.solution = Objects.requireNonNull(solution, "solution");
        this.test = Objects.requireNonNull(test, "test");
        this.threads = threads;
        if (solution.samples() != data.samples()) {
            throw new IllegalArgumentException(solution.samples() + " labels for " + data.samples() + " samples");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be positive");
        }
    }

    /**
     * The comparison of {@code data} (samples in rows, no missing values: the prepared data) under
     * {@code solution}.
     */
    public static FeatureContrast of(DataMatrix data, Solution solution, ContrastTest test, int threads) {
        return new FeatureContrast(data, solution, test, threads);
    }

    /** Compares every feature with every cluster. */
    public FeatureTable compute() {
        int m = data.features();
        int k = solution.k();
        int[] rows = solution.clustered();
        int n = rows.length;
        int[] label = new int[n];
        int[] sizes = new int[k];
        for (int i = 0; i < n; i++) {
            label[i] = solution.label(rows[i]) - 1;
            sizes[label[i]]++;
        }
        for (int c = 0; c < k; c++) {
            if (n - sizes[c] < 1) {
                throw new IllegalArgumentException("cluster " + (c + 1) + " holds every clustered sample");
            }
        }
        var out = new Arrays2(k, m);
        int blocks = (m + BLOCK - 1) / BLOCK;
        if (threads == 1 || blocks == 1) {
            var w = new Work(n, label, sizes, out);
            for (int b = 0; b < blocks; b++) {
                w.block(rows, b * BLOCK, Math.min(m, (b + 1) * BLOCK));
            }
        } else {
            ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, blocks));
            try {
                int per = (blocks + threads * 4 - 1) / (threads * 4);
                List<Future<?>> tasks = new ArrayList<>();
                for (int b0 = 0; b0 < blocks; b0 += per) {
                    int from = b0;
                    int to = Math.min(blocks, b0 + per);
                    tasks.add(pool.submit(() -> {
                        var w = new Work(n, label, sizes, out);
                        for (int b = from; b < to; b++) {
                            w.block(rows, b * BLOCK, Math.min(m, (b + 1) * BLOCK));
                        }
                    }));
                }
                for (Future<?> f : tasks) {
                    f.get();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted", e);
            } catch (ExecutionException e) {
                if (e.getCause() instanceof RuntimeException r) {
                    throw r;
                }
                throw new IllegalStateException(e.getCause());
            } finally {
                pool.shutdownNow();
            }
        }
        double[][] q = new double[k][];
        int[][] order = new int[k][];
        for (int c = 0; c < k; c++) {
            q[c] = FalseDiscovery.benjaminiHochberg(out.p[c]);
            order[c] = rankOrder(out.auc[c], out.effect[c], out.p[c]);
        }
        return new FeatureTable(test, data.featureNames(), sizes, n, out.effect, out.auc, out.meanIn, out.meanOut,
                out.p, q, order);
    }

    /** Features by decreasing |AUC − 0.5|, then decreasing |d|, then increasing p, then input order. */
    private static int[] rankOrder(double[] auc, double[] d, double[] p) {
        Integer[] idx = new Integer[auc.length];
        for (int j = 0; j < idx.length; j++) {
            idx[j] = j;
        }
        Arrays.sort(idx, (a, b) -> {
            int c = Double.compare(Math.abs(auc[b] - 0.5), Math.abs(auc[a] - 0.5));
            if (c != 0) {
                return c;
            }
            c = Double.compare(abs(d[b]), abs(d[a]));
            if (c != 0) {
                return c;
            }
            c = Double.compare(p[a], p[b]);
            return c != 0 ? c : Integer.compare(a, b);
        });
        int[] out = new int[idx.length];
        for (int r = 0; r < out.length; r++) {
            out[r] = idx[r];
        }
        return out;
    }

    /** |x|, with NaN (no spread) last. */
    private static double abs(double x) {
        return Double.isNaN(x) ? -1 : Math.abs(x);
    }

    /** The result arrays, {@code [cluster][feature]}; each task writes only its own features. */
    private static final class Arrays2 {
        final double[][] effect;
        final double[][] auc;
        final double[][] meanIn;
        final double[][] meanOut;
        final double[][] p;

        Arrays2(int k, int m) {
            effect = new double[k][m];
            auc = new double[k][m];
            meanIn = new double[k][m];
            meanOut = new double[k][m];
            p = new double[k][m];
        }
    }

    /** One thread's scratch space. */
    private final class Work {
        private final int n;
        private final int[] label;
        private final int[] sizes;
        private final Arrays2 out;
        private final double[][] columns;
        private final double[] ranks;
        private final double[] sorted;
        private final double[] rankSum;
        private final double[] sum;
        private final double[] ss;

        Work(int n, int[] label, int[] sizes, Arrays2 out) {
            this.n = n;
            this.label = label;
            this.sizes = sizes;
            this.out = out;
            columns = new double[BLOCK][n];
            ranks = new double[n];
            sorted = new double[n];
            int k = sizes.length;
            rankSum = new double[k];
            sum = new double[k];
            ss = new double[k];
        }

        /** Features {@code from..to-1}: gathered as columns row by row (the data are row-major), then each tested. */
        void block(int[] rows, int from, int to) {
            int width = to - from;
            for (int i = 0; i < n; i++) {
                int r = rows[i];
                for (int b = 0; b < width; b++) {
                    columns[b][i] = data.get(r, from + b);
                }
            }
            for (int b = 0; b < width; b++) {
                feature(from + b, columns[b]);
            }
        }

        private void feature(int j, double[] x) {
            int k = sizes.length;
            double ties = Ranks.midranks(x, n, ranks, sorted);
            Arrays.fill(rankSum, 0);
            Arrays.fill(sum, 0);
            Arrays.fill(ss, 0);
            double total = 0;
            for (int i = 0; i < n; i++) {
                rankSum[label[i]] += ranks[i];
                sum[label[i]] += x[i];
                total += x[i];
            }
            double mean = total / n;
            double ssAll = 0;
            for (int i = 0; i < n; i++) {
                int c = label[i];
                double d = x[i] - sum[c] / sizes[c];
                ss[c] += d * d;
                double e = x[i] - mean;
                ssAll += e * e;
            }
            for (int c = 0; c < k; c++) {
                double n1 = sizes[c];
                double n2 = n - n1;
                double m1 = sum[c] / n1;
                double m2 = (total - sum[c]) / n2;
                // squares about the mean elsewhere, from the whole and the cluster (Huygens)
                double ssOut = ssAll + n * (mean - m2) * (mean - m2) - ss[c] - n1 * (m1 - m2) * (m1 - m2);
                ssOut = Math.max(0, ssOut);
                double u1 = rankSum[c] - n1 * (n1 + 1) / 2;
                out.meanIn[c][j] = m1;
                out.meanOut[c][j] = m2;
                out.auc[c][j] = u1 / (n1 * n2);
                double pooled = n > 2 ? Math.sqrt((ss[c] + ssOut) / (n - 2)) : Double.NaN;
                out.effect[c][j] = pooled > 0 ? (m1 - m2) / pooled : Double.NaN;
                out.p[c][j] = test == ContrastTest.WILCOXON ? rankSumP(u1, n1, n2, ties)
                        : welchP(m1, m2, ss[c], ssOut, n1, n2);
            }
        }
    }

    /** Two-sided p of the rank-sum test, normal approximation with tie and continuity corrections. */
    static double rankSumP(double u1, double n1, double n2, double ties) {
        double big = n1 + n2;
        double variance = n1 * n2 / 12.0 * ((big + 1) - ties / (big * (big - 1)));
        if (!(variance > 0)) {
            return 1.0;
        }
        double z = (Math.abs(u1 - n1 * n2 / 2) - 0.5) / Math.sqrt(variance);
        return Math.min(1.0, 2 * NORMAL.cumulativeProbability(-z));
    }

    /** Two-sided p of Welch's t-test from the means and sums of squared deviations. */
    static double welchP(double m1, double m2, double ss1, double ss2, double n1, double n2) {
        if (n1 < 2 || n2 < 2) {
            return Double.NaN;
        }
        double a = ss1 / (n1 - 1) / n1;
        double b = ss2 / (n2 - 1) / n2;
        double se2 = a + b;
        if (!(se2 > 0)) {
            return m1 == m2 ? 1.0 : 0.0;
        }
        double t = (m1 - m2) / Math.sqrt(se2);
        double df = se2 * se2 / (a * a / (n1 - 1) + b * b / (n2 - 1));
        return Math.min(1.0, 2 * new TDistribution(null, df).cumulativeProbability(-Math.abs(t)));
    }
}
