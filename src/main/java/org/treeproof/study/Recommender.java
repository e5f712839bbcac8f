package org.treeproof.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.score.JaccardStability;

/**
 * Applies a {@link DecisionRule} to the evidence of a study. Pure: the same evidence and rule give the
 * same recommendation.
 */
public final class Recommender {
    private final Evidence evidence;
    private final DecisionRule rule;

    private Recommender(Evidence evidence, DecisionRule rule) {
        this.evidence = evidence;
        this.rule = rule;
    }

    public static Recommender of(Evidence evidence, DecisionRule rule) {
        return new Recommender(evidence, rule);
    }

    /** A candidate solution and its verdict; {@code verdict == UNSUPPORTED} means not eligible. */
    private record Candidate(int linkage, KEvidence e, Verdict verdict, double cophenetic) {
        /** True when this candidate wins over {@code o} by the rule's order. */
        boolean beats(Candidate o) {
            if (verdict != o.verdict) {
                return verdict.betterThan(o.verdict);
            }
            if (e.silhouette() != o.e.silhouette()) {
                return e.silhouette() > o.e.silhouette();
            }
            if (e.worstJaccard() != o.e.worstJaccard()) {
                return e.worstJaccard() > o.e.worstJaccard();
            }
            if (cophenetic != o.cophenetic) {
                return cophenetic > o.cophenetic;
            }
            return false; // keep the earlier linkage and the smaller k
        }
    }

    /** The verdict of one solution under the rule. */
    public Verdict verdictOf(KEvidence e) {
        Stability s = e.stability();
        boolean beats;
        boolean calibrated = s.nullModel() != null;
        if (calibrated) {
            beats = s.nullModel().pValueCombined() <= rule.alpha() + 1e-12 && s.ari().mean() >= rule.stableJaccard();
        } else {
            beats = s.ari().mean() >= rule.stableJaccard();
        }
        if (!beats || !(e.worstJaccard() > rule.dissolvedJaccard())) {
            return Verdict.UNSUPPORTED;
        }
        boolean allStable = e.worstJaccard() >= rule.stableJaccard();
        if (calibrated && allStable && e.silhouette() > rule.reasonableSilhouette()) {
            return Verdict.SUPPORTED;
        }
        return Verdict.TENTATIVE;
    }

    private Candidate best(int l) {
        LinkageEvidence le = evidence.linkages().get(l);
        Candidate best = null;
        for (KEvidence e : le.byK()) {
            var c = new Candidate(l, e, verdictOf(e), le.copheneticCorrelation());
            if (c.verdict != Verdict.UNSUPPORTED && (best == null || c.beats(best))) {
                best = c;
            }
        }
        return best;
    }

    /** Decides. */
    public Recommendation recommend() {
        List<LinkageEvidence> all = evidence.linkages();
        Candidate winner = null;
        Candidate[] perLinkage = new Candidate[all.size()];
        for (int l = 0; l < all.size(); l++) {
            perLinkage[l] = best(l);
            if (perLinkage[l] != null && (winner == null || perLinkage[l].beats(winner))) {
                winner = perLinkage[l];
            }
        }
        var summaries = new ArrayList<Recommendation.LinkageSummary>();
        for (int l = 0; l < all.size(); l++) {
            LinkageEvidence le = all.get(l);
            Candidate c = perLinkage[l];
            if (c == null) {
                summaries.add(new Recommendation.LinkageSummary(le.linkage(), le.copheneticCorrelation(), 1,
                        Verdict.UNSUPPORTED, Double.NaN, Double.NaN, Double.NaN, Double.NaN));
            } else {
                summaries.add(new Recommendation.LinkageSummary(le.linkage(), le.copheneticCorrelation(), c.e.k(),
                        c.verdict, c.e.stability().ari().mean(), c.e.stability().pac(), c.e.silhouette(),
                        c.e.worstJaccard()));
            }
        }
        double[][] agreement = agreement(perLinkage);
        if (winner == null) {
            return unsupported(summaries, agreement);
        }
        LinkageEvidence le = all.get(winner.linkage);
        KEvidence e = winner.e;
        var levels = levels(le);
        if (!levels.contains(e.k())) {
            levels.add(e.k());
            levels.sort(null);
        }
        List<Recommendation.CriterionChoice> criteria = criteria(le);
        var reasons = new Reasons(evidence, rule).forSolution(le, e, winner.verdict, levels, criteria, perLinkage.length > 1
                ? summaries : List.of());
        return new Recommendation(le.linkage(), e.k(), e.cutHeight(), winner.verdict, levels, reasons,
                criteria, flaggedClusters(e), flaggedSamples(e), summaries, agreement, rule);
    }

    /**
     * The levels of nested structure on one linkage: solutions that are eligible, keep every cluster stable,
     * hold no cluster smaller than {@code max(3, 2% of n)} (splitting off outliers is not a level), and persist
     * over a range of cut heights at least half as long, relative to the height, as the longest-persisting such
     * solution. The last condition reads the dendrogram's merge-height gaps (a cluster solution that exists only
     * over a sliver of heights is a transient state of the agglomeration, not a level); on trees with inversions
     * an empty interval never qualifies.
     */
    private List<Integer> levels(LinkageEvidence le) {
        int n = evidence.samples();
        int minSize = Math.max(3, (int) Math.ceil(0.02 * n));
        var candidates = new ArrayList<KEvidence>();
        double widest = 0;
        for (KEvidence o : le.byK()) {
            boolean bigEnough = o.clusters().stream().allMatch(c -> c.size() >= minSize);
            if (verdictOf(o) != Verdict.UNSUPPORTED && o.worstJaccard() >= rule.stableJaccard() && bigEnough) {
                candidates.add(o);
                widest = Math.max(widest, persistence(o));
            }
        }
        var out = new ArrayList<Integer>();
        for (KEvidence o : candidates) {
            if (widest > 0 && persistence(o) >= 0.5 * widest) {
                out.add(o.k());
            }
        }
        return out;
    }

    /** The share of the height at which exactly this many clusters exist: (high - low) / high, 0 if empty. */
    private static double persistence(KEvidence e) {
        double low = e.cutHeight().low();
        double high = e.cutHeight().high();
        return high > low && high > 0 && Double.isFinite(high) ? (high - low) / high : 0;
    }

    private Recommendation unsupported(List<Recommendation.LinkageSummary> summaries, double[][] agreement) {
        // Report the tree with the highest cophenetic correlation: it represents the distances best.
        int l = 0;
        for (int i = 1; i < evidence.linkages().size(); i++) {
            if (evidence.linkages().get(i).copheneticCorrelation() > evidence.linkages().get(l).copheneticCorrelation()) {
                l = i;
            }
        }
        LinkageEvidence le = evidence.linkages().get(l);
        int n = le.tree().leaves();
        double root = le.tree().height(n - 2);
        var cut = new CutHeight(root, Double.POSITIVE_INFINITY, root);
        var reasons = new Reasons(evidence, rule).forUnsupported();
        return new Recommendation(le.linkage(), 1, cut, Verdict.UNSUPPORTED, List.of(), reasons, criteria(le),
                List.of(), List.of(), summaries, agreement, rule);
    }

    private double[][] agreement(Candidate[] perLinkage) {
        int m = perLinkage.length;
        double[][] a = new double[m][m];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                if (perLinkage[i] == null || perLinkage[j] == null) {
                    a[i][j] = i == j ? 1.0 : Double.NaN;
                } else {
                    a[i][j] = AdjustedRandIndex.of(perLinkage[i].e.partition(), perLinkage[j].e.partition())
                            .compute().value();
                }
            }
        }
        return a;
    }

    /** Each criterion's own choice of k on one linkage. */
    List<Recommendation.CriterionChoice> criteria(LinkageEvidence le) {
        var out = new ArrayList<Recommendation.CriterionChoice>();
        KEvidence bestAri = null;
        KEvidence bestPac = null;
        KEvidence bestJac = null;
        KEvidence bestSil = null;
        KEvidence bestCh = null;
        KEvidence bestDb = null;
        KEvidence bestDunn = null;
        for (KEvidence e : le.byK()) {
            bestAri = pick(bestAri, e, e.stability().ari().mean() - nullAri(e), bestAri == null ? 0
                    : bestAri.stability().ari().mean() - nullAri(bestAri), true);
            bestPac = pick(bestPac, e, e.stability().pac(), bestPac == null ? 0 : bestPac.stability().pac(), false);
            bestJac = pick(bestJac, e, e.worstJaccard(), bestJac == null ? 0 : bestJac.worstJaccard(), true);
            bestSil = pick(bestSil, e, e.silhouette(), bestSil == null ? 0 : bestSil.silhouette(), true);
            bestCh = pick(bestCh, e, e.calinskiHarabasz(), bestCh == null ? 0 : bestCh.calinskiHarabasz(), true);
            bestDb = pick(bestDb, e, e.daviesBouldin(), bestDb == null ? 0 : bestDb.daviesBouldin(), false);
            bestDunn = pick(bestDunn, e, e.dunn(), bestDunn == null ? 0 : bestDunn.dunn(), true);
        }
        boolean calibrated = le.byK().get(0).stability().nullModel() != null;
        add(out, "stability (ARI)", bestAri, calibrated ? "largest mean ARI above the null mean ARI"
                : "largest mean ARI");
        add(out, "PAC", bestPac, "smallest proportion of ambiguous clustering");
        add(out, "cluster-wise Jaccard", bestJac, "largest smallest-cluster Jaccard");
        add(out, "silhouette", bestSil, "largest average silhouette");
        if (le.gap() != null) {
            out.add(new Recommendation.CriterionChoice("gap statistic", le.gapChoice(), le.gap().ruleMet()
                    ? "smallest k with Gap(k) >= Gap(k+1) - s(k+1)" : "rule not met up to the largest k; largest k shown"));
        }
        add(out, "Calinski-Harabasz", bestCh, "largest index");
        add(out, "Davies-Bouldin", bestDb, "smallest index");
        add(out, "Dunn", bestDunn, "largest index");
        return out;
    }

    private static double nullAri(KEvidence e) {
        NullStability n = e.stability().nullModel();
        return n == null ? 0 : n.ariMean();
    }

    private static KEvidence pick(KEvidence best, KEvidence e, double value, double bestValue, boolean larger) {
        if (Double.isNaN(value)) {
            return best;
        }
        if (best == null || Double.isNaN(bestValue) || (larger ? value > bestValue : value < bestValue)) {
            return e;
        }
        return best;
    }

    private static void add(List<Recommendation.CriterionChoice> out, String name, KEvidence e, String basis) {
        if (e != null) {
            out.add(new Recommendation.CriterionChoice(name, e.k(), basis));
        }
    }

    private List<ClusterEvidence> flaggedClusters(KEvidence e) {
        var out = new ArrayList<ClusterEvidence>();
        for (ClusterEvidence c : e.clusters()) {
            if (c.status() != JaccardStability.Status.STABLE) {
                out.add(c);
            }
        }
        return out;
    }

    private List<Recommendation.SampleFlag> flaggedSamples(KEvidence e) {
        var out = new ArrayList<Recommendation.SampleFlag>();
        double[] st = e.sampleStability();
        double[] sil = e.sampleSilhouette();
        for (int i = 0; i < st.length; i++) {
            var why = new ArrayList<String>();
            if (st[i] < rule.unstableSample()) {
                why.add(String.format(Locale.ROOT, "stays with its cluster in %.0f%% of replicates", 100 * st[i]));
            }
            if (sil[i] < 0) {
                why.add(String.format(Locale.ROOT, "negative silhouette (%.2f): closer to another cluster", sil[i]));
            }
            if (!why.isEmpty()) {
                out.add(new Recommendation.SampleFlag(i, evidence.sampleIds().get(i), e.partition().label(i) + 1, st[i],
                        sil[i], why));
            }
        }
        return out;
    }
}
