package org.treeproof.score;

import java.io.Serializable;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.treeproof.tree.MergeTree;

/**
 * Branch support of a reference tree: for each of its clades, the share of replicates whose own tree
 * contains a clade with exactly the replicate's members of it, among replicates holding at least two of
 * its members. This is the resampling support of clades in the sense of J. Felsenstein, "Confidence
 * limits on phylogenies: an approach using the bootstrap", Evolution 39 (1985) 783-791,
 * doi:10.1111/j.1558-5646.1985.tb00420.x, applied to samples instead of characters, with the clade
 * restricted to the samples a replicate holds (as subsampling requires).
 *
 * <p>Clades are compared through set hashes: every sample gets a random 64-bit key modulo the Mersenne
 * prime 2^61-1 and a clade's hash is the sum of its members' keys, so a replicate's clades are hashed in
 * one pass over its merges and each reference clade is looked up in O(1). Under bootstrap a sample may be
 * drawn several times; each copy contributes key/multiplicity (a modular inverse), so a replicate clade
 * hashes to a sample set's hash exactly when it holds every copy of each of its samples. Two different
 * sets share a hash with probability about 2^-61 per comparison; with at most 10^5 clades and 10^4
 * replicates the chance of any false match in a study is below 10^-9.
 *
 * <p>Serializable (the reference tree and the keys), so that replicates can be scored on other machines.
 */
public final class BranchSupport implements Serializable {
    private static final long serialVersionUID = 1L;
    private static final long P = (1L << 61) - 1;

    private final MergeTree reference;
    private final long[] keys;

    private BranchSupport(MergeTree reference, long[] keys) {
        this.reference = reference;
        this.keys = keys;
    }

    /** Support counting for the clades of {@code reference}, with sample keys drawn from {@code keySeed}. */
    public static BranchSupport of(MergeTree reference, long keySeed) {
        var rng = new SplittableRandom(keySeed);
        long[] keys = new long[reference.leaves()];
        for (int i = 0; i < keys.length; i++) {
            keys[i] = 1 + rng.nextLong(P - 1);
        }
        return new BranchSupport(reference, keys);
    }

    /**
     * Which reference clades one replicate holds at least two members of, and which of those its tree
     * reproduces.
     *
     * @param counted   bit s set when the replicate holds at least two members of merge s's clade
     * @param supported bit s set when, in addition, the replicate tree has a clade with exactly those members
     */
    public record Replicate(long[] counted, long[] supported) implements Serializable {
        public Replicate {
            counted = counted.clone();
            supported = supported.clone();
        }

        @Override
        public long[] counted() {
            return counted.clone();
        }

        @Override
        public long[] supported() {
            return supported.clone();
        }

        public boolean counted(int s) {
            return (counted[s >>> 6] & (1L << s)) != 0;
        }

        public boolean supported(int s) {
            return (supported[s >>> 6] & (1L << s)) != 0;
        }
    }

    /**
     * Scores one replicate.
     *
     * @param draws         the sample (index into the reference's leaves) of each leaf of the replicate tree
     * @param replicateTree the tree built on those draws
     */
    public Replicate score(int[] draws, MergeTree replicateTree) {
        int n = reference.leaves();
        int m = replicateTree.leaves();
        if (draws.length != m) {
            throw new IllegalArgumentException("one draw per replicate leaf expected");
        }
        int[] multiplicity = new int[n];
        for (int d : draws) {
            multiplicity[d]++;
        }
        var held = new LongHashSet(2 * m);
        long[] node = new long[2 * m - 1];
        for (int a = 0; a < m; a++) {
            int mult = multiplicity[draws[a]];
            node[a] = mult == 1 ? keys[draws[a]] : mulMod(keys[draws[a]], inverse(mult));
        }
        for (int s = 0; s < m - 1; s++) {
            long h = addMod(node[replicateTree.left(s)], node[replicateTree.right(s)]);
            node[m + s] = h;
            held.add(h);
        }
        long[] refHash = new long[2 * n - 1];
        int[] refCount = new int[2 * n - 1];
        for (int i = 0; i < n; i++) {
            if (multiplicity[i] > 0) {
                refHash[i] = keys[i];
                refCount[i] = 1;
            }
        }
        int words = (n - 1 + 63) >>> 6;
        long[] counted = new long[Math.max(1, words)];
        long[] supported = new long[Math.max(1, words)];
        for (int s = 0; s < n - 1; s++) {
            int l = reference.left(s);
            int r = reference.right(s);
            refHash[n + s] = addMod(refHash[l], refHash[r]);
            refCount[n + s] = refCount[l] + refCount[r];
            if (refCount[n + s] >= 2) {
                counted[s >>> 6] |= 1L << s;
                if (held.contains(refHash[n + s])) {
                    supported[s >>> 6] |= 1L << s;
                }
            }
        }
        return new Replicate(counted, supported);
    }

    /** The reference tree's number of merges (clades). */
    public int clades() {
        return reference.leaves() - 1;
    }

    /** Counts replicates one at a time; not thread-safe (feed it from one thread, in index order). */
    public static final class Tally {
        private final int[] counted;
        private final int[] supported;

        public Tally(int clades) {
            counted = new int[clades];
            supported = new int[clades];
        }

        public void add(Replicate r) {
            for (int s = 0; s < counted.length; s++) {
                if (r.counted(s)) {
                    counted[s]++;
                    if (r.supported(s)) {
                        supported[s]++;
                    }
                }
            }
        }

        /** Per merge of the reference tree, the support in [0, 1], or NaN where no replicate counted. */
        public double[] support() {
            double[] out = new double[counted.length];
            for (int s = 0; s < out.length; s++) {
                out[s] = counted[s] == 0 ? Double.NaN : (double) supported[s] / counted[s];
            }
            return out;
        }

        /** Per merge, the number of replicates that held at least two of the clade's members. */
        public int[] counted() {
            return counted.clone();
        }
    }

    static long addMod(long a, long b) {
        long s = a + b;
        return s >= P ? s - P : s;
    }

    static long mulMod(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        // a, b < 2^61, so a*b < 2^122 = hi:lo; reduce with 2^61 = 1 (mod P)
        long low61 = lo & P;
        long high = (lo >>> 61) | (hi << 3);
        long r = low61 + high;
        r = (r & P) + (r >>> 61);
        return r >= P ? r - P : r;
    }

    static long inverse(long a) {
        // Fermat: a^(P-2) mod P
        long result = 1;
        long base = a % P;
        long e = P - 2;
        while (e > 0) {
            if ((e & 1) != 0) {
                result = mulMod(result, base);
            }
            base = mulMod(base, base);
            e >>>= 1;
        }
        return result;
    }

    /** An open-addressing set of hash values in [0, P); small and allocation-free per lookup. */
    private static final class LongHashSet {
        private final long[] slots;
        private final int mask;

        LongHashSet(int expected) {
            int cap = Integer.highestOneBit(Math.max(4, expected * 2) - 1) << 1;
            slots = new long[cap];
            Arrays.fill(slots, -1L);
            mask = cap - 1;
        }

        void add(long v) {
            int i = spread(v) & mask;
            while (slots[i] != -1L && slots[i] != v) {
                i = (i + 1) & mask;
            }
            slots[i] = v;
        }

        boolean contains(long v) {
            int i = spread(v) & mask;
            while (slots[i] != -1L) {
                if (slots[i] == v) {
                    return true;
                }
                i = (i + 1) & mask;
            }
            return false;
        }

        private static int spread(long v) {
            long z = v * 0x9E3779B97F4A7C15L;
            return (int) (z >>> 32);
        }
    }
}
