package org.treeproof.spark;

import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;

/** Spark contexts for tests: in this JVM, bound to loopback, without the web UI. */
final class LocalSpark {
    private LocalSpark() {
    }

    /** A context on {@code master} ("local[2]", or "local[2,4]" to retry failed tasks up to 4 times). */
    static JavaSparkContext start(String master) {
        SparkConf conf = new SparkConf().setMaster(master).setAppName("treeproof-test")
                .set("spark.driver.host", "127.0.0.1").set("spark.driver.bindAddress", "127.0.0.1")
                .set("spark.ui.enabled", "false").set("spark.ui.showConsoleProgress", "false")
                .set("spark.log.level", "WARN");
        return new JavaSparkContext(conf);
    }
}
