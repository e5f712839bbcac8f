package org.treeproof.data;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Features with a long tail on one side: sample skewness {@code g1 = m3 / m2^(3/2)} (moments about the mean, divided
 * by n; the Fisher-Pearson coefficient, as {@code scipy.stats.skew} with {@code bias=True}) beyond {@link #LIMIT} in
 * absolute value. Raw intensities, abundances and counts look like this. The null data that calibrate the decision
 * are symmetric about their centre, so pieces of such a tail can beat them without being groups: a log transform
 * before scaling is the usual remedy.
 *
 * <p>The limit of 2 is a common rule of thumb for "highly skewed", with no single source (our choice). Skewness
 * does not change under scaling, so it can be read on the prepared data.
 */
public final class SkewedFeatures {
    /** The absolute skewness beyond which a feature is flagged. A rule of thumb; see the class comment. */
    public static final double LIMIT = 2;

    private SkewedFeatures() {
    }

    /**
     * One flagged feature.
     *
     * @param feature  the feature's name
     * @param skewness its sample skewness g1
     */
    public record Flag(String feature, double skewness) {
    }

    /** The sample skewness g1 of {@code x}; NaN when the values do not vary. */
    public static double skewness(double[] x) {
        int n = x.length;
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double m2 = 0;
        double m3 = 0;
        for (double v : x) {
            double d = v - mean;
            m2 += d * d;
            m3 += d * d * d;
        }
        m2 /= n;
        m3 /= n;
        return m2 > 0 ? m3 / Math.pow(m2, 1.5) : Double.NaN;
    }

    /** The flagged features of {@code data}, most skewed first (ties in feature order). */
    public static List<Flag> of(DataMatrix data) {
        var out = new ArrayList<Flag>();
        for (int j = 0; j < data.features(); j++) {
            double g = skewness(data.column(j));
            if (Math.abs(g) > LIMIT) {
                out.add(new Flag(data.featureNames().get(j), g));
            }
        }
        out.sort(Comparator.comparingDouble((Flag f) -> -Math.abs(f.skewness())));
        return out;
    }
}
