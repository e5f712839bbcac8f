package org.treeproof.spark;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.treeproof.data.DataMatrix;
import org.treeproof.io.SummaryJson;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.Evidence;
import org.treeproof.study.Recommendation;
import org.treeproof.study.Recommender;
import org.treeproof.study.StudyInput;
import org.treeproof.study.StudyProgress;
import org.treeproof.study.StudyRunner;
import org.treeproof.study.StudySettings;
import org.treeproof.tree.Linkage;

/**
 * A small complete study (replicates, null calibration, gap statistic, two linkages) for comparing executors by
 * the bytes of its summary.json.
 */
final class SmallStudy {
    private SmallStudy() {
    }

    /** 40 samples in three spherical Gaussian groups, 6 features, centres 6 SD apart. */
    static DataMatrix data() {
        var rng = new SplittableRandom(40);
        int n = 40;
        int p = 6;
        double[] v = new double[n * p];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
            for (int j = 0; j < p; j++) {
                v[i * p + j] = (j == i % 3 ? 6 : 0) + rng.nextGaussian();
            }
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, v);
    }

    static StudySettings settings() {
        return StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.WARD)).maxK(6).replicates(30)
                .nullSets(19).nullReplicates(4).referenceSets(5).seed(2024).build();
    }

    /** summary.json of the study run with {@code executor}, with fixed provenance. */
    static byte[] summary(ReplicateExecutor executor) {
        Evidence e = new StudyRunner(StudyInput.of(data()), settings(), executor, 2, StudyProgress.SILENT).run();
        var provenance = new SummaryJson.Provenance("treeproof", "test", "groups.csv", "0".repeat(64),
                List.of("Read the table."), List.of(), null);
        Recommendation r = Recommender.of(e, DecisionRule.DEFAULT).recommend();
        return new SummaryJson(e, r, provenance, new org.treeproof.report.ReasonWords(r.rule())::word).toBytes();
    }
}
