package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.treeproof.report.Fixtures.assertPrinted;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.treeproof.study.KEvidence;
import org.treeproof.study.Recommendation;

class HtmlReportTest {
    private static final List<String> WITHOUT_LABELS = List.of("decision", "evidence", "linkages", "flags",
            "reproducibility", "caution", "references");

    private static List<EmbeddedImage> images(ReportModel m) {
        var out = new ArrayList<EmbeddedImage>();
        int i = 0;
        for (Figure f : m.figures()) {
            out.add(new EmbeddedImage(f.id(), "image/png", Fixtures.png(i++)));
        }
        return out;
    }

    private static Document parse(String html) {
        return Jsoup.parse(html);
    }

    private static List<String> sectionIds(Document d) {
        return d.select("body > section").eachAttr("id");
    }

    @Test
    void everySectionIsThereInOrderWithTheDecisionFirst() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.noise(), Studies.distancesOnly())) {
            ReportModel m = s.model();
            Document d = parse(HtmlReport.of(m, images(m)).render());
            assertEquals(WITHOUT_LABELS, sectionIds(d));
            Element decision = d.getElementById("decision");
            assertTrue(decision.selectFirst(".verdict").text().startsWith(m.decision().verdict().id()));
            assertEquals(Integer.toString(m.decision().k()), decision.select("dl.facts dd").first().text());
            assertEquals(m.decision().criteria().size(), decision.select("table.criteria tbody tr").size());
            assertEquals(m.decision().reasons(), decision.select("ul.reasons li").eachText());
            // the caution beside the verdict, as in the closing section
            assertEquals(m.caution(), decision.selectFirst("p.caution").text());
            assertEquals(m.caution(), d.getElementById("caution").selectFirst("p.caution").text());
            for (String id : WITHOUT_LABELS) {
                assertFalse(d.getElementById(id).select("h2").text().isBlank(), id);
            }
        }
    }

    @Test
    void theLabelSectionAppearsWhenClassesAreGiven() {
        Studies.Study s = Studies.separated();
        int n = s.evidence().samples();
        String[] truth = new String[n];
        for (int i = 0; i < n; i++) {
            truth[i] = "class " + (i % 3);
        }
        var labels = LabelComparison.of(s.recommendation().clustering(), truth);
        ReportModel m = ReportModel.of(s.evidence(), s.recommendation(), s.run(), labels);
        Document d = parse(HtmlReport.of(m, List.of()).render());
        assertEquals(List.of("decision", "evidence", "linkages", "flags", "labels", "reproducibility", "caution",
                "references"), sectionIds(d));
        Element table = d.getElementById("labels").selectFirst("table.contingency");
        assertEquals(List.of("Cluster", "class 0", "class 1", "class 2", "Total"), table.select("thead th").eachText());
        assertEquals(4, table.select("tbody tr").size());
        assertEquals("45", table.select("tbody tr").last().select("td").last().text());
        assertTrue(d.getElementById("labels").text().contains("1.000"));
    }

    @Test
    void everyGivenImageIsEmbeddedAsADataUriWithItsOwnBytes() {
        ReportModel m = Studies.separated().model();
        List<EmbeddedImage> given = new ArrayList<>(images(m));
        byte[] svg = "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"4\" height=\"4\"/>".getBytes(StandardCharsets.UTF_8);
        given.set(0, new EmbeddedImage("dendrogram", "image/svg+xml", svg));
        String html = HtmlReport.of(m, given).render();
        Document d = parse(html);
        var imgs = d.select("img");
        assertEquals(given.size(), imgs.size());
        assertEquals(given.size(), html.split("src=\"data:", -1).length - 1);
        for (EmbeddedImage img : given) {
            Element e = d.selectFirst("#figure-" + img.figureId() + " img");
            String src = e.attr("src");
            String prefix = "data:" + img.mimeType() + ";base64,";
            assertTrue(src.startsWith(prefix), src.substring(0, 40));
            assertArrayEquals(img.bytes(), Base64.getDecoder().decode(src.substring(prefix.length())));
            assertFalse(e.attr("alt").isBlank());
        }
        assertEquals(m.figures().size(), d.select("figure").size());
        assertEquals(0, d.select("figure.absent").size());
    }

    @Test
    void aFigureWithoutAnImageSaysWhereItsFileIs() {
        ReportModel m = Studies.separated().model();
        Document d = parse(HtmlReport.of(m, List.of()).render());
        assertEquals(0, d.select("img").size());
        assertEquals(m.figures().size(), d.select("figure.absent").size());
        assertTrue(d.selectFirst("#figure-gap").text().contains("charts/gap.png"));
    }

    @Test
    void aChartsNoteJoinsItsCaptionAndANotDrawnChartSaysWhy() {
        ReportModel m = Studies.separated().model();
        List<EmbeddedImage> given = images(m).stream().filter(i -> !i.figureId().equals("gap")).toList();
        Document d = parse(HtmlReport.of(m, given, java.util.Map.of("stability", "the grey band is the null's",
                "gap", "the chart refused the values (x)")).render());
        assertTrue(d.selectFirst("#figure-stability figcaption").text().endsWith("Note: the grey band is the null's."),
                d.selectFirst("#figure-stability").text());
        String gap = d.selectFirst("#figure-gap figcaption").text();
        assertTrue(gap.endsWith("(Not drawn: the chart refused the values (x).)") && !gap.contains("charts/gap.png"),
                gap);
    }

    @Test
    void imagesForFiguresTheModelDoesNotShowAreRefused() {
        ReportModel noise = Studies.noise().model();
        var silhouette = new EmbeddedImage("silhouette", "image/png", Fixtures.png(1));
        assertThrows(IllegalArgumentException.class, () -> HtmlReport.of(noise, List.of(silhouette)));
        var gap = new EmbeddedImage("gap", "image/png", Fixtures.png(1));
        assertThrows(IllegalArgumentException.class, () -> HtmlReport.of(noise, List.of(gap, gap)));
        assertThrows(IllegalArgumentException.class, () -> new EmbeddedImage("gap", "text/html", Fixtures.png(1)));
        assertThrows(IllegalArgumentException.class, () -> new EmbeddedImage("gap", "image/png", new byte[0]));
    }

    @Test
    void thePageIsSelfContainedAndPrintable() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.noise())) {
            ReportModel m = s.model();
            String html = HtmlReport.of(m, images(m)).render();
            Document d = parse(html);
            assertTrue(d.select("script, link, iframe, object, embed, base, frame, video, audio").isEmpty());
            for (Element e : d.select("[src]")) {
                assertTrue(e.attr("src").startsWith("data:"), e.outerHtml());
            }
            for (Element a : d.select("a[href]")) {
                String href = a.attr("href");
                assertTrue(href.startsWith("#") || href.startsWith("https://doi.org/10."), href);
                if (href.startsWith("#")) {
                    assertTrue(d.getElementById(href.substring(1)) != null, href);
                }
            }
            String css = d.select("style").html();
            assertTrue(css.contains("@media print"));
            assertFalse(css.contains("url("));
            assertFalse(css.contains("@import"));
            assertFalse(css.contains("http"));
            assertEquals("utf-8", d.selectFirst("meta[charset]").attr("charset"));
            assertFalse(d.select("ol.references li a").isEmpty());
        }
    }

    @Test
    void theEvidenceTablesShowTheStudysValuesAndHighlightTheRecommendedRow() {
        Studies.Study s = Studies.bridged();
        ReportModel m = s.model();
        Document d = parse(HtmlReport.of(m, images(m)).render());
        var tables = d.select("#evidence table.evidence");
        assertEquals(s.evidence().linkages().size(), tables.size());
        for (Element t : tables) {
            assertTrue(t.select("tbody tr").size() >= 1);
        }
        var marked = d.select("#evidence tr.recommended");
        assertEquals(1, marked.size());
        Recommendation rec = s.recommendation();
        KEvidence e = s.evidence().linkages().stream().filter(l -> l.linkage() == rec.linkage()).findFirst()
                .orElseThrow().at(rec.k());
        var cells = marked.first().select("td");
        assertEquals(Integer.toString(rec.k()), cells.get(0).text());
        // the verdict second, with the recommended tag
        assertTrue(cells.get(1).text().startsWith(rec.verdict().id()) && cells.get(1).text().contains("recommended"));
        assertEquals(Integer.toString(e.outliers()), cells.get(2).text());
        assertPrinted(cells.get(3).text().replace("\u00A0†", ""), e.cutHeight().chosen(), "cut height");
        String[] ari = cells.get(5).text().replace('\u00A0', ' ').replaceAll("[\\[\\],]", " ").trim().split("\\s+");
        assertPrinted(ari[0], e.stability().ari().mean(), "mean ARI");
        assertPrinted(ari[1], e.stability().ari().low(), "ARI low");
        assertPrinted(ari[2], e.stability().ari().high(), "ARI high");
        assertPrinted(cells.get(7).text(), e.stability().pac(), "PAC");
        assertPrinted(cells.get(9).text(), e.worstJaccard(), "smallest Jaccard");
        assertPrinted(cells.get(10).text(), e.silhouette(), "silhouette");
        assertPrinted(cells.get(11).text(), e.stability().nullModel().silhouetteMean(), "null silhouette");
        assertPrinted(cells.get(12).text(), e.stability().nullModel().excess(), "excess over the null");
        assertPrinted(cells.get(13).text(), e.stability().nullModel().pValueAdjusted(), "adjusted p");
        // the separation p: the largest dip-test p over the clusters, "< 0.001" (no-break space) below the third decimal
        String sep = cells.get(14).text().replace('\u00A0', ' ');
        assertTrue(e.separationP() < 0.001 ? sep.equals("< 0.001") : sep.equals(String.format(Locale.ROOT, "%.3f",
                e.separationP())), sep + " for " + e.separationP());
        assertPrinted(cells.get(17).text(), e.dunn(), "Dunn");
        String[] gap = cells.get(18).text().replace('\u00A0', ' ').split(" ± ");
        assertPrinted(gap[0], e.gap(), "gap");
        assertPrinted(gap[1], e.gapSE(), "s_k");
        assertEquals(1, d.select("#linkages tr.recommended").size());
    }

    @Test
    void aTreeWithInversionsGivesNoRangeOfHeights() {
        // centroid linkage on three Gaussian groups: merging two close samples moves their centroid nearer to a
        // third, whose merge is then lower (an inversion), so the state after n - k merges is no cut by height and
        // the low end of the "range" may lie above its high end
        var settings = org.treeproof.study.StudySettings.builder().linkages(List.of(org.treeproof.tree.Linkage.CENTROID))
                .maxK(5).replicates(10).referenceSets(0).nullSets(0).seed(3).build();
        Studies.Study s = Studies.run(Studies.threeGroups(15, 21, i -> "s" + i), settings);
        ReportModel m = s.model();
        assertFalse(m.table(org.treeproof.tree.Linkage.CENTROID).monotone(), "the centroid tree has inversions");
        Document d = parse(HtmlReport.of(m, List.of()).render());
        for (Element row : d.select("#evidence table.evidence tbody tr")) {
            assertEquals("no single height", row.select("td").get(4).text().replace('\u00A0', ' '));
        }
    }

    @Test
    void missingValuesShowADashWithAFootnoteAndNeverNaN() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.noise(), Studies.distancesOnly(),
                Studies.tentative())) {
            ReportModel m = s.model();
            String html = HtmlReport.of(m, images(m)).render();
            Document d = parse(html);
            String text = d.text();
            assertFalse(text.contains("NaN"), "NaN in the page");
            assertFalse(text.contains("Infinity"), "Infinity in the page");
            for (Element t : d.select("table")) {
                boolean dash = t.select("td").eachText().stream().anyMatch(c -> c.contains("–"));
                if (dash) {
                    Element after = t.parent().nextElementSibling();
                    assertTrue(after != null && after.hasClass("footnote") && after.text().startsWith("–"),
                            "a dash without its footnote");
                }
            }
        }
        Document d = parse(HtmlReport.of(Studies.distancesOnly().model(), List.of()).render());
        assertFalse(d.select("#evidence p.footnote").isEmpty());
    }

    @Test
    void hostileStringsAreEscapedAndComeBackVerbatim() {
        String script = "<script>alert(1)</script>";
        Studies.Study s = Studies.bridged(i -> script + " \"s\" & 'q' #" + i);
        String file = script + "\"data\" & 'more'.csv";
        String command = "treeproof assess '" + file + "' --out \"x & y\" " + script;
        RunInfo r = s.run(file, "2024-01-01T00:00:00Z", 2, 4.0);
        RunInfo hostile = new RunInfo(r.toolName(), r.toolVersion(), file, r.inputSha256(), r.samples(), r.features(),
                List.of(script + " step & \"quoted\""), r.metric(), command, r.seed(), r.threads(), r.wallSeconds(),
                script);
        int n = s.evidence().samples();
        String[] classes = new String[n];
        for (int i = 0; i < n; i++) {
            classes[i] = i % 2 == 0 ? script : "\"A\" & 'B'";
        }
        var labels = LabelComparison.of(s.recommendation().clustering(), classes);
        ReportModel m = ReportModel.of(s.evidence(), s.recommendation(), hostile, labels);
        String html = HtmlReport.of(m, images(m)).render();
        assertFalse(html.contains("<script"), "an unescaped script tag");
        Document d = parse(html);
        assertTrue(d.select("script").isEmpty());
        assertEquals("Cluster evidence: " + file, d.title());
        assertEquals("Cluster evidence: " + file, d.selectFirst("h1").text());
        List<String> flaggedIds = d.select("#flags table.samples tbody tr td:first-child").eachText();
        assertFalse(flaggedIds.isEmpty(), "the bridging samples are flagged");
        assertEquals(m.flaggedSamples().stream().map(Recommendation.SampleFlag::sampleId).toList(), flaggedIds);
        assertTrue(flaggedIds.get(0).startsWith(script + " \"s\" & 'q' #"));
        assertEquals(command, d.selectFirst("#reproducibility pre code").wholeText());
        var runCells = d.select("#reproducibility table.run td").eachText();
        assertTrue(runCells.contains(file));
        assertTrue(runCells.contains(script));
        assertEquals(List.of(script + " step & \"quoted\""), d.select("#reproducibility table.run ol li").eachText());
        List<String> heads = d.select("#labels table.contingency thead th").eachText();
        assertEquals(List.of("Cluster", script, "\"A\" & 'B'", "Total"), heads);
    }

    @Test
    void longListsOfFlaggedSamplesAreCutAndPointToTheCsv() {
        ReportModel m = Studies.bridged().model();
        int flagged = m.flaggedSamples().size();
        assertTrue(flagged >= 2);
        Document d = parse(HtmlReport.of(m, List.of(), flagged - 1).render());
        assertEquals(flagged - 1, d.select("#flags table.samples tbody tr").size());
        assertTrue(d.getElementById("flags").text().contains("1 more flagged sample is not shown here; clusters.csv"));

        var many = new ArrayList<Recommendation.SampleFlag>();
        for (int i = 0; i < 250; i++) {
            many.add(new Recommendation.SampleFlag(i, "sample " + i, 1, 0.5, 0.1, true, false));
        }
        Document big = parse(HtmlReport.of(Fixtures.withFlags(m, many), List.of()).render());
        assertEquals(HtmlReport.SAMPLE_ROWS, big.select("#flags table.samples tbody tr").size());
        assertEquals("sample 199", big.select("#flags table.samples tbody tr").last().child(0).text());
        assertTrue(big.getElementById("flags").text().contains("50 more flagged samples are not shown here"));
    }

    @Test
    void theSettingsSectionHoldsEveryFactOfTheRun() {
        Studies.Study s = Studies.separated();
        ReportModel m = s.model();
        Element repro = parse(HtmlReport.of(m, List.of()).render()).getElementById("reproducibility");
        String text = repro.text();
        RunInfo r = m.run();
        for (String expected : List.of(r.toolName() + " " + r.toolVersion(), r.inputFile(), r.inputSha256(),
                "Threads 2", "Wall time 1.5 s", "Seed 11", r.commandLine(), r.generatedAt())) {
            assertTrue(text.contains(expected), "missing '" + expected + "'");
        }
        for (ReportModel.Setting setting : m.effectiveSettings()) {
            assertTrue(text.contains(setting.name() + " " + setting.value()), setting.toString());
        }
        assertEquals(m.effectiveSettings().size(), repro.select("table.settings tbody tr").size());
    }

    @Test
    void theCautionClosesThePageBeforeTheReferences() {
        ReportModel m = Studies.separated().model();
        Document d = parse(HtmlReport.of(m, List.of()).render());
        assertEquals(m.caution(), d.selectFirst("#caution p.caution").text());
        assertTrue(d.getElementById("references").text().contains("doi:10.1038/srep06207"));
    }
}
