package org.treeproof.chart;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Seeded synthetic inputs for the chart tests and the look demo: points in well-separated groups and a
 * plain agglomerative clustering of them, written here from the Lance-Williams recurrence
 * (G. N. Lance and W. T. Williams, Computer Journal 9 (1967) 373-380, doi:10.1093/comjnl/9.4.373) so that
 * the chart tests do not depend on the tree package.
 */
final class Synthetic {
    private Synthetic() {
    }

    /** {@code n} points in {@code dims} dimensions around {@code groups} centres; labels in {@code truth}. */
    static double[][] points(SplittableRandom rnd, int n, int dims, int groups, double spread, int[] truth) {
        double[][] centres = new double[groups][dims];
        for (double[] c : centres) {
            for (int d = 0; d < dims; d++) {
                c[d] = rnd.nextGaussian() * 4;
            }
        }
        double[][] x = new double[n][dims];
        for (int i = 0; i < n; i++) {
            int gr = (int) ((long) i * groups / n);
            truth[i] = gr;
            for (int d = 0; d < dims; d++) {
                x[i][d] = centres[gr][d] + rnd.nextGaussian() * spread;
            }
        }
        return x;
    }

    /** Merges {left, right} and heights from average linkage (UPGMA) by the nearest-neighbour chain. */
    static ChartTree average(double[][] x) {
        int n = x.length;
        double[][] d = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double s = 0;
                for (int t = 0; t < x[i].length; t++) {
                    double e = x[i][t] - x[j][t];
                    s += e * e;
                }
                d[i][j] = Math.sqrt(s);
                d[j][i] = d[i][j];
            }
        }
        int[] size = new int[n];
        Arrays.fill(size, 1);
        int[] node = new int[n];
        for (int i = 0; i < n; i++) {
            node[i] = i;
        }
        boolean[] active = new boolean[n];
        Arrays.fill(active, true);
        double[][] merges = new double[n - 1][3];
        int[] chain = new int[n];
        int len = 0;
        for (int step = 0; step < n - 1; step++) {
            if (len == 0) {
                int first = 0;
                while (!active[first]) {
                    first++;
                }
                chain[len++] = first;
            }
            while (true) {
                int a = chain[len - 1];
                int prev = len > 1 ? chain[len - 2] : -1;
                int best = prev;
                double bestD = prev >= 0 ? d[a][prev] : Double.POSITIVE_INFINITY;
                for (int j = 0; j < n; j++) {
                    if (active[j] && j != a && d[a][j] < bestD) {
                        bestD = d[a][j];
                        best = j;
                    }
                }
                if (best == prev) {
                    break;
                }
                chain[len++] = best;
            }
            int a = chain[--len];
            int b = chain[--len];
            int lo = Math.min(a, b);
            int hi = Math.max(a, b);
            merges[step] = new double[] {node[lo], node[hi], d[a][b]};
            for (int j = 0; j < n; j++) {
                if (active[j] && j != lo && j != hi) {
                    double v = (size[lo] * d[lo][j] + size[hi] * d[hi][j]) / (size[lo] + size[hi]);
                    d[lo][j] = v;
                    d[j][lo] = v;
                }
            }
            active[hi] = false;
            size[lo] += size[hi];
            node[lo] = n + step;
        }
        return sorted(n, merges);
    }

    /**
     * Centroid linkage by the naive generic algorithm on squared Euclidean distances, which produces
     * inversions; heights are reported as square roots. O(n^3): for small n only.
     */
    static ChartTree centroid(double[][] x) {
        int n = x.length;
        double[][] d = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int t = 0; t < x[i].length; t++) {
                    double e = x[i][t] - x[j][t];
                    s += e * e;
                }
                d[i][j] = s;
            }
        }
        int[] size = new int[n];
        Arrays.fill(size, 1);
        int[] node = new int[n];
        for (int i = 0; i < n; i++) {
            node[i] = i;
        }
        boolean[] active = new boolean[n];
        Arrays.fill(active, true);
        int[] left = new int[n - 1];
        int[] right = new int[n - 1];
        double[] h = new double[n - 1];
        for (int step = 0; step < n - 1; step++) {
            int ba = -1;
            int bb = -1;
            double best = Double.POSITIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; active[i] && j < n; j++) {
                    if (active[j] && d[i][j] < best) {
                        best = d[i][j];
                        ba = i;
                        bb = j;
                    }
                }
            }
            left[step] = node[ba];
            right[step] = node[bb];
            h[step] = Math.sqrt(best);
            double na = size[ba];
            double nb = size[bb];
            for (int j = 0; j < n; j++) {
                if (active[j] && j != ba && j != bb) {
                    double v = (na * d[ba][j] + nb * d[bb][j]) / (na + nb) - na * nb * d[ba][bb] / ((na + nb) * (na + nb));
                    d[ba][j] = v;
                    d[j][ba] = v;
                }
            }
            active[bb] = false;
            size[ba] += size[bb];
            node[ba] = n + step;
        }
        return ChartTree.leftFirst(n, left, right, h);
    }

    /** Re-numbers merges in order of height (the chain finds them out of order), keeping children first. */
    private static ChartTree sorted(int n, double[][] merges) {
        Integer[] idx = new Integer[n - 1];
        for (int i = 0; i < n - 1; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (p, q) -> Double.compare(merges[p][2], merges[q][2]));
        int[] newId = new int[2 * n - 1];
        for (int i = 0; i < n; i++) {
            newId[i] = i;
        }
        for (int r = 0; r < n - 1; r++) {
            newId[n + idx[r]] = n + r;
        }
        int[] left = new int[n - 1];
        int[] right = new int[n - 1];
        double[] h = new double[n - 1];
        for (int r = 0; r < n - 1; r++) {
            double[] m = merges[idx[r]];
            int a = newId[(int) m[0]];
            int b = newId[(int) m[1]];
            left[r] = Math.min(a, b);
            right[r] = Math.max(a, b);
            h[r] = m[2];
        }
        return ChartTree.leftFirst(n, left, right, h);
    }

    /** The labels when the first {@code n-k} merges are applied, numbered 0..k-1 in order of first leaf. */
    static int[] cut(ChartTree t, int k) {
        int n = t.leafCount();
        int[] parent = new int[2 * n - 1];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        int[] left = t.left();
        int[] right = t.right();
        for (int s = 0; s < n - k; s++) {
            parent[left[s]] = n + s;
            parent[right[s]] = n + s;
        }
        int[] label = new int[n];
        int[] map = new int[2 * n - 1];
        Arrays.fill(map, -1);
        int next = 0;
        for (int i = 0; i < n; i++) {
            int r = i;
            while (parent[r] != r) {
                r = parent[r];
            }
            if (map[r] < 0) {
                map[r] = next++;
            }
            label[i] = map[r];
        }
        return label;
    }

    /** A plausible support value per merge: high for the big groups, noisy for the small ones. */
    static double[] support(SplittableRandom rnd, ChartTree t) {
        int n = t.leafCount();
        double[] s = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            double base = 0.35 + 0.6 * i / (n - 1.0);
            s[i] = Math.max(0, Math.min(1, base + rnd.nextGaussian() * 0.12));
        }
        return s;
    }

    static String[] names(String prefix, int n) {
        String[] s = new String[n];
        for (int i = 0; i < n; i++) {
            s[i] = prefix + String.format("%04d", i + 1);
        }
        return s;
    }

    /** The height at which the tree has {@code k} groups: halfway between merge n-k-1 and merge n-k. */
    static double cutHeight(ChartTree t, int k) {
        double[] h = t.height();
        int n = t.leafCount();
        return (h[n - k - 1] + h[n - k]) / 2;
    }

    /** Silhouette widths (Rousseeuw 1987) of {@code label} on Euclidean distances; 0 for a lone member. */
    static double[] silhouette(double[][] x, int[] label, int k) {
        int n = x.length;
        double[] out = new double[n];
        int[] size = new int[k];
        for (int l : label) {
            size[l]++;
        }
        for (int i = 0; i < n; i++) {
            double[] sum = new double[k];
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    double s = 0;
                    for (int t = 0; t < x[i].length; t++) {
                        double e = x[i][t] - x[j][t];
                        s += e * e;
                    }
                    sum[label[j]] += Math.sqrt(s);
                }
            }
            int own = label[i];
            if (size[own] == 1) {
                continue;
            }
            double a = sum[own] / (size[own] - 1);
            double b = Double.POSITIVE_INFINITY;
            for (int c = 0; c < k; c++) {
                if (c != own && size[c] > 0) {
                    b = Math.min(b, sum[c] / size[c]);
                }
            }
            out[i] = (b - a) / Math.max(a, b);
        }
        return out;
    }

    /** A stability curve peaking at {@code peak}: mean ARI per k with a 95% interval. */
    static IntervalSeries stabilityCurve(SplittableRandom rnd, String name, int[] k, int peak, double top) {
        double[] m = new double[k.length];
        double[] lo = new double[k.length];
        double[] hi = new double[k.length];
        for (int i = 0; i < k.length; i++) {
            double v = top - 0.07 * Math.abs(k[i] - peak) - 0.02 * rnd.nextDouble();
            m[i] = Math.max(0.05, Math.min(1, v));
            double half = 0.04 + 0.02 * Math.abs(k[i] - peak) + 0.02 * rnd.nextDouble();
            lo[i] = Math.max(-0.05, m[i] - half);
            hi[i] = Math.min(1, m[i] + half * 0.7);
        }
        return new IntervalSeries(name, m, lo, hi);
    }

    static IntervalSeries referenceCurve(int[] k) {
        double[] m = new double[k.length];
        double[] lo = new double[k.length];
        double[] hi = new double[k.length];
        for (int i = 0; i < k.length; i++) {
            m[i] = 0.32 - 0.015 * k[i];
            lo[i] = m[i] - 0.12;
            hi[i] = m[i] + 0.1;
        }
        return new IntervalSeries("no structure", m, lo, hi);
    }

    /** A plausible consensus matrix (condensed): high within clusters, low between, clusters 0 and 1 blurred. */
    static double[] consensus(SplittableRandom rnd, int[] label) {
        int n = label.length;
        double[] c = new double[n * (n - 1) / 2];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double v;
                if (label[i] == label[j]) {
                    v = 0.78 + 0.22 * rnd.nextDouble();
                } else if (label[i] + label[j] == 1) {
                    v = 0.25 + 0.3 * rnd.nextDouble();
                } else {
                    v = 0.08 * rnd.nextDouble();
                }
                c[t++] = v;
            }
        }
        return c;
    }

    /** Loadings of {@code p} features on the latent dimensions, in a few feature groups. */
    static double[][] loadings(SplittableRandom rnd, int dims, int p) {
        double[][] w = new double[p][dims];
        for (int j = 0; j < p; j++) {
            int group = j % (dims + 1);
            for (int d = 0; d < dims; d++) {
                w[j][d] = (d == group ? 1.0 : 0.0) * (0.6 + 0.4 * rnd.nextDouble()) + 0.1 * rnd.nextGaussian();
            }
        }
        return w;
    }

    /** Row-major data: latent points times loadings plus noise. */
    static double[] data(SplittableRandom rnd, double[][] x, double[][] w) {
        int n = x.length;
        int p = w.length;
        double[] v = new double[n * p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                double s = 0;
                for (int d = 0; d < x[i].length; d++) {
                    s += x[i][d] * w[j][d];
                }
                v[i * p + j] = 10 + s + rnd.nextGaussian() * 1.5;
            }
        }
        return v;
    }
}
