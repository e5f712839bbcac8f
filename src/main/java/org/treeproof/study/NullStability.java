package org.treeproof.study;

/**
 * One (linkage, k) solution against the null data sets: data with no clusters, clustered, cut and resampled the
 * same way ({@link StudyRunner}; the null distribution is described in {@link NullCalibration}).
 *
 * <p>The solution's <i>excess</i> over the null is its null-standardised stability plus its null-standardised
 * separation: {@code (ARI - mean_null(ARI)) / sqrt(sd_null(ARI)^2 + sd_obs(ARI)^2 / m)
 * + (silhouette - mean_null(sil)) / sd_null(sil)}, each mean and SD taken over the null sets at the same linkage and
 * k, {@code sd_obs(ARI)} the SD of the data's replicates' ARI and {@code m} the replicates per null set (so the
 * ARI's difference is measured in SDs of the difference between two means of {@code m} replicates, one from the
 * data and one from a null set; {@link NullCalibration}). So solutions at different k and on
 * different linkages are each measured against what clustering noise gives at that k and linkage, and raw
 * silhouette, which falls with k and with the number of features whatever the structure, never compares two k.
 *
 * <p>Its p-value is adjusted for the choice among every linkage and k by the single-step maximum statistic
 * (P. H. Westfall and S. S. Young, <i>Resampling-Based Multiple Testing</i>, Wiley, 1993): the Monte Carlo
 * share of null sets whose largest test statistic over all linkages and k reaches this solution's,
 * {@code (1 + count) / (1 + sets)} (A. C. A. Hope, J. R. Stat. Soc. B 30 (1968) 582-598,
 * doi:10.1111/j.2517-6161.1968.tb00759.x).
 *
 * @param sets             null data sets drawn
 * @param replicatesPerSet replicates drawn from each (the observed test statistic uses as many)
 * @param ariMean          mean over null sets of their mean ARI
 * @param ariSD            SD over null sets of their mean ARI
 * @param ariLow           2.5% quantile of the null sets' mean ARI (a range of null sets, not a confidence
 *                         interval)
 * @param ariHigh          97.5% quantile of the null sets' mean ARI
 * @param pacMean          mean over null sets of their PAC
 * @param silhouetteMean   mean over null sets of the average silhouette of their own cut at this k
 * @param silhouetteSD     SD over null sets of that silhouette
 * @param silhouetteLow    2.5% quantile of the null sets' silhouette
 * @param silhouetteHigh   97.5% quantile of the null sets' silhouette
 * @param excess           the observed solution's excess over the null, from all its replicates
 * @param testExcess       the test statistic: the same sum from the first {@code replicatesPerSet} replicates (as
 *                         many as the null sets have), standardised by the pooled mean and SD of this value and
 *                         the null sets' values at this linkage and k ({@link NullCalibration}); NaN when the
 *                         observed cut does not exist
 * @param pValueAdjusted   the max-statistic Monte Carlo p-value of {@code testExcess} among the null sets'
 *                         largest statistics
 */
public record NullStability(int sets, int replicatesPerSet, double ariMean, double ariSD, double ariLow,
        double ariHigh, double pacMean, double silhouetteMean, double silhouetteSD, double silhouetteLow,
        double silhouetteHigh, double excess, double testExcess, double pValueAdjusted) {
}
