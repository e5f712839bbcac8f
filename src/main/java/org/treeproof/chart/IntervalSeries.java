package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * A named series of means with an interval around each, e.g. one linkage's mean adjusted Rand index per
 * number of clusters with its 95% interval over replicates.
 *
 * <p>A position may have no value (a linkage with no cut into that many clusters of the smallest size): mean, low
 * and high are then all NaN, and the chart leaves a gap there.
 *
 * @param name a short name for the key, e.g. "average"
 * @param mean the means, finite, or NaN where the position has no value
 * @param low  the lower ends, finite and not above the mean (NaN with it)
 * @param high the upper ends, finite and not below the mean (NaN with it)
 */
public record IntervalSeries(String name, double[] mean, double[] low, double[] high) {

    public IntervalSeries {
        Check.text(name, "name");
        Objects.requireNonNull(mean, "mean");
        mean = mean.clone();
        Objects.requireNonNull(low, name + " low");
        Objects.requireNonNull(high, name + " high");
        Check.length(low.length, mean.length, name + " low");
        Check.length(high.length, mean.length, name + " high");
        low = low.clone();
        high = high.clone();
        for (int i = 0; i < mean.length; i++) {
            if (Double.isNaN(mean[i]) && Double.isNaN(low[i]) && Double.isNaN(high[i])) {
                continue;   // no value at this position
            }
            if (!Double.isFinite(mean[i]) || !Double.isFinite(low[i]) || !Double.isFinite(high[i])) {
                throw new IllegalArgumentException(name + " at position " + i + ": mean " + mean[i] + " in ["
                        + low[i] + ", " + high[i] + "]; all three must be finite, or all NaN for no value");
            }
            if (low[i] > mean[i] || high[i] < mean[i]) {
                throw new IllegalArgumentException(name + " at position " + i + ": interval [" + low[i] + ", "
                        + high[i] + "] does not contain the mean " + mean[i]);
            }
        }
    }

    /** The number of points. */
    public int size() {
        return mean.length;
    }

    /** Whether position {@code i} has a value. */
    public boolean has(int i) {
        return !Double.isNaN(mean[i]);
    }

    /** The runs of consecutive positions with a value, each as {from, to} (inclusive), in order. */
    public java.util.List<int[]> runs() {
        var out = new java.util.ArrayList<int[]>();
        int i = 0;
        while (i < mean.length) {
            if (!has(i)) {
                i++;
                continue;
            }
            int from = i;
            while (i + 1 < mean.length && has(i + 1)) {
                i++;
            }
            out.add(new int[] {from, i});
            i++;
        }
        return out;
    }

    @Override
    public double[] mean() {
        return mean.clone();
    }

    @Override
    public double[] low() {
        return low.clone();
    }

    @Override
    public double[] high() {
        return high.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof IntervalSeries s && s.name.equals(name) && Arrays.equals(s.mean, mean)
                && Arrays.equals(s.low, low) && Arrays.equals(s.high, high);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, Arrays.hashCode(mean), Arrays.hashCode(low), Arrays.hashCode(high));
    }

    @Override
    public String toString() {
        return "IntervalSeries[" + name + ", points=" + mean.length + "]";
    }
}
