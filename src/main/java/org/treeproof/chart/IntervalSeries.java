package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * A named series of means with an interval around each, e.g. one linkage's mean adjusted Rand index per
 * number of clusters with its 95% interval over replicates.
 *
 * @param name a short name for the key, e.g. "average"
 * @param mean the means, finite
 * @param low  the lower ends, finite and not above the mean
 * @param high the upper ends, finite and not below the mean
 */
public record IntervalSeries(String name, double[] mean, double[] low, double[] high) {

    public IntervalSeries {
        Check.text(name, "name");
        Objects.requireNonNull(mean, "mean");
        mean = Check.finite(mean, mean.length, name + " mean");
        low = Check.finite(low, mean.length, name + " low");
        high = Check.finite(high, mean.length, name + " high");
        for (int i = 0; i < mean.length; i++) {
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
