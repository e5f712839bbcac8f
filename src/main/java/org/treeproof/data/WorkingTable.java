package org.treeproof.data;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoublePredicate;
import java.util.function.DoubleUnaryOperator;

/**
 * The mutable table that one run of {@link Preparation} works on; it never leaves that run.
 *
 * <p>Steps change the values in place and drop rows or columns by compacting the one row-major array, so a
 * preparation holds at most one copy of the data besides its input and output.
 */
final class WorkingTable {
    private final List<String> samples;
    private final List<String> features;
    private double[] v;

    WorkingTable(DataMatrix m) {
        samples = new ArrayList<>(m.sampleIds());
        features = new ArrayList<>(m.featureNames());
        v = m.rowMajorCopy();
    }

    int samples() {
        return samples.size();
    }

    int features() {
        return features.size();
    }

    String sample(int i) {
        return samples.get(i);
    }

    String feature(int j) {
        return features.get(j);
    }

    double get(int i, int j) {
        return v[i * features.size() + j];
    }

    void set(int i, int j, double x) {
        v[i * features.size() + j] = x;
    }

    /** A fresh copy of column {@code j}. */
    double[] column(int j) {
        int n = samples(), p = features();
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            c[i] = v[i * p + j];
        }
        return c;
    }

    /** Per-feature counts of cells for which {@code test} holds. */
    int[] countPerFeature(DoublePredicate test) {
        int n = samples(), p = features();
        int[] c = new int[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                if (test.test(v[i * p + j])) {
                    c[j]++;
                }
            }
        }
        return c;
    }

    /** Per-sample counts of cells for which {@code test} holds. */
    int[] countPerSample(DoublePredicate test) {
        int n = samples(), p = features();
        int[] c = new int[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                if (test.test(v[i * p + j])) {
                    c[i]++;
                }
            }
        }
        return c;
    }

    /**
     * The first cell for which {@code test} holds, in the order the source was written ({@code {sample,
     * feature}}), or {@code null}: the first reported problem should be the first one a reader of the file meets.
     */
    int[] first(DoublePredicate test, boolean featureMajor) {
        int n = samples(), p = features();
        if (featureMajor) {
            for (int j = 0; j < p; j++) {
                for (int i = 0; i < n; i++) {
                    if (test.test(v[i * p + j])) {
                        return new int[] {i, j};
                    }
                }
            }
        } else {
            for (int t = 0; t < v.length; t++) {
                if (test.test(v[t])) {
                    return new int[] {t / p, t % p};
                }
            }
        }
        return null;
    }

    /**
     * Per feature, the exponent {@code e} of the power of two {@code 2^e} with {@code max |x| / 2^e} in [1, 2)
     * ({@code 0} for an all-zero feature). Scaling a feature by it ({@link #scaleByPowerOfTwo}) is exact, and sums
     * and squares of the scaled values neither overflow (for values near {@link Double#MAX_VALUE}) nor underflow
     * (for subnormal values such as 1e-310); since rounding does not depend on a power-of-two scale, results for
     * ordinary values are the same bits as without it.
     */
    int[] powerOfTwoExponents() {
        int n = samples(), p = features();
        double[] largest = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                largest[j] = Math.max(largest[j], Math.abs(v[i * p + j]));
            }
        }
        int[] exponent = new int[p];
        for (int j = 0; j < p; j++) {
            double m = largest[j];
            exponent[j] = m == 0 ? 0 : Math.getExponent(m) >= Double.MIN_EXPONENT ? Math.getExponent(m)
                    : Math.getExponent(m * 0x1p54) - 54;
        }
        return exponent;
    }

    /** Multiplies feature {@code j} by {@code 2^(sign * exponent[j])}, in place. */
    void scaleByPowerOfTwo(int[] exponent, int sign) {
        int n = samples(), p = features();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                v[i * p + j] = Math.scalb(v[i * p + j], sign * exponent[j]);
            }
        }
    }

    /**
     * Per-feature means, exact for constant features and computed on power-of-two scaled values (see
     * {@link #powerOfTwoExponents}), so a feature holding values near {@link Double#MAX_VALUE} still has a finite
     * mean. The second pass adds the mean residual, which removes most of the rounding error of the plain sum
     * (the "corrected two-pass" mean).
     */
    double[] means() {
        int[] exponent = powerOfTwoExponents();
        scaleByPowerOfTwo(exponent, -1);
        double[] mean = scaledMeans();
        scaleByPowerOfTwo(exponent, 1);
        for (int j = 0; j < mean.length; j++) {
            mean[j] = Math.scalb(mean[j], exponent[j]);
        }
        return mean;
    }

    private double[] scaledMeans() {
        int n = samples(), p = features();
        double[] sum = new double[p];
        double[] min = new double[p];
        double[] max = new double[p];
        Arrays.fill(min, Double.POSITIVE_INFINITY);
        Arrays.fill(max, Double.NEGATIVE_INFINITY);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                double x = v[i * p + j];
                sum[j] += x;
                min[j] = Math.min(min[j], x);
                max[j] = Math.max(max[j], x);
            }
        }
        double[] mean = new double[p];
        for (int j = 0; j < p; j++) {
            mean[j] = sum[j] / n;
        }
        double[] residual = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                residual[j] += v[i * p + j] - mean[j];
            }
        }
        for (int j = 0; j < p; j++) {
            mean[j] = min[j] == max[j] ? min[j] : mean[j] + residual[j] / n;
        }
        return mean;
    }

    /**
     * Per-feature population variances (divisor n), by the two-pass formula around {@code means}. A variance too
     * large for a double (values beyond about 1e154) is infinite; {@link Scale#ZSCORE} avoids forming it.
     */
    double[] variances(double[] means) {
        int n = samples(), p = features();
        double[] ss = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                double d = v[i * p + j] - means[j];
                ss[j] += d * d;
            }
        }
        for (int j = 0; j < p; j++) {
            ss[j] /= n;
        }
        return ss;
    }

    /** Whether each feature takes a single value over all samples (compared exactly, not within a tolerance). */
    boolean[] constantFeatures() {
        int n = samples(), p = features();
        boolean[] constant = new boolean[p];
        Arrays.fill(constant, true);
        for (int i = 1; i < n; i++) {
            for (int j = 0; j < p; j++) {
                if (v[i * p + j] != v[j]) {
                    constant[j] = false;
                }
            }
        }
        return constant;
    }

    /** Applies {@code x -> (x - shift[j]) / divisor[j]} to every cell. */
    void shiftAndDivide(double[] shift, double[] divisor) {
        int n = samples(), p = features();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                v[i * p + j] = (v[i * p + j] - shift[j]) / divisor[j];
            }
        }
    }

    /** Applies {@code op} to every cell. */
    void replaceAll(DoubleUnaryOperator op) {
        for (int t = 0; t < v.length; t++) {
            v[t] = op.applyAsDouble(v[t]);
        }
    }

    /** Keeps the features with {@code keep[j]}, in their order. */
    void keepFeatures(boolean[] keep) {
        int n = samples(), p = features();
        int q = 0;
        for (boolean k : keep) {
            q += k ? 1 : 0;
        }
        if (q == p) {
            return;
        }
        double[] w = new double[n * q];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                if (keep[j]) {
                    w[t++] = v[i * p + j];
                }
            }
        }
        List<String> names = new ArrayList<>(q);
        for (int j = 0; j < p; j++) {
            if (keep[j]) {
                names.add(features.get(j));
            }
        }
        features.clear();
        features.addAll(names);
        v = w;
    }

    /** Keeps the samples with {@code keep[i]}, in their order. */
    void keepSamples(boolean[] keep) {
        int n = samples(), p = features();
        List<String> ids = new ArrayList<>();
        int r = 0;
        for (int i = 0; i < n; i++) {
            if (keep[i]) {
                System.arraycopy(v, i * p, v, r * p, p);
                ids.add(samples.get(i));
                r++;
            }
        }
        if (r < n) {
            v = Arrays.copyOf(v, r * p);
            samples.clear();
            samples.addAll(ids);
        }
    }

    DataMatrix toMatrix() {
        return new DataMatrix(samples, features, v);
    }
}
