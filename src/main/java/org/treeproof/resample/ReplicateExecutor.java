package org.treeproof.resample;

import java.util.function.Consumer;

/**
 * Runs {@code count} independent replicate tasks and hands their results to a sink in index order.
 *
 * <p>A task is a pure function of its index (its randomness comes from {@link Seeds}), so an executor
 * may run tasks on any thread, in any order, and retry them; because the sink always sees results in
 * index order, everything accumulated from them is identical for any executor and thread count.
 *
 * <p>{@link LocalExecutor} runs tasks on threads of this JVM; an executor in another package may serialize a
 * task and run it on other machines, which is why tasks are {@link ReplicateTask}s.
 */
public interface ReplicateExecutor {

    /**
     * Runs tasks {@code first .. count-1} and passes each result to {@code inOrder}, in increasing
     * index order, on the calling thread.
     *
     * @param first   the first index to run (later than 0 when resuming from a checkpoint)
     * @param count   one past the last index
     * @param task    the pure function of the index
     * @param inOrder receives results in index order
     */
    <T> void run(int first, int count, ReplicateTask<T> task, Consumer<? super T> inOrder);
}
