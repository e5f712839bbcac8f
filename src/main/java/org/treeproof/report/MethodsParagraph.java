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
    /** Markdown's inline markup characters, escaped where text comes from outside the renderer. */
    private static final CharSequenceTranslator MARKDOWN = new LookupTranslator(Map.of("\\", "\\\\", "`", "\\`",
            "*", "\\*", "_", "\\_", "[", "\\[", "]", "\\]", "<", "\\<", ">", "\\>"));

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
        sb.append("# Result\n\n").append(result()).append("\n\n");
        sb.append("## References\n\n");
        List<Reference> refs = new ArrayList<>(cited);
        // alphabetical as a reader expects (Şenbabaoğlu among the S, Müllner before Murtagh), not by code point
        Collator collator = Collator.getInstance(Locale.ENGLISH);
        refs.sort(Comparator.comparing(Reference::entry, collator));
        for (Reference r : refs) {
            sb.append("- ").append(r.entry()).append(" https://doi.org/").append(r.doi()).append('\n');
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
        if (model.hasData()) {
            out.add(run.preparation().isEmpty()
                    ? f("The data (%d samples, %d features) were used as given.", run.samples(), run.features())
                    : f("The data (%d samples, %d features after preparation) were prepared in these steps. %s",
                            run.samples(), run.features(), steps));
            out.add(f("Dissimilarities between samples were %s.", Names.metricProse(s.metric())));
        } else {
            out.add(f("The input was a matrix of dissimilarities between %d samples%s.", run.samples(),
                    run.preparation().isEmpty() ? ", used as given" : ". " + steps));
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
        if (model.nullCalibrated()) {
            out.add(f("To tell stability from chance, the same procedure (%d replicates each) was applied to %d null "
                    + "data sets %s; p-values are Monte Carlo p-values, (1 + null sets at least as "
                    + "stable) / (1 + %d) (%s).", s.nullReplicates(), s.nullSets(), Names.nullModelProse(s.metric()),
                    s.nullSets(), cite(c, Reference.HOPE)));
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
        String kr = model.nullCalibrated() ? cite(c, Reference.KAUFMAN_ROUSSEEUW)
                : narrative(c, Reference.KAUFMAN_ROUSSEEUW);
        if (model.nullCalibrated()) {
            return f("A solution was eligible when it beat the null data on stability plus separation (its mean ARI plus "
                    + "its average silhouette width exceeded that of the null data sets, each clustered and resampled "
                    + "the same way; Monte Carlo p ≤ %s), its mean ARI was at least %s, and no cluster dissolved (every "
                    + "mean Jaccard above %s). An eligible solution was called supported when, in addition, every "
                    + "cluster was stable (mean Jaccard at least %s; %s) and its average silhouette was above %s (%s); "
                    + "tentative otherwise; when no solution was eligible the verdict was unsupported (k = 1). Among the "
                    + "eligible solutions the better verdict was preferred, then the higher average silhouette, the "
                    + "higher smallest cluster Jaccard and the higher cophenetic correlation.", Numbers.plain(r.alpha()),
                    Numbers.plain(r.stableJaccard()), Numbers.plain(r.dissolvedJaccard()),
                    Numbers.plain(r.stableJaccard()), Reference.HENNIG.cite(), Numbers.plain(r.reasonableSilhouette()),
                    kr);
        }
        return f("Without null calibration a solution was eligible when its mean ARI was at least %s and no cluster "
                + "dissolved (every mean Jaccard above %s; %s), and could be called no more than tentative; the "
                + "average silhouette was read as %s suggest (above %s, a reasonable structure). Among the eligible solutions the higher "
                + "average silhouette was preferred, then the higher smallest cluster Jaccard and the higher cophenetic "
                + "correlation.", Numbers.plain(r.stableJaccard()), Numbers.plain(r.dissolvedJaccard()),
                Reference.HENNIG.cite(), kr, Numbers.plain(r.reasonableSilhouette()));
    }

    private String result() {
        Decision d = model.decision();
        var out = new ArrayList<String>();
        if (d.verdict() == Verdict.UNSUPPORTED) {
            out.add(f("No convincing cluster structure was found: no cut of any tree into 2 to %d clusters met the "
                    + "conditions above, so the samples are treated as a single group.", model.settings().maxK()));
            for (EvidenceTable t : model.evidence()) {
                out.add(unsupportedLinkage(t));
            }
        } else {
            EvidenceRow r = model.recommendedRow().orElseThrow();
            out.add(f("The evidence %s k = %d clusters with %s linkage (%s).", d.verdict() == Verdict.SUPPORTED
                    ? "supported" : "tentatively supported", d.k(), Names.linkage(d.linkage()), Prose.cut(r, model.table(d.linkage()))));
            out.add(stability(r) + f(" The smallest cluster Jaccard was %s and the average silhouette %s.",
                    Numbers.fixed(r.worstJaccard(), 2), Numbers.fixed(r.silhouette(), 2)));
            if (d.verdict() == Verdict.TENTATIVE) {
                out.add(whyTentative(r));
            }
            EvidenceTable t = model.table(d.linkage());
            if (t.hasGap()) {
                out.add(f("The gap statistic chose k = %d%s.", t.gapChoice(), t.gapRuleMet() ? ""
                        : ", the largest k examined, because its rule was not met below it"));
            }
            if (d.levels().size() > 1) {
                out.add(f("k = %s were each supported with every cluster stable; as cuts of one tree they are nested.",
                        Prose.and(d.levels().stream().map(String::valueOf).toList())));
            }
            for (ClusterEvidence ce : model.flaggedClusters()) {
                out.add(f("Cluster %d (%d samples) was %s: mean Jaccard %s; it dissolved in %s and was recovered in %s "
                        + "of the replicates.", ce.id(), ce.size(), ce.status().label(), Numbers.fixed(ce.jaccard(), 2),
                        Numbers.percent(ce.dissolvedShare()), Numbers.percent(ce.recoveredShare())));
            }
            int flagged = model.flaggedSamples().size();
            if (flagged > 0) {
                out.add(f("%d sample%s flagged for low stability or a negative silhouette.", flagged,
                        flagged == 1 ? " was" : "s were"));
            }
        }
        return String.join(" ", out);
    }

    private String whyTentative(EvidenceRow r) {
        DecisionRule rule = model.rule();
        if (!r.calibrated()) {
            return "It is tentative because, without null calibration, no solution can be more than tentative.";
        }
        if (r.worstJaccard() < rule.stableJaccard()) {
            return f("It is tentative because not every cluster is stable (smallest mean Jaccard %s, below %s).",
                    Numbers.fixed(r.worstJaccard(), 2), Numbers.plain(rule.stableJaccard()));
        }
        return f("It is tentative because its average silhouette (%s) is not above %s.", Numbers.fixed(r.silhouette(),
                2), Numbers.plain(rule.reasonableSilhouette()));
    }

    private String unsupportedLinkage(EvidenceTable t) {
        EvidenceRow r = t.mostStable();
        String gap = t.hasGap() ? f("; the gap statistic chose k = %d", t.gapChoice()) : "";
        return f("With %s linkage the most stable cut (k = %d) had a %s%s.", Names.linkage(t.linkage()), r.k(),
                stabilityClause(r, "of"), gap);
    }

    private static String stability(EvidenceRow r) {
        return f("Across the %d replicates the ", r.replicates()) + stabilityClause(r, "was") + f("; PAC was %s%s.", Numbers.fixed(r.pac(), 3),
                r.calibrated() ? f(" (%s on null data)", Numbers.fixed(r.nullPac(), 3)) : "");
    }

    private static String stabilityClause(EvidenceRow r, String verb) {
        String s = f("mean ARI " + verb + " %s (95%% interval %s to %s)", Numbers.fixed(r.ariMean(), 2), Numbers.fixed(r.ariLow(), 2),
                Numbers.fixed(r.ariHigh(), 2));
        if (r.calibrated()) {
            s += f(" against %s on null data (Monte Carlo p = %s); mean ARI plus average silhouette beat the null data "
                    + "with p = %s", Numbers.fixed(r.nullAriMean(), 2), Numbers.p(r.pValueAri()),
                    Numbers.p(r.pValueCombined()));
        }
        return s;
    }

    private static String md(String text) {
        return MARKDOWN.translate(text);
    }
}
