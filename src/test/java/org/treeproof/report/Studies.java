package org.treeproof.report;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.IntFunction;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.Metric;
import org.treeproof.resample.Resampling;
import org.treeproof.resample.LocalExecutor;
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
 * Small real studies for the report tests, each run once per test JVM: three well-separated groups (which the
 * decision rule must call supported) and uniform noise (which it must call unsupported).
 */
final class Studies {
    /** A study's evidence and recommendation. */
    record Study(Evidence evidence, Recommendation recommendation) {
        RunInfo run() {
            return run("input.csv", "2024-01-01T00:00:00Z", 2, 1.5);
        }

        RunInfo run(String file, String generatedAt, int threads, double wall) {
            var s = evidence.settings();
            return new RunInfo("treeproof", "0.1.0", file, "ab".repeat(32), evidence.samples(), evidence.features(),
                    evidence.features() == 0 ? List.of() : List.of("log2(x+1) applied.", "2 constant features dropped."),
                    s.metric().id(),
                    "treeproof assess " + file + " --out result", s.seed(), threads, wall, generatedAt);
        }

        ReportModel model() {
            return ReportModel.of(evidence, recommendation, run());
        }
    }

    private static Study separated;
    private static Study noise;
    private static Study bridged;
    private static Study tentative;
    private static Study distancesOnly;

    private Studies() {
    }

    static StudySettings settings() {
        // 19 null sets: the smallest Monte Carlo p-value is then 1/20 = 0.05, the rule's level
        return StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.COMPLETE, Linkage.WARD)).maxK(5)
                .replicates(20).referenceSets(10).nullSets(19).nullReplicates(5).seed(11).build();
    }

    /** Three spherical Gaussian groups of 15 in 4 dimensions, centres 10 SD apart. */
    static synchronized Study separated() {
        if (separated == null) {
            separated = run(threeGroups(15, 21, i -> "s" + i), settings());
        }
        return separated;
    }

    /** 40 samples uniform on the unit 4-cube: no clusters. */
    static synchronized Study noise() {
        if (noise == null) {
            var rng = new SplittableRandom(5);
            int n = 40;
            int p = 4;
            double[] v = new double[n * p];
            for (int i = 0; i < v.length; i++) {
                v[i] = rng.nextDouble();
            }
            noise = run(new DataMatrix(ids(n, i -> "u" + i), names(p), v), settings());
        }
        return noise;
    }

    /**
     * Three groups of 15 and three samples midway between the first two: the groups are supported and the
     * samples in between are flagged (with hostile ids when {@code id} makes them so).
     */
    static Study bridged(IntFunction<String> id) {
        var rng = new SplittableRandom(4);
        int p = 4;
        int n = 48;
        double[] v = new double[n * p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                v[i * p + j] = (i < 45 ? (j == i % 3 ? 10 : 0) : (j < 2 ? 5 : 0)) + gaussian(rng);
            }
        }
        return run(new DataMatrix(ids(n, id), names(p), v), settings());
    }

    static synchronized Study bridged() {
        if (bridged == null) {
            bridged = bridged(i -> "b" + i);
        }
        return bridged;
    }

    /** Two groups of 25 and 8, 5 SD apart: stable beyond the null but with a weak silhouette, so tentative. */
    static synchronized Study tentative() {
        if (tentative == null) {
            var rng = new SplittableRandom(1);
            int p = 4;
            int n = 33;
            double[] v = new double[n * p];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < p; j++) {
                    v[i * p + j] = (i >= 25 && j == 0 ? 9 : 0) + gaussian(rng);
                }
            }
            // without null data no solution can be more than tentative, however clear: a verdict fixed by the rule
            StudySettings noNull = StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.COMPLETE,
                    Linkage.WARD)).maxK(5).replicates(20).referenceSets(10).nullSets(0).seed(11).build();
            tentative = run(new DataMatrix(ids(n, i -> "t" + i), names(p), v), noNull);
        }
        return tentative;
    }

    /**
     * The three separated groups given as distances only, one linkage, bootstrap resampling: no feature-space
     * scores, no null calibration, no gap statistic, no linkage comparison.
     */
    static synchronized Study distancesOnly() {
        if (distancesOnly == null) {
            DataMatrix data = threeGroups(15, 21, i -> "d" + i);
            var settings = StudySettings.builder().linkages(List.of(Linkage.AVERAGE)).maxK(5).replicates(20)
                    .resampling(Resampling.BOOTSTRAP).seed(3).build();
            StudyInput input = StudyInput.ofDistances(data.sampleIds(), Metric.EUCLIDEAN.compute(data, 1));
            Evidence e = new StudyRunner(input, settings, new LocalExecutor(2), 2, StudyProgress.SILENT).run();
            distancesOnly = new Study(e, Recommender.of(e, DecisionRule.DEFAULT).recommend());
        }
        return distancesOnly;
    }

    static Study run(DataMatrix data, StudySettings settings) {
        Evidence e = new StudyRunner(StudyInput.of(data), settings, new LocalExecutor(2), 2, StudyProgress.SILENT).run();
        return new Study(e, Recommender.of(e, DecisionRule.DEFAULT).recommend());
    }

    static DataMatrix threeGroups(int perGroup, long seed, IntFunction<String> id) {
        var rng = new SplittableRandom(seed);
        int p = 4;
        int n = 3 * perGroup;
        double[] v = new double[n * p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                v[i * p + j] = (j == i % 3 ? 10 : 0) + gaussian(rng);
            }
        }
        return new DataMatrix(ids(n, id), names(p), v);
    }

    static List<String> ids(int n, IntFunction<String> id) {
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add(id.apply(i));
        }
        return ids;
    }

    static List<String> names(int p) {
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return names;
    }

    /** A standard normal draw (Marsaglia's polar method). */
    static double gaussian(SplittableRandom rng) {
        double u;
        double w;
        double s;
        do {
            u = 2 * rng.nextDouble() - 1;
            w = 2 * rng.nextDouble() - 1;
            s = u * u + w * w;
        } while (s >= 1 || s == 0);
        return u * Math.sqrt(-2 * Math.log(s) / s);
    }
}
