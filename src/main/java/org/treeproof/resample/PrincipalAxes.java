package org.treeproof.resample;

import java.util.Arrays;
import java.util.Objects;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

/**
 * The principal axes of a data matrix: its column means, the right singular vectors {@code V} (p × r) of the
 * column-centred matrix {@code X_c = U Σ Vᵀ}, and the singular values {@code σ_1 ≥ … ≥ σ_r > 0}.
 *
 * <p>Principal component analysis as reviewed by I. T. Jolliffe and J. Cadima, "Principal component analysis:
 * a review and recent developments", Phil. Trans. R. Soc. A 374 (2016) 20150202, doi:10.1098/rsta.2015.0202
 * (DOI from memory). The axes feed the reference distributions of the gap statistic (Tibshirani, Walther &amp;
 * Hastie 2001, doi:10.1111/1467-9868.00293, method (b)) and the Gaussian null in {@link ReferenceData}.
 *
 * <p><b>Route.</b> Both routes eigen-decompose the smaller cross-product matrix with commons-math3's
 * symmetric {@link EigenDecomposition} (Householder tridiagonalisation and implicit QL):
 * <ul>
 *   <li>{@link Route#FEATURE_CROSS_PRODUCT} when {@code p ≤ n}: {@code C = X_cᵀ X_c} (p × p), whose
 *       eigenvectors are {@code V} and eigenvalues {@code σ²}. Cost {@code n·p²/2 + O(p³)} flops,
 *       memory {@code n·p + p²} doubles.</li>
 *   <li>{@link Route#SAMPLE_GRAM} when {@code p > n}: {@code G = X_c X_cᵀ} (n × n), eigenvectors
 *       {@code U}, then {@code V = X_cᵀ U Σ⁻¹}. Cost {@code n²·p/2 + O(n³) + n·p·r} flops, memory
 *       {@code n·p + n² + r·p} doubles.</li>
 * </ul>
 * A full SVD of {@code X_c} in commons-math3 (Golub-Kahan, with {@code U} accumulated) took about 8 s at
 * n = 2000, p = 500 on the development machine, against well under a second for the cross-product route,
 * which is why it is not used. The price is the usual one of forming a cross-product: the variance of an
 * axis carries an absolute error of order {@code ε·σ_1²}, so axes whose variance is below about
 * {@code max(n,p)·ε} times the largest are rounding noise (ε = 2⁻⁵²).
 *
 * <p><b>Rank.</b> An axis is kept only when {@code σ_c² > σ_1² · max(n, p) · ε}; the others (including the
 * exact zero that centring always leaves when {@code p ≥ n}) are dropped, so {@code rank() ≤ min(n−1, p)}.
 * Constant data have rank 0. In the Gram route each {@code V} column is rescaled to unit length, because
 * {@code X_cᵀ u / σ} is unit only up to the rounding of {@code σ}.
 *
 * <p><b>Signs.</b> Each axis is oriented so that its component of largest magnitude (the first such on
 * ties) is positive, which makes the result reproducible whatever the eigen-solver's sign choice.
 *
 * <p>The canonical constructor checks shapes, finiteness and ordering and copies the arrays; it does not
 * check orthonormality (that would cost {@code p·r²}). Use {@link #of(DataMatrix)} to compute axes.
 *
 * @param means          column means, length p
 * @param axes           {@code Vᵀ} row-major, r × p: axis {@code c} occupies {@code [c·p, (c+1)·p)}
 * @param singularValues σ_1 ≥ … ≥ σ_r &gt; 0 of the centred data
 * @param samples        n, the number of rows the axes were computed from
 * @param route          which cross-product was decomposed
 */
public record PrincipalAxes(double[] means, double[] axes, double[] singularValues, int samples, Route route) {

    /** Which cross-product matrix was eigen-decomposed; see the class comment for costs. */
    public enum Route {
        /** {@code X_cᵀ X_c}, p × p; used when features ≤ samples. */
        FEATURE_CROSS_PRODUCT,
        /** {@code X_c X_cᵀ}, n × n; used when features &gt; samples. */
        SAMPLE_GRAM
    }

    /** Relative size, per unit of {@code max(n,p)}, below which an eigenvalue counts as zero. */
    private static final double RELATIVE_EPS = Math.ulp(1.0);

    public PrincipalAxes {
        means = means.clone();
        axes = axes.clone();
        singularValues = singularValues.clone();
        Objects.requireNonNull(route, "route");
        int p = means.length;
        int r = singularValues.length;
        if (p < 1) {
            throw new IllegalArgumentException("no features");
        }
        if (samples < 1) {
            throw new IllegalArgumentException("samples must be positive, got " + samples);
        }
        if (axes.length != (long) r * p) {
            throw new IllegalArgumentException("axes has length " + axes.length + ", expected " + r + " x " + p);
        }
        if (r > Math.min(samples - 1, p)) {
            throw new IllegalArgumentException("rank " + r + " exceeds min(n-1, p) = " + Math.min(samples - 1, p));
        }
        for (int c = 0; c < r; c++) {
            double s = singularValues[c];
            if (!(s > 0) || !Double.isFinite(s) || (c > 0 && s > singularValues[c - 1])) {
                throw new IllegalArgumentException("singular values must be finite, positive and descending");
            }
        }
        requireFinite(means, "means");
        requireFinite(axes, "axes");
    }

    private static void requireFinite(double[] a, String what) {
        for (double v : a) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(what + " must be finite");
            }
        }
    }

    /**
     * Computes the principal axes of {@code data}.
     *
     * @throws InputException if a value is missing: the axes need complete data
     */
    public static PrincipalAxes of(DataMatrix data) {
        int n = data.samples();
        int p = data.features();
        if (n < 1 || p < 1) {
            throw new IllegalArgumentException("principal axes need at least one sample and one feature");
        }
        double[] x = data.rowMajorCopy();
        requireComplete(data, x, "principal axes");
        double[] means = centreColumns(x, n, p);
        return p > n ? viaGram(x, n, p, means) : viaCrossProduct(x, n, p, means);
    }

    /** Throws an {@link InputException} naming the first missing cell of {@code data}. */
    static void requireComplete(DataMatrix data, double[] rowMajor, String purpose) {
        int p = data.features();
        for (int a = 0; a < rowMajor.length; a++) {
            if (Double.isNaN(rowMajor[a])) {
                throw new InputException(purpose + " need complete data, but sample '" + data.sampleIds().get(a / p)
                        + "' has no value for feature '" + data.featureNames().get(a % p)
                        + "' (choose a --missing policy)");
            }
        }
    }

    /** Subtracts column means in place and returns them; the second pass corrects the mean's rounding. */
    private static double[] centreColumns(double[] x, int n, int p) {
        double[] means = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                means[j] += x[i * p + j];
            }
        }
        for (int j = 0; j < p; j++) {
            means[j] /= n;
        }
        double[] correction = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                correction[j] += x[i * p + j] - means[j];
            }
        }
        for (int j = 0; j < p; j++) {
            means[j] += correction[j] / n;
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                x[i * p + j] -= means[j];
            }
        }
        return means;
    }

    private static PrincipalAxes viaCrossProduct(double[] x, int n, int p, double[] means) {
        double[][] c = new double[p][p];
        for (int i = 0; i < n; i++) {
            int off = i * p;
            for (int a = 0; a < p; a++) {
                double xa = x[off + a];
                if (xa == 0) {
                    continue;
                }
                double[] ca = c[a];
                for (int b = a; b < p; b++) {
                    ca[b] += xa * x[off + b];
                }
            }
        }
        mirrorUpper(c);
        Eigen e = Eigen.of(c, n, p);
        int r = e.order.length;
        double[] axes = new double[r * p];
        for (int k = 0; k < r; k++) {
            int col = e.order[k];
            for (int j = 0; j < p; j++) {
                axes[k * p + j] = e.vectors.getEntry(j, col);
            }
        }
        return finish(means, axes, e.singularValues, n, Route.FEATURE_CROSS_PRODUCT);
    }

    private static PrincipalAxes viaGram(double[] x, int n, int p, double[] means) {
        double[][] g = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = i; k < n; k++) {
                g[i][k] = dot(x, i * p, x, k * p, p);
            }
        }
        mirrorUpper(g);
        Eigen e = Eigen.of(g, n, p);
        int r = e.order.length;
        double[] axes = new double[r * p];
        // V = X_cᵀ U Σ⁻¹, accumulated a row of X_c at a time over a block of columns so that the block of
        // every axis stays in cache while the rows stream past.
        final int block = 512;
        double[] w = new double[r];
        for (int j0 = 0; j0 < p; j0 += block) {
            int j1 = Math.min(p, j0 + block);
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < r; k++) {
                    w[k] = e.vectors.getEntry(i, e.order[k]) / e.singularValues[k];
                }
                int xo = i * p;
                for (int k = 0; k < r; k++) {
                    double wk = w[k];
                    int ao = k * p;
                    for (int j = j0; j < j1; j++) {
                        axes[ao + j] += wk * x[xo + j];
                    }
                }
            }
        }
        for (int k = 0; k < r; k++) {
            double norm = Math.sqrt(dot(axes, k * p, axes, k * p, p));
            for (int j = 0; j < p; j++) {
                axes[k * p + j] /= norm;
            }
        }
        return finish(means, axes, e.singularValues, n, Route.SAMPLE_GRAM);
    }

    private static PrincipalAxes finish(double[] means, double[] axes, double[] sv, int n, Route route) {
        int p = means.length;
        for (int k = 0; k < sv.length; k++) {
            int lead = k * p;
            for (int j = k * p + 1; j < (k + 1) * p; j++) {
                if (Math.abs(axes[j]) > Math.abs(axes[lead])) {
                    lead = j;
                }
            }
            if (axes[lead] < 0) {
                for (int j = k * p; j < (k + 1) * p; j++) {
                    axes[j] = -axes[j];
                }
            }
        }
        return new PrincipalAxes(means, axes, sv, n, route);
    }

    private static void mirrorUpper(double[][] m) {
        for (int a = 0; a < m.length; a++) {
            for (int b = 0; b < a; b++) {
                m[a][b] = m[b][a];
            }
        }
    }

    static double dot(double[] a, int ao, double[] b, int bo, int len) {
        double s = 0;
        for (int t = 0; t < len; t++) {
            s += a[ao + t] * b[bo + t];
        }
        return s;
    }

    /** The eigen-decomposition of a cross-product, restricted to the eigenvalues above the rank tolerance. */
    private static final class Eigen {
        final RealMatrix vectors;
        final int[] order;
        final double[] singularValues;

        private Eigen(RealMatrix vectors, int[] order, double[] singularValues) {
            this.vectors = vectors;
            this.order = order;
            this.singularValues = singularValues;
        }

        static Eigen of(double[][] symmetric, int n, int p) {
            int m = symmetric.length;
            EigenDecomposition ed = new EigenDecomposition(new Array2DRowRealMatrix(symmetric, false));
            double[] values = ed.getRealEigenvalues();
            Integer[] idx = new Integer[m];
            for (int a = 0; a < m; a++) {
                idx[a] = a;
            }
            // Descending by value, ties by index: the solver's own order is not part of its contract.
            Arrays.sort(idx, (a, b) -> values[a] != values[b] ? Double.compare(values[b], values[a]) : a - b);
            double largest = m == 0 ? 0 : values[idx[0]];
            double tol = largest * Math.max(n, p) * RELATIVE_EPS;
            int r = 0;
            while (r < m && r < n - 1 && values[idx[r]] > tol && largest > 0) {
                r++;
            }
            int[] order = new int[r];
            double[] sv = new double[r];
            for (int k = 0; k < r; k++) {
                order[k] = idx[k];
                sv[k] = Math.sqrt(values[idx[k]]);
            }
            return new Eigen(ed.getV(), order, sv);
        }
    }

    /** The number of features p. */
    public int features() {
        return means.length;
    }

    /** The number of axes kept, r. */
    public int rank() {
        return singularValues.length;
    }

    @Override
    public double[] means() {
        return means.clone();
    }

    @Override
    public double[] axes() {
        return axes.clone();
    }

    @Override
    public double[] singularValues() {
        return singularValues.clone();
    }

    /** The sample variance along each axis, {@code σ_c² / (n − 1)} (empty when n = 1). */
    public double[] variances() {
        double[] v = new double[singularValues.length];
        for (int c = 0; c < v.length; c++) {
            v[c] = singularValues[c] * singularValues[c] / (samples - 1);
        }
        return v;
    }

    /** A copy of axis {@code c} (column c of V), length p. */
    public double[] axis(int c) {
        Objects.checkIndex(c, rank());
        int p = features();
        return Arrays.copyOfRange(axes, c * p, (c + 1) * p);
    }

    /** Component {@code j} of axis {@code c}, that is {@code V[j][c]}. */
    public double component(int c, int j) {
        Objects.checkIndex(c, rank());
        Objects.checkIndex(j, features());
        return axes[c * features() + j];
    }

    /**
     * The coordinates {@code (x_i − means) · V} of every row of {@code data} on these axes, row-major n × r.
     *
     * @throws InputException if a value is missing
     */
    public double[] scores(DataMatrix data) {
        int p = features();
        if (data.features() != p) {
            throw new IllegalArgumentException("data have " + data.features() + " features, axes " + p);
        }
        int n = data.samples();
        int r = rank();
        double[] x = data.rowMajorCopy();
        requireComplete(data, x, "principal axes");
        double[] out = new double[n * r];
        double[] row = new double[p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                row[j] = x[i * p + j] - means[j];
            }
            for (int c = 0; c < r; c++) {
                out[i * r + c] = dot(row, 0, axes, c * p, p);
            }
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PrincipalAxes a && a.samples == samples && a.route == route
                && Arrays.equals(a.means, means) && Arrays.equals(a.axes, axes)
                && Arrays.equals(a.singularValues, singularValues);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(singularValues) + Arrays.hashCode(means);
    }

    @Override
    public String toString() {
        return "PrincipalAxes[n=" + samples + ", p=" + means.length + ", rank=" + rank() + ", " + route + "]";
    }
}
