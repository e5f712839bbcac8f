package org.treeproof.io;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import org.treeproof.data.InputSource;
import org.treeproof.distance.CondensedDistances;

/**
 * A table of pairwise distances as read from a file.
 *
 * @param ids       the items, in file order; item {@code i} is row and column {@code i} of {@code distances}
 * @param distances the distances, symmetric with zero diagonal
 * @param source    the file's path as given, the SHA-256 of its bytes and their count
 */
public record DistanceTable(List<String> ids, CondensedDistances distances, InputSource source) {
    public DistanceTable {
        ids = List.copyOf(ids);
        Objects.requireNonNull(distances, "distances");
        Objects.requireNonNull(source, "source");
        if (ids.size() != distances.size()) {
            throw new IllegalArgumentException(ids.size() + " ids for " + distances.size() + " items");
        }
        if (new HashSet<>(ids).size() != ids.size()) {
            throw new IllegalArgumentException("duplicate ids");
        }
    }
}
