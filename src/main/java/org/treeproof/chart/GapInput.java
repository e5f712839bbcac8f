package org.treeproof.chart;

import java.util.Arrays;
import java.util.Objects;

/**
 * What the gap-statistic chart shows: Gap(k) and its standard error s_k for k = 1..K.
 *
 * @param title         the chart title in plain words, e.g. "Gap statistic, average linkage"
 * @param gap           Gap(k) at index k-1, finite, at least one value
 * @param standardError s_k at index k-1, finite and non-negative
 * @param chosenK       the number of clusters the gap rule picked, 1..K, or 0 for none
 * @param linkage       the linkage whose tree was cut, which gives the line its colour
 *                      ({@link ChartColors#linkage}), or {@code null} for the first series colour
 */
public record GapInput(String title, double[] gap, double[] standardError, int chosenK, String linkage) {

    public GapInput {
        Check.text(title, "title");
        Objects.requireNonNull(gap, "gap");
        if (gap.length == 0) {
            throw new IllegalArgumentException("gap must hold at least one value (k = 1)");
        }
        gap = Check.finite(gap, gap.length, "gap");
        standardError = Check.within(standardError, gap.length, 0, Double.MAX_VALUE, false, "standardError");
        if (chosenK < 0 || chosenK > gap.length) {
            throw new IllegalArgumentException("chosenK " + chosenK + " is outside 1.." + gap.length + " (0 for none)");
        }
        if (linkage != null) {
            Check.text(linkage, "linkage");
        }
    }

    /** A gap chart that names no linkage. */
    public GapInput(String title, double[] gap, double[] standardError, int chosenK) {
        this(title, gap, standardError, chosenK, null);
    }

    /** K, the largest number of clusters shown. */
    public int maxK() {
        return gap.length;
    }

    @Override
    public double[] gap() {
        return gap.clone();
    }

    @Override
    public double[] standardError() {
        return standardError.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GapInput g && g.title.equals(title) && Arrays.equals(g.gap, gap)
                && Arrays.equals(g.standardError, standardError) && g.chosenK == chosenK
                && Objects.equals(g.linkage, linkage);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, Arrays.hashCode(gap), Arrays.hashCode(standardError), chosenK, linkage);
    }

    @Override
    public String toString() {
        return "GapInput[" + title + ", K=" + gap.length + ", chosen=" + chosenK + (linkage == null ? "" : ", " + linkage) + "]";
    }
}
