package org.treeproof.cli;

import java.util.Locale;
import org.treeproof.data.InputException;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReplicateExecutor;

/**
 * Where {@code assess} runs the replicates of a study ({@code --engine}): on this machine's threads, or as Spark
 * tasks on a cluster. Results are identical.
 *
 * <p>Nothing here loads a Spark class unless {@link #SPARK} is chosen, so the treeproof jar runs with plain
 * {@code java -jar}; Spark is then looked for once, by name, and supplied by {@code spark-submit}.
 */
enum Engine {
    /** Threads of this JVM ({@code --threads}). */
    LOCAL("local") {
        @Override
        void requireAvailable() {
        }

        @Override
        Run start(int threads) {
            var executor = new LocalExecutor(threads);
            return new Run() {
                @Override
                public ReplicateExecutor executor() {
                    return executor;
                }

                @Override
                public String description() {
                    return "";
                }

                @Override
                public void close() {
                }
            };
        }
    },
    /** Spark tasks, with the master and resources of the Spark configuration. */
    SPARK("spark") {
        @Override
        void requireAvailable() {
            try {
                Class.forName("org.apache.spark.SparkContext", false, Engine.class.getClassLoader());
            } catch (ClassNotFoundException | LinkageError e) {
                throw new InputException("--engine spark: Spark is not on the class path; run treeproof under "
                        + "spark-submit (spark-submit --class org.treeproof.cli.Main treeproof.jar assess ...)");
            }
        }

        @Override
        Run start(int threads) {
            requireAvailable();
            return SparkRun.start();
        }
    };

    /** A started engine: the executor, and what to release when the study is done. */
    interface Run extends AutoCloseable {
        ReplicateExecutor executor();

        /** Where replicates run, for the terminal; empty when it goes without saying (this machine). */
        String description();

        @Override
        void close();
    }

    private final String id;

    Engine(String id) {
        this.id = id;
    }

    /** Fails with a one-line message if this engine cannot run here; cheap, so checked before the input is read. */
    abstract void requireAvailable();

    /** Starts the engine; {@code threads} is the thread count of a local engine. */
    abstract Run start(int threads);

    /** The engine named {@code text} (any case). */
    static Engine parse(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (Engine e : values()) {
            if (e.id.equals(t)) {
                return e;
            }
        }
        throw new InputException("--engine: unknown engine '" + text.strip() + "'; expected local or spark");
    }
}
