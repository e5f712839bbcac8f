package org.treeproof.resample;

import java.io.Serializable;
import java.util.function.IntFunction;

/**
 * One unit of replicate work as a pure function of its index, serializable so that an executor may run it in
 * other JVMs (other machines) as well as on local threads.
 *
 * <p>A task carries everything it needs by value, and its results must be serializable too. Its serialized
 * form may leave out what it can rebuild from the rest (a study's replicate work carries the data table, not
 * the n² distances); {@link #prepare} rebuilds such parts once in the JVM that received it.
 *
 * @param <T> the result of one index
 */
@FunctionalInterface
public interface ReplicateTask<T> extends IntFunction<T>, Serializable {

    /**
     * This task made ready to run many indices in a JVM it was deserialized in. Executors that ship tasks call it
     * at most once per JVM and shipment, and may skip it: the prepared task must give exactly the results of this
     * one, only faster, at the price of the memory of what it precomputes.
     *
     * @param threads the threads it may use to prepare
     */
    default ReplicateTask<T> prepare(int threads) {
        return this;
    }
}
