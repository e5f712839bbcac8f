package org.treeproof.data;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Hartigan's dip test of unimodality: J. A. Hartigan and P. M. Hartigan, "The dip test of unimodality", Ann.
 * Statist. 13 (1985) 70-84, doi:10.1214/aos/1176346577.
 *
 * <p>The dip of a sample is the largest distance (sup norm) from its empirical distribution function to the
 * nearest unimodal distribution function: about 0 for one mode, up to 1/4 for two far-apart halves. It is found as
 * in their algorithm: the greatest convex minorant of the empirical function's lower points and the least concave
 * majorant of its upper points are taken over a modal interval, which shrinks to where the two are farthest apart,
 * and the dip is half the largest departure seen outside it. Tied values are one jump of the empirical function.
 *
 * <p>The p-value is the share of uniform samples of the same size whose dip is at least as large: the uniform is the
 * least favourable unimodal distribution, asymptotically (their Theorem 3). It is read from a table of quantiles of
 * {@code sqrt(n) * dip} for uniform samples ({@link DipUniformTable}, made by {@code DipTableGenerator} in the
 * tests, by simulation), interpolated in {@code log n} and, between quantiles, in
 * the logarithm of the tail share. Beyond the table's last quantile the p-value is only known to be below its
 * level ({@link Result#pBelow()}).
 */
public final class DipTest {
    /** The smallest sample the test is applied to. */
    public static final int MIN_SAMPLES = 10;

    private static final Table TABLE = Table.load();

    private DipTest() {
    }

    /**
     * The dip of a sample with its p-value.
     *
     * @param dip    the dip statistic
     * @param n      the sample size
     * @param pValue the share of uniform samples of size n with a dip at least as large (from the table); when
     *               {@code pBelow} is true, an upper bound (the table's smallest level)
     * @param pBelow whether the dip lies beyond the table, so that the p-value is only known to be smaller
     */
    public record Result(double dip, int n, double pValue, boolean pBelow) {
    }

    /** The dip and its p-value; {@code values} are not changed. Needs at least {@link #MIN_SAMPLES} values. */
    public static Result test(double[] values) {
        if (values.length < MIN_SAMPLES) {
            throw new IllegalArgumentException("the dip test needs at least " + MIN_SAMPLES + " values");
        }
        double d = dip(values);
        return TABLE.pValue(d, values.length);
    }

    /** The dip statistic of {@code values} (not changed; NaN not allowed). */
    public static double dip(double[] values) {
        double[] x = values.clone();
        Arrays.sort(x);
        return dipOfSorted(x);
    }

    /** The dip statistic of values sorted in increasing order. */
    static double dipOfSorted(double[] x) {
        int n = x.length;
        // Distinct values with the empirical function's counts just below (lower) and at (upper) each.
        double[] v = new double[n];
        double[] lower = new double[n];
        double[] upper = new double[n];
        int m = 0;
        for (int i = 0; i < n;) {
            int j = i;
            while (j < n && x[j] == x[i]) {
                j++;
            }
            v[m] = x[i];
            lower[m] = i;
            upper[m] = j;
            m++;
            i = j;
        }
        if (m < 2) {
            return 0;
        }
        int[] g = new int[m];
        int[] l = new int[m];
        int lo = 0;
        int hi = m - 1;
        double dip = 0;
        while (true) {
            int ng = hull(v, lower, lo, hi, g, true);
            int nl = hull(v, upper, lo, hi, l, false);
            int tg = -1;
            double dg = Double.NEGATIVE_INFINITY;
            for (int a = 0; a < ng; a++) {
                double d = at(v, upper, l, nl, v[g[a]]) - lower[g[a]];
                if (d > dg) {
                    dg = d;
                    tg = g[a];
                }
            }
            int tl = -1;
            double dl = Double.NEGATIVE_INFINITY;
            for (int b = 0; b < nl; b++) {
                double d = upper[l[b]] - at(v, lower, g, ng, v[l[b]]);
                if (d > dl) {
                    dl = d;
                    tl = l[b];
                }
            }
            double d;
            int lo2;
            int hi2;
            if (dg >= dl) {
                d = dg;
                lo2 = tg;
                hi2 = firstAtLeast(l, nl, tg);
            } else {
                d = dl;
                hi2 = tl;
                lo2 = lastAtMost(g, ng, tl);
            }
            if (d <= dip) {
                break;
            }
            double left = 0;
            for (int i = lo; i <= lo2; i++) {
                left = Math.max(left, upper[i] - at(v, lower, g, ng, v[i]));
            }
            double right = 0;
            for (int i = hi2; i <= hi; i++) {
                right = Math.max(right, at(v, upper, l, nl, v[i]) - lower[i]);
            }
            dip = Math.max(dip, Math.max(left, right));
            if (lo2 == lo && hi2 == hi) {
                dip = Math.max(dip, d);
                break;
            }
            lo = lo2;
            hi = hi2;
        }
        return dip / (2.0 * n);
    }

    /**
     * The vertices (indices into {@code xs}, in order) of the greatest convex minorant ({@code convex}) or the least
     * concave majorant of the points {@code (xs[i], ys[i])}, {@code from <= i <= to}, xs strictly increasing.
     */
    private static int hull(double[] xs, double[] ys, int from, int to, int[] out, boolean convex) {
        int h = 0;
        for (int i = from; i <= to; i++) {
            while (h >= 2) {
                int a = out[h - 2];
                int b = out[h - 1];
                double lhs = (ys[b] - ys[a]) * (xs[i] - xs[a]);
                double rhs = (ys[i] - ys[a]) * (xs[b] - xs[a]);
                if (convex ? lhs >= rhs : lhs <= rhs) {
                    h--;
                } else {
                    break;
                }
            }
            out[h++] = i;
        }
        return h;
    }

    /** The piecewise-linear function through the vertices {@code idx[0..k)} of (xs, ys), at {@code q}. */
    private static double at(double[] xs, double[] ys, int[] idx, int k, double q) {
        if (q <= xs[idx[0]]) {
            return ys[idx[0]];
        }
        if (q >= xs[idx[k - 1]]) {
            return ys[idx[k - 1]];
        }
        int lo = 0;
        int hi = k - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (xs[idx[mid]] <= q) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double x0 = xs[idx[lo]];
        double x1 = xs[idx[hi]];
        if (q == x0) {
            return ys[idx[lo]];
        }
        return ys[idx[lo]] + (ys[idx[hi]] - ys[idx[lo]]) * (q - x0) / (x1 - x0);
    }

    private static int firstAtLeast(int[] idx, int k, int t) {
        for (int i = 0; i < k; i++) {
            if (idx[i] >= t) {
                return idx[i];
            }
        }
        return idx[k - 1];
    }

    private static int lastAtMost(int[] idx, int k, int t) {
        for (int i = k - 1; i >= 0; i--) {
            if (idx[i] <= t) {
                return idx[i];
            }
        }
        return idx[0];
    }

    /** The p-value of {@code dip} for a sample of size {@code n} from the table. */
    public static Result pValue(double dip, int n) {
        return TABLE.pValue(dip, n);
    }

    /** The smallest p-value the table can tell apart at size {@code n}. */
    public static double smallestLevel(int n) {
        return TABLE.smallestLevel(n);
    }

    /**
     * Quantiles of {@code sqrt(n) * dip} for uniform samples: for each tabulated n, the value exceeded by a share
     * {@code level} of the samples, for decreasing levels, the first being level 1 at 0.
     */
    private record Table(int[] sizes, List<double[]> levels, List<double[]> quantiles) {

        static Table load() {
            var levels = new ArrayList<double[]>();
            var quantiles = new ArrayList<double[]>();
            for (int i = 0; i < DipUniformTable.SIZES.length; i++) {
                levels.add(DipUniformTable.LEVELS[i].clone());
                quantiles.add(DipUniformTable.QUANTILES[i].clone());
            }
            return new Table(DipUniformTable.SIZES.clone(), levels, quantiles);
        }

        /** The tabulated size at or below {@code n} (the first for smaller n), and the weight of the next. */
        private int bracket(int n) {
            int i = Arrays.binarySearch(sizes, n);
            if (i >= 0) {
                return i;
            }
            return Math.max(0, -i - 2);
        }

        double smallestLevel(int n) {
            int i = bracket(n);
            double[] a = levels.get(i);
            double s = a[a.length - 1];
            if (i + 1 < sizes.length && n > sizes[i]) {
                double[] b = levels.get(i + 1);
                s = Math.max(s, b[b.length - 1]);
            }
            return s;
        }

        Result pValue(double dip, int n) {
            double s = Math.sqrt(n) * dip;
            int i = bracket(n);
            if (n <= sizes[0] || i + 1 >= sizes.length || n == sizes[i]) {
                return tail(s, levels.get(i), quantiles.get(i), dip, n);
            }
            // Quantiles at n interpolated in log n over the levels both sizes have.
            double w = (Math.log(n) - Math.log(sizes[i])) / (Math.log(sizes[i + 1]) - Math.log(sizes[i]));
            double[] la = levels.get(i);
            double[] lb = levels.get(i + 1);
            int k = Math.min(la.length, lb.length);
            double[] lv = Arrays.copyOf(la, k);
            double[] q = new double[k];
            for (int j = 0; j < k; j++) {
                q[j] = (1 - w) * quantiles.get(i)[j] + w * quantiles.get(i + 1)[j];
            }
            return tail(s, lv, q, dip, n);
        }

        private static Result tail(double s, double[] lv, double[] q, double dip, int n) {
            if (s <= q[0]) {
                return new Result(dip, n, lv[0], false);
            }
            for (int j = 1; j < q.length; j++) {
                if (s <= q[j]) {
                    double t = (s - q[j - 1]) / (q[j] - q[j - 1]);
                    double logP = Math.log(lv[j - 1]) + t * (Math.log(lv[j]) - Math.log(lv[j - 1]));
                    return new Result(dip, n, Math.exp(logP), false);
                }
            }
            return new Result(dip, n, lv[lv.length - 1], true);
        }
    }
}
