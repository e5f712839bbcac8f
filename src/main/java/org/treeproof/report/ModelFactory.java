package org.treeproof.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;
import org.treeproof.explain.Explanation;
import org.treeproof.resample.Resampling;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Recommendation;
import org.treeproof.study.Reason;
import org.treeproof.study.Recommender;
import org.treeproof.study.StudySettings;
import org.treeproof.study.Verdict;
import org.treeproof.tree.Linkage;

/** Builds a {@link ReportModel} from a study's evidence and recommendation; checks that they belong together. */
final class ModelFactory {
    private final Evidence evidence;
    private final Recommendation rec;
    private final RunInfo run;
    private final ReasonWords words;

    ModelFactory(Evidence evidence, Recommendation rec, RunInfo run) {
        this.evidence = Objects.requireNonNull(evidence, "evidence");
        this.rec = Objects.requireNonNull(rec, "recommendation");
        this.run = Objects.requireNonNull(run, "run");
        this.words = new ReasonWords(rec.rule());
        check();
    }

    private void check() {
        StudySettings s = evidence.settings();
        if (run.samples() != evidence.samples() || run.features() != evidence.features()) {
            throw new IllegalArgumentException("the run describes " + run.samples() + " samples and " + run.features()
                    + " features; the evidence has " + evidence.samples() + " and " + evidence.features());
        }
        if (run.seed() != s.seed() || !run.metric().equals(s.metric().id())) {
            throw new IllegalArgumentException("the run's seed or metric differ from the study's settings");
        }
        LinkageEvidence le = linkageEvidence(rec.linkage());
        if (rec.k() > 1 && le.at(rec.k()) == null) {
            throw new IllegalArgumentException("the recommendation does not come from this evidence");
        }
        int assessed = 0;
        for (LinkageEvidence l : evidence.linkages()) {
            for (KEvidence e : l.byK()) {
                var a = rec.assessment(l.linkage(), e.k());
                if (a == null || !a.facts().equals(Recommender.facts(l, e))) {
                    throw new IllegalArgumentException("the recommendation does not come from this evidence");
                }
                assessed++;
            }
        }
        if (assessed != rec.assessments().size()) {
            throw new IllegalArgumentException("the recommendation does not come from this evidence");
        }
        if (rec.linkages().size() != evidence.linkages().size()) {
            throw new IllegalArgumentException("the recommendation compares " + rec.linkages().size()
                    + " linkages; the evidence has " + evidence.linkages().size());
        }
    }

    private LinkageEvidence linkageEvidence(Linkage l) {
        return evidence.linkages().stream().filter(x -> x.linkage() == l).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("the recommended linkage " + l.id()
                        + " is not in the evidence"));
    }

    ReportModel build(LabelComparison labels, Explanation explanation) {
        var tables = new ArrayList<EvidenceTable>();
        for (LinkageEvidence le : evidence.linkages()) {
            tables.add(table(le));
        }
        Decision decision = decision(explanation);
        List<ClusterEvidence> clusters = rec.clusters();
        var notes = new ArrayList<String>();
        notes.addAll(dataNotes());
        var figures = new ArrayList<>(Figures.of(evidence, rec, notes));
        if (explanation != null) {
            figures.addAll(ExplainFigures.of(explanation));
        }
        return new ReportModel(run, evidence.settings(), rec.rule(), decision, tables, comparison(),
                clusters, rec.flaggedSamples(), labels, settingsList(), caution(), figures, notes, explanation,
                BranchPValueReport.clusterBranches(evidence, rec));
    }

    private EvidenceTable table(LinkageEvidence le) {
        var rows = new ArrayList<EvidenceRow>();
        for (KEvidence e : le.byK()) {
            NullStability n = e.stability().nullModel();
            double nan = Double.NaN;
            Verdict v = rec.assessment(le.linkage(), e.k()).verdict();
            boolean recommended = rec.k() > 1 && le.linkage() == rec.linkage() && e.k() == rec.k();
            rows.add(new EvidenceRow(e.k(), e.cutHeight(), e.tieDependent(), e.stability().ari().mean(),
                    e.stability().ari().low(), e.stability().ari().high(), e.stability().ari().count(),
                    n == null ? nan : n.ariMean(), n == null ? nan : n.ariLow(), n == null ? nan : n.ariHigh(),
                    e.stability().pac(), n == null ? nan : n.pacMean(), n == null ? nan : n.silhouetteMean(),
                    n == null ? nan : n.excess(), n == null ? nan : n.pValueAdjusted(), e.separationP(), e.outliers(),
                    e.worstJaccard(), e.silhouette(), e.calinskiHarabasz(),
                    e.daviesBouldin(), e.dunn(), e.gap(), e.gapSE(), v, recommended));
        }
        return new EvidenceTable(le.linkage(), le.copheneticCorrelation(), le.tree().monotone(), le.gapChoice(),
                le.gap() != null && le.gap().ruleMet(), rows);
    }

    private Decision decision(Explanation explanation) {
        String link = Names.linkage(rec.linkage());
        String headline = switch (rec.verdict()) {
            case SUPPORTED -> f("The evidence supports %d clusters with %s linkage.", rec.k(), link);
            case TENTATIVE -> f("The evidence tentatively supports %d clusters with %s linkage; it falls short of full "
                    + "support.", rec.k(), link);
            case UNSUPPORTED -> rec.outlierCount() == 0
                    ? "No convincing cluster structure was found; the samples are treated as one group."
                    : f("No convincing cluster structure was found; the samples are treated as one group, with %d far "
                            + "sample%s set aside as outlier%s.", rec.outlierCount(), rec.outlierCount() == 1 ? "" : "s",
                            rec.outlierCount() == 1 ? "" : "s");
        };
        var criteria = new ArrayList<Decision.CriterionRow>();
        for (Recommendation.CriterionChoice c : rec.criteria()) {
            criteria.add(new Decision.CriterionRow(c.name(), c.k(), c.basis(), c.k() == rec.k()));
        }
        var reasons = new ArrayList<String>();
        // a covariate the clusters largely follow leads the reasons: it is what a reviewer checks first
        if (explanation != null) {
            explanation.flags().forEach(flag -> reasons.add(ReasonWords.covariate(flag)));
        }
        reasons.addAll(reasons());
        var outliers = java.util.Arrays.stream(rec.clustering().outliers()).mapToObj(evidence.sampleIds()::get)
                .toList();
        return new Decision(rec.verdict(), headline, rec.linkage(), rec.k(), rec.cutHeight(), rec.levels(),
                reasons, criteria, outliers, rec.minClusterSize(), rec.structureTest());
    }

    private LinkageComparison comparison() {
        var rows = new ArrayList<LinkageComparison.Row>();
        for (Recommendation.LinkageSummary s : rec.linkages()) {
            rows.add(new LinkageComparison.Row(s.linkage(), s.copheneticCorrelation(), s.k(), s.verdict(), s.ariMean(),
                    s.pac(), s.silhouette(), s.worstJaccard(), s.linkage() == rec.linkage()));
        }
        // the recommendation's own reasons on the linkages, when it gave them; otherwise one of ours
        var why = new ArrayList<String>();
        for (Reason r : rec.reasons()) {
            if (r instanceof Reason.OtherLinkages || r instanceof Reason.BestFailed) {
                why.add(clean(words.word(r)));
            }
        }
        if (why.isEmpty()) {
            why.add(rows.size() == 1 ? f("Only %s linkage was assessed.", rec.linkage().id())
                    : rec.verdict() == Verdict.UNSUPPORTED
                            ? f("No linkage gives a convincing solution; the %s tree is shown because it represents "
                                    + "the distances best (highest cophenetic correlation).", rec.linkage().id())
                            : f("%s linkage gives the best-supported solution under the decision rule (best verdict, "
                                    + "then larger excess over the null, then higher smallest cluster Jaccard, then "
                                    + "higher cophenetic correlation; within the tree, the finest supported cut).",
                                    capital(rec.linkage().id())));
        }
        return new LinkageComparison(rows, rec.agreement(), rec.linkage(), why);
    }

    /**
     * The recommendation's sentences as the report prints them: a value that was not a number (a cluster that no
     * replicate held has no mean Jaccard) shows as the report's dash, never as "NaN".
     */
    private List<String> reasons() {
        return rec.reasons().stream().map(r -> clean(words.word(r))).toList();
    }

    private static String clean(String sentence) {
        return NOT_A_NUMBER.matcher(sentence).replaceAll(Numbers.MISSING);
    }

    private static final Pattern NOT_A_NUMBER = Pattern.compile("-?\\b(?:NaN|Infinity)\\b");

    private List<String> dataNotes() {
        var out = new ArrayList<String>();
        StudySettings s = evidence.settings();
        if (evidence.features() == 0) {
            out.add("Only distances were given, so the scores that need a data table (Calinski-Harabasz, "
                    + "Davies-Bouldin, the gap statistic and null calibration) were not computed.");
        } else {
            if (s.nullSets() == 0) {
                out.add("Null calibration was not run (0 null data sets): stability cannot be compared with "
                        + "structureless data, so no solution can be more than tentative.");
            }
            if (s.referenceSets() == 0) {
                out.add("The gap statistic was not computed (0 reference sets).");
            }
        }
        return out;
    }

    private List<ReportModel.Setting> settingsList() {
        StudySettings s = evidence.settings();
        DecisionRule r = rec.rule();
        boolean data = evidence.features() > 0;
        var out = new ArrayList<ReportModel.Setting>();
        out.add(new ReportModel.Setting("Linkages compared",
                String.join(", ", s.linkages().stream().map(Linkage::id).toList())));
        out.add(new ReportModel.Setting("Dissimilarity (metric)", data ? s.metric().id()
                : org.treeproof.distance.Metric.PRECOMPUTED + ": the distance table's own, not known to treeproof"));
        out.add(new ReportModel.Setting("Numbers of clusters assessed", "2 to " + s.maxK()));
        out.add(new ReportModel.Setting("Stability replicates", Integer.toString(s.replicates())));
        out.add(new ReportModel.Setting("Resampling of samples", s.resampling().id()));
        out.add(new ReportModel.Setting("Sample fraction", s.resampling() == Resampling.SUBSAMPLE
                ? Numbers.plain(s.sampleFraction()) : "not used (the bootstrap draws n samples with replacement)"));
        out.add(new ReportModel.Setting("Feature fraction", Numbers.plain(s.featureFraction())
                + (s.resamplesFeatures() ? "" : " (all features in every replicate)")));
        // Only settings that took effect: no reference or null data are drawn from a distance table.
        boolean gap = data && s.referenceSets() > 0;
        boolean nulls = data && s.nullSets() > 0;
        out.add(new ReportModel.Setting("Gap statistic reference sets", gap ? Integer.toString(s.referenceSets())
                : data ? "0 (not computed)" : "none (not computed: distances only)"));
        if (gap) {
            out.add(new ReportModel.Setting("Gap statistic reference data", s.gapReference().userName()));
        }
        out.add(new ReportModel.Setting("Null data sets", nulls ? Integer.toString(s.nullSets())
                : data ? "0 (no null calibration)" : "none (not run: distances only)"));
        if (nulls) {
            out.add(new ReportModel.Setting("Replicates per null data set", Integer.toString(s.nullReplicates())));
        }
        out.add(new ReportModel.Setting("PAC interval", "(" + Numbers.plain(s.pacLow()) + ", "
                + Numbers.plain(s.pacHigh()) + "]"));
        out.addAll(BranchPValueReport.settings(s));
        out.add(new ReportModel.Setting("Seed", Long.toString(s.seed())));
        out.add(new ReportModel.Setting("Smallest cluster (samples; smaller branches are outliers)",
                Integer.toString(s.minClusterSize(evidence.samples())) + (s.minClusterSize() == 0
                        ? " (default: the larger of 5 and 1% of the samples)" : "")));
        out.add(new ReportModel.Setting("Null test level (p at most)", Numbers.plain(r.alpha())));
        out.add(new ReportModel.Setting("Stable cluster (mean Jaccard at least)", Numbers.plain(r.stableJaccard())));
        out.add(new ReportModel.Setting("Dissolved cluster (mean Jaccard at most)", Numbers.plain(r.dissolvedJaccard())));
        out.add(new ReportModel.Setting("Reasonable fit (average silhouette above)",
                Numbers.plain(r.reasonableSilhouette())));
        out.add(new ReportModel.Setting("No substantial structure (average silhouette at most)",
                Numbers.plain(r.weakSilhouette())));
        out.add(new ReportModel.Setting("Unstable sample (stays with its cluster in fewer than)",
                Numbers.percent(r.unstableSample()) + " of replicates"));
        return out;
    }

    private String caution() {
        String base = "Stability and fit are statistical evidence about this data set, not validation of subtypes. "
                + "Clusters that steer clinical or other consequential decisions need review by people who know the "
                + "domain and confirmation in independent data.";
        // resampling and null data cannot tell a cut through a continuous path from a gap between groups; the
        // separation test looks along straight lines, which a bending or branching path can defeat (RELIABILITY.md,
        // "Continua")
        String continuum = " Stable clusters can also be segments of a continuum (a gradient in time, dose or "
                + "development): the separation test asks for a dip in density between each cluster and its nearest, "
                + "but it looks along a straight line, which a path that bends or branches can defeat, so look for "
                + "gaps between the clusters in the heat map (a tree is no guide: its merge "
                + "heights can grow with cluster size and show a gap at every top merge). Reproducible clusters can also follow a "
                + "processing batch, site or date: check them against such covariates (--covariates).";
        return switch (rec.verdict()) {
            case SUPPORTED -> base + continuum;
            case TENTATIVE -> base + continuum + " This solution is tentative: treat its clusters as hypotheses to test.";
            case UNSUPPORTED -> base + " Finding no convincing structure here does not prove that none exists: it may "
                    + "lie in features, samples or scales this study did not examine.";
        };
    }

    static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }

    static String capital(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
