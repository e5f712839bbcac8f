package org.treeproof.distance;

/**
 * The per-feature accumulation a metric needs, as the inner loop of the blocked kernel.
 *
 * <p>Every step updates the accumulators of one sample {@code x} against a block of samples held
 * feature-major ({@code t[k][jj]} is feature {@code k} of block sample {@code jj}). The loop over
 * {@code jj} carries no dependence between lanes and indexes every array from offset 0, which is the
 * shape HotSpot's C2 turns into SIMD code; a flat array with a variable offset stays scalar (measured:
 * about four times slower).
 *
 * <p>For each pair the features are folded in strictly increasing order, so a pair's value does not
 * depend on the block it falls in or on the thread that computes it: results are bit-identical for any
 * tiling and thread count.
 */
enum Accumulation {
    /** Sum of squared differences, fused multiply-add per feature. */
    SQUARED_DIFFERENCE {
        @Override
        void step4(double[] a, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
                   double x0, double x1, double x2, double x3) {
            for (int jj = from; jj < to; jj++) {
                double d0 = x0 - t0[jj];
                double d1 = x1 - t1[jj];
                double d2 = x2 - t2[jj];
                double d3 = x3 - t3[jj];
                a[jj] = Math.fma(d3, d3, Math.fma(d2, d2, Math.fma(d1, d1, Math.fma(d0, d0, a[jj]))));
            }
        }

        @Override
        void step1(double[] a, double[] t0, int from, int to, double x0) {
            for (int jj = from; jj < to; jj++) {
                double d0 = x0 - t0[jj];
                a[jj] = Math.fma(d0, d0, a[jj]);
            }
        }

        @Override
        void step4x2(double[] a, double[] b, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
                double x0, double x1, double x2, double x3, double y0, double y1, double y2, double y3) {
            for (int jj = from; jj < to; jj++) {
                double u0 = t0[jj];
                double u1 = t1[jj];
                double u2 = t2[jj];
                double u3 = t3[jj];
                double d0 = x0 - u0;
                double d1 = x1 - u1;
                double d2 = x2 - u2;
                double d3 = x3 - u3;
                double e0 = y0 - u0;
                double e1 = y1 - u1;
                double e2 = y2 - u2;
                double e3 = y3 - u3;
                a[jj] = Math.fma(d3, d3, Math.fma(d2, d2, Math.fma(d1, d1, Math.fma(d0, d0, a[jj]))));
                b[jj] = Math.fma(e3, e3, Math.fma(e2, e2, Math.fma(e1, e1, Math.fma(e0, e0, b[jj]))));
            }
        }
    },
    /** Sum of absolute differences. */
    ABSOLUTE_DIFFERENCE {
        @Override
        void step4(double[] a, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
                   double x0, double x1, double x2, double x3) {
            for (int jj = from; jj < to; jj++) {
                a[jj] = a[jj] + Math.abs(x0 - t0[jj]) + Math.abs(x1 - t1[jj]) + Math.abs(x2 - t2[jj])
                        + Math.abs(x3 - t3[jj]);
            }
        }

        @Override
        void step1(double[] a, double[] t0, int from, int to, double x0) {
            for (int jj = from; jj < to; jj++) {
                a[jj] = a[jj] + Math.abs(x0 - t0[jj]);
            }
        }
    },
    /** Largest absolute difference. */
    MAXIMUM_ABSOLUTE_DIFFERENCE {
        // One feature per pass: C2 vectorises a single max per element but not a tree of four (measured
        // about five times slower); the order of the maxima does not change the result.
        @Override
        void step4(double[] a, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
                   double x0, double x1, double x2, double x3) {
            step1(a, t0, from, to, x0);
            step1(a, t1, from, to, x1);
            step1(a, t2, from, to, x2);
            step1(a, t3, from, to, x3);
        }

        @Override
        void step1(double[] a, double[] t0, int from, int to, double x0) {
            for (int jj = from; jj < to; jj++) {
                a[jj] = Math.max(a[jj], Math.abs(x0 - t0[jj]));
            }
        }
    },
    /** Dot product, fused multiply-add per feature. */
    PRODUCT {
        @Override
        void step4(double[] a, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
                   double x0, double x1, double x2, double x3) {
            for (int jj = from; jj < to; jj++) {
                a[jj] = Math.fma(x3, t3[jj], Math.fma(x2, t2[jj], Math.fma(x1, t1[jj], Math.fma(x0, t0[jj], a[jj]))));
            }
        }

        @Override
        void step1(double[] a, double[] t0, int from, int to, double x0) {
            for (int jj = from; jj < to; jj++) {
                a[jj] = Math.fma(x0, t0[jj], a[jj]);
            }
        }
    };

    /** Folds four consecutive features {@code x0..x3} (rows {@code t0..t3}) into lanes {@code from..to-1}. */
    abstract void step4(double[] a, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
                        double x0, double x1, double x2, double x3);

    /** Folds one feature into lanes {@code from..to-1}. */
    abstract void step1(double[] a, double[] t0, int from, int to, double x0);

    /**
     * {@link #step4} for two samples {@code x} and {@code y} against the same block features, into {@code a} and
     * {@code b}: each block value is loaded once for both. The same operations on each accumulator as two calls
     * of {@link #step4}, so the same bits.
     */
    void step4x2(double[] a, double[] b, double[] t0, double[] t1, double[] t2, double[] t3, int from, int to,
            double x0, double x1, double x2, double x3, double y0, double y1, double y2, double y3) {
        step4(a, t0, t1, t2, t3, from, to, x0, x1, x2, x3);
        step4(b, t0, t1, t2, t3, from, to, y0, y1, y2, y3);
    }
}
