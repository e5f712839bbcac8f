package org.treeproof.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.treeproof.data.BatchCentering;
import org.treeproof.data.InputException;
import org.treeproof.data.LibrarySize;
import org.treeproof.data.MissingPolicy;
import org.treeproof.data.Preparation;
import org.treeproof.data.Scale;
import org.treeproof.io.DataTable;
import org.treeproof.io.DataTableReader;
import org.treeproof.io.DistanceTableReader;
import org.treeproof.io.LoadedInput;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * The input options every command that reads a table shares (a picocli mixin): how the file is laid out and how
 * it is prepared. {@link #load(Path)} reads and prepares the command's INPUT accordingly.
 *
 * <p>The default scaling is {@code zscore}: with features in different units, a distance on raw values is
 * decided by whichever feature has the largest numbers, which is rarely what a study means. Data already on one
 * scale (and comparisons with other software on raw values) ask for {@code --scale none}; the effective choice is
 * recorded with the results either way.
 */
public final class InputOptions {

    @Option(names = "--samples-in-columns",
            description = "The table has one feature per row and one sample per column (header row = sample ids).")
    private boolean samplesInColumns;

    @Option(names = "--delimiter", paramLabel = "CHAR", converter = DelimiterConverter.class,
            description = "Field delimiter: a single character, or tab, comma, semicolon, space, pipe (also '\\t')."
                    + " Default: from the file name: .csv comma; .tsv, .tab, .txt tab (also with .gz).")
    private Character delimiter;

    @Option(names = "--missing", paramLabel = "POLICY", converter = MissingConverter.class,
            description = "Missing cells (empty, NA, N/A, #N/A, NaN): error, drop-features, drop-samples or"
                    + " impute-median (the feature's median). Default: error.")
    private MissingPolicy missing;

    @Option(names = "--library-size", paramLabel = "HOW", converter = LibrarySizeConverter.class,
            description = "Scale counts for each sample's depth before log2: none (default), total (each sample to"
                    + " the mean total) or median-ratio (Anders and Huber's size factors, from the features above 0"
                    + " in every sample). For read counts of uneven depth; values must be >= 0.")
    private LibrarySize librarySize;

    @Option(names = "--log2", description = "Take log2(x + 1) of every value (all values must be >= 0).")
    private boolean log2;

    @Option(names = "--scale", paramLabel = "HOW", converter = ScaleConverter.class,
            description = "Per-feature scaling after log2: none, center, zscore (population SD) or robust (median and"
                    + " Qn, which keeps the separation of groups that lie on few features; long-tailed features need"
                    + " --log2 first); constant features are dropped and reported. Default: zscore; none for the 0/1"
                    + " metrics jaccard and hamming.")
    private Scale scale;

    @Option(names = "--top-variable", paramLabel = "N", converter = TopVariableConverter.class,
            description = "Keep the N features of largest variance (ties by input order), 0 for all. Default: 0.")
    private Integer topVariable;

    @Option(names = "--center-within", paramLabel = "COLUMN",
            description = "Remove each batch's mean from every feature, after --log2 and before --top-variable and"
                    + " --scale: COLUMN is the column of --covariates that records how the samples were processed (a"
                    + " batch, run, site or date). Groups spread evenly over the batches keep their difference;"
                    + " groups spread unevenly lose part of it. Default: no centring.")
    private String centerWithin;

    @Option(names = "--no-ids",
            description = "The table has no id column: every column is a feature, and samples are named by their"
                    + " row, 1 to n.")
    private boolean noIds;

    @Option(names = "--distances",
            description = "INPUT is a square, symmetric table of distances with ids in its header row and first"
                    + " column, not a data table.")
    private boolean distances;

    /** Set by {@link #fitTo}: a 0/1 metric, whose default scaling is none. */
    private boolean binaryMetric;

    /** Reads each sample's batch for {@code --center-within}, given the table's sample ids; set by the command. */
    private Function<List<String>, Map<String, String>> batchLevels;

    /** Built when a data table is loaded with {@code --center-within}. */
    private BatchCentering centering;

    /** How messages name the input when INPUT is {@code -}. */
    static final String STANDARD_INPUT = "standard input";

    /** Whether {@code input} is {@code -}, which stands for standard input. */
    static boolean isStandardInput(Path input) {
        return input.toString().equals("-");
    }

    /** The covariate column named by {@code --center-within}, if given. */
    public Optional<String> centerWithin() {
        return Optional.ofNullable(centerWithin);
    }

    /**
     * Supplies each sample's level of the {@code --center-within} column (by sample id), read once the table's
     * ids are known; a sample without a value is left out of the map.
     */
    public void batchLevelsFrom(Function<List<String>, Map<String, String>> levels) {
        this.batchLevels = levels;
    }

    /** Whether INPUT is a distance table. */
    public boolean distances() {
        return distances;
    }

    /** Whether a data table holds one sample per column. */
    public boolean samplesInColumns() {
        return samplesInColumns;
    }

    /** The delimiter asked for; empty when it is chosen by the file name. */
    public Optional<Character> delimiter() {
        return Optional.ofNullable(delimiter);
    }

    /**
     * The effective preparation of a data table, defaults filled in: {@link Preparation#DEFAULT_SCALE}, or no
     * scaling for a 0/1 metric (see {@link #fitTo}).
     */
    public Preparation preparation() {
        Scale defaultScale = binaryMetric ? Scale.NONE : Preparation.DEFAULT_SCALE;
        return new Preparation(missing == null ? MissingPolicy.ERROR : missing,
                librarySize == null ? LibrarySize.NONE : librarySize, log2,
                scale == null ? defaultScale : scale, topVariable == null ? 0 : topVariable, centering);
    }

    /**
     * Reads {@code input} as these options say and, for a data table, prepares it.
     *
     * @throws InputException when the file is not a valid table, cannot be prepared, or an option given does not
     *                        apply to a distance table
     */
    public LoadedInput load(Path input) {
        try {
            return loadAsGiven(input);
        } catch (InputException e) {
            throw InputHints.explain(input, e, this);
        }
    }

    private LoadedInput loadAsGiven(Path input) {
        if (distances) {
            List<String> notForDistances = new ArrayList<>();
            addIf(notForDistances, samplesInColumns, "--samples-in-columns");
            addIf(notForDistances, missing != null, "--missing");
            addIf(notForDistances, librarySize != null, "--library-size");
            addIf(notForDistances, log2, "--log2");
            addIf(notForDistances, scale != null, "--scale");
            addIf(notForDistances, topVariable != null, "--top-variable");
            addIf(notForDistances, noIds, "--no-ids");
            addIf(notForDistances, centerWithin != null, "--center-within");
            if (!notForDistances.isEmpty()) {
                throw new InputException(String.join(", ", notForDistances) + (notForDistances.size() == 1 ? " does"
                        : " do") + " not apply to a distance table (--distances)");
            }
            DistanceTableReader reader = new DistanceTableReader(delimiter);
            return LoadedInput.of(isStandardInput(input) ? reader.read(STANDARD_INPUT, System.in) : reader.read(input));
        }
        if (centerWithin != null && batchLevels == null) {
            throw new InputException("--center-within " + centerWithin + " names a column of --covariates FILE, which "
                    + "only the assess command reads");
        }
        DataTableReader reader = new DataTableReader(delimiter, samplesInColumns, noIds);
        DataTable table = isStandardInput(input) ? reader.read(STANDARD_INPUT, System.in) : reader.read(input);
        if (centerWithin != null) {
            centering = BatchCentering.of(centerWithin, batchLevels.apply(table.matrix().sampleIds()));
        }
        return LoadedInput.of(table, preparation().apply(table.matrix(), table.locator()));
    }

    /** Reads {@code input}, a data table, as it is (before any preparation), for rerunning other preparations. */
    public org.treeproof.data.DataMatrix readRaw(Path input) {
        return new DataTableReader(delimiter, samplesInColumns).read(input).matrix();
    }

    /**
     * Fits the preparation to {@code metric}: a 0/1 measure takes the data as they are, so its default scaling is
     * {@code none}, and an explicit log2 or scaling, which would turn 0/1 values into others, is refused.
     *
     * @throws InputException naming the option that transforms the values
     */
    public void fitTo(org.treeproof.distance.Metric metric) {
        binaryMetric = metric.binaryOnly() && !distances;
        if (!binaryMetric) {
            return;
        }
        Preparation p = preparation();
        var changes = new ArrayList<String>();
        addIf(changes, p.librarySize() != LibrarySize.NONE, "--library-size " + p.librarySize().userName());
        addIf(changes, p.log2(), "--log2");
        addIf(changes, p.scale() != Scale.NONE, "--scale " + p.scale().userName());
        addIf(changes, centerWithin != null, "--center-within");
        if (!changes.isEmpty()) {
            throw new InputException("--metric " + metric.id() + " takes 0/1 data as they are; drop "
                    + String.join(" and ", changes) + " (" + (changes.size() == 1 ? "it changes" : "they change")
                    + " 0/1 values)");
        }
    }

    private static void addIf(List<String> list, boolean condition, String option) {
        if (condition) {
            list.add(option);
        }
    }

    /** Reads a delimiter: one character, or a name for one that is awkward to type. */
    public static final class DelimiterConverter implements CommandLine.ITypeConverter<Character> {
        @Override
        public Character convert(String value) {
            char c = switch (value.toLowerCase(Locale.ROOT)) {
                case "tab", "\\t", "\t" -> '\t';
                case "comma" -> ',';
                case "semicolon" -> ';';
                case "space", " " -> ' ';
                case "pipe" -> '|';
                default -> {
                    if (value.length() != 1) {
                        throw new CommandLine.TypeConversionException("'" + value + "' is not one character; give a"
                                + " character or tab, comma, semicolon, space or pipe");
                    }
                    yield value.charAt(0);
                }
            };
            if (c == '"' || (c < 0x20 && c != '\t')) {
                throw new CommandLine.TypeConversionException(c == '"' ? "the quote character '\"' cannot delimit"
                        + " fields" : "a control character cannot delimit fields");
            }
            return c;
        }
    }

    /** Reads a missing-value policy by its user name. */
    public static final class MissingConverter implements CommandLine.ITypeConverter<MissingPolicy> {
        @Override
        public MissingPolicy convert(String value) {
            try {
                return MissingPolicy.fromUserName(value);
            } catch (InputException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }

    /** Reads a scaling by its user name. */
    public static final class ScaleConverter implements CommandLine.ITypeConverter<Scale> {
        @Override
        public Scale convert(String value) {
            try {
                return Scale.fromUserName(value);
            } catch (InputException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }

    /** Reads a library-size method by its user name. */
    public static final class LibrarySizeConverter implements CommandLine.ITypeConverter<LibrarySize> {
        @Override
        public LibrarySize convert(String value) {
            try {
                return LibrarySize.fromUserName(value);
            } catch (InputException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }

    /** Reads a feature count, 0 meaning all. */
    public static final class TopVariableConverter implements CommandLine.ITypeConverter<Integer> {
        @Override
        public Integer convert(String value) {
            int n;
            try {
                n = Integer.parseInt(value.strip());
            } catch (NumberFormatException e) {
                throw new CommandLine.TypeConversionException("'" + value + "' is not a whole number");
            }
            if (n < 0) {
                throw new CommandLine.TypeConversionException("'" + value + "' is negative; give 0 (all features) or"
                        + " a positive count");
            }
            return n;
        }
    }
}
