package org.treeproof.data;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * What a {@link Preparation} did to a table, for the report and the methods paragraph: every sample and feature
 * it dropped with the reason, how many cells it imputed, which features the top-variable step kept.
 *
 * @param settings        the preparation that was applied
 * @param inputSamples    samples in the table as read
 * @param inputFeatures   features in the table as read
 * @param missingCells    missing cells in the table as read
 * @param droppedSamples  samples dropped, in input order (only the missing-value policy drops samples)
 * @param droppedFeatures features dropped by the missing-value policy or as constant under z-scoring or robust scaling, in the
 *                        order they were dropped; features left out by the top-variable step are not listed here
 *                        but described by {@code topVariable}
 * @param imputedCells    cells filled in with their feature's median
 * @param imputedFeatures features with at least one imputed cell
 * @param topVariable     the top-variable selection, empty when it was not asked for
 * @param samples         samples in the prepared table
 * @param features        features in the prepared table
 * @param sizeFactors     the library-size factors, empty when no library-size scaling was asked for
 * @param countTotals     without library-size scaling, under log2, of data that are whole numbers >= 0: the range
 *                        of the samples' totals (for a note when counts of uneven depth may need scaling)
 */
public record PreparationReport(Preparation settings, int inputSamples, int inputFeatures, long missingCells,
        List<Removal> droppedSamples, List<Removal> droppedFeatures, long imputedCells, int imputedFeatures,
        Optional<TopVariable> topVariable, int samples, int features, Optional<SizeFactors> sizeFactors,
        Optional<Totals> countTotals) {

    public PreparationReport {
        Objects.requireNonNull(settings, "settings");
        droppedSamples = List.copyOf(droppedSamples);
        droppedFeatures = List.copyOf(droppedFeatures);
        Objects.requireNonNull(topVariable, "topVariable");
        Objects.requireNonNull(sizeFactors, "sizeFactors");
        Objects.requireNonNull(countTotals, "countTotals");
        if (inputSamples < 0 || inputFeatures < 0 || missingCells < 0 || imputedCells < 0 || imputedFeatures < 0) {
            throw new IllegalArgumentException("negative count");
        }
        if (samples != inputSamples - droppedSamples.size()) {
            throw new IllegalArgumentException(samples + " samples left does not match " + inputSamples + " read and "
                    + droppedSamples.size() + " dropped");
        }
        int leftOut = topVariable.map(t -> t.candidates() - t.kept().size()).orElse(0);
        if (features != inputFeatures - droppedFeatures.size() - leftOut) {
            throw new IllegalArgumentException(features + " features left does not match " + inputFeatures + " read, "
                    + droppedFeatures.size() + " dropped and " + leftOut + " not among the most variable");
        }
    }

    /**
     * The preparation as plain sentences, in the order the steps ran, for the report, the methods paragraph
     * and {@code summary.json}.
     */
    public List<String> steps() {
        var out = new ArrayList<String>();
        out.add(String.format(Locale.ROOT, "Read %d samples and %d features.", inputSamples, inputFeatures));
        if (missingCells > 0) {
            out.add(String.format(Locale.ROOT, "%d cells were missing; missing-value policy: %s.", missingCells,
                    settings.missing().userName()));
        }
        if (!droppedSamples.isEmpty()) {
            out.add(String.format(Locale.ROOT, "Dropped %d sample(s) with missing values: %s.",
                    droppedSamples.size(), names(droppedSamples)));
        }
        List<Removal> missingFeatures = droppedFeatures.stream().filter(r -> r.reason() != Reason.CONSTANT).toList();
        List<Removal> constant = droppedFeatures.stream().filter(r -> r.reason() == Reason.CONSTANT).toList();
        if (!missingFeatures.isEmpty()) {
            out.add(String.format(Locale.ROOT, "Dropped %d feature(s) with missing values: %s.",
                    missingFeatures.size(), names(missingFeatures)));
        }
        if (imputedCells > 0) {
            out.add(String.format(Locale.ROOT, "Imputed %d cell(s) in %d feature(s) with the feature's median.",
                    imputedCells, imputedFeatures));
        }
        sizeFactors.ifPresent(f -> out.add(f.sentence()));
        if (settings.log2()) {
            out.add("Transformed every value to log2(x + 1).");
        }
        if (settings.centering() != null) {
            out.add(settings.centering().sentence());
        }
        topVariable.ifPresent(t -> out.add(t.kept().size() < t.candidates()
                ? String.format(Locale.ROOT, "Kept the %d of %d features with the largest variance%s.",
                        t.kept().size(), t.candidates(), t.tieAtCutoff() ? " (a tie at the cutoff went by input order)" : "")
                : String.format(Locale.ROOT, "Asked for the %d most variable features; all %d were kept.",
                        t.requested(), t.candidates())));
        if (!constant.isEmpty()) {
            out.add(String.format(Locale.ROOT, "Dropped %d constant feature(s), which have no spread to scale by: %s.",
                    constant.size(), names(constant)));
        }
        out.add(settings.scale().sentence());
        out.add(String.format(Locale.ROOT, "Clustered %d samples on %d features.", samples, features));
        return out;
    }

    private static String names(List<Removal> removals) {
        int shown = Math.min(10, removals.size());
        var sb = new StringBuilder();
        for (int i = 0; i < shown; i++) {
            sb.append(i == 0 ? "" : ", ").append('\'').append(removals.get(i).name()).append('\'');
        }
        if (removals.size() > shown) {
            sb.append(" and ").append(removals.size() - shown).append(" more");
        }
        return sb.toString();
    }

    /** A sample or feature that was dropped, and why. */
    public record Removal(String name, Reason reason, int missingValues) {
        public Removal {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(reason, "reason");
            if (missingValues < 0) {
                throw new IllegalArgumentException("negative missing count");
            }
        }
    }

    /** Why a sample or feature was dropped. */
    public enum Reason {
        /** It had missing values and the policy drops such rows or columns. */
        MISSING_VALUES("has missing values"),
        /** Every value of the feature was missing, so there was no median to impute. */
        NO_OBSERVED_VALUES("has no observed value to take a median of"),
        /** The feature takes one value in every sample, so its spread is 0 and it cannot be scaled (z-score or Qn). */
        CONSTANT("is constant, so it has no spread to scale by");

        private final String description;

        Reason(String description) {
            this.description = description;
        }

        /** A short phrase for reports, e.g. "has missing values". */
        public String description() {
            return description;
        }
    }

    /**
     * The size factor each sample's counts were divided by.
     *
     * @param method  the library-size method
     * @param samples the samples, in the order of the table at that step
     * @param factors their size factors, in the same order
     */
    public record SizeFactors(LibrarySize method, List<String> samples, List<Double> factors) {
        public SizeFactors {
            if (Objects.requireNonNull(method, "method") == LibrarySize.NONE) {
                throw new IllegalArgumentException("no size factors without library-size scaling");
            }
            samples = List.copyOf(samples);
            factors = List.copyOf(factors);
            if (samples.size() != factors.size() || samples.isEmpty()) {
                throw new IllegalArgumentException(samples.size() + " samples for " + factors.size() + " factors");
            }
        }

        /** What was done, as a sentence for reports: the method's, with the range of the factors. */
        String sentence() {
            int lo = 0;
            int hi = 0;
            for (int i = 1; i < factors.size(); i++) {
                lo = factors.get(i) < factors.get(lo) ? i : lo;
                hi = factors.get(i) > factors.get(hi) ? i : hi;
            }
            return method.sentence(String.format(Locale.ROOT, "size factors from %.3g ('%s') to %.3g ('%s')",
                    factors.get(lo), samples.get(lo), factors.get(hi), samples.get(hi)));
        }
    }

    /**
     * The range of the samples' totals over the features, as read (after the missing-value policy).
     *
     * @param smallest       the smallest total
     * @param smallestSample the sample that has it
     * @param largest        the largest total
     * @param largestSample  the sample that has it
     */
    public record Totals(double smallest, String smallestSample, double largest, String largestSample) {
        public Totals {
            Objects.requireNonNull(smallestSample, "smallestSample");
            Objects.requireNonNull(largestSample, "largestSample");
        }

        /**
         * The ratio of the largest total to the smallest from which the depths are called uneven: twice. Our
         * choice, with no source: a sample read twice as deeply has every count doubled, one log2 unit on every
         * feature, as large as a typical between-group difference in expression data.
         */
        public static final double UNEVEN = 2;

        /** How many times the largest total the smallest is; infinite when the smallest is 0. */
        public double ratio() {
            return largest / smallest;
        }

        /** Whether the totals differ by at least {@link #UNEVEN} times. */
        public boolean uneven() {
            return !(ratio() < UNEVEN);
        }
    }

    /**
     * The outcome of keeping the {@code requested} features of largest population variance.
     *
     * @param requested      the N asked for
     * @param candidates     features available at that step
     * @param kept           the kept features, in input order (all candidates when N is not smaller)
     * @param cutoffVariance the smallest variance among the kept features
     * @param tieAtCutoff    whether a left-out feature has exactly the cutoff variance, so input order decided
     */
    public record TopVariable(int requested, int candidates, List<String> kept, double cutoffVariance,
            boolean tieAtCutoff) {
        public TopVariable {
            kept = List.copyOf(kept);
            if (requested < 1 || kept.size() != Math.min(requested, candidates)) {
                throw new IllegalArgumentException("kept " + kept.size() + " of " + candidates + " for N = "
                        + requested);
            }
        }
    }
}
