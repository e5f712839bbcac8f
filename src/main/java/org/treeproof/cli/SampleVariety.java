package org.treeproof.cli;

import java.nio.file.Path;
import org.treeproof.data.InputException;
import org.treeproof.study.DistinctSamples;
import org.treeproof.study.StudyInput;
import org.treeproof.study.StudySettings;

/**
 * Refuses, before any work, an input whose samples are too alike to study as asked: all identical (nothing to
 * cluster), or fewer distinct samples than the numbers of clusters asked for (see {@link DistinctSamples}).
 */
final class SampleVariety {
    private SampleVariety() {
    }

    /**
     * @param input    the input file as the user named it
     * @param study    the prepared input
     * @param settings the study's settings
     * @throws InputException when every sample is the same, or {@code --max-k} asks for more clusters than the
     *                        distinct samples allow (one fewer when the gap statistic runs, whose within-cluster
     *                        dispersion is 0 once every cluster holds copies of one sample)
     */
    static void require(Path input, StudyInput study, StudySettings settings) {
        int n = study.samples();
        int distinct = DistinctSamples.count(study);
        if (distinct == 1) {
            throw new InputException(input + ": all " + n + " samples are identical" + (study.hasData()
                    ? " after preparation (every feature takes one value)" : " (every distance is 0)")
                    + "; there is nothing to cluster");
        }
        boolean gap = study.hasData() && settings.referenceSets() > 0;
        int largest = gap ? distinct - 1 : distinct;
        if (distinct < n && settings.maxK() > largest) {
            throw new InputException(input + ": only " + distinct + " of the " + n + " samples are distinct (the others"
                    + " repeat them), so " + (gap ? "the gap statistic is undefined beyond k = " + largest
                    + " (every cluster would hold copies of one sample); " + remedy(largest)
                    : "no more than " + largest + " clusters can be told apart; give --max-k " + largest + " or less"));
        }
        int reference = DistinctSamples.fewestInGapReferences(study, settings);
        if (settings.maxK() > reference - 1) {
            throw new InputException(input + ": a 0/1 reference data set of the gap statistic (drawn with each"
                    + " feature's frequency of ones) holds only " + reference + " distinct samples, so the gap statistic"
                    + " is undefined beyond k = " + (reference - 1) + "; " + remedy(reference - 1));
        }
    }

    /** What to do when the gap statistic is defined only up to {@code largest} clusters. */
    private static String remedy(int largest) {
        String skip = "--reference-sets 0 to skip the gap statistic";
        return largest >= 2 ? "give --max-k " + largest + " or less, or " + skip : "give " + skip;
    }
}
