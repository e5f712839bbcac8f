package org.treeproof.explain;

import java.util.Locale;
import org.treeproof.data.InputException;

/**
 * The two-sided test that compares a feature between one cluster and the rest of the clustered samples.
 */
public enum ContrastTest {
    /**
     * Wilcoxon rank-sum (Mann-Whitney U) test by the normal approximation with the tie correction of the
     * variance and a continuity correction of 0.5: {@code z = (|U − n₁n₂/2| − 0.5) / σ},
     * {@code σ² = n₁n₂/12 · ((N + 1) − Σ(t³ − t) / (N(N − 1)))}, {@code p = min(1, 2Φ(−z))}. F. Wilcoxon,
     * "Individual comparisons by ranking methods", Biometrics Bulletin 1 (1945) 80-83, doi:10.2307/3001968;
     * H. B. Mann and D. R. Whitney, Annals of Mathematical Statistics 18 (1947) 50-60,
     * doi:10.1214/aoms/1177730491. No exact small-sample distribution is used: for clusters of fewer than about
     * 8 samples the approximation is rough, and the report says so.
     */
    WILCOXON("wilcoxon", "Wilcoxon rank-sum test (normal approximation with tie and continuity corrections)"),
    /**
     * Welch's t-test (unequal variances, Welch-Satterthwaite degrees of freedom; p from the t distribution of
     * commons-math3). B. L. Welch, "The generalization of 'Student's' problem when several different population
     * variances are involved", Biometrika 34 (1947) 28-35, doi:10.1093/biomet/34.1-2.28.
     */
    WELCH("welch", "Welch's t-test (unequal variances)");

    private final String id;
    private final String description;

    ContrastTest(String id, String description) {
        this.id = id;
        this.description = description;
    }

    /** The name typed on the command line and written in outputs. */
    public String id() {
        return id;
    }

    /** The test in words, for the report and the methods text. */
    public String description() {
        return description;
    }

    /**
     * The test with this name (case-insensitive; {@code mann-whitney} and {@code t} are accepted too).
     *
     * @throws InputException for an unknown name
     */
    public static ContrastTest parse(String name) {
        String s = name.strip().toLowerCase(Locale.ROOT);
        return switch (s) {
            case "wilcoxon", "mann-whitney", "rank-sum" -> WILCOXON;
            case "welch", "t", "welch-t" -> WELCH;
            default -> throw new InputException("unknown test '" + name + "'; use wilcoxon or welch");
        };
    }
}
