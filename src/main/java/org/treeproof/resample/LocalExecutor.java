package org.treeproof.resample;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import java.util.function.IntFunction;

/**
 * Runs replicate tasks on a fixed number of threads in this JVM.
 *
 * <p>At most {@code 2 × threads} tasks are in flight at once, which bounds the memory held by finished
 * results waiting for an earlier index: each thread works on one replicate and at most one more result
 * per thread waits in the queue. With one thread the tasks run on the calling thread. Tasks are never
 * serialized, so they use what they hold in place (a study's replicates gather from the full distance matrix).
 */
public final class LocalExecutor implements ReplicateExecutor {
    private final int threads;

    /** @param threads the number of worker threads, at least 1 */
    public LocalExecutor(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1: " + threads);
        }
        this.threads = threads;
    }

    public int threads() {
        return threads;
    }

    @Override
    public <T> void run(int first, int count, ReplicateTask<T> task, Consumer<? super T> inOrder) {
        runHere(first, count, task, inOrder);
    }

    /**
     * Like {@link #run} for any function of the index, shippable or not: this executor never leaves the JVM.
     * For work that needs what only this JVM holds, such as trees built from the full distance matrix.
     */
    public <T> void runHere(int first, int count, IntFunction<T> task, Consumer<? super T> inOrder) {
        if (threads == 1) {
            for (int i = first; i < count; i++) {
                inOrder.accept(task.apply(i));
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, new Daemons());
        try {
            int window = 2 * threads;
            @SuppressWarnings("unchecked")
            Future<T>[] ring = new Future[window];
            int submitted = first;
            for (; submitted < Math.min(count, first + window); submitted++) {
                final int index = submitted;
                ring[index % window] = pool.submit(() -> task.apply(index));
            }
            for (int next = first; next < count; next++) {
                T result = await(ring[next % window]);
                ring[next % window] = null;
                if (submitted < count) {
                    final int index = submitted++;
                    ring[index % window] = pool.submit(() -> task.apply(index));
                }
                inOrder.accept(result);
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static <T> T await(Future<T> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for a replicate", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException r) {
                throw r;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(c);
        }
    }

    private static final class Daemons implements ThreadFactory {
        private final AtomicInteger count = new AtomicInteger();

        @Override
        public Thread newThread(Runnable r) {
            Thread t = new Thread(r, "treeproof-replicate-" + count.incrementAndGet());
            t.setDaemon(true);
            return t;
        }
    }
}
