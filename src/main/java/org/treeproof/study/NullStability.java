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
 * @param silhouetteMean   mean over null sets of the average silhouette of their own reference cut at this k
 * @param silhouetteLow    2.5% quantile of the null sets' average silhouette
 * @param silhouetteHigh   97.5% quantile of the null sets' average silhouette
 * @param pValueAri        Monte Carlo p-value of the observed mean ARI (null sets reaching it)
 * @param pValuePac        Monte Carlo p-value of the observed PAC (null sets at most as ambiguous)
 * @param pValueSilhouette Monte Carlo p-value of the observed average silhouette
 * @param pValueCombined   Monte Carlo p-value of {@link #combined} (stability plus separation), the one test the
 *                         decision rule uses
 */
public record NullStability(int sets, int replicatesPerSet, double ariMean, double ariLow, double ariHigh,
        double pacMean, double pacLow, double pacHigh, double silhouetteMean, double silhouetteLow,
        double silhouetteHigh, double pValueAri, double pValuePac, double pValueSilhouette, double pValueCombined) {

    /**
     * The statistic the decision rule tests against the null: mean ARI plus average silhouette width. Stability
     * alone has little power against a null whose covariance makes one split as reproducible as a real one (two
     * well-separated groups put most of the variance on one axis, and a Gaussian elongated along it is split
     * the same way every time); separation alone ignores reproducibility. Their sum, both on [-1, 1], is large
     * only when a solution is both reproducible and separated, and its null distribution is simulated like the
     * others, so the test is valid for any such statistic. The choice of statistic is ours.
     */
    public static double combined(double meanAri, double silhouette) {
        return meanAri + silhouette;
    }
}
