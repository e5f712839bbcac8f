package org.treeproof.resample;

import java.io.Serializable;
import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Makes the plan of any replicate from the master seed alone: plan {@code b} is a pure function of
 * (master seed, purpose, b, sizes, fractions), so replicates can be drawn in any order, on any thread or
 * machine.
 *
 * @param samples         the number of samples in the full data
 * @param features        the number of features (0 when only distances are known)
 * @param scheme          how samples are drawn
 * @param sampleFraction  the fraction of samples a subsample keeps, in (0, 1]
 * @param featureFraction the fraction of features a replicate keeps, in (0, 1]; 1 keeps all
 * @param masterSeed      the study's seed
 * @param purpose         the seed stream the plans come from
 */
public record ReplicatePlanner(int samples, int features, Resampling scheme, double sampleFraction,
        double featureFraction, long masterSeed, Seeds.Purpose purpose) implements Serializable {

    public ReplicatePlanner {
        if (samples < 2) {
            throw new IllegalArgumentException("need at least two samples");
        }
        if (!(sampleFraction > 0 && sampleFraction <= 1)) {
            throw new IllegalArgumentException("sample fraction must be in (0, 1]: " + sampleFraction);
        }
        if (!(featureFraction > 0 && featureFraction <= 1)) {
            throw new IllegalArgumentException("feature fraction must be in (0, 1]: " + featureFraction);
        }
        if (featureFraction < 1 && features < 1) {
            throw new IllegalArgumentException("feature resampling needs a data table, not distances");
        }
    }

    /** Whether replicates draw features (and so recompute distances). */
    public boolean resamplesFeatures() {
        return featureFraction < 1;
    }

    /** The number of features a feature-resampled replicate keeps (at least 1). */
    public int featuresPerReplicate() {
        return Math.max(1, (int) Math.round(featureFraction * features));
    }

    /** The plan of replicate {@code index}. */
    public ReplicatePlan plan(int index) {
        var rng = new SplittableRandom(Seeds.seedFor(masterSeed, purpose, index));
        int[] draws = scheme.draw(samples, sampleFraction, rng);
        int[] distinct = Arrays.stream(draws).distinct().toArray();
        if (distinct.length < 2) {
            // Only possible for a bootstrap of very few samples: redraw deterministically from a child stream.
            int attempt = 0;
            while (distinct.length < 2) {
                rng = new SplittableRandom(Seeds.child(Seeds.seedFor(masterSeed, purpose, index), attempt++));
                draws = scheme.draw(samples, sampleFraction, rng);
                distinct = Arrays.stream(draws).distinct().toArray();
            }
        }
        int[] feats = resamplesFeatures() ? Resampling.sortedSubset(features, featuresPerReplicate(), rng) : null;
        return new ReplicatePlan(index, draws, distinct, feats);
    }
}
