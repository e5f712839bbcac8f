package org.treeproof.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.treeproof.data.Preparation;
import org.treeproof.chart.ExplainCharts;
import org.treeproof.explain.Explanation;
import org.treeproof.io.CsvOutputs;
import org.treeproof.io.ExplainCsv;
import org.treeproof.io.LoadedInput;
import org.treeproof.io.OutputDirectory;
import org.treeproof.io.SummaryJson;
import org.treeproof.chart.Figure;
import org.treeproof.chart.StudyCharts;
import org.treeproof.data.DataMatrix;
import org.treeproof.report.EmbeddedImage;
import org.treeproof.report.HtmlReport;
import org.treeproof.report.LabelComparison;
import org.treeproof.report.MethodsParagraph;
import org.treeproof.report.ReportModel;
import org.treeproof.report.RunInfo;
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
    private final Explanation explanation;
    private final boolean samplesInColumns;
    private final Path covariatesFile;

    /** @param covariatesFile the covariates file as given ({@code --covariates}), or {@code null} */
    StudyOutputs(LoadedInput loaded, Evidence evidence, Recommendation rec, String[] classes, Path labelsFile,
            String[] commandLine, int threads, double seconds, Explanation explanation, boolean samplesInColumns,
            Path covariatesFile) {
        this.samplesInColumns = samplesInColumns;
        this.covariatesFile = covariatesFile;
        this.loaded = loaded;
        this.evidence = evidence;
        this.rec = rec;
        this.classes = classes;
        this.labelsFile = labelsFile;
        this.commandLine = commandLine.clone();
        this.threads = threads;
        this.seconds = seconds;
        this.explanation = explanation;
    }

    LabelComparison labels() {
        return classes == null ? null
                : LabelComparison.of(rec.clustering(), classes);
    }

    SummaryJson.LabelsSummary labelsSummary(LabelComparison l) {
        return l == null ? null : new SummaryJson.LabelsSummary(labelsFile.toString(), l.ari(), l.classNames(),
                l.table(), l.outliers());
    }

    List<String> preparationSteps() {
        var steps = new ArrayList<String>(loaded.preparation().map(r -> r.steps())
                .orElse(List.of(String.format(Locale.ROOT, "Read a distance table of %d samples.", loaded.samples()))));
        return steps;
    }

    private List<String> cautions;

    /** What the preparation found that bears on the result: warnings and notes, one sentence group each. */
    List<String> preparationCautions() {
        if (cautions == null) {
            cautions = List.copyOf(findCautions());
        }
        return cautions;
    }

    private List<String> findCautions() {
        var out = new ArrayList<String>(loneFeatureWarnings(loaded));
        // 0/1 data are drawn for the null at each feature's frequency of ones, not symmetric about a centre, and a
        // log transform leaves them as they are: the skew warning does not apply to them
        if (!evidence.settings().metric().binaryOnly()) {
            out.addAll(skewWarning(loaded));
        }
        out.addAll(multimodalNote(loaded));
        out.addAll(unevenDepthNote(loaded));
        loaded.preparation().map(r -> r.settings().centering()).ifPresent(c -> out.add("Note: each level's mean of '"
                + c.column() + "' was removed from every feature (--center-within). Groups spread unevenly over its "
                + "levels lose part of their difference and can vanish: compare with the study without "
                + "--center-within before reading either."));
        if (loaded.isDistanceTable()) {
            for (var link : evidence.settings().linkages()) {
                if (link.requiresEuclidean()) {
                    out.add("Note: " + euclideanAssumed(link) + ".");
                }
            }
        }
        return out;
    }

    /**
     * The note for a linkage that assumes Euclidean distances run on a distance table (whose dissimilarity treeproof
     * cannot know); the one wording that the terminal, {@code tree} and the cautions of {@code assess} use.
     */
    static String euclideanAssumed(org.treeproof.tree.Linkage link) {
        return link.id() + " linkage assumes the given distances are Euclidean (its merge cost is a within-cluster sum "
                + "of squares); with another dissimilarity its heights have no such meaning";
    }

    /**
     * With z-scores, one note when some features, at most half of them, have values in separated modes on their own
     * ({@link org.treeproof.data.MultimodalFeatures}; the three with the largest dip named, then a count). Dilution
     * needs the separating features to be few beside the others: when most features separate (the demo's strains
     * differ on 36 of 48) z-scoring costs little, and the note would only distract. "At most half" is our choice.
     */
    static List<String> multimodalNote(LoadedInput loaded) {
        boolean zscores = loaded.preparation().map(r -> r.settings().scale() == org.treeproof.data.Scale.ZSCORE)
                .orElse(false);
        if (!zscores || loaded.matrix().isEmpty()) {
            return List.of();
        }
        var data = loaded.matrix().get();
        var result = org.treeproof.data.MultimodalFeatures.of(data);
        var flags = result.flags();
        if (flags.isEmpty() || 2 * flags.size() > data.features()) {
            return List.of();
        }
        var named = new ArrayList<String>();
        for (int i = 0; i < Math.min(3, flags.size()); i++) {
            var t = flags.get(i).test();
            named.add(String.format(Locale.ROOT, "%s (dip %.3f, p %s)", flags.get(i).feature(), t.dip(),
                    t.pBelow() || t.pValue() < 0.001 ? "< 0.001" : String.format(Locale.ROOT, "= %.3f", t.pValue())));
        }
        return List.of(String.format(Locale.ROOT, "Note: %d of the %d features tested %s values in separated "
                + "modes on their own (the dip test of Hartigan and Hartigan, Ann. Statist. 13 (1985) 70-84, "
                + "family-wise level %s over the features tested): %s%s. "
                + "Z-scores divide each feature by its standard deviation, which for such a feature includes the "
                + "distance between its modes, so groups that lie on a few features can be diluted by the others; "
                + "with features in one unit, --scale none keeps those distances.", flags.size(), result.tested(),
                flags.size() == 1 ? "has" : "have",
                java.math.BigDecimal.valueOf(org.treeproof.data.MultimodalFeatures.ALPHA).toPlainString(),
                String.join(", ", named), flags.size() > 3 ? String.format(Locale.ROOT, " and %d more", flags.size() - 3) : ""));
    }

    /**
     * A note when counts (whole numbers, log2 taken, no library-size scaling) have sample totals that differ by at
     * least {@link org.treeproof.data.PreparationReport.Totals#UNEVEN} times.
     */
    static List<String> unevenDepthNote(LoadedInput loaded) {
        var totals = loaded.preparation().flatMap(r -> r.countTotals()).filter(t -> t.uneven());
        return totals.map(t -> List.of(t.smallest() > 0 ? String.format(Locale.ROOT, "Note: the samples' totals "
                + "range from %s ('%s') to %s ('%s'), %.1f times as much. If these are read counts, samples read more "
                + "deeply have larger counts on every feature and can cluster by depth; --library-size median-ratio "
                + "(or total) divides each sample by its size factor before log2.", plain(t.smallest()),
                t.smallestSample(), plain(t.largest()), t.largestSample(), t.ratio())
                : String.format(Locale.ROOT, "Note: sample '%s' has no counts (every value is 0) while others total "
                + "up to %s ('%s'). If these are read counts, it carries no information; remove it, and if the other "
                + "samples were read to uneven depths, --library-size median-ratio (or total) divides each by its "
                + "size factor before log2.", t.smallestSample(), plain(t.largest()), t.largestSample())))
                .orElse(List.of());
    }

    private static String plain(double x) {
        return java.math.BigDecimal.valueOf(x).stripTrailingZeros().toPlainString();
    }

    /** One warning when features have a long tail on one side (the three most skewed named, then a count). */
    static List<String> skewWarning(LoadedInput loaded) {
        var flags = loaded.matrix().map(org.treeproof.data.SkewedFeatures::of).orElse(List.of());
        if (flags.isEmpty()) {
            return List.of();
        }
        int features = loaded.matrix().map(m -> m.features()).orElse(0);
        var named = new ArrayList<String>();
        for (int i = 0; i < Math.min(3, flags.size()); i++) {
            named.add(String.format(Locale.ROOT, "%s %.1f", flags.get(i).feature(), flags.get(i).skewness()));
        }
        boolean logged = loaded.preparation().map(r -> r.settings().log2()).orElse(false);
        return List.of(String.format(Locale.ROOT, "Warning: %d of %d features %s a long tail on one side "
                + "(skewness beyond %.0f: %s%s). The null data are symmetric, so pieces of such a tail can pass for "
                + "clusters; %s", flags.size(), features, flags.size() == 1 ? "has" : "have",
                org.treeproof.data.SkewedFeatures.LIMIT,
                String.join(", ", named), flags.size() > 3 ? ", ..." : "", logged
                        ? "these are skewed after log2 (--log2), so check them (a feature mostly at 0 is one such) and "
                        + "consider leaving them out of the table."
                        : "for intensities, abundances or counts, a log transform (--log2) before scaling is the usual "
                        + "remedy."));
    }

    /** A warning per feature that alone puts a sample far out (at most five named, then a count). */
    static List<String> loneFeatureWarnings(LoadedInput loaded) {
        var flags = loaded.matrix().map(org.treeproof.data.LoneFeatureOutliers::of).orElse(List.of());
        var out = new ArrayList<String>();
        for (int i = 0; i < Math.min(5, flags.size()); i++) {
            var f = flags.get(i);
            out.add(String.format(Locale.ROOT, "Warning: feature %s alone puts sample %s %.0f standard deviations "
                    + "from its mean%s, which can split that sample off as an outlier whatever the other features "
                    + "say; a nearly constant feature scaled to unit variance, or one with a long tail, does this. To "
                    + "avoid it, drop such features (--top-variable keeps the most variable ones), use --scale center or "
                    + "none, or log-transform a long tail.",
                    f.feature(), f.sample(), f.sds(), f.samples() > 1
                            ? String.format(Locale.ROOT, " (%d samples lie beyond %.0f)", f.samples(),
                                    org.treeproof.data.LoneFeatureOutliers.LIMIT) : ""));
        }
        if (flags.size() > 5) {
            out.add(String.format(Locale.ROOT, "Warning: %d more features each put a sample more than %.0f standard "
                    + "deviations from their mean.", flags.size() - 5, org.treeproof.data.LoneFeatureOutliers.LIMIT));
        }
        return out;
    }

    List<SummaryJson.Option> inputOptions() {
        var o = new ArrayList<SummaryJson.Option>();
        o.add(new SummaryJson.Option("inputKind", loaded.isDistanceTable() ? "distances" : "data"));
        loaded.preparation().ifPresent(r -> {
            Preparation p = r.settings();
            o.add(new SummaryJson.Option("samplesInColumns", samplesInColumns));
            o.add(new SummaryJson.Option("missing", p.missing().userName()));
            o.add(new SummaryJson.Option("librarySize", p.librarySize().userName()));
            o.add(new SummaryJson.Option("log2", p.log2()));
            o.add(new SummaryJson.Option("scale", p.scale().userName()));
            o.add(new SummaryJson.Option("topVariable", p.topVariable()));
            if (p.centering() != null) {
                o.add(new SummaryJson.Option("centerWithin", p.centering().column()));
            }
        });
        if (covariatesFile != null) {
            o.add(new SummaryJson.Option("covariatesFile", covariatesFile.toString()));
        }
        return o;
    }

    SummaryJson summary(LabelComparison labels) {
        var provenance = new SummaryJson.Provenance("treeproof", Main.toolVersion(), loaded.source().path(),
                loaded.source().sha256(), preparationSteps(), preparationCautions(), inputOptions(),
                labelsSummary(labels));
        return new SummaryJson(evidence, rec, provenance, new org.treeproof.report.ReasonWords(rec.rule())::word,
                explanation, org.treeproof.report.ReasonWords::covariate);
    }

    RunInfo runInfo() {
        return new RunInfo("treeproof", Main.toolVersion(), loaded.source().path(), loaded.source().sha256(),
                evidence.samples(), evidence.features(), preparationSteps(), preparationCautions(),
                evidence.settings().metric().id(),
                ShellWords.join(commandLine), evidence.settings().seed(), threads, seconds,
                DateTimeFormatter.ISO_OFFSET_DATE_TIME.format(ZonedDateTime.now().withNano(0)),
                loaded.preparation().map(r -> r.settings().librarySize()).orElse(org.treeproof.data.LibrarySize.NONE),
                loaded.preparation().map(r -> r.settings().centering()).map(c -> c.column()).orElse(null));
    }

    /** Writes every output into the (staging) directory. */
    void writeInto(OutputDirectory dir) {
        LabelComparison labels = labels();
        dir.write("summary.json", summary(labels).toBytes());
        dir.write("clusters.csv", CsvOutputs.clusters(evidence, rec).getBytes(StandardCharsets.UTF_8));
        dir.write("scores.csv", CsvOutputs.scores(evidence, rec).getBytes(StandardCharsets.UTF_8));
        writeExplanation(dir);
        ReportModel model = ReportModel.of(evidence, rec, runInfo(), labels, explanation);
        dir.write("methods.md", MethodsParagraph.of(model).render().getBytes(StandardCharsets.UTF_8));
        List<EmbeddedImage> images = new ArrayList<>();
        var chartNotes = new java.util.HashMap<String, String>();
        try {
            Path charts = dir.file("charts/.keep").getParent();
            Files.deleteIfExists(charts.resolve(".keep"));
            DataMatrix data = loaded.matrix().orElse(null);
            var figures = new ArrayList<>(StudyCharts.drawAll(evidence, rec, data, charts, threads));
            if (explanation != null) {
                figures.addAll(ExplainCharts.drawAll(explanation, charts));
            }
            for (Figure f : figures) {
                chartNotes.put(f.id(), f.note());
                String png = f.files().stream().filter(n -> n.endsWith(".png")).findFirst().orElse(null);
                if (png != null && model.figure(f.id()).isPresent()) {
                    images.add(new EmbeddedImage(f.id(), "image/png", Files.readAllBytes(charts.resolve(png))));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the charts", e);
        }
        dir.write("report.html", HtmlReport.of(model, images, chartNotes).render().getBytes(StandardCharsets.UTF_8));
    }

    /** features.csv, and covariates.csv and sensitivity.csv when they were asked for and there were clusters. */
    private void writeExplanation(OutputDirectory dir) {
        if (explanation == null) {
            return;
        }
        if (explanation.features() != null) {
            dir.write("features.csv", ExplainCsv.features(explanation.features()).getBytes(StandardCharsets.UTF_8));
        }
        if (explanation.covariates() != null && explanation.solution() != null) {
            dir.write("covariates.csv", ExplainCsv.covariates(explanation.covariates())
                    .getBytes(StandardCharsets.UTF_8));
        }
        if (explanation.sensitivity() != null) {
            dir.write("sensitivity.csv", ExplainCsv.sensitivity(explanation.sensitivity())
                    .getBytes(StandardCharsets.UTF_8));
        }
    }

    /** One line for the terminal: the verdict and the decision. */
    String headline() {
        return rec.k() == 1
                ? "treeproof: unsupported: no convincing cluster structure (k = 1" + (rec.outlierCount() == 0 ? ")"
                        : String.format(Locale.ROOT, ", %d far sample%s set aside as outlier%s)", rec.outlierCount(),
                                rec.outlierCount() == 1 ? "" : "s", rec.outlierCount() == 1 ? "" : "s"))
                : String.format(Locale.ROOT, "treeproof: %s: k = %d with %s linkage (cut height %.4g)",
                        rec.verdict().id(), rec.k(), rec.linkage().id(), rec.cutHeight().chosen())
                        + (rec.outlierCount() == 0 ? "" : String.format(Locale.ROOT, ", %d outlier%s set aside",
                                rec.outlierCount(), rec.outlierCount() == 1 ? "" : "s"));
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
