package org.treeproof.data;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Features whose values fall in separated modes on their own, by Hartigan's dip test ({@link DipTest}). Dividing
 * such a feature by its standard deviation (z-scores) divides it by a spread that includes the distance between its
 * modes, so groups that lie on a few such features weigh in the distances no more than each unimodal feature and
 * can be diluted by them.
 *
 * <p>A feature is tested when it has at least {@link DipTest#MIN_SAMPLES} values and no value is held by more than
 * {@link #MOST_COMMON_SHARE} of the samples (at least two): the dip's reference is a continuous distribution, and
 * answers on a short scale, counts and zero-inflated values repeat values by design, which the dip reads as modes
 * (our choice of limit). A tested feature is flagged when its p-value times the number of features tested is at
 * most {@link #ALPHA} (Bonferroni), so that data without modes flag any feature with probability at most about
 * {@code ALPHA}; where that needs a p-value below the table's smallest level, no feature is flagged. The dip does
 * not change under shifting and scaling, so it can be read on the prepared data.
 */
public final class MultimodalFeatures {
    /** The family-wise level over the features tested. Our choice: a note should rarely be wrong. */
    public static final double ALPHA = 0.01;
    /** The largest share of the samples one value may hold for the feature to be tested. Our choice. */
    public static final double MOST_COMMON_SHARE = 0.05;

    private MultimodalFeatures() {
    }

    /**
     * One flagged feature.
     *
     * @param feature the feature's name
     * @param test    its dip and p-value
     */
    public record Flag(String feature, DipTest.Result test) {
    }

    /**
     * The outcome over a data table.
     *
     * @param tested the number of features tested
     * @param flags  the flagged features, largest dip first
     */
    public record Result(int tested, List<Flag> flags) {
        public Result {
            flags = List.copyOf(flags);
        }
    }

    /** Tests every feature of {@code data}. */
    public static Result of(DataMatrix data) {
        int n = data.samples();
        var tests = new ArrayList<Flag>();
        if (n >= DipTest.MIN_SAMPLES) {
            int allowed = (int) Math.max(2, Math.floor(MOST_COMMON_SHARE * n));
            for (int j = 0; j < data.features(); j++) {
                double[] x = data.column(j).clone();
                Arrays.sort(x);
                if (largestRun(x) > allowed) {
                    continue;
                }
                tests.add(new Flag(data.featureNames().get(j), DipTest.pValue(DipTest.dipOfSorted(x), n)));
            }
        }
        int tested = tests.size();
        var flags = new ArrayList<Flag>();
        for (Flag f : tests) {
            if (f.test().pValue() * tested <= ALPHA) {
                flags.add(f);
            }
        }
        flags.sort(Comparator.comparingDouble((Flag f) -> -f.test().dip()));
        return new Result(tested, flags);
    }

    private static int largestRun(double[] sorted) {
        int best = 0;
        for (int i = 0; i < sorted.length;) {
            int j = i;
            while (j < sorted.length && sorted[j] == sorted[i]) {
                j++;
            }
            best = Math.max(best, j - i);
            i = j;
        }
        return best;
    }
}
