package org.treeproof.explain;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.data.LibrarySize;
import org.treeproof.data.Preparation;
import org.treeproof.data.Scale;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.partition.Partition;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.tree.Linkage;

/**
 * Reruns the chosen linkage at the chosen k under the other analyses a reviewer might ask about, one change at a
 * time: each other scaling; log2 switched on or off (switched on only where the data allow it: no negative
 * values); half and double the number of most variable features when a number was set; and each other
 * dissimilarity the linkage accepts (none for Ward, centroid and median, which need Euclidean distances; among
 * the 0/1 measures only for 0/1 data, where scaling and log2 are not varied either).
 *
 * <p>Each alternative is compared with the chosen solution over its clustered samples (outliers left out) by
 * the adjusted Rand index (L. Hubert and P. Arabie, Journal of Classification 2 (1985) 193-218,
 * doi:10.1007/BF01908075) and, per chosen cluster, the Jaccard similarity of its best match among the
 * alternative's clusters (as in C. Hennig, CSDA 52 (2007) 258-271, doi:10.1016/j.csda.2006.11.025).
 */
public final class Sensitivity {
    private final DataMatrix raw;
    private final Preparation chosen;
    private final Metric metric;
    private final Linkage linkage;
    private final Solution solution;
    private final List<String> sampleIds;
    private final double survives;
    private final int threads;

    private Sensitivity(DataMatrix raw, Preparation chosen, Metric metric, Linkage linkage, Solution solution,
            List<String> sampleIds, double survives, int threads) {
        this.raw = Objects.requireNonNull(raw, "raw");
        this.chosen = Objects.requireNonNull(chosen, "chosen");
        this.metric = Objects.requireNonNull(metric, "metric");
        this.linkage = Objects.requireNonNull(linkage, "linkage");
        this.solution = Objects.requireNonNull(solution, "solution");
        this.sampleIds = List.copyOf(sampleIds);
        this.survives = survives;
        this.threads = threads;
        if (sampleIds.size() != solution.samples()) {
            throw new IllegalArgumentException(sampleIds.size() + " sample ids for " + solution.samples() + " labels");
        }
    }

    /**
     * The sensitivity of {@code solution} (over the samples {@code sampleIds}, which the preparation
     * {@code chosen} kept of {@code raw}) to the analysis choices.
     *
     * @param raw      the data as read, before any preparation
     * @param survives the best-match Jaccard at or above which a chosen cluster counts as found again
     */
    public static Sensitivity of(DataMatrix raw, Preparation chosen, Metric metric, Linkage linkage,
            Solution solution, List<String> sampleIds, double survives, int threads) {
        return new Sensitivity(raw, chosen, metric, linkage, solution, sampleIds, survives, threads);
    }

    /**
     * The alternatives, in a fixed order: scalings, log2, the other library-size methods (when one was chosen, or
     * when none was and log2 is taken of counts), numbers of features, the batch means kept (when
     * {@code --center-within} removed them: groups spread unevenly over the batches lose part of their difference
     * under centring, so how far the clusters depend on it is worth seeing), dissimilarities.
     */
    List<Alternative> alternatives() {
        var out = new ArrayList<Alternative>();
        boolean binary = metric.binaryOnly();
        if (!binary) {
            for (Scale s : Scale.values()) {
                if (s != chosen.scale()) {
                    out.add(new Alternative("scale: " + s.userName(), "scale", with(chosen, s, chosen.log2(),
                            chosen.topVariable()), metric));
                }
            }
            out.add(new Alternative("log2: " + (chosen.log2() ? "off" : "on"), "log2", with(chosen, chosen.scale(),
                    !chosen.log2(), chosen.topVariable()), metric));
            // the other methods when one was chosen; both when none was but the data are counts taken to log2
            if (chosen.librarySize() != LibrarySize.NONE || chosen.log2() && LibrarySize.countsLike(raw)) {
                for (LibrarySize l : LibrarySize.values()) {
                    if (l != chosen.librarySize()) {
                        out.add(new Alternative("library-size: " + l.userName(), "library-size", new Preparation(
                                chosen.missing(), l, chosen.log2(), chosen.scale(), chosen.topVariable(),
                                chosen.centering()), metric));
                    }
                }
            }
        }
        if (chosen.topVariable() > 0) {
            int half = Math.max(1, chosen.topVariable() / 2);
            out.add(new Alternative("top-variable: " + half, "top-variable", with(chosen, chosen.scale(),
                    chosen.log2(), half), metric));
            out.add(new Alternative("top-variable: " + 2L * chosen.topVariable(), "top-variable", with(chosen,
                    chosen.scale(), chosen.log2(), (int) Math.min(Integer.MAX_VALUE, 2L * chosen.topVariable())),
                    metric));
        }
        if (chosen.centering() != null) {
            out.add(new Alternative("center-within: off", "center-within", new Preparation(chosen.missing(),
                    chosen.librarySize(), chosen.log2(), chosen.scale(), chosen.topVariable()), metric));
        }
        if (!linkage.requiresEuclidean()) {
            for (Metric m : Metric.values()) {
                if (m != metric && m.binaryOnly() == binary) {
                    out.add(new Alternative("metric: " + m.id(), "metric", chosen, m));
                }
            }
        }
        return out;
    }

    private static Preparation with(Preparation p, Scale scale, boolean log2, int top) {
        return p.with(log2, scale, top);
    }

    /** One alternative analysis: a preparation and a dissimilarity. */
    record Alternative(String name, String change, Preparation preparation, Metric metric) {
    }

    /** Runs every alternative. */
    public SensitivityResult compute() {
        Map<String, Integer> position = new HashMap<>();
        for (int i = 0; i < sampleIds.size(); i++) {
            position.put(sampleIds.get(i), i);
        }
        var rows = new ArrayList<SensitivityResult.Row>();
        for (Alternative a : alternatives()) {
            rows.add(run(a, position));
        }
        return new SensitivityResult(linkage.id(), solution.k(), survives, rows);
    }

    private SensitivityResult.Row run(Alternative a, Map<String, Integer> position) {
        Preparation p = a.preparation();
        DataMatrix prepared;
        int[] labels;
        try {
            prepared = p.apply(raw).matrix();
            CondensedDistances d = a.metric().compute(prepared, threads);
            labels = linkage.cluster(d).cutLabelsAtK(Math.min(solution.k(), prepared.samples()));
        } catch (InputException e) {
            return new SensitivityResult.Row(a.name(), a.change(), p.librarySize().userName(), p.scale().userName(),
                    p.log2(), p.topVariable(),
                    a.metric().id(), Double.NaN, new double[0], "not run: " + e.getMessage());
        }
        // the chosen solution's clustered samples that the alternative also kept
        var chosenLabels = new ArrayList<Integer>();
        var altLabels = new ArrayList<Integer>();
        List<String> ids = prepared.sampleIds();
        for (int i = 0; i < ids.size(); i++) {
            Integer at = position.get(ids.get(i));
            if (at != null && solution.label(at) > 0) {
                chosenLabels.add(solution.label(at));
                altLabels.add(labels[i]);
            }
        }
        int[] x = chosenLabels.stream().mapToInt(Integer::intValue).toArray();
        int[] y = altLabels.stream().mapToInt(Integer::intValue).toArray();
        Partition px = Partition.of(x);
        Partition py = Partition.of(y);
        double ari = AdjustedRandIndex.of(px, py).compute().value();
        return new SensitivityResult.Row(a.name(), a.change(), p.librarySize().userName(), p.scale().userName(),
                    p.log2(), p.topVariable(),
                a.metric().id(), ari, bestJaccard(x, y, solution.k()), "");
    }

    /** Per chosen cluster {@code c} (labels {@code 1..k} in {@code x}), the best Jaccard among {@code y}'s clusters. */
    static double[] bestJaccard(int[] x, int[] y, int k) {
        Partition py = Partition.of(y);
        int[] yl = py.labels();
        int ky = py.clusterCount();
        int[][] both = new int[k][ky];
        int[] sx = new int[k];
        int[] sy = new int[ky];
        for (int i = 0; i < x.length; i++) {
            both[x[i] - 1][yl[i]]++;
            sx[x[i] - 1]++;
            sy[yl[i]]++;
        }
        double[] out = new double[k];
        for (int c = 0; c < k; c++) {
            double best = 0;
            for (int d = 0; d < ky; d++) {
                int inter = both[c][d];
                int union = sx[c] + sy[d] - inter;
                if (union > 0) {
                    best = Math.max(best, (double) inter / union);
                }
            }
            out[c] = best;
        }
        return out;
    }
}
