package org.treeproof.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.treeproof.data.Preparation;
import org.treeproof.io.CsvOutputs;
import org.treeproof.io.LoadedInput;
import org.treeproof.io.OutputDirectory;
import org.treeproof.io.SummaryJson;
import org.treeproof.partition.ContingencyTable;
import org.treeproof.partition.Partition;
import org.treeproof.score.AdjustedRandIndex;
import org.treeproof.study.Evidence;
import org.treeproof.study.Recommendation;

/** Everything {@code assess} writes, from the study's results and the input's provenance. */
final class StudyOutputs {
    private final LoadedInput loaded;
    private final Evidence evidence;
    private final Recommendation rec;
    private final String[] classes;
    private final Path labelsFile;
    private final String[] commandLine;
    private final int threads;
    private final double seconds;

    StudyOutputs(LoadedInput loaded, Evidence evidence, Recommendation rec, String[] classes, Path labelsFile,
            String[] commandLine, int threads, double seconds) {
        this.loaded = loaded;
        this.evidence = evidence;
        this.rec = rec;
        this.classes = classes;
        this.labelsFile = labelsFile;
        this.commandLine = commandLine.clone();
        this.threads = threads;
        this.seconds = seconds;
    }

    /** The recommended partition on all samples (one cluster for k = 1). */
    Partition recommendedPartition() {
        if (rec.k() == 1) {
            return new Partition(new int[evidence.samples()], 1);
        }
        return evidence.linkages().stream().filter(l -> l.linkage() == rec.linkage()).findFirst().orElseThrow()
                .at(rec.k()).partition();
    }

    SummaryJson.LabelsSummary labelsSummary() {
        if (classes == null) {
            return null;
        }
        List<String> names = new ArrayList<>(new TreeSet<>(List.of(classes)));
        int[] codes = new int[classes.length];
        for (int i = 0; i < classes.length; i++) {
            codes[i] = names.indexOf(classes[i]);
        }
        Partition clusters = recommendedPartition();
        Partition known = Partition.of(codes);
        double ari = AdjustedRandIndex.of(clusters, known).compute().value();
        int[][] table = new int[clusters.clusterCount()][names.size()];
        for (int i = 0; i < codes.length; i++) {
            table[clusters.label(i)][codes[i]]++;
        }
        return new SummaryJson.LabelsSummary(labelsFile.toString(), ari, names, table);
    }

    List<String> preparationSteps() {
        return loaded.preparation().map(r -> r.steps())
                .orElse(List.of(String.format(Locale.ROOT, "Read a distance table of %d samples.", loaded.samples())));
    }

    List<SummaryJson.Option> inputOptions() {
        var o = new ArrayList<SummaryJson.Option>();
        o.add(new SummaryJson.Option("inputKind", loaded.isDistanceTable() ? "distances" : "data"));
        loaded.preparation().ifPresent(r -> {
            Preparation p = r.settings();
            o.add(new SummaryJson.Option("missing", p.missing().userName()));
            o.add(new SummaryJson.Option("log2", String.valueOf(p.log2())));
            o.add(new SummaryJson.Option("scale", p.scale().userName()));
            o.add(new SummaryJson.Option("topVariable", String.valueOf(p.topVariable())));
        });
        return o;
    }

    SummaryJson summary() {
        var provenance = new SummaryJson.Provenance("treeproof", Main.toolVersion(), loaded.source().path(),
                loaded.source().sha256(), preparationSteps(), inputOptions(), labelsSummary());
        return new SummaryJson(evidence, rec, provenance);
    }

    void writeInto(OutputDirectory dir) {
        dir.write("summary.json", summary().toBytes());
        dir.write("clusters.csv", CsvOutputs.clusters(evidence, rec).getBytes(StandardCharsets.UTF_8));
        dir.write("scores.csv", CsvOutputs.scores(evidence, rec).getBytes(StandardCharsets.UTF_8));
    }

    /** One line for the terminal: the verdict and the decision. */
    String headline() {
        return rec.k() == 1
                ? "treeproof: unsupported: no convincing cluster structure (k = 1)"
                : String.format(Locale.ROOT, "treeproof: %s: k = %d with %s linkage (cut height %.4g)",
                        rec.verdict().id(), rec.k(), rec.linkage().id(), rec.cutHeight().chosen());
    }

    int threads() {
        return threads;
    }

    double seconds() {
        return seconds;
    }

    String[] commandLine() {
        return commandLine.clone();
    }
}
