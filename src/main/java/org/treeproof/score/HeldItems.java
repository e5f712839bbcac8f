package org.treeproof.score;

import java.util.Objects;

/**
 * The distinct original items a replicate holds, ascending, each with the replicate position of its
 * first occurrence.
 *
 * <p>Every replicate-based score counts an item drawn more than once (a bootstrap repeat) as one
 * item, with the cluster of its first occurrence; this class is where that rule lives.
 */
final class HeldItems {
    /** Distinct held items, ascending. */
    final int[] items;
    /** {@code positions[a]} is the first replicate position holding {@code items[a]}. */
    final int[] positions;

    private HeldItems(int[] items, int[] positions) {
        this.items = items;
        this.positions = positions;
    }

    /**
     * @param n     the number of original items; every index must be below it
     * @param drawn original item index per replicate position
     */
    static HeldItems of(int n, int[] drawn) {
        Objects.requireNonNull(drawn, "items");
        int[] first = new int[n];
        java.util.Arrays.fill(first, -1);
        int distinct = 0;
        for (int a = 0; a < drawn.length; a++) {
            int i = drawn[a];
            if (i < 0 || i >= n) {
                throw new IllegalArgumentException("item index " + i + " is outside 0.." + (n - 1));
            }
            if (first[i] < 0) {
                first[i] = a;
                distinct++;
            }
        }
        int[] items = new int[distinct];
        int[] positions = new int[distinct];
        int t = 0;
        for (int i = 0; i < n && t < distinct; i++) {
            if (first[i] >= 0) {
                items[t] = i;
                positions[t++] = first[i];
            }
        }
        return new HeldItems(items, positions);
    }

    int size() {
        return items.length;
    }
}
