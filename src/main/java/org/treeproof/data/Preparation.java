package org.treeproof.data;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * How a table as read is made ready for clustering, applied in this fixed order:
 * <ol>
 *   <li>the missing-value policy ({@link MissingPolicy}); afterwards no cell is missing;</li>
 *   <li>optionally library-size scaling of counts ({@link LibrarySize}): each sample divided by its size factor;
 *       every value must then be {@code >= 0};</li>
 *   <li>optionally {@code log2(x + 1)}; every value must then be {@code >= 0} (a value in (-1, 0) would have a
 *       logarithm, but a negative count or intensity means the data are not what log2 is meant for, so all
 *       negatives are refused);</li>
 *   <li>optionally batch mean-centring ({@link BatchCentering}): each batch's mean removed from every feature,
 *       before features are ranked by variance or scaled, so that neither counts the batches' differences;</li>
 *   <li>optionally the {@code topVariable} features of largest population variance, ties broken by input
 *       order, kept in input order; asking for at least as many features as there are keeps all of them (and
 *       the report says so) rather than failing, because the count left after the missing-value policy is not
 *       known in advance;</li>
 *   <li>the scaling ({@link Scale}); under z-scoring and robust scaling, constant features are dropped and
 *       reported.</li>
 * </ol>
 * Applying a preparation is a pure function of the matrix; nothing is read or written.
 *
 * @param missing     what to do with missing cells
 * @param librarySize how counts are scaled for each sample's depth
 * @param log2        whether to take {@code log2(x + 1)}
 * @param scale       the per-feature scaling
 * @param topVariable how many of the most variable features to keep, 0 for all
 * @param centering   the batch mean-centring, or {@code null} for none
 */
public record Preparation(MissingPolicy missing, LibrarySize librarySize, boolean log2, Scale scale,
        int topVariable, BatchCentering centering) {

    /**
     * The scaling used when none is asked for: z-scores, so that features measured in different units weigh the
     * same in a distance. Data already on one scale can ask for {@link Scale#NONE}.
     */
    public static final Scale DEFAULT_SCALE = Scale.ZSCORE;

    public Preparation {
        Objects.requireNonNull(missing, "missing");
        Objects.requireNonNull(librarySize, "librarySize");
        Objects.requireNonNull(scale, "scale");
        if (topVariable < 0) {
            throw new InputException("--top-variable must be 0 (keep all features) or a positive count, got "
                    + topVariable);
        }
    }

    /** A preparation without batch mean-centring. */
    public Preparation(MissingPolicy missing, LibrarySize librarySize, boolean log2, Scale scale, int topVariable) {
        this(missing, librarySize, log2, scale, topVariable, null);
    }

    /** A preparation without library-size scaling or batch mean-centring. */
    public Preparation(MissingPolicy missing, boolean log2, Scale scale, int topVariable) {
        this(missing, LibrarySize.NONE, log2, scale, topVariable);
    }

    /** This preparation with {@code log2}, {@code scale} and {@code topVariable} replaced, the rest kept. */
    public Preparation with(boolean log2, Scale scale, int topVariable) {
        return new Preparation(missing, librarySize, log2, scale, topVariable, centering);
    }

    /** The defaults: refuse missing values, no log2, {@link #DEFAULT_SCALE}, all features. */
    public static Preparation defaults() {
        return new Preparation(MissingPolicy.ERROR, false, DEFAULT_SCALE, 0);
    }

    /** Uses the data as read: refuse missing values, no log2, no scaling, all features. */
    public static Preparation asRead() {
        return new Preparation(MissingPolicy.ERROR, false, Scale.NONE, 0);
    }

    /** {@link #apply(DataMatrix, CellLocator)} for a matrix that has no file; messages call it {@code input}. */
    public Prepared apply(DataMatrix raw) {
        return apply(raw, CellLocator.unplaced("input"));
    }

    /**
     * Prepares {@code raw}.
     *
     * @param where tells messages where each cell came from
     * @throws InputException when the data cannot be prepared as asked (missing values under {@code error},
     *                        negative values under log2, fewer than 2 samples or no feature left)
     */
    public Prepared apply(DataMatrix raw, CellLocator where) {
        Objects.requireNonNull(raw, "raw");
        Objects.requireNonNull(where, "where");
        if (raw.samples() < 2) {
            throw new InputException(where.source() + ": " + raw.samples() + " sample" + (raw.samples() == 1 ? "" : "s")
                    + "; clustering needs at least 2");
        }
        if (raw.features() < 1) {
            throw new InputException(where.source() + ": no features to cluster on");
        }
        long missingCells = raw.missingCount();
        var run = new PreparationRun(raw, where);
        // whether the observed cells are counts is read before imputed medians (which can be halves) fill gaps
        boolean counts = librarySize == LibrarySize.NONE && log2 && LibrarySize.countsLike(raw);
        missing.apply(run);
        if (counts) {
            noteCountTotals(run);
        }
        librarySize.apply(run);
        if (log2) {
            takeLog2(run);
        }
        if (centering != null) {
            centering.apply(run);
        }
        if (topVariable > 0) {
            keepTopVariable(run);
        }
        scale.apply(run);
        return new Prepared(run.table.toMatrix(), run.report(this, raw, missingCells));
    }

    /**
     * Records the range of the samples' totals after the missing-value policy, for data whose observed values are
     * counts, so that the outputs can point out uneven depths that {@code --library-size} would scale.
     */
    private static void noteCountTotals(PreparationRun run) {
        WorkingTable t = run.table;
        int lo = 0;
        int hi = 0;
        double[] total = new double[t.samples()];
        for (int i = 0; i < t.samples(); i++) {
            for (int j = 0; j < t.features(); j++) {
                total[i] += t.get(i, j);
            }
            lo = total[i] < total[lo] ? i : lo;
            hi = total[i] > total[hi] ? i : hi;
        }
        run.countTotals(new PreparationReport.Totals(total[lo], t.sample(lo), total[hi], t.sample(hi)));
    }

    private static void takeLog2(PreparationRun run) {
        WorkingTable t = run.table;
        int[] at = t.first(x -> x < 0, run.where.featureMajor());
        if (at != null) {
            long count = Arrays.stream(t.countPerFeature(x -> x < 0)).asLongStream().sum();
            throw new InputException(run.locate(at[0], at[1]) + ": " + t.get(at[0], at[1]) + " is negative "
                    + run.names(at[0], at[1]) + (count == 1 ? "" : ", the first of " + count + " negative values")
                    + "; --log2 takes log2(x + 1), which needs values >= 0");
        }
        double ln2 = Math.log(2);
        t.replaceAll(x -> Math.log1p(x) / ln2);
    }

    private void keepTopVariable(PreparationRun run) {
        WorkingTable t = run.table;
        int p = t.features();
        double[] var = t.variances(t.means());
        for (int j = 0; j < p; j++) {
            if (Double.isInfinite(var[j])) {
                int widest = 0;
                for (int i = 1; i < t.samples(); i++) {
                    widest = Math.abs(t.get(i, j)) > Math.abs(t.get(widest, j)) ? i : widest;
                }
                throw new InputException(run.locate(widest, j) + ": " + t.get(widest, j) + " " + run.names(widest, j)
                        + " makes its feature's variance too large for a double, so --top-variable cannot rank it;"
                        + " rescale the feature (e.g. --log2) first");
            }
        }
        Integer[] order = new Integer[p];
        for (int j = 0; j < p; j++) {
            order[j] = j;
        }
        // Arrays.sort on objects is stable, so equal variances keep input order.
        Arrays.sort(order, (a, b) -> Double.compare(var[b], var[a]));
        int k = Math.min(topVariable, p);
        boolean[] keep = new boolean[p];
        for (int r = 0; r < k; r++) {
            keep[order[r]] = true;
        }
        double cutoff = var[order[k - 1]];
        boolean tie = k < p && var[order[k]] == cutoff;
        List<String> kept = new ArrayList<>(k);
        for (int j = 0; j < p; j++) {
            if (keep[j]) {
                kept.add(t.feature(j));
            }
        }
        run.topVariable(new PreparationReport.TopVariable(topVariable, p, kept, cutoff, tie));
        t.keepFeatures(keep);
    }
}
