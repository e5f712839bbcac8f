package org.treeproof.score;

import java.util.Locale;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;

/**
 * The approximately unbiased (AU) p-value of one branch from multiscale bootstrap counts: H. Shimodaira,
 * "An approximately unbiased test of phylogenetic tree selection", Systematic Biology 51 (2002) 492-508,
 * doi:10.1080/10635150290069913; H. Shimodaira, "Approximately unbiased tests of regions using multistep-multiscale
 * bootstrap resampling", Annals of Statistics 32 (2004) 2616-2641, doi:10.1214/009053604000000823; applied to the
 * branches of a clustering tree as in R. Suzuki and H. Shimodaira, "Pvclust: an R package for assessing the
 * uncertainty in hierarchical clustering", Bioinformatics 22 (2006) 1540-1542, doi:10.1093/bioinformatics/btl117.
 *
 * <p>At scale {@code r = n'/n} (replicates of {@code n'} features drawn with replacement from {@code n}) the branch
 * reappears in {@code C_r} of {@code B_r} replicates, {@code bp_r = C_r / B_r}, and its normalised z-value is
 * {@code z_r = Φ⁻¹(1 − bp_r)}. The model {@code z_r = v·√r + c/√r} is fitted by weighted least squares, each
 * scale weighted by the inverse of the delta-method variance of {@code z_r},
 * {@code bp_r(1 − bp_r) / (B_r φ(z_r)²)}. Then {@code au = 1 − Φ(v − c)} and {@code bp = 1 − Φ(v + c)} (the
 * fitted share at r = 1); their standard errors follow from the fit's covariance of (v, c) by the delta method,
 * and the fit's quality is the weighted residual sum of squares, a chi-square on (scales − 2) degrees of freedom
 * under the model.
 *
 * <p>Scales at which the branch reappeared in none or all replicates have no finite z-value and are left out of
 * the fit. No number is given (NaN, with the reason in {@link Result#reason()}) when the branch reappeared in
 * every replicate of every scale ({@link Status#ALWAYS}) or in none ({@link Status#NEVER}), when fewer than
 * {@value #MIN_SCALES} scales are left ({@link Status#TOO_FEW_SCALES}: the two parameters need one more scale
 * to check the fit), or when the fit is poor ({@link Status#POOR_FIT}: chi-square p-value below
 * {@value #POOR_FIT_P}; this cut-off is our choice, not a published value), or when it fits but leaves the value
 * undetermined ({@link Status#UNDETERMINED}: a standard error above {@value #MAX_SE}, see {@link #MAX_SE}).
 */
public final class MultiscaleFit {
    /** The fewest scales with a count strictly between 0 and B that give a number (our choice: df ≥ 1). */
    public static final int MIN_SCALES = 3;
    /** Below this chi-square p-value the fit is called poor and no p-value is given (our choice). */
    public static final double POOR_FIT_P = 0.01;

    /**
     * The largest standard error for which au and bp are given: a share in [0, 1] has a standard deviation of at
     * most 1/2 (Popoviciu's inequality on variances), so an error above it says the fit does not determine the value.
     */
    public static final double MAX_SE = 0.5;

    private static final NormalDistribution NORMAL = new NormalDistribution(null, 0, 1);

    /** How a branch's fit ended. */
    public enum Status {
        /** The model was fitted and fits; au and bp are given. */
        FITTED("fitted"),
        /** The chi-square test rejects the model; no p-value is given. */
        POOR_FIT("poor fit"),
        /** The branch reappeared in every replicate at every scale. */
        ALWAYS("always reappeared"),
        /** The branch reappeared in no replicate at any scale. */
        NEVER("never reappeared"),
        /** Too few scales had a count strictly between 0 and B to fit and check the model. */
        TOO_FEW_SCALES("too few scales"),
        /** The model fits, but leaves au or bp undetermined: a standard error above {@value #MAX_SE}. */
        UNDETERMINED("undetermined");

        private final String label;

        Status(String label) {
            this.label = label;
        }

        /** A short label for tables. */
        public String label() {
            return label;
        }
    }

    /**
     * The fit of one branch.
     *
     * @param au         approximately unbiased p-value in [0, 1]; NaN unless {@link Status#FITTED}
     * @param auSE       its standard error; NaN unless fitted
     * @param bp         the fitted bootstrap share at scale 1, in [0, 1]; NaN unless fitted
     * @param bpSE       its standard error; NaN unless fitted
     * @param v          the fitted signed distance (NaN when nothing was fitted)
     * @param c          the fitted curvature (NaN when nothing was fitted)
     * @param chiSquare  the weighted residual sum of squares (NaN when nothing was fitted)
     * @param df         its degrees of freedom, scales used − 2 (0 when nothing was fitted)
     * @param fitPValue  the chi-square p-value of the fit (NaN when nothing was fitted)
     * @param scalesUsed scales with a count strictly between 0 and B
     * @param status     how the fit ended
     * @param reason     for anything but {@link Status#FITTED}, why no p-value is given, in plain words; else empty
     */
    public record Result(double au, double auSE, double bp, double bpSE, double v, double c, double chiSquare, int df,
            double fitPValue, int scalesUsed, Status status, String reason) {

        /** Whether au and bp are numbers. */
        public boolean fitted() {
            return status == Status.FITTED;
        }
    }

    private final double[] scales;
    private final int[] replicates;
    private final int[] counts;

    private MultiscaleFit(double[] scales, int[] replicates, int[] counts) {
        this.scales = scales;
        this.replicates = replicates;
        this.counts = counts;
    }

    /**
     * The fit of counts at scales.
     *
     * @param scales     each scale r = n'/n, positive
     * @param replicates replicates B_r drawn at each scale, positive
     * @param counts     replicates C_r in which the branch reappeared, in [0, B_r]
     */
    public static MultiscaleFit of(double[] scales, int[] replicates, int[] counts) {
        if (scales.length != replicates.length || scales.length != counts.length) {
            throw new IllegalArgumentException("scales, replicates and counts differ in length");
        }
        for (int i = 0; i < scales.length; i++) {
            if (!(scales[i] > 0) || Double.isInfinite(scales[i])) {
                throw new IllegalArgumentException("scale " + i + " is not positive: " + scales[i]);
            }
            if (replicates[i] < 1 || counts[i] < 0 || counts[i] > replicates[i]) {
                throw new IllegalArgumentException("scale " + i + ": count " + counts[i] + " of " + replicates[i]);
            }
        }
        return new MultiscaleFit(scales.clone(), replicates.clone(), counts.clone());
    }

    public Result compute() {
        int s = scales.length;
        int none = 0;
        int all = 0;
        int used = 0;
        for (int i = 0; i < s; i++) {
            if (counts[i] == 0) {
                none++;
            } else if (counts[i] == replicates[i]) {
                all++;
            } else {
                used++;
            }
        }
        if (all == s) {
            return unfitted(0, Status.ALWAYS, "reappeared in every replicate at every scale, so the curve cannot be "
                    + "fitted (support is at least as strong as the replicates can show)");
        }
        if (none == s) {
            return unfitted(0, Status.NEVER, "reappeared in no replicate at any scale");
        }
        if (used < MIN_SCALES) {
            return unfitted(used, Status.TOO_FEW_SCALES, "only " + used + " of " + s + " scales had the branch in "
                    + "some but not all replicates; at least " + MIN_SCALES + " are needed to fit and check the curve");
        }
        double[] y = new double[used];
        double[][] x = new double[used][2];
        int row = 0;
        for (int i = 0; i < s; i++) {
            if (counts[i] == 0 || counts[i] == replicates[i]) {
                continue;
            }
            double bp = (double) counts[i] / replicates[i];
            double z = -NORMAL.inverseCumulativeProbability(bp);
            double dens = NORMAL.density(z);
            double variance = bp * (1 - bp) / (replicates[i] * dens * dens);
            double w = Math.sqrt(1 / variance);
            double root = Math.sqrt(scales[i]);
            y[row] = z * w;
            x[row][0] = root * w;
            x[row][1] = w / root;
            row++;
        }
        var ols = new OLSMultipleLinearRegression();
        ols.setNoIntercept(true);
        ols.newSampleData(y, x);
        double[] beta;
        double[][] cov;
        try {
            beta = ols.estimateRegressionParameters();
            cov = ols.estimateRegressionParametersVariance();
        } catch (org.apache.commons.math3.linear.SingularMatrixException e) {
            return unfitted(used, Status.TOO_FEW_SCALES, "the scales used cannot separate the two parameters "
                    + "(fewer than two distinct scales)");
        }
        double v = beta[0];
        double c = beta[1];
        double chi = ols.calculateResidualSumOfSquares();
        int df = used - 2;
        double p = 1 - new ChiSquaredDistribution(null, df).cumulativeProbability(chi);
        if (p < POOR_FIT_P) {
            return new Result(Double.NaN, Double.NaN, Double.NaN, Double.NaN, v, c, chi, df, p, used, Status.POOR_FIT,
                    String.format(Locale.ROOT, "the curve fits poorly (chi-square %.2f on %d df, p = %.2g, below %s)",
                            chi, df, p, POOR_FIT_P));
        }
        double au = NORMAL.cumulativeProbability(c - v);
        double bp = NORMAL.cumulativeProbability(-(v + c));
        double dAu = NORMAL.density(v - c);
        double dBp = NORMAL.density(v + c);
        double auSE = dAu * Math.sqrt(Math.max(0, cov[0][0] + cov[1][1] - 2 * cov[0][1]));
        double bpSE = dBp * Math.sqrt(Math.max(0, cov[0][0] + cov[1][1] + 2 * cov[0][1]));
        if (!(auSE <= MAX_SE && bpSE <= MAX_SE)) {
            return new Result(Double.NaN, Double.NaN, Double.NaN, Double.NaN, v, c, chi, df, p, used,
                    Status.UNDETERMINED, String.format(Locale.ROOT, "the curve fits but does not determine the value "
                            + "(standard error of au %.2f, of bp %.2f; above %s)", auSE, bpSE, MAX_SE));
        }
        return new Result(au, auSE, bp, bpSE, v, c, chi, df, p, used, Status.FITTED, "");
    }

    private static Result unfitted(int used, Status status, String reason) {
        return new Result(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 0,
                Double.NaN, used, status, reason);
    }
}
