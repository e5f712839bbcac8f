package org.treeproof.study;

import java.util.List;

/**
 * The evidence table of a study: every linkage, every k, every measure.
 *
 * @param sampleIds the samples, in input order
 * @param features  the number of features of the prepared data (0 when only distances were given)
 * @param settings  the study's settings
 * @param linkages  per linkage, in the order of the settings
 * @param minClusterSize the smallest cluster; samples on smaller branches are outliers
 * @param structureTest  the test of any cluster structure, or {@code null} without null calibration
 */
public record Evidence(List<String> sampleIds, int features, StudySettings settings, List<LinkageEvidence> linkages,
        int minClusterSize, StructureTest structureTest) {
    public Evidence {
        sampleIds = List.copyOf(sampleIds);
        linkages = List.copyOf(linkages);
    }

    public int samples() {
        return sampleIds.size();
    }
}
