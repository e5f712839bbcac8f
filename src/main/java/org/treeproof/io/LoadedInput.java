package org.treeproof.io;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputSource;
import org.treeproof.data.Prepared;
import org.treeproof.data.PreparationReport;
import org.treeproof.distance.CondensedDistances;

/**
 * An input ready for clustering: either a prepared data table, or a table of distances, with where it came from.
 *
 * @param source        the file's path as given, SHA-256 and size
 * @param inputSamples  samples (or items) in the file as read
 * @param inputFeatures features in the file as read; 0 for a distance table, which has none
 * @param sampleIds     the samples to cluster, in order (after any dropped by the preparation)
 * @param matrix        the prepared data table; empty for a distance table
 * @param preparation   what the preparation did; empty for a distance table
 * @param distances     the distances read; empty for a data table, whose distances the chosen metric computes
 */
public record LoadedInput(InputSource source, int inputSamples, int inputFeatures, List<String> sampleIds,
        Optional<DataMatrix> matrix, Optional<PreparationReport> preparation,
        Optional<CondensedDistances> distances) {

    public LoadedInput {
        Objects.requireNonNull(source, "source");
        sampleIds = List.copyOf(sampleIds);
        Objects.requireNonNull(matrix, "matrix");
        Objects.requireNonNull(preparation, "preparation");
        Objects.requireNonNull(distances, "distances");
        if (matrix.isPresent() == distances.isPresent() || matrix.isPresent() != preparation.isPresent()) {
            throw new IllegalArgumentException("either a prepared matrix with its report, or distances");
        }
        List<String> ids = sampleIds;
        int n = matrix.map(DataMatrix::samples).orElseGet(() -> distances.get().size());
        if (n != ids.size() || matrix.map(m -> !m.sampleIds().equals(ids)).orElse(false)) {
            throw new IllegalArgumentException(ids.size() + " sample ids for " + n + " samples");
        }
    }

    /** A data table read and prepared. */
    public static LoadedInput of(DataTable table, Prepared prepared) {
        DataMatrix raw = table.matrix();
        return new LoadedInput(table.source(), raw.samples(), raw.features(), prepared.matrix().sampleIds(),
                Optional.of(prepared.matrix()), Optional.of(prepared.report()), Optional.empty());
    }

    /** A distance table read. */
    public static LoadedInput of(DistanceTable table) {
        return new LoadedInput(table.source(), table.ids().size(), 0, table.ids(), Optional.empty(), Optional.empty(),
                Optional.of(table.distances()));
    }

    /** Whether the input was a table of distances rather than of data. */
    public boolean isDistanceTable() {
        return distances.isPresent();
    }

    /** The number of samples to cluster. */
    public int samples() {
        return sampleIds.size();
    }

    /** The number of features of the prepared table; 0 for a distance table. */
    public int features() {
        return matrix.map(DataMatrix::features).orElse(0);
    }
}
