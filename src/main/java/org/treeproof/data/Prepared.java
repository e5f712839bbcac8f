package org.treeproof.data;

import java.util.Objects;

/**
 * A prepared table and the account of how it was made from the table as read.
 *
 * @param matrix the table ready for a distance metric: no missing values, finite
 * @param report what the preparation did
 */
public record Prepared(DataMatrix matrix, PreparationReport report) {
    public Prepared {
        Objects.requireNonNull(matrix, "matrix");
        Objects.requireNonNull(report, "report");
        if (matrix.samples() != report.samples() || matrix.features() != report.features()) {
            throw new IllegalArgumentException("matrix " + matrix + " does not match the report's "
                    + report.samples() + " x " + report.features());
        }
    }
}
