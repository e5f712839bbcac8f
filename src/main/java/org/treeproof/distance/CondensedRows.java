package org.treeproof.distance;

/**
 * The values of a condensed matrix read row by row, in the condensed order: row {@code i} holds
 * {@code d(i, j)} for {@code j = i+1 .. n-1}. Lets an algorithm that needs only one pass at a time over the
 * distances (the cophenetic correlation, say) run without the whole matrix in memory: the rows may come from
 * a matrix that is held, or be computed again band by band ({@link Metric#rows}).
 */
public interface CondensedRows {

    /** The number of items {@code n}. */
    int size();

    /**
     * One pass over rows {@code 0 .. n-2}, in increasing order. Each call starts a new pass.
     *
     * @throws org.treeproof.data.InputException if the rows are computed and the data cannot give them
     */
    void forEachRow(RowVisitor visitor);

    /** Receives one row of a pass. */
    @FunctionalInterface
    interface RowVisitor {
        /**
         * Row {@code i}: {@code values[from + (j - i - 1)]} is {@code d(i, j)} for {@code j = i+1 .. n-1}. The array
         * belongs to the source and is only valid during the call; the visitor must not change it.
         */
        void row(int i, double[] values, int from);
    }
}
