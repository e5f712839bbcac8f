/**
 * Agglomerative hierarchical clustering: the {@link org.treeproof.tree.Linkage} methods with their
 * Lance-Williams coefficients, the algorithms (minimum spanning tree, nearest-neighbour chain, generic
 * algorithm with a nearest-neighbour list; D. Müllner, arXiv:1109.2378, 2011) and the
 * {@link org.treeproof.tree.MergeTree} with its cuts by k and by height, cophenetic distances, leaf
 * order and clades. Results match scipy.cluster.hierarchy (1.10) merge for merge. Imports
 * {@code distance}, {@code partition} (for cuts) and {@code data} (for {@code InputException}).
 */
package org.treeproof.tree;
