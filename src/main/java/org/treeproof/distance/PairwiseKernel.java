package org.treeproof.distance;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

/**
 * All pairwise values of one metric over prepared rows, blocked for the cache and spread over threads.
 *
 * <p>The pair space is cut into a fixed set of tasks, one per block of {@value #BLOCK_J} consecutive
 * "column" samples {@code j}. A task holds its block feature-major and sweeps the samples {@code i < j}
 * in groups of {@value #BLOCK_I}, folding {@value #CHUNK_K} features at a time so that the block slice
 * and the accumulators stay in the first-level cache. Threads take tasks from a shared counter, largest
 * first; since each pair is folded in feature order by whichever thread holds it, the result does not
 * depend on the number of threads.
 *
 * <p>Memory: the condensed output plus, per thread, about {@code (BLOCK_J + BLOCK_I) * width} doubles.
 */
final class PairwiseKernel {
    static final int BLOCK_J = 128;
    static final int BLOCK_I = 32;
    static final int CHUNK_K = 32;

    private final RowSource rows;
    private final Metric metric;
    private final double[] perRow;
    private final int n;
    private final int m;
    /** The band of rows computed: {@code rowFrom <= i < rowTo}, all {@code j > i}. */
    private final int rowFrom;
    private final int rowTo;
    /** The condensed position of the band's first value, which goes to {@code out[0]}. */
    private final int base;
    private final double[] out;
    private final int firstTask;
    private final int tasks;
    private final AtomicInteger nextTask = new AtomicInteger();
    /** Smallest condensed index whose value is not finite, or Long.MAX_VALUE. */
    private final AtomicLong firstNonFinite = new AtomicLong(Long.MAX_VALUE);

    private PairwiseKernel(RowSource rows, Metric metric, double[] perRow, int rowFrom, int rowTo, double[] out) {
        this.rows = rows;
        this.metric = metric;
        this.perRow = perRow;
        this.n = rows.rows();
        this.m = rows.width();
        this.rowFrom = rowFrom;
        this.rowTo = rowTo;
        this.base = rowStart(n, rowFrom);
        this.out = out;
        // column blocks holding some j > rowFrom; none when the band is empty
        this.firstTask = rowFrom < rowTo ? (rowFrom + 1) / BLOCK_J : 0;
        this.tasks = rowFrom < rowTo ? (n + BLOCK_J - 1) / BLOCK_J : 0;
    }

    /** The condensed position of pair {@code (i, i+1)}; {@code n(n-1)/2} for {@code i = n-1}. */
    static int rowStart(int n, int i) {
        return (int) ((long) n * i - (long) i * (i + 1) / 2);
    }

    /**
     * The values computed and, if some pair overflowed, the first such pair's condensed index. The array
     * is not copied: it goes straight to {@link CondensedDistances#wrap}, and a copy could double the
     * largest allocation of a run.
     */
    record Result(double[] condensed, long firstNonFinite) {
    }

    /** Computes all pairs of {@code rows} with {@code threads} threads (1 runs in the caller's thread). */
    static Result run(RowSource rows, Metric metric, double[] perRow, int threads) {
        int n = rows.rows();
        return band(rows, metric, perRow, 0, Math.max(0, n - 1), new double[CondensedDistances.length(n)], threads);
    }

    /**
     * Computes rows {@code rowFrom <= i < rowTo} of the condensed matrix (every {@code j > i}) into
     * {@code out[0 ..]}, in the condensed order: the same bits as those positions of {@link #run}. The
     * position of the first non-finite value, if any, is its position in the whole matrix.
     */
    static Result band(RowSource rows, Metric metric, double[] perRow, int rowFrom, int rowTo, double[] out,
            int threads) {
        PairwiseKernel k = new PairwiseKernel(rows, metric, perRow, rowFrom, rowTo, out);
        if (out.length < rowStart(k.n, rowTo) - k.base) {
            throw new IllegalArgumentException("band of " + out.length + " values too short for rows " + rowFrom
                    + ".." + (rowTo - 1));
        }
        int workers = Math.max(1, Math.min(threads, k.tasks - k.firstTask));
        if (workers == 1) {
            k.new Worker().call();
        } else {
            k.runParallel(workers);
        }
        return new Result(k.out, k.firstNonFinite.get());
    }

    private void runParallel(int workers) {
        ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
            Thread t = new Thread(r, "treeproof-distance");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Callable<Void>> jobs = new ArrayList<>();
            for (int w = 0; w < workers; w++) {
                jobs.add(new Worker());
            }
            for (Future<Void> f : pool.invokeAll(jobs)) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while computing distances", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        } finally {
            pool.shutdownNow();
        }
    }

    /** One thread's buffers and loop over tasks. */
    private final class Worker implements Callable<Void> {
        private final double[] scratch = new double[rows.scratchLength()];
        private final double[] row = new double[m];
        /** block[k][jj]: feature k of column sample j0 + jj (no wider than n, for small problems). */
        private final double[][] block = new double[m][Math.min(BLOCK_J, n)];
        /** Row-major values of the current group of row samples. */
        private final double[] group = new double[Math.min(BLOCK_I, n) * m];
        private final double[][] acc = new double[Math.min(BLOCK_I, n)][Math.min(BLOCK_J, n)];

        @Override
        public Void call() {
            int b;
            while ((b = nextTask.getAndIncrement()) < tasks - firstTask) {
                runTask(tasks - 1 - b);
            }
            return null;
        }

        private void runTask(int task) {
            int j0 = task * BLOCK_J;
            int bj = Math.min(BLOCK_J, n - j0);
            for (int jj = 0; jj < bj; jj++) {
                rows.load(j0 + jj, row, 0, scratch);
                for (int k = 0; k < m; k++) {
                    block[k][jj] = row[k];
                }
            }
            // row samples i pair with j > i, so the last column sample has none
            int iEnd = Math.min(j0 + bj - 1, rowTo);
            for (int i0 = rowFrom; i0 < iEnd; i0 += BLOCK_I) {
                int bi = Math.min(BLOCK_I, iEnd - i0);
                for (int ii = 0; ii < bi; ii++) {
                    rows.load(i0 + ii, group, ii * m, scratch);
                }
                // lanes below i0 + 1 - j0 belong to pairs j <= i for every row of the group
                int from = Math.max(0, i0 + 1 - j0);
                tile(bi, from, bj);
                write(i0, bi, j0, bj);
            }
        }

        private void tile(int bi, int from, int bj) {
            Accumulation op = metric.accumulation();
            for (int ii = 0; ii < bi; ii++) {
                java.util.Arrays.fill(acc[ii], from, bj, 0.0);
            }
            for (int k0 = 0; k0 < m; k0 += CHUNK_K) {
                int k1 = Math.min(m, k0 + CHUNK_K);
                int ii = 0;
                // two row samples at a time share the loads of the block
                for (; ii + 1 < bi; ii += 2) {
                    double[] a = acc[ii];
                    double[] b = acc[ii + 1];
                    int x = ii * m;
                    int y = x + m;
                    int k = k0;
                    for (; k + 3 < k1; k += 4) {
                        op.step4x2(a, b, block[k], block[k + 1], block[k + 2], block[k + 3], from, bj,
                                group[x + k], group[x + k + 1], group[x + k + 2], group[x + k + 3],
                                group[y + k], group[y + k + 1], group[y + k + 2], group[y + k + 3]);
                    }
                    for (; k < k1; k++) {
                        op.step1(a, block[k], from, bj, group[x + k]);
                        op.step1(b, block[k], from, bj, group[y + k]);
                    }
                }
                for (; ii < bi; ii++) {
                    double[] a = acc[ii];
                    int x = ii * m;
                    int k = k0;
                    for (; k + 3 < k1; k += 4) {
                        op.step4(a, block[k], block[k + 1], block[k + 2], block[k + 3], from, bj,
                                group[x + k], group[x + k + 1], group[x + k + 2], group[x + k + 3]);
                    }
                    for (; k < k1; k++) {
                        op.step1(a, block[k], from, bj, group[x + k]);
                    }
                }
            }
        }

        private void write(int i0, int bi, int j0, int bj) {
            for (int ii = 0; ii < bi; ii++) {
                int i = i0 + ii;
                int jStart = Math.max(j0, i + 1);
                int jEnd = j0 + bj;
                if (jStart >= jEnd) {
                    continue;
                }
                double[] a = acc[ii];
                double rowI = perRow == null ? 0 : perRow[i];
                int t = CondensedDistances.index(n, i, jStart) - base;
                for (int j = jStart; j < jEnd; j++, t++) {
                    double v = metric.finish(a[j - j0], rowI, perRow == null ? 0 : perRow[j], m);
                    out[t] = v;
                    if (!(v <= Double.MAX_VALUE)) {
                        long at = (long) t + base;
                        firstNonFinite.accumulateAndGet(at, Math::min);
                    }
                }
            }
        }
    }
}
