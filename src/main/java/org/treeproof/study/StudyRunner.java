package org.treeproof.study;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.partition.Partition;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.resample.ReplicateExecutor;
import org.treeproof.resample.ReplicatePlanner;
import org.treeproof.resample.Seeds;
import org.treeproof.score.BranchSupport;
import org.treeproof.score.CalinskiHarabasz;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.DaviesBouldin;
import org.treeproof.score.DunnIndex;
import org.treeproof.score.GapResult;
import org.treeproof.score.JaccardStability;
import org.treeproof.score.ReplicateSummary;
import org.treeproof.score.SampleStability;
import org.treeproof.score.Separation;
import org.treeproof.score.Silhouette;
import org.treeproof.partition.Clustering;
import org.treeproof.tree.SizedCut;

/**
 * Runs a study: the reference tree of every linkage, B resampled replicates, null calibration and the
 * gap statistic, and assembles the evidence table.
 *
 * <p>Every random draw comes from {@link Seeds#seedFor}, every replicate is a pure function of its index,
 * and results are accumulated in index order, so the evidence is identical for any executor and any
 * number of threads.
 *
 * <p>The executor runs the replicates, null-set replicates and gap reference sets, which it may ship to
 * other machines; the full distance matrices and reference trees are built here, on {@code kernelThreads}
 * threads of this JVM.
 */
public final class StudyRunner {
    private final StudyInput input;
    private final StudySettings settings;
    private final ReplicateExecutor executor;
    private final LocalExecutor here;
    private final int kernelThreads;
    private final StudyProgress progress;
    private Checkpoint checkpoint = Checkpoint.NONE;
    /** The principal axes of the data, computed once for the null model and the gap reference (when they need them). */
    private java.util.function.Supplier<org.treeproof.resample.PrincipalAxes> axes;

    /**
     * @param kernelThreads threads for whole-matrix distance computations (the replicates are parallel
     *                      through the executor)
     */
    public StudyRunner(StudyInput input, StudySettings settings, ReplicateExecutor executor, int kernelThreads,
            StudyProgress progress) {
        this.input = input;
        this.settings = settings;
        this.executor = executor;
        this.here = new LocalExecutor(kernelThreads);
        this.kernelThreads = kernelThreads;
        this.progress = progress;
        settings.checkAgainst(input.samples(), input.hasData());
        if (settings.branchPValues() != null && input.hasData()) {
            settings.branchPValues().checkFeatures(input.data().features());
        }
    }

    /** Keeps finished work in {@code checkpoint} and replays what it already holds. */
    public StudyRunner withCheckpoint(Checkpoint checkpoint) {
        this.checkpoint = java.util.Objects.requireNonNull(checkpoint);
        return this;
    }

    /** Runs the study. */
    public Evidence run() {
        DataMatrix data = input.data();
        axes = memoized(() -> org.treeproof.resample.PrincipalAxes.of(data));
        int n = input.samples();
        int maxK = settings.maxK();
        Metric metric = settings.metric();
        progress.stage("distances and reference trees", 1 + settings.linkages().size());
        CondensedDistances d = input.distances() != null ? input.distances() : metric.compute(data, kernelThreads);
        progress.step();
        int minSize = settings.minClusterSize(n);
        List<ReferenceSolution> refs = ReferenceSolution.all(settings.linkages(), d, maxK, minSize, here);
        for (int i = 0; i < refs.size(); i++) {
            progress.step();
        }

        StabilityTally tally = stability(data, d, refs, settings.replicates(), settings.seed(), true,
                "replicates");
        NullTable nulls = data != null && settings.nullSets() > 0 ? nullCalibration(data, refs.size(), minSize) : null;
        GapResult[] gaps = data != null && settings.referenceSets() > 0
                ? new GapRun(data, d, settings, refs, executor, progress, checkpoint, axes).run() : null;
        List<BranchPValues> pvalues = data != null && settings.branchPValues() != null
                ? new MultiscaleRun(data, settings, refs, executor, progress, checkpoint).run() : null;

        double[][] silhouettes = new double[refs.size()][maxK - 1];
        Silhouette.Result[][] silResults = new Silhouette.Result[refs.size()][maxK - 1];
        Silhouette.Result[] widths = NullSetTask.silhouettes(d, refs, maxK);
        for (int l = 0; l < refs.size(); l++) {
            for (int k = 2; k <= maxK; k++) {
                silResults[l][k - 2] = widths[l * (maxK - 1) + k - 2];
                silhouettes[l][k - 2] = silResults[l][k - 2] == null ? Double.NaN : silResults[l][k - 2].mean();
            }
        }
        NullCalibration.Result calibration = nulls == null ? null : calibrate(tally, silhouettes, nulls);
        var linkages = new ArrayList<LinkageEvidence>();
        // the rows in the metric's geometry, for the separation test: made once, read by every linkage
        DataMatrix geometry = data == null ? null : settings.metric().embedding(data);
        for (int l = 0; l < refs.size(); l++) {
            linkages.add(linkageEvidence(l, refs.get(l), data, geometry, d, tally, silResults[l],
                    calibration == null ? null : calibration.cells()[l], gaps == null ? null : gaps[l],
                    pvalues == null ? null : pvalues.get(l)));
        }
        return new Evidence(input.sampleIds(), data == null ? 0 : data.features(), settings, linkages, minSize,
                calibration == null ? null : calibration.test());
    }

    private NullCalibration.Result calibrate(StabilityTally tally, double[][] silhouettes, NullTable nulls) {
        int links = silhouettes.length;
        int ks = settings.maxK() - 1;
        double[][] test = new double[links][ks];
        double[][] all = new double[links][ks];
        double[][] sd = new double[links][ks];
        for (int l = 0; l < links; l++) {
            for (int k = 2; k <= settings.maxK(); k++) {
                double[] ari = tally.ari(l, k);
                all[l][k - 2] = mean(ari, ari.length);
                sd[l][k - 2] = Double.isNaN(all[l][k - 2]) ? Double.NaN : ReplicateSummary.of(ari).sd();
                test[l][k - 2] = mean(ari, Math.min(ari.length, settings.nullReplicates()));
            }
        }
        return NullCalibration.of(test, all, sd, silhouettes, nulls.meanAri(), nulls.silhouette(), nulls.pac(),
                settings.nullReplicates());
    }

    /** Mean of the first {@code count} values; NaN when any is NaN (the cut does not exist). */
    private static double mean(double[] v, int count) {
        double s = 0;
        for (int i = 0; i < count; i++) {
            s += v[i];
        }
        return count == 0 ? Double.NaN : s / count;
    }

    private StabilityTally stability(DataMatrix data, CondensedDistances d, List<ReferenceSolution> refs,
            int replicates, long masterSeed, boolean full, String stage) {
        int n = d.size();
        var planner = new ReplicatePlanner(n, data == null ? 0 : data.features(), settings.resampling(),
                settings.sampleFraction(), settings.featureFraction(), masterSeed, Seeds.Purpose.REPLICATE);
        List<BranchSupport> supports = null;
        if (full) {
            supports = new ArrayList<>();
            for (int l = 0; l < refs.size(); l++) {
                supports.add(BranchSupport.of(refs.get(l).tree(), Seeds.seedFor(masterSeed, Seeds.Purpose.CLADE_KEYS, l)));
            }
        }
        var work = new ReplicateWork(data, d, settings.metric(), settings.linkages(), supports, planner,
                settings.maxK(), refs.get(0).minSize(), n);
        var tally = new StabilityTally(refs, n, settings.maxK(), replicates, full);
        if (stage != null) {
            progress.stage(stage, replicates);
        }
        int first = 0;
        if (full) {
            for (ReplicateOutcome kept : checkpoint.replicates()) {
                if (kept.index() != first || first >= replicates) {
                    break;
                }
                tally.add(kept);
                first++;
                progress.step();
            }
        }
        executor.run(first, replicates, work, r -> {
            tally.add(r);
            if (full) {
                checkpoint.replicateDone(r);
            }
            if (stage != null) {
                progress.step();
            }
        });
        return tally;
    }

    /** Mean ARI and PAC of every null set, per linkage and k: {@code [l][k-2][set]}. */
    private record NullTable(double[][][] meanAri, double[][][] pac, double[][][] silhouette) {
    }

    private NullTable nullCalibration(DataMatrix data, int linkages, int minSize) {
        int sets = settings.nullSets();
        int maxK = settings.maxK();
        var generator = org.treeproof.resample.ReferenceData.nullModel(settings.metric(), data, axes);
        double[][][] meanAri = new double[linkages][maxK - 1][sets];
        double[][][] pac = new double[linkages][maxK - 1][sets];
        double[][][] sil = new double[linkages][maxK - 1][sets];
        progress.stage("null data sets", sets);
        int kept = 0;
        for (double[] row : checkpoint.rows(Checkpoint.Stage.NULL_SETS)) {
            if (kept >= sets) {
                break;
            }
            NullSetTask.unpack(row, kept, meanAri, pac, sil);
            kept++;
            progress.step();
        }
        var task = NullSetTask.of(generator, settings, minSize);
        java.util.function.Consumer<double[][]> done = result -> {
            int j = (int) result[0][0];
            NullSetTask.unpack(result[1], j, meanAri, pac, sil);
            checkpoint.rowDone(Checkpoint.Stage.NULL_SETS, j, result[1]);
            progress.step();
        };
        if (nullSetsSideBySide(data)) {
            // each null set is one task, run side by side with the others; rows arrive in index order
            executor.run(kept, sets, task, done);
        } else {
            for (int j = kept; j < sets; j++) {
                done.accept(task.run(j, executor, kernelThreads, here));
            }
        }
        return new NullTable(meanAri, pac, sil);
    }

    /**
     * Whether null sets run as tasks side by side (always on an executor that ships them elsewhere), or one at a
     * time with their replicates in parallel, when as many sets as threads would not fit in this JVM's heap. Only
     * the schedule differs: every set is a pure function of its index.
     */
    private boolean nullSetsSideBySide(DataMatrix data) {
        if (!(executor instanceof LocalExecutor local) || local.threads() == 1) {
            return true;
        }
        int n = data.samples();
        int p = data.features();
        return MemoryEstimate.of(n, p, settings, local.threads(), true).nullSetsFitSideBySide(local.threads(),
                MemoryEstimate.nullSetBytes(n, p, settings), Runtime.getRuntime().maxMemory());
    }

    private static <T> java.util.function.Supplier<T> memoized(java.util.function.Supplier<T> compute) {
        return new java.util.function.Supplier<>() {
            private T value;

            @Override
            public synchronized T get() {
                if (value == null) {
                    value = compute.get();
                }
                return value;
            }
        };
    }

    private BigDecimal pacLow() {
        return BigDecimal.valueOf(settings.pacLow());
    }

    private BigDecimal pacHigh() {
        return BigDecimal.valueOf(settings.pacHigh());
    }

    private LinkageEvidence linkageEvidence(int l, ReferenceSolution ref, DataMatrix data, DataMatrix geometry,
            CondensedDistances d, StabilityTally tally, Silhouette.Result[] sils, NullStability[] calibrated,
            GapResult gap, BranchPValues pvalues) {
        ConsensusMatrix consensus = tally.consensus(l);
        var byK = new ArrayList<KEvidence>();
        for (int k = 2; k <= settings.maxK(); k++) {
            SizedCut cut = ref.cut(k);
            if (cut == null) {
                continue;
            }
            Clustering c = cut.clustering();
            Silhouette.Result sil = sils[k - 2];
            DataMatrix clusteredData = data == null ? null
                    : c.outlierCount() == 0 ? data : data.selectSamples(c.clustered());
            Partition clustered = c.clusteredPartition();
            double ch = data == null ? Double.NaN : CalinskiHarabasz.of(clusteredData, clustered).compute().value();
            double db = data == null ? Double.NaN : DaviesBouldin.of(clusteredData, clustered).compute().value();
            double dunn = DunnIndex.of(d, c).value();
            Partition withSingletons = c.withSingletons();
            double pac = consensus.pac(k, pacLow(), pacHigh());
            double[] replicateAri = tally.ari(l, k);
            ReplicateSummary ari = ReplicateSummary.of(replicateAri);
            NullStability ns = calibrated == null ? null : calibrated[k - 2];
            JaccardStability.Result jac = tally.jaccard(l, k);
            int[] sizes = c.clusterSizes();
            int[] singletonLabels = withSingletons.labels();
            int[] firstMember = new int[c.k()];
            java.util.Arrays.fill(firstMember, -1);
            for (int i = 0; i < c.size(); i++) {
                int lab = c.label(i);
                if (lab >= 0 && firstMember[lab] < 0) {
                    firstMember[lab] = i;
                }
            }
            var clusters = new ArrayList<ClusterEvidence>();
            for (int cl = 0; cl < c.k(); cl++) {
                JaccardStability.Cluster jc = jac.cluster(singletonLabels[firstMember[cl]]);
                clusters.add(new ClusterEvidence(cl + 1, sizes[cl], jc.mean(), jc.dissolvedShare(), jc.recoveredShare(),
                        jc.status()));
            }
            double[] sampleStability = tally.samples(l, k).stability();
            double[] sampleConsensus = consensus.itemConsensus(k, withSingletons);
            for (int i = 0; i < c.size(); i++) {
                if (c.isOutlier(i)) {
                    sampleStability[i] = Double.NaN;
                    sampleConsensus[i] = Double.NaN;
                }
            }
            byK.add(new KEvidence(k, new CutHeight(cut.low(), cut.high(), cut.chosen()), cut.tieDependent(), c,
                    cut.branches(), sil.mean(), ch, db, dunn, gap == null ? Double.NaN : gap.gapAt(k),
                    gap == null ? Double.NaN : gap.seAt(k), new Stability(ari, pac, ns), clusters, sil.values(),
                    sampleStability, sampleConsensus, replicateAri,
                    geometry == null ? null : Separation.of(geometry, c)));
        }
        double cophenetic = ref.tree().copheneticCorrelation(d);
        return new LinkageEvidence(ref.linkage(), ref.tree(), cophenetic, gap, byK, tally.branchSupport(l), consensus,
                LinkageEvidence.cdfs(consensus), pvalues);
    }

    private static double[] finite(double[] v) {
        return java.util.Arrays.stream(v).filter(Double::isFinite).toArray();
    }
}
