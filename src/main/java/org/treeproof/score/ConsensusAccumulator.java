package org.treeproof.score;

import java.util.Objects;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/**
 * Builds a consensus matrix from resampling replicates, one replicate at a time.
 *
 * <p>S. Monti, P. Tamayo, J. Mesirov and T. Golub, "Consensus clustering: a resampling-based method
 * for class discovery and visualization of gene expression microarray data", Machine Learning 52
 * (2003) 91-118, doi:10.1023/A:1023949509487. For every pair of items it counts the replicates that
 * drew both (co-sampled, the same for every k) and, for each k in {@code 2..maxK}, the replicates whose
 * k-cluster solution put them in one cluster (co-clustered). The consensus at k is co-clustered /
 * co-sampled.
 *
 * <p>A replicate is given as the original item indices it drew and, for each k from 2 to
 * {@code maxK}, a partition of its positions ({@code cuts[k - 2]}). An item drawn more than once (a
 * bootstrap repeat) counts once, with the clusters of its first occurrence; an item is never paired
 * with its own copy.
 *
 * <p>Two ways in. {@link #addNestedCuts} is for the cuts of one tree, which are nested: two items
 * together at k are together at every smaller k, so the replicate's whole contribution for a pair is
 * the largest k at which the two are together (none: counter 0), recorded with one counter increment; the
 * counters hold a difference encoding that {@link #finish} sums from the largest k down to counter 0, which
 * then holds the co-sampled count (every drawn pair added exactly one increment). {@link #add} takes any
 * partitions, nested or not, and records each maximal run of k at which the pair is together as one
 * increment at its top and one decrement below its bottom, plus one at counter 0 when no run starts at
 * k = 2. The two can be mixed; the result depends only on the set of replicates, never on the order they
 * arrive in.
 *
 * <p>Memory: {@code (maxK) · n(n-1)/2} counters of one byte (up to 255 replicates) or two bytes (up to
 * {@value #MAX_REPLICATES}); see {@link #bytesFor}. Time per replicate is O(m²) for m distinct drawn
 * items. The add methods are synchronized, so replicates computed on several threads may be handed in
 * directly; they are applied one at a time.
 */
public final class ConsensusAccumulator {
    /**
     * The most replicates one accumulator takes. The exact distribution of consensus values keeps one
     * counter per (co-clustered, co-sampled) combination, up to R²/2 of them.
     */
    public static final int MAX_REPLICATES = 10_000;

    private final int n;
    private final int maxK;
    private final int levels;
    private final int capacity;
    private PairCounters counters;
    private int added;

    private ConsensusAccumulator(int n, int maxK, int capacity) {
        this.n = n;
        this.maxK = maxK;
        this.levels = maxK - 1;
        this.capacity = capacity;
        this.counters = new PairCounters(maxK, CondensedDistances.length(n), capacity > 0xFF);
    }

    /**
     * An empty accumulator.
     *
     * @param n             the number of original items, at least 2
     * @param maxK          the largest k; replicates bring cuts for k = 2..maxK
     * @param maxReplicates how many replicates at most will be added (sets the counter width)
     */
    public static ConsensusAccumulator create(int n, int maxK, int maxReplicates) {
        validate(n, maxK, maxReplicates);
        return new ConsensusAccumulator(n, maxK, maxReplicates);
    }

    /** The bytes {@link #create} allocates for these arguments, to check before allocating. */
    public static long bytesFor(int n, int maxK, int maxReplicates) {
        validate(n, maxK, maxReplicates);
        return PairCounters.bytesFor(maxK, (long) n * (n - 1) / 2, maxReplicates > 0xFF);
    }

    private static void validate(int n, int maxK, int maxReplicates) {
        if (n < 2) {
            throw new IllegalArgumentException("a consensus matrix needs at least 2 items, got " + n);
        }
        if (maxK < 2) {
            throw new IllegalArgumentException("maxK must be at least 2, got " + maxK);
        }
        if (maxReplicates < 1 || maxReplicates > MAX_REPLICATES) {
            throw new IllegalArgumentException("maxReplicates must be between 1 and " + MAX_REPLICATES
                    + ", got " + maxReplicates);
        }
        CondensedDistances.length(n);
    }

    /**
     * Adds a replicate whose cuts are nested (each cluster at k+1 lies within one cluster at k), as
     * the cuts of one tree are.
     *
     * @param items original item index per replicate position
     * @param cuts  {@code cuts[k - 2]} partitions the replicate's positions at k, for k = 2..maxK
     * @throws IllegalArgumentException if the cuts are not nested or do not fit the items
     */
    public synchronized void addNestedCuts(int[] items, Partition[] cuts) {
        Replicate r = prepare(items, cuts);
        r.requireNested();
        long[] codes = r.packedCodes();
        if (codes != null) {
            addPacked(r.held.items, codes, r.levelOfBit());
        } else {
            addNestedScan(r.held.items, r.itemMajorLabels());
        }
        added++;
    }

    /**
     * Adds a replicate with any partitions for k = 2..maxK, nested or not.
     *
     * @param items original item index per replicate position
     * @param cuts  {@code cuts[k - 2]} partitions the replicate's positions at k, for k = 2..maxK
     * @throws IllegalArgumentException if the cuts do not fit the items
     */
    public synchronized void add(int[] items, Partition[] cuts) {
        Replicate r = prepare(items, cuts);
        addRuns(r.held.items, r.itemMajorLabels());
        added++;
    }

    // The three pair loops below are written out rather than sharing a callback: a call per pair
    // that the JIT cannot inline costs as much as the work it does.

    /** Nested cuts, packed: the lowest differing bit names the first level at which a pair splits. */
    private void addPacked(int[] held, long[] codes, int[] levelOfBit) {
        PairCounters c = counters;
        if (!c.wide()) {
            addPackedNarrow(held, codes, levelOfBit);
            return;
        }
        for (int a = 0; a < held.length; a++) {
            int rowBase = rowBase(held[a]);
            long ca = codes[a];
            for (int b = a + 1; b < held.length; b++) {
                long x = ca ^ codes[b];
                // counter index k - 1 for the largest k joining them, 0 when split at k = 2
                c.increment(x == 0 ? levels : levelOfBit[Long.numberOfTrailingZeros(x)], rowBase + held[b]);
            }
        }
    }

    /**
     * As {@link #addPacked} for one-byte counters, which have no high byte to carry into, so the loop
     * increments the byte arrays directly (modulo 256, like {@link PairCounters#increment}): one increment
     * per pair and no branch on the level, which saves about a sixth of the time of the general loop.
     */
    private void addPackedNarrow(int[] held, long[] codes, int[] levelOfBit) {
        byte[][] top = new byte[levels + 1][];
        for (int l = 0; l <= levels; l++) {
            top[l] = counters.lowBytes(l);
        }
        int h = held.length;
        for (int a = 0; a < h; a++) {
            int rowBase = rowBase(held[a]);
            long ca = codes[a];
            for (int b = a + 1; b < h; b++) {
                long x = ca ^ codes[b];
                top[x == 0 ? levels : levelOfBit[Long.numberOfTrailingZeros(x)]][rowBase + held[b]]++;
            }
        }
    }

    /** Nested cuts whose labels do not pack into 64 bits: compare level by level until they split. */
    private void addNestedScan(int[] held, int[] lab) {
        PairCounters c = counters;
        for (int a = 0; a < held.length; a++) {
            int rowBase = rowBase(held[a]);
            int ia = a * levels;
            for (int b = a + 1; b < held.length; b++) {
                int ib = b * levels;
                int together = 0;
                while (together < levels && lab[ia + together] == lab[ib + together]) {
                    together++;
                }
                c.increment(together, rowBase + held[b]);
            }
        }
    }

    /** Any partitions: each maximal run of levels at which a pair is together is one +1 and one -1. */
    private void addRuns(int[] held, int[] lab) {
        PairCounters c = counters;
        for (int a = 0; a < held.length; a++) {
            int rowBase = rowBase(held[a]);
            int ia = a * levels;
            for (int b = a + 1; b < held.length; b++) {
                int p = rowBase + held[b];
                int ib = b * levels;
                if (lab[ia] != lab[ib]) {
                    c.increment(0, p);   // no run starts at k = 2, so the +1 of co-sampling goes here
                }
                int runStart = -1;
                for (int l = 0; l <= levels; l++) {
                    boolean same = l < levels && lab[ia + l] == lab[ib + l];
                    if (same && runStart < 0) {
                        runStart = l;
                    } else if (!same && runStart >= 0) {
                        // together at levels runStart..l-1, that is k = runStart+2 .. l+1
                        c.increment(l, p);
                        if (runStart > 0) {
                            c.decrement(runStart, p);
                        }
                        runStart = -1;
                    }
                }
            }
        }
    }

    /** {@code rowBase(i) + j} is the condensed index of pair (i, j), i < j. */
    private int rowBase(int i) {
        return (int) ((long) n * i - (long) i * (i + 1) / 2 - i - 1);
    }

    /** The number of replicates added so far. */
    public synchronized int replicatesAdded() {
        return added;
    }

    /**
     * The consensus matrix of the replicates added. The accumulator hands its counters over to the
     * result (no copy is made) and takes no more replicates.
     */
    public synchronized ConsensusMatrix finish() {
        requireOpen();
        PairCounters c = counters;
        counters = null;
        for (int index = levels - 1; index >= 0; index--) {
            c.addInto(index, index + 1);
        }
        return new ConsensusMatrix(n, maxK, added, c);
    }

    private void requireOpen() {
        if (counters == null) {
            throw new IllegalStateException("the consensus matrix has been finished; it takes no more replicates");
        }
    }

    private Replicate prepare(int[] items, Partition[] cuts) {
        requireOpen();
        Objects.requireNonNull(items, "items");
        if (added >= capacity) {
            throw new IllegalStateException("this accumulator was made for " + capacity + " replicates");
        }
        Objects.requireNonNull(cuts, "cuts");
        if (cuts.length != levels) {
            throw new IllegalArgumentException("expected cuts for k = 2.." + maxK + " (" + levels + "), got "
                    + cuts.length);
        }
        for (int l = 0; l < levels; l++) {
            if (cuts[l].size() != items.length) {
                throw new IllegalArgumentException("the cut for k = " + (l + 2) + " is over " + cuts[l].size()
                        + " positions but the replicate has " + items.length);
            }
        }
        return new Replicate(HeldItems.of(n, items), cuts, levels);
    }

    /** One replicate's held items and their labels at each level (level l is k = l + 2). */
    private static final class Replicate {
        final HeldItems held;
        final Partition[] cuts;
        final int levels;

        Replicate(HeldItems held, Partition[] cuts, int levels) {
            this.held = held;
            this.cuts = cuts;
            this.levels = levels;
        }

        int label(int level, int a) {
            return cuts[level].label(held.positions[a]);
        }

        void requireNested() {
            for (int l = 1; l < levels; l++) {
                int[] parent = new int[cuts[l].clusterCount()];
                java.util.Arrays.fill(parent, -1);
                for (int a = 0; a < held.size(); a++) {
                    int c = label(l, a);
                    int up = label(l - 1, a);
                    if (parent[c] < 0) {
                        parent[c] = up;
                    } else if (parent[c] != up) {
                        throw new IllegalArgumentException("the cuts are not nested: a cluster at k = " + (l + 2)
                                + " spans two clusters at k = " + (l + 1) + "; use add for such partitions");
                    }
                }
            }
        }

        private int[] widths() {
            int[] w = new int[levels];
            for (int l = 0; l < levels; l++) {
                w[l] = Math.max(1, 32 - Integer.numberOfLeadingZeros(Math.max(0, cuts[l].clusterCount() - 1)));
            }
            return w;
        }

        /** All levels' labels packed into one long per item, k = 2 lowest; null if they do not fit. */
        long[] packedCodes() {
            int[] w = widths();
            int total = 0;
            for (int x : w) {
                total += x;
            }
            if (total > 64) {
                return null;
            }
            long[] codes = new long[held.size()];
            for (int a = 0; a < codes.length; a++) {
                long code = 0;
                int shift = 0;
                for (int l = 0; l < levels; l++) {
                    code |= (long) label(l, a) << shift;
                    shift += w[l];
                }
                codes[a] = code;
            }
            return codes;
        }

        /** For each bit of a packed code, the level whose field holds it. */
        int[] levelOfBit() {
            int[] w = widths();
            int[] out = new int[64];
            int bit = 0;
            for (int l = 0; l < levels; l++) {
                for (int b = 0; b < w[l]; b++) {
                    out[bit++] = l;
                }
            }
            return out;
        }

        /** {@code lab[a * levels + l]}: the label of held item a at level l. */
        int[] itemMajorLabels() {
            int[] lab = new int[held.size() * levels];
            for (int a = 0; a < held.size(); a++) {
                for (int l = 0; l < levels; l++) {
                    lab[a * levels + l] = label(l, a);
                }
            }
            return lab;
        }
    }
}
