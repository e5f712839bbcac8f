package org.treeproof.study;

import java.util.List;
import java.util.Locale;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.distance.CondensedDistances;

/**
 * The largest magnitude a study computes with. Linkage updates add distances weighted by cluster sizes, Ward's
 * criterion and the reference data's principal axes work with squares, and both sum over up to
 * {@link CondensedDistances#MAX_ITEMS} samples: with every value at most {@value #LIMIT} in absolute value, such a
 * sum stays below 6.6e304, inside the range of a double (1.8e308, IEEE 754). Larger values would overflow to
 * infinity part-way through and are refused before any work. At the other end, data whose every value is below
 * {@value #SMALLEST} in magnitude have squares below 1e-300, near the smallest normal double (2.2e-308): their
 * cross-products and squared distances lose their digits and underflow to 0, so such data are refused too.
 */
public final class Magnitudes {
    /** The largest absolute value of a prepared data cell or a given distance. */
    public static final double LIMIT = 1e150;
    /** The largest absolute value of a prepared data table must be at least this (unless every value is 0). */
    public static final double SMALLEST = 1e-150;

    private Magnitudes() {
    }

    /**
     * Refuses prepared data with a cell beyond {@link #LIMIT}, naming the first such sample and feature, or whose
     * every cell is below {@link #SMALLEST} in magnitude (but not all 0), naming the largest.
     */
    public static void requireWithinLimit(DataMatrix data) {
        int wi = -1;
        int wj = -1;
        double largest = 0;
        for (int i = 0; i < data.samples(); i++) {
            for (int j = 0; j < data.features(); j++) {
                double v = data.get(i, j);
                if (Math.abs(v) > largest) {
                    largest = Math.abs(v);
                    wi = i;
                    wj = j;
                }
                if (Math.abs(v) > LIMIT) {
                    throw new InputException(String.format(Locale.ROOT, "sample '%s' has %s in feature '%s' after "
                            + "preparation; treeproof computes with magnitudes up to %s (their squares must stay "
                            + "finite): divide the table by a power of ten, or use --scale zscore",
                            data.sampleIds().get(i), v, data.featureNames().get(j), LIMIT));
                }
            }
        }
        if (largest > 0 && largest < SMALLEST) {
            throw new InputException(String.format(Locale.ROOT, "every value after preparation is below %s in "
                    + "magnitude (the largest, %s, is sample '%s' in feature '%s'); treeproof computes with magnitudes "
                    + "from %s (their squares must not underflow): multiply the table by a power of ten, or use "
                    + "--scale zscore", SMALLEST, data.get(wi, wj), data.sampleIds().get(wi),
                    data.featureNames().get(wj), SMALLEST));
        }
    }

    /** Refuses given distances beyond {@link #LIMIT}, naming the first such pair. */
    public static void requireWithinLimit(List<String> ids, CondensedDistances d) {
        int n = d.size();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double v = d.get(i, j);
                if (v > LIMIT) {
                    throw new InputException(String.format(Locale.ROOT, "the distance between '%s' and '%s' is %s; "
                            + "treeproof computes with distances up to %s (linkage updates and squares must stay "
                            + "finite): divide the table by a power of ten", ids.get(i), ids.get(j), v, LIMIT));
                }
            }
        }
    }

    /** Refuses a study input with data or distances beyond {@link #LIMIT}. */
    public static void requireWithinLimit(StudyInput input) {
        if (input.data() != null) {
            requireWithinLimit(input.data());
        }
        if (input.distances() != null) {
            requireWithinLimit(input.sampleIds(), input.distances());
        }
    }
}
