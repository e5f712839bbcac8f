/**
 * Dissimilarity measures between samples and the condensed (upper-triangle) matrix that holds them, with blocked kernels that use every core. Imports only {@code data}.
 */
package org.treeproof.distance;
