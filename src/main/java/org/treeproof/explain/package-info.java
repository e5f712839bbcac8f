/**
 * Explaining and stress-testing a chosen cluster solution: what sets each cluster apart
 * ({@link org.treeproof.explain.FeatureContrast}), whether the clusters follow a covariate such as a batch
 * ({@link org.treeproof.explain.CovariateAssociation}), and whether other reasonable preparations and
 * dissimilarities find the same clusters ({@link org.treeproof.explain.Sensitivity}).
 *
 * <p>The solution comes in as a {@link org.treeproof.explain.Solution}: labels in input order, clusters
 * {@code 1..k}, {@code 0} for a sample set aside as an outlier, which takes part in no comparison and no test.
 * Pure functions over the core packages (data, distance, tree, partition, score, resample) and commons-math3's
 * distributions; no I/O, no study, report or chart types. Results are immutable.
 */
package org.treeproof.explain;
