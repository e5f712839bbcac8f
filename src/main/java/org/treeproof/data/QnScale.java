package org.treeproof.data;

import java.util.Arrays;

/**
 * The scale estimator Q<sub>n</sub> of P. J. Rousseeuw and C. Croux, "Alternatives to the median absolute
 * deviation", J. Am. Stat. Assoc. 88 (1993) 1273-1283, doi:10.1080/01621459.1993.10476408:
 * {@code Qn = d · c_n · {|x_i − x_j|; i < j}_(k)}, the k-th smallest of the pairwise distances with
 * {@code k = C(h, 2)}, {@code h = ⌊n/2⌋ + 1}, and {@code d = 1 / (√2 · Φ⁻¹(5/8))} for consistency at the normal.
 * No small-sample factor is applied (as in statsmodels' {@code qn_scale}): its only use here, the scales of the
 * null's axes, depends on their ratios alone.
 *
 * <p>Like the median absolute deviation it tolerates up to half of the values being far out, but it needs no
 * location and is not inflated when the values gather in two modes: the k-th pairwise distance falls among the
 * distances within a mode, where the MAD measures the distance of the modes from the median.
 *
 * <p>The k-th smallest distance is found exactly by bisection over the ordered bit patterns of non-negative
 * doubles, counting the pairs at most a candidate apart with two pointers over the sorted values (floating
 * subtraction is monotone, so the count is exact for the computed differences): {@code O(n log n + 64 n)}.
 */
public final class QnScale {
    /** 1 / (√2 Φ⁻¹(5/8)), the normal consistency factor. */
    static final double CONSISTENCY = 2.219144465985076;

    private QnScale() {
    }

    /** Qn of {@code values} (not modified); 0 for fewer than two values. */
    public static double of(double[] values) {
        int n = values.length;
        if (n < 2) {
            return 0;
        }
        double[] x = values.clone();
        Arrays.sort(x);
        long h = n / 2 + 1;
        long k = h * (h - 1) / 2;
        long lo = 0;
        long hi = Double.doubleToLongBits(x[n - 1] - x[0]);
        while (lo < hi) {
            long mid = lo + (hi - lo) / 2;
            if (atMost(x, Double.longBitsToDouble(mid)) >= k) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return CONSISTENCY * Double.longBitsToDouble(lo);
    }

    /** The number of pairs i < j of the sorted {@code x} with {@code x[j] − x[i] ≤ d}. */
    private static long atMost(double[] x, double d) {
        long count = 0;
        int i = 0;
        for (int j = 1; j < x.length; j++) {
            while (x[j] - x[i] > d) {
                i++;
            }
            count += j - i;
        }
        return count;
    }
}
