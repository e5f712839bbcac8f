package org.treeproof.resample;

import java.util.Arrays;
import org.apache.commons.math3.distribution.GammaDistribution;

/**
 * The radial distribution of the elliptical null: a power exponential (multivariate generalised normal) law whose
 * tail weight and scale are fitted to the observed samples' radii.
 *
 * <p>The family has density proportional to {@code exp(-(r / s)^(2 beta) / 2)} in {@code d} dimensions, so that
 * {@code (r / s)^(2 beta) / 2} follows a gamma law of shape {@code d / (2 beta)} and scale 1: {@code beta = 1} is
 * the Gaussian, {@code beta < 1} has heavier tails, {@code beta > 1} lighter ones, tending to the uniform ball.
 * (E. Gómez, M. A. Gómez-Villegas and J. M. Marín, "A multivariate generalization of the power exponential family
 * of distributions", Commun. Stat. Theory Methods 27 (1998) 589-600, doi:10.1080/03610929808832115; the gamma
 * representation is derived beside this class's test.) For every {@code beta > 0} the density falls away from the
 * centre, so a null drawn from it has one mode and no clusters, whatever the data's tails.
 *
 * <p><b>The fit.</b> {@code beta} makes the ratio of the 95% to the 50% quantile of the radius equal to the
 * observed radii's, and {@code s} then matches their median. These quantiles are untouched by a small group or a
 * few far samples (under 5% of the samples), which the data's own radii would carry into the null as a shell of
 * far points that linkages group into clusters of their own; a heavy-tailed population moves both and so gets a
 * heavy-tailed null. The 50% and 95% quantiles and the range {@code [MIN_BETA, MAX_BETA]} are our choices.
 */
public final class RadialModel {
    /** The heaviest tail allowed. Our choice. */
    static final double MIN_BETA = 0.1;
    /** The lightest tail allowed (near the uniform ball). Our choice. */
    static final double MAX_BETA = 20;
    private static final double LOW = 0.5;
    private static final double HIGH = 0.95;

    private final int dims;
    private final double beta;
    private final double scale;

    private RadialModel(int dims, double beta, double scale) {
        this.dims = dims;
        this.beta = beta;
        this.scale = scale;
    }

    /** The model with given parameters (for tests). */
    static RadialModel of(int dims, double beta, double scale) {
        return new RadialModel(dims, beta, scale);
    }

    /**
     * Fits the model to radii observed in {@code dims} dimensions.
     *
     * @return the model, or {@code null} when the radii cannot be fitted (fewer than 2 dimensions' worth of
     *         positive radii, or a median radius of 0)
     */
    public static RadialModel fit(double[] radii, int dims) {
        if (dims < 1 || radii.length < 2) {
            return null;
        }
        double[] sorted = radii.clone();
        Arrays.sort(sorted);
        double q50 = quantile(sorted, LOW);
        double q90 = quantile(sorted, HIGH);
        if (!(q50 > 0) || !Double.isFinite(q90)) {
            return null;
        }
        double target = q90 / q50;
        double lo = Math.log(MIN_BETA);
        double hi = Math.log(MAX_BETA);
        double beta;
        if (target >= ratio(dims, MIN_BETA)) {
            beta = MIN_BETA;
        } else if (target <= ratio(dims, MAX_BETA)) {
            beta = MAX_BETA;
        } else {
            for (int i = 0; i < 100 && hi - lo > 1e-12; i++) {
                double mid = (lo + hi) / 2;
                if (ratio(dims, Math.exp(mid)) > target) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            beta = Math.exp((lo + hi) / 2);
        }
        return new RadialModel(dims, beta, q50 / unitQuantile(dims, beta, LOW));
    }

    /** The tail parameter (1: Gaussian). */
    public double beta() {
        return beta;
    }

    /** The scale {@code s}. */
    public double scale() {
        return scale;
    }

    /** The radius at probability {@code u} in (0, 1). */
    public double quantile(double u) {
        return scale * unitQuantile(dims, beta, u);
    }

    /** {@code n} radii at the model's quantiles {@code (i + 1/2) / n}, increasing. */
    public double[] radii(int n) {
        var g = gamma(dims, beta);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = scale * unitQuantile(g, beta, (i + 0.5) / n);
        }
        return out;
    }

    private static double ratio(int dims, double beta) {
        return unitQuantile(dims, beta, HIGH) / unitQuantile(dims, beta, LOW);
    }

    private static double unitQuantile(int dims, double beta, double u) {
        return unitQuantile(gamma(dims, beta), beta, u);
    }

    /** The radius quantile at {@code u} with scale 1: {@code (2 G^-1(u))^(1 / (2 beta))}, G the gamma law below. */
    private static double unitQuantile(GammaDistribution g, double beta, double u) {
        return Math.pow(2 * g.inverseCumulativeProbability(u), 1 / (2 * beta));
    }

    /** The gamma law of {@code (r / s)^(2 beta) / 2}: shape {@code dims / (2 beta)}, scale 1. */
    private static GammaDistribution gamma(int dims, double beta) {
        return new GammaDistribution(null, dims / (2 * beta), 1);
    }

    /** The linear-interpolation sample quantile (Hyndman and Fan's type 7, numpy's default) of sorted values. */
    static double quantile(double[] sorted, double u) {
        double h = (sorted.length - 1) * u;
        int i = (int) Math.floor(h);
        return i + 1 < sorted.length ? sorted[i] + (h - i) * (sorted[i + 1] - sorted[i]) : sorted[i];
    }
}
