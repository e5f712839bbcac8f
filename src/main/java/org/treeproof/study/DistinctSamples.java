package org.treeproof.study;

import java.util.Arrays;
import java.util.HashSet;
import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.resample.ReferenceData;

/**
 * How many samples of a study input differ from each other, which bounds the number of clusters a tree can tell
 * apart: every linkage merges identical samples at height 0 first, so cutting into more clusters than there are
 * distinct samples only splits copies of one sample (an arbitrary cut), and the within-cluster dispersion of the
 * gap statistic is then 0, whose logarithm does not exist.
 *
 * <p>For a data table two samples are the same when every value is equal ({@code -0.0} equals {@code 0.0}); for
 * a distance table when their distance is 0 (or a chain of zero distances joins them).
 */
public final class DistinctSamples {
    private DistinctSamples() {
    }

    /** The number of distinct samples of {@code input}, from 1 to its number of samples. */
    public static int count(StudyInput input) {
        Objects.requireNonNull(input, "input");
        return input.hasData() ? ofRows(input.data()) : ofDistances(input.distances());
    }

    /**
     * The fewest distinct samples among the gap statistic's reference data sets of a study of {@code input} with
     * {@code settings}, or {@link Integer#MAX_VALUE} when there are none or their values are continuous (no ties
     * but by chance of measure 0). The 0/1 reference data ({@link ReferenceData.Kind#FEATURE_FREQUENCY}) are drawn
     * here exactly as the gap statistic will draw them, one at a time, so a study that would meet a reference set
     * with too few distinct samples can be refused before any work; drawing costs a small share of clustering them.
     * Data that are not all 0/1 are left to the metric to refuse.
     */
    public static int fewestInGapReferences(StudyInput input, StudySettings settings) {
        if (!input.hasData() || settings.referenceSets() == 0
                || settings.gapReference() != ReferenceData.Kind.FEATURE_FREQUENCY) {
            return Integer.MAX_VALUE;
        }
        for (double v : input.data().rowMajorCopy()) {
            if (v != 0 && v != 1) {
                // not 0/1 data: the metric refuses them, naming the cell, when it computes the distances
                return Integer.MAX_VALUE;
            }
        }
        ReferenceData generator = settings.gapReference().prepare(input.data());
        int fewest = Integer.MAX_VALUE;
        for (int b = 0; b < settings.referenceSets(); b++) {
            fewest = Math.min(fewest, ofRows(generator.draw(GapRun.referenceSeed(settings.seed(), b))));
        }
        return fewest;
    }

    private static int ofRows(DataMatrix data) {
        var seen = new HashSet<Row>();
        for (int i = 0; i < data.samples(); i++) {
            double[] r = data.row(i);
            for (int j = 0; j < r.length; j++) {
                r[j] = r[j] == 0 ? 0.0 : r[j];
            }
            seen.add(new Row(r));
        }
        return seen.size();
    }

    private static int ofDistances(CondensedDistances d) {
        int n = d.size();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        int distinct = n;
        int t = 0;
        for (int i = 0; i < n - 1; i++) {
            for (int j = i + 1; j < n; j++, t++) {
                if (d.at(t) == 0) {
                    int a = root(parent, i);
                    int b = root(parent, j);
                    if (a != b) {
                        parent[Math.max(a, b)] = Math.min(a, b);
                        distinct--;
                    }
                }
            }
        }
        return distinct;
    }

    private static int root(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    /** A row compared by value. */
    private record Row(double[] values) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Row r && Arrays.equals(values, r.values);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(values);
        }
    }
}
