package org.treeproof.score;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.Objects;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/**
 * A consensus matrix for k = 2..maxK: for every item pair, how many replicates drew both and how many
 * of those clustered them together at each k. Made by {@link ConsensusAccumulator#finish()}.
 *
 * <p>S. Monti, P. Tamayo, J. Mesirov and T. Golub, "Consensus clustering", Machine Learning 52 (2003)
 * 91-118, doi:10.1023/A:1023949509487. The consensus of a pair at k is co-clustered / co-sampled; a
 * pair never co-sampled has none ({@code NaN}) and is left out of every summary, and
 * {@link #neverCoSampledPairs()} says how many there are.
 *
 * <p>Immutable. The counters (one or two bytes per pair and k) are too large to copy, so this class,
 * unlike the result records, holds the accumulator's arrays directly; nothing else refers to them.
 * The exact distribution of values at every k is computed once, on construction.
 */
public final class ConsensusMatrix {
    private final int n;
    private final int maxK;
    private final int replicates;
    /** Index 0: co-sampled counts; index k-1: co-clustered counts at k. */
    private final PairCounters counts;
    private final long coSampledPairs;
    private final ConsensusDistribution[] distributions;

    ConsensusMatrix(int n, int maxK, int replicates, PairCounters counts) {
        this.n = n;
        this.maxK = maxK;
        this.replicates = replicates;
        this.counts = counts;
        Histogram h = new Histogram(counts, replicates);
        this.coSampledPairs = h.coSampledPairs;
        this.distributions = new ConsensusDistribution[maxK + 1];
        for (int k = 2; k <= maxK; k++) {
            distributions[k] = h.distribution(k);
        }
    }

    /** The number of items. */
    public int size() {
        return n;
    }

    /** The largest k. */
    public int maxK() {
        return maxK;
    }

    /** The number of replicates accumulated. */
    public int replicates() {
        return replicates;
    }

    /** Replicates that drew both {@code i} and {@code j} ({@code i != j}). */
    public int coSampled(int i, int j) {
        return counts.get(0, pair(i, j));
    }

    /** Replicates that drew both and put them in one cluster at {@code k}. */
    public int coClustered(int k, int i, int j) {
        return counts.get(level(k), pair(i, j));
    }

    /** The consensus of {@code i} and {@code j} at {@code k}; {@code NaN} if never co-sampled. */
    public double consensus(int k, int i, int j) {
        int p = pair(i, j);
        int c = counts.get(0, p);
        return c == 0 ? Double.NaN : (double) counts.get(level(k), p) / c;
    }

    /** Pairs {@code i < j} co-sampled at least once. */
    public long coSampledPairs() {
        return coSampledPairs;
    }

    /** Pairs {@code i < j} never co-sampled; they have no consensus value. */
    public long neverCoSampledPairs() {
        return (long) n * (n - 1) / 2 - coSampledPairs;
    }

    /** The exact distribution of consensus values at {@code k}. */
    public ConsensusDistribution distribution(int k) {
        return distributions[level(k) + 1];
    }

    /** PAC at {@code k} over the default interval {@code (0.1, 0.9]}; see {@link ConsensusDistribution}. */
    public double pac(int k) {
        return distribution(k).pac();
    }

    /** PAC at {@code k} with bounds {@code (lower, upper]}, decided exactly. */
    public double pac(int k, BigDecimal lower, BigDecimal upper) {
        return distribution(k).pac(lower, upper);
    }

    /**
     * Item consensus at {@code k}: for each sample {@code i} in cluster {@code C} of {@code reference},
     * the mean consensus between {@code i} and the other members of {@code C}, over the members it was
     * ever co-sampled with; {@code NaN} when there are none (as for a singleton). After Monti et al.
     * (2003), section 2.3.
     *
     * @param reference a partition of all {@code size()} items, usually the reference cut at {@code k}
     */
    public double[] itemConsensus(int k, Partition reference) {
        Objects.requireNonNull(reference, "reference");
        if (reference.size() != n) {
            throw new IllegalArgumentException("the reference partition is over " + reference.size()
                    + " items, the consensus matrix over " + n);
        }
        int level = level(k);
        double[] sum = new double[n];
        int[] pairs = new int[n];
        for (int[] members : reference.members()) {
            for (int a = 0; a < members.length; a++) {
                int i = members[a];
                for (int b = a + 1; b < members.length; b++) {
                    int j = members[b];
                    int p = CondensedDistances.index(n, i, j);
                    int c = counts.get(0, p);
                    if (c > 0) {
                        double v = (double) counts.get(level, p) / c;
                        sum[i] += v;
                        sum[j] += v;
                        pairs[i]++;
                        pairs[j]++;
                    }
                }
            }
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = pairs[i] == 0 ? Double.NaN : sum[i] / pairs[i];
        }
        return out;
    }

    private int level(int k) {
        if (k < 2 || k > maxK) {
            throw new IllegalArgumentException("k = " + k + " is outside 2.." + maxK);
        }
        return k - 1;
    }

    private int pair(int i, int j) {
        Objects.checkIndex(i, n);
        Objects.checkIndex(j, n);
        if (i == j) {
            throw new IllegalArgumentException("a pair needs two different items, got " + i + " twice");
        }
        return CondensedDistances.index(n, i, j);
    }

    @Override
    public String toString() {
        return "ConsensusMatrix[n=" + n + ", k=2.." + maxK + ", replicates=" + replicates + "]";
    }

    /**
     * Counts pairs per (co-clustered t, co-sampled c) combination, over the c values that occur, then
     * merges equal fractions. Fractions with denominators at most {@value ConsensusAccumulator#MAX_REPLICATES}
     * differ by at least 10<sup>-8</sup>, far above double rounding, so equal fractions and equal
     * doubles are the same thing and the doubles can be sorted directly.
     */
    private static final class Histogram {
        private final PairCounters counts;
        private final int[] offset;
        private final int cells;
        final long coSampledPairs;

        Histogram(PairCounters counts, int replicates) {
            this.counts = counts;
            boolean[] seen = new boolean[replicates + 1];
            long coSampled = 0;
            for (int p = 0; p < counts.length; p++) {
                int c = counts.get(0, p);
                if (c > replicates) {
                    throw new IllegalStateException("pair " + p + " co-sampled " + c + " times in " + replicates
                            + " replicates");
                }
                seen[c] = true;
                if (c > 0) {
                    coSampled++;
                }
            }
            this.coSampledPairs = coSampled;
            this.offset = new int[replicates + 1];
            Arrays.fill(offset, -1);
            int total = 0;
            for (int c = 1; c <= replicates; c++) {
                if (seen[c]) {
                    offset[c] = total;
                    total += c + 1;
                }
            }
            this.cells = total;
        }

        ConsensusDistribution distribution(int k) {
            int level = k - 1;
            int[] hist = new int[cells];
            for (int p = 0; p < counts.length; p++) {
                int c = counts.get(0, p);
                if (c == 0) {
                    continue;
                }
                int t = counts.get(level, p);
                if (t > c) {
                    throw new IllegalStateException("pair " + p + " co-clustered " + t + " times but co-sampled "
                            + c + " at k = " + k);
                }
                hist[offset[c] + t]++;
            }
            int entries = 0;
            for (int v : hist) {
                if (v > 0) {
                    entries++;
                }
            }
            double[] value = new double[entries];
            int[] num = new int[entries];
            int[] den = new int[entries];
            long[] cnt = new long[entries];
            int e = 0;
            for (int c = 1; c < offset.length; c++) {
                if (offset[c] < 0) {
                    continue;
                }
                for (int t = 0; t <= c; t++) {
                    int v = hist[offset[c] + t];
                    if (v > 0) {
                        int g = ConsensusDistribution.gcd(t, c);
                        num[e] = t / g;
                        den[e] = c / g;
                        value[e] = (double) t / c;
                        cnt[e++] = v;
                    }
                }
            }
            double[] distinct = value.clone();
            Arrays.sort(distinct);
            int d = 0;
            for (int x = 0; x < distinct.length; x++) {
                if (x == 0 || distinct[x] != distinct[x - 1]) {
                    distinct[d++] = distinct[x];
                }
            }
            int[] outNum = new int[d];
            int[] outDen = new int[d];
            long[] outCount = new long[d];
            for (int x = 0; x < entries; x++) {
                int at = Arrays.binarySearch(distinct, 0, d, value[x]);
                outNum[at] = num[x];
                outDen[at] = den[x];
                outCount[at] += cnt[x];
            }
            return new ConsensusDistribution(k, outNum, outDen, outCount);
        }
    }
}
