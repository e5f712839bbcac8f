package org.treeproof.study;

import java.util.List;
import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;

/**
 * What a study runs on: the samples, the prepared data table when there is one, and the dissimilarities.
 *
 * @param sampleIds the samples, in input order
 * @param data      the prepared samples-by-features table, or {@code null} when only distances were given
 *                  (then the scores that need features — Calinski-Harabasz, Davies-Bouldin, the gap
 *                  statistic, null calibration, feature resampling — are not available)
 * @param distances the dissimilarities between samples under the study's metric, or {@code null} to have
 *                  the study compute them from {@code data}
 */
public record StudyInput(List<String> sampleIds, DataMatrix data, CondensedDistances distances) {
    public StudyInput {
        sampleIds = List.copyOf(sampleIds);
        if (data == null && distances == null) {
            throw new IllegalArgumentException("a study needs data or distances");
        }
        if (data != null && !data.sampleIds().equals(sampleIds)) {
            throw new IllegalArgumentException("the data's sample ids differ from the study's");
        }
        if (distances != null && distances.size() != sampleIds.size()) {
            throw new IllegalArgumentException("the distances are over " + distances.size() + " samples, not "
                    + sampleIds.size());
        }
    }

    /** A study of a data table; the study computes the distances. */
    public static StudyInput of(DataMatrix data) {
        return new StudyInput(Objects.requireNonNull(data).sampleIds(), data, null);
    }

    /** A study of given distances alone. */
    public static StudyInput ofDistances(List<String> ids, CondensedDistances distances) {
        return new StudyInput(ids, null, Objects.requireNonNull(distances));
    }

    public int samples() {
        return sampleIds.size();
    }

    public boolean hasData() {
        return data != null;
    }
}
