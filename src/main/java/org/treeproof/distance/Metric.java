package org.treeproof.distance;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

/**
 * The dissimilarity between two samples (rows of a {@link DataMatrix}), by the name a user types.
 *
 * <p>Definitions are those of {@code scipy.spatial.distance.pdist} (SciPy 1.10; P. Virtanen et al.,
 * "SciPy 1.0: fundamental algorithms for scientific computing in Python", Nature Methods 17 (2020)
 * 261-272, doi:10.1038/s41592-019-0686-2), with {@code x}, {@code y} rows of {@code m} features:
 * <ul>
 *   <li>{@link #EUCLIDEAN} sqrt(sum (x-y)^2); {@link #SQEUCLIDEAN} sum (x-y)^2;
 *       {@link #MANHATTAN} sum |x-y| (alias {@code cityblock}); {@link #CHEBYSHEV} max |x-y|;</li>
 *   <li>{@link #COSINE} 1 - x.y / (|x| |y|); {@link #PEARSON} the same on rows centred on their mean,
 *       1 - r (alias {@code correlation}); {@link #SPEARMAN} Pearson on average ranks within each row,
 *       1 - rho (C. Spearman, "The proof and measurement of association between two things",
 *       Am. J. Psychol. 15 (1904) 72-101, doi:10.2307/1412159). All three lie in [0, 2]; as in SciPy, a
 *       similarity that rounds beyond +-1 is clipped;</li>
 *   <li>{@link #JACCARD} (0/1 data) the share of features that differ among those where either row is 1
 *       (P. Jaccard, "The distribution of the flora in the alpine zone", New Phytol. 11 (1912) 37-50,
 *       doi:10.1111/j.1469-8137.1912.tb05611.x); two all-zero rows are at distance 0, as in SciPy since
 *       1.2; {@link #HAMMING} (0/1 data) the share of features that differ.</li>
 * </ul>
 *
 * <p>Missing values are refused (apply a missing-value policy first), as are infinite values, values
 * other than 0 and 1 for the binary metrics, rows without spread for Pearson and Spearman and all-zero
 * rows for cosine; each refusal is an {@link InputException} naming the sample (and the feature).
 *
 * <p>Computation is blocked and multi-threaded (see {@code PairwiseKernel}); the bits of the result do
 * not depend on the thread count, and {@link #between} gives the same bits as the matrix entry.
 */
public enum Metric {
    EUCLIDEAN("euclidean", List.of("l2"), true, RowPreparation.AS_IS, Accumulation.SQUARED_DIFFERENCE) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return Math.sqrt(acc);
        }
    },
    SQEUCLIDEAN("sqeuclidean", List.of("squared-euclidean"), false, RowPreparation.AS_IS,
            Accumulation.SQUARED_DIFFERENCE) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return acc;
        }
    },
    MANHATTAN("manhattan", List.of("cityblock", "l1"), false, RowPreparation.AS_IS,
            Accumulation.ABSOLUTE_DIFFERENCE) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return acc;
        }
    },
    CHEBYSHEV("chebyshev", List.of("maximum"), false, RowPreparation.AS_IS,
            Accumulation.MAXIMUM_ABSOLUTE_DIFFERENCE) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return acc;
        }
    },
    COSINE("cosine", List.of(), false, RowPreparation.UNIT_LENGTH, Accumulation.PRODUCT) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return oneMinusSimilarity(acc);
        }
    },
    PEARSON("pearson", List.of("correlation"), false, RowPreparation.CENTRED_UNIT_LENGTH, Accumulation.PRODUCT) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return oneMinusSimilarity(acc);
        }
    },
    SPEARMAN("spearman", List.of(), false, RowPreparation.RANKS_CENTRED_UNIT_LENGTH, Accumulation.PRODUCT) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return oneMinusSimilarity(acc);
        }
    },
    /** Accumulates the ones both rows share; the per-row counts of ones give the rest exactly. */
    JACCARD("jaccard", List.of(), false, RowPreparation.BINARY, Accumulation.PRODUCT) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            double either = rowI + rowJ - acc;
            return either == 0 ? 0.0 : (either - acc) / either;
        }
    },
    HAMMING("hamming", List.of(), false, RowPreparation.BINARY, Accumulation.ABSOLUTE_DIFFERENCE) {
        @Override
        double finish(double acc, double rowI, double rowJ, int m) {
            return acc / m;
        }
    };

    /** The name outputs give the dissimilarity of a distance table read as given: its own, unknown to treeproof. */
    public static final String PRECOMPUTED = "precomputed";

    private final String id;
    private final List<String> aliases;
    private final boolean euclidean;
    private final RowPreparation preparation;
    private final Accumulation accumulation;

    Metric(String id, List<String> aliases, boolean euclidean, RowPreparation preparation, Accumulation accumulation) {
        this.id = id;
        this.aliases = aliases;
        this.euclidean = euclidean;
        this.preparation = preparation;
        this.accumulation = accumulation;
    }

    /** The metric's value from its accumulated sum; {@code rowI}, {@code rowJ} are per-row numbers or 0. */
    abstract double finish(double acc, double rowI, double rowJ, int m);

    Accumulation accumulation() {
        return accumulation;
    }

    private static double oneMinusSimilarity(double similarity) {
        if (similarity >= 1) {
            return 0.0;
        }
        return similarity <= -1 ? 2.0 : 1.0 - similarity;
    }

    /** The canonical lower-case name, as typed on the command line and written in reports. */
    public String id() {
        return id;
    }

    /** Other accepted names. */
    public List<String> aliases() {
        return aliases;
    }

    /** True only for the Euclidean distance, which Ward, centroid and median linkage require. */
    public boolean euclidean() {
        return euclidean;
    }

    /** Whether this measure takes only 0/1 data (Jaccard, Hamming). */
    public boolean binaryOnly() {
        return this == JACCARD || this == HAMMING;
    }

    /**
     * Whether this measure depends on the samples only through their Euclidean geometry, so it is unchanged by
     * rotating and shifting the feature space (Euclidean and squared Euclidean distance). Such data may be handled
     * in any orthonormal coordinates, e.g. principal-axis scores.
     */
    public boolean rotationInvariant() {
        return this == EUCLIDEAN || this == SQEUCLIDEAN;
    }

    /**
     * The metric named {@code name}, ignoring case and surrounding blanks; aliases are accepted.
     *
     * @throws InputException naming the unknown name and listing the valid ones
     */
    public static Metric parse(String name) {
        Objects.requireNonNull(name, "name");
        String key = name.strip().toLowerCase(Locale.ROOT);
        for (Metric metric : values()) {
            if (metric.id.equals(key) || metric.aliases.contains(key)) {
                return metric;
            }
        }
        String valid = Stream.of(values())
                .map(mt -> mt.aliases.isEmpty() ? mt.id : mt.id + " (" + String.join(", ", mt.aliases) + ")")
                .collect(Collectors.joining(", "));
        throw new InputException("unknown metric '" + name + "'; valid metrics: " + valid);
    }

    /**
     * Distances between all samples over all features.
     *
     * @param threads worker threads, at least 1
     * @throws InputException if the data cannot be used with this metric (see the class comment)
     */
    public CondensedDistances compute(DataMatrix data, int threads) {
        Objects.requireNonNull(data, "data");
        return run(data, null, threads);
    }

    /**
     * Distances between all samples over the features {@code features} (column indices of {@code data},
     * in any order, repeats allowed), without building a new matrix: the same bits as
     * {@code compute(data.selectFeatures(features), threads)}.
     *
     * @throws IllegalArgumentException if {@code features} is empty or holds an index out of range
     * @throws InputException           as for {@link #compute(DataMatrix, int)}
     */
    public CondensedDistances compute(DataMatrix data, int[] features, int threads) {
        Objects.requireNonNull(data, "data");
        return run(data, checkedFeatures(data, features), threads);
    }

    private static int[] checkedFeatures(DataMatrix data, int[] features) {
        Objects.requireNonNull(features, "features");
        if (features.length == 0) {
            throw new IllegalArgumentException("no features selected");
        }
        for (int f : features) {
            Objects.checkIndex(f, data.features());
        }
        return features.clone();
    }

    /**
     * The distance between two vectors of equal length: the same bits as the corresponding entry of
     * {@link #compute}. Messages about unusable values call the vectors samples 'x' and 'y' and name
     * features by their 1-based position.
     */
    public double between(double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("vectors differ in length: " + x.length + " and " + y.length);
        }
        double[] both = new double[2 * x.length];
        System.arraycopy(x, 0, both, 0, x.length);
        System.arraycopy(y, 0, both, x.length, y.length);
        List<String> names = IntStream.rangeClosed(1, x.length).mapToObj(Integer::toString).toList();
        return compute(new DataMatrix(List.of("x", "y"), names, both), 1).at(0);
    }

    /**
     * The rows as this metric compares them, in coordinates whose Euclidean geometry is the metric's where it has
     * one: for {@link #COSINE}, {@link #PEARSON} and {@link #SPEARMAN} the rows the kernel multiplies (scaled to unit
     * length; centred first; on average ranks first), between which the squared Euclidean distance is twice the
     * metric's distance; for every other metric the data as they are (for Manhattan, Chebyshev, Jaccard and Hamming
     * an approximation of their geometry).
     *
     * @throws InputException as for {@link #compute(DataMatrix, int)}
     */
    public DataMatrix embedding(DataMatrix data) {
        Objects.requireNonNull(data, "data");
        if (preparation == RowPreparation.AS_IS || preparation == RowPreparation.BINARY) {
            return data;
        }
        RowSource rows = preparation.prepare(new RowSource.Columns(data, null), data, id).rows();
        int m = rows.width();
        double[] values = new double[rows.rows() * m];
        double[] scratch = new double[rows.scratchLength()];
        for (int r = 0; r < rows.rows(); r++) {
            rows.load(r, values, r * m, scratch);
        }
        return new DataMatrix(data.sampleIds(), data.featureNames(), values);
    }

    /**
     * Distances between all samples over all features, as a matrix the caller owns and may give up to a linkage
     * that works in place: the same values as {@link #compute(DataMatrix, int)}, without a second copy.
     *
     * @throws InputException as for {@link #compute(DataMatrix, int)}
     */
    public OwnedDistances computeOwned(DataMatrix data, int threads) {
        Objects.requireNonNull(data, "data");
        return OwnedDistances.wrap(data.samples(), kernel(data, null, threads));
    }

    /**
     * {@link #compute(DataMatrix, int[], int)} as a matrix the caller owns (see {@link #computeOwned(DataMatrix, int)}).
     */
    public OwnedDistances computeOwned(DataMatrix data, int[] features, int threads) {
        Objects.requireNonNull(data, "data");
        return OwnedDistances.wrap(data.samples(), kernel(data, checkedFeatures(data, features), threads));
    }

    /**
     * The distances between all samples over all features, computed again band by band whenever they are read:
     * each pass holds about {@value #BAND_VALUES} values at a time instead of the n(n-1)/2 of the matrix, and
     * gives the same bits as {@link #compute(DataMatrix, int)}, since every pair is computed on its own in
     * feature order. A pass costs as much time as computing the matrix. The data are checked at once, as by
     * {@code compute}; {@code data} must not change while the rows are in use.
     *
     * @param threads worker threads for each band, at least 1
     * @throws InputException as for {@link #compute(DataMatrix, int)}
     */
    public CondensedRows rows(DataMatrix data, int threads) {
        return rows(data, threads, BAND_VALUES);
    }

    /** {@link #rows(DataMatrix, int)} holding about {@code bandValues} values at a time (at least one row). */
    CondensedRows rows(DataMatrix data, int threads, int bandValues) {
        Objects.requireNonNull(data, "data");
        checkArguments(data, threads);
        RowPreparation.Prepared prepared = preparation.prepare(new RowSource.Columns(data, null), data, id);
        int n = data.samples();
        Metric metric = this;
        return new CondensedRows() {
            @Override
            public int size() {
                return n;
            }

            @Override
            public void forEachRow(RowVisitor visitor) {
                double[] band = new double[Math.min(CondensedDistances.length(n), Math.max(bandValues, n))];
                for (int from = 0; from < n - 1; ) {
                    int to = from;
                    while (to < n - 1 && PairwiseKernel.rowStart(n, to + 1) - PairwiseKernel.rowStart(n, from)
                            <= band.length) {
                        to++;
                    }
                    PairwiseKernel.Result r = PairwiseKernel.band(prepared.rows(), metric, prepared.perRow(), from,
                            to, band, threads);
                    checkFinite(data, r.firstNonFinite());
                    int base = PairwiseKernel.rowStart(n, from);
                    for (int i = from; i < to; i++) {
                        visitor.row(i, band, PairwiseKernel.rowStart(n, i) - base);
                    }
                    from = to;
                }
            }
        };
    }

    /** Values a pass of {@link #rows} holds at a time, at least one row (4 Mi values, 32 MiB). */
    static final int BAND_VALUES = 1 << 22;

    private CondensedDistances run(DataMatrix data, int[] features, int threads) {
        return CondensedDistances.wrap(data.samples(), kernel(data, features, threads));
    }

    private void checkArguments(DataMatrix data, int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        if (data.samples() == 0) {
            throw new InputException("no samples to compute " + id + " distances between");
        }
        if (data.features() == 0) {
            throw new InputException("no features to compute " + id + " distances from");
        }
    }

    private double[] kernel(DataMatrix data, int[] features, int threads) {
        checkArguments(data, threads);
        RowPreparation.Prepared prepared = preparation.prepare(new RowSource.Columns(data, features), data, id);
        PairwiseKernel.Result result = PairwiseKernel.run(prepared.rows(), this, prepared.perRow(), threads);
        checkFinite(data, result.firstNonFinite());
        return result.condensed();
    }

    private void checkFinite(DataMatrix data, long firstNonFinite) {
        if (firstNonFinite != Long.MAX_VALUE) {
            int[] pair = pairAt(data.samples(), firstNonFinite);
            throw new InputException("the " + id + " distance between samples '" + data.sampleIds().get(pair[0])
                    + "' and '" + data.sampleIds().get(pair[1]) + "' is too large to represent; rescale the data");
        }
    }

    /** The pair (i, j), i < j, at condensed position {@code t}; only for messages, so a linear walk will do. */
    private static int[] pairAt(int n, long t) {
        long start = 0;
        for (int i = 0; i < n - 1; i++) {
            long len = n - 1 - i;
            if (t < start + len) {
                return new int[] {i, (int) (i + 1 + (t - start))};
            }
            start += len;
        }
        throw new IllegalArgumentException("condensed position " + t + " out of range for n = " + n);
    }
}
