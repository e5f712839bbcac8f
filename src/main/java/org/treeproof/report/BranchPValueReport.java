package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.List;
import java.util.Set;
import org.treeproof.score.ConsensusCdf;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.study.BranchPValueSettings;
import org.treeproof.study.ClusterBranch;
import org.treeproof.study.Evidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.Recommendation;
import org.treeproof.study.StudySettings;

/**
 * What the report says about branch p-values (multiscale bootstrap) and the consensus CDF: the figure, the table
 * of the recommended clusters' branches, the methods sentence, the settings and the references.
 */
final class BranchPValueReport {
    static final Reference SHIMODAIRA_2002 = new Reference("Shimodaira, 2002",
            "Shimodaira, H. (2002). An approximately unbiased test of phylogenetic tree selection. Systematic Biology, "
                    + "51, 492–508.", "10.1080/10635150290069913");
    static final Reference SHIMODAIRA_2004 = new Reference("Shimodaira, 2004",
            "Shimodaira, H. (2004). Approximately unbiased tests of regions using multistep-multiscale bootstrap "
                    + "resampling. The Annals of Statistics, 32, 2616–2641.", "10.1214/009053604000000823");
    static final Reference SUZUKI_SHIMODAIRA = new Reference("Suzuki & Shimodaira, 2006",
            "Suzuki, R. & Shimodaira, H. (2006). Pvclust: an R package for assessing the uncertainty in hierarchical "
                    + "clustering. Bioinformatics, 22, 1540–1542.", "10.1093/bioinformatics/btl117");
    /** The sources of the multiscale bootstrap, in citation order. */
    static final List<Reference> REFERENCES = List.of(SHIMODAIRA_2002, SHIMODAIRA_2004, SUZUKI_SHIMODAIRA);

    private BranchPValueReport() {
    }

    /** The branch of each cluster of the recommended cut with its fit; empty without clusters or p-values. */
    static List<ClusterBranch> clusterBranches(Evidence evidence, Recommendation rec) {
        if (rec.k() < 2) {
            return List.of();
        }
        LinkageEvidence le = evidence.linkages().stream().filter(l -> l.linkage() == rec.linkage()).findFirst()
                .orElseThrow();
        return le.branchPValues() == null ? List.of() : le.clusterBranches(rec.k());
    }

    static Figure cdfFigure(LinkageEvidence le, int k) {
        String link = Names.linkage(le.linkage());
        String chosen = "";
        if (k > 1) {
            ConsensusCdf c = le.cdfAt(k);
            chosen = f(" At the recommended k = %d (in black) the area is %s and its change from k − 1 is %s.", k,
                    Numbers.fixed(c.area(), 3), Numbers.fixed(c.deltaArea(), 3));
        }
        return new Figure("consensus-cdf", "Distribution of consensus values by k", f("Left: for each k, the share "
                + "of sample pairs whose consensus (share of replicates clustering them together) is at most x, %s "
                + "linkage; a curve that is flat between 0 and 1 means pairs are either always or never together. "
                + "Right: the relative change in the area under that curve from k − 1 to k (Monti et al. 2003); where "
                + "it drops towards 0, one more cluster adds little.%s", link, chosen), "consensus-cdf.png");
    }

    /** The methods sentence, or empty when branch p-values were not computed. */
    static String methods(StudySettings s, Set<Reference> cited) {
        BranchPValueSettings b = s.branchPValues();
        if (b == null) {
            return "";
        }
        cited.addAll(REFERENCES);
        return f("Each branch of each tree was also given an approximately unbiased (AU) p-value by a multiscale "
                + "bootstrap of the features (%s; %s): %d replicates at each of %d scales (%s times the number of "
                + "features, drawn with replacement), with the normalised z-values fitted across scales by weighted "
                + "least squares as in %s; no value is given where the fit is poor (chi-square p below %s), leaves "
                + "the value undetermined (standard error above %s) or the branch was found in all or none of the "
                + "replicates.", SHIMODAIRA_2002.cite(), SHIMODAIRA_2004.cite(),
                b.replicatesPerScale(), b.scales().size(), Prose.and(b.scales().stream().map(Numbers::plain).toList()),
                SUZUKI_SHIMODAIRA.narrative(), Numbers.plain(MultiscaleFit.POOR_FIT_P),
                Numbers.plain(MultiscaleFit.MAX_SE));
    }

    /**
     * The result's sentence on the recommended clusters' branches: each cluster's AU p-value (or why it has none),
     * then the clusters flagged for a low one ({@link ClusterBranch#lowAu()}); empty when branch p-values were not
     * computed or there are no clusters.
     */
    static String result(List<ClusterBranch> branches) {
        if (branches.isEmpty()) {
            return "";
        }
        var each = new java.util.ArrayList<String>();
        for (ClusterBranch b : branches) {
            MultiscaleFit.Result r = b.fit();
            each.add(f("cluster %d %s", b.cluster(), r == null ? "none (a single sample)" : r.fitted()
                    ? Numbers.fixed(r.au(), 3) + " ± " + Numbers.fixed(r.auSE(), 3) : "none (" + r.status().label() + ")"));
        }
        String out = f("AU p-values of the recommended clusters' branches: %s.", Prose.and(each));
        List<ClusterBranch> low = branches.stream().filter(ClusterBranch::lowAu).toList();
        if (!low.isEmpty()) {
            out += f(" Cluster%s %s %s flagged: below an AU p-value of %s the multiscale bootstrap of features does not "
                    + "reject, at the %s level, that %s branch is absent.", low.size() == 1 ? "" : "s",
                    Prose.and(low.stream().map(b -> Integer.toString(b.cluster())).toList()),
                    low.size() == 1 ? "is" : "are", Numbers.plain(ClusterBranch.LOW_AU),
                    Numbers.percent(1 - ClusterBranch.LOW_AU), low.size() == 1 ? "its" : "each one's");
        }
        return out;
    }

    /** The effective settings of the multiscale bootstrap. */
    static List<ReportModel.Setting> settings(StudySettings s) {
        BranchPValueSettings b = s.branchPValues();
        if (b == null) {
            return List.of(new ReportModel.Setting("Branch p-values (multiscale bootstrap)", "not computed"));
        }
        return List.of(new ReportModel.Setting("Branch p-values: scales", String.join(", ",
                        b.scales().stream().map(Numbers::plain).toList())),
                new ReportModel.Setting("Branch p-values: replicates per scale", Integer.toString(b.replicatesPerScale())),
                new ReportModel.Setting("Low AU p-value (cluster flagged below)", Numbers.plain(ClusterBranch.LOW_AU)));
    }

    /** The table of the recommended clusters' branches, in the flags section. */
    static void table(Page page, List<ClusterBranch> branches) {
        if (branches.isEmpty()) {
            return;
        }
        Html h = page.html;
        page.table("branches", f("The branch of each recommended cluster: its approximately unbiased (AU) p-value "
                + "from the multiscale bootstrap of features, and the bootstrap share at scale 1 (bp); a cluster whose "
                + "AU p-value is below %s is flagged", Numbers.plain(ClusterBranch.LOW_AU)), "#Cluster", "#Samples",
                "#AU p-value ± SE", "#bp ± SE", "Fit", "Status");
        for (ClusterBranch b : branches) {
            h.open("tr", "class", b.lowAu() ? "flagged" : null);
            page.num(Integer.toString(b.cluster())).num(Integer.toString(b.size()));
            MultiscaleFit.Result r = b.fit();
            if (r == null) {
                page.num(Numbers.MISSING).num(Numbers.MISSING).cell("a single sample has no branch");
            } else {
                page.num(r.fitted() ? Numbers.fixed(r.au(), 3) + " ± " + Numbers.fixed(r.auSE(), 3) : Numbers.MISSING)
                        .num(r.fitted() ? Numbers.fixed(r.bp(), 3) + " ± " + Numbers.fixed(r.bpSE(), 3) : Numbers.MISSING)
                        .cell(r.fitted() ? f("chi-square %s on %d df (p = %s)", Numbers.fixed(r.chiSquare(), 2), r.df(),
                                Numbers.p(r.fitPValue())) : r.reason());
            }
            page.cell(b.lowAu() ? "low AU p-value (flagged)" : r != null && r.status() == MultiscaleFit.Status.ALWAYS
                    ? "found in every replicate" : r != null && r.fitted() ? "supported" : "not assessed");
            h.close("tr");
        }
        page.endTable();
        h.element("p", "note", f("An AU p-value of at least %s rejects, at the %s level, the hypothesis that the "
                + "branch is absent from the tree that the whole population of features would give (Shimodaira 2002). "
                + "The features were resampled, not the samples: this is statistical evidence about this data set, not "
                + "validation of the cluster, and domain review should decide what the clusters mean.",
                Numbers.plain(ClusterBranch.LOW_AU), Numbers.percent(1 - ClusterBranch.LOW_AU)));
    }
}
