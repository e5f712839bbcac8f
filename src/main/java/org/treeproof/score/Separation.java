package org.treeproof.score;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.DipTest;
import org.treeproof.partition.Clustering;

/**
 * Whether each cluster is set apart from its nearest cluster by a dip in density, or is a piece cut from a
 * continuum. Stability and the excess over a unimodal null cannot tell these apart: the pieces of a long curved
 * chain are recovered in every replicate and beat a Gaussian null with the chain's own spread, yet nothing
 * separates one piece from the next.
 *
 * <p>For each cluster A and its nearest cluster B (closest centroids), let S be the smaller of the two and L the
 * larger. The members of L nearest to S's centroid ({@link #NEAR_SHARE} of L, at least as many as S has) are taken
 * with the members of S: a local sample, since the far side of L says nothing about the boundary and, when L is a
 * long curved piece, folds back on the line. Each sample is placed on the line joining the two centroids, its own
 * cluster's centroid computed without it (leave-one-out, so that in data with many features a sample's own noise,
 * which pulls its cluster's centroid towards it, does not separate the clusters by itself). The two sides are
 * weighed equally (each position of S counted round(h/|S|) times, h the members of L taken), since a small group
 * beside a large one would otherwise weigh too little to show a second mode, and Hartigan's dip test of unimodality
 * is applied, its p-value read at the effective size of two equally weighed samples ({@link #effectiveSize}):
 * J. A. Hartigan and P. M. Hartigan, "The dip test of unimodality", Ann. Statist. 13 (1985) 70-84,
 * doi:10.1214/aos/1176346577 ({@link DipTest}). Two groups with a gap between them give two modes; the two sides of a
 * cut through a continuum give one. Testing unimodality along the line between two clusters follows the projection
 * tests of cluster splits (for instance A. Kalogeratos and A. Likas, "Dip-means: an incremental clustering method
 * for estimating the number of clusters", NIPS 25 (2012)); the local sample, the equal weights and the leave-one-out
 * centroids are our choices.
 *
 * <p>The solution's p-value is the largest over its clusters: every cluster must be separated, and as an
 * intersection-union test the solution is then separated at the level each test uses. The clusters being found
 * from the same data, the p-values are a screen for a density gap rather than exact error rates.
 *
 * <p>Outliers take no part. A pair whose smaller cluster has fewer than {@link DipTest#MIN_SAMPLES}/2 members is
 * not assessed; without an assessed pair the result is not available.
 */
public final class Separation {
    private Separation() {
    }

    /**
     * The test of one cluster against its nearest.
     *
     * @param cluster the cluster (0-based label)
     * @param nearest its nearest cluster (0-based label)
     * @param samples the samples tested (the smaller cluster and the members of the larger taken)
     * @param dip     the dip of their positions on the line joining the two centroids
     * @param pValue  the dip test's p-value; when {@code pBelow}, an upper bound
     * @param pBelow  whether the dip lies beyond the p-value table
     */
    public record Pair(int cluster, int nearest, int samples, double dip, double pValue, boolean pBelow) {
    }

    /**
     * Every cluster's test.
     *
     * @param clusters per cluster, in label order (clusters too small to assess are left out)
     */
    public record Result(List<Pair> clusters) {
        public Result {
            clusters = List.copyOf(clusters);
        }

        /** The solution's p-value: the largest over its clusters; NaN when no pair could be assessed. */
        public double pValue() {
            return clusters.stream().mapToDouble(Pair::pValue).max().orElse(Double.NaN);
        }

        /** Whether any pair was assessed. */
        public boolean assessed() {
            return !clusters.isEmpty();
        }
    }

    /**
     * The separation of the clusters of {@code clustering} in the rows of {@code data} (Euclidean geometry).
     *
     * @throws IllegalArgumentException if the sizes differ or a value is missing
     */
    public static Result of(DataMatrix data, Clustering clustering) {
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(clustering, "clustering");
        if (data.samples() != clustering.size()) {
            throw new IllegalArgumentException("the data have " + data.samples() + " samples but the clustering "
                    + clustering.size());
        }
        int k = clustering.k();
        int p = data.features();
        int[] sizes = clustering.clusterSizes();
        int[][] members = new int[k][];
        for (int c = 0; c < k; c++) {
            members[c] = new int[sizes[c]];
        }
        int[] fill = new int[k];
        double[][] centroid = new double[k][p];
        double[] row = new double[p];
        for (int i = 0; i < clustering.size(); i++) {
            int c = clustering.label(i);
            if (c < 0) {
                continue;
            }
            members[c][fill[c]++] = i;
            data.copyRow(i, row, 0);
            for (int f = 0; f < p; f++) {
                centroid[c][f] += row[f];
            }
        }
        for (int c = 0; c < k; c++) {
            for (int f = 0; f < p; f++) {
                centroid[c][f] /= sizes[c];
                if (Double.isNaN(centroid[c][f])) {
                    throw new IllegalArgumentException("feature " + data.featureNames().get(f)
                            + " has missing values; the separation test needs complete data");
                }
            }
        }
        var pairs = new ArrayList<Pair>();
        var tested = new java.util.HashMap<Integer, DipTest.Result>();   // a pair's test, by its smaller and larger
        for (int a = 0; a < k; a++) {
            int b = nearest(centroid, a);
            if (b < 0) {
                continue;
            }
            boolean aSmaller = sizes[a] < sizes[b] || (sizes[a] == sizes[b] && a < b);
            int s = aSmaller ? a : b;
            int l = aSmaller ? b : a;
            int m = sizes[s];
            if (2 * m < DipTest.MIN_SAMPLES) {
                continue;
            }
            int h = Math.max(m, (int) Math.ceil(NEAR_SHARE * sizes[l]));
            DipTest.Result r = tested.computeIfAbsent(s * k + l, key -> {
                int[] near = nearestMembers(data, members[l], centroid[s], h);
                int copies = (int) Math.round((double) h / m);
                double[] positions = new double[m * copies + h];
                int t = 0;
                for (int i : members[s]) {
                    double v = position(data, i, row, centroid[s], sizes[s], centroid[l]);
                    for (int c = 0; c < copies; c++) {
                        positions[t++] = v;
                    }
                }
                for (int i : near) {
                    positions[t++] = -position(data, i, row, centroid[l], sizes[l], centroid[s]);
                }
                return DipTest.pValue(DipTest.dip(positions), effectiveSize(m, h));
            });
            pairs.add(new Pair(a, b, m + h, r.dip(), r.pValue(), r.pBelow()));
        }
        return new Result(pairs);
    }

    /**
     * The share of the larger cluster compared with the smaller: the members nearest the smaller cluster's centroid,
     * at least as many as the smaller has. Our choice: a quarter of a Gaussian cluster nearest a point outside it
     * begins about 0.7 SD short of its centre, where the density is still about 80% of the peak, so the larger
     * cluster's mode is seen rather than only its tail (with as many as the smaller has, a group of 12 beside one of
     * 400 compared only the 3% tail facing it, and a gap of 6 SDs looked closed); and it stays local, so the far side
     * of a long curved piece, whose projection folds back, is left out (with half, two halves of a curved chain
     * looked bimodal). Tried on the judgement suite's draws 0 and 2 (bench/judgement/README.md).
     */
    public static final double NEAR_SHARE = 0.25;

    /**
     * The effective sample size of two samples of {@code m} and {@code h} values weighed equally: the size whose
     * empirical distribution function has the same variance at the median, 1 / (1/(4m) + 1/(4h)) = 4mh / (m + h);
     * 2m when h = m.
     */
    static int effectiveSize(int m, int h) {
        return (int) Math.round(4.0 * m * h / (m + h));
    }

    /** The cluster whose centroid is closest to {@code a}'s (the lower label on ties); -1 with one cluster. */
    private static int nearest(double[][] centroid, int a) {
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int b = 0; b < centroid.length; b++) {
            if (b == a) {
                continue;
            }
            double d = squared(centroid[a], centroid[b]);
            if (d < bestD) {
                bestD = d;
                best = b;
            }
        }
        return best;
    }

    /** The {@code m} of {@code members} closest to {@code centre} (ties: the earlier sample). */
    private static int[] nearestMembers(DataMatrix data, int[] members, double[] centre, int m) {
        double[] row = new double[data.features()];
        Integer[] order = new Integer[members.length];
        double[] d = new double[members.length];
        for (int t = 0; t < members.length; t++) {
            order[t] = t;
            data.copyRow(members[t], row, 0);
            d[t] = squared(row, centre);
        }
        Arrays.sort(order, (x, y) -> d[x] != d[y] ? Double.compare(d[x], d[y]) : Integer.compare(x, y));
        int[] out = new int[m];
        for (int t = 0; t < m; t++) {
            out[t] = members[order[t]];
        }
        return out;
    }

    /**
     * Sample {@code i}'s position on the line from the other centroid to its own, its own centroid computed
     * without it, measured from the midpoint of the two (positive: on its own side).
     */
    private static double position(DataMatrix data, int i, double[] row, double[] own, int ownSize, double[] other) {
        data.copyRow(i, row, 0);
        double norm = 0;
        double s = 0;
        for (int f = 0; f < row.length; f++) {
            double o = ownSize > 1 ? (ownSize * own[f] - row[f]) / (ownSize - 1) : own[f];
            double dir = o - other[f];
            norm += dir * dir;
            s += (row[f] - (o + other[f]) / 2) * dir;
        }
        return norm == 0 ? 0 : s / Math.sqrt(norm);
    }

    private static double squared(double[] x, double[] y) {
        double s = 0;
        for (int f = 0; f < x.length; f++) {
            double d = x[f] - y[f];
            s += d * d;
        }
        return s;
    }
}
