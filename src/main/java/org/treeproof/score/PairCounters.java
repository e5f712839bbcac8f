package org.treeproof.score;

/**
 * Small unsigned counters, one per item pair in condensed order, in several parallel arrays.
 *
 * <p>A counter is one byte when every count stays below 256 and two bytes (a low and a high byte
 * array) otherwise, so a consensus over 20 000 items and ten cuts costs 2·10<sup>9</sup> bytes rather
 * than four or eight times that. Arithmetic is modulo 2<sup>8</sup> or 2<sup>16</sup>: a counter may
 * pass through "negative" values while a difference encoding is built, and ends exact as long as the
 * true final count fits.
 */
final class PairCounters {
    final int arrays;
    final int length;
    private final byte[][] low;
    private final byte[][] high;

    PairCounters(int arrays, int length, boolean wide) {
        this.arrays = arrays;
        this.length = length;
        this.low = new byte[arrays][length];
        this.high = wide ? new byte[arrays][length] : null;
    }

    /** Bytes held by counters of this shape. */
    static long bytesFor(int arrays, long length, boolean wide) {
        return arrays * length * (wide ? 2 : 1);
    }

    /** Whether counters are two bytes wide. */
    boolean wide() {
        return high != null;
    }

    /** The low bytes of array {@code a}, for loops that increment one-byte counters directly. */
    byte[] lowBytes(int a) {
        return low[a];
    }

    /** The largest count a counter can hold. */
    int maxCount() {
        return high == null ? 0xFF : 0xFFFF;
    }

    void increment(int a, int p) {
        byte[] lo = low[a];
        byte v = (byte) (lo[p] + 1);
        lo[p] = v;
        if (v == 0 && high != null) {
            high[a][p]++;
        }
    }

    void decrement(int a, int p) {
        byte[] lo = low[a];
        byte v = lo[p];
        lo[p] = (byte) (v - 1);
        if (v == 0 && high != null) {
            high[a][p]--;
        }
    }

    int get(int a, int p) {
        int v = low[a][p] & 0xFF;
        return high == null ? v : v | (high[a][p] & 0xFF) << 8;
    }

    void set(int a, int p, int v) {
        low[a][p] = (byte) v;
        if (high != null) {
            high[a][p] = (byte) (v >>> 8);
        }
    }

    /** Replaces array {@code a} by its sum with array {@code b}, pair by pair (modulo the width). */
    void addInto(int a, int b) {
        byte[] la = low[a];
        byte[] lb = low[b];
        if (high == null) {
            for (int p = 0; p < length; p++) {
                la[p] += lb[p];
            }
            return;
        }
        byte[] ha = high[a];
        byte[] hb = high[b];
        for (int p = 0; p < length; p++) {
            int s = (la[p] & 0xFF) + (lb[p] & 0xFF);
            la[p] = (byte) s;
            ha[p] += (byte) (hb[p] + (s >>> 8));
        }
    }
}
