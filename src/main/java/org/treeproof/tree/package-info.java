/**
 * Agglomerative hierarchical clustering: the linkage methods with their Lance-Williams coefficients, the algorithms (minimum spanning tree, nearest-neighbour chain, generic) and the merge tree with its cuts, cophenetic distances, leaf order and clades. Imports only {@code distance} (and {@code partition} for cuts).
 */
package org.treeproof.tree;
