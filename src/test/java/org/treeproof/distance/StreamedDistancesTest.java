package org.treeproof.distance;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

/**
 * The two ways of reading distances without a second matrix: {@link Metric#rows} (computed again band by band)
 * and {@link OwnedDistances} (a matrix its owner may give up). Both must give the bits of
 * {@link Metric#compute}, which {@code MetricScipyReferenceTest} checks against scipy.
 */
class StreamedDistancesTest {
    /** Several 128-sample column blocks and a partial one; 70 features span two 32-feature chunks and a tail. */
    private static final int N = 301;
    private static final int P = 70;

    private static DataMatrix random(long seed, boolean binary) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] v = new double[N * P];
        for (int t = 0; t < v.length; t++) {
            v[t] = binary ? (rnd.nextDouble() < 0.4 ? 1 : 0) : rnd.nextGaussian() * 2 + 0.5;
        }
        return new DataMatrix(IntStream.range(0, N).mapToObj(i -> "s" + i).toList(),
                IntStream.range(0, P).mapToObj(j -> "f" + j).toList(), v);
    }

    /** The rows of one pass, laid end to end: the condensed array if the rows are right. */
    private static double[] collect(CondensedRows rows) {
        int n = rows.size();
        double[] out = new double[CondensedDistances.length(n)];
        int[] next = {0, 0};
        rows.forEachRow((i, values, from) -> {
            assertEquals(next[1]++, i, "rows in order");
            System.arraycopy(values, from, out, next[0], n - i - 1);
            next[0] += n - i - 1;
        });
        assertEquals(out.length, next[0]);
        return out;
    }

    @Test
    void rowsComputedAgainInBandsAreTheMatrixBitForBit() {
        for (Metric m : Metric.values()) {
            DataMatrix data = random(11 + m.ordinal(), m.binaryOnly());
            double[] whole = m.compute(data, 1).toCondensedArray();
            // one row per band, bands that end inside a 128-sample block, one band for all
            for (int band : new int[] {1, 1000, 7777, 1 << 22}) {
                for (int threads : new int[] {1, 3}) {
                    assertArrayEquals(whole, collect(m.rows(data, threads, band)), m + ", band " + band);
                }
            }
            // each pass starts again
            CondensedRows rows = m.rows(data, 2, 5000);
            assertArrayEquals(collect(rows), collect(rows), m + ": a second pass");
        }
    }

    @Test
    void aBandIsThatSliceOfTheWholeKernel() {
        DataMatrix data = random(3, false);
        RowPreparation.Prepared prepared = RowPreparation.AS_IS.prepare(new RowSource.Columns(data, null), data,
                "euclidean");
        double[] whole = PairwiseKernel.run(prepared.rows(), Metric.EUCLIDEAN, null, 2).condensed();
        int from = 129;
        int to = 260;
        int base = PairwiseKernel.rowStart(N, from);
        int len = PairwiseKernel.rowStart(N, to) - base;
        double[] band = new double[len + 5];
        PairwiseKernel.band(prepared.rows(), Metric.EUCLIDEAN, null, from, to, band, 2);
        assertArrayEquals(java.util.Arrays.copyOfRange(whole, base, base + len),
                java.util.Arrays.copyOf(band, len));
        assertThrows(IllegalArgumentException.class, () -> PairwiseKernel.band(prepared.rows(), Metric.EUCLIDEAN,
                null, from, to, new double[len - 1], 1));
    }

    @Test
    void rowsCheckTheDataAtOnceLikeCompute() {
        double[] v = {1, 2, Double.NaN, 4};
        DataMatrix data = new DataMatrix(List.of("a", "b"), List.of("f", "g"), v);
        InputException e = assertThrows(InputException.class, () -> Metric.EUCLIDEAN.rows(data, 1));
        assertEquals(assertThrows(InputException.class, () -> Metric.EUCLIDEAN.compute(data, 1)).getMessage(),
                e.getMessage());
    }

    @Test
    void ownedDistancesAreTheComputedOnesUntilGivenUp() {
        DataMatrix data = random(5, false);
        CondensedDistances d = Metric.PEARSON.compute(data, 2);
        OwnedDistances owned = Metric.PEARSON.computeOwned(data, 2);
        assertEquals(N, owned.size());
        assertArrayEquals(d.toCondensedArray(), collect(owned));
        assertArrayEquals(d.toCondensedArray(), collect(d));
        assertEquals(d.at(17), owned.at(17));
        double[] taken = owned.take();
        assertArrayEquals(d.toCondensedArray(), taken);
        assertTrue(owned.taken());
        assertThrows(IllegalStateException.class, owned::take);
        assertThrows(IllegalStateException.class, () -> owned.at(0));
        assertThrows(IllegalStateException.class, owned::freeze);

        OwnedDistances copy = OwnedDistances.copyOf(d);
        assertEquals(d, copy.freeze());
        assertThrows(IllegalStateException.class, () -> copy.forEachRow((i, values, from) -> { }));
    }

    @Test
    void gatheredRowsAreTheEntriesTheyName() {
        DataMatrix data = random(9, false);
        CondensedDistances d = Metric.EUCLIDEAN.compute(data, 2);
        SplittableRandom rnd = new SplittableRandom(4);
        // unsorted, with repeats (bootstrap), and the first and last items
        int[] items = new int[250];
        for (int a = 0; a < items.length; a++) {
            items[a] = a < 2 ? a * (N - 1) : rnd.nextInt(N);
        }
        CondensedDistances g = d.gather(items);
        for (int a = 0; a < items.length; a++) {
            for (int b = 0; b < items.length; b++) {
                double expected = items[a] == items[b] ? 0.0 : d.get(items[a], items[b]);
                assertEquals(expected, g.get(a, b), "pair " + a + ", " + b);
            }
        }
        OwnedDistances owned = d.gatherOwned(items);
        assertEquals(g, owned.copy().freeze());
        assertArrayEquals(g.toCondensedArray(), owned.take());
        assertThrows(IndexOutOfBoundsException.class, () -> d.gather(new int[] {0, N}));
    }

    @Test
    void aMatrixHandsOutCopiesOfItsRows() {
        CondensedDistances d = CondensedDistances.of(4, new double[] {1, 2, 3, 4, 5, 6});
        d.forEachRow((i, values, from) -> java.util.Arrays.fill(values, 99));
        assertArrayEquals(new double[] {1, 2, 3, 4, 5, 6}, d.toCondensedArray());
    }
}
