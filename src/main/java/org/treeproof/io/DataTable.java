package org.treeproof.io;

import java.util.Objects;
import org.treeproof.data.CellLocator;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputSource;

/**
 * A data table as read from a file, before any preparation.
 *
 * @param matrix       samples by features; missing cells are {@code NaN}
 * @param source       the file's path as given, the SHA-256 of its bytes and their count
 * @param missingCells how many cells were missing-value tokens
 * @param locator      the line and column of every cell, for messages from the preparation
 */
public record DataTable(DataMatrix matrix, InputSource source, long missingCells, CellLocator locator) {
    public DataTable {
        Objects.requireNonNull(matrix, "matrix");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(locator, "locator");
        if (missingCells != matrix.missingCount()) {
            throw new IllegalArgumentException(missingCells + " missing cells reported, the matrix has "
                    + matrix.missingCount());
        }
    }
}
