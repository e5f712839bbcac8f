package org.treeproof.data;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * What to do with missing cells (read from empty, {@code NA}, {@code N/A}, {@code #N/A} or {@code NaN} cells).
 * Distances and trees need complete data, so every policy but {@link #ERROR} leaves none.
 */
public enum MissingPolicy {
    /** Refuse the table, naming how many cells are missing and where the first one is. The default. */
    ERROR("error") {
        @Override
        void apply(PreparationRun run) {
            WorkingTable t = run.table;
            int[] at = t.first(Double::isNaN, run.where.featureMajor());
            if (at == null) {
                return;
            }
            long count = Arrays.stream(t.countPerFeature(Double::isNaN)).asLongStream().sum();
            throw new InputException(run.locate(at[0], at[1]) + ": missing value " + run.names(at[0], at[1])
                    + (count == 1 ? ", the only one" : ", the first of " + count)
                    + "; choose --missing drop-features, drop-samples or impute-median to go on");
        }
    },
    /** Drop every feature with a missing cell. */
    DROP_FEATURES("drop-features") {
        @Override
        void apply(PreparationRun run) {
            int[] missing = run.table.countPerFeature(Double::isNaN);
            boolean[] drop = new boolean[missing.length];
            int left = 0;
            for (int j = 0; j < missing.length; j++) {
                drop[j] = missing[j] > 0;
                left += drop[j] ? 0 : 1;
            }
            if (left == 0) {
                throw new InputException(run.where.source() + ": every feature has a missing value, so --missing "
                        + "drop-features leaves none; try drop-samples or impute-median");
            }
            run.dropFeatures(drop, PreparationReport.Reason.MISSING_VALUES, missing);
        }
    },
    /** Drop every sample with a missing cell. */
    DROP_SAMPLES("drop-samples") {
        @Override
        void apply(PreparationRun run) {
            int[] missing = run.table.countPerSample(Double::isNaN);
            boolean[] drop = new boolean[missing.length];
            int left = 0;
            for (int i = 0; i < missing.length; i++) {
                drop[i] = missing[i] > 0;
                left += drop[i] ? 0 : 1;
            }
            if (left < 2) {
                throw new InputException(run.where.source() + ": --missing drop-samples leaves " + left + " of "
                        + missing.length + " samples (the others have missing values) and clustering needs at "
                        + "least 2; try drop-features or impute-median");
            }
            run.dropSamples(drop, PreparationReport.Reason.MISSING_VALUES, missing);
        }
    },
    /**
     * Fill each missing cell with the median of its feature's observed values (the mean of the two middle values
     * for an even count); a feature with no observed value is dropped.
     */
    IMPUTE_MEDIAN("impute-median") {
        @Override
        void apply(PreparationRun run) {
            WorkingTable t = run.table;
            int[] missing = t.countPerFeature(Double::isNaN);
            boolean[] empty = new boolean[missing.length];
            int left = 0;
            long cells = 0;
            int features = 0;
            for (int j = 0; j < missing.length; j++) {
                empty[j] = missing[j] == t.samples();
                left += empty[j] ? 0 : 1;
                if (missing[j] == 0 || empty[j]) {
                    continue;
                }
                double median = medianOfObserved(t.column(j));
                for (int i = 0; i < t.samples(); i++) {
                    if (Double.isNaN(t.get(i, j))) {
                        t.set(i, j, median);
                    }
                }
                cells += missing[j];
                features++;
            }
            if (left == 0) {
                throw new InputException(run.where.source() + ": every feature is missing in every sample; "
                        + "there is nothing to impute from");
            }
            run.imputed(cells, features);
            run.dropFeatures(empty, PreparationReport.Reason.NO_OBSERVED_VALUES, missing);
        }
    };

    private final String userName;

    MissingPolicy(String userName) {
        this.userName = userName;
    }

    /** The name users type, e.g. {@code drop-features}. */
    public String userName() {
        return userName;
    }

    /**
     * The policy for a user-typed name: case is ignored and {@code _} may stand for {@code -}.
     *
     * @throws InputException naming the accepted names when {@code name} is none of them
     */
    public static MissingPolicy fromUserName(String name) {
        String key = name.strip().toLowerCase(Locale.ROOT).replace('_', '-');
        for (MissingPolicy p : values()) {
            if (p.userName.equals(key)) {
                return p;
            }
        }
        throw new InputException("unknown missing-value policy '" + name + "'; use one of " + names());
    }

    /** The user names, comma-separated, for help and messages. */
    public static String names() {
        return Arrays.stream(values()).map(MissingPolicy::userName).collect(Collectors.joining(", "));
    }

    /** Leaves no missing cell in the run's table, or throws. */
    abstract void apply(PreparationRun run);

    /** The median of the non-NaN values of {@code column}, which has at least one. */
    static double medianOfObserved(double[] column) {
        double[] x = Arrays.stream(column).filter(v -> !Double.isNaN(v)).sorted().toArray();
        int m = x.length / 2;
        if (x.length % 2 == 1) {
            return x[m];
        }
        double sum = x[m - 1] + x[m];
        return Double.isInfinite(sum) ? x[m - 1] / 2 + x[m] / 2 : sum / 2;
    }

    @Override
    public String toString() {
        return userName;
    }
}
