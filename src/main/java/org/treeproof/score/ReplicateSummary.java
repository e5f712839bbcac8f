package org.treeproof.score;

import java.util.Arrays;

/**
 * Mean, standard deviation and percentile interval of one score over replicates (for example the
 * adjusted Rand index of each replicate with the reference).
 *
 * <p>The standard deviation is the sample one (divisor {@code count - 1}), {@code NaN} for fewer than
 * two values. The interval's ends are the {@code (1-level)/2} and {@code (1+level)/2} quantiles by
 * linear interpolation between order statistics: with the values sorted as {@code x_0 ≤ … ≤ x_(m-1)},
 * the {@code q}-quantile is {@code x_j + g (x_(j+1) - x_j)} where {@code h = (m - 1) q},
 * {@code j = floor(h)}, {@code g = h - j}. This is definition 7 of R. J. Hyndman and Y. Fan, "Sample
 * quantiles in statistical packages", The American Statistician 50 (1996) 361-365,
 * doi:10.1080/00031305.1996.10473566, and the default of numpy's {@code percentile}. With no values
 * everything is {@code NaN}.
 *
 * @param count the number of values
 * @param mean  their mean
 * @param sd    their sample standard deviation
 * @param low   the lower end of the interval
 * @param high  the upper end of the interval
 * @param level the interval's coverage, e.g. 0.95
 */
public record ReplicateSummary(int count, double mean, double sd, double low, double high, double level) {
    /** The coverage used by {@link #of(double[])}. */
    public static final double DEFAULT_LEVEL = 0.95;

    public ReplicateSummary {
        if (count < 0) {
            throw new IllegalArgumentException("negative count " + count);
        }
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("interval level " + level + " is not between 0 and 1");
        }
        if (count > 0 && !(low <= high)) {
            throw new IllegalArgumentException("interval [" + low + ", " + high + "] is empty");
        }
    }

    /** The summary with a 95% percentile interval. */
    public static ReplicateSummary of(double[] values) {
        return of(values, DEFAULT_LEVEL);
    }

    /**
     * The summary with a percentile interval of the given coverage.
     *
     * @throws IllegalArgumentException if a value is {@code NaN} or infinite
     */
    public static ReplicateSummary of(double[] values, double level) {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("interval level " + level + " is not between 0 and 1");
        }
        int m = values.length;
        if (m == 0) {
            return new ReplicateSummary(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, level);
        }
        double[] sorted = values.clone();
        double sum = 0;
        for (double v : sorted) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("value " + v + " cannot be summarised");
            }
            sum += v;
        }
        double mean = sum / m;
        double sd = Double.NaN;
        if (m > 1) {
            double ss = 0;
            for (double v : sorted) {
                ss += (v - mean) * (v - mean);
            }
            sd = Math.sqrt(ss / (m - 1));
        }
        Arrays.sort(sorted);
        double tail = (1 - level) / 2;
        return new ReplicateSummary(m, mean, sd, quantile(sorted, tail), quantile(sorted, 1 - tail), level);
    }

    /** The {@code q}-quantile of sorted values by linear interpolation (see the type's description). */
    static double quantile(double[] sorted, double q) {
        double h = (sorted.length - 1) * q;
        int j = (int) Math.floor(h);
        if (j >= sorted.length - 1) {
            return sorted[sorted.length - 1];
        }
        double g = h - j;
        double a = sorted[j];
        double b = sorted[j + 1];
        // interpolate from the nearer end, as numpy does, so equal neighbours give exactly that value
        return g < 0.5 ? a + (b - a) * g : b - (b - a) * (1 - g);
    }
}
