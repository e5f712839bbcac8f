package org.treeproof.study;

import java.util.List;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.OwnedDistances;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;
import org.treeproof.tree.SizedCut;
import org.treeproof.tree.SizedCuts;

/**
 * One linkage's tree on all samples and its cuts into k = 1..maxK clusters of at least the study's minimum
 * size, smaller branches set aside as outliers: the solutions every replicate is compared with.
 *
 * @param linkage the linkage
 * @param tree    the tree on all samples
 * @param cuts    {@code cuts[k - 1]} is the cut at k, or {@code null} when no cut of the tree has exactly k
 *                clusters of the minimum size
 * @param minSize the smallest cluster
 */
record ReferenceSolution(Linkage linkage, MergeTree tree, SizedCut[] cuts, int minSize) {

    ReferenceSolution {
        cuts = cuts.clone();
    }

    /** The cut at k (1..maxK), or {@code null} when it does not exist. */
    SizedCut cut(int k) {
        return cuts[k - 1];
    }

    int maxK() {
        return cuts.length;
    }

    static ReferenceSolution of(Linkage linkage, CondensedDistances d, int maxK, int minSize) {
        return of(linkage, linkage.cluster(d), maxK, minSize);
    }

    private static ReferenceSolution of(Linkage linkage, MergeTree tree, int maxK, int minSize) {
        SizedCuts sized = SizedCuts.of(tree, minSize, maxK);
        SizedCut[] cuts = new SizedCut[maxK];
        for (int k = 1; k <= maxK; k++) {
            cuts[k - 1] = sized.at(k);
        }
        return new ReferenceSolution(linkage, tree, cuts, minSize);
    }

    /**
     * The reference solutions of every linkage, built in parallel (one linkage per task) in this JVM, where the
     * full matrix is.
     */
    static List<ReferenceSolution> all(List<Linkage> linkages, CondensedDistances d, int maxK, int minSize,
            LocalExecutor executor) {
        var out = new java.util.ArrayList<ReferenceSolution>(linkages.size());
        if (executor.threads() == 1) {
            // one after another: every linkage overwrites the same copy of the matrix instead of a fresh one
            double[] work = new double[CondensedDistances.length(d.size())];
            for (Linkage linkage : linkages) {
                var mine = OwnedDistances.copyOf(d, work);
                out.add(of(linkage, linkage.clusterInPlace(mine), maxK, minSize));
            }
            return List.copyOf(out);
        }
        executor.runHere(0, linkages.size(), i -> of(linkages.get(i), d, maxK, minSize), out::add);
        return List.copyOf(out);
    }
}
