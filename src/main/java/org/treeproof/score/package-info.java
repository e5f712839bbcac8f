/**
 * Pure scoring functions: internal validity (silhouette, Calinski-Harabasz, Davies-Bouldin, Dunn), agreement (adjusted Rand index, cluster-wise Jaccard), consensus matrix and PAC, and the gap statistic.
 */
package org.treeproof.score;
