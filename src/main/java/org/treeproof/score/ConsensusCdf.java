package org.treeproof.score;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The empirical distribution function of the consensus values at one k, the area under it, and its relative
 * change from k − 1: S. Monti, P. Tamayo, J. Mesirov and T. Golub, "Consensus clustering: a resampling-based
 * method for class discovery and visualization of gene expression microarray data", Machine Learning 52 (2003)
 * 91-118, doi:10.1023/A:1023949509487.
 *
 * <p>{@code F(x)} is the share of item pairs (those co-sampled at least once, as in {@link ConsensusDistribution})
 * with consensus at most x. The area is the exact area under this step function on [0, 1],
 * {@code A(k) = Σ_{i<m} (x_{i+1} − x_i) F(x_i) + (1 − x_m)} over the distinct values {@code x_1 < … < x_m}
 * (equal to one minus the mean consensus value). Monti et al. write the area as a sum over the sorted consensus
 * values; ours is the exact integral of the empirical CDF, which needs no choice of end point. The change in area
 * is {@code ΔA(2) = A(2)} and {@code ΔA(k) = (A(k) − A(k−1)) / A(k−1)} for k ≥ 3 (NaN when A(k−1) is 0): a
 * large change means k separates pairs that k − 1 left ambiguous; where it levels off, more clusters add little.
 *
 * @param k         the number of clusters
 * @param x         the distinct consensus values, increasing
 * @param f         the CDF at each of them, non-decreasing, the last 1
 * @param area      the area under the CDF on [0, 1]
 * @param deltaArea the relative change in area from k − 1 (NaN when not known, as for a lone k)
 */
public record ConsensusCdf(int k, double[] x, double[] f, double area, double deltaArea) {
    /** The most points {@link #points(int)} gives by default for outputs. */
    public static final int OUTPUT_POINTS = 201;

    public ConsensusCdf {
        x = x.clone();
        f = f.clone();
        if (x.length != f.length) {
            throw new IllegalArgumentException("x and f differ in length");
        }
    }

    /** The CDF of one distribution, its change in area not yet known (NaN). */
    public static ConsensusCdf of(ConsensusDistribution d) {
        double[] x = d.values();
        double[] f = d.cumulativeShares();
        return new ConsensusCdf(d.k(), x, f, area(x, f), Double.NaN);
    }

    /**
     * The CDFs of consecutive k (the first being 2 or any k whose predecessor is not given), each with its change
     * in area from the one before.
     */
    public static List<ConsensusCdf> series(List<ConsensusDistribution> byK) {
        var out = new ArrayList<ConsensusCdf>(byK.size());
        ConsensusCdf previous = null;
        for (ConsensusDistribution d : byK) {
            ConsensusCdf c = of(d);
            double delta;
            if (previous != null && previous.k == c.k - 1) {
                delta = previous.area > 0 ? (c.area - previous.area) / previous.area : Double.NaN;
            } else if (c.k == 2) {
                delta = c.area;
            } else {
                delta = Double.NaN;
            }
            c = new ConsensusCdf(c.k, c.x, c.f, c.area, delta);
            out.add(c);
            previous = c;
        }
        return List.copyOf(out);
    }

    private static double area(double[] x, double[] f) {
        int m = x.length;
        if (m == 0) {
            return Double.NaN;
        }
        double a = 0;
        for (int i = 0; i + 1 < m; i++) {
            a += (x[i + 1] - x[i]) * f[i];
        }
        return a + (1 - x[m - 1]);
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] f() {
        return f.clone();
    }

    /**
     * The CDF as {@code [x, F(x)]} points for an output: every distinct value when there are at most
     * {@code maxPoints}; otherwise the CDF at the evenly spaced points {@code j / (maxPoints − 1)}, each exact
     * (decided on the fractions by {@code d}), so the list always ends at x = 1, F = 1.
     *
     * @param d         the distribution this CDF was made from (for exact values at grid points)
     * @param maxPoints at least 2
     */
    public double[][] points(ConsensusDistribution d, int maxPoints) {
        if (maxPoints < 2) {
            throw new IllegalArgumentException("need at least 2 points");
        }
        if (d.k() != k || d.counts().length != x.length) {
            throw new IllegalArgumentException("the distribution is not this CDF's");
        }
        if (x.length <= maxPoints) {
            double[][] p = new double[x.length][];
            for (int i = 0; i < x.length; i++) {
                p[i] = new double[] {x[i], f[i]};
            }
            return p;
        }
        double[][] p = new double[maxPoints][];
        BigDecimal steps = BigDecimal.valueOf(maxPoints - 1L);
        for (int j = 0; j < maxPoints; j++) {
            BigDecimal at = BigDecimal.valueOf(j).divide(steps, java.math.MathContext.DECIMAL128);
            p[j] = new double[] {(double) j / (maxPoints - 1), j == maxPoints - 1 ? 1.0 : d.shareAtMost(at)};
        }
        return p;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ConsensusCdf c && c.k == k && Arrays.equals(c.x, x) && Arrays.equals(c.f, f)
                && Double.compare(c.area, area) == 0 && Double.compare(c.deltaArea, deltaArea) == 0;
    }

    @Override
    public int hashCode() {
        return 31 * k + Arrays.hashCode(x);
    }

    @Override
    public String toString() {
        return "ConsensusCdf[k=" + k + ", " + x.length + " values, area " + area + ", deltaArea " + deltaArea + "]";
    }
}
