package org.treeproof.explain;

import java.util.List;
import java.util.Objects;

/**
 * How the chosen solution fares under alternative analyses.
 *
 * @param linkage   the linkage rerun (the chosen one)
 * @param k         the number of clusters cut (the chosen one)
 * @param survives  the smallest best-match Jaccard at which a chosen cluster counts as found again
 * @param rows      one row per alternative, in a fixed order
 */
public record SensitivityResult(String linkage, int k, double survives, List<Row> rows) {
    public SensitivityResult {
        Objects.requireNonNull(linkage, "linkage");
        rows = List.copyOf(rows);
    }

    /**
     * One alternative analysis.
     *
     * @param name        a short name ("scale: none", "metric: manhattan")
     * @param change      what differs from the chosen analysis: scale, log2, top-variable or metric
     * @param librarySize the library-size method used ({@code none} without one)
     * @param scale       the scaling used
     * @param log2        whether log2 was applied
     * @param topVariable features kept by variance, 0 for all
     * @param metric      the dissimilarity used
     * @param ari         the adjusted Rand index with the chosen solution over the clustered samples (NaN when not run)
     * @param jaccard     per chosen cluster (index c − 1) its best-match Jaccard (empty when not run)
     * @param note        why the alternative could not be run, empty when it ran
     */
    public record Row(String name, String change, String librarySize, String scale, boolean log2, int topVariable, String metric,
            double ari, double[] jaccard, String note) {
        public Row {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(note, "note");
            jaccard = jaccard.clone();
        }

        @Override
        public double[] jaccard() {
            return jaccard.clone();
        }

        /** Whether the alternative ran. */
        public boolean ran() {
            return note.isEmpty();
        }

        /** The number of chosen clusters found again at Jaccard {@code survives} or more. */
        public int surviving(double survives) {
            int n = 0;
            for (double j : jaccard) {
                n += j >= survives ? 1 : 0;
            }
            return n;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Row r && r.name.equals(name) && r.change.equals(change) && r.scale.equals(scale)
                    && r.log2 == log2 && r.topVariable == topVariable && r.metric.equals(metric)
                    && Double.compare(r.ari, ari) == 0 && java.util.Arrays.equals(r.jaccard, jaccard)
                    && r.note.equals(note);
        }

        @Override
        public int hashCode() {
            return Objects.hash(name, change, scale, log2, topVariable, metric, ari, note);
        }

        @Override
        public String toString() {
            return "Row[" + name + ", ari=" + ari + (note.isEmpty() ? "" : ", " + note) + "]";
        }
    }

    /** The rows that ran. */
    public List<Row> ran() {
        return rows.stream().filter(Row::ran).toList();
    }
}
