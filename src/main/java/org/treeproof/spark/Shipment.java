package org.treeproof.spark;

import java.io.Serializable;
import org.treeproof.resample.ReplicateTask;

/**
 * A task as it is broadcast: its serialized bytes, decoded (and prepared, if asked) at most once per executor JVM.
 * Spark keeps one deserialized copy of a broadcast value per executor and hands it to every task there, so the
 * decoded task below is shared by the executor's task threads (tasks are immutable and safe to share).
 */
final class Shipment<T> implements Serializable {
    private static final long serialVersionUID = 1L;

    private final byte[] bytes;
    private final SparkExecutor.Preparation preparation;
    private transient volatile ReplicateTask<T> ready;

    private Shipment(byte[] bytes, SparkExecutor.Preparation preparation) {
        this.bytes = bytes;
        this.preparation = preparation;
    }

    static <T> Shipment<T> of(ReplicateTask<T> task, SparkExecutor.Preparation preparation) {
        return new Shipment<>(Codec.encode(task), preparation);
    }

    /** The serialized size of the task, which is what every executor receives once. */
    int size() {
        return bytes.length;
    }

    /** The task, decoded from the bytes (never the driver's own object, also in local mode). */
    ReplicateTask<T> task() {
        ReplicateTask<T> t = ready;
        if (t == null) {
            synchronized (this) {
                t = ready;
                if (t == null) {
                    @SuppressWarnings("unchecked")
                    ReplicateTask<T> decoded = (ReplicateTask<T>) Codec.decode(bytes);
                    // the executor's other task threads wait for this, so it may use all the cores
                    t = preparation.apply(decoded, Runtime.getRuntime().availableProcessors());
                    ready = t;
                }
            }
        }
        return t;
    }
}
