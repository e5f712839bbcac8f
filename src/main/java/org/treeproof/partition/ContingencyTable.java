package org.treeproof.partition;

import java.util.Arrays;
import java.util.Objects;

/**
 * The contingency table of two partitions of the same items: cell {@code (r, c)} counts the items in
 * cluster {@code r} of the first (row) partition and cluster {@code c} of the second (column) partition.
 *
 * <p>Only the non-zero cells are held, in row-major order, so the table costs at most one cell per item
 * however many clusters the partitions have (two all-singleton partitions of 20 000 items would need
 * 4·10<sup>8</sup> dense cells). The table is immutable; accessors never expose its arrays.
 */
public final class ContingencyTable {
    /** Dense counting is used while the dense table is at most this many cells (or a few per item). */
    private static final long DENSE_LIMIT = 1L << 20;

    private final int rows;
    private final int columns;
    private final int[] rowSums;
    private final int[] columnSums;
    /** Row-major keys {@code r * columns + c} of the non-zero cells, ascending. */
    private final long[] keys;
    private final int[] counts;

    private ContingencyTable(int rows, int columns, int[] rowSums, int[] columnSums, long[] keys, int[] counts) {
        this.rows = rows;
        this.columns = columns;
        this.rowSums = rowSums;
        this.columnSums = columnSums;
        this.keys = keys;
        this.counts = counts;
    }

    /**
     * The table of {@code rowPartition} against {@code columnPartition}.
     *
     * @throws IllegalArgumentException if the partitions are of different numbers of items
     */
    public static ContingencyTable of(Partition rowPartition, Partition columnPartition) {
        Objects.requireNonNull(rowPartition, "rowPartition");
        Objects.requireNonNull(columnPartition, "columnPartition");
        int n = rowPartition.size();
        if (columnPartition.size() != n) {
            throw new IllegalArgumentException("partitions are of " + n + " and " + columnPartition.size()
                    + " items; a contingency table needs the same items");
        }
        int rows = rowPartition.clusterCount();
        int columns = columnPartition.clusterCount();
        int[] rowSums = rowPartition.clusterSizes();
        int[] columnSums = columnPartition.clusterSizes();
        long cells = (long) rows * columns;
        if (cells <= Math.max(DENSE_LIMIT, 4L * n)) {
            return dense(rowPartition, columnPartition, rows, columns, rowSums, columnSums);
        }
        long[] itemKeys = new long[n];
        for (int i = 0; i < n; i++) {
            itemKeys[i] = (long) rowPartition.label(i) * columns + columnPartition.label(i);
        }
        Arrays.sort(itemKeys);
        int distinct = 0;
        for (int i = 0; i < n; i++) {
            if (i == 0 || itemKeys[i] != itemKeys[i - 1]) {
                distinct++;
            }
        }
        long[] keys = new long[distinct];
        int[] counts = new int[distinct];
        int t = -1;
        for (int i = 0; i < n; i++) {
            if (i == 0 || itemKeys[i] != itemKeys[i - 1]) {
                keys[++t] = itemKeys[i];
            }
            counts[t]++;
        }
        return new ContingencyTable(rows, columns, rowSums, columnSums, keys, counts);
    }

    private static ContingencyTable dense(Partition a, Partition b, int rows, int columns, int[] rowSums,
            int[] columnSums) {
        int[] table = new int[rows * columns];
        for (int i = 0; i < a.size(); i++) {
            table[a.label(i) * columns + b.label(i)]++;
        }
        int distinct = 0;
        for (int v : table) {
            if (v != 0) {
                distinct++;
            }
        }
        long[] keys = new long[distinct];
        int[] counts = new int[distinct];
        int t = 0;
        for (int cell = 0; cell < table.length; cell++) {
            if (table[cell] != 0) {
                keys[t] = cell;
                counts[t++] = table[cell];
            }
        }
        return new ContingencyTable(rows, columns, rowSums, columnSums, keys, counts);
    }

    /** The number of clusters of the row partition. */
    public int rows() {
        return rows;
    }

    /** The number of clusters of the column partition. */
    public int columns() {
        return columns;
    }

    /** The number of items. */
    public int total() {
        int s = 0;
        for (int v : rowSums) {
            s += v;
        }
        return s;
    }

    /** The count in cell {@code (r, c)}. */
    public int count(int r, int c) {
        Objects.checkIndex(r, rows);
        Objects.checkIndex(c, columns);
        int t = Arrays.binarySearch(keys, (long) r * columns + c);
        return t >= 0 ? counts[t] : 0;
    }

    /** The size of row cluster {@code r}. */
    public int rowSum(int r) {
        return rowSums[r];
    }

    /** The size of column cluster {@code c}. */
    public int columnSum(int c) {
        return columnSums[c];
    }

    /** The number of non-zero cells; they are numbered {@code 0..nonZeroCells()-1} in row-major order. */
    public int nonZeroCells() {
        return counts.length;
    }

    /** The row of the {@code t}-th non-zero cell. */
    public int cellRow(int t) {
        return (int) (keys[t] / columns);
    }

    /** The column of the {@code t}-th non-zero cell. */
    public int cellColumn(int t) {
        return (int) (keys[t] % columns);
    }

    /** The count of the {@code t}-th non-zero cell (always positive). */
    public int cellCount(int t) {
        return counts[t];
    }

    /** A fresh dense copy, {@code [row][column]}; for small tables only. */
    public int[][] toArray() {
        int[][] out = new int[rows][columns];
        for (int t = 0; t < counts.length; t++) {
            out[cellRow(t)][cellColumn(t)] = counts[t];
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ContingencyTable c && c.rows == rows && c.columns == columns
                && Arrays.equals(c.keys, keys) && Arrays.equals(c.counts, counts);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * rows + columns) + Arrays.hashCode(counts);
    }

    @Override
    public String toString() {
        return "ContingencyTable[" + rows + " x " + columns + ", n=" + total() + "]";
    }
}
