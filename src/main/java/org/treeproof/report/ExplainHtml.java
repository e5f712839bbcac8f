package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.treeproof.explain.CovariateResult;
import org.treeproof.explain.CovariateRule;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.SensitivityResult;

/** The report's sections on the explanation: features, covariates and alternative analyses. */
final class ExplainHtml {
    /** The section titles, by id. */
    static final Map<String, String> TITLES = Map.of("features", "What sets each cluster apart", "covariates",
            "Do the clusters follow a covariate?", "sensitivity", "Would another analysis find them?");

    private final Explanation e;
    private final Page page;
    private final Html h;

    ExplainHtml(Explanation e, Page page) {
        this.e = e;
        this.page = page;
        this.h = page.html;
    }

    /** Whether the page has the section {@code id} (one of {@link #TITLES}). */
    static boolean shows(ReportModel model, String id) {
        return model.explained().map(x -> switch (id) {
            case "features" -> true;
            case "covariates" -> x.covariates() != null;
            case "sensitivity" -> x.sensitivity() != null;
            default -> false;
        }).orElse(false);
    }

    void features(ReportModel model) {
        HtmlTables.openSection(h, "features");
        FeatureTable t = e.features();
        if (t == null) {
            for (String n : e.notes()) {
                h.element("p", n);
            }
            h.close("section").newline();
            return;
        }
        h.element("p", f("Each of the %d features of the prepared data (after the preparation steps listed under "
                + "Settings) was compared between each cluster and the other clustered samples with the %s. The "
                + "effect is the standardised mean difference (Cohen's d); the AUC is the probability that a sample of "
                + "the cluster has the higher value (1 or 0: complete separation, 0.5: none). q-values are "
                + "Benjamini-Hochberg within each cluster. Every feature of every cluster is in features.csv.",
                t.features().size(), t.test().description()));
        h.element("p", "caution", ExplainProse.doubleDipping());
        if (t.test() == org.treeproof.explain.ContrastTest.WILCOXON) {
            int small = 0;
            for (int c = 1; c <= t.clusters(); c++) {
                small += t.clusterSize(c) < 8 ? 1 : 0;
            }
            if (small > 0) {
                h.element("p", f("%d cluster%s fewer than 8 samples: the normal approximation of the rank-sum test is "
                        + "rough there.", small, small == 1 ? " has" : "s have"));
            }
        }
        model.figure("features").ifPresent(page::figure);
        page.table("features", f("The %d features that set each cluster apart most", ExplainProse.NAMED), "#Cluster",
                "#Samples", "#Features with q ≤ 0.05", "Most distinguishing features (direction in the cluster; AUC, d)");
        for (int c = 1; c <= t.clusters(); c++) {
            var named = new ArrayList<String>();
            for (int r = 1; r <= Math.min(ExplainProse.NAMED, t.features().size()); r++) {
                named.add(ExplainProse.feature(t, c, t.featureAtRank(c, r)));
            }
            h.open("tr");
            page.num(Integer.toString(c)).num(Integer.toString(t.clusterSize(c)))
                    .num(Integer.toString(t.significant(c, ExplainProse.Q_LEVEL))).cell(String.join("; ", named));
            h.close("tr");
        }
        page.endTable();
        h.close("section").newline();
    }

    void covariates() {
        HtmlTables.openSection(h, "covariates");
        List<CovariateResult> rs = e.covariates();
        if (rs.isEmpty()) {
            h.element("p", "The covariates were not tested: no solution with clusters is recommended.");
            h.close("section").newline();
            return;
        }
        h.element("p", ExplainProse.covariates(rs) + f(" A covariate is flagged when its q-value is at most %s and its "
                + "effect is large: Cramér's V at least %s (categorical) or epsilon-squared at least %s (numeric). "
                + "Clusters that follow a batch, a site or a processing date are the classic artefact; clusters that "
                + "follow a known property of the samples recover it. Decide which each flagged covariate is before "
                + "reading the clusters as groups.", Numbers.plain(CovariateRule.MAX_Q),
                Numbers.plain(CovariateRule.MIN_CRAMERS_V), Numbers.plain(CovariateRule.MIN_EPSILON_SQUARED)));
        page.table("covariates", "Each covariate against the recommended clusters (outliers and missing values left out)",
                "Covariate", "Kind", "Test", "#Samples", "#Statistic", "#p", "#q", "Effect", "#Value", "Flagged");
        for (CovariateResult r : rs) {
            h.open("tr");
            page.cell(r.name()).cell(r.kind().id()).cell(r.test().id()).num(Integer.toString(r.used()))
                    .num(Numbers.fixed(r.statistic(), 2)).num(ExplainProse.q(r.pValue()))
                    .num(ExplainProse.q(r.qValue())).cell(r.effectName()).num(Numbers.fixed(r.effect(), 2));
            h.open("td").element("span", r.flagged() ? "no" : "yes", r.flagged() ? "flagged" : "no").close("td");
            h.close("tr");
        }
        page.endTable();
        h.close("section").newline();
    }

    void sensitivity(ReportModel model) {
        HtmlTables.openSection(h, "sensitivity");
        SensitivityResult s = e.sensitivity();
        h.element("p", f("The %s linkage was rerun at k = %d with one analysis choice changed at a time. ", s.linkage(),
                s.k()) + ExplainProse.sensitivity(s) + f(" A cluster counts as found again when its best match has a "
                        + "Jaccard similarity of at least %s. Low agreement means the clusters depend on how the data "
                        + "were prepared or compared: report that choice with them.", Numbers.plain(s.survives())));
        model.figure("sensitivity").ifPresent(page::figure);
        page.table("sensitivity", "Each alternative analysis against the recommended solution", "Alternative",
                "What changed", "#ARI", "#Clusters found again", "Jaccard per cluster");
        for (SensitivityResult.Row r : s.rows()) {
            h.open("tr");
            page.cell(r.name()).cell(r.change());
            if (r.ran()) {
                page.num(Numbers.fixed(r.ari(), 2)).num(r.surviving(s.survives()) + " of " + s.k())
                        .cell(ExplainProse.jaccards(r));
            } else {
                page.num(Numbers.MISSING).num(Numbers.MISSING).cell(r.note());
            }
            h.close("tr");
        }
        page.endTable();
        h.close("section").newline();
    }
}
