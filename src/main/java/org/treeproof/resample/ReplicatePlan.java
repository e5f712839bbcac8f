package org.treeproof.resample;

import java.util.Arrays;

/**
 * Which samples and features one replicate holds.
 *
 * @param index    the replicate's index within its purpose, from 0
 * @param draws    the drawn sample indices, sorted; repeats only under bootstrap
 * @param distinct the distinct sample indices, sorted
 * @param features the feature indices, sorted, or {@code null} when the replicate keeps every feature
 *                 (then its distances are gathered from the full matrix, never recomputed)
 */
public record ReplicatePlan(int index, int[] draws, int[] distinct, int[] features) {

    public ReplicatePlan {
        draws = draws.clone();
        distinct = distinct.clone();
        features = features == null ? null : features.clone();
        if (distinct.length < 2) {
            throw new IllegalArgumentException("a replicate needs at least two distinct samples");
        }
        for (int a = 1; a < distinct.length; a++) {
            if (distinct[a] <= distinct[a - 1]) {
                throw new IllegalArgumentException("distinct samples must be strictly increasing");
            }
        }
        for (int a = 1; a < draws.length; a++) {
            if (draws[a] < draws[a - 1]) {
                throw new IllegalArgumentException("draws must be sorted");
            }
        }
    }

    /** Whether this replicate recomputes distances on a subset of features. */
    public boolean resamplesFeatures() {
        return features != null;
    }

    @Override
    public int[] draws() {
        return draws.clone();
    }

    @Override
    public int[] distinct() {
        return distinct.clone();
    }

    @Override
    public int[] features() {
        return features == null ? null : features.clone();
    }

    /** The number of drawn samples (with repeats). */
    public int drawCount() {
        return draws.length;
    }

    /**
     * For each draw, the position of its sample within {@link #distinct()}: maps the replicate tree's
     * leaves (one per draw) to distinct samples.
     */
    public int[] drawToDistinct() {
        int[] map = new int[draws.length];
        int d = 0;
        for (int a = 0; a < draws.length; a++) {
            while (distinct[d] != draws[a]) {
                d++;
            }
            map[a] = d;
        }
        return map;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ReplicatePlan p && p.index == index && Arrays.equals(p.draws, draws)
                && Arrays.equals(p.features, features);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(draws) + index;
    }

    @Override
    public String toString() {
        return "ReplicatePlan[" + index + ", " + distinct.length + " samples"
                + (features == null ? "" : ", " + features.length + " features") + "]";
    }
}
