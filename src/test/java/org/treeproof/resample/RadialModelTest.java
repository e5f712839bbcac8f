package org.treeproof.resample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.FDistribution;
import org.junit.jupiter.api.Test;

/**
 * The radial law of the elliptical null. Reference values from scipy 1.17.1 (numpy 2.4.6), computed by hand beside
 * this test:
 * <ul>
 *   <li>In one dimension the power exponential law with density proportional to {@code exp(-(r/s)^(2b)/2)} is
 *       scipy's {@code gennorm} with shape {@code 2b} and scale {@code s * 2^(1/(2b))}, folded at 0, so its radius
 *       quantile at {@code u} is {@code gennorm.ppf((1 + u) / 2, 2b, scale)}: b = 1/2, s = 1 gives 1.386294361119891
 *       at u = 1/2 (the Laplace median, 2 ln 2); b = 3, s = 1.5 gives 1.5000250497020207 at u = 0.9. This checks the
 *       gamma representation the class uses.</li>
 *   <li>With b = 1 the law is the Gaussian, whose radius in 4 dimensions is chi with 4 degrees of freedom:
 *       {@code chi.ppf(0.5, 4)} = 1.8321282651695876, {@code chi.ppf(0.95, 4)} = 3.080215745168048.</li>
 * </ul>
 */
class RadialModelTest {

    @Test
    void quantilesMatchScipysGeneralisedNormalAndChi() {
        assertEquals(1.386294361119891, RadialModel.of(1, 0.5, 1).quantile(0.5), 1e-9);
        assertEquals(1.5000250497020207, RadialModel.of(1, 3, 1.5).quantile(0.9), 1e-9);
        assertEquals(1.8321282651695876, RadialModel.of(4, 1, 1).quantile(0.5), 1e-9);
        assertEquals(3.080215745168048, RadialModel.of(4, 1, 1).quantile(0.95), 1e-9);
    }

    @Test
    void gaussianRadiiFitTheGaussian() {
        // radii of a 5-dimensional standard Gaussian at their exact quantiles: sqrt of chi-square(5) quantiles
        var chi2 = new ChiSquaredDistribution(null, 5);
        double[] radii = new double[4000];
        for (int i = 0; i < radii.length; i++) {
            radii[i] = Math.sqrt(chi2.inverseCumulativeProbability((i + 0.5) / radii.length));
        }
        RadialModel m = RadialModel.fit(radii, 5);
        assertEquals(1, m.beta(), 0.01);
        assertEquals(1, m.scale(), 0.01);
    }

    @Test
    void heavyTailsGiveAHeavyTailedLawThatKeepsTheirMedianAnd95PercentQuantile() {
        // radii of a 10-dimensional multivariate t with 3 degrees of freedom: r^2 / 10 follows F(10, 3)
        var fd = new FDistribution(null, 10, 3);
        double[] radii = new double[2000];
        for (int i = 0; i < radii.length; i++) {
            radii[i] = Math.sqrt(10 * fd.inverseCumulativeProbability((i + 0.5) / radii.length));
        }
        RadialModel m = RadialModel.fit(radii, 10);
        assertTrue(m.beta() < 0.6, "beta " + m.beta());
        double[] sorted = radii.clone();
        assertEquals(RadialModel.quantile(sorted, 0.5), m.quantile(0.5), 1e-6);
        assertEquals(RadialModel.quantile(sorted, 0.95), m.quantile(0.95), 1e-6);
    }

    @Test
    void aSmallFarGroupDoesNotMoveTheLaw() {
        // 280 Gaussian radii in 10 dimensions and 10 at radius 13: the 95% quantile stays in the bulk (at its own
        // 98% quantile), so the law widens a little but has no shell of far samples
        var chi2 = new ChiSquaredDistribution(null, 10);
        double[] radii = new double[290];
        for (int i = 0; i < 280; i++) {
            radii[i] = Math.sqrt(chi2.inverseCumulativeProbability((i + 0.5) / 280));
        }
        for (int i = 280; i < 290; i++) {
            radii[i] = 13;
        }
        RadialModel m = RadialModel.fit(radii, 10);
        assertTrue(m.beta() > 0.6 && m.beta() < 1, "beta " + m.beta());
        double[] drawn = m.radii(290);
        assertTrue(drawn[279] < 6.5 && drawn[289] < 13 / 2.0, "largest radii " + drawn[279] + ", " + drawn[289]);
    }

    @Test
    void radiiThatCannotBeFittedAreRefused() {
        assertNull(RadialModel.fit(new double[] {0, 0, 0, 1}, 3));
        assertNull(RadialModel.fit(new double[] {1}, 3));
        assertNull(RadialModel.fit(new double[] {1, 2}, 0));
    }

    @Test
    void theSampleQuantileIsNumpysLinearInterpolation() {
        // numpy.quantile([1, 2, 4, 8], 0.5) = 3.0 and 0.9 -> 6.8 (h = 2.7: 4 + 0.7 * 4)
        assertEquals(3.0, RadialModel.quantile(new double[] {1, 2, 4, 8}, 0.5), 1e-12);
        assertEquals(6.8, RadialModel.quantile(new double[] {1, 2, 4, 8}, 0.9), 1e-12);
    }
}
