package org.treeproof.tree;

import java.util.Arrays;
import org.treeproof.distance.CondensedDistances;

/**
 * The mutable state shared by the matrix-updating algorithms: one working copy of the condensed matrix,
 * the sorted list of active cluster slots and their sizes.
 *
 * <p>A cluster lives in the slot of one of its items. When slots {@code x < y} merge, {@code x} is
 * dropped and {@code y} holds the union, the convention of Müllner's fastcluster and of scipy, which
 * keeps tie resolution identical to theirs. Loops run over the list of active slots, not over all n
 * checking each; {@code rowOffset} turns the condensed index of {@code (i, j)}, {@code i < j}, into one
 * addition.
 *
 * <p>The running time is set by memory traffic: the half of a slot's distances that lies in its column
 * of the upper triangle costs one cache line (and, with small pages, one TLB entry) per item.
 */
final class WorkingDistances {
    final int n;
    final double[] d;
    final int[] size;
    private final int[] rowOffset;
    private final int[] active;
    private int count;
    private final double[] bufX;
    /** After {@link #merge}: the new distance to the union from each {@link #touchedSlot}. */
    final double[] touchedDistance;
    /** After {@link #merge}: every active slot other than the union, in increasing order. */
    final int[] touchedSlot;
    private final int[] bufSize;
    private final int[] bufPos;

    /** Works on a copy of {@code source}. */
    WorkingDistances(CondensedDistances source) {
        this(source.size(), source.toCondensedArray());
    }

    /** Works in place on {@code condensed}, a condensed matrix over {@code n} items that it now owns. */
    WorkingDistances(int n, double[] condensed) {
        this.n = n;
        d = condensed;
        size = new int[n];
        Arrays.fill(size, 1);
        rowOffset = new int[n];
        for (int i = 0; i < n; i++) {
            rowOffset[i] = (int) ((long) n * i - (long) i * (i + 1) / 2 - i - 1);
        }
        active = new int[n];
        for (int i = 0; i < n; i++) {
            active[i] = i;
        }
        count = n;
        bufX = new double[n];
        touchedDistance = new double[n];
        touchedSlot = new int[n];
        bufSize = new int[n];
        bufPos = new int[n];
    }

    /** Condensed position of {@code (i, j)}; requires {@code i < j}. */
    int index(int i, int j) {
        return rowOffset[i] + j;
    }

    double get(int i, int j) {
        return i < j ? d[rowOffset[i] + j] : d[rowOffset[j] + i];
    }

    /** The smallest active slot. */
    int firstActive() {
        return active[0];
    }

    /**
     * The active slot nearest to {@code x}, scanning in increasing slot order and replacing the current
     * best only when strictly closer; {@code preferred} (or -1) is the starting best, so it wins ties.
     */
    int nearest(int x, int preferred) {
        double best = preferred >= 0 ? get(x, preferred) : Double.POSITIVE_INFINITY;
        int arg = preferred;
        final double[] dd = d;
        final int[] off = rowOffset;
        final int[] act = active;
        int p = Arrays.binarySearch(act, 0, count, x);
        for (int r = 0; r < p; r++) {
            int i = act[r];
            double v = dd[off[i] + x];
            if (v < best) {
                best = v;
                arg = i;
            }
        }
        int ox = off[x];
        for (int r = p + 1, m = count; r < m; r++) {
            int i = act[r];
            double v = dd[ox + i];
            if (v < best) {
                best = v;
                arg = i;
            }
        }
        return arg;
    }

    /** The active slot above {@code x} nearest to it (smallest slot on ties), or -1 if none. */
    int nearestAbove(int x) {
        double best = Double.POSITIVE_INFINITY;
        int arg = -1;
        final double[] dd = d;
        final int[] act = active;
        int ox = rowOffset[x];
        for (int r = Arrays.binarySearch(act, 0, count, x) + 1, m = count; r < m; r++) {
            int i = act[r];
            double v = dd[ox + i];
            if (v < best) {
                best = v;
                arg = i;
            }
        }
        return arg;
    }

    /**
     * Merges slots {@code x < y} at distance {@code dxy}: drops {@code x}, gives {@code y} the union and
     * its Lance-Williams distances to every other active slot, which are left in {@link #touchedSlot} and
     * {@link #touchedDistance} for the caller's bookkeeping; returns how many.
     */
    int merge(Linkage linkage, int x, int y, double dxy) {
        int nx = size[x];
        int ny = size[y];
        int p = Arrays.binarySearch(active, 0, count, x);
        System.arraycopy(active, p + 1, active, p, count - p - 1);
        count--;
        final double[] dd = d;
        final int[] off = rowOffset;
        final int[] act = active;
        final int ox = off[x];
        final int oy = off[y];
        int c = 0;
        for (int r = 0, m = count; r < m; r++) {
            int i = act[r];
            int px;
            int py;
            if (i < x) {
                px = off[i] + x;
                py = off[i] + y;
            } else if (i < y) {
                px = ox + i;
                py = off[i] + y;
            } else if (i > y) {
                px = ox + i;
                py = oy + i;
            } else {
                continue;
            }
            bufX[c] = dd[px];
            touchedDistance[c] = dd[py];
            touchedSlot[c] = i;
            bufSize[c] = size[i];
            bufPos[c] = py;
            c++;
        }
        linkage.update(bufX, touchedDistance, dxy, nx, ny, bufSize, c);
        for (int r = 0; r < c; r++) {
            dd[bufPos[r]] = touchedDistance[r];
        }
        size[x] = 0;
        size[y] = nx + ny;
        return c;
    }
}
