package org.treeproof.study;

import java.util.List;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.tree.KCut;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

/**
 * One linkage's tree on all samples and its cuts at k = 2..maxK: the solutions every replicate is
 * compared with.
 *
 * @param linkage the linkage
 * @param tree    the tree on all samples
 * @param cuts    {@code cuts[k - 2]} is the cut at k
 */
record ReferenceSolution(Linkage linkage, MergeTree tree, KCut[] cuts) {

    ReferenceSolution {
        cuts = cuts.clone();
    }

    KCut cut(int k) {
        return cuts[k - 2];
    }

    int maxK() {
        return cuts.length + 1;
    }

    static ReferenceSolution of(Linkage linkage, CondensedDistances d, int maxK) {
        MergeTree tree = linkage.cluster(d);
        KCut[] cuts = new KCut[maxK - 1];
        for (int k = 2; k <= maxK; k++) {
            cuts[k - 2] = tree.cutAtK(k);
        }
        return new ReferenceSolution(linkage, tree, cuts);
    }

    /**
     * The reference solutions of every linkage, built in parallel (one linkage per task) in this JVM, where the
     * full matrix is.
     */
    static List<ReferenceSolution> all(List<Linkage> linkages, CondensedDistances d, int maxK,
            LocalExecutor executor) {
        var out = new java.util.ArrayList<ReferenceSolution>(linkages.size());
        executor.runHere(0, linkages.size(), i -> of(linkages.get(i), d, maxK), out::add);
        return List.copyOf(out);
    }
}
