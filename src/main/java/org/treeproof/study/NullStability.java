package org.treeproof.study;

/**
 * Stability of the same procedure on null data: data sets with the observed data's principal-axis
 * variances (so the same covariance) but no clusters, each resampled like the observed data.
 *
 * <p>The p-values are the usual Monte Carlo ones, (1 + number of null sets at least as extreme) /
 * (1 + number of null sets): A. C. A. Hope, "A simplified Monte Carlo significance test procedure",
 * J. R. Stat. Soc. B 30 (1968) 582-598, doi:10.1111/j.2517-6161.1968.tb00759.x; with 19 null sets the
 * smallest attainable value is 0.05.
 *
 * @param sets             null data sets drawn
 * @param replicatesPerSet replicates drawn from each
 * @param ariMean          mean over null sets of their mean ARI
 * @param ariLow           2.5% quantile of the null sets' mean ARI
 * @param ariHigh          97.5% quantile of the null sets' mean ARI
 * @param pacMean          mean over null sets of their PAC
 * @param pacLow           2.5% quantile of the null sets' PAC
 * @param pacHigh          97.5% quantile of the null sets' PAC
 * @param pValueAri        share of null sets whose mean ARI reaches the observed one (Monte Carlo p-value)
 * @param pValuePac        share of null sets whose PAC is at most the observed one (Monte Carlo p-value)
 */
public record NullStability(int sets, int replicatesPerSet, double ariMean, double ariLow, double ariHigh,
        double pacMean, double pacLow, double pacHigh, double pValueAri, double pValuePac) {
}
