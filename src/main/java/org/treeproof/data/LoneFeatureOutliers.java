package org.treeproof.data;

import java.util.ArrayList;
import java.util.List;

/**
 * Features that by themselves put a sample far from all others: a value more than {@link #LIMIT} standard
 * deviations from the feature's mean in the prepared data. A nearly constant feature scaled to unit variance does
 * this (one sample with a different value gets a z-score near {@code sqrt(n)}), and a sample so placed is split
 * off by any tree, as an outlier, whatever the other features say.
 *
 * <p>The limit of 10 SDs is our choice: by Chebyshev's inequality at most 1% of any feature's values lie that far
 * out, and for Gaussian data it is never reached in practice.
 */
public final class LoneFeatureOutliers {
    /** The number of standard deviations beyond which a value is flagged. Our choice; see the class comment. */
    public static final double LIMIT = 10;

    private LoneFeatureOutliers() {
    }

    /**
     * One flagged feature: its name, the sample with its most extreme value, and how many SDs out it is.
     *
     * @param feature  the feature's name
     * @param sample   the id of the sample with the most extreme value
     * @param sds      how many standard deviations from the feature's mean that value lies
     * @param samples  how many samples lie beyond the limit on this feature
     */
    public record Flag(String feature, String sample, double sds, int samples) {
    }

    /** The flagged features of {@code data}, in feature order. */
    public static List<Flag> of(DataMatrix data) {
        var out = new ArrayList<Flag>();
        int n = data.samples();
        for (int j = 0; j < data.features(); j++) {
            double[] x = data.column(j);
            double mean = 0;
            for (double v : x) {
                mean += v / n;
            }
            double ss = 0;
            for (double v : x) {
                ss += (v - mean) * (v - mean);
            }
            double sd = Math.sqrt(ss / n);
            if (!(sd > 0)) {
                continue;
            }
            int worst = -1;
            double worstZ = 0;
            int beyond = 0;
            for (int i = 0; i < n; i++) {
                double z = Math.abs(x[i] - mean) / sd;
                if (z > LIMIT) {
                    beyond++;
                    if (z > worstZ) {
                        worstZ = z;
                        worst = i;
                    }
                }
            }
            if (worst >= 0) {
                out.add(new Flag(data.featureNames().get(j), data.sampleIds().get(worst), worstZ, beyond));
            }
        }
        return out;
    }
}
