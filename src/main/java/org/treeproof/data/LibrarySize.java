package org.treeproof.data;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * How counts are put on a common depth before log2 and scaling: per sample, over its features. Counts from
 * sequencing (reads per gene, per taxon) grow with the number of reads a sample got, so two samples of one kind at
 * different depths differ on every feature at once; without correcting for it, a tree tends to sort samples by
 * depth. Each sample's counts are divided by its size factor; the factors are reported.
 */
public enum LibrarySize {
    /** The counts as they are. */
    NONE("none", "Left the counts as they are.") {
        @Override
        double[] factors(PreparationRun run) {
            return null;
        }
    },
    /**
     * Total-count scaling: each sample's size factor is its total over the features divided by the mean total of
     * the samples, so every sample is brought to the mean total and counts keep their magnitude (log2(x + 1) then
     * still adds about one count). The "total count" normalisation as described by M.-A. Dillies et al., "A
     * comprehensive evaluation of normalization methods for Illumina high-throughput RNA sequencing data
     * analysis", Briefings in Bioinformatics 14 (2013) 671-683, doi:10.1093/bib/bbs046 (the mean as the common
     * total is from memory of that description). A few features with very high counts in some samples move the
     * totals, which the median-ratio method resists.
     */
    TOTAL("total", "Divided each sample's counts by its total relative to the mean total of the samples"
            + " (total-count scaling, Dillies et al., 2013; %s).") {
        @Override
        double[] factors(PreparationRun run) {
            WorkingTable t = run.table;
            int n = t.samples();
            int p = t.features();
            double[] total = new double[n];
            double mean = 0;
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int j = 0; j < p; j++) {
                    s += t.get(i, j);
                }
                total[i] = s;
                mean += s / n;
            }
            for (int i = 0; i < n; i++) {
                total[i] /= mean;
            }
            return total;
        }
    },
    /**
     * The median-ratio method: S. Anders and W. Huber, "Differential expression analysis for sequence count
     * data", Genome Biology 11 (2010) R106, doi:10.1186/gb-2010-11-10-r106, equation 5. A pseudo-sample is formed
     * from each feature's geometric mean over the samples; a sample's size factor is the median, over the
     * features, of its count divided by that geometric mean. Only features with a count above 0 in every sample
     * take part (a zero makes the geometric mean 0). Being a median, it is not moved by the few features that
     * differ between groups, as a total is.
     */
    MEDIAN_RATIO("median-ratio", "Divided each sample's counts by its size factor from the median-ratio method"
            + " (Anders & Huber, 2010; %s).") {
        @Override
        double[] factors(PreparationRun run) {
            WorkingTable t = run.table;
            int n = t.samples();
            int p = t.features();
            int[] usable = new int[p];
            double[] logMean = new double[p];
            int used = 0;
            for (int j = 0; j < p; j++) {
                boolean positive = true;
                double sum = 0;
                for (int i = 0; i < n && positive; i++) {
                    double x = t.get(i, j);
                    positive = x > 0;
                    sum += positive ? Math.log(x) : 0;
                }
                if (positive) {
                    usable[used] = j;
                    logMean[used++] = sum / n;
                }
            }
            if (used == 0) {
                throw new InputException(run.where.source() + ": no feature is above 0 in every sample, so"
                        + " --library-size median-ratio has no feature to form its ratios from; use --library-size"
                        + " total");
            }
            double[] factor = new double[n];
            double[] r = new double[used];
            for (int i = 0; i < n; i++) {
                for (int u = 0; u < used; u++) {
                    r[u] = Math.log(t.get(i, usable[u])) - logMean[u];
                }
                Arrays.sort(r);
                double median = used % 2 == 1 ? r[used / 2] : (r[used / 2 - 1] + r[used / 2]) / 2;
                factor[i] = Math.exp(median);
            }
            return factor;
        }
    };

    private final String userName;
    private final String sentence;

    LibrarySize(String userName, String sentence) {
        this.userName = userName;
        this.sentence = sentence;
    }

    /** What this method did, as a sentence for reports, with {@code factors} (the range of the factors) in it. */
    String sentence(String factors) {
        return String.format(Locale.ROOT, sentence, factors);
    }

    /** The name users type, e.g. {@code median-ratio}. */
    public String userName() {
        return userName;
    }

    /**
     * The method for a user-typed name, ignoring case.
     *
     * @throws InputException naming the accepted names when {@code name} is none of them
     */
    public static LibrarySize fromUserName(String name) {
        String key = name.strip().toLowerCase(Locale.ROOT);
        for (LibrarySize s : values()) {
            if (s.userName.equals(key)) {
                return s;
            }
        }
        throw new InputException("unknown library-size method '" + name + "'; use one of " + names());
    }

    /**
     * Whether every observed (not missing) cell of {@code m} is a whole number {@code >= 0}, as counts are: the data
     * that library-size scaling is for, and that the outputs and {@code --sensitivity} offer it to.
     */
    public static boolean countsLike(DataMatrix m) {
        for (int i = 0; i < m.samples(); i++) {
            for (int j = 0; j < m.features(); j++) {
                double x = m.get(i, j);
                if (!Double.isNaN(x) && (x < 0 || x != Math.rint(x) || Double.isInfinite(x))) {
                    return false;
                }
            }
        }
        return true;
    }

    /** The user names, comma-separated, for help and messages. */
    public static String names() {
        return Arrays.stream(values()).map(LibrarySize::userName).collect(Collectors.joining(", "));
    }

    /** Each sample's size factor, in the working table's sample order; null for {@link #NONE}. */
    abstract double[] factors(PreparationRun run);

    /**
     * Divides each sample's counts by its size factor and records the factors.
     *
     * @throws InputException when a value is negative (counts cannot be), a sample has no counts, or the factors
     *                        cannot be formed
     */
    void apply(PreparationRun run) {
        if (this == NONE) {
            return;
        }
        WorkingTable t = run.table;
        int[] at = t.first(x -> x < 0, run.where.featureMajor());
        if (at != null) {
            throw new InputException(run.locate(at[0], at[1]) + ": " + t.get(at[0], at[1]) + " is negative "
                    + run.names(at[0], at[1]) + "; --library-size " + userName + " scales counts, which are >= 0");
        }
        for (int i = 0; i < t.samples(); i++) {
            boolean empty = true;
            for (int j = 0; j < t.features() && empty; j++) {
                empty = t.get(i, j) == 0;
            }
            if (empty) {
                throw new InputException(run.where.source() + ": sample '" + t.sample(i) + "' has no counts (every"
                        + " value is 0), so --library-size " + userName + " cannot scale it; remove the sample from"
                        + " the table");
            }
        }
        double[] factor = factors(run);
        int p = t.features();
        String[] samples = new String[t.samples()];
        for (int i = 0; i < t.samples(); i++) {
            samples[i] = t.sample(i);
            for (int j = 0; j < p; j++) {
                t.set(i, j, t.get(i, j) / factor[i]);
            }
        }
        run.librarySizes(new PreparationReport.SizeFactors(this, Arrays.asList(samples),
                Arrays.stream(factor).boxed().toList()));
        run.refuseNonFinite("--library-size " + userName, "values this large are not read counts; drop"
                + " --library-size");
    }

    @Override
    public String toString() {
        return userName;
    }
}
