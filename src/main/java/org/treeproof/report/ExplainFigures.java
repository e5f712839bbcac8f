package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.SensitivityResult;

/** The charts of the explanation: the top features per cluster and the alternative analyses. */
public final class ExplainFigures {
    /** The features per cluster the chart shows. */
    static final int TOP_PER_CLUSTER = 3;
    /** At most this many features in the chart; beyond it each cluster keeps fewer. */
    static final int MOST_FEATURES = 40;

    private ExplainFigures() {
    }

    static List<Figure> of(Explanation e) {
        var out = new ArrayList<Figure>();
        FeatureTable t = e.features();
        if (t != null) {
            out.add(new Figure("features", "What sets each cluster apart", f("For each cluster, its %d most "
                    + "distinguishing features (rows, grouped by the cluster they distinguish most): each cell is the "
                    + "AUC of the feature in the cluster against the other clustered samples, red where the cluster "
                    + "is higher, blue where it is lower, white at 0.5 (no difference); a frame marks a top feature of "
                    + "that column's cluster. Found in the data that formed the clusters: descriptive, not a test.",
                    perCluster(t.clusters())), "features.png"));
        }
        SensitivityResult s = e.sensitivity();
        if (s != null && !s.ran().isEmpty()) {
            out.add(new Figure("sensitivity", "Other analyses against the chosen clusters", f("Adjusted Rand index of the %s linkage "
                    + "at k = %d under each alternative analysis with the recommended solution (bar; 1 = the same "
                    + "clusters), and for each cluster the Jaccard similarity of its best match (dots; at %s or more it "
                    + "is found again).", s.linkage(), s.k(), Numbers.plain(s.survives())), "sensitivity.png"));
        }
        return out;
    }

    /** The number of top features the chart shows per cluster: 3, fewer when there are many clusters. */
    public static int perCluster(int clusters) {
        return Math.max(1, Math.min(TOP_PER_CLUSTER, MOST_FEATURES / clusters));
    }
}
