package org.treeproof.tree;

/**
 * The nearest-neighbour chain algorithm for the reducible linkages (complete, average, weighted,
 * Ward): O(n²) time on one working copy of the condensed matrix. Müllner (2011), arXiv:1109.2378;
 * F. Murtagh, "A survey of recent advances in hierarchical clustering algorithms", The
 * Computer Journal 26 (1983) 354-359, doi:10.1093/comjnl/26.4.354.
 *
 * <p>The chain is followed until two clusters are each other's nearest neighbours; the element before
 * the top of the chain wins ties, which rules out cycles, and otherwise the smallest slot wins, as in
 * scipy's {@code nn_chain}. The merges, found out of height order, are then sorted and relabelled.
 *
 * <p>Every step scans the top of the chain in full. Caching a few nearest neighbours per cluster
 * would avoid most scans but was measured slower: the scans of the two clusters about to merge bring
 * their columns into cache for the update that follows, and without them the update pays those misses.
 */
final class NearestNeighborChain {
    private final Linkage linkage;
    private final WorkingDistances w;

    /** Clusters {@code w}, which it overwrites. */
    NearestNeighborChain(Linkage linkage, WorkingDistances w) {
        this.linkage = linkage;
        this.w = w;
    }

    MergeTree run() {
        int n = w.n;
        int m = n - 1;
        int[] a = new int[m];
        int[] b = new int[m];
        double[] h = new double[m];
        int[] chain = new int[n];
        int length = 0;
        for (int k = 0; k < m; k++) {
            if (length == 0) {
                chain[0] = w.firstActive();
                length = 1;
            }
            int x;
            int y;
            while (true) {
                x = chain[length - 1];
                int previous = length > 1 ? chain[length - 2] : -1;
                y = w.nearest(x, previous);
                if (y == previous) {
                    break;
                }
                chain[length++] = y;
            }
            length -= 2;
            if (x > y) {
                int t = x;
                x = y;
                y = t;
            }
            double dxy = w.get(x, y);
            a[k] = x;
            b[k] = y;
            h[k] = dxy;
            w.merge(linkage, x, y, dxy);
        }
        return MergeOrder.sortAndLabel(n, a, b, h);
    }
}
