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
import org.treeproof.score.Silhouette;
import org.treeproof.tree.KCut;

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
    }

    /** Keeps finished work in {@code checkpoint} and replays what it already holds. */
    public StudyRunner withCheckpoint(Checkpoint checkpoint) {
        this.checkpoint = java.util.Objects.requireNonNull(checkpoint);
        return this;
    }

    /** Runs the study. */
    public Evidence run() {
        DataMatrix data = input.data();
        int n = input.samples();
        int maxK = settings.maxK();
        Metric metric = settings.metric();
        progress.stage("distances and reference trees", 1 + settings.linkages().size());
        CondensedDistances d = input.distances() != null ? input.distances() : metric.compute(data, kernelThreads);
        progress.step();
        List<ReferenceSolution> refs = ReferenceSolution.all(settings.linkages(), d, maxK, here);
        for (int i = 0; i < refs.size(); i++) {
            progress.step();
        }

        StabilityTally tally = stability(data, d, refs, settings.replicates(), settings.seed(), true,
                "replicates");
        NullTable nulls = data != null && settings.nullSets() > 0 ? nullCalibration(data, refs.size()) : null;
        GapResult[] gaps = data != null && settings.referenceSets() > 0
                ? new GapRun(data, d, settings, refs, executor, progress, checkpoint).run() : null;

        var linkages = new ArrayList<LinkageEvidence>();
        for (int l = 0; l < refs.size(); l++) {
            linkages.add(linkageEvidence(l, refs.get(l), data, d, tally, nulls, gaps == null ? null : gaps[l]));
        }
        return new Evidence(input.sampleIds(), data == null ? 0 : data.features(), settings, linkages);
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
                settings.maxK());
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

    private NullTable nullCalibration(DataMatrix data, int linkages) {
        int sets = settings.nullSets();
        int maxK = settings.maxK();
        var generator = org.treeproof.resample.ReferenceData.nullModel(settings.metric(), data);
        double[][][] meanAri = new double[linkages][maxK - 1][sets];
        double[][][] pac = new double[linkages][maxK - 1][sets];
        double[][][] sil = new double[linkages][maxK - 1][sets];
        progress.stage("null data sets", sets);
        int kept = 0;
        for (double[] row : checkpoint.rows(Checkpoint.Stage.NULL_SETS)) {
            if (kept >= sets) {
                break;
            }
            unpackNullRow(row, kept, meanAri, pac, sil);
            kept++;
            progress.step();
        }
        for (int j = kept; j < sets; j++) {
            long seed = Seeds.seedFor(settings.seed(), Seeds.Purpose.NULL_DATA, j);
            // Without feature resampling only distances matter, and Euclidean ones are the same in the null's
            // principal coordinates (an exact rotation), which skips the back-transform to the features.
            DataMatrix nullData = settings.metric().rotationInvariant() && !settings.resamplesFeatures()
                    ? generator.drawCoordinates(seed) : generator.draw(seed);
            CondensedDistances nd = settings.metric().compute(nullData, kernelThreads);
            List<ReferenceSolution> nullRefs = ReferenceSolution.all(settings.linkages(), nd, maxK, here);
            StabilityTally t = stability(nullData, nd, nullRefs, settings.nullReplicates(),
                    Seeds.seedFor(settings.seed(), Seeds.Purpose.NULL_REPLICATE, j), false, null);
            for (int l = 0; l < linkages; l++) {
                ConsensusMatrix cm = t.consensus(l);
                for (int k = 2; k <= maxK; k++) {
                    meanAri[l][k - 2][j] = ReplicateSummary.of(t.ari(l, k)).mean();
                    pac[l][k - 2][j] = cm.pac(k, pacLow(), pacHigh());
                    sil[l][k - 2][j] = Silhouette.of(nd, nullRefs.get(l).cut(k).partition()).compute().mean();
                }
            }
            checkpoint.rowDone(Checkpoint.Stage.NULL_SETS, j, packNullRow(j, meanAri, pac, sil));
            progress.step();
        }
        return new NullTable(meanAri, pac, sil);
    }

    /** One null set's results as a row: mean ARI then PAC, for every linkage and k. */
    private static double[] packNullRow(int j, double[][][] meanAri, double[][][] pac, double[][][] sil) {
        int l = meanAri.length;
        int ks = meanAri[0].length;
        double[] row = new double[3 * l * ks];
        int t = 0;
        for (int a = 0; a < l; a++) {
            for (int k = 0; k < ks; k++) {
                row[t++] = meanAri[a][k][j];
                row[t++] = pac[a][k][j];
                row[t++] = sil[a][k][j];
            }
        }
        return row;
    }

    private static void unpackNullRow(double[] row, int j, double[][][] meanAri, double[][][] pac,
            double[][][] sil) {
        int l = meanAri.length;
        int ks = meanAri[0].length;
        if (row.length != 3 * l * ks) {
            throw new IllegalStateException("a kept null-set row has the wrong length");
        }
        int t = 0;
        for (int a = 0; a < l; a++) {
            for (int k = 0; k < ks; k++) {
                meanAri[a][k][j] = row[t++];
                pac[a][k][j] = row[t++];
                sil[a][k][j] = row[t++];
            }
        }
    }

    private BigDecimal pacLow() {
        return BigDecimal.valueOf(settings.pacLow());
    }

    private BigDecimal pacHigh() {
        return BigDecimal.valueOf(settings.pacHigh());
    }

    private LinkageEvidence linkageEvidence(int l, ReferenceSolution ref, DataMatrix data, CondensedDistances d,
            StabilityTally tally, NullTable nulls, GapResult gap) {
        ConsensusMatrix consensus = tally.consensus(l);
        var byK = new ArrayList<KEvidence>();
        for (int k = 2; k <= settings.maxK(); k++) {
            KCut cut = ref.cut(k);
            Partition p = cut.partition();
            Silhouette.Result sil = Silhouette.of(d, p).compute();
            double ch = data == null ? Double.NaN : CalinskiHarabasz.of(data, p).compute().value();
            double db = data == null ? Double.NaN : DaviesBouldin.of(data, p).compute().value();
            double dunn = DunnIndex.of(d, p).compute().value();
            double pac = consensus.pac(k, pacLow(), pacHigh());
            ReplicateSummary ari = ReplicateSummary.of(tally.ari(l, k));
            NullStability ns = nulls == null ? null : nullStability(nulls, l, k, ari.mean(), pac, sil.mean());
            JaccardStability.Result jac = tally.jaccard(l, k);
            int[] sizes = p.clusterSizes();
            var clusters = new ArrayList<ClusterEvidence>();
            for (int c = 0; c < k; c++) {
                JaccardStability.Cluster jc = jac.cluster(c);
                clusters.add(new ClusterEvidence(c + 1, sizes[c], jc.mean(), jc.dissolvedShare(), jc.recoveredShare(),
                        jc.status()));
            }
            SampleStability.Result ss = tally.samples(l, k);
            byK.add(new KEvidence(k, new CutHeight(cut.low(), cut.high(), cut.chosen()), cut.tieDependent(), p,
                    sil.mean(), ch, db, dunn, gap == null ? Double.NaN : gap.gapAt(k),
                    gap == null ? Double.NaN : gap.seAt(k), new Stability(ari, pac, ns), clusters, sil.values(),
                    ss.stability(), consensus.itemConsensus(k, p)));
        }
        double cophenetic = ref.tree().copheneticCorrelation(d);
        return new LinkageEvidence(ref.linkage(), ref.tree(), cophenetic, gap, byK, tally.branchSupport(l), consensus);
    }

    private NullStability nullStability(NullTable nulls, int l, int k, double observedAri, double observedPac,
            double observedSilhouette) {
        double[] a = nulls.meanAri()[l][k - 2];
        double[] c = nulls.pac()[l][k - 2];
        double[] s = nulls.silhouette()[l][k - 2];
        double observedCombined = NullStability.combined(observedAri, observedSilhouette);
        int atLeast = 0;
        int atMost = 0;
        int silAtLeast = 0;
        int combinedAtLeast = 0;
        for (int j = 0; j < a.length; j++) {
            atLeast += a[j] >= observedAri ? 1 : 0;
            atMost += c[j] <= observedPac ? 1 : 0;
            silAtLeast += !(s[j] < observedSilhouette) ? 1 : 0;
            combinedAtLeast += !(NullStability.combined(a[j], s[j]) < observedCombined) ? 1 : 0;
        }
        double sets = a.length;
        ReplicateSummary as = ReplicateSummary.of(a);
        ReplicateSummary cs = ReplicateSummary.of(c);
        ReplicateSummary ss = ReplicateSummary.of(finite(s));
        return new NullStability(a.length, settings.nullReplicates(), as.mean(), as.low(), as.high(), cs.mean(),
                cs.low(), cs.high(), ss.mean(), ss.low(), ss.high(), (1.0 + atLeast) / (1.0 + sets),
                (1.0 + atMost) / (1.0 + sets), (1.0 + silAtLeast) / (1.0 + sets), (1.0 + combinedAtLeast) / (1.0 + sets));
    }

    private static double[] finite(double[] v) {
        return java.util.Arrays.stream(v).filter(Double::isFinite).toArray();
    }
}
