package org.treeproof.study;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.partition.Clustering;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.score.JaccardStability;
import org.treeproof.tree.SizedCuts;

/**
 * Applies a {@link DecisionRule} to the evidence of a study: assesses every (linkage, k) solution, takes the
 * first in the rule's order, and gathers the typed reasons. Pure: the same evidence and rule give the same
 * recommendation.
 */
public final class Recommender {
    /**
     * Without cluster structure, a small branch shed at the top of the tree is a far sample (an outlier) when it
     * joins at least this many times higher than the tree's first split into two large branches. Our choice: on
     * Gaussian samples the shed branches join at about 1.3 times that height, a sample far from all others many
     * times higher.
     */
    public static final double FAR_FACTOR = 1.5;

    private final Evidence evidence;
    private final DecisionRule rule;

    private Recommender(Evidence evidence, DecisionRule rule) {
        this.evidence = evidence;
        this.rule = rule;
    }

    public static Recommender of(Evidence evidence, DecisionRule rule) {
        return new Recommender(evidence, rule);
    }

    /** The facts the rule reads for one solution. */
    public static Assessment.Facts facts(LinkageEvidence le, KEvidence e) {
        NullStability ns = e.stability().nullModel();
        boolean noneDissolved = e.clusters().stream().noneMatch(c -> c.status() == JaccardStability.Status.DISSOLVED
                || c.status() == JaccardStability.Status.NOT_ASSESSED);
        int doubtful = (int) e.clusters().stream().filter(c -> c.status() == JaccardStability.Status.DOUBTFUL).count();
        return new Assessment.Facts(le.linkage(), e.k(), e.outliers(), e.stability().ari().mean(), e.worstJaccard(),
                noneDissolved, doubtful, e.silhouette(), leastClusterSilhouette(e), ns != null, ns == null ? Double.NaN : ns.excess(),
                ns == null ? Double.NaN : ns.pValueAdjusted(), le.copheneticCorrelation(), e.separationP());
    }

    /** The smallest mean silhouette width of one cluster's members; NaN when no width is defined. */
    static double leastClusterSilhouette(KEvidence e) {
        return Cohesion.leastClusterMean(e.sampleSilhouette(), e.clustering());
    }

    /** Decides. */
    public Recommendation recommend() {
        List<LinkageEvidence> all = evidence.linkages();
        var assessments = new ArrayList<Assessment>();
        Assessment[] perLinkage = new Assessment[all.size()];
        Assessment[] strongest = new Assessment[all.size()];
        for (int l = 0; l < all.size(); l++) {
            LinkageEvidence le = all.get(l);
            var own = new ArrayList<Assessment>();
            for (KEvidence e : le.byK()) {
                own.add(rule.assess(facts(le, e)));
            }
            assessments.addAll(own);
            java.util.Set<Integer> passing = passingStates(le, own);
            for (Assessment a : own) {
                if (!passing.contains(a.k()) && (strongest[l] == null || rule.order().compare(a, strongest[l]) < 0)) {
                    strongest[l] = a;
                }
            }
            perLinkage[l] = strongest[l] != null && strongest[l].verdict() != Verdict.UNSUPPORTED ? strongest[l] : null;
        }
        Assessment[] best = perLinkage.clone();
        // each linkage's own choice: its strongest, or, when that is supported, its finest level (rule item 3)
        for (int l = 0; l < all.size(); l++) {
            if (perLinkage[l] != null && perLinkage[l].verdict() == Verdict.SUPPORTED) {
                LinkageEvidence le = all.get(l);
                List<Integer> lv = levels(le, assessments, perLinkage[l]);
                int finest = lv.get(lv.size() - 1);
                perLinkage[l] = assessments.stream().filter(a -> a.linkage() == le.linkage() && a.k() == finest)
                        .findFirst().orElseThrow();
            }
        }
        int winnerLinkage = recommendedLinkage(best, perLinkage, rule.order());
        Assessment winner = winnerLinkage < 0 ? null : perLinkage[winnerLinkage];
        var summaries = new ArrayList<Recommendation.LinkageSummary>();
        for (int l = 0; l < all.size(); l++) {
            LinkageEvidence le = all.get(l);
            Assessment a = perLinkage[l];
            if (a == null) {
                summaries.add(new Recommendation.LinkageSummary(le.linkage(), le.copheneticCorrelation(), 1,
                        Verdict.UNSUPPORTED, Double.NaN, Double.NaN, Double.NaN, Double.NaN));
            } else {
                KEvidence e = le.at(a.k());
                summaries.add(new Recommendation.LinkageSummary(le.linkage(), le.copheneticCorrelation(), a.k(),
                        a.verdict(), e.stability().ari().mean(), e.stability().pac(), e.silhouette(), e.worstJaccard()));
            }
        }
        double[][] agreement = agreement(perLinkage);
        var reasons = new ArrayList<Reason>();
        StructureTest test = evidence.structureTest();
        if (test != null) {
            reasons.add(new Reason.Structure(test, rule.alpha(), winner != null));
        } else {
            reasons.add(new Reason.NoNullData(evidence.features() == 0));
        }
        if (winner == null) {
            return unsupported(summaries, agreement, assessments, strongest, reasons);
        }
        LinkageEvidence le = all.get(winnerLinkage);
        KEvidence e = le.at(winner.k());
        // a tentative winner is no supported level (none of the linkage's solutions is supported)
        List<Integer> levels = winner.verdict() == Verdict.SUPPORTED ? levels(le, assessments, winner) : List.of();
        List<Recommendation.CriterionChoice> criteria = criteria(le);
        List<Recommendation.KShare> votes = votes(le, winner.verdict(), assessments);
        reasons.add(new Reason.Chosen(winner, e));
        Clustering solution = farSamplesAside(le, e);
        if (solution.outlierCount() > 0) {
            reasons.add(new Reason.Outliers(solution.outlierCount(), evidence.minClusterSize(),
                    solution.outlierCount() - e.outliers(), evidence.samples()));
        }
        if (!votes.isEmpty()) {
            reasons.add(new Reason.Votes(le.linkage(), winner.verdict(), votes, e.k(), rule.stableJaccard()));
        }
        if (le.gap() != null) {
            reasons.add(new Reason.Gap(le.gapChoice(), le.gap().ruleMet(), e.k()));
        }
        var disagreeing = criteria.stream().filter(c -> c.k() != e.k()).toList();
        if (!disagreeing.isEmpty()) {
            reasons.add(new Reason.Criteria(disagreeing, e.k(),
                    assessments.stream().filter(a -> a.linkage() == le.linkage()).toList()));
        }
        if (levels.size() > 1) {
            reasons.add(new Reason.Levels(levels));
        }
        if (e.tieDependent()) {
            reasons.add(new Reason.TieDependent(e.k()));
        }
        if (!le.tree().monotone()) {
            reasons.add(new Reason.Inversions(le.linkage(), e.k()));
        }
        if (all.size() > 1) {
            var others = new ArrayList<Recommendation.LinkageSummary>();
            var nesting = new ArrayList<Double>();
            for (int l = 0; l < all.size(); l++) {
                if (l != winnerLinkage) {
                    others.add(summaries.get(l));
                    Assessment a = perLinkage[l];
                    nesting.add(a == null || a.k() == winner.k() ? Double.NaN
                            : all.get(l).at(a.k()).clustering().nesting(e.clustering()));
                }
            }
            reasons.add(new Reason.OtherLinkages(le.linkage(), winner.k(), others, nesting));
        }
        return new Recommendation(le.linkage(), e.k(), e.cutHeight(), winner.verdict(), levels, reasons, criteria,
                ClusterEvidence.sizedBy(e.clusters(), solution), flaggedSamples(e, solution), summaries, agreement, rule, assessments, test, solution,
                evidence.minClusterSize(), votes);
    }

    /**
     * The linkage whose own choice is recommended (item 3 of {@link DecisionRule}): the linkage whose best solution
     * comes first in the rule's order; but when that is supported, the linkage whose finest supported level is the
     * finest of all (among equally fine ones, the one whose best solution comes first in the order). The finest
     * partition into clusters that are each stable, cohesive and separated and that beats the null is the most
     * detailed claim the evidence carries, whichever tree holds it.
     *
     * @param best   each linkage's first solution in the rule's order (passing states left out); null when it is
     *               unsupported
     * @param choice each linkage's own choice: its best solution or, when that is supported, its finest level
     * @return the index of the linkage, or -1 when no linkage has a solution better than unsupported
     */
    static int recommendedLinkage(Assessment[] best, Assessment[] choice, java.util.Comparator<Assessment> order) {
        int w = -1;
        for (int l = 0; l < best.length; l++) {
            if (best[l] != null && (w < 0 || order.compare(best[l], best[w]) < 0)) {
                w = l;
            }
        }
        if (w < 0 || best[w].verdict() != Verdict.SUPPORTED) {
            return w;
        }
        int finest = w;
        for (int l = 0; l < best.length; l++) {
            if (best[l] != null && best[l].verdict() == Verdict.SUPPORTED && (choice[l].k() > choice[finest].k()
                    || choice[l].k() == choice[finest].k() && order.compare(best[l], best[finest]) < 0)) {
                finest = l;
            }
        }
        return finest;
    }

    /**
     * The levels of nested structure on the recommended linkage: its supported solutions that persist over a range
     * of cut heights at least half as long, relative to the height, as the longest-persisting supported one; the
     * recommended k is always a level. On trees with inversions an empty height range never qualifies. The
     * persistence condition is our choice.
     */
    private static List<Integer> levels(LinkageEvidence le, List<Assessment> assessments, Assessment winner) {
        var own = assessments.stream().filter(a -> a.linkage() == le.linkage()).toList();
        java.util.Set<Integer> passing = passingStates(le, own);
        var out = new ArrayList<Integer>();
        for (Assessment a : own) {
            if (a.verdict() == Verdict.SUPPORTED && !passing.contains(a.k()) || a.k() == winner.k()) {
                out.add(a.k());
            }
        }
        return out;
    }

    /**
     * The supported solutions of one linkage that are passing states of the agglomeration: they exist over a range
     * of cut heights less than half as long, relative to the height, as the longest-persisting supported one, such
     * as one family split while the other is not yet. They neither compete for the recommendation nor count as
     * levels. Empty when no supported solution persists at all (a tree whose every such range is empty).
     *
     * <p>Tried and rejected (bench/judgement/README.md): sparing the finest supported solution when another linkage
     * supports the same clusters. It kept a real group of 12 beside 400 that Ward's tree holds only briefly, but
     * with few replicates it also kept a strain of 40 cut in two by both Ward and average linkage.
     */
    private static java.util.Set<Integer> passingStates(LinkageEvidence le, List<Assessment> own) {
        double widest = 0;
        for (Assessment a : own) {
            if (a.verdict() == Verdict.SUPPORTED) {
                widest = Math.max(widest, persistence(le.at(a.k())));
            }
        }
        var out = new java.util.HashSet<Integer>();
        if (widest > 0) {
            for (Assessment a : own) {
                if (a.verdict() == Verdict.SUPPORTED && persistence(le.at(a.k())) < 0.5 * widest) {
                    out.add(a.k());
                }
            }
        }
        return out;
    }

    /** The share of the height over which this state exists: (high - low) / high, 0 if empty. */
    private static double persistence(KEvidence e) {
        double low = e.cutHeight().low();
        double high = e.cutHeight().high();
        return high > low && high > 0 && Double.isFinite(high) ? (high - low) / high : 0;
    }

    private Recommendation unsupported(List<Recommendation.LinkageSummary> summaries, double[][] agreement,
            List<Assessment> assessments, Assessment[] strongest, List<Reason> reasons) {
        // Report the tree with the highest cophenetic correlation: it represents the distances best.
        int l = 0;
        for (int i = 1; i < evidence.linkages().size(); i++) {
            if (evidence.linkages().get(i).copheneticCorrelation() > evidence.linkages().get(l).copheneticCorrelation()) {
                l = i;
            }
        }
        for (Assessment a : strongest) {
            if (a != null) {
                reasons.add(new Reason.BestFailed(a));
            }
        }
        LinkageEvidence le = evidence.linkages().get(l);
        Clustering one = SizedCuts.of(le.tree(), evidence.minClusterSize(), 2).oneClusterWithOutliers(FAR_FACTOR);
        if (one.outlierCount() > 0) {
            reasons.add(new Reason.Outliers(one.outlierCount(), evidence.minClusterSize(), 0, evidence.samples()));
        }
        int n = le.tree().leaves();
        double root = le.tree().height(n - 2);
        var cut = new CutHeight(root, Double.POSITIVE_INFINITY, root);
        return new Recommendation(le.linkage(), 1, cut, Verdict.UNSUPPORTED, List.of(), reasons, criteria(le),
                List.of(), List.of(), summaries, agreement, rule, assessments, evidence.structureTest(), one,
                evidence.minClusterSize(), List.of());
    }

    /**
     * The recommended clusters with far samples set aside as well: samples a linkage merged into a cluster from far
     * away (a small branch joining the cluster at least {@link #FAR_FACTOR} times higher than the cluster's own first
     * split into two large branches; {@link SizedCuts#withFarSamplesAside}). Cluster numbers stay those of the
     * evidence.
     */
    private Clustering farSamplesAside(LinkageEvidence le, KEvidence e) {
        Clustering far = SizedCuts.of(le.tree(), evidence.minClusterSize(), e.k()).withFarSamplesAside(e.k(),
                FAR_FACTOR);
        int[] labels = e.clustering().labels();
        for (int i = 0; i < labels.length; i++) {
            if (far.isOutlier(i)) {
                labels[i] = Clustering.OUTLIER;
            }
        }
        return new Clustering(labels, e.k());
    }

    /**
     * Per k, the share of replicates that the rule's ordering (item 3 of {@link DecisionRule}) would give to that k,
     * read replicate by replicate among the recommended linkage's solutions with the recommended verdict (passing
     * states left out, as from the recommendation; a verdict belongs to all replicates together):
     * <ul>
     *   <li>supported solutions compete by fineness, so a replicate gives its vote to the finest of them that it
     *       reproduces, its own ARI with that cut of the data at least the stable band ({@link
     *       DecisionRule#stableJaccard()}, the same threshold as {@link Condition#REPRODUCED}); a replicate that
     *       reproduces none gives no vote, so the shares can sum to less than 1;</li>
     *   <li>tentative solutions compete by their excess over the null, so a replicate gives its vote to the k with
     *       the largest excess when the replicate's own ARI replaces the mean ARI (the separation term is the
     *       solution's own).</li>
     * </ul>
     */
    private List<Recommendation.KShare> votes(LinkageEvidence le, Verdict verdict, List<Assessment> assessments) {
        if (le.byK().isEmpty() || le.byK().get(0).stability().nullModel() == null) {
            return List.of();
        }
        var own = assessments.stream().filter(a -> a.linkage() == le.linkage()).toList();
        java.util.Set<Integer> passing = passingStates(le, own);
        var candidates = new java.util.HashSet<Integer>();
        for (Assessment a : own) {
            if (a.verdict() == verdict && !passing.contains(a.k())) {
                candidates.add(a.k());
            }
        }
        boolean byFineness = verdict == Verdict.SUPPORTED;
        int replicates = le.byK().get(0).replicateAri().length;
        int[] wins = new int[evidence.settings().maxK() + 1];
        double[][] ari = new double[le.byK().size()][];
        for (int t = 0; t < ari.length; t++) {
            ari[t] = le.byK().get(t).replicateAri();
        }
        for (int r = 0; r < replicates; r++) {
            int best = -1;
            double bestValue = Double.NEGATIVE_INFINITY;
            for (int t = 0; t < ari.length; t++) {
                KEvidence e = le.byK().get(t);
                NullStability ns = e.stability().nullModel();
                if (!candidates.contains(e.k()) || ns == null) {
                    continue;
                }
                double v;
                if (byFineness) {
                    v = ari[t][r] >= rule.stableJaccard() ? e.k() : Double.NEGATIVE_INFINITY;
                } else {
                    v = NullCalibration.excess(ari[t][r], e.silhouette(), ns.ariMean(),
                            NullCalibration.ariScale(ns.ariSD(), e.stability().ari().sd(), ns.replicatesPerSet()),
                            ns.silhouetteMean(), ns.silhouetteSD());
                }
                if (v > bestValue) {
                    bestValue = v;
                    best = e.k();
                }
            }
            if (best > 0) {
                wins[best]++;
            }
        }
        var out = new ArrayList<Recommendation.KShare>();
        for (int k = 2; k < wins.length; k++) {
            if (candidates.contains(k)) {
                out.add(new Recommendation.KShare(k, wins[k] / (double) replicates));
            }
        }
        return out;
    }

    private double[][] agreement(Assessment[] perLinkage) {
        int m = perLinkage.length;
        double[][] a = new double[m][m];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                if (perLinkage[i] == null || perLinkage[j] == null) {
                    a[i][j] = i == j ? 1.0 : Double.NaN;
                } else {
                    var pi = evidence.linkages().get(i).at(perLinkage[i].k()).clustering().withSingletons();
                    var pj = evidence.linkages().get(j).at(perLinkage[j].k()).clustering().withSingletons();
                    a[i][j] = AdjustedRandIndex.of(pi, pj).compute().value();
                }
            }
        }
        return a;
    }

    /** Each criterion's own choice of k on one linkage, and the gap statistic's. */
    List<Recommendation.CriterionChoice> criteria(LinkageEvidence le) {
        var out = new ArrayList<Recommendation.CriterionChoice>();
        for (Criterion c : Criterion.values()) {
            KEvidence best = null;
            for (KEvidence e : le.byK()) {
                if (best == null ? !Double.isNaN(c.of(e)) : c.better(c.of(e), c.of(best))) {
                    best = e;
                }
            }
            if (best != null) {
                out.add(new Recommendation.CriterionChoice(c, c.label(), best.k(),
                        (c.direction() == Criterion.Direction.LARGER ? "largest " : "smallest ") + c.label()));
            }
        }
        if (le.gap() != null) {
            out.add(new Recommendation.CriterionChoice(null, "gap statistic", le.gapChoice(), le.gap().ruleMet()
                    ? "smallest k with Gap(k) >= Gap(k+1) - s(k+1)" : "rule not met up to the largest k; largest k shown"));
        }
        return out;
    }

    /** The flagged samples of the recommended clusters, leaving out every outlier of the final solution. */
    private List<Recommendation.SampleFlag> flaggedSamples(KEvidence e, Clustering solution) {
        var out = new ArrayList<Recommendation.SampleFlag>();
        double[] st = e.sampleStability();
        double[] sil = e.sampleSilhouette();
        for (int i = 0; i < st.length; i++) {
            if (solution.isOutlier(i)) {
                continue;   // an outlier, set aside by the cut or afterwards as far from its cluster, has no cluster
            }
            boolean unstable = st[i] < rule.unstableSample();
            boolean negative = sil[i] < 0;
            if (unstable || negative) {
                out.add(new Recommendation.SampleFlag(i, evidence.sampleIds().get(i), e.clustering().label(i) + 1,
                        st[i], sil[i], unstable, negative));
            }
        }
        return out;
    }
}
