package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import org.treeproof.explain.ContrastTest;
import org.treeproof.explain.CovariateAssociation;
import org.treeproof.explain.CovariateKind;
import org.treeproof.explain.CovariateResult;
import org.treeproof.explain.CovariateRule;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.SensitivityResult;

/**
 * The words for the explanation of the recommended solution, shared by the HTML report and {@code methods.md}:
 * what was done, one sentence per cluster, the covariates and the alternative analyses, and the caution on
 * describing clusters by the data that formed them.
 */
final class ExplainProse {
    /** The features named per cluster in sentences and tables. */
    static final int NAMED = 3;
    /** The q-value at which a feature counts as distinguishing its cluster in the words. */
    static final double Q_LEVEL = 0.05;

    static final Reference WILCOXON = new Reference("Wilcoxon, 1945", "Wilcoxon, F. (1945). Individual comparisons "
            + "by ranking methods. Biometrics Bulletin, 1, 80–83.", "10.2307/3001968");
    static final Reference MANN_WHITNEY = new Reference("Mann & Whitney, 1947", "Mann, H. B. & Whitney, D. R. (1947). "
            + "On a test of whether one of two random variables is stochastically larger than the other. Annals of "
            + "Mathematical Statistics, 18, 50–60.", "10.1214/aoms/1177730491");
    static final Reference WELCH = new Reference("Welch, 1947", "Welch, B. L. (1947). The generalization of "
            + "'Student's' problem when several different population variances are involved. Biometrika, 34, 28–35.",
            "10.1093/biomet/34.1-2.28");
    static final Reference BENJAMINI_HOCHBERG = new Reference("Benjamini & Hochberg, 1995", "Benjamini, Y. & "
            + "Hochberg, Y. (1995). Controlling the false discovery rate: a practical and powerful approach to multiple "
            + "testing. Journal of the Royal Statistical Society B, 57, 289–300.", "10.1111/j.2517-6161.1995.tb02031.x");
    static final Reference KRUSKAL_WALLIS = new Reference("Kruskal & Wallis, 1952", "Kruskal, W. H. & Wallis, W. A. "
            + "(1952). Use of ranks in one-criterion variance analysis. Journal of the American Statistical "
            + "Association, 47, 583–621.", "10.1080/01621459.1952.10483441");
    /** Entry quoted from memory of the paper; no DOI known. */
    static final Reference TOMCZAK = new Reference("Tomczak & Tomczak, 2014", "Tomczak, M. & Tomczak, E. (2014). The "
            + "need to report effect size estimates revisited. An overview of some recommended measures of effect size. "
            + "Trends in Sport Sciences, 21, 19–25.", "");
    static final Reference CRAMER = new Reference("Cramér, 1946", "Cramér, H. (1946). Mathematical Methods of "
            + "Statistics. Princeton University Press (section 21.9). ISBN 0-691-08004-6.", "");
    static final Reference FISHER = new Reference("Fisher, 1922", "Fisher, R. A. (1922). On the interpretation of χ² "
            + "from contingency tables, and the calculation of P. Journal of the Royal Statistical Society, 85, 87–94.",
            "10.2307/2340521");

    private ExplainProse() {
    }

    /** The plain-words caution on features found by the data that formed the clusters. */
    static String doubleDipping() {
        return "The features that set a cluster apart were found in the same data that formed the clusters, so they "
                + "describe the clusters rather than confirm them: the clusters were built to differ, and some features "
                + "will differ between them even when the clusters are not real groups. Their p- and q-values are "
                + "therefore too small (this is sometimes called double dipping); read them as a ranking, and test a "
                + "feature on new samples before treating it as a marker.";
    }

    /** What was done, for the methods. */
    static List<String> methods(Explanation e, Set<Reference> cited) {
        var out = new ArrayList<String>();
        FeatureTable t = e.features();
        if (t != null) {
            String test = t.test() == ContrastTest.WILCOXON
                    ? f("a two-sided Wilcoxon rank-sum test (%s; %s) by the normal approximation with tie and "
                            + "continuity corrections", cite(cited, WILCOXON), cite(cited, MANN_WHITNEY))
                    : f("a two-sided Welch t-test (%s)", cite(cited, WELCH));
            out.add(f("To describe the recommended clusters, each of the %d features of the prepared data was compared "
                    + "between each cluster and the other clustered samples%s by the standardised mean difference "
                    + "(Cohen's d with the pooled standard deviation), the AUC (the probability that a sample of the "
                    + "cluster has the higher value) and %s, with Benjamini-Hochberg q-values over the features within "
                    + "each cluster (%s); features were ranked by the distance of the AUC from 0.5.",
                    t.features().size(), outliers(e), test, cite(cited, BENJAMINI_HOCHBERG)));
        }
        if (e.covariates() != null && !e.covariates().isEmpty()) {
            out.add(f("Each covariate was tested against the clusters: a categorical one by Pearson's chi-square test "
                    + "(Fisher's exact test (%s) for a 2 × 2 table, or a Monte Carlo test with %d permutations for a larger "
                    + "one, when an expected count was below 5) with Cramér's V (%s) as the effect; a numeric one by the "
                    + "Kruskal-Wallis test (%s) with epsilon-squared (%s) as the effect; q-values "
                    + "are Benjamini-Hochberg (%s) over the covariates. A covariate was flagged when q ≤ %s and Cramér's V ≥ "
                    + "%s or epsilon-squared ≥ %s.", cite(cited, FISHER), CovariateAssociation.PERMUTATIONS,
                    cite(cited, CRAMER), cite(cited, KRUSKAL_WALLIS), cite(cited, TOMCZAK), cite(cited, BENJAMINI_HOCHBERG), Numbers.plain(CovariateRule.MAX_Q),
                    Numbers.plain(CovariateRule.MIN_CRAMERS_V), Numbers.plain(CovariateRule.MIN_EPSILON_SQUARED)));
        }
        SensitivityResult s = e.sensitivity();
        if (s != null) {
            List<SensitivityResult.Row> skipped = s.rows().stream().filter(r -> !r.ran()).toList();
            // the choices that were changed, named once each in the order the alternatives ran
            List<String> choices = s.rows().stream().map(r -> CHOICES.getOrDefault(r.change(), r.change()))
                    .distinct().toList();
            out.add(f("To see whether other reasonable analyses find the same clusters, the %s linkage was rerun at "
                    + "k = %d under %d alternative analys%s, each changing one choice (%s), and compared with the "
                    + "recommended solution by the "
                    + "adjusted Rand index and, per cluster, the Jaccard similarity of its best match (found again at "
                    + "%s or more).%s", s.linkage(), s.k(), s.ran().size(), s.ran().size() == 1 ? "is" : "es",
                    Prose.or(choices), Numbers.plain(s.survives()), skipped.isEmpty() ? "" : f(" %s tried and could not run on these data: %s.",
                            skipped.size() == 1 ? "One more alternative was" : skipped.size() + " more alternatives were",
                            String.join("; ", skipped.stream().map(r -> r.name() + " (" + r.note() + ")").toList()))));
        }
        return out;
    }

    /** How the methods text names each kind of change of the sensitivity analysis ({@code Alternative.change}). */
    private static final java.util.Map<String, String> CHOICES = java.util.Map.of("scale", "scaling", "log2", "log2",
            "library-size", "the library-size scaling", "top-variable", "the number of most variable features",
            "center-within", "the batch means kept", "metric", "the dissimilarity");

    /** The references {@link #methods} cites for this explanation, in the order it cites them. */
    static List<Reference> references(Explanation e) {
        var cited = new java.util.LinkedHashSet<Reference>();
        methods(e, cited);
        return List.copyOf(cited);
    }

    private static String outliers(Explanation e) {
        int o = e.solution().outliers();
        return o == 0 ? "" : f(" (%d outlier%s set aside took no part)", o, o == 1 ? "" : "s");
    }

    private static String cite(Set<Reference> cited, Reference r) {
        cited.add(r);
        return r.cite();
    }

    /** One sentence per cluster: its size and the features that set it apart most. */
    static List<String> clusterSentences(FeatureTable t) {
        var out = new ArrayList<String>();
        for (int c = 1; c <= t.clusters(); c++) {
            var named = new ArrayList<String>();
            for (int r = 1; r <= Math.min(NAMED, t.features().size()); r++) {
                named.add(feature(t, c, t.featureAtRank(c, r)));
            }
            int sig = t.significant(c, Q_LEVEL);
            out.add(f("Cluster %d (%d samples) is set apart most by %s; %d of %d features %s q ≤ %s.", c,
                    t.clusterSize(c), Prose.and(named), sig, t.features().size(), sig == 1 ? "has" : "have",
                    Numbers.plain(Q_LEVEL)));
        }
        return out;
    }

    /** A feature with its direction, AUC and d: "GeneA (higher; AUC 0.97, d 2.10)". */
    static String feature(FeatureTable t, int c, int j) {
        double auc = t.auc(c, j);
        return f("%s (%s; AUC %s, d %s)", t.features().get(j), auc >= 0.5 ? "higher" : "lower",
                Numbers.fixed(auc, 2), Numbers.fixed(t.effect(c, j), 2));
    }

    /** What the covariates showed, in one or two sentences. */
    static String covariates(List<CovariateResult> results) {
        List<String> flagged = results.stream().filter(CovariateResult::flagged).map(CovariateResult::name).toList();
        List<String> tested = results.stream().map(CovariateResult::name).toList();
        if (flagged.isEmpty()) {
            return tested.size() == 1
                    ? f("The covariate '%s' was not strongly associated with the clusters.", tested.get(0))
                    : f("None of the %d covariates (%s) was strongly associated with the clusters.", tested.size(),
                            Prose.and(tested));
        }
        return f("The clusters largely follow %s (%s); the other covariates were not flagged.", Prose.and(flagged
                .stream().map(n -> "'" + n + "'").toList()), String.join("; ", results.stream()
                .filter(CovariateResult::flagged).map(r -> f("%s %s, q %s", r.effectName(), Numbers.fixed(r.effect(),
                        2), q(r.qValue()))).toList()));
    }

    static String q(double q) {
        return q < 0.001 ? "< 0.001" : Numbers.fixed(q, 3);
    }

    /** What the alternative analyses showed. */
    static String sensitivity(SensitivityResult s) {
        List<SensitivityResult.Row> ran = s.ran();
        if (ran.isEmpty()) {
            return "None of the alternative analyses could be run on these data.";
        }
        double[] ari = ran.stream().mapToDouble(SensitivityResult.Row::ari).sorted().toArray();
        double median = ari.length % 2 == 1 ? ari[ari.length / 2] : (ari[ari.length / 2 - 1] + ari[ari.length / 2]) / 2;
        long all = ran.stream().filter(r -> r.surviving(s.survives()) == s.k()).count();
        return f("Under %d alternative analyses the adjusted Rand index with the recommended solution ranged from %s "
                + "to %s (median %s); all %d clusters were found again in %d of them.", ran.size(),
                Numbers.fixed(ari[0], 2), Numbers.fixed(ari[ari.length - 1], 2), Numbers.fixed(median, 2), s.k(), all);
    }

    /** The Jaccard values of a row, "0.98, 0.95, 0.40". */
    static String jaccards(SensitivityResult.Row r) {
        return String.join(", ", Arrays.stream(r.jaccard()).mapToObj(j -> Numbers.fixed(j, 2)).toList());
    }

    static String kind(CovariateKind k) {
        return k.id();
    }
}
