package org.treeproof.chart;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;

/** Cluster names, colours and key entries, the same on every chart. */
final class Clusters {
    /** Beyond this many clusters a key lists the first ones and counts the rest. */
    static final int KEY_MAX = 12;

    private Clusters() {
    }

    /** The strip's text for a run of one label: the 1-based cluster number, or "out" for outliers (-1). */
    static String stripText(int label) {
        return label < 0 ? "out" : Integer.toString(label + 1);
    }

    /** Labels are 0-based inside the program and 1-based for readers, as on the command line. */
    static String name(int label) {
        return "cluster " + (label + 1);
    }

    static Color[] colours(int k) {
        Color[] c = new Color[k];
        for (int i = 0; i < k; i++) {
            c[i] = ChartColors.cluster(i);
        }
        return c;
    }

    static int[] sizes(int[] labels, int k) {
        int[] s = new int[k];
        for (int l : labels) {
            if (l >= 0) {
                s[l]++;
            }
        }
        return s;
    }

    /** The number of outliers (label -1). */
    static int outliers(int[] labels) {
        int c = 0;
        for (int l : labels) {
            c += l < 0 ? 1 : 0;
        }
        return c;
    }

    /** The key's swatch for outliers, or none when there are none. */
    static List<Key.Entry> outlierEntry(int[] labels, String unit) {
        int o = outliers(labels);
        return o == 0 ? List.of() : List.of(Key.Entry.fill(ChartColors.OUTLIER, "outliers (no cluster): " + o + " "
                + unit(unit, o)));
    }

    /** One swatch per cluster with its size, e.g. "cluster 2: 41 samples". */
    static List<Key.Entry> entries(int[] sizes, String unit) {
        List<Key.Entry> e = new ArrayList<>();
        int shown = sizes.length <= KEY_MAX + 1 ? sizes.length : KEY_MAX;
        for (int c = 0; c < shown; c++) {
            e.add(Key.Entry.fill(ChartColors.cluster(c), name(c) + ": " + sizes[c] + " " + unit(unit, sizes[c])));
        }
        if (shown < sizes.length) {
            e.add(Key.Entry.note("and " + (sizes.length - shown) + " more clusters (colours repeat after "
                    + ChartColors.clusterColorCount() + ")"));
        }
        return e;
    }

    private static String unit(String unit, int count) {
        return count == 1 && unit.endsWith("s") ? unit.substring(0, unit.length() - 1) : unit;
    }

    /** Runs of equal labels along {@code order}: {start, endExclusive, label} triples. */
    static List<int[]> runs(int[] labelOfItem, int[] order) {
        List<int[]> runs = new ArrayList<>();
        int start = 0;
        for (int p = 1; p <= order.length; p++) {
            if (p == order.length || labelOfItem[order[p]] != labelOfItem[order[start]]) {
                runs.add(new int[] {start, p, labelOfItem[order[start]]});
                start = p;
            }
        }
        return runs;
    }
}
