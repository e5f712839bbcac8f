package org.treeproof.distance;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;

/**
 * Properties of the blocked, multi-threaded kernel on seeded random data large enough to span several
 * sample blocks and feature chunks: identical bits for any thread count, for any order of the samples,
 * for a pair computed alone, for a subset of the samples (which is how a replicate run on another machine
 * gets its distances) and for a feature subset taken by index; and agreement with a direct
 * transcription of each definition (the formulas in {@link Metric}'s documentation).
 */
class KernelInvarianceTest {
    /** More than two 128-sample blocks, a partial block, and 70 features: two 32-feature chunks and a tail. */
    private static final int N = 301;
    private static final int P = 70;

    private static DataMatrix random(long seed, int n, int p, boolean binary) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] v = new double[n * p];
        for (int t = 0; t < v.length; t++) {
            v[t] = binary ? (rnd.nextDouble() < 0.4 ? 1 : 0) : rnd.nextGaussian() * 2 + 0.5;
        }
        return new DataMatrix(IntStream.range(0, n).mapToObj(i -> "s" + i).toList(),
                IntStream.range(0, p).mapToObj(j -> "f" + j).toList(), v);
    }

    /** The columns {@code features} of {@code data} as a new matrix; repeated columns get new names. */
    private static DataMatrix gather(DataMatrix data, int[] features) {
        double[] v = new double[data.samples() * features.length];
        for (int i = 0; i < data.samples(); i++) {
            for (int k = 0; k < features.length; k++) {
                v[i * features.length + k] = data.get(i, features[k]);
            }
        }
        return new DataMatrix(data.sampleIds(), IntStream.range(0, features.length).mapToObj(k -> "c" + k).toList(), v);
    }

    private static DataMatrix dataFor(Metric m, long seed) {
        return random(seed, N, P, m == Metric.JACCARD || m == Metric.HAMMING);
    }

    @Test
    void threadCountDoesNotChangeABit() {
        for (Metric m : Metric.values()) {
            DataMatrix data = dataFor(m, 11);
            double[] one = m.compute(data, 1).toCondensedArray();
            for (int threads : new int[] {2, 3, 7}) {
                assertArrayEquals(one, m.compute(data, threads).toCondensedArray(), m + " with " + threads + " threads");
            }
        }
    }

    @Test
    void reorderingSamplesPermutesTheSameBits() {
        SplittableRandom rnd = new SplittableRandom(12);
        int[] perm = IntStream.range(0, N).toArray();
        for (int i = N - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            int t = perm[i];
            perm[i] = perm[j];
            perm[j] = t;
        }
        for (Metric m : Metric.values()) {
            DataMatrix data = dataFor(m, 13);
            CondensedDistances d = m.compute(data, 2);
            CondensedDistances e = m.compute(data.selectSamples(perm), 2);
            for (int a = 0; a < N; a++) {
                for (int b = a + 1; b < N; b++) {
                    assertEquals(d.get(perm[a], perm[b]), e.get(a, b), 0.0, m + " pair " + a + "," + b);
                }
            }
        }
    }

    @Test
    void aPairAloneHasTheBitsOfItsMatrixEntry() {
        SplittableRandom rnd = new SplittableRandom(14);
        for (Metric m : Metric.values()) {
            DataMatrix data = dataFor(m, 15);
            CondensedDistances d = m.compute(data, 3);
            for (int s = 0; s < 200; s++) {
                int i = rnd.nextInt(N);
                int j = rnd.nextInt(N);
                if (i != j) {
                    assertEquals(d.get(i, j), m.between(data.row(i), data.row(j)), 0.0, m + " pair " + i + "," + j);
                }
            }
        }
    }

    /**
     * A replicate shipped without the full matrix computes its distances over its own samples; they must be the
     * entries the replicate would gather from the full matrix, bit for bit, also when the subset falls into other
     * blocks than its samples did in the full run, and also over a feature subset.
     */
    @Test
    void aSubsetOfSamplesHasTheBitsOfItsGatheredEntries() {
        SplittableRandom rnd = new SplittableRandom(19);
        int[] features = rnd.ints(23, 0, P).toArray();
        for (Metric m : Metric.values()) {
            DataMatrix data = dataFor(m, 20);
            CondensedDistances full = m.compute(data, 2);
            CondensedDistances fullOnFeatures = m.compute(data, features, 3);
            for (int size : new int[] {2, 37, 129, 240}) {
                int[] subset = rnd.ints(0, N).distinct().limit(size).sorted().toArray();
                DataMatrix rows = data.selectSamples(subset);
                assertArrayEquals(full.gather(subset).toCondensedArray(), m.compute(rows, 1).toCondensedArray(),
                        m + " on " + size + " samples");
                assertArrayEquals(fullOnFeatures.gather(subset).toCondensedArray(),
                        m.compute(rows, features, 1).toCondensedArray(), m + " on " + size + " samples, 23 features");
            }
        }
    }

    @Test
    void featureSubsetByIndexEqualsTheSelectedMatrix() {
        SplittableRandom rnd = new SplittableRandom(16);
        // a small subset (read value by value) and a large one with repeats (read by copying rows)
        int[] few = rnd.ints(9, 0, P).toArray();
        int[] many = rnd.ints(60, 0, P).toArray();
        for (Metric m : Metric.values()) {
            DataMatrix data = dataFor(m, 17);
            for (int[] features : List.of(few, many)) {
                assertArrayEquals(m.compute(gather(data, features), 2).toCondensedArray(),
                        m.compute(data, features, 2).toCondensedArray(), m + " over " + features.length + " features");
            }
        }
    }

    @Test
    void agreesWithTheDefinitionsWrittenOut() {
        for (Metric m : Metric.values()) {
            DataMatrix data = dataFor(m, 18);
            CondensedDistances d = m.compute(data, 2);
            for (int i = 0; i < N; i += 7) {
                for (int j = i + 1; j < N; j += 5) {
                    double want = Definitions.of(m, data.row(i), data.row(j));
                    double tol = 1e-12 * Math.abs(want) + (m == Metric.COSINE || m == Metric.PEARSON || m == Metric.SPEARMAN ? 1e-12 : 0);
                    assertEquals(want, d.get(i, j), tol, m + " pair " + i + "," + j);
                }
            }
        }
    }
}
