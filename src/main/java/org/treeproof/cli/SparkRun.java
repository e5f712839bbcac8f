package org.treeproof.cli;

import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.spark.SparkEngine;

/**
 * The Spark engine as the command line starts it. Referenced only from {@link Engine#SPARK}, so Spark's classes are
 * loaded only when {@code --engine spark} is chosen.
 */
final class SparkRun implements Engine.Run {
    private final SparkEngine engine;

    private SparkRun(SparkEngine engine) {
        this.engine = engine;
    }

    static SparkRun start() {
        return new SparkRun(SparkEngine.start("treeproof assess"));
    }

    @Override
    public ReplicateExecutor executor() {
        return engine.executor();
    }

    @Override
    public String description() {
        return "Spark (" + engine.master() + ", " + engine.parallelism() + " cores)";
    }

    @Override
    public void close() {
        engine.close();
    }
}
