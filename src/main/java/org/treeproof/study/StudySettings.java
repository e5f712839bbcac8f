package org.treeproof.study;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import org.treeproof.data.InputException;
import org.treeproof.distance.Metric;
import org.treeproof.resample.ReferenceData;
import org.treeproof.resample.Resampling;
import org.treeproof.tree.Linkage;

/**
 * Every choice of a study, validated once, with every problem reported together.
 *
 * <p>The thread count is deliberately not here: it cannot change a result, so it belongs to the run,
 * not to the study (see {@link StudyRunner}).
 *
 * @param linkages        the linkages to compare, in the order given, no repeats
 * @param metric          the dissimilarity between samples
 * @param maxK            the largest number of clusters assessed (from 2)
 * @param replicates      stability replicates B
 * @param resampling      how replicates draw samples
 * @param sampleFraction  share of samples a subsample holds, in (0, 1]
 * @param featureFraction share of features each replicate holds, in (0, 1]; 1 keeps all (no recomputation)
 * @param referenceSets   reference data sets for the gap statistic (0 skips it)
 * @param gapReference    how the gap statistic's reference data are drawn; it must fit the metric
 *                        ({@link ReferenceData.Kind#misfit}) when the gap statistic runs
 * @param nullSets        null data sets for calibrating stability (0 skips it)
 * @param nullReplicates  replicates drawn from each null data set
 * @param pacLow          lower end of the PAC interval (exclusive)
 * @param pacHigh         upper end of the PAC interval (inclusive)
 * @param seed            the master seed every random draw derives from
 * @param minClusterSize  the fewest samples a cluster holds; smaller branches are outliers. 0 chooses
 *                        {@link #defaultMinClusterSize(int)} for the number of samples
 * @param branchPValues   the multiscale bootstrap for branch p-values, or {@code null} to skip it
 */
public record StudySettings(List<Linkage> linkages, Metric metric, int maxK, int replicates, Resampling resampling,
        double sampleFraction, double featureFraction, int referenceSets, ReferenceData.Kind gapReference,
        int nullSets, int nullReplicates, double pacLow, double pacHigh, long seed, int minClusterSize,
        BranchPValueSettings branchPValues) {

    /** The defaults a study uses when an option is not given (with the Euclidean metric). */
    public static final List<Linkage> DEFAULT_LINKAGES = List.of(Linkage.AVERAGE, Linkage.COMPLETE, Linkage.WARD);

    /**
     * The linkages a study with {@code metric} compares unless told otherwise: {@link #DEFAULT_LINKAGES} without
     * those defined only on Euclidean distances when the metric is another.
     */
    public static List<Linkage> defaultLinkagesFor(Metric metric) {
        return DEFAULT_LINKAGES.stream().filter(l -> metric.euclidean() || !l.requiresEuclidean()).toList();
    }

    /** The most replicates a study takes (the consensus counters' limit). */
    public static final int MAX_REPLICATES = org.treeproof.score.ConsensusAccumulator.MAX_REPLICATES;
    /** The largest number of clusters a study assesses. */
    public static final int MAX_K = 100;

    public StudySettings {
        linkages = List.copyOf(linkages);
        Objects.requireNonNull(metric, "metric");
        Objects.requireNonNull(resampling, "resampling");
        Objects.requireNonNull(gapReference, "gapReference");
        List<String> problems = problems(linkages, metric, maxK, replicates, sampleFraction, featureFraction,
                referenceSets, nullSets, nullReplicates, pacLow, pacHigh);
        if (referenceSets > 0) {
            gapReference.misfit(metric).ifPresent(problems::add);
        }
        if (minClusterSize < 0) {
            problems.add("--min-cluster-size must be 0 (automatic) or a number of samples, got " + minClusterSize);
        }
        if (branchPValues != null) {
            problems.addAll(branchPValues.problems());
        }
        if (!problems.isEmpty()) {
            throw new InputException(String.join("; ", problems));
        }
    }

    private static List<String> problems(List<Linkage> linkages, Metric metric, int maxK, int replicates,
            double sampleFraction, double featureFraction, int referenceSets, int nullSets, int nullReplicates,
            double pacLow, double pacHigh) {
        var p = new ArrayList<String>();
        if (linkages.isEmpty()) {
            p.add("--linkages needs at least one linkage");
        }
        if (new LinkedHashSet<>(linkages).size() != linkages.size()) {
            p.add("--linkages names a linkage twice");
        }
        for (Linkage l : linkages) {
            if (l.requiresEuclidean() && !metric.euclidean()) {
                p.add(l.id() + " linkage needs --metric euclidean (it is defined on Euclidean distances), not "
                        + metric.id());
            }
        }
        if (maxK < 2 || maxK > MAX_K) {
            p.add("--max-k must be between 2 and " + MAX_K + ", got " + maxK);
        }
        if (replicates < 2 || replicates > MAX_REPLICATES) {
            p.add("--replicates must be between 2 and " + MAX_REPLICATES + ", got " + replicates);
        }
        if (nullReplicates > MAX_REPLICATES) {
            p.add("--null-replicates must be at most " + MAX_REPLICATES + ", got " + nullReplicates);
        }
        if (!(sampleFraction > 0 && sampleFraction <= 1)) {
            p.add("--sample-fraction must be in (0, 1], got " + sampleFraction);
        }
        if (!(featureFraction > 0 && featureFraction <= 1)) {
            p.add("--feature-fraction must be in (0, 1], got " + featureFraction);
        }
        if (referenceSets < 0 || referenceSets == 1) {
            p.add("--reference-sets must be 0 (no gap statistic) or at least 2, got " + referenceSets);
        }
        if (nullSets < 0) {
            p.add("--null-sets must be 0 (no null calibration) or more, got " + nullSets);
        }
        if (nullSets > 0 && nullReplicates < 2) {
            p.add("--null-replicates must be at least 2, got " + nullReplicates);
        }
        if (!(pacLow >= 0 && pacLow < pacHigh && pacHigh <= 1)) {
            p.add("the PAC interval must satisfy 0 <= low < high <= 1, got (" + pacLow + ", " + pacHigh + "]");
        }
        return p;
    }

    /** Checks the settings against the size of the input; every problem in one message. */
    public void checkAgainst(int samples, boolean hasData) {
        checkAgainst(samples, hasData, true);
    }

    /**
     * As {@link #checkAgainst(int, boolean)}; {@code maxKChosen} says whether the user gave --max-k, so that a
     * default that does not fit is not blamed on them.
     */
    public void checkAgainst(int samples, boolean hasData, boolean maxKChosen) {
        var p = new ArrayList<String>();
        if (samples > org.treeproof.distance.CondensedDistances.MAX_ITEMS) {
            throw new InputException("the input has " + samples + " samples; a study holds at most "
                    + org.treeproof.distance.CondensedDistances.MAX_ITEMS + " (their pairwise distances must fit one "
                    + "array); assess a subsample of the samples");
        }
        int smallest = resampling == Resampling.SUBSAMPLE ? (int) Math.round(sampleFraction * samples) : samples;
        int largest = Math.min(samples, smallest) - 1;
        if (largest < 2) {
            p.add("the input has " + samples + " samples, too few to assess 2 clusters"
                    + (smallest < samples && samples >= 3 ? " in replicates of " + smallest + " samples (--sample-fraction "
                    + sampleFraction + "); raise --sample-fraction or add samples" : "; a study needs at least 3"));
        } else if (maxK > largest && !maxKChosen) {
            p.add("the input has " + samples + " samples" + (smallest < samples ? " (replicates of " + smallest + ")"
                    : "") + ", too few for the default --max-k " + maxK + "; give --max-k " + largest + " or less");
        } else if (maxK > samples - 1) {
            p.add("--max-k " + maxK + " needs more than " + maxK + " samples; the input has " + samples
                    + ": give --max-k " + largest + " or less");
        } else if (maxK > smallest - 1) {
            p.add("--max-k " + maxK + " is too large for replicates of " + smallest
                    + " samples; lower --max-k to " + largest + " or raise --sample-fraction");
        }
        int m = minClusterSize(samples);
        if (p.isEmpty() && 2 * m > samples) {
            p.add(minClusterSize > 0
                    ? "--min-cluster-size " + m + " leaves no room for 2 clusters in " + samples + " samples; give "
                            + samples / 2 + " or less"
                    : "the input has " + samples + " samples, too few for 2 clusters of the default smallest size "
                            + m + "; give --min-cluster-size " + samples / 2 + " or less, or add samples");
        }
        if (!hasData) {
            if (featureFraction < 1) {
                p.add("--feature-fraction needs a data table; distances alone cannot be resampled by feature");
            }
            if (branchPValues != null) {
                p.add("--branch-pvalues needs a data table; distances alone cannot be resampled by feature");
            }
        }
        if (!p.isEmpty()) {
            throw new InputException(String.join("; ", p));
        }
    }

    /**
     * The default smallest cluster: the larger of 5 samples and 1% of the samples (rounded up). Our choice, no
     * published value: a branch of fewer than 5 samples cannot show a cluster's internal spread and is shed by
     * single far points and heavy tails; on large studies 1% keeps a split of a few dozen samples from many
     * thousands from counting as a subtype, while a group of 10 in 290 (3%) still counts.
     */
    public static int defaultMinClusterSize(int samples) {
        return Math.max(5, (int) Math.ceil(samples / 100.0));
    }

    /** The effective smallest cluster for a study of {@code samples} samples. */
    public int minClusterSize(int samples) {
        return minClusterSize > 0 ? minClusterSize : defaultMinClusterSize(samples);
    }

    /**
     * The smallest cluster inside a replicate tree over {@code leaves} samples (draws, counting repeats) of a
     * study of {@code samples}: the study's minimum scaled to the replicate's size, at least 2 (so a lone sample
     * is always an outlier) unless the study's minimum is 1 (no outliers at all).
     */
    public static int minClusterSizeFor(int studyMinimum, int samples, int leaves) {
        if (studyMinimum <= 1) {
            return 1;
        }
        return Math.max(2, (int) Math.round(studyMinimum * (double) leaves / samples));
    }

    /** Whether replicates draw features too (and so recompute distances). */
    public boolean resamplesFeatures() {
        return featureFraction < 1;
    }

    /** A builder holding the defaults. */
    public static Builder builder() {
        return new Builder();
    }

    /** Collects options one by one; {@link #build()} validates them all at once. */
    public static final class Builder {
        /** Null until set: the default depends on the metric ({@link #defaultLinkagesFor}). */
        private List<Linkage> linkages;
        private Metric metric = Metric.EUCLIDEAN;
        private int maxK = 10;
        private int replicates = 200;
        private Resampling resampling = Resampling.SUBSAMPLE;
        private double sampleFraction = 0.8;
        private double featureFraction = 1.0;
        private int referenceSets = 50;
        /** Null until set: the default depends on the metric ({@link ReferenceData.Kind#defaultFor}). */
        private ReferenceData.Kind gapReference;
        private int nullSets = 19;
        private int nullReplicates = 10;
        private int minClusterSize = 0;
        private double pacLow = 0.1;
        private double pacHigh = 0.9;
        private long seed = 1;
        private BranchPValueSettings branchPValues;

        private Builder() {
        }

        public Builder linkages(List<Linkage> v) {
            linkages = v;
            return this;
        }

        public Builder metric(Metric v) {
            metric = v;
            return this;
        }

        public Builder maxK(int v) {
            maxK = v;
            return this;
        }

        public Builder replicates(int v) {
            replicates = v;
            return this;
        }

        public Builder resampling(Resampling v) {
            resampling = v;
            return this;
        }

        public Builder sampleFraction(double v) {
            sampleFraction = v;
            return this;
        }

        public Builder featureFraction(double v) {
            featureFraction = v;
            return this;
        }

        public Builder referenceSets(int v) {
            referenceSets = v;
            return this;
        }

        public Builder gapReference(ReferenceData.Kind v) {
            gapReference = v;
            return this;
        }

        public Builder nullSets(int v) {
            nullSets = v;
            return this;
        }

        public Builder nullReplicates(int v) {
            nullReplicates = v;
            return this;
        }

        public Builder pacInterval(double low, double high) {
            pacLow = low;
            pacHigh = high;
            return this;
        }

        public Builder minClusterSize(int v) {
            minClusterSize = v;
            return this;
        }

        public Builder seed(long v) {
            seed = v;
            return this;
        }

        /** The multiscale bootstrap for branch p-values, or {@code null} (the default) to skip it. */
        public Builder branchPValues(BranchPValueSettings v) {
            branchPValues = v;
            return this;
        }

        public StudySettings build() {
            return new StudySettings(linkages == null ? defaultLinkagesFor(metric) : linkages, metric, maxK, replicates,
                    resampling, sampleFraction, featureFraction, referenceSets,
                    gapReference == null ? ReferenceData.Kind.defaultFor(metric) : gapReference, nullSets, nullReplicates,
                    pacLow, pacHigh, seed, minClusterSize, branchPValues);
        }
    }
}
