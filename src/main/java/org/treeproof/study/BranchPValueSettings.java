package org.treeproof.study;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import org.treeproof.data.InputException;
import org.treeproof.resample.MultiscalePlanner;

/**
 * The multiscale bootstrap that gives branch p-values: the scales r (replicates draw r·p of the p features with
 * replacement) and the replicates per scale.
 *
 * <p>The default scales, 0.5 to 1.4 in steps of 0.1, are the range the issue and the papers use (H. Shimodaira,
 * Systematic Biology 51 (2002) 492, doi:10.1080/10635150290069913, takes ten scales around 1; from memory). The
 * default of {@value #DEFAULT_REPLICATES} replicates per scale is our choice, sized by the benchmark in
 * {@code bench/README.md}: it gives au a standard error of a few hundredths where it matters (near 0.95).
 *
 * @param scales             the scales, each in (0, {@value #MAX_SCALE}], at least {@value #MIN_SCALES} distinct
 * @param replicatesPerScale replicates per scale, {@value #MIN_REPLICATES} to {@value #MAX_REPLICATES}
 */
public record BranchPValueSettings(List<Double> scales, int replicatesPerScale) {
    /** The default scales. */
    public static final List<Double> DEFAULT_SCALES = List.of(0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1, 1.2, 1.3, 1.4);
    /** The default replicates per scale. */
    public static final int DEFAULT_REPLICATES = 200;
    /** Fewest distinct scales: two parameters and one degree of freedom to check the fit. */
    public static final int MIN_SCALES = org.treeproof.score.MultiscaleFit.MIN_SCALES;
    /** The largest scale accepted (ten times the features). */
    public static final double MAX_SCALE = 10;
    /** Fewest replicates per scale. */
    public static final int MIN_REPLICATES = 10;
    /** Most replicates per scale. */
    public static final int MAX_REPLICATES = 100_000;

    /** The defaults. */
    public static final BranchPValueSettings DEFAULT = new BranchPValueSettings(DEFAULT_SCALES, DEFAULT_REPLICATES);

    public BranchPValueSettings {
        scales = List.copyOf(scales);
    }

    /** What is wrong with these settings, one entry per problem, naming the options. */
    List<String> problems() {
        var p = new ArrayList<String>();
        for (double r : scales) {
            if (!(r > 0 && r <= MAX_SCALE)) {
                p.add("--branch-scales: every scale must be in (0, " + (int) MAX_SCALE + "], got " + fmt(r));
            }
        }
        if (new HashSet<>(scales).size() < MIN_SCALES) {
            p.add("--branch-scales needs at least " + MIN_SCALES + " different scales, got "
                    + new HashSet<>(scales).size());
        } else if (new HashSet<>(scales).size() != scales.size()) {
            p.add("--branch-scales names a scale twice");
        }
        if (replicatesPerScale < MIN_REPLICATES || replicatesPerScale > MAX_REPLICATES) {
            p.add("--branch-replicates must be between " + MIN_REPLICATES + " and " + MAX_REPLICATES + ", got "
                    + replicatesPerScale);
        }
        return p;
    }

    /**
     * Checks the scales against the number of features: after rounding r·p to whole features, at least
     * {@value #MIN_SCALES} scales must still differ.
     *
     * @throws InputException if they do not
     */
    public void checkFeatures(int features) {
        var planner = planner(features, 0);
        var counts = new HashSet<Integer>();
        for (int s = 0; s < scales.size(); s++) {
            counts.add(planner.drawsAt(s));
        }
        if (counts.size() < MIN_SCALES) {
            throw new InputException("--branch-scales: with " + features + (features == 1 ? " feature" : " features")
                    + " the scales give only "
                    + counts.size() + " different numbers of drawn features; at least " + MIN_SCALES
                    + " are needed (spread the scales further apart)");
        }
    }

    /** The plans of this bootstrap for data with {@code features} features. */
    public MultiscalePlanner planner(int features, long seed) {
        return new MultiscalePlanner(features, scales, replicatesPerScale, seed);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%s", v);
    }
}
