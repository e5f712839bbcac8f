package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.text.Collator;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.commons.text.translate.CharSequenceTranslator;
import org.apache.commons.text.translate.LookupTranslator;
import org.treeproof.resample.Resampling;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.StudySettings;
import org.treeproof.study.Verdict;
import org.treeproof.tree.Linkage;

/**
 * Renders a {@link ReportModel} as {@code methods.md}: a methods paragraph to paste into a paper, a paragraph on
 * the result with its key figures, and the references with their DOIs.
 *
 * <p>Everything comes from the model and numbers are printed with {@link java.util.Locale#ROOT}. The text leaves out
 * what cannot change a result (threads, wall time, the time of the run), so the same study always gives the same
 * text.
 */
public final class MethodsParagraph {
    /**
     * Markdown's inline markup characters, escaped where text comes from outside the renderer. A {@code <} is
     * escaped only where it could open raw HTML or an autolink (before a letter, {@code /}, {@code !} or
     * {@code ?}; CommonMark spec 0.31.2, "Raw HTML" and "Autolinks"), a {@code >} never (it marks a block quote
     * only at the start of a line, and every paragraph here starts with the renderer's own words), and a {@code _}
     * only where it is not inside a word (an underscore between letters or digits cannot open or close emphasis;
     * "Emphasis and strong emphasis"), so that "p < 0.001" and feature names such as petal_width_cm read the same
     * when the text is pasted as it is.
     */
    private static final CharSequenceTranslator MARKDOWN = new LookupTranslator(Map.of("\\", "\\\\", "`", "\\`",
            "*", "\\*", "[", "\\[", "]", "\\]"));
    private static final java.util.regex.Pattern TAG_OPENER = java.util.regex.Pattern.compile("<(?=[A-Za-z/!?])");
    private static final java.util.regex.Pattern LOOSE_UNDERSCORE =
            java.util.regex.Pattern.compile("(?<![\\p{L}\\p{N}])_|_(?![\\p{L}\\p{N}])");

    private final ReportModel model;

    private MethodsParagraph(ReportModel model) {
        this.model = model;
    }

    /** The renderer of one model. */
    public static MethodsParagraph of(ReportModel model) {
        return new MethodsParagraph(java.util.Objects.requireNonNull(model, "model"));
    }

    /** The Markdown text, ending with a newline. */
    public String render() {
        Set<Reference> cited = new LinkedHashSet<>();
        var sb = new StringBuilder("# Methods\n\n");
        sb.append(methods(cited)).append("\n\n");
        model.explained().map(x -> ExplainProse.methods(x, cited)).filter(m -> !m.isEmpty())
                .ifPresent(m -> sb.append(md(String.join(" ", m))).append("\n\n"));
        sb.append("# Result\n\n").append(result()).append("\n\n");
        model.explained().ifPresent(x -> sb.append(explained(x)));
        sb.append("## Caution\n\n").append(md(model.caution())).append("\n\n");
        if (!model.run().cautions().isEmpty()) {
            // what the preparation found is for the analyst, not the paper: listed, outside the paragraphs
            sb.append("## What the preparation found\n\n");
            for (String c : model.run().cautions()) {
                sb.append("- ").append(md(c)).append('\n');
            }
            sb.append('\n');
        }
        sb.append("## References\n\n");
        List<Reference> refs = new ArrayList<>(cited);
        // alphabetical as a reader expects (Şenbabaoğlu among the S, Müllner before Murtagh), not by code point
        Collator collator = Collator.getInstance(Locale.ENGLISH);
        refs.sort(Comparator.comparing(Reference::entry, collator));
        for (Reference r : refs) {
            sb.append("- ").append(r.entry()).append(r.doi().isEmpty() ? "" : " https://doi.org/" + r.doi())
                    .append('\n');
        }
        return sb.toString();
    }

    private static String cite(Set<Reference> cited, Reference r) {
        cited.add(r);
        return r.cite();
    }

    private static String narrative(Set<Reference> cited, Reference r) {
        cited.add(r);
        return r.narrative();
    }

    private String methods(Set<Reference> c) {
        StudySettings s = model.settings();
        DecisionRule rule = model.rule();
        RunInfo run = model.run();
        var out = new ArrayList<String>();
        out.add(f("Samples were clustered hierarchically with %s %s (seed %d).", md(run.toolName()),
                md(run.toolVersion()), s.seed()));
        String steps = String.join(" ", run.preparation().stream().map(MethodsParagraph::md).toList());
        // each step's own sentence names the method; its sources join the references
        c.addAll(Reference.ofPreparation(run));
        if (model.hasData()) {
            out.add(run.preparation().isEmpty()
                    ? f("The data (%d samples, %d features) were used as given.", run.samples(), run.features())
                    : f("The data (%d samples, %d features after preparation) were prepared in these steps. %s",
                            run.samples(), run.features(), steps));
            if (run.centeredWithin() != null) {
                out.add(f("Removing the batch means (as in %s) leaves groups spread evenly over the levels of '%s' "
                        + "as they were, but shrinks the difference of groups spread unevenly over them (%s).",
                        cite(c, Reference.SIMS), md(run.centeredWithin()), cite(c, Reference.NYGAARD)));
            }
            out.add(f("Dissimilarities between samples were %s.", Names.metricProse(s.metric())));
        } else {
            // each step ends with its own full stop
            out.add(run.preparation().isEmpty()
                    ? f("The input was a matrix of dissimilarities between %d samples, used as given.", run.samples())
                    : f("The input was a matrix of dissimilarities between %d samples. %s", run.samples(), steps));
        }
        out.add(f("Trees were built with %s linkage by the algorithms of %s, and each tree was cut into k = 2 to %d "
                + "clusters.%s", Prose.and(s.linkages().stream().map(Names::linkageProse).toList()), narrative(c,
                        Reference.MULLNER), s.maxK(), ward(c)));
        String draw = s.resampling() == Resampling.SUBSAMPLE
                ? f("a subsample of %s%% of the samples drawn without replacement", Numbers.plain(100 * s.sampleFraction()))
                : f("a bootstrap sample of n = %d draws with replacement", run.samples());
        String features = s.resamplesFeatures() ? f(" and %s%% of the features, with distances recomputed on them",
                Numbers.plain(100 * s.featureFraction())) : "";
        out.add(f("The stability of each cut was estimated from %d replicates, each %s%s, reclustered with the same "
                + "linkage and cut into the same number of clusters.", s.replicates(), draw, features));
        out.add(f("Each replicate's clusters were compared with the full-data clusters over the samples it held by the "
                + "adjusted Rand index (ARI; %s); the replicates' co-clustering was summarised in a consensus matrix "
                + "(%s) and its proportion of ambiguous clustering (PAC, the share of sample pairs with consensus in "
                + "(%s, %s]; %s); and each cluster's stability by the mean Jaccard similarity of its best match in the "
                + "replicates (%s).", cite(c, Reference.HUBERT_ARABIE), cite(c, Reference.MONTI),
                Numbers.plain(s.pacLow()), Numbers.plain(s.pacHigh()), cite(c, Reference.SENBABAOGLU),
                cite(c, Reference.HENNIG)));
        int m = model.decision().minClusterSize();
        out.add(f("Only branches of at least %d samples counted as clusters, in the full-data trees and in every "
                + "replicate%s; samples on smaller branches were set aside as outliers, left out of k "
                + "and of the fit measures, and counted as clusters of their own in the ARI and consensus. In the "
                + "recommended solution, small branches that joined their cluster (or, with no cluster, the tree) more "
                + "than %s times higher than its first split into two such branches were also set aside as outliers. "
                + "A replicate was cut into as many clusters as the full-data solution had with at least that many "
                + "(scaled to the replicate's size) of their samples drawn.", m,
                model.nullCalibrated() ? " and null data set" : "",
                Numbers.plain(org.treeproof.study.Recommender.FAR_FACTOR)));
        String branches = BranchPValueReport.methods(s, c);
        if (!branches.isEmpty()) {
            out.add(branches);
        }
        if (model.nullCalibrated()) {
            String nullData = s.metric().binaryOnly() ? Names.nullModelProse(s.metric())
                    : f("drawn from a unimodal elliptical distribution with the data's principal axes and robust "
                    + "scales along them (as in %s, but measured by the estimator Qn of %s, the first quartile of the "
                    + "pairwise distances, so that two groups along an axis do not widen the null) and distances from the "
                    + "centre drawn from a power exponential law (%s) fitted to the median and 95%% quantile of the "
                    + "data's, so that heavy tails are kept and clusters are not", cite(c, Reference.LIU),
                    cite(c, Reference.ROUSSEEUW_CROUX), cite(c, Reference.GOMEZ));
            out.add(f("To tell structure from noise, the same procedure (%d replicates each) was applied to %d null "
                    + "data sets %s. For each linkage and k, the excess "
                    + "over the null was the mean ARI and the average silhouette, each standardised by the null sets' "
                    + "mean and standard deviation at that linkage and k, added together; it ordered the solutions. "
                    + "The mean ARI's difference from the null's was divided by the standard deviation of the "
                    + "difference between two means of %d replicates, one from the data and one from a null set, "
                    + "so that the spread of the data's own replicates counted as well as the null's (a Welch-type "
                    + "standardised difference, %s). "
                    + "For testing, the same sum was formed with the observed solution (its first %d replicates, as "
                    + "many as each null set had) and the null sets that had a cut at that linkage and k "
                    + "standardised alike, by their pooled mean and standard deviation. A solution's p-value was "
                    + "adjusted for the choice among every linkage and k by the maximum statistic (%s): the Monte "
                    + "Carlo share (1 + sets reaching it) / (1 + %d) (%s) of null sets whose largest statistic over "
                    + "all linkages and k reached the solution's. The largest observed statistic against the null "
                    + "sets' largest is the test of any cluster structure; beside its Monte Carlo p-value a p-value "
                    + "from a normal distribution fitted to the null sets' largest is reported.", s.nullReplicates(),
                    s.nullSets(), nullData, s.nullReplicates(), cite(c, Reference.WELCH), s.nullReplicates(),
                    cite(c, Reference.WESTFALL_YOUNG), s.nullSets(),
                    cite(c, Reference.HOPE)));
        } else {
            out.add("Stability was not calibrated against null data.");
        }
        String fit = f("Fit was measured by the average silhouette width (%s)", cite(c, Reference.ROUSSEEUW));
        if (model.hasData()) {
            fit += f(", the Calinski-Harabasz index (%s), the Davies-Bouldin index (%s)", cite(c,
                    Reference.CALINSKI_HARABASZ), cite(c, Reference.DAVIES_BOULDIN));
        }
        fit += f(" and the Dunn index (%s)", cite(c, Reference.DUNN));
        if (model.gapComputed()) {
            fit += f("; the gap statistic (%s) was computed with %d reference data sets %s, "
                    + "taking the smallest k with Gap(k) ≥ Gap(k+1) − s(k+1)", cite(c, Reference.TIBSHIRANI),
                    s.referenceSets(), Names.gapReferenceProse(s.gapReference()));
        }
        out.add(fit + ".");
        out.add(rule(c, rule));
        return String.join(" ", out);
    }

    private String ward(Set<Reference> c) {
        if (!model.settings().linkages().contains(Linkage.WARD)) {
            return "";
        }
        return f(" Ward linkage (%s) was computed in the variant that %s call Ward2.", cite(c, Reference.WARD),
                narrative(c, Reference.MURTAGH_LEGENDRE));
    }

    private String rule(Set<Reference> c, DecisionRule r) {
        if (model.nullCalibrated()) {
            return f("A solution was called supported when it beat the null data (adjusted p ≤ %s), every cluster "
                    + "was cohesive (its members' mean silhouette width above 0; %s)%s and every cluster was stable "
                    + "(mean Jaccard at least %s; %s); tentative when it beat the null data, every cluster was "
                    + "cohesive%s and no cluster dissolved (every mean Jaccard above %s) but one cluster, and only "
                    + "one, was doubtful; and unsupported otherwise.%s No threshold on the average silhouette entered the "
                    + "verdict; it was read only as a description (%s). Among the solutions the better verdict was "
                    + "preferred, then the larger excess over the null, the higher smallest cluster Jaccard and the "
                    + "higher cophenetic correlation, leaving out supported solutions that existed over less than half "
                    + "the relative range of cut heights of the linkage's longest-lasting one (passing states of the "
                    + "tree). When the first solution so ordered was supported, the finest supported cut of any "
                    + "linkage's tree was recommended (among equally fine cuts, that of the linkage whose best "
                    + "solution came first), its linkage's coarser supported cuts reported as levels of nested "
                    + "structure; otherwise the first solution was recommended. When no solution was better than "
                    + "unsupported, the data were treated as one group (k = 1).",
                    Numbers.plain(r.alpha()),
                    cite(c, Reference.ROUSSEEUW), model.hasData() ? ", every cluster was set apart from its nearest "
                            + "cluster by a dip in density (described below)" : "", Numbers.plain(r.stableJaccard()),
                    cite(c, Reference.HENNIG), model.hasData() ? " and separated" : "",
                    Numbers.plain(r.dissolvedJaccard()), separation(c, r), cite(c, Reference.KAUFMAN_ROUSSEEUW));
        }
        return f("Without null data no solution could be called more than tentative, which needed every cluster "
                + "cohesive (its members' mean silhouette width above 0)%s and stable (mean Jaccard at least %s; %s), a mean ARI of at least %s and an average silhouette above "
                + "%s, the reading of a reasonable structure of %s; among such solutions the higher mean ARI was "
                + "preferred, then the higher smallest cluster Jaccard and the higher cophenetic correlation.%s",
                model.hasData() ? ", set apart from its nearest cluster by a dip in density (described below)," : "",
                Numbers.plain(r.stableJaccard()), cite(c, Reference.HENNIG), Numbers.plain(r.stableJaccard()),
                Numbers.plain(r.reasonableSilhouette()), narrative(c, Reference.KAUFMAN_ROUSSEEUW), separation(c, r));
    }

    /**
     * How the separation condition was tested ({@link org.treeproof.score.Separation}); for a distance table, that
     * it could not be.
     */
    private String separation(Set<Reference> c, DecisionRule r) {
        if (!model.hasData()) {
            return " Whether the clusters were separated by a dip in density could not be tested: it needs the "
                    + "feature table, and only distances were given.";
        }
        return f(" Separation was tested for each cluster against its nearest (closest centroids): the smaller of "
                + "the two and the quarter of the larger nearest the smaller's centroid (at least as many samples as "
                + "the smaller had) were placed on the line joining the two centroids (each sample's own centroid "
                + "computed without it), the two sides weighed equally, and the dip test of unimodality (%s, its "
                + "p-value read at the effective size of two equally weighed samples) had to reject one mode at "
                + "p ≤ %s. This condition is meant to tell groups from "
                + "pieces cut from a continuum (a chain, a gradient), which are stable and beat unimodal null data but "
                + "have no dip between them. As the clusters come from the same data, these p-values screen for a gap "
                + "rather than give exact error rates.",
                cite(c, Reference.HARTIGAN), Numbers.plain(r.alpha()));
    }

    /**
     * The result: the decision's headline and its reasons, as the report words them (the same sentences as the
     * report's decision section), then the flagged clusters and samples.
     */
    private String result() {
        Decision d = model.decision();
        var out = new ArrayList<String>();
        if (d.verdict() == Verdict.UNSUPPORTED) {
            out.add(d.headline());
        } else {
            EvidenceRow r = model.recommendedRow().orElseThrow();
            out.add(f("The evidence %s k = %d clusters with %s linkage (%s).", d.verdict() == Verdict.SUPPORTED
                    ? "supported" : "tentatively supported", d.k(), Names.linkage(d.linkage()),
                    Prose.cut(r, model.table(d.linkage()))));
        }
        for (String reason : d.reasons()) {
            out.add(md(reason));
        }
        if (d.hasClusters()) {
            for (ClusterEvidence ce : model.flaggedClusters()) {
                out.add(f("Cluster %d (%d samples) was %s: mean Jaccard %s; it dissolved in %s and was recovered in %s "
                        + "of the replicates.", ce.id(), ce.size(), ce.status().label(), Numbers.fixed(ce.jaccard(), 2),
                        Numbers.percent(ce.dissolvedShare()), Numbers.percent(ce.recoveredShare())));
            }
            String branches = BranchPValueReport.result(model.clusterBranches());
            if (!branches.isEmpty()) {
                out.add(branches);
            }
            int flagged = model.flaggedSamples().size();
            if (flagged > 0) {
                out.add(f("%d sample%s flagged for low stability or a negative silhouette.", flagged,
                        flagged == 1 ? " was" : "s were"));
            }
        }
        if (!d.outliers().isEmpty()) {
            int shown = Math.min(20, d.outliers().size());
            out.add(f("Outliers: %s%s.", String.join(", ", d.outliers().subList(0, shown).stream()
                    .map(MethodsParagraph::md).toList()), shown < d.outliers().size()
                            ? f(" and %d more (clusters.csv lists all)", d.outliers().size() - shown) : ""));
        }
        return String.join(" ", out);
    }

    /** The explanation's result: one sentence per cluster, the covariates, the alternative analyses, the caution. */
    private static String explained(org.treeproof.explain.Explanation x) {
        var out = new ArrayList<String>();
        if (x.features() != null) {
            out.addAll(ExplainProse.clusterSentences(x.features()));
        }
        if (x.covariates() != null && !x.covariates().isEmpty()) {
            out.add(ExplainProse.covariates(x.covariates()));
        }
        if (x.sensitivity() != null) {
            out.add(ExplainProse.sensitivity(x.sensitivity()));
        }
        out.addAll(x.notes());
        if (x.features() != null) {
            out.add(ExplainProse.doubleDipping());
        }
        return out.isEmpty() ? "" : md(String.join(" ", out)) + "\n\n";
    }

    private static String md(String text) {
        String escaped = TAG_OPENER.matcher(MARKDOWN.translate(text)).replaceAll("\\\\<");
        return LOOSE_UNDERSCORE.matcher(escaped).replaceAll("\\\\_");
    }
}
