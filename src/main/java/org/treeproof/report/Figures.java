package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.Recommendation;

/**
 * The report's fixed list of charts: which appear, with what title and caption. A chart whose data the study
 * does not have is left out and a note says why, so no chart is ever drawn empty.
 */
final class Figures {
    private Figures() {
    }

    static List<Figure> of(Evidence evidence, Recommendation rec, List<String> notes) {
        LinkageEvidence le = evidence.linkages().stream().filter(l -> l.linkage() == rec.linkage()).findFirst()
                .orElseThrow();
        String link = Names.linkage(rec.linkage());
        String metric = evidence.features() > 0 ? Names.metricProse(evidence.settings().metric())
                : "dissimilarities as given";
        int k = rec.k();
        int n = evidence.samples();
        int maxK = evidence.settings().maxK();
        boolean clusters = k > 1;
        KEvidence e = clusters ? le.at(k) : null;
        var out = new ArrayList<Figure>();

        out.add(figure("dendrogram", f("Tree of the %s linkage", link), clusters
                ? f("Hierarchical clustering tree of the %d samples (%s linkage, %s); the line marks the "
                        + "recommended cut at height %s (in units of the dissimilarity), which gives %d clusters, "
                        + "coloured by cluster.", n, link, metric, Numbers.scaled(rec.cutHeight().chosen()), k)
                : f("Hierarchical clustering tree of the %d samples (%s linkage, %s; the linkage whose "
                        + "tree best represents the distances). No cut is recommended.", n, link, metric)));

        if (clusters) {
            int afterCut = rec.clustering().outlierCount() - e.outliers();
            out.add(figure("silhouette", f("Silhouette widths at k = %d", k), f("Silhouette width of each sample in "
                    + "the %d-cluster solution, grouped by cluster and sorted; the average is %s. A width below 0 means "
                    + "the sample is on average closer to another cluster (Rousseeuw 1987).%s", k,
                    Numbers.fixed(e.silhouette(), 2), afterCut == 0 ? "" : f(" The widths and their average are those "
                            + "of the cut, which also held the %d far sample%s set aside afterwards (not drawn).",
                            afterCut, afterCut == 1 ? "" : "s"))));
        }

        boolean calibrated = evidence.structureTest() != null;
        out.add(figure("stability", "Stability by number of clusters", f("Mean adjusted Rand index of %d resampled "
                + "solutions with the full-data solution, for k = 2 to %d and each linkage, with the range of the middle 95%% "
                + "of replicates%s. 1 means every replicate reproduced the full-data clusters.",
                evidence.settings().replicates(), maxK, calibrated
                        ? "; the band is the 95% range of the same mean on null data without clusters" : "")));

        if (le.gap() != null) {
            out.add(figure("gap", "Gap statistic", f("Gap(k) with ± s_k for k = 1 to %d (%s linkage, %d reference sets "
                    + "%s); the rule (Tibshirani et al. 2001) picks k = %d%s.", le.gap().maxK(), link,
                    le.gap().referenceSets(), Names.gapReferenceProse(evidence.settings().gapReference()),
                    le.gapChoice(), le.gap().ruleMet() ? "" : ", the largest k examined, because it was never met")));
        } else {
            notes.add("The gap statistic chart is left out: the gap statistic was not computed.");
        }

        if (clusters) {
            out.add(figure("consensus", f("Consensus matrix at k = %d", k), f("Share of the replicates holding both "
                    + "samples in which they were clustered together (0 to 1), %s linkage at k = %d, samples in the "
                    + "tree's leaf order; PAC = %s (Monti et al. 2003; Şenbabaoğlu et al. 2014).", link, k,
                    Numbers.fixed(e.stability().pac(), 3))));
            out.add(BranchPValueReport.cdfFigure(le, k));
            out.add(figure("jaccard", f("Cluster stability at k = %d", k), f("Mean Jaccard similarity of each "
                    + "cluster's best match over the replicates (Hennig 2007), against the bands: at least %s is "
                    + "stable, %s or less has dissolved. The smallest is %s.", Numbers.plain(rec.rule().stableJaccard()),
                    Numbers.plain(rec.rule().dissolvedJaccard()), Numbers.fixed(e.worstJaccard(), 2))));
        } else {
            out.add(BranchPValueReport.cdfFigure(le, k));
            notes.add("The silhouette, consensus matrix and cluster stability charts are left out: no solution with "
                    + "more than one cluster is recommended.");
        }

        if (evidence.linkages().size() > 1) {
            out.add(figure("linkages", "Linkage comparison", f("Each of the %d linkages at its own best k: cophenetic "
                    + "correlation, mean adjusted Rand index and average silhouette; and the agreement (adjusted Rand "
                    + "index) between the linkages' solutions.", evidence.linkages().size())));
        } else {
            notes.add("The linkage comparison chart is left out: only one linkage was assessed.");
        }

        if (evidence.features() > 0) {
            out.add(figure("heatmap", "Prepared data", f("The prepared data (%d samples × %d features), each "
                    + "feature standardised over the samples for display, samples in the %s tree's leaf order%s.", n,
                    evidence.features(), link,
                    clusters ? f(", marked by their cluster at k = %d", k) : "")));
        } else {
            notes.add("The data heat map is left out: only distances were given.");
        }
        return out;
    }

    private static Figure figure(String id, String title, String caption) {
        return new Figure(id, title, caption, id + ".png");
    }
}
