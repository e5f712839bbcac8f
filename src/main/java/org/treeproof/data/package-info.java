/**
 * Immutable data tables and their preparation: missing-value policies, log2, centring, z-scoring and selection of the most variable features. Imports only the JDK.
 */
package org.treeproof.data;
