package org.treeproof.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.InputException;
import org.treeproof.distance.Metric;
import org.treeproof.io.CheckpointFile;
import org.treeproof.io.CovariatesReader;
import org.treeproof.io.CsvOutputs;
import org.treeproof.io.DiskFull;
import org.treeproof.io.LabelsReader;
import org.treeproof.io.LoadedInput;
import org.treeproof.io.OutputDirectory;
import org.treeproof.io.OutputGuard;
import org.treeproof.io.SummaryJson;
import org.treeproof.resample.ReferenceData;
import org.treeproof.resample.Resampling;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.Evidence;
import org.treeproof.study.MemoryEstimate;
import org.treeproof.study.Recommendation;
import org.treeproof.study.Recommender;
import org.treeproof.study.StudyInput;
import org.treeproof.study.StudyRunner;
import org.treeproof.study.StudySettings;
import org.treeproof.tree.Linkage;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code treeproof assess INPUT --out DIR}: the whole study, from the table to the recommendation, the report,
 * the methods paragraph and the machine-readable outputs.
 */
@Command(name = "assess", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Cluster the input with each linkage, recluster resampled replicates, calibrate against null "
                + "data and the gap statistic, and recommend a number of clusters with its reasons.",
            "Writes DIR/summary.json, clusters.csv, scores.csv, methods.md, report.html and charts/, and when clusters "
                + "are recommended features.csv (covariates.csv with --covariates, sensitivity.csv with "
                + "--sensitivity)."})
final class AssessCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "INPUT", description = "Data table (CSV/TSV, optionally .gz), samples in rows "
            + "unless --samples-in-columns; or a distance table with --distances.")
    Path input;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output directory (must not exist "
            + "unless --force).")
    Path out;

    @Mixin
    StudyOptions study;

    @Mixin
    InputOptions inputOptions;

    @Option(names = "--labels", paramLabel = "FILE", description = "Known classes (id, class per row, header row) to "
            + "compare the recommended clusters with.")
    Path labels;

    @Mixin
    ExplainOptions explain;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores). Results do not "
            + "depend on it.")
    Integer threads;

    @Option(names = "--engine", paramLabel = "local|spark", description = "Where replicates run: local (threads of "
            + "this machine, default) or spark (Spark tasks; run treeproof under spark-submit, which supplies the "
            + "master). Results do not depend on it.")
    String engine;

    @Option(names = "--force", description = "Replace DIR if it exists and treeproof wrote it, unchanged (only once the "
            + "new results are complete). Never replaces a folder holding the input, the current directory or a folder "
            + "above it.")
    boolean force;

    @Option(names = "--resume", description = "Continue a run of the same study that was interrupted, from the "
            + "replicates it had finished (kept beside DIR as .DIR.checkpoint); the result is identical to an "
            + "uninterrupted run.")
    boolean resume;

    @Option(names = "--no-progress", description = "Do not show progress.")
    boolean noProgress;

    @Option(names = "--quiet", description = "Print nothing but errors.")
    boolean quiet;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    /** The command line as typed (the words after the sub-command's name), for the reproducibility section. */
    private String[] commandLine() {
        List<String> typed = spec.commandLine().getParseResult().originalArgs();
        int at = typed.indexOf(spec.name());
        var args = new ArrayList<String>(List.of("treeproof", spec.name()));
        args.addAll(typed.subList(at + 1, typed.size()));
        return args.toArray(String[]::new);
    }

    /**
     * What makes two runs the same study: tool version and build (the jar's checksum, {@link BuildIdentity}), input
     * bytes, input preparation and every setting (not the thread count, which cannot change a result).
     */
    private static String fingerprint(LoadedInput loaded, StudySettings settings) {
        String text = Main.toolVersion() + "\n" + BuildIdentity.current() + "\n" + loaded.source().sha256() + "\n"
                + loaded.preparation().map(p -> p.settings().toString()).orElse("distances") + "\n" + settings;
        try {
            var md = java.security.MessageDigest.getInstance("SHA-256");
            return java.util.HexFormat.of().formatHex(md.digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /**
     * Each sample's level of {@code column} for {@code --center-within}, by sample id; samples without a value are
     * left out (the centring then names the first). A numeric column's values are its levels.
     */
    private Map<String, String> batchLevels(List<org.treeproof.explain.Covariate> covariates, String column,
            List<String> ids) {
        var covariate = covariates.stream().filter(c -> c.name().equals(column)).findFirst()
                .orElseThrow(() -> new InputException("--center-within " + column + ": --covariates "
                        + explain.covariates + " has no column '" + column + "' (its columns: "
                        + String.join(", ", covariates.stream().map(org.treeproof.explain.Covariate::name).toList())
                        + ")"));
        String[] categories = covariate.categories();
        double[] values = covariate.values();
        var levels = new java.util.HashMap<String, String>();
        for (int i = 0; i < ids.size(); i++) {
            if (covariate.missing(i)) {
                continue;
            }
            String level;
            if (categories != null) {
                level = categories[i];
            } else {
                double v = values[i];
                level = v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
            }
            levels.put(ids.get(i), level);
        }
        return levels;
    }

    @Override
    public Integer call() {
        long started = System.nanoTime();
        int nThreads = Threads.resolve(threads, "--threads");
        Engine chosen = engine == null ? Engine.LOCAL : Engine.parse(engine);
        chosen.requireAvailable();
        StudySettings settings = study.settings(inputOptions.distances());
        List<Path> reads = labels == null ? List.of(input) : List.of(input, labels);
        InputHints.requireReadable(input, "INPUT");
        if (labels != null) {
            InputHints.requireReadable(labels, "--labels");
        }
        OutputGuard.check(out, "--out", force, reads);
        inputOptions.fitTo(settings.metric());
        // a distance table refuses --center-within when it is loaded, naming --distances
        inputOptions.centerWithin().filter(column -> !inputOptions.distances()).ifPresent(column -> {
            if (explain.covariates == null) {
                throw new InputException("--center-within " + column + " names a column of --covariates FILE; give "
                        + "--covariates");
            }
            inputOptions.batchLevelsFrom(ids -> batchLevels(
                    CovariatesReader.read(explain.covariates, ids, explain.kinds()), column, ids));
        });
        LoadedInput loaded = inputOptions.load(input);
        StudyInput studyInput = loaded.isDistanceTable()
                ? StudyInput.ofDistances(loaded.sampleIds(), loaded.distances().orElseThrow())
                : StudyInput.of(loaded.matrix().orElseThrow());
        SampleVariety.require(input, studyInput, settings);
        settings.checkAgainst(studyInput.samples(), studyInput.hasData(), study.maxKGiven());
        org.treeproof.study.Magnitudes.requireWithinLimit(studyInput);
        if (loaded.isDistanceTable()) {
            for (var link : settings.linkages()) {
                if (link.requiresEuclidean()) {
                    // as the tree command says: the table's metric is not known here
                    System.err.println("treeproof: note: " + StudyOutputs.euclideanAssumed(link));
                }
            }
        }
        String[] classes = labels == null ? null
                : LabelsReader.read(labels, inputOptions.delimiter().orElse(null), loaded.sampleIds());
        var covariateKinds = explain.kinds();
        var testOfFeatures = explain.test();
        var covariates = explain.covariates == null ? null
                : CovariatesReader.read(explain.covariates, loaded.sampleIds(), covariateKinds);
        if (explain.sensitivity && loaded.isDistanceTable()) {
            throw new InputException("--sensitivity reruns other preparations of a data table; a distance table has none");
        }
        if (explain.featureTest != null && loaded.isDistanceTable()) {
            throw new InputException("--feature-test compares features between clusters; a distance table has none");
        }
        MemoryEstimate.of(studyInput.samples(), loaded.features(), settings, nThreads, studyInput.hasData())
                .requireFits(Runtime.getRuntime().maxMemory(), studyInput.samples());

        if (!quiet) {
            for (String w : StudyOutputs.loneFeatureWarnings(loaded)) {
                System.err.println("treeproof: " + w);
            }
        }
        String fingerprint = fingerprint(loaded, settings);
        Evidence evidence;
        CheckpointFile checkpoint = CheckpointFile.open(out, fingerprint, resume);
        KeptWork kept = new KeptWork(checkpoint, out.toString(), System.err);
        try (Engine.Run run = chosen.start(nThreads);
                var progress = new ProgressReporter(System.err, quiet || noProgress)) {
            if (resume && !quiet) {
                System.err.println(checkpoint.resumed()
                        ? "treeproof: resuming with " + checkpoint.resumedReplicates()
                                + " replicates kept from the interrupted run"
                        : "treeproof: --resume: no interrupted run of this study was found beside --out; starting "
                                + "afresh");
            }
            if (checkpoint.discardedEarlierWork() && !quiet) {
                System.err.println("treeproof: note: the work an interrupted run kept beside --out was discarded "
                        + "(run the same command with --resume to continue such a run)");
            }
            if (!run.description().isEmpty() && !quiet) {
                System.err.println("treeproof: replicates run on " + run.description());
            }
            evidence = new StudyRunner(studyInput, settings, run.executor(), nThreads, progress)
                    .withCheckpoint(checkpoint).run();
        } catch (InputException e) {
            // the input cannot be studied as asked: nothing worth resuming
            kept.close();
            checkpoint.discard();
            throw e;
        } catch (RuntimeException e) {
            kept.close();
            checkpoint.close();
            throw DiskFull.causedBy(e) ? kept.diskFullDuringStudy() : e;
        } finally {
            checkpoint.close();
        }
        Recommendation rec = Recommender.of(evidence, DecisionRule.DEFAULT).recommend();
        var explanation = ExplainRun.explain(loaded, evidence, rec, testOfFeatures, covariates,
                explain.sensitivity ? inputOptions.readRaw(input) : null, inputOptions.preparation(), nThreads);
        var outputs = new StudyOutputs(loaded, evidence, rec, classes, labels, commandLine(), nThreads,
                (System.nanoTime() - started) / 1e9, explanation, inputOptions.samplesInColumns(), explain.covariates);
        try (OutputDirectory dir = OutputDirectory.begin(out, "--out", force, reads)) {
            outputs.writeInto(dir);
            dir.commit();
        } catch (RuntimeException e) {
            kept.close();
            throw DiskFull.causedBy(e) ? kept.diskFullDuringResults() : e;
        }
        kept.close();
        checkpoint.discard();
        if (!quiet) {
            System.out.println(outputs.headline());
            System.out.println("report: " + out.resolve("report.html"));
        }
        return ExitCodes.OK;
    }
}
