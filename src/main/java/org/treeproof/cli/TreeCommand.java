package org.treeproof.cli;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.DoubleSupplier;
import org.treeproof.data.DataMatrix;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.Metric;
import org.treeproof.distance.OwnedDistances;
import org.treeproof.partition.Partition;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code treeproof tree INPUT}: clusters once and prints the tree as JSON on standard output, in the
 * layout scripts compare with other libraries (merges in the conventional layout, full precision).
 */
@Command(name = "tree", mixinStandardHelpOptions = true,
        description = "Cluster the input once and print the merge tree, its cophenetic correlation and cuts as JSON.")
final class TreeCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "INPUT", description = "Data table (CSV/TSV, optionally .gz), samples in rows "
            + "unless --samples-in-columns; or a distance table with --distances.")
    Path input;

    @Mixin
    InputOptions inputOptions;

    @Option(names = "--metric", paramLabel = "NAME", defaultValue = "euclidean",
            description = "Dissimilarity: euclidean, sqeuclidean, manhattan, chebyshev, cosine, pearson, spearman, "
                    + "jaccard, hamming (default: ${DEFAULT-VALUE}).")
    String metric;

    @Option(names = "--linkage", paramLabel = "NAME", defaultValue = "average",
            description = "Linkage: single, complete, average (upgma), weighted (wpgma), ward, centroid, median "
                    + "(default: ${DEFAULT-VALUE}).")
    String linkage;

    @Option(names = "--cut-k", paramLabel = "K", split = ",",
            description = "Numbers of clusters to cut the tree into, e.g. 2,3,4.")
    List<Integer> cutK = List.of();

    @Option(names = "--cut-height", paramLabel = "H", description = "Also cut at this height (every merge at or below it).")
    Double cutHeight;

    @Option(names = "--threads", paramLabel = "N", description = "Threads for the distance kernels (default: all cores).")
    Integer threads;

    @Override
    public Integer call() throws IOException {
        Linkage link = Linkage.parse(linkage);
        if (!inputOptions.distances()) {
            inputOptions.fitTo(Metric.parse(metric));
        }
        InputHints.requireReadable(input, "INPUT");
        var loaded = inputOptions.load(input);
        if (loaded.samples() > CondensedDistances.MAX_ITEMS) {
            throw new org.treeproof.data.InputException(input + ": " + loaded.samples() + " samples; the tree command "
                    + "holds at most " + CondensedDistances.MAX_ITEMS + " (their pairwise distances must fit one array)");
        }
        // Only the cophenetic correlation needs the distances once the tree is built. For a data table they are
        // computed again for it, row band by row band, and the linkage works in place on the one matrix; a
        // distance table is held, and the linkage works on a copy.
        MergeTree tree;
        String metricId;
        DoubleSupplier cophenetic;
        if (loaded.isDistanceTable()) {
            CondensedDistances d = loaded.distances().orElseThrow();
            metricId = org.treeproof.distance.Metric.PRECOMPUTED;
            if (link.requiresEuclidean()) {
                System.err.println("treeproof: note: " + StudyOutputs.euclideanAssumed(link));
            }
            org.treeproof.study.Magnitudes.requireWithinLimit(loaded.sampleIds(), d);
            checkCuts(d.size());
            tree = link.cluster(d);
            cophenetic = () -> tree.copheneticCorrelation(d);
        } else {
            Metric m = Metric.parse(metric);
            if (link.requiresEuclidean() && !m.euclidean()) {
                throw new org.treeproof.data.InputException("--linkage " + link.id()
                        + " needs --metric euclidean (it is defined on Euclidean distances), not " + m.id());
            }
            DataMatrix data = loaded.matrix().orElseThrow();
            org.treeproof.study.Magnitudes.requireWithinLimit(data);
            int kernelThreads = Threads.resolve(threads, "--threads");
            OwnedDistances d = m.computeOwned(data, kernelThreads);
            checkCuts(d.size());
            double meanDistance = MergeTree.meanDistance(d);
            tree = link.clusterInPlace(d);
            cophenetic = () -> tree.copheneticCorrelation(meanDistance, m.rows(data, kernelThreads));
            metricId = m.id();
        }
        write(System.out, loaded.sampleIds(), metricId, link, tree, cophenetic);
        return ExitCodes.OK;
    }

    private void checkCuts(int n) {
        for (int k : cutK) {
            if (k < 1 || k > n) {
                throw new org.treeproof.data.InputException("--cut-k " + k + " is outside 1.." + n
                        + " (the input has " + n + " samples)");
            }
        }
        if (cutHeight != null && !(cutHeight >= 0) ) {
            throw new org.treeproof.data.InputException("--cut-height must be a non-negative number, got " + cutHeight);
        }
    }

    private void write(OutputStream out, List<String> ids, String metricId, Linkage link, MergeTree tree,
            DoubleSupplier cophenetic) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out, JsonEncoding.UTF8)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.writeStartObject();
            g.writeArrayFieldStart("samples");
            for (String id : ids) {
                g.writeString(id);
            }
            g.writeEndArray();
            g.writeStringField("metric", metricId);
            g.writeStringField("linkage", link.id());
            g.writeBooleanField("monotone", tree.monotone());
            g.writeArrayFieldStart("merges");
            for (int s = 0; s < tree.leaves() - 1; s++) {
                g.writeStartObject();
                g.writeNumberField("left", tree.left(s));
                g.writeNumberField("right", tree.right(s));
                g.writeNumberField("height", tree.height(s));
                g.writeNumberField("size", tree.size(s));
                g.writeEndObject();
            }
            g.writeEndArray();
            double cc = tree.leaves() > 2 ? cophenetic.getAsDouble() : Double.NaN;
            if (Double.isFinite(cc)) {
                g.writeNumberField("copheneticCorrelation", cc);
            } else {
                g.writeNullField("copheneticCorrelation");
            }
            g.writeArrayFieldStart("leafOrder");
            for (int leaf : tree.leafOrder()) {
                g.writeNumber(leaf);
            }
            g.writeEndArray();
            g.writeObjectFieldStart("cuts");
            for (int k : cutK) {
                var cut = tree.cutAtK(k);
                writeLabels(g, String.valueOf(k), cut.partition());
            }
            g.writeEndObject();
            if (cutHeight != null) {
                g.writeObjectFieldStart("cutAtHeight");
                g.writeNumberField("height", cutHeight);
                Partition p = tree.cutAtHeight(cutHeight);
                g.writeNumberField("clusters", p.clusterCount());
                writeLabels(g, "labels", p);
                g.writeEndObject();
            }
            g.writeEndObject();
        }
        out.write('\n');
        out.flush();
    }

    private static void writeLabels(JsonGenerator g, String field, Partition p) throws IOException {
        g.writeArrayFieldStart(field);
        for (int i = 0; i < p.size(); i++) {
            g.writeNumber(p.label(i) + 1);
        }
        g.writeEndArray();
    }
}
