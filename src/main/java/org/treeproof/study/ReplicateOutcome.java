package org.treeproof.study;

import java.io.Serializable;
import org.treeproof.score.BranchSupport;

/**
 * The compact result of one replicate: everything the study accumulates from it, and nothing it can
 * recompute. Small enough to keep in a checkpoint or send between machines (a few bytes per sample and
 * linkage).
 *
 * @param index    the replicate's index
 * @param distinct the distinct samples it held, sorted
 * @param labels   {@code labels[l][k - 1][a]}: the cluster (0-based, canonical; -1 for an outlier) of
 *                 {@code distinct[a]} when linkage {@code l}'s replicate tree is cut into k clusters of at least
 *                 the replicate's minimum size, for k = 1..maxK
 * @param support  per linkage, which reference clades this replicate counted and reproduced; {@code null}
 *                 when branch support is not computed (null calibration)
 */
public record ReplicateOutcome(int index, int[] distinct, int[][][] labels, BranchSupport.Replicate[] support)
        implements Serializable {
}
