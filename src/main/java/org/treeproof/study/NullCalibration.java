package org.treeproof.study;

import java.util.Arrays;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.treeproof.score.ReplicateSummary;

/**
 * Calibrates every (linkage, k) solution against null data and runs the structure test. Pure: arrays in,
 * records out.
 *
 * <p><b>The null data.</b> A unimodal elliptical distribution with the observed data's principal axes, robust
 * scales along them and a radial law fitted to the data's ({@link
 * org.treeproof.resample.ReferenceData#ellipticalNull}): Gaussian-like for Gaussian data, as in the significance
 * test for clustering of Liu, Hayes, Nobel and Marron (2008, doi:10.1198/016214508000000454), but as
 * heavy-tailed as the data's bulk, so heavy tails alone do not beat it.
 *
 * <p><b>Two standardisations.</b> The <i>excess</i>, which orders solutions, standardises the observed mean ARI
 * and silhouette by the null sets' mean and spread at the same linkage and k. The ARI's difference is divided by
 * the SD of the difference between two means of {@code replicatesPerSet} replicates, one from the data and one
 * from a null set: {@code sqrt(sd_null^2 + sd_obs^2 / replicatesPerSet)}, where {@code sd_null} is the SD of the
 * null sets' means (each of that many replicates) and {@code sd_obs} the SD of the observed replicates' ARI. So
 * the data's mean is compared like with like, as in the test statistic below, and a solution whose replicates
 * scatter widely is not lifted by a null that happens to be narrow (a Welch-type standardised difference: B. L.
 * Welch, "The generalization of 'Student's' problem when several different population variances are involved",
 * Biometrika 34 (1947) 28-35, doi:10.1093/biomet/34.1-2.28). Dividing by {@code sd_null} alone ranked a linkage
 * whose null splits are all near ARI 0 (complete linkage at k = 2, null SD 0.009) above Ward's better reproduced
 * finer solution in wide data (RELIABILITY.md, "Linkages ranked by a z-score that a narrow null inflates").
 * The silhouette is one value of the data, so its difference is divided by the null sets' SD. The <i>test
 * statistic</i> standardises
 * the observed value (from as many replicates as each null set has) and each null set's value alike, by the
 * mean and SD of all of them that have a cut there, so that under the null the data and the null sets are
 * exchangeable and the Monte Carlo p-value holds (Hope 1968). Standardising the null sets among themselves
 * only, as the excess does, caps how far out any one of them can lie (at (m - 1) / sqrt(m) SDs of m values)
 * while the observed value is not capped, which made the test anti-conservative on noise. A set without a cut
 * at a linkage and k has no statistic there (counting it as 0 would let the few sets that have the cut stand out
 * by many SDs).
 *
 * <p><b>Null sets without a cut at k.</b> In the excess, a null set whose tree has no cut into k clusters of the
 * minimum size counts at that k as mean ARI 0 and silhouette 0 (no reproducible and no separated solution); our
 * convention. When no null set has the cut, the excess is not defined (NaN): the null's mean and SD would both be
 * 0, and the observed value divided by the SD floor is a number of hundreds that measures nothing.
 *
 * <p><b>Standardising.</b> SDs below {@link #SD_FLOOR} are raised to it, so that null sets that agree to the
 * third decimal do not turn a difference in the fourth into a large excess; the floor is our choice (the
 * measures are reported to two or three decimals).
 */
final class NullCalibration {
    /** The smallest SD a measure is standardised by. Our choice; see the class comment. */
    static final double SD_FLOOR = 1e-3;

    private NullCalibration() {
    }

    /**
     * @param obsAriTest  {@code [l][k-2]} observed mean ARI over the first {@code replicatesPerSet} replicates
     *                    (NaN where the cut does not exist)
     * @param obsAri      {@code [l][k-2]} observed mean ARI over all replicates
     * @param obsAriSd    {@code [l][k-2]} SD of the observed replicates' ARI (NaN where the cut does not exist)
     * @param obsSil      {@code [l][k-2]} observed average silhouette
     * @param nullAri     {@code [l][k-2][set]} null sets' mean ARI (NaN where the null set has no such cut)
     * @param nullSil     {@code [l][k-2][set]} null sets' silhouette
     * @param nullPac     {@code [l][k-2][set]} null sets' PAC
     */
    record Result(NullStability[][] cells, StructureTest test) {
    }

    static Result of(double[][] obsAriTest, double[][] obsAri, double[][] obsAriSd, double[][] obsSil,
            double[][][] nullAri, double[][][] nullSil, double[][][] nullPac, int replicatesPerSet) {
        int links = obsAri.length;
        int ks = obsAri[0].length;
        int sets = nullAri[0][0].length;
        double[][] ariMean = new double[links][ks];
        double[][] ariSd = new double[links][ks];
        double[][] silMean = new double[links][ks];
        double[][] silSd = new double[links][ks];
        double[] nullMax = new double[sets];
        Arrays.fill(nullMax, Double.NEGATIVE_INFINITY);
        double observedMax = Double.NEGATIVE_INFINITY;
        double[][] testExcess = new double[links][ks];
        for (int l = 0; l < links; l++) {
            for (int k = 0; k < ks; k++) {
                double[] a = filled(nullAri[l][k]);
                double[] s = filled(nullSil[l][k]);
                ariMean[l][k] = mean(a);
                ariSd[l][k] = Math.max(SD_FLOOR, sd(a, ariMean[l][k]));
                silMean[l][k] = mean(s);
                silSd[l][k] = Math.max(SD_FLOOR, sd(s, silMean[l][k]));
                // the test statistic: the observed and the null sets that have this cut, standardised alike
                double[] pa = finite(withFirst(obsAriTest[l][k], nullAri[l][k]));
                double[] ps = finite(withFirst(Double.isNaN(obsAriTest[l][k]) ? Double.NaN : obsSil[l][k],
                        nullSil[l][k]));
                double pam = mean(pa);
                double pas = Math.max(SD_FLOOR, sd(pa, pam));
                double psm = mean(ps);
                double pss = Math.max(SD_FLOOR, sd(ps, psm));
                for (int j = 0; j < sets; j++) {
                    double e = excess(nullAri[l][k][j], nullSil[l][k][j], pam, pas, psm, pss);
                    if (!Double.isNaN(e)) {
                        nullMax[j] = Math.max(nullMax[j], e);
                    }
                }
                testExcess[l][k] = excess(obsAriTest[l][k], obsSil[l][k], pam, pas, psm, pss);
                if (!Double.isNaN(testExcess[l][k])) {
                    observedMax = Math.max(observedMax, testExcess[l][k]);
                }
            }
        }
        NullStability[][] cells = new NullStability[links][ks];
        for (int l = 0; l < links; l++) {
            for (int k = 0; k < ks; k++) {
                if (Double.isNaN(obsAri[l][k])) {
                    continue;
                }
                double[] a = filled(nullAri[l][k]);
                double[] s = filled(nullSil[l][k]);
                ReplicateSummary as = ReplicateSummary.of(a);
                ReplicateSummary ss = ReplicateSummary.of(s);
                double full = finite(nullAri[l][k]).length == 0 ? Double.NaN : excess(obsAri[l][k], obsSil[l][k],
                        ariMean[l][k], ariScale(ariSd[l][k], obsAriSd[l][k], replicatesPerSet), silMean[l][k],
                        silSd[l][k]);
                cells[l][k] = new NullStability(sets, replicatesPerSet, ariMean[l][k], ariSd[l][k], as.low(),
                        as.high(), mean(finite(nullPac[l][k])), silMean[l][k], silSd[l][k], ss.low(), ss.high(), full,
                        testExcess[l][k], monteCarlo(testExcess[l][k], nullMax));
            }
        }
        double fitted = Double.NaN;
        double[] reached = finite(nullMax);
        double m = mean(reached);
        double sd = sd(reached, m);
        if (sd > 0 && Double.isFinite(observedMax)) {
            fitted = new NormalDistribution(null, m, sd).cumulativeProbability(observedMax);
            fitted = 1 - fitted;
        }
        var test = new StructureTest(observedMax, monteCarlo(observedMax, nullMax), fitted, sets, replicatesPerSet,
                nullMax);
        return new Result(cells, test);
    }

    /**
     * The excess of one observation over the null at a cell; NaN when the observation is NaN.
     *
     * @param ariScale what the ARI's difference is divided by ({@link #ariScale})
     */
    static double excess(double ari, double sil, double ariMean, double ariScale, double silMean, double silSd) {
        return (ari - ariMean) / ariScale + (sil - silMean) / silSd;
    }

    /**
     * The SD of the difference between the data's and a null set's mean ARI, each over {@code replicatesPerSet}
     * replicates: {@code sqrt(nullSd^2 + observedSd^2 / replicatesPerSet)}, at least {@link #SD_FLOOR} (see the
     * class comment). An observed SD that is not defined (fewer than two replicates) counts as 0.
     *
     * @param nullSd     SD over the null sets of their mean ARI
     * @param observedSd SD of the data's replicates' ARI
     */
    static double ariScale(double nullSd, double observedSd, int replicatesPerSet) {
        double obs = Double.isNaN(observedSd) ? 0 : observedSd * observedSd / replicatesPerSet;
        return Math.max(SD_FLOOR, Math.sqrt(nullSd * nullSd + obs));
    }

    /** Hope's Monte Carlo p-value of {@code observed} among {@code nulls} (NaN observed: 1). */
    static double monteCarlo(double observed, double[] nulls) {
        if (Double.isNaN(observed)) {
            return 1.0;
        }
        return (1.0 + reaching(observed, nulls)) / (1.0 + nulls.length);
    }

    /** How many of {@code nulls} reach {@code observed} (are not below it), as Hope's p-value counts them. */
    static int reaching(double observed, double[] nulls) {
        int atLeast = 0;
        for (double v : nulls) {
            atLeast += !(v < observed) ? 1 : 0;
        }
        return atLeast;
    }

    private static double[] filled(double[] v) {
        double[] out = v.clone();
        for (int i = 0; i < out.length; i++) {
            if (Double.isNaN(out[i])) {
                out[i] = 0;
            }
        }
        return out;
    }

    private static double[] withFirst(double first, double[] rest) {
        double[] out = new double[rest.length + 1];
        out[0] = first;
        System.arraycopy(rest, 0, out, 1, rest.length);
        return out;
    }

    private static double[] finite(double[] v) {
        return Arrays.stream(v).filter(Double::isFinite).toArray();
    }

    private static double mean(double[] v) {
        if (v.length == 0) {
            return Double.NaN;
        }
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    /** Sample SD (n - 1). */
    private static double sd(double[] v, double mean) {
        if (v.length < 2) {
            return 0;
        }
        double s = 0;
        for (double x : v) {
            s += (x - mean) * (x - mean);
        }
        return Math.sqrt(s / (v.length - 1));
    }
}
