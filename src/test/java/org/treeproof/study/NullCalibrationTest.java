package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/**
 * The excess over the null and the structure test on a case small enough to work by hand. Null ARI 0.2, 0.4, 0.6
 * (mean 0.4, sample SD 0.2) and silhouette 0.1, 0.1, 0.4 (mean 0.2, SD sqrt(0.03)); observed 0.8 and 0.5 give an
 * excess of 2 + 0.3 / sqrt(0.03) = 2 + sqrt(3) = 3.7320508. The null sets' own excesses are -1 - 1/sqrt(3),
 * -1/sqrt(3) and 1 + 2/sqrt(3); a second linkage whose null sets all agree has excess 0 on each (its SD is raised to
 * the floor), so the null maxima are 0, 0 and 2.1547005, none reaching 3.73: Monte Carlo p = 1/4 (Hope 1968). A
 * normal fitted to the maxima (mean 0.7182, SD 1.2440) puts 3.732 at an upper tail of 0.0077039 (scipy 1.10.1
 * norm.sf, computed by hand beside this test).
 */
class NullCalibrationTest {

    @Test
    void aHandWorkedCaseGivesTheExcessAndBothPValues() {
        double[][] obsTest = {{0.8}, {Double.NaN}};
        double[][] obsAll = {{0.8}, {Double.NaN}};
        double[][] obsSil = {{0.5}, {Double.NaN}};
        double[][][] nullAri = {{{0.2, 0.4, 0.6}}, {{0.5, 0.5, 0.5}}};
        double[][][] nullSil = {{{0.1, 0.1, 0.4}}, {{0, 0, 0}}};
        double[][][] nullPac = {{{0.1, 0.2, 0.3}}, {{0, 0, 0}}};
        NullCalibration.Result r = NullCalibration.of(obsTest, obsAll, obsSil, nullAri, nullSil, nullPac, 10);
        NullStability c = r.cells()[0][0];
        assertEquals(2 + Math.sqrt(3), c.excess(), 1e-12);
        assertEquals(2 + Math.sqrt(3), c.testExcess(), 1e-12);
        assertEquals(0.4, c.ariMean(), 1e-12);
        assertEquals(0.2, c.ariSD(), 1e-12);
        assertEquals(Math.sqrt(0.03), c.silhouetteSD(), 1e-12);
        assertEquals(0.2, c.pacMean(), 1e-12);
        assertEquals(0.25, c.pValueAdjusted(), 0);
        assertNull(r.cells()[1][0], "a cut that does not exist has no calibration");
        StructureTest t = r.test();
        assertEquals(2 + Math.sqrt(3), t.statistic(), 1e-12);
        assertEquals(0.25, t.pValue(), 0);
        assertEquals(0.007703887379738761, t.pValueFitted(), 1e-9);
        assertEquals(3, t.nullSets());
        assertEquals(1 + 2 / Math.sqrt(3), t.nullMaxima()[2], 1e-12);
        assertEquals(0, t.nullMaxima()[0], 1e-12);
    }

    @Test
    void aNullSetWithoutTheCutCountsAsNoStructure() {
        // the second null set has no cut at this k: it counts as ARI 0 and silhouette 0
        double[][][] nullAri = {{{0.5, Double.NaN, 0.7}}};
        double[][][] nullSil = {{{0.2, Double.NaN, 0.4}}};
        NullCalibration.Result r = NullCalibration.of(new double[][] {{0.9}}, new double[][] {{0.9}},
                new double[][] {{0.5}}, nullAri, nullSil, new double[][][] {{{0, 0, 0}}}, 5);
        assertEquals(0.4, r.cells()[0][0].ariMean(), 1e-12);
        assertEquals(0.2, r.cells()[0][0].silhouetteMean(), 1e-12);
    }

    @Test
    void theMonteCarloPValueCountsTiesAsReaching() {
        assertEquals(2.0 / 3, NullCalibration.monteCarlo(1.0, new double[] {1.0, 0.5}), 1e-15);
        assertEquals(1.0 / 3, NullCalibration.monteCarlo(1.5, new double[] {1.0, 0.5}), 1e-15);
        assertEquals(1.0, NullCalibration.monteCarlo(Double.NaN, new double[] {1.0, 0.5}), 0);
    }
}
