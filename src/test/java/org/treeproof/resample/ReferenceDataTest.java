package org.treeproof.resample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.treeproof.resample.PrincipalAxesTest.doubles;
import static org.treeproof.resample.PrincipalAxesTest.matrix;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.distance.Metric;

class ReferenceDataTest {

    private static final List<Function<DataMatrix, ReferenceData>> ALL = List.of(
            ReferenceData::featureRange, ReferenceData::principalBox, ReferenceData::gaussian);

    /** Correlated, offset data: three features mixed from independent uniforms. */
    private static DataMatrix correlated(long seed, int n) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] v = new double[n * 3];
        for (int i = 0; i < n; i++) {
            double a = rng.nextDouble() - 0.5;
            double b = rng.nextDouble() - 0.5;
            double c = rng.nextDouble() - 0.5;
            v[i * 3] = 10 + 4 * a;
            v[i * 3 + 1] = -3 + 3 * a + 1.5 * b;
            v[i * 3 + 2] = 0.5 * a - b + 0.8 * c;
        }
        return matrix(n, 3, v);
    }

    private static DataMatrix wide(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] v = new double[10 * 35];
        for (int a = 0; a < v.length; a++) {
            v[a] = rng.nextDouble() * (1 + a % 35) - 2;
        }
        return matrix(10, 35, v);
    }

    @Test
    void drawsKeepShapeIdsAndNames() {
        for (DataMatrix x : List.of(correlated(1, 40), wide(2))) {
            for (var make : ALL) {
                DataMatrix z = make.apply(x).draw(99);
                assertEquals(x.sampleIds(), z.sampleIds());
                assertEquals(x.featureNames(), z.featureNames());
                assertEquals(x.samples(), z.samples());
                assertEquals(x.features(), z.features());
                assertEquals(0, z.missingCount());
            }
        }
    }

    @Test
    void aSeedDeterminesTheDrawAndDifferentSeedsDiffer() {
        DataMatrix x = correlated(3, 30);
        for (var make : ALL) {
            ReferenceData one = make.apply(x);
            ReferenceData two = make.apply(x);
            assertTrue(Arrays.equals(one.draw(5).rowMajorCopy(), two.draw(5).rowMajorCopy()), one.toString());
            assertTrue(Arrays.equals(one.draw(5).rowMajorCopy(), one.draw(5).rowMajorCopy()));
            assertFalse(Arrays.equals(one.draw(5).rowMajorCopy(), one.draw(6).rowMajorCopy()), one.toString());
        }
    }

    @Test
    void featureRangeStaysInsideEachObservedRange() {
        // Method (a) of Tibshirani, Walther & Hastie (2001): uniform over [min_j, max_j] of each feature.
        DataMatrix x = correlated(4, 2000);
        ReferenceData ref = ReferenceData.featureRange(x);
        for (long seed = 0; seed < 5; seed++) {
            DataMatrix z = ref.draw(seed);
            for (int j = 0; j < 3; j++) {
                double[] col = x.column(j);
                double lo = Arrays.stream(col).min().orElseThrow();
                double hi = Arrays.stream(col).max().orElseThrow();
                double mean = 0;
                for (int i = 0; i < z.samples(); i++) {
                    double v = z.get(i, j);
                    assertTrue(v >= lo && v <= hi, v + " outside [" + lo + ", " + hi + "]");
                    mean += v / z.samples();
                }
                // Uniform on [lo, hi]: mean (lo+hi)/2 with standard error (hi−lo)/sqrt(12 n); 5 SE allowed.
                assertEquals((lo + hi) / 2, mean, 5 * (hi - lo) / Math.sqrt(12.0 * z.samples()));
            }
        }
    }

    @Test
    void constantFeatureStaysConstant() {
        DataMatrix x = matrix(3, 2, new double[] {1, 7, 2, 7, 3, 7});
        DataMatrix z = ReferenceData.featureRange(x).draw(1);
        for (int i = 0; i < 3; i++) {
            assertEquals(7, z.get(i, 1));
        }
    }

    @Test
    void principalBoxStaysInsideTheRotatedBoxAndTheDataSubspace() {
        // Method (b): in the coordinates X_c V every draw lies within the observed ranges of those columns,
        // and nothing lies off the span of the kept axes (checked on wide data, whose rank n−1 < p).
        for (DataMatrix x : List.of(correlated(5, 300), wide(6))) {
            PrincipalAxes pa = PrincipalAxes.of(x);
            int r = pa.rank();
            int n = x.samples();
            int p = x.features();
            double[] obs = pa.scores(x);
            double[] lo = new double[r];
            double[] hi = new double[r];
            Arrays.fill(lo, Double.POSITIVE_INFINITY);
            Arrays.fill(hi, Double.NEGATIVE_INFINITY);
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < r; c++) {
                    lo[c] = Math.min(lo[c], obs[i * r + c]);
                    hi[c] = Math.max(hi[c], obs[i * r + c]);
                }
            }
            ReferenceData ref = ReferenceData.principalBox(x, pa);
            for (long seed = 10; seed < 15; seed++) {
                DataMatrix z = ref.draw(seed);
                double[] s = pa.scores(z);
                double[] m = pa.means();
                for (int i = 0; i < n; i++) {
                    for (int c = 0; c < r; c++) {
                        double tol = 1e-9 * (hi[c] - lo[c] + 1);
                        assertTrue(s[i * r + c] >= lo[c] - tol && s[i * r + c] <= hi[c] + tol,
                                "axis " + c + ": " + s[i * r + c] + " outside [" + lo[c] + ", " + hi[c] + "]");
                    }
                    for (int j = 0; j < p; j++) {
                        double back = m[j];
                        for (int c = 0; c < r; c++) {
                            back += s[i * r + c] * pa.component(c, j);
                        }
                        assertEquals(z.get(i, j), back, 1e-9, "draw leaves the data's affine subspace");
                    }
                }
            }
        }
    }

    @Test
    void principalBoxFromPrecomputedAxesEqualsComputingThem() {
        DataMatrix x = wide(7);
        assertTrue(Arrays.equals(ReferenceData.principalBox(x).draw(3).rowMajorCopy(),
                ReferenceData.principalBox(x, PrincipalAxes.of(x)).draw(3).rowMajorCopy()));
        assertThrows(IllegalArgumentException.class,
                () -> ReferenceData.principalBox(x, PrincipalAxes.of(correlated(1, 10))));
    }

    @Test
    void theEllipticalNullIsAsWideAsOneModeAlongAnAxisThatSeparatesTwo() {
        // Feature 1: two modes at -5 and +5, SD 1 each (SD of the whole 5.1); feature 2: N(0, 1.5²). The first
        // principal axis is feature 1. Its Qn falls among the distances within a mode (about 2.2, as statsmodels
        // gives for the two-mode sample of QnScaleTest), so the null's spread along it is about 2.2 / 1.5 = 1.5
        // times that along feature 2 (an elliptical null's covariance is diag(scale²) in the axes, whatever its
        // radial law); the normalised MAD (about 7.4, the modes' distance from the median) would give about 5,
        // the SD about 3.4.
        int n = 2000;
        var rng = new SplittableRandom(41);
        double[] v = new double[n * 2];
        for (int i = 0; i < n; i++) {
            v[i * 2] = (i % 2 == 0 ? -5 : 5) + rng.nextGaussian();
            v[i * 2 + 1] = 1.5 * rng.nextGaussian();
        }
        DataMatrix x = matrix(n, 2, v);
        DataMatrix z = ReferenceData.ellipticalNull(x).draw(7);
        double[][] c = covariance(z);
        double ratio = Math.sqrt(c[0][0] / c[1][1]);
        assertTrue(ratio > 1.2 && ratio < 1.9, "null SD ratio along the two axes " + ratio);
    }

    @Test
    void gaussianNullKeepsTheDataCovariance() {
        // The Gaussian null's expected sample covariance is the data's (Z diag(sd) Vᵀ has covariance
        // V diag(var) Vᵀ). For a Gaussian sample of size n, an entry of the sample covariance has variance
        // (S_aa S_bb + S_ab²)/(n − 1) (Wishart moments); allow 5 such standard errors, and 5 SE for the means.
        int n = 5000;
        DataMatrix x = correlated(8, n);
        double[][] sx = covariance(x);
        double[] mx = columnMeans(x);
        ReferenceData ref = ReferenceData.gaussian(x);
        for (long seed = 20; seed < 23; seed++) {
            DataMatrix z = ref.draw(seed);
            double[][] sz = covariance(z);
            double[] mz = columnMeans(z);
            for (int a = 0; a < 3; a++) {
                assertEquals(mx[a], mz[a], 5 * Math.sqrt(sx[a][a] / n), "mean " + a);
                for (int b = 0; b < 3; b++) {
                    double se = Math.sqrt((sx[a][a] * sx[b][b] + sx[a][b] * sx[a][b]) / (n - 1));
                    assertEquals(sx[a][b], sz[a][b], 5 * se, "covariance " + a + "," + b);
                }
            }
        }
        // The draws are Gaussian, not a rotated copy of the (uniform-based) data: the kurtosis of the first
        // axis coordinate is 3 for a normal sample and 1.8 for a uniform one; its SE is about sqrt(24/n) = 0.07.
        DataMatrix z = ref.draw(30);
        PrincipalAxes pa = PrincipalAxes.of(x);
        double[] s = pa.scores(z);
        int r = pa.rank();
        double m2 = 0;
        double m4 = 0;
        for (int i = 0; i < n; i++) {
            double v = s[i * r];
            m2 += v * v / n;
            m4 += v * v * v * v / n;
        }
        assertEquals(3.0, m4 / (m2 * m2), 0.3, "kurtosis of a normal sample (SE about sqrt(24/n) = 0.07)");
    }

    private static double[] columnMeans(DataMatrix x) {
        double[] m = new double[x.features()];
        for (int j = 0; j < m.length; j++) {
            m[j] = Arrays.stream(x.column(j)).average().orElseThrow();
        }
        return m;
    }

    private static double[][] covariance(DataMatrix x) {
        int p = x.features();
        int n = x.samples();
        double[] m = columnMeans(x);
        double[][] s = new double[p][p];
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < p; a++) {
                for (int b = 0; b < p; b++) {
                    s[a][b] += (x.get(i, a) - m[a]) * (x.get(i, b) - m[b]) / (n - 1);
                }
            }
        }
        return s;
    }

    @Test
    void streamsMatchAnIndependentSplitMix64() throws IOException {
        // Reference: make_reference.py re-implements SplittableRandom's SplitMix64 stream and the
        // Marsaglia-Bray polar method, then applies the documented draw order. Method (a) uses only IEEE
        // + and × on the same doubles, so it must agree bit for bit; (b) and (c) go through the axes
        // (and, for (c), a logarithm from a different maths library), so they agree to rounding.
        JsonNode s = PrincipalAxesTest.fixture().get("referenceStreams");
        long seed = s.get("seed").asLong();
        JsonNode multi = s.get("multi");
        DataMatrix x = matrix(multi.get("n").asInt(), multi.get("p").asInt(), doubles(multi.get("data")));
        double[] expected = doubles(multi.get("featureRange"));
        double[] got = ReferenceData.featureRange(x).draw(seed).rowMajorCopy();
        for (int a = 0; a < expected.length; a++) {
            assertEquals(Double.doubleToLongBits(expected[a]), Double.doubleToLongBits(got[a]), "value " + a);
        }
        JsonNode single = s.get("single");
        DataMatrix y = matrix(single.get("n").asInt(), 1, doubles(single.get("data")));
        double[] box = ReferenceData.principalBox(y).draw(seed).rowMajorCopy();
        double[] gauss = ReferenceData.gaussian(y).draw(seed).rowMajorCopy();
        double[] eBox = doubles(single.get("principalBox"));
        double[] eGauss = doubles(single.get("gaussian"));
        for (int i = 0; i < eBox.length; i++) {
            assertEquals(eBox[i], box[i], 1e-12, "principal box " + i);
            assertEquals(eGauss[i], gauss[i], 1e-12, "gaussian " + i);
        }
    }

    @Test
    void kindsParseUserNamesAndAliases() {
        assertSame(ReferenceData.Kind.FEATURE_RANGE, ReferenceData.Kind.parse("feature-range"));
        assertSame(ReferenceData.Kind.FEATURE_RANGE, ReferenceData.Kind.parse(" Range "));
        assertSame(ReferenceData.Kind.PRINCIPAL_BOX, ReferenceData.Kind.parse("PRINCIPAL-BOX"));
        assertSame(ReferenceData.Kind.PRINCIPAL_BOX, ReferenceData.Kind.parse("pca-box"));
        assertEquals("principal-box", ReferenceData.Kind.PRINCIPAL_BOX.toString());
        InputException e = assertThrows(InputException.class, () -> ReferenceData.Kind.parse("uniformish"));
        assertTrue(e.getMessage().contains("'uniformish'") && e.getMessage().contains("feature-range")
                && e.getMessage().contains("principal-box"), e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
    }

    @Test
    void kindsPrepareTheirGenerator() {
        DataMatrix x = correlated(9, 25);
        assertTrue(Arrays.equals(ReferenceData.Kind.FEATURE_RANGE.prepare(x).draw(4).rowMajorCopy(),
                ReferenceData.featureRange(x).draw(4).rowMajorCopy()));
        assertTrue(Arrays.equals(ReferenceData.Kind.PRINCIPAL_BOX.prepare(x).draw(4).rowMajorCopy(),
                ReferenceData.principalBox(x).draw(4).rowMajorCopy()));
        assertNotEquals(ReferenceData.Kind.FEATURE_RANGE.prepare(x).draw(4).get(0, 0),
                ReferenceData.Kind.PRINCIPAL_BOX.prepare(x).draw(4).get(0, 0));
    }

    @Test
    void missingValuesAreRefused() {
        DataMatrix x = matrix(2, 2, new double[] {1, Double.NaN, 3, 4});
        for (var make : ALL) {
            InputException e = assertThrows(InputException.class, () -> make.apply(x));
            assertTrue(e.getMessage().contains("'s0'") && e.getMessage().contains("'f1'"), e.getMessage());
        }
    }

    /** 0/1 data: feature j is 1 in the first (j + 1) * n / 5 samples. */
    private static DataMatrix binary(int n) {
        double[] v = new double[n * 4];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < 4; j++) {
                v[i * 4 + j] = i < (j + 1) * n / 5 ? 1 : 0;
            }
        }
        return matrix(n, 4, v);
    }

    @Test
    void featureFrequencyDrawsZerosAndOnesWithEachFeaturesFrequency() {
        // Independent Bernoulli features with the observed frequencies 0.2, 0.4, 0.6, 0.8: a draw of n samples has
        // a share of ones with mean f_j and standard error sqrt(f_j (1 - f_j) / n); 5 SE allowed.
        DataMatrix x = binary(2000);
        ReferenceData ref = ReferenceData.featureFrequency(x);
        for (long seed = 0; seed < 3; seed++) {
            DataMatrix z = ref.draw(seed);
            assertEquals(x.sampleIds(), z.sampleIds());
            assertEquals(x.featureNames(), z.featureNames());
            for (int j = 0; j < 4; j++) {
                double f = (j + 1) / 5.0;
                double ones = 0;
                for (int i = 0; i < z.samples(); i++) {
                    double v = z.get(i, j);
                    assertTrue(v == 0 || v == 1, "not 0/1: " + v);
                    ones += v;
                }
                assertEquals(f, ones / z.samples(), 5 * Math.sqrt(f * (1 - f) / z.samples()));
            }
        }
        assertArrayEquals(ref.draw(4).rowMajorCopy(), ReferenceData.featureFrequency(x).draw(4).rowMajorCopy());
        assertArrayEquals(ref.draw(4).rowMajorCopy(), ref.drawCoordinates(4).rowMajorCopy());
    }

    @Test
    void featureFrequencyRefusesValuesOtherThanZeroAndOne() {
        InputException e = assertThrows(InputException.class,
                () -> ReferenceData.featureFrequency(matrix(2, 2, new double[] {0, 1, 0.5, 1})));
        assertTrue(e.getMessage().contains("sample 's1' has value 0.5 in feature 'f0'"), e.getMessage());
    }

    @Test
    void theNullModelAndTheDefaultGapReferenceFitTheMetric() {
        // The 0/1 metrics can measure only 0/1 data: their null and reference data are 0/1, every other metric's
        // continuous (a draw of the Gaussian null is 0/1 with probability 0).
        DataMatrix x = binary(50);
        for (Metric m : Metric.values()) {
            DataMatrix nul = ReferenceData.nullModel(m, x).draw(7);
            boolean zeroOne = Arrays.stream(nul.rowMajorCopy()).allMatch(v -> v == 0 || v == 1);
            assertEquals(m.binaryOnly(), zeroOne, m.id());
            ReferenceData.Kind kind = ReferenceData.Kind.defaultFor(m);
            assertTrue(kind.misfit(m).isEmpty(), m.id());
            DataMatrix ref = kind.prepare(x).draw(7);
            assertEquals(m.binaryOnly(), Arrays.stream(ref.rowMajorCopy()).allMatch(v -> v == 0 || v == 1), m.id());
            // and each draw can be measured by the metric
            m.compute(nul, 1);
            m.compute(ref, 1);
        }
        assertTrue(ReferenceData.Kind.PRINCIPAL_BOX.misfit(Metric.JACCARD).isPresent());
        assertTrue(ReferenceData.Kind.FEATURE_FREQUENCY.misfit(Metric.EUCLIDEAN).isPresent());
        assertEquals(ReferenceData.Kind.FEATURE_FREQUENCY, ReferenceData.Kind.parse("binary"));
    }
}
