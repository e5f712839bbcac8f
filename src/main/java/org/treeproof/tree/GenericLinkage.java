package org.treeproof.tree;

/**
 * The generic agglomeration algorithm with a nearest-neighbour list, for the linkages that are not
 * reducible (centroid, median): every step merges the globally closest pair, found through a heap of
 * lower bounds on each slot's distance to its nearest neighbour among the higher slots. Müllner (2011),
 * arXiv:1109.2378; O(n²) in the usual case, O(n³) at worst.
 *
 * <p>Merge heights can decrease from one merge to the next (inversions), so the merges are kept in the
 * order they happen, not sorted. The steps, the nearest-neighbour scans (first of equal distances, so
 * the smaller slot) and the heap (a binary heap compared on values only, with the same sift rules) are
 * those of scipy 1.10's {@code fast_linkage}, so tied distances are resolved as scipy resolves them:
 * deterministically, with the heap layout deciding between equal bounds. Resolving heap ties by the
 * smaller slot instead would be equally valid but would give trees that differ from scipy's on data
 * with ties (Fisher's Iris has many), which users could not cross-check.
 */
final class GenericLinkage {
    private final Linkage linkage;
    private final WorkingDistances w;

    /** Clusters {@code w}, which it overwrites. */
    GenericLinkage(Linkage linkage, WorkingDistances w) {
        this.linkage = linkage;
        this.w = w;
    }

    MergeTree run() {
        int n = w.n;
        int m = n - 1;
        int[] left = new int[m];
        int[] right = new int[m];
        double[] heights = new double[m];
        int[] clusterId = new int[n];
        for (int i = 0; i < n; i++) {
            clusterId[i] = i;
        }
        // neighbor[x] is a candidate nearest neighbour of slot x among higher slots and bound[x] a lower
        // bound on the distance to the true one; the heap is keyed by slot 0..n-2
        int[] neighbor = new int[Math.max(m, 0)];
        double[] bound = new double[Math.max(m, 0)];
        for (int x = 0; x < m; x++) {
            neighbor[x] = w.nearestAbove(x);
            bound[x] = w.d[w.index(x, neighbor[x])];
        }
        Heap heap = new Heap(bound);
        for (int k = 0; k < m; k++) {
            int x;
            int y;
            double dxy;
            while (true) {
                x = heap.topKey();
                y = neighbor[x];
                dxy = heap.topValue();
                if (dxy == w.d[w.index(x, y)]) {
                    break;
                }
                y = w.nearestAbove(x);
                neighbor[x] = y;
                bound[x] = w.d[w.index(x, y)];
                heap.change(x, bound[x]);
            }
            heap.removeTop();
            int idX = clusterId[x];
            int idY = clusterId[y];
            left[k] = Math.min(idX, idY);
            right[k] = Math.max(idX, idY);
            heights[k] = dxy;
            int touched = w.merge(linkage, x, y, dxy);
            clusterId[y] = n + k;

            // the slots below y come first among the touched ones, in increasing order (as scipy's loop)
            for (int r = 0; r < touched; r++) {
                int z = w.touchedSlot[r];
                if (z >= y) {
                    break;
                }
                if (z < x && neighbor[z] == x) {
                    neighbor[z] = y; // a guess; the bound stays valid and is checked when z surfaces
                }
                double v = w.touchedDistance[r];
                if (v < bound[z]) {
                    neighbor[z] = y;
                    bound[z] = v;
                    heap.change(z, v);
                }
            }
            if (y < n - 1) {
                int z = w.nearestAbove(y);
                neighbor[y] = z;
                bound[y] = w.d[w.index(y, z)];
                heap.change(y, bound[y]);
            }
        }
        return new MergeTree(n, left, right, heights, false);
    }

    /**
     * A binary min-heap over keys {@code 0..size-1} with a changeable value per key. Which of several
     * equal values is on top depends on the history of the heap, exactly as in scipy's heap.
     */
    private static final class Heap {
        private final int[] keyAt;
        private final int[] positionOf;
        private final double[] value;
        private int size;

        Heap(double[] initial) {
            size = initial.length;
            value = initial.clone();
            keyAt = new int[size];
            positionOf = new int[size];
            for (int i = 0; i < size; i++) {
                keyAt[i] = i;
                positionOf[i] = i;
            }
            for (int i = size / 2 - 1; i >= 0; i--) {
                siftDown(i);
            }
        }

        int topKey() {
            return keyAt[0];
        }

        double topValue() {
            return value[keyAt[0]];
        }

        void removeTop() {
            swap(0, size - 1);
            size--;
            siftDown(0);
        }

        void change(int key, double v) {
            int p = positionOf[key];
            double old = value[key];
            value[key] = v;
            if (v < old) {
                siftUp(p);
            } else {
                siftDown(p);
            }
        }

        private boolean less(int p, int q) {
            int a = keyAt[p];
            int b = keyAt[q];
            return value[a] < value[b];
        }

        private void siftUp(int p) {
            while (p > 0) {
                int parent = (p - 1) >>> 1;
                if (!less(p, parent)) {
                    return;
                }
                swap(p, parent);
                p = parent;
            }
        }

        private void siftDown(int p) {
            while (true) {
                int c = 2 * p + 1;
                if (c >= size) {
                    return;
                }
                if (c + 1 < size && less(c + 1, c)) {
                    c++;
                }
                if (!less(c, p)) {
                    return;
                }
                swap(p, c);
                p = c;
            }
        }

        private void swap(int p, int q) {
            int a = keyAt[p];
            int b = keyAt[q];
            keyAt[p] = b;
            keyAt[q] = a;
            positionOf[b] = p;
            positionOf[a] = q;
        }
    }
}
