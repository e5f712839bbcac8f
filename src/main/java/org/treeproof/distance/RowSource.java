package org.treeproof.distance;

import org.treeproof.data.DataMatrix;

/**
 * The rows a kernel compares, delivered one at a time into the kernel's own buffers.
 *
 * <p>Rows are produced on demand rather than copied into a second matrix, so a computation needs the
 * output array plus scratch proportional to the number of features times the block size. The one
 * exception is {@link Ranks}: ranking a row costs a sort, too much to repeat each time the row is read,
 * so ranks are kept for all rows (as {@code float}, exact for half-integers below 2<sup>23</sup>).
 *
 * <p>Instances are read-only after construction and shared by all worker threads.
 */
abstract sealed class RowSource permits RowSource.Columns, RowSource.Ranks, RowSource.Standardised {
    /** Above this share of the columns a gathered row is read by copying the whole row first. */
    private static final int COPY_WHOLE_ROW_RATIO = 4;

    /** The number of rows. */
    abstract int rows();

    /** The number of values per row. */
    abstract int width();

    /** Length of the scratch array {@link #load} needs. */
    abstract int scratchLength();

    /** Writes row {@code r} into {@code dst[off .. off + width())}. */
    abstract void load(int r, double[] dst, int off, double[] scratch);

    /** Rows of a data matrix over selected columns (all columns when {@code features} is null). */
    static final class Columns extends RowSource {
        private final DataMatrix data;
        private final int[] features;
        private final boolean copyWholeRow;

        Columns(DataMatrix data, int[] features) {
            this.data = data;
            this.features = features;
            this.copyWholeRow = features != null && (long) features.length * COPY_WHOLE_ROW_RATIO >= data.features();
        }

        @Override
        int rows() {
            return data.samples();
        }

        @Override
        int width() {
            return features == null ? data.features() : features.length;
        }

        @Override
        int scratchLength() {
            return copyWholeRow ? data.features() : 0;
        }

        /** The data column behind value {@code k} of a row. */
        int column(int k) {
            return features == null ? k : features[k];
        }

        @Override
        void load(int r, double[] dst, int off, double[] scratch) {
            if (features == null) {
                data.copyRow(r, dst, off);
            } else if (copyWholeRow) {
                data.copyRow(r, scratch, 0);
                for (int k = 0; k < features.length; k++) {
                    dst[off + k] = scratch[features[k]];
                }
            } else {
                for (int k = 0; k < features.length; k++) {
                    dst[off + k] = data.get(r, features[k]);
                }
            }
        }
    }

    /** Average ranks (1-based, ties share the mean of their positions) of every row, held as floats. */
    static final class Ranks extends RowSource {
        private final int rows;
        private final int width;
        private final float[] ranks;

        /** Ranks every row of {@code values}; the rows must hold no NaN. */
        Ranks(RowSource values) {
            this.rows = values.rows();
            this.width = values.width();
            if ((long) rows * width > Integer.MAX_VALUE - 8) {
                throw new IllegalArgumentException(rows + " x " + width + " ranks do not fit one array");
            }
            if (width >= 1 << 23) {
                throw new IllegalArgumentException(width + " values per row are too many to rank exactly in float");
            }
            this.ranks = new float[rows * width];
            double[] row = new double[width];
            int[] order = new int[width];
            int[] buffer = new int[width];
            double[] scratch = new double[values.scratchLength()];
            for (int r = 0; r < rows; r++) {
                values.load(r, row, 0, scratch);
                averageRanks(row, order, buffer, ranks, r * width);
            }
        }

        /**
         * Average ranks of {@code row} into {@code out[outOff ..]}, the convention of
         * {@code scipy.stats.rankdata(method='average')}: equal values (also {@code -0.0} and {@code 0.0})
         * share the mean of the 1-based positions they occupy in sorted order.
         */
        static void averageRanks(double[] row, int[] order, int[] buffer, float[] out, int outOff) {
            int m = row.length;
            sortIndices(row, order, buffer);
            for (int lo = 0; lo < m; ) {
                double v = row[order[lo]];
                int hi = lo + 1;
                while (hi < m && row[order[hi]] == v) {
                    hi++;
                }
                // sorted positions lo .. hi-1 hold equal values: 1-based ranks lo+1 .. hi, mean (lo + 1 + hi) / 2
                float rank = (float) ((lo + 1 + hi) * 0.5);
                for (int k = lo; k < hi; k++) {
                    out[outOff + order[k]] = rank;
                }
                lo = hi;
            }
        }

        private static final int INSERTION_RUN = 16;

        /**
         * Puts into {@code order} the indices of {@code v} in increasing order of value: a bottom-up merge
         * sort over runs sorted by insertion. The JDK sorts primitives only by value, and a sort of boxed
         * indices with a comparator costs several times more for the short rows typical here.
         */
        static void sortIndices(double[] v, int[] order, int[] buffer) {
            int m = v.length;
            for (int k = 0; k < m; k++) {
                order[k] = k;
            }
            for (int start = 0; start < m; start += INSERTION_RUN) {
                int end = Math.min(m, start + INSERTION_RUN);
                for (int k = start + 1; k < end; k++) {
                    int idx = order[k];
                    double key = v[idx];
                    int j = k - 1;
                    while (j >= start && v[order[j]] > key) {
                        order[j + 1] = order[j];
                        j--;
                    }
                    order[j + 1] = idx;
                }
            }
            int[] src = order;
            int[] dst = buffer;
            for (int width = INSERTION_RUN; width < m; width *= 2) {
                for (int lo = 0; lo < m; lo += 2 * width) {
                    int mid = Math.min(m, lo + width);
                    int hi = Math.min(m, lo + 2 * width);
                    int a = lo;
                    int b = mid;
                    for (int k = lo; k < hi; k++) {
                        if (a < mid && (b >= hi || v[src[a]] <= v[src[b]])) {
                            dst[k] = src[a++];
                        } else {
                            dst[k] = src[b++];
                        }
                    }
                }
                int[] t = src;
                src = dst;
                dst = t;
            }
            if (src != order) {
                System.arraycopy(src, 0, order, 0, m);
            }
        }

        @Override
        int rows() {
            return rows;
        }

        @Override
        int width() {
            return width;
        }

        @Override
        int scratchLength() {
            return 0;
        }

        @Override
        void load(int r, double[] dst, int off, double[] scratch) {
            int base = r * width;
            for (int k = 0; k < width; k++) {
                dst[off + k] = ranks[base + k];
            }
        }
    }

    /**
     * Rows scaled to unit length, optionally after subtracting their mean, so that cosine similarity and
     * Pearson correlation become plain dot products.
     *
     * <p>Each row is first multiplied by a power of two that brings its largest magnitude into [1, 2):
     * exact, and it keeps the sums below from overflowing or underflowing. The mean is refined by one
     * correction pass (the mean of the residuals), which makes centring accurate also for rows with a
     * large common offset. The same arithmetic runs when statistics are taken and when a row is
     * delivered, so a delivered row is the same bits every time.
     */
    static final class Standardised extends RowSource {
        private final RowSource raw;
        private final double[] factor;
        private final double[] shift;
        private final double[] norm;

        /**
         * @param raw    the values, already checked: finite, and not all zero ({@code centre == false}) or
         *               not all equal ({@code centre == true}) in any row
         * @param centre whether to subtract each row's mean
         */
        Standardised(RowSource raw, boolean centre) {
            this.raw = raw;
            int n = raw.rows();
            int m = raw.width();
            this.factor = new double[n];
            this.shift = new double[n];
            this.norm = new double[n];
            double[] row = new double[m];
            double[] scratch = new double[raw.scratchLength()];
            for (int r = 0; r < n; r++) {
                raw.load(r, row, 0, scratch);
                double maxAbs = 0;
                for (int k = 0; k < m; k++) {
                    maxAbs = Math.max(maxAbs, Math.abs(row[k]));
                }
                if (maxAbs == 0) {
                    throw new IllegalStateException("row " + r + " is all zero; callers must refuse it first");
                }
                double f = Math.scalb(1.0, -Math.getExponent(maxAbs));
                double s = 0;
                if (centre) {
                    double sum = 0;
                    for (int k = 0; k < m; k++) {
                        sum += row[k] * f;
                    }
                    s = sum / m;
                    double residual = 0;
                    for (int k = 0; k < m; k++) {
                        residual += row[k] * f - s;
                    }
                    s += residual / m;
                }
                double squares = 0;
                for (int k = 0; k < m; k++) {
                    double c = row[k] * f - s;
                    squares = Math.fma(c, c, squares);
                }
                if (!(squares > 0)) {
                    throw new IllegalStateException("row " + r + " has no spread; callers must refuse it first");
                }
                factor[r] = f;
                shift[r] = s;
                norm[r] = Math.sqrt(squares);
            }
        }

        @Override
        int rows() {
            return raw.rows();
        }

        @Override
        int width() {
            return raw.width();
        }

        @Override
        int scratchLength() {
            return raw.scratchLength();
        }

        @Override
        void load(int r, double[] dst, int off, double[] scratch) {
            raw.load(r, dst, off, scratch);
            double f = factor[r];
            double s = shift[r];
            double d = norm[r];
            int end = off + raw.width();
            for (int k = off; k < end; k++) {
                dst[k] = (dst[k] * f - s) / d;
            }
        }
    }
}
