package org.treeproof.score;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import org.apache.commons.math3.fraction.BigFraction;
import org.treeproof.partition.Partition;

/**
 * Cluster-wise stability of a reference partition under resampling, by the best Jaccard match.
 *
 * <p>C. Hennig, "Cluster-wise assessment of cluster stability", Computational Statistics &amp; Data
 * Analysis 52 (2007) 258-271, doi:10.1016/j.csda.2006.11.025. For reference cluster {@code C} and a
 * replicate holding the item set {@code S}, let {@code C' = C ∩ S}; the replicate's score for
 * {@code C} is {@code max_D |C' ∩ D| / |C' ∪ D|} over the replicate's clusters {@code D}. A replicate
 * that holds none of {@code C}'s items does not count for {@code C} (its value is recorded as
 * {@code NaN}). An item drawn more than once counts once, with the cluster of its first occurrence.
 *
 * <p>Per cluster we report the mean over the replicates that count, the share of them in which the
 * cluster <em>dissolved</em> (best Jaccard ≤ 0.5) and in which it was <em>recovered</em> (≥ 0.75), and
 * a status: {@linkplain Status#STABLE stable} when the mean is ≥ 0.75, {@linkplain Status#DOUBTFUL
 * doubtful} when it is strictly between 0.5 and 0.75, {@linkplain Status#DISSOLVED dissolved} when it
 * is ≤ 0.5. Hennig uses 0.5 as the dissolution threshold and regards a mean of 0.75 or more as the mark
 * of a stable cluster (thresholds quoted from memory of the paper). Thresholds are decided exactly:
 * per replicate on the integer counts, and for the mean with exact fractions whenever the
 * floating-point mean is within 10<sup>-9</sup> of a threshold.
 */
public final class JaccardStability {
    /** Hennig's stable band starts here (inclusive): 3/4. The one owner of this threshold. */
    public static final double STABLE_FROM = 0.75;
    /** Hennig's dissolution threshold (inclusive): 1/2. The one owner of this threshold. */
    public static final double DISSOLVED_AT = 0.5;
    private final Partition reference;
    private final List<ResampledPartition> replicates;

    private JaccardStability(Partition reference, List<ResampledPartition> replicates) {
        this.reference = Objects.requireNonNull(reference, "reference");
        this.replicates = List.copyOf(replicates);
    }

    /** Stability of {@code reference} (over all original items) under the replicates, in index order. */
    public static JaccardStability of(Partition reference, List<ResampledPartition> replicates) {
        return new JaccardStability(reference, replicates);
    }

    /** An accumulator that takes the replicates one at a time, in index order. */
    public static Accumulator accumulator(Partition reference) {
        return new Accumulator(reference);
    }

    /** Computes the stability of every reference cluster. */
    public Result compute() {
        Accumulator acc = new Accumulator(reference);
        for (int r = 0; r < replicates.size(); r++) {
            acc.add(r, replicates.get(r));
        }
        return acc.result();
    }

    /** The verdict on one cluster. */
    public enum Status {
        /** Mean best Jaccard of at least 0.75. */
        STABLE("stable"),
        /** Mean best Jaccard above 0.5 and below 0.75. */
        DOUBTFUL("doubtful"),
        /** Mean best Jaccard of at most 0.5. */
        DISSOLVED("dissolved"),
        /** No replicate held any of the cluster's items. */
        NOT_ASSESSED("not assessed");

        private final String label;

        Status(String label) {
            this.label = label;
        }

        /** The lower-case word for reports. */
        public String label() {
            return label;
        }
    }

    /**
     * The stability of one reference cluster.
     *
     * @param id             the reference cluster's label
     * @param size           its number of items
     * @param counted        replicates that held at least one of its items
     * @param mean           mean best Jaccard over those replicates ({@code NaN} when none)
     * @param dissolvedShare share of them with best Jaccard ≤ 0.5
     * @param recoveredShare share of them with best Jaccard ≥ 0.75
     * @param status         the verdict from the mean
     * @param perReplicate   best Jaccard per replicate, in index order, {@code NaN} where not counted
     */
    public record Cluster(int id, int size, int counted, double mean, double dissolvedShare,
            double recoveredShare, Status status, double[] perReplicate) {
        public Cluster {
            Objects.requireNonNull(status, "status");
            perReplicate = perReplicate.clone();
            if (counted < 0 || counted > perReplicate.length) {
                throw new IllegalArgumentException("counted " + counted + " of " + perReplicate.length);
            }
            if ((counted == 0) != (status == Status.NOT_ASSESSED)) {
                throw new IllegalArgumentException("status " + status + " with " + counted + " replicates");
            }
        }

        @Override
        public double[] perReplicate() {
            return perReplicate.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Cluster c && c.id == id && c.size == size && c.counted == counted
                    && Double.compare(c.mean, mean) == 0 && Double.compare(c.dissolvedShare, dissolvedShare) == 0
                    && Double.compare(c.recoveredShare, recoveredShare) == 0 && c.status == status
                    && Arrays.equals(c.perReplicate, perReplicate);
        }

        @Override
        public int hashCode() {
            return Objects.hash(id, size, counted, mean, status) * 31 + Arrays.hashCode(perReplicate);
        }

        @Override
        public String toString() {
            return "Cluster[id=" + id + ", size=" + size + ", mean=" + mean + ", " + status.label() + "]";
        }
    }

    /**
     * The stability of every reference cluster.
     *
     * @param replicates the number of replicates taken
     * @param clusters   one entry per reference cluster, in label order
     */
    public record Result(int replicates, List<Cluster> clusters) {
        public Result {
            clusters = List.copyOf(clusters);
        }

        /** The entry for reference cluster {@code id}. */
        public Cluster cluster(int id) {
            return clusters.get(id);
        }
    }

    /**
     * Takes replicates one at a time, in index order, and keeps only per-cluster counts. Not thread-safe:
     * the caller hands replicates over in order, from one thread at a time.
     */
    public static final class Accumulator {
        private final int[] referenceLabels;
        private final int[] referenceSizes;
        private final int k;
        /** Per cluster and replicate: the best match's intersection and union; union 0 = not counted. */
        private int[][] intersections;
        private int[][] unions;
        private int added;

        private Accumulator(Partition reference) {
            Objects.requireNonNull(reference, "reference");
            this.referenceLabels = reference.labels();
            this.referenceSizes = reference.clusterSizes();
            this.k = reference.clusterCount();
            this.intersections = new int[k][16];
            this.unions = new int[k][16];
        }

        /** Adds replicate number {@code replicate}, which must be the next index (0, 1, 2, …). */
        public void add(int replicate, ResampledPartition clustering) {
            add(replicate, clustering.items(), clustering.partition());
        }

        /**
         * Adds replicate number {@code replicate}: original item {@code items[a]} has cluster
         * {@code partition.label(a)}.
         */
        public void add(int replicate, int[] items, Partition partition) {
            if (replicate != added) {
                throw new IllegalArgumentException("replicate " + replicate + " given where " + added
                        + " was expected; replicates must come in index order");
            }
            if (items.length != partition.size()) {
                throw new IllegalArgumentException(items.length + " items but a partition of " + partition.size());
            }
            HeldItems held = HeldItems.of(referenceLabels.length, items);
            int kr = partition.clusterCount();
            int m = held.size();
            // group the held items by reference cluster (counting sort), then count replicate clusters
            int[] start = new int[k + 1];
            for (int a = 0; a < m; a++) {
                start[referenceLabels[held.items[a]] + 1]++;
            }
            for (int c = 0; c < k; c++) {
                start[c + 1] += start[c];
            }
            int[] fill = Arrays.copyOf(start, k);
            int[] groupedLabels = new int[m];
            int[] replicateSizes = new int[kr];
            for (int a = 0; a < m; a++) {
                int d = partition.label(held.positions[a]);
                replicateSizes[d]++;
                groupedLabels[fill[referenceLabels[held.items[a]]]++] = d;
            }
            ensureCapacity(added + 1);
            int[] overlap = new int[kr];
            for (int c = 0; c < k; c++) {
                int heldOfC = start[c + 1] - start[c];
                if (heldOfC == 0) {
                    unions[c][added] = 0;
                    intersections[c][added] = 0;
                    continue;
                }
                for (int t = start[c]; t < start[c + 1]; t++) {
                    overlap[groupedLabels[t]]++;
                }
                long bestInter = 0;
                long bestUnion = 1;
                for (int t = start[c]; t < start[c + 1]; t++) {
                    int d = groupedLabels[t];
                    long inter = overlap[d];
                    if (inter == 0) {
                        continue;   // already scored for this cluster
                    }
                    long union = heldOfC + replicateSizes[d] - inter;
                    if (inter * bestUnion > bestInter * union) {
                        bestInter = inter;
                        bestUnion = union;
                    }
                    overlap[d] = 0;
                }
                intersections[c][added] = (int) bestInter;
                unions[c][added] = (int) bestUnion;
            }
            added++;
        }

        /** The number of replicates added so far. */
        public int replicatesAdded() {
            return added;
        }

        /** The stability from the replicates added so far. */
        public Result result() {
            List<Cluster> out = new ArrayList<>(k);
            for (int c = 0; c < k; c++) {
                out.add(cluster(c));
            }
            return new Result(added, out);
        }

        private Cluster cluster(int c) {
            double[] values = new double[added];
            int counted = 0;
            int dissolved = 0;
            int recovered = 0;
            double sum = 0;
            for (int r = 0; r < added; r++) {
                long inter = intersections[c][r];
                long union = unions[c][r];
                if (union == 0) {
                    values[r] = Double.NaN;
                    continue;
                }
                counted++;
                values[r] = (double) inter / union;
                sum += values[r];
                if (2 * inter <= union) {
                    dissolved++;
                }
                if (4 * inter >= 3 * union) {
                    recovered++;
                }
            }
            if (counted == 0) {
                return new Cluster(c, referenceSizes[c], 0, Double.NaN, Double.NaN, Double.NaN,
                        Status.NOT_ASSESSED, values);
            }
            double mean = sum / counted;
            Status status;
            if (compareMean(c, mean, counted, 3, 4) >= 0) {
                status = Status.STABLE;
            } else if (compareMean(c, mean, counted, 1, 2) > 0) {
                status = Status.DOUBTFUL;
            } else {
                status = Status.DISSOLVED;
            }
            return new Cluster(c, referenceSizes[c], counted, mean, (double) dissolved / counted,
                    (double) recovered / counted, status, values);
        }

        /** The sign of (exact mean - num/den); exact fractions only when the double mean is close. */
        private int compareMean(int c, double mean, int counted, int num, int den) {
            double threshold = (double) num / den;
            if (Math.abs(mean - threshold) > 1e-9) {
                return mean > threshold ? 1 : -1;
            }
            return exactMean(c, counted).compareTo(new BigFraction(num, den));
        }

        private BigFraction exactMean(int c, int counted) {
            BigFraction sum = BigFraction.ZERO;
            for (int r = 0; r < added; r++) {
                if (unions[c][r] > 0) {
                    sum = sum.add(new BigFraction(intersections[c][r], unions[c][r]));
                }
            }
            return sum.divide(counted);
        }

        private void ensureCapacity(int size) {
            if (k == 0 || size <= unions[0].length) {
                return;
            }
            int cap = Math.max(size, 2 * unions[0].length);
            for (int c = 0; c < k; c++) {
                intersections[c] = Arrays.copyOf(intersections[c], cap);
                unions[c] = Arrays.copyOf(unions[c], cap);
            }
        }
    }
}
