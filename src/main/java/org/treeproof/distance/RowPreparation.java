package org.treeproof.distance;

import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;

/**
 * How a metric checks and transforms the rows before the kernel compares them.
 *
 * <p>Every preparation refuses missing ({@code NaN}) and infinite values, naming the sample and the
 * feature: missing-value policies belong to data preparation, which runs before any distance.
 */
enum RowPreparation {
    /** Rows as they are. */
    AS_IS {
        @Override
        Prepared prepare(RowSource.Columns rows, DataMatrix data, String metric) {
            forEachValue(rows, data, metric, null);
            return new Prepared(rows, null);
        }
    },
    /** 0/1 rows; the number of ones per row is kept for the metric. */
    BINARY {
        @Override
        Prepared prepare(RowSource.Columns rows, DataMatrix data, String metric) {
            double[] ones = new double[rows.rows()];
            forEachValue(rows, data, metric, (r, k, v) -> {
                if (v != 0 && v != 1) {
                    throw new InputException("sample '" + data.sampleIds().get(r) + "' has value " + v
                            + " in feature '" + data.featureNames().get(rows.column(k)) + "'; the " + metric
                            + " distance takes only 0/1 data");
                }
                ones[r] += v;
            });
            return new Prepared(rows, ones);
        }
    },
    /** Rows scaled to unit length (cosine similarity as a dot product). */
    UNIT_LENGTH {
        @Override
        Prepared prepare(RowSource.Columns rows, DataMatrix data, String metric) {
            boolean[] nonZero = new boolean[rows.rows()];
            forEachValue(rows, data, metric, (r, k, v) -> nonZero[r] |= v != 0);
            for (int r = 0; r < nonZero.length; r++) {
                if (!nonZero[r]) {
                    throw new InputException("sample '" + data.sampleIds().get(r) + "' is zero in all "
                            + rows.width() + " features used; its " + metric + " distance is undefined");
                }
            }
            return new Prepared(new RowSource.Standardised(rows, false), null);
        }
    },
    /** Rows centred on their mean and scaled to unit length (Pearson correlation as a dot product). */
    CENTRED_UNIT_LENGTH {
        @Override
        Prepared prepare(RowSource.Columns rows, DataMatrix data, String metric) {
            requireSpread(rows, data, metric);
            return new Prepared(new RowSource.Standardised(rows, true), null);
        }
    },
    /** Average ranks within each row, then centred and scaled (Spearman correlation as a dot product). */
    RANKS_CENTRED_UNIT_LENGTH {
        @Override
        Prepared prepare(RowSource.Columns rows, DataMatrix data, String metric) {
            requireSpread(rows, data, metric);
            return new Prepared(new RowSource.Standardised(new RowSource.Ranks(rows), true), null);
        }
    };

    /** The rows to compare and, where a metric needs it, one number per row ({@code null} otherwise). */
    record Prepared(RowSource rows, double[] perRow) {
    }

    /** Checks the rows and makes them ready for the kernel; {@code metric} is the name used in messages. */
    abstract Prepared prepare(RowSource.Columns rows, DataMatrix data, String metric);

    @FunctionalInterface
    private interface ValueCheck {
        void accept(int row, int k, double value);
    }

    /** Visits every value in row order, refusing missing and infinite ones before {@code check} sees them. */
    private static void forEachValue(RowSource.Columns rows, DataMatrix data, String metric, ValueCheck check) {
        int m = rows.width();
        double[] row = new double[m];
        double[] scratch = new double[rows.scratchLength()];
        for (int r = 0; r < rows.rows(); r++) {
            rows.load(r, row, 0, scratch);
            for (int k = 0; k < m; k++) {
                double v = row[k];
                if (Double.isNaN(v)) {
                    throw new InputException("sample '" + data.sampleIds().get(r) + "' has a missing value in feature '"
                            + data.featureNames().get(rows.column(k)) + "'; " + metric
                            + " distances need complete data (apply a missing-value policy first)");
                }
                if (Double.isInfinite(v)) {
                    throw new InputException("sample '" + data.sampleIds().get(r) + "' has an infinite value in feature '"
                            + data.featureNames().get(rows.column(k)) + "'; " + metric + " distances need finite values");
                }
                if (check != null) {
                    check.accept(r, k, v);
                }
            }
        }
    }

    private static void requireSpread(RowSource.Columns rows, DataMatrix data, String metric) {
        int n = rows.rows();
        double[] first = new double[n];
        boolean[] varies = new boolean[n];
        forEachValue(rows, data, metric, (r, k, v) -> {
            if (k == 0) {
                first[r] = v;
            } else {
                varies[r] |= v != first[r];
            }
        });
        for (int r = 0; r < n; r++) {
            if (!varies[r]) {
                throw new InputException("sample '" + data.sampleIds().get(r) + "' has the same value in all "
                        + rows.width() + " features used; its " + metric + " distance is undefined");
            }
        }
    }
}
