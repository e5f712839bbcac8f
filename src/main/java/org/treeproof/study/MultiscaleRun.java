package org.treeproof.study;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.resample.MultiscalePlanner;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicateTask;
import org.treeproof.resample.Seeds;
import org.treeproof.score.BranchSupport;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

/**
 * Branch p-values of every linkage's tree by the multiscale bootstrap of features (H. Shimodaira, Systematic
 * Biology 51 (2002) 492, doi:10.1080/10635150290069913; Annals of Statistics 32 (2004) 2616,
 * doi:10.1214/009053604000000823; R. Suzuki and H. Shimodaira, Bioinformatics 22 (2006) 1540,
 * doi:10.1093/bioinformatics/btl117).
 *
 * <p>Each replicate draws features with replacement at its scale ({@link MultiscalePlanner}), computes the
 * distances between all samples over them, clusters with every linkage and records which clades of the full-data
 * trees its trees contain (compared by set hashes, {@link BranchSupport}). Replicates run through the study's
 * executor as pure functions of their index and are counted in index order, and each finished replicate is kept
 * in the checkpoint, so the counts, and the fits from them ({@link MultiscaleFit}), are the same for any thread
 * count, on Spark, and after a resume.
 */
final class MultiscaleRun {
    private final DataMatrix data;
    private final StudySettings settings;
    private final List<ReferenceSolution> refs;
    private final ReplicateExecutor executor;
    private final StudyProgress progress;
    private final Checkpoint checkpoint;

    MultiscaleRun(DataMatrix data, StudySettings settings, List<ReferenceSolution> refs, ReplicateExecutor executor,
            StudyProgress progress, Checkpoint checkpoint) {
        this.data = data;
        this.settings = settings;
        this.refs = refs;
        this.executor = executor;
        this.progress = progress;
        this.checkpoint = checkpoint;
    }

    /** The branch p-values of every linkage, in the order of {@code refs}. */
    List<BranchPValues> run() {
        BranchPValueSettings bs = settings.branchPValues();
        MultiscalePlanner planner = bs.planner(data.features(), settings.seed());
        int links = refs.size();
        int n = data.samples();
        int scales = bs.scales().size();
        int perScale = bs.replicatesPerScale();
        int total = planner.replicates();
        var supports = new ArrayList<BranchSupport>();
        for (int l = 0; l < links; l++) {
            supports.add(BranchSupport.of(refs.get(l).tree(), Seeds.seedFor(settings.seed(), Seeds.Purpose.CLADE_KEYS, l)));
        }
        int words = words(n);
        int[][][] counts = new int[links][scales][n - 1];
        progress.stage("multiscale bootstrap (branch p-values)", total);
        int first = 0;
        for (double[] kept : checkpoint.rows(Checkpoint.Stage.MULTISCALE)) {
            if (first >= total) {
                break;
            }
            add(counts, planner.scaleOf(first), unpack(kept, links, words));
            first++;
            progress.step();
        }
        var task = new ScaledReplicate(data, settings.metric(), settings.linkages(), supports, planner);
        final int[] next = {first};
        executor.run(first, total, task, supported -> {
            int index = next[0]++;
            add(counts, planner.scaleOf(index), supported);
            checkpoint.rowDone(Checkpoint.Stage.MULTISCALE, index, pack(supported, words));
            progress.step();
        });
        double[] realised = new double[scales];
        int[] reps = new int[scales];
        for (int s = 0; s < scales; s++) {
            realised[s] = planner.realisedScale(s);
            reps[s] = perScale;
        }
        var out = new ArrayList<BranchPValues>(links);
        for (int l = 0; l < links; l++) {
            var fits = new ArrayList<MultiscaleFit.Result>(n - 1);
            int[] c = new int[scales];
            for (int m = 0; m < n - 1; m++) {
                for (int s = 0; s < scales; s++) {
                    c[s] = counts[l][s][m];
                }
                fits.add(MultiscaleFit.of(realised, reps, c).compute());
            }
            out.add(new BranchPValues(realised, perScale, counts[l], fits));
        }
        return out;
    }

    private static int words(int n) {
        return Math.max(1, (n - 1 + 63) >>> 6);
    }

    private static void add(int[][][] counts, int scale, long[][] supported) {
        for (int l = 0; l < counts.length; l++) {
            int[] row = counts[l][scale];
            long[] bits = supported[l];
            for (int m = 0; m < row.length; m++) {
                if ((bits[m >>> 6] & (1L << m)) != 0) {
                    row[m]++;
                }
            }
        }
    }

    /** A replicate's bits as checkpoint numbers: each 64-bit word as two 32-bit halves (exact in a double). */
    private static double[] pack(long[][] supported, int words) {
        double[] row = new double[supported.length * words * 2];
        int t = 0;
        for (long[] bits : supported) {
            for (int w = 0; w < words; w++) {
                row[t++] = (double) (bits[w] >>> 32);
                row[t++] = (double) (bits[w] & 0xFFFF_FFFFL);
            }
        }
        return row;
    }

    private static long[][] unpack(double[] row, int links, int words) {
        if (row.length != links * words * 2) {
            throw new IllegalStateException("a kept multiscale replicate has the wrong length");
        }
        long[][] out = new long[links][words];
        int t = 0;
        for (int l = 0; l < links; l++) {
            for (int w = 0; w < words; w++) {
                long hi = (long) row[t++];
                long lo = (long) row[t++];
                out[l][w] = (hi << 32) | lo;
            }
        }
        return out;
    }

    /**
     * One replicate as a task: features drawn at its scale, distances over all samples, one tree per linkage, and
     * per linkage the bits of the reference clades it reproduces. Carries the data table, never the distances.
     */
    private record ScaledReplicate(DataMatrix data, Metric metric, List<Linkage> linkages, List<BranchSupport> supports,
            MultiscalePlanner planner) implements ReplicateTask<long[][]> {
        ScaledReplicate {
            linkages = List.copyOf(linkages);
            supports = List.copyOf(supports);
        }

        @Override
        public long[][] apply(int index) {
            int[] features = planner.plan(index);
            CondensedDistances d = metric.compute(data, features, 1);
            int n = data.samples();
            int[] all = new int[n];
            for (int i = 0; i < n; i++) {
                all[i] = i;
            }
            long[][] out = new long[linkages.size()][];
            for (int l = 0; l < linkages.size(); l++) {
                MergeTree tree = linkages.get(l).cluster(d);
                out[l] = supports.get(l).score(all, tree).supported();
            }
            return out;
        }
    }
}
