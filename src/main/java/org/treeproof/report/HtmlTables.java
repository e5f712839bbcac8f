package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.List;
import java.util.Map;
import org.treeproof.score.JaccardStability;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.Recommendation;

/** The HTML report's evidence, comparison, flag, label and reproducibility sections. */
final class HtmlTables {
    private static final Map<String, String> TITLES = Map.of("decision", "The decision", "evidence",
            "Evidence for each number of clusters", "linkages", "How the linkages compare", "flags",
            "Clusters and samples to check", "labels", "Comparison with the known classes", "reproducibility",
            "Settings and reproducibility", "caution", "What this evidence does not show", "references", "References");

    private final ReportModel model;
    private final Page page;
    private final Html h;
    private final int sampleRows;

    HtmlTables(ReportModel model, Page page, int sampleRows) {
        this.model = model;
        this.page = page;
        this.h = page.html;
        this.sampleRows = sampleRows;
    }

    static String title(String sectionId) {
        return TITLES.containsKey(sectionId) ? TITLES.get(sectionId) : ExplainHtml.TITLES.get(sectionId);
    }

    static void openSection(Html h, String id) {
        h.open("section", "id", id).newline().element("h2", title(id)).newline();
    }

    void evidence() {
        openSection(h, "evidence");
        h.element("p", f("Each row is one linkage's tree cut into k clusters of at least %d samples; samples on "
                + "smaller branches are outliers (their number is shown) and are left out of the fit measures. "
                + "Stability is over %d resampled replicates: the mean adjusted Rand index (ARI) of each replicate's "
                + "clusters with the full-data clusters, with the range of the middle 95%% of replicates (not a "
                + "confidence interval); PAC is the share of sample pairs clustered together in some replicates and "
                + "apart in others (consensus in (%s, %s]); the smallest Jaccard is the least stable cluster's mean "
                + "best match. Null columns are the same measures on data without clusters. The excess over the null "
                + "is the mean ARI and the silhouette, each standardised by the null data sets at the same linkage "
                + "and k (the ARI's difference also by the spread of the data's own replicates), added; its p-value "
                + "is adjusted for the choice among every linkage and k. The separation p is "
                + "the largest over the clusters of the dip test of each against its nearest (a dip in density "
                + "between them; at most %s passes). Cut heights are "
                + "in the units of the dissimilarity.", model.decision().minClusterSize(),
                model.settings().replicates(), Numbers.plain(model.settings().pacLow()),
                Numbers.plain(model.settings().pacHigh()), Numbers.plain(model.rule().alpha())));
        boolean tie = false;
        for (EvidenceTable t : model.evidence()) {
            h.element("h3", f("%s linkage", ModelFactory.capital(Names.linkage(t.linkage()))));
            page.table("evidence", f("Cophenetic correlation of the tree with the distances: %s%s",
                    Numbers.fixed(t.copheneticCorrelation(), 3), t.monotone() ? ""
                            : "; the tree has inversions, so each row is the state after the first n − k merges"),
                    "#k", "Verdict", "#Outliers", "#Cut height", "#Range giving k", "#Mean ARI [middle 95% of replicates]",
                    "#Null ARI [middle 95% of sets]", "#PAC", "#Null PAC", "#Smallest Jaccard", "#Silhouette",
                    "#Null silhouette", "#Excess over null", "#Adjusted p", "#Separation p", "#Calinski-Harabasz",
                    "#Davies-Bouldin", "#Dunn", "#Gap ± s_k");
            for (EvidenceRow r : t.rows()) {
                h.open("tr", "class", r.recommended() ? "recommended" : null);
                tie |= r.tieDependent();
                // wide cells may wrap only at one ordinary space (no-break spaces elsewhere), so that at narrower
                // widths the table fits by putting a figure's interval, range end or s_k on a second line
                // the verdict second, so that it stays in view when a narrow window scrolls the wide table
                page.num(Integer.toString(r.k()));
                h.open("td", "class", "verdict-cell").text(r.verdict().id());
                if (r.recommended()) {
                    h.element("span", "tag tag-recommended", "recommended");
                }
                h.close("td");
                page.num(Integer.toString(r.outliers()))
                        .num(Numbers.scaled(r.cutHeight().chosen()) + (r.tieDependent()
                        ? NBSP + "†" : "")).num(!t.monotone() || r.cutHeight().low() > r.cutHeight().high()
                                // a tree with inversions: the state after n - k merges, which no height need give
                                ? "no" + NBSP + "single height"
                                : Numbers.scaled(r.cutHeight().low()) + NBSP + "to "
                                + Numbers.scaled(r.cutHeight().high()))
                        .num(interval(r.ariMean(), r.ariLow(), r.ariHigh()))
                        .num(interval(r.nullAriMean(), r.nullAriLow(), r.nullAriHigh()))
                        .num(Numbers.fixed(r.pac(), 3)).num(Numbers.fixed(r.nullPac(), 3))
                        .num(Numbers.fixed(r.worstJaccard(), 2)).num(Numbers.fixed(r.silhouette(), 3))
                        .num(Numbers.fixed(r.nullSilhouette(), 3)).num(Numbers.fixed(r.excess(), 1))
                        .num(Numbers.p(r.pValueAdjusted())).num(Numbers.smallP(r.separationP()))
                        .num(Numbers.scaled(r.calinskiHarabasz())).num(Numbers.fixed(r.daviesBouldin(), 2))
                        .num(Numbers.fixed(r.dunn(), 3)).num(Double.isFinite(r.gap()) ? Numbers.fixed(r.gap(), 3)
                                + " ±" + NBSP + Numbers.fixed(r.gapSE(), 3) : Numbers.MISSING);
                h.close("tr");
            }
            page.endTable();
            if (t.hasGap()) {
                h.element("p", "note", f("The gap statistic picks k = %d%s%s.", t.gapChoice(), t.gapRuleMet() ? ""
                        : " (its rule was not met below the largest k examined)", t.gapChoice() == 1
                                || t.gapChoiceHasRow() ? "" : "; this tree has no cut into that many clusters of at "
                                + "least the minimum size, so the table has no row for it"));
            }
        }
        if (tie) {
            h.element("p", "footnote", "† Merge heights tie at this cut: which k clusters result depends on the order "
                    + "of the tied merges.");
        }
        for (String id : List.of("stability", "gap", "consensus", "consensus-cdf", "heatmap")) {
            model.figure(id).ifPresent(page::figure);
        }
        h.close("section").newline();
    }

    private static String interval(double mean, double low, double high) {
        if (!Double.isFinite(mean)) {
            return Numbers.MISSING;
        }
        return Numbers.fixed(mean, 2) + " [" + Numbers.fixed(low, 2) + "," + NBSP + Numbers.fixed(high, 2) + "]";
    }

    /** A no-break space: keeps the parts of a figure together when a wide table's cells wrap. */
    private static final String NBSP = "\u00A0";

    void linkages() {
        openSection(h, "linkages");
        LinkageComparison c = model.linkages();
        page.table("linkages", "Each linkage's own best solution under the decision rule", "Linkage",
                "#Cophenetic correlation", "#Its best k", "Verdict", "#Mean ARI", "#PAC", "#Silhouette",
                "#Smallest Jaccard");
        for (LinkageComparison.Row r : c.rows()) {
            h.open("tr", "class", r.recommended() ? "recommended" : null);
            h.open("td").text(Names.linkage(r.linkage()));
            if (r.recommended()) {
                h.element("span", "tag tag-recommended", model.decision().hasClusters() ? "recommended" : "shown");
            }
            h.close("td");
            page.num(Numbers.fixed(r.copheneticCorrelation(), 3)).num(Integer.toString(r.k())).cell(r.verdict().id())
                    .num(Numbers.fixed(r.ariMean(), 2)).num(Numbers.fixed(r.pac(), 3))
                    .num(Numbers.fixed(r.silhouette(), 2)).num(Numbers.fixed(r.worstJaccard(), 2));
            h.close("tr");
        }
        page.endTable();
        if (c.rows().size() > 1) {
            String[] headers = new String[c.rows().size() + 1];
            headers[0] = "";
            for (int j = 0; j < c.rows().size(); j++) {
                headers[j + 1] = "#" + Names.linkage(c.rows().get(j).linkage());
            }
            page.table("agreement", "Agreement between the linkages' own solutions (adjusted Rand index; 1 = the same "
                    + "clusters)", headers);
            for (int i = 0; i < c.rows().size(); i++) {
                h.open("tr").open("th", "scope", "row").text(Names.linkage(c.rows().get(i).linkage())).close("th");
                for (int j = 0; j < c.rows().size(); j++) {
                    page.num(Numbers.fixed(c.agreement(i, j), 2));
                }
                h.close("tr");
            }
            page.endTable();
        }
        for (String why : c.why()) {
            h.element("p", why);
        }
        model.figure("linkages").ifPresent(page::figure);
        h.close("section").newline();
    }

    void flags() {
        openSection(h, "flags");
        if (!model.decision().hasClusters()) {
            h.element("p", "No solution with more than one cluster is recommended, so there are no clusters or samples "
                    + "to flag.");
            h.close("section").newline();
            return;
        }
        page.table("clusters", f("The %d clusters of the recommended solution; stable from a mean Jaccard of %s, "
                + "dissolved at %s or less (Hennig 2007)", model.clusters().size(),
                Numbers.plain(model.rule().stableJaccard()), Numbers.plain(model.rule().dissolvedJaccard())),
                "#Cluster", "#Samples", "#Mean Jaccard", "#Dissolved in (share of replicates)",
                "#Recovered in (share of replicates)", "Status");
        for (ClusterEvidence ce : model.clusters()) {
            boolean flagged = ce.status() != JaccardStability.Status.STABLE;
            h.open("tr", "class", flagged ? "flagged" : null);
            page.num(Integer.toString(ce.id())).num(Integer.toString(ce.size())).num(Numbers.fixed(ce.jaccard(), 2))
                    .num(Numbers.percent(ce.dissolvedShare())).num(Numbers.percent(ce.recoveredShare()))
                    .cell(ce.status().label() + (flagged ? " (flagged)" : ""));
            h.close("tr");
        }
        page.endTable();
        BranchPValueReport.table(page, model.clusterBranches());
        List<Recommendation.SampleFlag> flags = model.flaggedSamples();
        if (flags.isEmpty()) {
            h.element("p", f("No sample is flagged: every sample stays with its cluster in at least %s of the replicates "
                    + "that hold it, and none has a negative silhouette.", Numbers.percent(model.rule().unstableSample())));
        } else {
            boolean one = flags.size() == 1;
            page.table("samples", f("%d flagged sample%s: staying with %s cluster in fewer than %s of the replicates "
                    + "that hold %s, or closer on average to another cluster (negative silhouette)", flags.size(),
                    one ? "" : "s", one ? "its" : "their", Numbers.percent(model.rule().unstableSample()),
                    one ? "it" : "them"), "Sample",
                    "#Cluster", "#Stays with its cluster (share of replicates)", "#Silhouette", "Why");
            for (Recommendation.SampleFlag s : flags.subList(0, Math.min(sampleRows, flags.size()))) {
                h.open("tr");
                page.cell(s.sampleId()).num(Integer.toString(s.cluster())).num(Numbers.percent(s.stability()))
                        .num(Numbers.fixed(s.silhouette(), 3)).cell(sampleWhy(s));
                h.close("tr");
            }
            page.endTable();
            if (flags.size() > sampleRows) {
                int more = flags.size() - sampleRows;
                h.element("p", "note", f("%d more flagged sample%s not shown here; clusters.csv lists every sample "
                        + "with its flag.", more, more == 1 ? " is" : "s are"));
            }
        }
        for (String id : List.of("silhouette", "jaccard")) {
            model.figure(id).ifPresent(page::figure);
        }
        h.close("section").newline();
    }

    void labels() {
        LabelComparison l = model.labels();
        openSection(h, "labels");
        h.element("p", f("Adjusted Rand index of the recommended solution with the %d known classes: %s (1 means the "
                + "same grouping; about 0, agreement no better than chance; Hubert & Arabie 1985)%s. The classes were not "
                + "used in clustering.", l.classNames().size(), Numbers.fixed(l.ari(), 3), l.hasOutliers()
                        ? "; each outlier counts as a group of its own" : ""));
        String[] headers = new String[l.classNames().size() + 2];
        headers[0] = "Cluster";
        for (int c = 0; c < l.classNames().size(); c++) {
            headers[c + 1] = "#" + l.classNames().get(c);
        }
        headers[headers.length - 1] = "#Total";
        page.table("contingency", "Samples of each known class (columns) in each cluster (rows)", headers);
        int[] columnTotals = new int[l.classNames().size()];
        for (int r = 0; r < l.clusters(); r++) {
            h.open("tr").open("th", "scope", "row").text(Integer.toString(r + 1)).close("th");
            int total = 0;
            for (int c = 0; c < l.classNames().size(); c++) {
                page.num(Integer.toString(l.count(r, c)));
                total += l.count(r, c);
                columnTotals[c] += l.count(r, c);
            }
            page.num(Integer.toString(total));
            h.close("tr");
        }
        if (l.hasOutliers()) {
            h.open("tr").open("th", "scope", "row").text("Outliers").close("th");
            int total = 0;
            for (int c = 0; c < l.classNames().size(); c++) {
                page.num(Integer.toString(l.outliers()[c]));
                total += l.outliers()[c];
                columnTotals[c] += l.outliers()[c];
            }
            page.num(Integer.toString(total));
            h.close("tr");
        }
        h.open("tr").open("th", "scope", "row").text("Total").close("th");
        int all = 0;
        for (int t : columnTotals) {
            page.num(Integer.toString(t));
            all += t;
        }
        page.num(Integer.toString(all));
        h.close("tr");
        page.endTable();
        h.close("section").newline();
    }

    void reproducibility() {
        RunInfo run = model.run();
        openSection(h, "reproducibility");
        page.table("run", "This run", "Item", "Value");
        row("Tool", run.toolName() + " " + run.toolVersion());
        row("Input file", run.inputFile());
        h.open("tr").element("td", "Input SHA-256").open("td", "class", "mono").text(run.inputSha256()).close("td")
                .close("tr");
        row("Samples", Integer.toString(run.samples()));
        row("Features (after preparation)", model.hasData() ? Integer.toString(run.features()) : "none: distances given");
        h.open("tr").element("td", "Preparation").open("td");
        if (run.preparation().isEmpty()) {
            h.text("none: the data were used as given");
        } else {
            h.open("ol");
            for (String step : run.preparation()) {
                h.element("li", step);
            }
            h.close("ol");
        }
        h.close("td").close("tr");
        row("Threads", Integer.toString(run.threads()));
        row("Wall time", Numbers.seconds(run.wallSeconds()));
        row("Report generated", run.generatedAt());
        page.endTable();
        page.table("settings", "Every effective setting of the study and the decision rule", "Setting", "Value");
        for (ReportModel.Setting s : model.effectiveSettings()) {
            row(s.name(), s.value());
        }
        page.endTable();
        h.element("h3", "Command line");
        h.open("pre").element("code", run.commandLine()).close("pre");
        h.element("p", "note", "The same input, command line and seed give the same results on any number of threads.");
        if (!model.notes().isEmpty()) {
            h.element("h3", "Left out");
            h.open("ul");
            for (String n : model.notes()) {
                h.element("li", n);
            }
            h.close("ul");
        }
        h.close("section").newline();
    }

    private void row(String name, String value) {
        h.open("tr");
        page.cell(name).cell(value);
        h.close("tr");
    }

    private static String sampleWhy(Recommendation.SampleFlag s) {
        var why = new java.util.ArrayList<String>();
        if (s.unstable()) {
            why.add("stays with its cluster in " + Numbers.percent(s.stability()) + " of replicates");
        }
        if (s.negativeSilhouette()) {
            why.add("negative silhouette: closer to another cluster");
        }
        return String.join("; ", why);
    }
}
