package org.treeproof.chart;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.score.ConsensusMatrix;
import org.treeproof.score.GapResult;
import org.treeproof.score.ReplicateSummary;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Recommendation;
import org.treeproof.tree.MergeTree;

/**
 * Turns a study's evidence and recommendation into one {@link Plan} per figure: its title, and how to build
 * the chart's input and write it. Building the input is deferred to the plan's renderer, so that an input a
 * chart refuses (its record throws {@link IllegalArgumentException}) skips that figure alone.
 *
 * <p>Linkages are named by their plain ids ({@code average}, {@code ward}) so that each keeps its colour
 * ({@link ChartColors#linkage}) on every chart.
 */
final class StudyChartInputs {
    /**
     * Floating-point sums can leave a value a few ulps outside its mathematical range (a mean of ARIs of 1
     * above 1, a mean beside its own percentile interval); within this distance it is put back in range.
     * Anything further off is left for the chart to refuse.
     */
    private static final double ROUNDING = 1e-9;

    /** A figure to draw: its id, its title, a note, and its renderer ({@code null} when skipped). */
    record Plan(String id, String title, String note, Render render) {
        static Plan skipped(String id, String title, String why) {
            return new Plan(id, title, why, null);
        }
    }

    /** Builds a chart's input and writes the chart. */
    @FunctionalInterface
    interface Render {
        Drawn draw(Path dir, String baseName) throws IOException;
    }

    /** What a renderer wrote and the PNG's size. */
    record Drawn(List<String> files, int width, int height) {
    }

    private final Evidence evidence;
    private final Recommendation rec;
    private final LinkageEvidence chosen;
    /** The recommended solution, or {@code null} when the recommendation is one cluster. */
    private final KEvidence solution;
    private final String linkage;

    StudyChartInputs(Evidence evidence, Recommendation rec) {
        this.evidence = Objects.requireNonNull(evidence, "evidence");
        this.rec = Objects.requireNonNull(rec, "recommendation");
        this.chosen = evidence.linkages().stream().filter(l -> l.linkage() == rec.linkage()).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("the recommended linkage " + rec.linkage().id()
                        + " is not in the evidence"));
        this.solution = rec.k() >= 2 ? chosen.at(rec.k()) : null;
        this.linkage = chosen.linkage().id();
    }

    Plan dendrogram() {
        int n = evidence.samples();
        String title = solution == null
                ? "Tree of " + n + " samples, " + linkage + " linkage: no split into clusters is supported"
                : "Tree of " + n + " samples, " + linkage + " linkage, cut into " + rec.k() + " clusters";
        String heightLabel = "Merge height (" + linkage + " linkage on " + evidence.settings().metric().id()
                + " distances)";
        return new Plan("dendrogram", title, "", (dir, base) -> {
            var in = new DendrogramInput(title, chartTree(chosen.tree()), evidence.sampleIds().toArray(String[]::new),
                    rec.clustering().labels(),
                    solution == null ? Double.NaN : rec.cutHeight().chosen(), chosen.branchSupport(),
                    BranchPValueCharts.auPerMerge(chosen), heightLabel);
            var chart = new DendrogramChart(in);
            return new Drawn(chart.write(dir, base), chart.width(), chart.height());
        });
    }

    Plan silhouette() {
        if (solution == null) {
            return Plan.skipped("silhouette", "Silhouette, " + linkage + " linkage",
                    "no silhouette: the recommendation is a single cluster");
        }
        String title = "Silhouette of " + rec.k() + " clusters, " + linkage + " linkage";
        return new Plan("silhouette", title, "", (dir, base) -> {
            // outliers have no silhouette width: the chart shows the recommended clusters' samples (widths of the cut)
            int[] clustered = rec.clustering().clustered();
            double[] widths = new double[clustered.length];
            double[] all = solution.sampleSilhouette();
            for (int t = 0; t < clustered.length; t++) {
                widths[t] = all[clustered[t]];
            }
            var in = new SilhouetteInput(title, widths, rec.clustering().clusteredPartition().labels());
            return new Drawn(new SilhouetteChart(in).write(dir, base), SilhouetteChart.WIDTH, SilhouetteChart.HEIGHT);
        });
    }

    Plan stability() {
        int replicates = evidence.settings().replicates();
        String title = solution == null
                ? "Stability over " + replicates + " replicates: no number of clusters is supported"
                : "Stability over " + replicates + " replicates; chosen: " + linkage + " linkage, k = " + rec.k();
        LinkageEvidence nullSource = nullSource();
        // the numbers of clusters any linkage was assessed at: a linkage without a cut into k clusters of the
        // smallest size has no value at k, and the chart leaves a gap there
        int[] k = evidence.linkages().stream().flatMap(le -> le.byK().stream()).mapToInt(KEvidence::k).distinct()
                .sorted().toArray();
        var notes = new ArrayList<String>();
        if (nullSource == null) {
            notes.add("no null data were drawn, so no band for data without clusters");
        } else if (evidence.linkages().size() > 1) {
            notes.add("the grey band is the null data's stability under " + nullSource.linkage().id() + " linkage");
        }
        for (LinkageEvidence le : evidence.linkages()) {
            List<String> absent = java.util.Arrays.stream(k).filter(x -> le.byK().stream().noneMatch(e -> e.k() == x))
                    .mapToObj(Integer::toString).toList();
            if (!absent.isEmpty()) {
                notes.add(le.linkage().id() + " linkage has no cut into k = "
                        + String.join(", ", absent) + " clusters of at least " + evidence.settings().minClusterSize(
                                evidence.samples()) + " samples");
            }
        }
        String note = String.join("; ", notes);
        return new Plan("stability", title, note, (dir, base) -> {
            var series = new ArrayList<IntervalSeries>();
            for (LinkageEvidence le : evidence.linkages()) {
                series.add(onAxis(k, le, interval(le.linkage().id(), le.byK().stream().map(x -> x.stability().ari())
                        .toList())));
            }
            IntervalSeries reference = nullSource == null ? null : onAxis(k, nullSource, nullInterval(nullSource));
            var in = new StabilityInput(title, k, series, reference, solution == null ? 0 : rec.k(),
                    solution == null ? null : linkage);
            return new Drawn(new StabilityChart(in).write(dir, base), StabilityChart.WIDTH, StabilityChart.HEIGHT);
        });
    }

    Plan gap() {
        GapResult gap = chosen.gap();
        if (gap == null) {
            return Plan.skipped("gap", "Gap statistic, " + linkage + " linkage", evidence.features() == 0
                    ? "no gap statistic: it needs a data table, and the study ran on distances alone"
                    : "no gap statistic: it was not computed (no reference sets)");
        }
        String title = "Gap statistic, " + linkage + " linkage (" + gap.referenceSets() + " reference sets)";
        // the report's caption says when the rule was never met (report.Figures owns that sentence)
        return new Plan("gap", title, "", (dir, base) -> {
            var in = new GapInput(title, gap.gap(), gap.se(), gap.chosenK(), linkage);
            return new Drawn(new GapChart(in).write(dir, base), GapChart.WIDTH, GapChart.HEIGHT);
        });
    }

    Plan consensus() {
        int replicates = evidence.settings().replicates();
        int k;
        String title;
        if (solution != null) {
            k = rec.k();
            title = "Consensus of " + replicates + " replicates, " + linkage + " linkage, k = " + k;
        } else {
            int stable = strongestK(chosen, rec);
            k = stable == 0 ? 2 : stable;
            String why = stable == 0 ? "" : "; the strongest by the decision rule";
            title = "Consensus of " + replicates + " replicates, " + linkage + " linkage, k = " + k
                    + " (no k is supported" + why + ")";
        }
        if (chosen.at(k) == null) {
            return Plan.skipped("consensus", title, "no cut of this tree into " + k + " clusters of the minimum size");
        }
        final int kk = k;
        return new Plan("consensus", title, "", (dir, base) -> {
            var in = new ConsensusInput(title, evidence.samples(), condensed(chosen.consensus(), kk),
                    chosen.tree().leafOrder(), chosen.at(kk).clustering().labels());
            return new Drawn(new ConsensusChart(in).write(dir, base), ConsensusChart.WIDTH, ConsensusChart.HEIGHT);
        });
    }

    Plan consensusCdf() {
        String title = "Consensus values by k, " + linkage + " linkage";
        return new Plan("consensus-cdf", title, "", (dir, base) -> {
            var in = BranchPValueCharts.cdfInput(title, chosen, solution == null ? 0 : rec.k());
            return new Drawn(new ConsensusCdfChart(in).write(dir, base), ConsensusCdfChart.WIDTH,
                    ConsensusCdfChart.HEIGHT);
        });
    }

    Plan jaccard() {
        if (solution == null) {
            return Plan.skipped("jaccard", "Cluster-wise stability, " + linkage + " linkage",
                    "no cluster-wise stability: the recommendation is a single cluster");
        }
        String title = "How well each cluster is found again, " + linkage + " linkage, k = " + rec.k();
        return new Plan("jaccard", title, "", (dir, base) -> {
            int k = rec.k();
            double[] jac = new double[k];
            int[] size = new int[k];
            for (ClusterEvidence c : solution.clusters()) {
                jac[c.id() - 1] = inRange(c.jaccard(), 0);
                size[c.id() - 1] = c.size();
            }
            var in = new JaccardInput(title, jac, size);
            return new Drawn(new JaccardChart(in).write(dir, base), JaccardChart.WIDTH, JaccardChart.HEIGHT);
        });
    }

    Plan linkages() {
        String title = "Linkage methods compared, each at its own best k";
        return new Plan("linkages", title, "", (dir, base) -> {
            var rows = new ArrayList<LinkageComparisonInput.Row>();
            for (Recommendation.LinkageSummary s : rec.linkages()) {
                rows.add(new LinkageComparisonInput.Row(s.linkage().id(), s.k(), inRange(s.copheneticCorrelation(), -1),
                        inRange(s.ariMean(), -1), inRange(s.silhouette(), -1)));
            }
            double[][] agreement = rec.agreement();
            for (int a = 0; a < agreement.length; a++) {
                for (int b = 0; b < agreement[a].length; b++) {
                    // a clustering agrees with itself by definition; the computed ARI may miss 1 by an ulp
                    agreement[a][b] = a == b ? 1.0 : inRange(agreement[a][b], -1);
                }
            }
            var chart = new LinkageComparisonChart(new LinkageComparisonInput(title, rows, agreement));
            return new Drawn(chart.write(dir, base), LinkageComparisonChart.WIDTH, chart.height());
        });
    }

    Plan heatmap(DataMatrix data, int threads) {
        if (data == null) {
            return Plan.skipped("heatmap", "Data heat map", "no data heat map: no data table was given");
        }
        if (!data.sampleIds().equals(evidence.sampleIds())) {
            throw new IllegalArgumentException("the data's samples are not the study's samples, in the same order");
        }
        int n = data.samples();
        HeatmapFeatures features = HeatmapFeatures.of(data, threads);
        int q = features.columns().length;
        String shown;
        if (!features.selected()) {
            shown = n + " samples and " + q + " features";
        } else if (features.tiedAtLimit()) {
            shown = n + " samples and " + q + " of " + features.total() + " features (equal variances: first in"
                    + " input order)";
        } else {
            shown = n + " samples and the " + q + " most variable of " + features.total() + " features";
        }
        String title = "Data of " + shown + ", samples in " + linkage + "-linkage tree order";
        String note = features.tree() == null && q >= 2
                ? "features in input order: missing values leave no distances between features to cluster them"
                : "";
        return new Plan("heatmap", title, note, (dir, base) -> {
            var in = new DataHeatmapInput(title, n, q, features.values(data), data.sampleIds().toArray(String[]::new),
                    features.names(data), chartTree(chosen.tree()), features.tree(),
                    solution == null ? null : rec.clustering().labels());
            var chart = new DataHeatmapChart(in);
            return new Drawn(chart.write(dir, base), DataHeatmapChart.WIDTH, chart.height());
        });
    }

    /** A core tree in the charts' form, with its own leaf order. */
    static ChartTree chartTree(MergeTree t) {
        int m = t.merges();
        int[] left = new int[m];
        int[] right = new int[m];
        for (int s = 0; s < m; s++) {
            left[s] = t.left(s);
            right[s] = t.right(s);
        }
        return new ChartTree(t.leaves(), left, right, t.heights(), t.leafOrder());
    }

    /** The consensus at {@code k} in the condensed layout; NaN for pairs never drawn together. */
    static double[] condensed(ConsensusMatrix c, int k) {
        int n = c.size();
        double[] out = new double[(int) ((long) n * (n - 1) / 2)];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                out[t++] = c.consensus(k, i, j);
            }
        }
        return out;
    }

    /**
     * The k of the linkage's first solution in the decision rule's order (its strongest, though not good enough to
     * recommend), as the recommendation assessed it; 0 when the linkage has no solution.
     */
    static int strongestK(LinkageEvidence le, Recommendation rec) {
        return rec.assessments().stream().filter(a -> a.linkage() == le.linkage()).sorted(rec.rule().order())
                .findFirst().map(org.treeproof.study.Assessment::k).orElse(0);
    }

    /** The recommended linkage if its solutions were compared with null data, else the first that was. */
    private LinkageEvidence nullSource() {
        if (hasNull(chosen)) {
            return chosen;
        }
        return evidence.linkages().stream().filter(StudyChartInputs::hasNull).findFirst().orElse(null);
    }

    private static boolean hasNull(LinkageEvidence le) {
        return le.byK().stream().allMatch(e -> e.stability().nullModel() != null);
    }

    private static IntervalSeries interval(String name, List<ReplicateSummary> s) {
        int m = s.size();
        double[] mean = new double[m];
        double[] low = new double[m];
        double[] high = new double[m];
        for (int i = 0; i < m; i++) {
            mean[i] = s.get(i).mean();
            low[i] = s.get(i).low();
            high[i] = s.get(i).high();
        }
        return bracket(name, mean, low, high);
    }

    /** {@code s}, one value per k of {@code le.byK()}, placed on the axis {@code k} with NaN where {@code le} lacks k. */
    private static IntervalSeries onAxis(int[] k, LinkageEvidence le, IntervalSeries s) {
        double[] mean = new double[k.length];
        double[] low = new double[k.length];
        double[] high = new double[k.length];
        java.util.Arrays.fill(mean, Double.NaN);
        java.util.Arrays.fill(low, Double.NaN);
        java.util.Arrays.fill(high, Double.NaN);
        double[] m = s.mean();
        double[] lo = s.low();
        double[] hi = s.high();
        for (int i = 0; i < le.byK().size(); i++) {
            int at = java.util.Arrays.binarySearch(k, le.byK().get(i).k());
            mean[at] = m[i];
            low[at] = lo[i];
            high[at] = hi[i];
        }
        return new IntervalSeries(s.name(), mean, low, high);
    }

    private static IntervalSeries nullInterval(LinkageEvidence le) {
        int m = le.byK().size();
        double[] mean = new double[m];
        double[] low = new double[m];
        double[] high = new double[m];
        for (int i = 0; i < m; i++) {
            NullStability nul = le.byK().get(i).stability().nullModel();
            mean[i] = nul.ariMean();
            low[i] = nul.ariLow();
            high[i] = nul.ariHigh();
        }
        return bracket("no-structure reference", mean, low, high);
    }

    /**
     * The series with each interval made to hold its mean. The mean of a set of values lies within their
     * 95% percentile interval (provably so for 40 values or fewer, as null sets are), but a mean of equal values can
     * round an ulp past them, which the series would refuse.
     */
    private static IntervalSeries bracket(String name, double[] mean, double[] low, double[] high) {
        for (int i = 0; i < mean.length; i++) {
            low[i] = Math.min(low[i], mean[i]);
            high[i] = Math.max(high[i], mean[i]);
        }
        return new IntervalSeries(name, mean, low, high);
    }

    /** {@code v} put back into {@code [lo, 1]} when rounding left it just outside; NaN and far values as they are. */
    static double inRange(double v, double lo) {
        if (v > 1 && v <= 1 + ROUNDING) {
            return 1;
        }
        if (v < lo && v >= lo - ROUNDING) {
            return lo;
        }
        return v;
    }
}
