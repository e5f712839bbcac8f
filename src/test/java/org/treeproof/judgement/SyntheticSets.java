package org.treeproof.judgement;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * The seeded synthetic data sets of the judgement suite: invented data whose right answer is known because it was
 * planted. Each set is drawn from its own {@link SplittableRandom} with a fixed seed, so the files are the same on
 * every machine and every run (a test checks this); nothing else is random.
 *
 * <p>Tables have samples in rows (an {@code id} column, then features {@code f001, f002, ...}) except the count
 * table, which has genes in rows and samples in columns as expression tables usually do. Each set also has a truth
 * table ({@code id,class}); a planted far point has the class {@value #FAR_POINT}. Sizes and dimensions of the noise
 * sets are drawn from ranges by their seed, so the several seeds of one kind differ in shape as well as in values.
 *
 * <p>Run {@code main(dir)} to write every set into {@code dir}; the judgement suite does this at run time.
 */
public final class SyntheticSets {
    /** The truth class of a planted far point (a sample that belongs to no group). */
    public static final String FAR_POINT = "far-point";

    /** One generated set: file names and CSV text of the data and of the truth. */
    public record Set(String name, String fileName, String csv, String truthFileName, String truthCsv) {
        /** Writes both files into {@code dir}. */
        public void writeTo(Path dir) throws IOException {
            Files.writeString(dir.resolve(fileName), csv, StandardCharsets.UTF_8);
            Files.writeString(dir.resolve(truthFileName), truthCsv, StandardCharsets.UTF_8);
        }
    }

    private SyntheticSets() {
    }

    /** Every synthetic set of the suite (draw 0), in a fixed order. */
    public static List<Set> all() {
        return all(0);
    }

    /**
     * Every synthetic set, in a fixed order, from draw {@code draw}: draw 0 is the suite; any other draw gives fresh
     * data of the same kinds, sizes and names from other seeds (offset by 100 000 per draw), to judge a rule on data
     * it was not developed on. The expected answers are the same for every draw.
     */
    public static List<Set> all(int draw) {
        long d = 100_000L * draw;
        var sets = new ArrayList<Set>();
        for (int s = 1; s <= 3; s++) {
            sets.add(gaussianNoise(s, d + 1000 + s));
        }
        for (int s = 1; s <= 3; s++) {
            sets.add(uniformNoise(s, d + 2000 + s));
        }
        for (int s = 1; s <= 4; s++) {
            sets.add(heavyTailedNoise(s, d + 3000 + s));
        }
        for (int s = 1; s <= 2; s++) {
            sets.add(oneFarPoint(s, d + 4000 + s));
        }
        for (int s = 1; s <= 2; s++) {
            sets.add(skewedNoise(s, d + 12_000 + s));
        }
        for (int s = 1; s <= 2; s++) {
            sets.add(likertNoise(s, d + 13_000 + s));
        }
        for (int s = 1; s <= 2; s++) {
            sets.add(compositionNoise(s, d + 14_000 + s));
        }
        for (int s = 1; s <= 2; s++) {
            sets.add(scatteredFarSamples(s, d + 15_000 + s));
        }
        sets.add(groupsWithFarPoints(d + 5001, new int[] {60, 50, 40}, 8, 3));
        sets.add(groupsWithFarPoints(d + 5002, new int[] {80, 70}, 6, 2));
        sets.add(wideGroups("wide-3-groups-p200", d + 301, new int[] {50, 45, 40}, 200, 24, 3.0));
        sets.add(wideGroups("wide-3-groups-p500", d + 302, new int[] {50, 45, 40}, 500, 30, 4.0));
        sets.add(wideGroups("wide-4-unequal-groups-p300", d + 303, new int[] {60, 40, 25, 15}, 300, 28, 4.0));
        sets.add(fiveUnevenGroups(d + 16_001));
        sets.add(smallRealGroup(d + 6001));
        sets.add(imbalancedGroups(d + 7001));
        sets.add(lopsidedGroups(d + 17_001));
        sets.add(nestedGroups(d + 8001));
        sets.add(countsInRows(d + 9001));
        sets.add(parallelBands(d + 10001));
        sets.add(chain(d + 11001));
        return List.copyOf(sets);
    }

    /** Writes every set of draw {@code draw} into {@code dir} (created if absent). */
    public static void writeAll(Path dir, int draw) throws IOException {
        Files.createDirectories(dir);
        for (Set s : all(draw)) {
            s.writeTo(dir);
        }
    }

    /** {@code SyntheticSets DIR [DRAW]}: writes the sets. */
    public static void main(String[] args) throws IOException {
        if (args.length < 1 || args.length > 2) {
            System.err.println("usage: SyntheticSets DIR [DRAW]");
            System.exit(2);
        }
        writeAll(Path.of(args[0]), args.length == 2 ? Integer.parseInt(args[1]) : 0);
    }

    // ---- the kinds ------------------------------------------------------------------------------------------

    /** One correlated Gaussian population: n 100-200, p 4-30, covariance A A^T with A = I + random. */
    static Set gaussianNoise(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 100 + rng.nextInt(101);
        int p = 4 + rng.nextInt(27);
        double[][] a = mixing(rng, p);
        double[][] x = new double[n][];
        for (int i = 0; i < n; i++) {
            x[i] = times(a, gaussians(rng, p));
        }
        return rows("gaussian-noise-" + index, x, constantClass(n, "population"));
    }

    /** Independent uniform features on boxes of random widths: n 100-200, p 2-8. */
    static Set uniformNoise(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 100 + rng.nextInt(101);
        int p = 2 + rng.nextInt(7);
        double[] width = new double[p];
        for (int j = 0; j < p; j++) {
            width[j] = 1 + 9 * rng.nextDouble();
        }
        double[][] x = new double[n][p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                x[i][j] = width[j] * rng.nextDouble();
            }
        }
        return rows("uniform-noise-" + index, x, constantClass(n, "population"));
    }

    /**
     * One multivariate t population with 3 degrees of freedom (a correlated Gaussian divided by sqrt(chi2_3 / 3),
     * the usual construction): n 120-220, p 5-10. Heavy tails give a few far samples by chance, no groups.
     */
    static Set heavyTailedNoise(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 120 + rng.nextInt(101);
        int p = 5 + rng.nextInt(6);
        double[][] a = mixing(rng, p);
        double[][] x = new double[n][];
        for (int i = 0; i < n; i++) {
            double chi2 = 0;
            for (int d = 0; d < 3; d++) {
                double z = rng.nextGaussian();
                chi2 += z * z;
            }
            double scale = 1 / Math.sqrt(chi2 / 3);
            double[] z = gaussians(rng, p);
            for (int j = 0; j < p; j++) {
                z[j] *= scale;
            }
            x[i] = times(a, z);
        }
        return rows("heavy-tailed-noise-" + index, x, constantClass(n, "population"));
    }

    /** One correlated Gaussian population (n 120-200, p 4-10) and one sample 12 standard units from its centre. */
    static Set oneFarPoint(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 120 + rng.nextInt(81);
        int p = 4 + rng.nextInt(7);
        double[][] a = mixing(rng, p);
        double[][] x = new double[n + 1][];
        String[] cls = new String[n + 1];
        for (int i = 0; i < n; i++) {
            x[i] = times(a, gaussians(rng, p));
            cls[i] = "population";
        }
        x[n] = times(a, scaled(unit(rng, p), 12));
        cls[n] = FAR_POINT;
        return rows("one-far-point-" + index, shuffled(rng, x, cls), cls);
    }

    /**
     * One right-skewed population, as expression levels or abundances often are: each feature exp(s_j z_j) of a
     * correlated Gaussian z, with s_j uniform in 0.5-1.2 (log-normal marginals); n 150-220, p 5-10. The long right
     * tails give far samples by chance, no groups.
     */
    static Set skewedNoise(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 150 + rng.nextInt(71);
        int p = 5 + rng.nextInt(6);
        double[][] a = mixing(rng, p);
        double[] spread = new double[p];
        for (int j = 0; j < p; j++) {
            spread[j] = 0.5 + 0.7 * rng.nextDouble();
        }
        double[][] x = new double[n][];
        for (int i = 0; i < n; i++) {
            double[] z = times(a, gaussians(rng, p));
            for (int j = 0; j < p; j++) {
                z[j] = Math.exp(spread[j] * z[j] / Math.sqrt(rowSquares(a, j)));
            }
            x[i] = z;
        }
        return rows("skewed-noise-" + index, x, constantClass(n, "population"));
    }

    /**
     * Survey answers without respondent types: n 150-250 respondents answer 10-20 items on a 1-5 scale, each item
     * with its own answer frequencies (weights 0.5 + U(0, 1), normalised) and independently of every other item.
     * Many ties, no groups.
     */
    static Set likertNoise(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 150 + rng.nextInt(101);
        int p = 10 + rng.nextInt(11);
        double[][] cumulative = new double[p][5];
        for (int j = 0; j < p; j++) {
            double total = 0;
            for (int c = 0; c < 5; c++) {
                total += 0.5 + rng.nextDouble();
                cumulative[j][c] = total;
            }
            for (int c = 0; c < 5; c++) {
                cumulative[j][c] /= total;
            }
        }
        double[][] x = new double[n][p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                double u = rng.nextDouble();
                int c = 0;
                while (c < 4 && u >= cumulative[j][c]) {
                    c++;
                }
                x[i][j] = c + 1;
            }
        }
        return rows("likert-noise-" + index, x, constantClass(n, "population"));
    }

    /**
     * Compositions without groups, as relative abundances are: 6-12 parts drawn from one Dirichlet law with integer
     * parameters 2-5 (each part a sum of that many unit exponentials, divided by the row's total); n 150-220.
     * Bounded, closed data, no groups.
     */
    static Set compositionNoise(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 150 + rng.nextInt(71);
        int p = 6 + rng.nextInt(7);
        int[] shape = new int[p];
        for (int j = 0; j < p; j++) {
            shape[j] = 2 + rng.nextInt(4);
        }
        double[][] x = new double[n][p];
        for (int i = 0; i < n; i++) {
            double total = 0;
            for (int j = 0; j < p; j++) {
                double g = 0;
                for (int e = 0; e < shape[j]; e++) {
                    g -= Math.log(1 - rng.nextDouble());
                }
                x[i][j] = g;
                total += g;
            }
            for (int j = 0; j < p; j++) {
                x[i][j] /= total;
            }
        }
        return rows("composition-noise-" + index, x, constantClass(n, "population"));
    }

    /**
     * One correlated Gaussian population (n 150-200, p 4-8) and 5% more samples scattered 8-14 standard units from
     * its centre in random directions: far samples that are not a group of their own.
     */
    static Set scatteredFarSamples(int index, long rngSeed) {
        var rng = new SplittableRandom(rngSeed);
        int n = 150 + rng.nextInt(51);
        int p = 4 + rng.nextInt(5);
        int far = (int) Math.round(0.05 * n);
        double[][] a = mixing(rng, p);
        double[][] x = new double[n + far][];
        String[] cls = new String[n + far];
        for (int i = 0; i < n; i++) {
            x[i] = times(a, gaussians(rng, p));
            cls[i] = "population";
        }
        for (int f = 0; f < far; f++) {
            x[n + f] = times(a, scaled(unit(rng, p), 8 + 6 * rng.nextDouble()));
            cls[n + f] = FAR_POINT;
        }
        return rows("scattered-far-samples-" + index, shuffled(rng, x, cls), cls);
    }

    /** The sum of squares of row {@code j} of {@code a}: the variance of feature j of {@code a z}. */
    private static double rowSquares(double[][] a, int j) {
        double s = 0;
        for (double v : a[j]) {
            s += v * v;
        }
        return s;
    }

    /**
     * Well separated spherical groups (unit noise; group g > 0 shifted by 5 on its own three features) plus a few far
     * points 25 units from the grand centre in random directions.
     */
    static Set groupsWithFarPoints(long seed, int[] sizes, int p, int far) {
        var rng = new SplittableRandom(seed);
        int n = sum(sizes);
        double[][] x = new double[n + far][];
        String[] cls = new String[n + far];
        int i = 0;
        for (int g = 0; g < sizes.length; g++) {
            for (int r = 0; r < sizes[g]; r++, i++) {
                x[i] = gaussians(rng, p);
                if (g > 0) {
                    for (int j = 3 * (g - 1); j < 3 * g; j++) {
                        x[i][j] += 5;
                    }
                }
                cls[i] = "group-" + (g + 1);
            }
        }
        for (int f = 0; f < far; f++, i++) {
            x[i] = scaled(unit(rng, p), 25);
            cls[i] = FAR_POINT;
        }
        return rows(sizes.length + "-groups-" + far + "-far-points", shuffled(rng, x, cls), cls);
    }

    /**
     * Wide data: groups planted in the first {@code informative} of {@code p} unit-noise features, group g shifted by
     * {@code shift} on its own block of informative/G features; the rest is pure noise.
     */
    static Set wideGroups(String name, long seed, int[] sizes, int p, int informative, double shift) {
        var rng = new SplittableRandom(seed);
        int block = informative / sizes.length;
        double[][] x = new double[sum(sizes)][];
        String[] cls = new String[x.length];
        int i = 0;
        for (int g = 0; g < sizes.length; g++) {
            for (int r = 0; r < sizes[g]; r++, i++) {
                x[i] = gaussians(rng, p);
                for (int j = g * block; j < (g + 1) * block; j++) {
                    x[i][j] += shift;
                }
                cls[i] = "group-" + (g + 1);
            }
        }
        return rows(name, shuffled(rng, x, cls), cls);
    }

    /**
     * Five groups of 40 in ten features around fixed centres 5 units from the origin in uneven directions, so that
     * the centres lie 4.4 to 8.6 units apart (two pairs near 5, no pair a level of its own); unit Gaussian noise.
     * The centres are those of the unseen set S5-5groups-p10 (bench/judgement/unseen/gen.py, numpy seed 20261204),
     * rounded to two decimals.
     */
    static Set fiveUnevenGroups(long seed) {
        double[][] centres = {
            {1.28, -1.07, -2.45, -0.06, -2.14, 0.16, 0.07, -1.40, 2.54, -1.79},
            {1.21, -1.78, -2.46, 0.38, 0.89, 0.52, 0.53, -0.17, 2.31, 2.74},
            {1.04, -0.35, -3.92, -1.76, -0.22, 0.14, 1.84, -0.92, -1.00, -0.22},
            {1.23, -1.37, -0.90, 2.76, 0.51, 0.58, 1.62, -1.73, -0.45, 2.60},
            {-1.40, 0.34, 0.19, 1.30, 0.94, -2.58, 2.67, -0.65, -2.26, 1.00}};
        var rng = new SplittableRandom(seed);
        double[][] x = new double[200][];
        String[] cls = new String[200];
        for (int i = 0; i < 200; i++) {
            int g = i / 40;
            x[i] = gaussians(rng, 10);
            for (int j = 0; j < 10; j++) {
                x[i][j] += centres[g][j];
            }
            cls[i] = "group-" + (g + 1);
        }
        return rows("five-uneven-groups", shuffled(rng, x, cls), cls);
    }

    /** 280 samples of one population and a real group of 10, 6 units away on five of ten features. */
    static Set smallRealGroup(long seed) {
        var rng = new SplittableRandom(seed);
        int p = 10;
        double[][] x = new double[290][];
        String[] cls = new String[290];
        for (int i = 0; i < 290; i++) {
            x[i] = gaussians(rng, p);
            boolean small = i >= 280;
            if (small) {
                for (int j = 0; j < 5; j++) {
                    x[i][j] += 6;
                }
            }
            cls[i] = small ? "small-group" : "main";
        }
        return rows("small-real-group", shuffled(rng, x, cls), cls);
    }

    /** Three well separated groups of 140, 45 and 15 samples (shift 5 on own feature pairs, p = 6). */
    static Set imbalancedGroups(long seed) {
        return pairShifted("imbalanced-groups", seed, new int[] {140, 45, 15}, 6, 5);
    }

    /**
     * Groups of 400, 40 and 12 samples in 10 features, the two small ones 6 units from the large one (4.24 on each of
     * their own two features) and 8.5 from each other.
     */
    static Set lopsidedGroups(long seed) {
        return pairShifted("lopsided-groups", seed, new int[] {400, 40, 12}, 10, 6 / Math.sqrt(2));
    }

    /** Gaussian groups of the given sizes; group g > 1 shifted by {@code shift} on features 2g - 3 and 2g - 2. */
    private static Set pairShifted(String name, long seed, int[] sizes, int p, double shift) {
        var rng = new SplittableRandom(seed);
        double[][] x = new double[sum(sizes)][];
        String[] cls = new String[x.length];
        int i = 0;
        for (int g = 0; g < sizes.length; g++) {
            for (int r = 0; r < sizes[g]; r++, i++) {
                x[i] = gaussians(rng, p);
                if (g > 0) {
                    x[i][2 * (g - 1)] += shift;
                    x[i][2 * (g - 1) + 1] += shift;
                }
                cls[i] = "group-" + (g + 1);
            }
        }
        return rows(name, shuffled(rng, x, cls), cls);
    }

    /**
     * Two families of two subgroups each, 40 samples per subgroup, p = 10: families 8 units apart on features 1-3,
     * subgroups of family 1 apart by 3.5 units on features 4-6, of family 2 on features 7-9; feature 10 is noise.
     */
    static Set nestedGroups(long seed) {
        var rng = new SplittableRandom(seed);
        int p = 10;
        double[][] x = new double[160][];
        String[] cls = new String[160];
        for (int i = 0; i < 160; i++) {
            int g = i / 40;
            int family = g / 2;
            x[i] = gaussians(rng, p);
            for (int j = 0; j < 3; j++) {
                x[i][j] += family == 0 ? 4 : -4;
                x[i][3 + 3 * family + j] += g % 2 == 0 ? 1.75 : -1.75;
            }
            cls[i] = "family-" + (family + 1) + "/sub-" + (char) ('a' + g);
        }
        return rows("nested-2x2-groups", shuffled(rng, x, cls), cls);
    }

    /**
     * RNA-seq-like counts, genes in rows and samples in columns: 600 genes, 3 subtypes of 30 samples. Gene means are
     * log-uniform between 10 and 2000; each sample has a size factor exp(N(0, 0.05^2)) (near-equal sequencing depths)
     * and each count a biological factor exp(N(0, 0.3^2)) before Poisson sampling; subtype g raises its own 30 genes
     * fourfold. Analysed with {@code --log2 --samples-in-columns}.
     */
    static Set countsInRows(long seed) {
        var rng = new SplittableRandom(seed);
        int genes = 600;
        int per = 30;
        int n = 3 * per;
        double[] mean = new double[genes];
        for (int j = 0; j < genes; j++) {
            mean[j] = Math.exp(Math.log(10) + (Math.log(2000) - Math.log(10)) * rng.nextDouble());
        }
        int[] subtype = new int[n];
        for (int i = 0; i < n; i++) {
            subtype[i] = i / per;
        }
        shuffle(rng, subtype);
        long[][] counts = new long[genes][n];
        for (int i = 0; i < n; i++) {
            double size = Math.exp(0.05 * rng.nextGaussian());
            for (int j = 0; j < genes; j++) {
                double mu = mean[j] * size * Math.exp(0.3 * rng.nextGaussian());
                if (j / per == subtype[i]) {
                    mu *= 4;
                }
                counts[j][i] = poisson(rng, mu);
            }
        }
        var csv = new StringBuilder("gene");
        var truth = new StringBuilder("id,class\n");
        for (int i = 0; i < n; i++) {
            String id = String.format(Locale.ROOT, "s%03d", i + 1);
            csv.append(',').append(id);
            truth.append(id).append(",subtype-").append((char) ('A' + subtype[i])).append('\n');
        }
        csv.append('\n');
        for (int j = 0; j < genes; j++) {
            csv.append(String.format(Locale.ROOT, "g%04d", j + 1));
            for (int i = 0; i < n; i++) {
                csv.append(',').append(counts[j][i]);
            }
            csv.append('\n');
        }
        return new Set("counts-3-subtypes", "counts-3-subtypes.csv", csv.toString(), "counts-3-subtypes-truth.csv",
                truth.toString());
    }

    /**
     * Two long parallel bands in the plane, 100 samples each: position along a band uniform over 20 units, across it
     * N(0, 0.3^2), band centres 3 units apart, the pair turned 45 degrees so that z-scoring keeps the shape. A clear
     * empty gap separates the bands, but each band is seven times longer than the gap.
     */
    static Set parallelBands(long seed) {
        var rng = new SplittableRandom(seed);
        double[][] x = new double[200][];
        String[] cls = new String[200];
        double c = Math.sqrt(0.5);
        for (int i = 0; i < 200; i++) {
            int band = i / 100;
            double along = 20 * rng.nextDouble() - 10;
            double across = (band == 0 ? -1.5 : 1.5) + 0.3 * rng.nextGaussian();
            x[i] = new double[] {c * (along - across), c * (along + across)};
            cls[i] = "band-" + (band + 1);
        }
        return rows("parallel-bands", shuffled(rng, x, cls), cls);
    }

    /**
     * One continuous curved chain in the plane: 200 samples on a half circle of radius 10 (angle uniform), with
     * N(0, 0.6^2) scatter in both directions; no gap anywhere along the chain.
     */
    static Set chain(long seed) {
        var rng = new SplittableRandom(seed);
        double[][] x = new double[200][];
        for (int i = 0; i < 200; i++) {
            double t = Math.PI * rng.nextDouble();
            x[i] = new double[] {10 * Math.cos(t) + 0.6 * rng.nextGaussian(),
                10 * Math.sin(t) + 0.6 * rng.nextGaussian()};
        }
        return rows("curved-chain", x, constantClass(200, "population"));
    }

    // ---- helpers ------------------------------------------------------------------------------------------------

    private static Set rows(String name, double[][] x, String[] cls) {
        int p = x[0].length;
        var csv = new StringBuilder("id");
        for (int j = 0; j < p; j++) {
            csv.append(String.format(Locale.ROOT, ",f%03d", j + 1));
        }
        csv.append('\n');
        var truth = new StringBuilder("id,class\n");
        for (int i = 0; i < x.length; i++) {
            String id = String.format(Locale.ROOT, "s%04d", i + 1);
            csv.append(id);
            for (double v : x[i]) {
                csv.append(',').append(String.format(Locale.ROOT, "%.5f", v));
            }
            csv.append('\n');
            truth.append(id).append(',').append(cls[i]).append('\n');
        }
        return new Set(name, name + ".csv", csv.toString(), name + "-truth.csv", truth.toString());
    }

    private static String[] constantClass(int n, String cls) {
        String[] c = new String[n];
        java.util.Arrays.fill(c, cls);
        return c;
    }

    /** A mixing matrix I + 0.5 G / sqrt(p), G standard Gaussian: correlated features, full rank in practice. */
    private static double[][] mixing(SplittableRandom rng, int p) {
        double[][] a = new double[p][p];
        for (int r = 0; r < p; r++) {
            for (int c = 0; c < p; c++) {
                a[r][c] = (r == c ? 1 : 0) + 0.5 * rng.nextGaussian() / Math.sqrt(p);
            }
        }
        return a;
    }

    private static double[] times(double[][] a, double[] z) {
        double[] y = new double[a.length];
        for (int r = 0; r < a.length; r++) {
            double s = 0;
            for (int c = 0; c < z.length; c++) {
                s += a[r][c] * z[c];
            }
            y[r] = s;
        }
        return y;
    }

    private static double[] gaussians(SplittableRandom rng, int p) {
        double[] z = new double[p];
        for (int j = 0; j < p; j++) {
            z[j] = rng.nextGaussian();
        }
        return z;
    }

    private static double[] unit(SplittableRandom rng, int p) {
        double[] z = gaussians(rng, p);
        double norm = 0;
        for (double v : z) {
            norm += v * v;
        }
        return scaled(z, 1 / Math.sqrt(norm));
    }

    private static double[] scaled(double[] v, double f) {
        double[] r = new double[v.length];
        for (int j = 0; j < v.length; j++) {
            r[j] = v[j] * f;
        }
        return r;
    }

    private static int sum(int[] sizes) {
        int n = 0;
        for (int s : sizes) {
            n += s;
        }
        return n;
    }

    /** Shuffles rows and their classes together (so groups are not contiguous in the file); returns the rows. */
    private static double[][] shuffled(SplittableRandom rng, double[][] x, String[] cls) {
        for (int i = x.length - 1; i > 0; i--) {
            int j = rng.nextInt(i + 1);
            double[] t = x[i];
            x[i] = x[j];
            x[j] = t;
            String c = cls[i];
            cls[i] = cls[j];
            cls[j] = c;
        }
        return x;
    }

    private static void shuffle(SplittableRandom rng, int[] a) {
        for (int i = a.length - 1; i > 0; i--) {
            int j = rng.nextInt(i + 1);
            int t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }

    /**
     * A Poisson draw with mean {@code mu}: the sum of Poisson draws of mean at most 20 each (Poisson is closed under
     * sums), each by Knuth's multiplication method (Knuth, The Art of Computer Programming vol. 2, 3.4.1).
     */
    static long poisson(SplittableRandom rng, double mu) {
        long total = 0;
        double left = mu;
        while (left > 0) {
            double part = Math.min(left, 20);
            left -= part;
            double limit = Math.exp(-part);
            double prod = rng.nextDouble();
            while (prod > limit) {
                total++;
                prod *= rng.nextDouble();
            }
        }
        return total;
    }
}
