package org.treeproof.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.treeproof.partition.ContingencyTable;
import org.treeproof.partition.Partition;
import org.treeproof.score.AdjustedRandIndex;

/**
 * How the recommended solution compares with classes the user already knows ({@code --labels}).
 *
 * <p>The agreement is the adjusted Rand index of L. Hubert and P. Arabie, "Comparing partitions", Journal of
 * Classification 2 (1985) 193-218, doi:10.1007/BF01908075: 1 for the same grouping, about 0 for agreement no
 * better than chance.
 *
 * <p>Outliers (samples set aside, in no cluster) count each as a group of their own in the index, as the judgement
 * suite counts them, and are shown as one row of their own beside the clusters.
 *
 * @param classNames the known classes, in order of their first sample in the input
 * @param ari        the adjusted Rand index of the recommended solution with the classes
 * @param table      the contingency table, {@code [cluster][class]}: rows are the recommended clusters in their
 *                   order (cluster {@code r + 1}), columns the classes in the order of {@code classNames}
 * @param outliers   the outliers of each class, in the order of {@code classNames} (all 0 without outliers)
 */
public record LabelComparison(List<String> classNames, double ari, int[][] table, int[] outliers) {

    /** A comparison without outliers. */
    public LabelComparison(List<String> classNames, double ari, int[][] table) {
        this(classNames, ari, table, new int[classNames.size()]);
    }

    public LabelComparison {
        classNames = List.copyOf(classNames);
        if (outliers.length != classNames.size()) {
            throw new IllegalArgumentException(outliers.length + " outlier counts for " + classNames.size()
                    + " classes");
        }
        outliers = outliers.clone();
        if (classNames.isEmpty() || table.length == 0) {
            throw new IllegalArgumentException("a label comparison needs at least one class and one cluster");
        }
        if (!(ari <= 1.0)) {
            throw new IllegalArgumentException("adjusted Rand index " + ari + " is above 1 or not a number");
        }
        int[][] t = new int[table.length][];
        for (int r = 0; r < table.length; r++) {
            if (table[r].length != classNames.size()) {
                throw new IllegalArgumentException("row " + r + " has " + table[r].length + " cells for "
                        + classNames.size() + " classes");
            }
            for (int c : table[r]) {
                if (c < 0) {
                    throw new IllegalArgumentException("negative count in the contingency table");
                }
            }
            t[r] = table[r].clone();
        }
        table = t;
    }

    /**
     * Compares a solution with known classes.
     *
     * @param recommended  the recommended clusters over all samples, in input order, outliers marked
     * @param classLabels  each sample's known class, in input order
     * @throws IllegalArgumentException if the numbers of samples differ or a label is missing
     */
    public static LabelComparison of(org.treeproof.partition.Clustering recommended, String[] classLabels) {
        LabelComparison all = of(recommended.withSingletons(), classLabels);
        int[][] table = new int[recommended.k()][all.classNames().size()];
        int[] outliers = new int[all.classNames().size()];
        var index = new java.util.HashMap<String, Integer>();
        for (int c = 0; c < all.classNames().size(); c++) {
            index.put(all.classNames().get(c), c);
        }
        for (int i = 0; i < classLabels.length; i++) {
            int c = index.get(classLabels[i]);
            if (recommended.isOutlier(i)) {
                outliers[c]++;
            } else {
                table[recommended.label(i)][c]++;
            }
        }
        return new LabelComparison(all.classNames(), all.ari(), table, outliers);
    }

    /** Whether some samples are outliers. */
    public boolean hasOutliers() {
        return java.util.Arrays.stream(outliers).sum() > 0;
    }

    @Override
    public int[] outliers() {
        return outliers.clone();
    }

    /**
     * Compares a partition (every sample in a group) with known classes.
     *
     * @param recommended  the recommended solution over all samples, in input order
     * @param classLabels  each sample's known class, in input order
     * @throws IllegalArgumentException if the numbers of samples differ or a label is missing
     */
    public static LabelComparison of(Partition recommended, String[] classLabels) {
        Objects.requireNonNull(recommended, "recommended");
        if (classLabels.length != recommended.size()) {
            throw new IllegalArgumentException(classLabels.length + " class labels for " + recommended.size()
                    + " samples");
        }
        Map<String, Integer> index = new LinkedHashMap<>();
        int[] codes = new int[classLabels.length];
        for (int i = 0; i < classLabels.length; i++) {
            String label = Objects.requireNonNull(classLabels[i], "class label of sample " + i);
            codes[i] = index.computeIfAbsent(label, x -> index.size());
        }
        // first-appearance codes are already canonical, so the table's columns follow classNames
        Partition classes = Partition.of(codes);
        ContingencyTable table = ContingencyTable.of(recommended, classes);
        double ari = AdjustedRandIndex.of(table).compute().value();
        return new LabelComparison(List.copyOf(index.keySet()), ari, table.toArray());
    }

    @Override
    public int[][] table() {
        int[][] t = new int[table.length][];
        for (int r = 0; r < t.length; r++) {
            t[r] = table[r].clone();
        }
        return t;
    }

    /** The number of clusters (rows). */
    public int clusters() {
        return table.length;
    }

    /** The count of samples in cluster row {@code r} and class column {@code c}. */
    public int count(int r, int c) {
        return table[r][c];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LabelComparison l && l.classNames.equals(classNames) && Double.compare(l.ari, ari) == 0
                && java.util.Arrays.deepEquals(l.table, table) && java.util.Arrays.equals(l.outliers, outliers);
    }

    @Override
    public int hashCode() {
        return 31 * classNames.hashCode() + java.util.Arrays.deepHashCode(table);
    }

    @Override
    public String toString() {
        return "LabelComparison[classes=" + classNames + ", ari=" + ari + ", clusters=" + table.length + "]";
    }
}
