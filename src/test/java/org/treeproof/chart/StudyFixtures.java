package org.treeproof.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.treeproof.data.DataMatrix;
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

/** Small real studies (seeded data, the real runner and recommender) for the tests of {@link StudyCharts}. */
final class StudyFixtures {
    /** A study's results with the data it ran on. */
    record Run(Evidence evidence, Recommendation recommendation, DataMatrix data) {
    }

    private StudyFixtures() {
    }

    /**
     * Gaussian groups in {@code p} dimensions: group {@code g} is shifted by {@code shift} along features
     * {@code g*width .. g*width+width-1}, every value has unit noise. Samples are dealt round the groups.
     */
    static DataMatrix groups(int[] sizes, int p, int width, double shift, long seed) {
        var rng = new SplittableRandom(seed);
        int n = 0;
        for (int s : sizes) {
            n += s;
        }
        int[] group = new int[n];
        int[] left = sizes.clone();
        for (int i = 0, g = 0; i < n; g = (g + 1) % sizes.length) {
            if (left[g] > 0) {
                left[g]--;
                group[i++] = g;
            }
        }
        double[] v = new double[n * p];
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + (i + 1));
            for (int j = 0; j < p; j++) {
                boolean own = j / width == group[i];
                v[i * p + j] = (own ? shift : 0) + gaussian(rng);
            }
        }
        return new DataMatrix(ids, names("f", p), v);
    }

    /** Uniform noise on [0, 1): no cluster structure. */
    static DataMatrix noise(int n, int p, long seed) {
        var rng = new SplittableRandom(seed);
        double[] v = new double[n * p];
        for (int t = 0; t < v.length; t++) {
            v[t] = rng.nextDouble();
        }
        return new DataMatrix(names("s", n), names("f", p), v);
    }

    static List<String> names(String prefix, int count) {
        var out = new ArrayList<String>(count);
        for (int i = 0; i < count; i++) {
            out.add(prefix + (i + 1));
        }
        return out;
    }

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

    /**
     * Small settings that still calibrate against null data: 19 null sets are the fewest whose Monte Carlo
     * p-value can reach 0.05 (Hope 1968, see {@code NullStability}), each with few replicates.
     */
    static StudySettings small() {
        return StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.WARD)).maxK(5).replicates(20)
                .referenceSets(5).nullSets(19).nullReplicates(4).seed(11).build();
    }

    static Run run(StudyInput input, DataMatrix data, StudySettings settings, int threads) {
        Evidence e = new StudyRunner(input, settings, new LocalExecutor(threads), threads, StudyProgress.SILENT).run();
        return new Run(e, Recommender.of(e, DecisionRule.DEFAULT).recommend(), data);
    }

    static Run run(DataMatrix data, StudySettings settings) {
        return run(StudyInput.of(data), data, settings, 2);
    }
}
