package org.treeproof.score;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import org.treeproof.partition.Partition;

/**
 * How often each sample stays with its reference cluster when the data are resampled.
 *
 * <p>Definition. Let sample {@code i} be in reference cluster {@code C}. A replicate <em>counts</em>
 * for {@code i} when it holds {@code i} and at least one other member of {@code C}. In such a
 * replicate, for every replicate cluster {@code D} let {@code n_D} be the number of members of
 * {@code C}, other than {@code i}, that the replicate holds in {@code D}. Sample {@code i}
 * <em>stays</em> when its own replicate cluster is the single {@code D} with the largest
 * {@code n_D}; a tie for the largest counts as not staying, since the replicate then gives no single
 * home for the rest of {@code C}. The stability of {@code i} is (replicates where it stays) /
 * (replicates that count), {@code NaN} when none counts (always so for a reference singleton).
 * An item drawn more than once counts once, with the cluster of its first occurrence.
 *
 * <p>This per-sample measure is our own definition, in the spirit of the per-item consensus of
 * S. Monti, P. Tamayo, J. Mesirov and T. Golub, "Consensus clustering", Machine Learning 52 (2003)
 * 91-118, doi:10.1023/A:1023949509487, but asking about the majority of the cluster rather than the
 * mean pairwise agreement; it needs O(n) memory where a consensus matrix needs O(n²).
 */
public final class SampleStability {
    private final Partition reference;
    private final List<ResampledPartition> replicates;

    private SampleStability(Partition reference, List<ResampledPartition> replicates) {
        this.reference = Objects.requireNonNull(reference, "reference");
        this.replicates = List.copyOf(replicates);
    }

    /** Stability of each sample of {@code reference} (over all original items) under the replicates. */
    public static SampleStability of(Partition reference, List<ResampledPartition> replicates) {
        return new SampleStability(reference, replicates);
    }

    /** An accumulator that takes the replicates one at a time, in any order. */
    public static Accumulator accumulator(Partition reference) {
        return new Accumulator(reference);
    }

    /** Computes the stability of every sample. */
    public Result compute() {
        Accumulator acc = new Accumulator(reference);
        for (ResampledPartition r : replicates) {
            acc.add(r);
        }
        return acc.result();
    }

    /**
     * Per-sample stability, in sample order.
     *
     * @param stays   replicates in which the sample stayed
     * @param counted replicates that counted for the sample
     */
    public record Result(int[] stays, int[] counted) {
        public Result {
            stays = stays.clone();
            counted = counted.clone();
            if (stays.length != counted.length) {
                throw new IllegalArgumentException("stays and counted differ in length");
            }
            for (int i = 0; i < stays.length; i++) {
                if (stays[i] < 0 || stays[i] > counted[i]) {
                    throw new IllegalArgumentException("sample " + i + " stays " + stays[i] + " of " + counted[i]);
                }
            }
        }

        @Override
        public int[] stays() {
            return stays.clone();
        }

        @Override
        public int[] counted() {
            return counted.clone();
        }

        /** The number of samples. */
        public int size() {
            return stays.length;
        }

        /** The stability of sample {@code i}, {@code NaN} when no replicate counted for it. */
        public double stability(int i) {
            return counted[i] == 0 ? Double.NaN : (double) stays[i] / counted[i];
        }

        /** The stability of every sample. */
        public double[] stability() {
            double[] s = new double[stays.length];
            for (int i = 0; i < s.length; i++) {
                s[i] = stability(i);
            }
            return s;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Result r && Arrays.equals(r.stays, stays) && Arrays.equals(r.counted, counted);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(stays) * 31 + Arrays.hashCode(counted);
        }

        @Override
        public String toString() {
            return "SampleStability.Result[n=" + stays.length + "]";
        }
    }

    /**
     * Takes replicates one at a time, in any order (the result depends only on the set of replicates).
     * Not thread-safe: hand replicates over from one thread at a time.
     */
    public static final class Accumulator {
        private final int[] referenceLabels;
        private final int k;
        private final int[] stays;
        private final int[] counted;
        private int added;

        private Accumulator(Partition reference) {
            Objects.requireNonNull(reference, "reference");
            this.referenceLabels = reference.labels();
            this.k = reference.clusterCount();
            this.stays = new int[referenceLabels.length];
            this.counted = new int[referenceLabels.length];
        }

        /** Adds one replicate. */
        public void add(ResampledPartition clustering) {
            add(clustering.items(), clustering.partition());
        }

        /** Adds one replicate: original item {@code items[a]} has cluster {@code partition.label(a)}. */
        public void add(int[] items, Partition partition) {
            if (items.length != partition.size()) {
                throw new IllegalArgumentException(items.length + " items but a partition of " + partition.size());
            }
            HeldItems held = HeldItems.of(referenceLabels.length, items);
            int m = held.size();
            int[] start = new int[k + 1];
            for (int a = 0; a < m; a++) {
                start[referenceLabels[held.items[a]] + 1]++;
            }
            for (int c = 0; c < k; c++) {
                start[c + 1] += start[c];
            }
            int[] fill = Arrays.copyOf(start, k);
            int[] groupedItems = new int[m];
            int[] groupedLabels = new int[m];
            for (int a = 0; a < m; a++) {
                int t = fill[referenceLabels[held.items[a]]]++;
                groupedItems[t] = held.items[a];
                groupedLabels[t] = partition.label(held.positions[a]);
            }
            int[] overlap = new int[partition.clusterCount()];
            for (int c = 0; c < k; c++) {
                if (start[c + 1] - start[c] < 2) {
                    continue;   // no other member of c is held
                }
                for (int t = start[c]; t < start[c + 1]; t++) {
                    overlap[groupedLabels[t]]++;
                }
                int best = -1;
                int max = 0;
                int second = 0;
                for (int t = start[c]; t < start[c + 1]; t++) {
                    int d = groupedLabels[t];
                    if (d == best) {
                        continue;
                    }
                    int v = overlap[d];
                    if (v > max) {
                        second = max;
                        max = v;
                        best = d;
                    } else if (v > second) {
                        second = v;
                    }
                }
                for (int t = start[c]; t < start[c + 1]; t++) {
                    int d = groupedLabels[t];
                    int own = overlap[d] - 1;
                    int otherBest = d == best ? second : max;
                    int i = groupedItems[t];
                    counted[i]++;
                    if (own > otherBest) {
                        stays[i]++;
                    }
                }
                for (int t = start[c]; t < start[c + 1]; t++) {
                    overlap[groupedLabels[t]] = 0;
                }
            }
            added++;
        }

        /** The number of replicates added so far. */
        public int replicatesAdded() {
            return added;
        }

        /** The stability from the replicates added so far. */
        public Result result() {
            return new Result(stays, counted);
        }
    }
}
