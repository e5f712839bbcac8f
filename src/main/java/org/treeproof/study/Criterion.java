package org.treeproof.study;

import java.util.function.ToDoubleFunction;

/**
 * Each criterion a study measures per (linkage, k), described once: its name, output key, direction, whether it
 * needs the feature table, its reference, and how to read it from the evidence. Outputs and each criterion's own
 * choice of k loop over this description.
 */
public enum Criterion {
    EXCESS("excess over the null", "excess", Direction.LARGER, true,
            "this study's null calibration (NullStability)", e -> e.stability().nullModel() == null ? Double.NaN
                    : e.stability().nullModel().excess()),
    MEAN_ARI("stability (mean ARI)", "ariMean", Direction.LARGER, false,
            "Hubert and Arabie 1985, doi:10.1007/BF01908075", e -> e.stability().ari().mean()),
    PAC("PAC", "pac", Direction.SMALLER, false, "Senbabaoglu et al. 2014, doi:10.1038/srep06207",
            e -> e.stability().pac()),
    WORST_JACCARD("smallest cluster Jaccard", "worstJaccard", Direction.LARGER, false,
            "Hennig 2007, doi:10.1016/j.csda.2006.11.025", KEvidence::worstJaccard),
    SILHOUETTE("silhouette", "silhouette", Direction.LARGER, false, "Rousseeuw 1987, doi:10.1016/0377-0427(87)90125-7",
            KEvidence::silhouette),
    CALINSKI_HARABASZ("Calinski-Harabasz", "calinskiHarabasz", Direction.LARGER, true,
            "Calinski and Harabasz 1974, doi:10.1080/03610927408827101", KEvidence::calinskiHarabasz),
    DAVIES_BOULDIN("Davies-Bouldin", "daviesBouldin", Direction.SMALLER, true,
            "Davies and Bouldin 1979, doi:10.1109/TPAMI.1979.4766909", KEvidence::daviesBouldin),
    DUNN("Dunn", "dunn", Direction.LARGER, false, "Dunn 1974, doi:10.1080/01969727408546059", KEvidence::dunn);

    /** Which values are better. */
    public enum Direction {
        LARGER, SMALLER;

        boolean better(double a, double b) {
            return this == LARGER ? a > b : a < b;
        }
    }

    private final String label;
    private final String key;
    private final Direction direction;
    private final boolean needsFeatures;
    private final String reference;
    private final ToDoubleFunction<KEvidence> read;

    Criterion(String label, String key, Direction direction, boolean needsFeatures, String reference,
            ToDoubleFunction<KEvidence> read) {
        this.label = label;
        this.key = key;
        this.direction = direction;
        this.needsFeatures = needsFeatures;
        this.reference = reference;
        this.read = read;
    }

    public String label() {
        return label;
    }

    public String key() {
        return key;
    }

    public Direction direction() {
        return direction;
    }

    /**
     * Whether it is a fit measure of the clusters themselves (written beside k in every output), rather than a
     * stability or null measure written with its own group.
     */
    public boolean fit() {
        return this == SILHOUETTE || this == CALINSKI_HARABASZ || this == DAVIES_BOULDIN || this == DUNN;
    }

    /** The fit measures, in output order. */
    public static java.util.List<Criterion> fitMeasures() {
        return java.util.Arrays.stream(values()).filter(Criterion::fit).toList();
    }

    /** Whether it needs the feature table (or, for the excess, null data drawn from it). */
    public boolean needsFeatures() {
        return needsFeatures;
    }

    public String reference() {
        return reference;
    }

    /** Its value for one solution (NaN when not available). */
    public double of(KEvidence e) {
        return read.applyAsDouble(e);
    }

    /** Whether {@code a} is better than {@code b} by this criterion (NaN never better). */
    public boolean better(double a, double b) {
        return !Double.isNaN(a) && (Double.isNaN(b) || direction.better(a, b));
    }
}
