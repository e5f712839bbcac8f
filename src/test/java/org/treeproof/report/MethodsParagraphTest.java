package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.treeproof.report.Fixtures.assertPrinted;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.treeproof.score.JaccardStability;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Recommendation;

class MethodsParagraphTest {
    private static final String NUM = "(-?[0-9]+(?:\\.[0-9]+)?(?:e[+-][0-9]+)?)";

    private static Matcher find(String text, String regex) {
        Matcher m = Pattern.compile(regex).matcher(text);
        assertTrue(m.find(), "no match for /" + regex + "/ in:\n" + text);
        return m;
    }

    private static KEvidence chosen(Studies.Study s) {
        Recommendation r = s.recommendation();
        return s.evidence().linkages().stream().filter(l -> l.linkage() == r.linkage()).findFirst().orElseThrow()
                .at(r.k());
    }

    @Test
    void theChosenSolutionsFiguresEqualTheEvidenceAtThePrintedPrecision() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.bridged())) {
            String md = MethodsParagraph.of(s.model()).render();
            KEvidence e = chosen(s);
            NullStability n = e.stability().nullModel();
            Matcher cut = find(md, "k = " + e.k() + " clusters with \\S+ linkage \\(tree cut at height " + NUM
                    + "; every height from " + NUM + " up to " + NUM + " gives the same clusters\\)");
            assertPrinted(cut.group(1), e.cutHeight().chosen(), "cut height");
            assertPrinted(cut.group(2), e.cutHeight().low(), "lowest height");
            assertPrinted(cut.group(3), e.cutHeight().high(), "highest height");
            Matcher ari = find(md, "clusters with \\S+ linkage; mean ARI " + NUM + " over ([0-9]+) replicates \\(null "
                    + NUM + "\\) and average silhouette " + NUM + " \\(null " + NUM + "\\): an excess of " + NUM
                    + " over the null, adjusted p = " + NUM + "; smallest cluster Jaccard " + NUM);
            assertPrinted(ari.group(1), e.stability().ari().mean(), "mean ARI");
            assertEquals(e.stability().ari().count(), Integer.parseInt(ari.group(2)));
            assertPrinted(ari.group(3), n.ariMean(), "null mean ARI");
            assertPrinted(ari.group(4), e.silhouette(), "silhouette");
            assertPrinted(ari.group(5), n.silhouetteMean(), "null silhouette");
            assertPrinted(ari.group(6), n.excess(), "excess");
            assertPrinted(ari.group(7), n.pValueAdjusted(), "adjusted p");
            assertPrinted(ari.group(8), e.worstJaccard(), "smallest Jaccard");
            LinkageEvidence le = s.evidence().linkages().stream()
                    .filter(l -> l.linkage() == s.recommendation().linkage()).findFirst().orElseThrow();
            assertEquals(le.gapChoice(), Integer.parseInt(find(md, "The gap statistic (?:agrees|disagrees): its rule "
                    + "picks k = ([0-9]+)").group(1)));
        }
    }

    @Test
    void theCautionFollowsTheResult() {
        for (Studies.Study s : List.of(Studies.separated(), Studies.noise())) {
            String md = MethodsParagraph.of(s.model()).render();
            int result = md.indexOf("# Result");
            int caution = md.indexOf("## Caution\n\n" + s.model().caution());
            assertTrue(result >= 0 && caution > result && caution < md.indexOf("## References"), md);
        }
    }

    @Test
    void theProcedureIsDescribedFromTheSettings() {
        Studies.Study s = Studies.separated();
        String md = MethodsParagraph.of(s.model()).render();
        var st = s.evidence().settings();
        for (String expected : List.of("treeproof 0.1.0 (seed 11)", "45 samples, 4 features after preparation",
                "log2(x+1) applied. 2 constant features dropped.", "Euclidean distances",
                "average (UPGMA), complete and Ward linkage", "k = 2 to 5 clusters", "from 20 replicates",
                "a subsample of 80% of the samples drawn without replacement", "(5 replicates each)",
                "19 null data sets", "(1 + 19)", "10 reference data sets", "principal axes", "(0.1, 0.9]",
                "adjusted p ≤ 0.05", "mean Jaccard at least 0.75", "every mean Jaccard above 0.5", "mean silhouette width above 0",
                "at least 5 samples counted as clusters", "first 5 replicates", "Ward2",
                "every cluster was set apart from its nearest cluster by a dip in density",
                "the quarter of the larger nearest the smaller's centroid", "had to reject one mode at p ≤ 0.05")) {
            assertTrue(md.contains(expected), "missing '" + expected + "' in\n" + md);
        }
        assertEquals(20, st.replicates());
        assertTrue(md.contains("The evidence supported k = 3 clusters with "
                + Names.linkage(s.recommendation().linkage()) + " linkage"), md);
    }

    @Test
    void everyCriterionIsCitedAndEveryReferenceHasItsDoi() {
        String md = MethodsParagraph.of(Studies.separated().model()).render();
        int split = md.indexOf("## References");
        String text = md.substring(0, split);
        String refs = md.substring(split);
        // the criteria's papers, with the DOIs their publishers give
        String[][] required = {{"Hubert & Arabie, 1985", "10.1007/BF01908075"},
            {"Monti et al., 2003", "10.1023/A:1023949509487"}, {"Şenbabaoğlu et al., 2014", "10.1038/srep06207"},
            {"Hennig, 2007", "10.1016/j.csda.2006.11.025"}, {"Rousseeuw, 1987", "10.1016/0377-0427(87)90125-7"},
            {"Tibshirani et al., 2001", "10.1111/1467-9868.00293"},
            {"Kaufman & Rousseeuw, 1990", "10.1002/9780470316801"}, {"Liu et al., 2008", "10.1198/016214508000000454"},
            {"Rousseeuw & Croux, 1993", "10.1080/01621459.1993.10476408"},
            {"Hartigan & Hartigan, 1985", "10.1214/aos/1176346577"}};
        for (String[] r : required) {
            assertTrue(text.contains(r[0]), "not cited: " + r[0]);
            assertTrue(refs.contains("https://doi.org/" + r[1]), "no DOI for " + r[0]);
        }
        List<String> entries = refs.lines().filter(l -> l.startsWith("- ")).toList();
        for (String entry : entries) {
            assertTrue(entry.matches(".* https://doi\\.org/10\\.\\S+$") || entry.matches(".* ISBN [0-9-]+\\.$"), entry);
            String firstAuthor = entry.substring(2, entry.indexOf(','));
            assertTrue(text.contains(firstAuthor), "listed but not cited: " + entry);
        }
        var sorted = new ArrayList<>(entries);
        sorted.sort(java.text.Collator.getInstance(Locale.ENGLISH));
        assertEquals(sorted, entries);
    }

    @Test
    void noConvincingStructureIsSaidPlainlyWithEachLinkagesBestAttempt() {
        Studies.Study s = Studies.noise();
        String md = MethodsParagraph.of(s.model()).render();
        assertTrue(md.contains("No convincing cluster structure was found"), md);
        assertTrue(md.contains("treated as one group"), md);
        assertFalse(md.contains("The evidence supported"));
        var rec = s.recommendation();
        for (LinkageEvidence le : s.evidence().linkages()) {
            var best = rec.assessments().stream().filter(a -> a.linkage() == le.linkage())
                    .sorted(rec.rule().order()).findFirst().orElseThrow();
            Matcher m = find(md, "With " + Names.linkage(le.linkage()) + " linkage the strongest solution is k = "
                    + "([0-9]+) \\(excess over the null " + NUM + ", adjusted p = " + NUM);
            assertEquals(best.k(), Integer.parseInt(m.group(1)));
            assertPrinted(m.group(2), best.facts().excess(), "excess");
            assertPrinted(m.group(3), best.facts().pAdjusted(), "adjusted p");
        }
    }

    @Test
    void aRejectedNullWithoutAnyPassingSolutionIsNotCalledClusterStructure() {
        // hand-built test outcome: statistic 5.95 beyond every one of 19 null maxima (Monte Carlo p = 1/20)
        var t = new org.treeproof.study.StructureTest(5.95, 0.05, 2e-4, 19, 10, new double[19]);
        var words = new ReasonWords(org.treeproof.study.DecisionRule.DEFAULT);
        String none = words.word(new org.treeproof.study.Reason.Structure(t, 0.05, false));
        assertTrue(none.startsWith("The data depart from the null data without clusters"), none);
        assertTrue(none.contains("not evidence of stable, cohesive, separated clusters"), none);
        assertFalse(none.contains("hold cluster structure"), none);
        String some = words.word(new org.treeproof.study.Reason.Structure(t, 0.05, true));
        assertTrue(some.startsWith("The data depart from null data without clusters (a unimodal law"), some);
        assertTrue(some.contains("0.050 is the smallest Monte Carlo p-value 19 null data sets allow"), some);
        // not rejected (9 of 19 null maxima reach 1.2: p = 10 / 20 = 0.5): no structure, whatever the rule found
        double[] maxima = new double[19];
        java.util.Arrays.fill(maxima, 0, 9, 2.0);
        var weak = new org.treeproof.study.StructureTest(1.2, 0.5, 0.4, 19, 10, maxima);
        String no = words.word(new org.treeproof.study.Reason.Structure(weak, 0.05, false));
        assertTrue(no.startsWith("No cluster structure was detected beyond"), no);
        assertTrue(no.endsWith("This is not evidence that the data hold no groups."), no);
    }

    @Test
    void replicateVotesSayWhatEachReplicateVotedFor() {
        var words = new ReasonWords(org.treeproof.study.DecisionRule.DEFAULT);
        var ward = org.treeproof.tree.Linkage.WARD;
        var supported = org.treeproof.study.Verdict.SUPPORTED;
        // hand-built shares: 150 of 200 replicates reproduce k = 5, 40 only k = 3, 10 neither
        String two = words.word(new org.treeproof.study.Reason.Votes(ward, supported, List.of(
                new org.treeproof.study.Recommendation.KShare(3, 0.2),
                new org.treeproof.study.Recommendation.KShare(5, 0.75)), 5, 0.75));
        assertEquals("Replicate by replicate, the finest supported solution on Ward linkage that the replicate "
                + "reproduces (its ARI with that cut at least 0.75) is k = 3 in 20%, k = 5 in 75% of replicates; 5% "
                + "reproduce none of them.", two);
        String one = words.word(new org.treeproof.study.Reason.Votes(ward, supported, List.of(
                new org.treeproof.study.Recommendation.KShare(2, 0.485)), 2, 0.75));
        assertTrue(one.endsWith("; 48.5% of replicates reproduce it (ARI with that cut at least 0.75).")
                || one.endsWith("; 49% of replicates reproduce it (ARI with that cut at least 0.75)."), one);
    }

    @Test
    void aTentativeSolutionSaysWhatHeldItBack() {
        Studies.Study s = Studies.tentative();
        String md = MethodsParagraph.of(s.model()).render();
        KEvidence e = chosen(s);
        assertTrue(md.contains("tentatively supported k = " + e.k()), md);
        assertTrue(md.contains("Null calibration was not run (--null-sets 0): no solution can be called better than "
                + "tentative."), md);
        // a failed condition is named in plain words
        var words = new ReasonWords(s.recommendation().rule());
        assertEquals("every cluster is stable (mean Jaccard at least 0.75)",
                words.condition(org.treeproof.study.Condition.EVERY_CLUSTER_STABLE));
    }

    @Test
    void distancesAloneAndTheBootstrapAreDescribedAsSuch() {
        String md = MethodsParagraph.of(Studies.distancesOnly().model()).render();
        assertTrue(md.contains("a matrix of dissimilarities between 45 samples, used as given"), md);
        assertTrue(md.contains("a bootstrap sample of n = 45 draws with replacement"), md);
        assertTrue(md.contains("not calibrated against null data"), md);
        assertTrue(md.contains("Only distances were given, so no null data could be drawn"), md);
        assertFalse(md.contains("Tibshirani"));
        assertFalse(md.contains("Calinski"));
        assertFalse(md.contains("Ward"));
        assertFalse(md.contains("null data set;"), "no null data sets were drawn");
        // the separation test needs the feature table: said so, and its work is not cited
        assertTrue(md.contains("Whether the clusters were separated by a dip in density could not be tested"), md);
        assertFalse(md.contains("Hartigan"), md);
        // the report lists neither the null data's nor the gap statistic's works when neither was computed
        String refs = HtmlReport.of(Studies.distancesOnly().model(), List.of()).render();
        refs = refs.substring(refs.indexOf("class=\"references\""));
        for (String absent : List.of("Tibshirani, R.", "Westfall, P.", "Liu, Y.", "Hope, A.", "Rousseeuw, P. J. & Croux")) {
            assertFalse(refs.contains(absent), absent);
        }
        assertTrue(refs.contains("Hubert, L.") && refs.contains("Hennig, C."), refs);
    }

    @Test
    void eachFlaggedClusterGetsASentence() {
        ReportModel m = Studies.separated().model();
        var clusters = new ArrayList<>(m.clusters());
        ClusterEvidence c = clusters.get(1);
        clusters.set(1, new ClusterEvidence(c.id(), c.size(), 0.6234, 0.2, 0.35, JaccardStability.Status.DOUBTFUL));
        String md = MethodsParagraph.of(Fixtures.withClusters(m, clusters)).render();
        assertTrue(md.contains("Cluster 2 (15 samples) was doubtful: mean Jaccard 0.62; it dissolved in 20% and was "
                + "recovered in 35% of the replicates."), md);
        assertFalse(md.contains("Cluster 1 ("));
    }

    @Test
    void theTextDependsOnlyOnTheStudyNotOnTheRunsTimingOrLocale() {
        Studies.Study s = Studies.bridged();
        String a = MethodsParagraph.of(ReportModel.of(s.evidence(), s.recommendation(),
                s.run("input.csv", "2024-01-01T00:00:00Z", 1, 3.0))).render();
        Locale before = Locale.getDefault();
        String b;
        try {
            Locale.setDefault(Locale.GERMANY);
            b = MethodsParagraph.of(ReportModel.of(s.evidence(), s.recommendation(),
                    s.run("input.csv", "2031-07-09T12:34:56Z", 2, 97.5))).render();
        } finally {
            Locale.setDefault(before);
        }
        assertEquals(a, b);
        assertFalse(a.contains("2024-01-01"));
        assertFalse(a.matches("(?s).*[0-9],[0-9].*"), "a decimal comma");
        assertTrue(a.contains("2 samples were flagged"), a);
    }

    @Test
    void whatThePreparationFoundIsListedAfterTheParagraphsAndBesideTheVerdict() {
        Studies.Study s = Studies.separated();
        RunInfo r = s.run();
        String note = "Note: 1 of the 4 features tested has values in separated modes on their own.";
        RunInfo withCaution = new RunInfo(r.toolName(), r.toolVersion(), r.inputFile(), r.inputSha256(), r.samples(),
                r.features(), r.preparation(), List.of(note), r.metric(), r.commandLine(), r.seed(), r.threads(),
                r.wallSeconds(), r.generatedAt());
        ReportModel m = ReportModel.of(s.evidence(), s.recommendation(), withCaution);
        String md = MethodsParagraph.of(m).render();
        int section = md.indexOf("## What the preparation found\n\n- " + note);
        assertTrue(section > md.indexOf("## Caution") && section < md.indexOf("## References"), md);
        assertEquals(md.indexOf(note), section + "## What the preparation found\n\n- ".length(), "only there");
        var d = org.jsoup.Jsoup.parse(HtmlReport.of(m, List.of()).render());
        assertEquals(List.of(note), d.getElementById("decision").select("ul.cautions li").eachText());
        // without cautions, neither part appears
        assertFalse(MethodsParagraph.of(s.model()).render().contains("What the preparation found"));
    }

    @Test
    void markupInPreparationStepsIsEscaped() {
        Studies.Study s = Studies.separated();
        RunInfo r = s.run();
        RunInfo marked = new RunInfo(r.toolName(), r.toolVersion(), r.inputFile(), r.inputSha256(), r.samples(),
                r.features(), List.of("kept the *top* 500 [variable] features_x _y <b> where p < 0.05 and q > 0"),
                r.metric(), r.commandLine(),
                r.seed(), r.threads(), r.wallSeconds(), r.generatedAt());
        String md = MethodsParagraph.of(ReportModel.of(s.evidence(), s.recommendation(), marked)).render();
        // a tag opener and an underscore at a word's edge are escaped; "<" before a space, ">" and an underscore
        // inside a word cannot be markup in CommonMark 0.31.2 and stay as they are
        assertTrue(md.contains("kept the \\*top\\* 500 \\[variable\\] features_x \\_y \\<b> where p < 0.05 and q > 0"),
                md);
    }
}
