package org.treeproof.cli;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.data.InputException;
import org.treeproof.distance.Metric;
import org.treeproof.resample.ReferenceData;
import org.treeproof.resample.Resampling;
import org.treeproof.study.BranchPValueSettings;
import org.treeproof.study.StudySettings;
import org.treeproof.tree.Linkage;
import picocli.CommandLine.Option;

/**
 * The options of a study (a picocli mixin). Names are parsed here and every problem, of any option, is
 * reported together in one line.
 */
final class StudyOptions {

    @Option(names = "--linkages", paramLabel = "L,L", split = ",", description = "Linkages to compare (default: "
            + "average,complete,ward; average,complete with a metric other than euclidean). Any of single, complete, average (upgma), weighted (wpgma), ward, centroid, median.")
    List<String> linkages;

    @Option(names = "--metric", paramLabel = "NAME", description = "Dissimilarity (default: euclidean): euclidean, "
            + "sqeuclidean, manhattan, chebyshev, cosine, pearson, spearman, jaccard, hamming.")
    String metric;

    @Option(names = "--max-k", paramLabel = "K", description = "Largest number of clusters to assess (default: 10).")
    Integer maxK;

    @Option(names = "--replicates", paramLabel = "B", description = "Resampled replicates (default: 200).")
    Integer replicates;

    @Option(names = "--resampling", paramLabel = "HOW", description = "subsample (without replacement, default) or "
            + "bootstrap (with replacement).")
    String resampling;

    @Option(names = "--sample-fraction", paramLabel = "F", description = "Share of samples per subsample, in (0, 1] "
            + "(default: 0.8).")
    Double sampleFraction;

    @Option(names = "--feature-fraction", paramLabel = "F", description = "Share of features per replicate, in (0, 1];"
            + " below 1 recomputes distances per replicate (default: 1.0).")
    Double featureFraction;

    @Option(names = "--reference-sets", paramLabel = "B", description = "Reference data sets for the gap statistic; 0 "
            + "skips it (default: 50).")
    Integer referenceSets;

    @Option(names = "--gap-reference", paramLabel = "KIND", description = "Reference data for the gap statistic: "
            + "principal-box (uniform in the principal-axis box, default) or feature-range (uniform per feature).")
    String gapReference;

    @Option(names = "--null-sets", paramLabel = "N", description = "Null data sets (same covariance, no clusters) to "
            + "calibrate stability; 0 skips it (default: 19, the fewest that can give p = 0.05).")
    Integer nullSets;

    @Option(names = "--null-replicates", paramLabel = "B", description = "Replicates per null data set (default: 10, sized so that a 2000-sample study stays within a minute on two cores).")
    Integer nullReplicates;

    @Option(names = "--min-cluster-size", paramLabel = "M", description = "Fewest samples a cluster holds; samples "
            + "on smaller branches are reported as outliers, not clusters (default: the larger of 5 and 1%% of the "
            + "samples; 1 turns outliers off).")
    Integer minClusterSize;

    @Option(names = "--branch-pvalues", description = "Also compute approximately unbiased p-values for every branch "
            + "of each tree, by a multiscale bootstrap of the features (needs a data table).")
    boolean branchPValues;

    @Option(names = "--branch-scales", paramLabel = "R,R", split = ",", description = "Scales of the multiscale "
            + "bootstrap: each replicate draws R times the number of features, with replacement (default: "
            + "0.5,0.6,...,1.4).")
    List<String> branchScales;

    @Option(names = "--branch-replicates", paramLabel = "B", description = "Replicates per scale of the multiscale "
            + "bootstrap (default: 200).")
    Integer branchReplicates;

    @Option(names = "--seed", paramLabel = "S", description = "Master seed; every random draw derives from it "
            + "(default: 1).")
    Long seed;

    /**
     * The valid range of a whole-number option, in the words of the rule that owns it ("--replicates must be between
     * 2 and 10000"), or null when the option has no upper limit; for a value too large to be read at all.
     */
    static String rangeOf(String option) {
        if (option.equals("--threads")) {
            try {
                Threads.resolve(Integer.MAX_VALUE, option);
            } catch (InputException e) {
                return e.getMessage().replaceFirst(", got .*$", "");
            }
            return null;
        }
        StudySettings.Builder b = StudySettings.builder();
        switch (option) {
            case "--max-k" -> b.maxK(Integer.MAX_VALUE);
            case "--replicates" -> b.replicates(Integer.MAX_VALUE);
            case "--null-replicates" -> b.nullReplicates(Integer.MAX_VALUE);
            case "--reference-sets" -> b.referenceSets(Integer.MAX_VALUE);
            case "--null-sets" -> b.nullSets(Integer.MAX_VALUE);
            default -> {
                return null;
            }
        }
        try {
            b.build();
            return null;
        } catch (InputException e) {
            for (String part : e.getMessage().split("; ")) {
                if (part.startsWith(option + " ")) {
                    return part.replaceFirst(", got .*$", "");
                }
            }
            return null;
        }
    }

    /** Whether the user gave --max-k (otherwise the default applies). */
    boolean maxKGiven() {
        return maxK != null;
    }

    /** The multiscale bootstrap's options into {@code b}; their problems into {@code problems}. */
    private void branchPValues(StudySettings.Builder b, List<String> problems) {
        if (!branchPValues) {
            if (branchScales != null || branchReplicates != null) {
                problems.add((branchScales != null ? "--branch-scales" : "--branch-replicates")
                        + " needs --branch-pvalues");
            }
            return;
        }
        List<Double> scales = BranchPValueSettings.DEFAULT_SCALES;
        if (branchScales != null) {
            var parsed = new ArrayList<Double>();
            for (String s : branchScales) {
                try {
                    parsed.add(Double.parseDouble(s.strip()));
                } catch (NumberFormatException e) {
                    problems.add("--branch-scales: '" + s.strip() + "' is not a number");
                }
            }
            scales = parsed;
        }
        b.branchPValues(new BranchPValueSettings(scales,
                branchReplicates == null ? BranchPValueSettings.DEFAULT_REPLICATES : branchReplicates));
    }

    /** The settings for a data table, every problem reported at once. */
    StudySettings settings() {
        return settings(false);
    }

    /**
     * The settings, every problem reported at once. For a distance table ({@code distanceTable}) the options that
     * act on data are refused as contradictory, and the effective settings hold no gap reference sets and no null
     * sets, which need a data table to draw from.
     */
    StudySettings settings(boolean distanceTable) {
        if (distanceTable) {
            refuseDataOnlyOptions();
        }
        var problems = new ArrayList<String>();
        StudySettings.Builder b = StudySettings.builder();
        if (distanceTable) {
            b.referenceSets(0).nullSets(0);
        }
        if (linkages != null) {
            var parsed = new ArrayList<Linkage>();
            for (String s : linkages) {
                try {
                    parsed.add(Linkage.parse(s.strip()));
                } catch (InputException e) {
                    problems.add("--linkages: " + e.getMessage());
                }
            }
            b.linkages(parsed);
        }
        if (metric != null) {
            try {
                b.metric(Metric.parse(metric));
            } catch (InputException e) {
                problems.add("--metric: " + e.getMessage());
            }
        }
        if (resampling != null) {
            try {
                b.resampling(Resampling.parse(resampling));
            } catch (InputException e) {
                problems.add("--resampling: " + e.getMessage());
            }
        }
        if (gapReference != null) {
            try {
                b.gapReference(ReferenceData.Kind.parse(gapReference));
            } catch (InputException e) {
                problems.add("--gap-reference: " + e.getMessage());
            }
        }
        if (maxK != null) {
            b.maxK(maxK);
        }
        if (replicates != null) {
            b.replicates(replicates);
        }
        if (sampleFraction != null) {
            b.sampleFraction(sampleFraction);
        }
        if (featureFraction != null) {
            b.featureFraction(featureFraction);
        }
        if (referenceSets != null && !distanceTable) {
            b.referenceSets(referenceSets);
        }
        if (nullSets != null && !distanceTable) {
            b.nullSets(nullSets);
        }
        if (nullReplicates != null) {
            b.nullReplicates(nullReplicates);
        }
        if (minClusterSize != null) {
            if (minClusterSize < 1) {
                // 0 means "automatic" inside the library; on the command line the default is had by leaving it out
                problems.add("--min-cluster-size must be at least 1 (leave it out for the default), got "
                        + minClusterSize);
            } else {
                b.minClusterSize(minClusterSize);
            }
        }
        if (seed != null) {
            b.seed(seed);
        }
        branchPValues(b, problems);
        try {
            StudySettings s = b.build();
            if (!problems.isEmpty()) {
                throw new InputException(String.join("; ", problems));
            }
            return s;
        } catch (InputException e) {
            if (problems.isEmpty()) {
                throw e;
            }
            if (!e.getMessage().equals(String.join("; ", problems))) {
                problems.add(e.getMessage());
            }
            throw new InputException(String.join("; ", problems));
        }
    }

    /**
     * Refuses the options that only mean something for a data table: a distance table's distances are used as
     * given, and null and reference data sets are drawn from the data. {@code --metric euclidean} (the default) is
     * accepted, as a statement of what the distances are.
     *
     * @throws InputException naming each such option and {@code --distances}
     */
    private void refuseDataOnlyOptions() {
        var given = new ArrayList<String>();
        if (metric != null) {
            Metric m;
            try {
                m = Metric.parse(metric);
            } catch (InputException e) {
                m = null;
            }
            if (m != Metric.EUCLIDEAN) {
                given.add("--metric " + metric.strip());
            }
        }
        addIf(given, referenceSets != null, "--reference-sets");
        addIf(given, gapReference != null, "--gap-reference");
        addIf(given, nullSets != null, "--null-sets");
        addIf(given, nullReplicates != null, "--null-replicates");
        addIf(given, featureFraction != null, "--feature-fraction");
        if (given.isEmpty()) {
            return;
        }
        throw new InputException(String.join(", ", given) + " contradict" + (given.size() == 1 ? "s" : "")
                + " --distances: a distance table is clustered as given (no metric is applied, no null or reference"
                + " data can be drawn, no features resampled); drop " + (given.size() == 1 ? "it" : "them")
                + " or give the data table without --distances");
    }

    private static void addIf(List<String> list, boolean condition, String option) {
        if (condition) {
            list.add(option);
        }
    }
}
