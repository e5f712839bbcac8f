package org.treeproof.resample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

class PrincipalAxesTest {

    /** Values written by src/test/resources/reference/gap/make_reference.py (numpy.linalg.svd). */
    static JsonNode fixture() throws IOException {
        try (InputStream in = PrincipalAxesTest.class.getResourceAsStream("/reference/gap/gap_reference.json")) {
            return new ObjectMapper().readTree(in);
        }
    }

    static double[] doubles(JsonNode array) {
        double[] d = new double[array.size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = array.get(i).doubleValue();
        }
        return d;
    }

    static DataMatrix matrix(int n, int p, double[] values) {
        List<String> ids = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, values);
    }

    static DataMatrix gaussian(SplittableRandom rng, int n, int p) {
        double[] v = new double[n * p];
        for (int a = 0; a < v.length; a++) {
            // Sum of uniforms scaled per column: enough spread of column scales to keep axes distinct.
            int j = a % p;
            v[a] = (rng.nextDouble() + rng.nextDouble() - 1) * (1 + j * 0.7) + 0.1 * j;
        }
        return matrix(n, p, v);
    }

    @Test
    void matchesNumpySvdOnTallWideAndDeficientData() throws IOException {
        for (JsonNode c : fixture().get("principalAxes")) {
            String name = c.get("name").asText();
            int n = c.get("n").asInt();
            int p = c.get("p").asInt();
            PrincipalAxes pa = PrincipalAxes.of(matrix(n, p, doubles(c.get("data"))));
            // Reference: numpy.linalg.svd of the centred data (fixture), rank as stated there.
            assertEquals(c.get("rank").asInt(), pa.rank(), name + " rank");
            assertEquals(p > n ? PrincipalAxes.Route.SAMPLE_GRAM : PrincipalAxes.Route.FEATURE_CROSS_PRODUCT,
                    pa.route(), name);
            double[] means = doubles(c.get("means"));
            for (int j = 0; j < p; j++) {
                assertEquals(means[j], pa.means()[j], 1e-12 * Math.max(1, Math.abs(means[j])), name + " mean");
            }
            double[] sv = doubles(c.get("singularValues"));
            double[] var = doubles(c.get("variances"));
            for (int k = 0; k < sv.length; k++) {
                assertEquals(sv[k], pa.singularValues()[k], 1e-9 * sv[k], name + " singular value " + k);
                assertEquals(var[k], pa.variances()[k], 1e-9 * var[k], name + " variance " + k);
            }
            double[] axes = doubles(c.get("axes"));
            for (int k = 0; k < pa.rank(); k++) {
                double[] mine = pa.axis(k);
                for (int j = 0; j < p; j++) {
                    // Up to sign, as singular vectors are only defined up to sign.
                    assertEquals(Math.abs(axes[k * p + j]), Math.abs(mine[j]), 1e-9, name + " |axis| " + k + "," + j);
                    // The fixture applies the same sign rule (largest |component| positive) to numpy's vectors.
                    assertEquals(axes[k * p + j], mine[j], 1e-9, name + " signed axis " + k + "," + j);
                }
            }
        }
    }

    @Test
    void axesAreOrthonormalAndReconstructTheDataOnSeededShapes() {
        // Invariant of any SVD: VᵀV = I and X = means + (X_c V) Vᵀ once only zero-variance axes are dropped.
        SplittableRandom rng = new SplittableRandom(7);
        for (int trial = 0; trial < 40; trial++) {
            int n = 2 + rng.nextInt(40);
            int p = 1 + rng.nextInt(40);
            DataMatrix x = gaussian(rng, n, p);
            PrincipalAxes pa = PrincipalAxes.of(x);
            int r = pa.rank();
            assertEquals(Math.min(n - 1, p), r, "random data have full rank " + n + "x" + p);
            for (int a = 0; a < r; a++) {
                for (int b = 0; b < r; b++) {
                    double d = PrincipalAxes.dot(pa.axes(), a * p, pa.axes(), b * p, p);
                    assertEquals(a == b ? 1 : 0, d, 1e-9, "V'V at " + a + "," + b + " for " + n + "x" + p);
                }
            }
            double[] scores = pa.scores(x);
            double[] m = pa.means();
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < p; j++) {
                    double back = m[j];
                    for (int c = 0; c < r; c++) {
                        back += scores[i * r + c] * pa.component(c, j);
                    }
                    assertEquals(x.get(i, j), back, 1e-9, "reconstruction " + n + "x" + p);
                }
            }
            double[] sv = pa.singularValues();
            for (int c = 1; c < r; c++) {
                assertTrue(sv[c] <= sv[c - 1], "descending");
            }
        }
    }

    @Test
    void scoreVariancesAreTheAxisVariances() {
        // Definition: the sample variance of the coordinates on axis c is σ_c² / (n − 1), their mean is 0.
        SplittableRandom rng = new SplittableRandom(11);
        for (int[] shape : new int[][] {{50, 6}, {8, 30}}) {
            int n = shape[0];
            DataMatrix x = gaussian(rng, n, shape[1]);
            PrincipalAxes pa = PrincipalAxes.of(x);
            double[] s = pa.scores(x);
            int r = pa.rank();
            for (int c = 0; c < r; c++) {
                double mean = 0;
                double ss = 0;
                for (int i = 0; i < n; i++) {
                    mean += s[i * r + c] / n;
                    ss += s[i * r + c] * s[i * r + c];
                }
                assertEquals(0, mean, 1e-10);
                assertEquals(pa.variances()[c], ss / (n - 1), 1e-9 * pa.variances()[c]);
            }
        }
    }

    @Test
    void signRuleMakesTheLargestComponentPositive() {
        // Our convention (documented in the class): reproducible orientation whatever the solver returns.
        SplittableRandom rng = new SplittableRandom(3);
        for (int trial = 0; trial < 20; trial++) {
            int n = 3 + rng.nextInt(30);
            int p = 2 + rng.nextInt(30);
            PrincipalAxes pa = PrincipalAxes.of(gaussian(rng, n, p));
            for (int c = 0; c < pa.rank(); c++) {
                double[] v = pa.axis(c);
                int lead = 0;
                for (int j = 1; j < p; j++) {
                    if (Math.abs(v[j]) > Math.abs(v[lead])) {
                        lead = j;
                    }
                }
                assertTrue(v[lead] > 0, "axis " + c + " leads with a positive component");
            }
        }
    }

    @Test
    void negatedDataGiveTheSameAxes() {
        // X and −X have the same axes up to sign; the sign rule must make them identical.
        SplittableRandom rng = new SplittableRandom(5);
        DataMatrix x = gaussian(rng, 30, 5);
        double[] neg = x.rowMajorCopy();
        for (int a = 0; a < neg.length; a++) {
            neg[a] = -neg[a];
        }
        PrincipalAxes a = PrincipalAxes.of(x);
        PrincipalAxes b = PrincipalAxes.of(matrix(30, 5, neg));
        assertArrayEquals(a.axes(), b.axes(), 1e-10);
        assertArrayEquals(a.singularValues(), b.singularValues(), 1e-10);
    }

    @Test
    void rankDeficiencyDropsZeroVarianceAxes() {
        // Hand cases: constant data have no spread; one sample has none; a duplicated feature adds none.
        PrincipalAxes constant = PrincipalAxes.of(matrix(4, 3, new double[] {1, 2, 3, 1, 2, 3, 1, 2, 3, 1, 2, 3}));
        assertEquals(0, constant.rank());
        assertEquals(0, constant.variances().length);
        assertArrayEquals(new double[] {1, 2, 3}, constant.means(), 0);

        PrincipalAxes single = PrincipalAxes.of(matrix(1, 3, new double[] {4, 5, 6}));
        assertEquals(0, single.rank());

        // Points (0,0,5) and (2,2,5): mean (1,1,5), centred rows ±(1,1,0), so one axis (1,1,0)/√2 with
        // σ² = 2 + 2 = 4 and variance σ²/(n−1) = 4.
        PrincipalAxes line = PrincipalAxes.of(matrix(2, 3, new double[] {0, 0, 5, 2, 2, 5}));
        assertEquals(1, line.rank());
        assertEquals(4.0, line.variances()[0], 1e-12);
        assertEquals(Math.sqrt(0.5), line.component(0, 0), 1e-12);
        assertEquals(Math.sqrt(0.5), line.component(0, 1), 1e-12);
        assertEquals(0, line.component(0, 2), 1e-12);

        SplittableRandom rng = new SplittableRandom(13);
        DataMatrix base = gaussian(rng, 40, 4);
        double[] v = new double[40 * 6];
        for (int i = 0; i < 40; i++) {
            for (int j = 0; j < 4; j++) {
                v[i * 6 + j] = base.get(i, j);
            }
            v[i * 6 + 4] = base.get(i, 0) - 2 * base.get(i, 3);
            v[i * 6 + 5] = base.get(i, 1);
        }
        assertEquals(4, PrincipalAxes.of(matrix(40, 6, v)).rank(), "two dependent features add no axis");
    }

    @Test
    void isDeterministic() {
        DataMatrix x = gaussian(new SplittableRandom(17), 15, 40);
        assertEquals(PrincipalAxes.of(x), PrincipalAxes.of(x));
    }

    @Test
    void missingValueIsAUserErrorNamingSampleAndFeature() {
        double[] v = {1, 2, 3, 4, Double.NaN, 6};
        InputException e = assertThrows(InputException.class, () -> PrincipalAxes.of(matrix(3, 2, v)));
        assertTrue(e.getMessage().contains("'s2'") && e.getMessage().contains("'f0'"), e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
    }

    @Test
    void constructorValidatesAndCopies() {
        double[] means = {0, 0};
        double[] axes = {1, 0};
        double[] sv = {2};
        PrincipalAxes pa = new PrincipalAxes(means, axes, sv, 3, PrincipalAxes.Route.FEATURE_CROSS_PRODUCT);
        means[0] = 9;
        axes[0] = 9;
        sv[0] = 9;
        assertEquals(0, pa.means()[0]);
        assertEquals(1, pa.axes()[0]);
        assertEquals(2, pa.singularValues()[0]);
        pa.axes()[0] = 7;
        assertEquals(1, pa.component(0, 0));
        assertThrows(IllegalArgumentException.class, () -> new PrincipalAxes(new double[] {0, 0},
                new double[] {1, 0, 0, 1}, new double[] {1, 2}, 5, PrincipalAxes.Route.FEATURE_CROSS_PRODUCT));
        assertThrows(IllegalArgumentException.class, () -> new PrincipalAxes(new double[] {0, 0},
                new double[] {1, 0}, new double[] {1}, 1, PrincipalAxes.Route.FEATURE_CROSS_PRODUCT));
        assertThrows(IllegalArgumentException.class, () -> new PrincipalAxes(new double[] {0, 0},
                new double[] {1, 0, 0}, new double[] {1}, 4, PrincipalAxes.Route.FEATURE_CROSS_PRODUCT));
    }
}
