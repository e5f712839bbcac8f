package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.score.JaccardStability;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Recommendation;
import org.treeproof.study.Recommender;
import org.treeproof.study.Verdict;

class ReportModelTest {

    private static List<String> ids(ReportModel m) {
        return m.figures().stream().map(Figure::id).toList();
    }

    @Test
    void threeSeparatedGroupsAreSupportedAndEveryFigureIsShown() {
        Studies.Study s = Studies.separated();
        ReportModel m = s.model();
        assertEquals(Verdict.SUPPORTED, m.decision().verdict());
        assertEquals(3, m.decision().k());
        assertEquals(s.recommendation().linkage(), m.decision().linkage());
        assertEquals(new ReasonWords(s.recommendation().rule()).words(s.recommendation().reasons()),
                m.decision().reasons());
        // every study figure; the explanation's two (features, sensitivity) come only with an explanation
        assertEquals(Figure.IDS.subList(0, Figure.IDS.indexOf("features")), ids(m));
        for (Figure f : m.figures()) {
            assertEquals(f.id() + ".png", f.fileName());
            assertEquals("charts/" + f.id() + ".png", f.path());
        }
        assertTrue(m.notes().isEmpty(), m.notes().toString());
        assertEquals(3, m.recommendedRow().orElseThrow().k());
        assertEquals(3, m.clusters().size());
        assertTrue(m.flaggedClusters().isEmpty());
        assertTrue(m.nullCalibrated());
        assertTrue(m.gapComputed());
        assertTrue(m.hasData());
        // every criterion that reads the study's scores picks k = 3; the gap statistic's 1-SE rule may stop at k = 1
        // here (a cut into 2 of 3 equal groups has a negative Gap(2)), so it is not asked to agree
        assertTrue(m.decision().criteria().stream().filter(c -> !c.criterion().equals("gap statistic"))
                .allMatch(Decision.CriterionRow::agrees), m.decision().criteria().toString());
    }

    @Test
    void aGapChoiceWithNoSizedCutIsReportedNotRefused() throws Exception {
        // 46 samples in 3 features: tight groups of 5-8 samples and a few far pairs (reference/
        // gap-beyond-sized-cuts.csv). Ward's tree has cuts into clusters of at least 5 samples only up to k = 5,
        // while the gap statistic, which cuts the tree itself, picks k = 8. This stopped the report with an
        // internal error once.
        var lines = java.nio.file.Files.readAllLines(java.nio.file.Path.of(
                ReportModelTest.class.getResource("/report/gap-beyond-sized-cuts.csv").toURI()));
        int n = lines.size() - 1;
        double[] v = new double[n * 3];
        var ids = new java.util.ArrayList<String>();
        for (int i = 0; i < n; i++) {
            String[] f = lines.get(i + 1).split(",");
            ids.add(f[0]);
            for (int j = 0; j < 3; j++) {
                v[i * 3 + j] = Double.parseDouble(f[j + 1]);
            }
        }
        var settings = org.treeproof.study.StudySettings.builder().linkages(List.of(org.treeproof.tree.Linkage.WARD))
                .maxK(10).replicates(20).referenceSets(50).nullSets(0).seed(1).build();
        Studies.Study s = Studies.run(new org.treeproof.data.DataMatrix(ids, List.of("a", "b", "c"), v), settings);
        ReportModel m = s.model();
        EvidenceTable t = m.table(org.treeproof.tree.Linkage.WARD);
        assertEquals(s.evidence().linkages().get(0).gapChoice(), t.gapChoice());
        assertTrue(t.gapChoice() > t.rows().size() + 1, "gap " + t.gapChoice() + ", rows " + t.rows().size());
        assertFalse(t.gapChoiceHasRow());
        String html = HtmlReport.of(m, List.of()).render();
        assertTrue(html.contains("this tree has no cut into that many clusters of at least the minimum size"));
    }

    @Test
    void uniformNoiseIsUnsupportedAndTheClusterFiguresAreLeftOutWithANote() {
        ReportModel m = Studies.noise().model();
        assertEquals(Verdict.UNSUPPORTED, m.decision().verdict());
        assertEquals(1, m.decision().k());
        assertFalse(m.decision().hasClusters());
        assertTrue(m.recommendedRow().isEmpty());
        assertTrue(m.clusters().isEmpty());
        assertTrue(m.flaggedSamples().isEmpty());
        assertEquals(List.of("dendrogram", "stability", "gap", "consensus-cdf", "linkages", "heatmap"), ids(m));
        assertTrue(m.notes().stream().anyMatch(n -> n.contains("silhouette") && n.contains("left out")), m.notes().toString());
        for (EvidenceTable t : m.evidence()) {
            assertTrue(t.recommended().isEmpty());
        }
        assertTrue(m.caution().contains("does not prove that none exists"));
        assertFalse(m.caution().contains("continuum"), m.caution());
    }

    @Test
    void distancesAloneLeaveOutTheGapHeatMapAndNullColumnsAndSaySo() {
        Studies.Study s = Studies.distancesOnly();
        ReportModel m = s.model();
        assertEquals(List.of("dendrogram", "silhouette", "stability", "consensus", "consensus-cdf", "jaccard"), ids(m));
        assertFalse(m.nullCalibrated());
        assertFalse(m.gapComputed());
        assertFalse(m.hasData());
        // without null calibration nothing can be more than tentative (DecisionRule, step 1)
        assertEquals(Verdict.TENTATIVE, m.decision().verdict());
        String notes = String.join(" ", m.notes());
        assertTrue(notes.contains("gap statistic chart is left out"), notes);
        assertTrue(notes.contains("heat map is left out"), notes);
        assertTrue(notes.contains("only one linkage"), notes);
        for (EvidenceRow r : m.evidence().get(0).rows()) {
            assertTrue(Double.isNaN(r.calinskiHarabasz()) && Double.isNaN(r.gap()) && Double.isNaN(r.pValueAdjusted()));
            assertFalse(r.calibrated());
        }
    }

    @Test
    void evidenceRowsCarryTheStudysValuesAndMarkOnlyTheRecommendedSolution() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.noise(), Studies.tentative())) {
            Evidence e = s.evidence();
            Recommendation rec = s.recommendation();
            ReportModel m = s.model();
            int recommended = 0;
            for (LinkageEvidence le : e.linkages()) {
                EvidenceTable t = m.table(le.linkage());
                assertEquals(le.copheneticCorrelation(), t.copheneticCorrelation());
                assertEquals(le.gapChoice(), t.gapChoice());
                assertEquals(le.byK().size(), t.rows().size());
                for (KEvidence k : le.byK()) {
                    EvidenceRow r = t.at(k.k());
                    NullStability n = k.stability().nullModel();
                    assertEquals(k.cutHeight(), r.cutHeight());
                    assertEquals(k.stability().ari().mean(), r.ariMean());
                    assertEquals(k.stability().ari().low(), r.ariLow());
                    assertEquals(k.stability().ari().high(), r.ariHigh());
                    assertEquals(k.stability().ari().count(), r.replicates());
                    assertEquals(n == null ? Double.NaN : n.ariMean(), r.nullAriMean());
                    assertEquals(n == null ? Double.NaN : n.pValueAdjusted(), r.pValueAdjusted());
                    assertEquals(n == null ? Double.NaN : n.excess(), r.excess());
                    assertEquals(k.outliers(), r.outliers());
                    assertEquals(n == null ? Double.NaN : n.pacMean(), r.nullPac());
                    assertEquals(k.stability().pac(), r.pac());
                    assertEquals(k.worstJaccard(), r.worstJaccard());
                    assertEquals(k.silhouette(), r.silhouette());
                    assertEquals(k.calinskiHarabasz(), r.calinskiHarabasz());
                    assertEquals(k.daviesBouldin(), r.daviesBouldin());
                    assertEquals(k.dunn(), r.dunn());
                    assertEquals(k.gap(), r.gap());
                    assertEquals(k.gapSE(), r.gapSE());
                    assertEquals(rec.assessment(le.linkage(), k.k()).verdict(), r.verdict());
                    boolean isRec = rec.k() > 1 && le.linkage() == rec.linkage() && k.k() == rec.k();
                    assertEquals(isRec, r.recommended());
                    recommended += r.recommended() ? 1 : 0;
                }
            }
            assertEquals(rec.k() > 1 ? 1 : 0, recommended);
            LinkageComparison c = m.linkages();
            assertEquals(rec.linkages().size(), c.rows().size());
            for (int i = 0; i < c.rows().size(); i++) {
                assertEquals(rec.linkages().get(i).k(), c.rows().get(i).k());
                assertEquals(rec.linkages().get(i).verdict(), c.rows().get(i).verdict());
                assertArrayEquals(rec.agreement()[i], c.agreement()[i]);
            }
            assertEquals(1, c.rows().stream().filter(LinkageComparison.Row::recommended).count());
            assertFalse(c.why().isEmpty());
        }
    }

    @Test
    void clustersAndFlagsAreThoseOfTheRecommendedSolution() {
        Studies.Study s = Studies.bridged();
        ReportModel m = s.model();
        Recommendation rec = s.recommendation();
        KEvidence chosen = s.evidence().linkages().stream().filter(l -> l.linkage() == rec.linkage()).findFirst()
                .orElseThrow().at(rec.k());
        assertEquals(chosen.clusters().size(), m.clusters().size());
        assertEquals(rec.flaggedSamples(), m.flaggedSamples());
        assertFalse(m.flaggedSamples().isEmpty(), "the samples between two groups are flagged");
        assertEquals(m.clusters().stream().filter(c -> c.status() != JaccardStability.Status.STABLE).toList(),
                m.flaggedClusters());
    }

    @Test
    void farSamplesSetAsideAfterTheCutLeaveTheirClusterEverywhere() throws Exception {
        // Two groups of 30, 10 apart on each of 4 features, and two samples 25 out on the first feature beside the
        // first group. Ward merges each far sample into the first group (cost about 1.4 x 25) long before the groups
        // merge (about 5.5 x 20), so the cut at k = 2 holds them; they join that cluster far above its own first
        // split and are set aside after the cut. The cluster table, the partition compared with labels and the
        // flagged samples must then all be those of clusters.csv.
        var settings = org.treeproof.study.StudySettings.builder().linkages(List.of(org.treeproof.tree.Linkage.WARD))
                .maxK(4).replicates(20).referenceSets(10).nullSets(19).nullReplicates(5).seed(11).build();
        var rng = new java.util.SplittableRandom(9);
        int n = 62;
        double[] v = new double[n * 4];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < 4; j++) {
                double centre = i < 30 ? 0 : i < 60 ? 10 : j == 0 ? -25 : 0;
                v[i * 4 + j] = centre + Studies.gaussian(rng);
            }
        }
        Studies.Study s = Studies.run(new org.treeproof.data.DataMatrix(Studies.ids(n, i -> "s" + i),
                Studies.names(4), v), settings);
        Recommendation rec = s.recommendation();
        assertEquals(2, rec.k());
        KEvidence cut = s.evidence().linkages().get(0).at(2);
        assertEquals(0, cut.outliers(), "the cut itself holds the far samples");
        assertTrue(rec.clustering().isOutlier(60) && rec.clustering().isOutlier(61));
        ReportModel m = s.model();
        assertEquals(List.of(30, 30), m.clusters().stream().map(c -> c.size()).toList());
        // summary.json's recommendation carries the same sizes (its per-k figures are those of the cut, 32 and 30
        // with the far pair; a script reading only those got other clusters than clusters.csv)
        var provenance = new org.treeproof.io.SummaryJson.Provenance("treeproof", "test", "far.csv", "0".repeat(64),
                List.of(), List.of(), null);
        var json = new com.fasterxml.jackson.databind.ObjectMapper().readTree(new org.treeproof.io.SummaryJson(
                s.evidence(), rec, provenance, new ReasonWords(rec.rule())::word).toBytes());
        var sizes = new java.util.ArrayList<Integer>();
        json.get("recommendation").get("clusters").forEach(c -> sizes.add(c.get("size").asInt()));
        assertEquals(List.of(30, 30), sizes);
        // known classes: the two groups and the far pair; the comparison has the 2 clusters and an outlier row
        // (this once stopped the run: the comparison counted the far samples as clusters of their own)
        String[] classes = new String[n];
        for (int i = 0; i < n; i++) {
            classes[i] = i < 30 ? "a" : i < 60 ? "b" : "far";
        }
        var labels = LabelComparison.of(rec.clustering(), classes);
        assertEquals(2, labels.clusters());
        org.junit.jupiter.api.Assertions.assertArrayEquals(new int[] {0, 0, 2}, labels.outliers());
        assertEquals(labels, ReportModel.of(s.evidence(), rec, s.run(), labels).labelComparison().orElseThrow());
        // the index counts each far sample as a group of its own: the partition {a}, {b}, {x}, {y} against the
        // classes {a}, {b}, {x, y} (Hubert & Arabie 1985): sum C(n_ij) = 2 C(30) = 870, rows 870, columns
        // 870 + C(2) = 871, C(62) = 1891; expected 870 * 871 / 1891 = 400.73; maximum 870.5;
        // ARI = (870 - 400.73) / (870.5 - 400.73) = 0.99894
        assertEquals((870 - 870.0 * 871 / 1891) / (870.5 - 870.0 * 871 / 1891), labels.ari(), 1e-12);
        assertTrue(rec.flaggedSamples().stream().noneMatch(f -> f.sample() >= 60));
        var outliers = rec.reasons().stream().filter(r -> r instanceof org.treeproof.study.Reason.Outliers)
                .map(r -> (org.treeproof.study.Reason.Outliers) r).findFirst().orElseThrow();
        assertEquals(2, outliers.count());
        assertEquals(2, outliers.afterCut());
        assertTrue(new ReasonWords(rec.rule()).word(outliers).contains("set aside after the cut was assessed"));
    }

    @Test
    void unsupportedRecommendsOneGroupOfAllSamples() {
        Studies.Study s = Studies.noise();
        var c = s.recommendation().clustering();
        assertEquals(1, c.k());
        assertEquals(s.evidence().samples(), c.size());
    }

    @Test
    void tentativeSolutionsSayWhyInTheCaution() {
        ReportModel m = Studies.tentative().model();
        assertEquals(Verdict.TENTATIVE, m.decision().verdict());
        assertTrue(m.decision().headline().contains("tentatively"));
        assertTrue(m.caution().contains("hypotheses"));
        assertTrue(m.caution().contains("segments of a continuum"), m.caution());
        // a tentative solution is no supported level (the report said "Supported levels: k = 3 only")
        assertEquals(List.of(), Studies.tentative().recommendation().levels());
        String html = HtmlReport.of(m, List.of()).render();
        assertTrue(html.contains("none: the recommendation is tentative"), "the decision's facts");
    }

    @Test
    void aReasonWithANonNumberPrintsTheDash() {
        Studies.Study s = Studies.separated();
        Recommendation r = s.recommendation();
        var reasons = new java.util.ArrayList<>(r.reasons());
        var a = r.assessment(r.linkage(), r.k());
        var f = a.facts();
        var odd = new org.treeproof.study.Assessment(new org.treeproof.study.Assessment.Facts(f.linkage(), f.k(),
                f.outliers(), f.meanAri(), Double.NaN, f.noneDissolved(), f.doubtfulClusters(), f.silhouette(), f.leastClusterSilhouette(), f.calibrated(),
                f.excess(), f.pAdjusted(),
                f.cophenetic(), f.separationP()), a.verdict(), a.met(), a.failed());
        reasons.add(new org.treeproof.study.Reason.BestFailed(odd));
        var changed = new Recommendation(r.linkage(), r.k(), r.cutHeight(), r.verdict(), r.levels(), reasons,
                r.criteria(), r.clusters(), r.flaggedSamples(), r.linkages(), r.agreement(), r.rule(),
                r.assessments(), r.structureTest(), r.clustering(), r.minClusterSize(), r.votes());
        List<String> shown = ReportModel.of(s.evidence(), changed, s.run()).decision().reasons();
        String last = shown.get(shown.size() - 1);
        assertTrue(last.contains("smallest cluster Jaccard –"), last);
        assertFalse(last.contains("NaN"), last);
    }

    @Test
    void cautionSaysFitIsNotValidation() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.noise())) {
            String c = s.model().caution();
            assertTrue(c.contains("not validation of subtypes"), c);
            assertTrue(c.contains("independent data"), c);
            assertTrue(c.contains("clinical"), c);
        }
    }

    @Test
    void everyEffectiveSettingIsListed() {
        ReportModel m = Studies.separated().model();
        var values = m.effectiveSettings().stream().collect(java.util.stream.Collectors.toMap(ReportModel.Setting::name,
                ReportModel.Setting::value));
        assertEquals("average, complete, ward", values.get("Linkages compared"));
        assertEquals("euclidean", values.get("Dissimilarity (metric)"));
        assertEquals("2 to 5", values.get("Numbers of clusters assessed"));
        assertEquals("20", values.get("Stability replicates"));
        assertEquals("subsample", values.get("Resampling of samples"));
        assertEquals("0.8", values.get("Sample fraction"));
        assertTrue(values.get("Feature fraction").startsWith("1 "));
        assertEquals("10", values.get("Gap statistic reference sets"));
        assertEquals("principal-box", values.get("Gap statistic reference data"));
        assertEquals("19", values.get("Null data sets"));
        assertEquals("5", values.get("Replicates per null data set"));
        assertEquals("(0.1, 0.9]", values.get("PAC interval"));
        assertEquals("11", values.get("Seed"));
        assertEquals("0.05", values.get("Null test level (p at most)"));
        assertEquals("0.75", values.get("Stable cluster (mean Jaccard at least)"));
        assertEquals("0.5", values.get("Dissolved cluster (mean Jaccard at most)"));
        // one line per component of StudySettings and of DecisionRule, the PAC interval's two ends sharing one:
        // a setting added to either record without a line here fails this count
        int components = org.treeproof.study.StudySettings.class.getRecordComponents().length
                + org.treeproof.study.DecisionRule.class.getRecordComponents().length;
        assertEquals(components - 1, m.effectiveSettings().size());
    }

    @Test
    void partsOfDifferentStudiesAreRefused() {
        Studies.Study a = Studies.separated();
        Studies.Study b = Studies.noise();
        assertThrows(IllegalArgumentException.class, () -> ReportModel.of(b.evidence(), a.recommendation(), b.run()));
        assertThrows(IllegalArgumentException.class, () -> ReportModel.of(a.evidence(), a.recommendation(), b.run()));
        RunInfo r = a.run();
        RunInfo otherSeed = new RunInfo(r.toolName(), r.toolVersion(), r.inputFile(), r.inputSha256(), r.samples(),
                r.features(), r.preparation(), r.metric(), r.commandLine(), r.seed() + 1, r.threads(), r.wallSeconds(),
                r.generatedAt());
        assertThrows(IllegalArgumentException.class, () -> ReportModel.of(a.evidence(), a.recommendation(), otherSeed));
        RunInfo otherMetric = new RunInfo(r.toolName(), r.toolVersion(), r.inputFile(), r.inputSha256(), r.samples(),
                r.features(), r.preparation(), "manhattan", r.commandLine(), r.seed(), r.threads(), r.wallSeconds(),
                r.generatedAt());
        assertThrows(IllegalArgumentException.class, () -> ReportModel.of(a.evidence(), a.recommendation(), otherMetric));
        int n = a.evidence().samples();
        // a comparison made for one cluster cannot belong to the three-cluster decision
        var oneCluster = LabelComparison.of(org.treeproof.partition.Partition.of(new int[n]), twoClassLabels(n));
        assertThrows(IllegalArgumentException.class,
                () -> ReportModel.of(a.evidence(), a.recommendation(), a.run(), oneCluster));
    }

    private static String[] twoClassLabels(int n) {
        String[] l = new String[n];
        for (int i = 0; i < n; i++) {
            l[i] = i % 2 == 0 ? "even" : "odd";
        }
        return l;
    }
}
