package org.treeproof.explain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.apache.commons.math3.special.Gamma;
import org.treeproof.resample.Seeds;

/**
 * How strongly each covariate is associated with the clusters. Outliers and samples without a value for the
 * covariate are left out of that covariate's test.
 *
 * <p>Categorical: the clusters × categories table (empty rows and columns dropped), tested as
 * {@link CovariateTest} says (chi-square; Fisher's exact test for a 2 × 2 table with an expected count below
 * 5; a Monte Carlo chi-square test for a larger one), with Cramér's V, {@code √(χ² / (N (min(r, c) − 1)))}
 * (H. Cramér, Mathematical Methods of Statistics, Princeton 1946, §21.9; ISBN 0-691-08004-6). Numeric: the
 * Kruskal-Wallis H with the tie correction and epsilon-squared {@code ε² = H / ((N² − 1)/(N + 1))}, the rank
 * analogue of η² given by M. Tomczak and E. Tomczak, "The need to report effect size estimates revisited. An
 * overview of some recommended measures of effect size", Trends in Sport Sciences 21 (2014) 19-25 (formula
 * quoted from memory of the paper; it equals {@code H / (N − 1)}). q-values are Benjamini-Hochberg over the
 * covariates tested.
 */
public final class CovariateAssociation {
    /** Permutations of the Monte Carlo chi-square test. */
    public static final int PERMUTATIONS = 9_999;
    /** Expected counts below this make the chi-square approximation doubtful (Cochran 1954). */
    static final double SMALL_EXPECTED = 5.0;

    private final Solution solution;
    private final List<Covariate> covariates;
    private final long seed;

    private CovariateAssociation(Solution solution, List<Covariate> covariates, long seed) {
        this.solution = Objects.requireNonNull(solution, "solution");
        this.covariates = List.copyOf(covariates);
        this.seed = seed;
        for (Covariate c : this.covariates) {
            if (c.samples() != solution.samples()) {
                throw new IllegalArgumentException("covariate " + c.name() + " has " + c.samples() + " values for "
                        + solution.samples() + " samples");
            }
        }
    }

    /** The association of each covariate with {@code solution}; {@code seed} drives the Monte Carlo tests. */
    public static CovariateAssociation of(Solution solution, List<Covariate> covariates, long seed) {
        return new CovariateAssociation(solution, covariates, seed);
    }

    /** One result per covariate, in the given order. */
    public List<CovariateResult> compute() {
        int m = covariates.size();
        Tested[] tested = new Tested[m];
        double[] p = new double[m];
        for (int v = 0; v < m; v++) {
            Covariate c = covariates.get(v);
            tested[v] = c.kind() == CovariateKind.CATEGORICAL ? categorical(c, v) : numeric(c);
            p[v] = tested[v].p;
        }
        double[] q = FalseDiscovery.benjaminiHochberg(p);
        var out = new ArrayList<CovariateResult>(m);
        for (int v = 0; v < m; v++) {
            Covariate c = covariates.get(v);
            Tested t = tested[v];
            boolean flagged = t.test != CovariateTest.NONE && CovariateRule.flags(c.kind(), q[v], t.effect);
            out.add(new CovariateResult(c.name(), c.kind(), t.test, t.statistic, t.p, q[v], t.effect, flagged, t.used,
                    t.categories, t.counts, t.medians));
        }
        return List.copyOf(out);
    }

    private record Tested(CovariateTest test, double statistic, double p, double effect, int used,
            List<String> categories, int[][] counts, double[] medians) {
    }

    private Tested categorical(Covariate c, int index) {
        int k = solution.k();
        String[] values = c.categories();
        Map<String, Integer> codes = new LinkedHashMap<>();
        int[] rowOf = new int[values.length];
        int[] colOf = new int[values.length];
        int used = 0;
        for (int i = 0; i < values.length; i++) {
            if (solution.label(i) > 0 && values[i] != null) {
                rowOf[used] = solution.label(i) - 1;
                colOf[used] = codes.computeIfAbsent(values[i], x -> codes.size());
                used++;
            }
        }
        int cats = codes.size();
        int[][] counts = new int[k][cats];
        for (int s = 0; s < used; s++) {
            counts[rowOf[s]][colOf[s]]++;
        }
        List<String> names = List.copyOf(codes.keySet());
        int[][] table = ContingencyChiSquare.compact(counts);
        if (table.length < 2 || table[0].length < 2) {
            return new Tested(CovariateTest.NONE, Double.NaN, Double.NaN, Double.NaN, used, names, counts,
                    new double[0]);
        }
        double chi2 = ContingencyChiSquare.statistic(table);
        double v = Math.sqrt(chi2 / (used * (Math.min(table.length, table[0].length) - 1.0)));
        if (ContingencyChiSquare.minExpected(table) >= SMALL_EXPECTED) {
            int df = (table.length - 1) * (table[0].length - 1);
            double p = upperChiSquare(chi2, df);
            return new Tested(CovariateTest.CHI_SQUARE, chi2, p, v, used, names, counts, new double[0]);
        }
        if (table.length == 2 && table[0].length == 2) {
            return new Tested(CovariateTest.FISHER_EXACT, chi2, fisher2x2(table), v, used, names, counts,
                    new double[0]);
        }
        double p = monteCarlo(rowOf, colOf, used, k, cats, chi2, Seeds.seedFor(seed,
                Seeds.Purpose.COVARIATE_PERMUTATION, index));
        return new Tested(CovariateTest.MONTE_CARLO_CHI_SQUARE, chi2, p, v, used, names, counts, new double[0]);
    }

    /**
     * The upper tail of the chi-square distribution, the regularized upper incomplete gamma function
     * {@code Q(df/2, x/2)} of commons-math3 (the same function its {@code ChiSquaredDistribution} uses, without
     * the loss of precision of {@code 1 − cdf} for small p).
     */
    static double upperChiSquare(double x, int df) {
        return x <= 0 ? 1.0 : Gamma.regularizedGammaQ(df / 2.0, x / 2.0);
    }

    /** Two-sided Fisher exact p of a 2 × 2 table. */
    static double fisher2x2(int[][] t) {
        int a = t[0][0];
        int row1 = t[0][0] + t[0][1];
        int col1 = t[0][0] + t[1][0];
        int n = row1 + t[1][0] + t[1][1];
        var h = new HypergeometricDistribution(null, n, col1, row1);
        double observed = h.probability(a);
        double p = 0;
        int lo = Math.max(0, row1 + col1 - n);
        int hi = Math.min(row1, col1);
        for (int x = lo; x <= hi; x++) {
            double px = h.probability(x);
            if (px <= observed * (1 + 1e-7)) {
                p += px;
            }
        }
        return Math.min(1.0, p);
    }

    /** Monte Carlo p of the chi-square statistic under permutations of the categories over the samples. */
    private static double monteCarlo(int[] rowOf, int[] colOf, int used, int k, int cats, double observed, long seed) {
        var random = new SplittableRandom(seed);
        int[] perm = Arrays.copyOf(colOf, used);
        int[][] counts = new int[k][cats];
        int atLeast = 0;
        double bar = observed * (1 - 1e-12);
        for (int b = 0; b < PERMUTATIONS; b++) {
            for (int i = used - 1; i > 0; i--) {
                int j = random.nextInt(i + 1);
                int tmp = perm[i];
                perm[i] = perm[j];
                perm[j] = tmp;
            }
            for (int[] row : counts) {
                Arrays.fill(row, 0);
            }
            for (int s = 0; s < used; s++) {
                counts[rowOf[s]][perm[s]]++;
            }
            if (ContingencyChiSquare.statistic(ContingencyChiSquare.compact(counts)) >= bar) {
                atLeast++;
            }
        }
        return (1.0 + atLeast) / (1.0 + PERMUTATIONS);
    }

    private Tested numeric(Covariate c) {
        int k = solution.k();
        double[] values = c.values();
        double[] x = new double[values.length];
        int[] group = new int[values.length];
        int used = 0;
        List<List<Double>> byCluster = new ArrayList<>();
        for (int g = 0; g < k; g++) {
            byCluster.add(new ArrayList<>());
        }
        for (int i = 0; i < values.length; i++) {
            if (solution.label(i) > 0 && !Double.isNaN(values[i])) {
                x[used] = values[i];
                group[used] = solution.label(i) - 1;
                byCluster.get(group[used]).add(values[i]);
                used++;
            }
        }
        double[] medians = new double[k];
        int groups = 0;
        for (int g = 0; g < k; g++) {
            double[] v = byCluster.get(g).stream().mapToDouble(Double::doubleValue).sorted().toArray();
            medians[g] = v.length == 0 ? Double.NaN
                    : v.length % 2 == 1 ? v[v.length / 2] : (v[v.length / 2 - 1] + v[v.length / 2]) / 2;
            groups += v.length > 0 ? 1 : 0;
        }
        if (groups < 2) {
            return new Tested(CovariateTest.NONE, Double.NaN, Double.NaN, Double.NaN, used, List.of(), new int[0][],
                    medians);
        }
        double[] ranks = new double[used];
        double ties = Ranks.midranks(x, used, ranks, new double[used]);
        double big = used;
        double correction = 1 - ties / (big * big * big - big);
        if (!(correction > 0)) {
            // every value the same: nothing to tell the clusters apart
            return new Tested(CovariateTest.NONE, Double.NaN, Double.NaN, Double.NaN, used, List.of(), new int[0][],
                    medians);
        }
        double[] rankSum = new double[k];
        int[] size = new int[k];
        for (int s = 0; s < used; s++) {
            rankSum[group[s]] += ranks[s];
            size[group[s]]++;
        }
        double h = 0;
        for (int g = 0; g < k; g++) {
            if (size[g] > 0) {
                h += rankSum[g] * rankSum[g] / size[g];
            }
        }
        h = (12.0 / (big * (big + 1)) * h - 3 * (big + 1)) / correction;
        double p = upperChiSquare(h, groups - 1);
        double epsilon = h / ((big * big - 1) / (big + 1));
        return new Tested(CovariateTest.KRUSKAL_WALLIS, h, p, epsilon, used, List.of(), new int[0][], medians);
    }
}
