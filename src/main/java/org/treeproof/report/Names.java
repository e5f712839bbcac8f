package org.treeproof.report;

import java.util.EnumMap;
import java.util.Map;
import org.treeproof.distance.Metric;
import org.treeproof.resample.ReferenceData;
import org.treeproof.tree.Linkage;

/** How the report's prose names linkages and dissimilarities (the user-typed ids stay in tables and settings). */
final class Names {
    private static final Map<Linkage, String> LINKAGE_PROSE = new EnumMap<>(Map.of(Linkage.SINGLE, "single",
            Linkage.COMPLETE, "complete", Linkage.AVERAGE, "average (UPGMA)", Linkage.WEIGHTED, "weighted (WPGMA)",
            Linkage.WARD, "Ward", Linkage.CENTROID, "centroid", Linkage.MEDIAN, "median"));

    private static final Map<Metric, String> METRIC_PROSE = new EnumMap<>(Map.of(Metric.EUCLIDEAN,
            "Euclidean distances", Metric.SQEUCLIDEAN, "squared Euclidean distances", Metric.MANHATTAN,
            "Manhattan (city-block) distances", Metric.CHEBYSHEV, "Chebyshev (maximum) distances", Metric.COSINE,
            "cosine dissimilarities (1 − cosine similarity)", Metric.PEARSON,
            "Pearson correlation dissimilarities (1 − r)", Metric.SPEARMAN,
            "Spearman rank correlation dissimilarities (1 − ρ)", Metric.JACCARD, "Jaccard distances on 0/1 features",
            Metric.HAMMING, "Hamming distances (the share of 0/1 features that differ)"));

    /** How 0/1 reference and null data are drawn ({@link ReferenceData#featureFrequency}). */
    private static final String BINARY_DRAW = "drawn as 0/1 values with each feature's observed frequency of ones,"
            + " independently per feature";

    private static final Map<ReferenceData.Kind, String> GAP_REFERENCE_PROSE = new EnumMap<>(Map.of(
            ReferenceData.Kind.PRINCIPAL_BOX, "drawn uniformly over the box aligned with the data's principal axes",
            ReferenceData.Kind.FEATURE_RANGE, "drawn uniformly over the range of each feature",
            ReferenceData.Kind.FEATURE_FREQUENCY, BINARY_DRAW));

    private Names() {
    }

    /** The linkage's name in a sentence or table: its id, with Ward capitalised as a person's name. */
    static String linkage(Linkage l) {
        return l == Linkage.WARD ? "Ward" : l.id();
    }

    /** The linkage's name in the methods text, with its other common name. */
    static String linkageProse(Linkage l) {
        return LINKAGE_PROSE.getOrDefault(l, l.id());
    }

    /** The dissimilarity in plain words, plural ("Euclidean distances"). */
    static String metricProse(Metric m) {
        return METRIC_PROSE.getOrDefault(m, m.id() + " dissimilarities");
    }

    /** How the gap statistic's reference data are drawn, as a participle phrase ("drawn uniformly over ..."). */
    static String gapReferenceProse(ReferenceData.Kind kind) {
        return GAP_REFERENCE_PROSE.getOrDefault(kind, "drawn as " + kind.userName());
    }

    /**
     * How the null data of stability calibration are drawn for {@code metric}, as a participle phrase: the choice
     * of {@link ReferenceData#nullModel}.
     */
    static String nullModelProse(Metric metric) {
        return metric.binaryOnly() ? BINARY_DRAW + " (the same feature frequencies, no clusters)"
                : "drawn from a unimodal elliptical distribution with the data's principal axes (no clusters)";
    }
}
