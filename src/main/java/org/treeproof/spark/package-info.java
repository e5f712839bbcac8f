/**
 * Runs the replicates of a study on Apache Spark: {@link org.treeproof.spark.SparkExecutor} is a
 * {@link org.treeproof.resample.ReplicateExecutor} whose tasks run on a cluster's executors, and
 * {@link org.treeproof.spark.SparkEngine} starts and stops the Spark context for the command line. The only
 * package besides {@code cli} that imports Spark, and only {@code cli} imports it; Spark itself is supplied by
 * {@code spark-submit} at run time and is not part of the treeproof jar.
 */
package org.treeproof.spark;
