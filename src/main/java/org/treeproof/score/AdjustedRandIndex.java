package org.treeproof.score;

import java.math.BigInteger;
import java.util.Objects;
import org.treeproof.partition.ContingencyTable;
import org.treeproof.partition.Partition;

/**
 * The adjusted Rand index between two partitions of the same items.
 *
 * <p>L. Hubert and P. Arabie, "Comparing partitions", Journal of Classification 2 (1985) 193-218,
 * doi:10.1007/BF01908075. With {@code n_ij} the contingency counts, {@code a_i}, {@code b_j} the
 * cluster sizes and {@code C(x) = x(x-1)/2}:
 * <pre>
 *   ARI = (Σ C(n_ij) - Σ C(a_i) Σ C(b_j) / C(n)) / (½ [Σ C(a_i) + Σ C(b_j)] - Σ C(a_i) Σ C(b_j) / C(n))
 * </pre>
 * evaluated, as scikit-learn 1.2.1 does, in the equivalent pair-count form
 * {@code 2 (tp·tn - fn·fp) / ((tp+fn)(fn+tn) + (tp+fp)(fp+tn))} with the pair counts held exactly as
 * integers, so the only rounding is the final division.
 *
 * <p>Convention: when the two partitions put the same pairs together (they are identical, which
 * includes both being one cluster, both being all singletons, and fewer than two items) the index is
 * 1.0, as in scikit-learn. These are exactly the cases where the denominator vanishes (the expected
 * index equals its maximum), so the value is defined for every pair of partitions.
 */
public final class AdjustedRandIndex {
    private final ContingencyTable table;

    private AdjustedRandIndex(ContingencyTable table) {
        this.table = table;
    }

    /** The index between two partitions of the same items. */
    public static AdjustedRandIndex of(Partition first, Partition second) {
        return new AdjustedRandIndex(ContingencyTable.of(first, second));
    }

    /** The index from a contingency table already made (rows: first partition). */
    public static AdjustedRandIndex of(ContingencyTable table) {
        return new AdjustedRandIndex(Objects.requireNonNull(table, "table"));
    }

    /**
     * The index and the pair counts it comes from.
     *
     * @param value           the adjusted Rand index, at most 1
     * @param togetherInBoth  pairs in one cluster in both partitions
     * @param togetherInFirst pairs together in the first partition only
     * @param togetherInSecond pairs together in the second partition only
     * @param apartInBoth     pairs apart in both
     */
    public record Result(double value, long togetherInBoth, long togetherInFirst, long togetherInSecond,
            long apartInBoth) {
        public Result {
            if (togetherInBoth < 0 || togetherInFirst < 0 || togetherInSecond < 0 || apartInBoth < 0) {
                throw new IllegalArgumentException("pair counts must be non-negative");
            }
            if (!(value <= 1.0)) {
                throw new IllegalArgumentException("adjusted Rand index " + value + " is above 1 or not a number");
            }
        }

        /** All pairs of items, {@code n(n-1)/2}. */
        public long pairs() {
            return togetherInBoth + togetherInFirst + togetherInSecond + apartInBoth;
        }
    }

    /** Computes the index. */
    public Result compute() {
        long sumCells = 0;
        for (int t = 0; t < table.nonZeroCells(); t++) {
            sumCells += pairs(table.cellCount(t));
        }
        long sumRows = 0;
        for (int r = 0; r < table.rows(); r++) {
            sumRows += pairs(table.rowSum(r));
        }
        long sumColumns = 0;
        for (int c = 0; c < table.columns(); c++) {
            sumColumns += pairs(table.columnSum(c));
        }
        long tp = sumCells;
        long fn = sumRows - sumCells;
        long fp = sumColumns - sumCells;
        long tn = pairs(table.total()) - sumRows - sumColumns + sumCells;
        if (fn == 0 && fp == 0) {
            return new Result(1.0, tp, fn, fp, tn);
        }
        return new Result(ratio(tp, fn, fp, tn), tp, fn, fp, tn);
    }

    private static double ratio(long tp, long fn, long fp, long tn) {
        try {
            long num = Math.subtractExact(Math.multiplyExact(tp, tn), Math.multiplyExact(fn, fp));
            long den = Math.addExact(Math.multiplyExact(tp + fn, fn + tn), Math.multiplyExact(tp + fp, fp + tn));
            return 2.0 * num / den;
        } catch (ArithmeticException overflow) {
            // beyond about 65 000 items the products leave the long range; exact big integers then
            BigInteger btp = BigInteger.valueOf(tp);
            BigInteger bfn = BigInteger.valueOf(fn);
            BigInteger bfp = BigInteger.valueOf(fp);
            BigInteger btn = BigInteger.valueOf(tn);
            BigInteger num = btp.multiply(btn).subtract(bfn.multiply(bfp));
            BigInteger den = btp.add(bfn).multiply(bfn.add(btn)).add(btp.add(bfp).multiply(bfp.add(btn)));
            return 2.0 * num.doubleValue() / den.doubleValue();
        }
    }

    private static long pairs(long m) {
        return m * (m - 1) / 2;
    }
}
