package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.study.Assessment;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.Condition;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.KEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Reason;
import org.treeproof.study.Recommendation;
import org.treeproof.study.StructureTest;
import org.treeproof.study.Verdict;
import org.treeproof.tree.Linkage;

/**
 * Words the decision's typed reasons: the one place their sentences are written. Reads what the rule decided
 * (verdicts, conditions met and failed); never re-derives any of it.
 */
public final class ReasonWords implements Reason.Visitor<String> {
    private final DecisionRule rule;

    public ReasonWords(DecisionRule rule) {
        this.rule = rule;
    }

    /** The sentence for one reason. */
    public String word(Reason r) {
        return r.accept(this);
    }

    /**
     * The sentence for a covariate the clusters largely follow (a typed fact of the explanation, decided by
     * {@link org.treeproof.explain.CovariateRule}); the covariate's name is quoted as given.
     */
    public static String covariate(org.treeproof.explain.CovariateFlag flag) {
        String q = flag.qValue() < 0.001 ? "q < 0.001" : String.format(java.util.Locale.ROOT, "q = %.3f", flag.qValue());
        return String.format(java.util.Locale.ROOT, "The clusters largely follow the covariate '%s' (%s %.2f, %s): "
                + "if it records how the samples were collected or processed (a batch, a site, a date), the clusters "
                + "may reflect that rather than a difference between the samples; if it is a known property of the "
                + "samples, the clusters recover it. Decide which before reading the clusters as groups; to look for "
                + "groups within the batches, rerun with --center-within naming this column, which removes each "
                + "batch's mean, and compare: groups spread unevenly over the batches lose part of their difference "
                + "when it is removed.", flag.covariate(), flag.effectName(), flag.effect(), q);
    }

    /** The sentence for each reason, in order. */
    public List<String> words(List<Reason> reasons) {
        return reasons.stream().map(this::word).toList();
    }

    /** The plain words for one condition of the rule. */
    public String condition(Condition c) {
        return switch (c) {
            case BEATS_NULL -> "the solution beats the null data (allowing for the choice among linkages and k)";
            case NO_CLUSTER_DISSOLVES -> f("no cluster dissolves (every mean Jaccard above %s)",
                    Numbers.plain(rule.dissolvedJaccard()));
            case EVERY_CLUSTER_COHESIVE -> "every cluster is cohesive (its members' mean silhouette width above 0)";
            case EVERY_CLUSTER_SEPARATED -> f("every cluster is set apart from its nearest cluster by a dip in density "
                    + "(Hartigan's dip test on the line joining them, p at most %s)",
                    Numbers.plain(rule.alpha()));
            case AT_MOST_ONE_DOUBTFUL -> f("at most one cluster is only doubtful (mean Jaccard between %s and %s) while "
                    + "the others are stable", Numbers.plain(rule.dissolvedJaccard()), Numbers.plain(rule.stableJaccard()));
            case EVERY_CLUSTER_STABLE -> f("every cluster is stable (mean Jaccard at least %s)",
                    Numbers.plain(rule.stableJaccard()));
            case REPRODUCED -> f("replicates reproduce the solution (mean ARI at least %s)",
                    Numbers.plain(rule.stableJaccard()));
            case SEPARATED_WITHOUT_NULL -> f("its clusters are separated (average silhouette above %s)",
                    Numbers.plain(rule.reasonableSilhouette()));
        };
    }

    @Override
    public String structure(Reason.Structure r) {
        StructureTest t = r.test();
        String largest = f("the largest test statistic (stability plus separation, standardised alike for the data "
                + "and the null sets) among every linkage and k is %s", Numbers.fixed(t.statistic(), 2));
        String ps = f("Monte Carlo p = %s over %d null data sets, which decides; %s from a normal fit to their maxima, "
                + "an approximation reported beside it", Numbers.p(t.pValue()), t.nullSets(), fitted(t.pValueFitted()));
        if (!r.found()) {
            if (t.reachedBy() == 0) {
                return f("No solution can beat the null data with %d null data sets: %s, beyond every null set, but "
                        + "the Monte Carlo p-value cannot go below 1/(1 + %d) = %s, above the level %s (%s). At least "
                        + "%d null data sets are needed (--null-sets).", t.nullSets(), largest, t.nullSets(),
                        Numbers.p(t.smallestPValue()), Numbers.plain(r.alpha()), ps,
                        StructureTest.setsNeededFor(r.alpha()));
            }
            return f("No cluster structure was detected beyond what data without clusters give: %s, which %d of the "
                    + "%d null data sets reach (%s). This is not evidence that the data hold no groups.", largest,
                    t.reachedBy(), t.nullSets(), ps);
        }
        if (!r.clustersFound()) {
            return f("The data depart from the null data without clusters: %s (%s). But no solution with clusters "
                    + "meets the rule's conditions, so this departure is not evidence of stable, cohesive, separated clusters; "
                    + "skewed or bounded features, a continuum, scattered far samples or, under z-scores, groups on "
                    + "a few of many features diluted by the scaling (see --scale) can cause it.", largest, ps);
        }
        return f("The data depart from null data without clusters (a unimodal law with the data's own spread): %s "
                + "(%s%s).", largest, ps, t.pValue() <= t.smallestPValue() + 1e-12
                        ? f("; %s is the smallest Monte Carlo p-value %d null data sets allow", Numbers.p(t.pValue()),
                                t.nullSets()) : "");
    }

    private static String fitted(double p) {
        if (Double.isNaN(p)) {
            return "p not available";
        }
        return p < 0.001 ? "p < 0.001" : "p = " + Numbers.p(p);
    }

    @Override
    public String noNullData(Reason.NoNullData r) {
        return r.distancesOnly()
                ? "Only distances were given, so no null data could be drawn: no solution can be called better than "
                        + "tentative."
                : "Null calibration was not run (--null-sets 0): no solution can be called better than tentative.";
    }

    @Override
    public String chosen(Reason.Chosen r) {
        Assessment a = r.assessment();
        KEvidence e = r.evidence();
        var parts = new ArrayList<String>();
        parts.add(f("%s: %d clusters with %s linkage", a.verdict() == Verdict.SUPPORTED ? "Supported" : "Tentative",
                a.k(), Names.linkage(a.linkage())));
        NullStability ns = e.stability().nullModel();
        String stab = f("mean ARI %s over %d replicates", Numbers.fixed(e.stability().ari().mean(), 2),
                e.stability().ari().count());
        if (ns != null) {
            stab += f(" (null %s) and average silhouette %s (null %s): an excess of %s over the null, adjusted p = %s",
                    Numbers.fixed(ns.ariMean(), 2), Numbers.fixed(e.silhouette(), 3),
                    Numbers.fixed(ns.silhouetteMean(), 3), Numbers.fixed(ns.excess(), 1),
                    Numbers.p(ns.pValueAdjusted()));
        } else {
            stab += f(", average silhouette %s", Numbers.fixed(e.silhouette(), 2));
        }
        parts.add(stab);
        parts.add(f("smallest cluster Jaccard %s", Numbers.fixed(e.worstJaccard(), 2)));
        String s = String.join("; ", parts) + ".";
        if (!a.failed().isEmpty()) {
            s += " It falls short of full support: " + fails(a.failed()) + ".";
        }
        var weak = new ArrayList<String>();
        for (ClusterEvidence c : e.clusters()) {
            if (!(c.jaccard() >= rule.stableJaccard())) {
                weak.add(f("cluster %d (%d samples) is %s (mean Jaccard %s)", c.id(), c.size(), c.status().label(),
                        Numbers.fixed(c.jaccard(), 2)));
            }
        }
        if (!weak.isEmpty()) {
            s += " " + ModelFactory.capital(String.join("; ", weak)) + ".";
        }
        if (ns != null) {
            s += " " + silhouetteReading(e.silhouette());
        }
        return s;
    }

    /**
     * Kaufman and Rousseeuw's reading of an average silhouette, as a description only: with null data the verdict
     * never reads a silhouette band (the rule's thresholds, {@link DecisionRule}).
     */
    String silhouetteReading(double silhouette) {
        String reading = silhouette > rule.reasonableSilhouette() ? "a reasonable structure"
                : silhouette > rule.weakSilhouette() ? "a weak structure" : "no substantial structure";
        return f("In Kaufman and Rousseeuw's reading an average silhouette of %s describes %s (above %s reasonable, "
                + "above %s weak); it is a description only and did not enter the verdict (no silhouette band gates a "
                + "verdict, since silhouettes shrink when many features carry no groups).", Numbers.fixed(silhouette, 3), reading,
                Numbers.plain(rule.reasonableSilhouette()), Numbers.plain(rule.weakSilhouette()));
    }

    /**
     * "it fails the condition that A" for one condition; for several, each in its own clause ("it fails the conditions
     * that A; that B; and that C"), since a condition's own wording may hold commas.
     */
    private String fails(List<Condition> failed) {
        return fails("it", failed);
    }

    private String fails(String subject, List<Condition> failed) {
        if (failed.size() == 1) {
            return subject + " fails the condition that " + condition(failed.get(0));
        }
        var that = failed.stream().map(c -> "that " + condition(c)).toList();
        return subject + " fails the conditions " + String.join("; ", that.subList(0, that.size() - 1)) + "; and "
                + that.get(that.size() - 1);
    }

    /** The first failed condition, and how many more: a clause for a list of criteria's choices. */
    private String failsBriefly(List<Condition> failed) {
        // "that solution", not "it": the clause follows criteria named in the plural
        return failed.size() == 1 ? fails("that solution", failed) : f("that solution fails %d "
                + "conditions, among them that %s", failed.size(),
                condition(failed.get(0)));
    }

    @Override
    public String bestFailed(Reason.BestFailed r) {
        Assessment a = r.assessment();
        var f = a.facts();
        String figures = f.calibrated()
                ? f("excess over the null %s, adjusted p = %s, smallest cluster Jaccard %s", Numbers.fixed(f.excess(), 1),
                        Numbers.p(f.pAdjusted()), Numbers.fixed(f.worstJaccard(), 2))
                : f("mean ARI %s, smallest cluster Jaccard %s, silhouette %s", Numbers.fixed(f.meanAri(), 2),
                        Numbers.fixed(f.worstJaccard(), 2), Numbers.fixed(f.silhouette(), 2));
        String failed = a.failed().isEmpty() ? "" : "; " + fails(a.failed());
        return f("With %s linkage the strongest solution is k = %d (%s)%s.", Names.linkage(a.linkage()), a.k(),
                figures, failed);
    }

    @Override
    public String outliers(Reason.Outliers r) {
        String after = r.afterCut() == 0 ? "" : f(" %s of them joined their cluster far above its own first split and "
                + "%s set aside after the cut was assessed, so the cut's figures (stability, silhouette, the evidence "
                + "table) include %s; the clusters' sizes and members leave %s out.", r.afterCut() == r.count() ? "All"
                : Integer.toString(r.afterCut()), r.afterCut() == 1 ? "was" : "were", r.afterCut() == 1 ? "it" : "them",
                r.afterCut() == 1 ? "it" : "them");
        boolean one = r.count() == 1;
        // a tenth of the samples or more is no longer a few stray samples (our choice): the reader is told so
        String many = 10 * r.count() >= r.samples() ? f(" That is %s of the samples, more than scattered outliers: "
                + "they may be the long tail of a heavy-tailed population, a group of their own that differs in spread "
                + "rather than in location, or a sparse part of a continuum; look at them in the heat map before "
                + "reading them as noise.",
                Numbers.percent((double) r.count() / r.samples())) : "";
        return f("%d sample%s %s set aside as %s, not %s: on branches of fewer than %d samples, or joining the tree (or "
                + "%s cluster) far above its first split into two large branches; %s listed in clusters.csv and left "
                + "out of k.%s%s", r.count(), one ? "" : "s", one ? "is" : "are", one ? "an outlier" : "outliers",
                one ? "a cluster" : "clusters", r.minClusterSize(), one ? "its" : "their", one ? "it is" : "they are",
                after, many);
    }

    @Override
    public String gap(Reason.Gap r) {
        if (r.agrees()) {
            return f("The gap statistic agrees: its rule picks k = %d.", r.gapK());
        }
        return f("The gap statistic disagrees: its rule picks k = %d%s.", r.gapK(),
                r.ruleMet() ? "" : " (the rule was not met up to the largest k)");
    }

    @Override
    public String votes(Reason.Votes r) {
        var parts = new ArrayList<String>();
        double recommended = 0;
        for (Recommendation.KShare s : r.shares()) {
            parts.add(f("k = %d in %s", s.k(), Numbers.percent(s.share())));
            if (s.k() == r.recommendedK()) {
                recommended = s.share();
            }
        }
        if (r.shares().size() == 1) {
            String only = r.verdict() == Verdict.SUPPORTED
                    ? f("k = %d is the only supported level on %s linkage (supported cuts that last only briefly, "
                            + "passing states of the tree, are not levels), so no other k competes replicate by "
                            + "replicate", r.recommendedK(), Names.linkage(r.linkage()))
                    : f("k = %d is the only %s solution on %s linkage, so no other k competes replicate by replicate",
                            r.recommendedK(), r.verdict().id(), Names.linkage(r.linkage()));
            return r.verdict() == Verdict.SUPPORTED
                    ? f("%s; %s of replicates reproduce it (ARI with that cut at least %s).", only,
                            Numbers.percent(recommended), Numbers.plain(r.reproducedAt()))
                    : only + ".";
        }
        String fewer = recommended >= 0.5 ? "" : f("; k = %d wins in fewer than half", r.recommendedK());
        if (r.verdict() == Verdict.SUPPORTED) {
            double none = 1 - r.shares().stream().mapToDouble(Recommendation.KShare::share).sum();
            return f("Replicate by replicate, the finest supported solution on %s linkage that the replicate "
                    + "reproduces (its ARI with that cut at least %s) is %s of replicates%s%s.",
                    Names.linkage(r.linkage()), Numbers.plain(r.reproducedAt()), String.join(", ", parts),
                    none > 0.0005 ? f("; %s reproduce none of them", Numbers.percent(none)) : "", fewer);
        }
        return f("Ranked replicate by replicate (each replicate's own stability against the null), the %s "
                + "solutions on %s linkage favour %s of replicates%s.", r.verdict().id(), Names.linkage(r.linkage()),
                String.join(", ", parts), fewer);
    }

    @Override
    public String levels(Reason.Levels r) {
        return f("Supported levels: k = %s. Being cuts of one tree they nest, which by itself is no evidence of groups "
                + "within groups; the finest is recommended, and the coarser show how its clusters merge.",
                Prose.and(r.levels().stream().map(String::valueOf).toList()));
    }

    @Override
    public String tieDependent(Reason.TieDependent r) {
        return f("Merge heights tie at this cut, so which %d clusters result depends on the order of tied merges.",
                r.k());
    }

    @Override
    public String inversions(Reason.Inversions r) {
        return f("The %s tree has inversions (a merge lower than an earlier one); the %d clusters are a state of the "
                + "agglomeration, and a cut by height need not give them.", Names.linkage(r.linkage()), r.k());
    }

    @Override
    public String otherLinkages(Reason.OtherLinkages r) {
        var parts = new ArrayList<String>();
        for (int i = 0; i < r.others().size(); i++) {
            Recommendation.LinkageSummary s = r.others().get(i);
            double nest = r.nesting().get(i);
            String part = s.verdict() == Verdict.UNSUPPORTED ? f("%s finds no convincing k", Names.linkage(s.linkage()))
                    : f("%s is %s at k = %d", Names.linkage(s.linkage()), s.verdict().id(), s.k());
            if (!Double.isNaN(nest)) {
                // floored, so that "100%" means every sample
                part += f(" (%s; the finer solution's clusters fall within single clusters of the coarser for %d%% "
                        + "of the samples)", s.k() > r.recommendedK() ? "finer" : "coarser",
                        nest >= 1 ? 100 : (int) Math.floor(100 * nest));
            }
            parts.add(part);
        }
        return f("Among the linkages, %s gives the recommended solution; %s.", Names.linkage(r.recommended()),
                String.join("; ", parts));
    }

    @Override
    public String criteria(Reason.Criteria r) {
        // criteria that pick the same k share one clause, in the order the first of them comes
        var byK = new java.util.LinkedHashMap<Integer, List<String>>();
        for (Recommendation.CriterionChoice c : r.disagreeing()) {
            if (c.criterion() != null) {
                byK.computeIfAbsent(c.k(), k -> new ArrayList<>()).add(c.name());
            }
        }
        var parts = new ArrayList<String>();
        for (var e : byK.entrySet()) {
            int k = e.getKey();
            String verdict = r.linkage().stream().filter(a -> a.k() == k).findFirst()
                    .map(a -> a.verdict() == Verdict.SUPPORTED ? "" : f(", %s there%s", a.verdict().id(),
                            a.failed().isEmpty() ? "" : ": " + failsBriefly(a.failed())))
                    .orElse("");
            parts.add(f("%s %s k = %d%s", Prose.and(e.getValue()), e.getValue().size() == 1 ? "picks" : "pick", k,
                    verdict));
        }
        // the gap statistic (no criterion constant) has a reason of its own, so it is only left out of "every"
        boolean gapDisagrees = r.disagreeing().stream().anyMatch(c -> c.criterion() == null);
        return parts.isEmpty() ? f("Every criterion %staken alone agrees with k = %d.", gapDisagrees
                ? "other than the gap statistic " : "", r.recommendedK())
                : "Taken alone, " + String.join("; ", parts) + ".";
    }

    /** A linkage's name for prose. */
    static String name(Linkage l) {
        return Names.linkage(l);
    }
}
