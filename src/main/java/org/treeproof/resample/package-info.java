/**
 * Replicate plans (sample subsampling, bootstrap, feature subsampling), per-replicate seed derivation and the parallel replicate runner.
 */
package org.treeproof.resample;
