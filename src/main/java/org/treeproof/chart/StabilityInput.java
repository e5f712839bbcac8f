package org.treeproof.chart;

import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * What the stability chart shows: for each linkage, how well replicate clusterings agree with the full-data
 * clustering at each number of clusters, against the agreement expected without structure.
 *
 * @param title         the chart title in plain words, e.g. "Stability of the clusters over 200 replicates"
 * @param k             the numbers of clusters, strictly increasing, each at least 1
 * @param linkages      one series per linkage, named by the linkage, each with one point per {@code k};
 *                      values are adjusted Rand indices (mean and 95% interval over replicates)
 * @param reference     the same measure for data without cluster structure (mean and 95% interval), one point
 *                      per {@code k}; {@code null} when not computed
 * @param chosenK       the recommended number of clusters, one of {@code k}, or 0 for none
 * @param chosenLinkage the name of the recommended linkage (one of {@code linkages}), or {@code null}
 */
public record StabilityInput(String title, int[] k, List<IntervalSeries> linkages, IntervalSeries reference,
        int chosenK, String chosenLinkage) {

    public StabilityInput {
        Check.text(title, "title");
        k = increasingK(k);
        Objects.requireNonNull(linkages, "linkages");
        linkages = List.copyOf(linkages);
        if (linkages.isEmpty()) {
            throw new IllegalArgumentException("linkages must hold at least one series");
        }
        Set<String> names = new HashSet<>();
        for (IntervalSeries s : linkages) {
            Check.length(s.size(), k.length, "linkage series " + s.name());
            if (!names.add(s.name())) {
                throw new IllegalArgumentException("linkage series name " + s.name() + " appears twice");
            }
        }
        if (reference != null) {
            Check.length(reference.size(), k.length, "reference series");
        }
        checkChosenK(chosenK, k);
        if (chosenLinkage != null && !names.contains(chosenLinkage)) {
            throw new IllegalArgumentException("chosenLinkage " + chosenLinkage + " is not among the series " + names);
        }
    }

    static int[] increasingK(int[] k) {
        Objects.requireNonNull(k, "k");
        if (k.length == 0) {
            throw new IllegalArgumentException("k must hold at least one number of clusters");
        }
        for (int i = 0; i < k.length; i++) {
            if (k[i] < 1 || (i > 0 && k[i] <= k[i - 1])) {
                throw new IllegalArgumentException("k must be strictly increasing numbers of at least 1, got "
                        + Arrays.toString(k));
            }
        }
        return k.clone();
    }

    static void checkChosenK(int chosenK, int[] k) {
        if (chosenK != 0 && Arrays.stream(k).noneMatch(v -> v == chosenK)) {
            throw new IllegalArgumentException("chosenK " + chosenK + " is not among k " + Arrays.toString(k)
                    + " (use 0 for none)");
        }
    }

    @Override
    public int[] k() {
        return k.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof StabilityInput s && s.title.equals(title) && Arrays.equals(s.k, k)
                && s.linkages.equals(linkages) && Objects.equals(s.reference, reference) && s.chosenK == chosenK
                && Objects.equals(s.chosenLinkage, chosenLinkage);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, Arrays.hashCode(k), linkages, reference, chosenK, chosenLinkage);
    }

    @Override
    public String toString() {
        return "StabilityInput[" + title + ", linkages=" + linkages.size() + ", k=" + Arrays.toString(k) + "]";
    }
}
