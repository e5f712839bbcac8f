package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.treeproof.study.Verdict;

/**
 * Renders a {@link ReportModel} as one self-contained HTML page ({@code report.html}): inline style with a print
 * layout, charts embedded as data URIs, no scripts, fonts or links other than to DOIs.
 *
 * <p>Sections, in order (element ids in brackets): the decision and its reasons [{@code decision}], the evidence
 * for each number of clusters [{@code evidence}], how the linkages compare [{@code linkages}], clusters and samples
 * to check [{@code flags}], the comparison with known classes when given [{@code labels}], what sets each cluster
 * apart [{@code features}], the covariates when given [{@code covariates}], the alternative analyses when asked
 * for [{@code sensitivity}] (these three only when the study was explained), settings and
 * reproducibility [{@code reproducibility}], what the evidence does not show [{@code caution}], and the references
 * [{@code references}]. Every string that comes from the user or the input (sample ids, class names, file name,
 * command line) is escaped with {@code StringEscapeUtils.escapeHtml4}. A value that is not a finite number prints
 * as a dash with a footnote.
 */
public final class HtmlReport {
    /** The most flagged samples listed in the page; the rest are in {@code clusters.csv}. */
    public static final int SAMPLE_ROWS = 200;

    /** The section ids, in the order of the page ({@code labels} only when classes were given). */
    public static final List<String> SECTION_IDS = List.of("decision", "evidence", "linkages", "flags", "labels",
            "features", "covariates", "sensitivity", "reproducibility", "caution", "references");

    private final ReportModel model;
    private final Map<String, EmbeddedImage> images;
    private final Map<String, String> chartNotes = new java.util.HashMap<>();
    private final int sampleRows;

    private HtmlReport(ReportModel model, Map<String, EmbeddedImage> images, int sampleRows) {
        this.model = model;
        this.images = images;
        this.sampleRows = sampleRows;
    }

    /**
     * The renderer of one model with its drawn charts.
     *
     * @param images at most one image per figure of the model; a figure without one is described, not drawn
     * @throws IllegalArgumentException if an image is for a figure the model does not show, or two are for one
     */
    public static HtmlReport of(ReportModel model, List<EmbeddedImage> images) {
        return of(model, images, Map.of());
    }

    /**
     * The renderer of one model with its drawn charts and what each chart noted while it was drawn (a band's source,
     * a k without a value, why it was not drawn), added to the figure's caption.
     *
     * @param images     at most one image per figure of the model; a figure without one is described, not drawn
     * @param chartNotes by figure id, the chart's note (blank for none)
     * @throws IllegalArgumentException if an image is for a figure the model does not show, or two are for one
     */
    public static HtmlReport of(ReportModel model, List<EmbeddedImage> images, Map<String, String> chartNotes) {
        HtmlReport r = of(model, images, SAMPLE_ROWS);
        r.chartNotes.putAll(chartNotes);
        return r;
    }

    static HtmlReport of(ReportModel model, List<EmbeddedImage> images, int sampleRows) {
        Objects.requireNonNull(model, "model");
        var byId = new LinkedHashMap<String, EmbeddedImage>();
        for (EmbeddedImage img : images) {
            if (model.figure(img.figureId()).isEmpty()) {
                throw new IllegalArgumentException("the report shows no figure '" + img.figureId() + "'; it shows "
                        + model.figures().stream().map(Figure::id).toList());
            }
            if (byId.put(img.figureId(), img) != null) {
                throw new IllegalArgumentException("two images for figure '" + img.figureId() + "'");
            }
        }
        if (sampleRows < 1) {
            throw new IllegalArgumentException("sampleRows must be positive");
        }
        return new HtmlReport(model, byId, sampleRows);
    }

    /** The page. */
    public String render() {
        Page page = new Page(images, chartNotes);
        Html h = page.html;
        RunInfo run = model.run();
        h.markup("<!DOCTYPE html>\n").open("html", "lang", "en").newline().open("head").newline()
                .markup("<meta charset=\"utf-8\">\n")
                .markup("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .element("title", "Cluster evidence: " + run.inputFile()).newline()
                .open("style").markup(ReportStyle.CSS).close("style").newline().close("head").newline()
                .open("body").newline();
        h.open("header").element("h1", "Cluster evidence: " + run.inputFile());
        h.element("p", "meta", f("%d samples · %s · %s %s · generated %s", run.samples(),
                model.hasData() ? run.features() + " features · " + Names.metricProse(model.settings().metric())
                        : "a distance table given", run.toolName(), run.toolVersion(), run.generatedAt()));
        nav(h);
        h.close("header").newline();
        var tables = new HtmlTables(model, page, sampleRows);
        decision(page);
        tables.evidence();
        tables.linkages();
        tables.flags();
        if (model.labels() != null) {
            tables.labels();
        }
        model.explained().ifPresent(x -> {
            var explain = new ExplainHtml(x, page);
            explain.features(model);
            if (ExplainHtml.shows(model, "covariates")) {
                explain.covariates();
            }
            if (ExplainHtml.shows(model, "sensitivity")) {
                explain.sensitivity(model);
            }
        });
        tables.reproducibility();
        caution(h);
        references(h, model);
        h.open("footer").text(f("Made with %s %s from %s (SHA-256 %s).", run.toolName(), run.toolVersion(),
                run.inputFile(), run.inputSha256())).close("footer").newline();
        h.close("body").newline().close("html").newline();
        return h.toString();
    }

    private void nav(Html h) {
        h.open("nav", "aria-label", "Sections").open("ol");
        for (String id : SECTION_IDS) {
            boolean shown = id.equals("labels") ? model.labels() != null
                    : !ExplainHtml.TITLES.containsKey(id) || ExplainHtml.shows(model, id);
            if (shown) {
                h.open("li").open("a", "href", "#" + id).text(HtmlTables.title(id)).close("a").close("li");
            }
        }
        h.close("ol").close("nav");
    }

    private void decision(Page page) {
        Html h = page.html;
        Decision d = model.decision();
        HtmlTables.openSection(h, "decision");
        String cls = "verdict verdict-" + d.verdict().id();
        h.open("div", "class", cls, "role", "status").element("strong", d.verdict().id()).text(d.headline())
                .close("div");
        // the caution stands beside the claim as well as in the closing section, and so do the preparation's
        h.element("p", "caution", model.caution());
        if (!model.run().cautions().isEmpty()) {
            h.element("h3", "What the preparation found");
            h.open("ul", "class", "cautions");
            for (String c : model.run().cautions()) {
                h.element("li", c);
            }
            h.close("ul");
        }
        h.open("dl", "class", "facts");
        fact(h, "Number of clusters (k)", Integer.toString(d.k()));
        fact(h, d.hasClusters() ? "Linkage" : "Tree shown", Names.linkage(d.linkage()) + " linkage");
        if (d.hasClusters()) {
            fact(h, "Cut height (distance units)", ModelFactory.capital(Prose.cut(model.recommendedRow().orElseThrow(),
                    model.table(d.linkage()))));
            fact(h, "Supported levels", d.levels().isEmpty() ? "none: the recommendation is tentative"
                    : d.levels().size() > 1 ? "k = " + Prose.and(d.levels().stream()
                    .map(String::valueOf).toList()) + " (nested cuts of one tree)"
                    : "k = " + d.k() + " only");
        } else {
            fact(h, "Cut height (distance units)", f("none: the samples are one group (the tree's top merge is at %s)",
                    Numbers.scaled(d.cutHeight().low())));
        }
        EvidenceTable t = model.table(d.linkage());
        fact(h, "Gap statistic's choice", t.hasGap() ? "k = " + t.gapChoice() : "not computed");
        h.close("dl");
        h.element("h3", "Why");
        h.open("ul", "class", "reasons");
        for (String r : d.reasons()) {
            h.element("li", r);
        }
        h.close("ul");
        page.table("criteria", "What each criterion picks on its own, beside the decision (" + model.decision().k()
                + (d.hasClusters() ? " clusters" : ": one group") + ")", "Criterion", "#Its k", "How it picks",
                "Agrees");
        for (Decision.CriterionRow c : d.criteria()) {
            h.open("tr");
            page.cell(c.criterion()).num(Integer.toString(c.k())).cell(c.basis());
            h.open("td").element("span", c.agrees() ? "yes" : "no", c.agrees() ? "yes" : "no").close("td");
            h.close("tr");
        }
        page.endTable();
        model.figure("dendrogram").ifPresent(page::figure);
        h.close("section").newline();
    }

    private static void fact(Html h, String term, String value) {
        h.element("dt", term).element("dd", value);
    }

    private void caution(Html h) {
        HtmlTables.openSection(h, "caution");
        h.element("p", "caution", model.caution());
        if (model.explained().map(x -> x.features() != null).orElse(false)) {
            h.element("p", ExplainProse.doubleDipping());
        }
        if (model.decision().verdict() == Verdict.UNSUPPORTED) {
            h.element("p", "No cluster solution is recommended; describing these samples as groups would need evidence "
                    + "this study did not find.");
        }
        h.close("section").newline();
    }

    private static void references(Html h, ReportModel model) {
        HtmlTables.openSection(h, "references");
        h.open("ol", "class", "references");
        // the works behind every score the report's tables show; the null data's and the gap statistic's only when
        // they were computed (a study on distances alone has neither)
        var refs = new java.util.ArrayList<>(List.of(Reference.CALINSKI_HARABASZ, Reference.DAVIES_BOULDIN,
                Reference.DUNN, Reference.GOMEZ, Reference.HENNIG, Reference.HOPE, Reference.HUBERT_ARABIE, Reference.KAUFMAN_ROUSSEEUW,
                Reference.LIU, Reference.MONTI, Reference.MULLNER, Reference.MURTAGH_LEGENDRE, Reference.ROUSSEEUW,
                Reference.ROUSSEEUW_CROUX, Reference.SENBABAOGLU, Reference.TIBSHIRANI, Reference.WARD, Reference.WESTFALL_YOUNG));
        if (!model.nullCalibrated()) {
            refs.removeAll(List.of(Reference.GOMEZ, Reference.HOPE, Reference.LIU, Reference.ROUSSEEUW_CROUX,
                    Reference.WESTFALL_YOUNG));
        }
        if (!model.gapComputed()) {
            refs.remove(Reference.TIBSHIRANI);
        }
        if (model.hasData()) {
            refs.add(Reference.HARTIGAN);   // the separation test of the evidence tables
        }
        refs.addAll(Reference.ofPreparation(model.run()));
        model.explained().ifPresent(x -> refs.addAll(ExplainProse.references(x)));
        for (Reference r : refs) {
            if (r.doi().isEmpty()) {
                h.element("li", r.entry());
            } else {
                h.open("li").text(r.entry() + " ").open("a", "href", r.url()).text("doi:" + r.doi()).close("a")
                        .close("li");
            }
        }
        if (model.settings().branchPValues() != null) {
            for (Reference r : BranchPValueReport.REFERENCES) {
                h.open("li").text(r.entry() + " ").open("a", "href", r.url()).text("doi:" + r.doi()).close("a")
                        .close("li");
            }
        }
        h.close("ol").close("section").newline();
    }
}
