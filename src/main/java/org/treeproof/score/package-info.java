/**
 * Pure scoring functions over partitions.
 *
 * <ul>
 *   <li>Internal validity of one partition: {@link org.treeproof.score.Silhouette} and
 *       {@link org.treeproof.score.DunnIndex} from a dissimilarity matrix;
 *       {@link org.treeproof.score.CalinskiHarabasz}, {@link org.treeproof.score.DaviesBouldin} and
 *       the pooled within-cluster sum of squares {@link org.treeproof.score.WithinClusterSumOfSquares}
 *       from the data (Euclidean).</li>
 *   <li>Agreement between partitions: {@link org.treeproof.score.AdjustedRandIndex}.</li>
 *   <li>Stability under resampling, from {@link org.treeproof.score.ResampledPartition replicates}:
 *       the consensus matrix ({@link org.treeproof.score.ConsensusAccumulator},
 *       {@link org.treeproof.score.ConsensusMatrix}) with its exact distribution and PAC
 *       ({@link org.treeproof.score.ConsensusDistribution}), cluster-wise Jaccard stability
 *       ({@link org.treeproof.score.JaccardStability}), per-sample stability
 *       ({@link org.treeproof.score.SampleStability}), and summaries of a score over replicates
 *       ({@link org.treeproof.score.ReplicateSummary}).</li>
 *   <li>The pooled {@code W_k} is also the building block of the gap statistic.</li>
 * </ul>
 *
 * <p>Each algorithm binds its inputs in a static factory and returns an immutable result; the
 * accumulators are the only mutable types and keep their state private. No I/O, no global state.
 */
package org.treeproof.score;
