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

    private static final Map<ReferenceData.Kind, String> GAP_REFERENCE_PROSE = new EnumMap<>(Map.of(
            ReferenceData.Kind.PRINCIPAL_BOX, "box aligned with the data's principal axes",
            ReferenceData.Kind.FEATURE_RANGE, "range of each feature"));

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

    /** Where the gap statistic's reference data are drawn uniformly, as a noun phrase. */
    static String gapReferenceProse(ReferenceData.Kind kind) {
        return GAP_REFERENCE_PROSE.getOrDefault(kind, kind.userName());
    }
}
