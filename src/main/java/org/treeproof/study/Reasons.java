package org.treeproof.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.treeproof.score.JaccardStability;

/** The plain sentences that explain a recommendation, with the figures they rest on. */
final class Reasons {
    private final Evidence evidence;
    private final DecisionRule rule;

    Reasons(Evidence evidence, DecisionRule rule) {
        this.evidence = evidence;
        this.rule = rule;
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }

    List<String> forSolution(LinkageEvidence le, KEvidence e, Verdict verdict, List<Integer> levels,
            List<Recommendation.CriterionChoice> criteria,
            List<Recommendation.LinkageSummary> others) {
        var out = new ArrayList<String>();
        String link = le.linkage().id();
        out.add(f("%s: %d clusters with %s linkage.", verdict == Verdict.SUPPORTED ? "Supported" : "Tentative",
                e.k(), link));
        out.add(stabilitySentence(e));
        out.add(jaccardSentence(e));
        out.add(silhouetteSentence(e));
        if (le.gap() != null) {
            int g = le.gapChoice();
            out.add(g == e.k() ? f("The gap statistic agrees: its rule picks k = %d.", g)
                    : f("The gap statistic disagrees: its rule picks k = %d%s.", g,
                            le.gap().ruleMet() ? "" : " (the rule was not met up to the largest k)"));
        }
        var disagree = new ArrayList<String>();
        for (Recommendation.CriterionChoice c : criteria) {
            if (c.k() != e.k() && !c.criterion().equals("gap statistic")) {
                disagree.add(f("%s picks k = %d", c.criterion(), c.k()));
            }
        }
        if (!disagree.isEmpty()) {
            out.add("Taken alone, " + String.join("; ", disagree) + ".");
        }
        if (levels.size() > 1) {
            out.add(f("Nested structure: k = %s are each stable beyond the null with every cluster stable; being cuts "
                    + "of one tree, the larger numbers split the clusters of the smaller.", join(levels)));
        }
        if (e.tieDependent()) {
            out.add(f("Merge heights tie at this cut, so which %d clusters result depends on the order of tied merges.",
                    e.k()));
        }
        if (!le.tree().monotone()) {
            out.add(f("The %s tree has inversions (a merge lower than an earlier one); the %d clusters are the state "
                    + "after the first n - %d merges, and a cut by height need not give them.", link, e.k(), e.k()));
        }
        if (!others.isEmpty()) {
            var parts = new ArrayList<String>();
            for (Recommendation.LinkageSummary s : others) {
                if (s.linkage() == le.linkage()) {
                    continue;
                }
                parts.add(s.verdict() == Verdict.UNSUPPORTED ? f("%s finds no convincing k", s.linkage().id())
                        : f("%s is %s at k = %d (silhouette %.2f, smallest Jaccard %.2f)", s.linkage().id(),
                                s.verdict().id(), s.k(), s.silhouette(), s.worstJaccard()));
            }
            if (!parts.isEmpty()) {
                out.add(f("Among the linkages, %s is best supported; ", link) + String.join("; ", parts) + ".");
            }
        }
        return out;
    }

    List<String> forUnsupported() {
        var out = new ArrayList<String>();
        int maxK = evidence.settings().maxK();
        out.add(f("Unsupported: no number of clusters from 2 to %d is convincing with any linkage; the data hold no "
                + "convincing cluster structure, and the report treats them as one group (k = 1).", maxK));
        for (LinkageEvidence le : evidence.linkages()) {
            KEvidence bestStab = null;
            for (KEvidence e : le.byK()) {
                if (bestStab == null || e.stability().ari().mean() > bestStab.stability().ari().mean()) {
                    bestStab = e;
                }
            }
            String why;
            NullStability ns = bestStab.stability().nullModel();
            if (bestStab.stability().ari().mean() < rule.stableJaccard()) {
                why = f("even its most stable cut (k = %d) is reproduced only partly by replicates (mean ARI %.2f, "
                        + "below %.2f)", bestStab.k(), bestStab.stability().ari().mean(), rule.stableJaccard());
            } else if (ns != null && ns.pValueCombined() > rule.alpha()) {
                why = f("its most stable cut (k = %d, mean ARI %.2f, silhouette %.2f) is no more stable and separated "
                        + "than null data without clusters (null mean ARI %.2f, silhouette %.2f, p = %.2f)",
                        bestStab.k(), bestStab.stability().ari().mean(), bestStab.silhouette(), ns.ariMean(),
                        ns.silhouetteMean(), ns.pValueCombined());
            } else if (!(bestStab.worstJaccard() > rule.dissolvedJaccard())) {
                why = f("even its most stable cut (k = %d) dissolves a cluster (smallest mean Jaccard %.2f)",
                        bestStab.k(), bestStab.worstJaccard());
            } else {
                why = f("no cut both beats the null and keeps every cluster (best mean ARI %.2f at k = %d)",
                        bestStab.stability().ari().mean(), bestStab.k());
            }
            String gap = le.gap() == null ? "" : f("; the gap statistic picks k = %d", le.gapChoice());
            out.add(f("With %s linkage, %s%s.", le.linkage().id(), why, gap));
        }
        return out;
    }

    private String stabilitySentence(KEvidence e) {
        Stability s = e.stability();
        String base = f("Across %d replicates the mean adjusted Rand index with the full-data solution is %.2f "
                + "(95%% interval %.2f to %.2f) and PAC is %.3f", s.ari().count(), s.ari().mean(), s.ari().low(),
                s.ari().high(), s.pac());
        NullStability n = s.nullModel();
        if (n == null) {
            return base + "; no null calibration was run, so this stability cannot be compared with structureless data.";
        }
        return base + f(", against a mean ARI of %.2f (%.2f to %.2f) and PAC of %.3f on %d null data sets with the "
                + "same covariance but no clusters (Monte Carlo p = %.3f for ARI, %.3f for PAC). Stability plus "
                + "separation (mean ARI + average silhouette, %.2f here, %.2f on the null sets on average) beats the "
                + "null with p = %.3f.", n.ariMean(), n.ariLow(), n.ariHigh(), n.pacMean(), n.sets(), n.pValueAri(),
                n.pValuePac(), NullStability.combined(s.ari().mean(), e.silhouette()),
                NullStability.combined(n.ariMean(), n.silhouetteMean()), n.pValueCombined());
    }

    private String jaccardSentence(KEvidence e) {
        var weak = new ArrayList<String>();
        for (ClusterEvidence c : e.clusters()) {
            if (c.status() != JaccardStability.Status.STABLE) {
                weak.add(f("cluster %d (%d samples) is %s with mean Jaccard %.2f", c.id(), c.size(),
                        c.status().label(), c.jaccard()));
            }
        }
        if (weak.isEmpty()) {
            return f("Every cluster is stable: the smallest mean Jaccard is %.2f (stable from %.2f, Hennig 2007).",
                    e.worstJaccard(), rule.stableJaccard());
        }
        return "Not every cluster is stable: " + String.join("; ", weak) + f(" (stable from %.2f, dissolved at or "
                + "below %.2f, Hennig 2007).", rule.stableJaccard(), rule.dissolvedJaccard());
    }

    private String silhouetteSentence(KEvidence e) {
        double s = e.silhouette();
        String reading = s > 0.70 ? "a strong structure" : s > rule.reasonableSilhouette() ? "a reasonable structure"
                : s > rule.weakSilhouette() ? "a weak structure" : "no substantial structure";
        return f("The average silhouette width is %.2f: %s in the reading of Kaufman and Rousseeuw (1990).", s, reading);
    }

    private static String join(List<Integer> ks) {
        var sb = new StringBuilder();
        for (int i = 0; i < ks.size(); i++) {
            if (i > 0) {
                sb.append(i == ks.size() - 1 ? " and " : ", ");
            }
            sb.append(ks.get(i));
        }
        return sb.toString();
    }
}
