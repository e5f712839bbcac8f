package org.treeproof.study;

/**
 * The thresholds that turn evidence into a verdict. The defaults, and where each comes from:
 *
 * <ul>
 *   <li>{@code alpha = 0.05}: the Monte Carlo p-value against null data of the observed mean ARI plus average
 *       silhouette ({@link NullStability#combined}) must be at most this (with 19 null sets: the observed
 *       solution beats every null set). Conventional level.</li>
 *   <li>{@code stableJaccard = 0.75} and {@code dissolvedJaccard = 0.5}: the bands of C. Hennig,
 *       "Cluster-wise assessment of cluster stability", Comput. Stat. Data Anal. 52 (2007) 258-271,
 *       doi:10.1016/j.csda.2006.11.025.</li>
 *   <li>{@code reasonableSilhouette = 0.5} and {@code weakSilhouette = 0.25}: the reading of the average
 *       silhouette width in L. Kaufman and P. J. Rousseeuw, <i>Finding Groups in Data</i>, Wiley (1990),
 *       doi:10.1002/9780470316801: above 0.50 a reasonable (above 0.70 strong) structure, 0.26-0.50 weak,
 *       0.25 or less no substantial structure (quoted from memory of their chapter 2).</li>
 *   <li>{@code unstableSample = 0.75}: a sample that stays with its cluster-mates in fewer than 75% of the
 *       replicates holding it is flagged. Our choice, by analogy with Hennig's stable band; common practice
 *       has no published value for this.</li>
 * </ul>
 *
 * <p>The rule, for one linkage and one k:
 * <ol>
 *   <li>Eligible when the solution beats the null ({@code pValueCombined <= alpha}), the mean ARI reaches
 *       {@code stableJaccard} (a solution that replicates reproduce only partly is not a finding, however much
 *       better than the null it is; the value borrows Hennig's stable band and is our choice), and no cluster
 *       dissolves (every mean Jaccard above {@code dissolvedJaccard}). Without null calibration (distances given
 *       without data, or {@code --null-sets 0}) nothing can be eligible for more than {@code tentative}, and
 *       the stability must instead reach a mean ARI of at least {@code stableJaccard}.</li>
 *   <li>{@code supported} when, in addition, every cluster is stable (Jaccard at least {@code stableJaccard})
 *       and the average silhouette is above {@code reasonableSilhouette}; otherwise {@code tentative}.</li>
 *   <li>The recommendation is the eligible (linkage, k) with the best verdict; ties go to the higher average
 *       silhouette, then the higher smallest cluster Jaccard, then the higher cophenetic correlation, then
 *       the earlier linkage and the smaller k.</li>
 *   <li>When nothing is eligible the verdict is {@code unsupported} and k = 1: the data hold no convincing
 *       cluster structure. The gap statistic's choice is reported beside it.</li>
 *   <li>Levels: the k of the recommended linkage whose solutions are eligible, keep every cluster stable, hold
 *       no cluster smaller than max(3, 2% of the samples), and persist over a range of cut heights at least half
 *       as long (relative to the height) as the longest-persisting such solution; the recommended k is always a
 *       level. Being cuts of one tree, levels are nested, so two or more describe nested structure. The size and
 *       persistence conditions are our own choices, made so that splitting off outliers or a transient state of
 *       the agglomeration does not count as a level.</li>
 * </ol>
 *
 * @param alpha                the largest p-value that beats the null
 * @param stableJaccard        Hennig's stable band
 * @param dissolvedJaccard     Hennig's dissolved band
 * @param reasonableSilhouette the average silhouette above which the fit is reasonable
 * @param weakSilhouette       the average silhouette at or below which there is no substantial structure
 * @param unstableSample       per-sample stability below which a sample is flagged
 */
public record DecisionRule(double alpha, double stableJaccard, double dissolvedJaccard, double reasonableSilhouette,
        double weakSilhouette, double unstableSample) {

    /** The defaults documented above. */
    public static final DecisionRule DEFAULT = new DecisionRule(0.05, 0.75, 0.5, 0.5, 0.25, 0.75);

    public DecisionRule {
        if (!(alpha > 0 && alpha < 1) || !(dissolvedJaccard < stableJaccard) || !(weakSilhouette < reasonableSilhouette)) {
            throw new IllegalArgumentException("inconsistent decision thresholds");
        }
    }
}
