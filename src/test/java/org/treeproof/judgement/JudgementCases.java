package org.treeproof.judgement;

import static org.treeproof.judgement.Expected.SUPPORTED;
import static org.treeproof.judgement.Expected.SUPPORTED_OR_TENTATIVE;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.treeproof.judgement.Expected.NoStructure;
import org.treeproof.judgement.Expected.Structure;

/**
 * The cases of the judgement suite and the answer each one should get, with the reason. This class is the one
 * owner of the expected answers; the README in bench/judgement prints them from here ({@code --list}).
 *
 * <p>The expected answers were written from what was planted (synthetic sets) or from what is known about the data
 * and its classes (open sets), before and independently of any output of the tool. Every case runs {@code assess}
 * with default options except the input options the data needs ({@code --log2}, {@code --samples-in-columns}).
 */
public final class JudgementCases {
    /** Where a case's input comes from. */
    public enum Source {
        /** committed under src/test/resources/judgement/open (scikit-learn's copies, see make_open_sets.py) */
        OPEN,
        /** written at run time by {@link SyntheticSets} */
        SYNTHETIC,
        /** committed under src/test/resources/judgement/fixed: numpy draws of bench/judgement/unseen/gen.py */
        FIXED
    }

    /**
     * One case.
     *
     * @param name      short unique name
     * @param source    where the files are
     * @param file      data file name
     * @param truthFile truth file name (id,class)
     * @param options   input options the data needs; nothing else differs from the defaults
     * @param expected  accepted answers and their reason
     */
    public record Case(String name, Source source, String file, String truthFile, List<String> options,
            Expected expected) {
        public Case {
            options = List.copyOf(options);
        }
    }

    private JudgementCases() {
    }

    private static final String NO_GROUPS = "One population with no groups: any split is of a continuum, so the right"
            + " answer is k = 1 (samples in the tails may be set aside as outliers).";

    /** Reasons and accepted answers of the synthetic kinds, by set name prefix. */
    private static final Map<String, Expected> SYNTHETIC = Map.ofEntries(
            Map.entry("gaussian-noise", Expected.none(NO_GROUPS + " A single Gaussian is the null model of"
                    + " significance tests for clustering (Liu et al. 2008, doi:10.1198/016214508000000454).")),
            Map.entry("uniform-noise", Expected.none(NO_GROUPS + " Uniform data on a box are the gap statistic's own"
                    + " no-cluster reference (Tibshirani, Walther & Hastie 2001, doi:10.1111/1467-9868.00293);"
                    + " light tails are not groups.")),
            Map.entry("heavy-tailed-noise", Expected.none(NO_GROUPS + " Multivariate t with 3 df: the far samples are"
                    + " the tails of the one population, so a split that sheds them is k = 1 plus outliers.")),
            Map.entry("one-far-point", Expected.none(NO_GROUPS + " The one sample 12 standard units out is an outlier,"
                    + " not a second cluster.")),
            Map.entry("skewed-noise", Expected.none(NO_GROUPS + " Log-normal features, as expression levels and"
                    + " abundances often are: a long right tail is skew, not a group.")),
            Map.entry("likert-noise", Expected.none(NO_GROUPS + " Independent answers on a 1-5 scale: ties and a"
                    + " discrete grid are not respondent types.")),
            Map.entry("composition-noise", Expected.none(NO_GROUPS + " One Dirichlet law: compositions are bounded"
                    + " and closed (parts sum to 1), which is shape, not groups.")),
            Map.entry("scattered-far-samples", Expected.none(NO_GROUPS + " 5% of the samples lie 8-14 standard units"
                    + " out in random directions: each is an outlier, and together they are no cluster.")),
            Map.entry("3-groups-3-far-points", new Expected(List.of(new Structure(Set.of(3), SUPPORTED, 30, 0.95,
                    true)), "Three groups (60, 50, 40) about 8 noise SDs apart after z-scoring, plus 3 points 25 units"
                    + " out: the answer is the 3 groups, and the far points are outliers set aside, not clusters.")),
            Map.entry("2-groups-2-far-points", new Expected(List.of(new Structure(Set.of(2), SUPPORTED, 60, 0.95,
                    true)), "Two groups (80, 70) well apart plus 2 far points: k = 2 with the far points set aside.")),
            Map.entry("wide-3-groups", new Expected(List.of(new Structure(Set.of(3), SUPPORTED, 30, 0.8, false)),
                    "Three groups planted in 24-30 of 200-500 features: Ward recovers them (ARI >= 0.9 in the"
                    + " generator's check, SyntheticSetsTest), so the evidence is there and the verdict should say"
                    + " so; silhouettes are small only because most features are noise.")),
            Map.entry("wide-4-unequal", new Expected(List.of(new Structure(Set.of(4), SUPPORTED, 10, 0.8, false)),
                    "Four unequal groups (60, 40, 25, 15) planted in 28 of 300 features, recovered by Ward (generator"
                    + " check): k = 4, the group of 15 included.")),
            Map.entry("five-uneven-groups", new Expected(List.of(new Structure(Set.of(5), SUPPORTED, 30, 0.8,
                    false)), "Five groups of 40 whose centres lie 4.4 to 8.6 noise SDs apart in ten features: each"
                    + " group is a cluster, so k = 5; a coarser cut that merges the closer pairs is a level at most,"
                    + " not the answer (no pair is set apart from the rest).")),
            Map.entry("small-real-group", new Expected(List.of(new Structure(Set.of(2), SUPPORTED, 8, 0.9, false)),
                    "A real group of 10 among 290, about 13 noise SDs away: a small group is still a cluster, so k = 2"
                    + " with the 10 as one cluster (not set aside as outliers).")),
            Map.entry("imbalanced-groups", new Expected(List.of(new Structure(Set.of(3), SUPPORTED, 12, 0.9,
                    false)), "Groups of 140, 45 and 15, each shifted 5 units on its own pair of features: k = 3.")),
            Map.entry("lopsided-groups", new Expected(List.of(new Structure(Set.of(3), SUPPORTED, 10, 0.8,
                    false)), "Groups of 400, 40 and 12, the small ones 6 noise SDs from the large one and 8.5 from"
                    + " each other: k = 3, the group of 12 included; a group far smaller than its neighbour is still a"
                    + " group.")),
            Map.entry("nested-2x2-groups", new Expected(List.of(new Structure(Set.of(2, 4),
                    SUPPORTED_OR_TENTATIVE, 30, Double.NaN, false)), "Two families 8 units apart, each of two"
                    + " subgroups 3.5 units apart: both levels are real; k = 2 (families) or k = 4 (subgroups), with"
                    + " the other level reported as a level. k = 3 splits one family and not the other.")),
            Map.entry("counts-3-subtypes", new Expected(List.of(new Structure(Set.of(3), SUPPORTED, 20, 0.9,
                    false)), "Counts of 600 genes, 3 subtypes of 30 samples each raising its own 30 genes fourfold;"
                    + " analysed as counts should be (log2, genes in rows): k = 3.")),
            Map.entry("parallel-bands", new Expected(List.of(new Structure(Set.of(2), SUPPORTED_OR_TENTATIVE, 50, 0.9,
                    false), new NoStructure()), "Two long parallel bands with an empty gap between them: the bands"
                    + " are the structure (k = 2, the bands themselves). Compact-cluster linkages may not find"
                    + " them; then k = 1 is an honest 'no evidence', but pieces cut across the bands are wrong.")),
            Map.entry("curved-chain", Expected.none("One continuous curved chain with no gap anywhere: stable-looking"
                    + " pieces of a chain are not clusters, so k = 1.")));

    /** All cases: the open sets first, then the synthetic sets in generator order. */
    public static List<Case> all() {
        var cases = new ArrayList<Case>();
        cases.add(new Case("iris", Source.OPEN, "iris.csv", "iris-truth.csv", List.of(), new Expected(
                List.of(new Structure(Set.of(2, 3), SUPPORTED_OR_TENTATIVE, 40, 0.5, false)),
                "Fisher's iris, 3 species of 50. Setosa is far from the others; versicolor and virginica overlap."
                + " So k = 2 (setosa vs the rest, ARI 0.568 with the species by arithmetic) and k = 3 (the species)"
                + " are both right; any other partition agrees less (ARI < 0.5).")));
        cases.add(new Case("wine", Source.OPEN, "wine.csv", "wine-truth.csv", List.of(), new Expected(
                List.of(new Structure(Set.of(3), SUPPORTED_OR_TENTATIVE, 30, 0.5, false)),
                "Three cultivars (59, 71, 48) on 13 chemical measurements; after z-scoring they form three groups"
                + " (known from many analyses of this set, from memory) though not far apart, so k = 3, supported or"
                + " tentative, and the 3 clusters must be the cultivars in the main (ARI >= 0.5).")));
        cases.add(new Case("breast-cancer", Source.OPEN, "breast-cancer.csv.gz", "breast-cancer-truth.csv",
                List.of(), new Expected(List.of(new NoStructure(),
                        new Structure(Set.of(2), SUPPORTED_OR_TENTATIVE, 57, Double.NaN, false)),
                "Breast Cancer Wisconsin (212 malignant, 357 benign, 30 features): the two diagnoses overlap"
                + " heavily and the features are skewed, so the cluster structure is weak. Honest answers: k = 1"
                + " (possibly plus outliers), or k = 2 with both clusters substantial (at least 10% of n). A split"
                + " of a handful of extreme samples is wrong.")));
        cases.add(new Case("digits", Source.OPEN, "digits.csv.gz", "digits-truth.csv", List.of(), new Expected(
                List.of(new Structure(Set.of(2, 3, 4, 5, 6, 7, 8, 9, 10), SUPPORTED_OR_TENTATIVE, 45, Double.NaN,
                        false)),
                "1797 images of 10 digits (174-183 each), 64 pixels: there is strong structure, but some digits"
                + " overlap (1/7, 3/5/8/9) and the default --max-k is 10, so any k from 2 to 10 is defensible as"
                + " long as every cluster is a real group: at least 45 samples, a quarter of a digit class. The"
                + " 1796/1 split of a z-scored near-constant pixel is wrong.")));
        cases.add(new Case("five-groups-numpy", Source.FIXED, "five-groups-numpy.csv", "five-groups-numpy-truth.csv",
                List.of(), new Expected(List.of(new Structure(Set.of(5), SUPPORTED, 30, 0.8, false)),
                "Five groups of 40 around centres 5 units from the origin in random directions of ten features"
                + " (the unseen set S5-5groups-p10, numpy seed 20261204): the centres lie 4.4 to 8.6 noise SDs apart,"
                + " each group is a cluster, so k = 5. Ward's k = 3 (merging the closer pairs) is supported as well"
                + " and was recommended by the larger excess before the finest level was: a coarser level, not the"
                + " answer.")));
        for (SyntheticSets.Set s : SyntheticSets.all()) {
            List<String> options = s.name().startsWith("counts") ? List.of("--log2", "--samples-in-columns")
                    : List.of();
            cases.add(new Case(s.name(), Source.SYNTHETIC, s.fileName(), s.truthFileName(), options,
                    expectedFor(s.name())));
        }
        return List.copyOf(cases);
    }

    private static Expected expectedFor(String setName) {
        Expected found = null;
        String foundKey = "";
        for (var e : SYNTHETIC.entrySet()) {
            if (setName.startsWith(e.getKey()) && e.getKey().length() > foundKey.length()) {
                found = e.getValue();
                foundKey = e.getKey();
            }
        }
        if (found == null) {
            throw new IllegalStateException("no expected answer written for synthetic set " + setName);
        }
        return found;
    }
}
