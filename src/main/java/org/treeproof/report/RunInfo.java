package org.treeproof.report;

import java.util.List;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * The facts about one run that a report needs to be reproduced: what ran, on what input, how, and for how long.
 *
 * <p>{@code threads}, {@code wallSeconds} and {@code generatedAt} cannot change a result; renderers that must be
 * deterministic for a given study (the methods paragraph) leave them out.
 *
 * @param toolName    the tool's name
 * @param toolVersion the tool's version
 * @param inputFile   the input file's name as the user gave it
 * @param inputSha256 the SHA-256 of the input file's bytes, 64 hexadecimal digits (stored in lower case)
 * @param samples     samples in the study
 * @param features    features of the prepared data (0 when only distances were given)
 * @param preparation the preparation steps in order, as plain sentences ("log2(x+1) applied")
 * @param cautions    what the preparation found that bears on the result (warnings and notes, as sentences); shown
 *                    beside the decision and listed in methods.md after the paragraph, not in it
 * @param metric      the id of the dissimilarity ({@code Metric.id()})
 * @param commandLine the exact command line
 * @param seed        the master seed
 * @param threads     threads used
 * @param wallSeconds wall-clock time of the run in seconds
 * @param generatedAt when the report was made, as text (e.g. ISO-8601)
 * @param librarySize the library-size method of the preparation ({@code NONE} for a distance table), for the
 *                    methods paragraph's references
 * @param centeredWithin the covariate whose levels' means were removed ({@code --center-within}), or {@code null}
 */
public record RunInfo(String toolName, String toolVersion, String inputFile, String inputSha256, int samples,
        int features, List<String> preparation, List<String> cautions, String metric, String commandLine, long seed,
        int threads, double wallSeconds, String generatedAt, org.treeproof.data.LibrarySize librarySize,
        String centeredWithin) {

    /** A run without batch mean-centring. */
    public RunInfo(String toolName, String toolVersion, String inputFile, String inputSha256, int samples,
            int features, List<String> preparation, List<String> cautions, String metric, String commandLine, long seed,
            int threads, double wallSeconds, String generatedAt, org.treeproof.data.LibrarySize librarySize) {
        this(toolName, toolVersion, inputFile, inputSha256, samples, features, preparation, cautions, metric,
                commandLine, seed, threads, wallSeconds, generatedAt, librarySize, null);
    }

    /** A run without library-size scaling. */
    public RunInfo(String toolName, String toolVersion, String inputFile, String inputSha256, int samples,
            int features, List<String> preparation, List<String> cautions, String metric, String commandLine, long seed,
            int threads, double wallSeconds, String generatedAt) {
        this(toolName, toolVersion, inputFile, inputSha256, samples, features, preparation, cautions, metric,
                commandLine, seed, threads, wallSeconds, generatedAt, org.treeproof.data.LibrarySize.NONE);
    }

    /** A run whose preparation gave no caution. */
    public RunInfo(String toolName, String toolVersion, String inputFile, String inputSha256, int samples,
            int features, List<String> preparation, String metric, String commandLine, long seed, int threads,
            double wallSeconds, String generatedAt) {
        this(toolName, toolVersion, inputFile, inputSha256, samples, features, preparation, List.of(), metric,
                commandLine, seed, threads, wallSeconds, generatedAt);
    }

    private static final Pattern SHA256 = Pattern.compile("[0-9a-fA-F]{64}");

    public RunInfo {
        Objects.requireNonNull(toolName, "toolName");
        Objects.requireNonNull(toolVersion, "toolVersion");
        Objects.requireNonNull(inputFile, "inputFile");
        Objects.requireNonNull(inputSha256, "inputSha256");
        Objects.requireNonNull(metric, "metric");
        Objects.requireNonNull(commandLine, "commandLine");
        Objects.requireNonNull(generatedAt, "generatedAt");
        Objects.requireNonNull(librarySize, "librarySize");
        preparation = List.copyOf(preparation);
        cautions = List.copyOf(cautions);
        if (toolName.isBlank() || toolVersion.isBlank()) {
            throw new IllegalArgumentException("the tool's name and version must not be blank");
        }
        if (!SHA256.matcher(inputSha256).matches()) {
            throw new IllegalArgumentException("inputSha256 must be 64 hexadecimal digits, got '" + inputSha256 + "'");
        }
        inputSha256 = inputSha256.toLowerCase(java.util.Locale.ROOT);
        if (samples < 1 || features < 0) {
            throw new IllegalArgumentException("samples " + samples + ", features " + features);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be positive, got " + threads);
        }
        if (!(wallSeconds >= 0) || Double.isInfinite(wallSeconds)) {
            throw new IllegalArgumentException("wall time must be a non-negative number of seconds, got " + wallSeconds);
        }
    }
}
