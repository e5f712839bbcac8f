package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/**
 * The excess over the null and the structure test on a case small enough to work by hand.
 *
 * <p><b>Excess</b> (the ordering's measure): null ARI 0.2, 0.4, 0.6 (mean 0.4, sample SD 0.2) and silhouette 0.1,
 * 0.1, 0.4 (mean 0.2, SD sqrt(0.03)); observed mean ARI 0.8 whose replicates have SD sqrt(0.225), and silhouette
 * 0.5. With 10 replicates per null set the ARI's difference is divided by sqrt(0.2^2 + 0.225 / 10) = 0.25, so the
 * excess is 0.4 / 0.25 + 0.3 / sqrt(0.03) = 1.6 + sqrt(3); replicates that all agree (SD 0) give 2 + sqrt(3).
 *
 * <p><b>Test statistic</b> (the observed value and the null sets standardised alike, by the mean and SD of all
 * four): ARI 0.8, 0.2, 0.4, 0.6 have mean 0.5 and SD sqrt(0.2 / 3); silhouettes 0.5, 0.1, 0.1, 0.4 have mean 0.275
 * and SD sqrt(0.0425). The observed statistic is 0.3 / sqrt(0.2 / 3) + 0.225 / sqrt(0.0425) = 2.2533053; the null
 * sets' are -2.0107697, -1.2361730 and 0.1 / sqrt(0.2 / 3) + 0.125 / sqrt(0.0425) = 0.9936374. A second linkage
 * whose observed cut does not exist and whose null sets all agree has statistic 0 on each (the SD is raised to the
 * floor), so the null maxima are 0, 0 and 0.9936374, none reaching 2.2533: Monte Carlo p = 1/4 (Hope 1968). A normal
 * fitted to the maxima (mean 0.3312125, SD 0.5736768) puts 2.2533 at an upper tail of 0.00040335781 (scipy 1.17.1
 * {@code norm.sf}, computed by hand beside this test).
 */
class NullCalibrationTest {
    private static final double ARI_SD = Math.sqrt(0.2 / 3);
    private static final double SIL_SD = Math.sqrt(0.0425);

    @Test
    void aHandWorkedCaseGivesTheExcessTheStatisticAndBothPValues() {
        double[][] obsTest = {{0.8}, {Double.NaN}};
        double[][] obsAll = {{0.8}, {Double.NaN}};
        double[][] obsSd = {{Math.sqrt(0.225)}, {Double.NaN}};
        double[][] obsSil = {{0.5}, {Double.NaN}};
        double[][][] nullAri = {{{0.2, 0.4, 0.6}}, {{0.5, 0.5, 0.5}}};
        double[][][] nullSil = {{{0.1, 0.1, 0.4}}, {{0, 0, 0}}};
        double[][][] nullPac = {{{0.1, 0.2, 0.3}}, {{0, 0, 0}}};
        NullCalibration.Result r = NullCalibration.of(obsTest, obsAll, obsSd, obsSil, nullAri, nullSil, nullPac, 10);
        NullStability c = r.cells()[0][0];
        assertEquals(1.6 + Math.sqrt(3), c.excess(), 1e-12);
        NullCalibration.Result agreeing = NullCalibration.of(obsTest, obsAll, new double[][] {{0}, {Double.NaN}},
                obsSil, nullAri, nullSil, nullPac, 10);
        assertEquals(2 + Math.sqrt(3), agreeing.cells()[0][0].excess(), 1e-12);
        double statistic = 0.3 / ARI_SD + 0.225 / SIL_SD;
        assertEquals(2.2533053165257235, statistic, 1e-12);
        assertEquals(statistic, c.testExcess(), 1e-12);
        assertEquals(0.4, c.ariMean(), 1e-12);
        assertEquals(0.2, c.ariSD(), 1e-12);
        assertEquals(Math.sqrt(0.03), c.silhouetteSD(), 1e-12);
        assertEquals(0.2, c.pacMean(), 1e-12);
        assertEquals(0.25, c.pValueAdjusted(), 0);
        assertNull(r.cells()[1][0], "a cut that does not exist has no calibration");
        StructureTest t = r.test();
        assertEquals(statistic, t.statistic(), 1e-12);
        assertEquals(0.25, t.pValue(), 0);
        assertEquals(0.00040335781052188173, t.pValueFitted(), 1e-12);
        assertEquals(3, t.nullSets());
        assertEquals(0.1 / ARI_SD + 0.125 / SIL_SD, t.nullMaxima()[2], 1e-12);
        assertEquals(0, t.nullMaxima()[0], 1e-12);
    }

    @Test
    void theStatisticStandardisesTheObservedValueAndTheNullSetsAlike() {
        // the observed value is one of the pooled values, so it cannot lie further out than (m - 1) / sqrt(m) SDs
        // of m values (here m = 4: 1.5 per measure), however far beyond the null sets it is
        double[][][] nullAri = {{{0.1, 0.1, 0.1 + 1e-3}}};
        double[][][] nullSil = {{{0.0, 0.0, 1e-3}}};
        NullCalibration.Result r = NullCalibration.of(new double[][] {{1.0}}, new double[][] {{1.0}}, new double[][] {{0}},
                new double[][] {{0.9}}, nullAri, nullSil, new double[][][] {{{0, 0, 0}}}, 10);
        assertEquals(3.0, r.test().statistic(), 1e-2);
    }

    @Test
    void aNullSetWithoutTheCutCountsAsNoStructure() {
        // the second null set has no cut at this k: in the excess it counts as ARI 0 and silhouette 0; in the test
        // statistic it has no value at this cut, so (with no other cut) it reaches nothing
        double[][][] nullAri = {{{0.5, Double.NaN, 0.7}}};
        double[][][] nullSil = {{{0.2, Double.NaN, 0.4}}};
        NullCalibration.Result r = NullCalibration.of(new double[][] {{0.9}}, new double[][] {{0.9}}, new double[][] {{0.1}},
                new double[][] {{0.5}}, nullAri, nullSil, new double[][][] {{{0, 0, 0}}}, 5);
        assertEquals(0.4, r.cells()[0][0].ariMean(), 1e-12);
        assertEquals(0.2, r.cells()[0][0].silhouetteMean(), 1e-12);
        // pooled ARI 0.9, 0.5, 0.7 (mean 0.7, SD 0.2) and silhouette 0.5, 0.2, 0.4 (mean 11/30, SD sqrt(7/300))
        double silSd = Math.sqrt(7.0 / 300);
        assertEquals(1 + (0.5 - 11.0 / 30) / silSd, r.test().statistic(), 1e-12);
        assertEquals(Double.NEGATIVE_INFINITY, r.test().nullMaxima()[1], 0);
        assertEquals(1.0 / 4, r.test().pValue(), 0);
    }

    @Test
    void noNullSetWithTheCutLeavesTheExcessUndefined() {
        // no null set has a cut at this k (their trees shed small branches): the null's mean and SD are 0, and the
        // excess was the observed 0.2 + 0.1 over the SD floor of 0.001, 300 "SDs", which measured nothing
        double nan = Double.NaN;
        NullCalibration.Result r = NullCalibration.of(new double[][] {{0.2}}, new double[][] {{0.2}}, new double[][] {{0.1}},
                new double[][] {{0.1}}, new double[][][] {{{nan, nan, nan}}}, new double[][][] {{{nan, nan, nan}}},
                new double[][][] {{{nan, nan, nan}}}, 5);
        assertEquals(Double.NaN, r.cells()[0][0].excess(), 0);
        // the test is unchanged: the observed statistic is 0 (standardised among itself alone), and no null set
        // reaches anything, so p = 1/(1 + 3)
        assertEquals(0, r.cells()[0][0].testExcess(), 0);
        assertEquals(0.25, r.cells()[0][0].pValueAdjusted(), 0);
    }

    @Test
    void aNarrowNullDoesNotLiftAScatteredSolutionAboveAWellReproducedOne() {
        // the wide expression-like case of RELIABILITY.md, as measured: complete linkage's k = 2 (mean ARI 0.655, its
        // replicates' SD 0.330; null 0.007 +- 0.0086) and Ward's k = 3 (0.858, SD 0.039; null 0.039 +- 0.0132), 10
        // replicates per null set. Divided by the null's SD alone the ARI terms were 75.3 and 62.0; with the observed
        // means' own spread, sqrt(0.0086^2 + 0.330^2 / 10) = 0.104709 and sqrt(0.0132^2 + 0.039^2 / 10) = 0.018065,
        // they are 6.189 and 45.34
        assertEquals(0.104709, NullCalibration.ariScale(0.0086, 0.330, 10), 1e-6);
        assertEquals(0.018065, NullCalibration.ariScale(0.0132, 0.039, 10), 1e-6);
        double complete = NullCalibration.excess(0.655, 0, 0.007, NullCalibration.ariScale(0.0086, 0.330, 10), 0, 1);
        double ward = NullCalibration.excess(0.858, 0, 0.039, NullCalibration.ariScale(0.0132, 0.039, 10), 0, 1);
        assertEquals(6.189, complete, 1e-3);
        assertEquals(45.34, ward, 1e-2);
        // and the floor still holds when both spreads vanish
        assertEquals(NullCalibration.SD_FLOOR, NullCalibration.ariScale(0, 0, 10), 0);
        assertEquals(NullCalibration.SD_FLOOR, NullCalibration.ariScale(0, Double.NaN, 10), 0);
    }

    @Test
    void theMonteCarloPValueCountsTiesAsReaching() {
        assertEquals(2.0 / 3, NullCalibration.monteCarlo(1.0, new double[] {1.0, 0.5}), 1e-15);
        assertEquals(1.0 / 3, NullCalibration.monteCarlo(1.5, new double[] {1.0, 0.5}), 1e-15);
        assertEquals(1.0, NullCalibration.monteCarlo(Double.NaN, new double[] {1.0, 0.5}), 0);
    }
}
